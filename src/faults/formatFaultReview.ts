/**
 * The fault review in one of its formats: the `format…(report, format)` shape every renderer of the library shares.
 * @module
 */
import { formatFaultReviewJson } from "./formatFaultReviewJson.js";
import { formatFaultReviewMarkdown } from "./formatFaultReviewMarkdown.js";
import { formatFaultReviewText } from "./formatFaultReviewText.js";
import type { FaultReviewReport } from "./types.js";
import { _invalidChoice } from "../errors.js";

/** Formats of a fault review. */
export type FaultReviewFormat = "text" | "markdown" | "json";

const formats: readonly FaultReviewFormat[] = ["text", "markdown", "json"];

/**
 * Renders a fault review report as text, Markdown or JSON (the same as {@link formatFaultReviewText},
 * {@link formatFaultReviewMarkdown} and {@link formatFaultReviewJson}). Every format carries the caution.
 * @param report - from `faultReviewReport` or `reviewChainFaults`
 * @param format - `"text"`, `"markdown"` or `"json"`
 * @returns the report text
 * @throws HotjunctionRangeError (`INVALID_OPTION`) for another format
 * @example
 * ```ts
 * import { faultReviewReport, formatFaultReview, formatFaultReviewText } from "hotjunction";
 * const report = faultReviewReport([], "empty review");
 * console.log(formatFaultReview(report, "text") === formatFaultReviewText(report)); // true
 * ```
 */
export function formatFaultReview(report: FaultReviewReport, format: FaultReviewFormat): string {
  switch (format) {
    case "text":
      return formatFaultReviewText(report);
    case "markdown":
      return formatFaultReviewMarkdown(report);
    case "json":
      return formatFaultReviewJson(report);
    default:
      return _invalidChoice("fault review format", format, formats, "formatFaultReview");
  }
}
