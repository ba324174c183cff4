/**
 * The one place that loads the Cephes special-function library (compiled to WebAssembly).
 *
 * Cephes (S. L. Moshier, "Methods and Programs for Mathematical Functions", Ellis Horwood 1989) is
 * used through the `cephes` npm package. Its CommonJS build compiles its WebAssembly synchronously when it is
 * required (its `compiled` promise is already settled under Node), which costs tens of ms at start-up: it is
 * loaded on the first call that needs it (`cephesLibrary()`), so a run that evaluates no Bessel or Gamma
 * function (a rectangular fin's check) never pays for it. `initBessel()` loads it ahead of time and awaits
 * `compiled`, for a caller that wants the cost up front or a build where compiling is asynchronous.
 *
 * The package ships type declarations only for its CommonJS entry, so it is loaded through
 * `createRequire` (its CommonJS build) and typed from that entry; it stays external to the CLI bundle.
 */
import { createRequire } from 'node:module';
import type CephesModule from 'cephes' with { 'resolution-mode': 'require' };

export type CephesLibrary = typeof CephesModule;

let loaded: CephesLibrary | null = null;
let loading: Promise<void> | null = null;

/** The package's module (its CommonJS build; requiring it compiles the WebAssembly). */
function requireCephes(): CephesLibrary {
  return (createRequire(import.meta.url)('cephes') as { default: CephesLibrary }).default;
}

/** Load the Bessel/Gamma library ahead of its first use (optional: the first call loads it too). */
export function initBessel(): Promise<void> {
  if (loaded !== null) return Promise.resolve();
  if (loading === null) {
    const library = requireCephes();
    loading = library.compiled.then(() => {
      loaded = library;
    });
  }
  return loading;
}

/** True once the library is loaded (by `initBessel()` or a first call). */
export function isBesselReady(): boolean {
  return loaded !== null;
}

/** The loaded library, loaded now if no call has loaded it yet (the CommonJS build is ready when required). */
export function cephesLibrary(): CephesLibrary {
  if (loaded === null) loaded = requireCephes();
  return loaded;
}
