/**
 * Design flags of `fincheck check`: conditions a thermal engineer wants pointed out, each with the
 * value that triggered it and the basis of the threshold.
 */
import { estimateOneDError } from './one-d-error.js';
import type { Flag } from './types.js';

export interface FlagInputs {
  family: 'straight' | 'pin' | 'annular';
  /** Biot number across the thickness at the base: h (t/2) / k, or h (D/2) / k for pins; null where the single h is negative. */
  biot: number | null;
  /** m L of the equivalent uniform fin (mean section, mean h); null where the single h is negative. */
  mL: number | null;
  /** Effectiveness of the fin from the reference solution; null where the bare base would exchange no heat. */
  effectiveness: number | null;
  /** h A / (k P) at the base: a fin of any length helps only when this is below 1. */
  hAoverkP: number;
  tolerance: number;
  /** The reference's refinement study. */
  discretizationError: number;
  converged: boolean;
  energyBalance: number;
  /** Measured 1-D conduction drift (fd-1d vs fd-2d) when the 2-D model ran; null otherwise. */
  measuredOneDDrift: number | null;
}

/** Thresholds of the text-book rules of thumb; each carries its basis in the message. */
const EFFECTIVENESS_MIN = 2; // Incropera et al., Fundamentals of Heat and Mass Transfer, sec. 3.6 (from memory)
const ML_LONG = 2.65; // tanh(2.65) = 0.990: 99 % of the infinite-fin heat (Incropera et al., from memory)
const BIOT_RULE = 0.1; // common practice (borrowed from the lumped-capacitance rule), no fin-specific source

export function designFlags(f: FlagInputs): Flag[] {
  const flags: Flag[] = [];
  const pct = (x: number): string => `${(100 * x).toFixed(x < 0.01 ? 2 : 1)} %`;

  // Without Bi and mL (a negative single h) there is no table estimate; a measured 1-D drift still counts.
  const est = f.biot === null || f.mL === null ? null : estimateOneDError(f.family, f.biot, f.mL);
  const biotName = f.family === 'pin' ? 'Bi = h(D/2)/k' : 'Bi = h(t/2)/k';
  const oneDError = f.measuredOneDDrift ?? est?.error ?? 0;
  if (oneDError > f.tolerance / 4 || (f.biot !== null && f.biot > BIOT_RULE)) {
    const measured =
      f.measuredOneDDrift !== null
        ? `the 2-D solution shows the 1-D model over-predicting by ${pct(f.measuredOneDDrift)}`
        : `the 1-D model over-predicts by about ${est?.withinTable ? '' : 'at least '}${pct(est?.error ?? 0)} (${est?.basis ?? ''}, at this Bi and mL)`;
    const where = f.biot === null ? 'no Bi (the single h is negative)' : `${biotName} = ${f.biot.toPrecision(3)}`;
    flags.push({
      flag: 'thick-fin',
      severity: oneDError > f.tolerance ? 'warning' : 'info',
      value: f.biot ?? oneDError,
      message: `${where} across the thickness: ${measured}; rule of thumb (common practice): 1-D is fine below Bi ~ ${BIOT_RULE}.`,
    });
  }
  if (f.effectiveness !== null && f.effectiveness < EFFECTIVENESS_MIN) {
    flags.push({
      flag: 'low-effectiveness',
      severity: 'warning',
      value: f.effectiveness,
      message: `effectiveness ${f.effectiveness.toFixed(2)} < ${EFFECTIVENESS_MIN}: the fin barely beats the bare base it covers; a fin is usually worth adding only above about 2 (textbook guidance, Incropera et al., from memory).`,
    });
  }
  if (f.mL !== null && f.mL > ML_LONG) {
    flags.push({
      flag: 'long-fin',
      severity: 'info',
      value: f.mL,
      message: `mL = ${f.mL.toFixed(2)} > ${ML_LONG}: the fin already carries over 99 % of an infinitely long fin's heat (tanh(2.65) = 0.990); more length adds almost nothing.`,
    });
  }
  if (f.hAoverkP >= 1) {
    flags.push({
      flag: 'fin-insulates',
      severity: 'warning',
      value: f.hAoverkP,
      message: `hA/(kP) = ${f.hAoverkP.toFixed(3)} >= 1: conduction into the fin is the bottleneck, and a fin of any length removes less heat than the bare base (dq/dL at L = 0 is proportional to 1 - hA/(kP)).`,
    });
  }
  if (!f.converged || f.discretizationError > f.tolerance / 10) {
    flags.push({
      flag: 'grid-not-converged',
      severity: 'warning',
      value: f.discretizationError,
      message: `the reference's estimated discretisation error is ${pct(f.discretizationError)}${f.converged ? '' : ' and the grids are not in the asymptotic range'}; drifts smaller than that are not resolved.`,
    });
  }
  if (f.energyBalance > 1e-8) {
    flags.push({
      flag: 'energy-balance',
      severity: 'error',
      value: f.energyBalance,
      message: `heat in at the base and heat out of the surfaces differ by ${f.energyBalance.toExponential(2)} (relative): the solution is not trustworthy.`,
    });
  }
  return flags;
}
