/**
 * Types of the trip-design engine: the input `TripDesign` (setpoints, chain, reference, resistor series and
 * process limits) and the outputs `TripDesignResult` (per setpoint) and `ReferenceComparison`.
 * Every type is plain JSON-serializable data; every numeric key carries its unit.
 *
 * The trip chain is an over-temperature comparator: thermocouple -> cold-junction compensation -> amplifier
 * (fixed-scale or plain gain) -> comparator non-inverting input; the comparator's other input is a threshold
 * made by a resistor divider (two resistors per setpoint, or one multi-tap ladder) from a voltage reference.
 * The comparator trips when the amplified signal rises above the threshold and releases when it falls below
 * the threshold minus its hysteresis.
 * @module
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import type { PreferredSeriesName } from "../data/preferredSeries.js";

// ---------------------------------------------------------------------------------------------------------
// Input: the chain
// ---------------------------------------------------------------------------------------------------------

/**
 * Thermocouple of the trip chain. Its tolerance is the larger of `toleranceC` and `toleranceFraction`·|t|
 * (the shape of IEC 60584-1 and ASTM E230 tolerance tables), treated as a rectangular bound.
 */
export interface TripThermocouple {
  readonly type: ThermocoupleType;
  /** Fixed part of the tolerance, °C, ≥ 0 (e.g. 2.2 for type K standard limits, ASTM E230). */
  readonly toleranceC: number;
  /** Proportional part of the tolerance, fraction of |t| in °C, ≥ 0 (e.g. 0.0075). Default 0. */
  readonly toleranceFraction?: number;
}

/** Cold junction (reference junction) of the trip chain. */
export interface TripColdJunction {
  /** Temperature at which the threshold is designed, °C. */
  readonly nominalC: number;
  /** Lowest cold-junction temperature in service, °C (≤ nominalC). */
  readonly minC: number;
  /** Highest cold-junction temperature in service, °C (≥ nominalC). */
  readonly maxC: number;
  /**
   * `"compensated"` (default): a sensor measures the cold junction and the chain adds E(t_c + error);
   * `"none"`: no compensation, the chain sees E(t_h) − E(t_c) and the cold junction moving over
   * minC…maxC becomes an error source. A fixed-scale amplifier always compensates internally.
   */
  readonly compensation?: "compensated" | "none";
  /** Error bound of the cold-junction sensor or the amplifier's internal compensation, ±°C, ≥ 0. */
  readonly sensorToleranceC: number;
}

/**
 * A fixed-scale thermocouple amplifier with internal cold-junction compensation. Output
 * V = offsetVolts + scaleVoltsPerC · t_ind, where t_ind is the temperature it indicates. With
 * `linearizationMicrovoltsPerC` = α it indicates t_ind = [E(t_h) − E(t_c)]/α + t_c (a linear compensator,
 * so its nonlinearity error appears); without it the indication is ideal (t_ind = t_h).
 */
export interface TripFixedScaleAmplifier {
  readonly kind: "fixed-scale";
  /** Output scale, V/°C, > 0 (e.g. 0.005 for 5 mV/°C). */
  readonly scaleVoltsPerC: number;
  /** Nominal output at 0 °C indicated, V. Default 0. */
  readonly offsetVolts?: number;
  /** Output offset error bound, ±V, ≥ 0. Default 0. */
  readonly offsetToleranceVolts?: number;
  /** Gain (scale) error bound, ±fraction, ≥ 0. Default 0. */
  readonly gainToleranceFraction?: number;
  /** Linear Seebeck stand-in α of the compensator, µV/°C, > 0; omit for an ideal (linearized) output. */
  readonly linearizationMicrovoltsPerC?: number;
}

/** A plain voltage amplifier of gain G on the (compensated) thermocouple EMF: V = G·(EMF + input offset). */
export interface TripGainAmplifier {
  readonly kind: "gain";
  /** Nominal gain, V/V, > 0. */
  readonly gain: number;
  /** Gain error bound, ±fraction, ≥ 0. Default 0. */
  readonly gainToleranceFraction?: number;
  /** Input-referred offset error bound, ±µV, ≥ 0. Default 0. */
  readonly inputOffsetToleranceMicrovolts?: number;
}

/** Amplifier of the trip chain. */
export type TripAmplifier = TripFixedScaleAmplifier | TripGainAmplifier;

/** Comparator of the trip chain (rising trip, release below trip by the hysteresis). */
export interface TripComparator {
  /** Input offset error bound, ±V, ≥ 0. */
  readonly offsetToleranceVolts: number;
  /** Hysteresis: trip threshold minus release threshold at the comparator input, V, ≥ 0. */
  readonly hysteresisVolts: number;
  /** Hysteresis error bound, ±fraction of hysteresisVolts, ≥ 0. Default 0. */
  readonly hysteresisToleranceFraction?: number;
}

/** Ambient range of the electronics (references and resistors), °C; tempcos are referred to 25 °C. */
export interface TripAmbient {
  readonly minC: number;
  readonly maxC: number;
}

/** Common fields of reference options. */
export interface ReferenceOptionBase {
  /** Label of the option in results (e.g. "2.5 V series reference, 0.1 %"). */
  readonly name: string;
  /** Nominal output, V, > 0. */
  readonly nominalVolts: number;
  /** User-supplied cost of the option (any currency, per unit), ≥ 0; used only in comparisons. */
  readonly cost?: number;
}

/** An error-free reference (the yardstick of comparisons). */
export interface IdealReferenceOption extends ReferenceOptionBase {
  readonly kind: "ideal";
}

/** A precision series (three-terminal) voltage reference. */
export interface SeriesReferenceOption extends ReferenceOptionBase {
  readonly kind: "series";
  /** Initial tolerance at 25 °C, ±fraction, ≥ 0. */
  readonly initialToleranceFraction: number;
  /** Box-method temperature coefficient, ppm/°C, ≥ 0; bound TC·max(|T−25 °C|) over the ambient range. */
  readonly tempcoPpmPerC?: number;
  /** Long-term drift bound, ±ppm, ≥ 0 (already scaled to the service life). Default 0. */
  readonly driftPpm?: number;
}

/**
 * A shunt (two-terminal) reference fed from a supply through a series resistor that the engine sizes:
 * R ≤ (V_s,min − V_ref)/(I_load,max + I_shunt,min) with the resistor's tolerance, largest standard value.
 */
export interface ShuntReferenceOption extends ReferenceOptionBase {
  readonly kind: "shunt";
  /** Initial tolerance at 25 °C, ±fraction, ≥ 0. */
  readonly initialToleranceFraction: number;
  /** Box-method temperature coefficient, ppm/°C, ≥ 0. Default 0. */
  readonly tempcoPpmPerC?: number;
  /** Long-term drift bound, ±ppm, ≥ 0. Default 0. */
  readonly driftPpm?: number;
  /** Supply feeding the series resistor, lowest and highest, V (> nominalVolts). */
  readonly supplyMinVolts: number;
  readonly supplyMaxVolts: number;
  /** Minimum cathode current for regulation, A, > 0. */
  readonly minShuntCurrentAmps: number;
  /** Maximum allowed cathode current, A, > minShuntCurrentAmps. */
  readonly maxShuntCurrentAmps: number;
  /** Dynamic impedance, Ω, ≥ 0: the output moves by Z·ΔI over the current span. Default 0. */
  readonly dynamicImpedanceOhms?: number;
  /** Load current besides the threshold divider, lowest and highest, A, ≥ 0. Default 0. */
  readonly otherLoadMinAmps?: number;
  readonly otherLoadMaxAmps?: number;
  /** Series-resistor series and tolerance. Default the design's resistor series and tolerance. */
  readonly seriesResistorSeries?: PreferredSeriesName;
  readonly seriesResistorToleranceFraction?: number;
}

/** A regulator rail used directly as the reference (e.g. a 5 V linear regulator, ±4 % over line, load, temperature). */
export interface RegulatorReferenceOption extends ReferenceOptionBase {
  readonly kind: "regulator";
  /** Total tolerance over line, load and temperature, ±fraction, ≥ 0. */
  readonly toleranceFraction: number;
}

/** One way to make the reference voltage the threshold divider starts from. */
export type ReferenceOption =
  | IdealReferenceOption
  | SeriesReferenceOption
  | ShuntReferenceOption
  | RegulatorReferenceOption;

/** Resistors of the threshold divider. */
export interface TripResistors {
  /** Preferred series the values come from. */
  readonly series: PreferredSeriesName;
  /** Tolerance of each resistor, ±fraction, > 0 (e.g. 0.01). */
  readonly toleranceFraction: number;
  /** Temperature coefficient of each resistor, ±ppm/°C, ≥ 0, taken as independent between resistors. Default 0. */
  readonly tempcoPpmPerC?: number;
  /** Bounds on the total divider resistance, Ω. Defaults 1 kΩ and 1 MΩ. */
  readonly minTotalOhms?: number;
  readonly maxTotalOhms?: number;
  /** Bounds on the divider current at nominal reference voltage, A; tighten the resistance bounds. */
  readonly minDividerCurrentAmps?: number;
  readonly maxDividerCurrentAmps?: number;
  /**
   * `"separate"` (default): one two-resistor divider per setpoint; `"ladder"`: one string of N+1 resistors
   * whose N taps give the N thresholds (selectable setpoints).
   */
  readonly topology?: "separate" | "ladder";
}

/** Limits of the protected process. */
export interface ProcessLimits {
  /** Highest temperature of normal operation, °C: no trip may occur at or below it (no nuisance trip). */
  readonly maxNormalOperatingC: number;
  /** Hazard limit, °C: the trip must occur below it. */
  readonly hazardLimitC: number;
}

/** One trip setpoint. Process limits here override the design's `processLimits`. */
export interface TripSetpoint {
  /** Label (e.g. "glaze firing"). */
  readonly name: string;
  /** Desired trip temperature, °C (hot junction, rising). */
  readonly tripTemperatureC: number;
  readonly maxNormalOperatingC?: number;
  readonly hazardLimitC?: number;
}

/** A complete trip design: the input of `designTrip` and `compareReferences`. */
export interface TripDesign {
  /** Label of the design. */
  readonly name?: string;
  readonly setpoints: readonly TripSetpoint[];
  readonly thermocouple: TripThermocouple;
  readonly coldJunction: TripColdJunction;
  readonly amplifier: TripAmplifier;
  readonly comparator: TripComparator;
  readonly reference: ReferenceOption;
  readonly resistors: TripResistors;
  readonly ambient: TripAmbient;
  /** Default process limits for setpoints that do not give their own. */
  readonly processLimits?: ProcessLimits;
}

// ---------------------------------------------------------------------------------------------------------
// Output
// ---------------------------------------------------------------------------------------------------------

/** A temperature band [lowC, highC] by one propagation method. */
export interface TripBand {
  readonly method: "worst-case" | "rss" | "monte-carlo";
  readonly lowC: number;
  readonly highC: number;
  /** Coverage probability (1 for worst case). */
  readonly coverage: number;
  /** Standard uncertainty of the trip temperature, °C (worst case: 0 when not defined). */
  readonly standardUncertaintyC: number;
  /** Monte Carlo only: trials and seed (same seed, same band). */
  readonly trials?: number;
  readonly seed?: number;
}

/** One error source's share of the trip band. */
export interface TripErrorSource {
  /** Input name (e.g. "referenceFraction", "resistorTop", "comparatorOffsetVolts"). */
  readonly name: string;
  /** What it is, in words. */
  readonly description: string;
  /** Half-width of the trip-temperature swing this source alone causes over its bound, °C. */
  readonly worstCaseC: number;
  /** |c|·u of this source, °C. */
  readonly standardUncertaintyC: number;
}

/** The chosen threshold network. */
export interface ThresholdNetwork {
  readonly topology: "two-resistor" | "ladder";
  /**
   * Standard resistor values, Ω, from the reference end to ground: two-resistor [top, bottom]; ladder
   * [R_0 (top), …, R_N (bottom)], tap i (0-based, setpoints sorted by threshold, highest first) lies below R_i.
   */
  readonly resistorsOhms: readonly number[];
  readonly totalOhms: number;
  /** Divider current at nominal reference voltage, A. */
  readonly currentAmps: number;
}

/** How the reference was realized (shunt: the sized series resistor and the current span). */
export interface ReferenceRealization {
  readonly name: string;
  readonly kind: ReferenceOption["kind"];
  readonly nominalVolts: number;
  /** Total error bound of the reference voltage, ±fraction (sum of its parts). */
  readonly toleranceFraction: number;
  /** Shunt only: the standard series resistor, Ω, and its tolerance. */
  readonly seriesResistorOhms?: number;
  /** Shunt only: the cathode current range in service, A. */
  readonly shuntCurrentMinAmps?: number;
  readonly shuntCurrentMaxAmps?: number;
  /** Shunt only: worst dissipation of the series resistor, W. */
  readonly seriesResistorPowerWatts?: number;
  /** Problems (e.g. a shunt current above its maximum); empty when none. */
  readonly problems: readonly string[];
}

/** Result for one setpoint. */
export interface SetpointTripResult {
  readonly name: string;
  /** Desired trip temperature, °C. */
  readonly tripTemperatureC: number;
  /** Threshold voltage that would trip exactly at tripTemperatureC with nominal parts, V. */
  readonly idealThresholdVolts: number;
  /** Threshold from the chosen standard resistors at nominal reference voltage, V. */
  readonly realizedThresholdVolts: number;
  /** Divider ratio k = V_threshold / V_ref realized, and the ideal one. */
  readonly realizedRatio: number;
  readonly idealRatio: number;
  /** Standard resistors of this setpoint's divider [top, bottom], Ω (ladder: the equivalent above/below the tap). */
  readonly resistorsOhms: readonly [number, number];
  /** Trip and release temperatures with all parts nominal, °C. */
  readonly nominalTripC: number;
  readonly nominalReleaseC: number;
  /** Resistor-rounding error of the nominal trip, nominalTripC − tripTemperatureC, °C. */
  readonly roundingErrorC: number;
  /** Trip bands by worst case, RSS and Monte Carlo. */
  readonly worstCase: TripBand;
  readonly rss: TripBand;
  readonly monteCarlo: TripBand;
  /** Process limits used. */
  readonly maxNormalOperatingC: number;
  readonly hazardLimitC: number;
  /** Acceptance band (the `acceptanceMethod` one) low end minus maxNormalOperatingC, °C; > 0 needed. */
  readonly marginToNormalC: number;
  /** hazardLimitC minus acceptance band high end, °C; > 0 needed. */
  readonly marginToHazardC: number;
  readonly pass: boolean;
  /** One sentence: why it passes or fails. */
  readonly reason: string;
  /** Error sources, largest worst-case swing first. */
  readonly errorSources: readonly TripErrorSource[];
}

/** Result of `designTrip`. */
export interface TripDesignResult {
  readonly name?: string;
  readonly network: ThresholdNetwork;
  readonly reference: ReferenceRealization;
  /** One entry per setpoint, in input order. */
  readonly setpoints: readonly SetpointTripResult[];
  /** Method whose band decides pass/fail. */
  readonly acceptanceMethod: "worst-case" | "rss" | "monte-carlo";
  /** True when every setpoint passes and the reference has no problems. */
  readonly pass: boolean;
  /** How the network was found and what was assumed, in sentences. */
  readonly notes: readonly string[];
}

/** One setpoint under one reference option, beside the ideal reference. */
export interface ReferenceComparisonSetpoint {
  readonly name: string;
  /** Acceptance band with this reference, °C. */
  readonly lowC: number;
  readonly highC: number;
  /** Acceptance band with a perfect reference of the same voltage (same resistors), °C. */
  readonly idealLowC: number;
  readonly idealHighC: number;
  /** Extra band width this reference adds over the ideal one, °C (≥ 0). */
  readonly extraWidthC: number;
  readonly marginToNormalC: number;
  readonly marginToHazardC: number;
  readonly pass: boolean;
}

/** One reference option in a comparison. */
export interface ReferenceComparisonEntry {
  readonly name: string;
  readonly kind: ReferenceOption["kind"];
  /** User-supplied cost, or null when not given. */
  readonly cost: number | null;
  readonly reference: ReferenceRealization;
  readonly network: ThresholdNetwork;
  readonly setpoints: readonly ReferenceComparisonSetpoint[];
  /** "adequate" when every setpoint passes with this reference and it has no problems. */
  readonly verdict: "adequate" | "inadequate";
  /** One sentence answering "is this reference good enough for the margins?". */
  readonly verdictText: string;
}

/** Result of `compareReferences`. */
export interface ReferenceComparison {
  readonly acceptanceMethod: "worst-case" | "rss" | "monte-carlo";
  /** Options in input order. */
  readonly options: readonly ReferenceComparisonEntry[];
  /** Name of the cheapest adequate option (by cost; ties and missing costs by input order), or null. */
  readonly recommended: string | null;
  /** One sentence summarizing the comparison. */
  readonly summary: string;
}
