/**
 * A case for the library: from a plain object (as a YAML or JSON case file would hold), from YAML or JSON text,
 * or from a file. The same validation as the command line: an InputError lists every problem with its key path,
 * the value given and what is accepted (and, for text and files, its line and column).
 */
import { loadCase, parseCaseObject, parseCaseText, type Case } from '../case/index.js';

/** A case from a plain object, e.g. `{ name: 'x', fin: { profile: 'pin', length: '30 mm', diameter: '3 mm' }, ... }`. */
export function caseFromObject(value: unknown, name = 'unnamed case'): Case {
  return parseCaseObject(value, undefined, { defaultName: name });
}

/** A case from YAML or JSON text; `fileName` names it in messages (and is its default name). */
export function caseFromText(text: string, fileName = 'case.yaml'): Case {
  return parseCaseText(text, fileName);
}

/** A case from a YAML or JSON file (at most the command line's size cap). */
export function caseFromFile(path: string): Case {
  return loadCase(path);
}
