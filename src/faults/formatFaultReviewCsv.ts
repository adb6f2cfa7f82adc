/**
 * CSV rendering of a fault review report.
 * @module
 */
import { _csvField } from "../csvField.js";
import { _checkReport, _faultDisplay, _sentenceInUnit } from "./_faultReviewWords.js";
import type { FaultReviewDisplayOptions, FaultReviewReport } from "./types.js";


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
export function formatFaultReviewCsv(input: FaultReviewReport, options?: FaultReviewDisplayOptions): string {
  const report = _checkReport(input, "formatFaultReviewCsv");
  const d = _faultDisplay(options?.temperatureUnit, "formatFaultReviewCsv");
  const x = d.unit;
  const at = (v: number | null): number | null => (v === null ? null : d.at(v));
  const diff = (v: number | null): number | null => (v === null ? null : d.diff(v));
  const header = [
    "trip", "faultId", "element", "effect", `trip${x}`, `shift${x}`, "safety", `margin${x}`, "detected", "detectedBy", "category",
    `healthyTrip${x}`, `bandLow${x}`, `bandHigh${x}`, `noEffectThreshold${x}`, `maxNormalOperating${x}`, `hazardLimit${x}`, "description",
  ];
  const lines = [header.join(",")];
  for (const review of report.reviews) {
    for (const r of review.rows) {
      lines.push(
        [
          review.name, r.faultId, r.element, r.effect, at(r.tripC), diff(r.shiftC), r.safety, diff(r.marginC), r.detected, r.detectedBy.join(";"), r.category,
          at(review.healthyTripC), at(review.healthyBandC.lowC), at(review.healthyBandC.highC), diff(review.noEffectThresholdC), at(review.maxNormalOperatingC), at(review.hazardLimitC), _sentenceInUnit(r.description, d),
        ]
          .map(_csvField)
          .join(","),
      );
    }
  }
  if (d.unit !== "C") lines.push(`# temperatures in ${d.symbol} (differences ×${d.unit === "F" ? "1.8" : "1"} of °C); the JSON review keeps °C`);
  lines.push(`# Scope: ${report.scope.replace(/\r?\n/g, " ")}`, `# CAUTION: ${report.caution.replace(/\r?\n/g, " ")}`);
  return `${lines.join("\n")}\n`;
}
