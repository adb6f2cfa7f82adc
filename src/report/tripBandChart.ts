/**
 * SVG chart of trip bands: one panel per setpoint with the worst-case, RSS and Monte Carlo bands against the
 * highest normal operating temperature (dashed line) and the hazard limit (solid thick line). Bands are told
 * apart by fill pattern and by a text label, so the chart reads without colour. Drawn by the one band-panel
 * drawing (`bandPanelChart.ts`), which the comparison chart shares.
 * @module
 */
import { _bandPanelChartSvg } from "./bandPanelChart.js";
import { _displayOf, type ReportDisplayOptions } from "./displayUnit.js";
import { _describeMethods, _fixed, _methodShortName } from "./formatting.js";
import type { TripReport } from "./reportTypes.js";
import { _methodFill } from "./svg.js";
import { _requireShape } from "../errors.js";
import { _tripReportShape } from "./_reportShapes.js";

/**
 * Draws the trip bands of a trip report as an SVG document (text).
 * @param report - trip report data
 * @param options - `temperatureUnit`: the axis and figures in `"C"` (default), `"F"` or `"K"`
 * @returns SVG text
 * @example
 * ```ts
 * import { tripBandChartSvg } from "hotjunction/report";
 * const svg = tripBandChartSvg({
 *   title: "Trip design", pass: true, details: [], notes: [], methods: { methods: ["worst-case"], coverage: 0.95 },
 *   setpoints: [{ name: "guard", tripTemperatureC: 50, nominalTripC: 50, bands: [{ method: "worst-case", lowC: 48, highC: 52, coverage: 1, standardUncertaintyC: 0 }],
 *     maxNormalOperatingC: 45, hazardLimitC: 60, marginToNormalC: 3, marginToHazardC: 8, pass: true, reason: "inside", errorSources: [] }],
 * });
 * console.log(svg.startsWith("<svg")); // true
 * ```
 */
export function tripBandChartSvg(report: TripReport, options?: ReportDisplayOptions): string {
  _requireShape(report, _tripReportShape, "report", "tripBandChartSvg");
  const display = _displayOf(options);
  const methods = report.setpoints[0]?.bands.map((b) => b.method) ?? [];
  return _bandPanelChartSvg({
    title: `${report.title}${report.designName !== undefined ? `: ${report.designName}` : ""} — trip bands`,
    panels: report.setpoints.map((s) => ({
      heading: `${s.name}: target ${_fixed(display.at(s.tripTemperatureC))} ${display.symbol} — ${s.pass ? "PASS" : "FAIL"}`,
      targetC: s.tripTemperatureC,
      maxNormalOperatingC: s.maxNormalOperatingC,
      hazardLimitC: s.hazardLimitC,
      rows: s.bands.map((band) => ({
        label: _methodShortName(band.method),
        lowC: band.lowC,
        highC: band.highC,
        fill: _methodFill[band.method],
        className: `band band-${band.method}`,
        tooltip: _methodShortName(band.method),
      })),
    })),
    legend: methods.map((m) => ({ fill: _methodFill[m], text: `${_methodShortName(m)} band` })),
    legendSpacing: 150,
    left: 150,
    footer: _describeMethods(report.methods),
    display,
  });
}
