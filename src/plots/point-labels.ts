/**
 * Labels for marked points (the tip temperature, the base temperature) that do not sit on a line.
 *
 * The line chart sets a point's label up and to the left of its anchor (12 px above, 10 px left,
 * right of it when the left has no room). Here the chart is laid out once with the bare markers; for
 * each label the free side is chosen in pixels (above or below the point, whichever crosses fewer
 * drawn line points), and the label is added as a label-only annotation anchored there. The axis
 * ranges of the first layout are kept, so the labels move nothing else.
 */
import { lineChart, project, unproject, type LineChartSpec, type PanelGeometry, type PointAnnotation } from '../images/index.js';
import { textWidth, fontSize } from '../images/index.js';

export interface PointLabel {
  panel: number;
  x: number;
  y: number;
  text: string;
}

/**
 * Offsets (px, down positive) of the label-only anchor from its point, nearest first: 0 sets the text
 * just above the point, 31 just below it (its top 8 px under the point); the others move further out
 * when lines crowd both sides.
 */
const ANCHOR_OFFSETS_PX = [0, 31, -16, 47, -32, 63, -48, 79, -64, 95];

interface Box {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

function labelBox(anchorX: number, anchorY: number, text: string, plot: PanelGeometry['plot']): Box {
  const width = textWidth(text, fontSize.annotation);
  const baseline = anchorY - 12;
  const left = anchorX - 10 - width >= plot.x + 4;
  const x0 = left ? anchorX - 10 - width : anchorX + 10;
  return { x0: x0 - 2, x1: x0 + width + 2, y0: baseline - 0.75 * fontSize.annotation - 2, y1: baseline + 4 };
}

/** Screen points of the panel's lines every ~4 px. */
function linePoints(spec: LineChartSpec, k: number, g: PanelGeometry): { x: number[]; y: number[] } {
  const xs: number[] = [];
  const ys: number[] = [];
  for (const s of spec.panels[k]?.series ?? []) {
    let px0 = NaN;
    let py0 = NaN;
    for (let i = 0; i < Math.min(s.x.length, s.y.length); i++) {
      const px = project(g.x, s.x[i] as number);
      const py = project(g.y, s.y[i] as number);
      if (Number.isFinite(px0) && Number.isFinite(px) && Number.isFinite(py)) {
        const steps = Math.min(200, Math.ceil(Math.hypot(px - px0, py - py0) / 4));
        for (let t = 1; t < steps; t++) {
          xs.push(px0 + ((px - px0) * t) / steps);
          ys.push(py0 + ((py - py0) * t) / steps);
        }
      }
      xs.push(px);
      ys.push(py);
      px0 = px;
      py0 = py;
    }
  }
  return { x: xs, y: ys };
}

/**
 * Clearance (px) a label keeps from every line: half a series marker (11 px) and a line's half width,
 * so a label that clears the line's centre does not still sit on its markers or its stroke.
 */
export const LABEL_CLEARANCE_PX = 7;

function crossings(box: Box, pts: { x: number[]; y: number[] }, plot: PanelGeometry['plot']): number {
  let n = 0;
  const c = LABEL_CLEARANCE_PX;
  for (let i = 0; i < pts.x.length; i++) {
    const x = pts.x[i] as number;
    const y = pts.y[i] as number;
    if (x >= box.x0 - c && x <= box.x1 + c && y >= box.y0 - c && y <= box.y1 + c) n++;
  }
  // Outside the plot counts as crossing everything: a label there would be clipped or hit the axis.
  if (box.y0 < plot.y || box.y1 > plot.y + plot.height) n += 1e6;
  return n;
}

/** The spec with each label added beside its point on the freer side, and the first layout's axis ranges fixed. */
export function withPointLabels(spec: LineChartSpec, labels: readonly PointLabel[]): LineChartSpec {
  if (labels.length === 0) return spec;
  const first = lineChart(spec);
  const panels = spec.panels.map((p, k) => {
    const g = first.panels[k] as PanelGeometry;
    const pts = linePoints(spec, k, g);
    const added: PointAnnotation[] = [];
    for (const label of labels.filter((l) => l.panel === k)) {
      const px = project(g.x, label.x);
      const py = project(g.y, label.y);
      let anchorY = py;
      let fewest = Infinity;
      for (const offset of ANCHOR_OFFSETS_PX) {
        const n = crossings(labelBox(px, py + offset, label.text, g.plot), pts, g.plot);
        if (n < fewest) {
          fewest = n;
          anchorY = py + offset;
        }
      }
      added.push({ x: label.x, y: unproject(g.y, anchorY), label: label.text, marker: 'none' });
    }
    return { ...p, yDomain: [g.y.domain[0], g.y.domain[1]] as [number, number], points: [...(p.points ?? []), ...added] };
  });
  const g0 = first.panels[0] as PanelGeometry;
  return { ...spec, xDomain: [g0.x.domain[0], g0.x.domain[1]], panels };
}
