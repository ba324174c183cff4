/** The schemas of `solve --json` (fd-1d profile; fd-2d centreline and surface) and `map --json` (outputs.md). */
import { num, int, str, bool, nullable, arr, oneOfWords, described, obj, verdict, warning, type Schema } from './schema-words.js';

const profilePoint: Schema = { oneOf: [obj({ x_m: num, T_degC: num }), obj({ r_m: num, T_degC: num })] };

/** `solve --json`: fd-1d (profile) or fd-2d (centreline and surface). */
export function solveSchema(): Schema {
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
export function mapSchema(): Schema {
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
