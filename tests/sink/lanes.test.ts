/**
 * The check's two lanes (src/fd/three-d/sink-lanes.ts): the fd-3d work of a sink check on this thread and a worker
 * thread gives the numbers of the same steps on one thread. In-process (TypeScript sources, no bundled worker) both
 * lanes run here; the built command (dist/fincheck.js with dist/sink-worker.js, `npm run build`) runs the second
 * lane on its worker. The one difference allowed: a further study's finest grid starts CG from zero instead of
 * from the coarser solution, so its numbers agree to the solver's tolerance (relative residual 1e-10), not bit for
 * bit; 1e-7 relative leaves room for the ill-conditioning of the GCIs and the small drifts built from them. The sink
 * is invented.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { initBessel } from '../../src/analytic/index.js';
import { parseHeatSinkText } from '../../src/case/index.js';
import { resolvedSinkReference, resolvedSinkStudy, runSinkCheck } from '../../src/compare/index.js';
import { ModelNotApplicableError } from '../../src/errors.js';
import { sinkStudyUnknowns, startSinkLanes } from '../../src/fd/index.js';
import { cli } from '../cli/run.js';

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

describe('the sink check on two lanes', () => {
  const c = parseHeatSinkText(text, 'lanes.yaml');

  it('gives the numbers of the one-thread check (resolvedSinkStudy), the further study included', async () => {
    const one = await runSinkCheck(c, (s) => resolvedSinkStudy(s, TOLERANCE), { tolerance: TOLERANCE });
    const two = await runSinkCheck(c, resolvedSinkReference(TOLERANCE), { tolerance: TOLERANCE });
    // The further study ran: its finest grid has more unknowns than the default study's.
    expect(one.reference.unknowns[0]).toBeGreaterThan(sinkStudyUnknowns(c));
    expectClose(one, two, 1e-7);
  }, 120_000);

  it('a task that fails on the other lane reports its own error', async () => {
    const lanes = startSinkLanes(c, { parallel: false });
    await expect(lanes.run('there', { kind: 'study', options: { memoryLimit_bytes: 1 }, keep: false })).rejects.toBeInstanceOf(ModelNotApplicableError);
    await lanes.close();
  });
});

describe('the built command on two threads', () => {
  const bin = join(import.meta.dirname, '../../dist/fincheck.js');
  const dir = mkdtempSync(join(tmpdir(), 'fincheck-lanes-'));
  const file = join(dir, 'sink.yaml');
  writeFileSync(file, text);

  it('dist/sink-worker.js exists (npm test builds it first)', () => {
    expect(existsSync(join(import.meta.dirname, '../../dist/sink-worker.js')), 'run `npm run build`').toBe(true);
  });

  it('prints the numbers of the in-process check', async () => {
    const args = ['check', file, '--json', '--tolerance', `${100 * TOLERANCE}%`];
    const r = spawnSync(process.execPath, [bin, ...args], { encoding: 'utf8' });
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).toBe('');
    const inProcess = await cli(...args);
    expect(inProcess.code, inProcess.stderr).toBe(0);
    expectClose(JSON.parse(inProcess.stdout), JSON.parse(r.stdout), 1e-7);
  }, 120_000);
});
