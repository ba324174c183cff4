/**
 * Public API of src/analytic: every published closed form fincheck compares against, plus the special
 * functions and small numerical tools they need. The Bessel library loads on its first use (`initBessel()` loads it ahead).
 */
export { initBessel, isBesselReady, I0, I1, K0, K1, I0e, I1e, K0e, K1e, I2, K2, I2e, K2e, In, Kn, Ine, Kne } from './bessel.js';
export { besselIRatio } from './bessel-ratio.js';
export { Iv, besselIReflectionRatio } from './bessel-real-order.js';
export { gammaFunction } from './gamma.js';

export { uniformFin, uniformFinExcess, uniformFinExcessProfile, finParameter } from './uniform-fin.js';
export type { UniformTip, UniformFinInput, UniformFinResult } from './uniform-fin.js';

export { correctedLength, plateCorrectedLength, pinCorrectedLength, exactCorrectedLength, correctedLengthFin } from './corrected-length.js';
export type { CorrectedLengthInput, CorrectedLengthResult } from './corrected-length.js';

export type { ProfileFinResult } from './profile-result.js';
export {
  straightRectangularFin,
  straightTriangularFin,
  straightConcaveParabolicFin,
  straightConvexParabolicFin,
  straightTrapezoidalFin,
  gardnerStraightFin,
} from './straight-profiles.js';
export type { StraightFinInput } from './straight-profiles.js';
export { cylindricalPinFin, conicalSpine, truncatedConicalSpine, concaveParabolicSpine, convexParabolicSpine } from './spine-profiles.js';
export type { SpineInput } from './spine-profiles.js';
export { annularFin, annularFinCorrected, annularFinConvectiveTip, annularFinSchmidt, correctedOuterRadius } from './annular.js';
export type { AnnularFinInput } from './annular.js';

export { finArray } from './array.js';
export type { FinArrayInput, FinArrayResult } from './array.js';
export { tanhEfficiency, uniformBaseSink } from './overall-efficiency.js';
export type { UniformBaseInput, UniformBaseResult, UniformBaseSource } from './overall-efficiency.js';
export { spreadingSeries } from './spreading-series.js';
export type { SpreadingPlate, SpreadingSeriesInput, SpreadingSeriesResult, SpreadingSource } from './spreading-series.js';

export { finHFallingToTip, finHRisingFromBase } from './nonuniform-h.js';
export type { PowerLawHInput, PowerLawHResult } from './nonuniform-h.js';

export { optimumRectangularFin, optimumTriangularFin, optimumConcaveParabolicFin, optimumConvexParabolicFin, optimumPinFin } from './optimum.js';
export type { OptimumStraightInput, OptimumPinInput, OptimumResult } from './optimum.js';

export {
  stefanBoltzmann,
  powerLawHInfiniteQ,
  powerLawHInfiniteProfile,
  powerLawHLength,
  powerLawHAdiabatic,
  powerLawHInfiniteFin,
  powerLawHAdiabaticFin,
  linearConductivityInfiniteQ,
  linearConductivityLength,
  linearConductivityAdiabatic,
  linearConductivityInfiniteFin,
  linearConductivityAdiabaticFin,
  radiatingInfiniteFin,
  radiatingFinLength,
  radiatingAdiabaticFin,
} from './nonlinear.js';
export type {
  NonlinearTipResult,
  NonlinearFinResult,
  PowerLawHFinInput,
  LinearConductivityFinInput,
  RadiatingFinInput,
  RadiatingFinResult,
} from './nonlinear.js';

export { brentRoot } from './roots.js';
export type { RootOptions } from './roots.js';
export { integrate } from './quadrature.js';
export type { QuadratureOptions } from './quadrature.js';
export { normalCdf, normalQuantile } from './normal.js';
