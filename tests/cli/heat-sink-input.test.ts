/**
 * A heat-sink case given to a command that takes single-fin cases: exit 2, naming the key that makes it a heat
 * sink and what the command accepts, nothing on stdout. The sink is invented. (solve and plot took single fins
 * only until issue 11's outputs; they take heat sinks now: tests/cli/sink-commands.test.ts; optimize took single fins only
 * until issue 12's sink optimum: it takes heat sinks now, tests/design/optimize-sink.test.ts, and refuses the
 * single-fin options for them.)
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { cli } from './run.js';

const sink = `name: invented sink
fin: { profile: rectangular, length: 30 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 10, pitch: 8 mm }
plate: { width: 80 mm, length: 60 mm, thickness: 5 mm }
sources:
  - { power: 30 W, centre: [40 mm, 30 mm], size: [20 mm, 20 mm] }
convection: { ambient: 25 degC, h: 40 W/(m^2*K) }
`;

describe('single-fin commands given a heat sink', () => {
  const dir = mkdtempSync(join(tmpdir(), 'fincheck-sink-cli-'));
  const file = join(dir, 'sink.yaml');
  writeFileSync(file, sink);
  it('optimize: a single-fin option given for a heat sink exits 2 naming it and what a sink takes', async () => {
    const run = await cli('optimize', file, '--vary', 'fin.thickness', '--keep', 'profile-area');
    expect(run.code).toBe(2);
    expect(run.stdout).toBe('');
    expect(run.stderr).toMatch(
      /^fincheck: --keep: got profile-area; a heat sink takes none \(the plate fixed, the count or thickness free\), volume or mass/,
    );
  });
});
