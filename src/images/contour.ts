/**
 * Iso-lines of a field on a structured grid by marching squares
 * (W. E. Lorensen & H. E. Cline (1987), "Marching cubes", SIGGRAPH '87, in its two-dimensional form).
 *
 * A node is "above" when its value >= level. Each cell (i, j)-(i+1, j+1) gets a 4-bit case from
 * its corners; the iso-line crosses a cell edge where the two end nodes differ, at the point found
 * by linear interpolation of the value along that edge, t = (level - v0) / (v1 - v0), and the point
 * is mapped through the node coordinates by the same t. So the lines follow the grid's true
 * (boundary-fitted) geometry. Saddle cells (two opposite corners above) are resolved by the mean
 * of the four corners: if it is above, the two "above" corners are joined through the cell centre.
 * Cells with a non-finite corner are skipped. Segments are chained into polylines through shared
 * edges; a chain that returns to its start is closed.
 *
 * Node (i, j) is at offset + i * strideI + j * strideJ in the coordinate and value arrays.
 */

import type { GridLayout } from './field-raster.js';

export interface Polyline {
  x: Float64Array;
  y: Float64Array;
  closed: boolean;
}

/** Edges of a cell: 0 bottom (i,j)-(i+1,j), 1 right (i+1,j)-(i+1,j+1), 2 top (i,j+1)-(i+1,j+1), 3 left (i,j)-(i,j+1). */
type CellEdge = 0 | 1 | 2 | 3;

/** Segments (pairs of cell edges) for each case; bit 0 = (i,j), 1 = (i+1,j), 2 = (i+1,j+1), 3 = (i,j+1). */
const segmentTable: readonly (readonly [CellEdge, CellEdge])[][] = [
  [],
  [[3, 0]],
  [[0, 1]],
  [[3, 1]],
  [[1, 2]],
  [], // 5: saddle, resolved below
  [[0, 2]],
  [[3, 2]],
  [[2, 3]],
  [[0, 2]],
  [], // 10: saddle, resolved below
  [[1, 2]],
  [[1, 3]],
  [[0, 1]],
  [[3, 0]],
  [],
];

export function contourLines(layout: GridLayout, xs: ArrayLike<number>, ys: ArrayLike<number>, values: ArrayLike<number>, level: number): Polyline[] {
  const { ni, nj, offset, strideI, strideJ } = layout;
  if (ni < 2 || nj < 2) return [];
  const horizontalCount = nj * (ni - 1);
  // Global id of a cell edge: horizontal edges (i,j)-(i+1,j) first, then vertical edges (i,j)-(i,j+1).
  const edgeId = (i: number, j: number, e: CellEdge): number => {
    switch (e) {
      case 0:
        return j * (ni - 1) + i;
      case 2:
        return (j + 1) * (ni - 1) + i;
      case 3:
        return horizontalCount + j * ni + i;
      case 1:
        return horizontalCount + j * ni + i + 1;
      default: {
        const unreachable: never = e;
        throw new Error(`bad edge ${String(unreachable)}`);
      }
    }
  };
  const pointX = new Map<number, number>();
  const pointY = new Map<number, number>();
  const crossing = (id: number, a: number, b: number): void => {
    if (pointX.has(id)) return;
    const va = values[a] as number;
    const vb = values[b] as number;
    const t = va === vb ? 0.5 : (level - va) / (vb - va);
    pointX.set(id, (xs[a] as number) + t * ((xs[b] as number) - (xs[a] as number)));
    pointY.set(id, (ys[a] as number) + t * ((ys[b] as number) - (ys[a] as number)));
  };

  const segA: number[] = [];
  const segB: number[] = [];
  for (let j = 0; j + 1 < nj; j++) {
    for (let i = 0; i + 1 < ni; i++) {
      const n00 = offset + i * strideI + j * strideJ;
      const n10 = n00 + strideI;
      const n11 = n10 + strideJ;
      const n01 = n00 + strideJ;
      const v00 = values[n00] as number,
        v10 = values[n10] as number;
      const v11 = values[n11] as number,
        v01 = values[n01] as number;
      if (!Number.isFinite(v00) || !Number.isFinite(v10) || !Number.isFinite(v11) || !Number.isFinite(v01)) continue;
      const code = (v00 >= level ? 1 : 0) | (v10 >= level ? 2 : 0) | (v11 >= level ? 4 : 0) | (v01 >= level ? 8 : 0);
      let pairs = segmentTable[code] ?? [];
      if (code === 5 || code === 10) {
        const centreAbove = (v00 + v10 + v11 + v01) / 4 >= level;
        // Case 5: corners (i,j) and (i+1,j+1) above. Joined through the centre -> cut off the two below corners.
        if (code === 5)
          pairs = centreAbove
            ? [
                [0, 1],
                [2, 3],
              ]
            : [
                [3, 0],
                [1, 2],
              ];
        else
          pairs = centreAbove
            ? [
                [3, 0],
                [1, 2],
              ]
            : [
                [0, 1],
                [2, 3],
              ];
      }
      if (pairs.length === 0) continue;
      const ends: readonly (readonly [number, number])[] = [
        [n00, n10],
        [n10, n11],
        [n01, n11],
        [n00, n01],
      ];
      for (const pair of pairs) {
        for (const e of pair) {
          const [a, b] = ends[e] as readonly [number, number];
          crossing(edgeId(i, j, e), a, b);
        }
        segA.push(edgeId(i, j, pair[0]));
        segB.push(edgeId(i, j, pair[1]));
      }
    }
  }
  return chainSegments(segA, segB, pointX, pointY);
}

/** Joins segments that share an edge point into polylines (open chains first, then closed loops). */
function chainSegments(segA: number[], segB: number[], pointX: Map<number, number>, pointY: Map<number, number>): Polyline[] {
  const bySegEnd = new Map<number, number[]>();
  const link = (id: number, s: number): void => {
    const list = bySegEnd.get(id);
    if (list) list.push(s);
    else bySegEnd.set(id, [s]);
  };
  for (let s = 0; s < segA.length; s++) {
    link(segA[s] as number, s);
    link(segB[s] as number, s);
  }
  const used = new Uint8Array(segA.length);
  const lines: Polyline[] = [];

  const walk = (startSeg: number, startPoint: number): Polyline => {
    const ids: number[] = [startPoint];
    let seg = startSeg;
    let at = startPoint;
    for (;;) {
      used[seg] = 1;
      const next = segA[seg] === at ? (segB[seg] as number) : (segA[seg] as number);
      ids.push(next);
      at = next;
      const candidates = bySegEnd.get(at) ?? [];
      const following = candidates.find((c) => used[c] === 0);
      if (following === undefined) break;
      seg = following;
    }
    const closed = ids.length > 2 && ids[0] === ids[ids.length - 1];
    if (closed) ids.pop();
    const x = new Float64Array(ids.map((id) => pointX.get(id) as number));
    const y = new Float64Array(ids.map((id) => pointY.get(id) as number));
    return { x, y, closed };
  };

  // Open chains start at an edge point used by a single segment (the grid's boundary or a skipped cell).
  for (let s = 0; s < segA.length; s++) {
    if (used[s]) continue;
    for (const end of [segA[s] as number, segB[s] as number]) {
      if (used[s]) break;
      if ((bySegEnd.get(end) ?? []).length === 1) lines.push(walk(s, end));
    }
  }
  for (let s = 0; s < segA.length; s++) {
    if (!used[s]) lines.push(walk(s, segA[s] as number));
  }
  return lines;
}

/** Total length of a polyline (closing segment included when closed). */
export function polylineLength(line: Polyline): number {
  let length = 0;
  const n = line.x.length;
  for (let k = 1; k < n; k++) length += Math.hypot((line.x[k] as number) - (line.x[k - 1] as number), (line.y[k] as number) - (line.y[k - 1] as number));
  if (line.closed && n > 1) length += Math.hypot((line.x[0] as number) - (line.x[n - 1] as number), (line.y[0] as number) - (line.y[n - 1] as number));
  return length;
}

/** The point at arclength s along an open polyline (clamped to its ends). */
export function pointAtLength(line: Polyline, s: number): [number, number] {
  const n = line.x.length;
  let walked = 0;
  for (let k = 1; k < n; k++) {
    const x0 = line.x[k - 1] as number,
      y0 = line.y[k - 1] as number;
    const x1 = line.x[k] as number,
      y1 = line.y[k] as number;
    const d = Math.hypot(x1 - x0, y1 - y0);
    if (walked + d >= s && d > 0) {
      const f = Math.max(0, (s - walked) / d);
      return [x0 + f * (x1 - x0), y0 + f * (y1 - y0)];
    }
    walked += d;
  }
  return [line.x[n - 1] as number, line.y[n - 1] as number];
}

export interface LabelAnchor {
  x: number;
  y: number;
  /** Text rotation in degrees (SVG convention, clockwise), kept in (-90, 90] so text never reads upside down. */
  angle: number;
}

/**
 * Where to put a label of `labelWidth` px on a line drawn in screen px: the point at `fraction`
 * of its length, rotated along the chord spanning the label. Returns null when the line is
 * shorter than 1.5 label widths (the label would hide it).
 */
export function placeLineLabel(line: Polyline, labelWidth: number, fraction = 0.5): LabelAnchor | null {
  const length = polylineLength(line);
  if (line.x.length < 2 || length < 1.5 * labelWidth) return null;
  const half = labelWidth / 2;
  const s = Math.min(Math.max(fraction * length, half), length - half);
  const [x, y] = pointAtLength(line, s);
  const [xa, ya] = pointAtLength(line, s - half);
  const [xb, yb] = pointAtLength(line, s + half);
  let angle = (Math.atan2(yb - ya, xb - xa) * 180) / Math.PI;
  if (angle > 90) angle -= 180;
  else if (angle <= -90) angle += 180;
  return { x, y, angle };
}
