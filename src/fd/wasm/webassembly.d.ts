/**
 * The part of the WebAssembly JavaScript interface (W3C, "WebAssembly JavaScript Interface", 2019) that
 * kernel-memory.ts uses, which Node provides as a global: TypeScript declares it only in its DOM libraries, which
 * this project does not load.
 */
declare namespace WebAssembly {
  class Module {
    constructor(bytes: Uint8Array);
  }
  interface MemoryDescriptor {
    initial: number;
    maximum?: number;
    shared?: boolean;
  }
  class Memory {
    constructor(descriptor: MemoryDescriptor);
    readonly buffer: ArrayBuffer;
  }
  class Instance {
    constructor(module: Module, imports: Record<string, Record<string, unknown>>);
    readonly exports: Record<string, unknown>;
  }
}
