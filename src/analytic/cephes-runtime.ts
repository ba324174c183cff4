/**
 * The one place that loads the Cephes special-function library (compiled to WebAssembly).
 *
 * Cephes (S. L. Moshier, "Methods and Programs for Mathematical Functions", Ellis Horwood 1989) is
 * used through the `cephes` npm package, whose WebAssembly build must finish compiling before the first
 * call. `initBessel()` awaits that once; every synchronous wrapper in this folder asks `cephesLibrary()`
 * for the loaded module and gets a clear error if nobody awaited `initBessel()` first.
 */
import cephes from 'cephes';

export type CephesLibrary = typeof cephes;

let loaded: CephesLibrary | null = null;
let loading: Promise<void> | null = null;

/** Load the Bessel/Gamma library. Call (and await) once before any function of src/analytic. */
export function initBessel(): Promise<void> {
  if (loaded !== null) return Promise.resolve();
  if (loading === null) {
    loading = cephes.compiled.then(() => {
      loaded = cephes;
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
