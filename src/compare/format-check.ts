/** Plain-text rendering of a check report for the terminal (the default output of `fincheck check`). */
import { defaultDisplayUnits, inUnit, type Case, type DisplayUnits } from '../case/index.js';
import { describeCase } from './describe-case.js';
import { signedPercentText } from './percent-text.js';
import { fincheckUncertaintyLines } from './format-fin-uncertainty.js';
import type { CheckReport, Flag } from './types.js';

/** Signed percentage, the same as `map` prints (percent-text.ts). */
const pct = signedPercentText;
const sig = (x: number, n = 5): string => (Math.abs(x) >= 1e5 || (Math.abs(x) < 1e-3 && x !== 0) ? x.toExponential(n - 1) : x.toPrecision(n));
const pad = (s: string, n: number): string => (s.length >= n ? s : s + ' '.repeat(n - s.length));
const lpad = (s: string, n: number): string => (s.length >= n ? s : ' '.repeat(n - s.length) + s);

const MARK: Record<Flag['severity'], string> = { error: 'x', warning: '!', info: 'i' };

/** What the reference's error estimate is of: the extrapolated value (with the finest grid's GCI beside it) or the finest grid. */
function errorBasis(ref: CheckReport['reference'], u: DisplayUnits): string {
  return ref.heatRateFrom === 'extrapolated'
    ? `(relative, of the extrapolated value; finest grid ${sig(inUnit(u.heat, ref.finestGridHeatRate_W))} ${u.heat.ascii}, GCI ${ref.finestGridDiscretizationError.toExponential(1)})`
    : '(relative, GCI)';
}

/** `u`: the units numbers are shown in (the JSON output stays SI). */
export function formatCheck(c: Case, r: CheckReport, u: DisplayUnits = defaultDisplayUnits): string {
  const out: string[] = [];
  const heat = (q: number): string => sig(inUnit(u.heat, q));
  out.push(`fincheck check: ${r.case}`);
  for (const line of describeCase(c, u)) out.push(`  ${line}`);
  out.push('');
  const ref = r.reference;
  const grid = 'nodes' in ref.grid ? `${ref.grid.nodes} nodes` : `${ref.grid.nx} x ${ref.grid.ny} nodes`;
  out.push(
    `Reference (${ref.model}): heat rate ${heat(ref.heatRate_W)} ${u.heat.ascii}, efficiency ${ref.efficiency === null ? 'n/a' : ref.efficiency.toFixed(4)}, effectiveness ${ref.effectiveness === null ? 'n/a' : sig(ref.effectiveness, 4)}, tip at ${inUnit(u.temperature, ref.tipTemperature_degC).toFixed(2)} ${u.temperature.ascii}`,
  );
  out.push(
    `  estimated discretisation error ${ref.discretizationError.toExponential(1)} ${errorBasis(ref, u)}; energy balance ${ref.energyBalance.toExponential(1)}; finest grid ${grid}`,
  );
  out.push(`  ${ref.note}`);
  out.push('');
  out.push(`Shortcuts against the reference (tolerance +/-${(100 * r.tolerance).toFixed(1)} %):`);
  const label = (m: CheckReport['models'][number]): string => (m.guess ? `${m.model} (${m.guess} h)` : m.model);
  const w = Math.max(16, ...r.models.map((m) => label(m).length + 2));
  const head = `  ${pad('model', w)}${lpad(`Q [${u.heat.ascii}]`, 12)}${lpad('efficiency', 12)}${lpad('formula eff.', 14)}${lpad('drift', 11)}  verdict`;
  out.push(head);
  out.push(`  ${'-'.repeat(head.length - 2)}`);
  for (const m of r.models) {
    const formula = m.formulaEfficiency === null ? '-' : m.formulaEfficiency.toFixed(4);
    out.push(
      `  ${pad(label(m), w)}${lpad(heat(m.heatRate_W), 12)}${lpad(m.efficiency === null ? 'n/a' : m.efficiency.toFixed(4), 12)}${lpad(formula, 14)}${lpad(pct(m.drift), 11)}  ${m.verdict}`,
    );
  }
  const seen = new Set<string>();
  for (const m of r.models) {
    if (seen.has(m.model)) continue;
    seen.add(m.model);
    out.push(`    ${pad(m.model, 14)} ${m.basis}${m.model === 'fd-1d' ? `; ${m.accuracy}` : ''}`);
  }
  const guesses = new Map(r.models.filter((m) => m.guess && m.guessValues).map((m) => [m.guess, m.guessValues]));
  for (const [g, v] of guesses) {
    if (v)
      out.push(
        `    (${g} h)${' '.repeat(Math.max(1, 9 - (g ?? '').length))}${v.description}: h = ${sig(inUnit(u.h, v.h_W_per_m2K), 4)} ${u.h.ascii}, k = ${sig(inUnit(u.k, v.k_W_per_mK), 4)} ${u.k.ascii}`,
      );
  }
  for (const n of r.notApplicable) out.push(`    ${pad(n.model, 14)} not applicable: ${n.reason}`);
  out.push('  (efficiency of every row = Q / Q with the whole cooled surface at base temperature, the surface of the reference model;');
  if (ref.efficiencyNote !== null) out.push(`   efficiency: ${ref.efficiencyNote};`);
  if (ref.effectivenessNote !== null) out.push(`   effectiveness: ${ref.effectivenessNote};`);
  out.push("   formula eff. = the shortcut's own textbook efficiency on the area its formula assumes, e.g. tanh(mLc)/(mLc)");
  out.push('   on the corrected length: compare it with a textbook; it differs from the common efficiency by that area;');
  out.push(`   the shortcuts are closed forms, exact for their own assumptions, so their error for this fin is the drift,`);
  out.push(`   known to about the reference's discretisation error, ${ref.discretizationError.toExponential(1)})`);
  out.push('');
  out.push(...fincheckUncertaintyLines(r, label, u));
  if (r.assumptions.length > 0) {
    out.push('Where the drift comes from (one assumption at a time):');
    const methods = [...new Set(r.assumptions.map((a) => a.method))];
    const w = Math.max(...r.assumptions.map((a) => a.assumption.length)) + 2;
    for (const a of r.assumptions) {
      const by = a.madeBy.length > 0 ? `  made by ${a.madeBy.join(', ')}` : '';
      out.push(`  ${pad(a.assumption, w)}${lpad(pct(a.drift), 10)} [${methods.indexOf(a.method) + 1}]${by}`);
    }
    methods.forEach((m, i) => out.push(`    [${i + 1}] ${m}`));
    out.push('');
  }
  if (r.flags.length > 0) {
    out.push('Flags:');
    for (const f of r.flags) out.push(`  [${MARK[f.severity]}] ${f.flag}: ${f.message}`);
    out.push('');
  }
  out.push('Cautions:');
  for (const t of r.cautions) out.push(`  - ${t}`);
  return `${out.join('\n')}\n`;
}
