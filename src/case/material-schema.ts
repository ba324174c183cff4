/** The `material` key of a case: a built-in name, or { k } constant or tabulated over temperature. Part of the case schema (schema.ts). */
import { z } from 'zod';
import { conductivityRange, mapping, pairs, quantity, temperatureRange } from './fields.js';
import { findMaterial, materialNames, similarMaterialNames } from './materials.js';

export function materialSchemaOf() {
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
  return materialSchema;
}
