/**
 * The report's "Discretisation error" section: each numerical model's grids, its heat rate on each,
 * the observed order, and the Grid Convergence Index of the finest grid (Celik, Ghia, Roache, Freitas,
 * Coleman & Raad 2008, J. Fluids Eng. 130(7), 078001), the estimate quoted beside every number.
 */
import type { RefinementStudy } from '../fd/index.js';
import { relativeError, sig, type CheckPlotInput } from '../plots/index.js';
import type { Block, Section } from './document.js';

function studyTable(model: string, grids: string[], study: RefinementStudy): Block[] {
  return [
    {
      kind: 'table',
      caption: `${model}: heat rate Q on each grid, finest first`,
      columns: [
        { title: 'Grid', align: 'left' },
        { title: 'Cell size (mm)', align: 'right' },
        { title: 'Q (W)', align: 'right' },
      ],
      rows: study.values.map((v, k) => ({ cells: [grids[k] ?? '', sig((study.sizes[k] as number) * 1000, 4), sig(v, 10)] })),
      notes: [],
    },
    {
      kind: 'facts',
      caption: `${model}: Richardson extrapolation and GCI`,
      items: [
        ['Observed order', study.observedOrder === null ? 'not determined' : study.observedOrder.toFixed(2)],
        ['Order used, safety factor', `${study.orderUsed.toFixed(2)}, Fs = ${study.safetyFactor}`],
        ['Extrapolated Q', `${sig(study.extrapolated, 10)} W`],
        [
          'Estimated discretisation error of Q (GCI, finest grid)',
          `${relativeError(study.gci)} relative = ±${sig(study.gci * Math.abs(study.values[0] as number), 2)} W`,
        ],
        ['Converging', study.converged ? 'yes' : 'no: the grids are not in the asymptotic range'],
        ['How', study.note],
      ],
    },
  ];
}

export function discretisationSection(check: CheckPlotInput): Section {
  const blocks: Block[] = [];
  const study1 = check.oneD.refinement;
  const length = check.oneD.finest.mesh.length;
  if (study1 !== null)
    blocks.push(
      ...studyTable(
        'fd-1d',
        study1.sizes.map((h) => `${Math.round(length / h) + 1} nodes`),
        study1,
      ),
    );
  if (check.twoD) {
    const s2 = check.twoD;
    if (s2.refinement !== null)
      blocks.push(
        ...studyTable(
          'fd-2d',
          s2.grids.map((g) => `${g.nx} × ${g.ny} nodes`),
          s2.refinement,
        ),
      );
    if (check.report.reference.model === 'fd-2d' && Math.abs(check.report.reference.heatRate_W - s2.heatRate_W) > 0) {
      blocks.push({
        kind: 'paragraph',
        text: `The reference Q (${sig(check.report.reference.heatRate_W, 6)} W) is fd-2d's section (${sig(s2.heatRate_W, 6)} W) with the side edges' cooling added from fd-1d; its error estimate adds fd-1d's.`,
      });
    }
  }
  blocks.push({
    kind: 'paragraph',
    text: 'The closed forms have no discretisation error: they are exact (to round-off) for their own assumptions, and their error for this fin is their drift.',
  });
  return { id: 'discretisation', title: 'Discretisation error', blocks };
}
