/**
 * SVG chart of a reference comparison (`compare --svg`): one panel per setpoint, each reference option's band
 * (the acceptance method's) side by side on the panel's one temperature axis, against the highest normal
 * operating temperature and the hazard limit. An option that keeps the margins is drawn solid grey, one that
 * fails cross-hatched, and every row is labelled with its verdict, so the chart reads without colour. Drawn by
 * the one band-panel drawing the trip chart uses.
 * @module
 */
import type { ReferenceComparison } from "../trip/types.js";
import { _bandPanelChartSvg } from "./bandPanelChart.js";
import { _displayOf, type ReportDisplayOptions } from "./displayUnit.js";
import { _describeMethods, _fixed, _methodShortName } from "./formatting.js";
import type { ReportMethodInfo } from "./reportTypes.js";
import { _invalidChoice, _requireShape } from "../errors.js";
import { _comparisonShape, _methodInfoShape } from "./_reportShapes.js";

/** The input of {@link comparisonChartSvg}: what `compare` computed and how. */
export interface ComparisonChartInput {
  readonly comparison: ReferenceComparison;
  /** Methods, coverage, trials and seed used. */
  readonly methods: ReportMethodInfo;
  readonly designName?: string;
  /**
   * Per setpoint (by name) the target trip and the limits, °C; the comparison rows carry the margins only. A
   * setpoint missing here is drawn without its limit lines' values (they are required: see the example).
   */
  readonly setpoints: readonly { readonly name: string; readonly tripTemperatureC: number; readonly maxNormalOperatingC: number; readonly hazardLimitC: number }[];
}

const passFill = "#9a9a9a";
const failFill = "url(#hj-cross)";

/**
 * Draws a reference comparison as an SVG document (text).
 * @param input - the comparison, its methods and each setpoint's target and limits (°C)
 * @param options - `temperatureUnit`: the axis and figures in `"C"` (default), `"F"` or `"K"`
 * @returns SVG text
 * @throws HotjunctionRangeError `INVALID_OPTION` when a compared setpoint has no target and limits in `input.setpoints`
 * @example
 * ```ts
 * import { comparisonChartSvg } from "hotjunction/report";
 * const option = (name: string, lowC: number, highC: number, pass: boolean) => ({
 *   name, kind: "element" as const, cost: null, networks: [], verdict: pass ? "adequate" as const : "inadequate" as const, verdictText: "",
 *   reference: { name, kind: "element" as const, nominalVolts: 5, toleranceFraction: 0.01, problems: [] },
 *   setpoints: [{ name: "guard", lowC, highC, idealLowC: 49, idealHighC: 51, extraWidthC: 0, marginToNormalC: lowC - 45, marginToHazardC: 60 - highC, pass }],
 * });
 * const svg = comparisonChartSvg({
 *   comparison: { acceptanceMethod: "worst-case", options: [option("rail", 44, 56, false), option("series", 48.5, 51.5, true)], recommended: "series", summary: "" },
 *   methods: { methods: ["worst-case"], coverage: 0.95 },
 *   setpoints: [{ name: "guard", tripTemperatureC: 50, maxNormalOperatingC: 45, hazardLimitC: 60 }],
 * });
 * console.log(svg.includes("series — PASS")); // true
 * ```
 */
export function comparisonChartSvg(input: ComparisonChartInput, options?: ReportDisplayOptions): string {
  _requireShape(input, { comparison: _comparisonShape, methods: _methodInfoShape, designName: ["optional", "string"], setpoints: ["array", { name: "string", tripTemperatureC: "number", maxNormalOperatingC: "number", hazardLimitC: "number" }] }, "input", "comparisonChartSvg");
  const display = _displayOf(options);
  const { comparison } = input;
  const names = comparison.options[0]?.setpoints.map((s) => s.name) ?? input.setpoints.map((s) => s.name);
  const panels = names.map((name) => {
    const limits = input.setpoints.find((s) => s.name === name);
    if (limits === undefined) {
      return _missingSetpoint(name, input.setpoints.map((s) => s.name));
    }
    return {
      heading: `${name}: target ${_fixed(display.at(limits.tripTemperatureC))} ${display.symbol}, ${_methodShortName(comparison.acceptanceMethod)} band of each reference option`,
      targetC: limits.tripTemperatureC,
      maxNormalOperatingC: limits.maxNormalOperatingC,
      hazardLimitC: limits.hazardLimitC,
      rows: comparison.options.flatMap((o) => {
        const s = o.setpoints.find((x) => x.name === name);
        if (s === undefined) return [];
        const verdict = s.pass ? "PASS" : "FAIL";
        return [{
          label: `${o.name.length > 34 ? `${o.name.slice(0, 33)}…` : o.name} — ${verdict}`,
          lowC: s.lowC,
          highC: s.highC,
          fill: s.pass ? passFill : failFill,
          className: `band option ${s.pass ? "option-pass" : "option-fail"}`,
          tooltip: `${o.name} (${verdict}${o.name === comparison.recommended ? ", recommended" : ""})`,
        }];
      }),
    };
  });
  const title = `Reference comparison${input.designName !== undefined ? `: ${input.designName}` : ""} — trip bands by reference`;
  return _bandPanelChartSvg({
    title,
    panels,
    legend: [
      { fill: passFill, text: "keeps the margins" },
      { fill: failFill, text: "fails a margin" },
    ],
    legendSpacing: 180,
    left: 300,
    footer: `${_describeMethods({ ...input.methods, acceptanceMethod: comparison.acceptanceMethod })} Recommended: ${comparison.recommended ?? "none of the options is adequate"}.`,
    display,
  });
}

function _missingSetpoint(name: string, known: readonly string[]): never {
  return _invalidChoice("setpoint", name, known, "comparison chart");
}
