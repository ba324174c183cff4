/**
 * The built command (dist/fincheck.cjs with its worker dist/map-worker.js, `npm run build`) as a separate process:
 * `--jobs 2` on worker threads prints the same JSON as the in-process run, and a real SIGINT (Ctrl-C) ends it with
 * exit code 130 and no file written. Inputs are invented.
 */
import { spawn, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from '../cli/run.js';
import { caseFile, tmp } from './support.js';

const bin = join(import.meta.dirname, '../../dist/fincheck.cjs');
const worker = join(import.meta.dirname, '../../dist/map-worker.js');

const file = caseFile(
  'dist-plate.yaml',
  `name: dist plate
fin: { profile: pin, length: 30 mm, diameter: 4 mm }
material: { k: 120 W/(m*K) }
convection: { ambient: 25 degC, h: 80 W/(m^2*K), tip: convective }
base: { temperature: 75 degC }
`,
);
const grid = ['--x', 'fin.diameter=2:8 mm', '--y', 'fin.length=10:60 mm', '--reference', '1d'];

describe('the built map command', () => {
  it('dist/fincheck.cjs and dist/map-worker.js exist (npm test builds them first)', () => {
    expect(existsSync(bin), 'run `npm run build`').toBe(true);
    expect(existsSync(worker), 'run `npm run build`').toBe(true);
  });

  it('--jobs 2 in the bundle prints the same JSON as --jobs 1 in-process', async () => {
    const r = spawnSync(process.execPath, [bin, 'map', file, ...grid, '--steps', '6x5', '--jobs', '2', '--json', '--out', join(tmp, 'dist-2')], {
      encoding: 'utf8',
    });
    expect(r.status, r.stderr).toBe(0);
    expect(r.stderr).toBe('');
    const inProcess = await cli('map', file, ...grid, '--steps', '6x5', '--jobs', '1', '--json', '--out', join(tmp, 'dist-1'));
    expect(r.stdout).toBe(inProcess.stdout);
  });

  it('SIGINT ends a long map with exit 130, a message on stderr and no file or folder', async () => {
    const out = join(tmp, 'dist-interrupted');
    const child = spawn(process.execPath, [bin, 'map', file, ...grid, '--steps', '200x200', '--jobs', '2', '--out', out], {
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d: Buffer) => (stdout += d.toString()));
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    const ended = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) =>
      child.on('exit', (code, signal) => resolve({ code, signal })),
    );
    // 40 000 points take well over a minute; 3 s is enough for the command to start and listen for SIGINT (a SIGINT
    // before that kills the process by the default action: signal SIGINT, no exit code, and this test fails).
    await new Promise((resolve) => setTimeout(resolve, 3000));
    child.kill('SIGINT');
    const { code, signal } = await ended;
    expect(signal, 'SIGINT arrived before the map started listening for it').toBeNull();
    expect(code).toBe(130);
    expect(stdout).toBe('');
    expect(stderr).toMatch(/^fincheck: interrupted after \d+ of 40000 points; no files were written\n$/);
    expect(existsSync(out)).toBe(false);
  });
});
