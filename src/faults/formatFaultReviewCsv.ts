/**
 * CSV rendering of a fault review report.
 * @module
 */
import { _csvField } from "../csvField.js";
import { _checkReport } from "./_faultReviewWords.js";
import type { FaultReviewReport } from "./types.js";


/**
 * The report as CSV (RFC 4180 quoting, "\n" line ends): one line per fault and trip with the columns
 * `trip,faultId,element,effect,tripC,shiftC,safety,marginC,detected,detectedBy,category,healthyTripC,bandLowC,bandHighC,noEffectThresholdC,maxNormalOperatingC,hazardLimitC`
 * (°C; `tripC`, `shiftC` and `marginC` empty when the output never trips; `detectedBy` methods joined by `;`),
 * then `#` lines with the scope and the safety caution.
 * @param input - from {@link reviewTripDesignFaults}, {@link reviewChainFaults} or {@link faultReviewReport}
 * @returns CSV text ending with a newline
 * @throws HotjunctionRangeError when `report` has no reviews array
 * @example
 * ```ts
 * import { faultReviewReport, formatFaultReviewCsv } from "hotjunction";
 * const csv = formatFaultReviewCsv(faultReviewReport([]));
 * console.log(csv.split("\n")[0]?.startsWith("trip,faultId,element,effect,tripC,shiftC,safety,marginC")); // true
 * ```
 */
export function formatFaultReviewCsv(input: FaultReviewReport): string {
  const report = _checkReport(input, "formatFaultReviewCsv");
  const header = [
    "trip", "faultId", "element", "effect", "tripC", "shiftC", "safety", "marginC", "detected", "detectedBy", "category",
    "healthyTripC", "bandLowC", "bandHighC", "noEffectThresholdC", "maxNormalOperatingC", "hazardLimitC",
  ];
  const lines = [header.join(",")];
  for (const review of report.reviews) {
    for (const r of review.rows) {
      lines.push(
        [
          review.name, r.faultId, r.element, r.effect, r.tripC, r.shiftC, r.safety, r.marginC, r.detected, r.detectedBy.join(";"), r.category,
          review.healthyTripC, review.healthyBandC.lowC, review.healthyBandC.highC, review.noEffectThresholdC, review.maxNormalOperatingC, review.hazardLimitC,
        ]
          .map(_csvField)
          .join(","),
      );
    }
  }
  lines.push(`# Scope: ${report.scope.replace(/\r?\n/g, " ")}`, `# CAUTION: ${report.caution.replace(/\r?\n/g, " ")}`);
  return `${lines.join("\n")}\n`;
}
