/**
 * map.csv: one row per grid point, x fastest (the order of the JSON points), units in the header in brackets.
 * Columns: i, j, the two axis keys [their units], Bi [-], mL [-], the reference model, its heat rate [W] and
 * efficiency [-], then per shortcut its heat rate [W], drift [-] and verdict, and last the error of an invalid point
 * (empty otherwise; the result columns are then empty). Numbers are written in full (shortest round-trip form), so
 * the CSV holds the same values as the JSON. Fields holding a comma, quote or line break are quoted as RFC 4180 describes; lines end in LF.
 */
import type { MapRun } from './run-map.js';
import { isPointError, type MapAxis } from './types.js';

function field(value: string | number | null): string {
  if (value === null) return '';
  const text = typeof value === 'number' ? (Number.isFinite(value) ? String(value) : '') : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

function axisHeader(axis: MapAxis): string {
  return axis.displayUnit === '' ? `${axis.key} [-]` : `${axis.key} [${axis.displayUnit}]`;
}

export function mapCsv(run: MapRun): string {
  if (run.job.kind === 'heat-sink') return sinkMapCsv(run);
  const models = run.job.check.models;
  const header = [
    'i',
    'j',
    axisHeader(run.x),
    axisHeader(run.y),
    'Bi [-]',
    'mL [-]',
    'reference',
    'reference heatRate [W]',
    'reference efficiency [-]',
    ...models.flatMap((m) => [`${m} heatRate [W]`, `${m} drift [-]`, `${m} verdict`]),
    'error',
  ];
  const nx = run.x.values.length;
  const lines = [header.map(field).join(',')];
  for (const p of run.points) {
    const row: (string | number | null)[] = [p.index % nx, Math.floor(p.index / nx), p.x, p.y];
    if (isPointError(p)) {
      row.push(...new Array<null>(5 + 3 * models.length).fill(null), p.error);
    } else {
      row.push(p.biot, p.mL, p.reference.model, p.reference.heatRate_W, p.reference.efficiency);
      for (const id of models) {
        const m = p.models.find((r) => r.model === id);
        row.push(m ? m.heatRate_W : null, m ? m.drift : null, m ? m.verdict : null);
      }
      row.push(null);
    }
    lines.push(row.map(field).join(','));
  }
  return `${lines.join('\n')}\n`;
}

/**
 * map.csv of a heat sink: i, j, the two axis keys, then fd-3d's sink resistance [K/W], hottest temperature [degC],
 * realised overall efficiency [-] and GCI [-], per array shortcut its sink resistance [K/W], drift [-] (the worst
 * source's mean rise), verdict and worst source, and last the error of an invalid point.
 */
function sinkMapCsv(run: MapRun): string {
  const models = run.job.check.models;
  const header = [
    'i',
    'j',
    axisHeader(run.x),
    axisHeader(run.y),
    'fd-3d sinkResistance [K/W]',
    'fd-3d maxTemperature [degC]',
    'fd-3d overallEfficiency [-]',
    'fd-3d discretizationError [-]',
    ...models.flatMap((m) => [`${m} sinkResistance [K/W]`, `${m} drift [-]`, `${m} verdict`, `${m} worstSource`]),
    'error',
  ];
  const nx = run.x.values.length;
  const lines = [header.map(field).join(',')];
  for (const p of run.points) {
    const row: (string | number | null)[] = [p.index % nx, Math.floor(p.index / nx), p.x, p.y];
    if (isPointError(p)) {
      row.push(...new Array<null>(4 + 4 * models.length).fill(null), p.error);
    } else {
      const r = p.reference;
      row.push(r.sinkResistance_KperW ?? null, r.maxTemperature_degC ?? null, r.efficiency, r.discretizationError);
      for (const id of models) {
        const m = p.models.find((q) => q.model === id);
        row.push(m?.sinkResistance_KperW ?? null, m ? m.drift : null, m ? m.verdict : null, m?.worstSource ?? null);
      }
      row.push(null);
    }
    lines.push(row.map(field).join(','));
  }
  return `${lines.join('\n')}\n`;
}
