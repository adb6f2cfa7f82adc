/**
 * Shared construction and validation of input distributions (internal).
 * @module
 * @internal
 */
import { _invalidChoice, _requireBeta, _requireFinite, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { _requireDegreesOfFreedom, _requireNonNegative } from "./_checks.js";
import type { Distribution, DistributionKind } from "./types.js";

/** @internal Kinds in a fixed order; the index is used as a numeric code in hot loops. */
export const _distributionKinds: readonly DistributionKind[] = [
  "normal",
  "rectangular",
  "triangular",
  "trapezoidal",
  "arcsine",
];

/**
 * @internal Largest |mean|, standard uncertainty and half-width accepted (1e150): the squares and sums of
 * squares the methods form (variances, RSS sums, sample variances) then stay far inside the float64 range.
 */
export const _maxMagnitude = 1e150;

/** @internal Throws OUT_OF_RANGE unless |x| ≤ {@link _maxMagnitude}. */
export function _requireMagnitude(x: number, quantity: string, context: string): number {
  if (!(Math.abs(x) <= _maxMagnitude)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: x,
      min: -_maxMagnitude,
      max: _maxMagnitude,
      context,
      problem: "is too large in magnitude (its square would leave the float64 range)",
    });
  }
  return x;
}

/**
 * @internal Builds the plain result object. `degreesOfFreedom` is stored only when finite, so the object
 * survives `JSON.stringify` (Infinity would become `null`).
 */
export function _makeDistribution(
  kind: DistributionKind,
  mean: number,
  standardUncertainty: number,
  halfWidth: number | undefined,
  beta: number | undefined,
  degreesOfFreedom: unknown,
  context: string,
): Distribution {
  const dof = _requireDegreesOfFreedom(degreesOfFreedom, context);
  _requireMagnitude(mean, "mean", context);
  if (halfWidth !== undefined) _requireMagnitude(halfWidth, "half-width", context);
  _requireMagnitude(standardUncertainty, "standard uncertainty", context);
  const result: {
    kind: DistributionKind;
    mean: number;
    standardUncertainty: number;
    halfWidth?: number;
    beta?: number;
    degreesOfFreedom?: number;
  } = { kind, mean, standardUncertainty };
  if (halfWidth !== undefined) result.halfWidth = halfWidth;
  if (beta !== undefined) result.beta = beta;
  if (Number.isFinite(dof)) result.degreesOfFreedom = dof;
  return result;
}

/** @internal A validated distribution, with its support bounds (±Infinity for normal). */
export interface _CheckedDistribution {
  readonly kindCode: number;
  readonly kind: DistributionKind;
  readonly mean: number;
  readonly standardUncertainty: number;
  readonly halfWidth: number;
  readonly beta: number;
  readonly degreesOfFreedom: number;
}

/**
 * @internal Checks a distribution given to `propagate` (it may come from JSON, so it is re-checked field
 * by field, including that `standardUncertainty` agrees with the shape and half-width).
 */
export function _checkDistribution(value: unknown, name: string): _CheckedDistribution {
  const context = `input "${name}"`;
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "distribution",
      value,
      context,
      problem: "is not a distribution object (make one with normal, rectangular, triangular, trapezoidal or arcsine)",
    });
  }
  const d = value as Record<string, unknown>;
  const kindCode = _distributionKinds.indexOf(d["kind"] as DistributionKind);
  if (kindCode < 0) _invalidChoice("distribution kind", d["kind"], _distributionKinds, context);
  const kind = _distributionKinds[kindCode] as DistributionKind;
  const mean = _requireMagnitude(_requireFinite(d["mean"], "mean", undefined, context), "mean", context);
  const u = _requireMagnitude(_requireNonNegative(d["standardUncertainty"], "standard uncertainty", undefined, context), "standard uncertainty", context);
  const degreesOfFreedom = _requireDegreesOfFreedom(d["degreesOfFreedom"] ?? undefined, context);
  if (kind === "normal") {
    return { kindCode, kind, mean, standardUncertainty: u, halfWidth: Number.POSITIVE_INFINITY, beta: 0, degreesOfFreedom };
  }
  const halfWidth = _requireMagnitude(_requireNonNegative(d["halfWidth"], "half-width", undefined, context), "half-width", context);
  let beta = kind === "rectangular" ? 1 : 0;
  if (kind === "trapezoidal") beta = _requireBeta(d["beta"], context);
  const expected = halfWidth * _standardUncertaintyPerHalfWidth(kind, beta);
  if (Math.abs(expected - u) > 1e-12 * Math.max(expected, u)) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "standard uncertainty",
      value: u,
      context,
      problem: `does not match the ${kind} half-width ${halfWidth} (expected ${expected})`,
    });
  }
  return { kindCode, kind, mean, standardUncertainty: u, halfWidth, beta, degreesOfFreedom };
}

/**
 * @internal u/a of a bounded shape with half-width a (JCGM 100:2008 4.3.7–4.3.9):
 * rectangular 1/√3, triangular 1/√6, trapezoidal √((1+β²)/6), arcsine 1/√2.
 */
export function _standardUncertaintyPerHalfWidth(kind: DistributionKind, beta: number): number {
  switch (kind) {
    case "rectangular":
      return 1 / Math.sqrt(3);
    case "triangular":
      return 1 / Math.sqrt(6);
    case "trapezoidal":
      return Math.sqrt((1 + beta * beta) / 6);
    case "arcsine":
      return 1 / Math.SQRT2;
    default:
      return Number.NaN;
  }
}

/**
 * @internal Inverse distribution function of a bounded shape standardised to [−1, 1], at u in [0, 1].
 * Trapezoid of top half-width β: density h = 1/(1+β) on |x| ≤ β, linear to 0 at |x| = 1.
 */
export function _standardBoundedQuantile(kindCode: number, beta: number, u: number): number {
  switch (kindCode) {
    case 1:
      return 2 * u - 1;
    case 4:
      return -Math.cos(Math.PI * u);
    default: {
      // triangular is the trapezoid with β = 0
      const b = kindCode === 2 ? 0 : beta;
      const tail = (1 - b) / (2 * (1 + b));
      if (u < tail) return -1 + Math.sqrt(2 * u * (1 - b) * (1 + b));
      if (u > 1 - tail) return 1 - Math.sqrt(2 * (1 - u) * (1 - b) * (1 + b));
      return -b + (u - tail) * (1 + b);
    }
  }
}
