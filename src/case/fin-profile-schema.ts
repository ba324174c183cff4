/**
 * The `fin` key of a case: a discriminated union over the profiles (rectangular, pin, trapezoidal, triangular, the
 * two parabolas, conical pin, annular, tabulated), each with the dimensions it needs, lengths read into m (bare
 * numbers in the case's `units.length`). Part of the case schema (schema.ts).
 */
import { z } from 'zod';
import { finPosition, finSize, finSizeOrZero, mapping, pairs, quantity, word, type Range } from './fields.js';
import { nearWords } from './spelling.js';
import type { LengthUnit } from './units.js';

/** How bare lengths are read: SI, or the case's units.length. */
export type LengthOptions = { bareUnit?: LengthUnit };

export const profileNames = [
  'rectangular',
  'pin',
  'trapezoidal',
  'triangular',
  'parabolic-concave',
  'parabolic-convex',
  'conical-pin',
  'annular',
  'tabulated',
] as const;

export type ProfileName = (typeof profileNames)[number];

export function isProfileName(value: unknown): value is ProfileName {
  return typeof value === 'string' && (profileNames as readonly string[]).includes(value);
}

/**
 * The `fin` schema: a discriminated union over every profile, or over `only` that profile. A union parses an object
 * whose `profile` names one of its options with that option alone (zod's discriminator lookup), so for a case of that
 * profile the one-option union gives the same value and the same issues as the whole union, and costs an eighth of
 * its build (a check builds its schema at run time, once). Any other input (no profile, an unknown one, not a
 * mapping) needs the whole union for its message.
 */
export function finProfileSchema(lengthOptions: LengthOptions, only?: ProfileName) {
  const finLength = (description: string, whenMissing: string, range: Range = finSize) =>
    quantity('length', { ...lengthOptions, range, description: `${description}, m`, whenMissing });

  const edges = word(
    ['cooled', 'insulated'],
    'Straight fins: whether the two narrow side edges (thickness x length) lose heat. Default cooled; ' +
      'insulated gives the per-unit-width fin of the closed forms',
  );

  const needs = (fin: string, keys: string) => `${fin} needs ${keys}`;

  const rectangularNeeds = needs('a rectangular fin', 'length, thickness and width');
  const rectangular = () =>
    mapping(
      {
        profile: z.literal('rectangular'),
        length: finLength('Length from the base (x = 0) to the tip', rectangularNeeds),
        thickness: finLength('Thickness (uniform)', rectangularNeeds),
        width: finLength('Width along the base, across the direction of heat flow', rectangularNeeds),
        edges: edges.optional(),
      },
      'a rectangular fin',
      'Straight fin of uniform thickness',
    );

  const pinNeeds = needs('a pin fin', 'length and diameter');
  const pin = () =>
    mapping(
      {
        profile: z.literal('pin'),
        length: finLength('Length from the base (x = 0) to the tip', pinNeeds),
        diameter: finLength('Diameter (uniform)', pinNeeds),
      },
      'a pin fin',
      'Cylindrical spine',
    );

  const trapezoidalNeeds = needs('a trapezoidal fin', 'length, baseThickness, tipThickness and width');
  const trapezoidal = () =>
    mapping(
      {
        profile: z.literal('trapezoidal'),
        length: finLength('Length from the base (x = 0) to the tip', trapezoidalNeeds),
        baseThickness: finLength('Thickness at the base', trapezoidalNeeds),
        tipThickness: finLength('Thickness at the tip, at most baseThickness (0 makes a triangle)', trapezoidalNeeds, finSizeOrZero),
        width: finLength('Width along the base', trapezoidalNeeds),
        edges: edges.optional(),
      },
      'a trapezoidal fin',
      'Straight fin whose thickness tapers linearly from base to tip',
    );

  function taperedStraight(profile: 'triangular' | 'parabolic-concave' | 'parabolic-convex', shape: string) {
    const fin = `a ${profile} fin`;
    const finNeeds = needs(fin, 'length, baseThickness and width');
    return mapping(
      {
        profile: z.literal(profile),
        length: finLength('Length from the base (x = 0) to the tip', finNeeds),
        baseThickness: finLength('Thickness at the base', finNeeds),
        width: finLength('Width along the base', finNeeds),
        edges: edges.optional(),
      },
      fin,
      `Straight fin, ${shape}`,
    );
  }

  const conicalNeeds = needs('a conical-pin fin', 'length, baseDiameter and tipDiameter');
  const conicalPin = () =>
    mapping(
      {
        profile: z.literal('conical-pin'),
        length: finLength('Length from the base (x = 0) to the tip', conicalNeeds),
        baseDiameter: finLength('Diameter at the base', conicalNeeds),
        tipDiameter: finLength('Diameter at the tip, at most baseDiameter (0 makes a sharp cone)', conicalNeeds, finSizeOrZero),
      },
      'a conical-pin fin',
      'Spine whose diameter tapers linearly from base to tip',
    );

  const annularNeeds = needs('an annular fin', 'innerRadius, outerRadius and thickness');
  const annular = () =>
    mapping(
      {
        profile: z.literal('annular'),
        innerRadius: finLength('Radius of the base (the tube the fin sits on)', annularNeeds),
        outerRadius: finLength('Radius of the tip, greater than innerRadius', annularNeeds),
        thickness: finLength('Thickness (uniform)', annularNeeds),
      },
      'an annular fin',
      'Radial fin of uniform thickness on a tube; x = r - innerRadius',
    );

  const tabulatedNeeds = needs('a tabulated fin', 'shape and points (and width when the shape is straight)');
  const tabulated = () =>
    mapping(
      {
        profile: z.literal('tabulated'),
        shape: word(['straight', 'pin'], 'Whether the points give the thickness of a straight fin or the diameter of a pin'),
        points: pairs(
          quantity('length', { ...lengthOptions, range: finPosition, description: 'Position x from the base, m', whenMissing: tabulatedNeeds }),
          quantity('length', { ...lengthOptions, range: finSizeOrZero, description: 'Thickness (straight) or diameter (pin) at x, m' }),
          '[x, thickness or diameter]',
          2,
          'The profile, linear between points: x strictly increasing from 0 at the base; the size at the base > 0, ' + 'the size at the tip may be 0',
        ),
        width: finLength('Width along the base (straight shape only)', tabulatedNeeds).optional(),
        edges: edges.optional(),
      },
      'a tabulated fin',
      'Any measured or drawn profile',
    );

  const builders = {
    rectangular,
    pin,
    trapezoidal,
    triangular: () => taperedStraight('triangular', 'tapering linearly to a sharp tip'),
    'parabolic-concave': () => taperedStraight('parabolic-concave', 'thickness ~ (1 - x/L)^2'),
    'parabolic-convex': () => taperedStraight('parabolic-convex', 'thickness ~ (1 - x/L)^(1/2)'),
    'conical-pin': conicalPin,
    annular,
    tabulated,
  } satisfies Record<ProfileName, () => unknown>;
  type ProfileSchema = ReturnType<(typeof builders)[ProfileName]>;
  const build = (name: ProfileName): ProfileSchema => builders[name]();
  const options: [ProfileSchema, ...ProfileSchema[]] = only === undefined ? [build(profileNames[0]), ...profileNames.slice(1).map(build)] : [build(only)];
  const finSchema = z
    .discriminatedUnion('profile', options, {
      error: (issue) => {
        const given = issue.input;
        const profile = typeof given === 'object' && given !== null && 'profile' in given ? given.profile : given;
        const near = typeof profile === 'string' ? nearWords(profile, profileNames, 3) : [];
        const hint = near.length > 0 ? ` (did you mean ${near[0]}?)` : '';
        return `a fin profile: one of ${profileNames.join(', ')}${hint}`;
      },
    })
    .describe('The fin: its profile and the dimensions that profile needs');
  return finSchema;
}
