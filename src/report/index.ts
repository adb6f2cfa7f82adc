/**
 * hotjunction/report: the report renderers (text, Markdown, CSV, JSON) and the SVG charts. This entry adds the
 * chart scales (d3-scale, d3-shape); the core (`hotjunction`) and the design-file entry (`hotjunction/design`)
 * stay free of them.
 * @module
 */
export { CAUTION_TEXT } from "../caution.js";
export type {
  ErrorSweep,
  ErrorSweepBand,
  ErrorSweepBracket,
  ErrorSweepRow,
  ErrorSweepSetpoint,
  ReportFormat,
  ReportMethodInfo,
  TripReport,
  TripReportDynamics,
  TripReportSetpoint,
} from "./reportTypes.js";
export { formatTripReport, renderTripReport, tripReportFromResult } from "./renderTripReport.js";
export { formatComparisonReport, renderComparisonReport } from "./renderComparisonReport.js";
export { formatSweepReport, renderSweepReport } from "./renderSweepReport.js";
export { tripBandChartSvg } from "./tripBandChart.js";
export { errorBandChartSvg } from "./errorBandChart.js";
export { comparisonChartSvg, type ComparisonChartInput } from "./comparisonChart.js";
export { reportTemperatureUnits, type ReportDisplayOptions, type ReportTemperatureUnit } from "./displayUnit.js";
export { pfdAvgChartSvg, type PfdAvgChartInput } from "./pfdAvgChart.js";
export { firmwareTripReport, type FirmwareTripSetpoint } from "./firmwareTripReport.js";
export { formatRunawayReport, type RunawayReport } from "./runawayReport.js";
export { runawayChartSvg, type RunawayChartOptions } from "../dynamics/runawayChartSvg.js";
