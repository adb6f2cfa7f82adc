/**
 * Reference tables in the published style: EMF rounded to 0.001 mV, the rounding done in decimal
 * arithmetic on the exact decimal value of the reference function (so no float rounding flips a digit).
 * @module
 */
import { Decimal } from "decimal.js";
import { _requireFinite, _requireShape, HotjunctionRangeError, type _Shape } from "../errors.js";
import type { ThermocoupleTypeInput } from "./convert.js";
import { _decimalContext, _emfDecimal } from "./exactDecimal.js";
import { thermocoupleData } from "./resolveType.js";

/** Options of {@link referenceTable}. */
export interface ReferenceTableOptions {
  /** First temperature, °C (within the type's range). */
  readonly fromC: number;
  /** Last temperature, °C (within the type's range, not below `fromC`). */
  readonly toC: number;
  /** Step, °C, positive. Default 1. */
  readonly stepC?: number;
  /** Decimal places of the EMF, 0 to 6. Default 3 (0.001 mV, as the published tables). */
  readonly decimals?: number;
}

/** One row of a reference table. */
export interface ReferenceTableRow {
  /** Temperature, °C. */
  readonly temperatureC: number;
  /** EMF, mV, rounded as printed. */
  readonly emfMillivolts: number;
  /** EMF as printed (decimal text, e.g. `"20.644"`; a rounded negative zero prints as `"0.000"`). */
  readonly emfText: string;
}

/** A reference table of one type (reference junction at 0 °C). */
export interface ReferenceTable {
  readonly type: string;
  readonly decimals: number;
  readonly rows: readonly ReferenceTableRow[];
  readonly source: string;
}

/** Most rows one table may hold. */
export const referenceTableMaxRows = 200_000;

/** What the formatters read of a table (checked at their entry with the shared shape guard). */
const referenceTableShape: _Shape = { type: "string", source: "string", rows: ["array", { temperatureC: "number", emfText: "string" }] };

/**
 * Generates a reference table of E(t) for any type, range and step, rounded half away from zero to
 * 0.001 mV (or `decimals` places) in 40-digit decimal arithmetic.
 * @param type - thermocouple type
 * @param options - range and step in °C; see {@link ReferenceTableOptions}
 * @returns the table as data
 * @throws HotjunctionRangeError for a range outside the type's, a non-positive step, or more than
 *   {@link referenceTableMaxRows} rows
 * @example
 * ```ts
 * import { referenceTable } from "hotjunction/exact";
 * const table = referenceTable("K", { fromC: 0, toC: 100, stepC: 50 });
 * console.log(table.rows.map((r) => r.emfText).join(" ")); // 0.000 2.023 4.096
 * ```
 * @see NIST Monograph 175 (1993) table conventions
 */
export function referenceTable(type: ThermocoupleTypeInput, options: ReferenceTableOptions): ReferenceTable {
  const data = thermocoupleData(type);
  const context = `type ${data.type} reference table`;
  const minC = data.minC;
  const maxC = data.maxC;
  const fromC = _requireFinite(options?.fromC, "first temperature (fromC)", "°C", context);
  const toC = _requireFinite(options?.toC, "last temperature (toC)", "°C", context);
  const stepC = _requireFinite(options.stepC ?? 1, "step (stepC)", "°C", context);
  const decimals = _requireFinite(options.decimals ?? 3, "decimals", undefined, context);
  for (const [quantity, value] of [
    ["first temperature (fromC)", fromC],
    ["last temperature (toC)", toC],
  ] as const) {
    if (value < minC || value > maxC) {
      throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value, min: minC, max: maxC, unit: "°C", context });
    }
  }
  if (toC < fromC) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "last temperature (toC)",
      value: toC,
      min: fromC,
      max: maxC,
      unit: "°C",
      context,
      problem: "is below the first temperature",
    });
  }
  if (!(stepC > 0)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "step (stepC)", value: stepC, min: 0, unit: "°C", context, problem: "is not positive" });
  }
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 6) {
    throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: "decimals", value: decimals, min: 0, max: 6, context, problem: "is not an integer in range" });
  }
  const D = _decimalContext(40);
  const from = new D(String(fromC));
  const step = new D(String(stepC));
  const count = new D(String(toC)).minus(from).div(step).floor().toNumber() + 1;
  if (count > referenceTableMaxRows) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "row count",
      value: count,
      min: 1,
      max: referenceTableMaxRows,
      context,
      problem: "is too large",
    });
  }
  const rows: ReferenceTableRow[] = [];
  for (let i = 0; i < count; i++) {
    const t = from.plus(step.times(i));
    const emf = _emfDecimal(data, t.toString(), 40).toDecimalPlaces(decimals, Decimal.ROUND_HALF_UP);
    const text = emf.isZero() ? new D(0).toFixed(decimals) : emf.toFixed(decimals);
    rows.push({ temperatureC: t.toNumber(), emfMillivolts: Number(text), emfText: text });
  }
  return { type: data.type, decimals, rows, source: data.source };
}

/**
 * Formats a reference table as CSV (`temperature_C,emf_mV` header, one row per line, `\n` endings).
 * @param table - a table from {@link referenceTable}
 * @returns CSV text
 * @example
 * ```ts
 * import { referenceTable, formatReferenceTableCsv } from "hotjunction/exact";
 * const csv = formatReferenceTableCsv(referenceTable("T", { fromC: 100, toC: 100 }));
 * console.log(csv.trim().split("\n")[1]); // 100,4.279
 * ```
 */
export function formatReferenceTableCsv(table: ReferenceTable): string {
  _requireShape(table, referenceTableShape, "table", "formatReferenceTableCsv");
  let text = "temperature_C,emf_mV\n";
  for (const row of table.rows) text += `${row.temperatureC},${row.emfText}\n`;
  return text;
}

/**
 * Formats a reference table as a Markdown table with a caption naming the type and source.
 * @param table - a table from {@link referenceTable}
 * @returns Markdown text
 * @example
 * ```ts
 * import { referenceTable, formatReferenceTableMarkdown } from "hotjunction/exact";
 * const md = formatReferenceTableMarkdown(referenceTable("J", { fromC: 0, toC: 0 }));
 * console.log(md.split("\n")[2]); // | Temperature (°C) | EMF (mV) |
 * ```
 */
export function formatReferenceTableMarkdown(table: ReferenceTable): string {
  _requireShape(table, referenceTableShape, "table", "formatReferenceTableMarkdown");
  const lines = [
    `Type ${table.type} thermocouple, EMF with the reference junction at 0 °C (ITS-90)`,
    "",
    "| Temperature (°C) | EMF (mV) |",
    "| ---: | ---: |",
  ];
  for (const row of table.rows) lines.push(`| ${row.temperatureC} | ${row.emfText} |`);
  lines.push("", `Source of the reference function: ${table.source}`);
  return `${lines.join("\n")}\n`;
}
