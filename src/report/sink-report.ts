/**
 * `fincheck report` on a heat sink: the sink check as a ReportDocument (document.ts), so the HTML, Markdown and
 * PDF writers render it as they render a fin's: cautions first, then the result, the case, the fd-3d reference
 * per source, the array shortcuts against it, the assumption ledger, the flags, the fins, the three sink charts
 * and the discretisation error. Every number names its model, its unit and its error estimate. Numbers are shown
 * in the case's display units (`c.display`; by default mm and SI); temperature rises in the display unit of a
 * temperature difference (K, or °F for a °F display).
 */
import { defaultDisplayUnits, inUnit, type DisplayUnit, type DisplayUnits, type HeatSinkCase } from '../case/index.js';
import { describeSink, type SinkCheckReport } from '../compare/index.js';
import { relativeError, sig, signedPercent, type SinkPlotInput } from '../plots/index.js';
import { prettyUnits } from './case-inputs.js';
import type { Block, ReportDocument, Section, Tone } from './document.js';
import { sinkUncertaintySection } from './sink-uncertainty-section.js';

/** One chart of a sink report: its file beside the Markdown, the SVG (the PDF draws it) and the PNG. */
export interface SinkReportFigure {
  kind: 'plate' | 'fin-heat' | 'profile' | 'sensitivity';
  file: string;
  title: string;
  caption: string;
  svg: string;
  png: Buffer;
  width_px: number;
  height_px: number;
}

export interface SinkReportInputs {
  input: SinkPlotInput;
  caseFile: string;
  figures: SinkReportFigure[];
  version: string;
  date: string;
}

const gci = (e: number | null): string => (e === null ? 'not estimated' : relativeError(e));
/** An input value as the case gave it (SI units: the number itself; others: converted, 6 significant figures). */
const asGiven = (unit: DisplayUnit, si: number): string =>
  unit.scale === 1 && unit.offset === 0 ? String(si) : String(Number(inUnit(unit, si).toPrecision(6)));

/** The number formats of a report in display units `u`, each with its unit. */
function shown(u: DisplayUnits) {
  return {
    temp: (t: number, digits: number): string => inUnit(u.temperature, t).toFixed(digits),
    rise: (d: number, digits?: number): string => sig(inUnit(u.temperatureDifference, d), digits),
    heat: (q: number): string => sig(inUnit(u.heat, q)),
    resistance: (r: number): string => sig(inUnit(u.resistance, r)),
    T: u.temperature.pretty,
    dT: u.temperatureDifference.pretty,
    W: u.heat.pretty,
    KW: u.resistance.pretty,
  };
}

function summary(r: SinkCheckReport, u: DisplayUnits): Block {
  const f = shown(u);
  const counts = { ok: 0, marginal: 0, unsafe: 0, unresolved: 0 };
  for (const m of r.models) counts[m.verdict]++;
  const hottest = r.sources.reduce((a, s) => (s.maxTemperature_degC > a.maxTemperature_degC ? s : a));
  const tone: Tone = !r.reference.resolved ? 'warning' : counts.unsafe > 0 ? 'unsafe' : counts.marginal > 0 ? 'marginal' : 'ok';
  const over = r.sources.filter((s) => s.margin_K !== null && s.margin_K < 0);
  const items = [
    `fd-3d: hottest point ${f.temp(hottest.maxTemperature_degC, 1)} ${f.T} on ${hottest.name}; sink resistance ${f.resistance(r.sinkResistance_KperW)} ${f.KW} (hottest point over the total power); estimated error of each source's mean rise at most ${gci(r.reference.discretizationError)} (GCI).`,
    r.reference.resolved
      ? `${r.models.length} array shortcuts checked on every source's mean rise at ±${(100 * r.tolerance).toFixed(1)} %: ${counts.ok} ok, ${counts.marginal} marginal, ${counts.unsafe} unsafe.`
      : `The reference is not resolved (error above a tenth of the tolerance, ${relativeError(r.reference.target)}): no verdicts (${counts.unresolved} unresolved).`,
    ...r.models.map((m) => `${m.model}: worst drift ${signedPercent(m.drift)} on ${m.worstSource} (${m.verdict}).`),
  ];
  if (over.length > 0) items.push(`Over its limit: ${over.map((s) => `${s.name} by ${f.rise(-(s.margin_K ?? 0), 3)} ${f.dT}`).join(', ')}.`);
  const title =
    tone === 'warning'
      ? 'Result: reference not resolved, no verdicts'
      : tone === 'ok'
        ? 'Result: every array shortcut within the tolerance'
        : tone === 'marginal'
          ? 'Result: some array shortcuts marginal'
          : 'Result: some array shortcuts unsafe';
  return { kind: 'callout', title, items, tone: over.length > 0 ? 'unsafe' : tone };
}

function caseRows(c: HeatSinkCase, u: DisplayUnits): Block {
  const lines = describeSink(c, u);
  const rows: [string, string, string][] = [];
  lines.forEach((line, k) => {
    const label =
      k === 0 ? 'Fins' : line.startsWith('plate ') ? 'Plate' : line.startsWith('source ') ? 'Source' : line.startsWith('ambient ') ? 'Convection' : 'Case';
    rows.push([label, prettyUnits(line), '']);
  });
  if (c.fin !== null) rows.push(['Fin material', `${c.fin.material.name}, ${materialK(c.fin.material.k, u)}`, prettyUnits(c.fin.material.source)]);
  rows.push(['Plate material', `${c.plate.material.name}, ${materialK(c.plate.material.k, u)}`, prettyUnits(c.plate.material.source)]);
  return {
    kind: 'table',
    caption: 'Inputs',
    columns: [
      { title: 'Quantity', align: 'left' },
      { title: 'Value', align: 'left' },
      { title: 'Note', align: 'left' },
    ],
    rows: rows.map((cells) => ({ cells })),
    notes: ['The plate’s four narrow edges and the plate fins’ end faces are adiabatic (small areas).'],
  };
}

function materialK(k: HeatSinkCase['plate']['material']['k'], u: DisplayUnits): string {
  return k.kind === 'constant' ? `k = ${+inUnit(u.k, k.k).toPrecision(4)} ${u.k.pretty}` : `k(T) table of ${k.k.length} points`;
}

function referenceBlocks(input: SinkPlotInput, u: DisplayUnits): Block[] {
  const r = input.report;
  const s = input.study;
  const f = shown(u);
  return [
    {
      kind: 'facts',
      caption: 'Reference model fd-3d',
      items: [
        [
          'Sink resistance',
          `${f.resistance(r.sinkResistance_KperW)} ${f.KW} (hottest point − ambient over ${f.heat(s.totalHeat_W)} ${f.W}; GCI ${gci(s.errors.sinkResistance)})`,
        ],
        ['Plate top, mean', `${f.temp(s.plateTopMean_degC, 2)} ${f.T} (GCI of its rise ${gci(s.errors.plateTopMeanRise)})`],
        ['Realised overall efficiency', `${sig(r.overallEfficiency)} (Q over h A_t (T̄_top − T_amb), every surface with its own h)`],
        ['Heat out', `fins ${f.heat(s.finsHeat_W)} ${f.W}, plate ${f.heat(s.plateHeat_W)} ${f.W}`],
        ['Energy balance', `${r.reference.energyBalance.toExponential(1)} (|Q_sources − Q_surfaces| / Q_sources)`],
        ['Grids', `${r.reference.unknowns.map((n) => n.toLocaleString('en-US')).join(' / ')} unknowns, finest first (refinement ratio 2)`],
        ['Fins', r.reference.finModel],
        ['How it was solved', prettyUnits(r.reference.note)],
      ],
    },
    {
      kind: 'table',
      caption: 'Sources (fd-3d; temperatures include each source’s interface drop)',
      columns: [
        { title: 'Source', align: 'left' },
        { title: `Power (${f.W})`, align: 'right' },
        { title: `Mean (${f.T})`, align: 'right' },
        { title: `Max (${f.T})`, align: 'right' },
        { title: `Mean rise (${f.dT})`, align: 'right' },
        { title: 'GCI of the mean rise', align: 'right' },
        { title: 'Limit', align: 'left' },
      ],
      rows: r.sources.map((x) => ({
        cells: [
          x.name,
          f.heat(x.power_W),
          f.temp(x.meanTemperature_degC, 2),
          f.temp(x.maxTemperature_degC, 2),
          f.rise(x.meanRise_K),
          gci(x.discretizationError),
          x.limit_degC === null || x.margin_K === null ? '–' : `${asGiven(u.temperature, x.limit_degC)} ${f.T} (margin ${f.rise(x.margin_K, 3)} ${f.dT})`,
        ],
        ...(x.margin_K !== null && x.margin_K < 0 ? { tone: 'unsafe' as Tone } : {}),
      })),
      notes: [],
    },
  ];
}

function checkBlocks(r: SinkCheckReport, u: DisplayUnits): Block[] {
  const f = shown(u);
  return [
    {
      kind: 'table',
      caption: `Array shortcuts against fd-3d on each source’s mean rise (tolerance ±${(100 * r.tolerance).toFixed(1)} %; the worst source decides)`,
      columns: [
        { title: 'Model', align: 'left' },
        ...r.sources.map((s) => ({ title: `${s.name}: rise (${f.dT}), drift`, align: 'right' as const })),
        { title: 'Worst drift', align: 'right' },
        { title: 'Verdict', align: 'left' },
        { title: 'Error estimate of the model’s own number', align: 'left' },
      ],
      rows: r.models.map((m) => ({
        cells: [
          m.model,
          ...m.sourceRise_K.map((rise, j) => `${f.rise(rise)} (${signedPercent(m.sourceDrift[j] ?? Number.NaN)})`),
          signedPercent(m.drift),
          m.verdict,
          prettyUnits(m.accuracy),
        ],
        tone: m.verdict === 'unresolved' ? 'warning' : m.verdict,
      })),
      notes: [
        'Drift = (rise_model − rise_fd-3d) / rise_fd-3d on each source’s mean temperature rise above ambient. The shortcuts predict mean rises only; fd-3d also gives the hottest point.',
      ],
    },
    {
      kind: 'list',
      items: r.models.map(
        (m) =>
          `${m.model}: ${prettyUnits(m.basis)}; eta_o ${m.overallEfficiency.toFixed(4)}${m.finEfficiency === null ? '' : `, eta_f ${m.finEfficiency.toFixed(4)}`}.`,
      ),
    },
  ];
}

function ledgerBlocks(r: SinkCheckReport): Block[] {
  return [
    {
      kind: 'table',
      caption: 'Drift caused by each assumption alone',
      columns: [
        { title: 'Assumption', align: 'left' },
        { title: 'Drift', align: 'right' },
        { title: 'Made by', align: 'left' },
        { title: 'How it was measured', align: 'left' },
      ],
      rows: r.assumptions.map((a) => ({
        cells: [a.assumption, a.drift === null ? 'n/a' : signedPercent(a.drift), a.madeBy.join(', ') || '–', prettyUnits(a.method)],
      })),
      notes: ['Rows measured against fd-3d carry its discretisation error (see Discretisation error).'],
    },
  ];
}

function flagBlocks(r: SinkCheckReport): Block[] {
  if (r.flags.length === 0)
    return [{ kind: 'paragraph', text: 'No flags: no source over its limit, no idle fins, spreading does not dominate, the grids converge.' }];
  const tone: Record<string, Tone> = { info: 'info', warning: 'warning', error: 'error' };
  return [
    {
      kind: 'table',
      caption: 'Design flags',
      columns: [
        { title: 'Severity', align: 'left' },
        { title: 'Flag', align: 'left' },
        { title: 'What it means', align: 'left' },
      ],
      rows: r.flags.map((f) => ({ cells: [f.severity, f.flag, prettyUnits(f.message)], tone: tone[f.severity] ?? 'info' })),
      notes: [],
    },
  ];
}

function finBlocks(input: SinkPlotInput, u: DisplayUnits): Block[] {
  const f = shown(u);
  const fins = input.study.fins;
  if (fins.length === 0) return [{ kind: 'paragraph', text: 'A bare plate: no fins.' }];
  return [
    {
      kind: 'table',
      caption: 'Heat per fin (fd-3d), numbered as in the JSON fins array',
      columns: [
        { title: 'Fin', align: 'right' },
        { title: `Heat (${f.W})`, align: 'right' },
        { title: 'GCI of the heat', align: 'right' },
        { title: `Root (${f.T})`, align: 'right' },
      ],
      rows: fins.map((fin, k) => ({
        cells: [String(fin.index), f.heat(fin.heatRate_W), gci(input.study.errors.finHeat[k] ?? null), f.temp(fin.rootTemperature_degC, 2)],
      })),
      notes: [],
    },
  ];
}

function discretisationBlocks(input: SinkPlotInput, u: DisplayUnits): Block[] {
  const dT = u.temperatureDifference;
  return input.study.sources.map((s) => {
    const st = s.refinement;
    return {
      kind: 'facts',
      caption: `fd-3d: mean rise of ${s.name} on each grid, finest first`,
      items:
        st === null
          ? [['Grids', 'one grid: no estimate']]
          : [
              [`Mean rise (${dT.pretty})`, st.values.map((v) => sig(inUnit(dT, v), 8)).join(' / ')],
              [`Cell size in x and y on the coarsest plan (${u.length.pretty})`, st.sizes.map((h) => sig(inUnit(u.length, h), 4)).join(' / ')],
              ['Observed order', st.observedOrder === null ? 'not determined' : st.observedOrder.toFixed(2)],
              ['Extrapolated rise', `${sig(inUnit(dT, st.extrapolated), 8)} ${dT.pretty}`],
              ['Estimated discretisation error (GCI, finest grid)', `${relativeError(st.gci)} relative`],
              ['How', st.note],
            ],
    };
  });
}

export function buildSinkReport(inputs: SinkReportInputs): ReportDocument {
  const { input, version, date } = inputs;
  const r = input.report;
  const u = input.case.display ?? defaultDisplayUnits;
  const fileName = inputs.caseFile.split(/[\\/]/).pop() ?? inputs.caseFile;
  const figures: Block[] = inputs.figures.map((f, k) => ({
    kind: 'figure',
    file: f.file,
    alt: `${f.title}: ${r.case}`,
    caption: `Figure ${k + 1}. ${f.caption}`,
    png: f.png,
    width_px: f.width_px,
    height_px: f.height_px,
  }));
  const tornado = inputs.figures.findIndex((f) => f.kind === 'sensitivity');
  const tornadoFigure = tornado < 0 ? null : `Figure ${tornado + 1}`;
  const sections: Section[] = [
    { id: 'summary', title: 'Summary', blocks: [summary(r, u)] },
    { id: 'case', title: 'The heat sink', blocks: [caseRows(input.case, u)] },
    { id: 'reference', title: 'The reference (fd-3d)', blocks: referenceBlocks(input, u) },
    { id: 'check', title: 'Array shortcuts against the reference', blocks: checkBlocks(r, u) },
    ...[sinkUncertaintySection(r, u, tornadoFigure)].filter((x): x is Section => x !== null),
    { id: 'ledger', title: 'Where the drift comes from', blocks: ledgerBlocks(r) },
    { id: 'flags', title: 'Flags', blocks: flagBlocks(r) },
    { id: 'fins', title: 'Fins', blocks: finBlocks(input, u) },
    { id: 'plots', title: 'Plots', blocks: figures },
    {
      id: 'discretisation',
      title: 'Discretisation error',
      blocks: [
        {
          kind: 'paragraph',
          text: 'fd-3d is solved on nested grids (every cell halved in x, y, z and along the fins); the Grid Convergence Index of the finest grid (Celik, Ghia, Roache, Freitas, Coleman & Raad 2008, J. Fluids Eng. 130(7), 078001) is the error estimate quoted beside each number.',
        },
        ...discretisationBlocks(input, u),
      ],
    },
  ];
  return {
    title: `Heat-sink check: ${r.case}`,
    byline: `fincheck ${version} · ${date} · case file ${fileName}`,
    front: [{ kind: 'callout', title: 'Cautions', items: r.cautions, tone: 'warning' }],
    sections,
    footer: `Generated by fincheck ${version} on ${date} from ${fileName}. Engineering estimates of an idealised heat sink: confirm the design by test.`,
  };
}
