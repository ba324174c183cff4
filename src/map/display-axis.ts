/**
 * A map shown in display units (`--units`): the two axes, the points' and the case's own coordinates converted from
 * the unit the sweep was written in to the display unit of their quantity (a length axis in in, h in
 * BTU/(h*ft^2*degF), ...). Drifts have no unit and stay. For the charts and the printed summary only: map.json and
 * map.csv keep the values in the unit the sweep was written in.
 */
import { inUnit, parseQuantity, type DisplayUnit, type DisplayUnits, type QuantityKind } from '../case/index.js';
import type { MapRun } from './run-map.js';
import { isPointError, type MapAxis, type MapPoint } from './types.js';

function displayUnitOf(kind: QuantityKind, u: DisplayUnits): DisplayUnit | null {
  switch (kind) {
    case 'length':
      return u.length;
    case 'temperature':
      return u.temperature;
    case 'temperatureDifference':
      return u.temperatureDifference;
    case 'heatTransferCoefficient':
      return u.h;
    case 'conductivity':
      return u.k;
    case 'power':
      return u.heat;
    case 'contactResistance':
    case 'dimensionless':
      return null;
    default: {
      const never: never = kind;
      throw new Error(`displayUnitOf: unknown kind ${String(never)}`);
    }
  }
}

/** The axis value `v` (in the axis's own unit) in `unit`. */
function converter(axis: MapAxis, unit: DisplayUnit): (v: number) => number {
  return (v) => {
    const si = axis.unit === '' ? { ok: true as const, value: v } : parseQuantity(`${v} ${axis.unit}`, axis.kind);
    return si.ok ? inUnit(unit, si.value) : Number.NaN;
  };
}

interface ShownAxis {
  axis: MapAxis;
  convert: (v: number) => number;
}

function shownAxis(axis: MapAxis, u: DisplayUnits): ShownAxis {
  const unit = displayUnitOf(axis.kind, u);
  if (unit === null) return { axis, convert: (v) => v };
  const convert = converter(axis, unit);
  return {
    axis: {
      ...axis,
      displayUnit: unit.ascii,
      values: Float64Array.from(axis.values, convert),
      caseValue: axis.caseValue === null ? null : convert(axis.caseValue),
    },
    convert,
  };
}

/** The run with its axes and coordinates in the display units `u`. */
export function runInDisplayUnits(run: MapRun, u: DisplayUnits): MapRun {
  const x = shownAxis(run.x, u);
  const y = shownAxis(run.y, u);
  const point = <P extends { x: number; y: number }>(p: P): P => ({ ...p, x: x.convert(p.x), y: y.convert(p.y) });
  const points: MapPoint[] = run.points.map((p) => (isPointError(p) ? point(p) : point(p)));
  return { ...run, x: x.axis, y: y.axis, casePoint: point(run.casePoint), points };
}
