/**
 * The fd-2d line of a nonlinear fin's profile and flux charts (src/compare/model-profiles.ts): the demo
 * demo/enclosure-fin-natural-convection.yaml (invented data: a 60 mm x 3 mm x 150 mm aluminium fin, base
 * 75 degC, air at 30 degC, h = 6.5 (theta/theta_b)^0.25 W/(m^2 K), emissivity 0.85, surroundings at the
 * ambient). Its numbers are not reference values: the tests check that the chart draws the Newton
 * solution with the face law the solver uses, and that the drawn losses add up to the solver's heat rate.
 * Face law: power-law h of laminar natural convection, as in the fin analyses of Sen & Trinh 1986,
 * J. Heat Transfer 108, 457-459 [from memory]; grey radiation by the Stefan-Boltzmann law with
 * sigma = 5.670374419e-8 W/(m^2 K^4) (CODATA 2018: Tiesinga et al. 2021, Rev. Mod. Phys. 93, 025010).
 */
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { loadCase } from '../../src/case/parse.js';
import type { ModelProfile } from '../../src/compare/model-profiles.js';
import { lineChart } from '../../src/images/index.js';
import { fluxChartSpec } from '../../src/plots/flux-chart.js';
import { profileChartSpec, type CheckPlotInput } from '../../src/plots/profile-chart.js';
import { checkPlotInput } from '../../src/plots/sources.js';
import { svgTexts } from '../images/helpers.js';

const demo = join(import.meta.dirname, '../../demo/enclosure-fin-natural-convection.yaml');
const size = { width: 1200, height: 750 };

let input: CheckPlotInput;
let p: ModelProfile;
beforeAll(async () => {
  input = await checkPlotInput(loadCase(demo), { tolerance: 0.02, reference: 'auto', ledger: false });
  const found = input.profiles.profiles.find((q) => q.model === 'fd-2d');
  if (!found) throw new Error('no fd-2d profile');
  p = found;
});

describe('a power-law h, radiating fin: the fd-2d reference is drawn', () => {
  it('the profile chart has the fd-2d mid-plane and face lines and the tip marker', () => {
    expect(input.report.reference.model).toBe('fd-2d');
    const texts = svgTexts(lineChart(profileChartSpec(input, size)).svg);
    expect(texts).toEqual(expect.arrayContaining(['fd-2d (reference), mid-plane', 'fd-2d, face', 'fd-1d']));
    expect(texts).toContain(`tip ${p.tipTemperature_degC.toFixed(2)} °C (fd-2d)`);
    expect(p.basis).toContain('nonlinear (Newton)');
    // Heat leaves through the face: it is never hotter than the mid-plane at the same station.
    const face = p.faceTemperature?.values ?? new Float64Array();
    expect(face.length).toBe(p.temperature.values.length);
    for (let i = 0; i < face.length; i++) expect(face[i] as number).toBeLessThanOrEqual((p.temperature.values[i] as number) + 1e-9);
  });

  it('the flux chart has the fd-2d heat flow and loss lines', () => {
    const texts = svgTexts(lineChart(fluxChartSpec(input, size)).svg);
    expect(texts).toContain('fd-2d (reference)');
    expect(texts.some((t) => t.includes('% of Q gone (fd-2d)'))).toBe(true);
  });

  it("q' is the nonlinear face law at the face temperature (convection ~ theta^1.25 plus radiation), both faces of the width", () => {
    const sigma = 5.670374419e-8;
    const Ta = 30 + 273.15;
    const faceT = p.faceTemperature?.values ?? new Float64Array();
    const n = p.loss.values.length;
    for (const i of [0, Math.round(n / 4), Math.round(n / 2), n - 1]) {
      const theta = 0.5 * ((faceT[i] as number) + (faceT[i + 1] as number)) - 30;
      const q = 6.5 * (theta / 45) ** 0.25 * theta + 0.85 * sigma * ((theta + Ta) ** 4 - Ta ** 4);
      // Two faces x 0.15 m width per metre of fin; the same arithmetic in another order: round-off (1e-12).
      expect(Math.abs((p.loss.values[i] as number) / (2 * 0.15 * q) - 1)).toBeLessThan(1e-12);
    }
    // A linear h theta would miss the radiation, about half of q at the base here: the law matters.
    const theta0 = (faceT[0] as number) - 30;
    expect((0.85 * sigma * ((theta0 + Ta) ** 4 - Ta ** 4)) / (6.5 * theta0)).toBeGreaterThan(0.9);
  });

  it('the loss per unit length integrates, with the tip loss, to the fd-2d heat rate', () => {
    const study = input.twoD;
    expect(study).not.toBeNull();
    const finest = study?.finest;
    const x = p.faceTemperature?.x_m ?? new Float64Array();
    let faceLoss = 0;
    for (let i = 0; i < p.loss.values.length; i++) faceLoss += (p.loss.values[i] as number) * ((x[i + 1] as number) - (x[i] as number));
    const heatRate = study?.heatRate_W ?? NaN;
    expect(p.heatRate_W).toBe(heatRate);
    // The profile integrates q(theta) at segment middles (trapezoidal); the solver lumps q(theta_p) at the
    // face nodes: both second order, so on the study's finest grid (185 x 33) they differ by O(ds^2), far
    // below the study's own error estimate (GCI 1.2e-6; measured difference 9e-9 of Q). 1e-7 leaves a
    // tenfold margin and stays under the GCI; a face law left linear (radiation dropped) would miss by ~50 %.
    expect(Math.abs(faceLoss + (finest?.tipHeatRate_W ?? NaN) - heatRate) / heatRate).toBeLessThan(1e-7);
    expect(Math.abs(faceLoss - (finest?.faceHeatRate_W ?? NaN)) / heatRate).toBeLessThan(1e-7);
    // The check's reference adds the cooled side edges (from fd-1d) to this section's heat rate.
    expect(input.report.reference.heatRate_W).toBeGreaterThan(heatRate);
  });
});
