/**
 * Measurement-chain models: one module per element (thermocouple, cold junction, amplifier, fixed-scale
 * amplifier, series/shunt/regulator reference, divider, comparator, ADC), each contributing named error
 * sources and a transfer function; a chain is plain data listing the elements.
 * @module
 */
// Deliberately alike (the duplicate finder pairs these lists): every barrel names its exports one by one, and the
// root entry repeats each folder's list on purpose, so an export is added or removed in a reviewed place
// (tests/package/apiSurface.json pins the result).
export type {
  AdcElement,
  AmbientRange,
  AmplifierElement,
  AstmToleranceGrade,
  ChainBound,
  ChainContribution,
  ChainElement,
  ChainElementKind,
  ChainErrorSource,
  ChainEvaluation,
  ChainModel,
  ChainReading,
  ChainSourceElement,
  ChainTemperatureResult,
  ColdJunctionElement,
  ComparatorEdge,
  ComparatorElement,
  CustomTolerance,
  DetectorElement,
  DividerElement,
  DriftScaling,
  ErrorSourceUnit,
  FixedGain,
  FixedScaleAmplifierElement,
  HardwareColdJunction,
  HysteresisPlacement,
  IecToleranceClass,
  MatchedNetwork,
  MeasurementChain,
  NominalTrip,
  ReferenceCommon,
  ReferenceElement,
  RegulatorReference,
  ResistorGain,
  SeriesReference,
  ShuntReference,
  SoftwareColdJunction,
  SourceDistributionOverride,
  TempcoMethod,
  ThermocoupleElement,
  ThermocoupleTolerance,
} from "./types.js";
export {
  thermocoupleEmfMillivolts,
  thermocoupleToleranceC,
  toleranceRange,
  type ToleranceRange,
} from "./thermocouple.js";
export {
  coldJunctionIndicatedC,
  coldJunctionSensitivity,
  hardwareCompensationMillivolts,
  hardwareCompensationResidual,
  type CompensationResidual,
} from "./coldJunction.js";
export { amplifierGain } from "./amplifier.js";
export { fixedScaleNonlinearityC } from "./fixedScaleAmplifier.js";
export { boxMethodTempcoPpmPerC, longTermDriftPpm, tempcoExcursionPpm } from "./seriesReference.js";
export {
  shuntDynamicChangeMillivolts,
  shuntResistorSizing,
  type ShuntResistorSizing,
  type ShuntResistorSizingOptions,
} from "./shuntReference.js";
export { referenceErrorSources, type ReferenceErrorSourcesOptions } from "./reference.js";
export { referenceHeadroom, type ReferenceHeadroom } from "./referenceHeadroom.js";
export {
  dividerRatioModel,
  dividerTapRatio,
  type DividerRatioModel,
  type DividerRatioModelOptions,
} from "./divider.js";
export { comparatorSwitchingOffsetMillivolts } from "./comparator.js";
export { adcLsbVolts } from "./adc.js";
export { chainErrorSources } from "./chainErrorSources.js";
export {
  chainReadingModel,
  readingFromChain,
  type ReadingFromChainOptions,
  type ReadingFromChainResult,
} from "./readingFromChain.js";
export { evaluateChain, type EvaluateChainOptions } from "./evaluateChain.js";
export { evaluateChainParallel, type EvaluateChainParallelOptions } from "./evaluateChainParallel.js";
export type { ChainBoundsOptions } from "./_chainBounds.js";
export {
  temperatureFromChainReading,
  type RawChainReading,
  type TemperatureFromChainReadingOptions,
} from "./temperatureFromChainReading.js";
export {
  nominalTripTemperature,
  requiredThresholdVolts,
  tripTemperatureModel,
  type TripTemperatureModelOptions,
} from "./tripTemperatureModel.js";

// The wire elements
export {
  ageingBandAt,
  ageingBandOverService,
  type AgeingBandPoint,
  type AgeingElement,
  type AstmCableLimits,
  astmExtensionWireTolerances,
  awgDiameterMm,
  cableMismatchBound,
  type CableMismatchBound,
  type CableMismatchModel,
  cableTipErrorC,
  type CableTolerance,
  type CableToleranceEntry,
  cableToleranceMicrovolts,
  cableToleranceStatement,
  type CableToleranceStatement,
  type CableToleranceTable,
  type ConnectorElement,
  type ContactMetal,
  type ContactMetalName,
  contactMetals,
  type CustomCableTolerance,
  type DetectionDirection,
  detectionOffsetMicrovolts,
  type DriftDirection,
  type ExtensionCableElement,
  type IecCableClass,
  iecCableTolerances,
  type InsulationLeakageElement,
  isothermalGradientAsConnector,
  leakageScale,
  type LegSeebeck,
  legSeebeckVsContact,
  type LoopResistance,
  type LoopResistanceElement,
  loopResistanceOhms,
  type StatedContactMetal,
  type StatedLegSeebeck,
  type TemperatureRangeC,
  thermocoupleLegs,
  type ThermocoupleLegs,
  thermocoupleLoopOhmsPerMetre,
  type ThermocoupleWireRun,
  type WireAlloy,
  wireAlloySource,
  type WireDescription,
  type WireElement,
  wireEmfMillivolts,
  type WireErrorSource,
  wireErrorSources,
  type WireOptions,
  type WireSourceElement,
} from "./wire/index.js";
