/**
 * The result of the fd-3d reference for a heat sink (heat-sink.md): what compare, plots and cli read. The
 * solver (src/fd/three-d) fills it; the array shortcuts (src/analytic) predict the same per-source rises.
 * Temperatures in degC, rises above ambient in K, heat in W, lengths in m.
 */
import type { RefinementStudy } from '../study/refinement.js';

export interface SinkSourceResult {
  name: string;
  power_W: number;
  /** Mean temperature over the source's footprint on the underside, including its contact resistance's drop. */
  meanTemperature_degC: number;
  /** Largest temperature over the footprint (same convention). */
  maxTemperature_degC: number;
  /** meanTemperature_degC − ambient, K: the quantity the shortcuts are judged on. */
  meanRise_K: number;
  /** Refinement study of meanRise_K (null for a single grid). */
  refinement: RefinementStudy | null;
  /** Estimated relative discretisation error of meanRise_K (the GCI); null for a single grid. */
  discretizationError: number | null;
}

export interface SinkFinResult {
  /** 0-based, x first then y (plate fins: left to right; pins: row by row). */
  index: number;
  /** Heat entering the fin from the plate, W. */
  heatRate_W: number;
  /** Mean temperature over the fin's root (where it meets the plate), degC. */
  rootTemperature_degC: number;
}

/** A plan view of the plate for charts: temperatures on a regular nx x ny raster, row-major in x. */
export interface SinkPlateView {
  nx: number;
  ny: number;
  /** Cell-centre coordinates, m. */
  x: Float64Array;
  y: Float64Array;
  /** Underside (z = 0) and top (z = plate thickness) temperatures, degC, index = j * nx + i. */
  underside_degC: Float64Array;
  top_degC: Float64Array;
}

/** Temperature up every fin (finest grid): the root (junction mean) at height 0, then each layer's centre. */
export interface SinkFinProfiles {
  /** Heights above the plate top, m: 0 (the root), then the layer centres. */
  height_m: Float64Array;
  /** Per fin (in the order of `fins`), the mean temperature over its section at each height, degC. */
  temperature_degC: Float64Array[];
}

export interface SinkStudy {
  model: 'fd-3d';
  sources: SinkSourceResult[];
  fins: SinkFinResult[];
  /** Heat put in by the sources, W. */
  totalHeat_W: number;
  /** Heat leaving the fins (faces and tips), W. */
  finsHeat_W: number;
  /** Heat leaving the exposed plate top and, if cooled, the underside, W. */
  plateHeat_W: number;
  /** |Q_in − Q_out| / Q_in on the finest grid (the largest over the grids of a study). */
  energyBalance: number;
  /** Area-weighted mean temperature of the plate's top (under the fins included), degC. */
  plateTopMean_degC: number;
  /** (T_source,max − T_ambient) / Q_total, K/W (finest grid). */
  sinkResistance_KperW: number;
  /** Unknowns of each grid of the study, finest first. */
  unknowns: number[];
  /** How the fins are represented (e.g. 'each fin a 2-D conducting sheet coupled to the plate'), for notes. */
  finModel: string;
  /** Plan view of the plate on the finest grid. */
  plate: SinkPlateView;
  /**
   * Estimated relative discretisation error (Celik et al. 2008 GCI over the study's grids) of the other reported
   * quantities: each source's maximum rise, the plate top's mean rise, each fin's heat, the sink resistance;
   * null for a single grid (or fewer than three).
   */
  errors: { sourceMaxRise: (number | null)[]; plateTopMeanRise: number | null; finHeat: (number | null)[]; sinkResistance: number | null };
  /** Temperature up each fin on the finest grid; null for a bare plate. */
  finProfiles: SinkFinProfiles | null;
  /** Iterative solver statistics of the finest grid. */
  solver: { method: string; iterations: number; relativeResidual: number };
}
