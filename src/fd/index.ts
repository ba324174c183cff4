/** Public API of the 1-D finite-volume fin solver (fd-1d). */
export type { LinearFinCase, LinearHDistribution } from './problem/linear-case.js';
export { isLinearFinCase } from './problem/linear-case.js';
export type { BaseBoundary, TipBoundary, ExcessField } from './one-d/boundary.js';
export { baseBoundary, tipBoundary, fieldFromTheta, baseHeatRate, tipHeatLoss } from './one-d/boundary.js';
export { dropSystem } from './one-d/drop-system.js';
export type { FinProblem1D } from './one-d/problem.js';
export { finProblem1D } from './one-d/problem.js';
export { hAt, hAtNodes, hBreakpoints, idealConvectiveConductance } from './problem/convection.js';
export { interfaceConductance, convectiveConductance } from './one-d/conductance.js';
export { assembleFin1D } from './one-d/assemble.js';
export type { TridiagonalSystem, RowSumSystem, TridiagonalSolver } from './linear-algebra/tridiagonal.js';
export {
  createTridiagonalSystem,
  thomas,
  thomasInto,
  twoSidedThomas,
  twoSidedThomasInto,
  solveTridiagonal,
} from './linear-algebra/tridiagonal.js';
export { conservativeThomas, conservativeThomasInto, conservativeThomasFromTipInto } from './linear-algebra/conservative-thomas.js';
export type { FinHeatRates1D } from './one-d/heat-rate.js';
export { finHeatRates, idealHeatRate, finEffectiveness } from './one-d/heat-rate.js';
export type { Fin1DOptions, Fin1DResult, Fin1DStudy, Fin1DStudyOptions } from './one-d/linear-solve.js';
export {
  solveFin1D,
  studyFin1D,
  solveFinProblem1D,
  studyFinProblem1D,
  solveOnMesh1D,
  autoGrading,
  DEFAULT_STUDY_NODES,
} from './one-d/linear-solve.js';
