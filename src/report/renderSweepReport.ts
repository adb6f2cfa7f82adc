/**
 * Error-sweep renderers: a chain's reading error bounds over a range of true temperatures.
 * @module
 */
import { CAUTION_TEXT } from "./caution.js";
import { _cautionLine, _csv, _describeMethods, _fixed, _markdownTable, _methodShortName, _signed, _textTable } from "./formatting.js";
import type { ErrorSweep, ReportFormat } from "./reportTypes.js";

function rows(sweep: ErrorSweep): string[][] {
  const methods = sweep.rows[0]?.bands.map((b) => b.method) ?? [];
  const withSources = sweep.rows.some((r) => r.largestSources !== undefined);
  return [
    ["true °C", "nominal error °C", ...methods.map((m) => `${_methodShortName(m)} error °C`), ...(withSources ? ["largest sources ±°C"] : [])],
    ...sweep.rows.map((r) => [
      _fixed(r.temperatureC, 1),
      _signed(r.nominalErrorC, 2),
      ...r.bands.map((b) => `${_signed(b.errorLowC, 2)} to ${_signed(b.errorHighC, 2)}`),
      ...(withSources ? [(r.largestSources ?? []).map((s) => `${s.source} ${_fixed(s.halfSwingC, 2)}`).join(", ")] : []),
    ]),
  ];
}

/**
 * Renders an error sweep.
 * @param sweep - sweep data
 * @param format - `"text"`, `"markdown"`, `"csv"` or `"json"`
 * @returns the report text
 * @example
 * ```ts
 * import { formatSweepReport } from "hotjunction/report";
 * const csv = formatSweepReport(
 *   { title: "Error sweep", rows: [{ temperatureC: 100, nominalErrorC: 0, bands: [{ method: "worst-case", errorLowC: -2, errorHighC: 2 }] }], notes: [], methods: { methods: ["worst-case"], coverage: 0.95 } },
 *   "csv",
 * );
 * console.log(csv.trim().split("\n").at(-1)); // "100,0,worst-case,-2,2"
 * ```
 */
export function formatSweepReport(sweep: ErrorSweep, format: ReportFormat): string {
  const heading = `${sweep.title}${sweep.designName !== undefined ? `: ${sweep.designName}` : ""}`;
  switch (format) {
    case "json":
      return `${JSON.stringify({ report: "error-sweep", reportSchemaVersion: 1, caution: CAUTION_TEXT, method: sweep.methods, ...sweep }, null, 2)}\n`;
    case "csv": {
      const table: (string | number)[][] = [["true_C", "nominal_error_C", "method", "error_low_C", "error_high_C"]];
      for (const r of sweep.rows) for (const b of r.bands) table.push([r.temperatureC, r.nominalErrorC, b.method, b.errorLowC, b.errorHighC]);
      return `# ${_cautionLine()}\n# ${_describeMethods(sweep.methods)}\n${_csv(table)}`;
    }
    case "markdown":
      return [
        `# ${heading}`,
        "",
        `> **Caution.** ${CAUTION_TEXT}`,
        "",
        "Error = indicated minus true temperature.",
        "",
        _markdownTable(rows(sweep)),
        "",
        "## Method",
        "",
        _describeMethods(sweep.methods),
        ...(sweep.notes.length > 0 ? ["", ...sweep.notes.map((n) => `- ${n}`)] : []),
        "",
      ].join("\n");
    default:
      return [
        heading,
        "=".repeat([...heading].length),
        "Error = indicated minus true temperature.",
        "",
        _textTable(rows(sweep)),
        "",
        _describeMethods(sweep.methods),
        ...sweep.notes.map((n) => `Note: ${n}`),
        "",
        _cautionLine(),
        "",
      ].join("\n");
  }
}

/** @deprecated use {@link formatSweepReport} (the one `format…` family of renderers); kept for one minor version. */
export const renderSweepReport = formatSweepReport;
