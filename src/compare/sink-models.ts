/**
 * The array shortcuts of a heat sink (heat-sink.md), each predicting every source's mean temperature rise (K):
 *
 *   overall-efficiency            one uniform base temperature theta_b = Q / (N h eta_f A_f + h_plate A_exposed), the
 *                                 textbook fin efficiency eta_f = tanh(mLc)/(mLc) on the equivalent uniform fin
 *                                 (thin-fin habits: P = 2w, Lc = L + t/2; pins P = pi D, Lc = L + D/4; Lc = L for an
 *                                 adiabatic tip), plus 1-D conduction through the plate under the sources' total area
 *                                 and each source's interface drop (analytic/overall-efficiency.ts)
 *   overall-efficiency-exact-fin  the same with the exact 1-D heat of the actual fin (profile, h form, tip, k(T)):
 *                                 the fd-1d study of one fin (src/fd studyFin), so it isolates the uniform-base
 *                                 assumption from the fin-efficiency shortcut
 *   spreading-series              the plate with the finned face as a uniform h_eff = (N G_f + h_plate A_exposed) /
 *                                 (a b), G_f the exact 1-D fin conductance, sources by superposition
 *                                 (Muzychka, Culham & Yovanovich 2003; analytic/spreading-series.ts)
 *
 * With a conductivity table or a power-law h, the hand calculations take one k and one h: k at the base
 * temperature they predict, h at the root (the power law's base value); the exact-fin model iterates its base
 * temperature with the nonlinear fin (at most 30 passes, to 1e-9 relative). No shortcut sees an underside h.
 */
import { spreadingSeries, tanhEfficiency, uniformBaseSink, type UniformBaseResult } from '../analytic/index.js';
import type { HeatSinkCase, HDistribution } from '../case/index.js';
import { finProblem, isLinearProblem, studyFin, type FinStudy, type LinearFinCase } from '../fd/index.js';
import { finGeometry } from '../mesh/index.js';
import { equivalentUniformFin } from './equivalent.js';
import { conductivityAt, materialAt, sinkFinCase } from './sink-fin-case.js';
import { exposedPlateArea, finCount, isPin, sourceArea, totalPower } from './sink-geometry.js';

export type SinkShortcutId = 'overall-efficiency' | 'overall-efficiency-exact-fin' | 'spreading-series';
export const SINK_SHORTCUT_IDS: readonly SinkShortcutId[] = ['overall-efficiency', 'overall-efficiency-exact-fin', 'spreading-series'];

export interface SinkShortcutResult {
  model: SinkShortcutId;
  /** Mean rise of each source above ambient, K, in the order of the case's sources. */
  sourceRise_K: number[];
  /** The largest predicted source rise over the total power, K/W (the shortcuts predict means, not maxima). */
  sinkResistance_KperW: number;
  /** The model's overall surface efficiency: G / G_ideal (every surface at the base temperature). */
  overallEfficiency: number;
  /** The model's fin efficiency (null for a bare plate). */
  finEfficiency: number | null;
  /** Heat of one fin, W, at the model's base rise (null for a bare plate or the spreading series). */
  finHeatRate_W: number | null;
  /** The one base rise of a uniform-base model, K; the plate-mean rise A0 of the spreading series. */
  baseRise_K: number;
  /** Estimated relative error of the rises as a solution of the model's own equations. */
  relativeError: number;
  /** That accuracy in words. */
  accuracy: string;
  /** What the model assumes, in one line. */
  basis: string;
}

export interface SinkShortcuts {
  models: SinkShortcutResult[];
  /** The exact-fin model with the exposed plate at the fins' mean h (one h everywhere, the textbook habit). */
  singleH: { sourceRise_K: number[]; h_W_per_m2K: number } | null;
  /** One fin's exact 1-D conductance at the root, W/K, and the study that gave it (null for a bare plate). */
  exactFin: { conductance_WperK: number; efficiency: number; study: FinStudy } | null;
}

const MAX_PASSES = 30;
const PASS_TOLERANCE = 1e-9;

/** The h of a hand calculation: a power law at its base value (the root), every other form as given. */
function handH(h: HDistribution): Exclude<HDistribution, { kind: 'power' }> {
  return h.kind === 'power' ? { kind: 'uniform', h: h.base } : h;
}

interface Textbook {
  conductance: number;
  idealConductance: number;
  efficiency: number;
  hMean: number;
  basis: string;
}

/** tanh(mLc)/(mLc) on the equivalent uniform fin (thin-fin habits), per kelvin of root excess. */
function textbookFin(c: HeatSinkCase, thetaRoot: number): Textbook | null {
  const fin = sinkFinCase(c, thetaRoot);
  if (fin === null) return null;
  const linear: LinearFinCase = {
    ...fin,
    material: materialAt(fin.material, c.convection.ambient_degC + thetaRoot),
    convection: { ...fin.convection, h: handH(fin.convection.h), emissivity: 0 },
  };
  const eq = equivalentUniformFin(linear, finGeometry(linear));
  const pin = c.fin !== null && isPin(c.fin.profile);
  const convective = c.convection.tip.kind === 'convective';
  const Lc = eq.length + (convective ? (pin ? eq.size / 4 : eq.size / 2) : 0);
  const m = Math.sqrt((eq.h * eq.Pthin) / (eq.k * eq.A));
  const efficiency = tanhEfficiency(m * Lc);
  const area = eq.Pthin * Lc;
  const habits = pin ? 'P = pi D, Lc = L + D/4' : 'P = 2w, Lc = L + t/2';
  return {
    conductance: eq.h * efficiency * area,
    idealConductance: eq.h * area,
    efficiency,
    hMean: eq.h,
    basis: `eta_f = tanh(mLc)/(mLc) (${convective ? habits : 'adiabatic tip, Lc = L'}, mean section and mean h)`,
  };
}

function uniformBase(c: HeatSinkCase, finConductance: number, idealFinConductance: number, hPlate: number, kPlate: number): UniformBaseResult {
  return uniformBaseSink({
    sources: c.sources.map((s) => ({ power: s.power, area: sourceArea(s), contactResistance: s.contactResistance })),
    finCount: finCount(c),
    finConductance,
    // eta_o = G / G_ideal: the fin's "h A_f" is its ideal conductance; hFin = 1 makes finArea carry it.
    finArea: idealFinConductance,
    hFin: 1,
    exposedArea: exposedPlateArea(c),
    hPlate,
    plateThickness: c.plate.thickness,
    plateConductivity: kPlate,
  });
}

/** eta_o = G / G_ideal of a uniform-base result (uniformBaseSink gives G / (hFin A_t) with hFin = 1 and the fin's ideal conductance as A_f). */
function overallEfficiencyOf(c: HeatSinkCase, r: UniformBaseResult, idealFinConductance: number): number {
  const ideal = finCount(c) * idealFinConductance + c.convection.plate * exposedPlateArea(c);
  return ideal > 0 ? r.conductance_WperK / ideal : 1;
}

function row(
  c: HeatSinkCase,
  model: SinkShortcutId,
  rise: number[],
  rest: Omit<SinkShortcutResult, 'model' | 'sourceRise_K' | 'sinkResistance_KperW'>,
): SinkShortcutResult {
  return { model, sourceRise_K: rise, sinkResistance_KperW: Math.max(...rise) / totalPower(c), ...rest };
}

/** The three array shortcuts for a heat-sink case. */
export async function sinkShortcuts(c: HeatSinkCase): Promise<SinkShortcuts> {
  const Q = totalPower(c);
  const ambient = c.convection.ambient_degC;
  const hPlate = c.convection.plate;
  const models: SinkShortcutResult[] = [];

  // ---- overall-efficiency: textbook fin, one base temperature (k and the fin at that temperature: two passes) ----
  const bare = c.fin === null;
  let theta = Q / Math.max(hPlate * exposedPlateArea(c), 1e-300);
  let textbook: Textbook | null = null;
  let oe: UniformBaseResult | null = null;
  for (let pass = 0; pass < 2; pass++) {
    textbook = textbookFin(c, theta);
    oe = uniformBase(c, textbook?.conductance ?? 0, textbook?.idealConductance ?? 0, hPlate, conductivityAt(c.plate.material.k, ambient + theta));
    theta = oe.baseRise_K;
  }
  if (oe === null) throw new Error('sinkShortcuts: no pass ran');
  const plateWords = `plate 1-D under the sources' ${c.sources.length > 1 ? 'total ' : ''}area`;
  models.push(
    row(c, 'overall-efficiency', oe.sourceRise_K, {
      overallEfficiency: overallEfficiencyOf(c, oe, textbook?.idealConductance ?? 0),
      finEfficiency: textbook?.efficiency ?? null,
      finHeatRate_W: textbook === null ? null : textbook.conductance * oe.baseRise_K,
      baseRise_K: oe.baseRise_K,
      relativeError: 0,
      accuracy: 'closed form: exact for its own assumptions',
      basis: `one uniform base temperature, ${textbook?.basis ?? 'bare plate'}, ${plateWords}`,
    }),
  );

  // ---- overall-efficiency-exact-fin: the fd-1d fin, iterated with its base temperature when it is nonlinear ----
  let exactFin: SinkShortcuts['exactFin'] = null;
  let exact = oe;
  let exactIdeal = 0;
  let kPlate = conductivityAt(c.plate.material.k, ambient + oe.baseRise_K);
  if (!bare) {
    theta = oe.baseRise_K;
    for (let pass = 0; pass < MAX_PASSES; pass++) {
      const fin = sinkFinCase(c, theta);
      if (fin === null) break;
      const problem = finProblem(fin);
      const study = await studyFin(problem, { model: '1d' });
      if (study.model !== 'fd-1d') throw new Error('sinkShortcuts: the fin study is not 1-D');
      const conductance = study.heatRate_W / theta;
      exactIdeal = study.idealHeatRate_W / theta;
      kPlate = conductivityAt(c.plate.material.k, ambient + theta);
      exact = uniformBase(c, conductance, exactIdeal, hPlate, kPlate);
      exactFin = { conductance_WperK: conductance, efficiency: study.efficiency ?? conductance / exactIdeal, study };
      const change = Math.abs(exact.baseRise_K - theta);
      theta = exact.baseRise_K;
      if (isLinearProblem(problem) || change <= PASS_TOLERANCE * theta) break;
    }
  }
  const finError = exactFin?.study.discretizationError ?? 0;
  const finAccuracy =
    exactFin === null
      ? 'closed form: exact for its own assumptions'
      : `fd-1d fin study: estimated error ${finError.toExponential(1)} of the fin heat (GCI)`;
  models.push(
    row(c, 'overall-efficiency-exact-fin', exact.sourceRise_K, {
      overallEfficiency: overallEfficiencyOf(c, exact, exactIdeal),
      finEfficiency: exactFin?.efficiency ?? null,
      finHeatRate_W: exactFin === null ? null : exactFin.conductance_WperK * exact.baseRise_K,
      baseRise_K: exact.baseRise_K,
      relativeError: finError,
      accuracy: finAccuracy,
      basis: `one uniform base temperature, the exact 1-D fin (actual profile, h and tip), ${plateWords}`,
    }),
  );

  // ---- spreading-series: the finned face as one h_eff ----
  const plateArea = c.plate.width * c.plate.length;
  const hEff = (finCount(c) * (exactFin?.conductance_WperK ?? 0) + hPlate * exposedPlateArea(c)) / plateArea;
  const series = spreadingSeries({
    plate: { width: c.plate.width, length: c.plate.length, thickness: c.plate.thickness, conductivity: kPlate },
    h: hEff,
    sources: c.sources.map((s) => ({ centre: s.centre, size: s.size, power: s.power, contactResistance: s.contactResistance })),
  });
  const seriesError = Math.max(...series.truncationBound_K.map((b, j) => b / Math.max(series.sourceRise_K[j] ?? 0, 1e-300)));
  models.push(
    row(c, 'spreading-series', series.sourceRise_K, {
      overallEfficiency: overallEfficiencyOf(c, exact, exactIdeal),
      finEfficiency: exactFin?.efficiency ?? null,
      finHeatRate_W: null,
      baseRise_K: series.plateMeanRise_K,
      relativeError: seriesError + finError,
      accuracy: `series of ${series.terms[0]} x ${series.terms[1]} terms: truncation at most ${seriesError.toExponential(1)} of the rise${exactFin === null ? '' : `; fin heat from fd-1d (estimated error ${finError.toExponential(1)})`}`,
      basis:
        exactFin === null
          ? `plate spreading (Muzychka, Culham & Yovanovich 2003), the top at h_plate = ${hEff.toPrecision(4)} W/(m^2*K)`
          : `plate spreading (Muzychka, Culham & Yovanovich 2003), finned face as a uniform h_eff = ${hEff.toPrecision(4)} W/(m^2*K) with the exact 1-D fin`,
    }),
  );

  const singleH =
    bare || textbook === null
      ? null
      : { sourceRise_K: uniformBase(c, exactFin?.conductance_WperK ?? 0, exactIdeal, textbook.hMean, kPlate).sourceRise_K, h_W_per_m2K: textbook.hMean };
  return { models, singleH, exactFin };
}
