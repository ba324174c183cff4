/**
 * The normalised heat-sink case (../shared/design/heat-sink.md, format 1): identical fins standing on a
 * rectangular plate, heated by isoflux sources on the plate's underside. What every layer after parsing sees.
 *
 * Axes: x across the plate (plate.width, across plate fins), y along it (plate.length, along plate fins), z up
 * through the plate (underside z = 0, finned top z = plate.thickness), fins rising from the top in +z.
 * Units as in types.ts: SI lengths (m), W, W/(m*K), W/(m^2*K), m^2*K/W; absolute temperatures in degC with the
 * suffix `_degC`.
 */
import type { DisplayUnits } from './display-units.js';
import type { CaseWarning, HDistribution, InputUncertainty, Material, Profile, TipCondition } from './types.js';

/** Fin profiles an array may use: the straight ones (running the whole plate length) and the pins. */
export type ArrayFinProfile = Exclude<Profile, { kind: 'annular' }>;

/**
 * The fin layout on the plate's top.
 * - `plates`: `count` straight fins across x, centre-to-centre `pitch`, the group centred on the plate; each runs
 *   the plate's whole length in y (its `width` is plate.length). `count` 0 is a bare plate.
 * - `pins`: `rows` along y by `columns` across x, centre-to-centre pitch [x, y], centred on the plate;
 *   `staggered` shifts every second row by half the x pitch.
 */
export type FinArray =
  | { kind: 'plates'; count: number; pitch: number }
  | { kind: 'pins'; rows: number; columns: number; pitch: readonly [number, number]; pattern: 'inline' | 'staggered' };

export interface Plate {
  /** Extent in x, m. */
  width: number;
  /** Extent in y, m. */
  length: number;
  /** Extent in z, m. */
  thickness: number;
  /** The plate's material (the fins' material unless `plate.material` was given). */
  material: Material;
}

export interface HeatSource {
  /** As given, or `source i` (0-based i). */
  name: string;
  /** Heat input, W, spread uniformly over the source's area (isoflux). */
  power: number;
  /** Centre of the footprint on the underside, [x, y] in m. */
  centre: readonly [number, number];
  /** Extent [x, y] in m. */
  size: readonly [number, number];
  /** Interface resistance per unit of source area, m^2*K/W; 0 when absent. */
  contactResistance: number;
  /** Temperature the source must stay below, degC (`sources[i].limit`), or null. */
  limit_degC: number | null;
}

export interface SinkConvection {
  ambient_degC: number;
  /** On the fins' faces: every form of the single-fin format (the power law's reference theta is the fins' mean root rise). */
  h: HDistribution;
  /** On the fins' tips. */
  tip: TipCondition;
  /** On the exposed top of the plate between fins, W/(m^2*K) (default: h's value at the fin root). */
  plate: number;
  /** On the underside outside the sources, W/(m^2*K); null = adiabatic. */
  underside: number | null;
}

export interface HeatSinkCase {
  kind: 'heat-sink';
  /** One line of at most 120 characters, without control characters. */
  name: string;
  /** One fin of the array; null for a bare plate (`array.count: 0`). */
  fin: { profile: ArrayFinProfile; material: Material } | null;
  array: FinArray;
  plate: Plate;
  sources: readonly HeatSource[];
  convection: SinkConvection;
  warnings?: readonly CaseWarning[];
  /** Standard uncertainties of inputs (sink-numeric-inputs.ts keys), relative; absent in cases built in code (default h 25 %). */
  uncertainty?: readonly InputUncertainty[];
  /** The units to show numbers in: the case's `display` key over what its inputs suggest (absent: the default, mm and SI). */
  display?: DisplayUnits;
}
