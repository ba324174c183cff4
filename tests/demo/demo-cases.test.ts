/**
 * Every demo case runs through `fincheck check`. The demo scenarios are invented; these tests pin the
 * behaviour each scenario exists to show, not published values (those are in the other suites).
 */
import { readdirSync, readFileSync, existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadCase } from '../../src/case/parse.js';
import { loadAnyCase } from '../../src/case/index.js';
import { resolvedSinkStudy, runSinkCheck } from '../../src/compare/index.js';
import { runCheck } from '../../src/compare/check.js';
import { VERSION } from '../../src/version.js';

const demoDir = join(import.meta.dirname, '../../demo');
const cases = readdirSync(demoDir).filter((f) => f.endsWith('.yaml') || f.endsWith('.json'));
// Single fins here; the heat-sink demos (an `array` key) run through the sink check below.
const sinkDemos = cases.filter((f) => loadAnyCase(join(demoDir, f)).kind === 'heat-sink');
const demos = cases.filter((f) => !sinkDemos.includes(f));

async function check(file: string) {
  return (await runCheck(loadCase(join(demoDir, file)), { tolerance: 0.02, reference: 'auto' })).report;
}

describe.each(demos)('demo %s', (file) => {
  it('checks without error, with a converged reference and the cautions', async () => {
    const r = await check(file);
    expect(r.models.length).toBeGreaterThan(0);
    expect(r.reference.energyBalance).toBeLessThan(1e-10);
    // 1e-3: the 2-D reference of the thick polymer fin converges at order ~1.9 (base-corner singularity) and
    // shows a GCI of ~1.5e-4; still far below the 2 % tolerance the drifts are judged against.
    expect(r.reference.discretizationError).toBeLessThan(1e-3);
    expect(r.cautions.length).toBeGreaterThanOrEqual(3);
    expect(r.flags.map((f) => f.flag)).not.toContain('grid-not-converged');
  });
});

describe('each scenario shows what it is for', () => {
  it('inverter plate fin in forced air: every shortcut within the 2 % tolerance', async () => {
    const r = await check('inverter-plate-fin.yaml');
    for (const m of r.models) expect(m.verdict, m.model).toBe('ok');
    expect(r.flags.filter((f) => f.severity !== 'info')).toEqual([]);
  });
  it('tapered cast rib with falling h: the hand shortcuts drift, and the ledger names the causes', async () => {
    const r = await check('motor-housing-tapered-fin.yaml');
    expect(r.models.some((m) => m.verdict !== 'ok')).toBe(true);
    const causes = r.assumptions.map((a) => a.assumption).join(' | ');
    expect(causes).toMatch(/uniform h/);
    expect(causes).toMatch(/uniform section/);
  });
  it('condenser disc fin: the annular closed form agrees, the straight-fin shortcuts drift', async () => {
    const r = await check('condenser-tube-annular-fin.yaml');
    const q = (id: string): number => r.models.find((m) => m.model === id)!.heatRate_W;
    expect(Math.abs(q('closed-form') / q('fd-1d') - 1)).toBeLessThan(1e-6);
    expect(r.assumptions.map((a) => a.assumption)).toContain('radial fin treated as straight (mean radius)');
  });
  it('enclosure fin in still air: two constant-h guesses, a constant-h row and a no-radiation row', async () => {
    const r = await check('enclosure-fin-natural-convection.yaml');
    // Every shortcut row carries one of the two guesses (the fd-1d row beside the fd-2d reference has none).
    expect(new Set(r.models.filter((m) => m.model !== 'fd-1d').map((m) => m.guess))).toEqual(new Set(['base', 'mean']));
    const rows = r.assumptions.map((a) => a.assumption).join(' | ');
    expect(rows).toMatch(/constant h/);
    expect(rows).toMatch(/no radiation/);
  });
  it('thick polymer fin in coolant: the Biot flag warns', async () => {
    const r = await check('polymer-fin-liquid-cooled.yaml');
    const flag = r.flags.find((f) => f.flag === 'thick-fin');
    expect(flag?.severity).toBe('warning');
    expect(flag?.value).toBeGreaterThan(0.1);
  });
});

describe.each(sinkDemos)('heat-sink demo %s', (file) => {
  it('checks without error against a resolved fd-3d reference, energy balanced, with the cautions and the sheet row', async () => {
    const any = loadAnyCase(join(demoDir, file));
    if (any.kind !== 'heat-sink') throw new Error('not a sink');
    const r = await runSinkCheck(any.case, (c) => resolvedSinkStudy(c, 0.02), { tolerance: 0.02 });
    expect(r.reference.resolved).toBe(true);
    expect(r.reference.energyBalance).toBeLessThan(1e-10);
    expect(r.cautions.length).toBeGreaterThanOrEqual(3);
    expect(r.assumptions.find((a) => /conducting sheets/.test(a.assumption))?.drift).not.toBeNull();
  }, 120_000);
});

describe('the heat-sink scenario shows what it is for', () => {
  it('motor-drive sink: the uniform-base shortcuts miss the off-centre sources, the spreading series holds', async () => {
    const any = loadAnyCase(join(demoDir, 'motor-drive-sink.yaml'));
    if (any.kind !== 'heat-sink') throw new Error('not a sink');
    const r = await runSinkCheck(any.case, (c) => resolvedSinkStudy(c, 0.02), { tolerance: 0.02, sheetDrift: false });
    const verdict = (id: string) => r.models.find((m) => m.model === id)?.verdict;
    expect(verdict('overall-efficiency')).toBe('unsafe');
    expect(verdict('spreading-series')).toBe('ok');
    expect(r.sources.every((s) => s.margin_K === null || s.margin_K > 0)).toBe(true);
  }, 120_000);
});

describe('the built command', () => {
  const bin = join(import.meta.dirname, '../../dist/fincheck.cjs');
  it('dist/fincheck.cjs exists (npm test builds it first)', () => {
    expect(existsSync(bin), 'run `npm run build` (npm test does it)').toBe(true);
  });
  it('runs `check` on a demo case as a separate process and exits 0', () => {
    const r = spawnSync(process.execPath, [bin, 'check', join(demoDir, 'inverter-plate-fin.yaml'), '--json'], { encoding: 'utf8' });
    expect(r.status, r.stderr).toBe(0);
    expect(JSON.parse(r.stdout).reference.model).toMatch(/^fd-/);
  });
  it('exits 2 with a message on stderr for a bad case, and prints nothing on stdout', () => {
    const r = spawnSync(process.execPath, [bin, 'check', join(demoDir, 'no-such-case.yaml')], { encoding: 'utf8' });
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/no-such-case\.yaml/);
  });
  it('--version prints the package version', () => {
    const pkg = JSON.parse(readFileSync(join(import.meta.dirname, '../../package.json'), 'utf8'));
    expect(VERSION).toBe(pkg.version);
    const r = spawnSync(process.execPath, [bin, '--version'], { encoding: 'utf8' });
    expect(r.stdout.trim()).toBe(pkg.version);
  });
});
