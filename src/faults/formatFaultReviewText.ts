/**
 * Plain-text rendering of a fault review report.
 * @module
 */
import { _wrapWords } from "../textWrap.js";
import { _bandLine, _categoryWords, _checkReport, _countEntries, _faultDisplay, _fmt1, _sentenceInUnit } from "./_faultReviewWords.js";
import type { FaultReviewDisplayOptions, FaultReviewReport } from "./types.js";

function wrap(text: string, width: number, indent: string): string[] {
  return _wrapWords(text, width).map((line) => indent + line);
}

/**
 * The report as plain text for a terminal: per trip a header, one block per fault (class, effect on the trip,
 * detection, mitigation), the counts per class and the notes; then the scope and the safety caution.
 * @param input - from {@link reviewTripDesignFaults}, {@link reviewChainFaults} or {@link faultReviewReport}
 * @returns the text, lines joined with "\n", ending with a newline
 * @throws HotjunctionRangeError when `report` has no reviews array
 * @example
 * ```ts
 * import { faultReviewReport, formatFaultReviewText } from "hotjunction";
 * const text = formatFaultReviewText(faultReviewReport([], "demo"));
 * console.log(text.split("\n")[0]); // "Single-fault review: demo"
 * ```
 */
export function formatFaultReviewText(input: FaultReviewReport, options?: FaultReviewDisplayOptions): string {
  const report = _checkReport(input, "formatFaultReviewText");
  const d = _faultDisplay(options?.temperatureUnit, "formatFaultReviewText");
  const u = (text: string): string => _sentenceInUnit(text, d);
  const lines: string[] = [`Single-fault review${report.name !== undefined ? `: ${report.name}` : ""}`, ""];
  for (const review of report.reviews) {
    lines.push(
      u(`Trip "${review.name}": healthy trip ${_fmt1(review.healthyTripC)} °C, normal operation up to ${_fmt1(review.maxNormalOperatingC)} °C, hazard limit ${_fmt1(review.hazardLimitC)} °C`),
      u(_bandLine(review)),
      "",
    );
    const idWidth = Math.max(5, ...review.rows.map((r) => r.faultId.length));
    const classWidth = Math.max(...Object.values(_categoryWords).map((w) => w.length));
    for (const row of review.rows) {
      lines.push(`${row.faultId.padEnd(idWidth)}  ${_categoryWords[row.category].padEnd(classWidth)}  ${u(row.effectText)}`);
      const indent = " ".repeat(idWidth + 2);
      lines.push(...wrap(u(row.description), 100, indent));
      lines.push(...wrap(`detection: ${u(row.detectionText)}`, 100, indent));
      if (row.mitigations.length > 0) lines.push(...wrap(`mitigation: ${row.mitigations.join("; ")}`, 100, indent));
    }
    lines.push("", "Counts:");
    for (const [label, n] of _countEntries(review.counts)) lines.push(`  ${label.padEnd(22)} ${n}`);
    lines.push("", "Notes:");
    for (const note of review.notes) lines.push(...wrap(u(note), 100, "  "));
    lines.push("");
  }
  if (report.reviews.length !== 1) {
    lines.push("Counts over all trips:");
    for (const [label, n] of _countEntries(report.counts)) lines.push(`  ${label.padEnd(22)} ${n}`);
    lines.push("");
  }
  lines.push(...wrap(`Scope: ${report.scope}`, 100, ""), "", ...wrap(`CAUTION: ${report.caution}`, 100, ""));
  return `${lines.join("\n")}\n`;
}
