/**
 * Firmware lookup tables: generation with proven error bounds, TypeScript evaluation, C/JSON/CSV emitters.
 * @module
 */
export type { FirmwareAdcChain } from "./firmwareAdcChain.js";
export type { FirmwareNumberType } from "./firmwareNumberType.js";
export type { FirmwareTableChain } from "./types.js";
export type { FirmwareTableKind, FirmwareTableUnit } from "./tableFunction.js";
export {
  buildFirmwareTable,
  type BuildFirmwareTableOptions,
  type FirmwareColumnFormat,
  type FirmwareTable,
  type FirmwareTableColumn,
  type FirmwareTableErrorBound,
  type FirmwareTableErrorFound,
  type FirmwareTablePlacement,
} from "./buildFirmwareTable.js";
export { interpolateFirmwareTable } from "./interpolateFirmwareTable.js";
export { firmwareTableCaution } from "./firmwareCaution.js";
export { formatFirmwareTableC, type FormatFirmwareTableCOptions } from "./formatFirmwareTableC.js";
export { formatFirmwareTableJson, firmwareTableJsonFormat } from "./formatFirmwareTableJson.js";
export { formatFirmwareTableCsv } from "./formatFirmwareTableCsv.js";
export { firmwareTableFromSpec, type FirmwareTableFormat, type FirmwareTableSpec } from "./firmwareTableFromSpec.js";
