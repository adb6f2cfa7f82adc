/**
 * Reference comparison renderers: which reference options keep every setpoint inside its margins, and at what
 * cost. Every format carries the caution and the methods.
 * @module
 */
import type { ReferenceComparison } from "../trip/types.js";
import { CAUTION_TEXT } from "./caution.js";
import { _cautionLine, _csv, _describeMethods, _fixed, _markdownTable, _signed, _textTable } from "./formatting.js";
import type { ReportFormat, ReportMethodInfo } from "./reportTypes.js";
import { _sentenceInUnit } from "../faults/_faultReviewWords.js";
import { _csvUnitLine, _displayOf, _jsonUnitField, type ReportDisplayOptions, type _TemperatureDisplay } from "./displayUnit.js";
import { _requireShape } from "../errors.js";
import { _comparisonShape, _methodInfoShape } from "./_reportShapes.js";

function rows(comparison: ReferenceComparison, d: _TemperatureDisplay): string[][] {
  const u = d.symbol;
  const out: string[][] = [
    ["reference", "kind", "cost", "setpoint", `band ${u}`, `ideal-reference band ${u}`, `extra width ${u}`, `margin low ${u}`, `margin high ${u}`, "result"],
  ];
  for (const option of comparison.options) {
    option.setpoints.forEach((s, i) => {
      out.push([
        i === 0 ? option.name : "",
        i === 0 ? option.kind : "",
        i === 0 ? (option.cost === null ? "-" : String(option.cost)) : "",
        s.name,
        `${_fixed(d.at(s.lowC))} to ${_fixed(d.at(s.highC))}`,
        `${_fixed(d.at(s.idealLowC))} to ${_fixed(d.at(s.idealHighC))}`,
        _fixed(d.diff(s.extraWidthC)),
        _signed(d.diff(s.marginToNormalC)),
        _signed(d.diff(s.marginToHazardC)),
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
 * @param options - `temperatureUnit` `"C"` (default), `"F"` or `"K"` for text, Markdown and CSV (bands with the
 *   offset, widths and margins by the scale); JSON keeps °C and records the unit as `temperatureUnit`
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
  options?: ReportDisplayOptions,
): string {
  _requireShape(comparison, _comparisonShape, "comparison", "formatComparisonReport");
  _requireShape(methods, _methodInfoShape, "methods", "formatComparisonReport");
  _requireShape(designName, ["optional", "string"], "designName", "formatComparisonReport");
  const d = _displayOf(options);
  const x = d.csvSuffix;
  const info: ReportMethodInfo = { ...methods, acceptanceMethod: comparison.acceptanceMethod };
  const heading = `Reference comparison${designName !== undefined ? `: ${designName}` : ""}`;
  const verdicts = comparison.options.map((o) => `${o.name}: ${o.verdict.toUpperCase()}. ${_sentenceInUnit(o.verdictText, d)}`);
  const recommended = `Recommended: ${comparison.recommended ?? "none of the options is adequate"}.`;
  switch (format) {
    case "json":
      return `${JSON.stringify({ report: "reference-comparison", reportSchemaVersion: 1, caution: CAUTION_TEXT, method: info, designName, ..._jsonUnitField(d), ...comparison }, null, 2)}\n`;
    case "csv": {
      const table: (string | number | boolean | null)[][] = [
        ["reference", "kind", "cost", "verdict", "setpoint", `low_${x}`, `high_${x}`, `ideal_low_${x}`, `ideal_high_${x}`, `extra_width_${x}`, `margin_to_normal_${x}`, `margin_to_hazard_${x}`, "pass"],
      ];
      for (const o of comparison.options) {
        for (const s of o.setpoints) {
          table.push([o.name, o.kind, o.cost, o.verdict, s.name, d.at(s.lowC), d.at(s.highC), d.at(s.idealLowC), d.at(s.idealHighC), d.diff(s.extraWidthC), d.diff(s.marginToNormalC), d.diff(s.marginToHazardC), s.pass]);
        }
      }
      return `# ${_cautionLine()}\n# ${_describeMethods(info)}\n${_csvUnitLine(d)}${_csv(table)}`;
    }
    case "markdown":
      return [
        `# ${heading}`,
        "",
        `> **Caution.** ${CAUTION_TEXT}`,
        "",
        comparison.summary,
        "",
        _markdownTable(rows(comparison, d)),
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
      // Deliberately alike: every text report opens with its heading underlined (the sweep report too).
      return [
        heading,
        "=".repeat([...heading].length),
        "",
        comparison.summary,
        "",
        _textTable(rows(comparison, d)),
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
