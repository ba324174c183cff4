/**
 * The numeric inputs of a heat-sink case that its source temperature rises depend on, by the key paths of the
 * heat-sink case file (numeric-inputs.ts does the same for one fin), each with its nominal value and a way to
 * scale it. `check` differentiates the hottest source's mean rise with respect to each (d ln rise / d ln x) and a
 * sink case's `uncertainty` key may name any of them.
 *
 * Choices (stated once, here):
 * - `convection.h` scales every convective coefficient of the sink together (the fins' faces and tips, the plate's
 *   exposed top, the underside): they come from one correlation, so their errors go together. `convection.plate`
 *   and `convection.underside` are also inputs of their own (that surface alone).
 * - `material.k` scales the fins' conductivity, and the plate's when the plate has no material of its own;
 *   `plate.material.k` is the plate's alone when it has.
 * - Fin dimensions are the profile's keys (`fin.thickness`, `fin.length`, ...); a plate fin's width is the plate's
 *   length and is not an input of its own.
 * Units: SI; a source's power in W.
 */
import type { HeatSinkCase } from './heat-sink-types.js';
import { dimensionRange, dimensions, make, scaleH, type NumericInput } from './numeric-inputs.js';
import type { Material, Profile } from './types.js';

export function sinkNumericInputs(c: HeatSinkCase): NumericInput<HeatSinkCase>[] {
  const out: NumericInput<HeatSinkCase>[] = [];
  const conv = c.convection;
  const scaleTip = (f: number): HeatSinkCase['convection']['tip'] =>
    conv.tip.kind === 'convective' && conv.tip.h !== null ? { kind: 'convective', h: conv.tip.h * f } : conv.tip;
  const hNominal = conv.h.kind === 'uniform' ? conv.h.h : conv.h.kind === 'points' ? Number.NaN : conv.h.base;
  out.push(
    make('convection.h', 'heatTransferCoefficient', c.fin === null ? conv.plate : hNominal, (f) => ({
      ...c,
      convection: {
        ...conv,
        h: scaleH(conv.h, f),
        tip: scaleTip(f),
        plate: conv.plate * f,
        underside: conv.underside === null ? null : conv.underside * f,
      },
    })),
  );
  if (c.fin !== null && conv.plate > 0)
    out.push(make('convection.plate', 'heatTransferCoefficient', conv.plate, (f) => ({ ...c, convection: { ...conv, plate: conv.plate * f } })));
  const under = conv.underside;
  if (under !== null && under > 0)
    out.push(make('convection.underside', 'heatTransferCoefficient', under, (f) => ({ ...c, convection: { ...conv, underside: under * f } })));

  const scaleMaterial = (m: Material, f: number): Material => ({
    ...m,
    k: m.k.kind === 'constant' ? { kind: 'constant', k: m.k.k * f } : { ...m.k, k: m.k.k.map((v) => v * f) },
  });
  const kOf = (m: Material): number => (m.k.kind === 'constant' ? m.k.k : Number.NaN);
  const fin = c.fin;
  const shared =
    fin === null || fin.material === c.plate.material || (fin.material.name === c.plate.material.name && kOf(fin.material) === kOf(c.plate.material));
  if (fin !== null) {
    out.push(
      make('material.k', 'conductivity', kOf(fin.material), (f) => ({
        ...c,
        fin: { ...fin, material: scaleMaterial(fin.material, f) },
        plate: shared ? { ...c.plate, material: scaleMaterial(c.plate.material, f) } : c.plate,
      })),
    );
  }
  if (fin === null || !shared) {
    out.push(
      make(fin === null ? 'material.k' : 'plate.material.k', 'conductivity', kOf(c.plate.material), (f) => ({
        ...c,
        plate: { ...c.plate, material: scaleMaterial(c.plate.material, f) },
      })),
    );
  }

  out.push(make('plate.thickness', 'length', c.plate.thickness, (f) => ({ ...c, plate: { ...c.plate, thickness: c.plate.thickness * f } })));
  if (fin !== null) {
    for (const [name, value] of dimensions(fin.profile)) {
      if (!(value > 0) || name === 'width') continue;
      const scaled = (f: number): HeatSinkCase => ({
        ...c,
        fin: { ...fin, profile: { ...fin.profile, [name]: value * f } as Exclude<Profile, { kind: 'annular' }> },
      });
      out.push(make(`fin.${name}`, 'length', value, scaled, dimensionRange(fin.profile, name)));
    }
  }
  c.sources.forEach((s, i) => {
    const withSource = (next: HeatSinkCase['sources'][number]): HeatSinkCase => ({ ...c, sources: c.sources.map((t, j) => (j === i ? next : t)) });
    out.push(make(`sources[${i}].power`, 'power', s.power, (f) => withSource({ ...s, power: s.power * f })));
    if (s.contactResistance > 0)
      out.push(
        make(`sources[${i}].contactResistance`, 'contactResistance', s.contactResistance, (f) =>
          withSource({ ...s, contactResistance: s.contactResistance * f }),
        ),
      );
  });
  return out;
}
