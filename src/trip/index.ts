/**
 * Over-temperature trip design: standard resistor values (IEC 60063), exhaustive two-resistor and multi-tap
 * ladder threshold dividers, the mid-rail divider, reference realization (shunt series-resistor sizing),
 * trip bands and margins (`designTrip`), and reference comparison (`compareReferences`).
 * @module
 */
// Deliberately alike (the duplicate finder pairs these lists): every barrel names its exports one by one, and the
// root entry repeats each folder's list on purpose, so an export is added or removed in a reviewed place
// (tests/package/apiSurface.json pins the result).
export type {
  ElementReferenceOption,
  IdealReferenceOption,
  ProcessLimits,
  ReferenceComparison,
  ReferenceComparisonEntry,
  ReferenceComparisonSetpoint,
  ReferenceOption,
  ReferenceOptionCommon,
  ReferenceRealization,
  SetpointTripResult,
  ShuntReferenceToSize,
  SizedShuntReferenceOption,
  ThresholdNetwork,
  TripBand,
  TripDesign,
  TripDesignResult,
  TripErrorSource,
  TripServicePoint,
  TripResistors,
  TripSetpoint,
} from "./types.js";
export { standardResistorValues, nearestStandardResistor } from "./standardResistorValues.js";
export { selectDividerPair, type DividerPairSelection, type SelectDividerPairOptions } from "./selectDividerPair.js";
export { selectLadder, type LadderSelection, type SelectLadderOptions } from "./selectLadder.js";
export { midRailDivider, type MidRailDivider, type MidRailDividerOptions } from "./midRailDivider.js";
export { realizeReference, type RealizedReference, type RealizeReferenceOptions } from "./realizeReference.js";
export { resistorPositionNames, resistorDesignator } from "./buildSheet.js";
export type {
  TripBuildSheet,
  BuildSheetSetpoint,
  BuildSheetAdcSetpoint,
  BuildSheetNetwork,
  BuildSheetResistor,
  BuildSheetShuntResistor,
  BuildSheetMidRail,
  BuildSheetPart,
} from "./types.js";
export { designTrip, type DesignTripOptions } from "./designTrip.js";
export { designTripParallel, type DesignTripParallelOptions } from "./designTripParallel.js";
export { compareReferences, compareReferencesParallel, type CompareReferencesOptions } from "./compareReferences.js";
export {
  customaryToleranceFractions,
  preferredSeries,
  preferredSeriesNames,
  seriesE12,
  seriesE192,
  seriesE24,
  seriesE48,
  seriesE6,
  seriesE96,
  type PreferredSeriesName,
} from "../data/preferredSeries.js";
export {
  chainSignalSlope,
  type ChainSignalSlope,
  tripDynamics,
  type TripDynamicsCase,
  type TripDynamicsInput,
  type TripDynamicsModel,
  type TripDynamicsNoise,
  type TripDynamicsNoiseFigures,
  type TripDynamicsResult,
  type TripDynamicsSetpoint,
  type TripDynamicsSetpointInput,
} from "./tripDynamics.js";
