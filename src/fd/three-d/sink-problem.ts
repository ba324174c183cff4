/**
 * The linear heat-sink problem that the fd-3d model solves, from the normalised case (heat-sink-types.ts), in
 * excess temperature theta = T − T_ambient (K):
 *   plate:  div(k_p grad theta) = 0 in 0 < x < width, 0 < y < length, 0 < z < thickness;
 *           −k_p dtheta/dz = q''_s on source s (z = 0), = −h_u theta outside the sources (0 when adiabatic);
 *           −k_p dtheta/dz = h_plate theta on the exposed top; narrow edges adiabatic;
 *   fins:   div(k_f grad theta) = 0 in every fin, h(s) on its faces, the tip condition at its tip, its end faces
 *           adiabatic; temperature and heat flux continuous where it stands on the plate.
 * Linear when h does not depend on temperature (uniform, linear, points) and both conductivities are
 * constant: one symmetric positive definite solve. A power-law h on the fins or a k(T) table (one for plate and
 * fins) makes it nonlinear: sink-newton.ts solves it by Newton in the Kirchhoff potential. An infinite tip has
 * no meaning on a sink of finite fins (ModelNotApplicableError).
 */
import type { Conductivity, HeatSinkCase, TipCondition } from '../../case/index.js';
import { ModelNotApplicableError } from '../../errors.js';
import { geometryOfProfile, isPinProfile, sinkLayout, type FinGeometry1D, type SinkLayout } from '../../mesh/index.js';
import type { LinearHDistribution } from '../problem/linear-case.js';
import { kirchhoffTransform, type KirchhoffTransform } from '../problem/conductivity.js';

export type SinkTip = Exclude<TipCondition, { kind: 'infinite' }>;

export interface SinkProblem {
  layout: SinkLayout;
  /** Plate and fin conductivities, W/(m K). */
  kPlate: number;
  kFin: number;
  /** One fin of unit width (straight fins) or one pin; null for a bare plate. */
  finGeometry: FinGeometry1D | null;
  /**
   * The plate's conductivity law and its Kirchhoff potential phi(theta) = (1/k_ref) ∫_0^theta k dθ' (measured
   * from the ambient, k_ref = k at the ambient; identity for a constant k). A table requires the fins' law to be
   * the same (sinkModelApplies), so one potential serves the whole sink.
   */
  conductivity: KirchhoffTransform;
  /** h on the fins' faces along the height, W/(m^2 K) (a power law: its base value, the law in `powerLaw`). */
  h: LinearHDistribution;
  /**
   * The fins' power law h = base (theta/theta_root)^exponent, theta_root the mean rise of all the fins' roots
   * (so `base` is h at the fins' mean root temperature, as it is h at the base for a single fin); null: linear h.
   */
  powerLaw: { base: number; exponent: number } | null;
  tip: SinkTip;
  /** W/(m^2 K); underside null = adiabatic. */
  hPlate: number;
  hUnderside: number | null;
  ambient_degC: number;
  sources: { name: string; power: number; contactResistance: number }[];
}

/** Whether fd-3d covers a sink, and why not in the problem's words. */
export function sinkModelApplies(c: HeatSinkCase): { applies: true } | { applies: false; reason: string } {
  const hasFins = c.fin !== null && (c.array.kind === 'plates' ? c.array.count : c.array.rows * c.array.columns) > 0;
  if (hasFins && c.fin !== null) {
    const plateK = c.plate.material.k;
    const finK = c.fin.material.k;
    if ((plateK.kind !== 'constant' || finK.kind !== 'constant') && !sameConductivity(plateK, finK)) {
      return {
        applies: false,
        reason:
          'a k(T) table with plate and fins of different materials: fd-3d carries one Kirchhoff potential for the whole sink, so a table needs one conductivity for plate and fins',
      };
    }
    if (c.convection.tip.kind === 'infinite')
      return { applies: false, reason: 'an infinite fin tip has no meaning on a heat sink of fins of finite height' };
  }
  return { applies: true };
}

export function sinkProblem(c: HeatSinkCase): SinkProblem {
  const coverage = sinkModelApplies(c);
  if (!coverage.applies) throw new ModelNotApplicableError('fd-3d', coverage.reason);
  const layout = sinkLayout(c);
  const fin = layout.finKind === 'bare' ? null : c.fin;
  const conductivity = kirchhoffTransform(c.plate.material.k, c.convection.ambient_degC, 0);
  const kPlate = conductivity.kRef;
  const law = c.convection.h;
  const powerLaw = fin !== null && law.kind === 'power' ? { base: law.base, exponent: law.exponent } : null;
  const h: LinearHDistribution = law.kind === 'power' ? { kind: 'uniform', h: law.base } : law;
  const tip = c.convection.tip;
  let finGeometry: FinGeometry1D | null = null;
  if (fin !== null) {
    const p = fin.profile;
    const unit = isPinProfile(p) || p.kind === 'pin' || p.kind === 'conical-pin' ? p : { ...p, width: 1 };
    finGeometry = geometryOfProfile(unit, 'insulated');
  }
  checkFootprints(layout);
  return {
    layout,
    kPlate,
    kFin: fin === null || fin.material.k.kind !== 'constant' ? kPlate : fin.material.k.k,
    conductivity,
    powerLaw,
    finGeometry,
    h,
    tip: tip.kind === 'infinite' ? { kind: 'adiabatic' } : tip,
    hPlate: c.convection.plate,
    hUnderside: c.convection.underside,
    ambient_degC: c.convection.ambient_degC,
    sources: c.sources.map((s) => ({ name: s.name, power: s.power, contactResistance: s.contactResistance })),
  };
}

/** Two conductivity laws that are the same function of temperature. */
function sameConductivity(a: Conductivity, b: Conductivity): boolean {
  if (a.kind === 'constant' && b.kind === 'constant') return a.k === b.k;
  if (a.kind !== 'table' || b.kind !== 'table' || a.k.length !== b.k.length) return false;
  return a.k.every((k, j) => k === b.k[j] && a.T_degC[j] === b.T_degC[j]);
}

/** Fins must stand on the plate and not overlap (the case checks say so first; this guards the model). */
function checkFootprints(layout: SinkLayout): void {
  const tol = 1e-9 * Math.max(layout.width, layout.length);
  for (const f of layout.fins) {
    if (f.x0 < -tol || f.x1 > layout.width + tol || f.y0 < -tol || f.y1 > layout.length + tol) {
      throw new ModelNotApplicableError('fd-3d', 'the fins do not fit on the plate (count x pitch wider than the plate)');
    }
  }
  const sorted = [...layout.fins].sort((a, b) => a.x0 - b.x0 || a.y0 - b.y0);
  for (let k = 0; k + 1 < sorted.length; k++) {
    for (let m = k + 1; m < sorted.length && sorted[m].x0 < sorted[k].x1 - tol; m++) {
      if (sorted[m].y0 < sorted[k].y1 - tol && sorted[k].y0 < sorted[m].y1 - tol) {
        throw new ModelNotApplicableError('fd-3d', 'neighbouring fins overlap (pitch smaller than the fin thickness or diameter)');
      }
    }
  }
}
