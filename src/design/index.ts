/**
 * `hotjunction/design`: design files (zod schema, validation, JSON Schema) and the report renderers.
 * @module
 */
export { designFileSchema, referenceSchema, type DesignFile, type DesignReference } from "./designSchema.js";
export { DesignFileError, type DesignFileErrorDetails } from "./designFileError.js";
export {
  designFileMaxBytes,
  designFileMaxDepth,
  parseDesign,
  safeParseDesign,
  validateDesign,
  type ParseDesignOptions,
  type SafeParseDesignResult,
} from "./parseDesign.js";
export { loadDesignFile, type LoadDesignFileOptions } from "./loadDesignFile.js";
export { designJsonSchema } from "./designJsonSchema.js";
export { measurementChainFromDesign, referenceOptionFromDesign, tripDesignFromDesign } from "./designToObjects.js";
export { CAUTION_TEXT } from "../report/caution.js";
export type {
  ErrorSweep,
  ErrorSweepRow,
  ReportFormat,
  ReportMethodInfo,
  TripReport,
  TripReportSetpoint,
} from "../report/reportTypes.js";
export { renderTripReport, tripReportFromResult } from "../report/renderTripReport.js";
export { renderComparisonReport } from "../report/renderComparisonReport.js";
export { renderSweepReport } from "../report/renderSweepReport.js";
export { tripBandChartSvg } from "../report/tripBandChart.js";
export { errorBandChartSvg } from "../report/errorBandChart.js";
export { firmwareTripReport, type FirmwareTripSetpoint } from "../report/firmwareTripReport.js";
