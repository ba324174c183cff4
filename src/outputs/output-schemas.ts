/**
 * JSON Schemas (draft 2020-12) of the JSON documents: `check` (a single fin or a heat sink), `check` with
 * several cases (an array), `solve` (fd-1d and fd-2d), `map` and `optimize`. Key names are those of outputs.md,
 * heat-sink.md and design-questions.md; quantities are SI with the unit in the key (`heatRate_W`, `_degC`, `_K`).
 *
 * Every mapping whose shape is fixed has additionalProperties: false, so a key added to an output without being
 * documented here fails tests/outputs (the schema is the published contract of the JSON output). Mappings keyed by
 * the user's own names (optimize's values and bounds by key path) take any key of the stated value type.
 */

type Schema = Record<string, unknown>;

const num: Schema = { type: 'number' };
const int: Schema = { type: 'integer', minimum: 0 };
const str: Schema = { type: 'string' };
const bool: Schema = { type: 'boolean' };
const nullable = (s: Schema): Schema => ({ anyOf: [s, { type: 'null' }] });
const arr = (items: Schema): Schema => ({ type: 'array', items });
const oneOfWords = (...words: string[]): Schema => ({ enum: words });
const described = (s: Schema, description: string): Schema => ({ ...s, description });

/** A mapping with exactly these keys: `optional` lists the ones that may be absent. */
function obj(properties: Record<string, Schema>, optional: readonly string[] = []): Schema {
  return {
    type: 'object',
    properties,
    required: Object.keys(properties).filter((k) => !optional.includes(k)),
    additionalProperties: false,
  };
}

const verdict = oneOfWords('ok', 'marginal', 'unsafe', 'unresolved');
const finModelIds = ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form', 'fd-1d', 'fd-2d'];
const shortcutIds = ['tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form'];
const warning = obj({ path: str, message: str });
const flag = obj({ flag: str, severity: oneOfWords('info', 'warning', 'error'), value: num, message: str });

// Design questions (design-questions.md): the sensitivities of the reference and its uncertainty band.
const driftOverUncertainty = described(nullable(num), '|drift| over the relative uncertainty band of the reference (null when the band is 0)');
const finSensitivity = obj({ key: str, dlnQ_dlnx: num, method: oneOfWords('adjoint', 'central-difference', 'exact'), value: num, uncertainty: num });
const finUncertainty = obj({
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
const sinkSensitivity = obj({ key: str, dlnRise_dlnx: num, method: oneOfWords('adjoint', 'central-difference'), value: num, uncertainty: num });
const sinkUncertainty = obj({
  method: { const: 'first-order' },
  relative: num,
  low_K: num,
  high_K: num,
  firstOrder: num,
  fromH: num,
  sample: { type: 'null' },
  source: str,
  note: str,
});

const fincheckId = 'https://fincheck.invalid/schema/output';

function document(id: string, title: string, body: Schema): Schema {
  return { $schema: 'https://json-schema.org/draft/2020-12/schema', $id: `${fincheckId}/${id}.json`, title, ...body };
}

/** `check --json` of a single fin (outputs.md "JSON output"). */
function finCheck(): Schema {
  const reference = obj({
    model: oneOfWords('fd-1d', 'fd-2d'),
    heatRate_W: num,
    efficiency: nullable(num),
    efficiencyNote: nullable(str),
    effectiveness: nullable(num),
    effectivenessNote: nullable(str),
    discretizationError: num,
    heatRateFrom: oneOfWords('extrapolated', 'finest-grid'),
    finestGridHeatRate_W: num,
    finestGridDiscretizationError: num,
    energyBalance: num,
    observedOrder: nullable(num),
    grid: { oneOf: [obj({ nodes: int }), obj({ nx: int, ny: int })] },
    tipTemperature_degC: num,
    note: str,
    resolved: bool,
    resolution: obj({ target: num, refinements: int, grids: arr(str), grading: str, budget: str }),
  });
  const model = obj(
    {
      model: oneOfWords(...shortcutIds, 'fd-1d'),
      heatRate_W: num,
      efficiency: nullable(num),
      effectiveness: nullable(num),
      drift: num,
      verdict,
      formulaEfficiency: nullable(num),
      m_per_m: nullable(num),
      length_m: nullable(num),
      basis: str,
      accuracy: str,
      guess: oneOfWords('base', 'mean'),
      guessValues: obj({ h_W_per_m2K: num, k_W_per_mK: num, description: str }),
      driftOverUncertainty,
    },
    ['guess', 'guessValues', 'driftOverUncertainty'],
  );
  return obj(
    {
      case: str,
      tolerance: num,
      biot: nullable(num),
      mL: nullable(num),
      dimensionlessNote: nullable(str),
      reference,
      models: arr(model),
      notApplicable: arr(obj({ model: oneOfWords(...shortcutIds), reason: str })),
      assumptions: arr(obj({ assumption: str, drift: num, madeBy: arr(oneOfWords(...finModelIds)), method: str })),
      flags: arr(flag),
      cautions: arr(str),
      warnings: arr(warning),
      sensitivities: arr(finSensitivity),
      sensitivityMethod: str,
      uncertainty: finUncertainty,
    },
    ['sensitivities', 'sensitivityMethod', 'uncertainty'],
  );
}

/** `check --json` of a heat sink (heat-sink.md "What check reports for a heat sink"). */
function sinkCheck(): Schema {
  return obj(
    {
      case: str,
      kind: { const: 'heat-sink' },
      tolerance: num,
      reference: obj({
        model: { const: 'fd-3d' },
        sourceRise_K: arr(num),
        sourceDiscretizationError: arr(nullable(num)),
        discretizationError: nullable(num),
        energyBalance: num,
        resolved: bool,
        target: num,
        unknowns: arr(int),
        finModel: str,
        note: str,
      }),
      sources: arr(
        obj({
          name: str,
          power_W: num,
          meanTemperature_degC: num,
          maxTemperature_degC: num,
          meanRise_K: num,
          discretizationError: nullable(num),
          limit_degC: nullable(num),
          margin_K: nullable(num),
        }),
      ),
      sinkResistance_KperW: num,
      overallEfficiency: num,
      fins: arr(obj({ index: int, heatRate_W: num, rootTemperature_degC: num })),
      models: arr(
        obj(
          {
            model: str,
            sourceRise_K: arr(num),
            sourceDrift: arr(num),
            drift: num,
            worstSource: str,
            verdict,
            sinkResistance_KperW: num,
            overallEfficiency: num,
            finEfficiency: nullable(num),
            basis: str,
            accuracy: str,
            driftOverUncertainty,
          },
          ['driftOverUncertainty'],
        ),
      ),
      assumptions: arr(obj({ assumption: str, drift: nullable(num), madeBy: arr(str), method: str })),
      flags: arr(flag),
      cautions: arr(str),
      warnings: arr(warning),
      sensitivities: arr(sinkSensitivity),
      sensitivityMethod: str,
      uncertainty: sinkUncertainty,
    },
    ['sensitivities', 'sensitivityMethod', 'uncertainty'],
  );
}

function checkSchema(): Schema {
  return { $defs: { fin: finCheck(), heatSink: sinkCheck() }, oneOf: [{ $ref: '#/$defs/fin' }, { $ref: '#/$defs/heatSink' }] };
}

/** `check CASE... --json` with several cases: one entry per case, its file beside its document, or its error. */
function checkManySchema(): Schema {
  const withFile = (ref: string): Schema => ({
    type: 'object',
    allOf: [{ $ref: ref }],
    properties: { file: str },
    required: ['file'],
    unevaluatedProperties: false,
  });
  const fin = finCheck();
  const sink = sinkCheck();
  // The single-case mappings without their own additionalProperties, so that `file` is allowed beside them.
  const open = (s: Schema): Schema => {
    const { additionalProperties: _closed, ...rest } = s;
    return rest;
  };
  return {
    $defs: { fin: open(fin), heatSink: open(sink) },
    type: 'array',
    items: {
      oneOf: [withFile('#/$defs/fin'), withFile('#/$defs/heatSink'), obj({ file: str, error: obj({ exitCode: { enum: [2, 3] }, message: str }) })],
    },
  };
}

const profilePoint: Schema = { oneOf: [obj({ x_m: num, T_degC: num }), obj({ r_m: num, T_degC: num })] };

/** `solve --json`: fd-1d (profile) or fd-2d (centreline and surface). */
function solveSchema(): Schema {
  const common = {
    case: str,
    heatRate_W: num,
    efficiency: nullable(num),
    efficiencyNote: nullable(str),
    effectiveness: nullable(num),
    effectivenessNote: nullable(str),
    baseTemperature_degC: num,
    tipTemperature_degC: num,
    energyBalance: num,
    discretizationError: nullable(num),
    observedOrder: nullable(num),
    warnings: arr(warning),
  };
  const newton = obj({
    stepsPerGrid: arr(int),
    finest: obj({
      iterations: int,
      totalIterations: int,
      coarseGridIterations: int,
      halvings: int,
      continuationStages: int,
      residual: num,
      heatRateChange: num,
    }),
  });
  const oneD = obj({ ...common, model: { const: 'fd-1d' }, grid: obj({ nodes: int }), profileStride: int, profile: arr(profilePoint) });
  const twoD = obj({
    ...common,
    model: { const: 'fd-2d' },
    grid: obj({ nx: int, ny: int }),
    heatRateFrom: oneOfWords('extrapolated', 'finest-grid'),
    finestGridHeatRate_W: num,
    finestGridDiscretizationError: nullable(num),
    sectionHeatRate_W: num,
    edgesHeatRate_W: num,
    newton: nullable(newton),
    centreline: arr(profilePoint),
    surface: arr(profilePoint),
  });
  // A heat sink (fd-3d on its three nested grids).
  const sink = obj({
    case: str,
    kind: { const: 'heat-sink' },
    model: { const: 'fd-3d' },
    finModel: str,
    unknowns: arr(int),
    sources: arr(
      obj({
        name: str,
        power_W: num,
        meanTemperature_degC: num,
        meanDiscretizationError: nullable(num),
        observedOrder: nullable(num),
        maxTemperature_degC: num,
        maxDiscretizationError: nullable(num),
      }),
    ),
    fins: arr(obj({ index: int, heatRate_W: num, heatRateDiscretizationError: nullable(num), rootTemperature_degC: num })),
    plateTopMeanTemperature_degC: num,
    plateTopMeanDiscretizationError: nullable(num),
    sinkResistance_KperW: num,
    sinkResistanceDiscretizationError: nullable(num),
    totalHeat_W: num,
    finsHeat_W: num,
    plateHeat_W: num,
    energyBalance: num,
    solver: obj({ method: str, iterations: int, relativeResidual: num }),
    cautions: arr(str),
    warnings: arr(warning),
  });
  return { oneOf: [oneD, twoD, sink] };
}

/** `map --json` (the content of map.json). */
function mapSchema(): Schema {
  const axis = obj({ key: str, unit: str, log: bool, values: arr(num), caseValue: nullable(num) });
  // A heat-sink map adds the sink's resistance and hottest temperature (reference) and each model's resistance and worst source.
  const reference = obj(
    {
      model: oneOfWords('fd-1d', 'fd-2d', 'fd-3d'),
      heatRate_W: num,
      efficiency: nullable(num),
      discretizationError: num,
      resolved: bool,
      sinkResistance_KperW: num,
      maxTemperature_degC: num,
    },
    ['sinkResistance_KperW', 'maxTemperature_degC'],
  );
  const model = obj({ model: str, heatRate_W: num, efficiency: nullable(num), drift: num, verdict, sinkResistance_KperW: num, worstSource: str }, [
    'sinkResistance_KperW',
    'worstSource',
  ]);
  const solved = obj({ x: nullable(num), y: nullable(num), biot: nullable(num), mL: nullable(num), reference, models: arr(model) });
  return obj(
    {
      case: str,
      reference: oneOfWords('fd-1d', 'fd-2d', 'fd-3d'),
      tolerance: num,
      x: axis,
      y: axis,
      models: arr(str),
      shortcutGuess: nullable(oneOfWords('base')),
      casePoint: solved,
      summary: obj({
        points: int,
        solved: int,
        errors: int,
        errorGroups: arr(obj({ example: str, count: int })),
        references: arr(obj({ model: str, points: int, unresolved: int })),
        models: arr(
          obj({
            model: str,
            ok: int,
            marginal: int,
            unsafe: int,
            unresolved: int,
            missing: int,
            minDrift: nullable(num),
            maxDrift: nullable(num),
          }),
        ),
      }),
      cautions: arr(str),
      warnings: arr(warning),
      points: arr({ oneOf: [solved, obj({ x: num, y: num, error: str })] }),
      files: described(arr(str), 'The files the map wrote into its folder (map.json and the printed document alike)'),
    },
    ['files'],
  );
}

/** `optimize --json`. */
function optimizeSchema(): Schema {
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
