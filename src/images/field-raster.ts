/**
 * Fills the pixels covered by a structured (boundary-fitted) grid with the colour of the field.
 *
 * Each grid cell (i, j)-(i+1, j+1) is split into two triangles along the diagonal (i, j)-(i+1, j+1);
 * inside a triangle the value is interpolated linearly (barycentric weights) from its three nodes,
 * then mapped to a colour through a lookup table. A pixel is filled when its centre lies inside
 * a triangle (edges included, so neighbouring triangles leave no gaps). Pixels outside every
 * cell stay transparent, so the fin's true outline shows. Cells with a non-finite node value are
 * skipped (left transparent).
 *
 * Coordinates: node positions `px`, `py` are already in image pixels (x right, y down), with the
 * same indexing as the values: node (i, j) at offset + i * strideI + j * strideJ.
 */

import { createRgbaImage, type RgbaImage } from './raster.js';

export interface GridLayout {
  ni: number;
  nj: number;
  offset: number;
  strideI: number;
  strideJ: number;
}

export interface ColourLookup {
  /** 8-bit r, g, b triples; the first maps to `low`, the last to `high`. */
  lut: Uint8Array;
  low: number;
  high: number;
}

export function rasterizeStructuredField(
  layout: GridLayout,
  px: Float64Array,
  py: Float64Array,
  values: ArrayLike<number>,
  width: number,
  height: number,
  colours: ColourLookup,
): RgbaImage {
  const image = createRgbaImage(width, height);
  const { ni, nj, offset, strideI, strideJ } = layout;
  const lutSize = colours.lut.length / 3;
  const span = colours.high - colours.low;
  const scale = span > 0 ? (lutSize - 1) / span : 0;
  const data = image.data;
  const lut = colours.lut;

  const fillTriangle = (a: number, b: number, c: number): void => {
    const ax = px[a] as number,
      ay = py[a] as number;
    const bx = px[b] as number,
      by = py[b] as number;
    const cx = px[c] as number,
      cy = py[c] as number;
    const va = values[a] as number,
      vb = values[b] as number,
      vc = values[c] as number;
    const area = (bx - ax) * (cy - ay) - (cx - ax) * (by - ay);
    if (area === 0 || !Number.isFinite(area)) return;
    // Pixel centres sit at (x + 0.5, y + 0.5).
    const x0 = Math.max(0, Math.floor(Math.min(ax, bx, cx) - 0.5));
    const x1 = Math.min(width - 1, Math.ceil(Math.max(ax, bx, cx) - 0.5));
    const y0 = Math.max(0, Math.floor(Math.min(ay, by, cy) - 0.5));
    const y1 = Math.min(height - 1, Math.ceil(Math.max(ay, by, cy) - 0.5));
    const inv = 1 / area;
    // Edge tolerance in barycentric units: a pixel centre exactly on a shared edge is filled by both triangles.
    const tol = -1e-9;
    // Per row, the weights are affine in the pixel centre's x: w = alpha + beta (sx - ax), from coordinates relative
    // to vertex a (no cancellation of large coordinates). Only the pixels where each such w >= -1e-6 (a margin far
    // above the ~1e-12 by which the affine form and the test below can differ, and above the tolerance) are tested,
    // one more on each side for the rounding of the bounds; the test below alone decides, so the same pixels are
    // filled as by testing the whole bounding box, in about half the work.
    const margin = 1e-6;
    const bxr = bx - ax,
      byr = by - ay,
      cxr = cx - ax,
      cyr = cy - ay;
    const betaA = (byr - cyr) * inv;
    const betaB = cyr * inv;
    const betaC = -betaA - betaB;
    for (let y = y0; y <= y1; y++) {
      const sy = y + 0.5;
      const syr = sy - ay;
      const alphaA = (bxr * (cyr - syr) - cxr * (byr - syr)) * inv;
      const alphaB = -cxr * syr * inv;
      const alphaC = 1 - alphaA - alphaB;
      let from = x0;
      let to = x1;
      // Non-finite weights (a triangle of subnormal area) leave the whole row to the test.
      if (Number.isFinite(alphaA + alphaB + alphaC + betaA + betaB + betaC)) {
        let lo = -Infinity;
        let hi = Infinity;
        if (betaA > 0) lo = Math.max(lo, (-margin - alphaA) / betaA);
        else if (betaA < 0) hi = Math.min(hi, (-margin - alphaA) / betaA);
        else if (alphaA < -margin) continue;
        if (betaB > 0) lo = Math.max(lo, (-margin - alphaB) / betaB);
        else if (betaB < 0) hi = Math.min(hi, (-margin - alphaB) / betaB);
        else if (alphaB < -margin) continue;
        if (betaC > 0) lo = Math.max(lo, (-margin - alphaC) / betaC);
        else if (betaC < 0) hi = Math.min(hi, (-margin - alphaC) / betaC);
        else if (alphaC < -margin) continue;
        if (lo > hi) continue;
        from = Math.max(x0, Math.ceil(ax + lo - 0.5) - 1);
        to = Math.min(x1, Math.floor(ax + hi - 0.5) + 1);
      }
      for (let x = from; x <= to; x++) {
        const sx = x + 0.5;
        const wa = ((bx - sx) * (cy - sy) - (cx - sx) * (by - sy)) * inv;
        const wb = ((cx - sx) * (ay - sy) - (ax - sx) * (cy - sy)) * inv;
        const wc = 1 - wa - wb;
        if (wa < tol || wb < tol || wc < tol) continue;
        const v = wa * va + wb * vb + wc * vc;
        let k = Math.round((v - colours.low) * scale);
        if (k < 0) k = 0;
        else if (k >= lutSize) k = lutSize - 1;
        const o = 4 * (y * width + x);
        data[o] = lut[3 * k] as number;
        data[o + 1] = lut[3 * k + 1] as number;
        data[o + 2] = lut[3 * k + 2] as number;
        data[o + 3] = 255;
      }
    }
  };

  for (let j = 0; j + 1 < nj; j++) {
    for (let i = 0; i + 1 < ni; i++) {
      const n00 = offset + i * strideI + j * strideJ;
      const n10 = n00 + strideI;
      const n01 = n00 + strideJ;
      const n11 = n10 + strideJ;
      // A cell with any non-finite node is left out whole (as the contour lines leave it out).
      if (!Number.isFinite(values[n00] as number) || !Number.isFinite(values[n10] as number)) continue;
      if (!Number.isFinite(values[n01] as number) || !Number.isFinite(values[n11] as number)) continue;
      fillTriangle(n00, n10, n11);
      fillTriangle(n00, n11, n01);
    }
  }
  return image;
}
