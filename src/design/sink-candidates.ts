/**
 * The candidates of a heat sink's optimisation: the user's sink with `array.count` and/or `fin.thickness` written
 * in (as if typed into the file; a changed count drops `array.pitch`, so the pitch is plate.width / count and the
 * array stays on the fixed plate), validated again, and judged by the hottest source's mean temperature rise above
 * ambient (K) from
 *   - the reference, fd-3d, on one of two studies (src/fd studySink, Celik et al. 2008 GCI over three grids):
 *       'search':  coarsest cells min(width, length)/8 in plan, 1 plate layer, 2 fin layers (its finest grid is the
 *                  default study's middle grid): about a quarter of the default study's work, for the search;
 *       'confirm': the default study (coarsest cells min(width, length)/16, 2 plate layers, 4 fin layers: the first
 *                  study of `check`, which refines it once more only where its GCI is above a tenth of the
 *                  tolerance; that refinement costs 8 times as much, 10 s a value for the demo's thin long fins,
 *                  so the optimiser stays on the default study and says when it is not resolved), for the
 *                  optimum and its neighbours;
 *   - the uniform-base shortcut (compare/sink-models.ts): `overall-efficiency` (tanh(mLc)/(mLc)) or
 *     `overall-efficiency-exact-fin` (the exact 1-D fin), the same rises the check compares.
 * Every value is cached by the written values and the study, and the count of fd-3d studies is kept.
 */
import { parseHeatSinkObject, readDocument, setByKeyPath, type HeatSinkCase, type Locate, type ParseOptions } from '../case/index.js';
import { sinkShortcuts } from '../compare/index.js';
import { studySink, type SinkStudy } from '../fd/index.js';
import { InputError } from '../errors.js';

export type SinkStudyKind = 'search' | 'confirm';
export type SinkShortcutModel = 'overall-efficiency' | 'overall-efficiency-exact-fin';

/** The search study's options (module header). */
export const SEARCH_CELLS_PER_SIDE = 8;
export const SEARCH_STUDY = { plateLayers: 1, finLayers: 2 } as const;

export interface SinkReferenceValue {
  /** Mean rise of every source above ambient, K. */
  sourceRise_K: number[];
  /** Largest of them, K (the objective). */
  hottestRise_K: number;
  /** Index of the hottest source. */
  hottest: number;
  /** GCI of the hottest source's mean rise (relative), null when not estimated. */
  discretizationError: number | null;
  /** Largest temperature over each source, degC (finest grid). */
  sourceMax_degC: number[];
  /** Unknowns of the study's finest grid. */
  unknowns: number;
}

export interface SinkShortcutValue {
  sourceRise_K: number[];
  hottestRise_K: number;
}

export class SinkOptimizer {
  private readonly raw: unknown;
  private readonly locate: Locate;
  private readonly parseOptions: ParseOptions;
  readonly base: HeatSinkCase;
  private readonly references = new Map<string, SinkReferenceValue | null>();
  private readonly shortcuts = new Map<string, SinkShortcutValue | null>();
  /** fd-3d studies solved, by kind. */
  readonly studies = { search: 0, confirm: 0 };

  constructor(private readonly request: { caseText: string; fileName: string; shortcutModel: SinkShortcutModel }) {
    const document = readDocument(request.caseText, request.fileName);
    this.raw = document.raw;
    this.locate = document.locate;
    this.parseOptions = { file: request.fileName };
    this.base = parseHeatSinkObject(this.raw, this.locate, this.parseOptions);
  }

  /** The raw case with the values written in (count: a number without pitch; lengths: "<v> m"). */
  private rawWith(values: ReadonlyMap<string, number>): unknown {
    let raw = this.raw;
    for (const [key, v] of values) {
      if (key === 'array.count') {
        const record = raw as Record<string, unknown>;
        const array = { ...(record.array as Record<string, unknown>) };
        delete array.pitch;
        array.count = v;
        raw = { ...record, array };
      } else raw = setByKeyPath(raw, key, `${v} m`);
    }
    return raw;
  }

  /** The sink with `values` written in, or null where it becomes invalid (fins overlapping, off the plate...). */
  caseWith(values: ReadonlyMap<string, number>): HeatSinkCase | null {
    try {
      return parseHeatSinkObject(this.rawWith(values), this.locate, this.parseOptions);
    } catch (e) {
      if (e instanceof InputError) return null;
      throw e;
    }
  }

  private static id(values: ReadonlyMap<string, number>): string {
    return [...values].map(([k, v]) => `${k}=${v}`).join(',');
  }

  /** The study of a candidate (a variant of it, e.g. h scaled, through `variant`). */
  studyOf(c: HeatSinkCase, kind: SinkStudyKind): SinkStudy {
    this.studies[kind]++;
    return kind === 'confirm'
      ? studySink(c)
      : studySink(c, { cellSize: Math.min(c.plate.width, c.plate.length) / SEARCH_CELLS_PER_SIDE, ...SEARCH_STUDY });
  }

  /** The reference's rises at `values`, on the study `kind`; `variant` changes the case first (cached under `tag`). */
  reference(
    values: ReadonlyMap<string, number>,
    kind: SinkStudyKind,
    variant?: { tag: string; apply: (c: HeatSinkCase) => HeatSinkCase },
  ): SinkReferenceValue | null {
    const id = `${kind}|${variant?.tag ?? ''}|${SinkOptimizer.id(values)}`;
    if (this.references.has(id)) return this.references.get(id) ?? null;
    const given = this.caseWith(values);
    const c = given === null || variant === undefined ? given : variant.apply(given);
    const value = c === null ? null : referenceValue(this.studyOf(c, kind));
    this.references.set(id, value);
    return value;
  }

  /** The shortcut's rises at `values` (null where the sink is invalid). */
  async shortcut(
    values: ReadonlyMap<string, number>,
    variant?: { tag: string; apply: (c: HeatSinkCase) => HeatSinkCase },
  ): Promise<SinkShortcutValue | null> {
    const id = `${variant?.tag ?? ''}|${SinkOptimizer.id(values)}`;
    if (this.shortcuts.has(id)) return this.shortcuts.get(id) ?? null;
    const given = this.caseWith(values);
    const c = given === null || variant === undefined ? given : variant.apply(given);
    let value: SinkShortcutValue | null = null;
    if (c !== null) {
      const row = (await sinkShortcuts(c)).models.find((m) => m.model === this.request.shortcutModel);
      if (row === undefined) throw new Error(`SinkOptimizer: no ${this.request.shortcutModel} row`);
      value = { sourceRise_K: row.sourceRise_K, hottestRise_K: Math.max(...row.sourceRise_K) };
    }
    this.shortcuts.set(id, value);
    return value;
  }
}

function referenceValue(study: SinkStudy): SinkReferenceValue {
  const rises = study.sources.map((s) => s.meanRise_K);
  let hottest = 0;
  rises.forEach((r, j) => {
    if (r > (rises[hottest] as number)) hottest = j;
  });
  return {
    sourceRise_K: rises,
    hottestRise_K: rises[hottest] as number,
    hottest,
    discretizationError: study.sources[hottest]?.discretizationError ?? null,
    sourceMax_degC: study.sources.map((s) => s.maxTemperature_degC),
    unknowns: study.unknowns[0] ?? 0,
  };
}
