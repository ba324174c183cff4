// `npm run fuzz`: the fuzz tests (tests/fuzz) on many more random cases than `npm test` runs, from a fresh
// seed printed first, so a failure can be replayed with `FUZZ_SEED=<seed> npm run fuzz`.
// FUZZ_RUNS multiplies every property's count (default 20: about 10-15 minutes on two cores).
import { spawnSync } from 'node:child_process';
import { randomInt } from 'node:crypto';

const seed = process.env.FUZZ_SEED ?? String(randomInt(1, 2 ** 31 - 1));
const runs = process.env.FUZZ_RUNS ?? '20';
console.log(`fuzz: seed ${seed}, ${runs}x the npm test counts; replay with FUZZ_SEED=${seed} FUZZ_RUNS=${runs} npm run fuzz`);
const result = spawnSync('npx', ['vitest', 'run', 'tests/fuzz', ...process.argv.slice(2)], {
  stdio: 'inherit',
  env: { ...process.env, FUZZ_SEED: seed, FUZZ_RUNS: runs },
});
console.log(`fuzz: seed ${seed} (FUZZ_SEED=${seed} FUZZ_RUNS=${runs} npm run fuzz to replay)`);
process.exit(result.status ?? 1);
