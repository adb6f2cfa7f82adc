/**
 * Small text helpers shared by the renderers: number formatting, aligned text tables, Markdown tables, CSV fields.
 * @module
 */
import { CAUTION_TEXT } from "./caution.js";
import type { ReportMethodInfo } from "./reportTypes.js";
import type { PropagationMethod } from "../uncertainty/types.js";

/** A number with fixed decimals; `-0.0` shown as `0.0`; non-finite as `n/a`. @internal */
export function _fixed(value: number, decimals = 1): string {
  if (!Number.isFinite(value)) return "n/a";
  const text = value.toFixed(decimals);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** A signed number (`+1.2`, `-0.4`). @internal */
export function _signed(value: number, decimals = 1): string {
  const text = _fixed(value, decimals);
  return value > 0 && text !== _fixed(0, decimals) ? `+${text}` : text;
}

/** Aligned text table; first row is the header; numbers right-aligned. @internal */
export function _textTable(rows: readonly (readonly string[])[]): string {
  const widths: number[] = [];
  for (const row of rows) row.forEach((cell, i) => (widths[i] = Math.max(widths[i] ?? 0, [...cell].length)));
  const numeric = (cell: string): boolean => /^[-+]?\d[\d.]*(?: to [-+]?\d[\d.]*)?$/.test(cell);
  const lines = rows.map((row) =>
    row
      .map((cell, i) => {
        const pad = (widths[i] ?? 0) - [...cell].length;
        return numeric(cell) ? " ".repeat(pad) + cell : cell + " ".repeat(pad);
      })
      .join("  ")
      .trimEnd(),
  );
  const rule = widths.map((w) => "-".repeat(w)).join("  ");
  return [lines[0] ?? "", rule, ...lines.slice(1)].join("\n");
}

/** Markdown table; first row is the header. @internal */
export function _markdownTable(rows: readonly (readonly string[])[]): string {
  const escape = (cell: string): string => cell.replace(/\|/g, "\\|");
  const [header, ...body] = rows;
  if (header === undefined) return "";
  return [
    `| ${header.map(escape).join(" | ")} |`,
    `| ${header.map(() => "---").join(" | ")} |`,
    ...body.map((row) => `| ${row.map(escape).join(" | ")} |`),
  ].join("\n");
}

/** One CSV field (RFC 4180 quoting). @internal */
export function _csvField(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return "";
  const text = typeof value === "number" ? (Number.isFinite(value) ? String(value) : "") : String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** CSV text from rows (first row header), `\n` line ends. @internal */
export function _csv(rows: readonly (readonly (string | number | boolean | null | undefined)[])[]): string {
  return `${rows.map((row) => row.map(_csvField).join(",")).join("\n")}\n`;
}

const methodNames = { "worst-case": "worst case", rss: "RSS (GUM, JCGM 100)", "monte-carlo": "Monte Carlo (JCGM 101)" } as const;

/** A short name of a method for table headers. @internal */
export function _methodShortName(method: PropagationMethod): string {
  return method === "worst-case" ? "worst case" : method === "rss" ? "RSS" : "Monte Carlo";
}

/** The sentence naming methods, coverage, trials and seed. @internal */
export function _describeMethods(info: ReportMethodInfo): string {
  const parts = info.methods.map((m) => methodNames[m]);
  let text = `Methods: ${parts.join("; ")}.`;
  if (info.methods.some((m) => m !== "worst-case")) text += ` Coverage of RSS and Monte Carlo intervals: ${_fixed(info.coverage * 100, 0)} %.`;
  if (info.methods.includes("monte-carlo")) {
    text += ` Monte Carlo: ${info.trials ?? "default"} trials, seed ${info.seed ?? "default"}.`;
  } else {
    text += " Seed: none used (no random sampling).";
  }
  if (info.acceptanceMethod !== undefined) text += ` Pass/fail judged on the ${_methodShortName(info.acceptanceMethod)} band.`;
  return text;
}

/** The caution line as printed. @internal */
export function _cautionLine(): string {
  return `CAUTION: ${CAUTION_TEXT}`;
}
