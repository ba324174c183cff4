/**
 * The keys of a heat-sink case (heat-sink.md) a map can sweep, with the kind of quantity each holds and its own
 * accepted range (as axis-keys.ts does for a single fin). Counts (`array.count`, `array.pins.rows`,
 * `array.pins.columns`) are whole numbers: their axis values are rounded to whole numbers (axis.ts).
 */
import {
  coefficientRange,
  conductivityRange,
  contactResistanceRange,
  finPosition,
  finSize,
  finSizeOrZero,
  sinkFinCountRange,
  sinkRowCountRange,
  sourcePowerRange,
  temperatureRange,
} from '../case/index.js';
import type { AxisKeyInfo } from './axis-keys.js';

interface SinkKeyPattern extends AxisKeyInfo {
  pattern: RegExp;
}

const finSizes = 'length|thickness|diameter|baseThickness|baseDiameter';

const patterns: readonly SinkKeyPattern[] = [
  { pattern: new RegExp(`^fin\\.(${finSizes})$`), kind: 'length', range: finSize },
  { pattern: /^fin\.(tipThickness|tipDiameter)$/, kind: 'length', range: finSizeOrZero },
  { pattern: /^(plate\.)?material\.k$/, kind: 'conductivity', range: conductivityRange },
  { pattern: /^array\.count$/, kind: 'dimensionless', range: sinkFinCountRange, integer: true },
  { pattern: /^array\.pitch$/, kind: 'length', range: finSize },
  { pattern: /^array\.pins\.(rows|columns)$/, kind: 'dimensionless', range: sinkRowCountRange, integer: true },
  { pattern: /^array\.pins\.pitch\[[01]\]$/, kind: 'length', range: finSize },
  { pattern: /^plate\.(width|length|thickness)$/, kind: 'length', range: finSize },
  { pattern: /^sources\[\d+\]\.power$/, kind: 'power', range: sourcePowerRange },
  { pattern: /^sources\[\d+\]\.centre\[[01]\]$/, kind: 'length', range: finPosition },
  { pattern: /^sources\[\d+\]\.size\[[01]\]$/, kind: 'length', range: finSize },
  { pattern: /^sources\[\d+\]\.contactResistance$/, kind: 'contactResistance', range: contactResistanceRange, absentDefault: 0 },
  { pattern: /^sources\[\d+\]\.limit$/, kind: 'temperature', range: temperatureRange },
  { pattern: /^convection\.(h|plate|underside)$/, kind: 'heatTransferCoefficient', range: coefficientRange },
  { pattern: /^convection\.ambient$/, kind: 'temperature', range: temperatureRange },
];

/** Examples for the message when a key of a heat sink cannot be mapped. */
export const mappableSinkKeyExamples =
  'array.count, array.pitch, plate.thickness, plate.width, plate.material.k, fin.length, fin.thickness, material.k, ' +
  'sources[0].power, sources[0].size[0], sources[0].centre[0], convection.h, convection.plate';

/** The kind and range of a normalised key path of a heat-sink case, or undefined when it holds no quantity. */
export function sinkAxisKeyInfo(key: string): AxisKeyInfo | undefined {
  const found = patterns.find((p) => p.pattern.test(key));
  if (!found) return undefined;
  const { pattern: _pattern, ...info } = found;
  return info;
}
