/**
 * Starting a map worker thread. The bundled CLI (dist/fincheck.cjs) starts the bundled worker beside it,
 * dist/map-worker.js (scripts/build.mjs builds both). Run from the TypeScript sources (tests, `tsx cli/main.ts`)
 * there is no bundle: the worker then starts from src/map/worker.ts through a small bootstrap that registers the
 * tsx loader (a devDependency) in the new thread first.
 */
import { existsSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { MapJob } from './types.js';

/** The file URL of tsx's ESM registration API, read from tsx's own package exports. */
function tsxApiUrl(): string {
  const require = createRequire(import.meta.url);
  const manifestPath = require.resolve('tsx/package.json');
  const manifest = JSON.parse(readFileSync(manifestPath, 'utf8')) as { exports: Record<string, { import?: { default?: string } }> };
  const entry = manifest.exports['./esm/api']?.import?.default;
  if (entry === undefined) throw new Error('tsx/esm/api has no ESM entry');
  return pathToFileURL(join(dirname(manifestPath), entry)).href;
}

export function startMapWorker(job: MapJob): Worker {
  const bundled = new URL('./map-worker.js', import.meta.url);
  if (existsSync(fileURLToPath(bundled))) return new Worker(bundled, { workerData: job });
  const source = new URL('./worker.ts', import.meta.url);
  if (!existsSync(fileURLToPath(source))) {
    throw new Error(`map worker not found (looked for ${fileURLToPath(bundled)}); run \`npm run build\``);
  }
  const bootstrap = `import(${JSON.stringify(tsxApiUrl())}).then((tsx) => { tsx.register(); return import(${JSON.stringify(source.href)}); });`;
  return new Worker(bootstrap, { eval: true, workerData: job });
}
