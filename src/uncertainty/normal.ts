import { _requireFinite } from "../errors.js";
import { _requireNonNegative, _requireOneOf, _requireOptionsObject, _requirePositive } from "./_checks.js";
import { _makeDistribution } from "./_distribution.js";
import type { InputDistribution } from "./types.js";

// Deliberately alike: every distribution module (arcsine, normal, rectangular, trapezoidal, triangular) has the
// same layout, its own documented options and entry over the shared checks (_checks.ts) and builder
// (_makeDistribution), so each public type and its JCGM reference read alone in the docs.
/**
 * Options of {@link normalDistribution}: either a standard deviation, or an expanded uncertainty with its coverage factor.
 */
export type NormalOptions =
  | {
      /** Expectation, in the input's unit (finite). */
      readonly mean: number;
      /** Standard deviation u, in the input's unit (≥ 0). */
      readonly standardDeviation: number;
      /** Degrees of freedom of u (> 0); default `Infinity`. */
      readonly degreesOfFreedom?: number;
    }
  | {
      /** Expectation, in the input's unit (finite). */
      readonly mean: number;
      /** Expanded uncertainty U, in the input's unit (≥ 0), as on a calibration certificate. */
      readonly expandedUncertainty: number;
      /** Coverage factor k of U (> 0), e.g. 2. */
      readonly coverageFactor: number;
      /** Degrees of freedom of u (> 0); default `Infinity`. */
      readonly degreesOfFreedom?: number;
    };

/**
 * A normal (Gaussian) input: from a standard deviation, or from an expanded uncertainty U with coverage factor k,
 * giving u = U/k (JCGM 100:2008 4.3.3). Sampled by the Box–Muller transform (JCGM 101:2008 6.4.7).
 * @param options - `{ mean, standardDeviation }` or `{ mean, expandedUncertainty, coverageFactor }`, plus
 *   optional `degreesOfFreedom`; all values in the input's own unit
 * @returns a plain, JSON-serializable {@link Distribution} (no `halfWidth`: the support is unbounded)
 * @throws HotjunctionTypeError for a non-finite value or a mix of both forms; HotjunctionRangeError for a
 *   negative standard deviation or expanded uncertainty, a coverage factor ≤ 0, or degrees of freedom ≤ 0
 * @example
 * ```ts
 * import { normalDistribution } from "hotjunction";
 * console.log(normalDistribution({ mean: 10, expandedUncertainty: 0.5, coverageFactor: 2 }).standardUncertainty); // 0.25
 * console.log("halfWidth" in normalDistribution({ mean: 0, standardDeviation: 1 })); // false
 * ```
 */
export function normalDistribution(options: NormalOptions): InputDistribution {
  const context = "normal distribution";
  _requireOptionsObject(options, context, false);
  const form = _requireOneOf(options, [["standardDeviation"], ["expandedUncertainty", "coverageFactor"]], context);
  const o = options as Record<string, unknown>;
  const mean = _requireFinite(o["mean"], "mean", undefined, context);
  let u: number;
  if (form === 0) {
    u = _requireNonNegative(o["standardDeviation"], "standard deviation", undefined, context);
  } else {
    const expanded = _requireNonNegative(o["expandedUncertainty"], "expanded uncertainty", undefined, context);
    const k = _requirePositive(o["coverageFactor"], "coverage factor", undefined, context);
    u = expanded / k;
  }
  return _makeDistribution("normal", mean, u, undefined, undefined, o["degreesOfFreedom"], context);
}

/** @deprecated use {@link normalDistribution} (a name that says what it is); kept for one minor version. */
export const normal = normalDistribution;
