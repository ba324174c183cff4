/**
 * The library's heat-sink entry points (src/api/sink.ts): the same numbers as `fincheck check --json` and
 * `fincheck solve --json` on the demo's invented motor-drive sink, and typed errors naming the field.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { checkSink, InputError, sinkFromFile, sinkFromObject, sinkFromText, solveSink, UsageError } from '../../src/api/index.js';
import { cli } from '../cli/run.js';

const SINK = 'demo/motor-drive-sink.yaml';

describe('library: heat sinks', () => {
  it('checkSink equals `fincheck check --json`, key by key', async () => {
    const fromApi = await checkSink(sinkFromFile(SINK));
    const fromCli = await cli('check', SINK, '--json');
    expect(fromCli.code).toBe(0);
    expect(JSON.parse(JSON.stringify(fromApi))).toEqual(JSON.parse(fromCli.stdout));
  }, 120_000);

  it('solveSink equals `fincheck solve --json`', async () => {
    const fromApi = solveSink(sinkFromText(readFileSync(SINK, 'utf8'), SINK));
    const fromCli = await cli('solve', SINK, '--json');
    expect(fromCli.code).toBe(0);
    expect(JSON.parse(JSON.stringify(fromApi))).toEqual(JSON.parse(fromCli.stdout));
  }, 120_000);

  it('a sink from an object is the sink from text', () => {
    const text = `name: small sink
fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 40 mm, thickness: 4 mm }
sources:
  - { name: chip, power: 15 W, centre: [20 mm, 20 mm], size: [10 mm, 10 mm] }
convection: { ambient: 30 degC, h: 40 W/(m^2*K) }
`;
    const fromObject = sinkFromObject({
      name: 'small sink',
      fin: { profile: 'rectangular', length: '20 mm', thickness: '1.5 mm' },
      material: 'aluminium-6063',
      array: { count: 4, pitch: '10 mm' },
      plate: { width: '40 mm', length: '40 mm', thickness: '4 mm' },
      sources: [{ name: 'chip', power: '15 W', centre: ['20 mm', '20 mm'], size: ['10 mm', '10 mm'] }],
      convection: { ambient: '30 degC', h: '40 W/(m^2*K)' },
    });
    expect(fromObject).toEqual(sinkFromText(text));
  });

  it('a single-fin case is an InputError that says what a sink case holds', () => {
    const read = () => sinkFromFile('demo/inverter-plate-fin.yaml');
    expect(read).toThrow(InputError);
    expect(read).toThrow(/array/);
  });

  it('a bad source power names its key path, the value and what is accepted', () => {
    try {
      sinkFromObject({
        fin: { profile: 'rectangular', length: '20 mm', thickness: '1.5 mm' },
        material: 'aluminium-6063',
        array: { count: 4, pitch: '10 mm' },
        plate: { width: '40 mm', length: '40 mm', thickness: '4 mm' },
        sources: [{ power: '-3 W', centre: ['20 mm', '20 mm'], size: ['10 mm', '10 mm'] }],
        convection: { ambient: '30 degC', h: '40 W/(m^2*K)' },
      });
      expect.unreachable('the negative power was accepted');
    } catch (error) {
      expect(error).toBeInstanceOf(InputError);
      const issue = (error as InputError).issues.find((i) => i.path.startsWith('sources[0].power'));
      expect(issue?.value).toContain('-3');
    }
  });

  it('a tolerance out of range is a UsageError naming options.tolerance', async () => {
    await expect(checkSink(sinkFromFile(SINK), { tolerance: 2 })).rejects.toThrow(UsageError);
    await expect(checkSink(sinkFromFile(SINK), { tolerance: 2 })).rejects.toThrow(/options\.tolerance/);
  });
});
