/** Public API of the 1-D finite-volume fin solver (fd-1d). */
export type { LinearFinCase, LinearHDistribution } from './linear-case.js';
export { isLinearFinCase } from './linear-case.js';
export type { BaseBoundary, TipBoundary, ExcessField } from './boundary.js';
export { baseBoundary, tipBoundary, fieldFromTheta, baseHeatRate, tipHeatLoss } from './boundary.js';
export { dropSystem } from './drop-system.js';
export type { FinProblem1D } from './problem1d.js';
export { finProblem1D } from './problem1d.js';
export { hAt, hAtNodes, hBreakpoints, idealConvectiveConductance } from './convection1d.js';
export { interfaceConductance, convectiveConductance } from './conductance1d.js';
export { assembleFin1D } from './assemble1d.js';
export type { TridiagonalSystem, RowSumSystem, TridiagonalSolver } from './tridiagonal.js';
export {
  createTridiagonalSystem,
  thomas,
  thomasInto,
  twoSidedThomas,
  twoSidedThomasInto,
  solveTridiagonal,
} from './tridiagonal.js';
export { conservativeThomas, conservativeThomasInto, conservativeThomasFromTipInto } from './conservative-thomas.js';
export type { FinHeatRates1D } from './heat-rate1d.js';
export { finHeatRates, idealHeatRate, finEffectiveness } from './heat-rate1d.js';
export type { Fin1DOptions, Fin1DResult, Fin1DStudy, Fin1DStudyOptions } from './fin1d.js';
export {
  solveFin1D,
  studyFin1D,
  solveFinProblem1D,
  studyFinProblem1D,
  solveOnMesh1D,
  autoGrading,
  DEFAULT_STUDY_NODES,
} from './fin1d.js';
// The 2-D models and the refinement study, as plots and report use them.
export { fin2dProblem } from './fin2dCase.js';
export { grid2dIssue } from './fin2d.js';
export { studyFin2DProblem } from './fin2dStudy.js';
export { nonlinearFin2DProblem } from './nonlinear2d-problem.js';
export { studyNonlinearFin2DProblem } from './nonlinear2d-study.js';
export type { Fin2DStudy } from './fin2dStudy.js';
export type { NonlinearFin2DStudy } from './nonlinear2d-study.js';
export type { RefinementStudy } from './refinement.js';
