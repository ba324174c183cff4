import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './run.js';

const tmp = mkdtempSync(join(tmpdir(), 'fincheck-cli-'));
function caseFile(name: string, text: string): string {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
}

// Check case R1 of the uniform-fin tables: aluminium plate fin k = 180, h = 40, t = 2 mm, w = 50 mm,
// L = 30 mm, theta_b = 60 K, convective tip. Exact 1-D heat rate 7.203722261 W (Incropera et al.,
// Fundamentals of Heat and Mass Transfer, Table 3.4, case A; table number from memory; value computed
// with mpmath from that closed form), corrected-length value 7.203708456 W (Harper & Brown 1922).
const R1 = caseFile(
  'r1.yaml',
  `name: R1 plate fin
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40, tip: convective }
base: { temperature: 80 degC }
`,
);

describe('fincheck check --json', () => {
  it('prints one JSON document with the contract keys and the published heat rates (R1)', async () => {
    const r = await cli('check', R1, '--json', '--reference', '1d');
    expect(r.code).toBe(0);
    expect(r.stderr).toBe('');
    const j = JSON.parse(r.stdout);
    expect(Object.keys(j)).toEqual(expect.arrayContaining(['case', 'tolerance', 'reference', 'models', 'assumptions', 'flags', 'cautions']));
    expect(j.tolerance).toBe(0.02);
    expect(j.reference.model).toBe('fd-1d');
    // fd-1d vs the exact closed form: the study's finest grid is accurate to ~1e-8 (GCI); 1e-6 is the
    // acceptance level of the foundation issue.
    expect(Math.abs(j.reference.heatRate_W / 7.203722261 - 1)).toBeLessThan(1e-6);
    expect(j.reference.discretizationError).toBeLessThan(1e-6);
    const byId = Object.fromEntries(j.models.map((m: { model: string }) => [m.model, m]));
    expect(Object.keys(byId).sort()).toEqual(['closed-form', 'convective-tip', 'tanh-L', 'tanh-Lc', 'tanh-Lc-thin']);
    // 10 significant digits in the reference table: 1e-9 relative.
    expect(Math.abs(byId['tanh-Lc'].heatRate_W / 7.203708456 - 1)).toBeLessThan(1e-9);
    expect(Math.abs(byId['convective-tip'].heatRate_W / 7.203722261 - 1)).toBeLessThan(1e-9);
    // tanh-Lc's drift equals the table's corrected-length error (-1.92e-6) to the reference's accuracy.
    expect(byId['tanh-Lc'].drift).toBeCloseTo(-1.92e-6, 7);
    for (const m of j.models) {
      expect(m.verdict).toBe(Math.abs(m.drift) <= 0.02 ? 'ok' : Math.abs(m.drift) <= 0.04 ? 'marginal' : 'unsafe');
      expect(m.drift).toBeCloseTo((m.heatRate_W - j.reference.heatRate_W) / j.reference.heatRate_W, 12);
    }
    expect(j.cautions.join(' ')).toMatch(/confirm .* by test/);
    expect(j.cautions.join(' ')).toMatch(/h is usually the largest uncertainty/);
  });

  it('--tolerance changes the verdicts; --strict exits 1 only when a shortcut is unsafe', async () => {
    // tanh-L drifts -2.7 % on R1 (adiabatic instead of convective tip): marginal at 2 %, unsafe at 1 %.
    const loose = await cli('check', R1, '--json', '--strict');
    expect(loose.code).toBe(0);
    const tight = await cli('check', R1, '--json', '--strict', '--tolerance', '1%');
    expect(tight.code).toBe(1);
    const j = JSON.parse(tight.stdout);
    expect(j.tolerance).toBe(0.01);
    expect(j.models.find((m: { model: string }) => m.model === 'tanh-L').verdict).toBe('unsafe');
  });

  it('prints a readable table naming the reference, each model and the cautions', async () => {
    const r = await cli('check', R1, '--reference', '1d');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Reference \(fd-1d\): heat rate 7\.2037\d* W/);
    for (const id of ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form']) expect(r.stdout).toContain(id);
    expect(r.stdout).toContain('Where the drift comes from');
    expect(r.stdout).toContain('Cautions:');
  });
});

describe('fincheck check, prescribed tip temperature', () => {
  it('R1 with the tip held at 35 degC (theta_L = 15 K): closed form 29.76665185 W, fd-1d within 1e-6', async () => {
    // Incropera et al. 2007, Table 3.4 case C (from memory for the table number); value computed with mpmath.
    const tipC = caseFile('r1-tip.yaml', (await import('node:fs')).readFileSync(R1, 'utf8').replace('tip: convective', 'tip: { temperature: 35 degC }'));
    const j = JSON.parse((await cli('check', tipC, '--json', '--reference', '1d')).stdout);
    const cf = j.models.find((m: { model: string }) => m.model === 'closed-form');
    expect(Math.abs(cf.heatRate_W / 29.76665185 - 1)).toBeLessThan(1e-9);
    expect(Math.abs(j.reference.heatRate_W / 29.76665185 - 1)).toBeLessThan(1e-6);
  });
});

describe('fincheck check with the 2-D reference', () => {
  // Plate fin with Bi = h b / k = 0.1 and mL = 1 (b = t/2 = 1 mm, L = b / sqrt(Bi)), insulated edges, convective
  // tip with the face h. Exact 2-D eigen-series (separation of variables for the rectangular fin, cf. Lau &
  // Tan 1973, J. Heat Transfer 95, 549; from memory): eta_2D = 0.648851377 on the area 2L + 2b; exact 1-D
  // convective tip eta = 0.659934986 (Incropera et al. 2007, Table 3.4 case A; from memory); values computed with
  // mpmath in tests/reference/fin2d_series.py.
  const L = 0.001 / Math.sqrt(0.1);
  const plate = caseFile(
    'plate-bi01.yaml',
    `name: plate Bi 0.1 mL 1
fin: { profile: rectangular, length: ${L}, thickness: 2 mm, width: 100 mm, edges: insulated }
material: { k: 10 }
convection: { ambient: 20, h: 1000, tip: convective }
base: { temperature: 70 }
`,
  );
  it('auto picks fd-2d; the one-dimensional conduction row equals the exact series error (+1.708 %)', async () => {
    const r = await cli('check', plate, '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.reference.model).toBe('fd-2d');
    expect(Object.keys(j.reference.grid).sort()).toEqual(['nx', 'ny']);
    const q2d = 0.648851377 * 1000 * (2 * L + 0.002) * 0.1 * 50;
    // The 2-D study's GCI is ~1e-4 here (corner singularity, order ~1.9): 5e-4 relative covers it.
    expect(Math.abs(j.reference.heatRate_W / q2d - 1)).toBeLessThan(5e-4);
    expect(Math.abs(j.reference.heatRate_W / q2d - 1)).toBeLessThan(2 * j.reference.discretizationError + 1e-6);
    const row = j.assumptions.find((a: { assumption: string }) => a.assumption.startsWith('one-dimensional conduction'));
    expect(row.drift).toBeCloseTo(0.659934986 / 0.648851377 - 1, 3);
    const fd1d = j.models.find((m: { model: string }) => m.model === 'fd-1d');
    expect(fd1d.drift).toBeCloseTo(row.drift, 12);
    expect(j.flags.find((f: { flag: string }) => f.flag === 'thick-fin').message).toMatch(/2-D solution shows/);
  });
  it('--reference 1d keeps fd-1d and has no one-dimensional row', async () => {
    const j = JSON.parse((await cli('check', plate, '--json', '--reference', '1d')).stdout);
    expect(j.reference.model).toBe('fd-1d');
    expect(j.assumptions.map((a: { assumption: string }) => a.assumption).join()).not.toMatch(/one-dimensional/);
  });
});

describe('exit codes and messages for bad input (exit 2, nothing on stdout)', () => {
  it.each([
    ['unknown option', ['check', R1, '--bogus'], /unknown option '--bogus'/],
    ['bad tolerance', ['check', R1, '--tolerance', '150%'], /--tolerance: got "150%"/],
    ['bad reference', ['check', R1, '--reference', '3d'], /--reference: got "3d"; expected auto, 1d or 2d/],
    ['missing file', ['check', join(tmp, 'missing.yaml')], /missing\.yaml.*no such file/],
    ['bad nodes', ['solve', R1, '--nodes', '2.5'], /--nodes: got "2\.5"/],
  ])('%s', async (_name, argv, message) => {
    const r = await cli(...argv);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(message);
  });

  it('a case with an error names the key path, the value, what is accepted and the line', async () => {
    const bad = caseFile(
      'bad.yaml',
      'name: x\nfin:\n  profile: rectangular\n  length: 30 mm\n  thickness: -2 mm\n  width: 50 mm\nmaterial: { k: 180 }\nconvection: { ambient: 20, h: 40, tip: convective }\nbase: { temperature: 80 }\n',
    );
    const r = await cli('check', bad, '--json');
    expect(r.code).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/bad\.yaml:5(:\d+)?: fin\.thickness: got .*-2 mm/);
  });
});

describe('fincheck solve', () => {
  it('--nodes N solves once on exactly that grid: discretizationError null, N profile points', async () => {
    const r = await cli('solve', R1, '--nodes', '101', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.model).toBe('fd-1d');
    expect(j.grid).toEqual({ nodes: 101 });
    expect(j.discretizationError).toBeNull();
    expect(j.profile).toHaveLength(101);
    expect(j.profile[0].x_m).toBe(0);
    expect(j.profile[100].x_m).toBeCloseTo(0.03, 15);
    expect(j.baseTemperature_degC).toBeCloseTo(80, 12);
    // Second-order scheme at 100 cells, mL = 0.456: error ~ (mL)^2/(12 N^2) ~ 2e-6 relative.
    expect(Math.abs(j.heatRate_W / 7.203722261 - 1)).toBeLessThan(1e-5);
    // Tip temperature: theta(L) = 53.92214373 K (closed form, Incropera et al. 2007, Table 3.4 case A) + 20 degC.
    expect(j.tipTemperature_degC).toBeCloseTo(73.92214373, 4);
  });
  it('by default runs a refinement study and reports the GCI', async () => {
    const j = JSON.parse((await cli('solve', R1, '--json')).stdout);
    expect(j.discretizationError).toBeGreaterThan(0);
    expect(j.discretizationError).toBeLessThan(1e-6);
    expect(Math.abs(j.heatRate_W / 7.203722261 - 1)).toBeLessThan(1e-6);
    expect(j.energyBalance).toBeLessThan(1e-10);
  });
});

describe('fincheck solve --model 2d', () => {
  it('--grid NXxNY solves once: grid as given, centre line and surface, no 1-D profile', async () => {
    const r = await cli('solve', R1, '--model', '2d', '--grid', '61x9', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.model).toBe('fd-2d');
    expect(j.grid).toEqual({ nx: 61, ny: 9 });
    expect(j.discretizationError).toBeNull();
    expect(j.profile).toBeUndefined();
    expect(j.centreline).toHaveLength(61);
    expect(j.surface).toHaveLength(61);
    // Bi = h b / k = 2.2e-4: the section is nearly isothermal across, so centre and surface agree to
    // ~Bi * theta = 0.013 K, and the heat rate is within a few 1e-4 of the 1-D closed form with insulated
    // edges (P = 2w): the R1 fin per unit width, 2-D error ~Bi/6 (small-Bi asymptote of the exact series).
    for (let i = 0; i < 61; i++) expect(Math.abs(j.centreline[i].T_degC - j.surface[i].T_degC)).toBeLessThan(0.02);
    expect(j.energyBalance).toBeLessThan(1e-9);
  });
  it('rejects --grid with the 1-D model and --nodes with the 2-D model (exit 2)', async () => {
    expect((await cli('solve', R1, '--grid', '10x10')).code).toBe(2);
    expect((await cli('solve', R1, '--model', '2d', '--nodes', '100')).stderr).toMatch(/--nodes goes with --model 1d/);
    expect((await cli('solve', R1, '--model', '3d')).stderr).toMatch(/--model: got "3d"; expected 1d or 2d/);
  });
});

describe('fincheck materials and schema', () => {
  it('materials lists each material with k and a source', async () => {
    const r = await cli('materials', '--json');
    const j = JSON.parse(r.stdout);
    expect(j.materials.length).toBeGreaterThan(10);
    for (const m of j.materials) {
      expect(m.k_W_per_mK).toBeGreaterThan(0);
      expect(m.source.length).toBeGreaterThan(10);
    }
  });
  it('schema prints a JSON Schema naming the top-level keys', async () => {
    const j = JSON.parse((await cli('schema')).stdout);
    expect(JSON.stringify(j)).toContain('contactResistance');
    expect(j.type ?? j.anyOf ?? j.oneOf).toBeDefined();
  });
  it('--help of every command shows examples', async () => {
    for (const cmd of ['check', 'solve', 'materials', 'schema', 'demo']) {
      const r = await cli(cmd, '--help');
      expect(r.code).toBe(0);
      expect(r.stdout).toContain('Examples:');
    }
  });
});
