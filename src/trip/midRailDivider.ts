/**
 * A mid-rail divider of two equal resistors and its error.
 * @module
 */
import { _requireFinite, HotjunctionRangeError } from "../errors.js";

/** Options of {@link midRailDivider}. */
export interface MidRailDividerOptions {
  /** Error bound of the rail itself, ±fraction, 0 … 0.5. Default 0. */
  readonly referenceToleranceFraction?: number;
}

/** Result of {@link midRailDivider}. */
export interface MidRailDivider {
  /** V_ref/2, V. */
  readonly nominalVolts: number;
  /** Worst-case extremes of the tap voltage, V (exact, resistors and rail at their bounds). */
  readonly worstCaseLowVolts: number;
  readonly worstCaseHighVolts: number;
  /** Worst-case relative error bound of the tap, ±fraction (exact). */
  readonly worstCaseFraction: number;
  /**
   * Relative standard uncertainty of the tap (GUM first order, rectangular tolerances):
   * √( 2·(½·t/√3)² + (t_ref/√3)² ) = √(t²/6 + t_ref²/3).
   */
  readonly relativeStandardUncertainty: number;
}

/**
 * The tap of two equal resistors across a rail: V_ref/2, and how far it can stray. With resistors of
 * tolerance t, the ratio k = R₂/(R₁+R₂) lies between (1−t)/2 and (1+t)/2 exactly (R₁ high and R₂ low, or the
 * reverse), so the ratio error is ±t — the same fraction as one resistor, since ∂ln k/∂ln R = ±(1−k) = ±½ for
 * each of the two. The rail's own tolerance adds in full.
 * @param referenceVolts - rail voltage, V, > 0
 * @param resistorToleranceFraction - tolerance of each resistor, ±fraction, 0 … 0.5
 * @param options - `referenceToleranceFraction`: the rail's tolerance, ±fraction
 * @returns nominal and worst-case tap voltage, V, and the relative error figures
 * @throws HotjunctionRangeError for a tolerance out of range or a non-positive rail; HotjunctionTypeError
 *   for non-finite input
 * @example
 * ```ts
 * import { midRailDivider } from "hotjunction";
 * const mid = midRailDivider(5, 0.01);
 * console.log(mid.nominalVolts, mid.worstCaseLowVolts.toFixed(4), mid.worstCaseHighVolts.toFixed(4)); // 2.5 2.4750 2.5250
 * console.log((mid.relativeStandardUncertainty * 100).toFixed(4)); // 0.4082
 * ```
 * @see error-budget conventions for dividers, ∂ln k/∂ln R₂ = 1 − k (common practice, no source)
 */
// Deliberately alike: a public entry's signature with its options default and context line (as reviewTripDesignFaults).
export function midRailDivider(
  referenceVolts: number,
  resistorToleranceFraction: number,
  options: MidRailDividerOptions = {},
): MidRailDivider {
  const context = "midRailDivider";
  const rail = _requireFinite(referenceVolts, "referenceVolts", "V", context);
  if (!(rail > 0)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "referenceVolts", value: rail, min: 0, unit: "V", context, problem: "is not positive" });
  }
  const t = _requireFinite(resistorToleranceFraction, "resistorToleranceFraction", undefined, context);
  if (t < 0 || t > 0.5) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "resistorToleranceFraction", value: t, min: 0, max: 0.5, context });
  }
  const tRef = _requireFinite(options.referenceToleranceFraction ?? 0, "referenceToleranceFraction", undefined, context);
  if (tRef < 0 || tRef > 0.5) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "referenceToleranceFraction", value: tRef, min: 0, max: 0.5, context });
  }
  const nominalVolts = rail / 2;
  const lowRatio = (1 - t) / ((1 + t) + (1 - t));
  const highRatio = (1 + t) / ((1 - t) + (1 + t));
  const worstCaseLowVolts = rail * (1 - tRef) * lowRatio;
  const worstCaseHighVolts = rail * (1 + tRef) * highRatio;
  return {
    nominalVolts,
    worstCaseLowVolts,
    worstCaseHighVolts,
    worstCaseFraction: worstCaseHighVolts / nominalVolts - 1,
    relativeStandardUncertainty: Math.sqrt((t * t) / 6 + (tRef * tRef) / 3),
  };
}
