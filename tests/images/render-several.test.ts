/** svgsToPngs: several charts rendered two at a time give the bytes of one-by-one renders, in order, and stop on a checkpoint. */
import { describe, expect, it } from 'vitest';
import { svgToPng } from '../../src/images/render.js';
import { svgsToPngs } from '../../src/images/render-several.js';

const box = (fill: string, w: number): string =>
  `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="40" viewBox="0 0 ${w} 40"><rect width="${w}" height="40" fill="${fill}"/></svg>`;
const svgs = [box('#c00', 60), box('#0c0', 80), box('#00c', 100), box('#888', 120), box('#000', 140)];

describe('svgsToPngs', () => {
  it('returns the PNGs in the order of the SVGs, byte for byte the one-by-one renders', async () => {
    const alone = [];
    for (const svg of svgs) alone.push(await svgToPng(svg, { dpi: 120 }));
    const together = await svgsToPngs(svgs, { dpi: 120 });
    expect(together.map((b) => b.toString('base64'))).toEqual(alone.map((b) => b.toString('base64')));
    const one = await svgsToPngs(svgs, { dpi: 120, concurrency: 1 });
    expect(one.map((b) => b.toString('base64'))).toEqual(alone.map((b) => b.toString('base64')));
  });

  it('calls the checkpoint before every render, and a checkpoint that throws stops the rest', async () => {
    let calls = 0;
    await svgsToPngs(svgs, { dpi: 96, checkpoint: () => void calls++ });
    expect(calls).toBe(svgs.length);
    let started = 0;
    const stop = new Error('stop');
    await expect(
      svgsToPngs(svgs, {
        dpi: 96,
        checkpoint: () => {
          if (++started > 2) throw stop;
        },
      }),
    ).rejects.toBe(stop);
    // Two lanes: the third checkpoint throws in one lane, the other lane finishes its render and
    // stops at its next checkpoint before the promise rejects; no render starts after.
    expect(started).toBe(4);
  });

  it('refuses a concurrency that is not a positive integer', async () => {
    await expect(svgsToPngs(svgs, { dpi: 96, concurrency: 0 })).rejects.toThrow(/concurrency must be a positive integer, got 0/);
  });

  it('an empty list gives an empty list', async () => {
    expect(await svgsToPngs([], { dpi: 96 })).toEqual([]);
  });
});
