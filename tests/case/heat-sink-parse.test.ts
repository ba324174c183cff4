/**
 * Heat-sink cases (heat-sink.md): a valid sink of each layout, the defaults, and every error class, each naming the
 * key path, the value as given and what is accepted, as an InputError with exit code 2. All inputs are invented.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { heatSinkJsonSchema, loadAnyCase, loadCase, parseAnyCaseText, parseHeatSinkText, type HeatSinkCase } from '../../src/case/index.js';

/** A valid plate-fin sink; each test breaks one line of it. */
const valid = `name: Invented drive sink
fin:
  profile: rectangular
  length: 35 mm
  thickness: 1.6 mm
material: aluminium-6063
array:
  count: 12
  pitch: 8 mm
plate:
  width: 96 mm
  length: 80 mm
  thickness: 6 mm
  material: copper-c110
sources:
  - name: module A
    power: 60 W
    centre: [30 mm, 40 mm]
    size: [25 mm, 30 mm]
    contactResistance: 2e-5 m^2*K/W
    limit: 125 degC
  - power: 20 W
    centre: [70 mm, 40 mm]
    size: [20 mm, 20 mm]
convection:
  ambient: 35 degC
  h: 45 W/(m^2*K)
  plate: 30 W/(m^2*K)
  underside: adiabatic
  tip: convective
`;

function sink(text: string): HeatSinkCase {
  const parsed = parseAnyCaseText(text, 'sink.yaml');
  if (parsed.kind !== 'heat-sink') throw new Error('expected a heat sink');
  return parsed.case;
}

function failure(text: string): InputError {
  try {
    parseAnyCaseText(text, 'sink.yaml');
  } catch (err) {
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).exitCode).toBe(2);
    return err as InputError;
  }
  throw new Error('expected an InputError');
}

function replace(from: string, to: string): string {
  expect(valid).toContain(from);
  return valid.replace(from, to);
}

describe('a valid heat sink', () => {
  it('reads the plate-fin sink into SI, with the fin running the plate length', () => {
    const c = sink(valid);
    expect(c.kind).toBe('heat-sink');
    expect(c.fin?.profile).toEqual({ kind: 'rectangular', length: 0.035, thickness: 0.0016, width: 0.08 });
    expect(c.fin?.material.name).toBe('aluminium-6063');
    expect(c.plate.material.name).toBe('copper-c110');
    expect(c.array).toEqual({ kind: 'plates', count: 12, pitch: 0.008 });
    expect(c.sources.map((s) => s.name)).toEqual(['module A', 'source 1']);
    expect(c.sources[0]).toMatchObject({ power: 60, centre: [0.03, 0.04], size: [0.025, 0.03], contactResistance: 2e-5, limit_degC: 125 });
    expect(c.sources[1]).toMatchObject({ contactResistance: 0, limit_degC: null });
    expect(c.convection).toMatchObject({
      ambient_degC: 35,
      h: { kind: 'uniform', h: 45 },
      plate: 30,
      underside: null,
      tip: { kind: 'convective', h: null },
    });
    expect(c.warnings).toEqual([]);
  });

  it('reads the same sink written as JSON', () => {
    const json = JSON.stringify({
      name: 'Invented drive sink',
      fin: { profile: 'rectangular', length: '35 mm', thickness: '1.6 mm' },
      material: 'aluminium-6063',
      array: { count: 12, pitch: '8 mm' },
      plate: { width: '96 mm', length: '80 mm', thickness: '6 mm', material: 'copper-c110' },
      sources: [
        { name: 'module A', power: '60 W', centre: ['30 mm', '40 mm'], size: ['25 mm', '30 mm'], contactResistance: '2e-5 m^2*K/W', limit: '125 degC' },
        { power: 20, centre: [0.07, 0.04], size: [0.02, 0.02] },
      ],
      convection: { ambient: 35, h: 45, plate: 30, underside: 'adiabatic', tip: 'convective' },
    });
    const parsed = parseAnyCaseText(json, 'sink.json');
    expect(parsed.kind).toBe('heat-sink');
    expect(parsed.case).toEqual(sink(valid));
  });

  it('fills the defaults: pitch = width / count, plate material = the fins\u2019, plate h = h at the root, underside adiabatic', () => {
    const c = sink(
      valid
        .replace('  pitch: 8 mm\n', '')
        .replace('  material: copper-c110\n', '')
        .replace('  plate: 30 W/(m^2*K)\n', '')
        .replace('  underside: adiabatic\n', '')
        .replace('  h: 45 W/(m^2*K)', '  h: { base: 50, tip: 20 }'),
    );
    expect(c.array).toEqual({ kind: 'plates', count: 12, pitch: 0.008 });
    expect(c.plate.material.name).toBe('aluminium-6063');
    expect(c.convection.plate).toBe(50);
    expect(c.convection.underside).toBeNull();
  });

  it('reads a bare plate (array.count: 0) without a fin, its material from plate.material and its top h from convection.plate', () => {
    const text = `name: bare plate
array: { count: 0 }
plate: { width: 40 mm, length: 40 mm, thickness: 3 mm, material: { k: 170 } }
sources:
  - { power: 10 W, centre: [20 mm, 20 mm], size: [8 mm, 8 mm] }
convection: { ambient: 20 degC, plate: 300, underside: 5 W/(m^2*K) }
`;
    const c = sink(text);
    expect(c.fin).toBeNull();
    expect(c.array).toEqual({ kind: 'plates', count: 0, pitch: 0.04 });
    expect(c.plate.material.k).toEqual({ kind: 'constant', k: 170 });
    expect(c.convection.plate).toBe(300);
    expect(c.convection.underside).toBe(5);
  });

  it('reads a staggered pin array with a conical pin, and units: { length: mm }', () => {
    const text = `name: pins
units: { length: mm }
fin: { profile: conical-pin, length: 30, baseDiameter: 4, tipDiameter: 2 }
material: aluminium-6061
array:
  pins: { rows: 8, columns: 9, pitch: [10, 9], pattern: staggered }
plate: { width: 96, length: 80, thickness: 5 }
sources:
  - { power: 40 W, centre: [48, 40], size: [30, 30] }
convection: { ambient: 25 degC, h: 60 W/(m^2*K), tip: adiabatic }
`;
    const c = sink(text);
    expect(c.array).toMatchObject({ kind: 'pins', rows: 8, columns: 9, pattern: 'staggered' });
    // 9 mm read through mathjs is 0.009000000000000001: within a few ulps (1e-15 relative).
    expect(c.array.kind === 'pins' && c.array.pitch[1]).toBeCloseTo(0.009, 15);
    expect(c.fin?.profile).toEqual({ kind: 'conical-pin', length: 0.03, baseDiameter: 0.004, tipDiameter: 0.002 });
    expect(c.sources[0]?.centre).toEqual([0.048, 0.04]);
    expect(c.convection.tip).toEqual({ kind: 'adiabatic' });
  });

  it('loads a file of either kind: a heat sink or a single fin', () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-sink-'));
    const sinkFile = join(dir, 'sink.yaml');
    writeFileSync(sinkFile, valid);
    expect(loadAnyCase(sinkFile).kind).toBe('heat-sink');
    const finFile = join(dir, 'fin.yaml');
    writeFileSync(
      finFile,
      'fin: { profile: pin, length: 40 mm, diameter: 3 mm }\nmaterial: brass\nconvection: { ambient: 20, h: 30 }\nbase: { temperature: 80 degC }\n',
    );
    const fin = loadAnyCase(finFile);
    expect(fin.kind).toBe('fin');
    expect(fin.kind === 'fin' && fin.case.name).toBe('fin');
  });
});

describe('single-fin readers and heat-sink readers refuse the other kind, naming what they accept', () => {
  it('loadCase (single-fin commands) given a heat sink: array, exit 2', () => {
    const dir = mkdtempSync(join(tmpdir(), 'fincheck-sink-'));
    const file = join(dir, 'sink.yaml');
    writeFileSync(file, valid);
    let error: unknown;
    try {
      loadCase(file);
    } catch (err) {
      error = err;
    }
    expect(error).toBeInstanceOf(InputError);
    const issues = (error as InputError).issues;
    expect(issues).toHaveLength(1);
    expect(issues[0]).toMatchObject({ path: 'array', line: 8 });
    expect(issues[0]?.accepted).toMatch(
      /a single-fin case \(keys fin, material, convection and base\): a case with an array key is a heat sink, and only single-fin cases are taken here/,
    );
  });

  it("reads the format's own example as written (heat-sink.md), plate.material: copper included", () => {
    // The contract's example, comments and all; `copper` is pure copper, k = 401 W/(m K) (Incropera, DeWitt,
    // Bergman & Lavine 2007, Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1, 300 K).
    const example = `name: Drive inverter, six-pack module sink
fin:                          # one fin of the array
  profile: rectangular        # straight profiles: plate fins running the whole plate length (no \`width\` key)
  length: 35 mm               # height above the plate
  thickness: 1.6 mm
material: aluminium-6063      # the fins' material, and the plate's unless plate.material is given
array:
  count: 12                   # plate fins across the plate width, centre-to-centre \`pitch\`
  pitch: 8 mm                 # optional: default plate.width / count; the array is centred on the plate
plate:
  width: 96 mm                # x, across the plate fins
  length: 80 mm               # y, along the plate fins (the flow direction, if any)
  thickness: 6 mm
  material: copper            # optional; default: the fins' material
sources:                      # on the underside (z = 0); the fins stand on the top (z = thickness)
  - name: module A
    power: 60 W
    centre: [30 mm, 40 mm]    # x, y of the source's centre
    size: [25 mm, 30 mm]      # extent in x and y
    contactResistance: 2e-5 m^2*K/W   # optional, per unit of source area (interface material)
convection:
  ambient: 35 degC
  h: 45 W/(m^2*K)             # on the fins
  plate: 30 W/(m^2*K)         # on the exposed top of the plate between fins; default: h
  underside: adiabatic        # or an h on the underside outside the sources
  tip: convective
`;
    const c = sink(example);
    expect(c.plate.material.k).toEqual({ kind: 'constant', k: 401 });
    expect(c.plate.material.source).toMatch(/Incropera, DeWitt, Bergman & Lavine 2007.*Table A\.1, 300 K/);
    expect(c.fin?.material.name).toBe('aluminium-6063');
    expect(c.sources).toHaveLength(1);
  });

  it('parseHeatSinkText given a single fin: array', () => {
    const text =
      'fin: { profile: pin, length: 40 mm, diameter: 3 mm }\nmaterial: brass\nconvection: { ambient: 20, h: 30 }\nbase: { temperature: 80 degC }\n';
    let error: unknown;
    try {
      parseHeatSinkText(text, 'fin.yaml');
    } catch (err) {
      error = err;
    }
    expect(error).toBeInstanceOf(InputError);
    expect((error as InputError).issues[0]).toMatchObject({ path: 'array', value: 'nothing (the key is missing)' });
    expect((error as InputError).issues[0]?.accepted).toMatch(/a heat-sink case/);
  });
});

/** [what, the broken text, key path, value as shown, accepted (pattern)]. */
const errors: [string, string, string, string | RegExp, RegExp][] = [
  [
    'fins wider than the plate',
    replace('count: 12', 'count: 13'),
    'array.pitch',
    '8 mm',
    /count x pitch \(13 x 8 mm = 104 mm\) at most plate\.width \(96 mm\)/,
  ],
  [
    'fins that touch (default pitch)',
    replace('  pitch: 8 mm\n', '').replace('count: 12', 'count: 60'),
    'array.count',
    '60',
    /pitch \(1\.6 mm\) greater than the fin's root thickness/,
  ],
  ['a non-integer count', replace('count: 12', 'count: 2.5'), 'array.count', '2.5', /a whole number/],
  [
    'both count and pins',
    replace('count: 12', 'count: 12\n  pins: { rows: 2, columns: 2, pitch: [9 mm, 9 mm] }'),
    'array.pins',
    '{"rows":2,"columns":2,"pitch":["9 mm","9 mm"]}',
    /either count .* or pins/,
  ],
  ['neither count nor pins', replace('  count: 12\n', ''), 'array.count', 'nothing (the key is missing)', /plate fins >= 0/],
  [
    'a pitch beside pins',
    replace('count: 12', 'pins: { rows: 2, columns: 2, pitch: [9 mm, 9 mm] }')
      .replace('profile: rectangular', 'profile: pin')
      .replace('thickness: 1.6 mm', 'diameter: 3 mm'),
    'array.pitch',
    '8 mm',
    /pins\.pitch/,
  ],
  [
    'a source off the plate',
    replace('centre: [30 mm, 40 mm]', 'centre: [90 mm, 40 mm]'),
    'sources[0].centre',
    '["90 mm","40 mm"]',
    /lying on the plate: its footprint x 77\.5 mm to 102\.5 mm/,
  ],
  [
    'overlapping sources',
    replace('centre: [70 mm, 40 mm]', 'centre: [45 mm, 40 mm]'),
    'sources[1].centre',
    '["45 mm","40 mm"]',
    /sources\[1\] overlaps sources\[0\] by 7\.5 mm x 20 mm/,
  ],
  ['a power in metres', replace('power: 60 W', 'power: 60 m'), 'sources[0].power', '60 m', /a power >= 0 .*"m" is a length, not a power/],
  ['a negative power', replace('power: 60 W', 'power: -60 W'), 'sources[0].power', '-60 W', /a power >= 0/],
  [
    'no power at all',
    replace('power: 60 W', 'power: 0 W').replace('power: 20 W', 'power: 0'),
    'sources',
    /^\[\{"name":"module A","power":"0 W",.*characters in all\)$/,
    /at least one source > 0 W/,
  ],
  [
    'no sources',
    replace(valid.slice(valid.indexOf('sources:'), valid.indexOf('convection:')), 'sources: []\n'),
    'sources',
    '[]',
    /a list of 1 to 100 sources/,
  ],
  ['a source without size', replace('    size: [20 mm, 20 mm]\n', ''), 'sources[1].size', 'nothing (the key is missing)', /a pair \[x extent, y extent\]/],
  [
    'a limit below ambient',
    replace('limit: 125 degC', 'limit: 30 degC'),
    'sources[0].limit',
    '30 degC',
    /a temperature above convection\.ambient \(35 degC\)/,
  ],
  ['an annular fin', replace('profile: rectangular', 'profile: annular'), 'fin.profile', 'annular', /annular fins stand on tubes, not on a plate/],
  [
    'a pin profile with plate fins',
    replace('profile: rectangular', 'profile: pin').replace('thickness: 1.6 mm', 'diameter: 3 mm'),
    'fin.profile',
    'pin',
    /a plate-fin profile for array\.count/,
  ],
  [
    'a straight profile with pins',
    replace('count: 12', 'pins: { rows: 2, columns: 2, pitch: [9 mm, 9 mm] }').replace('  pitch: 8 mm\n', ''),
    'fin.profile',
    'rectangular',
    /a pin profile for array\.pins/,
  ],
  [
    'a width on a plate fin',
    replace('thickness: 1.6 mm', 'thickness: 1.6 mm\n  width: 80 mm'),
    'fin.width',
    '80 mm',
    /one of the keys of a rectangular fin of an array: profile, length, thickness/,
  ],
  [
    'a fin missing with fins on the plate',
    replace(valid.slice(valid.indexOf('fin:'), valid.indexOf('material:')), ''),
    'fin',
    'nothing (the key is missing)',
    /only array\.count: 0 needs no fin/,
  ],
  [
    'a fin tip thicker than its root',
    replace('profile: rectangular', 'profile: trapezoidal').replace('thickness: 1.6 mm', 'baseThickness: 1.6 mm\n  tipThickness: 2 mm'),
    'fin.tipThickness',
    '2 mm',
    /from 0 to baseThickness \(1\.6 mm\)/,
  ],
  [
    'a tabulated fin out of order',
    replace(
      'profile: rectangular\n  length: 35 mm\n  thickness: 1.6 mm',
      'profile: tabulated\n  shape: straight\n  points: [[0, 2 mm], [20 mm, 1 mm], [10 mm, 1 mm]]',
    ),
    'fin.points[2][0]',
    '10 mm',
    /strictly increasing/,
  ],
  ['no material for the fins', replace('material: aluminium-6063\n', ''), 'material', 'nothing (the key is missing)', /the fins\u2019 material/],
  ['no h on the fins', replace('  h: 45 W/(m^2*K)\n', ''), 'convection.h', 'nothing (the key is missing)', /the h on the fins/],
  [
    'h points above the fin',
    replace('h: 45 W/(m^2*K)', 'h: { points: [[0, 50], [40 mm, 20]] }'),
    'convection.h.points[1][0]',
    '40 mm',
    /from 0 to the fin's height \(35 mm\)/,
  ],
  [
    'a misspelt underside',
    replace('underside: adiabatic', 'underside: adiabatc'),
    'convection.underside',
    'adiabatc',
    /adiabatic or a heat-transfer coefficient >= 0 .*\(did you mean adiabatic\?\)/,
  ],
  ['a negative plate h', replace('plate: 30 W/(m^2*K)', 'plate: -30 W/(m^2*K)'), 'convection.plate', '-30 W/(m^2*K)', /a heat-transfer coefficient >= 0/],
  [
    'a tip held at a temperature',
    replace('tip: convective', 'tip: { temperature: 40 degC }'),
    'convection.tip',
    '{"temperature":"40 degC"}',
    /the tips of a heat sink are cooled/,
  ],
  [
    'an infinite tip on a tapered fin',
    replace('profile: rectangular', 'profile: triangular')
      .replace('thickness: 1.6 mm', 'baseThickness: 1.6 mm')
      .replace('tip: convective', 'tip: infinite'),
    'convection.tip',
    'infinite',
    /needs a uniform profile \(rectangular or pin\), not triangular/,
  ],
  ['a misspelt plate key', replace('thickness: 6 mm', 'thikness: 6 mm'), 'plate.thikness', '6 mm', /did you mean thickness\?/],
  ['a zero plate thickness', replace('thickness: 6 mm', 'thickness: 0 mm'), 'plate.thickness', '0 mm', /a length > 0/],
  ['an unknown plate material', replace('material: copper-c110', 'material: copper-wire'), 'plate.material', 'copper-wire', /a built-in material/],
];

describe.each(errors)('%s', (_what, text, path, value, accepted) => {
  it(`names ${path}, the value given and what is accepted`, () => {
    const err = failure(text);
    const issue = err.issues.find((i) => i.path === path);
    expect(issue, JSON.stringify(err.issues)).toBeDefined();
    if (typeof value === 'string') expect(issue?.value).toBe(value);
    else expect(issue?.value).toMatch(value);
    expect(issue?.accepted).toMatch(accepted);
  });
});

describe('pins that do not fit', () => {
  const pins = (layout: string) =>
    replace('count: 12', layout)
      .replace('  pitch: 8 mm\n', '')
      .replace('profile: rectangular', 'profile: pin')
      .replace('thickness: 1.6 mm', 'diameter: 3 mm');
  it.each([
    ['too many columns', 'pins: { rows: 8, columns: 11, pitch: [9 mm, 9 mm] }', 'array.pins.columns', /= 99 mm at most plate\.width \(96 mm\)/],
    [
      'staggered: the half pitch counts',
      'pins: { rows: 8, columns: 10, pitch: [9.5 mm, 9 mm], pattern: staggered }',
      'array.pins.columns',
      /staggered.*= 99\.75 mm/,
    ],
    ['too many rows', 'pins: { rows: 9, columns: 10, pitch: [9 mm, 9 mm] }', 'array.pins.rows', /= 81 mm at most plate\.length \(80 mm\)/],
    [
      'pins that touch',
      'pins: { rows: 8, columns: 10, pitch: [9 mm, 2.5 mm] }',
      'array.pins.pitch',
      /nearest pin spacing \(2\.5 mm\) exceeds the pin's root diameter \(3 mm\)/,
    ],
  ])('%s', (_what, layout, path, accepted) => {
    const issue = failure(pins(layout)).issues.find((i) => i.path === path);
    expect(issue).toBeDefined();
    expect(issue?.accepted).toMatch(accepted);
  });

  it('the same pins fit when the numbers allow (control)', () => {
    expect(sink(pins('pins: { rows: 8, columns: 10, pitch: [9 mm, 9 mm] }')).array.kind).toBe('pins');
  });
});

describe('a bare plate', () => {
  const bare = (convection: string, material = 'plate: { width: 40 mm, length: 40 mm, thickness: 3 mm }') =>
    `array: { count: 0 }\n${material}\nsources:\n  - { power: 10 W, centre: [20 mm, 20 mm], size: [8 mm, 8 mm] }\nconvection: ${convection}\n`;

  it('needs a material (material or plate.material)', () => {
    const issue = failure(bare('{ ambient: 20, plate: 300 }')).issues[0];
    expect(issue).toMatchObject({ path: 'material' });
    expect(issue?.accepted).toMatch(/material or plate\.material/);
  });

  it('needs an h on its top (convection.plate or convection.h)', () => {
    const issue = failure(bare('{ ambient: 20 }', 'material: silicon\nplate: { width: 40 mm, length: 40 mm, thickness: 3 mm }')).issues[0];
    expect(issue).toMatchObject({ path: 'convection.plate' });
  });

  it('needs something that cools', () => {
    const issue = failure(bare('{ ambient: 20, plate: 0 }', 'material: silicon\nplate: { width: 40 mm, length: 40 mm, thickness: 3 mm }')).issues[0];
    expect(issue).toMatchObject({ path: 'convection.plate' });
    expect(issue?.accepted).toMatch(/h > 0 somewhere/);
  });

  it('takes convection.h as its top h when convection.plate is absent', () => {
    expect(sink(bare('{ ambient: 20, h: 250 }', 'material: silicon\nplate: { width: 40 mm, length: 40 mm, thickness: 3 mm }')).convection.plate).toBe(250);
  });
});

describe('the heat-sink JSON schema', () => {
  it('describes every top-level key of the contract', () => {
    const schema = heatSinkJsonSchema() as { properties: Record<string, unknown>; required: string[] };
    // display and extends: issue 13; uncertainty: design-questions.md (issue 12).
    expect(Object.keys(schema.properties).sort()).toEqual([
      'array',
      'convection',
      'display',
      'extends',
      'fin',
      'material',
      'name',
      'plate',
      'sources',
      'uncertainty',
      'units',
    ]);
    expect(schema.required.sort()).toEqual(['array', 'convection', 'plate', 'sources']);
  });
});
