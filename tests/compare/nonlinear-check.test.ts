/**
 * `check` on nonlinear fins: the Newton reference against the first-integral closed forms, the two
 * constant-h guesses of the shortcuts, and the fd-2d reference (Newton across the thickness).
 */
import { UsageError } from '../../src/errors.js';
import { describe, expect, it } from 'vitest';
import { parseCaseObject } from '../../src/case/parse.js';
import { runCheck } from '../../src/compare/check.js';

// Plate fin with insulated edges and an adiabatic tip: P = 2w, A = wt, m^2 = h_b P/(kA) = 2 h_b/(kt).
// k = 200, t = 2 mm, h_b = 10 give m = sqrt(50); L = 1/m makes mL = 1.
const m = Math.sqrt(50);
const w = 0.1;
const M = Math.sqrt(10 * 2 * w * 200 * w * 0.002) * 50; // sqrt(h_b P k A) theta_b, W

function powerLawCase(exponent: number) {
  return parseCaseObject({
    name: `power law n = ${exponent}`,
    fin: { profile: 'rectangular', length: 1 / m, thickness: 0.002, width: w, edges: 'insulated' },
    material: { k: 200 },
    convection: { ambient: 20, h: { law: 'power', base: 10, exponent }, tip: 'adiabatic' },
    base: { temperature: 70 },
  });
}

describe('power-law h, adiabatic tip, mL = 1', () => {
  // Q = q / (sqrt(h_b P k A) theta_b) from the first integral of the fin equation with h = h_b (theta/theta_b)^n:
  // Sen & Trinh 1986, J. Heat Transfer 108, 457 (from memory); values evaluated by quadrature with mpmath
  // in tests/reference/nonlinear.py, given to 10 digits.
  it.each([
    [0.25, 0.7283030125],
    [1 / 3, 0.7183075317],
    [2, 0.5834585319],
  ])('n = %s: the fd-1d reference matches Q = %s to 1e-6, and the base-h shortcut gives tanh(1)', async (n, Q) => {
    const { report } = await runCheck(powerLawCase(n), { tolerance: 0.02, reference: '1d' });
    expect(report.reference.model).toBe('fd-1d');
    // Finest grid error ~1e-8 (GCI); 1e-6 is the acceptance level of the nonlinear issue.
    expect(Math.abs(report.reference.heatRate_W / (Q * M) - 1)).toBeLessThan(1e-6);
    // h at the base temperature is h_b: the shortcut is the linear fin, q = M tanh(mL) (Incropera et al. 2007, Table 3.4 case B).
    const base = report.models.find((x) => x.model === 'tanh-L' && x.guess === 'base')!;
    expect(base.heatRate_W / (Math.tanh(1) * M)).toBeCloseTo(1, 10);
    expect(base.drift).toBeCloseTo(Math.tanh(1) / Q - 1, 6);
    // The ledger's constant-h row is the same comparison made with fd-1d on one grid.
    const row = report.assumptions.find((a) => a.assumption.startsWith('constant h'))!;
    expect(row.drift).toBeCloseTo(Math.tanh(1) / Q - 1, 6);
    // The mean-h guess lies between: h falls along the fin, so the mean is below h_b.
    const mean = report.models.find((x) => x.model === 'tanh-L' && x.guess === 'mean')!;
    expect(mean.guessValues!.h_W_per_m2K).toBeLessThan(10);
    expect(Math.abs(mean.drift)).toBeLessThan(Math.abs(base.drift));
  });
});

describe('radiation and tabulated conductivity', () => {
  it('radiation is reported with its view-factor assumption and a no-radiation ledger row', async () => {
    const c = parseCaseObject({
      name: 'radiating',
      fin: { profile: 'rectangular', length: 0.05, thickness: 0.002, width: w, edges: 'insulated' },
      material: { k: 180 },
      convection: { ambient: 20, h: 5, emissivity: 0.9, tip: 'adiabatic' },
      base: { temperature: 120 },
    });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: 'auto' });
    expect(report.reference.note).toMatch(/view factor 1/);
    expect(report.cautions.join(' ')).toMatch(/see only the surroundings/);
    const row = report.assumptions.find((a) => a.assumption === 'no radiation')!;
    expect(row.drift).toBeLessThan(-0.2); // at 120 degC radiation is comparable to h = 5 convection
  });
  it('k over temperature: a constant-k row, and a table that is flat recovers the linear answer exactly', async () => {
    const flat = parseCaseObject({
      name: 'flat table',
      fin: { profile: 'rectangular', length: 1 / m, thickness: 0.002, width: w, edges: 'insulated' },
      material: {
        k: {
          points: [
            [0, 200],
            [200, 200],
          ],
        },
      },
      convection: { ambient: 20, h: 10, tip: 'adiabatic' },
      base: { temperature: 70 },
    });
    const { report } = await runCheck(flat, { tolerance: 0.02, reference: '1d' });
    // Uniform fin, adiabatic tip: q = M tanh(mL) (Incropera et al. 2007, Table 3.4 case B; from memory).
    expect(Math.abs(report.reference.heatRate_W / (M * Math.tanh(1)) - 1)).toBeLessThan(1e-6);
    expect(report.assumptions.find((a) => a.assumption.startsWith('constant k'))!.drift).toBeCloseTo(0, 12);
  });
});

describe('fd-2d reference for nonlinear fins (Newton across the thickness)', () => {
  it.each(['auto', '2d'] as const)('--reference %s: fd-2d is the reference, fd-1d a model, the 1-D conduction row their drift', async (reference) => {
    const { report, twoD } = await runCheck(powerLawCase(0.25), { tolerance: 0.02, reference });
    expect(report.reference.model).toBe('fd-2d');
    expect(report.reference.note).toMatch(/nonlinear, Newton converged/);
    expect(twoD).not.toBeNull();
    // Bi = h_b (t/2)/k = 5e-5: the 2-D fin is within ~Bi of the 1-D first integral (Sen & Trinh 1986,
    // Q = 0.7283030125 at n = 1/4, mL = 1, as above), and the 2-D grids resolve it to ~1e-6 (GCI).
    expect(Math.abs(report.reference.heatRate_W / (0.7283030125 * M) - 1)).toBeLessThan(1e-4);
    expect(report.reference.discretizationError).toBeLessThan(1e-5);
    expect(report.reference.energyBalance).toBeLessThan(1e-9);
    const fd1d = report.models.find((x) => x.model === 'fd-1d')!;
    const row = report.assumptions[0]!;
    expect(row.assumption).toMatch(/^one-dimensional conduction/);
    expect(row.madeBy).toContain('fd-1d');
    // Insulated edges: no edge correction, so the fd-1d row's drift is the ledger's 1-D conduction drift.
    expect(fd1d.drift).toBeCloseTo(row.drift, 12);
    // The 1-D model neglects the drop across the thickness, so it over-predicts (slightly, at this Bi).
    expect(row.drift).toBeGreaterThan(0);
    expect(row.drift).toBeLessThan(1e-4);
  });
  it('a thick fin: the thick-fin flag states the drift the 2-D solution measures; cooled edges are added from fd-1d', async () => {
    // Bi = h_b (t/2)/k = 2000 * 0.005 / 20 = 0.5.
    const c = parseCaseObject({
      name: 'thick boiling fin',
      fin: { profile: 'rectangular', length: 0.02, thickness: 0.01, width: 0.05, edges: 'cooled' },
      material: { k: 20 },
      convection: { ambient: 100, h: { law: 'power', base: 2000, exponent: 2 }, tip: 'convective' },
      base: { temperature: 120 },
    });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: 'auto' });
    expect(report.reference.model).toBe('fd-2d');
    expect(report.reference.note).toMatch(/side edges' cooling added from fd-1d/);
    const row = report.assumptions.find((a) => a.assumption.startsWith('one-dimensional conduction'))!;
    // At Bi = 0.5 the 1-D model over-predicts by several per cent (linear plate fins: the exact 2-D series of tests/reference/fin2d_series.py; cf. Lau & Tan 1973, J. Heat Transfer 95(4), 549, from memory).
    expect(row.drift).toBeGreaterThan(0.02);
    const flag = report.flags.find((f) => f.flag === 'thick-fin')!;
    expect(flag.message).toContain(`over-predicting by ${(100 * row.drift).toFixed(1)} %`);
  });
  it('a nonlinear infinite tip is outside the 2-D model: auto keeps fd-1d and says why, 2d is a usage error', async () => {
    const c = parseCaseObject({
      name: 'long fin',
      fin: { profile: 'rectangular', length: 0.2, thickness: 0.002, width: w, edges: 'insulated' },
      material: { k: 200 },
      convection: { ambient: 20, h: { law: 'power', base: 10, exponent: 0.25 }, tip: 'infinite' },
      base: { temperature: 70 },
    });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: 'auto' });
    expect(report.reference.model).toBe('fd-1d');
    expect(report.reference.note).toMatch(/2-D model does not cover this fin \(an infinite tip of a nonlinear fin/);
    // The library states the reason in the problem's words (the command line adds its option: tests/plots).
    await expect(runCheck(c, { tolerance: 0.02, reference: '2d' })).rejects.toThrow(UsageError);
    await expect(runCheck(c, { tolerance: 0.02, reference: '2d' })).rejects.toThrow(/fd-2d: an infinite tip of a nonlinear fin is not modelled in 2-D/);
  });
});
