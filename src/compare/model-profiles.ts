/**
 * Temperature, heat flow and heat loss along the fin for every model of a check: the 1-D reference
 * (fd-1d) and each shortcut on the equivalent uniform fin (equivalent.ts), for plots and reports.
 *
 * Shortcuts (theta = T - T_inf, K; x from the base, m; Incropera, DeWitt, Bergman & Lavine,
 * Fundamentals of Heat and Mass Transfer, 6th ed., Table 3.4 [from memory]):
 *   tanh-L         uniform fin A, P, h, length L, adiabatic tip
 *   tanh-Lc        uniform fin A, P, h, length Lc = L + A/P, adiabatic tip, drawn over 0 <= x <= L
 *   tanh-Lc-thin   uniform fin A, P = 2w (pins pi D), Lc = L + t/2 (pins L + D/4), adiabatic tip
 *   convective-tip uniform fin A, P, h, length L, tip coefficient h_tip
 *   closed-form    uniform fin with the case's own tip (rectangular fins and pins); the Bessel-function
 *                  forms of tapered and annular fins give the heat rate only, so no profile is drawn
 * Base: a contact resistance R (K/W over the base) sits in series, so the fin's base excess is
 * theta0 = theta_b - Q R with the model's own heat rate Q (the number in the check table).
 * Heat flow along the fin Q(x) = -k A dtheta/dx, W: for a uniform fin, the heat rate of the part of the
 * fin beyond x, a uniform fin of length L - x with base excess theta(x) and the same tip (exact).
 * Heat lost per unit length q'(x) = h P theta(x), W/m (annular fins: per metre of radius).
 *
 * fd-1d (refinement study's finest grid): theta at the nodes; Q at the base (the solver's base heat
 * rate), at each interface i+1/2 as K_i (theta_i - theta_{i+1}) with K_i = k A_{i+1/2}/dx_i (the
 * conservative scheme's own flux, Patankar 1980, ch. 4 [from memory]) and at the tip (surface heat
 * minus the face losses); q' = h(x) P(x) theta(x) at the nodes.
 *
 * Nonlinear fins (power-law h, radiation, k over temperature): fd-1d is the Newton solution; Q at the
 * interfaces uses k at the interface's mean temperature, and q' is the drop of Q across each control
 * volume over its length (the scheme's balance). The shortcuts are drawn as a hand calculation makes
 * them, with h and k at the base temperature (linear-surrogate.ts); the table also has the fin-averaged
 * guess.
 *
 * fd-2d (finest grid of its study, both halves, side edges insulated): temperature on the mid-plane
 * (pins: the axis) and on the cooled face. Face loss of the segment between face nodes a and b:
 * q(theta) ds times the depth (planar: 2 w; pins: 2 pi r_face; annular: 2 x 2 pi r), with theta and the
 * position part of h at the segment's middle and ds the chord (sloped faces at their true length); q is
 * the face law the solver uses (nonlinear-losses.ts, faceFlux), W/m^2:
 *   q(theta) = h_x |theta/theta_b|^n theta + eps sigma (T^4 - T_s^4),
 * which is h theta for a linear fin (n = 0, eps = 0). q' = the segment loss / dx at the segment's
 * middle, Q(x) = Q_base - the sum of the segment losses up to x (trapezoidal rule, second order, like the
 * solver's lumped face losses). At the tip Q(L) matches the solver's tip heat rate to that order. Q(x)
 * comes from the losses, not from k(T) grad T, so a conductivity over temperature needs no extra step:
 * the solver's temperatures already carry it (Kirchhoff transform, nonlinear2d-setup.ts).
 */
import { uniformFin, uniformFinExcess, type UniformFinInput, type UniformTip } from '../analytic/uniform-fin.js';
import { hAt, hAtNodes } from '../fd/problem/convection.js';
import { convectiveConductance, interfaceConductance } from '../fd/one-d/conductance.js';
import type { Fin1DStudy } from '../fd/one-d/linear-solve.js';
import type { Fin2DStudy } from '../fd/two-d/linear-study.js';
import { isLinearFinCase, type LinearFinCase } from '../fd/problem/linear-case.js';
import type { Case } from '../case/types.js';
import { faceFlux, faceLaw } from '../fd/problem/surface-law.js';
import { finProblem } from '../fd/problem/fin-problem.js';
import { conductivityAt, linearSurrogate } from './linear-surrogate.js';
import { finGeometry } from '../mesh/geometry1d.js';
import { equivalentUniformFin, type EquivalentUniformFin } from './equivalent.js';
import type { CheckReport, ModelId, ShortcutId } from './types.js';

/** A quantity along the fin: positions in m from the base (annular fins: r - r1) and values. */
export interface AlongFin {
  x_m: Float64Array;
  values: Float64Array;
}

export interface ModelProfile {
  model: ModelId;
  /** Temperature, degC: the 1-D models' section temperature; fd-2d's mid-plane (pins: axis). */
  temperature: AlongFin;
  /** fd-2d only: the temperature of the cooled face, degC. */
  faceTemperature: AlongFin | null;
  /** Heat lost per unit length of fin (annular: of radius), W/m. */
  loss: AlongFin;
  /** Heat flowing along the fin toward the tip, W. */
  flow: AlongFin;
  /** Temperature at the tip (fd-2d: the tip's centre), degC. */
  tipTemperature_degC: number;
  /** Heat entering at the base, W, as this line was drawn (fd-2d: the section, side edges insulated). */
  heatRate_W: number;
  /** How the line was made, in one line. */
  basis: string;
}

export interface OmittedProfile {
  model: ShortcutId;
  reason: string;
}

export interface ModelProfiles {
  /** fd-2d (when solved), fd-1d, then the shortcuts in the order of the check table. */
  profiles: ModelProfile[];
  /** Shortcuts of the table without a profile, and why. */
  omitted: OmittedProfile[];
  /** Fin length L, m (annular: r2 - r1). */
  length_m: number;
  /** x of the base in the plotted coordinate: 0, or r1 for annular fins (plots show the radius). */
  baseX_m: number;
  /** A remark on how the lines were drawn (nonlinear fins), or null. */
  note: string | null;
}

/** Points at which the shortcut profiles are evaluated (smooth closed forms: 241 points draw them exactly). */
export const SHORTCUT_POINTS = 241;

/** Uniform-fin parameters of one shortcut, or why it has no profile. */
type ShortcutFin = { ok: true; P: number; length: number; tip: UniformTip } | { ok: false; reason: string };

function shortcutFin(model: ShortcutId, c: LinearFinCase, eq: EquivalentUniformFin): ShortcutFin {
  const adiabatic: UniformTip = { kind: 'adiabatic' };
  switch (model) {
    case 'tanh-L':
      return { ok: true, P: eq.P, length: eq.length, tip: adiabatic };
    case 'tanh-Lc':
      return { ok: true, P: eq.P, length: eq.length + eq.A / eq.P, tip: adiabatic };
    case 'tanh-Lc-thin':
      return { ok: true, P: eq.Pthin, length: eq.length + (eq.family === 'pin' ? eq.size / 4 : eq.size / 2), tip: adiabatic };
    case 'convective-tip':
      return { ok: true, P: eq.P, length: eq.length, tip: { kind: 'convective', hTip: eq.hTip } };
    case 'closed-form': {
      const p = c.fin.profile.kind;
      if (p !== 'rectangular' && p !== 'pin') {
        return { ok: false, reason: `the ${p} closed form gives the heat rate only; no temperature profile is computed from it` };
      }
      return { ok: true, P: eq.P, length: eq.length, tip: caseTip(c, eq) };
    }
    default: {
      const never: never = model;
      throw new Error(`shortcutFin: unknown model ${String(never)}`);
    }
  }
}

function caseTip(c: LinearFinCase, eq: EquivalentUniformFin): UniformTip {
  const tip = c.convection.tip;
  switch (tip.kind) {
    case 'convective':
      return { kind: 'convective', hTip: eq.hTip };
    case 'adiabatic':
      return { kind: 'adiabatic' };
    case 'temperature':
      return { kind: 'temperature', thetaTip: tip.T_degC - c.convection.ambient_degC };
    case 'infinite':
      return { kind: 'infinite' };
    default: {
      const never: never = tip;
      throw new Error(`caseTip: unknown tip ${JSON.stringify(never)}`);
    }
  }
}

/** Heat flowing along a uniform fin at x (W), the conduction -k A theta'(x), from its excess theta(x). */
function uniformFlow(input: UniformFinInput, x: number, thetaX: number): number {
  const { tip, L } = input;
  if (tip.kind === 'infinite') return uniformFin({ ...input, thetaBase: thetaX }).heatRate;
  const rest = Math.max(0, L - x);
  if (tip.kind === 'temperature') {
    if (rest > 0) return uniformFin({ ...input, L: rest, thetaBase: thetaX }).heatRate;
    // At the tip itself: -k A theta'(L) = k A m [theta_b / sinh(mL) - theta_L coth(mL)], written with exp(-mL).
    const m = Math.sqrt((input.h * input.P) / (input.k * input.A));
    const e = Math.exp(-2 * m * L);
    return input.k * input.A * m * ((input.thetaBase * 2 * Math.exp(-m * L)) / (1 - e) - (tip.thetaTip * (1 + e)) / (1 - e));
  }
  return uniformFin({ ...input, L: rest, thetaBase: thetaX }).heatRate;
}

function shortcutProfile(
  model: ShortcutId,
  fin: Extract<ShortcutFin, { ok: true }>,
  eq: EquivalentUniformFin,
  heatRate_W: number,
  basis: string,
  ambient_degC: number,
): ModelProfile {
  // Without a contact resistance the base sits at theta_b whatever the table says.
  const theta0 = eq.contactResistance > 0 ? eq.thetaBase - heatRate_W * eq.contactResistance : eq.thetaBase;
  const input: UniformFinInput = { h: eq.h, k: eq.k, P: fin.P, A: eq.A, L: fin.length, thetaBase: theta0, tip: fin.tip };
  const n = SHORTCUT_POINTS;
  const x = new Float64Array(n);
  const T = new Float64Array(n);
  const loss = new Float64Array(n);
  const flow = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    // The plotted range is the actual fin, 0..L, also for models drawn on a corrected length Lc > L.
    const xi = i === n - 1 ? eq.length : (eq.length * i) / (n - 1);
    const theta = uniformFinExcess(input, xi);
    x[i] = xi;
    T[i] = theta + ambient_degC;
    loss[i] = eq.h * fin.P * theta;
    flow[i] = uniformFlow(input, xi, theta);
  }
  return {
    model,
    temperature: { x_m: x, values: T },
    faceTemperature: null,
    loss: { x_m: x, values: loss },
    flow: { x_m: x, values: flow },
    tipTemperature_degC: T[n - 1] as number,
    heatRate_W: flow[0] as number,
    basis,
  };
}

function oneDProfile(c: LinearFinCase, oneD: Fin1DStudy): ModelProfile {
  const r = oneD.result;
  const mesh = r.mesh;
  const n = mesh.nodes;
  const geometry = finGeometry(c);
  const k = c.material.k.k;
  const hNodes = hAtNodes(c.convection.h, mesh.x, mesh.length);
  const T = new Float64Array(n);
  const loss = new Float64Array(n);
  let faceLoss = 0;
  for (let i = 0; i < n; i++) {
    const theta = r.theta[i] as number;
    T[i] = theta + c.convection.ambient_degC;
    loss[i] = (hNodes[i] as number) * geometry.perimeter(mesh.x[i] as number) * theta;
    faceLoss += convectiveConductance(mesh, hNodes, i) * theta;
  }
  const flowX = new Float64Array(n + 1);
  const flow = new Float64Array(n + 1);
  flow[0] = r.heatRate;
  for (let i = 0; i + 1 < n; i++) {
    flowX[i + 1] = 0.5 * ((mesh.x[i] as number) + (mesh.x[i + 1] as number));
    flow[i + 1] = interfaceConductance(mesh, k, i) * ((r.theta[i] as number) - (r.theta[i + 1] as number));
  }
  flowX[n] = mesh.length;
  flow[n] = r.surfaceHeatRate - faceLoss;
  return {
    model: 'fd-1d',
    temperature: { x_m: mesh.x, values: T },
    faceTemperature: null,
    loss: { x_m: mesh.x, values: loss },
    flow: { x_m: flowX, values: flow },
    tipTemperature_degC: r.tipTemperature_degC,
    heatRate_W: r.heatRate,
    basis: `1-D finite volumes on ${n} nodes (the actual profile, h distribution, tip and base)`,
  };
}

/** fd-1d of any fin (also nonlinear): Q from the interface conduction with k(T), q' from the drop of Q across each CV. */
function oneDProfileGeneric(c: Case, oneD: Fin1DStudy): ModelProfile {
  const r = oneD.result;
  const mesh = r.mesh;
  const n = mesh.nodes;
  const ambient = c.convection.ambient_degC;
  const T = r.theta.map((theta) => theta + ambient);
  const flowX = new Float64Array(n);
  const flow = new Float64Array(n);
  flow[0] = r.heatRate;
  for (let i = 0; i + 1 < n; i++) {
    const k = conductivityAt(c.material.k, 0.5 * ((T[i] as number) + (T[i + 1] as number)));
    flowX[i + 1] = 0.5 * ((mesh.x[i] as number) + (mesh.x[i + 1] as number));
    flow[i + 1] = ((k * (mesh.interfaceArea[i] as number)) / (mesh.dx[i] as number)) * ((r.theta[i] as number) - (r.theta[i + 1] as number));
  }
  // CV i runs from flowX[i] (the base for i = 0) to flowX[i + 1]; the last node's half cell is left out.
  const lossX = mesh.x.slice(0, n - 1);
  const loss = new Float64Array(n - 1);
  for (let i = 0; i + 1 < n; i++) loss[i] = ((flow[i] as number) - (flow[i + 1] as number)) / ((flowX[i + 1] as number) - (flowX[i] as number));
  return {
    model: 'fd-1d',
    temperature: { x_m: mesh.x, values: T },
    faceTemperature: null,
    loss: { x_m: lossX, values: loss },
    flow: { x_m: flowX, values: flow },
    tipTemperature_degC: r.tipTemperature_degC,
    heatRate_W: r.heatRate,
    basis: `1-D finite volumes on ${n} nodes${isLinearFinCase(c) ? '' : ', nonlinear (Newton)'}`,
  };
}

/** Heat flux leaving the face at distance x from the base (m) and excess theta (K), W/m^2 (header). */
function faceFluxAlong(c: Case, length: number): (x: number, theta: number) => number {
  const problem = finProblem(c);
  const law = faceLaw(problem);
  return (x, theta) => faceFlux(law, hAt(problem.h, x, length), theta);
}

function twoDProfile(c: Case, study: Fin2DStudy): ModelProfile {
  const r = study.finest;
  const baseX = r.grid.baseX;
  const shift = (a: Float64Array): Float64Array => a.map((v) => v - baseX);
  const face = r.surface;
  const n = face.x_m.length;
  const L = (face.x_m[n - 1] as number) - baseX;
  const flux = faceFluxAlong(c, L);
  const lossX = new Float64Array(n - 1);
  const loss = new Float64Array(n - 1);
  const flow = new Float64Array(n);
  flow[0] = r.heatRate_W;
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
    flow[i + 1] = (flow[i] as number) - segment;
  }
  return {
    model: 'fd-2d',
    temperature: { x_m: shift(r.centreline.x_m), values: r.centreline.T_degC },
    faceTemperature: { x_m: shift(face.x_m), values: face.T_degC },
    loss: { x_m: lossX, values: loss },
    flow: { x_m: shift(face.x_m), values: flow },
    tipTemperature_degC: r.tipTemperature_degC,
    heatRate_W: r.heatRate_W,
    basis: `2-D finite volumes on ${r.grid.nodesX} x ${r.grid.nodesY} nodes (${r.grid.section === 'planar' ? 'longitudinal section, side edges insulated' : 'axisymmetric section'})${isLinearFinCase(c) ? '' : ', nonlinear (Newton)'}`,
  };
}

/**
 * Profiles of the numerical solutions (fd-2d first when given, then fd-1d) and of every shortcut in
 * `report` (same case, same check).
 */
export function modelProfiles(c: Case, report: CheckReport, oneD: Fin1DStudy, twoD: Fin2DStudy | null = null): ModelProfiles {
  const linear = isLinearFinCase(c) ? c : null;
  // A nonlinear fin's shortcuts take one h and k: the hand calculation's, at the base temperature.
  const surrogate = linear ?? linearSurrogate(c, 'base', oneD.result);
  const geometry = finGeometry(surrogate);
  const eq = equivalentUniformFin(surrogate, geometry);
  const profiles: ModelProfile[] = [];
  if (twoD) profiles.push(twoDProfile(c, twoD));
  profiles.push(linear ? oneDProfile(linear, oneD) : oneDProfileGeneric(c, oneD));
  const omitted: OmittedProfile[] = [];
  for (const m of report.models) {
    if (m.model === 'fd-1d' || (m.guess !== undefined && m.guess !== 'base')) continue;
    const fin = shortcutFin(m.model, surrogate, eq);
    if (!fin.ok) {
      omitted.push({ model: m.model, reason: fin.reason });
      continue;
    }
    if (eq.contactResistance > 0 && !Number.isFinite(m.heatRate_W)) {
      omitted.push({ model: m.model, reason: 'its heat rate in the check is not a finite number, so its base temperature behind the contact resistance is unknown' });
      continue;
    }
    profiles.push(shortcutProfile(m.model, fin, eq, m.heatRate_W, m.basis, c.convection.ambient_degC));
  }
  const p = c.fin.profile;
  const note = linear ? null : 'Nonlinear fin: shortcuts drawn with h and k at the base temperature (the table also has fin-averaged h and k).';
  return { profiles, omitted, length_m: eq.length, baseX_m: p.kind === 'annular' ? p.innerRadius : 0, note };
}
