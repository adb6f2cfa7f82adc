/**
 * Plain-data types of the response-time model: the runaway process, the sensor, the signal path (analog comparator
 * or firmware), the output stages and the noise at the comparator or ADC input. Every field carries its unit in its
 * name, so a model is plain JSON as it stands (no `Infinity`, no class instances).
 * @module
 */

/** A runaway stated as a constant rate of rise of the load with the heater stuck on. */
export interface ConstantRateRunaway {
  readonly kind: "constantRate";
  /** Rate of rise of the load's true temperature while the heater is stuck on, °C/s; > 0. After heat off the
   * load is taken to hold its temperature (no loss is known), so the peak is the temperature at heat off. */
  readonly rateCPerSecond: number;
}

/** The heater element as a second thermal node: its own capacity, coupled to the load. */
export interface HeaterElementNode {
  /** Thermal capacity of the element, J/K; > 0. */
  readonly capacityJoulesPerK: number;
  /** Thermal conductance from element to load, W/K; > 0. */
  readonly couplingWattsPerK: number;
}

/**
 * A runaway from heater power: the load (capacity C, loss G to ambient) is a first-order process that approaches
 * `ambientC + heaterWatts / lossWattsPerK` with time constant C/G. With `element`, the heater is a second node that
 * keeps feeding the load after the cut, so the peak comes later and higher.
 *
 * Before the runaway the process is taken at steady state at the start temperature (the highest normal operating
 * temperature, held by the controller), and the element, if any, at the temperature that carries the holding power
 * `G·(start − ambient)` into the load.
 */
export interface HeaterPowerRunaway {
  readonly kind: "heaterPower";
  /** Heater power with the heater stuck on, W; > 0. */
  readonly heaterWatts: number;
  /** Thermal capacity of the heated load, J/K; > 0. */
  readonly loadCapacityJoulesPerK: number;
  /** Loss conductance from the load to ambient, W/K; ≥ 0 (0: adiabatic, a ramp of P/C). */
  readonly lossWattsPerK: number;
  /** Ambient temperature, °C; not above the start temperature. */
  readonly ambientC: number;
  /** Optional heater element node. */
  readonly element?: HeaterElementNode;
}

/** The runaway process. */
export type RunawayProcess = ConstantRateRunaway | HeaterPowerRunaway;

/** A first-order sensor given by its time constant. */
export interface FirstOrderSensor {
  readonly kind: "firstOrder";
  /** Time constant τ, s; ≥ 0 (0: ideal). */
  readonly timeConstantSeconds: number;
}

/** A first-order sensor given by its 63.2 % response time (for a first-order lag this is τ itself). */
export interface ResponseTimeSensor {
  readonly kind: "responseTime";
  /** Time to reach 63.2 % of a step, s; ≥ 0. */
  readonly responseTime632Seconds: number;
}

/** A sheathed probe in a thermowell: two cascaded first-order lags (well, then probe). */
export interface TwoLagSensor {
  readonly kind: "twoLags";
  /** Time constant of the thermowell, s; ≥ 0. */
  readonly wellTimeConstantSeconds: number;
  /** Time constant of the probe inside the well, s; ≥ 0. */
  readonly probeTimeConstantSeconds: number;
}

/** The sensor's thermal response. */
export type SensorResponse = FirstOrderSensor | ResponseTimeSensor | TwoLagSensor;

/** A first-order input RC filter, τ = R·C. */
export interface InputRcFilter {
  /** Series resistance, Ω; ≥ 0. */
  readonly resistanceOhms: number;
  /** Shunt capacitance, F; ≥ 0. */
  readonly capacitanceFarads: number;
}

/** Analog path to a comparator: input filter, amplifier roll-off (first order, τ = 1/(2πf)), comparator delay. */
export interface AnalogSignalPath {
  readonly kind: "analog";
  readonly inputFilter?: InputRcFilter;
  /** Amplifier −3 dB bandwidth, Hz; > 0. Omitted: no roll-off. */
  readonly amplifierBandwidthHz?: number;
  /** Comparator propagation delay, s; ≥ 0. */
  readonly comparatorDelaySeconds?: number;
}

/** Moving average of the last N samples. */
export interface MovingAverageFilter {
  readonly kind: "movingAverage";
  /** Number of samples averaged, integer 1 … 100000. */
  readonly samples: number;
}

/** First-order IIR filter y[n] = y[n−1] + a·(x[n] − y[n−1]). */
export interface FirstOrderIirFilter {
  readonly kind: "firstOrderIir";
  /** Coefficient a, 0 < a ≤ 1 (1: no filtering). */
  readonly coefficient: number;
}

/** Digital filter of the firmware path. */
export type DigitalFilter = MovingAverageFilter | FirstOrderIirFilter;

/** Firmware path: analog front end, ADC sampling, digital filter, debounce of M consecutive samples. */
export interface FirmwareSignalPath {
  readonly kind: "firmware";
  readonly inputFilter?: InputRcFilter;
  /** Amplifier −3 dB bandwidth, Hz; > 0. Omitted: no roll-off. */
  readonly amplifierBandwidthHz?: number;
  /** ADC sample (decision) period, s; > 0. */
  readonly samplePeriodSeconds: number;
  readonly digitalFilter?: DigitalFilter;
  /** Consecutive samples at or above the threshold before the trip, integer 1 … 100000; default 1. */
  readonly debounceSamples?: number;
}

/** The signal path from sensor to trip decision. */
export type SignalPath = AnalogSignalPath | FirmwareSignalPath;

/** A relay or contactor: its release (drop-out) time. */
export interface RelayOutputStage {
  readonly kind: "relay";
  /** Release time, s; ≥ 0. */
  readonly releaseTimeSeconds: number;
}

/** A solid-state relay that turns off at the next current zero: up to half a mains period (worst case used). */
export interface SolidStateRelayOutputStage {
  readonly kind: "solidStateRelay";
  /** Mains frequency, Hz: 50 or 60. */
  readonly mainsFrequencyHz: 50 | 60;
}

/** A de-energise-to-trip stage's own delay (driver, watchdog, hold-up). */
export interface DelayOutputStage {
  readonly kind: "deEnergiseDelay";
  /** Delay, s; ≥ 0. */
  readonly delaySeconds: number;
}

/** One output stage between the trip decision and heat off (pure delays, in series). */
export type OutputStage = RelayOutputStage | SolidStateRelayOutputStage | DelayOutputStage;

/** White noise given by its density, band-limited to `bandwidthHz`. */
export interface WhiteNoiseDensity {
  readonly kind: "density";
  /** One-sided density at the comparator or ADC input, V/√Hz; ≥ 0. */
  readonly densityVoltsPerRootHertz: number;
  /** Bandwidth of the ideal low-pass (flat from 0 to B, nothing above), Hz; > 0. */
  readonly bandwidthHz: number;
}

/** White noise given by its rms in a stated bandwidth. */
export interface WhiteNoiseRms {
  readonly kind: "rms";
  /** rms at the comparator or ADC input, V; ≥ 0. */
  readonly rmsVolts: number;
  /** Bandwidth of the ideal low-pass (flat from 0 to B), Hz; > 0. */
  readonly bandwidthHz: number;
}

/** Mains pickup: a sinusoid entering before the input filter, attenuated by the analog lags at its frequency. */
export interface MainsPickup {
  /** Peak amplitude, referred to the comparator or ADC input scale but before the filter's attenuation, V; ≥ 0. */
  readonly amplitudeVolts: number;
  /** Mains frequency, Hz: 50 or 60. */
  readonly frequencyHz: 50 | 60;
}

/** Noise at the comparator or ADC input. */
export interface NoiseSpec {
  /** Signal slope at the comparator or ADC input, V/°C; > 0 (turns volts into °C). */
  readonly sensitivityVoltsPerC: number;
  readonly white?: WhiteNoiseDensity | WhiteNoiseRms;
  readonly mainsPickup?: MainsPickup;
  /** Highest acceptable rate of output re-crossings (chatter) with the signal at the threshold, per hour; > 0. */
  readonly chatterTargetPerHour: number;
}

/** The whole response-time model of one trip channel (plain JSON). */
export interface DynamicsModel {
  readonly runaway: RunawayProcess;
  readonly sensor?: SensorResponse;
  /** Omitted: an ideal analog path (no lag, no delay). */
  readonly signalPath?: SignalPath;
  readonly outputStages?: readonly OutputStage[];
  readonly noise?: NoiseSpec;
}

/** One runaway case: where it starts, where the trip is set (true temperature), and the hazard limit. */
export interface RunawayScenario {
  /** Temperature the runaway starts from (the highest normal operating temperature), °C. */
  readonly startC: number;
  /** True-temperature trip point (e.g. the static band's high edge for the slowest unit), °C; > startC. */
  readonly tripTemperatureC: number;
  /** Hazard limit, °C. */
  readonly hazardLimitC: number;
}
