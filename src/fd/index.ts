/**
 * Public entry of the fd layer (the finite-volume models of a fin): what compare, plots, map, report and
 * cli import. Everything else under src/fd is internal to the layer (tests may reach in).
 *
 * problem/  the one fin problem (geometry, conductivity law, surface law, base, tip) and which model covers it
 * study/    the one study: studyFin(problem, { model: '1d' | '2d' }) -> FinStudy; the refinement loop and GCI
 * one-d/    the 1-D model along the fin: assembly, boundaries, direct solve, Newton, heat rates, along-fin
 * two-d/    the 2-D model across the thickness: problem, assembly, boundaries, solve, Newton, study grids
 * newton/   what the 1-D and 2-D Newton solves share: continuation, the report
 * linear-algebra/  tridiagonal, banded and multigrid solvers
 */
export type { FinProblem, Radiation } from './problem/fin-problem.js';
export { finProblem, isLinearProblem, KELVIN_OFFSET, STEFAN_BOLTZMANN } from './problem/fin-problem.js';
export type { BaseBoundary, TipBoundary } from './problem/conditions.js';
export type { LinearFinCase, LinearHDistribution } from './problem/linear-case.js';
export { isLinearFinCase } from './problem/linear-case.js';
export type { FinModel, ModelCoverage } from './problem/model-applies.js';
export { modelApplies, modelId, nonlinearity, requireModel } from './problem/model-applies.js';
export { hAt, idealConvectiveConductance } from './problem/convection.js';

export type { FinStudy, FinStudy1D, FinStudy2D, NewtonStatistics } from './study/fin-study.js';
export type { AlongFin, AlongFinSeries } from './study/along-fin.js';
export type { FinGrid, FinStudyOptions } from './study/study-fin.js';
export { alongFin, solveFin, solveFinWith, studyFin, studyFinWith, studyGridIssue } from './study/study-fin.js';
export type { GridSolvers } from './study/grid-solvers.js';
export { gridSolvers } from './study/grid-solvers.js';
export { gridSolversNow } from './study/grid-solvers-now.js';
export type { RefinementStudy } from './study/refinement.js';
export { richardsonGci, fitObservedOrder } from './study/refinement.js';
export type { NewtonReport } from './newton/newton-report.js';
export type { SinkStudy, SinkSourceResult, SinkFinResult, SinkPlateView, SinkFinProfiles, SinkGridSpec } from './three-d/sink-study-types.js';
export { solveSinkOnGrid, type SinkGridSolution } from './three-d/sink-grid-solve.js';
export { sinkGridAdjoint, type SinkGridAdjoint } from './three-d/sink-adjoint.js';

export type { Fin1DResult } from './one-d/linear-solve.js';
export { DEFAULT_STUDY_NODES, autoGrading } from './one-d/linear-solve.js';
export type { Fin2DLine, Fin2DResult } from './two-d/linear-solve.js';
export type { Extrapolated2D, Fin2DGridValue } from './two-d/linear-study.js';
export type { Fin2DFieldViews } from './two-d/field-views.js';
export { fieldViews } from './two-d/field-views.js';
export { resolveFinStudy1D } from './study/resolve-study1d.js';
export type { Resolution, ResolutionBudget } from './study/resolve-study1d.js';
export { tipBoundary } from './one-d/boundary.js';
export { grid2dIssue } from './two-d/linear-solve.js';
export { finSectionAdjoint, finSectionHeatRate } from './two-d/adjoint.js';
export { linearFinHeatRate1D } from './study/linear-grid-solvers.js';
export { idealHeatRate } from './one-d/heat-rate.js';
export type { ExcessField } from './one-d/boundary.js';
export { baseBoundary, fieldFromTheta, baseHeatRate, tipHeatLoss } from './one-d/boundary.js';
export { dropSystem } from './one-d/drop-system.js';
export type { FinProblem1D } from './one-d/problem.js';
export { hAtNodes, hBreakpoints } from './problem/convection.js';
export { interfaceConductance, convectiveConductance } from './one-d/conductance.js';
export { assembleFin1D } from './one-d/assemble.js';
export type { TridiagonalSystem, RowSumSystem, TridiagonalSolver } from './linear-algebra/tridiagonal.js';
export { createTridiagonalSystem, thomas, thomasInto, twoSidedThomas, twoSidedThomasInto, solveTridiagonal } from './linear-algebra/tridiagonal.js';
export { conservativeThomas, conservativeThomasInto, conservativeThomasFromTipInto } from './linear-algebra/conservative-thomas.js';
export type { FinHeatRates1D } from './one-d/heat-rate.js';
export { finHeatRates, finEffectiveness } from './one-d/heat-rate.js';
export type { Fin1DOptions } from './one-d/linear-solve.js';
export { solveOnMesh1D } from './one-d/linear-solve.js';
export { studySink, sinkStudyUnknowns } from './three-d/study-sink.js';
export type { SinkStudyOptions } from './three-d/study-sink.js';
export { sinkModelApplies } from './three-d/sink-problem.js';
export { sheetReductionDrift } from './three-d/sheet-drift.js';
export type { SheetReductionDrift } from './three-d/sheet-drift.js';
