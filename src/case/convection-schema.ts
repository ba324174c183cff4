/**
 * The convection keys of a case: h (uniform, linear, tabulated along the fin, or a power law of the excess
 * temperature), the tip condition, and the `convection` mapping (ambient, h, tip, emissivity, surroundings). Part of
 * the case schema (schema.ts); the heat-sink schema takes h, the tip and the coefficient from here too.
 */
import { z } from 'zod';
import {
  coefficientRange,
  exponentRange,
  finPosition,
  fraction,
  mapping,
  pairs,
  positiveCoefficient,
  quantity,
  temperatureRange,
  word,
  type Range,
} from './fields.js';
import type { LengthOptions } from './fin-profile-schema.js';

export function convectionSchemasOf(lengthOptions: LengthOptions) {
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
  return { coefficient, hSchema, tipSchema, convectionSchema };
}
