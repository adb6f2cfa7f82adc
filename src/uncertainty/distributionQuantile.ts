import { _requireFinite, HotjunctionRangeError } from "../errors.js";
import { _requireOptionsObject, _requireProbability } from "./_checks.js";
import { _checkDistribution, _standardBoundedQuantile } from "./_distribution.js";
import { _normalQuantile } from "./normalQuantile.js";
import type { Distribution } from "./types.js";

/**
 * Quantile (inverse distribution function) of one input distribution: the value x with P(X ≤ x) = p.
 * Closed forms for every shape (rectangular linear, triangular and trapezoidal piecewise square-root, arcsine
 * −cos(πp)); normal via {@link normalQuantile}. For a bounded shape p may be 0 or 1 (the bounds).
 * @param distribution - a {@link Distribution} made by a factory
 * @param probability - p in [0, 1] for bounded shapes, (0, 1) for normal
 * @returns x, in the distribution's unit
 * @throws HotjunctionTypeError / HotjunctionRangeError for a malformed distribution or p out of range
 * @example
 * ```ts
 * import { distributionQuantile, arcsine } from "hotjunction";
 * console.log(Number(distributionQuantile(arcsine({ center: 0, halfWidth: 1 }), 0.975).toFixed(7))); // 0.9969173
 * ```
 */
export function distributionQuantile(distribution: Distribution, probability: number): number {
  const d = _checkDistribution(distribution, "distribution");
  if (d.kindCode === 0) return d.mean + d.standardUncertainty * _normalQuantile(_requireProbability(probability, "probability", "distributionQuantile"));
  const p = _requireFinite(probability, "probability", undefined, "distributionQuantile");
  if (p < 0 || p > 1) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "probability", value: p, min: 0, max: 1, context: "distributionQuantile" });
  }
  return d.mean + d.halfWidth * _standardBoundedQuantile(d.kindCode, d.beta, p);
}

/** Options of {@link distributionCoverageInterval}. */
export interface DistributionCoverageIntervalOptions {
  /** Coverage probability in (0, 1); default 0.95. */
  readonly coverage?: number;
}

/**
 * Exact probabilistically symmetric coverage interval of one input distribution, [G⁻¹((1−p)/2), G⁻¹((1+p)/2)]
 * (JCGM 101:2008 5.3). All shapes here are symmetric, so this is also the shortest interval for the unimodal ones.
 * Example: a rectangular ±a gives ±p·a; a triangular ±a gives ±a(1 − √(1 − p)).
 * @param distribution - a {@link Distribution} made by a factory
 * @param options - `{ coverage }`, default 0.95
 * @returns [low, high] in the distribution's unit
 * @throws HotjunctionTypeError / HotjunctionRangeError for a malformed distribution or coverage outside (0, 1)
 * @example
 * ```ts
 * import { distributionCoverageInterval, rectangular } from "hotjunction";
 * console.log(distributionCoverageInterval(rectangular({ center: 0, halfWidth: 2 })).map((v) => Number(v.toFixed(9)))); // [ -1.9, 1.9 ]
 * ```
 */
export function distributionCoverageInterval(
  distribution: Distribution,
  options?: DistributionCoverageIntervalOptions,
): [number, number] {
  _requireOptionsObject(options, "distributionCoverageInterval", true);
  const coverage =
    options?.coverage === undefined ? 0.95 : _requireProbability(options.coverage, "coverage", "distributionCoverageInterval");
  return [distributionQuantile(distribution, (1 - coverage) / 2), distributionQuantile(distribution, (1 + coverage) / 2)];
}
