/**
 * The assumption ledger of a heat sink (heat-sink.md): each row is the drift one assumption causes alone,
 * measured from the shortcuts' own differences, on the hottest source's mean rise (by the reference), relative to
 * the reference's rise, except the 1-D fin row, which is measured on the fins' total heat.
 *
 *   the fin-efficiency shortcut  overall-efficiency - overall-efficiency-exact-fin (same base model, textbook vs exact fin)
 *   uniform base temperature     overall-efficiency-exact-fin - spreading-series (same fins and h, without and with spreading)
 *   finned face as a uniform h   spreading-series - fd-3d (what remains: the fins' heat smeared over the face, the
 *                                fins' own conduction as 1-D, the underside h the series leaves out)
 *   fins as 1-D fins             sum of G_f theta_root,i (the exact 1-D fin at each fin's fd-3d mean root temperature) vs the
 *                                fd-3d fins' heat
 *   exposed-plate h              the exact-fin uniform-base model with the fins' mean h on the exposed plate (one h
 *                                everywhere, the textbook habit) vs with the given plate h
 */
import type { HeatSinkCase } from '../case/index.js';
import type { SinkStudy } from '../fd/index.js';
import type { SinkShortcutId, SinkShortcuts } from './sink-models.js';
import type { SinkAssumptionRow } from './sink-types.js';

function hottest(reference: SinkStudy): number {
  let best = 0;
  reference.sources.forEach((s, j) => {
    if (s.meanRise_K > (reference.sources[best]?.meanRise_K ?? -Infinity)) best = j;
  });
  return best;
}

export function sinkLedger(c: HeatSinkCase, reference: SinkStudy, shortcuts: SinkShortcuts): SinkAssumptionRow[] {
  const j = hottest(reference);
  const ref = reference.sources[j]?.meanRise_K ?? NaN;
  const name = reference.sources[j]?.name ?? `source ${j}`;
  const rise = (model: SinkShortcutId): number => shortcuts.models.find((m) => m.model === model)?.sourceRise_K[j] ?? NaN;
  const on = `on the mean rise of ${name} (the hottest source by fd-3d), relative to fd-3d's`;
  const bare = c.fin === null;
  const rows: SinkAssumptionRow[] = [
    {
      assumption: 'the fin-efficiency shortcut tanh(mLc)/(mLc)',
      drift: bare ? null : (rise('overall-efficiency') - rise('overall-efficiency-exact-fin')) / ref,
      madeBy: ['overall-efficiency'],
      method: bare ? 'a bare plate has no fins' : `overall-efficiency minus overall-efficiency-exact-fin, ${on}`,
    },
    {
      assumption: 'uniform base temperature (no spreading in the plate)',
      drift: (rise('overall-efficiency-exact-fin') - rise('spreading-series')) / ref,
      madeBy: ['overall-efficiency', 'overall-efficiency-exact-fin'],
      method: `overall-efficiency-exact-fin minus spreading-series (the same fins and h, without and with spreading), ${on}`,
    },
    {
      assumption: 'the finned face as a uniform h (fin roots smeared over the plate)',
      drift: (rise('spreading-series') - ref) / ref,
      madeBy: ['overall-efficiency', 'overall-efficiency-exact-fin', 'spreading-series'],
      method: `spreading-series minus fd-3d, ${on}; it also holds the fins' 1-D conduction${c.convection.underside !== null ? ' and the underside h the series leaves out' : ''}`,
    },
  ];
  const exact = shortcuts.exactFin;
  const finHeat = reference.fins.reduce((s, f) => s + f.heatRate_W, 0);
  if (exact === null || reference.fins.length === 0 || !(finHeat > 0)) {
    rows.push({
      assumption: 'fins as 1-D fins',
      drift: null,
      madeBy: [],
      method: bare ? 'a bare plate has no fins' : 'the reference reports no fin heat',
    });
  } else {
    const oneD = reference.fins.reduce((s, f) => s + exact.conductance_WperK * (f.rootTemperature_degC - c.convection.ambient_degC), 0);
    rows.push({
      assumption: 'fins as 1-D fins',
      drift: (oneD - finHeat) / finHeat,
      madeBy: ['overall-efficiency', 'overall-efficiency-exact-fin', 'spreading-series'],
      method:
        "on the fins' total heat: the exact 1-D fin at each fin's fd-3d mean root temperature against the fd-3d fins' heat (linear in the root excess)" +
        (c.convection.h.kind === 'power' || c.plate.material.k.kind !== 'constant'
          ? "; the fin's conductance is taken at the shortcut's base temperature, so with a power-law h or k(T) this row also holds their nonlinearity"
          : ''),
    });
  }
  const single = shortcuts.singleH;
  if (single === null) {
    rows.push({ assumption: 'exposed-plate h', drift: null, madeBy: [], method: 'a bare plate: the plate h is the only h' });
  } else {
    const same = Math.abs(single.h_W_per_m2K - c.convection.plate) <= 1e-12 * Math.max(single.h_W_per_m2K, 1);
    rows.push({
      assumption: 'exposed-plate h',
      drift: ((single.sourceRise_K[j] ?? NaN) - rise('overall-efficiency-exact-fin')) / ref,
      madeBy: [],
      method: same
        ? `the plate h given equals the fins' mean h (${single.h_W_per_m2K.toPrecision(4)} W/(m^2*K)): one h everywhere costs nothing here`
        : `the textbook habit of one h everywhere: overall-efficiency-exact-fin with the fins' mean h (${single.h_W_per_m2K.toPrecision(4)} W/(m^2*K)) on the exposed plate instead of the given ${c.convection.plate.toPrecision(4)}, ${on}`,
    });
  }
  return rows;
}
