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
 * fd-1d and fd-2d (the finest grid of their studies): temperature, heat flow and loss along the fin as
 * the solver computes them from its own discrete quantities (alongFin in src/fd: the scheme's own
 * fluxes, the Kirchhoff flux for k(T), the face law the solver uses); fd-2d also the cooled face's
 * temperature. Nonlinear fins: the shortcuts are drawn as a hand calculation makes them, with h and k at
 * the base temperature (linear-surrogate.ts); the table also has the fin-averaged guess.
 */
import { uniformFin, uniformFinExcess, type UniformFinInput, type UniformTip } from '../analytic/index.js';
import type { Case } from '../case/index.js';
import { alongFin, type AlongFinSeries, type FinStudy, type FinStudy1D, type FinStudy2D, type LinearFinCase } from '../fd/index.js';
import { finGeometry } from '../mesh/index.js';
import { equivalentUniformFin, type EquivalentUniformFin } from './equivalent.js';
import { guessesFor, shortcutCase } from './linear-surrogate.js';
import type { CheckReport, ModelId, ShortcutId } from './types.js';

/** A quantity along the fin: positions in m from the base (annular fins: r - r1) and values. */
export type AlongFin = AlongFinSeries;

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

/** The profile of a numerical model: the solver's own along-fin quantities. */
function solvedProfile(study: FinStudy): ModelProfile {
  const along = alongFin(study);
  const newton = study.newton === null ? '' : ', nonlinear (Newton)';
  const basis =
    study.model === 'fd-1d'
      ? `1-D finite volumes on ${study.finest.mesh.nodes} nodes (the actual profile, h distribution, tip and base)${newton}`
      : `2-D finite volumes on ${study.finest.grid.nodesX} x ${study.finest.grid.nodesY} nodes (${study.finest.grid.section === 'planar' ? 'longitudinal section, side edges insulated' : 'axisymmetric section'})${newton}`;
  return {
    model: study.model,
    temperature: along.temperature,
    faceTemperature: along.faceTemperature,
    loss: along.loss,
    flow: along.flow,
    tipTemperature_degC: study.tipTemperature_degC,
    heatRate_W: study.heatRate_W,
    basis,
  };
}

/**
 * Profiles of the numerical solutions (fd-2d first when given, then fd-1d) and of every shortcut in
 * `report` (same case, same check).
 */
export function modelProfiles(c: Case, report: CheckReport, oneD: FinStudy1D, twoD: FinStudy2D | null = null): ModelProfiles {
  // The shortcuts take one h and k: the fin's own, or for a nonlinear fin the hand calculation's first
  // guess, at the base temperature.
  const guess = guessesFor(c)[0] ?? null;
  const surrogate = shortcutCase(c, guess, oneD.finest);
  const geometry = finGeometry(surrogate);
  const eq = equivalentUniformFin(surrogate, geometry);
  const profiles: ModelProfile[] = [];
  if (twoD) profiles.push(solvedProfile(twoD));
  profiles.push(solvedProfile(oneD));
  const omitted: OmittedProfile[] = [];
  for (const m of report.models) {
    if (m.model === 'fd-1d' || (m.guess !== undefined && m.guess !== 'base')) continue;
    const fin = shortcutFin(m.model, surrogate, eq);
    if (!fin.ok) {
      omitted.push({ model: m.model, reason: fin.reason });
      continue;
    }
    if (eq.contactResistance > 0 && !Number.isFinite(m.heatRate_W)) {
      omitted.push({
        model: m.model,
        reason: 'its heat rate in the check is not a finite number, so its base temperature behind the contact resistance is unknown',
      });
      continue;
    }
    profiles.push(shortcutProfile(m.model, fin, eq, m.heatRate_W, m.basis, c.convection.ambient_degC));
  }
  const p = c.fin.profile;
  const note = guess === null ? null : 'Nonlinear fin: shortcuts drawn with h and k at the base temperature (the table also has fin-averaged h and k).';
  return { profiles, omitted, length_m: eq.length, baseX_m: p.kind === 'annular' ? p.innerRadius : 0, note };
}
