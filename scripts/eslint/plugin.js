/** fincheck's own lint rules (see each file): the import graph has no cycles; layers meet at their entries. */
import { layerEntry } from './layer-entry.js';
import { noImportCycle } from './no-import-cycle.js';

export default {
  meta: { name: 'fincheck' },
  rules: { 'layer-entry': layerEntry, 'no-import-cycle': noImportCycle },
};
