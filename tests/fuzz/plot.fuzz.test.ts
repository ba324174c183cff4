/**
 * Property-based fuzz test of `fincheck plot` on a small number of random valid cases (a chart costs a check
 * and a render): every kind, PNG and SVG, into a temporary folder. Exit 0 writes one complete image (PNG
 * signature, or an SVG document); exit 2 or 3 writes nothing and leaves no temporary file (README: "an error
 * leaves nothing half-written"); the exit-code and message contract as for check.
 */
import { existsSync, mkdtempSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fc } from '@fast-check/vitest';
import { afterAll, describe, it } from 'vitest';
import { validCase, type FuzzCase } from './support/cases.js';
import { fuzzParameters, timeoutFor } from './support/config.js';
import { exitProblems } from './support/contract.js';
import { unknownProblems } from './support/known.js';
import { caseText, cleanUp, describeRun, runOn, scratchDir } from './support/drive.js';
import { commandOptions } from './support/options.js';

afterAll(cleanUp);

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

interface PlotOptions {
  kind: 'profile' | 'flux' | 'heatmap';
  format: 'png' | 'svg';
}

async function property(c: FuzzCase, o: PlotOptions): Promise<void> {
  const out = mkdtempSync(join(scratchDir(), 'plot-'));
  const file = join(out, `chart.${o.format}`);
  const run = await runOn(caseText(c.doc, c.format), c.format, 'plot', ['--out', file, '--kind', o.kind, '--width', '600', '--height', '400']);
  const problems = exitProblems(run, false, await commandOptions('plot'));
  const written = readdirSync(out);
  if (run.code === 0) {
    if (!existsSync(file)) problems.push('exit 0 but no chart was written');
    else {
      const bytes = readFileSync(file);
      if (o.format === 'png' && !bytes.subarray(0, 8).equals(PNG_SIGNATURE)) problems.push('the .png file is not a PNG');
      if (o.format === 'svg' && !/^<svg[\s\S]*<\/svg>\s*$/.test(bytes.toString('utf8').replace(/^<\?xml[^>]*>\s*/, '')))
        problems.push('the .svg file is not one SVG document');
      if (o.format === 'svg' && /NaN|undefined|Infinity/.test(bytes.toString('utf8'))) problems.push('the SVG contains NaN, undefined or Infinity');
    }
    if (written.length !== 1) problems.push(`exit 0 left ${written.join(', ')} in the output folder`);
  } else if (written.length > 0) problems.push(`exit ${run.code} left ${written.join(', ')} in the output folder`);
  // A heat map needs the 2-D model: its refusal (exit 2) for an infinite tip of a nonlinear fin is documented.
  const documented = o.kind === 'heatmap' && c.facts.tip === 'infinite' && /infinite tip/.test(run.stderr);
  if (run.code === 2 && !documented) problems.push('a valid case was refused (exit 2)');
  const unknown = unknownProblems(problems, c.facts);
  if (unknown.length > 0) throw new Error(`${unknown.join('\n')}\n${describeRun(run)}`);
}

describe('fuzz: fincheck plot on random valid cases', () => {
  const RUNS = 6;
  it(
    'writes one complete chart, or nothing with a documented exit code',
    async () => {
      await fc.assert(
        fc.asyncProperty(
          validCase,
          fc.record({
            kind: fc.constantFrom('profile' as const, 'flux' as const, 'heatmap' as const),
            format: fc.constantFrom('png' as const, 'svg' as const),
          }),
          property,
        ),
        fuzzParameters(RUNS, 7),
      );
    },
    timeoutFor(RUNS, 1500),
  );
});
