/**
 * Grid values of a map axis between two ends, in the user's unit: evenly spaced (linear axis) or in geometric
 * progression (log axis), both ends exact, interior values rounded to 12 significant digits so that the value
 * printed in the CSV, the JSON and substituted into the case is one short number (the rounding, ~1e-12 relative,
 * is far below any grid spacing).
 */

export function axisValues(from: number, to: number, steps: number, log: boolean): Float64Array {
  if (!(steps >= 2) || !Number.isInteger(steps)) throw new RangeError(`axis: steps must be an integer >= 2, got ${steps}`);
  if (!(from < to)) throw new RangeError(`axis: from (${from}) must be below to (${to})`);
  if (log && !(from > 0)) throw new RangeError(`axis: a log axis needs from > 0, got ${from}`);
  const values = new Float64Array(steps);
  const last = steps - 1;
  for (let i = 0; i <= last; i++) {
    const t = i / last;
    const v = log ? from * Math.pow(to / from, t) : from + (to - from) * t;
    values[i] = i === 0 ? from : i === last ? to : Number(v.toPrecision(12));
  }
  return values;
}
