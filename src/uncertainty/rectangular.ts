import { _requireFinite, HotjunctionRangeError } from "../errors.js";
import { _requireNonNegative, _requireOneOf, _requireOptionsObject } from "./_checks.js";
import { _makeDistribution } from "./_distribution.js";
import type { Distribution } from "./types.js";

// Deliberately alike: every distribution module (arcsine, normal, rectangular, trapezoidal, triangular) has the
// same layout, its own documented options and entry over the shared checks (_checks.ts) and builder
// (_makeDistribution), so each public type and its JCGM reference read alone in the docs.
/** Options of {@link rectangular}: a center and half-width, or lower and upper bounds. */
export type RectangularOptions =
  | {
      /** Center of the interval, in the input's unit (finite). */
      readonly center: number;
      /** Half-width a, in the input's unit (≥ 0). */
      readonly halfWidth: number;
      /** Degrees of freedom (> 0); default `Infinity`. */
      readonly degreesOfFreedom?: number;
    }
  | {
      /** Lower bound, in the input's unit (finite, ≤ upper). */
      readonly lower: number;
      /** Upper bound, in the input's unit (finite, ≥ lower). */
      readonly upper: number;
      /** Degrees of freedom (> 0); default `Infinity`. */
      readonly degreesOfFreedom?: number;
    };

/**
 * A rectangular (uniform) input over [center − a, center + a]: u = a/√3 (JCGM 100:2008 4.3.7).
 * The usual reading of a tolerance "±a" with nothing else known. Sampled as a + (b − a)·r (JCGM 101:2008 6.4.2).
 * @param options - `{ center, halfWidth }` or `{ lower, upper }` in the input's unit, plus optional `degreesOfFreedom`
 * @returns a plain, JSON-serializable {@link Distribution}
 * @throws HotjunctionTypeError for a non-finite value or a mix of both forms; HotjunctionRangeError for a
 *   negative half-width, lower > upper, or a center or half-width beyond ±1e150 (`OUT_OF_RANGE`)
 * @example
 * ```ts
 * import { rectangular } from "hotjunction";
 * console.log(Number(rectangular({ center: 0, halfWidth: 1.5 }).standardUncertainty.toFixed(7))); // 0.8660254
 * console.log(rectangular({ lower: 2, upper: 4 }).mean); // 3
 * ```
 */
export function rectangular(options: RectangularOptions): Distribution {
  const context = "rectangular distribution";
  _requireOptionsObject(options, context, false);
  const form = _requireOneOf(options, [["center", "halfWidth"], ["lower", "upper"]], context);
  const o = options as Record<string, unknown>;
  let center: number;
  let halfWidth: number;
  if (form === 0) {
    center = _requireFinite(o["center"], "center", undefined, context);
    halfWidth = _requireNonNegative(o["halfWidth"], "half-width", undefined, context);
  } else {
    const lower = _requireFinite(o["lower"], "lower bound", undefined, context);
    const upper = _requireFinite(o["upper"], "upper bound", undefined, context);
    if (lower > upper) {
      throw new HotjunctionRangeError({
        code: "OUT_OF_RANGE",
        quantity: "lower bound",
        value: lower,
        max: upper,
        context,
        problem: "is above the upper bound",
      });
    }
    const width = upper - lower;
    if (Number.isFinite(width)) {
      center = lower + width / 2;
      halfWidth = width / 2;
    } else {
      // The width overflows (e.g. −1e308 to 1e308): halve first. The magnitude check then refuses it.
      center = lower / 2 + upper / 2;
      halfWidth = upper / 2 - lower / 2;
    }
  }
  return _makeDistribution("rectangular", center, halfWidth / Math.sqrt(3), halfWidth, undefined, o["degreesOfFreedom"], context);
}
