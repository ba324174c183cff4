/**
 * One map point's case: the raw case object (as read from the file) with the two axis values written in by key
 * path, exactly as if the user had typed them into the file (`thickness: 1.5 mm`), so that the point's numbers
 * are those `fincheck check` prints for that file. The object is validated again by the case layer afterwards.
 *
 * A built-in material name (`material: aluminium-6063`) swept over `material.k` becomes `material: { k: value }`
 * (a heat sink's `plate.material` likewise).
 */
import { formatKeyPath, getByKeyPath, setByKeyPath } from '../case/index.js';
import type { AxisSubstitution } from './types.js';

/** The value as it would stand in the case file: the bare number (SI) or "<number> <unit>". */
export function rawAxisValue(axis: AxisSubstitution, value: number): number | string {
  return axis.unit === '' ? value : `${value} ${axis.unit}`;
}

/** A copy of `raw` with `value` (in the axis unit) at the axis key; `raw` is not changed. */
export function substituteAxis(raw: unknown, axis: AxisSubstitution, value: number): unknown {
  const written = rawAxisValue(axis, value);
  const key = formatKeyPath(axis.path);
  if ((key === 'material.k' || key === 'plate.material.k') && typeof getByKeyPath(raw, axis.path.slice(0, -1)) === 'string') {
    return setByKeyPath(raw, axis.path.slice(0, -1), { k: written });
  }
  return setByKeyPath(raw, axis.path, written);
}
