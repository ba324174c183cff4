/**
 * Valid cases of every profile, in YAML and in JSON, read into the normalised Case (SI, degC).
 * Expected values are the given numbers converted by the unit definitions (mm = 1e-3 m, in = 0.0254 m exactly,
 * T(degC) = (T(degF) - 32)/1.8: NIST SP 811 (2008), Appendix B). The inputs are invented.
 */
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../src/case/parse.js';
import type { Profile } from '../../src/case/types.js';

/** The parts every case shares; the fin varies. */
const common = {
  material: 'aluminium-6063',
  convection: { ambient: '25 degC', h: '40 W/(m^2*K)', tip: 'adiabatic' },
  base: { temperature: '85 degC' },
};

interface ProfileCase {
  fin: Record<string, unknown>;
  expected: Profile;
}

const profiles: Record<string, ProfileCase> = {
  rectangular: {
    fin: { profile: 'rectangular', length: '40 mm', thickness: '2 mm', width: '80 mm' },
    expected: { kind: 'rectangular', length: 0.04, thickness: 0.002, width: 0.08 },
  },
  pin: {
    fin: { profile: 'pin', length: '1 in', diameter: '0.25 in' },
    expected: { kind: 'pin', length: 0.0254, diameter: 0.00635 },
  },
  trapezoidal: {
    fin: { profile: 'trapezoidal', length: '30 mm', baseThickness: '3 mm', tipThickness: '1 mm', width: 0.05 },
    expected: { kind: 'trapezoidal', length: 0.03, baseThickness: 0.003, tipThickness: 0.001, width: 0.05 },
  },
  triangular: {
    fin: { profile: 'triangular', length: '30 mm', baseThickness: '3 mm', width: '50 mm' },
    expected: { kind: 'triangular', length: 0.03, baseThickness: 0.003, width: 0.05 },
  },
  'parabolic-concave': {
    fin: { profile: 'parabolic-concave', length: '30 mm', baseThickness: '3 mm', width: '50 mm' },
    expected: { kind: 'parabolic-concave', length: 0.03, baseThickness: 0.003, width: 0.05 },
  },
  'parabolic-convex': {
    fin: { profile: 'parabolic-convex', length: '30 mm', baseThickness: '3 mm', width: '50 mm' },
    expected: { kind: 'parabolic-convex', length: 0.03, baseThickness: 0.003, width: 0.05 },
  },
  'conical-pin': {
    fin: { profile: 'conical-pin', length: '50 mm', baseDiameter: '6 mm', tipDiameter: 0 },
    expected: { kind: 'conical-pin', length: 0.05, baseDiameter: 0.006, tipDiameter: 0 },
  },
  annular: {
    fin: { profile: 'annular', innerRadius: '12.5 mm', outerRadius: '25 mm', thickness: '1 mm' },
    expected: { kind: 'annular', innerRadius: 0.0125, outerRadius: 0.025, thickness: 0.001 },
  },
  'tabulated straight': {
    fin: {
      profile: 'tabulated',
      shape: 'straight',
      width: '50 mm',
      points: [
        ['0 mm', '3 mm'],
        ['10 mm', '2 mm'],
        ['30 mm', '0.5 mm'],
      ],
    },
    expected: {
      kind: 'tabulated',
      shape: 'straight',
      width: 0.05,
      x: Float64Array.from([0, 0.01, 0.03]),
      size: Float64Array.from([0.003, 0.002, 0.0005]),
    },
  },
  'tabulated pin': {
    fin: {
      profile: 'tabulated',
      shape: 'pin',
      points: [
        [0, '5 mm'],
        ['20 mm', '4 mm'],
        ['40 mm', 0],
      ],
    },
    expected: {
      kind: 'tabulated',
      shape: 'pin',
      x: Float64Array.from([0, 0.02, 0.04]),
      size: Float64Array.from([0.005, 0.004, 0]),
    },
  },
};

/** A YAML rendering of a small object tree: block mappings, flow sequences, plain scalars. */
function toYaml(value: unknown, indent = ''): string {
  if (Array.isArray(value)) return `[${value.map((v) => toYaml(v)).join(', ')}]`;
  if (typeof value === 'object' && value !== null) {
    return Object.entries(value)
      .map(([k, v]) =>
        typeof v === 'object' && v !== null && !Array.isArray(v) ? `\n${indent}${k}:${toYaml(v, indent + '  ')}` : `\n${indent}${k}: ${toYaml(v)}`,
      )
      .join('');
  }
  return String(value);
}

/** Compares profiles field by field; floats from unit conversion are compared to 1e-15 relative (one rounding). */
function expectProfile(actual: Profile, expected: Profile): void {
  expect(actual.kind).toBe(expected.kind);
  for (const [key, want] of Object.entries(expected)) {
    const got = (actual as unknown as Record<string, unknown>)[key];
    if (typeof want === 'number') expect(Math.abs((got as number) - want)).toBeLessThanOrEqual(1e-15 * Math.abs(want));
    else if (want instanceof Float64Array) {
      expect(got).toBeInstanceOf(Float64Array);
      const array = got as Float64Array;
      expect(array.length).toBe(want.length);
      want.forEach((w, i) => expect(Math.abs((array[i] ?? NaN) - w)).toBeLessThanOrEqual(1e-15 * Math.abs(w)));
    } else expect(got).toEqual(want);
  }
  expect(Object.keys(actual).sort()).toEqual(Object.keys(expected).sort());
}

describe.each(Object.entries(profiles))('profile %s', (_name, { fin, expected }) => {
  const raw = { name: 'test fin', fin, ...common };

  it('parses from YAML', () => {
    const parsed = parseCaseText(toYaml(raw).trimStart() + '\n', 'fin.yaml');
    expectProfile(parsed.fin.profile, expected);
    expect(parsed.name).toBe('test fin');
  });

  it('parses from JSON', () => {
    const parsed = parseCaseText(JSON.stringify(raw, null, 2), 'fin.json');
    expectProfile(parsed.fin.profile, expected);
  });
});

describe('the example case of the case-format contract', () => {
  const text = `name: Traction-inverter sink, outer fin      # free text, shown in every output
fin:
  profile: rectangular
  length: 40 mm
  thickness: 2 mm
  width: 80 mm
material: aluminium-6063
convection:
  ambient: 25 degC
  h: 40 W/(m^2*K)
  tip: convective
base:
  temperature: 85 degC
  contactResistance: 1.5e-4 m^2*K/W
`;

  it('reads every key', () => {
    const c = parseCaseText(text, 'sink.yaml');
    expect(c.name).toBe('Traction-inverter sink, outer fin');
    expect(c.fin.edges).toBe('cooled');
    expect(c.material.name).toBe('aluminium-6063');
    // Issue 9: a recalled alloy value is shown as typical, to be confirmed (its handbook is the developers' note).
    expect(c.material.source).toMatch(/typical of aluminium 6063-T5.*confirm with the supplier's data sheet/);
    expect(c.convection).toEqual({
      ambient_degC: 25,
      h: { kind: 'uniform', h: 40 },
      tip: { kind: 'convective', h: null },
      emissivity: 0,
      surroundings_degC: 25,
    });
    expect(c.base).toEqual({ T_degC: 85, contactResistance: 1.5e-4 });
  });

  it('names a case without `name` after its file', () => {
    const c = parseCaseText(text.replace(/^name:.*\n/, ''), 'cases/outer-fin.yaml');
    expect(c.name).toBe('outer-fin');
  });
});

describe('US customary units and temperatures', () => {
  it('converts absolute temperatures as temperatures and the degF inside h as a difference', () => {
    const c = parseCaseText(
      `fin: { profile: pin, length: 2 in, diameter: 0.25 in }
material: { k: 120 BTU/(h*ft*degF) }
convection:
  ambient: 77 degF
  h: 7 BTU/(h*ft^2*degF)
  surroundings: 293.15 K
  emissivity: 0.8
base: { temperature: 185 °F }
`,
      'us.yaml',
    );
    // (77 - 32)/1.8 = 25 and (185 - 32)/1.8 = 85 (definition; NIST SP 811 B.9). 1e-12 K covers round-off.
    expect(c.convection.ambient_degC).toBeCloseTo(25, 12);
    expect(c.base.T_degC).toBeCloseTo(85, 12);
    expect(c.convection.surroundings_degC).toBeCloseTo(20, 12);
    // NIST SP 811 (2008) B.8 factors (from memory): 5.678263 and 1.730735, quoted to 7 figures -> 1e-6 relative.
    const h = c.convection.h;
    expect(h.kind).toBe('uniform');
    if (h.kind === 'uniform') expect(Math.abs(h.h / (7 * 5.678263) - 1)).toBeLessThan(1e-6);
    const k = c.material.k;
    expect(k.kind).toBe('constant');
    if (k.kind === 'constant') expect(Math.abs(k.k / (120 * 1.730735) - 1)).toBeLessThan(1e-6);
    expect(c.material).toMatchObject({ name: 'custom', source: 'given in the case file' });
    expect(c.convection.emissivity).toBe(0.8);
  });
});

describe('h distributions, tips, materials and edges', () => {
  const base = (convection: string, extra = '') => `fin: { profile: rectangular, length: 40 mm, thickness: 2 mm, width: 80 mm${extra} }
material: aluminium-pure
convection: ${convection}
base: { temperature: 85 }
`;

  it('reads a linear h, a tip with its own h and insulated edges', () => {
    const c = parseCaseText(base('{ ambient: 25, h: { base: 60, tip: 25 }, tip: { convective: 55 W/(m^2*K) } }', ', edges: insulated'), 'a.yaml');
    expect(c.convection.h).toEqual({ kind: 'linear', base: 60, tip: 25 });
    expect(c.convection.tip).toEqual({ kind: 'convective', h: 55 });
    expect(c.fin.edges).toBe('insulated');
  });

  it('reads an h table with lengths in mm', () => {
    const c = parseCaseText(base('{ ambient: 25, h: { points: [[0 mm, 60], [10 mm, 40], [40 mm, 25]] }, tip: adiabatic }'), 'a.yaml');
    const h = c.convection.h;
    expect(h.kind).toBe('points');
    if (h.kind === 'points') {
      expect(Array.from(h.x)).toEqual([0, 0.01, 0.04]);
      expect(Array.from(h.h)).toEqual([60, 40, 25]);
      expect(h.x).toBeInstanceOf(Float64Array);
    }
    expect(c.convection.tip).toEqual({ kind: 'adiabatic' });
  });

  it('reads a power law, a fixed tip temperature and an infinite tip', () => {
    const power = parseCaseText(base('{ ambient: 25, h: { law: power, base: 12, exponent: 1/4 }, tip: { temperature: 86 degF } }'), 'a.yaml');
    expect(power.convection.h).toEqual({ kind: 'power', base: 12, exponent: 0.25 });
    expect(power.convection.tip.kind).toBe('temperature');
    if (power.convection.tip.kind === 'temperature') expect(power.convection.tip.T_degC).toBeCloseTo(30, 12);
    const infinite = parseCaseText(base('{ ambient: 25, h: 10, tip: infinite }'), 'a.yaml');
    expect(infinite.convection.tip).toEqual({ kind: 'infinite' });
  });

  it('reads a conductivity table over temperature', () => {
    const c = parseCaseText(
      base('{ ambient: 25, h: 10 }').replace('material: aluminium-pure', 'material: { k: { points: [[20 degC, 205], [302 degF, 198 W/(m*K)]] } }'),
      'a.yaml',
    );
    const k = c.material.k;
    expect(k.kind).toBe('table');
    if (k.kind === 'table') {
      expect(k.T_degC[0]).toBe(20);
      expect(k.T_degC[1]).toBeCloseTo(150, 12); // (302 - 32)/1.8 = 150
      expect(Array.from(k.k)).toEqual([205, 198]);
    }
  });

  it('allows a fin colder than ambient (a fin that gathers heat) and a contact resistance of 0', () => {
    const c = parseCaseText(base('{ ambient: 25, h: 10 }').replace('temperature: 85', 'temperature: -10, contactResistance: 0'), 'a.yaml');
    expect(c.base.T_degC).toBe(-10);
    expect(c.base.contactResistance).toBe(0);
  });

  it('allows a trapezoid whose tip equals its base (a rectangle)', () => {
    const c = parseCaseText(
      base('{ ambient: 25, h: 10 }').replace(
        '{ profile: rectangular, length: 40 mm, thickness: 2 mm, width: 80 mm }',
        '{ profile: trapezoidal, length: 40 mm, baseThickness: 2 mm, tipThickness: 2 mm, width: 80 mm }',
      ),
      'a.yaml',
    );
    expect(c.fin.profile.kind).toBe('trapezoidal');
  });

  it('allows h = 0 everywhere when the faces radiate', () => {
    const c = parseCaseText(base('{ ambient: 25, h: 0, emissivity: 0.9, surroundings: -270 degC }'), 'space.yaml');
    expect(c.convection.h).toEqual({ kind: 'uniform', h: 0 });
    expect(c.convection.surroundings_degC).toBe(-270);
  });
});
