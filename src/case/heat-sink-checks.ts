/**
 * Checks that relate several keys of a heat-sink case whose keys are each valid (heat-sink-schema.ts has checked
 * every value's own range): the array's form, the fin that suits it, fins that fit the plate, sources on the
 * plate and apart, something that cools, limits above ambient. Each issue names the key to change and what it
 * accepts.
 */
import type { PendingIssue } from './issues.js';
import type { KeyPath } from './key-path.js';
import { pinFinProfiles, plateFinProfiles, type ValidatedHeatSink } from './heat-sink-schema.js';

type SinkFin = NonNullable<ValidatedHeatSink['fin']>;

/** Relative slack on geometric comparisons: far above the round-off of unit conversion (1e-15), far below any real gap. */
const fitSlack = 1e-9;

function mm(value: number): string {
  return `${Number((value * 1000).toPrecision(6))} mm`;
}

/** Whether the fin is a plate fin (straight) or a pin. */
export function sinkFinShape(fin: SinkFin): 'straight' | 'pin' {
  switch (fin.profile) {
    case 'pin':
    case 'conical-pin':
      return 'pin';
    case 'tabulated':
      return fin.shape;
    case 'rectangular':
    case 'trapezoidal':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return 'straight';
    default: {
      const never: never = fin;
      throw new Error(`unknown profile ${String(never)}`);
    }
  }
}

/** Thickness (plate fin) or diameter (pin) at the root, m, and the fin's height, m. */
export function sinkFinRoot(fin: SinkFin): { size: number; height: number } {
  switch (fin.profile) {
    case 'rectangular':
      return { size: fin.thickness, height: fin.length };
    case 'trapezoidal':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return { size: fin.baseThickness, height: fin.length };
    case 'pin':
      return { size: fin.diameter, height: fin.length };
    case 'conical-pin':
      return { size: fin.baseDiameter, height: fin.length };
    case 'tabulated':
      return { size: fin.points[0]?.[1] ?? 0, height: fin.points[fin.points.length - 1]?.[0] ?? 0 };
    default: {
      const never: never = fin;
      throw new Error(`unknown profile ${String(never)}`);
    }
  }
}

/** Whether the array has fins (plate fins with count > 0, or pins). */
export function hasFins(c: ValidatedHeatSink): boolean {
  return c.array.pins !== undefined || (c.array.count ?? 0) > 0;
}

function checkArray(c: ValidatedHeatSink): PendingIssue[] {
  const { count, pitch, pins } = c.array;
  if (count !== undefined && pins !== undefined) {
    return [{ path: ['array', 'pins'], accepted: 'either count (plate fins) or pins (a pin array), not both' }];
  }
  if (count === undefined && pins === undefined) {
    return [{ path: ['array', 'count'], accepted: 'a whole number of plate fins >= 0 such as 12 (0: a bare plate), or pins: { rows, columns, pitch }' }];
  }
  if (pins !== undefined && pitch !== undefined) {
    return [{ path: ['array', 'pitch'], accepted: 'no pitch here: a pin array gives its pitch in pins.pitch' }];
  }
  return [];
}

function checkFinFamily(c: ValidatedHeatSink): PendingIssue[] {
  if (!hasFins(c)) return [];
  const fin = c.fin;
  if (fin === undefined) {
    return [
      {
        path: ['fin'],
        accepted: 'one fin of the array, e.g. { profile: rectangular, length: 35 mm, thickness: 1.6 mm } (only array.count: 0 needs no fin)',
      },
    ];
  }
  const shape = sinkFinShape(fin);
  if (c.array.pins !== undefined && shape !== 'pin') {
    return [{ path: ['fin', 'profile'], accepted: `a pin profile for array.pins: ${pinFinProfiles.join(', ')} (tabulated with shape: pin)` }];
  }
  if (c.array.pins === undefined && shape !== 'straight') {
    return [
      {
        path: ['fin', 'profile'],
        accepted: `a plate-fin profile for array.count: ${plateFinProfiles.join(', ')} (tabulated with shape: straight); pins go in array.pins`,
      },
    ];
  }
  return checkSinkFin(fin);
}

/** The fin's own shape: tapering from root to tip, tables in order. */
function checkSinkFin(fin: SinkFin): PendingIssue[] {
  switch (fin.profile) {
    case 'trapezoidal':
      return fin.tipThickness > fin.baseThickness
        ? [{ path: ['fin', 'tipThickness'], accepted: `a length from 0 to baseThickness (${mm(fin.baseThickness)}): the fin tapers from root to tip` }]
        : [];
    case 'conical-pin':
      return fin.tipDiameter > fin.baseDiameter
        ? [{ path: ['fin', 'tipDiameter'], accepted: `a length from 0 to baseDiameter (${mm(fin.baseDiameter)}): the pin tapers from root to tip` }]
        : [];
    case 'tabulated': {
      const issues = increasing(
        fin.points.map((p) => p[0]),
        ['fin', 'points'],
        true,
      );
      const size = fin.shape === 'straight' ? 'thickness' : 'diameter';
      fin.points.forEach(([, s], i) => {
        if (i < fin.points.length - 1 && s <= 0) {
          issues.push({ path: ['fin', 'points', i, 1], accepted: `a ${size} > 0 (only the tip, the last point, may have ${size} 0)` });
        }
      });
      return issues;
    }
    case 'rectangular':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
    case 'pin':
      return [];
    default: {
      const never: never = fin;
      throw new Error(`unknown profile ${String(never)}`);
    }
  }
}

function increasing(xs: readonly number[], at: KeyPath, fromZero: boolean): PendingIssue[] {
  const issues: PendingIssue[] = [];
  if (fromZero && xs[0] !== 0) issues.push({ path: [...at, 0, 0], accepted: 'x = 0: the first point is the root' });
  for (let i = 1; i < xs.length; i++) {
    if (!((xs[i] ?? NaN) > (xs[i - 1] ?? -Infinity)))
      issues.push({ path: [...at, i, 0], accepted: "x greater than the previous point's (strictly increasing)" });
  }
  return issues;
}

/** Fins fit the plate and do not touch: count x pitch <= width (pins: columns and rows likewise), root size < pitch. */
function checkFit(c: ValidatedHeatSink): PendingIssue[] {
  if (!hasFins(c) || c.fin === undefined) return [];
  const { width, length } = c.plate;
  const root = sinkFinRoot(c.fin).size;
  const pins = c.array.pins;
  if (pins === undefined) {
    const count = c.array.count ?? 0;
    const pitch = c.array.pitch ?? width / count;
    const issues: PendingIssue[] = [];
    if (count * pitch > width * (1 + fitSlack)) {
      issues.push({
        path: ['array', c.array.pitch === undefined ? 'count' : 'pitch'],
        accepted: `fins that fit the plate: count x pitch (${count} x ${mm(pitch)} = ${mm(count * pitch)}) at most plate.width (${mm(width)})`,
      });
    }
    if (root >= pitch * (1 - fitSlack)) {
      issues.push({
        path: ['array', c.array.pitch === undefined ? 'count' : 'pitch'],
        accepted: `a pitch (${mm(pitch)}) greater than the fin's root thickness (${mm(root)}): fins would touch`,
      });
    }
    return issues;
  }
  const [px, py] = pins.pitch;
  const staggered = (pins.pattern ?? 'inline') === 'staggered' && pins.rows > 1;
  const spanX = (pins.columns + (staggered ? 0.5 : 0)) * px;
  const issues: PendingIssue[] = [];
  if (spanX > width * (1 + fitSlack)) {
    issues.push({
      path: ['array', 'pins', 'columns'],
      accepted: `pins that fit the plate: columns x x pitch${staggered ? ' (+ half a pitch, staggered)' : ''} = ${mm(spanX)} at most plate.width (${mm(width)})`,
    });
  }
  if (pins.rows * py > length * (1 + fitSlack)) {
    issues.push({
      path: ['array', 'pins', 'rows'],
      accepted: `pins that fit the plate: rows x y pitch = ${mm(pins.rows * py)} at most plate.length (${mm(length)})`,
    });
  }
  const nearest = staggered ? Math.min(px, Math.hypot(px / 2, py)) : Math.min(px, py);
  if (root >= nearest * (1 - fitSlack)) {
    issues.push({
      path: ['array', 'pins', 'pitch'],
      accepted: `pitches whose nearest pin spacing (${mm(nearest)}) exceeds the pin's root diameter (${mm(root)}): pins would touch`,
    });
  }
  return issues;
}

function checkMaterial(c: ValidatedHeatSink): PendingIssue[] {
  if (c.material !== undefined) return [];
  if (hasFins(c))
    return [
      {
        path: ['material'],
        accepted: 'the fins\u2019 material: a built-in name or { k: 205 W/(m*K) } (also the plate\u2019s unless plate.material is given)',
      },
    ];
  if (c.plate.material === undefined)
    return [{ path: ['material'], accepted: 'the plate\u2019s material (material or plate.material): a built-in name or { k: 205 W/(m*K) }' }];
  return [];
}

/** Sources on the plate, apart from each other, with some power, and limits above ambient. */
function checkSources(c: ValidatedHeatSink): PendingIssue[] {
  const issues: PendingIssue[] = [];
  const { width, length } = c.plate;
  const boxes = c.sources.map((s) => ({
    x0: s.centre[0] - s.size[0] / 2,
    x1: s.centre[0] + s.size[0] / 2,
    y0: s.centre[1] - s.size[1] / 2,
    y1: s.centre[1] + s.size[1] / 2,
  }));
  const slackX = width * fitSlack;
  const slackY = length * fitSlack;
  boxes.forEach((b, i) => {
    const s = c.sources[i];
    if (s === undefined) return;
    if (b.x0 < -slackX || b.x1 > width + slackX || b.y0 < -slackY || b.y1 > length + slackY) {
      issues.push({
        path: ['sources', i, 'centre'],
        accepted: `a source lying on the plate: its footprint x ${mm(b.x0)} to ${mm(b.x1)}, y ${mm(b.y0)} to ${mm(b.y1)} must be within x 0 to ${mm(width)} (plate.width), y 0 to ${mm(length)} (plate.length)`,
      });
    }
    for (let j = 0; j < i; j++) {
      const o = boxes[j];
      if (o === undefined) continue;
      const ox = Math.min(b.x1, o.x1) - Math.max(b.x0, o.x0);
      const oy = Math.min(b.y1, o.y1) - Math.max(b.y0, o.y0);
      if (ox > slackX && oy > slackY) {
        issues.push({
          path: ['sources', i, 'centre'],
          accepted: `a source apart from the others: sources[${i}] overlaps sources[${j}] by ${mm(ox)} x ${mm(oy)}`,
        });
      }
    }
    if (s.limit !== undefined && s.limit <= c.convection.ambient) {
      issues.push({
        path: ['sources', i, 'limit'],
        accepted: `a temperature above convection.ambient (${Number(c.convection.ambient.toPrecision(6))} degC): a heated source is always hotter than ambient`,
      });
    }
  });
  if (c.sources.every((s) => s.power === 0)) issues.push({ path: ['sources'], accepted: 'sources with some power: at least one source > 0 W' });
  return issues;
}

/** h where the fins need it, table positions within the fin, something that cools, an infinite tip only on uniform fins. */
function checkConvection(c: ValidatedHeatSink): PendingIssue[] {
  const issues: PendingIssue[] = [];
  const { h, tip, plate, underside } = c.convection;
  const fins = hasFins(c) && c.fin !== undefined;
  if (h === undefined) {
    if (hasFins(c)) issues.push({ path: ['convection', 'h'], accepted: 'the h on the fins, e.g. "45 W/(m^2*K)" (every form of a single-fin case)' });
    else if (plate === undefined)
      issues.push({
        path: ['convection', 'plate'],
        accepted: 'the h on the plate\u2019s top, e.g. "30 W/(m^2*K)" (a bare plate: convection.plate or convection.h)',
      });
    if (issues.length > 0) return issues;
  }
  if (h !== undefined && typeof h === 'object' && 'points' in h && c.fin !== undefined) {
    const height = sinkFinRoot(c.fin).height;
    issues.push(
      ...increasing(
        h.points.map((p) => p[0]),
        ['convection', 'h', 'points'],
        false,
      ),
    );
    h.points.forEach(([x], i) => {
      if (x > height * (1 + 1e-12))
        issues.push({ path: ['convection', 'h', 'points', i, 0], accepted: `a position from 0 to the fin's height (${mm(height)})` });
    });
  }
  const finCools =
    fins &&
    h !== undefined &&
    (typeof h === 'number' ? h > 0 : 'points' in h ? h.points.some(([, v]) => v > 0) : 'law' in h ? true : h.base > 0 || h.tip > 0);
  const plateH = plate ?? (h === undefined ? 0 : rootH(h));
  const undersideCools = typeof underside === 'number' && underside > 0;
  if (!finCools && plateH <= 0 && !undersideCools) {
    issues.push({
      path: ['convection', fins ? 'h' : 'plate'],
      accepted: 'h > 0 somewhere (fins, plate or underside): with no heat leaving the sink nothing cools the sources',
    });
  }
  if (tip === 'infinite' && fins && c.fin !== undefined && c.fin.profile !== 'rectangular' && c.fin.profile !== 'pin') {
    issues.push({
      path: ['convection', 'tip'],
      accepted: `adiabatic, convective or { convective: h }: an infinite tip needs a uniform profile (rectangular or pin), not ${c.fin.profile}`,
    });
  }
  if (typeof tip === 'object' && 'temperature' in tip) {
    issues.push({
      path: ['convection', 'tip'],
      accepted: 'adiabatic, convective, infinite or { convective: h }: the tips of a heat sink are cooled, not held at a temperature',
    });
  }
  return issues;
}

/** The h at the fin root (x = 0) of any h form, W/(m^2*K): the default of convection.plate. */
export function rootH(h: NonNullable<ValidatedHeatSink['convection']['h']>): number {
  if (typeof h === 'number') return h;
  if ('points' in h) {
    const [first] = h.points;
    return first?.[1] ?? 0;
  }
  return h.base;
}

/** All cross-key checks of a heat-sink case that passed the schema. */
export function checkHeatSink(c: ValidatedHeatSink): PendingIssue[] {
  const arrayIssues = checkArray(c);
  if (arrayIssues.length > 0) return [...arrayIssues, ...checkMaterial(c), ...checkSources(c)];
  return [...checkFinFamily(c), ...checkFit(c), ...checkMaterial(c), ...checkSources(c), ...checkConvection(c)];
}
