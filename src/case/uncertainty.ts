/**
 * The `uncertainty` key of a case: a standard uncertainty (one standard deviation) per input, by key path,
 *   uncertainty: { convection.h: 25 %, material.k: 5 %, fin.thickness: 0.05 mm }
 * relative with `%`, or absolute with the input's unit (a plain number for a dimensionless input such as the
 * emissivity). Each is turned into a relative standard uncertainty of the input's nominal value (the base
 * temperature's of its rise over the fluid). Inputs not named are taken as known exactly, except h: its
 * default is 25 % (DEFAULT_UNCERTAINTY; common practice, no source: correlations for h are commonly quoted
 * within 20-30 %), which `convection.h: 0 %` switches off.
 * The keys a case accepts are its numeric inputs (numeric-inputs.ts).
 */
import type { PendingIssue } from './issues.js';
import { numericInputs, type NumericInput } from './numeric-inputs.js';
import type { Case, InputUncertainty } from './types.js';
import { parseQuantity, quantityKinds, type QuantityKind } from './units.js';

/** Used when a case says nothing about h. */
export const DEFAULT_UNCERTAINTY: readonly InputUncertainty[] = [{ key: 'convection.h', relative: 0.25, given: 'default' }];

/** Relative uncertainties at or above 100 % are refused: a normal spread that wide is mostly below zero. */
const MAX_RELATIVE = 1;

/** An example of an absolute uncertainty of each kind, for messages. */
const ABSOLUTE_EXAMPLE: Record<QuantityKind, string> = {
  length: '0.05 mm',
  conductivity: '10 W/(m*K)',
  heatTransferCoefficient: '5 W/(m^2*K)',
  contactResistance: '1e-5 m^2*K/W',
  temperature: '2 K',
  temperatureDifference: '2 K',
  power: '1 W',
  dimensionless: '0.05',
};

const PERCENT = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*%\s*$/;

/**
 * Reads the raw `uncertainty` mapping of a case against the case's own inputs. Returns the uncertainties
 * (the default h one added unless the case names h) or the issues, each on `uncertainty.<key>`.
 */
export function readUncertainty(
  raw: Readonly<Record<string, string | number>> | undefined,
  c: Case,
): { uncertainty: InputUncertainty[]; issues: PendingIssue[] } {
  return readUncertaintyOf(raw, numericInputs(c));
}

/** readUncertainty against a list of inputs (a heat sink's: sink-numeric-inputs.ts). */
export function readUncertaintyOf<C>(
  raw: Readonly<Record<string, string | number>> | undefined,
  inputs: readonly NumericInput<C>[],
): { uncertainty: InputUncertainty[]; issues: PendingIssue[] } {
  const byKey = new Map(inputs.map((i) => [i.key, i]));
  const issues: PendingIssue[] = [];
  const out: InputUncertainty[] = [];
  for (const [key, value] of Object.entries(raw ?? {})) {
    const path = ['uncertainty', key];
    const input = byKey.get(key);
    if (input === undefined) {
      issues.push({ path, accepted: `an input of this case that the heat rate depends on: ${inputs.map((i) => i.key).join(', ')}` });
      continue;
    }
    const read = relativeOf(value, input);
    if (typeof read === 'string') issues.push({ path, accepted: read });
    else out.push({ key, relative: read, given: String(value) });
  }
  const hasH = inputs.some((i) => i.key === 'convection.h');
  if (hasH && !out.some((u) => u.key === 'convection.h') && !issues.some((i) => i.path[1] === 'convection.h')) out.unshift(...DEFAULT_UNCERTAINTY);
  return { uncertainty: out, issues };
}

/** The relative uncertainty `value` gives `input`, or what is accepted instead. */
function relativeOf<C>(value: string | number, input: NumericInput<C>): number | string {
  const absoluteWords =
    input.kind === 'dimensionless'
      ? 'as a plain number such as 0.05'
      : `with its unit, ${quantityKinds[input.kind].noun} such as "${ABSOLUTE_EXAMPLE[input.kind]}"`;
  const accepted = `a relative standard uncertainty such as "25 %" (0 % up to below 100 %) or an absolute one ${absoluteWords}, at least 0`;
  const percent = typeof value === 'string' ? PERCENT.exec(value) : null;
  if (percent) {
    const r = Number(percent[1]) / 100;
    return r >= 0 && r < MAX_RELATIVE ? r : accepted;
  }
  const bareNumber = typeof value === 'number' || /^\s*[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?\s*$/.test(value);
  if (bareNumber && input.kind !== 'dimensionless') return `${accepted} (a bare number has no unit here: write "%" or the unit)`;
  const parsed = parseQuantity(value, input.kind);
  if (!parsed.ok) return `${accepted} (${parsed.problem})`;
  if (!(parsed.value >= 0)) return accepted;
  if (!Number.isFinite(input.nominal))
    return `a relative standard uncertainty such as "25 %": ${input.key} varies (a table), so an absolute one has no single value to compare with`;
  const r = parsed.value / Math.abs(input.nominal);
  return r < MAX_RELATIVE ? r : `${accepted} and below the nominal value itself (${parsed.value} against ${Math.abs(input.nominal)} in SI units)`;
}
