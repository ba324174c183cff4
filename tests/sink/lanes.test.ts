/**
 * The check's two lanes (src/fd/three-d/sink-lanes.ts): the fd-3d work of a sink check on this thread and a worker
 * thread. The lanes give the numbers of the same tasks on one thread bit for bit (the bundled worker against both
 * lanes here, and the built command against the in-process one); against the one-thread resolvedSinkStudy the one
 * difference is the further study's finest grid, which starts CG from the default study's finest solution instead
 * of its own coarser one, so they agree to the solver's tolerance (relative residual 1e-10), not bit for bit: 1e-7
 * relative leaves room for the GCIs and the small drifts built from differences. The sink is invented.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel } from '../../src/analytic/index.js';
import { parseHeatSinkText } from '../../src/case/index.js';
import { resolvedSinkReference, resolvedSinkStudy, runSinkCheck, type SinkCheckReport } from '../../src/compare/index.js';
import { ModelNotApplicableError } from '../../src/errors.js';
import { sinkStudyUnknowns, startSinkLanes } from '../../src/fd/index.js';

const text = `name: small drive sink
fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 40 mm, thickness: 4 mm }
sources:
  - { name: chip, power: 15 W, centre: [14 mm, 20 mm], size: [10 mm, 10 mm] }
  - { name: driver, power: 5 W, centre: [30 mm, 12 mm], size: [6 mm, 6 mm] }
convection: { ambient: 30 degC, h: 40 W/(m^2*K), tip: convective }
`;
// A tolerance whose target (a tenth of it) the default study misses on this sink: the further study runs too.
const TOLERANCE = 0.01;

/** Every number of two JSON values within `rel` of each other (relative, or absolute below 1e-12); text equal. */
function expectClose(a: unknown, b: unknown, rel: number, path = ''): void {
  if (typeof a === 'number' && typeof b === 'number') {
    const scale = Math.max(Math.abs(a), Math.abs(b));
    expect(Math.abs(a - b), `${path}: ${a} vs ${b}`).toBeLessThanOrEqual(Math.max(rel * scale, 1e-12));
  } else if (Array.isArray(a) && Array.isArray(b)) {
    expect(b.length, path).toBe(a.length);
    a.forEach((x, k) => expectClose(x, b[k], rel, `${path}[${k}]`));
  } else if (a !== null && b !== null && typeof a === 'object' && typeof b === 'object') {
    expect(Object.keys(b).sort(), path).toEqual(Object.keys(a).sort());
    for (const key of Object.keys(a)) expectClose((a as Record<string, unknown>)[key], (b as Record<string, unknown>)[key], rel, `${path}.${key}`);
  } else if (typeof a === 'string' && typeof b === 'string') {
    // Texts carry numbers too (GCIs, iteration counts): compared with their digits masked.
    const masked = (s: string) => s.replace(/\d[\d.,e+-]*/g, '#');
    expect(masked(b), path).toBe(masked(a));
  } else expect(b, path).toEqual(a);
}

beforeAll(async () => {
  await initBessel();
});

const c = parseHeatSinkText(text, 'lanes.yaml');
/** The check with both lanes on this thread, computed once for the comparisons below. */
let oneThread: Promise<SinkCheckReport> | null = null;
const onOneThread = (): Promise<SinkCheckReport> =>
  (oneThread ??= runSinkCheck(c, resolvedSinkReference(TOLERANCE), { tolerance: TOLERANCE, lanes: { parallel: 'never' } }));

describe('the sink check on two lanes', () => {
  it('gives the numbers of the one-thread check (resolvedSinkStudy), the further study included', async () => {
    const sequential = await runSinkCheck(c, (s) => resolvedSinkStudy(s, TOLERANCE), { tolerance: TOLERANCE });
    // The further study ran: its finest grid has more unknowns than the default study's.
    expect(sequential.reference.unknowns[0]).toBeGreaterThan(sinkStudyUnknowns(c));
    expectClose(sequential, await onOneThread(), 1e-7);
  }, 120_000);

  it('a task that fails on the other lane reports its own error', async () => {
    const lanes = startSinkLanes(c, { parallel: 'never' });
    await expect(lanes.run('there', { kind: 'study', options: { memoryLimit_bytes: 1 }, keep: false })).rejects.toBeInstanceOf(ModelNotApplicableError);
    await lanes.close();
  });
});

describe('the second lane on the bundled worker thread', () => {
  const bin = join(import.meta.dirname, '../../dist/fincheck.cjs');
  const worker = pathToFileURL(join(import.meta.dirname, '../../dist/sink-worker.js'));

  it('dist/sink-worker.js exists (npm test builds it first)', () => {
    expect(existsSync(worker), 'run `npm run build`').toBe(true);
  });

  it('gives the numbers of both lanes on this thread, bit for bit', async () => {
    const threads = await runSinkCheck(c, resolvedSinkReference(TOLERANCE), { tolerance: TOLERANCE, lanes: { parallel: 'always', worker } });
    expect(JSON.stringify(threads)).toBe(JSON.stringify(await onOneThread()));
  }, 120_000);

  it('a task that fails on the worker is run here and reports its own error', async () => {
    const lanes = startSinkLanes(c, { parallel: 'always', worker });
    await expect(lanes.run('there', { kind: 'study', options: { memoryLimit_bytes: 1 }, keep: false })).rejects.toBeInstanceOf(ModelNotApplicableError);
    await lanes.close();
  });

  it('the built command prints the numbers of the check on one thread, bit for bit', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-lanes-'));
    const file = join(dir, 'sink.yaml');
    writeFileSync(file, text);
    const r = spawnSync(process.execPath, [bin, 'check', file, '--json', '--tolerance', `${100 * TOLERANCE}%`], { encoding: 'utf8' });
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).toBe('');
    const { warnings, ...printed } = JSON.parse(r.stdout) as Record<string, unknown>;
    expect(warnings).toEqual([]);
    expect(JSON.stringify(printed)).toBe(JSON.stringify(await onOneThread()));
  }, 120_000);
});
