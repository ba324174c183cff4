/**
 * The one builder of heat-sink cases for the tests and benchmarks (normalised HeatSinkCase, SI units): a plate,
 * a fin array (or none), sources and convection; everything a test does not name takes a plain default
 * (ambient 20 degC, adiabatic tip, adiabatic underside, no contact resistance, plate h = fin h).
 * The inputs are invented unless the test names a source beside them.
 */
import type { ArrayFinProfile, FinArray, HDistribution, HeatSinkCase, TipCondition } from '../../../src/case/index.js';

export interface SourceInputs {
  readonly centre: readonly [number, number];
  readonly size: readonly [number, number];
  readonly power: number;
  readonly contactResistance?: number;
  readonly name?: string;
}

export interface SinkInputs {
  /** Plate [width x, length y, thickness z], m. */
  readonly plate: readonly [number, number, number];
  readonly kPlate: number;
  /** Fin conductivity; default kPlate. */
  readonly kFin?: number;
  readonly fin?: ArrayFinProfile | null;
  /** Default: a bare plate. */
  readonly array?: FinArray;
  readonly sources: readonly SourceInputs[];
  /** h on the fins (default uniform hPlate). */
  readonly h?: HDistribution;
  readonly hPlate: number;
  readonly hUnderside?: number | null;
  readonly tip?: TipCondition;
  readonly ambient_degC?: number;
}

const material = (k: number) => ({ name: 'custom', k: { kind: 'constant' as const, k }, source: 'given in the case file' });

export function sinkCase(inputs: SinkInputs): HeatSinkCase {
  const [width, length, thickness] = inputs.plate;
  const array = inputs.array ?? { kind: 'plates', count: 0, pitch: width };
  const fin = inputs.fin ?? null;
  return {
    kind: 'heat-sink',
    name: 'test sink',
    fin: fin === null ? null : { profile: fin, material: material(inputs.kFin ?? inputs.kPlate) },
    array,
    plate: { width, length, thickness, material: material(inputs.kPlate) },
    sources: inputs.sources.map((s, i) => ({
      name: s.name ?? `source ${i}`,
      power: s.power,
      centre: s.centre,
      size: s.size,
      contactResistance: s.contactResistance ?? 0,
      limit_degC: null,
    })),
    convection: {
      ambient_degC: inputs.ambient_degC ?? 20,
      h: inputs.h ?? { kind: 'uniform', h: inputs.hPlate },
      tip: inputs.tip ?? { kind: 'adiabatic' },
      plate: inputs.hPlate,
      underside: inputs.hUnderside ?? null,
    },
  };
}

/** A rectangular plate fin of the array (its width is the plate's length, as the case parser sets it). */
export function plateFin(height: number, thickness: number, plateLength: number): ArrayFinProfile {
  return { kind: 'rectangular', length: height, thickness, width: plateLength };
}

/**
 * A small sink of pins (2 x 3, inline) or three plate fins on a 20 x 16 x 3 mm plate, a linear h and one source with
 * a contact resistance: every kind of coupling the solvers handle, on a grid small enough for a dense reference.
 */
export function smallSink(kind: 'pins' | 'plates'): HeatSinkCase {
  return sinkCase({
    plate: [0.02, 0.016, 0.003],
    kPlate: 150,
    kFin: 200,
    fin: kind === 'pins' ? { kind: 'pin', length: 0.012, diameter: 0.003 } : plateFin(0.012, 0.002, 0.016),
    array: kind === 'pins' ? { kind: 'pins', rows: 2, columns: 3, pitch: [0.006, 0.007], pattern: 'inline' } : { kind: 'plates', count: 3, pitch: 0.006 },
    hPlate: 25,
    hUnderside: 5,
    h: { kind: 'linear', base: 60, tip: 30 },
    tip: { kind: 'convective', h: null },
    sources: [{ centre: [0.008, 0.007], size: [0.006, 0.006], power: 4, contactResistance: 1e-5 }],
  });
}
