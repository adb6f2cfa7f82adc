/**
 * SVG chart of trip bands: one panel per setpoint with the worst-case, RSS and Monte Carlo bands against the
 * highest normal operating temperature (dashed line) and the hazard limit (solid thick line). Bands are told
 * apart by fill pattern and by a text label, so the chart reads without colour.
 * @module
 */
import { scaleLinear } from "d3-scale";
import { _describeMethods, _fixed, _methodShortName } from "./formatting.js";
import type { TripReport } from "./reportTypes.js";
import { _bottomAxis, _element, _methodFill, _splitCaution, _svgDocument, _text } from "./svg.js";
import { _wrapWords } from "../textWrap.js";

/**
 * Draws the trip bands of a trip report as an SVG document (text).
 * @param report - trip report data
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
export function tripBandChartSvg(report: TripReport): string {
  const width = 900;
  const left = 150;
  const right = 30;
  const top = 56;
  const rowHeight = 22;
  const legendHeight = 70;
  const title = `${report.title}${report.designName !== undefined ? `: ${report.designName}` : ""} — trip bands`;
  const parts: string[] = [_text(width / 2, 24, title, { "text-anchor": "middle", "font-size": 16, "font-weight": "bold", class: "chart-title" })];
  let y = top;
  for (const s of report.setpoints) {
    const values = [s.maxNormalOperatingC, s.hazardLimitC, s.tripTemperatureC, ...s.bands.flatMap((b) => [b.lowC, b.highC])];
    const lo = Math.min(...values);
    const hi = Math.max(...values);
    const pad = Math.max((hi - lo) * 0.1, 0.5);
    const x = scaleLinear().domain([lo - pad, hi + pad]).range([left, width - right]).nice();
    const panelHeight = s.bands.length * rowHeight + 16;
    parts.push(_text(left, y - 6, `${s.name}: target ${_fixed(s.tripTemperatureC)} °C — ${s.pass ? "PASS" : "FAIL"}`, { "font-size": 13, "font-weight": "bold", class: "panel-title" }));
    const panel: string[] = [];
    s.bands.forEach((band, i) => {
      const rowY = y + 8 + i * rowHeight;
      panel.push(_text(left - 8, rowY + 13, _methodShortName(band.method), { "text-anchor": "end", "font-size": 12, class: "band-label" }));
      panel.push(
        _element("rect", {
          class: `band band-${band.method}`,
          x: x(band.lowC),
          y: rowY,
          width: Math.max(1, x(band.highC) - x(band.lowC)),
          height: rowHeight - 6,
          fill: _methodFill[band.method],
          stroke: "#000000",
          "stroke-width": 1,
        }, _element("title", {}, `${_methodShortName(band.method)}: ${_fixed(band.lowC)} to ${_fixed(band.highC)} °C`)),
      );
    });
    const bottom = y + panelHeight - 8;
    panel.push(_element("line", { class: "limit-normal", x1: x(s.maxNormalOperatingC), x2: x(s.maxNormalOperatingC), y1: y, y2: bottom, stroke: "#000000", "stroke-width": 1.5, "stroke-dasharray": "6 4" }));
    panel.push(_element("line", { class: "limit-hazard", x1: x(s.hazardLimitC), x2: x(s.hazardLimitC), y1: y, y2: bottom, stroke: "#000000", "stroke-width": 3 }));
    panel.push(_element("line", { class: "target", x1: x(s.tripTemperatureC), x2: x(s.tripTemperatureC), y1: y, y2: bottom, stroke: "#000000", "stroke-width": 1, "stroke-dasharray": "1 3" }));
    panel.push(_bottomAxis(x, bottom, "hot-junction temperature, °C", 7));
    parts.push(_element("g", { class: "panel" }, panel.join("")));
    y = bottom + 62;
  }
  // Legend: patterns, line styles, words.
  const legendY = y - 20;
  const legend: string[] = [];
  const methods = report.setpoints[0]?.bands.map((b) => b.method) ?? [];
  methods.forEach((m, i) => {
    const lx = left + i * 150;
    legend.push(_element("rect", { x: lx, y: legendY, width: 26, height: 12, fill: _methodFill[m], stroke: "#000000" }));
    legend.push(_text(lx + 32, legendY + 10, `${_methodShortName(m)} band`, { "font-size": 12 }));
  });
  const lineY = legendY + 26;
  legend.push(_element("line", { x1: left, x2: left + 26, y1: lineY, y2: lineY, stroke: "#000000", "stroke-width": 1.5, "stroke-dasharray": "6 4" }));
  legend.push(_text(left + 32, lineY + 4, "highest normal operating", { "font-size": 12 }));
  legend.push(_element("line", { x1: left + 220, x2: left + 246, y1: lineY, y2: lineY, stroke: "#000000", "stroke-width": 3 }));
  legend.push(_text(left + 252, lineY + 4, "hazard limit", { "font-size": 12 }));
  legend.push(_element("line", { x1: left + 360, x2: left + 386, y1: lineY, y2: lineY, stroke: "#000000", "stroke-dasharray": "1 3" }));
  legend.push(_text(left + 392, lineY + 4, "target trip", { "font-size": 12 }));
  parts.push(_element("g", { class: "legend" }, legend.join("")));
  const footY = lineY + 24;
  const [cautionFirst, cautionRest] = _splitCaution();
  const methodLines = _wrapWords(_describeMethods(report.methods), 150);
  methodLines.forEach((text, i) => parts.push(_text(12, footY + 14 * i, text, { "font-size": 10, class: "method-note" })));
  const cautionY = footY + 14 * methodLines.length;
  parts.push(_text(12, cautionY, `Caution: ${cautionFirst}`, { "font-size": 10, class: "caution" }));
  parts.push(_text(12, cautionY + 14, cautionRest, { "font-size": 10, class: "caution" }));
  const height = cautionY + 14 + 14;
  return _svgDocument(width, height, title, parts.join(""));
}
