/**
 * The fault review in one of its formats: the `format…(report, format)` shape every renderer of the library shares.
 * @module
 */
import { formatFaultReviewCsv } from "./formatFaultReviewCsv.js";
import { formatFaultReviewJson } from "./formatFaultReviewJson.js";
import { formatFaultReviewMarkdown } from "./formatFaultReviewMarkdown.js";
import { formatFaultReviewText } from "./formatFaultReviewText.js";
import type { FaultReviewDisplayOptions, FaultReviewReport } from "./types.js";
import { _invalidChoice } from "../errors.js";

/** Formats of a fault review. */
export type FaultReviewFormat = "text" | "markdown" | "json" | "csv";

const formats: readonly FaultReviewFormat[] = ["text", "markdown", "json", "csv"];

/**
 * Renders a fault review report as text, Markdown, JSON or CSV (the same as {@link formatFaultReviewText},
 * {@link formatFaultReviewMarkdown}, {@link formatFaultReviewJson} and {@link formatFaultReviewCsv}). Every format
 * carries the caution.
 * @param report - from `faultReviewReport` or `reviewChainFaults`
 * @param format - `"text"`, `"markdown"`, `"json"` or `"csv"`
 * @returns the report text
 * @throws HotjunctionRangeError (`INVALID_OPTION`) for another format
 * @example
 * ```ts
 * import { faultReviewReport, formatFaultReview, formatFaultReviewText } from "hotjunction";
 * const report = faultReviewReport([], "empty review");
 * console.log(formatFaultReview(report, "text") === formatFaultReviewText(report)); // true
 * ```
 */
export function formatFaultReview(report: FaultReviewReport, format: FaultReviewFormat, options?: FaultReviewDisplayOptions): string {
  // Deliberately alike: every format… entry switches on the format to its own renderers (formatTripReport too).
  switch (format) {
    case "text":
      return formatFaultReviewText(report, options);
    case "markdown":
      return formatFaultReviewMarkdown(report, options);
    case "json":
      return formatFaultReviewJson(report);
    case "csv":
      return formatFaultReviewCsv(report, options);
    default:
      return _invalidChoice("fault review format", format, formats, "formatFaultReview");
  }
}
