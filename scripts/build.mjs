// Bundles the CLI into one ESM file so `fincheck` starts fast (no TypeScript at run time,
// tree-shaken mathjs). Native or WASM packages, and PDFKit (it reads its font metrics from its own folder at run
// time), stay external and load lazily.
import { build } from 'esbuild';

await build({
  entryPoints: ['cli/main.ts'],
  outfile: 'dist/fincheck.js',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  sourcemap: true,
  banner: {
    js: "#!/usr/bin/env node\nimport { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);",
  },
  external: ['@resvg/resvg-js', 'cephes', 'dejavu-fonts-ttf', 'playwright-core', 'pdfkit', 'svg-to-pdfkit'],
  logLevel: 'warning',
});

// The library entry (package.json exports '.'): src/api, for `import { check } from 'fincheck'`. Its declarations
// are written by `npm pack` (prepack: tsconfig.lib.json), not on every build.
await build({
  entryPoints: ['src/api/index.ts'],
  outfile: 'dist/lib.js',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  sourcemap: true,
  banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
  external: ['@resvg/resvg-js', 'cephes', 'dejavu-fonts-ttf', 'playwright-core', 'pdfkit', 'svg-to-pdfkit'],
  logLevel: 'warning',
});

// The map command's worker thread (src/map/worker.ts) needs its own entry: dist/fincheck.js starts
// dist/map-worker.js beside it (src/map/worker-start.ts).
await build({
  entryPoints: ['src/map/worker.ts'],
  outfile: 'dist/map-worker.js',
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  sourcemap: true,
  banner: { js: "import { createRequire as __cr } from 'node:module'; const require = __cr(import.meta.url);" },
  external: ['@resvg/resvg-js', 'cephes', 'dejavu-fonts-ttf', 'playwright-core', 'pdfkit', 'svg-to-pdfkit'],
  logLevel: 'warning',
});
