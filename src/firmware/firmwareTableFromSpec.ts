/**
 * One-call entry for tools (the CLI): a JSON-able spec in, the emitted text out.
 * @module
 */
import { _invalidChoice, HotjunctionTypeError } from "../errors.js";
import { buildFirmwareTable, type BuildFirmwareTableOptions } from "./buildFirmwareTable.js";
import { formatFirmwareTableC } from "./formatFirmwareTableC.js";
import { formatFirmwareTableCsv } from "./formatFirmwareTableCsv.js";
import { formatFirmwareTableJson } from "./formatFirmwareTableJson.js";

/** Output formats of {@link firmwareTableFromSpec}. */
export type FirmwareTableFormat = "c" | "json" | "csv";

/**
 * A complete, JSON-able request for a firmware table: the {@link BuildFirmwareTableOptions} plus the
 * output format and (for C) the identifier prefix. Shape:
 * ```
 * {
 *   "format": "c" | "json" | "csv",
 *   "prefix": "tc_table",                 // C only; a C identifier
 *   "type": "K",                          // B E J K N R S T
 *   "kind": "emfToTemperature",           // | "adcCodeToTemperature" | "temperatureToEmf"
 *                                         // | "temperatureToAdcCode" | "coldJunctionToEmf" | "coldJunctionToAdcCode"
 *   "minC": -200, "maxC": 1372,           // °C
 *   "maxErrorOutputUnits": 0.01,          // °C, µV or codes (the output's unit)
 *   "placement": "adaptive",              // or "uniform" (power-of-two spacing)
 *   "input":  { "numberType": "int32", "scale": 1 },      // int16 uint16 int32 uint32 float32 float64
 *   "output": { "numberType": "int32", "scale": 1000 },
 *   "chain": { "gain": 100, "offsetMillivolts": 0, "fullScaleVolts": 2.5, "bits": 16, "coldJunctionC": 25 },
 *   "maxBreakpoints": 4096
 * }
 * ```
 * Only `format`, `type`, `kind`, `minC`, `maxC` and `maxErrorOutputUnits` are required (`chain` for the
 * ADC-code kinds).
 */
export interface FirmwareTableSpec extends BuildFirmwareTableOptions {
  /** Output format. */
  readonly format: FirmwareTableFormat;
  /** Identifier prefix for the C header (default `"tc_table"`); ignored by JSON and CSV. */
  readonly prefix?: string;
}

/**
 * Builds a firmware table from a plain spec object (as a CLI reads from flags or a JSON file) and returns
 * the emitted text: a C header, JSON or CSV. Deterministic: the same spec gives byte-identical text.
 * @param spec - see {@link FirmwareTableSpec}
 * @returns the emitted text, ending in a newline
 * @throws everything {@link buildFirmwareTable} and {@link formatFirmwareTableC} throw;
 *   HotjunctionRangeError (`INVALID_OPTION`) for an unknown format; HotjunctionTypeError for a spec that is
 *   not an object
 * @example
 * ```ts
 * import { firmwareTableFromSpec } from "hotjunction";
 * const csv = firmwareTableFromSpec({ format: "csv", type: "K", kind: "coldJunctionToEmf", minC: 0, maxC: 50, maxErrorOutputUnits: 2 });
 * console.log(csv.split("\n")[1]); // "0,0,0,0,0"
 * ```
 */
export function firmwareTableFromSpec(spec: FirmwareTableSpec): string {
  // Same error shape as other object checks (deliberate: this one names the firmware table spec).
  if (typeof spec !== "object" || spec === null) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "firmware table spec",
      value: spec,
      problem: "is not an object",
    });
  }
  const format = spec.format;
  if (format !== "c" && format !== "json" && format !== "csv") {
    return _invalidChoice("output format", format, ["c", "json", "csv"], "firmware table spec");
  }
  const table = buildFirmwareTable(spec);
  if (format === "c") return formatFirmwareTableC(table, spec.prefix === undefined ? {} : { prefix: spec.prefix });
  if (format === "json") return formatFirmwareTableJson(table);
  return formatFirmwareTableCsv(table);
}
