/**
 * Warnings for dimensions that are valid but implausible for a fin, most often a bare number meant in mm and
 * read in m (`length: 40` is a 40 m fin). They never refuse a case (fields.ts has the hard bounds); they are data
 * on the parsed case (`Case.warnings`) that every command shows.
 *
 * Thresholds (common practice, no source): fins of heat sinks, engines and heat exchangers are millimetres to tens
 * of centimetres long and at most a few centimetres thick; a fin longer or wider than 1 m, or thicker than 0.1 m,
 * is rare enough to ask about.
 */
import { getByKeyPath, formatKeyPath, type KeyPath } from './key-path.js';
import { clip } from './clip-text.js';
import type { CaseWarning } from './types.js';

/** Longest plausible extent of a fin (length, width, radius, position along it), m. */
export const plausibleExtent = 1;
/** Largest plausible thickness or diameter of a fin, m. */
export const plausibleSection = 0.1;

const extentKeys = new Set(['length', 'width', 'innerRadius', 'outerRadius']);
const sectionKeys = new Set(['thickness', 'baseThickness', 'tipThickness', 'diameter', 'baseDiameter', 'tipDiameter']);

/** The plausible maximum of the length at `path` (a fin key or a table entry), or undefined when not a fin dimension. */
function plausibleMaximum(path: KeyPath): number | undefined {
  const last = path[path.length - 1];
  if (path[0] === 'fin' && path.length === 2 && typeof last === 'string') {
    if (extentKeys.has(last)) return plausibleExtent;
    if (sectionKeys.has(last)) return plausibleSection;
  }
  if (path[0] === 'fin' && path[1] === 'points' && path.length === 4) return last === 0 ? plausibleExtent : plausibleSection;
  return undefined;
}

function metres(value: number): string {
  return `${Number(value.toPrecision(6))} m`;
}

/**
 * A warning when the length `valueSI` (m) at `path` is implausible for a fin. `given` is the value as written;
 * `bareUnitChosen` says whether the case set `units: { length: ... }` (then a bare number was meant as it is read).
 */
export function dimensionWarning(path: KeyPath, valueSI: number, given: unknown, bareUnitChosen: boolean): CaseWarning | undefined {
  const maximum = plausibleMaximum(path);
  if (maximum === undefined || !(valueSI > maximum)) return undefined;
  const what = maximum === plausibleExtent ? 'longer than 1 m' : 'thicker than 0.1 m';
  const value = typeof given === 'number' ? String(given) : clip(String(given));
  const hint =
    typeof given === 'number' && !bareUnitChosen
      ? `: a bare number is in metres; did you mean ${given} mm? (write "${given} mm", or set units: { length: mm })`
      : '; check the unit';
  return { path: formatKeyPath(path), value, message: `${value} is ${metres(valueSI)}, ${what}, unusual for a fin${hint}` };
}

/** Warnings for every fin dimension of a validated case (`fin` holds SI values; `raw` the values as written). */
export function dimensionWarnings(fin: Record<string, unknown>, raw: unknown, bareUnitChosen: boolean): CaseWarning[] {
  const warnings: CaseWarning[] = [];
  for (const [key, value] of Object.entries(fin)) {
    if (typeof value === 'number') {
      const w = dimensionWarning(['fin', key], value, getByKeyPath(raw, ['fin', key]), bareUnitChosen);
      if (w) warnings.push(w);
    } else if (key === 'points' && Array.isArray(value)) {
      // One warning per column of the table (the first offending point), with the count of the others.
      for (const column of [0, 1]) {
        const offending = value.flatMap((point: unknown, i) => {
          const v = Array.isArray(point) ? (point[column] as unknown) : undefined;
          if (typeof v !== 'number') return [];
          const w = dimensionWarning(['fin', 'points', i, column], v, getByKeyPath(raw, ['fin', 'points', i, column]), bareUnitChosen);
          return w ? [w] : [];
        });
        const first = offending[0];
        if (first === undefined) continue;
        const more = offending.length - 1;
        warnings.push(more > 0 ? { ...first, message: `${first.message} (and ${more} more points like it)` } : first);
      }
    }
  }
  return warnings;
}
