/**
 * Words and numbers on fincheck's charts: axis titles in the units engineers read (mm, °C, W, W/m),
 * model labels and legend notes, and the thinning of long node arrays into chart series.
 */
import { arrayInUnit, defaultDisplayUnits, inUnit, type Case, type DisplayUnits } from '../case/index.js';
import type { ModelId, ReferenceResult } from '../compare/index.js';
import type { LineSeries } from '../images/index.js';
import { defaultSeriesStyle } from '../images/index.js';

/** Typographic minus, so "−1.75 %" does not read as a hyphen. */
const MINUS = '\u2212';

/** Signed percentage with two decimals (three below 0.1 %): "+0.31 %", "−1.75 %", "0.000 %". */
export function signedPercent(x: number): string {
  const digits = Math.abs(x) < 0.001 ? 3 : 2;
  const text = (100 * Math.abs(x)).toFixed(digits);
  if (Number(text) === 0) return `${(0).toFixed(digits)} %`;
  return `${x > 0 ? '+' : MINUS}${text} %`;
}

/** Significant figures, without exponent for engineering-sized numbers. */
export function sig(x: number, digits = 4): string {
  if (x === 0) return '0';
  const a = Math.abs(x);
  const text = a >= 1e5 || a < 1e-3 ? x.toExponential(digits - 1) : x.toPrecision(digits);
  return text.startsWith('-') ? `${MINUS}${text.slice(1)}` : text;
}

/** A relative error estimate as "2.3e-9" (one significant figure more than needed is noise). */
export function relativeError(x: number): string {
  return Number.isFinite(x) ? x.toExponential(1) : 'not estimated';
}

/** The units a case's charts show (its display units; by default mm, °C, W): a fin's or a heat sink's. */
export function unitsOf(c: { display?: DisplayUnits }): DisplayUnits {
  return c.display ?? defaultDisplayUnits;
}

/** Title of the x axis: distance from the base, or the radius for annular fins (plots show r). */
export function alongAxisLabel(c: Case): string {
  const unit = unitsOf(c).length.pretty;
  return c.fin.profile.kind === 'annular' ? `Radius r (${unit})` : `Distance from the base x (${unit})`;
}

/**
 * Title of the charts' x axis: alongAxisLabel, and for annular fins where the radius starts and ends:
 * "Radius r (mm): r1 = 3.1 at the tube, r2 = 5.6 at the rim".
 */
export function alongAxisTitle(c: Case): string {
  const p = c.fin.profile;
  if (p.kind !== 'annular') return alongAxisLabel(c);
  const u = unitsOf(c);
  return `${alongAxisLabel(c)}: r1 = ${shownLength(u, p.innerRadius)} at the tube, r2 = ${shownLength(u, p.outerRadius)} at the rim`;
}

/** A length in the display unit for a label, to 4 significant figures without trailing zeros (3.1, 12.5, 0.05). */
function shownLength(u: DisplayUnits, m: number): string {
  return String(Number(inUnit(u.length, m).toPrecision(4)));
}

/** The label of a model's line: the reference says so; fd-2d's temperature line is its mid-plane (pins: axis). */
export function lineLabel(c: Case, model: ModelId, reference: ReferenceResult, temperature = true): string {
  const base = model === reference.model ? `${model} (reference)` : model;
  return model === 'fd-2d' && temperature ? `${base}, ${isPin(c) ? 'axis' : 'mid-plane'}` : base;
}

/** The label of fd-2d's face line. */
export function faceLabel(model: ModelId): string {
  return `${model}, face`;
}

export function isPin(c: Case): boolean {
  const p = c.fin.profile;
  return p.kind === 'pin' || p.kind === 'conical-pin' || (p.kind === 'tabulated' && p.shape === 'pin');
}

/** One-line description of the reference's grid and error, for subtitles and captions. */
export function referenceWords(reference: ReferenceResult): string {
  const grid = 'nodes' in reference.grid ? `${reference.grid.nodes} nodes` : `${reference.grid.nx} × ${reference.grid.ny} nodes`;
  return `${reference.model} on ${grid}, estimated discretisation error of Q ${relativeError(reference.discretizationError)} (GCI)`;
}

/** Metres to the display length unit (mm by default) for a whole array, shifted by `offset_m` first (annular fins: r = r1 + x). */
export function toMillimetres(x_m: ArrayLike<number>, offset_m = 0, u: DisplayUnits = defaultDisplayUnits): Float64Array {
  const out = new Float64Array(x_m.length);
  for (let i = 0; i < x_m.length; i++) out[i] = ((x_m[i] as number) + offset_m) * u.length.scale;
  return out;
}

/** SI values of a chart series in a display unit (temperatures, heat rates). */
export const inDisplay = arrayInUnit;

/**
 * Keeps at most about `maxPoints` of a node series (every k-th node, always the first and the last),
 * so a 4001-node solution draws as a few hundred exact points. Graded meshes keep their grading.
 */
export function thinSeries(x: ArrayLike<number>, y: ArrayLike<number>, maxPoints = 600): { x: Float64Array; y: Float64Array } {
  const n = Math.min(x.length, y.length);
  const step = Math.max(1, Math.ceil((n - 1) / Math.max(1, maxPoints - 1)));
  const keep: number[] = [];
  for (let i = 0; i < n; i += step) keep.push(i);
  if (n > 0 && keep[keep.length - 1] !== n - 1) keep.push(n - 1);
  return { x: Float64Array.from(keep, (i) => x[i] as number), y: Float64Array.from(keep, (i) => y[i] as number) };
}

/** Every model in a fixed order, so that a model keeps its look on every chart of a report. */
const MODEL_ORDER: readonly ModelId[] = ['fd-2d', 'fd-1d', 'tanh-L', 'tanh-Lc', 'tanh-Lc-thin', 'convective-tip', 'closed-form'];

/**
 * The look of a model's line: the reference solid black without markers (style 0), the others the
 * chart module's styles 1, 2, ... in MODEL_ORDER, the reference left out (colour, dash and marker
 * each differ, so lines stay apart in grey print and for colour-blind readers).
 */
export function modelStyle(model: ModelId, reference: ModelId): Pick<LineSeries, 'colour' | 'style' | 'marker'> {
  const others = MODEL_ORDER.filter((m) => m !== reference);
  const index = model === reference ? 0 : 1 + others.indexOf(model);
  const look = defaultSeriesStyle(index);
  return { colour: look.colour, style: look.style, marker: look.marker };
}
