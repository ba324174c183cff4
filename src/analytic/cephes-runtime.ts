/**
 * The one place that loads the Cephes special-function library (compiled to WebAssembly).
 *
 * Cephes (S. L. Moshier, "Methods and Programs for Mathematical Functions", Ellis Horwood 1989) is
 * used through the `cephes` npm package, whose WebAssembly build must finish compiling before the first
 * call. `initBessel()` loads the package lazily and awaits that once; every synchronous wrapper in this
 * folder asks `cephesLibrary()` for the loaded module and gets a clear error if nobody awaited
 * `initBessel()` first.
 *
 * The package ships type declarations only for its CommonJS entry, so it is loaded through
 * `createRequire` (its CommonJS build) and typed from that entry; it stays external to the CLI bundle.
 */
import { createRequire } from 'node:module';
import type CephesModule from 'cephes' with { 'resolution-mode': 'require' };

export type CephesLibrary = typeof CephesModule;

let loaded: CephesLibrary | null = null;
let loading: Promise<void> | null = null;

/** Load the Bessel/Gamma library. Call (and await) once before any function of src/analytic. */
export function initBessel(): Promise<void> {
  if (loaded !== null) return Promise.resolve();
  if (loading === null) {
    const required = createRequire(import.meta.url)('cephes') as { default: CephesLibrary };
    const library = required.default;
    loading = library.compiled.then(() => {
      loaded = library;
    });
  }
  return loading;
}

/** True once `initBessel()` has finished. */
export function isBesselReady(): boolean {
  return loaded !== null;
}

/** The loaded library; throws if `initBessel()` has not been awaited. */
export function cephesLibrary(): CephesLibrary {
  if (loaded === null) {
    throw new Error('fincheck analytic: Bessel functions are not initialised; call `await initBessel()` first');
  }
  return loaded;
}
