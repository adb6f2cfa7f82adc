import { _requireFinite } from "../errors.js";
import { _requireNonNegative, _requireOptionsObject } from "./_checks.js";
import { _makeDistribution } from "./_distribution.js";
import type { Distribution } from "./types.js";

// Deliberately alike: every distribution module (arcsine, normal, rectangular, trapezoidal, triangular) has the
// same layout, its own documented options and entry over the shared checks (_checks.ts) and builder
// (_makeDistribution), so each public type and its JCGM reference read alone in the docs.
/** Options of {@link triangular}. */
export interface TriangularOptions {
  /** Center of the interval, in the input's unit (finite). */
  readonly center: number;
  /** Half-width a, in the input's unit (≥ 0). */
  readonly halfWidth: number;
  /** Degrees of freedom (> 0); default `Infinity`. */
  readonly degreesOfFreedom?: number;
}

/**
 * A triangular input over [center − a, center + a], peak at the center: u = a/√6 (JCGM 100:2008 4.3.9). Sampled as a + (b − a)(r₁ + r₂)/2 (JCGM 101:2008 6.4.4).
 * @param options - `{ center, halfWidth }` in the input's unit, plus optional `degreesOfFreedom`
 * @returns a plain, JSON-serializable {@link Distribution}
 * @throws HotjunctionTypeError for a non-finite value; HotjunctionRangeError for a negative half-width
 * @example
 * ```ts
 * import { triangular } from "hotjunction";
 * console.log(Number(triangular({ center: 0, halfWidth: 1 }).standardUncertainty.toFixed(7))); // 0.4082483
 * ```
 */
export function triangular(options: TriangularOptions): Distribution {
  const context = "triangular distribution";
  _requireOptionsObject(options, context, false);
  const center = _requireFinite(options.center, "center", undefined, context);
  const halfWidth = _requireNonNegative(options.halfWidth, "half-width", undefined, context);
  return _makeDistribution("triangular", center, halfWidth * (1 / Math.sqrt(6)), halfWidth, undefined, options.degreesOfFreedom, context);
}
