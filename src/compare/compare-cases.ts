/**
 * Several cases side by side (`check a.yaml b.yaml ...`): one row per case with its reference and each shortcut's
 * drift and verdict, a column per model id present. A single fin shows its reference heat rate Q; a heat sink its
 * hottest source's mean temperature and its sink resistance (hottest point). Efficiency: the reference's fin
 * efficiency, or a sink's realised overall efficiency. A case that could not be checked keeps its row, with the
 * reason and no numbers.
 *
 * The table is plain data (`comparisonTable`), rendered as text or CSV in the display units given.
 */
import { inUnit, type DisplayUnits } from '../case/index.js';
import { signedPercentText } from './percent-text.js';
import type { SinkCheckReport } from './sink-types.js';
import type { CheckReport, Verdict } from './types.js';

/** One case's outcome: a fin's or a sink's check report, or why it could not be checked (exit code 2 or 3). */
export type CaseOutcome =
  | { file: string; kind: 'fin'; report: CheckReport }
  | { file: string; kind: 'heat-sink'; report: SinkCheckReport }
  | { file: string; kind: 'failed'; exitCode: number; message: string };

export interface ComparisonCell {
  drift: number;
  verdict: Verdict;
}

export interface ComparisonRow {
  file: string;
  /** The case's name, or null when it could not be read. */
  case: string | null;
  kind: CaseOutcome['kind'];
  /** fd-1d, fd-2d or fd-3d. */
  reference: string | null;
  heatRate_W: number | null;
  hottestSourceMean_degC: number | null;
  sinkResistance_KperW: number | null;
  efficiency: number | null;
  /** Per column id (model id, with the h guess for nonlinear fins: `tanh-L (base h)`). */
  models: Record<string, ComparisonCell>;
  /** Why the case has no numbers (the error message), else null. */
  error: string | null;
}

export interface ComparisonTable {
  columns: string[];
  rows: ComparisonRow[];
}

function rowOf(outcome: CaseOutcome): ComparisonRow {
  const empty = { heatRate_W: null, hottestSourceMean_degC: null, sinkResistance_KperW: null, efficiency: null, models: {}, error: null };
  switch (outcome.kind) {
    case 'fin': {
      const r = outcome.report;
      const models: Record<string, ComparisonCell> = {};
      for (const m of r.models) models[m.guess ? `${m.model} (${m.guess} h)` : m.model] = { drift: m.drift, verdict: m.verdict };
      return {
        ...empty,
        file: outcome.file,
        case: r.case,
        kind: 'fin',
        reference: r.reference.model,
        heatRate_W: r.reference.heatRate_W,
        efficiency: r.reference.efficiency,
        models,
      };
    }
    case 'heat-sink': {
      const r = outcome.report;
      const models: Record<string, ComparisonCell> = {};
      for (const m of r.models) models[m.model] = { drift: m.drift, verdict: m.verdict };
      const hottest = r.sources.reduce<number | null>((t, s) => (t === null || s.meanTemperature_degC > t ? s.meanTemperature_degC : t), null);
      return {
        ...empty,
        file: outcome.file,
        case: r.case,
        kind: 'heat-sink',
        reference: 'fd-3d',
        hottestSourceMean_degC: hottest,
        sinkResistance_KperW: r.sinkResistance_KperW,
        efficiency: r.overallEfficiency,
        models,
      };
    }
    case 'failed':
      return { ...empty, file: outcome.file, case: null, kind: 'failed', reference: null, error: outcome.message };
    default: {
      const never: never = outcome;
      throw new Error(`comparison: unknown outcome ${String(never)}`);
    }
  }
}

/** The table of several outcomes, in their order; columns: every model id present, in order of first appearance. */
export function comparisonTable(outcomes: readonly CaseOutcome[]): ComparisonTable {
  const rows = outcomes.map(rowOf);
  const columns: string[] = [];
  for (const row of rows) for (const id of Object.keys(row.models)) if (!columns.includes(id)) columns.push(id);
  return { columns, rows };
}

const sig = (x: number, n = 5): string => (Math.abs(x) >= 1e5 || (Math.abs(x) < 1e-3 && x !== 0) ? x.toExponential(n - 1) : x.toPrecision(n));
const pad = (s: string, n: number): string => (s.length >= n ? s : s + ' '.repeat(n - s.length));
const lpad = (s: string, n: number): string => (s.length >= n ? s : ' '.repeat(n - s.length) + s);

/** The headers of the quantity columns, with their display units. */
function quantityHeaders(u: DisplayUnits): string[] {
  return [`Q [${u.heat.ascii}]`, `hottest source mean [${u.temperature.ascii}]`, `sink resistance [${u.resistance.ascii}]`, 'efficiency [-]'];
}

function quantityCells(row: ComparisonRow, u: DisplayUnits): (number | null)[] {
  const shown = (unit: DisplayUnits[keyof Omit<DisplayUnits, 'system'>], x: number | null): number | null => (x === null ? null : inUnit(unit, x));
  return [shown(u.heat, row.heatRate_W), shown(u.temperature, row.hottestSourceMean_degC), shown(u.resistance, row.sinkResistance_KperW), row.efficiency];
}

/** The table for the terminal: a row per case, the shortcuts' drift and verdict per column, then the failed cases' reasons. */
export function formatComparison(table: ComparisonTable, tolerance: number, u: DisplayUnits): string {
  const checked = table.rows.filter((row) => row.error === null);
  // Only the quantity columns some case has (a table of single fins has no sink columns); the CSV keeps them all.
  const shownQuantities = quantityHeaders(u)
    .map((_, i) => i)
    .filter((i) => checked.some((row) => quantityCells(row, u)[i] !== null));
  const headers = quantityHeaders(u);
  const head = ['case', 'reference', ...shownQuantities.map((i) => headers[i] as string), ...table.columns];
  const body = table.rows.map((row) => {
    if (row.error !== null) return [row.file, 'not checked (see the error above)'];
    const values = quantityCells(row, u);
    const quantities = shownQuantities.map((i) => {
      const x = values[i] ?? null;
      return x === null ? '-' : i === 1 ? x.toFixed(2) : i === 3 ? x.toFixed(4) : sig(x);
    });
    const cells = table.columns.map((id) => {
      const cell = row.models[id];
      return cell === undefined ? '-' : `${signedPercentText(cell.drift)} ${cell.verdict}`;
    });
    return [row.case ?? row.file, row.reference ?? '-', ...quantities, ...cells];
  });
  const widths = head.map((h, j) => Math.max(h.length, ...body.filter((r) => r.length > 2).map((r) => (r[j] ?? '').length)));
  const line = (cells: string[]): string =>
    `  ${cells
      .map((c, j) => (j < 2 ? pad(c, widths[j] ?? 0) : lpad(c, widths[j] ?? 0)))
      .join('  ')
      .trimEnd()}`;
  const out = [
    `fincheck check: ${table.rows.length} cases (drift of each shortcut against its case's reference; tolerance +/-${(100 * tolerance).toFixed(1)} %)`,
  ];
  out.push(line(head));
  out.push(`  ${'-'.repeat(line(head).length - 2)}`);
  for (const cells of body) out.push(cells.length > 2 ? line(cells) : `  ${pad(cells[0] ?? '', widths[0] ?? 0)}  ${cells[1] ?? ''}`);
  out.push('  (a heat sink: the worst source decides its drift; Q is the reference heat rate of a single fin; efficiency: the fin');
  out.push("   efficiency of a single fin, the realised overall efficiency of a heat sink; each case's own check names the");
  out.push('   models, their accuracy and the cautions: estimates to be confirmed by test, h is usually the largest uncertainty)');
  return `${out.join('\n')}\n`;
}

function csvField(value: string | number | null): string {
  if (value === null) return '';
  const text = typeof value === 'number' ? (Number.isFinite(value) ? String(value) : '') : value;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/**
 * The table as CSV (RFC 4180 quoting, LF line ends): file, case, kind, reference, the quantities in the display
 * units named in the header, then per model column its drift [-] and verdict. Numbers in full.
 */
export function comparisonCsv(table: ComparisonTable, u: DisplayUnits): string {
  const header = ['file', 'case', 'kind', 'reference', ...quantityHeaders(u), ...table.columns.flatMap((id) => [`${id} drift [-]`, `${id} verdict`])];
  const lines = [header.map(csvField).join(',')];
  for (const row of table.rows) {
    const cells: (string | number | null)[] = [row.file, row.case, row.kind, row.reference, ...quantityCells(row, u)];
    for (const id of table.columns) {
      const cell = row.models[id];
      cells.push(cell ? cell.drift : null, cell ? cell.verdict : null);
    }
    lines.push(cells.map(csvField).join(','));
  }
  return `${lines.join('\n')}\n`;
}
