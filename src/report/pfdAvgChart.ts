/**
 * SVG chart of PFDavg against the proof-test interval, for one channel (1oo1) and the two-channel pair (1oo2),
 * on log axes, with the stated interval marked, the scope and the safety caution.
 * @module
 */
import { scaleLog, type ScaleLogarithmic } from "d3-scale";
import { line } from "d3-shape";
import type { PfdAvgCurve } from "../safety/types.js";
import { _element, _splitCaution, _svgDocument, _text } from "./svg.js";
import { _wrapWords } from "../textWrap.js";
import { _requireShape, HotjunctionRangeError, type _Shape } from "../errors.js";
import { _maxOf, _minOf } from "../extremes.js";

/** Input of {@link pfdAvgChartSvg}. */
export interface PfdAvgChartInput {
  readonly title: string;
  /** One curve per setpoint (from `pfdAvgCurve`); at least two points each. */
  readonly curves: readonly PfdAvgCurve[];
  /** Proof-test interval of the design, h (marked with a vertical line). */
  readonly statedIntervalHours?: number;
  /** What the figures cover (printed under the chart). */
  readonly scope: string;
}

/** What {@link pfdAvgChartSvg} reads of its input (checked at its entry; a log axis needs intervals > 0). */
const pfdAvgChartInputShape: _Shape = {
  title: "string",
  scope: "string",
  statedIntervalHours: ["optional", "number"],
  curves: ["array", { channelName: "string", pairName: ["nullable", "string"], beta: ["nullable", "fraction"], points: ["array", { proofTestIntervalHours: "positive", pfdAvg1oo1: "number", pfdAvg1oo2: ["nullable", "number"] }] }],
};

function decadeTicks(scale: ScaleLogarithmic<number, number>): number[] {
  const [a, b] = scale.domain() as [number, number];
  const ticks: number[] = [];
  const last = Math.ceil(Math.log10(b));
  // a domain past the float64 range (an interval near 1e308 widened tenfold) has no decades to draw
  if (!Number.isFinite(last) || !Number.isFinite(Math.log10(a))) return ticks;
  for (let e = Math.floor(Math.log10(a)); e <= last; e++) {
    const t = 10 ** e;
    if (t >= a * (1 - 1e-12) && t <= b * (1 + 1e-12)) ticks.push(t);
  }
  return ticks;
}

function powerLabel(t: number): string {
  const e = Math.round(Math.log10(t));
  return e >= 0 && e <= 6 ? String(10 ** e) : `1e${e}`;
}

/**
 * Draws PFDavg against the proof-test interval T1 as an SVG document (text): both axes logarithmic (decade
 * ticks), a solid line per setpoint for one channel (1oo1), a dashed line for the pair (1oo2), direct labels at the
 * right end, the stated T1 as a dotted vertical line, then the scope and the caution. Lines differ by dash
 * pattern and label, so the chart reads without colour.
 * @param input - title, curves (each with at least two points, every PFDavg > 0), stated interval h, scope
 * @returns SVG text
 * @example
 * ```ts
 * import { pfdAvgChartSvg } from "hotjunction/report";
 * import { pfdAvgCurve } from "hotjunction";
 * const curve = pfdAvgCurve({ name: "kiln", lambdaDuFit: 225, lambdaDdFit: 0 }, { // invented rates
 *   proofTestIntervalsHours: [730, 8760, 87600], proofTest: { meanTimeToRestorationHours: 8 }, pair: { beta: 0.05, betaD: 0.02 } });
 * const svg = pfdAvgChartSvg({ title: "PFDavg", curves: [curve], statedIntervalHours: 8760, scope: "demo" });
 * console.log(svg.includes("proof-test interval T1, h (log scale)")); // true
 * ```
 */
export function pfdAvgChartSvg(input: PfdAvgChartInput): string {
  _requireShape(input, pfdAvgChartInputShape, "input", "pfdAvgChartSvg");
  input.curves.forEach((c, i) => {
    if (c.points.length < 2) {
      throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: `input.curves[${i}].points`, value: c.points, context: "pfdAvgChartSvg", problem: "has fewer than two points" });
    }
  });
  if (input.curves.length === 0) {
    throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: "input.curves", value: input.curves, context: "pfdAvgChartSvg", problem: "is empty" });
  }
  const width = 980;
  const height = 600;
  const margin = { left: 90, right: 300, top: 50, bottom: 170 };
  const points = input.curves.flatMap((c) => c.points);
  const hours = points.map((p) => p.proofTestIntervalHours);
  const pfds = points.flatMap((p) => [p.pfdAvg1oo1, ...(p.pfdAvg1oo2 === null ? [] : [p.pfdAvg1oo2])]).filter((v) => v > 0);
  const hMin = _minOf(hours);
  const hMax = _maxOf(hours);
  const pMin = pfds.length === 0 ? 1e-6 : _minOf(pfds);
  const pMax = pfds.length === 0 ? 1 : _maxOf(pfds);
  const x = scaleLog().domain(hMin === hMax ? [hMin / 10, hMax * 10] : [hMin, hMax]).range([margin.left, width - margin.right]);
  const y = scaleLog()
    .domain([10 ** Math.floor(Math.log10(pMin)), 10 ** Math.ceil(Math.log10(pMax === pMin ? pMax * 10 : pMax))])
    .range([height - margin.bottom, margin.top]);
  const parts: string[] = [_text(width / 2, 26, input.title, { "text-anchor": "middle", "font-size": 16, "font-weight": "bold", class: "chart-title" })];
  const [x0, x1] = x.range() as [number, number];
  const [y0, y1] = y.range() as [number, number];
  // Axes with decade ticks and grid lines.
  const xTicks = decadeTicks(x)
    .map((t) =>
      _element("g", { class: "tick", transform: `translate(${x(t)},${y0})` },
        _element("line", { y2: 5, stroke: "#000000" }) + _element("line", { y2: y1 - y0, stroke: "#dddddd" }) + _text(0, 17, powerLabel(t), { "text-anchor": "middle", "font-size": 11 })),
    )
    .join("");
  const yTicks = decadeTicks(y)
    .map((t) =>
      _element("g", { class: "tick", transform: `translate(${x0},${y(t)})` },
        _element("line", { x2: -5, stroke: "#000000" }) + _element("line", { x2: x1 - x0, stroke: "#dddddd" }) + _text(-8, 4, powerLabel(t), { "text-anchor": "end", "font-size": 11 })),
    )
    .join("");
  const middle = (y0 + y1) / 2;
  parts.push(
    _element("g", { class: "axis axis-x" },
      xTicks + _element("line", { x1: x0, x2: x1, y1: y0, y2: y0, stroke: "#000000" }) +
        _text((x0 + x1) / 2, y0 + 36, "proof-test interval T1, h (log scale)", { "text-anchor": "middle", "font-size": 12, class: "axis-title" })),
    _element("g", { class: "axis axis-y" },
      yTicks + _element("line", { x1: x0, x2: x0, y1: y0, y2: y1, stroke: "#000000" }) +
        _text(x0 - 60, middle, "PFDavg (log scale)", { "text-anchor": "middle", "font-size": 12, class: "axis-title", transform: `rotate(-90 ${x0 - 60} ${middle})` })),
  );
  if (input.statedIntervalHours !== undefined && input.statedIntervalHours >= hMin && input.statedIntervalHours <= hMax) {
    const sx = x(input.statedIntervalHours);
    parts.push(_element("line", { class: "stated-interval", x1: sx, x2: sx, y1: y0, y2: y1, stroke: "#000000", "stroke-dasharray": "1 3" }));
    parts.push(_text(sx + 4, y1 + 12, `stated T1 = ${input.statedIntervalHours} h`, { "font-size": 11 }));
  }
  const labels: { y: number; text: string }[] = [];
  const dashes = ["", "2 2", "6 2 1 2", "1 1"];
  input.curves.forEach((c, i) => {
    const last = c.points[c.points.length - 1];
    const draw = (key: "pfdAvg1oo1" | "pfdAvg1oo2", dash: string, text: string): void => {
      const pts = c.points.filter((p) => (p[key] ?? 0) > 0);
      if (pts.length < 2) return;
      const path = line<(typeof pts)[number]>().x((p) => x(p.proofTestIntervalHours)).y((p) => y(p[key] as number));
      parts.push(_element("path", { class: `curve curve-${key}`, d: path(pts) ?? "", fill: "none", stroke: "#000000", "stroke-width": key === "pfdAvg1oo1" ? 2 : 1.5, "stroke-dasharray": dash === "" ? undefined : dash }));
      const value = last?.[key];
      if (value !== undefined && value !== null && value > 0) labels.push({ y: y(value) + 4, text });
    };
    const tag = input.curves.length > 1 ? ` (${c.channelName})` : "";
    draw("pfdAvg1oo1", dashes[(2 * i) % dashes.length] ?? "", `1oo1${tag}`);
    if (c.pairName !== null) draw("pfdAvg1oo2", dashes[(2 * i + 1) % dashes.length] ?? "4 3", `${c.pairName === "1oo2" ? `1oo2${tag}` : c.pairName}, β ${((c.beta ?? 0) * 100).toFixed(0)} %`);
  });
  labels.sort((a, b) => a.y - b.y);
  for (let i = 1; i < labels.length; i++) labels[i]!.y = Math.max(labels[i]!.y, labels[i - 1]!.y + 13);
  for (const label of labels) parts.push(_text(width - margin.right + 8, label.y, label.text, { "font-size": 11, class: "direct-label" }));
  const [cautionFirst, cautionRest] = _splitCaution();
  const noteLines = [..._wrapWords(`Scope: ${input.scope}`, 150), `Caution: ${cautionFirst}`, cautionRest];
  noteLines.forEach((text, i) => {
    const cls = i < noteLines.length - 2 ? "scope-note" : "caution";
    parts.push(_text(12, height - 14 * (noteLines.length - i), text, { "font-size": 10, class: cls }));
  });
  return _svgDocument(width, height, input.title, parts.join(""));
}
