/**
 * Base and tip conditions of the nonlinear 1-D fin (the only place that knows them for this solver).
 *
 * Sign convention: that of boundary.ts (θ = T - T_amb in K; every row reads "heat leaving CV i" =
 * "heat entering it from outside the fin"; Q_base positive INTO the fin at its base, Q_tip positive
 * OUT of the fin through its tip section, both in W). Kirchhoff potential U (problem/conductivity.ts).
 *
 * Base (node 0):
 *   temperature: θ_0 = θ_b (the row is replaced); Q_base = K_0 (U_0 - U_1) + loss_0.
 *   contact:     Q_base = C_b (θ_b - θ_0), C_b = A_b / R'' (W/K), as in boundary.ts.
 * Tip (node n-1):
 *   adiabatic:   Q_tip = 0.
 *   temperature: θ_{n-1} = θ_L (row replaced); Q_tip = K_{n-2} (U_{n-2} - U_{n-1}) - loss_{n-1}.
 *   convective:  Q_tip = A_tip [h_tip θ + ε σ (T^4 - T_s^4)] with h_tip = h_x(L) g(θ) for the local
 *                face law, or the case's own tip coefficient (a constant) when one is given. The tip
 *                radiates with the faces' emissivity.
 *   infinite:    the fin continues for ever with its tip section (uniform A, P, h_x) and the same
 *                laws. The first integral of d/dx(k A dT/dx) = P q(θ) (multiply by k dT/dx, integrate
 *                from the far end, where θ = θ_e with q(θ_e) = 0 and dT/dx = 0) gives exactly
 *                  Q_tip = sign(θ - θ_e) sqrt(2 A P Ψ(θ)),   Ψ(θ) = ∫_{θ_e}^{θ} q(s) k(s) ds,
 *                dQ_tip/dθ = A P q(θ) k(θ) / Q_tip  (-> sqrt(A P k dq/dθ) at θ = θ_e).
 *                For a linear fin this is Q_tip = sqrt(h P k A) θ of boundary.ts; for a power-law h it
 *                is the infinite-fin heat rate of Sen & Trinh 1986 (J. Heat Transfer 108) and for
 *                radiation that of the classic radiating-fin analyses (Bartas & Sellers 1960) [from
 *                memory]. Ψ is exact: its convective part in closed form (∫ |θ|^n θ (a + bθ) dθ), its
 *                radiative part by a 3-point Gauss-Legendre rule, exact for the degree-5 polynomial
 *                (T^4 - T_s^4)(a + bθ) on each linear piece of k.
 */
import type { Mesh1D } from '../../mesh/index.js';
import { contactConductance, type BaseBoundary, type TipBoundary } from './boundary.js';
import { hAt } from '../problem/convection.js';
import type { KirchhoffTransform } from '../problem/conductivity.js';
import {
  ambientSlope,
  convectedExcess,
  equilibriumExcess,
  faceFlux,
  faceFluxAmbientSlope,
  faceFluxSlope,
  radiationGap,
  type FaceLaw,
} from '../problem/surface-law.js';
import type { FinProblem } from '../problem/fin-problem.js';

export interface NonlinearBoundaries {
  readonly base: BaseBoundary;
  readonly tip: TipBoundary;
  /** C_b of a contact base, W/K (0 for a temperature base). */
  readonly contact: number;
  readonly law: FaceLaw;
  readonly kirchhoff: KirchhoffTransform;
  /** h_x at the tip, W/(m^2 K). */
  readonly hxTip: number;
  readonly tipArea: number;
  readonly tipPerimeter: number;
  /** θ_e of the infinite tip, K (0 when unused). */
  readonly equilibrium: number;
}

/** A heat flow (W) and its derivative with respect to the local θ (W/K). */
export interface FlowAndSlope {
  value: number;
  slope: number;
}

export function nonlinearBoundaries(problem: FinProblem, mesh: Mesh1D, law: FaceLaw, kirchhoff: KirchhoffTransform): NonlinearBoundaries {
  const hxTip = hAt(problem.h, mesh.length, mesh.length);
  return {
    base: problem.base,
    tip: problem.tip,
    contact: problem.base.kind === 'contact' ? contactConductance(problem.base, mesh) : 0,
    law,
    kirchhoff,
    hxTip,
    tipArea: mesh.tipArea,
    tipPerimeter: mesh.tipPerimeter,
    equilibrium: problem.tip.kind === 'infinite' ? equilibriumExcess(law, hxTip) : 0,
  };
}

/**
 * Q_tip and dQ_tip/dθ_{n-1} for the tips that are not a fixed temperature (0 for those); with `ambientU` (the tip
 * node's ambient variable u, problem/surface-law.ts) the derivative is taken with respect to u instead, and the
 * face law's convection formed from u (exact where θ(u) underflows).
 */
export function tipLoss(b: NonlinearBoundaries, thetaTip: number, out: FlowAndSlope, ambientU: number | null = null): FlowAndSlope {
  const tip = b.tip;
  switch (tip.kind) {
    case 'adiabatic':
    case 'temperature':
      out.value = 0;
      out.slope = 0;
      return out;
    case 'convective': {
      const A = b.tipArea;
      if (tip.h === 'local') {
        if (ambientU !== null) {
          const radiated = b.law.radiative === 0 ? 0 : b.law.radiative * radiationGap(b.law, thetaTip);
          out.value = A * ((b.hxTip * ambientU) / b.law.inverseBaseExcess + radiated);
          out.slope = A * faceFluxAmbientSlope(b.law, b.hxTip, thetaTip, ambientU);
        } else {
          out.value = A * faceFlux(b.law, b.hxTip, thetaTip);
          out.slope = A * faceFluxSlope(b.law, b.hxTip, thetaTip);
        }
      } else {
        const radiated = b.law.radiative === 0 ? 0 : b.law.radiative * radiationGap(b.law, thetaTip);
        out.value = A * (tip.h * thetaTip + radiated);
        out.slope = A * (tip.h + faceFluxSlope(b.law, 0, thetaTip));
        if (ambientU !== null) out.slope *= ambientSlope(b.law, ambientU);
      }
      return out;
    }
    case 'infinite':
      continuation(b, thetaTip, out);
      if (ambientU !== null) {
        // dQ/du = dQ/dθ dθ/du: dθ/du -> 0 faster than dQ/dθ grows as θ -> 0 (n > -1); 0 when it underflows.
        const chain = ambientSlope(b.law, ambientU);
        out.slope = chain === 0 ? 0 : out.slope * chain;
      }
      return out;
    default: {
      const never: never = tip;
      throw new Error(`unknown tip condition ${JSON.stringify(never)}`);
    }
  }
}

function continuation(b: NonlinearBoundaries, theta: number, out: FlowAndSlope): FlowAndSlope {
  const AP = b.tipArea * b.tipPerimeter;
  const k = b.kirchhoff.conductivityAt(theta);
  const gap = theta - b.equilibrium;
  const psi = gap === 0 || AP === 0 ? 0 : continuationIntegral(b, theta);
  if (!(psi > 0)) {
    out.value = 0;
    // Limit of A P q k / Q_tip at θ = θ_e (in the linear solver's order of factors).
    out.slope = Math.sqrt(faceFluxSlope(b.law, b.hxTip, theta) * b.tipPerimeter * k * b.tipArea);
    return out;
  }
  const value = Math.sign(gap) * Math.sqrt(2 * AP * psi);
  out.value = value;
  out.slope = (AP * faceFlux(b.law, b.hxTip, theta) * k) / value;
  return out;
}

const GAUSS_NODE = Math.sqrt(3 / 5);
const GAUSS_OUTER = 5 / 9;
const GAUSS_CENTRE = 8 / 9;

/** Ψ(θ) = ∫_{θ_e}^{θ} q(s) k(s) ds, W^2/m^3 (>= 0). */
export function continuationIntegral(b: NonlinearBoundaries, theta: number): number {
  const from = Math.min(theta, b.equilibrium);
  const to = Math.max(theta, b.equilibrium);
  const law = b.law;
  const n = law.exponent;
  const hx = b.hxTip;
  let sum = 0;
  for (const piece of b.kirchhoff.pieces(from, to)) {
    const { from: lo, to: hi, k, slope } = piece;
    if (hx !== 0) {
      // ∫ g(s) s (a + slope s) ds = [a g s^2/(n+2) + slope g s^3/(n+3)], g = |s/θ_b|^n, a = k - slope lo.
      const a = k - slope * lo;
      const primitive = (s: number): number => convectedExcess(law, s) * s * (a / (n + 2) + (slope * s) / (n + 3));
      sum += hx * (primitive(hi) - primitive(lo));
    }
    if (law.radiative !== 0) {
      const mid = 0.5 * (lo + hi);
      const half = 0.5 * (hi - lo);
      const f = (s: number): number => radiationGap(law, s) * (k + slope * (s - lo));
      const gauss = half * (GAUSS_OUTER * (f(mid - half * GAUSS_NODE) + f(mid + half * GAUSS_NODE)) + GAUSS_CENTRE * f(mid));
      sum += law.radiative * gauss;
    }
  }
  return theta >= b.equilibrium ? sum : -sum;
}
