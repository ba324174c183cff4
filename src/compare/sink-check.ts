/**
 * The check of a heat sink (heat-sink.md): the array shortcuts (sink-models.ts) against the fd-3d reference, on
 * each source's mean temperature rise above ambient. drift_j = (rise_model,j - rise_ref,j) / rise_ref,j; the worst
 * source (largest |drift|) decides the verdict against the tolerance (ok, marginal up to twice, unsafe beyond);
 * no verdict (`unresolved`) while any source's GCI is above a tenth of the tolerance (resolved-reference.ts), nor
 * for a model whose own error estimate (the series' truncation bound, the fin study's GCI) is.
 *
 * The reference is an argument: a SinkStudy, or a function that computes one (src/fd studySink), so the check
 * can be tested with a hand-built study.
 */
import type { HeatSinkCase } from '../case/index.js';
import { sameSinkGrid, startSinkLanes, type SinkLanes, type SinkLanesOptions, type SinkRiseSlopes, type SinkStudy } from '../fd/index.js';
import { CAUTIONS } from './cautions.js';
import { resolutionTarget } from './resolved-reference.js';
import { sinkCautions, sinkFlags } from './sink-flags.js';
import { exposedPlateArea, finCount } from './sink-geometry.js';
import { sinkLedger } from './sink-ledger.js';
import { SHEET_CELLS_STUDY, sheetReductionRow, sheetRowMeasures } from './sink-sheet-row.js';
import { sinkShortcuts, type SinkShortcutResult, type SinkShortcuts } from './sink-models.js';
import type { SinkCheckReport, SinkModelRow, SinkReferenceResult } from './sink-types.js';
import { verdictOf } from './types.js';
import { hottestSource, sinkRowsWithBand, sinkSensitivity, sinkSlopeTask, sinkSlopeTaskOn, type SinkSlopeTask } from './sink-sensitivity.js';
import type { SinkStudyAhead } from './sink-resolve.js';
import { DEFAULT_SAMPLE_SEED, DEFAULT_SAMPLE_SIZE, type SampleWhen } from './uncertainty-band.js';

export interface SinkCheckOptions {
  /** Relative tolerance on each source's mean rise (e.g. 0.02). */
  tolerance: number;
  /** Compute the sensitivities and the band (default true; needs a study with its finest grid, as studySink gives). */
  sensitivities?: boolean;
  /**
   * Measure the reference's sheet reduction against full 3-D fin cells for the ledger (sink-sheet-row.ts: one more
   * study). Default true; false leaves that row unmeasured (map points, which show no ledger).
   */
  sheetDrift?: boolean;
  /** When the band is confirmed by a Latin-hypercube sample (default auto), its size (200) and seed (1): sink-sensitivity.ts. */
  sample?: SampleWhen;
  sampleSize?: number;
  sampleSeed?: number;
  /** How the fd-3d work is spread over threads (src/fd sink-lanes.ts; default: a worker thread when a core is free). */
  lanes?: SinkLanesOptions;
}

/**
 * The reference: a study, or a function that makes one, given the check's two lanes (src/fd sink-lanes.ts) to
 * run its fd-3d work on (resolveSinkStudyOn uses them; a function may ignore them).
 */
export type SinkReferenceSource = SinkStudy | ((c: HeatSinkCase, lanes: SinkLanes, ahead: SinkStudyAhead) => SinkStudy | Promise<SinkStudy>);

/** Runs the array shortcuts and judges them against the reference. */
export async function runSinkCheck(c: HeatSinkCase, reference: SinkReferenceSource, options: SinkCheckOptions): Promise<SinkCheckReport> {
  return (await runSinkCheckWith(c, reference, options)).report;
}

/** The check and what it was computed from (the reference study and the shortcuts), for charts and reports. */
export interface SinkCheckRun {
  report: SinkCheckReport;
  study: SinkStudy;
  shortcuts: SinkShortcuts;
}

/**
 * The fd-3d work runs on two lanes (src/fd sink-lanes.ts: this thread and a worker thread): the sheet row's cells
 * study starts on the other lane first, since it needs nothing but the case; the reference (resolveSinkStudyOn)
 * takes this one and, for a further study, both; the sensitivities run where the reference's second-finest grid
 * is kept, before the check waits for the cells study. The numbers are those of the same steps on one thread.
 */
export async function runSinkCheckWith(c: HeatSinkCase, reference: SinkReferenceSource, options: SinkCheckOptions): Promise<SinkCheckRun> {
  const lanes = startSinkLanes(c, options.lanes);
  try {
    const cellsStudy =
      options.sheetDrift !== false && sheetRowMeasures(c) ? lanes.run('there', { kind: 'study', options: SHEET_CELLS_STUDY, keep: false }) : null;
    // Awaited below; until then a failure is held, not reported as unhandled while the reference is solved.
    void cellsStudy?.catch(() => undefined);
    // Sensitivities queued on a further study's kept grid while its finest grid is solved (used if that study is chosen).
    const early: { task: SinkSlopeTask; slopes: Promise<SinkRiseSlopes> }[] = [];
    const ahead: SinkStudyAhead = (kept, provisional) => {
      if (options.sensitivities === false) return;
      const task = sinkSlopeTaskOn(c, kept.spec, hottestSource(provisional));
      const slopes = lanes.run(kept.lane, { kind: 'slopes', ...task });
      void slopes.catch(() => undefined);
      early.push({ task, slopes });
    };
    const study = typeof reference === 'function' ? await reference(c, lanes, ahead) : reference;
    // The slopes first: on this lane they run at once, while the other lane may still be solving the cells study.
    const task = options.sensitivities === false ? null : sinkSlopeTask(c, study);
    const queued = task === null ? undefined : early.find((e) => sameSinkGrid(e.task.spec, task.spec) && e.task.source === task.source);
    const slopesRun = task === null ? undefined : (queued?.slopes ?? lanes.run(lanes.holder(task.spec), { kind: 'slopes', ...task }));
    void slopesRun?.catch(() => undefined);
    const shortcuts = await sinkShortcuts(c);
    const base = sinkCheckFrom(c, study, shortcuts, options);
    const sheet = options.sheetDrift === false ? null : sheetReductionRow(c, study, cellsStudy === null ? undefined : await cellsStudy);
    const withSheet = sheet === null ? base : { ...base, assumptions: [...base.assumptions, sheet] };
    const slopes = slopesRun === undefined ? undefined : await slopesRun;
    const sensitivity =
      options.sensitivities === false
        ? null
        : sinkSensitivity(
            c,
            study,
            {
              when: options.sample ?? 'auto',
              n: options.sampleSize ?? DEFAULT_SAMPLE_SIZE,
              seed: options.sampleSeed ?? DEFAULT_SAMPLE_SEED,
            },
            slopes,
          );
    const report =
      sensitivity === null ? withSheet : { ...withSheet, models: sinkRowsWithBand(withSheet.models, sensitivity.uncertainty), ...sensitivity };
    return { report, study, shortcuts };
  } finally {
    await lanes.close();
  }
}

/** The reference's per-source rises and whether it is resolved enough to judge on. */
export function judgeSinkReference(study: SinkStudy, tolerance: number): SinkReferenceResult {
  const target = resolutionTarget(tolerance);
  const errors = study.sources.map((s) => s.discretizationError);
  const known = errors.every((e): e is number => e !== null && Number.isFinite(e));
  const worst = known ? Math.max(...errors) : null;
  const resolved = worst !== null && worst <= target;
  const grids = study.unknowns.length;
  const words = resolved
    ? `estimated error at most ${worst.toExponential(1)} of each source's rise (GCI over ${grids} grids)`
    : worst === null
      ? "NOT RESOLVED: no error estimate (a single grid): verdicts are 'unresolved'"
      : `NOT RESOLVED: estimated error ${worst.toExponential(1)} > ${target.toExponential(1)} (a tenth of the tolerance): verdicts are 'unresolved'`;
  return {
    model: 'fd-3d',
    sourceRise_K: study.sources.map((s) => s.meanRise_K),
    sourceDiscretizationError: errors,
    discretizationError: worst,
    energyBalance: study.energyBalance,
    resolved,
    target,
    unknowns: study.unknowns,
    finModel: study.finModel,
    note: `fd-3d: ${study.finModel}; ${words}`,
  };
}

function modelRow(c: HeatSinkCase, m: SinkShortcutResult, ref: SinkReferenceResult, tolerance: number): SinkModelRow {
  const sourceDrift = m.sourceRise_K.map((rise, j) => (rise - (ref.sourceRise_K[j] ?? NaN)) / (ref.sourceRise_K[j] ?? NaN));
  let worst = 0;
  sourceDrift.forEach((d, j) => {
    if (Math.abs(d) > Math.abs(sourceDrift[worst] ?? 0)) worst = j;
  });
  const drift = sourceDrift[worst] ?? NaN;
  return {
    model: m.model,
    sourceRise_K: m.sourceRise_K,
    sourceDrift,
    drift,
    worstSource: c.sources[worst]?.name ?? `source ${worst}`,
    // A model whose own solution is not accurate to a tenth of the tolerance (a truncated series) is not judged either.
    verdict: verdictOf(drift, tolerance, ref.resolved && m.relativeError <= ref.target),
    sinkResistance_KperW: m.sinkResistance_KperW,
    overallEfficiency: m.overallEfficiency,
    finEfficiency: m.finEfficiency,
    basis: m.basis,
    accuracy: m.accuracy,
  };
}

/** The check report from a reference study and the shortcuts already computed. */
export function sinkCheckFrom(c: HeatSinkCase, study: SinkStudy, shortcuts: SinkShortcuts, options: SinkCheckOptions): SinkCheckReport {
  if (study.sources.length !== c.sources.length) {
    throw new Error(`sinkCheckFrom: the reference has ${study.sources.length} sources, the case ${c.sources.length}`);
  }
  const reference = judgeSinkReference(study, options.tolerance);
  const ambient = c.convection.ambient_degC;
  const idealFin = shortcuts.exactFin === null ? 0 : shortcuts.exactFin.conductance_WperK / shortcuts.exactFin.efficiency;
  const idealConductance = finCount(c) * idealFin + c.convection.plate * exposedPlateArea(c);
  const topRise = study.plateTopMean_degC - ambient;
  return {
    case: c.name,
    kind: 'heat-sink',
    tolerance: options.tolerance,
    reference,
    sources: study.sources.map((s, j) => {
      const limit = c.sources[j]?.limit_degC ?? null;
      return {
        name: s.name,
        power_W: s.power_W,
        meanTemperature_degC: s.meanTemperature_degC,
        maxTemperature_degC: s.maxTemperature_degC,
        meanRise_K: s.meanRise_K,
        discretizationError: s.discretizationError,
        limit_degC: limit,
        margin_K: limit === null ? null : limit - s.maxTemperature_degC,
      };
    }),
    sinkResistance_KperW: study.sinkResistance_KperW,
    overallEfficiency: idealConductance > 0 && topRise > 0 ? study.totalHeat_W / (idealConductance * topRise) : Number.NaN,
    fins: study.fins.map((f) => ({ index: f.index, heatRate_W: f.heatRate_W, rootTemperature_degC: f.rootTemperature_degC })),
    models: shortcuts.models.map((m) => modelRow(c, m, reference, options.tolerance)),
    assumptions: sinkLedger(c, study, shortcuts),
    flags: sinkFlags(c, study, reference),
    cautions: sinkCautions(CAUTIONS),
  };
}
