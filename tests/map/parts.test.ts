/**
 * Small parts of the map: the solving order (every point once, consecutive points grid neighbours), the choice of
 * Bi / mL iso-line levels, all-or-nothing file writing, the progress bar. (CSV quoting is checked on a real error cell in
 * map-vs-check.test.ts.)
 */
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { biotCandidates, isoLevels, mLCandidates } from '../../src/map/iso-lines.js';
import { serpentineSchedule } from '../../src/map/schedule.js';
import { walkAlongY } from '../../src/map/pool.js';
import type { MapJob } from '../../src/map/types.js';
import { progressBar } from '../../src/map/progress.js';
import { StagedFiles } from '../../src/map/staged-files.js';
import { tmp } from './support.js';

describe('serpentine schedule', () => {
  it.each([
    [7, 5, 1],
    [41, 41, 2],
    [3, 200, 8],
    [2, 2, 4],
  ])('%i x %i on %i workers: every point once, each step to a grid neighbour, batches cover the path', (nx, ny, workers) => {
    const { order, starts } = serpentineSchedule(nx, ny, workers);
    expect([...order].sort((a, b) => a - b)).toEqual(Array.from({ length: nx * ny }, (_, k) => k));
    for (let k = 1; k < order.length; k++) {
      const a = order[k - 1] as number;
      const b = order[k] as number;
      const distance = Math.abs((a % nx) - (b % nx)) + Math.abs(Math.floor(a / nx) - Math.floor(b / nx));
      expect(distance).toBe(1);
    }
    expect(starts[0]).toBe(0);
    expect(starts[starts.length - 1]).toBe(nx * ny);
    for (let b = 1; b < starts.length; b++) expect((starts[b] as number) > (starts[b - 1] as number)).toBe(true);
    // About 8 batches per worker (never more than one row), so workers share the load.
    expect(starts.length - 1).toBeGreaterThanOrEqual(Math.min(ny, workers * 8));
  });
});

describe('serpentine schedule along y (a shape key on x, e.g. thickness x h)', () => {
  it.each([
    [7, 5, 1],
    [41, 41, 2],
    [200, 3, 8],
    [2, 2, 4],
  ])('%i x %i on %i workers: every point once, each step to a grid neighbour, a column at a time', (nx, ny, workers) => {
    const { order, starts } = serpentineSchedule(nx, ny, workers, true);
    expect([...order].sort((a, b) => a - b)).toEqual(Array.from({ length: nx * ny }, (_, k) => k));
    let sameColumn = 0;
    for (let k = 1; k < order.length; k++) {
      const a = order[k - 1] as number;
      const b = order[k] as number;
      const distance = Math.abs((a % nx) - (b % nx)) + Math.abs(Math.floor(a / nx) - Math.floor(b / nx));
      expect(distance).toBe(1);
      if (a % nx === b % nx) sameColumn++;
    }
    // Only the nx - 1 turns between columns change x.
    expect(sameColumn).toBe(order.length - 1 - (nx - 1));
    expect(starts[0]).toBe(0);
    expect(starts[starts.length - 1]).toBe(nx * ny);
    expect(starts.length - 1).toBeGreaterThanOrEqual(Math.min(nx, workers * 8));
  });

  it('is chosen for a fin whose x axis is a shape key and whose y axis is not', () => {
    const job = (x: string, y: string, kind: 'fin' | 'heat-sink' = 'fin'): MapJob => ({
      kind,
      caseText: '',
      fileName: 'case.yaml',
      x: { path: x.split('.'), unit: '' },
      y: { path: y.split('.'), unit: '' },
      check: { tolerance: 0.02, reference: '2d', models: [], guess: null },
    });
    expect(walkAlongY(job('fin.thickness', 'convection.h'))).toBe(true);
    expect(walkAlongY(job('convection.h', 'fin.thickness'))).toBe(false);
    expect(walkAlongY(job('fin.thickness', 'fin.length'))).toBe(false);
    expect(walkAlongY(job('fin.thickness', 'convection.h', 'heat-sink'))).toBe(false);
  });
});

describe('iso-line levels', () => {
  it('only round values inside the range, at most four, spread over it', () => {
    expect(isoLevels([0.003, 0.3], biotCandidates)).toEqual([0.005, 0.02, 0.05, 0.2]);
    expect(isoLevels([0.4, 2.6], mLCandidates)).toEqual([0.5, 1, 1.5, 2]);
    expect(isoLevels([0.4, 1.4], mLCandidates)).toEqual([0.5, 1]);
  });
  it('none when the quantity hardly changes over the map (< 10 %), or has no value', () => {
    expect(isoLevels([0.099, 0.105], biotCandidates)).toEqual([]);
    expect(isoLevels([Number.NaN, Number.NaN], biotCandidates)).toEqual([]);
  });
});

describe('staged files', () => {
  it('nothing under the final names until commit; commit renames every file', () => {
    const dir = join(tmp, 'staged-commit');
    const staged = new StagedFiles(dir);
    staged.stage('a.csv', 'x,y\n');
    staged.stage('b.png', new Uint8Array([1, 2, 3]));
    expect(readdirSync(dir).sort()).toEqual([`.a.csv.${process.pid}.tmp`, `.b.png.${process.pid}.tmp`]);
    expect(staged.commit()).toEqual([join(dir, 'a.csv'), join(dir, 'b.png')]);
    expect(readdirSync(dir).sort()).toEqual(['a.csv', 'b.png']);
    expect(readFileSync(join(dir, 'a.csv'), 'utf8')).toBe('x,y\n');
  });
  it('discard removes the temporary files, and the folder when it made it', () => {
    const dir = join(tmp, 'staged-discard');
    const staged = new StagedFiles(dir);
    staged.stage('a.csv', 'x');
    staged.discard();
    expect(existsSync(dir)).toBe(false);
  });
  it('discard keeps a folder that existed before, and files already there', () => {
    const dir = join(tmp, 'staged-existing');
    const first = new StagedFiles(dir);
    first.stage('old.csv', 'old');
    first.commit();
    const second = new StagedFiles(dir);
    second.stage('new.csv', 'new');
    second.discard();
    expect(readdirSync(dir)).toEqual(['old.csv']);
  });
});

describe('progress bar', () => {
  it('writes nothing when stderr is not a terminal', () => {
    let written = '';
    const bar = progressBar((t) => (written += t), false, 100);
    bar.update(50);
    bar.finish();
    expect(written).toBe('');
  });
  it('on a terminal: one redrawn line with the share done, cleared at the end', () => {
    let written = '';
    const bar = progressBar((t) => (written += t), true, 4);
    bar.update(4);
    // eslint-disable-next-line no-control-regex -- ESC[K is what the progress bar writes
    expect(written).toMatch(/^\rmap \[#{28}\] 100 % {2}4\/4 points\u001b\[K$/);
    bar.finish();
    expect(written.endsWith('\r\u001b[2K')).toBe(true);
  });
});
