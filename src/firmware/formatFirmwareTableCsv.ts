/**
 * CSV emitter for firmware tables.
 * @module
 */
import type { FirmwareTable } from "./types.js";
import { _requireFiniteResult } from "../errors.js";
import { _checkFirmwareTable } from "./_firmwareTableShape.js";

const UNIT_WORD: Record<string, string> = { "µV": "microvolts", "°C": "celsius", code: "codes" };

/**
 * Emits a firmware table's breakpoints as CSV (RFC 4180 style, `\n` line ends): a header row
 * `index,input_stored,output_stored,input_<unit>,output_<unit>` (unit words `microvolts`, `celsius`,
 * `codes`), then one row per breakpoint with the stored values and the natural values (stored / scale).
 * The error report, formats and caution live in the JSON and C outputs. Deterministic text.
 * @param table - a table from {@link buildFirmwareTable}
 * @returns the CSV text, ending in a newline
 * @example
 * ```ts
 * import { buildFirmwareTable, formatFirmwareTableCsv } from "hotjunction";
 * const table = buildFirmwareTable({ type: "T", kind: "temperatureToEmf", minC: 0, maxC: 100, maxErrorOutputUnits: 5 });
 * console.log(formatFirmwareTableCsv(table).split("\n")[0]); // "index,input_stored,output_stored,input_celsius,output_microvolts"
 * ```
 */
export function formatFirmwareTableCsv(table: FirmwareTable): string {
  const context = "formatFirmwareTableCsv";
  _checkFirmwareTable(table, context);
  const inWord = UNIT_WORD[table.input.unit] ?? "value";
  const outWord = UNIT_WORD[table.output.unit] ?? "value";
  const rows = [`index,input_stored,output_stored,input_${inWord},output_${outWord}`];
  for (let i = 0; i < table.inputs.length; i++) {
    const x = table.inputs[i] as number;
    const y = table.outputs[i] as number;
    const xValue = _requireFiniteResult(x / table.input.scale, `table.inputs[${i}] / table.input.scale`, x, undefined, context);
    const yValue = _requireFiniteResult(y / table.output.scale, `table.outputs[${i}] / table.output.scale`, y, undefined, context);
    rows.push(`${i},${x},${y},${xValue},${yValue}`);
  }
  return rows.join("\n") + "\n";
}
