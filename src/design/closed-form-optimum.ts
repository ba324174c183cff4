/**
 * The published optimum dimensions for a fin of fixed material, where one covers the case (1-D, uniform h and k,
 * adiabatic tip; optimum.ts in src/analytic has the stationarity conditions and their sources): the shortcut side
 * of `optimize`.
 */
import type { Case } from '../case/index.js';
import { optimumConcaveParabolicFin, optimumConvexParabolicFin, optimumPinFin, optimumRectangularFin, optimumTriangularFin } from '../analytic/index.js';
import type { Keep } from './fin-amount.js';

export interface ClosedFormOptimum {
  /** The varied key's value at the optimum, m. */
  value: number;
  /** The heat rate of the published solution at the optimum, W (whole fin). */
  heatRate_W: number;
  method: string;
}

/** The published optimum for the case, where one exists: the value of the varied key, and the method's words. */
export function closedFormOptimum(c: Case, key: string, keep: Keep, dependent: string | null): ClosedFormOptimum | null {
  const h = c.convection.h;
  const k = c.material.k;
  if (h.kind !== 'uniform' || k.kind !== 'constant' || c.convection.emissivity > 0 || dependent === null) return null;
  const p = c.fin.profile;
  const thetaBase = c.base.T_degC - c.convection.ambient_degC;
  const straight = { h: h.h, k: k.k, thetaBase };
  let result: { length: number; thickness: number; heatRate: number };
  let words: string;
  if (keep === 'profile-area') {
    switch (p.kind) {
      case 'rectangular':
        result = optimumRectangularFin({ ...straight, profileArea: p.length * p.thickness });
        words = "Schmidt's optimum (1926) for a rectangular fin of given profile area: sinh 2mL = 6 mL, mL = 1.419";
        break;
      case 'triangular':
        result = optimumTriangularFin({ ...straight, profileArea: (p.length * p.baseThickness) / 2 });
        words = 'the optimum triangular fin of given profile area (1/r - r = 2/(3 mL), mL = 1.309)';
        break;
      case 'parabolic-concave':
        result = optimumConcaveParabolicFin({ ...straight, profileArea: (p.length * p.baseThickness) / 3 });
        words = "Schmidt's least-material concave parabolic fin (mL = √2, efficiency 1/2)";
        break;
      case 'parabolic-convex':
        result = optimumConvexParabolicFin({ ...straight, profileArea: (2 * p.length * p.baseThickness) / 3 });
        words = 'the optimum convex parabolic fin of given profile area (mL = 1.354)';
        break;
      default:
        return null;
    }
  } else if ((keep === 'volume' || keep === 'mass') && p.kind === 'pin') {
    result = optimumPinFin({ h: h.h, k: k.k, thetaBase, volume: (Math.PI / 4) * p.diameter ** 2 * p.length });
    words = 'the optimum pin of given volume: sinh 2mL = (10/3) mL, mL = 0.919';
  } else return null;
  const value = key === 'fin.length' ? result.length : result.thickness;
  // optimum.ts gives W per metre of width for straight fins, W for a pin.
  const heatRate_W = p.kind === 'pin' ? result.heatRate : result.heatRate * ('width' in p ? p.width : 1);
  return {
    value,
    heatRate_W,
    method: `${words}; 1-D, uniform h and k, adiabatic tip (the published closed form, Kraus, Aziz & Welty 2001 [from memory])`,
  };
}
