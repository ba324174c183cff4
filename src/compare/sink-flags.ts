/**
 * Flags of a heat-sink check, from the fd-3d reference:
 *   spreading-dominates  the plate's share of the hottest source's resistance: (T_source,mean - interface drop -
 *                        T_plate,top mean) / (T_source,mean - T_ambient); info above 0.25, warning above 0.5 (common
 *                        practice, no source: beyond a quarter, a uniform-base estimate misses a large part)
 *   idle-fins            fins carrying less than a quarter of the busiest fin's heat (common practice, no source):
 *                        info, warning when they are a quarter or more of the fins
 *   over-limit           a source whose maximum temperature exceeds its `limit` (error, with the margin), or comes
 *                        within the reference's own uncertainty of it (warning)
 *   underside-ignored    an underside h that no shortcut sees (info)
 *   unresolved-reference the reference's GCI above a tenth of the tolerance: no verdict (warning)
 */
import type { HeatSinkCase } from '../case/index.js';
import type { SinkStudy } from '../fd/index.js';
import type { SinkReferenceResult } from './sink-types.js';
import type { Flag } from './types.js';

export const SPREADING_INFO_SHARE = 0.25;
export const SPREADING_WARNING_SHARE = 0.5;
export const IDLE_FIN_SHARE = 0.25;

const fmt = (x: number, digits = 3): string => x.toPrecision(digits);

export function sinkFlags(c: HeatSinkCase, reference: SinkStudy, judged: SinkReferenceResult): Flag[] {
  const flags: Flag[] = [];
  const ambient = c.convection.ambient_degC;

  // Spreading: the hottest source's rise that is spent inside the plate.
  let hot = 0;
  reference.sources.forEach((s, j) => {
    if (s.meanRise_K > (reference.sources[hot]?.meanRise_K ?? -Infinity)) hot = j;
  });
  const source = c.sources[hot];
  const result = reference.sources[hot];
  if (source !== undefined && result !== undefined && result.meanRise_K > 0) {
    const contactDrop = (source.contactResistance * source.power) / (source.size[0] * source.size[1]);
    const share = (result.meanRise_K - contactDrop - (reference.plateTopMean_degC - ambient)) / result.meanRise_K;
    if (share > SPREADING_INFO_SHARE) {
      flags.push({
        flag: 'spreading-dominates',
        severity: share > SPREADING_WARNING_SHARE ? 'warning' : 'info',
        value: share,
        message: `fd-3d: ${fmt(100 * share, 3)} % of ${result.name}'s rise is spent spreading through the plate (its mean against the plate top's mean): a uniform base temperature misses it; a thicker or more conductive plate, or a larger footprint, lowers it`,
      });
    }
  }

  // Fins that carry little heat.
  const busiest = Math.max(0, ...reference.fins.map((f) => f.heatRate_W));
  if (busiest > 0) {
    const idle = reference.fins.filter((f) => f.heatRate_W < IDLE_FIN_SHARE * busiest);
    if (idle.length > 0) {
      const list = idle.slice(0, 12).map((f) => f.index);
      const more = idle.length > list.length ? ` and ${idle.length - list.length} more` : '';
      flags.push({
        flag: 'idle-fins',
        severity: idle.length >= 0.25 * reference.fins.length ? 'warning' : 'info',
        value: idle.length,
        message: `fd-3d: ${idle.length} of ${reference.fins.length} fins carry less than a quarter of the busiest fin's ${fmt(busiest)} W (fins ${list.join(', ')}${more}): far from the sources they add area but little cooling`,
      });
    }
  }

  // Limits.
  reference.sources.forEach((r, j) => {
    const limit = c.sources[j]?.limit_degC ?? null;
    if (limit === null) return;
    const margin = limit - r.maxTemperature_degC;
    const uncertainty = (r.discretizationError ?? 0) * r.meanRise_K;
    if (margin < 0) {
      flags.push({
        flag: 'over-limit',
        severity: 'error',
        value: margin,
        message: `${r.name}: fd-3d maximum ${r.maxTemperature_degC.toFixed(1)} degC is ${fmt(-margin)} K above its limit ${limit} degC`,
      });
    } else if (margin <= uncertainty) {
      flags.push({
        flag: 'over-limit',
        severity: 'warning',
        value: margin,
        message: `${r.name}: fd-3d maximum ${r.maxTemperature_degC.toFixed(1)} degC is ${fmt(margin)} K below its limit ${limit} degC, within the reference's own uncertainty (${fmt(uncertainty)} K)`,
      });
    }
  });

  if (c.convection.underside !== null) {
    flags.push({
      flag: 'underside-ignored',
      severity: 'info',
      value: c.convection.underside,
      message: `the underside h (${c.convection.underside} W/(m^2*K)) is in fd-3d only: every shortcut takes the underside as adiabatic`,
    });
  }

  if (!judged.resolved) {
    flags.push({
      flag: 'unresolved-reference',
      severity: 'warning',
      value: judged.discretizationError ?? Number.NaN,
      message: `fd-3d's estimated error ${judged.discretizationError === null ? 'is unknown (a single grid)' : judged.discretizationError.toExponential(1)} is above a tenth of the tolerance (${judged.target.toExponential(1)}): no verdicts`,
    });
  }
  return flags;
}

/** The cautions of a heat-sink check: those of every design output, and what the sink model leaves out. */
export function sinkCautions(base: readonly string[]): string[] {
  return [
    ...base,
    'The plate\u2019s four narrow edges and the plate fins\u2019 end faces are taken as adiabatic; each surface has one h (or the given h form along the fins), while the real h varies between fins and along the flow.',
    'Sources are isoflux rectangles; a real package spreads its heat unevenly, and its junction temperature needs the package\u2019s own resistance on top of the source temperature shown.',
  ];
}
