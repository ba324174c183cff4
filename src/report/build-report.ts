/**
 * `fincheck report`: the check of one case as a ReportDocument (document.ts): cautions first, then the
 * case, the result, the check table, the assumption ledger, the flags, the plots and the
 * discretisation error. Every number names its model, its unit and its error estimate.
 */
import { defaultDisplayUnits, inUnit, type Case, type DisplayUnits } from '../case/index.js';
import type { CheckReport, Flag, ModelResult } from '../compare/index.js';
import { relativeError, sig, signedPercent, type CheckPlotInput } from '../plots/index.js';
import { caseInputRows, prettyUnits } from './case-inputs.js';
import { discretisationSection } from './discretisation.js';
import type { Block, ReportDocument, Section, Tone } from './document.js';
import { figureSection, type ReportFigure } from './figures.js';
import { uncertaintySection } from './uncertainty-section.js';
import type { FinStudy2D } from '../fd/index.js';

export interface ReportInputs {
  check: CheckPlotInput;
  /** The fd-2d study behind the heat map (the check's own when fd-2d is its reference), or null. */
  field: FinStudy2D | null;
  /** The case file's name as given (the report shows its base name only). */
  caseFile: string;
  figures: ReportFigure[];
  /** Why the heat map is missing, when it is. */
  heatmapUnavailable: string | null;
  version: string;
  /** ISO date, YYYY-MM-DD. */
  date: string;
}

const efficiency = (x: number | null): string => (x === null ? 'n/a' : x.toFixed(4));

/** A model's name in the tables; nonlinear fins list each shortcut with the h and k it was given. */
function modelName(m: ModelResult): string {
  if (m.guess === undefined) return m.model;
  return `${m.model} (${m.guess === 'base' ? 'h, k at the base' : 'h, k fin mean'})`;
}

/**
 * One exact sentence about the flags: the warnings (and errors) by name, and how many notes (info flags)
 * are listed below, e.g. "No warnings; 2 notes (long-fin, low-biot) listed under Flags."
 */
export function flagSummary(flags: readonly Flag[]): string {
  const count = (n: number, one: string, many: string): string => `${n} ${n === 1 ? one : many}`;
  const warnings = flags.filter((f) => f.severity !== 'info');
  const notes = flags.filter((f) => f.severity === 'info');
  const names = (list: readonly Flag[]): string => list.map((f) => f.flag).join(', ');
  const warned = warnings.length > 0 ? `${count(warnings.length, 'warning', 'warnings')} (${names(warnings)})` : 'No warnings';
  const noted = notes.length > 0 ? `${count(notes.length, 'note', 'notes')} (${names(notes)})` : 'no notes';
  return flags.length > 0 ? `${warned}; ${noted}; see Flags.` : `${warned}; ${noted}.`;
}

function summary(r: CheckReport, u: DisplayUnits): Block[] {
  const q = (w: number): string => `${sig(inUnit(u.heat, w), 5)} ${u.heat.pretty}`;
  const ref = r.reference;
  const counts = { ok: 0, marginal: 0, unsafe: 0, unresolved: 0 };
  for (const m of r.models) counts[m.verdict]++;
  const worst = [...r.models].sort((a, b) => Math.abs(b.drift) - Math.abs(a.drift))[0];
  const tone: Tone = !ref.resolved ? 'warning' : counts.unsafe > 0 ? 'unsafe' : counts.marginal > 0 ? 'marginal' : 'ok';
  const items = [
    `Reference ${ref.model}: heat rate Q = ${q(ref.heatRate_W)}, efficiency ${efficiency(ref.efficiency)}, effectiveness ${ref.effectiveness === null ? 'n/a' : sig(ref.effectiveness)}, tip ${inUnit(u.temperature, ref.tipTemperature_degC).toFixed(2)} ${u.temperature.pretty}; estimated discretisation error of Q ${relativeError(ref.discretizationError)} ${ref.heatRateFrom === 'extrapolated' ? `(relative, of the Richardson-extrapolated value; the finest grid's value ${q(ref.finestGridHeatRate_W)} has GCI ${relativeError(ref.finestGridDiscretizationError)})` : '(relative, GCI)'}.`,
    ref.resolved
      ? `${r.models.length} models checked against it at a tolerance of ±${(100 * r.tolerance).toFixed(1)} %: ${counts.ok} ok, ${counts.marginal} marginal, ${counts.unsafe} unsafe.`
      : `The reference is not resolved (estimated discretisation error above a tenth of the tolerance, ${relativeError(ref.resolution.target)}): no verdicts are given (${counts.unresolved} models unresolved).`,
  ];
  if (worst) items.push(`Largest drift: ${modelName(worst)}, ${signedPercent(worst.drift)} (Q = ${q(worst.heatRate_W)}, ${worst.verdict}).`);
  items.push(flagSummary(r.flags));
  return [
    {
      kind: 'callout',
      title:
        tone === 'warning'
          ? 'Result: reference not resolved, no verdicts'
          : tone === 'ok'
            ? 'Result: every shortcut within the tolerance'
            : tone === 'marginal'
              ? 'Result: some shortcuts marginal'
              : 'Result: some shortcuts unsafe',
      items,
      tone,
    },
  ];
}

function referenceFacts(r: CheckReport, u: DisplayUnits): Block {
  const W = u.heat;
  const ref = r.reference;
  const grid = 'nodes' in ref.grid ? `${ref.grid.nodes} nodes` : `${ref.grid.nx} × ${ref.grid.ny} nodes`;
  return {
    kind: 'facts',
    caption: `Reference model ${ref.model}`,
    items: [
      ['Heat rate Q', `${sig(inUnit(W, ref.heatRate_W), 6)} ${W.pretty} (whole fin)`],
      [
        'Efficiency',
        `${efficiency(ref.efficiency)} (Q over Q with every cooled surface at the base temperature)${ref.efficiencyNote !== null ? `; ${ref.efficiencyNote}` : ''}`,
      ],
      [
        'Effectiveness',
        ref.effectiveness === null ? `n/a: ${ref.effectivenessNote ?? ''}` : `${sig(ref.effectiveness)} (Q over the bare base area's heat rate)`,
      ],
      [
        'Tip temperature',
        `${inUnit(u.temperature, ref.tipTemperature_degC).toFixed(2)} ${u.temperature.pretty}${ref.model === 'fd-2d' ? ' (centre of the tip)' : ''}`,
      ],
      [
        'Estimated discretisation error of Q',
        `${relativeError(ref.discretizationError)} relative = ±${sig(ref.discretizationError * inUnit(W, ref.heatRate_W), 2)} ${W.pretty} (GCI, Celik et al. 2008)`,
      ],
      ['Observed order of accuracy', ref.observedOrder === null ? 'not determined' : ref.observedOrder.toFixed(2)],
      ['Energy balance', `${ref.energyBalance.toExponential(1)} (|Q_base − Q_surfaces| / Q_base)`],
      ['Finest grid', grid],
      ['How it was solved', prettyUnits(ref.note)],
    ],
  };
}

function checkTable(r: CheckReport, u: DisplayUnits): Block[] {
  const row = (m: ModelResult): { cells: string[]; tone: Tone } => ({
    cells: [modelName(m), sig(inUnit(u.heat, m.heatRate_W), 5), efficiency(m.efficiency), signedPercent(m.drift), m.verdict, prettyUnits(m.accuracy)],
    tone: m.verdict === 'unresolved' ? 'warning' : m.verdict,
  });
  const blocks: Block[] = [
    referenceFacts(r, u),
    {
      kind: 'table',
      caption: `Models against the reference ${r.reference.model} (tolerance ±${(100 * r.tolerance).toFixed(1)} %)`,
      columns: [
        { title: 'Model', align: 'left' },
        { title: `Q (${u.heat.pretty})`, align: 'right' },
        { title: 'Efficiency (–)', align: 'right' },
        { title: 'Drift of Q', align: 'right' },
        { title: 'Verdict', align: 'left' },
        { title: 'Error estimate of the model’s own number', align: 'left' },
      ],
      rows: r.models.map(row),
      notes: [
        `Drift = (Q_model − Q_ref) / Q_ref. The reference's own error (${relativeError(r.reference.discretizationError)} relative) bounds how well each drift is known.`,
        'Efficiency of every row = Q / (Q with the whole cooled surface at the base temperature), so the rows compare.',
      ],
    },
    {
      kind: 'list',
      items: r.models.map(
        (m) =>
          `${modelName(m)}: ${prettyUnits(m.basis)}${m.guessValues ? `; ${m.guessValues.description}: h = ${sig(m.guessValues.h_W_per_m2K)} W/(m²·K), k = ${sig(m.guessValues.k_W_per_mK)} W/(m·K)` : ''}${m.formulaEfficiency !== null ? `; formula efficiency ${efficiency(m.formulaEfficiency)}` : ''}${m.m_per_m !== null ? `; m = ${sig(m.m_per_m)} 1/m` : ''}${m.length_m !== null ? `, length ${sig(m.length_m * 1000)} mm` : ''}.`,
      ),
    },
  ];
  if (r.notApplicable.length > 0) {
    blocks.push({ kind: 'paragraph', text: 'Not applicable to this case:' });
    blocks.push({ kind: 'list', items: r.notApplicable.map((n) => `${n.model}: ${n.reason}.`) });
  }
  return blocks;
}

function ledger(r: CheckReport): Block[] {
  if (r.assumptions.length === 0) return [{ kind: 'paragraph', text: 'The assumption ledger was not computed.' }];
  return [
    {
      kind: 'table',
      caption: 'Drift of Q caused by each shortcut assumption alone',
      columns: [
        { title: 'Assumption', align: 'left' },
        { title: 'Drift of Q', align: 'right' },
        { title: 'Made by', align: 'left' },
        { title: 'How it was measured', align: 'left' },
      ],
      rows: r.assumptions.map((a) => ({ cells: [a.assumption, signedPercent(a.drift), a.madeBy.join(', '), a.method] })),
      notes: [
        'Each row imposes one assumption on the numerical model (or compares two closed forms) and keeps everything else; drifts measured with fd-1d carry its discretisation error (see Discretisation error), those against fd-2d carry fd-2d’s.',
      ],
    },
  ];
}

const FLAG_TONE: Record<Flag['severity'], Tone> = { info: 'info', warning: 'warning', error: 'error' };

function flags(r: CheckReport): Block[] {
  if (r.flags.length === 0)
    return [
      {
        kind: 'paragraph',
        text: 'No flags: none of the design checks (thick fin, low effectiveness, long fin, fin that insulates, grid convergence, energy balance) was triggered.',
      },
    ];
  return [
    {
      kind: 'table',
      caption: 'Design flags',
      columns: [
        { title: 'Severity', align: 'left' },
        { title: 'Flag', align: 'left' },
        { title: 'Value', align: 'right' },
        { title: 'What it means', align: 'left' },
      ],
      rows: r.flags.map((f) => ({ cells: [f.severity, f.flag, sig(f.value, 3), prettyUnits(f.message)], tone: FLAG_TONE[f.severity] })),
      notes: [],
    },
  ];
}

export function buildReport(inputs: ReportInputs): ReportDocument {
  const { check, version, date } = inputs;
  const c: Case = check.case;
  const r = check.report;
  const u = c.display ?? defaultDisplayUnits;
  const fileName = inputs.caseFile.split(/[\\/]/).pop() ?? inputs.caseFile;
  const sections: Section[] = [
    { id: 'summary', title: 'Summary', blocks: summary(r, u) },
    {
      id: 'case',
      title: 'The case',
      blocks: [
        {
          kind: 'table',
          caption: `Inputs of ${fileName}`,
          columns: [
            { title: 'Quantity', align: 'left' },
            { title: 'Value', align: 'left' },
            { title: 'Note', align: 'left' },
          ],
          rows: caseInputRows(c),
          notes: [],
        },
      ],
    },
    { id: 'check', title: 'Shortcuts against the reference', blocks: checkTable(r, u) },
    ...[uncertaintySection(r, modelName, u)].filter((x): x is Section => x !== null),
    { id: 'ledger', title: 'Where the drift comes from', blocks: ledger(r) },
    { id: 'flags', title: 'Flags', blocks: flags(r) },
    figureSection(check, inputs.field, inputs.figures, inputs.heatmapUnavailable),
    discretisationSection(check),
  ];
  return {
    title: `Fin check: ${r.case}`,
    byline: `fincheck ${version} · ${date} · case file ${fileName}`,
    front: [{ kind: 'callout', title: 'Cautions', items: r.cautions, tone: 'warning' }],
    sections,
    footer: `Generated by fincheck ${version} on ${date} from ${fileName}. Engineering estimates of an idealised fin: confirm the design by test.`,
  };
}
