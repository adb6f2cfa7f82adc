/**
 * Generic propagation of uncertainty: input distributions, worst case, RSS (JCGM 100) and Monte Carlo (JCGM 101).
 * Knows nothing about thermocouples.
 * @module
 */
export type {
  Contribution,
  Distribution,
  DistributionKind,
  InputDistribution,
  Model,
  PropagateOptions,
  PropagationMethod,
  PropagationModel,
  PropagationResult,
} from "./types.js";
export { normal, normalDistribution, type NormalOptions } from "./normal.js";
export { rectangular, type RectangularOptions } from "./rectangular.js";
export { triangular, type TriangularOptions } from "./triangular.js";
export { trapezoidal, type TrapezoidalOptions } from "./trapezoidal.js";
export { arcsine, type ArcsineOptions } from "./arcsine.js";
export { propagate } from "./propagate.js";
export { propagateCommonDraws, type PropagateCommonDrawsOptions } from "./propagateCommonDraws.js";
export {
  createMonteCarloPool,
  propagateParallel,
  type ModelReference,
  type MonteCarloPool,
  type PropagateParallelOptions,
} from "./propagateParallel.js";
export { normalCdf } from "./normalCdf.js";
export { normalQuantile } from "./normalQuantile.js";
export { studentTQuantile } from "./studentTQuantile.js";
export {
  distributionCoverageInterval,
  distributionQuantile,
  type DistributionCoverageIntervalOptions,
} from "./distributionQuantile.js";
