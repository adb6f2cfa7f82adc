/**
 * Failure-mode review of a trip chain: a fault catalogue per chain element (faults as data), the single-fault
 * review (what each fault does to the trip, safe/dangerous, detected/undetected) and its text, Markdown and
 * JSON renderings.
 * @module
 */
export type {
  AmplifierResistorFaultEffect,
  AnyOfEffect,
  BoardSupplyLossEffect,
  CustomEffect,
  DividerResistorFaultEffect,
  Fault,
  FaultCategory,
  FaultCategoryCounts,
  FaultContext,
  FaultDefinition,
  FaultDetection,
  FaultDetectionMethod,
  FaultEffect,
  FaultNodeName,
  FaultReview,
  FaultReviewDisplayOptions,
  FaultReviewReport,
  FaultReviewRow,
  FaultReviewTrip,
  FaultSafety,
  FaultSignals,
  FaultTripEffect,
  OffsetNodeEffect,
  OpenThermocoupleEffect,
  OutOfRangeWindow,
  OverrideNodeEffect,
  ReferenceOpenEffect,
  ReviewFaultsOptions,
  ScaleNodeEffect,
  SecondComparator,
  SupervisoryReading,
  ThermocoupleShortEffect,
} from "./types.js";
export { faultCatalogue, type FaultCatalogueOptions } from "./faultCatalogue.js";
export { classifyFaultShift, defaultNoEffectThresholdC, type ClassifyFaultShiftInput, type FaultShiftClass } from "./classifyFaultShift.js";
export { reviewFaults } from "./reviewFaults.js";
export { faultsFromJson } from "./faultsFromJson.js";
export { faultReviewReport, faultReviewScope, reviewChainFaults } from "./faultReviewReport.js";
export { reviewTripDesignFaults, type FaultReviewTripResult } from "./reviewTripDesignFaults.js";
export { formatFaultReview, type FaultReviewFormat } from "./formatFaultReview.js";
export { formatFaultReviewText } from "./formatFaultReviewText.js";
export { formatFaultReviewMarkdown } from "./formatFaultReviewMarkdown.js";
export { faultReviewJsonFormat, formatFaultReviewJson } from "./formatFaultReviewJson.js";
export { formatFaultReviewCsv } from "./formatFaultReviewCsv.js";
