/**
 * Advice after a 2-D solver failure names an option the running command has; src/ names none (it says what
 * failed, in the problem's words, and which kind of remedy applies: SolverError.remedy).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { SolverError, UsageError } from '../../src/errors.js';
import { solveFin2D } from '../../src/fd/two-d/linear-solve.js';
import { factorBandedCholesky } from '../../src/fd/linear-algebra/banded-cholesky.js';
import { TEMPERATURES_2D } from '../fd2d/cases.js';
import { finCase } from '../support/fin-case.js';
import { randomSpdStencil } from '../fd2d/random.js';
import { cli } from './run.js';

// The 2-D study of the one case below fails as a real solver failure would (a stand-in for the fin
// that made the multigrid CG fail before fin2d.ts solved for the departure from the lumped level). The
// one study (studyFin) solves each 2-D grid of a linear fin through linearGridSolvers.twoD.
vi.mock('../../src/fd/study/linear-grid-solvers.js', async (importOriginal) => {
  const original = await importOriginal<typeof import('../../src/fd/study/linear-grid-solvers.js')>();
  const solvers = original.linearGridSolvers;
  return {
    ...original,
    linearGridSolvers: {
      ...solvers,
      twoD: (...args: Parameters<typeof solvers.twoD>) => {
        if (args[0].physics.name === 'failing 2-D solve')
          throw new SolverError(
            'multigrid-preconditioned CG did not converge: relative residual 1.2e-7 after 7 iterations on a 153 x 33 grid',
            'another-2d-grid',
          );
        return solvers.twoD(...args);
      },
    },
  };
});

const tmp = mkdtempSync(join(tmpdir(), 'fincheck-advice-'));
const failing = join(tmp, 'failing.yaml');
writeFileSync(
  failing,
  `name: failing 2-D solve
fin: { profile: annular, innerRadius: 3.1 mm, outerRadius: 5.6 mm, thickness: 0.05 mm }
material: { k: 401 }
convection: { ambient: 25 degC, h: 45, tip: convective }
base: { temperature: 85 degC, contactResistance: 1e-3 m^2*K/W }
`,
);
const tabulated = join(tmp, 'tabulated.yaml');
writeFileSync(
  tabulated,
  `name: four-point table
fin: { profile: tabulated, shape: straight, width: 50 mm, points: [[0 mm, 4 mm], [10 mm, 3 mm], [20 mm, 2 mm], [30 mm, 1 mm]] }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40 }
base: { temperature: 80 degC }
`,
);

describe('advice after a 2-D solver failure', () => {
  it('src/ says what failed and the kind of remedy, no option name', () => {
    const a = randomSpdStencil(4, 4, 5);
    a.diag[5] = -1;
    let error: unknown;
    try {
      factorBandedCholesky(a);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(SolverError);
    expect((error as SolverError).remedy).toBe('another-2d-grid');
    expect((error as SolverError).message).not.toMatch(/--|another grid/);
  });

  it('solve --model 2d names --grid and --model 1d (exit 3)', async () => {
    const r = await cli('solve', failing, '--model', '2d');
    expect(r.code).toBe(3);
    expect(r.stderr).toMatch(
      /^fincheck: solver failure: multigrid-preconditioned CG did not converge.*; solve on another grid \(--grid NXxNY, e\.g\. fewer nodes across\) or with the 1-D model \(--model 1d\)\n$/,
    );
  });

  it('check, which has no grid option, names --reference 1d (exit 3)', async () => {
    const r = await cli('check', failing, '--reference', '2d');
    expect(r.code).toBe(3);
    expect(r.stderr).toMatch(/; use the 1-D reference \(--reference 1d\)\n$/);
    expect(r.stderr).not.toMatch(/--grid/);
  });
});

describe('a grid that cannot mesh the section', () => {
  it('src/ words it as the 2-D grid, without the option', () => {
    const c = finCase({
      profile: {
        kind: 'tabulated',
        shape: 'straight',
        x: Float64Array.of(0, 0.01, 0.02, 0.03),
        size: Float64Array.of(0.004, 0.003, 0.002, 0.001),
        width: 0.05,
      },
      k: 180,
      h: { kind: 'uniform', h: 40 },
      tip: { kind: 'adiabatic' },
      ...TEMPERATURES_2D,
    });
    expect(() => solveFin2D(c, { nx: 3, ny: 5 })).toThrow(UsageError);
    expect(() => solveFin2D(c, { nx: 3, ny: 5 })).toThrow(/^2-D grid: the profile has 4 points, so it needs at least 4 nodes along \(got 3\)$/);
  });

  it('solve names --grid (exit 2)', async () => {
    const r = await cli('solve', tabulated, '--model', '2d', '--grid', '3x5');
    expect(r.code).toBe(2);
    expect(r.stderr).toBe('fincheck: --grid: the profile has 4 points, so it needs at least 4 nodes along (got 3)\n');
  });
});
