/**
 * Minimal SVG text building (no DOM): escaping, elements, axes from d3-scale ticks, and patterns that keep the
 * charts readable without colour.
 * @module
 */
import type { ScaleLinear } from "d3-scale";
import { CAUTION_TEXT } from "./caution.js";

/** The caution in two lines for charts (split after its first sentence). @internal */
export function _splitCaution(): [string, string] {
  const cut = CAUTION_TEXT.indexOf(". ");
  return cut < 0 ? [CAUTION_TEXT, ""] : [CAUTION_TEXT.slice(0, cut + 1), CAUTION_TEXT.slice(cut + 2)];
}


/** Escapes text for SVG content and attribute values. @internal */
export function _escapeXml(text: string): string {
  return text.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;").replace(/'/g, "&apos;");
}

/** A number for an attribute (rounded to 0.01 px). @internal */
export function _px(value: number): string {
  return String(Math.round(value * 100) / 100);
}

/** One element as text. @internal */
export function _element(name: string, attributes: Record<string, string | number | undefined>, content?: string): string {
  const attrs = Object.entries(attributes)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => ` ${k}="${_escapeXml(typeof v === "number" ? _px(v) : String(v))}"`)
    .join("");
  return content === undefined ? `<${name}${attrs}/>` : `<${name}${attrs}>${content}</${name}>`;
}

/** A text element. @internal */
export function _text(x: number, y: number, text: string, attributes: Record<string, string | number | undefined> = {}): string {
  return _element("text", { x, y, ...attributes }, _escapeXml(text));
}

/** Fill patterns: diagonal hatch, cross hatch, dots (grey, readable in print). @internal */
export function _patternDefs(): string {
  return [
    "<defs>",
    '<pattern id="hj-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="6" fill="#ffffff"/><line x1="0" y1="0" x2="0" y2="6" stroke="#333333" stroke-width="2"/></pattern>',
    '<pattern id="hj-cross" width="6" height="6" patternUnits="userSpaceOnUse"><rect width="6" height="6" fill="#ffffff"/><path d="M0 0L6 6M6 0L0 6" stroke="#333333" stroke-width="1"/></pattern>',
    '<pattern id="hj-dots" width="5" height="5" patternUnits="userSpaceOnUse"><rect width="5" height="5" fill="#ffffff"/><circle cx="2.5" cy="2.5" r="1.2" fill="#222222"/></pattern>',
    "</defs>",
  ].join("");
}

/** Fill of each method's band. @internal */
export const _methodFill = { "worst-case": "#9a9a9a", rss: "url(#hj-hatch)", "monte-carlo": "url(#hj-dots)" } as const;

// Deliberately alike: _leftAxis below is the same axis stood upright (its own coordinates, tick side, turned title).
/** A horizontal axis at `y` with ticks, tick labels and a title. @internal */
export function _bottomAxis(scale: ScaleLinear<number, number>, y: number, title: string, tickCount = 8): string {
  const [x0, x1] = scale.range() as [number, number];
  const format = scale.tickFormat(tickCount, "~f");
  const ticks = scale
    .ticks(tickCount)
    .map((t) =>
      _element("g", { class: "tick", transform: `translate(${_px(scale(t))},${_px(y)})` },
        _element("line", { y2: 5, stroke: "#000000" }) + _text(0, 17, format(t), { "text-anchor": "middle", "font-size": 11 })),
    )
    .join("");
  return _element(
    "g",
    { class: "axis axis-x" },
    _element("line", { x1: x0, x2: x1, y1: y, y2: y, stroke: "#000000" }) +
      ticks +
      _text((x0 + x1) / 2, y + 34, title, { "text-anchor": "middle", "font-size": 12, class: "axis-title" }),
  );
}

// Deliberately alike: _bottomAxis above is the same axis lying down (its own coordinates and tick side).
/** A vertical axis at `x` with ticks, tick labels and a title. @internal */
export function _leftAxis(scale: ScaleLinear<number, number>, x: number, title: string, tickCount = 6): string {
  const [y0, y1] = scale.range() as [number, number];
  const format = scale.tickFormat(tickCount, "~f");
  const ticks = scale
    .ticks(tickCount)
    .map((t) =>
      _element("g", { class: "tick", transform: `translate(${_px(x)},${_px(scale(t))})` },
        _element("line", { x2: -5, stroke: "#000000" }) + _text(-8, 4, format(t), { "text-anchor": "end", "font-size": 11 })),
    )
    .join("");
  const middle = (y0 + y1) / 2;
  return _element(
    "g",
    { class: "axis axis-y" },
    _element("line", { x1: x, x2: x, y1: y0, y2: y1, stroke: "#000000" }) +
      ticks +
      _text(x - 48, middle, title, { "text-anchor": "middle", "font-size": 12, class: "axis-title", transform: `rotate(-90 ${_px(x - 48)} ${_px(middle)})` }),
  );
}

/** The whole SVG document. @internal */
export function _svgDocument(width: number, height: number, title: string, body: string): string {
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" ` +
    `font-family="sans-serif" role="img" aria-label="${_escapeXml(title)}">` +
    `<title>${_escapeXml(title)}</title>` +
    _patternDefs() +
    _element("rect", { width, height, fill: "#ffffff" }) +
    body +
    "</svg>\n"
  );
}
