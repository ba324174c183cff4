/**
 * How many random cases the fuzz tests run, and from which seed.
 *
 * `npm test` runs a bounded count from a fixed seed (the same cases every time, so a red test is
 * reproducible and the suite stays within about 30 s on two cores). `npm run fuzz` (scripts/fuzz.mjs)
 * sets FUZZ_RUNS to a multiple of the counts and a random FUZZ_SEED, which it prints first; a failure
 * is replayed with `FUZZ_SEED=<seed> npm run fuzz` (fast-check also prints the seed and the shrink path
 * of the counterexample; FUZZ_PATH=<path> replays that one case).
 */
import type { Parameters } from 'fast-check';

/** The seed of `npm test`: fixed, chosen once (any integer works; this one is arbitrary). */
export const FIXED_SEED = 20261202;

function intFromEnv(name: string): number | undefined {
  const text = process.env[name];
  if (text === undefined || text.trim() === '') return undefined;
  const value = Number(text);
  if (!Number.isInteger(value)) throw new Error(`${name} must be an integer, got ${JSON.stringify(text)}`);
  return value;
}

/** The seed of this run: FUZZ_SEED, else the fixed seed. */
export const fuzzSeed: number = intFromEnv('FUZZ_SEED') ?? FIXED_SEED;

/** Multiplies every property's run count: FUZZ_RUNS (npm run fuzz sets it), else 1. */
const runScale: number = intFromEnv('FUZZ_RUNS') ?? 1;

/** True in a long run (npm run fuzz): the tests allow more time per property. */
export const longRun = runScale > 1;

/**
 * fast-check parameters for one property. `runs` is its count in `npm test`; each property gets its own
 * seed derived from the run's seed and `salt`, so adding a property does not change the cases of another.
 */
export function fuzzParameters<T>(runs: number, salt: number): Parameters<T> {
  const path = process.env['FUZZ_PATH'];
  return {
    seed: (fuzzSeed ^ Math.imul(salt, 0x9e3779b1)) | 0,
    numRuns: runs * runScale,
    ...(path ? { path } : {}),
    // Shrinking re-runs the CLI many times; bound it so a failure is reported in minutes, not hours.
    interruptAfterTimeLimit: longRun ? 3_600_000 : 240_000,
    markInterruptAsFailure: false,
  };
}

/** Per-test time limit (ms) for a property that runs `runs` cases of about `perCaseMs` each. */
export function timeoutFor(runs: number, perCaseMs: number): number {
  return Math.max(60_000, runs * runScale * perCaseMs * 4 + 240_000);
}
