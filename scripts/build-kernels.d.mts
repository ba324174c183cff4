// Types of scripts/build-kernels.mjs (plain JavaScript, run by npm run kernels without TypeScript).
export const KERNEL_SOURCES: string[];
export function compileKernels(): Promise<Buffer>;
export function kernelsModuleText(bytes: Buffer): string;
