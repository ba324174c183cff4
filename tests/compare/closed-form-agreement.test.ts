/**
 * fd-1d and the `closed-form` model must agree on every profile that has a published closed form,
 * when the case matches the closed form's assumptions (uniform h, edges not cooled, adiabatic or
 * sharp tip): the drift is then the discretisation error of fd-1d alone.
 */
import { describe, expect, it } from 'vitest';
import { parseCaseObject } from '../../src/case/parse.js';
import { runCheck } from '../../src/compare/check.js';

const common = {
  material: { k: 180 },
  convection: { ambient: 20, h: 40, tip: 'adiabatic' },
  base: { temperature: 80 },
};

// Closed forms: Gardner 1945, Trans. ASME 67, 621 (straight profiles; from memory); Incropera et al.,
// Table 3.5 (pin, annular; from memory); truncated cone as derived in tests/reference/profiles.py
// (checked against a finite-volume solution there).
const cases: [string, Record<string, unknown>][] = [
  ['rectangular', { profile: 'rectangular', length: '30 mm', thickness: '2 mm', width: '50 mm', edges: 'insulated' }],
  ['triangular', { profile: 'triangular', length: '30 mm', baseThickness: '3 mm', width: '50 mm', edges: 'insulated' }],
  ['parabolic-concave', { profile: 'parabolic-concave', length: '30 mm', baseThickness: '3 mm', width: '50 mm', edges: 'insulated' }],
  ['parabolic-convex', { profile: 'parabolic-convex', length: '30 mm', baseThickness: '3 mm', width: '50 mm', edges: 'insulated' }],
  ['trapezoidal', { profile: 'trapezoidal', length: '30 mm', baseThickness: '3 mm', tipThickness: '1 mm', width: '50 mm', edges: 'insulated' }],
  ['pin', { profile: 'pin', length: '50 mm', diameter: '5 mm' }],
  ['conical-pin (full cone)', { profile: 'conical-pin', length: '40 mm', baseDiameter: '6 mm', tipDiameter: 0 }],
  ['conical-pin (truncated)', { profile: 'conical-pin', length: '40 mm', baseDiameter: '6 mm', tipDiameter: '2 mm' }],
  ['annular', { profile: 'annular', innerRadius: '10 mm', outerRadius: '25 mm', thickness: '1 mm' }],
];

describe.each(cases)('%s: fd-1d vs its closed form', (_name, fin) => {
  it("agree to 1e-6 relative (the foundation issue's acceptance level), with a GCI that covers the gap", async () => {
    const c = parseCaseObject({ name: 'agreement', fin, ...common });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: '1d' });
    const cf = report.models.find((m) => m.model === 'closed-form');
    expect(cf).toBeDefined();
    expect(Math.abs(cf!.drift)).toBeLessThan(1e-6);
    // The GCI (Fs = 1.25) should bound the true error; allow round-off (1e-12) on top.
    expect(Math.abs(cf!.drift)).toBeLessThan(report.reference.discretizationError * 1.0001 + 1e-12);
    expect(report.reference.energyBalance).toBeLessThan(1e-10);
  });
});

describe('closed-form is reported not applicable where no published form exists', () => {
  it('tabulated profile', async () => {
    const c = parseCaseObject({
      name: 'tab',
      fin: {
        profile: 'tabulated',
        shape: 'straight',
        width: '50 mm',
        points: [
          ['0 mm', '3 mm'],
          ['10 mm', '2 mm'],
          ['30 mm', '1 mm'],
        ],
      },
      ...common,
    });
    const { report } = await runCheck(c, { tolerance: 0.02, reference: '1d' });
    expect(report.models.map((m) => m.model)).not.toContain('closed-form');
    expect(report.notApplicable.find((n) => n.model === 'closed-form')?.reason).toMatch(/tabulated/);
  });
});
