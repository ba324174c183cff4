/**
 * A block of WebAssembly linear memory with the compiled kernels (kernels-binary.ts, from src/fd/wasm/assembly/)
 * bound to it: the arrays a kernel reads are typed-array views into the block, handed out by a bump allocator, and a
 * kernel takes their byte offsets. The block is sized once, before its first array (plan the bytes with
 * MemoryPlan), and never grows, so a view stays valid as long as the block lives.
 *
 * Why: V8 compiles a loop over typed arrays that arrive as arguments with a bounds check and a reload of each array's
 * data pointer per access; the same loop in WebAssembly reads memory directly. For the line sweeps of the 3-D sink
 * solver that halves the time on the development machine (bench: npm run bench, area sink).
 */
import { KERNELS_WASM_BASE64 } from './kernels-binary.js';

/** The kernels' exports (src/fd/wasm/assembly/); every pointer is a byte offset into the block. */
export interface KernelExports {
  sweepForward(level: number, b: number, x: number, fromZero: number): void;
  sweepBackward(level: number, b: number, x: number, withDot: number): number;
  forwardResidual(level: number, b: number, x: number, r: number): void;
  /** (stencil-products.ts) out = b − A x on a stencil described at `level`; returns |out|_1. */
  stencilResidual(level: number, x: number, b: number, out: number): number;
  /** out = A x; returns x · A x. */
  stencilMultiply(level: number, x: number, out: number): number;
  /** x += alpha p, r −= alpha q over n entries; returns |r|_1. */
  cgStep(n: number, alpha: number, p: number, q: number, x: number, r: number): number;
  /** p = z + beta p over n entries. */
  cgDirection(n: number, beta: number, z: number, p: number): void;
  /** (csr-kernels.ts) out = A x for the CSR matrix described at `matrix`. */
  csrMultiply(matrix: number, x: number, out: number): void;
  /** out = b − A x; returns |out|_1. */
  csrResidual(matrix: number, x: number, b: number, out: number): number;
  /** One line Gauss-Seidel sweep (forward != 0: in line order) with the relaxation described at `relaxation`. */
  csrLineSweep(relaxation: number, b: number, x: number, forward: number): void;
  /** (axis-transfers.ts; so and d0 are element offsets) dst = P^T src along one direction as a gather by coarse cell (sink-transfer.ts gatherTable). */
  restrictGather(
    n: number,
    nc: number,
    start: number,
    fine: number,
    weight: number,
    outer: number,
    inner: number,
    src: number,
    so: number,
    dst: number,
    d0: number,
  ): void;
  /** dst (+)= P src along one direction. */
  prolongAxis(
    n: number,
    nc: number,
    own: number,
    other: number,
    w: number,
    outer: number,
    inner: number,
    src: number,
    so: number,
    dst: number,
    d0: number,
    add: number,
  ): void;
}

const PAGE = 65536;
/** Every array starts on a 16-byte boundary. */
const ALIGN = 16;

/** The compiled module; null when this runtime cannot compile it (WebAssembly SIMD needs SSE4.1 on x86-64). */
let compiled: WebAssembly.Module | null | undefined;

function kernelModule(): WebAssembly.Module | null {
  if (compiled === undefined) {
    try {
      compiled = new WebAssembly.Module(Buffer.from(KERNELS_WASM_BASE64, 'base64'));
    } catch {
      compiled = null;
    }
  }
  return compiled;
}

/**
 * Whether the kernels run here. Where they do not, the solvers make no KernelMemory and run their TypeScript loops,
 * which give the same bits, only slower.
 */
export function kernelsAvailable(): boolean {
  return kernelModule() !== null;
}

/** WebAssembly's 32-bit memories hold at most 65536 pages (4 GiB). */
const MAX_PAGES = 65536;

/**
 * A block of `bytes`, or null where it cannot be had (beyond 4 GiB, or the runtime refuses the memory, or cannot
 * compile the kernels): the caller then runs its TypeScript loops, with the same bits.
 */
export function tryKernelMemory(bytes: number): KernelMemory | null {
  if (!kernelsAvailable() || Math.ceil((bytes + ALIGN) / PAGE) > MAX_PAGES) return null;
  try {
    return new KernelMemory(bytes);
  } catch (e) {
    if (e instanceof RangeError) return null;
    throw e;
  }
}

/** Bytes an allocation takes in a block (its size rounded up to the alignment). */
export function allocationBytes(count: number, bytesPerElement: number): number {
  return Math.ceil((count * bytesPerElement) / ALIGN) * ALIGN;
}

/** Counts the bytes a set of allocations will take, to size a block before making it. */
export class MemoryPlan {
  bytes = 0;
  add(count: number, bytesPerElement: number): this {
    this.bytes += allocationBytes(count, bytesPerElement);
    return this;
  }
}

export class KernelMemory {
  readonly memory: WebAssembly.Memory;
  readonly kernels: KernelExports;
  /** The first ALIGN bytes are never handed out, so that 0 is no array's offset (a kernel reads 0 as "none"). */
  private next = ALIGN;
  private readonly size: number;

  constructor(bytes: number) {
    const pages = Math.max(1, Math.ceil((bytes + ALIGN) / PAGE));
    this.memory = new WebAssembly.Memory({ initial: pages, maximum: pages });
    this.size = pages * PAGE;
    const module = kernelModule();
    if (module === null) throw new Error('KernelMemory: this runtime cannot compile the WebAssembly kernels (ask kernelsAvailable first)');
    const instance = new WebAssembly.Instance(module, {
      env: {
        memory: this.memory,
        abort: () => {
          throw new Error('WebAssembly kernel aborted');
        },
      },
    });
    this.kernels = instance.exports as unknown as KernelExports;
  }

  private take(count: number, bytesPerElement: number): number {
    const offset = this.next;
    const bytes = allocationBytes(count, bytesPerElement);
    if (offset + bytes > this.size) throw new Error(`KernelMemory: ${bytes} bytes asked with ${this.size - offset} left (plan the block's size first)`);
    this.next = offset + bytes;
    return offset;
  }

  f64(count: number): Float64Array {
    return new Float64Array(this.memory.buffer, this.take(count, 8), count);
  }

  f32(count: number): Float32Array {
    return new Float32Array(this.memory.buffer, this.take(count, 4), count);
  }

  i32(count: number): Int32Array {
    return new Int32Array(this.memory.buffer, this.take(count, 4), count);
  }

  u8(count: number): Uint8Array {
    return new Uint8Array(this.memory.buffer, this.take(count, 1), count);
  }

  /** A copy of v in the block (a kernel's table); returns the copy's byte offset. */
  copyF64(v: ArrayLike<number>): number {
    const c = this.f64(v.length);
    c.set(v);
    return c.byteOffset;
  }

  /** As copyF64, for 32-bit integers (indices). */
  copyI32(v: ArrayLike<number>): number {
    const c = this.i32(v.length);
    c.set(v);
    return c.byteOffset;
  }

  /** Whether a typed array is a view into this block (a kernel can read it by its byteOffset). */
  holds(v: ArrayBufferView): boolean {
    return v.buffer === this.memory.buffer;
  }
}
