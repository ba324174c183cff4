/**
 * A verdict is never given on an unresolved reference (issue 9, item 4). A 300 m copper pin
 * (mL ~ 3500) used to fall back to fd-1d with a GCI of 14 % and call the exact closed forms unsafe at
 * -8 %: the study now grades its grid to the decay length 1/m and refines until the GCI is at most a
 * tenth of the tolerance, and says `unresolved` when its budget cannot get there.
 *
 * Exact values: uniform pin, adiabatic tip q = sqrt(h P k A) theta_b tanh(mL); infinite fin
 * q = sqrt(h P k A) theta_b (Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass
 * Transfer, 6th ed., 2007, Table 3.4, cases B and D).
 */
import { describe, expect, it } from 'vitest';
import { parseCaseObject } from '../../src/case/parse.js';
import { runCheck } from '../../src/compare/check.js';
import { studyFin1D } from '../../src/fd/one-d/linear-solve.js';
import { resolveStudy1D } from '../../src/fd/study/resolve-study1d.js';
import type { LinearFinCase } from '../../src/fd/problem/linear-case.js';

const D = 0.003;
const k = 388;
const h = 40;
const thetaB = 50;
const L = 300;

function longPin(tip: string): Record<string, unknown> {
  return {
    name: 'long copper pin',
    fin: { profile: 'pin', length: `${L} m`, diameter: `${D * 1000} mm` },
    material: { k },
    convection: { ambient: 30, h, tip },
    base: { temperature: 30 + thetaB },
  };
}

const P = Math.PI * D;
const A = (Math.PI * D * D) / 4;
const m = Math.sqrt((h * P) / (k * A));
const M = Math.sqrt(h * P * k * A) * thetaB;
const exact: Record<string, number> = { adiabatic: M * Math.tanh(m * L), infinite: M };

describe.each(['adiabatic', 'infinite'])('300 m copper pin, %s tip (mL ~ 3500)', (tip) => {
  it('gets a resolved fd-1d reference that matches the exact closed form within its GCI, and the closed forms are ok', async () => {
    expect(m * L).toBeGreaterThan(3000);
    const c = parseCaseObject(longPin(tip));
    const { report } = await runCheck(c, { tolerance: 0.02, reference: '1d' });
    const ref = report.reference;
    expect(ref.model).toBe('fd-1d');
    expect(ref.resolved).toBe(true);
    // Resolved means the GCI is at most a tenth of the 2 % tolerance.
    expect(ref.discretizationError).toBeLessThanOrEqual(0.002);
    // The GCI (Fs = 1.25) must bound the true error of the reference.
    expect(Math.abs(ref.heatRate_W - (exact[tip] as number)) / (exact[tip] as number)).toBeLessThanOrEqual(ref.discretizationError);
    const closed = report.models.filter((r) => r.model === 'closed-form' || r.model === 'tanh-L');
    expect(closed.length).toBeGreaterThan(0);
    for (const r of closed) expect(r.verdict).toBe('ok');
  });

  it('with the default reference (fd-2d where the 2-D model covers the pin, else fd-1d) the closed forms are ok too', async () => {
    const { report } = await runCheck(parseCaseObject(longPin(tip)), { tolerance: 0.02, reference: 'auto' });
    expect(report.reference.resolved).toBe(true);
    for (const r of report.models.filter((x) => x.model === 'closed-form')) expect(r.verdict).toBe('ok');
  });
});

describe('unresolved references', () => {
  it('a uniform grid refined within a small budget cannot resolve the long pin: resolved false, the budget spent', () => {
    const c = parseCaseObject(longPin('adiabatic')) as LinearFinCase;
    const { study, resolution } = resolveStudy1D((nodes, g) => studyFin1D(c, { nodes, grading: g }), null, 0.002, { maxFinestNodes: 16001 });
    expect(resolution.resolved).toBe(false);
    expect(resolution.refinements).toBe(2);
    expect(resolution.nodes[resolution.nodes.length - 1]).toBe(16001);
    expect(study.study.gci).toBeGreaterThan(0.002);
  });

  it('a check forced to exhaust its budget gives the verdict unresolved on every model, never ok or unsafe', async () => {
    // Tolerance 1e-7 asks for a GCI of 1e-8; the budget allows no refinement beyond the default grids.
    const c = parseCaseObject(longPin('adiabatic'));
    const { report } = await runCheck(c, { tolerance: 1e-7, reference: '1d', resolutionBudget: { maxFinestNodes: 4001 } });
    expect(report.reference.resolved).toBe(false);
    expect(report.reference.resolution.target).toBeCloseTo(1e-8, 20);
    expect(report.reference.note).toMatch(/NOT RESOLVED/);
    expect(report.models.length).toBeGreaterThan(0);
    for (const r of report.models) expect(r.verdict).toBe('unresolved');
  });

  it('an ordinary fin keeps the default study (no refinement) and is resolved', async () => {
    const c = parseCaseObject({ ...longPin('adiabatic'), fin: { profile: 'pin', length: '30 mm', diameter: '3 mm' } });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: '1d' });
    expect(report.reference.resolved).toBe(true);
    expect(report.reference.resolution.refinements).toBe(0);
    expect(report.reference.resolution.grading).toBe('default grading');
  });
});
