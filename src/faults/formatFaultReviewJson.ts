/**
 * JSON rendering of a fault review report.
 * @module
 */
import { _checkReport } from "./_faultReviewWords.js";
import type { FaultReviewReport } from "./types.js";

/** Format tag of the JSON rendering. */
export const faultReviewJsonFormat = "hotjunction-fault-review/1";

/**
 * The report as JSON text (2-space indent): `{ format, caution, scope, name?, counts, reviews }`; every number in
 * its unit by key name, `tripC`/`shiftC` null when the output never trips. Custom (function) effects are not part
 * of the report, so it always serializes.
 * @param input - from {@link reviewTripDesignFaults}, {@link reviewChainFaults} or {@link faultReviewReport}
 * @returns JSON text ending with a newline
 * @throws HotjunctionRangeError when `report` has no reviews array
 * @example
 * ```ts
 * import { faultReviewReport, formatFaultReviewJson } from "hotjunction";
 * const data = JSON.parse(formatFaultReviewJson(faultReviewReport([])));
 * console.log(data.format, data.counts.total); // "hotjunction-fault-review/1" 0
 * ```
 */
export function formatFaultReviewJson(input: FaultReviewReport): string {
  const report = _checkReport(input, "formatFaultReviewJson");
  const { caution, scope, counts, reviews } = report;
  const body = {
    format: faultReviewJsonFormat,
    caution,
    scope,
    ...(report.name !== undefined ? { name: report.name } : {}),
    counts,
    reviews,
  };
  return `${JSON.stringify(body, null, 2)}\n`;
}
