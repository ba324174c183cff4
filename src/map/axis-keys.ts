/**
 * The case keys a map can sweep: each numeric key of the case-file contract (case-format.md) with the kind of
 * quantity it holds (which units FROM and TO may carry) and its own accepted range (so an axis end outside it is
 * refused before the run). Checks that relate two keys (a tip thicker than the base) depend on the other axis and
 * show per point instead.
 */
import {
  coefficientRange,
  conductivityRange,
  contactResistanceRange,
  exponentRange,
  finPosition,
  finSize,
  finSizeOrZero,
  fraction,
  temperatureRange,
  type Range,
} from '../case/index.js';
import type { QuantityKind } from '../case/index.js';

export interface AxisKeyInfo {
  kind: QuantityKind;
  range: Range;
  /** Value when the key is absent from the case (optional keys), in SI; undefined when the key must be present. */
  absentDefault?: number;
  /** A count: the axis values are rounded to whole numbers. */
  integer?: boolean;
}

interface KeyPattern extends AxisKeyInfo {
  pattern: RegExp;
}

const finSizes = 'length|thickness|width|diameter|baseThickness|baseDiameter|innerRadius|outerRadius';

const patterns: readonly KeyPattern[] = [
  { pattern: new RegExp(`^fin\\.(${finSizes})$`), kind: 'length', range: finSize },
  { pattern: /^fin\.(tipThickness|tipDiameter)$/, kind: 'length', range: finSizeOrZero },
  { pattern: /^fin\.points\[\d+\]\[0\]$/, kind: 'length', range: finPosition },
  { pattern: /^fin\.points\[\d+\]\[1\]$/, kind: 'length', range: finSizeOrZero },
  { pattern: /^material\.k$/, kind: 'conductivity', range: conductivityRange },
  { pattern: /^material\.k\.points\[\d+\]\[0\]$/, kind: 'temperature', range: temperatureRange },
  { pattern: /^material\.k\.points\[\d+\]\[1\]$/, kind: 'conductivity', range: conductivityRange },
  { pattern: /^convection\.h(\.tip)?$/, kind: 'heatTransferCoefficient', range: coefficientRange },
  // convection.h.base is > 0 for the power law and >= 0 for a linear h; the schema decides per point.
  { pattern: /^convection\.h\.base$/, kind: 'heatTransferCoefficient', range: coefficientRange },
  { pattern: /^convection\.h\.points\[\d+\]\[0\]$/, kind: 'length', range: finPosition },
  { pattern: /^convection\.h\.points\[\d+\]\[1\]$/, kind: 'heatTransferCoefficient', range: coefficientRange },
  { pattern: /^convection\.h\.exponent$/, kind: 'dimensionless', range: exponentRange },
  { pattern: /^convection\.tip\.convective$/, kind: 'heatTransferCoefficient', range: coefficientRange },
  { pattern: /^convection\.tip\.temperature$/, kind: 'temperature', range: temperatureRange },
  { pattern: /^convection\.ambient$/, kind: 'temperature', range: temperatureRange },
  { pattern: /^convection\.surroundings$/, kind: 'temperature', range: temperatureRange },
  { pattern: /^convection\.emissivity$/, kind: 'dimensionless', range: fraction, absentDefault: 0 },
  { pattern: /^base\.temperature$/, kind: 'temperature', range: temperatureRange },
  { pattern: /^base\.contactResistance$/, kind: 'contactResistance', range: contactResistanceRange, absentDefault: 0 },
];

/** Examples for the message when a key cannot be mapped. */
export const mappableKeyExamples =
  'fin.length, fin.thickness, fin.width, fin.diameter, fin.baseThickness, fin.tipThickness, material.k, convection.h, ' +
  'convection.h.base, convection.h.tip, convection.tip.convective, convection.ambient, base.temperature, base.contactResistance';

/** The kind and range of a normalised key path (`formatKeyPath` form), or undefined when it holds no quantity. */
export function axisKeyInfo(key: string): AxisKeyInfo | undefined {
  const found = patterns.find((p) => p.pattern.test(key));
  if (!found) return undefined;
  const { pattern: _pattern, ...info } = found;
  return info;
}
