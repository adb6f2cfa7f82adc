/**
 * Response time of an over-temperature trip: the runaway process, sensor and electronic lags, firmware sampling and
 * debounce, output stages, and noise level-crossing rates. Plain data in, time series and figures out.
 * @module
 */
export type * from "./types.js";
export {
  amplifierTimeConstantSeconds,
  firstOrderRampLagC,
  heatedLoadEquilibrium,
  iirRampDelaySeconds,
  movingAverageRampDelaySeconds,
  rampLagThroughLagsC,
} from "./lagFormulas.js";
export {
  chatterRatePerHour,
  hysteresisForChatterVolts,
  mainsPickupPeakVolts,
  NOISE_SPECTRUM_ASSUMPTION,
  riceUpCrossingRatePerSecond,
  tripNoiseFigures,
  whiteNoiseRmsVolts,
  type ChatterRateOptions,
  type TripNoiseFigures,
} from "./levelCrossing.js";
export { simulateRunaway, type RunawayResponse, type RunawaySeries, type SimulateRunawayOptions } from "./simulateRunaway.js";
export {
  checkDynamics,
  DYNAMICS_ASSUMPTIONS,
  dynamicsCheckJson,
  type DynamicsCase,
  type DynamicsCheck,
  type DynamicsCheckInput,
  type DynamicsCheckJsonOptions,
  type DynamicsThreshold,
  type RunawayFigures,
} from "./checkDynamics.js";
export { runawayChartSvg, type RunawayChartOptions } from "./runawayChartSvg.js";
