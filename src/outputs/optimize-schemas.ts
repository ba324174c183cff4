/** The schemas of `optimize --json`: a single fin's document or a heat sink's, told apart by `kind` (design-questions.md). */
import { num, int, str, bool, nullable, arr, oneOfWords, described, obj, type Schema } from './schema-words.js';

/** `optimize --json` of a single fin. */
function finOptimizeSchema(): Schema {
  const values = { type: 'object', additionalProperties: num, description: 'Every dimension that changed, m, by key path' };
  const point = {
    values,
    heatRate_W: num,
    amount: described(nullable(num), 'The material kept or minimised, m^2 (profile area) or m^3 (volume); null for keep none'),
  };
  return obj(
    {
      case: str,
      objective: oneOfWords('max-heat', 'min-material', 'required'),
      requiredHeat_W: nullable(num),
      keep: oneOfWords('profile-area', 'volume', 'mass', 'none'),
      vary: arr(str),
      dependent: nullable(str),
      bounds: { type: 'object', additionalProperties: { type: 'array', items: num, minItems: 2, maxItems: 2 } },
      shortcut: obj({ ...point, method: str }),
      reference: obj({ ...point, model: str, discretizationError: nullable(num), resolved: bool, evaluations: int }),
      shortcutAtReference_W: num,
      loss: num,
      notes: arr(str),
      cautions: arr(str),
      curve: obj({ key: str, x_m: arr(num), reference_W: arr(num), shortcut_W: arr(num), model: { const: 'fd-1d' }, note: str }),
      chartFile: described(str, 'The chart file written, when one was asked for'),
    },
    ['curve', 'chartFile'],
  );
}

/** `optimize --json` of a heat sink (src/design optimize-sink.ts): the objective is the hottest source's mean rise. */
function sinkOptimizeSchema(): Schema {
  const values = {
    type: 'object',
    additionalProperties: num,
    description: 'Every dimension that changed by key path: array.count (a count), lengths in m',
  };
  const point = {
    values,
    hottestRise_K: described(num, "The hottest source's mean temperature rise above ambient, K (the objective: max-heat minimises it)"),
    hottestTemperature_degC: num,
    hottestSource: str,
    sourceRise_K: arr(num),
    amount: described(num, "The fins' volume, m^3"),
  };
  return obj(
    {
      kind: { const: 'heat-sink' },
      case: str,
      objective: oneOfWords('max-heat', 'required'),
      quantity: str,
      requiredTemperature_degC: described(nullable(num), 'The required temperature of every source, degC; null: each source limit (or max-heat)'),
      limits: nullable(arr(obj({ source: str, limit_degC: num }))),
      sourceNames: arr(str),
      keep: oneOfWords('none', 'volume', 'mass'),
      vary: arr(oneOfWords('array.count', 'fin.thickness')),
      dependent: nullable(oneOfWords('fin.thickness', 'fin.length')),
      bounds: { type: 'object', additionalProperties: { type: 'array', items: num, minItems: 2, maxItems: 2 } },
      shortcut: obj({ ...point, model: oneOfWords('overall-efficiency', 'overall-efficiency-exact-fin'), method: str }),
      reference: obj({
        ...point,
        model: { const: 'fd-3d' },
        discretizationError: nullable(num),
        resolved: bool,
        evaluations: described(int, 'fd-3d refinement studies solved (search and default studies)'),
        search: obj({ studies: int, grid: str, discretizationError: nullable(num), values }),
        confirm: obj({ studies: int, grid: str }),
        neighbours: arr(obj({ values, hottestRise_K: num })),
        sourceMax_degC: arr(num),
      }),
      shortcutAtReference_K: described(num, "The reference's hottest rise at the shortcut's answer, K (the sink's form of shortcutAtReference_W)"),
      loss: num,
      shortcutKeepsLimit: nullable(bool),
      hSensitivity: nullable(obj({ method: str, dlnAnswer_dlnh: nullable(num), atLowH: nullable(num), atHighH: nullable(num) })),
      notes: arr(str),
      cautions: arr(str),
      curve: obj({ key: str, x: arr(num), reference_K: arr(num), shortcut_K: arr(num), model: { const: 'fd-3d' }, note: str }),
      chartFile: described(str, 'The chart file written, when one was asked for'),
    },
    ['curve', 'chartFile'],
  );
}

/** `optimize --json`: a single fin's document or a heat sink's (told apart by `kind`). */
export function optimizeSchema(): Schema {
  return { oneOf: [finOptimizeSchema(), sinkOptimizeSchema()] };
}
