import { _requireBeta, _requireFinite } from "../errors.js";
import { _requireNonNegative, _requireOptionsObject } from "./_checks.js";
import { _makeDistribution } from "./_distribution.js";
import type { Distribution } from "./types.js";

// Deliberately alike: every distribution module (arcsine, normal, rectangular, trapezoidal, triangular) has the
// same layout, its own documented options and entry over the shared checks (_checks.ts) and builder
// (_makeDistribution), so each public type and its JCGM reference read alone in the docs.
/** Options of {@link trapezoidal}. */
export interface TrapezoidalOptions {
  /** Center of the interval, in the input's unit (finite). */
  readonly center: number;
  /** Half-width a of the base, in the input's unit (≥ 0). */
  readonly halfWidth: number;
  /** Ratio of top to base width β in [0, 1] (0 = triangular, 1 = rectangular). */
  readonly beta: number;
  /** Degrees of freedom (> 0); default `Infinity`. */
  readonly degreesOfFreedom?: number;
}

/**
 * A symmetric trapezoidal input with base [center − a, center + a] and top half-width β·a:
 * u = a·√((1 + β²)/6) (JCGM 100:2008 4.3.9). Sampled as a + (b − a)[(1 + β)r₁ + (1 − β)r₂]/2 (JCGM 101:2008 6.4.3).
 * @param options - `{ center, halfWidth, beta }` in the input's unit (β unitless), plus optional `degreesOfFreedom`
 * @returns a plain, JSON-serializable {@link Distribution}
 * @throws HotjunctionTypeError for a non-finite value; HotjunctionRangeError for a negative half-width or β
 *   outside [0, 1]
 * @example
 * ```ts
 * import { trapezoidal } from "hotjunction";
 * console.log(Number(trapezoidal({ center: 0, halfWidth: 1, beta: 0.5 }).standardUncertainty.toFixed(8))); // 0.45643546
 * ```
 */
export function trapezoidal(options: TrapezoidalOptions): Distribution {
  const context = "trapezoidal distribution";
  _requireOptionsObject(options, context, false);
  const center = _requireFinite(options.center, "center", undefined, context);
  const halfWidth = _requireNonNegative(options.halfWidth, "half-width", undefined, context);
  const beta = _requireBeta(options.beta, context);
  const u = halfWidth * Math.sqrt((1 + beta * beta) / 6);
  return _makeDistribution("trapezoidal", center, u, halfWidth, beta, options.degreesOfFreedom, context);
}
