/**
 * Markdown rendering of a fault review report.
 * @module
 */
import { _bandLine, _categoryWords, _checkReport, _countEntries, _faultDisplay, _fmt1, _sentenceInUnit } from "./_faultReviewWords.js";
import type { FaultReviewDisplayOptions, FaultReviewReport } from "./types.js";

function cell(text: string): string {
  return text.replace(/\\/g, "\\\\").replace(/\|/g, "\\|").replace(/\r?\n/g, " ");
}

/**
 * The report as Markdown: per trip a fault table (fault, element, effect on the trip, class, detection,
 * suggested mitigation), the counts per class and the notes; then the scope and the safety caution.
 * @param input - from {@link reviewTripDesignFaults}, {@link reviewChainFaults} or {@link faultReviewReport}
 * @returns Markdown text ending with a newline
 * @throws HotjunctionRangeError when `report` has no reviews array
 * @example
 * ```ts
 * import { faultReviewReport, formatFaultReviewMarkdown } from "hotjunction";
 * const md = formatFaultReviewMarkdown(faultReviewReport([], "demo"));
 * console.log(md.split("\n")[0]); // "# Single-fault review: demo"
 * ```
 */
export function formatFaultReviewMarkdown(input: FaultReviewReport, options?: FaultReviewDisplayOptions): string {
  const report = _checkReport(input, "formatFaultReviewMarkdown");
  const d = _faultDisplay(options?.temperatureUnit, "formatFaultReviewMarkdown");
  const u = (text: string): string => _sentenceInUnit(text, d);
  const out: string[] = [`# Single-fault review${report.name !== undefined ? `: ${cell(report.name)}` : ""}`, ""];
  out.push(`> **Caution.** ${report.caution}`, "");
  for (const review of report.reviews) {
    out.push(
      `## Trip: ${cell(review.name)}`,
      "",
      u(`Healthy trip ${_fmt1(review.healthyTripC)} °C; normal operation up to ${_fmt1(review.maxNormalOperatingC)} °C; hazard limit ${_fmt1(review.hazardLimitC)} °C. ${_bandLine(review)}`),
      "",
      "| Fault | Element | Effect on the trip | Class | Detection | Suggested mitigation |",
      "| --- | --- | --- | --- | --- | --- |",
    );
    for (const r of review.rows) {
      out.push(
        `| \`${cell(r.faultId)}\`: ${cell(u(r.description))} | ${cell(r.element)} | ${cell(u(r.effectText))} | ${_categoryWords[r.category]} | ${cell(u(r.detectionText))} | ${cell(r.mitigations.join("; ") || "—")} |`,
      );
    }
    out.push("", "| Class | Faults |", "| --- | ---: |");
    for (const [label, n] of _countEntries(review.counts)) out.push(`| ${label} | ${n} |`);
    out.push("", ...review.notes.map((n) => `- ${cell(u(n))}`), "");
  }
  if (report.reviews.length !== 1) {
    out.push("## Counts over all trips", "", "| Class | Faults |", "| --- | ---: |");
    for (const [label, n] of _countEntries(report.counts)) out.push(`| ${label} | ${n} |`);
    out.push("");
  }
  out.push("## Scope", "", report.scope, "");
  return `${out.join("\n")}`;
}
