/**
 * Safety figures from the single-fault review: failure data as data (rates in FIT, mode shares mapped onto
 * the fault catalogue), λ_SD/λ_SU/λ_DD/λ_DU, SFF, DC, PFDavg and PFH by the IEC 61508-6 Annex B simplified
 * equations for 1oo1 and 1oo2, proof-test coverage, two-channel cutouts, PFDavg against the proof-test interval,
 * and text, Markdown and JSON renderings. The user supplies the rates; no certification is claimed.
 * @module
 */
export type {
  AssumedFaultClass,
  BetaSensitivityRow,
  ChannelRates,
  CommonCauseBasis,
  CommonCauseFactors,
  DangerousRates,
  ElementFailureData,
  FailureData,
  FailureModeShare,
  PfdAvg1oo1Result,
  PfdAvg1oo2Result,
  PfdAvgCurve,
  PfdAvgCurvePoint,
  PfhResult,
  ProofTestParameters,
  ProofTestUsed,
  SafetyFaultClass,
  SafetyFaultSafety,
  SafetyFiguresOptions,
  SafetyFiguresReport,
  SafetyModeRow,
  SafetyRates,
  SetpointFaultClasses,
  SetpointSafetyFigures,
  TwoChannelCutout,
  TwoChannelCutoutOptions,
} from "./types.js";
export { failureDataProblems, failureShareSumTolerance, validateFailureData, type ValidateFailureDataOptions } from "./validateFailureData.js";
// The classification rule lives in faults/ (the review uses it); the root entry exports it from there.
export { safetyFaultClassesFromReview, type FaultReviewForSafety, type SafetyFaultClassesFromReviewOptions } from "./safetyFaultClassesFromReview.js";
export { safetyFigures } from "./safetyFigures.js";
export { safetyFiguresFromReviews, type SafetyFiguresFromReviewsOptions } from "./safetyFiguresFromReviews.js";
export { pfdAvg1oo1 } from "./pfdAvg1oo1.js";
export { pfdAvg1oo2 } from "./pfdAvg1oo2.js";
export { pfh1oo1 } from "./pfh1oo1.js";
export { pfh1oo2 } from "./pfh1oo2.js";
export { twoChannelCutout } from "./twoChannelCutout.js";
export { logSpacedHours, pfdAvgCurve, type PfdAvgCurveOptions } from "./pfdAvgCurve.js";
export { safetyFiguresCertification, safetyFiguresReport, safetyFiguresScope, type SafetyFiguresReportInput } from "./safetyFiguresReport.js";
export { formatSafetyFiguresText } from "./formatSafetyFiguresText.js";
export { formatSafetyFiguresMarkdown } from "./formatSafetyFiguresMarkdown.js";
export { formatSafetyFiguresJson, safetyFiguresJsonFormat } from "./formatSafetyFiguresJson.js";
export { formatSafetyFiguresCsv } from "./formatSafetyFiguresCsv.js";
export { formatSafetyFigures, type SafetyFiguresFormat } from "./formatSafetyFigures.js";
