/** Turns model heat rates into the rows of the check table: efficiency, effectiveness, drift, verdict. */
import { efficiencyOf, type EfficiencyBasis } from './efficiency-basis.js';
import { effectivenessOf, type EffectivenessBasis } from './effectiveness-basis.js';
import type { ShortcutValue } from './shortcuts.js';
import { verdictOf, type AssumptionRow, type ModelResult, type ReferenceResult } from './types.js';

export const SHORTCUT_ACCURACY = 'closed form: exact for its own assumptions (round-off); its error here is the drift';

export type ModelInput = ShortcutValue & { accuracy: string; guess?: 'base' | 'mean'; guessValues?: ModelResult['guessValues'] };

export function shortcutInputs(
  values: ShortcutValue[],
  guess?: { guess: 'base' | 'mean'; guessValues: NonNullable<ModelResult['guessValues']> },
): ModelInput[] {
  return values.map((v) => ({ ...v, accuracy: SHORTCUT_ACCURACY, ...(guess ?? {}) }));
}

/**
 * basis: Q with every cooled surface at the base temperature (the efficiency denominator of every row), W;
 * effectiveness: the bare base's heat at the base temperature (the effectiveness denominator of every row).
 */
export function modelRows(
  inputs: (Omit<ModelInput, 'model'> & { model: ModelResult['model'] })[],
  reference: ReferenceResult,
  basis: EfficiencyBasis,
  effectiveness: EffectivenessBasis,
  tolerance: number,
): ModelResult[] {
  return inputs.map((v) => {
    const drift = (v.heatRate_W - reference.heatRate_W) / reference.heatRate_W;
    return {
      model: v.model,
      heatRate_W: v.heatRate_W,
      efficiency: efficiencyOf(v.heatRate_W, basis),
      effectiveness: effectivenessOf(v.heatRate_W, effectiveness),
      drift,
      verdict: verdictOf(drift, tolerance, reference.resolved),
      formulaEfficiency: v.formulaEfficiency,
      m_per_m: v.m_per_m,
      length_m: v.length_m,
      basis: v.basis,
      accuracy: v.accuracy,
      ...(v.guess ? { guess: v.guess } : {}),
      ...(v.guessValues ? { guessValues: v.guessValues } : {}),
    };
  });
}

/** Ledger rows name only the models the check actually reports (a not-applicable shortcut makes no assumption here). */
export function madeByReported(rows: AssumptionRow[], models: ModelResult[]): AssumptionRow[] {
  const present = new Set<string>(models.map((m) => m.model));
  return rows.map((r) => ({ ...r, madeBy: r.madeBy.filter((id) => present.has(id)) }));
}
