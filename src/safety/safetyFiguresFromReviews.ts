/**
 * The safety figures of every setpoint of a design from its fault reviews in one call.
 * @module
 */
import { _invalidChoice, _requireOptionsObject, _requireShape } from "../errors.js";
import type { FaultReview } from "../faults/types.js";
import { safetyFaultClassesFromReview, type FaultReviewForSafety } from "./safetyFaultClassesFromReview.js";
import { safetyFigures } from "./safetyFigures.js";
import type { FailureData, SafetyFiguresOptions, SetpointSafetyFigures } from "./types.js";

/** Options of {@link safetyFiguresFromReviews}. */
export interface SafetyFiguresFromReviewsOptions extends SafetyFiguresOptions {
  /** Healthy worst-case trip band of each review, °C, in the order of the reviews; a missing entry uses the nominal trip. */
  readonly healthyBandsC?: readonly ({ readonly lowC: number; readonly highC: number } | undefined)[];
  /** Shift below which a fault is "no effect", °C. Default 3. */
  readonly noEffectThresholdC?: number;
}

/**
 * One {@link SetpointSafetyFigures} per review (per setpoint): each review re-read against its healthy worst-case
 * band ({@link safetyFaultClassesFromReview}), then combined with the failure data ({@link safetyFigures}). The
 * same failure data serves every setpoint; the classes, and so λ_DU, differ per setpoint.
 * @param failureData - rates (FIT) and mode shares of the design's elements
 * @param reviews - the reviews, e.g. `report.reviews` of a fault review report
 * @param options - bands °C per review, no-effect threshold °C, proof test, revealed faults, degraded counting
 * @returns the figures, in the order of the reviews
 * @throws as {@link safetyFaultClassesFromReview} and {@link safetyFigures}; HotjunctionRangeError when `reviews`
 *   is not an array
 * @example
 * ```ts
 * import { safetyFiguresFromReviews } from "hotjunction";
 * const review = { name: "bisque", healthyTripC: 1000, maxNormalOperatingC: 960, hazardLimitC: 1040, rows: [
 *   { faultId: "reference.driftedLow", effect: "trips-late" as const, shiftC: 30, detected: false },
 * ] };
 * const data = { elements: [{ element: "reference", rateFit: 10, modes: [{ mode: "drift", share: 1, faultId: "reference.driftedLow" }] }] };
 * const [nominal, worst] = [undefined, { lowC: 988, highC: 1012 }].map((band) =>
 *   safetyFiguresFromReviews(data, [review], { healthyBandsC: [band] })[0]);
 * console.log(nominal?.lambdaDuFit, nominal?.lambdaDegradedFit, worst?.lambdaDuFit); // 0 10 10
 * ```
 */
export function safetyFiguresFromReviews(
  failureData: FailureData,
  reviews: readonly (FaultReviewForSafety | FaultReview)[],
  options: SafetyFiguresFromReviewsOptions = {},
): SetpointSafetyFigures[] {
  if (!Array.isArray(reviews)) _invalidChoice("reviews", reviews, ["an array of fault reviews"], "safetyFiguresFromReviews");
  _requireOptionsObject(options, "safetyFiguresFromReviews", true);
  _requireShape(options.healthyBandsC, ["optional", ["array", ["optional", { lowC: "number", highC: "number" }]]], "options.healthyBandsC", "safetyFiguresFromReviews");
  const { healthyBandsC, noEffectThresholdC, ...figureOptions } = options;
  return reviews.map((review, i) => {
    const band = healthyBandsC?.[i];
    const classes = safetyFaultClassesFromReview(review, {
      ...(band !== undefined ? { healthyBandC: band } : {}),
      ...(noEffectThresholdC !== undefined ? { noEffectThresholdC } : {}),
    });
    return safetyFigures(failureData, classes, figureOptions);
  });
}
