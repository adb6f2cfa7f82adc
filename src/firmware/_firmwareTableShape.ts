/**
 * What the firmware-table formatters and `interpolateFirmwareTable` read of a table, checked at their entry with the
 * shared shape guard (`_requireShape`, src/errors.ts): a forged or truncated table is refused by field name.
 * @module
 * @internal
 */
import { _requireShape, HotjunctionRangeError, type _Shape } from "../errors.js";
import type { FirmwareTable } from "./types.js";

const column: _Shape = { quantity: "string", unit: "string", numberType: "string", scale: "positive", min: "number", max: "number" };
const tableShape: _Shape = { input: column, output: column, inputs: ["array", "number"], outputs: ["array", "number"] };

/** @internal Checks a firmware table's columns and breakpoints (one output per input, finite, scales > 0). */
export function _checkFirmwareTable(table: unknown, context: string): FirmwareTable {
  _requireShape(table, tableShape, "table", context);
  const t = table as FirmwareTable;
  if (t.inputs.length !== t.outputs.length) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "table.outputs",
      value: t.outputs,
      context,
      problem: `must hold one output per input (${t.inputs.length} inputs)`,
    });
  }
  return t;
}
