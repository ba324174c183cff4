/**
 * An axis of a map, KEY=FROM:TO: which case key to sweep, between which values, in which unit. Everything that
 * can be known before the run is checked here and refused with a UsageError (exit 2) naming the option: a key
 * that is not a numeric key of the case, units of the wrong kind, FROM == TO, an end outside the key's own range,
 * a log axis through zero.
 *
 * Units: FROM and TO are read like case-file values (`1 mm`, `0.04 in`, `27 BTU/(h*ft^2*degF)`, a bare number is
 * SI, a bare temperature degC). A unit written on one end only applies to both (`1:3 mm` is 1 mm to 3 mm). When
 * both ends carry different units, TO is converted to FROM's unit. Axis values are spaced in that unit.
 */
import {
  bareLengthUnit,
  fromSI,
  formatKeyPath,
  getByKeyPath,
  normaliseUnitText,
  parseKeyPath,
  parseQuantity,
  quantityKinds,
  type Case,
  type HeatSinkCase,
  type KeyPath,
  type QuantityKind,
  rangeText,
} from '../case/index.js';
import { UsageError } from '../errors.js';
import { axisKeyInfo, mappableKeyExamples, type AxisKeyInfo } from './axis-keys.js';
import { mappableSinkKeyExamples, sinkAxisKeyInfo } from './sink-axis-keys.js';
import { axisValues } from './spacing.js';
import { rawAxisValue } from './substitute.js';
import type { MapAxis } from './types.js';

export interface AxisRequest {
  /** The axis's name as the caller shows it, for messages (the command line: its option). */
  option: string;
  /** KEY=FROM:TO as typed. */
  text: string;
  steps: number;
  log: boolean;
}

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?/;

/** "3 mm" -> { value: 3, unit: 'mm' }; "3" -> { value: 3, unit: '' }. */
function splitNumber(option: string, key: string, text: string): { value: number; unit: string } {
  const normalised = normaliseUnitText(text);
  const match = NUMBER.exec(normalised);
  if (!match || !Number.isFinite(Number(match[0]))) {
    throw new UsageError(`${option}: ${key}: got "${text}"; expected a number with an optional unit, such as "2 mm"`);
  }
  return { value: Number(match[0]), unit: normalised.slice(match[0].length).trim() };
}

function keyOf(option: string, keyText: string): { path: KeyPath; key: string } {
  try {
    const path = parseKeyPath(keyText);
    return { path, key: formatKeyPath(path) };
  } catch (err) {
    if (err instanceof UsageError) throw new UsageError(`${option}: ${err.message}`);
    throw err;
  }
}

/** The material a `material.k` (or a sink's `plate.material.k`) key stands for when the case names a built-in one. */
function namedMaterialK(key: string, c: Case | HeatSinkCase): number {
  const material = 'array' in c ? (key === 'plate.material.k' ? c.plate.material : (c.fin?.material ?? c.plate.material)) : c.material;
  if (material.k.kind !== 'constant') throw new Error('built-in material without a constant k');
  return material.k.k;
}

/** The SI value of the key in the case (its default when absent and optional), or throws when it is not there. */
function caseValueSI(option: string, key: string, path: KeyPath, info: AxisKeyInfo, raw: unknown, c: Case | HeatSinkCase): number {
  const examples = 'array' in c ? mappableSinkKeyExamples : mappableKeyExamples;
  if ((key === 'material.k' || key === 'plate.material.k') && typeof getByKeyPath(raw, path.slice(0, -1)) === 'string') return namedMaterialK(key, c);
  const current = getByKeyPath(raw, path);
  if (current === undefined) {
    if (info.absentDefault !== undefined) return info.absentDefault;
    const parent = getByKeyPath(raw, path.slice(0, -1));
    const present =
      typeof parent === 'object' && parent !== null && !Array.isArray(parent)
        ? ` (${formatKeyPath(path.slice(0, -1))} has ${Object.keys(parent).join(', ')})`
        : '';
    throw new UsageError(`${option}: ${key} is not in this case${present}; map a key the case has, e.g. ${examples}`);
  }
  if (typeof current !== 'number' && typeof current !== 'string') {
    throw new UsageError(
      `${option}: ${key} is not a single value in this case (it is ${Array.isArray(current) ? 'a list' : 'a mapping'}); ` +
        `map one of its values instead, e.g. ${key}.base or ${key}.points[0][1]`,
    );
  }
  const bare = info.kind === 'length' ? bareLengthUnit(raw) : 'm';
  const parsed = parseQuantity(typeof current === 'number' && bare !== 'm' ? `${current} ${bare}` : current, info.kind);
  if (!parsed.ok) throw new Error(`${key} of a validated case does not parse: ${parsed.problem}`);
  return parsed.value;
}

function unitProblem(kind: QuantityKind, unit: string): string | undefined {
  if (unit === '') return undefined;
  const probe = parseQuantity(`1 ${unit}`, kind);
  return probe.ok ? undefined : probe.problem;
}

/** Parses and checks one axis option against the case (raw object as read, and its validated form: a fin or a heat sink). */
export function parseMapAxis(request: AxisRequest, raw: unknown, c: Case | HeatSinkCase): MapAxis {
  const { option, text } = request;
  const sink = 'array' in c;
  const eq = text.indexOf('=');
  if (eq < 0)
    throw new UsageError(`${option}: got "${text}"; expected KEY=FROM:TO such as ${sink ? 'plate.thickness=3mm:10mm' : 'fin.thickness=1mm:3mm'}`);
  const { path, key } = keyOf(option, text.slice(0, eq).trim());
  const info = sink ? sinkAxisKeyInfo(key) : axisKeyInfo(key);
  if (!info)
    throw new UsageError(
      `${option}: ${key} is not a numeric key of a ${sink ? 'heat-sink case' : 'case'}; map one of ${sink ? mappableSinkKeyExamples : mappableKeyExamples}`,
    );
  const own = caseValueSI(option, key, path, info, raw, c);

  const ends = text.slice(eq + 1).split(':');
  if (ends.length !== 2 || ends.some((e) => e.trim() === '')) {
    throw new UsageError(`${option}: ${key}: got "${text.slice(eq + 1)}"; expected FROM:TO such as 1mm:3mm`);
  }
  const from = splitNumber(option, key, (ends[0] as string).trim());
  const to = splitNumber(option, key, (ends[1] as string).trim());
  // Bare ends of a length axis are in the case's unit for bare lengths (units: { length: mm }), as in the file.
  const caseBare = info.kind === 'length' ? bareLengthUnit(raw) : 'm';
  const unit = from.unit !== '' ? from.unit : to.unit !== '' ? to.unit : caseBare === 'm' ? '' : caseBare;
  const kindName = quantityKinds[info.kind].noun;
  for (const u of new Set([from.unit, to.unit])) {
    const problem = unitProblem(info.kind, u);
    if (problem) throw new UsageError(`${option}: ${key} takes ${kindName}; ${problem}`);
  }
  let toValue = to.value;
  if (to.unit !== '' && to.unit !== unit) {
    const si = parseQuantity(`${to.value} ${to.unit}`, info.kind);
    if (!si.ok) throw new UsageError(`${option}: ${key} takes ${kindName}; ${si.problem}`);
    toValue = fromSI(si.value, info.kind, unit);
  }
  if (from.value === toValue) {
    throw new UsageError(`${option}: ${key}: FROM and TO are the same (${ends[0]?.trim()}); give two different values`);
  }
  const lo = Math.min(from.value, toValue);
  const hi = Math.max(from.value, toValue);
  const substitution = { path, unit };
  for (const end of [lo, hi]) {
    const si = parseQuantity(rawAxisValue(substitution, end), info.kind);
    if (!si.ok) throw new UsageError(`${option}: ${key}: ${si.problem}`);
    if (!info.range.test(si.value)) {
      throw new UsageError(`${option}: ${key} = ${end}${unit ? ` ${unit}` : ''} is outside its range: ${kindName} ${rangeText(info.range)}`);
    }
  }
  if (request.log && !(lo > 0)) {
    throw new UsageError(`${option}: a log axis needs FROM and TO above 0 in the unit given; got ${lo} ${unit}`.trimEnd());
  }
  if (!(Number.isInteger(request.steps) && request.steps >= 2)) {
    throw new RangeError(`parseMapAxis: ${option} needs at least 2 steps; got ${request.steps}`);
  }
  const caseValue = unit === '' ? own : fromSI(own, info.kind, unit);
  let values = axisValues(lo, hi, request.steps, request.log);
  if (info.integer === true) {
    // A count: whole numbers, each once.
    values = Float64Array.from(values, (v) => Math.round(v));
    if (new Set(values).size !== values.length) {
      throw new UsageError(
        `${option}: ${key} is a whole number: ${lo}:${hi} holds ${Math.floor(hi) - Math.ceil(lo) + 1} of them${request.log ? ' (fewer distinct on a log axis)' : ''}, fewer than the ${request.steps} steps asked; give fewer steps or a wider range`,
      );
    }
  }
  return {
    key,
    path,
    kind: info.kind,
    unit,
    displayUnit: unit !== '' ? unit : quantityKinds[info.kind].bareUnit,
    log: request.log,
    values,
    caseValue: Number.isFinite(caseValue) ? caseValue : null,
  };
}
