/**
 * Every map point carries exactly the numbers `fincheck check --json` prints for the case file with the two axis
 * values written in (outputs.md: "Each point's numbers are exactly what fincheck check prints"). Compared with
 * toBe: the same doubles, not close ones, because both run the same pipeline on the same validated case.
 * Inputs are invented.
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from '../cli/run.js';
import { caseFile, tmp } from './support.js';

interface CheckJson {
  reference: { model: string; heatRate_W: number; efficiency: number; discretizationError: number; resolved: boolean };
  models: { model: string; heatRate_W: number; efficiency: number; drift: number; verdict: string }[];
}

interface MapJson {
  reference: string;
  tolerance: number;
  x: { key: string; unit: string; values: number[] };
  y: { key: string; unit: string; values: number[] };
  models: string[];
  summary: {
    points: number;
    solved: number;
    errors: number;
    errorGroups: { example: string; count: number }[];
    references: { model: string; points: number }[];
  };
  points: (
    | { x: number; y: number; error: string }
    | {
        x: number;
        y: number;
        biot: number;
        reference: CheckJson['reference'];
        models: CheckJson['models'];
      }
  )[];
}

const plateFin = (thickness: string, h: string): string => `name: map check plate
fin: { profile: rectangular, length: 30 mm, thickness: ${thickness}, width: 50 mm }
material: { k: 180 W/(m*K) }
convection: { ambient: 20 degC, h: ${h}, tip: convective }
base: { temperature: 80 degC, contactResistance: 1e-4 m^2*K/W }
`;

const taperedFin = (base: string, tip: string): string => `name: map check taper
fin: { profile: trapezoidal, length: 25 mm, baseThickness: ${base}, tipThickness: ${tip}, width: 40 mm }
material: aluminium-6063
convection: { ambient: 25 degC, h: 60, tip: adiabatic }
base: { temperature: 70 degC }
`;

async function checkJson(name: string, text: string, reference = '1d'): Promise<CheckJson> {
  const r = await cli('check', caseFile(name, text), '--json', '--reference', reference);
  expect(r.code, r.stderr).toBe(0);
  return JSON.parse(r.stdout) as CheckJson;
}

describe('map points equal fincheck check on the same parameters', () => {
  it('plate fin over thickness (mm) and h (log axis): every point, every number', async () => {
    const file = caseFile('plate.yaml', plateFin('2 mm', '40 W/(m^2*K)'));
    const out = join(tmp, 'plate-out');
    const r = await cli(
      'map',
      file,
      '--x',
      'fin.thickness=1:4 mm',
      '--y',
      'convection.h=20:400 W/(m^2*K)',
      '--log-y',
      '--steps',
      '4x3',
      '--reference',
      '1d',
      '--jobs',
      '1',
      '--json',
      '--out',
      out,
    );
    expect(r.code, r.stderr).toBe(0);
    const map = JSON.parse(r.stdout) as MapJson;
    expect(map.x).toMatchObject({ key: 'fin.thickness', unit: 'mm', values: [1, 2, 3, 4] });
    expect(map.y.unit).toBe('W/(m^2*K)');
    expect(map.y.values[0]).toBe(20);
    expect(map.y.values[2]).toBe(400);
    // Log spacing: the middle value is the geometric mean, sqrt(20 * 400), to the 12 digits values are kept to.
    expect(map.y.values[1]).toBeCloseTo(Math.sqrt(8000), 9);
    expect(map.points).toHaveLength(12);
    expect(map.summary.references).toEqual([{ model: 'fd-1d', points: 12, unresolved: 0 }]);
    for (let j = 0; j < 3; j++) {
      for (let i = 0; i < 4; i++) {
        const p = map.points[j * 4 + i];
        if (!p || 'error' in p) throw new Error(`point ${i},${j} has no result`);
        // Points run x fastest: index = j * NX + i.
        expect([p.x, p.y]).toEqual([map.x.values[i], map.y.values[j]]);
        const check = await checkJson(`plate-${i}-${j}.yaml`, plateFin(`${p.x} mm`, `${p.y} W/(m^2*K)`));
        expect(p.reference.model).toBe(check.reference.model);
        expect(p.reference.heatRate_W).toBe(check.reference.heatRate_W);
        expect(p.reference.efficiency).toBe(check.reference.efficiency);
        expect(p.reference.discretizationError).toBe(check.reference.discretizationError);
        expect(p.models.map((m) => m.model)).toEqual(check.models.map((m) => m.model));
        for (const m of p.models) {
          const c = check.models.find((x) => x.model === m.model);
          expect(m).toEqual({ model: c?.model, heatRate_W: c?.heatRate_W, efficiency: c?.efficiency, drift: c?.drift, verdict: c?.verdict });
        }
        // Bi = h (t/2) / k at the base (case-format.md definition).
        expect(p.biot).toBeCloseTo((p.y * (p.x / 2000)) / 180, 15);
      }
    }
    // --json prints the same document that map.json holds.
    expect(readFileSync(join(out, 'map.json'), 'utf8')).toBe(r.stdout);
  });

  it('with the default reference (fd-2d where the case allows, fd-1d shown beside it) the numbers equal check', async () => {
    const file = caseFile('plate2d.yaml', plateFin('2 mm', '40 W/(m^2*K)'));
    const r = await cli(
      'map',
      file,
      '--x',
      'fin.thickness=2:6 mm',
      '--y',
      'convection.h=200:2000 W/(m^2*K)',
      '--steps',
      '2x2',
      '--jobs',
      '1',
      '--json',
      '--out',
      join(tmp, 'plate2d-out'),
    );
    expect(r.code, r.stderr).toBe(0);
    const map = JSON.parse(r.stdout) as MapJson;
    // fd-2d once the 2-D reference is wired into check; fd-1d is mapped as a model exactly when it is not the reference.
    expect(map.models.includes('fd-1d')).toBe(map.reference === 'fd-2d');
    for (const p of map.points) {
      if ('error' in p) throw new Error(p.error);
      const check = await checkJson(`plate2d-${p.x}-${p.y}.yaml`, plateFin(`${p.x} mm`, `${p.y} W/(m^2*K)`), 'auto');
      expect(p.reference).toEqual({
        model: check.reference.model,
        heatRate_W: check.reference.heatRate_W,
        efficiency: check.reference.efficiency,
        discretizationError: check.reference.discretizationError,
        resolved: check.reference.resolved,
      });
      expect(p.models.map((m) => [m.model, m.drift, m.verdict])).toEqual(check.models.map((m) => [m.model, m.drift, m.verdict]));
    }
  });

  it('material.k over a built-in material: each point is the case with material: { k: value }', async () => {
    const named = caseFile('named.yaml', taperedFin('3 mm', '1 mm'));
    const r = await cli(
      'map',
      named,
      '--x',
      'material.k=50:200 W/(m*K)',
      '--y',
      'convection.h=20:80',
      '--steps',
      '2x2',
      '--reference',
      '1d',
      '--jobs',
      '1',
      '--json',
      '--out',
      join(tmp, 'named-out'),
    );
    expect(r.code, r.stderr).toBe(0);
    const map = JSON.parse(r.stdout) as MapJson;
    for (const p of map.points) {
      if ('error' in p) throw new Error(p.error);
      const text = taperedFin('3 mm', '1 mm').replace('material: aluminium-6063', `material: { k: ${p.x} W/(m*K) }`).replace('h: 60', `h: ${p.y}`);
      const check = await checkJson(`named-${p.x}-${p.y}.yaml`, text);
      expect(p.reference.heatRate_W).toBe(check.reference.heatRate_W);
      expect(p.models.map((m) => m.drift)).toEqual(check.models.map((m) => m.drift));
    }
  });

  it('a point where the case becomes invalid (tip thicker than base) is a marked cell, counted; the others equal check', async () => {
    const file = caseFile('taper.yaml', taperedFin('3 mm', '1 mm'));
    const out = join(tmp, 'taper-out');
    const r = await cli(
      'map',
      file,
      '--x',
      'fin.tipThickness=0.5mm:2.5mm',
      '--y',
      'fin.baseThickness=1mm:3mm',
      '--steps',
      '3x3',
      '--reference',
      '1d',
      '--jobs',
      '1',
      '--json',
      '--out',
      out,
    );
    expect(r.code, r.stderr).toBe(0);
    const map = JSON.parse(r.stdout) as MapJson;
    // tip 0.5/1.5/2.5 mm against base 1/2/3 mm: tip > base at (1.5, 1), (2.5, 1) and (2.5, 2).
    const invalid = map.points.filter((p) => 'error' in p).map((p) => [p.x, p.y]);
    expect(invalid).toEqual([
      [1.5, 1],
      [2.5, 1],
      [2.5, 2],
    ]);
    expect(map.summary).toMatchObject({ points: 9, solved: 6, errors: 3, references: [{ model: 'fd-1d', points: 6 }] });
    expect(map.summary.errorGroups).toHaveLength(1);
    expect(map.summary.errorGroups[0]?.count).toBe(3);
    for (const p of map.points) {
      if ('error' in p) {
        expect(p.error).toMatch(/^fin\.tipThickness: got "\d\.\d mm"; expected a length from 0 to baseThickness/);
        expect(Object.keys(p).sort()).toEqual(['error', 'x', 'y']);
        continue;
      }
      const check = await checkJson(`taper-${p.x}-${p.y}.yaml`, taperedFin(`${p.y} mm`, `${p.x} mm`));
      expect(p.reference.heatRate_W).toBe(check.reference.heatRate_W);
      for (const m of p.models) expect(m.drift).toBe(check.models.find((c) => c.model === m.model)?.drift);
    }
    // The CSV marks the same cells: an error column, empty result columns.
    const csv = readFileSync(join(out, 'map.csv'), 'utf8').trim().split('\n');
    expect(csv).toHaveLength(10);
    expect(csv[0]).toMatch(/^i,j,fin\.tipThickness \[mm\],fin\.baseThickness \[mm\],Bi \[-\],mL \[-\],reference,/);
    expect(csv[2]).toMatch(/^1,0,1\.5,1,,,,,.*,"fin\.tipThickness: got ""1\.5 mm""; expected .*"$/);
    expect(readdirSync(out).filter((f) => f.endsWith('.tmp'))).toEqual([]);
    expect(existsSync(join(out, 'overview.png'))).toBe(true);
  });
});

describe('nonlinear fins on a map', () => {
  it('power-law h: each point shows the base-temperature guess, the same numbers as check', async () => {
    const text = (length: string, base: string) => `name: map natural convection
fin: { profile: rectangular, length: ${length}, thickness: 3 mm, width: 100 mm }
material: { k: 200 }
convection: { ambient: 25 degC, h: { law: power, base: ${base}, exponent: 0.25 }, tip: adiabatic }
base: { temperature: 75 degC }
`;
    const file = caseFile('natural.yaml', text('40 mm', '6'));
    const r = await cli(
      'map',
      file,
      '--x',
      'fin.length=20:60 mm',
      '--y',
      'convection.h.base=4:8',
      '--steps',
      '2x2',
      '--reference',
      '1d',
      '--jobs',
      '1',
      '--json',
      '--out',
      join(tmp, 'natural-out'),
    );
    expect(r.code, r.stderr).toBe(0);
    const map = JSON.parse(r.stdout) as MapJson & { shortcutGuess: string | null };
    expect(map.shortcutGuess).toBe('base');
    expect(new Set(map.models).size).toBe(map.models.length);
    const p = map.points[3]!;
    if ('error' in p) throw new Error(p.error);
    const check = (await checkJson('natural-60.yaml', text('60 mm', '8'))) as unknown as {
      reference: CheckJson['reference'];
      models: (CheckJson['models'][number] & { guess?: string })[];
    };
    expect(p.reference.heatRate_W).toBe(check.reference.heatRate_W);
    const tanhL = check.models.find((m) => m.model === 'tanh-L' && m.guess === 'base')!;
    expect(p.models.find((m) => m.model === 'tanh-L')!.drift).toBe(tanhL.drift);
  });
});
