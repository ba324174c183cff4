/**
 * `solve --model 2d` and `check` give one fd-2d heat rate for a fin (the whole fin, the cooled side edges
 * included); annular fins are described by the radius r (r1 at the base, r2 at the rim) in every output.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './run.js';

const tmp = mkdtempSync(join(tmpdir(), 'fincheck-solve2d-'));
function caseFile(name: string, text: string): string {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
}

// A stubby plate fin with cooled side edges: the edges (2 x 3 mm x 30 mm) add ~27 % to the faces' area.
const cooled = caseFile(
  'cooled.yaml',
  `name: cooled edges
fin: { profile: rectangular, length: 30 mm, thickness: 3 mm, width: 10 mm, edges: cooled }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40, tip: convective }
base: { temperature: 80 degC }
`,
);
const insulated = caseFile(
  'insulated.yaml',
  `name: insulated edges
fin: { profile: rectangular, length: 30 mm, thickness: 3 mm, width: 10 mm, edges: insulated }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40, tip: convective }
base: { temperature: 80 degC }
`,
);
const annular = caseFile(
  'annular.yaml',
  `name: disc fin
fin: { profile: annular, innerRadius: 3.1 mm, outerRadius: 5.6 mm, thickness: 0.5 mm }
material: { k: 209 }
convection: { ambient: 25 degC, h: 45, tip: adiabatic }
base: { temperature: 85 degC }
`,
);

interface Point {
  x_m?: number;
  r_m?: number;
  T_degC: number;
}

describe('one fd-2d heat rate for check and solve --model 2d', () => {
  it('cooled side edges: solve reports the whole-fin heat rate of check, the section-only value beside it', async () => {
    const check = JSON.parse((await cli('check', cooled, '--reference', '2d', '--json')).stdout);
    const r = await cli('solve', cooled, '--model', '2d', '--json');
    expect(r.code).toBe(0);
    const solve = JSON.parse(r.stdout);
    expect(check.reference.model).toBe('fd-2d');
    // The same computation (same grids, same fd-1d edge factor): equal to round-off.
    expect(Math.abs(solve.heatRate_W / check.reference.heatRate_W - 1)).toBeLessThan(1e-12);
    expect(Math.abs(solve.discretizationError / check.reference.discretizationError - 1)).toBeLessThan(1e-12);
    expect(Math.abs(solve.efficiency / check.reference.efficiency - 1)).toBeLessThan(1e-12);
    // The section alone sees insulated edges: lower, by the edges' share (2 t / (2 w + 2 t) of the area ~ 23 %).
    expect(solve.sectionHeatRate_W).toBeLessThan(solve.heatRate_W);
    expect(solve.edgesHeatRate_W).toBeGreaterThan(0.15 * solve.heatRate_W);
    expect(Math.abs(solve.sectionHeatRate_W + solve.edgesHeatRate_W - solve.heatRate_W)).toBeLessThan(1e-12 * solve.heatRate_W);
    const text = (await cli('solve', cooled, '--model', '2d')).stdout;
    expect(text).toMatch(/heat rate +1\.831\d* W +\(whole fin, as check reports it;/);
    expect(text).toMatch(/section +1\.44\d* W +\(2-D section x width: side edges insulated\)/);
    expect(text).toMatch(/side edges +\+0\.38\d* W +\(the cooled side edges, from fd-1d/);
  });

  it('insulated side edges: the section is the whole fin (no edge line)', async () => {
    const solve = JSON.parse((await cli('solve', insulated, '--model', '2d', '--json')).stdout);
    const check = JSON.parse((await cli('check', insulated, '--reference', '2d', '--json')).stdout);
    expect(solve.edgesHeatRate_W).toBe(0);
    expect(solve.sectionHeatRate_W).toBe(solve.heatRate_W);
    expect(Math.abs(solve.heatRate_W / check.reference.heatRate_W - 1)).toBeLessThan(1e-12);
    expect((await cli('solve', insulated, '--model', '2d')).stdout).not.toMatch(/side edges/);
  });
});

describe('annular fins are described by the radius', () => {
  it('solve (1-D): profile points carry r_m from r1 to r2, the table marks r1 and r2', async () => {
    const j = JSON.parse((await cli('solve', annular, '--json')).stdout);
    const profile = j.profile as Point[];
    expect(profile.every((p) => p.x_m === undefined && typeof p.r_m === 'number')).toBe(true);
    expect(profile[0]?.r_m).toBeCloseTo(3.1e-3, 15);
    expect(profile[profile.length - 1]?.r_m).toBeCloseTo(5.6e-3, 15);
    const text = (await cli('solve', annular)).stdout;
    expect(text).toMatch(/r \[mm\] +T \[degC\] +\(radius: r1 at the base, r2 at the rim\)/);
    expect(text).toMatch(/\n +3\.100 +85\.000 +r1\n/);
    expect(text).toMatch(/\n +5\.600 +\d+\.\d+ +r2\n/);
  });

  it('solve --model 2d: centre line and surface carry r_m from r1 to r2, like the 1-D profile', async () => {
    const j = JSON.parse((await cli('solve', annular, '--model', '2d', '--json')).stdout);
    for (const line of [j.centreline, j.surface] as Point[][]) {
      expect(line.every((p) => p.x_m === undefined && typeof p.r_m === 'number')).toBe(true);
      expect(line[0]?.r_m).toBeCloseTo(3.1e-3, 15);
      expect(line[line.length - 1]?.r_m).toBeCloseTo(5.6e-3, 15);
    }
    const text = (await cli('solve', annular, '--model', '2d')).stdout;
    expect(text).toMatch(/r \[mm\] +centre T \[degC\] +surface T \[degC\] +\(radius: r1 at the base, r2 at the rim\)/);
    expect(text).toMatch(/\n +3\.100 +85\.000 +85\.000 +r1\n/);
    expect(text).toMatch(/\n +5\.600 +[\d.]+ +[\d.]+ +r2\n/);
  });

  it('straight fins keep x_m (distance from the base)', async () => {
    const j = JSON.parse((await cli('solve', insulated, '--json')).stdout);
    expect(j.profile[0].x_m).toBe(0);
    expect(j.profile[0].r_m).toBeUndefined();
  });
});
