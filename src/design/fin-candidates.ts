/**
 * The candidates of an optimisation: the user's case with dimensions written in by key path (in m, as if typed into
 * the file), validated again, and checked by `fincheck check`'s pipeline without the ledger. Each candidate is
 * checked once per reference choice (a cache keyed by the values), and the count of refinement studies is kept.
 */
import { type Case, parseCaseObject, parseKeyPath, readDocument, setByKeyPath, type Locate, type ParseOptions } from '../case/index.js';
import { runCheck, type CheckReport } from '../compare/index.js';
import { InputError } from '../errors.js';

export interface Evaluation {
  c: Case;
  report: CheckReport;
}

export class FinOptimizer {
  private readonly raw: unknown;
  private readonly locate: Locate;
  private readonly parseOptions: ParseOptions;
  readonly base: Case;
  private readonly cache = new Map<string, Evaluation | null>();
  evaluations = 0;

  constructor(private readonly request: { caseText: string; fileName: string; tolerance: number }) {
    const document = readDocument(request.caseText, request.fileName);
    this.raw = document.raw;
    this.locate = document.locate;
    this.parseOptions = { file: request.fileName };
    this.base = parseCaseObject(this.raw, this.locate, this.parseOptions);
  }

  /** The case with `values` (m) written in, or null where the case becomes invalid (a tip thicker than the base...). */
  caseWith(values: ReadonlyMap<string, number>): Case | null {
    let raw = this.raw;
    for (const [key, v] of values) raw = setByKeyPath(raw, parseKeyPath(key), `${v} m`);
    try {
      return parseCaseObject(raw, this.locate, this.parseOptions);
    } catch (e) {
      if (e instanceof InputError) return null;
      throw e;
    }
  }

  async evaluate(values: ReadonlyMap<string, number>, reference: 'auto' | '1d' | '2d'): Promise<Evaluation | null> {
    const id = `${reference}|${[...values].map(([k, v]) => `${k}=${v}`).join(',')}`;
    if (this.cache.has(id)) return this.cache.get(id) ?? null;
    const c = this.caseWith(values);
    let result: Evaluation | null = null;
    if (c !== null) {
      this.evaluations++;
      const { report } = await runCheck(c, { tolerance: this.request.tolerance, reference, ledger: false, sensitivities: false });
      result = { c, report };
    }
    this.cache.set(id, result);
    return result;
  }
}

export function caseValue(c: Case, key: string): number | undefined {
  const name = key.replace(/^fin\./, '');
  const v = (c.fin.profile as unknown as Record<string, unknown>)[name];
  return typeof v === 'number' ? v : undefined;
}

/** The heat of the tanh(mLc)/(mLc) shortcut in a check (tanh(mL)/(mL) for an adiabatic tip, where Lc = L), or NaN. */
export function shortcutHeat(report: CheckReport): number {
  const rows = report.models.filter((m) => m.guess === undefined || m.guess === 'base');
  const row = rows.find((m) => m.model === 'tanh-Lc') ?? rows.find((m) => m.model === 'tanh-L');
  return row ? row.heatRate_W : Number.NaN;
}
