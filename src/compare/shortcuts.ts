/**
 * The textbook shortcuts, evaluated on the equivalent uniform fin (equivalent.ts):
 *   tanh-L         q = M tanh(mL),            m = sqrt(hP/(kA)), M = sqrt(hPkA) theta_b   (adiabatic tip)
 *   tanh-Lc        q = M tanh(mLc),           Lc = L + A/P  (Harper & Brown 1922, NACA Report 158; from memory)
 *   tanh-Lc-thin   as tanh-Lc with P = 2w (pins pi D), Lc = L + t/2 (pins L + D/4)
 *   convective-tip q = M (sinh mL + beta cosh mL) / (cosh mL + beta sinh mL), beta = h_tip/(m k)
 *   closed-form    the profile's own solution (closed-form.ts)
 * (Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, Table 3.4; from memory.)
 * A contact resistance R (K/W over the base) is put in series exactly: with the fin's base heat
 * q_f(theta0) = s theta0 + c (affine), q = (theta_b - theta0)/R gives theta0 = (theta_b - c R)/(1 + s R).
 * Units: W, K, m.
 */
import { uniformFin } from '../analytic/index.js';
import type { LinearFinCase } from '../fd/index.js';
import { closedForm, type AffineHeatRate } from './closed-form.js';
import type { EquivalentUniformFin } from './equivalent.js';
import type { NotApplicable, ShortcutId } from './types.js';

export interface ShortcutValue {
  model: ShortcutId;
  heatRate_W: number;
  formulaEfficiency: number | null;
  m_per_m: number | null;
  length_m: number | null;
  basis: string;
}

/** Heat rate through a base contact resistance R (K/W) in series with an affine fin. */
export function withContact(f: AffineHeatRate, thetaBase: number, resistance: number): number {
  const theta0 = (thetaBase - f.offset * resistance) / (1 + f.slope * resistance);
  return f.slope * theta0 + f.offset;
}

function adiabaticUniform(eq: EquivalentUniformFin, P: number, L: number, basis: string): AffineHeatRate {
  const r = uniformFin({ h: eq.h, k: eq.k, P, A: eq.A, L, thetaBase: 1, tip: { kind: 'adiabatic' } });
  return { slope: r.heatRate, offset: 0, formulaEfficiency: r.efficiency, m: r.m, length: L, basis };
}

export function evaluateShortcuts(c: LinearFinCase, eq: EquivalentUniformFin): { values: ShortcutValue[]; notApplicable: NotApplicable[] } {
  const values: ShortcutValue[] = [];
  const notApplicable: NotApplicable[] = [];
  const unusable = unusableEquivalent(eq);
  if (unusable !== null) {
    for (const model of SHORTCUT_IDS) notApplicable.push({ model, reason: unusable });
    return { values, notApplicable };
  }
  const convective = c.convection.tip.kind === 'convective';
  const meanWords = describeMeans(c);
  const add = (model: ShortcutId, f: AffineHeatRate): void => {
    values.push({
      model,
      heatRate_W: withContact(f, eq.thetaBase, eq.contactResistance),
      formulaEfficiency: f.formulaEfficiency,
      m_per_m: f.m,
      length_m: f.length,
      basis: f.basis,
    });
  };

  add('tanh-L', adiabaticUniform(eq, eq.P, eq.length, `tanh(mL)/(mL): uniform fin, adiabatic tip at the actual length${meanWords}`));

  if (convective) {
    add('tanh-Lc', adiabaticUniform(eq, eq.P, eq.length + eq.A / eq.P, `tanh(mLc)/(mLc), Lc = L + A/P, full perimeter${meanWords}`));
    const thinLc = eq.length + (eq.family === 'pin' ? eq.size / 4 : eq.size / 2);
    add(
      'tanh-Lc-thin',
      adiabaticUniform(
        eq,
        eq.Pthin,
        thinLc,
        `tanh(mLc)/(mLc), ${eq.family === 'pin' ? 'P = pi D, Lc = L + D/4' : eq.family === 'annular' ? 'Lc = L + t/2' : 'P = 2w, Lc = L + t/2'}${meanWords}`,
      ),
    );
    const r = uniformFin({ h: eq.h, k: eq.k, P: eq.P, A: eq.A, L: eq.length, thetaBase: 1, tip: { kind: 'convective', hTip: eq.hTip } });
    add('convective-tip', {
      slope: r.heatRate,
      offset: 0,
      formulaEfficiency: r.efficiency,
      m: r.m,
      length: eq.length,
      basis: `uniform fin, exact convective tip (h_tip = ${eq.hTip.toPrecision(3)} W/(m^2*K))${meanWords}`,
    });
  } else {
    const reason = `the tip is ${c.convection.tip.kind}: corrected lengths and the convective-tip form model a convecting tip`;
    notApplicable.push({ model: 'tanh-Lc', reason }, { model: 'tanh-Lc-thin', reason }, { model: 'convective-tip', reason });
  }

  const cf = closedForm(c, eq);
  if (cf.ok) add('closed-form', cf.value);
  else notApplicable.push({ model: 'closed-form', reason: cf.reason });
  return { values, notApplicable };
}

const SHORTCUT_IDS: ShortcutId[] = ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form'];

/**
 * Why no shortcut applies to an equivalent fin, or null: every formula needs one finite h > 0 (and a tip
 * coefficient >= 0). A nonlinear fin's single h can be negative (radiation from surroundings hotter than
 * the fin outweighs convection) or infinite (h ~ theta^n with n < 0 where the fin reaches the ambient).
 */
export function unusableEquivalent(eq: EquivalentUniformFin): string | null {
  const w = (x: number): string => `${Number(x.toPrecision(3))} W/(m^2*K)`;
  if (!Number.isFinite(eq.h) || !Number.isFinite(eq.hTip)) {
    return 'no finite single h describes this fin (h ~ theta^n with n < 0 is infinite where the fin reaches the ambient): the shortcuts need one finite h';
  }
  if (eq.h <= 0) {
    return `the single h of this fin is ${w(eq.h)}, not > 0 (radiation from surroundings hotter than the fin outweighs convection): the shortcuts need h > 0`;
  }
  if (eq.hTip < 0) return `the tip coefficient is ${w(eq.hTip)}, below 0 (radiation from hotter surroundings): the convective-tip forms need h_tip >= 0`;
  return null;
}

function describeMeans(c: LinearFinCase): string {
  const p = c.fin.profile.kind;
  const uniformSection = p === 'rectangular' || p === 'pin' || p === 'annular';
  const parts: string[] = [];
  if (!uniformSection) parts.push('mean section');
  if (c.convection.h.kind !== 'uniform') parts.push('area-weighted mean h');
  if (p === 'annular') parts.push('mean radius');
  return parts.length > 0 ? `; ${parts.join(', ')}` : '';
}
