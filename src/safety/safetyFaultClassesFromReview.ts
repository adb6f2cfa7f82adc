/**
 * Reads a setpoint's single-fault review as classified faults for the safety figures, reclassifying each
 * fault with the healthy worst-case band.
 * @module
 */
import { _invalidChoice, _requireOptionsObject, _requireShape, type _Shape } from "../errors.js";
import type { FaultReview, FaultReviewRow } from "../faults/types.js";
import { classifyFaultShift, defaultNoEffectThresholdC } from "../faults/classifyFaultShift.js";
import type { SetpointFaultClasses } from "./types.js";

/** The parts of a fault review the safety figures read (a {@link FaultReview} has them). */
export interface FaultReviewForSafety {
  readonly name: string;
  readonly healthyTripC: number;
  readonly maxNormalOperatingC: number;
  readonly hazardLimitC: number;
  /** The band the review judged with (a {@link FaultReview} carries it); used when the options give none. */
  readonly healthyBandC?: { readonly lowC: number; readonly highC: number };
  /** The review's no-effect threshold, °C; used when the options give none. */
  readonly noEffectThresholdC?: number;
  readonly rows: readonly Pick<FaultReviewRow, "faultId" | "effect" | "shiftC" | "detected">[];
}

const band: _Shape = ["optional", { lowC: "number", highC: "number" }];
/** What the classes read of a review: its name and limits, and per row the id, effect, shift and detection. */
const reviewShape: _Shape = {
  name: "string",
  healthyTripC: "number",
  maxNormalOperatingC: "number",
  hazardLimitC: "number",
  healthyBandC: band,
  noEffectThresholdC: ["optional", "number"],
  rows: ["array", { faultId: "string", effect: ["oneOf", ["trips-immediately", "trips-early", "trips-late", "never-trips", "no-change"]], shiftC: ["nullable", "number"], detected: "boolean" }],
};
const optionsShape: _Shape = { healthyBandC: band, noEffectThresholdC: ["optional", "number"] };

/** Options of {@link safetyFaultClassesFromReview}. */
export interface SafetyFaultClassesFromReviewOptions {
  /** Healthy worst-case trip band of this setpoint, °C. Default the review's band, else the nominal healthy trip (zero width). */
  readonly healthyBandC?: { readonly lowC: number; readonly highC: number };
  /** Shift below which a fault is "no effect", °C. Default the review's threshold, else 3. */
  readonly noEffectThresholdC?: number;
}

/**
 * The classified faults of one setpoint: each row of the review moved by its shift against the healthy
 * worst-case band by the review's own rule ({@link classifyFaultShift}; the band and threshold default to the
 * review's, so the classes equal the review's rows); detection as the review found it. A row that never trips is
 * dangerous; one that trips immediately is safe.
 * @param review - a {@link FaultReview} (or any object with its name, limits and rows)
 * @param options - healthy worst-case band °C, no-effect threshold °C
 * @returns name, faults (id, safety, detected, shift °C, margin °C) and the threshold used
 * @throws HotjunctionRangeError when `review.rows` is not an array; as {@link classifyFaultShift} for bad limits
 * @example
 * ```ts
 * import { safetyFaultClassesFromReview } from "hotjunction";
 * const review = {
 *   name: "kiln", healthyTripC: 252, maxNormalOperatingC: 230, hazardLimitC: 280,
 *   rows: [
 *     { faultId: "reference.driftedLow", effect: "trips-late" as const, shiftC: 24, detected: false },
 *     { faultId: "thermocouple.open", effect: "trips-immediately" as const, shiftC: -227, detected: true },
 *   ],
 * };
 * const nominal = safetyFaultClassesFromReview(review);
 * const worstCase = safetyFaultClassesFromReview(review, { healthyBandC: { lowC: 248, highC: 256 } });
 * console.log(nominal.faults[0]?.safety, worstCase.faults[0]?.safety); // "degraded" "dangerous"
 * console.log(worstCase.faults[1]?.safety, worstCase.faults[1]?.detected); // "safe" true
 * ```
 */
export function safetyFaultClassesFromReview(review: FaultReviewForSafety | FaultReview, options: SafetyFaultClassesFromReviewOptions = {}): SetpointFaultClasses {
  if (typeof review !== "object" || review === null || !Array.isArray(review.rows)) {
    _invalidChoice("review", review, ["a fault review with rows"], "safetyFaultClassesFromReview");
  }
  _requireShape(review, reviewShape, "review", "safetyFaultClassesFromReview");
  _requireOptionsObject(options, "safetyFaultClassesFromReview", true);
  _requireShape(options, optionsShape, "options", "safetyFaultClassesFromReview");
  const band = options.healthyBandC ?? review.healthyBandC ?? { lowC: review.healthyTripC, highC: review.healthyTripC };
  const thresholdOption = options.noEffectThresholdC ?? review.noEffectThresholdC;
  let threshold = thresholdOption ?? defaultNoEffectThresholdC;
  const faults = review.rows.map((row) => {
    const c = classifyFaultShift({
      shiftC: row.effect === "never-trips" ? null : row.shiftC,
      tripsImmediately: row.effect === "trips-immediately",
      healthyBandC: band,
      maxNormalOperatingC: review.maxNormalOperatingC,
      hazardLimitC: review.hazardLimitC,
      ...(thresholdOption !== undefined ? { noEffectThresholdC: thresholdOption } : {}),
    });
    threshold = c.noEffectThresholdC;
    return { faultId: row.faultId, safety: c.safety, detected: row.detected, shiftC: row.shiftC, marginC: c.marginC };
  });
  return { name: review.name, faults, noEffectThresholdC: threshold };
}
