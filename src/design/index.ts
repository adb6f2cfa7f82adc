/**
 * `hotjunction/design`: design files (zod schema, validation, JSON Schema) and the report renderers.
 * @module
 */
export { designFileSchema, referenceSchema, type DesignFailureData, type DesignFile, type DesignReference } from "./designSchema.js";
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
export { failureDataFromDesign, measurementChainFromDesign, referenceOptionFromDesign, secondChannelDesign, tripDesignFromDesign } from "./designToObjects.js";
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
export { pfdAvgChartSvg, type PfdAvgChartInput } from "../report/pfdAvgChart.js";
export { safetyFiguresJsonSchema, safetyFiguresOutputSchema } from "./safetyFiguresJsonSchema.js";
export { firmwareTripReport, type FirmwareTripSetpoint } from "../report/firmwareTripReport.js";
