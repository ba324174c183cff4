/**
 * `optimize` on the demo heat sink as a whole process (bench/process.ts runCli: `node dist/fincheck.cjs`, the child's
 * own CPU time reported at exit): the fewest fins that keep the sources at or below 95 degC on
 * demo/motor-drive-sink.yaml, an fd-3d study a value (search study, then the default study) and the answer at
 * h x 0.75 and x 1.25. One run (4.0 s of CPU at load 9 on the 2-core machine): the row is for the record
 * (issue 12 sets no target), with the number of fd-3d studies the run solved.
 */
import { performance } from 'node:perf_hooks';
import { cpuText, errored, formatMs, type BenchRow } from './measure.js';
import { runCli } from './process.js';

const AREA = 'optimize';
const ITEM = 'optimize demo sink: fewest fins for 95 degC (whole process)';

export async function benchOptimizeSink(): Promise<BenchRow[]> {
  try {
    const args = ['optimize', 'demo/motor-drive-sink.yaml', '--vary', 'array.count', '--for', 'required', '--temperature', '95degC', '--json'];
    const start = performance.now();
    const r = runCli(args);
    const wallMs = performance.now() - start;
    if (r.status !== 0) throw new Error(`fincheck ${args.join(' ')} exited with ${r.status}: ${r.stderr.trim()}`);
    const doc = JSON.parse(r.stdout) as {
      reference: { evaluations: number; search: { studies: number }; confirm: { studies: number }; values: Record<string, number> };
    };
    return [
      {
        area: AREA,
        item: ITEM,
        target: '-',
        measured: formatMs(wallMs),
        cpu: cpuText(r.cpuMs),
        verdict: 'info',
        note: `one child process; ${doc.reference.evaluations} fd-3d studies (${doc.reference.search.studies} search, ${doc.reference.confirm.studies} default); answer ${doc.reference.values['array.count']} fins`,
      },
    ];
  } catch (error) {
    return [errored(AREA, ITEM, '-', error)];
  }
}
