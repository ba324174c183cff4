/** check's sensitivities and band on the command line (JSON keys of design-questions.md, the text) and plot --kind sensitivity. */
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { tornadoChart } from '../../src/images/index.js';
import { cli } from '../cli/run.js';
import { decodePng, svgTexts, wellFormednessError } from '../images/helpers.js';

describe('check', () => {
  it('--json carries sensitivities, the band and each row drift over the band', async () => {
    const r = await cli('check', 'demo/polymer-fin-liquid-cooled.yaml', '--json');
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout) as {
      sensitivities: { key: string; dlnQ_dlnx: number; method: string }[];
      uncertainty: { method: string; relative: number; low_W: number; high_W: number; sample: unknown };
      models: { drift: number; driftOverUncertainty: number }[];
      reference: { heatRate_W: number };
    };
    expect(j.sensitivities.map((s) => s.key)).toEqual(expect.arrayContaining(['convection.h', 'material.k', 'fin.length', 'base.temperature']));
    expect(j.uncertainty.method).toMatch(/^(first-order|latin-hypercube)$/);
    expect(j.uncertainty.low_W).toBeLessThan(j.reference.heatRate_W);
    expect(j.uncertainty.high_W).toBeGreaterThan(j.reference.heatRate_W);
    for (const m of j.models) expect(m.driftOverUncertainty).toBeCloseTo(Math.abs(m.drift) / j.uncertainty.relative, 12);
  }, 60_000);

  it('the text compares every drift with the band, and --sample never draws no sample', async () => {
    const r = await cli('check', 'demo/inverter-plate-fin.yaml', '--sample', 'never');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/How sure: the inputs/);
    expect(r.stdout).toMatch(/tanh-L \(ok\): drift -1\.75 % is a twelfth of the \+\/-21 % that the h uncertainty alone gives/);
    expect(r.stdout).toMatch(/no sample drawn \(switched off\)/);
  }, 60_000);

  it('refuses an unknown --sample with exit code 2', async () => {
    const r = await cli('check', 'demo/inverter-plate-fin.yaml', '--sample', 'sometimes');
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/--sample/);
    expect(r.stderr).toMatch(/auto, always or never/);
  });
});

describe('tornado chart', () => {
  it('plot --kind sensitivity writes the chart', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-sense-'));
    const r = await cli('plot', 'demo/led-pin-fin.yaml', '--kind', 'sensitivity', '--out', join(dir, 's.png'));
    expect(r.code).toBe(0);
    expect(decodePng(readFileSync(join(dir, 's.png')))).toMatchObject({ width: 1200, height: 750 });
  }, 60_000);

  it('draws the largest |value| on top, negative bars left of zero, well-formed SVG', () => {
    const { svg } = tornadoChart({
      title: 't',
      xLabel: 'x',
      bars: [
        { label: 'small', value: 0.1 },
        { label: 'negative', value: -0.5, note: 'minus half' },
        { label: 'large', value: 0.9, highlight: true },
      ],
    });
    expect(wellFormednessError(svg)).toBeNull();
    const texts = svgTexts(svg);
    expect(texts.indexOf('large')).toBeLessThan(texts.indexOf('negative'));
    expect(texts.indexOf('negative')).toBeLessThan(texts.indexOf('small'));
    const rects = [...svg.matchAll(/<rect x="([-\d.]+)" y="[-\d.]+" width="([\d.]+)"[^>]*fill="#(?:0072B2|D55E00)"/g)].map((m) => [
      Number(m[1]),
      Number(m[2]),
    ]);
    // Three bars: the negative one ends where the positive ones start (the zero line).
    expect(rects).toHaveLength(3);
    const zero = Math.max(...rects.map(([x]) => x as number));
    const negative = rects.find(([x]) => (x as number) < zero);
    expect(negative).toBeDefined();
    expect((negative?.[0] ?? 0) + (negative?.[1] ?? 0)).toBeCloseTo(zero, 6);
  });
});
