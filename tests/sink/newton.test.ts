/**
 * fd-3d on nonlinear heat sinks: a power-law h on the fins and a k(T) table, solved by Newton in the Kirchhoff
 * potential (src/fd/three-d/sink-newton.ts). Checked against
 *   - the linear solver itself where the law is linear in disguise (exponent 0, a flat table): same numbers;
 *   - a closed form: a bare plate heated over its whole underside is a 1-D slab, in which k dT/dz = −q'' gives
 *     ∫_{T_top}^{T_bottom} k dT = q'' t exactly (the Kirchhoff transform; Kirchhoff 1894, Vorlesungen über die
 *     Theorie der Wärme [from memory]) and h θ_top = q'' at the top;
 *   - the power-law fin with an adiabatic tip (Sen & Trinh 1986, J. Heat Transfer 108, 457-459; Ünal 1985,
 *     IJHMT 28, 2279-2284 [both from memory]), implemented and tested in src/analytic/nonlinear.ts: identical fins
 *     on a plate of very high conductivity heated over its whole underside all stand on one root temperature.
 */
import { describe, expect, it } from 'vitest';
import { powerLawHAdiabaticFin } from '../../src/analytic/index.js';
import type { Conductivity, HDistribution } from '../../src/case/index.js';
import { solveSinkOnGrid, studySink } from '../../src/fd/index.js';
import { plateFin, sinkCase, type SinkInputs } from './support/sink-case.js';

const one = { grids: 1 };

const sink: SinkInputs = {
  plate: [0.05, 0.04, 0.004],
  kPlate: 180,
  fin: plateFin(0.025, 0.0015, 0.04),
  array: { kind: 'plates', count: 5, pitch: 0.01 },
  hPlate: 8,
  h: { kind: 'uniform', h: 6 },
  sources: [
    { centre: [0.015, 0.02], size: [0.012, 0.016], power: 12 },
    { centre: [0.036, 0.018], size: [0.01, 0.01], power: 6 },
  ],
};

const withK = (inputs: SinkInputs, k: Conductivity) => {
  const c = sinkCase(inputs);
  const material = (m: { name: string; source: string }) => ({ ...m, k });
  return {
    ...c,
    plate: { ...c.plate, material: material(c.plate.material) },
    fin: c.fin === null ? null : { ...c.fin, material: material(c.fin.material) },
  };
};

describe('laws that are linear in disguise take the Newton path and give the linear numbers', () => {
  const linear = studySink(sinkCase(sink), one);
  it('a power law of exponent 0 is the uniform h at its base value', () => {
    // Same system, same start: Newton converges at its first check; the residual target 1e-10 bounds the gap.
    const power = studySink(sinkCase({ ...sink, h: { kind: 'power', base: 6, exponent: 0 } }), one);
    expect(power.solver.method).toMatch(/Newton/);
    power.sources.forEach((s, k) => expect(s.meanRise_K).toBeCloseTo(linear.sources[k]!.meanRise_K, 7));
    power.fins.forEach((f, k) => expect(f.heatRate_W).toBeCloseTo(linear.fins[k]!.heatRate_W, 8));
  });

  it('a flat k(T) table is the constant k', () => {
    const flat = studySink(withK(sink, { kind: 'table', T_degC: Float64Array.of(0, 200), k: Float64Array.of(180, 180) }), one);
    expect(flat.solver.method).toMatch(/Newton/);
    flat.sources.forEach((s, k) => expect(s.meanRise_K).toBeCloseTo(linear.sources[k]!.meanRise_K, 7));
    expect(flat.plateTopMean_degC).toBeCloseTo(linear.plateTopMean_degC, 7);
  });
});

describe('a bare plate heated over its whole underside with k linear in T (closed form, 1-D slab)', () => {
  // k = 20 W/(m K) at 20 degC rising to 60 at 220 degC (a poor conductor whose k doubles over the range).
  const q = 4000; // W/m^2 over 40 x 30 mm: 4.8 W
  const h = 25;
  const t = 0.006;
  const k0 = 20;
  const slope = (60 - 20) / 200;
  const c = withK(
    { plate: [0.04, 0.03, t], kPlate: k0, hPlate: h, sources: [{ centre: [0.02, 0.015], size: [0.04, 0.03], power: q * 0.04 * 0.03 }] },
    { kind: 'table', T_degC: Float64Array.of(20, 220), k: Float64Array.of(20, 60) },
  );
  // Top: h θ_top = q''. Kirchhoff: k0 θ + s θ^2/2 rises by q'' t from top to bottom.
  const thetaTop = q / h;
  const U = (th: number) => k0 * th + 0.5 * slope * th * th;
  const target = U(thetaTop) + q * t;
  const thetaBottom = (-k0 + Math.sqrt(k0 * k0 + 2 * slope * target)) / slope;

  it('the source rise is the closed form to the solver tolerance on any grid', () => {
    // φ is linear through the slab, which the finite volumes hold exactly; only the 1e-10 residual remains.
    const study = studySink(c, one);
    expect(study.sources[0]!.meanRise_K).toBeCloseTo(thetaBottom, 6);
    expect(study.sources[0]!.maxTemperature_degC - 20).toBeCloseTo(thetaBottom, 6);
    expect(study.plateTopMean_degC - 20).toBeCloseTo(thetaTop, 6);
    // With k at the ambient throughout, the bottom would be q'' t/k0 hotter than the top: 1.2 K against ~0.9 K here.
    expect(thetaBottom - thetaTop).toBeLessThan((q * t) / k0);
    expect(study.energyBalance).toBeLessThan(1e-9);
  });
});

describe('identical fins under a power-law h on a plate of very high conductivity (closed-form adiabatic fin)', () => {
  const n = 0.25;
  const hBase = 9;
  const k = 200;
  const thickness = 0.001;
  const height = 0.04;
  const count = 6;
  const length = 0.03;
  const power = 9;
  const inputs: SinkInputs = {
    plate: [0.06, length, 0.003],
    kPlate: k,
    fin: plateFin(height, thickness, length),
    array: { kind: 'plates', count, pitch: 0.01 },
    hPlate: 0,
    h: { kind: 'power', base: hBase, exponent: n } as HDistribution,
    sources: [{ centre: [0.03, length / 2], size: [0.06, length], power }],
  };
  // A plate 1e3 times more conductive than the fins: every root at one temperature (the conduction across the
  // 3 mm plate, q'' t/k_p ~ 1e-5 K, is below the tolerance).
  const c = {
    ...withK(inputs, { kind: 'constant', k }),
    plate: { ...sinkCase(inputs).plate, material: { name: 'custom', k: { kind: 'constant' as const, k: 2e5 }, source: 'test' } },
  };
  // Every fin carries power/count over its width `length`; per unit width the closed form gives q' = Q(n, mL) sqrt(h_b P k A) θ_b
  // with P = 2, A = t, and the law's reference is the root itself (θ_root = θ_b), so θ_b follows.
  const unit = powerLawHAdiabaticFin({ n, hBase, k, P: 2, A: thickness, L: height, thetaBase: 1 });
  const thetaBase = power / count / length / unit.heatRate;

  it("the fins' root rise converges to the closed form, second order along the fin", () => {
    const studies = [1, 2, 4].map((r) => studySink(c, { grids: 1, finLayers: 4 * r, cellSize: 0.06 / 12 }));
    const errors = studies.map((s) => Math.abs(s.fins[0]!.rootTemperature_degC - 20 - thetaBase) / thetaBase);
    const study = studies[2]!;
    // Measured 1.81e-3, 4.52e-4, 1.13e-4 with 4, 8, 16 layers: ratio 4.00 per halving (the sheet is second order
    // along the height, and the isothermal plate adds nothing).
    expect(errors[2]).toBeLessThan(2e-4);
    expect(errors[0]! / errors[1]!).toBeGreaterThan(3.8);
    expect(errors[1]! / errors[2]!).toBeGreaterThan(3.8);
    // Symmetric fins on an isothermal plate: every fin carries the same heat.
    for (const f of study.fins) expect(f.heatRate_W).toBeCloseTo(power / count, 6);
    expect(study.energyBalance).toBeLessThan(1e-9);
  });
});

describe('Newton on a realistic natural-convection sink', () => {
  it('converges in a few steps with the energy balance to the residual target; hotter than at the base h', () => {
    const natural = { ...sink, h: { kind: 'power', base: 6, exponent: 0.25 } as HDistribution };
    const study = studySink(sinkCase(natural), one);
    const steps = Number(/\((\d+) steps/.exec(study.solver.method)?.[1]);
    expect(steps).toBeGreaterThan(0);
    expect(steps).toBeLessThanOrEqual(4);
    expect(study.energyBalance).toBeLessThan(1e-9);
    // Fin faces cooler than the root have h below the base value: every source runs hotter than with h = base.
    const linear = studySink(sinkCase(sink), one);
    study.sources.forEach((s, k) => expect(s.meanRise_K).toBeGreaterThan(linear.sources[k]!.meanRise_K));
  });

  it.each([-0.9, 2])("an exponent of %d converges in a few steps (the law's reference is part of the Jacobian)", (n) => {
    // Lagging θ_root instead contracted by ~0.9 a step at n = −0.9 (60 steps left 6e-5); with the rank-one term: 2-3 steps.
    const study = studySink(sinkCase({ ...sink, h: { kind: 'power', base: 6, exponent: n } as HDistribution }), one);
    expect(Number(/\((\d+) steps/.exec(study.solver.method)?.[1])).toBeLessThanOrEqual(4);
    expect(study.energyBalance).toBeLessThan(1e-9);
  });
});

describe("a nonlinear sink re-solved on one grid (the sensitivities' central differences) takes Newton too", () => {
  // solveSinkOnGrid is what the check's sensitivities re-solve a variant with; before this test it solved the linear
  // system alone, so a power-law sink's slopes were those of the constant h at the base value. Same grid, same
  // Newton: equal to the study's own finest grid to the solver's tolerance (residual 1e-10 -> 1e-7 relative here).
  it.each([
    ['a power-law h', sinkCase({ ...sink, h: { kind: 'power', base: 6, exponent: 0.25 } })],
    ['a k(T) table', withK(sink, { kind: 'table', T_degC: Float64Array.of(0, 200), k: Float64Array.of(200, 150) })],
  ] as const)('%s', (_, c) => {
    const study = studySink(c, one);
    expect(study.finestGrid).toBeDefined();
    const again = solveSinkOnGrid(c, study.finestGrid!);
    study.sources.forEach((s, k) => expect(again.sourceMeanRise[k]! / s.meanRise_K - 1).toBeCloseTo(0, 7));
    // and it is not the linear model's answer: the law moves the rise by more than the tolerance above
    const linear = studySink(sinkCase(sink), one);
    expect(Math.abs(again.sourceMeanRise[0]! / linear.sources[0]!.meanRise_K - 1)).toBeGreaterThan(1e-3);
  });
});
