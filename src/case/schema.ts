/**
 * The case file's schema (format 1, /work/shared/design/case-format.md): every key, its unit and meaning.
 *
 * Parsing with it checks the shape (strict mappings: unknown keys are errors), reads every quantity into SI
 * (temperatures degC) and checks each value's own range (sizes > 0, h >= 0, emissivity 0..1). Checks that
 * relate several keys (tip thinner than base, points in order, base hotter or colder than ambient) are in
 * checks.ts. `caseJsonSchema()` is what `fincheck schema` prints.
 */
import { z } from 'zod';
import { contactResistanceRange, mapping, quantity, temperatureRange, word } from './fields.js';
import { convectionSchemasOf } from './convection-schema.js';
import { finProfileSchema, type ProfileName } from './fin-profile-schema.js';
import { materialSchemaOf } from './material-schema.js';
import { lengthUnits, type LengthUnit } from './units.js';
import { displayKinds, displayUnitChoices, type DisplayKind } from './display-units.js';

export { profileNames } from './fin-profile-schema.js';

const displayDescriptions: Record<DisplayKind, string> = {
  length: 'Lengths shown in',
  temperature: 'Temperatures shown in (differences follow: K, or degF for degF)',
  heat: 'Heat rates shown in',
  h: 'Heat-transfer coefficients shown in',
  k: 'Thermal conductivities shown in',
  flux: 'Heat fluxes shown in',
  resistance: 'Thermal resistances (a heat sink) shown in',
};

/**
 * The case schema whose bare lengths are in `lengthUnit` (`units: { length: mm }`); every other key is the same.
 * `profile`: the fin schema holds that profile alone (finProfileSchema). Built once per unit and profile (see
 * caseSchemaFor).
 */
function buildCaseSchema(lengthUnit: LengthUnit, profile?: ProfileName) {
  const lengthOptions = lengthUnit === 'm' ? {} : { bareUnit: lengthUnit };
  const finSchema = finProfileSchema(lengthOptions, profile);
  const materialSchema = materialSchemaOf();
  const { coefficient, hSchema, tipSchema, convectionSchema } = convectionSchemasOf(lengthOptions);

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
const schemas = new Map<string, BuiltSchema>();

function builtFor(lengthUnit: LengthUnit, profile?: ProfileName): BuiltSchema {
  const key = `${lengthUnit}|${profile ?? ''}`;
  let built = schemas.get(key);
  if (built === undefined) {
    built = buildCaseSchema(lengthUnit, profile);
    schemas.set(key, built);
  }
  return built;
}

/**
 * The schema for a case whose bare lengths are in `lengthUnit`. `profile`: the fin profile the case names, when it
 * names a known one; the schema then builds that profile's keys alone and parses such a case exactly as the whole
 * schema does (finProfileSchema). Without it (or for any other input), the whole schema.
 */
export function caseSchemaFor(lengthUnit: LengthUnit, profile?: ProfileName): BuiltSchema['caseMapping'] {
  return builtFor(lengthUnit, profile).caseMapping;
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
