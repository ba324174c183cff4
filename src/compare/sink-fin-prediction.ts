/**
 * What the uniform-base shortcut says about the temperature up a fin of the array: the exact 1-D fin
 * (overall-efficiency-exact-fin's fd-1d study of one fin, sink-models.ts) with its root at that model's one
 * uniform base temperature T_b. The study was solved at the root excess of its last pass, theta_s; a linear
 * fin's excess scales with its root excess, so
 *   T(x) = T_amb + (T_s(x) − T_amb) theta_b / theta_s,
 * exact for a linear fin and for a nonlinear one at convergence of the passes (theta_s = theta_b to 1e-9).
 * Positions in m from the root, temperatures in degC; null for a bare plate.
 */
import type { HeatSinkCase } from '../case/index.js';
import { alongFin } from '../fd/index.js';
import type { SinkShortcuts } from './sink-models.js';

export interface SinkFinPrediction {
  model: 'overall-efficiency-exact-fin';
  height_m: Float64Array;
  temperature_degC: Float64Array;
  /** The model's one base temperature, degC. */
  baseTemperature_degC: number;
  /** Heat of one fin at that base temperature, W (every fin the same). */
  heatRate_W: number;
}

export function sinkFinPrediction(c: HeatSinkCase, shortcuts: SinkShortcuts): SinkFinPrediction | null {
  const exact = shortcuts.exactFin;
  const model = shortcuts.models.find((m) => m.model === 'overall-efficiency-exact-fin');
  if (exact === null || model === undefined) return null;
  const ambient = c.convection.ambient_degC;
  const thetaStudy = exact.study.baseTemperature_degC - ambient;
  const scale = model.baseRise_K / thetaStudy;
  const along = alongFin(exact.study).temperature;
  return {
    model: 'overall-efficiency-exact-fin',
    height_m: Float64Array.from(along.x_m),
    temperature_degC: Float64Array.from(along.values, (T) => ambient + (T - ambient) * scale),
    baseTemperature_degC: ambient + model.baseRise_K,
    heatRate_W: exact.conductance_WperK * model.baseRise_K,
  };
}
