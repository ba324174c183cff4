/** The schemas of `check --json`: a single fin, a heat sink, and several cases (outputs.md, heat-sink.md). */
import {
  num,
  int,
  str,
  bool,
  nullable,
  arr,
  oneOfWords,
  obj,
  verdict,
  finModelIds,
  shortcutIds,
  warning,
  flag,
  driftOverUncertainty,
  finSensitivity,
  finUncertainty,
  sinkSensitivity,
  sinkUncertainty,
  type Schema,
} from './schema-words.js';

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

export function checkSchema(): Schema {
  return { $defs: { fin: finCheck(), heatSink: sinkCheck() }, oneOf: [{ $ref: '#/$defs/fin' }, { $ref: '#/$defs/heatSink' }] };
}

/** `check CASE... --json` with several cases: one entry per case, its file beside its document, or its error. */
export function checkManySchema(): Schema {
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
