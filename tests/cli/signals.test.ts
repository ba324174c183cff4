/**
 * The built command (dist/fincheck.cjs, `npm run build`) as a real child process, interrupted by a real signal:
 * `report` by SIGINT and SIGTERM (one case, several, and while it waits on standard input), `map` by SIGTERM in-process and on worker threads. Each ends with the shell's
 * code for the signal (130 = 128 + SIGINT's 2, 143 = 128 + SIGTERM's 15), one line on stderr, nothing on stdout,
 * and no output folder, temporary file or half-written file left. Inputs are invented.
 */
import { execFileSync, spawn } from 'node:child_process';
import { closeSync, constants, existsSync, mkdtempSync, openSync, readdirSync, readFileSync, writeFileSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const bin = join(import.meta.dirname, '../../dist/fincheck.cjs');
const tmp = mkdtempSync(join(tmpdir(), 'fincheck-signals-'));
const pin = join(tmp, 'pin.yaml');
writeFileSync(
  pin,
  `name: signal pin
fin: { profile: pin, length: 30 mm, diameter: 4 mm }
material: { k: 120 W/(m*K) }
convection: { ambient: 25 degC, h: 80 W/(m^2*K), tip: convective }
base: { temperature: 75 degC }
`,
);

interface Ended {
  code: number | null;
  signal: NodeJS.Signals | null;
  stdout: string;
  stderr: string;
}

/** Starts the command, sends `signal` after `afterMs` and waits for the end. */
async function interrupted(args: string[], signal: NodeJS.Signals, afterMs: number): Promise<Ended> {
  const child = spawn(process.execPath, [bin, ...args], { stdio: ['ignore', 'pipe', 'pipe'] });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (d: Buffer) => (stdout += d.toString()));
  child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
  const ended = new Promise<Ended>((resolve) => child.on('exit', (code, sig) => resolve({ code, signal: sig, stdout, stderr })));
  await new Promise((resolve) => setTimeout(resolve, afterMs));
  child.kill(signal);
  const r = await ended;
  return { ...r, stdout, stderr };
}

/** Every file under `dir` whose name marks it temporary. */
function temporaryFiles(dir: string): string[] {
  return existsSync(dir) ? readdirSync(dir, { recursive: true, encoding: 'utf8' }).filter((f) => f.endsWith('.tmp')) : [];
}

/**
 * A named pipe holding the case. The command listens for signals before it reads its cases, and blocks opening the
 * pipe until a writer comes: once a non-blocking open for writing succeeds (Linux: a reader waiting in open() counts
 * as a reader), the command is listening, so the signal needs no guess of the start-up time; the case is written
 * after the signal, so the signal always lands before the report is computed, however fast the machine.
 */
function pipedCase(name: string): string {
  const path = join(tmp, `${name}.yaml`);
  execFileSync('mkfifo', [path]);
  return path;
}

/** A writer's descriptor on `fifo` once a reader has opened it (polled every 20 ms), or null after `limitMs`. */
async function whenReaderOpens(fifo: string, limitMs: number): Promise<number | null> {
  const until = Date.now() + limitMs;
  while (Date.now() < until) {
    try {
      return openSync(fifo, constants.O_WRONLY | constants.O_NONBLOCK);
    } catch (e) {
      // ENXIO: nobody has the pipe open for reading yet; anything else is a real failure.
      if ((e as NodeJS.ErrnoException).code !== 'ENXIO') throw e;
    }
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  return null;
}

/** Starts the command, waits until it opens the piped case, sends `signal`, writes the case and waits for the end. */
async function interruptedWhileReading(args: string[], fifo: string, signal: NodeJS.Signals): Promise<Ended & { opened: boolean }> {
  const child = spawn(process.execPath, [bin, ...args], { stdio: ['ignore', 'pipe', 'pipe'] });
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (d: Buffer) => (stdout += d.toString()));
  child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
  const ended = new Promise<Ended>((resolve) => child.on('exit', (code, sig) => resolve({ code, signal: sig, stdout, stderr })));
  const fd = await whenReaderOpens(fifo, 30_000);
  child.kill(signal);
  if (fd !== null) {
    writeSync(fd, readFileSync(pin));
    closeSync(fd);
  }
  const r = await ended;
  return { ...r, stdout, stderr, opened: fd !== null };
}

describe('interrupted report', () => {
  // The case comes through a named pipe written after the signal: the command reads it, computes the check and the
  // charts, and stops at its next check (before the charts' renders or before the write).
  it.each([
    ['SIGINT', 130, 'one case'],
    ['SIGTERM', 143, 'one case'],
    ['SIGINT', 130, 'two cases compared'],
  ] as const)('%s: exit %i, a message, no folder and no temporary file (%s)', async (signal, code, kind) => {
    const out = join(tmp, `report-${signal}-${kind.length}`, 'nested');
    const piped = pipedCase(`piped-${signal}-${kind.length}`);
    const cases = kind === 'one case' ? [piped] : [pin, piped];
    const r = await interruptedWhileReading(['report', ...cases, '--out', out, '--date', '2026-01-01'], piped, signal);
    expect(r.opened, `the report did not open ${piped} within 30 s (stderr: ${r.stderr})`).toBe(true);
    expect(r.signal, `${signal} arrived before the report started listening for it`).toBeNull();
    expect(r.code).toBe(code);
    expect(r.stdout).toBe('');
    expect(r.stderr).toBe(`fincheck: interrupted (${signal}); no report files were written\n`);
    expect(existsSync(join(tmp, `report-${signal}-${kind.length}`))).toBe(false);
    expect(temporaryFiles(tmp)).toEqual([]);
  });

  it('SIGINT while waiting for the case on standard input: exit 130 at once, standard input released', async () => {
    const out = join(tmp, 'report-stdin');
    const child = spawn(process.execPath, [bin, 'report', '-', '--out', out], { stdio: ['pipe', 'pipe', 'pipe'] });
    let stderr = '';
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    const ended = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) =>
      child.on('exit', (code, sig) => resolve({ code, signal: sig })),
    );
    await new Promise((resolve) => setTimeout(resolve, 3000));
    child.kill('SIGINT');
    // Standard input stays open: the command must not wait for its end.
    const r = await ended;
    child.stdin.end();
    expect(r.signal, 'SIGINT arrived before the report started listening for it').toBeNull();
    expect(r.code).toBe(130);
    expect(stderr).toBe('fincheck: interrupted (SIGINT); no report files were written\n');
    expect(existsSync(out)).toBe(false);
  });
});

describe('interrupted map', () => {
  it.each([
    ['1', '1d'],
    ['2', '2d'],
  ] as const)('SIGTERM with --jobs %s (%s reference): exit 143, a message, no folder', async (jobs, reference) => {
    const out = join(tmp, `map-${jobs}`);
    const args = [
      'map',
      pin,
      '--x',
      'fin.diameter=2:8 mm',
      '--y',
      'fin.length=10:60 mm',
      '--steps',
      '150x150',
      '--reference',
      reference,
      '--jobs',
      jobs,
      '--out',
      out,
    ];
    const r = await interrupted(args, 'SIGTERM', 3000);
    expect(r.signal, 'SIGTERM arrived before the map started listening for it').toBeNull();
    expect(r.code).toBe(143);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/^fincheck: interrupted after \d+ of 22500 points; no files were written\n$/);
    expect(existsSync(out)).toBe(false);
    expect(temporaryFiles(tmp)).toEqual([]);
  });
});
