/**
 * The one drawing of temperature bands against limits, shared by the trip-band chart (`check --svg`, the
 * workbench) and the reference-comparison chart (`compare --svg`): one panel per setpoint, one row per band
 * (a method's band, or a reference option's band), every row of a panel on one shared temperature axis, with the
 * highest normal operating temperature (dashed line), the hazard limit (thick line) and the target trip (dotted
 * line). Rows are told apart by fill pattern and a text label, so the chart reads without colour.
 * @module
 */
import { scaleLinear } from "d3-scale";
import { _fixed } from "./formatting.js";
import type { _TemperatureDisplay } from "./displayUnit.js";
import { _bottomAxis, _element, _escapeXml, _splitCaution, _svgDocument, _text } from "./svg.js";
import { _wrapWords } from "../textWrap.js";
import { _maxOf, _minOf } from "../extremes.js";

/** One band row of a panel, temperatures in °C. @internal */
export interface _BandRow {
  readonly label: string;
  readonly lowC: number;
  readonly highC: number;
  readonly fill: string;
  /** Class of the rectangle (e.g. `band band-rss`). */
  readonly className: string;
  /** Tooltip text before the band's figures. */
  readonly tooltip: string;
}

/** One panel (a setpoint), temperatures in °C. @internal */
export interface _BandPanel {
  readonly heading: string;
  readonly targetC: number;
  readonly maxNormalOperatingC: number;
  readonly hazardLimitC: number;
  readonly rows: readonly _BandRow[];
}

/** The whole chart. @internal */
export interface _BandPanelChart {
  readonly title: string;
  readonly panels: readonly _BandPanel[];
  /** Legend swatches of the rows' fills. */
  readonly legend: readonly { readonly fill: string; readonly text: string }[];
  /** Width of one legend entry, px. */
  readonly legendSpacing: number;
  /** Left margin (room for the row labels), px. */
  readonly left: number;
  /** Footer lines above the caution (e.g. the methods sentence). */
  readonly footer: string;
  readonly display: _TemperatureDisplay;
}

/** Draws the chart as an SVG document (text). @internal */
export function _bandPanelChartSvg(chart: _BandPanelChart): string {
  const { display } = chart;
  const width = 900;
  const left = chart.left;
  const right = 30;
  const top = 56;
  const rowHeight = 22;
  const parts: string[] = [_text(width / 2, 24, chart.title, { "text-anchor": "middle", "font-size": 16, "font-weight": "bold", class: "chart-title" })];
  let y = top;
  for (const p of chart.panels) {
    const values = [p.maxNormalOperatingC, p.hazardLimitC, p.targetC, ...p.rows.flatMap((b) => [b.lowC, b.highC])].map(display.at);
    const lo = _minOf(values);
    const hi = _maxOf(values);
    const pad = Math.max((hi - lo) * 0.1, 0.5);
    const x = scaleLinear().domain([lo - pad, hi + pad]).range([left, width - right]).nice();
    const at = (c: number): number => x(display.at(c));
    const panelHeight = p.rows.length * rowHeight + 16;
    parts.push(_text(left, y - 6, p.heading, { "font-size": 13, "font-weight": "bold", class: "panel-title" }));
    const panel: string[] = [];
    p.rows.forEach((row, i) => {
      const rowY = y + 8 + i * rowHeight;
      panel.push(_text(left - 8, rowY + 13, row.label, { "text-anchor": "end", "font-size": 12, class: "band-label" }));
      panel.push(
        _element("rect", {
          class: row.className,
          x: at(row.lowC),
          y: rowY,
          width: Math.max(1, at(row.highC) - at(row.lowC)),
          height: rowHeight - 6,
          fill: row.fill,
          stroke: "#000000",
          "stroke-width": 1,
        }, _element("title", {}, _escapeXml(`${row.tooltip}: ${_fixed(display.at(row.lowC))} to ${_fixed(display.at(row.highC))} ${display.symbol}`))),
      );
    });
    const bottom = y + panelHeight - 8;
    panel.push(_element("line", { class: "limit-normal", x1: at(p.maxNormalOperatingC), x2: at(p.maxNormalOperatingC), y1: y, y2: bottom, stroke: "#000000", "stroke-width": 1.5, "stroke-dasharray": "6 4" }));
    panel.push(_element("line", { class: "limit-hazard", x1: at(p.hazardLimitC), x2: at(p.hazardLimitC), y1: y, y2: bottom, stroke: "#000000", "stroke-width": 3 }));
    panel.push(_element("line", { class: "target", x1: at(p.targetC), x2: at(p.targetC), y1: y, y2: bottom, stroke: "#000000", "stroke-width": 1, "stroke-dasharray": "1 3" }));
    panel.push(_bottomAxis(x, bottom, `hot-junction temperature, ${display.symbol}`, 7));
    parts.push(_element("g", { class: "panel" }, panel.join("")));
    y = bottom + 62;
  }
  // Legend: patterns, line styles, words.
  const legendY = y - 20;
  const legend: string[] = [];
  chart.legend.forEach((entry, i) => {
    const lx = left + i * chart.legendSpacing;
    legend.push(_element("rect", { x: lx, y: legendY, width: 26, height: 12, fill: entry.fill, stroke: "#000000" }));
    legend.push(_text(lx + 32, legendY + 10, entry.text, { "font-size": 12 }));
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
  const footLines = _wrapWords(chart.footer, 150);
  footLines.forEach((text, i) => parts.push(_text(12, footY + 14 * i, text, { "font-size": 10, class: "method-note" })));
  const cautionY = footY + 14 * footLines.length;
  parts.push(_text(12, cautionY, `Caution: ${cautionFirst}`, { "font-size": 10, class: "caution" }));
  parts.push(_text(12, cautionY + 14, cautionRest, { "font-size": 10, class: "caution" }));
  const height = cautionY + 14 + 14;
  return _svgDocument(width, height, chart.title, parts.join(""));
}
