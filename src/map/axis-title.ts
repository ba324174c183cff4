/**
 * Axis titles of the map charts: the quantity in words with its symbol and the unit set for print
 * ("Heat transfer coefficient h (W/(m²·K))") instead of the raw key path and the case file's ASCII unit
 * ("convection.h (W/(m^2*K))"). A key without an entry here (a table point such as fin.points[2][1]) keeps its key
 * path, so a title is never wrong, only plainer. map.csv, map.json and the text summary keep the key paths.
 */
import { prettyUnit } from '../images/index.js';
import type { MapAxis } from './types.js';

const titles: readonly { pattern: RegExp; title: string }[] = [
  { pattern: /^fin\.length$/, title: 'Fin length L' },
  { pattern: /^fin\.thickness$/, title: 'Fin thickness t' },
  { pattern: /^fin\.width$/, title: 'Fin width w' },
  { pattern: /^fin\.diameter$/, title: 'Pin diameter D' },
  { pattern: /^fin\.baseThickness$/, title: 'Thickness at the base' },
  { pattern: /^fin\.tipThickness$/, title: 'Thickness at the tip' },
  { pattern: /^fin\.baseDiameter$/, title: 'Diameter at the base' },
  { pattern: /^fin\.tipDiameter$/, title: 'Diameter at the tip' },
  { pattern: /^fin\.innerRadius$/, title: 'Inner radius r1' },
  { pattern: /^fin\.outerRadius$/, title: 'Outer radius r2' },
  { pattern: /^material\.k$/, title: 'Thermal conductivity k' },
  { pattern: /^convection\.h$/, title: 'Heat transfer coefficient h' },
  { pattern: /^convection\.h\.base$/, title: 'Heat transfer coefficient at the base' },
  { pattern: /^convection\.h\.tip$/, title: 'Heat transfer coefficient at the tip' },
  { pattern: /^convection\.h\.exponent$/, title: 'Exponent of the h law' },
  { pattern: /^convection\.tip\.convective$/, title: 'Heat transfer coefficient of the tip face' },
  { pattern: /^convection\.tip\.temperature$/, title: 'Tip temperature' },
  { pattern: /^convection\.ambient$/, title: 'Ambient temperature' },
  { pattern: /^convection\.surroundings$/, title: 'Temperature of the surroundings' },
  { pattern: /^convection\.emissivity$/, title: 'Emissivity ε' },
  { pattern: /^base\.temperature$/, title: 'Base temperature' },
  { pattern: /^base\.contactResistance$/, title: 'Contact resistance R″' },
];

/** The words for a key path, or the key path itself when it has none. */
export function keyTitle(key: string): string {
  return titles.find((t) => t.pattern.test(key))?.title ?? key;
}

/** "Heat transfer coefficient h (W/(m²·K))"; a dimensionless axis has no unit in brackets. */
export function axisTitle(axis: Pick<MapAxis, 'key' | 'displayUnit'>): string {
  const words = keyTitle(axis.key);
  return axis.displayUnit === '' ? words : `${words} (${prettyUnit(axis.displayUnit)})`;
}
