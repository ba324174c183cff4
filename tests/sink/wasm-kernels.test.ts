/**
 * The WebAssembly kernels (src/fd/wasm/assembly/, run when their tables and vectors live in a KernelMemory) against
 * the TypeScript loops they transcribe operation for operation: the line sweeps of sink-stencil-relaxation.ts (every
 * kind of sweep, both coefficient precisions), the transfers of sink-transfer.ts, the stencil products of
 * sink-stencil-product.ts, CG's vector updates (sparse-pcg.ts), and for fins as 3-D cells the CSR product, residual
 * and line sweeps of csr.ts and line-relaxation.ts: the same bits on pins and plate fins (fin roots as extra
 * couplings). Invented sinks (tests/sink/support/sink-case.ts). And the committed binary is what
 * scripts/build-kernels.mjs makes from the sources.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildSinkGrid } from '../../src/mesh/index.js';
import { relaxationBytes, stencilRelaxation, type RelaxationPrecision } from '../../src/fd/linear-algebra/sink-stencil-relaxation.js';
import { sinkMultigrid } from '../../src/fd/linear-algebra/sink-multigrid.js';
import { coarseningDirections, levelUnknowns } from '../../src/fd/linear-algebra/aggregation.js';
import { sinkTransfer, transferApply, transferBytes } from '../../src/fd/linear-algebra/sink-transfer.js';
import { stencilInMemory, stencilMemoryBytes, stencilMultiply, stencilResidual } from '../../src/fd/linear-algebra/sink-stencil-product.js';
import { sparsePcg } from '../../src/fd/linear-algebra/sparse-pcg.js';
import { assembleSink } from '../../src/fd/three-d/sink-system.js';
import { RESIDUAL_TARGET } from '../../src/fd/three-d/sink-solve.js';
import { sinkProblem } from '../../src/fd/three-d/sink-problem.js';
import { KernelMemory, MemoryPlan, kernelsAvailable, tryKernelMemory, type KernelExports } from '../../src/fd/wasm/kernel-memory.js';
import { compileKernels, kernelsModuleText } from '../../scripts/build-kernels.mjs';
import { csrMultiply, csrResidual } from '../../src/fd/linear-algebra/csr.js';
import { csrInMemory, csrMemoryBytes } from '../../src/fd/linear-algebra/csr-in-memory.js';
import { buildLineRelaxation, lineRelaxationBytes } from '../../src/fd/linear-algebra/line-relaxation.js';
import { smallSink } from './support/sink-case.js';

/** Indices where u and v differ as bits (Object.is: -0 and +0 differ, NaN equals NaN). */
function differing(u: Float64Array, v: Float64Array): number {
  let count = 0;
  for (let k = 0; k < u.length; k++) if (!Object.is(u[k], v[k])) count++;
  return count + Math.abs(u.length - v.length);
}

/** A KernelMemory that counts its kernel calls, to show the WebAssembly path ran. */
function countingMemory(bytes: number): { memory: KernelMemory; calls: () => number } {
  const memory = new KernelMemory(bytes);
  const inner = memory.kernels;
  let calls = 0;
  const counted: KernelExports = {
    ...inner,
    csrMultiply: (...a) => (calls++, inner.csrMultiply(...a)),
    csrResidual: (...a) => (calls++, inner.csrResidual(...a)),
    csrLineSweep: (...a) => (calls++, inner.csrLineSweep(...a)),
    stencilMultiply: (...a) => (calls++, inner.stencilMultiply(...a)),
    stencilResidual: (...a) => (calls++, inner.stencilResidual(...a)),
    restrictGather: (...a) => (calls++, inner.restrictGather(...a)),
    prolongAxis: (...a) => (calls++, inner.prolongAxis(...a)),
    sweepForward: (...a) => (calls++, inner.sweepForward(...a)),
    sweepBackward: (...a) => (calls++, inner.sweepBackward(...a)),
    forwardResidual: (...a) => (calls++, inner.forwardResidual(...a)),
  };
  Object.defineProperty(memory, 'kernels', { value: counted });
  return { memory, calls: () => calls };
}

describe.each(['pins', 'plates'] as const)('%s: WebAssembly sweeps', (kind) => {
  const problem = sinkProblem(smallSink(kind));
  const grid = buildSinkGrid(problem.layout, { cellSize: 0.002, plateLayers: 2, finLayers: 4, refine: 2 });
  const system = assembleSink(problem, grid, 'sheet');
  const s = system.stencil!;
  const n = s.n;

  it.each(['float64', 'float32'] as const)('give the TypeScript sweeps bit for bit (%s coefficients)', (precision: RelaxationPrecision) => {
    expect(s.extraTo.length).toBeGreaterThan(0);
    const { memory, calls } = countingMemory(new MemoryPlan().add(relaxationBytes(s, precision), 1).add(n, 8).add(n, 8).add(n, 8).bytes);
    const fast = stencilRelaxation(s, precision, memory);
    const plain = stencilRelaxation(s, precision);
    const b = memory.f64(n);
    const x = memory.f64(n);
    const r = memory.f64(n);
    for (let p = 0; p < n; p++) b[p] = system.rhs[p]! + 1e-3 * Math.sin(0.7 * p);
    const start = Float64Array.from({ length: n }, (_, p) => Math.cos(0.3 * p));
    const bPlain = Float64Array.from(b);
    const xPlain = new Float64Array(n);
    const rPlain = new Float64Array(n);

    x.set(start);
    xPlain.set(start);
    fast.sweep(b, x, 'forward');
    plain.sweep(bPlain, xPlain, 'forward');
    expect(differing(x, xPlain)).toBe(0);

    fast.sweep(b, x, 'backward');
    plain.sweep(bPlain, xPlain, 'backward');
    expect(differing(x, xPlain)).toBe(0);

    expect(Object.is(fast.backwardDot(b, x), plain.backwardDot(bPlain, xPlain))).toBe(true);
    expect(differing(x, xPlain)).toBe(0);

    x.fill(Number.NaN); // a sweep from zero reads no entry of x before writing it
    fast.sweep(b, x, 'forward', true);
    plain.sweep(bPlain, xPlain, 'forward', true);
    expect(differing(x, xPlain)).toBe(0);

    fast.forwardResidual(b, x, r);
    plain.forwardResidual(bPlain, xPlain, rPlain);
    expect(differing(x, xPlain)).toBe(0);
    expect(differing(r, rPlain)).toBe(0);
    expect(calls()).toBe(5);
  });

  it('form the products and residuals of the stencil as the TypeScript loops do, bit for bit', () => {
    const { memory, calls } = countingMemory(new MemoryPlan().add(stencilMemoryBytes(s), 1).add(n, 8).add(n, 8).add(n, 8).bytes);
    const products = stencilInMemory(s, memory);
    const x = memory.f64(n);
    const b = memory.f64(n);
    const out = memory.f64(n);
    for (let p = 0; p < n; p++) {
      x[p] = Math.sin(0.21 * p) + 1;
      b[p] = system.rhs[p]!;
    }
    const plain = new Float64Array(n);
    const xAx = products.multiply(x, out);
    expect(Object.is(xAx, stencilMultiply(s, Float64Array.from(x), plain))).toBe(true);
    expect(differing(out, plain)).toBe(0);
    const norm = products.residual(x, b, out);
    stencilResidual(s, Float64Array.from(x), Float64Array.from(b), plain);
    expect(differing(out, plain)).toBe(0);
    expect(norm).toBe(plain.reduce((sum, v) => sum + Math.abs(v), 0));
    expect(calls()).toBe(2);
  });

  it('transfer between levels as the TypeScript passes do, bit for bit', () => {
    // Two steps down, so that the second starts from a grid already coarsened (several directions at once).
    let g = system.levelGrid;
    for (let step = 0; step < 2; step++) {
      const t = sinkTransfer(g, coarseningDirections(g));
      const nf = levelUnknowns(t.fine);
      const nc = levelUnknowns(t.coarse);
      const { memory, calls } = countingMemory(new MemoryPlan().add(transferBytes(t), 1).add(nf, 8).add(nc, 8).add(nf, 8).bytes);
      const fast = transferApply(t, memory);
      const plain = transferApply(t);
      const r = memory.f64(nf);
      const rc = memory.f64(nc);
      const x = memory.f64(nf);
      for (let p = 0; p < nf; p++) r[p] = Math.sin(0.37 * p) + 2;
      const rcPlain = new Float64Array(nc);
      fast.restrict(r, rc);
      plain.restrict(Float64Array.from(r), rcPlain);
      expect(differing(rc, rcPlain)).toBe(0);
      for (let p = 0; p < nf; p++) x[p] = Math.cos(0.11 * p);
      const xPlain = Float64Array.from(x);
      fast.prolongAdd(rc, x);
      plain.prolongAdd(rcPlain, xPlain);
      expect(differing(x, xPlain)).toBe(0);
      expect(calls()).toBeGreaterThan(1);
      g = t.coarse;
    }
  });

  it('CG with the WebAssembly smoother reaches the TypeScript one solution bit for bit', () => {
    const pre = sinkMultigrid(system.matrix, system.lines, system.levelGrid, system.fold, system.stencil, 'float32');
    expect(pre.scratch?.r.length).toBe(n);
    // The updates through the scratch's kernels are counted: CG took the WebAssembly path.
    let updates = 0;
    const scratch = pre.scratch!;
    const counted = {
      ...scratch,
      holds: scratch.holds,
      step: (alpha: number, q: Float64Array) => (updates++, scratch.step(alpha, q)),
      direction: (beta: number) => (updates++, scratch.direction(beta)),
    };
    const viaKernels = sparsePcg(system.matrix, system.rhs, { ...pre, scratch: counted, operator: pre.operator }, RESIDUAL_TARGET, 400);
    expect(updates).toBeGreaterThan(2 * viaKernels.report.iterations - 2);
    // The same preconditioner applied to vectors outside its memory sweeps its finest level in TypeScript.
    const plainApply = { ...pre, scratch: undefined, operator: pre.operator };
    const viaPlain = sparsePcg(system.matrix, system.rhs, plainApply, RESIDUAL_TARGET, 400);
    expect(viaKernels.report).toEqual(viaPlain.report);
    expect(differing(viaKernels.x, viaPlain.x)).toBe(0);
  });
});

describe.each(['pins', 'plates'] as const)('%s as 3-D cells: WebAssembly CSR kernels', (kind) => {
  const problem = sinkProblem(smallSink(kind));
  const grid = buildSinkGrid(problem.layout, { cellSize: 0.002, plateLayers: 2, finLayers: 4, refine: 2 });
  const system = assembleSink(problem, grid, 'cells');
  const a = system.matrix;
  const n = a.n;

  it('form the product, the residual and the line sweeps as csr.ts and line-relaxation.ts do, bit for bit', () => {
    expect(a.excess).toBeDefined();
    const { memory, calls } = countingMemory(
      new MemoryPlan().add(csrMemoryBytes(a), 1).add(lineRelaxationBytes(a, system.lines), 1).add(n, 8).add(n, 8).add(n, 8).bytes,
    );
    const k = csrInMemory(a, memory);
    const fast = buildLineRelaxation(a, system.lines, memory);
    const plain = buildLineRelaxation(a, system.lines);
    const x = memory.f64(n);
    const b = memory.f64(n);
    const out = memory.f64(n);
    for (let p = 0; p < n; p++) {
      x[p] = Math.sin(0.19 * p) + 1;
      b[p] = a.excess![p]! * 3 + Math.cos(p);
    }
    const xPlain = Float64Array.from(x);
    const bPlain = Float64Array.from(b);
    const outPlain = new Float64Array(n);
    k.multiply(x, out);
    csrMultiply(a, xPlain, outPlain);
    expect(differing(out, outPlain)).toBe(0);
    expect(Object.is(k.residual(x, b, out), csrResidual(a, xPlain, bPlain, outPlain))).toBe(true);
    expect(differing(out, outPlain)).toBe(0);
    for (const direction of ['forward', 'backward'] as const) {
      fast.sweep(b, x, direction);
      plain.sweep(bPlain, xPlain, direction);
      expect(differing(x, xPlain)).toBe(0);
    }
    expect(calls()).toBe(4);
  });
});

describe('KernelMemory', () => {
  it('compiles on this runtime (Node 20 on x86-64 with SSE4.1, or arm64), so the solvers take the WebAssembly path', () => {
    expect(kernelsAvailable()).toBe(true);
  });

  it('is not made beyond 4 GiB (the solvers then run their TypeScript loops)', () => {
    expect(tryKernelMemory(2 ** 32)).toBeNull();
    expect(tryKernelMemory(1000)).not.toBeNull();
  });

  it('refuses an allocation beyond its planned size', () => {
    const memory = new KernelMemory(64000);
    memory.f64(8000);
    expect(() => memory.f64(500)).toThrow(/bytes asked/);
  });

  it('hands out aligned views that do not overlap', () => {
    const memory = new KernelMemory(4096);
    const a = memory.u8(3);
    const b = memory.f64(2);
    const c = memory.f32(5);
    expect(b.byteOffset % 16).toBe(0);
    expect(c.byteOffset).toBeGreaterThanOrEqual(b.byteOffset + 16);
    expect(b.byteOffset).toBeGreaterThanOrEqual(a.byteOffset + 3);
    expect(memory.holds(c)).toBe(true);
    expect(memory.holds(new Float64Array(2))).toBe(false);
  });
});

describe('the committed kernel binary', () => {
  it('is what scripts/build-kernels.mjs compiles from the AssemblyScript sources', async () => {
    const committed = readFileSync(new URL('../../src/fd/wasm/kernels-binary.ts', import.meta.url), 'utf8');
    expect(committed).toBe(kernelsModuleText(await compileKernels()));
  }, 60_000);
});
