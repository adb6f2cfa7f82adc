/**
 * JSON emitter for firmware tables.
 * @module
 */
import type { FirmwareTable } from "./types.js";
import { firmwareTableCaution } from "./firmwareCaution.js";
import { _checkFirmwareTable } from "./_firmwareTableShape.js";

/** Value of the `format` key of emitted JSON tables. */
export const firmwareTableJsonFormat = "hotjunction-firmware-table";

/**
 * Emits a firmware table as JSON: one key per line in a fixed order, arrays on one line, so the text is
 * deterministic and diffs well. Keys: `format` (`"hotjunction-firmware-table"`), `formatVersion` (1),
 * `caution`, then every field of {@link FirmwareTable} (`thermocoupleType`, `kind`, `placement`,
 * `requestedMinC`, `requestedMaxC`, `coveredMinC`, `coveredMaxC`, `input`, `output`, `chain`,
 * `spacingLog2`, `requestedMaxErrorOutputUnits`, `errorBound`, `maxErrorFound`, `monotonic`, `inputs`,
 * `outputs`). `JSON.parse` of the text gives back the table's values exactly.
 * @param table - a table from {@link buildFirmwareTable}
 * @returns the JSON text, ending in a newline
 * @example
 * ```ts
 * import { buildFirmwareTable, formatFirmwareTableJson } from "hotjunction";
 * const table = buildFirmwareTable({ type: "T", kind: "temperatureToEmf", minC: 0, maxC: 100, maxErrorOutputUnits: 5 });
 * const parsed = JSON.parse(formatFirmwareTableJson(table));
 * console.log(parsed.kind, parsed.outputs.length === table.outputs.length); // "temperatureToEmf" true
 * ```
 */
export function formatFirmwareTableJson(table: FirmwareTable): string {
  _checkFirmwareTable(table, "formatFirmwareTableJson");
  const entries: [string, unknown][] = [
    ["format", firmwareTableJsonFormat],
    ["formatVersion", 1],
    ["caution", firmwareTableCaution],
    ["thermocoupleType", table.thermocoupleType],
    ["kind", table.kind],
    ["placement", table.placement],
    ["requestedMinC", table.requestedMinC],
    ["requestedMaxC", table.requestedMaxC],
    ["coveredMinC", table.coveredMinC],
    ["coveredMaxC", table.coveredMaxC],
    ["input", table.input],
    ["output", table.output],
    ["chain", table.chain],
    ["spacingLog2", table.spacingLog2],
    ["requestedMaxErrorOutputUnits", table.requestedMaxErrorOutputUnits],
    ["errorBound", table.errorBound],
    ["maxErrorFound", table.maxErrorFound],
    ["monotonic", table.monotonic],
    ["inputs", table.inputs],
    ["outputs", table.outputs],
  ];
  const body = entries.map(([key, value]) => `  ${JSON.stringify(key)}: ${JSON.stringify(value)}`).join(",\n");
  return `{\n${body}\n}\n`;
}
