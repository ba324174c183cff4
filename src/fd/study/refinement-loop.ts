/**
 * The refinement-study loop of every model (1-D and 2-D, linear or Newton): the grids of a study solved in
 * order, coarsest first, each solve handed the previous grid's solution (a Newton solve starts from it,
 * nested iteration; a linear direct solve ignores it). The estimate of the discretisation error from the
 * solutions is refinement.ts (Celik et al. 2008).
 */
export function solveGrids<G, R>(grids: readonly G[], solveOn: (grid: G, previous: R | undefined) => R): R[] {
  const results: R[] = [];
  for (const grid of grids) results.push(solveOn(grid, results[results.length - 1]));
  return results;
}
