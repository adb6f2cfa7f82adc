/**
 * SVG chart of an error sweep: the error band (indicated minus true) of each method over temperature, with a
 * zero line, and the design's setpoints (dotted, named), highest normal operating temperature (dashed) and hazard
 * limit (thick) as vertical lines on the temperature axis. Bands are told apart by fill pattern and direct labels,
 * so the chart reads without colour.
 * @module
 */
import { scaleLinear } from "d3-scale";
import { area, line } from "d3-shape";
import { _displayOf, type ReportDisplayOptions } from "./displayUnit.js";
import { _describeMethods, _fixed, _methodShortName } from "./formatting.js";
import type { ErrorSweep } from "./reportTypes.js";
import { _bottomAxis, _element, _escapeXml, _leftAxis, _methodFill, _splitCaution, _svgDocument, _text } from "./svg.js";
import { _wrapWords } from "../textWrap.js";
import { _propagationMethods } from "../uncertainty/types.js";
import { _requireShape } from "../errors.js";
import { _errorSweepShape } from "./_reportShapes.js";
import { _maxOf, _minOf } from "../extremes.js";

/**
 * Draws an error sweep as an SVG document (text).
 * @param sweep - sweep data (at least two rows); its `setpoints`, when given, are marked with their limits
 * @param options - `temperatureUnit`: the axes and figures in `"C"` (default), `"F"` or `"K"` (errors are
 *   differences: scale only)
 * @returns SVG text
 * @example
 * ```ts
 * import { errorBandChartSvg } from "hotjunction/report";
 * const rows = [0, 100].map((t) => ({ temperatureC: t, nominalErrorC: 0, bands: [{ method: "worst-case" as const, errorLowC: -1, errorHighC: 1 }] }));
 * const svg = errorBandChartSvg({ title: "Error sweep", rows, notes: [], methods: { methods: ["worst-case"], coverage: 0.95 } });
 * console.log(svg.includes("true hot-junction temperature, °C")); // true
 * ```
 */
export function errorBandChartSvg(sweep: ErrorSweep, options?: ReportDisplayOptions): string {
  _requireShape(sweep, _errorSweepShape, "sweep", "errorBandChartSvg");
  const display = _displayOf(options);
  const width = 900;
  const height = 560;
  const margin = { left: 80, right: 190, top: 50, bottom: 150 };
  const title = `${sweep.title}${sweep.designName !== undefined ? `: ${sweep.designName}` : ""}`;
  const temperatures = sweep.rows.map((r) => display.at(r.temperatureC));
  const errors = sweep.rows.flatMap((r) => [r.nominalErrorC, ...r.bands.flatMap((b) => [b.errorLowC, b.errorHighC])]).map(display.diff);
  const tMin = _minOf(temperatures);
  const tMax = _maxOf(temperatures);
  const eMin = Math.min(0, ...errors);
  const eMax = Math.max(0, ...errors);
  const x = scaleLinear().domain(tMin === tMax ? [tMin - 1, tMax + 1] : [tMin, tMax]).range([margin.left, width - margin.right]);
  const y = scaleLinear().domain(eMin === eMax ? [eMin - 1, eMax + 1] : [eMin, eMax]).range([height - margin.bottom, margin.top]).nice();
  const methods = sweep.rows[0]?.bands.map((b) => b.method) ?? [];
  const parts: string[] = [_text(width / 2, 26, title, { "text-anchor": "middle", "font-size": 16, "font-weight": "bold", class: "chart-title" })];
  // Widest band first so narrower ones stay visible on top.
  const order = [...methods].sort((a, b) => _propagationMethods.indexOf(a) - _propagationMethods.indexOf(b));
  const labels: { y: number; text: string }[] = [];
  for (const method of order) {
    const index = methods.indexOf(method);
    const bandArea = area<(typeof sweep.rows)[number]>()
      .x((r) => x(display.at(r.temperatureC)))
      .y0((r) => y(display.diff(r.bands[index]?.errorLowC ?? 0)))
      .y1((r) => y(display.diff(r.bands[index]?.errorHighC ?? 0)));
    parts.push(_element("path", { class: `band band-${method}`, d: bandArea(sweep.rows) ?? "", fill: _methodFill[method], stroke: "#000000", "stroke-width": 1, "fill-opacity": method === "worst-case" ? 0.6 : method === "monte-carlo" ? 0.6 : 0.9, "stroke-dasharray": method === "monte-carlo" ? "3 2" : undefined }));
    const last = sweep.rows[sweep.rows.length - 1];
    const lastBand = last?.bands[index];
    if (last !== undefined && lastBand !== undefined) {
      labels.push({ y: y(display.diff(lastBand.errorHighC)) + 4, text: `${_methodShortName(method)} upper` });
      labels.push({ y: y(display.diff(lastBand.errorLowC)) + 4, text: `${_methodShortName(method)} lower` });
    }
  }
  // Direct labels at the right end, pushed apart so none overlaps.
  labels.sort((a, b) => a.y - b.y);
  for (let i = 1; i < labels.length; i++) labels[i]!.y = Math.max(labels[i]!.y, labels[i - 1]!.y + 13);
  for (const label of labels) parts.push(_text(width - margin.right + 8, label.y, label.text, { "font-size": 11, class: "direct-label" }));
  const nominal = line<(typeof sweep.rows)[number]>().x((r) => x(display.at(r.temperatureC))).y((r) => y(display.diff(r.nominalErrorC)));
  parts.push(_element("path", { class: "nominal", d: nominal(sweep.rows) ?? "", fill: "none", stroke: "#000000", "stroke-width": 2 }));
  parts.push(_element("line", { class: "zero", x1: margin.left, x2: width - margin.right, y1: y(0), y2: y(0), stroke: "#000000", "stroke-dasharray": "4 3" }));
  const marks = _sweepMarks(sweep, display.at);
  const [xLow, xHigh] = x.domain() as [number, number];
  const outside: string[] = [];
  let markRow = 0;
  for (const mark of marks) {
    const value = mark.value;
    const text = `${mark.label} ${_fixed(value)} ${display.symbol}`;
    if (!(value >= xLow && value <= xHigh)) {
      outside.push(text);
      continue;
    }
    const px = x(value);
    parts.push(
      _element("line", { class: mark.className, x1: px, x2: px, y1: margin.top, y2: height - margin.bottom, stroke: "#000000", ...mark.stroke },
        _element("title", {}, _escapeXml(text))),
    );
    parts.push(_text(px + 3, margin.top + 10 + 12 * (markRow++ % 4), text, { "font-size": 10, class: `${mark.className}-label` }));
  }
  parts.push(_bottomAxis(x, height - margin.bottom, `true hot-junction temperature, ${display.symbol}`));
  parts.push(_leftAxis(y, margin.left, `error (indicated − true), ${display.symbol}`));
  const legendY = height - margin.bottom + 52;
  const legend: string[] = [];
  methods.forEach((m, i) => {
    const lx = margin.left + i * 170;
    legend.push(_element("rect", { x: lx, y: legendY, width: 26, height: 12, fill: _methodFill[m], stroke: "#000000" }));
    legend.push(_text(lx + 32, legendY + 10, `${_methodShortName(m)} band`, { "font-size": 12 }));
  });
  const lx = margin.left + methods.length * 170;
  legend.push(_element("line", { x1: lx, x2: lx + 26, y1: legendY + 6, y2: legendY + 6, stroke: "#000000", "stroke-width": 2 }));
  legend.push(_text(lx + 32, legendY + 10, "nominal error", { "font-size": 12 }));
  if (marks.length > 0) {
    const markY = legendY + 26;
    const styles = [
      { text: "setpoint", stroke: markStroke.setpoint },
      { text: "highest normal operating", stroke: markStroke.normal },
      { text: "hazard limit", stroke: markStroke.hazard },
    ];
    styles.forEach((style, i) => {
      const sx = margin.left + i * 220;
      legend.push(_element("line", { x1: sx, x2: sx + 26, y1: markY, y2: markY, stroke: "#000000", ...style.stroke }));
      legend.push(_text(sx + 32, markY + 4, style.text, { "font-size": 12 }));
    });
  }
  parts.push(_element("g", { class: "legend" }, legend.join("")));
  const [cautionFirst, cautionRest] = _splitCaution();
  const outsideLine = outside.length > 0 ? _wrapWords(`Outside the swept range: ${outside.join("; ")}.`, 150) : [];
  const noteLines = [...outsideLine, ..._wrapWords(_describeMethods(sweep.methods), 150), `Caution: ${cautionFirst}`, cautionRest];
  noteLines.forEach((text, i) => {
    const cls = i < noteLines.length - 2 ? "method-note" : "caution";
    parts.push(_text(12, height - 14 * (noteLines.length - i), text, { "font-size": 10, class: cls }));
  });
  return _svgDocument(width, height, title, parts.join(""));
}

const markStroke = {
  setpoint: { "stroke-width": 1, "stroke-dasharray": "1 3" },
  normal: { "stroke-width": 1.5, "stroke-dasharray": "6 4" },
  hazard: { "stroke-width": 3 },
} as const;

/**
 * The vertical marks of a sweep chart in display units: each setpoint (named), then each distinct highest normal
 * operating temperature and hazard limit (one mark for a limit several setpoints share). @internal
 */
export function _sweepMarks(
  sweep: ErrorSweep,
  at: (temperatureC: number) => number,
): { label: string; value: number; className: string; stroke: Record<string, string | number> }[] {
  const setpoints = sweep.setpoints ?? [];
  const distinct = (values: number[]): number[] => [...new Set(values)].sort((a, b) => a - b);
  return [
    ...setpoints.map((s) => ({ label: `setpoint "${s.name}"`, value: at(s.tripTemperatureC), className: "mark-setpoint", stroke: markStroke.setpoint })),
    ...distinct(setpoints.map((s) => s.maxNormalOperatingC)).map((c) => ({ label: "normal ≤", value: at(c), className: "limit-normal", stroke: markStroke.normal })),
    ...distinct(setpoints.map((s) => s.hazardLimitC)).map((c) => ({ label: "hazard <", value: at(c), className: "limit-hazard", stroke: markStroke.hazard })),
  ];
}
