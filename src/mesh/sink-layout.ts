/**
 * Where the fins of a heat sink stand and where its sources sit, as rectangles on the plate (m), from the
 * normalised case (heat-sink-types.ts). Axes: x across the plate (0..width), y along it (0..length).
 *
 * - Plate fins: fin k (0-based, left to right) is centred at x_k = width/2 + (k − (count − 1)/2) pitch and covers
 *   [x_k − t_b/2, x_k + t_b/2] x [0, length], t_b the profile's thickness at the root.
 * - Pins: pin (row r, column c) is centred at x = width/2 + (c − (columns − 1)/2) p_x, y = length/2 + (r − (rows − 1)/2) p_y;
 *   `staggered` shifts the odd rows by +p_x/2 and then the whole group by −p_x/4 so that it stays centred.
 *   A pin's round root is represented on the Cartesian plate grid by the square of the same area (side
 *   D sqrt(pi)/2): the heat it draws enters the plate over that square (a modelling choice, stated in the notes).
 * - Sources: [x_c − c/2, x_c + c/2] x [y_c − d/2, y_c + d/2] on the underside.
 * Fin index order: x first then y (plate fins left to right; pins row by row), as the result type states.
 */
import type { ArrayFinProfile, HeatSinkCase } from '../case/index.js';

export interface Rectangle {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

export interface SinkLayout {
  width: number;
  length: number;
  thickness: number;
  /** 'plates', 'pins' or 'bare' (no fins). */
  finKind: 'plates' | 'pins' | 'bare';
  /** Fin height above the plate, m (0 for a bare plate). */
  finHeight: number;
  fins: Rectangle[];
  sources: Rectangle[];
}

/** Thickness (straight) or diameter (pin) of a profile at its root, m. */
export function rootSize(p: ArrayFinProfile): number {
  switch (p.kind) {
    case 'rectangular':
      return p.thickness;
    case 'pin':
      return p.diameter;
    case 'trapezoidal':
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return p.baseThickness;
    case 'conical-pin':
      return p.baseDiameter;
    case 'tabulated':
      return p.size[0];
    default: {
      const never: never = p;
      throw new Error(`unknown profile ${JSON.stringify(never)}`);
    }
  }
}

/** Whether a profile is a pin (round section) rather than a straight fin. */
export function isPinProfile(p: ArrayFinProfile): boolean {
  return p.kind === 'pin' || p.kind === 'conical-pin' || (p.kind === 'tabulated' && p.shape === 'pin');
}

export function sinkLayout(c: HeatSinkCase): SinkLayout {
  const { width, length, thickness } = c.plate;
  const sources = c.sources.map((s) => ({
    x0: s.centre[0] - s.size[0] / 2,
    x1: s.centre[0] + s.size[0] / 2,
    y0: s.centre[1] - s.size[1] / 2,
    y1: s.centre[1] + s.size[1] / 2,
  }));
  const a = c.array;
  const count = a.kind === 'plates' ? a.count : a.rows * a.columns;
  if (c.fin === null || count === 0) return { width, length, thickness, finKind: 'bare', finHeight: 0, fins: [], sources };
  const profile = c.fin.profile;
  const root = rootSize(profile);
  const fins: Rectangle[] = [];
  if (a.kind === 'plates') {
    for (let k = 0; k < a.count; k++) {
      const xc = width / 2 + (k - (a.count - 1) / 2) * a.pitch;
      fins.push({ x0: xc - root / 2, x1: xc + root / 2, y0: 0, y1: length });
    }
  } else {
    const side = (root * Math.sqrt(Math.PI)) / 2;
    const [px, py] = a.pitch;
    const shift = a.pattern === 'staggered' && a.rows > 1 ? -px / 4 : 0;
    for (let r = 0; r < a.rows; r++) {
      const yc = length / 2 + (r - (a.rows - 1) / 2) * py;
      const rowShift = shift + (a.pattern === 'staggered' && r % 2 === 1 ? px / 2 : 0);
      for (let col = 0; col < a.columns; col++) {
        const xc = width / 2 + (col - (a.columns - 1) / 2) * px + rowShift;
        fins.push({ x0: xc - side / 2, x1: xc + side / 2, y0: yc - side / 2, y1: yc + side / 2 });
      }
    }
  }
  return { width, length, thickness, finKind: a.kind, finHeight: finLength(profile), fins, sources };
}

/** Height of a fin above the plate, m. */
export function finLength(p: ArrayFinProfile): number {
  return p.kind === 'tabulated' ? p.x[p.x.length - 1] : p.length;
}
