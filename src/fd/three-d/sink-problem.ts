/**
 * The linear heat-sink problem that the fd-3d model solves, from the normalised case (heat-sink-types.ts), in
 * excess temperature theta = T − T_ambient (K):
 *   plate:  div(k_p grad theta) = 0 in 0 < x < width, 0 < y < length, 0 < z < thickness;
 *           −k_p dtheta/dz = q''_s on source s (z = 0), = −h_u theta outside the sources (0 when adiabatic);
 *           −k_p dtheta/dz = h_plate theta on the exposed top; narrow edges adiabatic;
 *   fins:   div(k_f grad theta) = 0 in every fin, h(s) on its faces, the tip condition at its tip, its end faces
 *           adiabatic; temperature and heat flux continuous where it stands on the plate.
 * Linear when h does not depend on temperature (uniform, linear, points) and both conductivities are
 * constant: one symmetric positive definite solve. The power law and k(T) tables would need Newton: the model
 * refuses them (ModelNotApplicableError), and an infinite tip has no meaning on a sink of finite fins.
 */
import type { HeatSinkCase, TipCondition } from '../../case/index.js';
import { ModelNotApplicableError } from '../../errors.js';
import { geometryOfProfile, isPinProfile, sinkLayout, type FinGeometry1D, type SinkLayout } from '../../mesh/index.js';
import type { LinearHDistribution } from '../problem/linear-case.js';

export type SinkTip = Exclude<TipCondition, { kind: 'infinite' }>;

export interface SinkProblem {
  layout: SinkLayout;
  /** Plate and fin conductivities, W/(m K). */
  kPlate: number;
  kFin: number;
  /** One fin of unit width (straight fins) or one pin; null for a bare plate. */
  finGeometry: FinGeometry1D | null;
  /** h on the fins' faces along the height, W/(m^2 K). */
  h: LinearHDistribution;
  tip: SinkTip;
  /** W/(m^2 K); underside null = adiabatic. */
  hPlate: number;
  hUnderside: number | null;
  ambient_degC: number;
  sources: { name: string; power: number; contactResistance: number }[];
}

/** Whether fd-3d covers a sink, and why not in the problem's words. */
export function sinkModelApplies(c: HeatSinkCase): { applies: true } | { applies: false; reason: string } {
  if (c.plate.material.k.kind !== 'constant') {
    return {
      applies: false,
      reason: 'a temperature-dependent plate conductivity (k(T) table) needs a nonlinear 3-D solve, which fd-3d does not have yet',
    };
  }
  const hasFins = c.fin !== null && (c.array.kind === 'plates' ? c.array.count : c.array.rows * c.array.columns) > 0;
  if (hasFins && c.fin !== null) {
    if (c.fin.material.k.kind !== 'constant') {
      return {
        applies: false,
        reason: 'a temperature-dependent fin conductivity (k(T) table) needs a nonlinear 3-D solve, which fd-3d does not have yet',
      };
    }
    if (c.convection.h.kind === 'power') {
      return {
        applies: false,
        reason: 'a power-law h on the fins makes the sink nonlinear, and fd-3d solves linear sinks only (h uniform, linear or by points)',
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
  const kPlate = constantK(c.plate.material.k);
  const fin = layout.finKind === 'bare' ? null : c.fin;
  const h: LinearHDistribution = c.convection.h.kind === 'power' ? { kind: 'uniform', h: 0 } : c.convection.h;
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
    kFin: fin === null ? kPlate : constantK(fin.material.k),
    finGeometry,
    h,
    tip: tip.kind === 'infinite' ? { kind: 'adiabatic' } : tip,
    hPlate: c.convection.plate,
    hUnderside: c.convection.underside,
    ambient_degC: c.convection.ambient_degC,
    sources: c.sources.map((s) => ({ name: s.name, power: s.power, contactResistance: s.contactResistance })),
  };
}

function constantK(k: HeatSinkCase['plate']['material']['k']): number {
  if (k.kind !== 'constant') throw new ModelNotApplicableError('fd-3d', 'a temperature-dependent conductivity needs a nonlinear 3-D solve');
  return k.k;
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
