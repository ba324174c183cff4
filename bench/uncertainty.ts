/**
 * The cost of check's sensitivities and uncertainty sample (issue 12), in process on the demo cases: the
 * check without them, with the sensitivities (two re-solves per input on the reference's finest grid) and
 * no sample, and with the 200-point Latin-hypercube sample (on the study's coarsest grid). Target: the
 * sample adds at most 1 s to the demo check (design-questions.md; common practice, no source: a check
 * should stay interactive).
 */
import { loadCase } from '../src/case/index.js';
import { runCheck, type CheckOptions } from '../src/compare/index.js';
import { atMost, cpuText, errored, formatMs, spread, timeTask, type BenchRow } from './measure.js';

const AREA = 'uncertainty';
const CASES = ['demo/inverter-plate-fin.yaml', 'demo/enclosure-fin-natural-convection.yaml'];

export async function benchUncertainty(): Promise<BenchRow[]> {
  const rows: BenchRow[] = [];
  for (const file of CASES) {
    const c = loadCase(file);
    const name = file.replace(/^demo\/|\.yaml$/g, '');
    const base: CheckOptions = { tolerance: 0.02, reference: 'auto' };
    const modes: [string, CheckOptions][] = [
      ['check, no sensitivities', { ...base, sensitivities: false }],
      ['check + sensitivities, no sample', { ...base, sample: 'never' }],
      ['check + sensitivities + sample (200)', { ...base, sample: 'always' }],
    ];
    const medians: number[] = [];
    for (const [label, opts] of modes) {
      const item = `${name}: ${label}`;
      try {
        const t = await timeTask(item, () => runCheck(c, opts), { time: 0, iterations: 5, warmupIterations: 1 });
        medians.push(t.medianMs);
        const extra = medians.length > 1 ? `; adds ${formatMs(t.medianMs - (medians[medians.length - 2] as number))} to the row above` : '';
        const isSample = label.includes('sample (200)');
        rows.push({
          area: AREA,
          item,
          target: isSample ? 'sample adds <= 1 s' : '-',
          measured: formatMs(t.medianMs),
          cpu: cpuText(t.cpuMedianMs),
          verdict: isSample ? atMost(t.medianMs - (medians[1] ?? 0), 1000) : 'info',
          note: `in process, warm; ${spread(t)}${extra}`,
        });
      } catch (error) {
        rows.push(errored(AREA, item, '-', error));
      }
    }
  }
  return rows;
}
