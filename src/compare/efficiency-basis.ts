/**
 * One surface for every efficiency of a check (case-format.md, "Efficiency": Q over the heat rate of the
 * same fin with every cooled surface at the base temperature). The surface is the one the reference model
 * actually has, and every row of the table (reference, fd-1d, shortcuts) divides by the same Q_ideal:
 *   fd-1d reference: the thin-fin surface (faces of length L, side edges when cooled, the tip when
 *     convective), Q_ideal = θ_b [∫ h P dx + h_tip A_tip] (heat-rate1d.ts);
 *   fd-2d reference: the true (sloped) faces the 2-D model cools, Q_ideal,2D = Q_2D / η_2D, plus the side
 *     edges of a straight fin with cooled edges (added from fd-1d: the edges are the same 2 t(x) dx strips
 *     in both models, so their ideal heat is Q_ideal,1D(cooled) - Q_ideal,1D(insulated)).
 * A stubby tapered fin's sloped faces are much larger than its length: dividing the 2-D heat rate by the
 * thin-fin Q_ideal gave efficiencies up to 52.7.
 * Range: 0 < η <= 1 for a fin cooled by its faces and tip (h > 0, surroundings not hotter than the base).
 * The argument: the face flux q(T) is increasing in T for every surface law, so when q(T_b) has one sign
 * over the whole surface the fin's temperature lies between T_b and where q vanishes, every surface
 * exchanges less than it would at T_b, and Q / Q_ideal is in (0, 1]. That holds too when radiation from
 * surroundings hotter than the fin outweighs convection everywhere (q(T_b) < 0 on the whole surface: the fin
 * gains heat, Q and Q_ideal both flow into the base, and η is the efficiency of a fin that collects heat).
 * Exceptions, stated in the output:
 *   - infinite tip: the model's surface is infinite (the fin continues beyond L), so no efficiency exists:
 *     null with the reason (the textbook 1/(mL) of an infinite fin "of length L" exceeds 1 for mL < 1);
 *   - a surface that at the base temperature would lose heat on one part and gain it on another (hot
 *     surroundings outweigh convection only where h is low): Q_ideal is then a difference of gains and losses
 *     that bounds nothing (it can be near 0 or of the other sign than Q, e.g. η = -0.04), so no efficiency:
 *     null with the reason; compare heat rates instead;
 *   - prescribed tip temperature: heat can enter the fin through its tip (a tip held near or above the base
 *     temperature), so Q/Q_ideal can legitimately exceed 1: a note says so.
 */
import type { Case } from '../case/index.js';
import { baseTemperatureH } from './linear-surrogate.js';

export interface EfficiencyBasis {
  /** Q_ideal, W; null when the model's surface is infinite (no efficiency). */
  idealHeatRate: number | null;
  /** Which surface Q_ideal uses, in words. */
  surface: string;
  /** Why the efficiency is null or may exceed 1; null when it is an ordinary 0..1 efficiency. */
  note: string | null;
}

export const ONE_D_SURFACE = 'the thin-fin surface of the 1-D model (faces over the length, cooled side edges, a convective tip)';
export const TWO_D_SURFACE = 'the surface the 2-D model cools (true sloped faces, a convective tip; cooled side edges from fd-1d)';

export const INFINITE_TIP_NOTE =
  'no efficiency for an infinite tip: the fin continues beyond its length, so the surface at base temperature (the denominator) is infinite; compare heat rates instead';

export function tipTemperatureNote(c: Case): string | null {
  const tip = c.convection.tip;
  if (tip.kind !== 'temperature') return null;
  return `the tip is held at ${Number(tip.T_degC.toPrecision(6))} degC: heat can enter the fin through its tip, so the efficiency Q / Q_ideal can exceed 1 without error`;
}

/** Why a fin whose surface at the base temperature both loses and gains heat has no efficiency (null when it does not). */
export function mixedSurfaceNote(c: Case): string | null {
  const { least, largest } = baseTemperatureH(c);
  if (least < 0 && largest > 0) {
    return `no efficiency: at the base temperature part of the surface would lose heat and part would gain it (the surroundings at ${Number(c.convection.surroundings_degC.toPrecision(6))} degC radiate more into the fin than the fluid takes away where h is low), so the heat rate with every surface at the base temperature bounds nothing; compare heat rates instead`;
  }
  if (!(least < 0) && !(largest > 0))
    return 'no efficiency: at the base temperature no surface would exchange heat (the denominator is 0); compare heat rates instead';
  return null;
}

/** The note of a fin that gains heat over its whole surface at the base temperature (null otherwise). */
function collectorNote(c: Case): string | null {
  return baseTemperatureH(c).largest < 0
    ? 'the surroundings radiate more into the fin than the fluid takes away, so the fin gains heat: Q and Q_ideal both flow into the base and the efficiency is that of a fin collecting heat'
    : null;
}

/** The basis of a check's efficiencies from the reference model's ideal heat rate (W, or null for no finite surface). */
export function efficiencyBasis(c: Case, idealHeatRate: number | null, surface: string): EfficiencyBasis {
  if (c.convection.tip.kind === 'infinite' || idealHeatRate === null) return { idealHeatRate: null, surface, note: INFINITE_TIP_NOTE };
  const mixed = mixedSurfaceNote(c);
  if (mixed !== null) return { idealHeatRate: null, surface, note: mixed };
  const notes = [tipTemperatureNote(c), collectorNote(c)].filter((n): n is string => n !== null);
  return { idealHeatRate, surface, note: notes.length === 0 ? null : notes.join('; ') };
}

/** Q / Q_ideal, or null without a finite surface. */
export function efficiencyOf(heatRate: number, basis: EfficiencyBasis): number | null {
  return basis.idealHeatRate === null ? null : heatRate / basis.idealHeatRate;
}

/**
 * Shortcut rows above 1 on an ordinary fin: the shortcut's equivalent uniform fin (mean section, a corrected
 * length or a convecting tip of the mean thickness) has more cooled surface than this fin, e.g. a stubby
 * tapered fin whose sharp tip has no area. Returns the note to add, or null.
 */
export function overUnityNote(rows: readonly { model: string; efficiency: number | null }[]): string | null {
  const over = [...new Set(rows.filter((r) => r.efficiency !== null && r.efficiency > 1).map((r) => r.model))];
  if (over.length === 0) return null;
  return `${over.join(', ')} above 1: the equivalent uniform fin of ${over.length === 1 ? 'that shortcut' : 'those shortcuts'} (mean section, corrected length or convecting tip) has more cooled surface than this fin, so its heat rate exceeds this fin's ideal one`;
}

/** The reference's efficiency note with the over-unity note of the rows added. */
export function withRowsNote(note: string | null, rows: readonly { model: string; efficiency: number | null }[]): string | null {
  const extra = overUnityNote(rows);
  if (extra === null) return note;
  return note === null ? extra : `${note}; ${extra}`;
}
