/**
 * The safety figures in one of their formats: the `format…(report, format)` shape every renderer of the library
 * shares.
 * @module
 */
import { _invalidChoice } from "../errors.js";
import { formatSafetyFiguresCsv } from "./formatSafetyFiguresCsv.js";
import { formatSafetyFiguresJson } from "./formatSafetyFiguresJson.js";
import { formatSafetyFiguresMarkdown } from "./formatSafetyFiguresMarkdown.js";
import { formatSafetyFiguresText } from "./formatSafetyFiguresText.js";
import type { SafetyFiguresReport } from "./types.js";

/** Formats of a safety-figures report. */
export type SafetyFiguresFormat = "text" | "markdown" | "json" | "csv";

const formats: readonly SafetyFiguresFormat[] = ["text", "markdown", "json", "csv"];

/**
 * Renders a safety-figures report as text, Markdown, JSON or CSV (the same as {@link formatSafetyFiguresText},
 * {@link formatSafetyFiguresMarkdown}, {@link formatSafetyFiguresJson} and {@link formatSafetyFiguresCsv}). Every
 * format carries the scope, the no-certification statement and the caution.
 * @param report - from {@link safetyFiguresReport}
 * @param format - `"text"`, `"markdown"`, `"json"` or `"csv"`
 * @returns the report text
 * @throws HotjunctionRangeError (`INVALID_OPTION`) for another format
 * @example
 * ```ts
 * import { formatSafetyFigures, formatSafetyFiguresCsv, safetyFiguresReport } from "hotjunction";
 * const report = safetyFiguresReport({ name: "kiln" });
 * console.log(formatSafetyFigures(report, "csv") === formatSafetyFiguresCsv(report)); // true
 * ```
 */
export function formatSafetyFigures(report: SafetyFiguresReport, format: SafetyFiguresFormat): string {
  switch (format) {
    case "text":
      return formatSafetyFiguresText(report);
    case "markdown":
      return formatSafetyFiguresMarkdown(report);
    case "json":
      return formatSafetyFiguresJson(report);
    case "csv":
      return formatSafetyFiguresCsv(report);
    default:
      return _invalidChoice("safety figures format", format, formats, "formatSafetyFigures");
  }
}
