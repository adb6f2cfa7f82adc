/**
 * Reference comparison renderers: which reference options keep every setpoint inside its margins, and at what
 * cost. Every format carries the caution and the methods.
 * @module
 */
import type { ReferenceComparison } from "../trip/types.js";
import { CAUTION_TEXT } from "./caution.js";
import { _cautionLine, _csv, _describeMethods, _fixed, _markdownTable, _signed, _textTable } from "./formatting.js";
import type { ReportFormat, ReportMethodInfo } from "./reportTypes.js";

function rows(comparison: ReferenceComparison): string[][] {
  const out: string[][] = [
    ["reference", "kind", "cost", "setpoint", "band °C", "ideal-reference band °C", "extra width °C", "margin low °C", "margin high °C", "result"],
  ];
  for (const option of comparison.options) {
    option.setpoints.forEach((s, i) => {
      out.push([
        i === 0 ? option.name : "",
        i === 0 ? option.kind : "",
        i === 0 ? (option.cost === null ? "-" : String(option.cost)) : "",
        s.name,
        `${_fixed(s.lowC)} to ${_fixed(s.highC)}`,
        `${_fixed(s.idealLowC)} to ${_fixed(s.idealHighC)}`,
        _fixed(s.extraWidthC),
        _signed(s.marginToNormalC),
        _signed(s.marginToHazardC),
        s.pass ? "PASS" : "FAIL",
      ]);
    });
  }
  return out;
}

/**
 * Renders a reference comparison.
 * @param comparison - result of `compareReferences`
 * @param format - `"text"`, `"markdown"`, `"csv"` or `"json"`
 * @param methods - methods, coverage, trials and seed used
 * @param designName - name of the design, shown in the heading
 * @returns the report text
 * @example
 * ```ts
 * import { formatComparisonReport } from "hotjunction/report";
 * const text = formatComparisonReport(
 *   { acceptanceMethod: "worst-case", options: [], recommended: null, summary: "No options." },
 *   "markdown",
 *   { methods: ["worst-case"], coverage: 0.95 },
 * );
 * console.log(text.split("\n")[0]); // "# Reference comparison"
 * ```
 */
export function formatComparisonReport(
  comparison: ReferenceComparison,
  format: ReportFormat,
  methods: ReportMethodInfo,
  designName?: string,
): string {
  const info: ReportMethodInfo = { ...methods, acceptanceMethod: comparison.acceptanceMethod };
  const heading = `Reference comparison${designName !== undefined ? `: ${designName}` : ""}`;
  const verdicts = comparison.options.map((o) => `${o.name}: ${o.verdict.toUpperCase()}. ${o.verdictText}`);
  const recommended = `Recommended: ${comparison.recommended ?? "none of the options is adequate"}.`;
  switch (format) {
    case "json":
      return `${JSON.stringify({ report: "reference-comparison", caution: CAUTION_TEXT, method: info, designName, ...comparison }, null, 2)}\n`;
    case "csv": {
      const table: (string | number | boolean | null)[][] = [
        ["reference", "kind", "cost", "verdict", "setpoint", "low_C", "high_C", "ideal_low_C", "ideal_high_C", "extra_width_C", "margin_to_normal_C", "margin_to_hazard_C", "pass"],
      ];
      for (const o of comparison.options) {
        for (const s of o.setpoints) {
          table.push([o.name, o.kind, o.cost, o.verdict, s.name, s.lowC, s.highC, s.idealLowC, s.idealHighC, s.extraWidthC, s.marginToNormalC, s.marginToHazardC, s.pass]);
        }
      }
      return `# ${_cautionLine()}\n# ${_describeMethods(info)}\n${_csv(table)}`;
    }
    case "markdown":
      return [
        `# ${heading}`,
        "",
        `> **Caution.** ${CAUTION_TEXT}`,
        "",
        comparison.summary,
        "",
        _markdownTable(rows(comparison)),
        "",
        ...verdicts.map((v) => `- ${v}`),
        "",
        `**${recommended}**`,
        "",
        "## Method",
        "",
        _describeMethods(info),
        "",
      ].join("\n");
    default:
      return [
        heading,
        "=".repeat([...heading].length),
        "",
        comparison.summary,
        "",
        _textTable(rows(comparison)),
        "",
        ...verdicts,
        "",
        recommended,
        "",
        _describeMethods(info),
        "",
        _cautionLine(),
        "",
      ].join("\n");
  }
}

/** @deprecated use {@link formatComparisonReport} (the one `format…` family of renderers); kept for one minor version. */
export const renderComparisonReport = formatComparisonReport;
