/**
 * Temperature, heat flow and heat loss along a solved 2-D fin (the finest grid of a study, both halves,
 * side edges insulated): the temperature on the mid-plane (pins: the axis) and on the cooled face.
 *
 * Face loss of the segment between face nodes a and b: q(θ) ds times the depth (planar: 2 w; pins:
 * 2 π r_face; annular: 2 x 2 π r), with θ and the position part of h at the segment's middle and ds the
 * chord (sloped faces at their true length); q is the face law the solver uses (problem/surface-law.ts,
 * faceFlux), W/m^2: q(θ) = h_x |θ/θ_b|^n θ + ε σ (T^4 - T_s^4), which is h θ for a linear fin. q' = the
 * segment loss / dx at the segment's middle (trapezoidal rule, second order, like the solver's lumped face
 * losses); Q(x) = the solver's tip heat rate + the segment losses beyond x, scaled so that they sum to the
 * solver's face heat rate (a factor 1 + O(h^2)). Q(x) comes from the losses, not from k(T) grad T, so a conductivity
 * over temperature needs no extra step: the solver's temperatures already carry it (Kirchhoff transform,
 * two-d/newton-setup.ts). Positions from the base (annular fins: r - r1), m.
 */
import type { AlongFin } from '../study/along-fin.js';
import { hAt } from '../problem/convection.js';
import type { FinProblem } from '../problem/fin-problem.js';
import { faceFlux, faceLaw } from '../problem/surface-law.js';
import type { Fin2DResult } from './linear-solve.js';

export function alongFin2D(problem: FinProblem, r: Fin2DResult): AlongFin {
  const baseX = r.grid.baseX;
  const shift = (a: Float64Array): Float64Array => a.map((v) => v - baseX);
  const face = r.surface;
  const n = face.x_m.length;
  const L = (face.x_m[n - 1] as number) - baseX;
  const law = faceLaw(problem);
  const flux = (x: number, theta: number): number => faceFlux(law, hAt(problem.h, x, L), theta);
  const lossX = new Float64Array(n - 1);
  const loss = new Float64Array(n - 1);
  const flow = new Float64Array(n);
  const segments = new Float64Array(n - 1);
  for (let i = 0; i + 1 < n; i++) {
    const xa = face.x_m[i] as number;
    const xb = face.x_m[i + 1] as number;
    const ya = face.y_m[i] as number;
    const yb = face.y_m[i + 1] as number;
    const xm = 0.5 * (xa + xb);
    const theta = 0.5 * ((face.T_degC[i] as number) + (face.T_degC[i + 1] as number)) - r.ambient_degC;
    const perDepth = r.grid.section === 'planar' ? 1 : r.grid.section === 'pin' ? 0.5 * (ya + yb) : xm;
    const segment = flux(xm - baseX, theta) * r.grid.depth * perDepth * Math.hypot(xb - xa, yb - ya);
    lossX[i] = xm - baseX;
    loss[i] = segment / (xb - xa);
    segments[i] = segment;
  }
  // Q(x) = tip loss + face losses beyond x, summed from the tip: the solver's own tip and face heat rates
  // fix the ends (an adiabatic tip passes exactly 0, and Q(0) is the face plus tip loss, the base heat rate
  // to the energy balance). Summing down from the base instead left the quadrature's O(h^2) mismatch at the
  // tip, a stray negative Q (-4e-4 W on a 118 W annular fin) that pulled the chart's axis below zero.
  let quadrature = 0;
  for (const s of segments) quadrature += s;
  const toSolverFaceLoss = quadrature !== 0 ? r.faceHeatRate_W / quadrature : 1;
  flow[n - 1] = r.tipHeatRate_W;
  for (let i = n - 2; i >= 0; i--) flow[i] = (flow[i + 1] as number) + (segments[i] as number) * toSolverFaceLoss;
  return {
    temperature: { x_m: shift(r.centreline.x_m), values: r.centreline.T_degC },
    faceTemperature: { x_m: shift(face.x_m), values: face.T_degC },
    loss: { x_m: lossX, values: loss },
    flow: { x_m: shift(face.x_m), values: flow },
  };
}
