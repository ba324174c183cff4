/**
 * JSON Schemas (draft 2020-12) of the JSON documents: `check` (a single fin or a heat sink), `check` with
 * several cases (an array), `solve` (fd-1d and fd-2d), `map` and `optimize`. Key names are those of outputs.md,
 * heat-sink.md and design-questions.md; quantities are SI with the unit in the key (`heatRate_W`, `_degC`, `_K`).
 *
 * Every mapping whose shape is fixed has additionalProperties: false, so a key added to an output without being
 * documented here fails tests/outputs (the schema is the published contract of the JSON output). Mappings keyed by
 * the user's own names (optimize's values and bounds by key path) take any key of the stated value type.
 */

import { checkManySchema, checkSchema } from './check-schemas.js';
import { optimizeSchema } from './optimize-schemas.js';
import type { Schema } from './schema-words.js';
import { mapSchema, solveSchema } from './solve-map-schemas.js';

const fincheckId = 'https://fincheck.invalid/schema/output';

function document(id: string, title: string, body: Schema): Schema {
  return { $schema: 'https://json-schema.org/draft/2020-12/schema', $id: `${fincheckId}/${id}.json`, title, ...body };
}

/** The outputs that have a schema (printed by the schema command). */
export const OUTPUT_SCHEMA_NAMES = ['check', 'check-many', 'solve', 'map', 'optimize'] as const;
export type OutputSchemaName = (typeof OUTPUT_SCHEMA_NAMES)[number];

/** The JSON Schema of one command's JSON output. */
export function outputJsonSchema(name: OutputSchemaName): Record<string, unknown> {
  switch (name) {
    case 'check':
      return document('check', 'fincheck check, JSON output (one case: a single fin or a heat sink)', checkSchema());
    case 'check-many':
      return document('check-many', 'fincheck check CASE..., JSON output (several cases: one entry per case, with its file)', checkManySchema());
    case 'solve':
      return document('solve', 'fincheck solve, JSON output (fd-1d or fd-2d)', solveSchema());
    case 'map':
      return document('map', 'fincheck map, JSON output (the content of map.json)', mapSchema());
    case 'optimize':
      return document('optimize', 'fincheck optimize, JSON output', optimizeSchema());
    default: {
      const never: never = name;
      throw new Error(`outputJsonSchema: unknown output ${String(never)}`);
    }
  }
}
