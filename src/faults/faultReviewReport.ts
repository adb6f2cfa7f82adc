/**
 * Gathers the reviews of several trips into one report with the scope statement and the safety caution.
 * @module
 */
import type { MeasurementChain } from "../chain/types.js";
import { _invalidChoice, _requireFiniteData, _requireObject, _requireShape } from "../errors.js";
import { _reviewShape } from "./_faultReviewWords.js";
import { CAUTION_TEXT } from "../caution.js";
import { _countCategories } from "./_faultClassification.js";
import { reviewFaults } from "./reviewFaults.js";
import type { FaultReview, FaultReviewReport, FaultReviewTrip, ReviewFaultsOptions } from "./types.js";

/**
 * What every fault review covers, in words: single faults of the modelled elements only.
 * @example
 * ```ts
 * import { faultReviewScope } from "hotjunction";
 * console.log(faultReviewScope.startsWith("Single faults of the modelled elements only")); // true
 * ```
 */
export const faultReviewScope: string =
  "Single faults of the modelled elements only: one fault at a time, each a deterministic change of the nominal " +
  "chain. Multiple and common-cause faults, wiring and connectors beyond the modelled elements, firmware, the " +
  "heater's own switching and the process itself are not covered. The classes use the vocabulary of the " +
  "functional-safety standards (safe / dangerous / no effect, detected / undetected); this review claims no certification.";

/**
 * A report from reviews already made (one per trip), with the category counts summed, the scope and the caution.
 * @param reviews - results of {@link reviewFaults}
 * @param name - optional design label
 * @returns the report
 * @throws HotjunctionRangeError when `reviews` is not an array
 * @example
 * ```ts
 * import { faultReviewReport } from "hotjunction";
 * const report = faultReviewReport([], "empty");
 * console.log(report.counts.total, report.caution.startsWith("These numbers do not certify")); // 0 true
 * ```
 */
export function faultReviewReport(reviews: readonly FaultReview[], name?: string): FaultReviewReport {
  if (!Array.isArray(reviews)) _invalidChoice("reviews", reviews, ["an array of fault reviews"], "fault review report");
  // the reviews are returned as they are: checked as the renderers read them, and free of NaN and ±Infinity
  _requireShape(reviews, ["array", _reviewShape], "reviews", "faultReviewReport");
  _requireFiniteData(reviews, "reviews", "faultReviewReport");
  _requireShape(name, ["optional", "string"], "name", "faultReviewReport");
  const rows = reviews.flatMap((r) => r.rows);
  return {
    ...(name !== undefined ? { name } : {}),
    reviews,
    counts: _countCategories(rows),
    scope: faultReviewScope,
    caution: CAUTION_TEXT,
  };
}

/**
 * Reviews several trips of one chain (e.g. the setpoints of an ADC chain's firmware, or the taps of a ladder)
 * with the same options, as one report. See {@link reviewFaults} for the method.
 * @param chain - the chain
 * @param trips - one entry per trip (name, tap, setpoint °C, process limits °C)
 * @param options - as for {@link reviewFaults}
 * @returns the report (reviews in input order)
 * @throws as {@link reviewFaults}
 * @example
 * ```ts
 * import { reviewChainFaults, type MeasurementChain } from "hotjunction";
 * const chain: MeasurementChain = {
 *   thermocouple: { kind: "thermocouple", type: "T", tolerance: { standard: "IEC 60584-1", class: 1 } },
 *   coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0.5 },
 *   amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 200 } },
 *   detector: { kind: "adc", bits: 12, fullScaleVolts: 2.048 },
 *   ambient: { minC: 0, maxC: 50 },
 * };
 * const report = reviewChainFaults(chain, [{ name: "plate", tripTemperatureC: 90, maxNormalOperatingC: 80, hazardLimitC: 100 }]);
 * const stuck = report.reviews[0]?.rows.find((r) => r.faultId === "adc.codeStuckZero");
 * console.log(stuck?.category); // "dangerous-undetected"
 * ```
 */
export function reviewChainFaults(
  chain: MeasurementChain,
  trips: readonly FaultReviewTrip[],
  options?: ReviewFaultsOptions,
): FaultReviewReport {
  if (!Array.isArray(trips)) _invalidChoice("trips", trips, ["an array of trips"], "fault review");
  // Checked here too: with no trips, reviewFaults (which checks the chain) never runs.
  _requireObject(chain, "chain", "fault review");
  return faultReviewReport(
    trips.map((t) => reviewFaults(chain, t, options)),
    chain.label,
  );
}
