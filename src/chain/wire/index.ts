/**
 * The wire between the probe and the amplifier: extension and compensating cable, connectors, loop
 * resistance with bias and detection currents, insulation leakage and ageing. Each element has a checker,
 * its named error sources and a stage with its transfer contribution; `wireStage.ts` says where each sits
 * in the signal path. Wired into the compiled chain, the design schema, the faults and the reports in a
 * later step.
 * @module
 */
export type * from "../wireTypes.js";
export type { WireErrorSource } from "../types.js";
export {
  astmExtensionWireTolerances,
  iecCableTolerances,
  type CableToleranceEntry,
  type CableToleranceTable,
} from "../../data/cableTolerances.js";
export {
  contactMetals,
  thermocoupleLegs,
  wireAlloySource,
  type ContactMetalName,
  type ThermocoupleLegs,
  type WireAlloy,
} from "../../data/wireAlloys.js";
export {
  cableMismatchBound,
  cableTipErrorC,
  cableToleranceMicrovolts,
  cableToleranceStatement,
  type CableMismatchBound,
  type CableToleranceStatement,
} from "./extensionCable.js";
export { isothermalGradientAsConnector, legSeebeckVsContact, type LegSeebeck } from "./connector.js";
export {
  awgDiameterMm,
  detectionOffsetMicrovolts,
  loopResistanceOhms,
  thermocoupleLoopOhmsPerMetre,
  type LoopResistance,
} from "./loopResistance.js";
export { ageingBandAt, ageingBandOverService, leakageScale, type AgeingBandPoint } from "./probe.js";
export { wireEmfMillivolts, wireErrorSources, type WireDescription, type WireOptions } from "./wireStage.js";
