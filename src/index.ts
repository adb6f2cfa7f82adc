/**
 * hotjunction: exact ITS-90 thermocouple conversion, measurement-chain error budgets,
 * over-temperature trip design and firmware lookup tables.
 * @module
 */

// Error family
export {
  HotjunctionRangeError,
  HotjunctionTypeError,
  isHotjunctionError,
  type ErrorCode,
  type ErrorDetails,
  type HotjunctionError,
} from "./errors.js";

// Units
export {
  celsiusToFahrenheit,
  celsiusToKelvin,
  fahrenheitToCelsius,
  kelvinAtZeroCelsius,
  kelvinToCelsius,
  microvoltsToMillivolts,
  millivoltsToMicrovolts,
  millivoltsToVolts,
  voltsToMillivolts,
} from "./units.js";

// ITS-90 data (one module per type)
export type {
  ApproximateInverseData,
  ExponentialTerm,
  ForwardSubrange,
  InverseSubrange,
  ThermocoupleData,
  ThermocoupleType,
} from "./data/thermocoupleData.js";
export { typeB, typeBApproximateInverse } from "./data/typeB.js";
export { typeE, typeEApproximateInverse } from "./data/typeE.js";
export { typeJ, typeJApproximateInverse } from "./data/typeJ.js";
export { typeK, typeKApproximateInverse } from "./data/typeK.js";
export { typeN, typeNApproximateInverse } from "./data/typeN.js";
export { typeR, typeRApproximateInverse } from "./data/typeR.js";
export { typeS, typeSApproximateInverse } from "./data/typeS.js";
export { typeT, typeTApproximateInverse } from "./data/typeT.js";

// ITS-90 conversion
export {
  createThermocouple,
  type ApproximateInverseRange,
  type ColdJunctionOptions,
  type Thermocouple,
  type ThermocoupleRange,
} from "./its90/engine.js";
export {
  approximateInverseRanges,
  approximateTemperatureFromEmf,
  emfFromTemperature,
  emfFromTemperatureArray,
  seebeckCoefficient,
  temperatureFromEmf,
  temperatureFromEmfArray,
  temperatureRange,
  type ThermocoupleTypeInput,
} from "./its90/convert.js";
export { approximateInverseData, thermocoupleData, thermocoupleTypes } from "./its90/resolveType.js";

// Firmware lookup tables
export {
  buildFirmwareTable,
  firmwareTableCaution,
  firmwareTableFromSpec,
  firmwareTableJsonFormat,
  formatFirmwareTableC,
  formatFirmwareTableCsv,
  formatFirmwareTableJson,
  interpolateFirmwareTable,
  type BuildFirmwareTableOptions,
  type FirmwareAdcChain,
  type FirmwareColumnFormat,
  type FirmwareNumberType,
  type FirmwareTable,
  type FirmwareTableColumn,
  type FirmwareTableErrorBound,
  type FirmwareTableErrorFound,
  type FirmwareTableFormat,
  type FirmwareTableKind,
  type FirmwareTablePlacement,
  type FirmwareTableSpec,
  type FirmwareTableUnit,
  type FormatFirmwareTableCOptions,
} from "./firmware/index.js";

// Uncertainty propagation (distributions, worst case, RSS, Monte Carlo)
export * from "./uncertainty/index.js";

// Measurement-chain models (elements, error sources, reading and trip models)
export * from "./chain/index.js";
export {
  astmE230Tolerances,
  iecToleranceClasses,
  type ToleranceBand,
  type ToleranceTable,
} from "./data/toleranceClasses.js";

// Over-temperature trip design (preferred series, threshold dividers, trip bands, reference comparison)
export * from "./trip/index.js";

// Failure-mode review of a trip chain (fault catalogue, single-fault review, renderers)
export * from "./faults/index.js";

// Response time of a trip: runaway, lags, sampling, output stages, noise level crossings (issue 14)
export * from "./dynamics/index.js";
