/**
 * SVG chart of a runaway: true and indicated temperature against time, with the true crossing, the trip decision,
 * heat off and the peak marked against the trip temperature and the hazard limit. Plain SVG text (no DOM, no chart
 * library), readable in greys without colour.
 * @module
 */
import { _wrapWords } from "../textWrap.js";
import { _requireInRange, _requireOptionsObject, _requireShape } from "../errors.js";
import { _CHART_MAX_ABS_C, _checkRunawayResponse } from "./_dynamicsShapes.js";
import { CAUTION_TEXT } from "../caution.js";
import type { RunawayResponse } from "./simulateRunaway.js";
import { _maxOf, _minOf } from "../extremes.js";

/** Options of {@link runawayChartSvg}. */
export interface RunawayChartOptions {
  /** Title line; default "Runaway response". */
  readonly title?: string;
  /** Width, px, 320 … 4000; default 760. */
  readonly widthPixels?: number;
  /** Height, px, 240 … 3000; default 440. */
  readonly heightPixels?: number;
}

function escapeXml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}


/** A pixel coordinate as text; a point far off the canvas (a marker time far past the series) is drawn at ±1e7 px. */
function px(v: number): string {
  return String(Math.round(Math.min(Math.max(v, -1e7), 1e7) * 100) / 100);
}

/** Round tick step (1, 2 or 5 × 10^k) giving about `count` ticks over `span`. */
function tickStep(span: number, count: number): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const f = raw / power;
  return (f < 1.5 ? 1 : f < 3.5 ? 2 : f < 7.5 ? 5 : 10) * power;
}

function ticks(lo: number, hi: number, count: number): number[] {
  const step = tickStep(hi - lo, count);
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Math.abs(v) < step * 1e-9 ? 0 : v);
  return out;
}

function tickLabel(v: number, step: number): string {
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  return v.toFixed(decimals);
}

/**
 * Renders a runaway as an SVG chart (text).
 * @param response - from {@link simulateRunaway} (or a case of {@link checkDynamics}).
 * @param options - title and size.
 * @returns the SVG document as a string.
 * @throws {@link HotjunctionRangeError} for a size out of range; {@link HotjunctionTypeError} /
 * {@link HotjunctionRangeError} for a response that is not one (a field missing or not finite, series of unequal
 * lengths, times not from 0 upward, a temperature beyond ±1e6 °C, the drawable bound).
 * @example
 * ```ts
 * import { runawayChartSvg, simulateRunaway } from "hotjunction";
 * const r = simulateRunaway({ runaway: { kind: "constantRate", rateCPerSecond: 2 }, sensor: { kind: "firstOrder", timeConstantSeconds: 10 } },
 *   { startC: 960, tripTemperatureC: 1000, hazardLimitC: 1040 });
 * const svg = runawayChartSvg(r, { title: "Kiln runaway (demo)" });
 * console.log(svg.startsWith("<svg"), svg.includes("hazard limit 1040 °C")); // true true
 * ```
 */
export function runawayChartSvg(response: RunawayResponse, options: RunawayChartOptions = {}): string {
  _checkRunawayResponse(response, "response", "dynamics chart", _CHART_MAX_ABS_C);
  _requireOptionsObject(options, "dynamics chart", false);
  _requireShape(options.title, ["optional", "string"], "title", "dynamics chart");
  const width = options.widthPixels === undefined ? 760 : _requireInRange(options.widthPixels, "chart width (widthPixels)", 320, 4000, "px", "dynamics chart");
  const height = options.heightPixels === undefined ? 440 : _requireInRange(options.heightPixels, "chart height (heightPixels)", 240, 3000, "px", "dynamics chart");
  const title = options.title ?? "Runaway response";
  const { series: s, scenario } = response;
  const left = 64;
  const right = 180;
  const top = 40;
  const bottom = 88;
  const plotW = width - left - right;
  const plotH = height - top - bottom;
  const tMax = s.timeSeconds.length > 0 ? (s.timeSeconds[s.timeSeconds.length - 1] as number) : 1;
  const values = [...s.trueC, ...s.indicatedC, ...(s.filteredC ?? []), scenario.hazardLimitC, scenario.tripTemperatureC, response.peakTrueC];
  let yLo = _minOf(values);
  let yHi = _maxOf(values);
  const pad = Math.max((yHi - yLo) * 0.06, 1e-6);
  yLo -= pad;
  yHi += pad;
  const xOf = (t: number) => left + (t / (tMax > 0 ? tMax : 1)) * plotW;
  const yOf = (c: number) => top + ((yHi - c) / (yHi - yLo)) * plotH;
  const parts: string[] = [];
  parts.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${px(width)}" height="${px(height)}" viewBox="0 0 ${px(width)} ${px(height)}" font-family="sans-serif" font-size="12">`);
  parts.push(`<rect width="100%" height="100%" fill="#ffffff"/>`);
  parts.push(`<text x="${left}" y="22" font-size="15" font-weight="bold">${escapeXml(title)}</text>`);
  // axes and grid
  const yStep = tickStep(yHi - yLo, 6);
  for (const v of ticks(yLo, yHi, 6)) {
    const y = yOf(v);
    parts.push(`<line x1="${left}" y1="${px(y)}" x2="${left + plotW}" y2="${px(y)}" stroke="#dddddd"/>`);
    parts.push(`<text x="${left - 6}" y="${px(y + 4)}" text-anchor="end">${tickLabel(v, yStep)}</text>`);
  }
  const xStep = tickStep(tMax > 0 ? tMax : 1, 8);
  for (const v of ticks(0, tMax > 0 ? tMax : 1, 8)) {
    const x = xOf(v);
    parts.push(`<line x1="${px(x)}" y1="${top}" x2="${px(x)}" y2="${top + plotH}" stroke="#eeeeee"/>`);
    parts.push(`<text x="${px(x)}" y="${top + plotH + 16}" text-anchor="middle">${tickLabel(v, xStep)}</text>`);
  }
  parts.push(`<rect x="${left}" y="${top}" width="${px(plotW)}" height="${px(plotH)}" fill="none" stroke="#333333"/>`);
  parts.push(`<text x="${left + plotW / 2}" y="${top + plotH + 34}" text-anchor="middle">time since the heater stuck on (s)</text>`);
  parts.push(`<text x="16" y="${top + plotH / 2}" text-anchor="middle" transform="rotate(-90 16 ${px(top + plotH / 2)})">temperature (°C)</text>`);
  // limits
  const hazardY = yOf(scenario.hazardLimitC);
  parts.push(`<line x1="${left}" y1="${px(hazardY)}" x2="${left + plotW}" y2="${px(hazardY)}" stroke="#000000" stroke-width="2.5" stroke-dasharray="10 3 2 3"/>`);
  parts.push(`<text x="${left + plotW + 6}" y="${px(hazardY + 4)}">hazard limit ${scenario.hazardLimitC} °C</text>`);
  const tripY = yOf(scenario.tripTemperatureC);
  parts.push(`<line x1="${left}" y1="${px(tripY)}" x2="${left + plotW}" y2="${px(tripY)}" stroke="#777777" stroke-width="1.2" stroke-dasharray="4 3"/>`);
  parts.push(`<text x="${left + plotW + 6}" y="${px(tripY + 4)}">trip ${scenario.tripTemperatureC} °C</text>`);
  // curves
  const path = (ys: readonly number[]) => ys.map((c, k) => `${k === 0 ? "M" : "L"}${px(xOf(s.timeSeconds[k] as number))} ${px(yOf(c))}`).join("");
  parts.push(`<path d="${path(s.trueC)}" fill="none" stroke="#000000" stroke-width="2"/>`);
  parts.push(`<path d="${path(s.indicatedC)}" fill="none" stroke="#555555" stroke-width="1.6" stroke-dasharray="7 4"/>`);
  if (s.filteredC !== null) parts.push(`<path d="${path(s.filteredC)}" fill="none" stroke="#555555" stroke-width="1.6" stroke-dasharray="1.5 3"/>`);
  // events
  const marker = (t: number | null, label: string, row: number) => {
    if (t === null) return;
    const x = xOf(t);
    parts.push(`<line x1="${px(x)}" y1="${top}" x2="${px(x)}" y2="${top + plotH}" stroke="#444444" stroke-width="1" stroke-dasharray="2 2"/>`);
    parts.push(`<text x="${px(x + 3)}" y="${top + 12 + 13 * row}" font-size="11">${escapeXml(label)}</text>`);
  };
  marker(response.trueCrossingSeconds, "true crossing", 0);
  marker(response.decisionSeconds, "trip decided", 1);
  marker(response.heatOffSeconds, "heat off", 2);
  if (response.peakSeconds !== null) {
    const x = xOf(response.peakSeconds);
    const y = yOf(response.peakTrueC);
    parts.push(`<circle cx="${px(x)}" cy="${px(y)}" r="4.5" fill="#ffffff" stroke="#000000" stroke-width="2"/>`);
    parts.push(`<text x="${px(x + 7)}" y="${px(y - 7)}" font-size="11">peak ${response.peakTrueC.toFixed(1)} °C</text>`);
  }
  // legend
  const lx = left + plotW + 10;
  const ly = top + plotH - 64;
  parts.push(`<line x1="${lx}" y1="${ly}" x2="${lx + 26}" y2="${ly}" stroke="#000000" stroke-width="2"/><text x="${lx + 32}" y="${ly + 4}">true</text>`);
  parts.push(`<line x1="${lx}" y1="${ly + 18}" x2="${lx + 26}" y2="${ly + 18}" stroke="#555555" stroke-width="1.6" stroke-dasharray="7 4"/><text x="${lx + 32}" y="${ly + 22}">indicated</text>`);
  if (s.filteredC !== null) parts.push(`<line x1="${lx}" y1="${ly + 36}" x2="${lx + 26}" y2="${ly + 36}" stroke="#555555" stroke-width="1.6" stroke-dasharray="1.5 3"/><text x="${lx + 32}" y="${ly + 40}">filtered (firmware)</text>`);
  const verdict = response.tripped
    ? `response ${response.responseTimeSeconds?.toFixed(2)} s, peak ${response.peakTrueC.toFixed(1)} °C, margin ${response.dynamicMarginC.toFixed(1)} °C`
    : `no trip: settles at ${response.peakTrueC.toFixed(1)} °C, margin ${response.dynamicMarginC.toFixed(1)} °C`;
  parts.push(`<text x="${left}" y="${height - 40}">${escapeXml(verdict)}</text>`);
  _wrapWords(CAUTION_TEXT, Math.max(40, Math.floor((width - left - 10) / 5.4))).forEach((line, k) => {
    parts.push(`<text x="${left}" y="${height - 24 + 12 * k}" font-size="10">${escapeXml(line)}</text>`);
  });
  parts.push("</svg>");
  return parts.join("\n");
}
