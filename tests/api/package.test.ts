/**
 * The published package, as a user installs it: `npm pack` of the bundles `npm test` built and the declarations
 * (written here as prepack writes them; the pack itself runs no script, so the bundles other tests run are not
 * rebuilt under them),
 * the tarball unpacked into a fresh folder's node_modules (its dependencies linked from this checkout's, so the test
 * needs no network), then imported by name from plain Node ESM and type-checked from TypeScript. A file missing from
 * `files`, a broken `exports` entry or declarations that do not match the code fail here.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, renameSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';

const repo = resolve('.');
const folder = mkdtempSync(join(tmpdir(), 'fincheck-package-'));
const modules = join(folder, 'node_modules');

const esm = `import { caseFromText, check, chartSvg, solve, InputError, VERSION } from 'fincheck';
const c = caseFromText(\`name: packaged pin
fin: { profile: pin, length: 30 mm, diameter: 3 mm }
material: aluminium-6063
convection: { ambient: 25 degC, h: 40 W/(m^2*K), tip: convective }
base: { temperature: 85 degC }
\`);
const r = await check(c, { reference: '1d' });
const svg = await chartSvg(c, 'profile', { reference: '1d' });
let invalid = '';
try { caseFromText('name: x\\n'); } catch (e) { invalid = e instanceof InputError ? e.issues[0].path : 'not an InputError'; }
console.log(JSON.stringify({ version: VERSION, model: r.reference.model, q: r.reference.heatRate_W, q1d: solve(c, { nodes: 101 }).heatRate_W, svg: svg.startsWith('<svg'), invalid }));
`;

const typed = `import { caseFromText, check, type CheckResult } from 'fincheck';
const c = caseFromText('name: x');
export const result: Promise<CheckResult> = check(c, { tolerance: 0.02, reference: 'auto' });
`;

/** Must not compile: the declarations are real types, not \`any\`. */
const mistyped = `import { caseFromText, check } from 'fincheck';
export const result = check(caseFromText('name: x'), { tolerance: '2%' });
`;

describe('the npm package', () => {
  let files: string[];
  beforeAll(() => {
    execFileSync(process.execPath, [join(repo, 'node_modules', 'typescript', 'bin', 'tsc'), '-p', 'tsconfig.lib.json'], { cwd: repo });
    const packed = execFileSync('npm', ['pack', '--ignore-scripts', '--silent', '--json', '--pack-destination', folder], { cwd: repo, encoding: 'utf8' });
    const [info] = JSON.parse(packed.slice(packed.indexOf('['))) as { filename: string; files: { path: string }[] }[];
    if (!info) throw new Error('npm pack reported no tarball');
    files = info.files.map((f) => f.path);
    mkdirSync(modules);
    execFileSync('tar', ['-xzf', join(folder, info.filename), '-C', modules]);
    renameSync(join(modules, 'package'), join(modules, 'fincheck'));
    // The package's dependencies from this checkout (what `npm install` would fetch).
    for (const entry of readdirSync(join(repo, 'node_modules'))) {
      if (entry === 'fincheck' || entry === '.bin' || entry.startsWith('.')) continue;
      symlinkSync(join(repo, 'node_modules', entry), join(modules, entry));
    }
  }, 300_000);

  it('holds the bundles, the worker, the declarations and the demo, and no sources or tests', () => {
    for (const f of [
      'dist/fincheck.cjs',
      'dist/program.cjs',
      'dist/lib.js',
      'dist/map-worker.js',
      'dist/types/api/index.d.ts',
      'package.json',
      'README.md',
      'LICENSE',
    ]) {
      expect(files).toContain(f);
    }
    expect(files.some((f) => f.startsWith('demo/'))).toBe(true);
    expect(files.filter((f) => f.startsWith('src/') || f.startsWith('tests/'))).toEqual([]);
  });

  it('imports by name from plain Node ESM and gives the numbers', () => {
    writeFileSync(join(folder, 'use.mjs'), esm);
    const run = spawnSync(process.execPath, ['use.mjs'], { cwd: folder, encoding: 'utf8' });
    expect(run.stderr).toBe('');
    const out = JSON.parse(run.stdout) as { version: string; model: string; q: number; q1d: number; svg: boolean; invalid: string };
    expect(out).toMatchObject({ version: '0.1.0', model: 'fd-1d', svg: true, invalid: 'fin' });
    // Same fin, fd-1d study vs one 101-node grid: second order, so within 1e-4 of each other.
    expect(Math.abs(out.q1d - out.q) / out.q).toBeLessThan(1e-4);
  });

  it('refuses deep imports (everything goes through the entry)', () => {
    writeFileSync(join(folder, 'deep.mjs'), "await import('fincheck/dist/lib.js');\n");
    const run = spawnSync(process.execPath, ['deep.mjs'], { cwd: folder, encoding: 'utf8' });
    expect(run.status).not.toBe(0);
    expect(run.stderr).toContain('ERR_PACKAGE_PATH_NOT_EXPORTED');
  });

  it('type-checks from TypeScript, and the types catch a wrong option', () => {
    const tsc = join(repo, 'node_modules', 'typescript', 'bin', 'tsc');
    // skipLibCheck: the declarations are tsc's own output; what is checked is the user's code against them.
    const options = [
      '--noEmit',
      '--strict',
      '--skipLibCheck',
      '--module',
      'NodeNext',
      '--moduleResolution',
      'NodeNext',
      '--target',
      'ES2022',
      '--types',
      'node',
    ];
    writeFileSync(join(folder, 'typed.ts'), typed);
    const ok = spawnSync(process.execPath, [tsc, ...options, 'typed.ts'], { cwd: folder, encoding: 'utf8' });
    expect(ok.stdout + ok.stderr).toBe('');
    expect(ok.status).toBe(0);
    writeFileSync(join(folder, 'mistyped.ts'), mistyped);
    const bad = spawnSync(process.execPath, [tsc, ...options, 'mistyped.ts'], { cwd: folder, encoding: 'utf8' });
    expect(bad.status).not.toBe(0);
    expect(bad.stdout).toMatch(/mistyped\.ts\(2,\d+\): error TS2322/);
  });

  it("runs the README's library example: a thickness sweep written to a CSV file", () => {
    const readme = readFileSync(join(repo, 'README.md'), 'utf8');
    const block = /<!-- library-example[^>]*-->\n```js\n([\s\S]*?)```/.exec(readme)?.[1];
    expect(block).toBeDefined();
    writeFileSync(join(folder, 'sweep.mjs'), block ?? '');
    const run = spawnSync(process.execPath, ['sweep.mjs'], { cwd: folder, encoding: 'utf8' });
    expect(run.stderr).toBe('');
    const lines = readFileSync(join(folder, 'thickness-sweep.csv'), 'utf8').trim().split('\n');
    expect(lines[0]).toBe('thickness_mm,reference,Q_reference_W,model,drift_percent,verdict');
    // Five thicknesses, one row per shortcut that applies to a plate fin with a convective tip.
    const rows = lines.slice(1).map((l) => l.split(','));
    expect(new Set(rows.map((r) => r[0]))).toEqual(new Set(['1', '1.5', '2', '3', '4']));
    for (const r of rows) {
      expect(r).toHaveLength(6);
      expect(Number(r[2])).toBeGreaterThan(0);
      expect(['ok', 'marginal', 'unsafe', 'unresolved']).toContain(r[5]);
    }
  }, 120_000);

  it('installs the command', () => {
    expect(existsSync(join(modules, 'fincheck', 'dist', 'fincheck.cjs'))).toBe(true);
    const run = spawnSync(process.execPath, [join(modules, 'fincheck', 'dist', 'fincheck.cjs'), '--version'], { encoding: 'utf8' });
    expect(run.stdout.trim()).toBe('0.1.0');
  });
});
