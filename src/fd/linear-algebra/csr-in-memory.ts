/**
 * A CSR conductance matrix (csr.ts) copied into a kernel memory, with its product and residual as WebAssembly
 * (src/fd/wasm/assembly/csr-kernels.ts: csrMultiply and csrResidual transcribed operation for operation, so the
 * same bits), for the 3-D sink systems whose finest level is a general sparse matrix (fins as full 3-D cells).
 *   multiply  out = A x;   residual  out = b − A x, returning |out|_1;
 * in the difference form (A x)_p = e_p x_p + sum_{q != p} A_pq (x_q − x_p) when the matrix carries its excess.
 */
import type { CsrMatrix } from './csr.js';
import { MemoryPlan, type KernelMemory } from '../wasm/kernel-memory.js';

/** Words of a matrix's descriptor (csr-kernels.ts). */
const DESCRIPTOR_WORDS = 5;

export function csrMemoryBytes(a: CsrMatrix): number {
  return new MemoryPlan()
    .add(a.n + 1, 4)
    .add(a.col.length, 4)
    .add(a.val.length, 8)
    .add(a.excess?.length ?? 0, 8)
    .add(DESCRIPTOR_WORDS, 4).bytes;
}

export interface CsrKernels {
  /** out = A x (x and out views into the memory). */
  multiply(x: Float64Array, out: Float64Array): void;
  /** out = b − A x; returns |out|_1. */
  residual(x: Float64Array, b: Float64Array, out: Float64Array): number;
}

export function csrInMemory(a: CsrMatrix, memory: KernelMemory): CsrKernels {
  const d = memory.i32(DESCRIPTOR_WORDS);
  const excess = a.excess !== undefined ? memory.copyF64(a.excess) : 0;
  d.set([a.n, memory.copyI32(a.rowStart.subarray(0, a.n + 1)), memory.copyI32(a.col), memory.copyF64(a.val), excess]);
  const k = memory.kernels;
  const level = d.byteOffset;
  return {
    multiply: (x, out) => k.csrMultiply(level, x.byteOffset, out.byteOffset),
    residual: (x, b, out) => k.csrResidual(level, x.byteOffset, b.byteOffset, out.byteOffset),
  };
}
