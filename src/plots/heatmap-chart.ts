/**
 * The heat map of `fincheck plot`: the fd-2d temperature field on the fin's true section (sloped and
 * curved faces as they are), both halves: the solver meshes one half (mid-plane or axis to the face)
 * and the field is mirrored about the symmetry line. Colour bar in °C (viridis: perceptually uniform,
 * readable with colour-vision deficiencies and in grey), labelled isotherms, base and tip marked.
 * Coordinates in mm: x along the fin (annular fins: the radius r), y across it. Nonlinear fins: the same
 * chart of the Newton study (two-d/nonlinear-study.ts), its steps per grid in the header.
 */
import { CHART_CAUTION } from '../compare/index.js';
import { arrayInUnit, inUnit, type Case } from '../case/index.js';
import type { FinStudy2D } from '../fd/index.js';
import type { FieldChartSpec } from '../images/index.js';
import { alongAxisTitle, relativeError, sig, unitsOf } from './labels.js';
import type { ChartSize } from './profile-chart.js';

export interface MirroredField {
  /** Nodes along (i) and across (j, both halves). Node (i, j) at i * nj + j. */
  ni: number;
  nj: number;
  x_mm: Float64Array;
  y_mm: Float64Array;
  T_degC: Float64Array;
}

/** Both halves of the solved half-section: j runs from the far face through the symmetry line to the near face. */
export function mirroredField(study: FinStudy2D): MirroredField {
  const r = study.finest;
  const g = r.grid;
  const ni = g.nodesX;
  const ny = g.nodesY;
  const nj = 2 * ny - 1;
  const x_mm = new Float64Array(ni * nj);
  const y_mm = new Float64Array(ni * nj);
  const T_degC = new Float64Array(ni * nj);
  for (let i = 0; i < ni; i++) {
    for (let j2 = 0; j2 < nj; j2++) {
      const mirrored = j2 < ny - 1;
      const j = mirrored ? ny - 1 - j2 : j2 - (ny - 1);
      const p = i * g.stride[0] + j * g.stride[1];
      const q = i * nj + j2;
      x_mm[q] = (g.x[p] as number) * 1000;
      y_mm[q] = (mirrored ? -1 : 1) * (g.y[p] as number) * 1000;
      T_degC[q] = (r.field[p] as number) + r.ambient_degC;
    }
  }
  return { ni, nj, x_mm, y_mm, T_degC };
}

function axisWords(c: Case): { x: string; y: string; symmetry: string; tip: string; base: string } {
  const kind = c.fin.profile.kind;
  const mm = unitsOf(c).length.pretty;
  if (kind === 'annular') return { x: alongAxisTitle(c), y: `Axial position z (${mm})`, symmetry: 'mid-plane', tip: 'r2 (rim)', base: 'r1 (tube)' };
  if (kind === 'pin' || kind === 'conical-pin' || (kind === 'tabulated' && c.fin.profile.shape === 'pin')) {
    return { x: `Distance from the base x (${mm})`, y: `Across the diameter (${mm})`, symmetry: 'axis', tip: 'tip', base: 'base' };
  }
  return { x: `Distance from the base x (${mm})`, y: `Across the thickness y (${mm})`, symmetry: 'mid-plane', tip: 'tip', base: 'base' };
}

/** Newton steps per grid (coarsest first) of a nonlinear fin's study; null for a linear fin. */
function newtonSteps(study: FinStudy2D): number[] | null {
  return study.newton === null ? null : study.newton.stepsPerGrid;
}

export function heatmapChartSpec(c: Case, study: FinStudy2D, size: ChartSize, rasterScale = 1): FieldChartSpec {
  const field = mirroredField(study);
  const words = axisWords(c);
  const u = unitsOf(c);
  // The field's coordinates are in mm and its temperatures in °C: shown in the display units.
  const fromMm = { ...u.length, scale: u.length.scale / 1000 };
  const r = study.finest;
  const planar = r.grid.section === 'planar';
  const steps = newtonSteps(study);
  const subtitle = [
    `fd-2d on ${r.grid.nodesX} × ${r.grid.nodesY} nodes over one half, mirrored about the ${words.symmetry}; estimated discretisation error of Q ${relativeError(study.discretizationError ?? Number.NaN)} (GCI, ${study.grids.length} grids).`,
    `Q = ${sig(inUnit(u.heat, study.heatRate_W), 5)} ${u.heat.pretty}${planar ? ' for the section with insulated side edges' : ''}; ${c.fin.profile.kind === 'annular' ? 'rim' : 'tip'} centre ${inUnit(u.temperature, r.tipTemperature_degC).toFixed(2)} ${u.temperature.pretty}.`,
    r.truncatedInfinite ? 'Infinite fin: the section is cut where the field has decayed and closed by its exact slowest mode.' : '',
    steps ? `Nonlinear fin: Newton's method on every grid (${steps.join('/')} steps, coarsest to finest; relative residual ≤ 1e-10).` : '',
    CHART_CAUTION,
  ].filter((s) => s !== '');
  return {
    title: `Temperature in the fin section: ${c.name}`,
    subtitle,
    xLabel: words.x,
    yLabel: words.y,
    valueLabel: `Temperature T (${u.temperature.pretty})`,
    valueUnit: ` ${u.temperature.pretty}`,
    grid: { ni: field.ni, nj: field.nj, x: arrayInUnit(fromMm, field.x_mm), y: arrayInUnit(fromMm, field.y_mm), strideI: field.nj, strideJ: 1 },
    values: arrayInUnit(u.temperature, field.T_degC),
    colormap: 'viridis',
    edgeLabels: { iMin: words.base, iMax: words.tip },
    width: size.width,
    height: size.height,
    rasterScale,
  };
}
