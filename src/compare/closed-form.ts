/**
 * The `closed-form` model: the profile's own published 1-D solution, chosen by profile and tip.
 *
 * - rectangular, pin: the uniform fin with the case's tip (convective, adiabatic, prescribed
 *   temperature, infinite), actual A and P (Incropera et al., Table 3.4; from memory for the number);
 * - triangular, concave and convex parabolic, trapezoidal: Gardner (1945), Trans. ASME 67, 621 (from
 *   memory), per unit width with P = 2w (edges and face slope neglected), adiabatic tip;
 * - conical pin: full cone or truncated cone (adiabatic tip), m^2 = 4h/(k D_b);
 * - annular: the Bessel-function solution with an adiabatic rim, or with a convective rim
 *   (Gardner 1945; Incropera et al., Table 3.5, from memory).
 * A non-uniform h enters as the area-weighted mean (these forms assume a uniform h).
 * Returns the base heat rate as an affine function of the base excess, so a contact resistance can be
 * put in series exactly: q(theta0) = slope * theta0 + offset (offset != 0 only for a prescribed tip).
 */
import type { LinearFinCase } from '../fd/index.js';
import {
  annularFin,
  annularFinConvectiveTip,
  conicalSpine,
  truncatedConicalSpine,
  straightConcaveParabolicFin,
  straightConvexParabolicFin,
  straightTrapezoidalFin,
  straightTriangularFin,
  uniformFin,
  type UniformTip,
} from '../analytic/index.js';
import type { EquivalentUniformFin } from './equivalent.js';

export interface AffineHeatRate {
  /** dq/dtheta0, W/K. */
  slope: number;
  /** q at theta0 = 0, W (nonzero only with a prescribed tip temperature). */
  offset: number;
  /** The formula's own efficiency, where it has one. */
  formulaEfficiency: number | null;
  m: number;
  length: number;
  /** The published solution used, in one line. */
  basis: string;
}

export type ClosedFormOutcome = { ok: true; value: AffineHeatRate } | { ok: false; reason: string };

export function closedForm(c: LinearFinCase, eq: EquivalentUniformFin): ClosedFormOutcome {
  const p = c.fin.profile;
  const h = eq.h;
  const k = eq.k;
  const hNote = c.convection.h.kind === 'uniform' ? '' : ', with the area-weighted mean h';
  const tip = c.convection.tip;
  const linearIn = (q: number, thetaBase: number): { slope: number; offset: number } => ({ slope: q / thetaBase, offset: 0 });
  const sharpOrAdiabatic = tip.kind === 'adiabatic' ? 'adiabatic tip' : 'tip face neglected (adiabatic)';
  switch (p.kind) {
    case 'rectangular':
    case 'pin': {
      const A = eq.A;
      const P = eq.P;
      const L = eq.length;
      const uTip: UniformTip =
        tip.kind === 'convective'
          ? { kind: 'convective', hTip: eq.hTip }
          : tip.kind === 'temperature'
            ? { kind: 'temperature', thetaTip: tip.T_degC - c.convection.ambient_degC }
            : { kind: tip.kind };
      const at = (theta0: number): number => uniformFin({ h, k, P, A, L, thetaBase: theta0, tip: uTip }).heatRate;
      const r = uniformFin({ h, k, P, A, L, thetaBase: eq.thetaBase, tip: uTip });
      // Affine in theta0 (the prescribed tip excess makes an offset): two evaluations at nonzero excesses,
      // since the tip-to-base ratio is undefined at theta0 = 0.
      const q1 = at(eq.thetaBase);
      const slope = (at(2 * eq.thetaBase) - q1) / eq.thetaBase;
      const offset = tip.kind === 'temperature' ? q1 - slope * eq.thetaBase : 0;
      return {
        ok: true,
        value: {
          slope,
          offset,
          formulaEfficiency: r.efficiency,
          m: r.m,
          length: L,
          basis: `uniform fin, exact 1-D, ${tip.kind} tip, actual A and P${hNote} (Incropera et al., Table 3.4)`,
        },
      };
    }
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
    case 'trapezoidal': {
      if (tip.kind === 'temperature') return { ok: false, reason: 'no published closed form for a tapered fin with a prescribed tip temperature' };
      const input = { h, k, length: p.length, baseThickness: p.baseThickness, thetaBase: 1, width: p.width };
      const r =
        p.kind === 'triangular'
          ? straightTriangularFin(input)
          : p.kind === 'parabolic-concave'
            ? straightConcaveParabolicFin(input)
            : p.kind === 'parabolic-convex'
              ? straightConvexParabolicFin(input)
              : straightTrapezoidalFin({ ...input, tipThickness: p.tipThickness });
      const tipWord = p.kind === 'trapezoidal' ? `, ${sharpOrAdiabatic}` : '';
      return {
        ok: true,
        value: {
          ...linearIn(r.heatRate, 1),
          formulaEfficiency: r.efficiency,
          m: r.m,
          length: p.length,
          basis: `${p.kind} straight fin, Bessel-function solution (Gardner 1945), P = 2w (edges not cooled)${tipWord}${hNote}`,
        },
      };
    }
    case 'conical-pin': {
      if (tip.kind === 'temperature') return { ok: false, reason: 'no published closed form for a tapered pin with a prescribed tip temperature' };
      const input = { h, k, length: p.length, baseDiameter: p.baseDiameter, thetaBase: 1 };
      const r = p.tipDiameter === 0 ? conicalSpine(input) : truncatedConicalSpine({ ...input, tipDiameter: p.tipDiameter });
      return {
        ok: true,
        value: {
          ...linearIn(r.heatRate, 1),
          formulaEfficiency: r.efficiency,
          m: r.m,
          length: p.length,
          basis: `${p.tipDiameter === 0 ? 'conical' : 'truncated conical'} spine, Bessel-function solution${p.tipDiameter === 0 ? '' : `, ${sharpOrAdiabatic}`}${hNote}`,
        },
      };
    }
    case 'annular': {
      if (tip.kind === 'temperature' || tip.kind === 'infinite') {
        return { ok: false, reason: `no published closed form for an annular fin with a ${tip.kind} rim` };
      }
      const input = { h, k, innerRadius: p.innerRadius, outerRadius: p.outerRadius, thickness: p.thickness, thetaBase: 1 };
      const r = tip.kind === 'convective' ? annularFinConvectiveTip({ ...input, hTip: eq.hTip }) : annularFin(input);
      return {
        ok: true,
        value: {
          ...linearIn(r.heatRate, 1),
          formulaEfficiency: r.efficiency,
          m: r.m,
          length: p.outerRadius - p.innerRadius,
          basis: `annular fin, Bessel-function solution with ${tip.kind === 'convective' ? 'a convective' : 'an adiabatic'} rim${hNote}`,
        },
      };
    }
    case 'tabulated':
      return { ok: false, reason: 'a tabulated profile has no published closed form' };
    default: {
      const never: never = p;
      return never;
    }
  }
}
