/**
 * The case file's schema (format 1, /work/shared/design/case-format.md): every key, its unit and meaning.
 *
 * Parsing with it checks the shape (strict mappings: unknown keys are errors), reads every quantity into SI
 * (temperatures degC) and checks each value's own range (sizes > 0, h >= 0, emissivity 0..1). Checks that
 * relate several keys (tip thinner than base, points in order, base hotter or colder than ambient) are in
 * checks.ts. `caseJsonSchema()` is what `fincheck schema` prints.
 */
import { z } from 'zod';
import {
  coefficientRange,
  conductivityRange,
  contactResistanceRange,
  exponentRange,
  finPosition,
  finSize,
  finSizeOrZero,
  fraction,
  mapping,
  pairs,
  positiveCoefficient,
  quantity,
  temperatureRange,
  word,
  type Range,
} from './fields.js';
import { nearWords } from './spelling.js';
import { findMaterial, materialNames, similarMaterialNames } from './materials.js';
import { lengthUnits, type LengthUnit } from './units.js';
import { displayKinds, displayUnitChoices, type DisplayKind } from './display-units.js';

const displayDescriptions: Record<DisplayKind, string> = {
  length: 'Lengths shown in',
  temperature: 'Temperatures shown in (differences follow: K, or degF for degF)',
  heat: 'Heat rates shown in',
  h: 'Heat-transfer coefficients shown in',
  k: 'Thermal conductivities shown in',
  flux: 'Heat fluxes shown in',
  resistance: 'Thermal resistances (a heat sink) shown in',
};

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

/**
 * The case schema whose bare lengths are in `lengthUnit` (`units: { length: mm }`); every other key is the same.
 * Built once per unit (see caseSchemaFor).
 */
function buildCaseSchema(lengthUnit: LengthUnit) {
  const lengthOptions = lengthUnit === 'm' ? {} : { bareUnit: lengthUnit };

  // ---- fin -------------------------------------------------------------------------------------------------

  const finLength = (description: string, whenMissing: string, range: Range = finSize) =>
    quantity('length', { ...lengthOptions, range, description: `${description}, m`, whenMissing });

  const edges = word(
    ['cooled', 'insulated'],
    'Straight fins: whether the two narrow side edges (thickness x length) lose heat. Default cooled; ' +
      'insulated gives the per-unit-width fin of the closed forms',
  );

  const needs = (fin: string, keys: string) => `${fin} needs ${keys}`;

  const rectangularNeeds = needs('a rectangular fin', 'length, thickness and width');
  const rectangular = mapping(
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
  const pin = mapping(
    {
      profile: z.literal('pin'),
      length: finLength('Length from the base (x = 0) to the tip', pinNeeds),
      diameter: finLength('Diameter (uniform)', pinNeeds),
    },
    'a pin fin',
    'Cylindrical spine',
  );

  const trapezoidalNeeds = needs('a trapezoidal fin', 'length, baseThickness, tipThickness and width');
  const trapezoidal = mapping(
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
  const conicalPin = mapping(
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
  const annular = mapping(
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
  const tabulated = mapping(
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

  const finSchema = z
    .discriminatedUnion(
      'profile',
      [
        rectangular,
        pin,
        trapezoidal,
        taperedStraight('triangular', 'tapering linearly to a sharp tip'),
        taperedStraight('parabolic-concave', 'thickness ~ (1 - x/L)^2'),
        taperedStraight('parabolic-convex', 'thickness ~ (1 - x/L)^(1/2)'),
        conicalPin,
        annular,
        tabulated,
      ],
      {
        error: (issue) => {
          const given = issue.input;
          const profile = typeof given === 'object' && given !== null && 'profile' in given ? given.profile : given;
          const near = typeof profile === 'string' ? nearWords(profile, profileNames, 3) : [];
          const hint = near.length > 0 ? ` (did you mean ${near[0]}?)` : '';
          return `a fin profile: one of ${profileNames.join(', ')}${hint}`;
        },
      },
    )
    .describe('The fin: its profile and the dimensions that profile needs');

  // ---- material --------------------------------------------------------------------------------------------

  const conductivity = (description: string) => quantity('conductivity', { range: conductivityRange, description });

  const materialName = z
    .string()
    .transform((name, ctx) => {
      const material = findMaterial(name);
      if (material) return material;
      const near = similarMaterialNames(name);
      const hint = near.length > 0 ? `; did you mean ${near.slice(0, 3).join(' or ')}?` : '';
      ctx.issues.push({
        code: 'custom',
        input: name,
        message: `a built-in material (${materialNames.join(', ')}) or { k: 205 W/(m*K) } (unknown material${hint})`,
        continue: true,
      });
      return z.NEVER;
    })
    .meta({ description: 'A built-in material (fincheck materials lists them with k and its source)', enum: [...materialNames] });

  const conductivityTable = mapping(
    {
      points: pairs(
        quantity('temperature', { range: temperatureRange, description: 'Temperature, degC' }),
        conductivity('Thermal conductivity at that temperature, W/(m*K)'),
        '[temperature, conductivity]',
        2,
        'Conductivity against temperature, linear between points, temperatures strictly increasing',
      ),
    },
    'a conductivity table',
    'Conductivity that depends on temperature',
  );

  const customMaterial = mapping(
    {
      k: z
        .union([conductivity('Thermal conductivity, W/(m*K)'), conductivityTable], {
          error: () => 'a thermal conductivity such as "205 W/(m*K)" or { points: [[20 degC, 205], [150 degC, 198]] }',
        })
        .describe('Thermal conductivity, constant or tabulated over temperature'),
    },
    'a material',
    'A material given by its conductivity',
  );

  const materialSchema = z
    .union([materialName, customMaterial], {
      error: () => `a built-in material (${materialNames.join(', ')}) or { k: 205 W/(m*K) }`,
    })
    .describe('The fin material: a built-in name or { k: ... }');

  // ---- convection ------------------------------------------------------------------------------------------

  const coefficient = (description: string, range: Range = coefficientRange) =>
    quantity('heatTransferCoefficient', { range, description: `${description}, W/(m^2*K)` });

  const hLinear = mapping({ base: coefficient('h at the base'), tip: coefficient('h at the tip') }, 'a linear h', 'h varying linearly from base to tip');

  const hPoints = mapping(
    {
      points: pairs(
        quantity('length', { ...lengthOptions, range: finPosition, description: 'Position x from the base, m' }),
        coefficient('h at x'),
        '[x, h]',
        2,
        'h piecewise linear along x: x strictly increasing, within [0, fin length]',
      ),
    },
    'an h table',
    'h given at points along the fin',
  );

  const hPower = mapping(
    {
      law: z.literal('power').describe('h = base * (theta / theta_base)^exponent, theta = T - ambient'),
      base: coefficient('h at the base temperature', positiveCoefficient),
      exponent: quantity('dimensionless', {
        range: exponentRange,
        description:
          'Exponent of the excess temperature: 1/4 laminar natural convection, 1/3 turbulent, about 2 ' +
          'nucleate boiling; > -1 so that the heat flux h * theta vanishes with theta, at most 5',
      }),
    },
    'a power-law h',
    'h that depends on the local excess temperature (nonlinear)',
  );

  const hSchema = z
    .union([coefficient('Uniform h over the faces'), hLinear, hPoints, hPower], {
      error: () =>
        'a heat-transfer coefficient such as "40 W/(m^2*K)", { base: 60, tip: 25 }, { points: [[0 mm, 60], [40 mm, 25]] } ' +
        'or { law: power, base: 12, exponent: 0.25 }',
    })
    .describe('Convection coefficient over the faces: uniform, linear, tabulated or a power law');

  const tipSchema = z
    .union(
      [
        word(
          ['adiabatic', 'convective', 'infinite'],
          'adiabatic: no heat leaves the tip; convective: the local face h; infinite: a fin so long the tip is at ambient (uniform profiles only)',
        ),
        mapping({ convective: coefficient('The tip face\u2019s own coefficient') }, 'a convective tip', 'Tip with its own h'),
        mapping(
          { temperature: quantity('temperature', { range: temperatureRange, description: 'Tip temperature, degC' }) },
          'a tip at a set temperature',
          'Tip held at a temperature',
        ),
      ],
      { error: () => 'adiabatic, convective, infinite, { convective: 55 W/(m^2*K) } or { temperature: 30 degC }' },
    )
    .describe('Tip condition; default convective (the local face h)');

  const convectionSchema = mapping(
    {
      ambient: quantity('temperature', { range: temperatureRange, description: 'Temperature of the surrounding fluid, degC' }),
      h: hSchema,
      tip: tipSchema.optional(),
      emissivity: quantity('dimensionless', { range: fraction, description: 'Grey-body emissivity of the faces (default 0: no radiation)' }).optional(),
      surroundings: quantity('temperature', {
        range: temperatureRange,
        description: 'Temperature of the radiating surroundings, degC (default: ambient)',
      }).optional(),
    },
    'convection',
    'Convection (and radiation) from the fin surfaces',
  );

  // ---- base and the whole case -----------------------------------------------------------------------------

  const baseSchema = mapping(
    {
      temperature: quantity('temperature', {
        range: temperatureRange,
        description: 'Temperature of the wall the fin stands on, degC',
        whenMissing: 'the base temperature is required',
      }),
      contactResistance: quantity('contactResistance', {
        range: contactResistanceRange,
        description: 'Contact resistance between wall and fin per unit of base area, m^2*K/W (default 0)',
      }).optional(),
    },
    'base',
    'The fin base',
  );

  const nameSchema = z
    .union([z.string(), z.number().transform(String)], { error: () => 'free text' })
    .optional()
    .describe('Free text shown in every output (default: the file name without extension)');
  const unitsSchema = mapping(
    {
      length: word(lengthUnits, 'Unit of every length given as a bare number in this case (default m); a length with its own unit keeps it'),
    },
    'units',
    'Units of bare numbers in this case; default SI (m)',
  ).optional();
  const uncertaintySchema = z
    .record(z.string(), z.union([z.string(), z.number()], { error: () => 'a standard uncertainty such as "25 %" or "0.05 mm"' }), {
      error: () => 'a mapping from input key paths to standard uncertainties, e.g. { convection.h: 25 %, fin.thickness: 0.05 mm }',
    })
    .optional()
    .describe(
      'Standard uncertainty (one standard deviation) of inputs, by key path: relative with % or absolute with the unit, ' +
        'e.g. { convection.h: 25 %, material.k: 5 %, fin.thickness: 0.05 mm }; default convection.h: 25 %, the rest 0',
    );
  const displaySchema = mapping(
    Object.fromEntries(
      displayKinds.map((kind) => [kind, word(Object.keys(displayUnitChoices[kind]) as [string, ...string[]], displayDescriptions[kind]).optional()]),
    ) as Record<DisplayKind, z.ZodOptional<ReturnType<typeof word<[string, ...string[]]>>>>,
    'display',
    'Units the text, charts, maps and reports show (JSON stays SI). Default: lengths in mm and SI, or US units ' +
      '(in, degF, BTU/h) when the inputs are written mostly in US units; a units option of the command line overrides it',
  ).optional();
  const extendsSchema = z
    .string()
    .optional()
    .describe(
      'A case file this case inherits from, relative to this file: its keys are merged under this one (mappings key by key, lists and values replace; name is not inherited)',
    );
  // The keys a heat-sink case shares with a single-fin case (heat-sink-schema.ts).
  const shared = {
    name: nameSchema,
    units: unitsSchema,
    display: displaySchema,
    extends: extendsSchema,
    material: materialSchema,
    h: hSchema,
    tip: tipSchema,
    coefficient,
    uncertainty: uncertaintySchema,
  };

  const caseMapping = mapping(
    {
      name: nameSchema,
      fin: finSchema,
      material: materialSchema,
      convection: convectionSchema,
      base: baseSchema,
      units: unitsSchema,
      display: displaySchema,
      extends: extendsSchema,
      uncertainty: uncertaintySchema,
    },
    'a case',
    'A fincheck case (format 1): one fin and its surroundings. A bare number is SI (m, W/(m*K), W/(m^2*K), ' +
      'm^2*K/W; lengths in units.length when given); a bare temperature is degC; a string carries its unit.',
  );
  return { caseMapping, shared };
}

type BuiltSchema = ReturnType<typeof buildCaseSchema>;
const schemas = new Map<LengthUnit, BuiltSchema>();

function builtFor(lengthUnit: LengthUnit): BuiltSchema {
  let built = schemas.get(lengthUnit);
  if (built === undefined) {
    built = buildCaseSchema(lengthUnit);
    schemas.set(lengthUnit, built);
  }
  return built;
}

/** The schema for a case whose bare lengths are in `lengthUnit`. */
export function caseSchemaFor(lengthUnit: LengthUnit): BuiltSchema['caseMapping'] {
  return builtFor(lengthUnit).caseMapping;
}

/** The parts a heat-sink case shares with a single-fin case (name, units, material, h, tip, a coefficient). */
export function sharedSchemaFor(lengthUnit: LengthUnit): BuiltSchema['shared'] {
  return builtFor(lengthUnit).shared;
}

/** The validated case file: SI numbers, temperatures degC, built-in materials resolved. */
export type ValidatedCase = z.output<BuiltSchema['caseMapping']>;

/** JSON Schema (draft 2020-12) of the case file, with the meaning and unit of every key. */
export function caseJsonSchema(): Record<string, unknown> {
  // The schema of a case without `units` (bare lengths in m). Schemas are built when first asked for (not at
  // import: start-up), once per unit.
  return z.toJSONSchema(caseSchemaFor('m'), { io: 'input' }) as Record<string, unknown>;
}
