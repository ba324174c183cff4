/**
 * A validated heat-sink case file (SI numbers, heat-sink-schema.ts) to the normalised HeatSinkCase of
 * heat-sink-types.ts.
 *
 * Defaults: array.pitch = plate.width / count; pins.pattern inline; plate.material = material; a source's name
 * `source i` (0-based); contactResistance 0; convection.plate = h at the fin root (heat-sink-checks.ts rootH);
 * convection.underside adiabatic; tip convective (the local face h). Straight fins get width = plate.length.
 */
import { caseName } from './case-name.js';
import { rootH } from './heat-sink-checks.js';
import type { ValidatedHeatSink } from './heat-sink-schema.js';
import type { ArrayFinProfile, FinArray, HeatSinkCase } from './heat-sink-types.js';
import { toH, toMaterial, toTip } from './normalise.js';

type SinkFin = NonNullable<ValidatedHeatSink['fin']>;

export function toArrayFinProfile(fin: SinkFin, plateLength: number): ArrayFinProfile {
  switch (fin.profile) {
    case 'rectangular':
      return { kind: 'rectangular', length: fin.length, thickness: fin.thickness, width: plateLength };
    case 'trapezoidal':
      return { kind: 'trapezoidal', length: fin.length, baseThickness: fin.baseThickness, tipThickness: fin.tipThickness, width: plateLength };
    case 'triangular':
    case 'parabolic-concave':
    case 'parabolic-convex':
      return { kind: fin.profile, length: fin.length, baseThickness: fin.baseThickness, width: plateLength };
    case 'pin':
      return { kind: 'pin', length: fin.length, diameter: fin.diameter };
    case 'conical-pin':
      return { kind: 'conical-pin', length: fin.length, baseDiameter: fin.baseDiameter, tipDiameter: fin.tipDiameter };
    case 'tabulated': {
      const x = Float64Array.from(fin.points, (p) => p[0]);
      const size = Float64Array.from(fin.points, (p) => p[1]);
      return fin.shape === 'straight'
        ? { kind: 'tabulated', shape: 'straight', x, size, width: plateLength }
        : { kind: 'tabulated', shape: 'pin', x, size };
    }
    default: {
      const never: never = fin;
      throw new Error(`unknown profile ${String(never)}`);
    }
  }
}

function toFinArray(array: ValidatedHeatSink['array'], plateWidth: number): FinArray {
  if (array.pins !== undefined) {
    const { rows, columns, pitch, pattern } = array.pins;
    return { kind: 'pins', rows, columns, pitch: [pitch[0], pitch[1]], pattern: pattern ?? 'inline' };
  }
  const count = array.count ?? 0;
  return { kind: 'plates', count, pitch: array.pitch ?? (count > 0 ? plateWidth / count : plateWidth) };
}

/** The normalised case; `validated` has passed checkHeatSink (material present where needed, h where fins need it). */
export function toHeatSinkCase(validated: ValidatedHeatSink, defaultName: string): HeatSinkCase {
  const { plate, convection } = validated;
  const array = toFinArray(validated.array, plate.width);
  const hasFins = array.kind === 'pins' || array.count > 0;
  const finMaterial = validated.material ?? plate.material;
  if (finMaterial === undefined) throw new Error('toHeatSinkCase: a case without material passed the checks');
  const fin =
    hasFins && validated.fin !== undefined ? { profile: toArrayFinProfile(validated.fin, plate.length), material: toMaterial(finMaterial) } : null;
  const h = convection.h ?? convection.plate ?? 0;
  return {
    kind: 'heat-sink',
    name: caseName(validated.name, defaultName).name,
    fin,
    array,
    plate: { width: plate.width, length: plate.length, thickness: plate.thickness, material: toMaterial(plate.material ?? finMaterial) },
    sources: validated.sources.map((s, i) => ({
      name: s.name !== undefined && s.name.trim() !== '' ? caseName(s.name, `source ${i}`).name : `source ${i}`,
      power: s.power,
      centre: [s.centre[0], s.centre[1]],
      size: [s.size[0], s.size[1]],
      contactResistance: s.contactResistance ?? 0,
      limit_degC: s.limit ?? null,
    })),
    convection: {
      ambient_degC: convection.ambient,
      h: toH(h),
      tip: toTip(convection.tip),
      plate: convection.plate ?? rootH(h),
      underside: typeof convection.underside === 'number' ? convection.underside : null,
    },
  };
}
