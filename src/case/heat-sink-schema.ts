/**
 * The heat-sink case's schema (../shared/design/heat-sink.md, format 1): identical fins on a rectangular plate,
 * heated by isoflux sources on its underside. A case with an `array` key is a heat sink.
 *
 * Same building blocks, units and messages as the single-fin schema (schema.ts, fields.ts): strict mappings,
 * quantities read into SI, each value's own range. What relates several keys (sources on the plate and apart,
 * fins that fit the plate, the fin profile that suits the array) is in heat-sink-checks.ts.
 *
 * Fins of an array: straight profiles run the whole plate length (no `width`: it is plate.length) and their two
 * end faces are adiabatic (no `edges`); pins stand in rows and columns. Annular fins stand on tubes, not plates.
 */
import { z } from 'zod';
import { contactResistanceRange, finPosition, finSize, finSizeOrZero, mapping, pairs, quantity, temperatureRange, word, type Range } from './fields.js';
import { sharedSchemaFor } from './schema.js';
import { nearWords } from './spelling.js';
import type { LengthUnit } from './units.js';

/** Profiles of plate fins (straight, running the plate's length) and of pins. */
export const plateFinProfiles = ['rectangular', 'trapezoidal', 'triangular', 'parabolic-concave', 'parabolic-convex', 'tabulated'] as const;
export const pinFinProfiles = ['pin', 'conical-pin', 'tabulated'] as const;
export const arrayFinProfiles = [
  'rectangular',
  'trapezoidal',
  'triangular',
  'parabolic-concave',
  'parabolic-convex',
  'pin',
  'conical-pin',
  'tabulated',
] as const;

/**
 * Most fins in one direction and most sources. A sink has tens of fins; 1000 a row leaves room for any
 * micro-channel plate while keeping every count and loop small (common practice, no source).
 */
export const maxFinsPerRow = 1000;
export const maxSources = 100;

/** A whole number of fins, 0 (a bare plate) to maxFinsPerRow. */
export const finCount: Range = {
  test: (v) => Number.isInteger(v) && v >= 0 && v <= maxFinsPerRow,
  text: '>= 0, a whole number',
  limit: `at most ${maxFinsPerRow}`,
};
export const rowCount: Range = {
  test: (v) => Number.isInteger(v) && v >= 1 && v <= maxFinsPerRow,
  text: '>= 1, a whole number',
  limit: `at most ${maxFinsPerRow}`,
};

/**
 * A source's power, W: 0 (an unheated footprint whose temperature is wanted) to 1e7 W (10 MW: far above the
 * largest power module on one plate, a few tens of kW; keeps every flux finite; common practice, no source).
 */
export const sourcePower: Range = { test: (v) => v >= 0 && v <= 1e7, text: '>= 0', limit: 'at most 1e7 W' };

/**
 * `adiabatic` or an h. A word that is not `adiabatic` gets the word's message (a union would report the
 * coefficient's "does not start with a number" for `adiabatc`).
 */
function undersideSchema(coefficient: z.ZodType<number>) {
  const accepted = 'adiabatic or a heat-transfer coefficient >= 0 such as "10 W/(m^2*K)"';
  return z
    .unknown()
    .transform((given, ctx): 'adiabatic' | number => {
      if (given === 'adiabatic') return 'adiabatic';
      if (typeof given === 'string' && /^\s*[a-z]/i.test(given)) {
        const near = nearWords(given, ['adiabatic'], 3);
        ctx.issues.push({ code: 'custom', input: given, message: `${accepted}${near.length > 0 ? ' (did you mean adiabatic?)' : ''}` });
        return z.NEVER;
      }
      const result = coefficient.safeParse(given);
      if (result.success) return result.data;
      for (const issue of result.error.issues) ctx.issues.push({ code: 'custom', input: given, message: `${accepted}: ${issue.message}` });
      return z.NEVER;
    })
    .meta({
      description: `The underside outside the sources: adiabatic (default) or an h. ${accepted}.`,
      anyOf: [{ type: 'number' }, { type: 'string' }],
    });
}

function buildHeatSinkSchema(lengthUnit: LengthUnit) {
  const shared = sharedSchemaFor(lengthUnit);
  const lengthOptions = lengthUnit === 'm' ? {} : { bareUnit: lengthUnit };
  const length = (description: string, whenMissing?: string, range: Range = finSize) =>
    quantity('length', { ...lengthOptions, range, description: `${description}, m`, ...(whenMissing ? { whenMissing } : {}) });
  const needs = (fin: string, keys: string) => `${fin} of an array needs ${keys}`;
  const height = 'Height above the plate, from the root (x = 0) to the tip';

  // ---- fin: one fin of the array -----------------------------------------------------------------------------

  const rectangularNeeds = needs('a rectangular fin', 'length and thickness');
  const rectangular = mapping(
    { profile: z.literal('rectangular'), length: length(height, rectangularNeeds), thickness: length('Thickness (uniform)', rectangularNeeds) },
    'a rectangular fin of an array',
    'Plate fin of uniform thickness running the plate length',
  );
  const trapezoidalNeeds = needs('a trapezoidal fin', 'length, baseThickness and tipThickness');
  const trapezoidal = mapping(
    {
      profile: z.literal('trapezoidal'),
      length: length(height, trapezoidalNeeds),
      baseThickness: length('Thickness at the root', trapezoidalNeeds),
      tipThickness: length('Thickness at the tip, at most baseThickness (0 makes a triangle)', trapezoidalNeeds, finSizeOrZero),
    },
    'a trapezoidal fin of an array',
    'Plate fin whose thickness tapers linearly from root to tip',
  );
  const tapered = (profile: 'triangular' | 'parabolic-concave' | 'parabolic-convex', shape: string) => {
    const finNeeds = needs(`a ${profile} fin`, 'length and baseThickness');
    return mapping(
      { profile: z.literal(profile), length: length(height, finNeeds), baseThickness: length('Thickness at the root', finNeeds) },
      `a ${profile} fin of an array`,
      `Plate fin, ${shape}`,
    );
  };
  const pinNeeds = needs('a pin fin', 'length and diameter');
  const pin = mapping(
    { profile: z.literal('pin'), length: length(height, pinNeeds), diameter: length('Diameter (uniform)', pinNeeds) },
    'a pin fin of an array',
    'Cylindrical pin',
  );
  const conicalNeeds = needs('a conical-pin fin', 'length, baseDiameter and tipDiameter');
  const conicalPin = mapping(
    {
      profile: z.literal('conical-pin'),
      length: length(height, conicalNeeds),
      baseDiameter: length('Diameter at the root', conicalNeeds),
      tipDiameter: length('Diameter at the tip, at most baseDiameter (0 makes a sharp cone)', conicalNeeds, finSizeOrZero),
    },
    'a conical-pin fin of an array',
    'Pin whose diameter tapers linearly from root to tip',
  );
  const tabulatedNeeds = needs('a tabulated fin', 'shape and points');
  const tabulated = mapping(
    {
      profile: z.literal('tabulated'),
      shape: word(['straight', 'pin'], 'Whether the points give the thickness of a plate fin or the diameter of a pin'),
      points: pairs(
        length('Position x from the root', tabulatedNeeds, finPosition),
        length('Thickness (straight) or diameter (pin) at x', undefined, finSizeOrZero),
        '[x, thickness or diameter]',
        2,
        'The profile, linear between points: x strictly increasing from 0 at the root; the size at the root > 0, the size at the tip may be 0',
      ),
    },
    'a tabulated fin of an array',
    'Any measured or drawn profile',
  );

  const finSchema = z
    .discriminatedUnion(
      'profile',
      [
        rectangular,
        trapezoidal,
        tapered('triangular', 'tapering linearly to a sharp tip'),
        tapered('parabolic-concave', 'thickness ~ (1 - x/L)^2'),
        tapered('parabolic-convex', 'thickness ~ (1 - x/L)^(1/2)'),
        pin,
        conicalPin,
        tabulated,
      ],
      {
        error: (issue) => {
          const given = issue.input;
          const profile = typeof given === 'object' && given !== null && 'profile' in given ? given.profile : given;
          const annular = profile === 'annular' ? ' (annular fins stand on tubes, not on a plate)' : '';
          const near = typeof profile === 'string' && annular === '' ? nearWords(profile, arrayFinProfiles, 3) : [];
          const hint = near.length > 0 ? ` (did you mean ${near[0]}?)` : '';
          return `a fin profile of an array: one of ${arrayFinProfiles.join(', ')}${annular}${hint}`;
        },
      },
    )
    .describe('One fin of the array (all fins are identical); plate fins run the whole plate length');

  // ---- array, plate, sources ---------------------------------------------------------------------------------

  const pinsSchema = mapping(
    {
      rows: quantity('dimensionless', { range: rowCount, description: 'Rows of pins along y (plate.length)' }),
      columns: quantity('dimensionless', { range: rowCount, description: 'Columns of pins across x (plate.width)' }),
      pitch: z
        .tuple([length('Centre-to-centre pitch in x'), length('Centre-to-centre pitch in y')], {
          error: () => 'a pair [x pitch, y pitch] of lengths such as [9 mm, 9 mm]',
        })
        .describe('Centre-to-centre pitch [x, y]'),
      pattern: word(['inline', 'staggered'], 'inline: pins in a grid; staggered: every second row shifted by half the x pitch').optional(),
    },
    'a pin array',
    'Pins in rows and columns, centred on the plate',
  );

  const arraySchema = mapping(
    {
      count: quantity('dimensionless', { range: finCount, description: 'Plate fins across the plate width (0: a bare plate)' }).optional(),
      pitch: length('Centre-to-centre pitch of the plate fins (default plate.width / count)').optional(),
      pins: pinsSchema.optional(),
    },
    'an array',
    'The fins on the plate: `count` plate fins (with an optional `pitch`), or `pins`; centred on the plate',
  );

  const plateSchema = mapping(
    {
      width: length('Extent in x, across the plate fins', 'the plate needs width, length and thickness'),
      length: length('Extent in y, along the plate fins', 'the plate needs width, length and thickness'),
      thickness: length('Extent in z, from the underside to the finned top', 'the plate needs width, length and thickness'),
      material: shared.material.optional(),
    },
    'a plate',
    'The plate the fins stand on; the sources heat its underside',
  );

  const position = (axis: string) => length(`${axis} of the source's centre on the underside`, 'a source needs power, centre and size', finPosition);
  const extent = (axis: string) => length(`Extent of the source in ${axis}`, 'a source needs power, centre and size');
  const sourceSchema = mapping(
    {
      name: z
        .union([z.string(), z.number().transform(String)], { error: () => 'free text' })
        .optional()
        .describe('Shown in every output (default: source i)'),
      power: quantity('power', {
        range: sourcePower,
        description: 'Heat input, spread uniformly over the source (isoflux), W',
        whenMissing: 'a source needs power, centre and size',
      }),
      centre: z
        .tuple([position('x'), position('y')], { error: () => 'a pair [x, y] of lengths such as [30 mm, 40 mm]' })
        .describe('Centre of the footprint [x, y]'),
      size: z
        .tuple([extent('x'), extent('y')], { error: () => 'a pair [x extent, y extent] of lengths such as [25 mm, 30 mm]' })
        .describe('Extent of the footprint [x, y]'),
      contactResistance: quantity('contactResistance', {
        range: contactResistanceRange,
        description: 'Interface resistance between source and plate per unit of source area, m^2*K/W (default 0)',
      }).optional(),
      limit: quantity('temperature', {
        range: temperatureRange,
        description: 'Temperature the source must stay below, degC (flagged with its margin)',
      }).optional(),
    },
    'a source',
    'A rectangular isoflux heat source on the underside',
  );

  const sourcesSchema = z
    .array(sourceSchema, { error: () => `a list of 1 to ${maxSources} sources` })
    .min(1, { error: () => `a list of 1 to ${maxSources} sources` })
    .max(maxSources, { error: () => `a list of 1 to ${maxSources} sources` })
    .describe('The heat sources on the plate underside');

  // ---- convection ---------------------------------------------------------------------------------------------

  const convectionSchema = mapping(
    {
      ambient: quantity('temperature', { range: temperatureRange, description: 'Temperature of the surrounding fluid, degC' }),
      h: shared.h.optional(),
      tip: shared.tip.optional(),
      plate: shared.coefficient('On the exposed top of the plate between fins (default: h at the fin root)').optional(),
      underside: undersideSchema(shared.coefficient('On the underside outside the sources')).optional(),
    },
    'the convection of a heat sink',
    'Convection from the fins, the exposed plate top and the underside',
  );

  return mapping(
    {
      name: shared.name,
      fin: finSchema.optional(),
      material: shared.material.optional(),
      array: arraySchema,
      plate: plateSchema,
      sources: sourcesSchema,
      convection: convectionSchema,
      units: shared.units,
      uncertainty: shared.uncertainty,
      display: shared.display,
      extends: shared.extends,
    },
    'a heat-sink case',
    'A fincheck heat-sink case (format 1): identical fins on a rectangular plate heated by sources on its underside; ' +
      'recognised by its array key. Units as in a single-fin case.',
  );
}

const schemas = new Map<LengthUnit, ReturnType<typeof buildHeatSinkSchema>>();

/** The heat-sink schema whose bare lengths are in `lengthUnit` (built once per unit). */
export function heatSinkSchemaFor(lengthUnit: LengthUnit): ReturnType<typeof buildHeatSinkSchema> {
  let schema = schemas.get(lengthUnit);
  if (schema === undefined) {
    schema = buildHeatSinkSchema(lengthUnit);
    schemas.set(lengthUnit, schema);
  }
  return schema;
}

/** A validated heat-sink case file: SI numbers, temperatures degC, built-in materials resolved. */
export type ValidatedHeatSink = z.output<ReturnType<typeof buildHeatSinkSchema>>;

/** JSON Schema (draft 2020-12) of the heat-sink case file. */
export function heatSinkJsonSchema(): Record<string, unknown> {
  // Built when first asked for (not at import: a single fin's run never builds it).
  return z.toJSONSchema(heatSinkSchemaFor('m'), { io: 'input' }) as Record<string, unknown>;
}
