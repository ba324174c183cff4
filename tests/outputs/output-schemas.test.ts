/**
 * The JSON Schemas of the commands' JSON outputs (`fincheck schema --output NAME`) against real outputs, validated
 * by Ajv (draft 2020-12, strict mode): check of a single fin with the 1-D and the 2-D reference, a nonlinear fin,
 * a heat sink, several cases with a bad one, solve 1-D and 2-D, map and optimize. additionalProperties: false
 * makes an undocumented key fail: the tests add one to a real output and expect the schema to refuse it.
 * All cases are invented.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { beforeAll, describe, expect, it } from 'vitest';
import { cli } from '../cli/run.js';

const tmp = mkdtempSync(join(tmpdir(), 'fincheck-outputs-'));
function file(name: string, text: string): string {
  const p = join(tmp, name);
  writeFileSync(p, text);
  return p;
}

const plate = file(
  'plate.yaml',
  `name: schema plate
fin: { profile: rectangular, length: 30 mm, thickness: 2 mm, width: 50 mm }
material: { k: 180 }
convection: { ambient: 20 degC, h: 40 }
base: { temperature: 80 degC }
`,
);
const annular = file(
  'annular.yaml',
  `name: schema disc
fin: { profile: annular, innerRadius: 5 mm, outerRadius: 12 mm, thickness: 0.4 mm }
material: aluminium-1100
convection: { ambient: 25 degC, h: 60 }
base: { temperature: 70 degC }
`,
);
const nonlinear = file(
  'nonlinear.yaml',
  `name: schema radiating pin
fin: { profile: pin, length: 40 mm, diameter: 4 mm }
material: { k: 40 }
convection: { ambient: 20 degC, h: { law: power, base: 8, exponent: 0.25 }, emissivity: 0.8 }
base: { temperature: 120 degC }
`,
);
const sink = file(
  'sink.yaml',
  `name: schema sink
fin: { profile: rectangular, length: 20 mm, thickness: 1.5 mm }
material: aluminium-6063
array: { count: 4, pitch: 10 mm }
plate: { width: 40 mm, length: 30 mm, thickness: 4 mm }
sources: [{ power: 10 W, centre: [20 mm, 15 mm], size: [10 mm, 10 mm], limit: 90 degC }]
convection: { ambient: 30 degC, h: 40 W/(m^2*K) }
`,
);
const bad = file(
  'bad.yaml',
  'name: bad\nfin: { profile: pin, length: -1 mm, diameter: 3 mm }\nmaterial: copper-pure\nconvection: { ambient: 20, h: 10 }\nbase: { temperature: 60 }\n',
);

const ajv = new Ajv2020({ strict: true, allErrors: true });
const schemas = new Map<string, ReturnType<typeof ajv.compile>>();

async function schemaOf(name: string) {
  let validate = schemas.get(name);
  if (validate === undefined) {
    const r = await cli('schema', '--output', name);
    expect(r.code).toBe(0);
    validate = ajv.compile(JSON.parse(r.stdout) as object);
    schemas.set(name, validate);
  }
  return validate;
}

async function jsonOf(...argv: string[]): Promise<unknown> {
  const r = await cli(...argv);
  expect(r.stderr.includes('internal error')).toBe(false);
  return JSON.parse(r.stdout) as unknown;
}

async function expectValid(name: string, value: unknown): Promise<void> {
  const validate = await schemaOf(name);
  const ok = validate(value);
  expect(ok ? [] : validate.errors).toEqual([]);
}

/** The same document with one undocumented key: the schema must refuse it. */
async function expectExtraKeyRefused(name: string, value: unknown, where: (doc: Record<string, unknown>) => Record<string, unknown>): Promise<void> {
  const copy = structuredClone(value) as Record<string, unknown>;
  where(copy).undocumentedKey = 1;
  expect((await schemaOf(name))(copy)).toBe(false);
}

describe('check', () => {
  const outputs: Record<string, unknown> = {};
  beforeAll(async () => {
    outputs.oneD = await jsonOf('check', plate, '--reference', '1d', '--json');
    outputs.twoD = await jsonOf('check', annular, '--json');
    outputs.nonlinear = await jsonOf('check', nonlinear, '--reference', '1d', '--json');
    outputs.sink = await jsonOf('check', sink, '--json');
  });

  it.each(['oneD', 'twoD', 'nonlinear', 'sink'])('the %s output matches the check schema', async (key) => {
    await expectValid('check', outputs[key]);
  });

  it('the outputs are of the kinds named (not vacuous): fd-1d, fd-2d, guesses of a nonlinear fin, fd-3d', () => {
    expect((outputs.oneD as { reference: { model: string } }).reference.model).toBe('fd-1d');
    expect((outputs.twoD as { reference: { model: string } }).reference.model).toBe('fd-2d');
    expect((outputs.sink as { reference: { model: string } }).reference.model).toBe('fd-3d');
    const models = (outputs.nonlinear as { models: { guess?: string }[] }).models;
    expect(models.some((m) => m.guess === 'base')).toBe(true);
  });

  it('an undocumented key fails, at the top and inside the reference', async () => {
    await expectExtraKeyRefused('check', outputs.oneD, (d) => d);
    await expectExtraKeyRefused('check', outputs.twoD, (d) => d.reference as Record<string, unknown>);
    await expectExtraKeyRefused('check', outputs.sink, (d) => (d.sources as Record<string, unknown>[])[0] as Record<string, unknown>);
  });

  it('several cases: the array with a bad case matches check-many, and a missing file key fails', async () => {
    const r = await cli('check', plate, bad, sink, '--reference', 'auto', '--json');
    expect(r.code).toBe(2);
    const many = JSON.parse(r.stdout) as Record<string, unknown>[];
    expect(many.map((d) => d.file)).toEqual([plate, bad, sink]);
    await expectValid('check-many', many);
    const withoutFile = structuredClone(many);
    delete (withoutFile[0] as Record<string, unknown>).file;
    expect((await schemaOf('check-many'))(withoutFile)).toBe(false);
    await expectExtraKeyRefused('check-many', many, (d) => (d as unknown as Record<string, unknown>[])[0] as Record<string, unknown>);
  });
});

describe('solve, map, optimize', () => {
  it('solve 1-D and 2-D (and a nonlinear 2-D with its Newton statistics) match the solve schema', async () => {
    await expectValid('solve', await jsonOf('solve', plate, '--json'));
    await expectValid('solve', await jsonOf('solve', annular, '--model', '2d', '--json'));
    const newton = (await jsonOf('solve', nonlinear, '--model', '2d', '--json')) as { newton: unknown };
    expect(newton.newton).not.toBeNull();
    await expectValid('solve', newton);
    await expectExtraKeyRefused('solve', await jsonOf('solve', plate, '--json'), (d) => d);
  });

  it('a heat sink: solve and map (a sink key swept) match the solve and map schemas', async () => {
    const solved = (await jsonOf('solve', sink, '--json')) as { model: string };
    expect(solved.model).toBe('fd-3d');
    await expectValid('solve', solved);
    await expectExtraKeyRefused('solve', solved, (d) => d.solver as Record<string, unknown>);
    const mapped = (await jsonOf(
      'map',
      sink,
      '--x',
      'array.count=3:4',
      '--y',
      'convection.h=20:60',
      '--steps',
      '2',
      '--json',
      '--out',
      join(tmp, 'sink-map'),
    )) as { reference: string };
    expect(mapped.reference).toBe('fd-3d');
    await expectValid('map', mapped);
  });

  it('map matches the map schema', async () => {
    const out = join(tmp, 'map');
    const doc = await jsonOf(
      'map',
      plate,
      '--x',
      'fin.thickness=1mm:3mm',
      '--y',
      'convection.h=20:100',
      '--steps',
      '3',
      '--reference',
      '1d',
      '--json',
      '--out',
      out,
    );
    await expectValid('map', doc);
    await expectExtraKeyRefused('map', doc, (d) => d.summary as Record<string, unknown>);
  });

  it('map with invalid points (a tip thicker than its base) matches too', async () => {
    const tapered = file(
      'tapered.yaml',
      'name: tapered\nfin: { profile: trapezoidal, length: 30 mm, baseThickness: 3 mm, tipThickness: 1 mm, width: 40 mm }\nmaterial: { k: 180 }\nconvection: { ambient: 20, h: 40 }\nbase: { temperature: 80 }\n',
    );
    const doc = (await jsonOf(
      'map',
      tapered,
      '--x',
      'fin.tipThickness=0.5mm:5mm',
      '--y',
      'convection.h=20:100',
      '--steps',
      '3',
      '--reference',
      '1d',
      '--json',
      '--out',
      join(tmp, 'map-errors'),
    )) as { summary: { errors: number } };
    expect(doc.summary.errors).toBeGreaterThan(0);
    await expectValid('map', doc);
  });

  it('optimize matches the optimize schema', async () => {
    const doc = await jsonOf('optimize', plate, '--vary', 'fin.thickness', '--reference', '1d', '--json');
    await expectValid('optimize', doc);
    await expectExtraKeyRefused('optimize', doc, (d) => d.reference as Record<string, unknown>);
  });
  it('optimize of a heat sink matches the optimize schema', async () => {
    const doc = await jsonOf(
      'optimize',
      sink,
      '--vary',
      'array.count',
      '--for',
      'required',
      '--temperature',
      '90degC',
      '--bounds',
      'array.count=2:12',
      '--json',
    );
    await expectValid('optimize', doc);
    await expectExtraKeyRefused('optimize', doc, (d) => d.reference as Record<string, unknown>);
  }, 120_000);
});

describe('schema command', () => {
  it('without --output prints the case schema, unchanged', async () => {
    const r = await cli('schema');
    expect((JSON.parse(r.stdout) as { title?: string; properties: object }).properties).toHaveProperty('fin');
  });

  it('an unknown output name is exit 2 naming the option and the accepted names', async () => {
    const r = await cli('schema', '--output', 'plot');
    expect(r.code).toBe(2);
    expect(r.stderr).toContain('--output: got "plot"; expected check, check-many, solve, map, optimize');
  });
});
