/**
 * `solve` on a heat sink: the fd-3d study alone (studySink: three nested grids, ratio 2) as plain data, the JSON of
 * `solve --json` for a heat-sink case. Every temperature and heat rate carries its estimated relative
 * discretisation error (the Celik et al. 2008 GCI over the study's grids, relative to the rise above ambient or to
 * the heat rate), null on a single grid. Temperatures degC, heat W, resistance K/W.
 */
import type { HeatSinkCase } from '../case/index.js';
import type { SinkStudy } from '../fd/index.js';
import { CAUTIONS } from './cautions.js';
import { sinkCautions } from './sink-flags.js';

export interface SinkSolveSource {
  name: string;
  power_W: number;
  meanTemperature_degC: number;
  /** GCI of the mean rise above ambient, relative. */
  meanDiscretizationError: number | null;
  /** Observed order of the mean rise over the three grids (null when it cannot be determined). */
  observedOrder: number | null;
  maxTemperature_degC: number;
  /** GCI of the maximum rise above ambient, relative. */
  maxDiscretizationError: number | null;
}

export interface SinkSolveFin {
  /** 0-based, as in `check --json`'s `fins` (plate fins left to right in x; pins row by row). */
  index: number;
  heatRate_W: number;
  heatRateDiscretizationError: number | null;
  rootTemperature_degC: number;
}

export interface SinkSolveReport {
  case: string;
  kind: 'heat-sink';
  model: 'fd-3d';
  /** How the fins are represented. */
  finModel: string;
  /** Unknowns of each grid, finest first. */
  unknowns: number[];
  sources: SinkSolveSource[];
  fins: SinkSolveFin[];
  /** Area-weighted mean temperature of the plate's top face (under the fins: the root junction), degC. */
  plateTopMeanTemperature_degC: number;
  plateTopMeanDiscretizationError: number | null;
  /** (T_source,max − T_ambient) / Q_total, K/W. */
  sinkResistance_KperW: number;
  sinkResistanceDiscretizationError: number | null;
  totalHeat_W: number;
  /** Heat leaving the fins' faces and tips, and the plate's exposed top (and cooled underside), W. */
  finsHeat_W: number;
  plateHeat_W: number;
  /** |Q_sources − Q_surfaces| / Q_sources, the largest over the grids. */
  energyBalance: number;
  solver: { method: string; iterations: number; relativeResidual: number };
  cautions: string[];
}

export function sinkSolveReport(c: HeatSinkCase, study: SinkStudy): SinkSolveReport {
  return {
    case: c.name,
    kind: 'heat-sink',
    model: 'fd-3d',
    finModel: study.finModel,
    unknowns: study.unknowns,
    sources: study.sources.map((s, j) => ({
      name: s.name,
      power_W: s.power_W,
      meanTemperature_degC: s.meanTemperature_degC,
      meanDiscretizationError: s.discretizationError,
      observedOrder: s.refinement?.observedOrder ?? null,
      maxTemperature_degC: s.maxTemperature_degC,
      maxDiscretizationError: study.errors.sourceMaxRise[j] ?? null,
    })),
    fins: study.fins.map((f, k) => ({
      index: f.index,
      heatRate_W: f.heatRate_W,
      heatRateDiscretizationError: study.errors.finHeat[k] ?? null,
      rootTemperature_degC: f.rootTemperature_degC,
    })),
    plateTopMeanTemperature_degC: study.plateTopMean_degC,
    plateTopMeanDiscretizationError: study.errors.plateTopMeanRise,
    sinkResistance_KperW: study.sinkResistance_KperW,
    sinkResistanceDiscretizationError: study.errors.sinkResistance,
    totalHeat_W: study.totalHeat_W,
    finsHeat_W: study.finsHeat_W,
    plateHeat_W: study.plateHeat_W,
    energyBalance: study.energyBalance,
    solver: study.solver,
    cautions: sinkCautions(CAUTIONS),
  };
}
