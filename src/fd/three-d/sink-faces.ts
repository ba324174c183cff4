/**
 * The faces of a nonlinear heat sink: the temperature and heat flow of a face behind a half cell, in the
 * Kirchhoff potential phi (K) of sink-problem.ts.
 *
 * A loss term (heat-terms.ts) is a face of surface conductance G_s (h A, W/K) with the flux law
 *   q(θ_f) = G_s g(θ_f) θ_f,   g = |θ_f/θ_root|^n on the fins' faces under a power law, 1 elsewhere,
 * behind a half cell of conductance G_h (k_ref based, W/K) from the node, whose potential is phi_P:
 *   G_h (phi_P − phi(θ_f)) = q(θ_f).
 * The left side falls and the right side rises with θ_f (k > 0, n > −1), so θ_f is unique and lies between 0
 * and θ(phi_P); it is found by Newton safeguarded by bisection on that bracket. Its derivative:
 *   dq/dphi_P = G_h q'/(G_h κ + q'),   q' = dq/dθ_f = (n + 1) G_s g,   κ = k(θ_f)/k_ref,
 * and with no half cell (a thin fin's sheet node on its face, G_h infinite) θ_f = θ(phi_P), dq/dphi_P = q'/κ.
 * A prescribed temperature (G_s infinite) is linear in phi: q = G_h (phi_P − phi(θ_fixed)).
 * The law's reference enters as dq/dθ_root = q_r G_h κ/(G_h κ + q'), q_r = ∂q/∂θ_root at fixed θ_f = −n q/θ_root
 * (the half cell shares the change; without one, q_r itself).
 * g θ is formed as θ_root sign(θ)|θ/θ_root|^(n+1) (finite for every θ when n > −1).
 * With a constant k and g = 1 the face is linear: θ_f = G_h phi_P/(G_h + G_s) and q = θ_f G_s (the assembled
 * series conductance), so a linear sink goes through this module unchanged.
 */
import type { KirchhoffTransform } from '../problem/conductivity.js';

export interface FaceState {
  /** Face excess temperature θ_f, K. */
  theta: number;
  /** Heat leaving through the face, W. */
  q: number;
  /** dq/dphi_P, W/K. */
  dq: number;
  /** dq/dθ_root at fixed phi_P, W/K (0 off the power law). */
  dRef: number;
}

export interface SinkFaces {
  /** θ of a potential, K. */
  thetaOf(phi: number): number;
  /** phi of an excess temperature, K. */
  phiOf(theta: number): number;
  /** dphi/dθ = k(θ)/k_ref. */
  kappaOf(theta: number): number;
  /**
   * The face of a loss term at node potential phiP: surface conductance gS, half cell gH (Infinity: none),
   * `law` 1 for the fins' power law, fixed θ for a prescribed temperature (gS infinite).
   */
  face(phiP: number, gS: number, gH: number, law: number, fixed: number): FaceState;
}

/** Faces of a sink with conductivity `k` and the fins' power-law exponent n (0: linear) about θ_root (K). */
export function sinkFaces(k: KirchhoffTransform, exponent: number, thetaRoot: () => number): SinkFaces {
  const thetaOf = (phi: number) => (k.constant ? phi : -k.dropAt(-phi));
  const phiOf = (theta: number) => (k.constant ? theta : -k.potentialDropAt(-theta));
  const kappa = (theta: number) => (k.constant ? 1 : k.conductivityAt(theta) / k.kRef);
  /** q/G_s and (dq/dθ)/G_s at θ. */
  const flux = (theta: number, law: number): [number, number] => {
    if (law === 0 || exponent === 0) return [theta, 1];
    const ref = thetaRoot();
    const u = Math.abs(theta) / ref;
    const p = Math.pow(u, exponent);
    return [Math.sign(theta) * ref * u * p, (exponent + 1) * p];
  };
  return {
    thetaOf,
    phiOf,
    kappaOf: kappa,
    face(phiP, gS, gH, law, fixed) {
      if (gS === Infinity) return { theta: fixed, q: gH * (phiP - phiOf(fixed)), dq: gH, dRef: 0 };
      const ofRef = (q: number) => (law === 0 || exponent === 0 ? 0 : (-exponent * q) / thetaRoot());
      if (gH === Infinity) {
        const theta = thetaOf(phiP);
        const [f, df] = flux(theta, law);
        return { theta, q: gS * f, dq: (gS * df) / kappa(theta), dRef: ofRef(gS * f) };
      }
      if (k.constant && (law === 0 || exponent === 0)) {
        const theta = (gH * phiP) / (gH + gS);
        return { theta, q: gS * theta, dq: (gH * gS) / (gH + gS), dRef: 0 };
      }
      const thetaP = thetaOf(phiP);
      let lo = Math.min(0, thetaP);
      let hi = Math.max(0, thetaP);
      let theta = (gH * thetaP) / (gH + gS);
      // r(θ) = G_h (phi(θ) − phi_P) + q(θ): increasing, r(lo) <= 0 <= r(hi).
      for (let it = 0; it < 100; it++) {
        const [f, df] = flux(theta, law);
        const r = gH * (phiOf(theta) - phiP) + gS * f;
        if (r > 0) hi = theta;
        else lo = theta;
        const slope = gH * kappa(theta) + gS * df;
        let next = theta - r / slope;
        if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
        const done = Math.abs(next - theta) <= 1e-15 * Math.max(Math.abs(theta), Math.abs(thetaP)) || hi - lo <= 1e-15 * Math.abs(thetaP);
        theta = next;
        if (done) break;
      }
      const [f, df] = flux(theta, law);
      const dqTheta = gS * df;
      const share = (gH * kappa(theta)) / (gH * kappa(theta) + dqTheta);
      return { theta, q: gS * f, dq: (gH * dqTheta) / (gH * kappa(theta) + dqTheta), dRef: ofRef(gS * f) * share };
    },
  };
}
