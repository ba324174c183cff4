/**
 * `fincheck solve --model 2d` and `fincheck plot --kind heatmap` on a nonlinear fin (Newton across the
 * thickness, src/fd/nonlinear2d*.ts), driven with real argv in-process. Case: the demo
 * demo/enclosure-fin-natural-convection.yaml (invented data: power-law h of laminar natural convection,
 * grey radiation). Its numbers are not reference values here: `solve --model 2d` is checked against
 * `fincheck check`'s fd-2d reference of the same fin, and the refusal where the 2-D model does not apply.
 */
import { mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { decodePng } from '../images/helpers.js';
import { cli } from './run.js';

const demo = join(import.meta.dirname, '../../demo/enclosure-fin-natural-convection.yaml');
const tmp = mkdtempSync(join(tmpdir(), 'fincheck-nonlinear-2d-'));

function caseFile(name: string, text: string): string {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
}

/**
 * The demo with insulated side edges: the 2-D section's own idealisation, so the check's fd-2d reference
 * is the 2-D study's heat rate with no side-edge correction from fd-1d added.
 */
function insulatedDemo(): string {
  const text = readFileSync(demo, 'utf8');
  const edited = text.replace('  width: 150 mm\n', '  width: 150 mm\n  edges: insulated\n');
  expect(edited).not.toBe(text);
  return caseFile('insulated.yaml', edited);
}

interface NewtonJson {
  stepsPerGrid: number[];
  finest: { iterations: number; coarseGridIterations: number; residual: number; heatRateChange: number };
}

interface Solve2DJson {
  model: string;
  grid: { nx: number; ny: number };
  heatRate_W: number;
  finestGridHeatRate_W: number;
  sectionHeatRate_W: number;
  discretizationError: number | null;
  energyBalance: number;
  newton: NewtonJson | null;
  centreline: { x_m: number; T_degC: number }[];
  surface: { x_m: number; T_degC: number }[];
}

describe('fincheck solve --model 2d on a nonlinear fin (power-law h, radiation)', () => {
  it('the refinement study agrees with the check’s fd-2d reference and reports the Newton steps', async () => {
    const solved = await cli('solve', demo, '--model', '2d', '--json');
    expect(solved.code).toBe(0);
    const j = JSON.parse(solved.stdout) as Solve2DJson;
    const checked = await cli('check', insulatedDemo(), '--json', '--reference', '2d');
    expect(checked.code).toBe(0);
    const ref = (
      JSON.parse(checked.stdout) as { reference: { model: string; heatRate_W: number; discretizationError: number; grid: { nx: number; ny: number } } }
    ).reference;
    expect(ref.model).toBe('fd-2d');
    expect(j.model).toBe('fd-2d');
    expect(j.grid).toEqual(ref.grid);
    // The reference's stated error is its GCI; solve runs the same Newton study on the same grids, so it
    // must fall within that, and in fact agrees to Newton's stopping test (heat-rate change <= 1e-10 per
    // grid): the 1e-9 margin allows that and no more.
    expect(ref.discretizationError).toBeGreaterThan(0);
    // The demo cools its side edges: solve's section-only heat rate is the insulated fin's (this test compared
    // heatRate_W before solve reported the whole fin; issue 9, item 7).
    expect(Math.abs(j.sectionHeatRate_W - ref.heatRate_W) / ref.heatRate_W).toBeLessThanOrEqual(ref.discretizationError + 1e-9);
    // The whole fin, edges included, is check's own reference for the demo: the same number and error.
    const whole = (
      JSON.parse((await cli('check', demo, '--json', '--reference', '2d')).stdout) as { reference: { heatRate_W: number; discretizationError: number } }
    ).reference;
    expect(Math.abs(j.heatRate_W - whole.heatRate_W) / whole.heatRate_W).toBeLessThanOrEqual(1e-9);
    expect(j.discretizationError).toBe(whole.discretizationError);
    // Newton: four grids (the study's three and the coarser one that estimates the extrapolated value's error),
    // each converged (relative residual <= 1e-10, the solver's stopping test).
    expect(j.newton?.stepsPerGrid).toHaveLength(4);
    for (const steps of j.newton?.stepsPerGrid ?? []) expect(steps).toBeGreaterThanOrEqual(1);
    expect(j.newton?.finest.residual).toBeLessThanOrEqual(1e-10);
    // Conservation: heat in at the base equals the face and tip losses to round-off (the scheme is conservative).
    expect(j.energyBalance).toBeLessThan(1e-10);
    expect(j.centreline).toHaveLength(j.grid.nx);
    expect(j.surface).toHaveLength(j.grid.nx);
  });

  it('--grid solves once on that grid (nested start from coarser grids) and agrees with the study’s finest grid', async () => {
    const study = JSON.parse((await cli('solve', demo, '--model', '2d', '--json')).stdout) as Solve2DJson;
    const { nx, ny } = study.grid;
    const r = await cli('solve', demo, '--model', '2d', '--grid', `${nx}x${ny}`, '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout) as Solve2DJson;
    expect(j.grid).toEqual({ nx, ny });
    expect(j.discretizationError).toBeNull();
    expect(j.newton?.stepsPerGrid).toHaveLength(1);
    expect(j.newton?.finest.coarseGridIterations).toBeGreaterThan(0);
    // Same grid, same equations, different starting fields: both stop at a relative residual <= 1e-10 and
    // a heat-rate change <= 1e-10, so 1e-8 of Q is a safe bound that a wrong problem would break.
    // (The study reports its extrapolated value as heatRate_W; its finest grid's value is finestGridHeatRate_W.)
    expect(Math.abs(j.heatRate_W / study.finestGridHeatRate_W - 1)).toBeLessThan(1e-8);
  });

  it('the text output says Newton converged', async () => {
    const r = await cli('solve', demo, '--model', '2d');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/nonlinear +Newton converged \(\d+\/\d+\/\d+\/\d+ steps, coarsest to finest grid\)/);
  });

  it('a nonlinear infinite tip is outside the 2-D model: exit 2 with the reason', async () => {
    const file = caseFile(
      'infinite.yaml',
      'name: natural convection\nfin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }\nmaterial: { k: 200 }\nconvection: { ambient: 20 degC, h: { law: power, base: 12, exponent: 0.25 }, tip: infinite }\nbase: { temperature: 80 degC }\n',
    );
    const r = await cli('solve', file, '--model', '2d');
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--model 2d: an infinite tip of a nonlinear fin is not modelled in 2-D');
    expect(r.stdout).toBe('');
  });
});

describe('fincheck plot --kind heatmap on a nonlinear fin', () => {
  it('writes the PNG of the Newton fd-2d field (exit 0)', async () => {
    const out = mkdtempSync(join(tmp, 'heatmap-'));
    const r = await cli('plot', demo, '--kind', 'heatmap', '--out', join(out, 'field.png'), '--json');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.stdout) as { kind: string; reference: string; models: string[] };
    expect(doc).toMatchObject({ kind: 'heatmap', reference: 'fd-2d', models: ['fd-2d'] });
    expect(readdirSync(out)).toEqual(['field.png']);
    expect(decodePng(readFileSync(join(out, 'field.png')))).toMatchObject({ width: 1200, height: 750 });
  });
});

describe('fincheck solve (1-D) on a nonlinear fin', () => {
  it('runs the Newton study and agrees with check --reference 1d exactly', async () => {
    const file = 'demo/enclosure-fin-natural-convection.yaml';
    const s = JSON.parse((await cli('solve', file, '--json')).stdout);
    const c = JSON.parse((await cli('check', file, '--json', '--reference', '1d')).stdout);
    expect(s.model).toBe('fd-1d');
    // Same study, same grids, same solver: the same double.
    expect(s.heatRate_W).toBe(c.reference.heatRate_W);
    expect(s.discretizationError).toBe(c.reference.discretizationError);
    const single = await cli('solve', file, '--nodes', '501', '--json');
    expect(single.code).toBe(0);
    expect(JSON.parse(single.stdout).discretizationError).toBeNull();
  });
});
