/**
 * The words the output schemas are written in (JSON Schema draft 2020-12): number, integer, string, a closed mapping
 * (`obj`, additionalProperties false), nullable, arrays, enumerations, and the pieces several documents share
 * (verdicts, model ids, flags, warnings, sensitivities and uncertainty bands of a fin and of a sink).
 */

export type Schema = Record<string, unknown>;

export const num: Schema = { type: 'number' };
export const int: Schema = { type: 'integer', minimum: 0 };
export const str: Schema = { type: 'string' };
export const bool: Schema = { type: 'boolean' };
export const nullable = (s: Schema): Schema => ({ anyOf: [s, { type: 'null' }] });
export const arr = (items: Schema): Schema => ({ type: 'array', items });
export const oneOfWords = (...words: string[]): Schema => ({ enum: words });
export const described = (s: Schema, description: string): Schema => ({ ...s, description });

/** A mapping with exactly these keys: `optional` lists the ones that may be absent. */
export function obj(properties: Record<string, Schema>, optional: readonly string[] = []): Schema {
  return {
    type: 'object',
    properties,
    required: Object.keys(properties).filter((k) => !optional.includes(k)),
    additionalProperties: false,
  };
}

export const verdict = oneOfWords('ok', 'marginal', 'unsafe', 'unresolved');
export const finModelIds = ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form', 'fd-1d', 'fd-2d'];
export const shortcutIds = ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form'];
export const warning = obj({ path: str, message: str });
export const flag = obj({ flag: str, severity: oneOfWords('info', 'warning', 'error'), value: num, message: str });

// Design questions (design-questions.md): the sensitivities of the reference and its uncertainty band.
export const driftOverUncertainty = described(nullable(num), '|drift| over the relative uncertainty band of the reference (null when the band is 0)');
export const finSensitivity = obj({
  key: str,
  dlnQ_dlnx: num,
  method: oneOfWords('adjoint', 'central-difference', 'exact'),
  value: num,
  uncertainty: num,
});
export const finUncertainty = obj({
  method: oneOfWords('first-order', 'latin-hypercube'),
  relative: num,
  low_W: num,
  high_W: num,
  firstOrder: num,
  fromH: num,
  sample: nullable(
    obj({
      method: { const: 'latin-hypercube' },
      n: int,
      seed: int,
      relative: num,
      samplingError: num,
      agrees: bool,
      grid: str,
      low_W: num,
      high_W: num,
    }),
  ),
  note: str,
});
export const sinkSensitivity = obj({ key: str, dlnRise_dlnx: num, method: oneOfWords('adjoint', 'central-difference'), value: num, uncertainty: num });
export const sinkUncertainty = obj({
  method: oneOfWords('first-order', 'latin-hypercube'),
  relative: num,
  low_K: num,
  high_K: num,
  firstOrder: num,
  fromH: num,
  sample: described(
    nullable(
      obj({
        method: { const: 'latin-hypercube' },
        n: int,
        seed: int,
        relative: num,
        samplingError: num,
        agrees: bool,
        grid: str,
        low_K: num,
        high_K: num,
      }),
    ),
    "The Latin-hypercube confirmation (each point an fd-3d solve on the study's coarsest grid); null when none was drawn",
  ),
  source: str,
  note: str,
});
