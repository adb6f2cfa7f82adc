/**
 * Plain, JSON-serializable descriptions of the elements of a measurement chain, of a chain, and of the
 * results the chain functions return. Every number carries its unit in its key name: °C (`C`), V
 * (`Volts`), mV, µV (`Microvolts`), Ω (`Ohms`), mA (`Milliamps`), nA (`Nanoamps`), relative values as
 * `Fraction` (0.01 = 1 %) or `Ppm` (parts per million), ADC quantities in LSB.
 *
 * Sign conventions: every tolerance is a ± limit (a half-width, not negative); its sign in a given unit is
 * unknown, so it becomes a zero-mean input of the propagation models. Ranges of operating conditions
 * (ambient, supply, load) are given as min/max pairs.
 *
 * These names are a contract shared with the trip, design, faults and firmware areas: add, don't rename.
 * @module
 */
import type { WireDescription, WireSourceElement } from "./wireTypes.js";
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import type { Distribution, DistributionKind, Model, PropagationMethod } from "../uncertainty/types.js";

// ---------------------------------------------------------------------------------------------------
// Thermocouple
// ---------------------------------------------------------------------------------------------------

/** IEC 60584-1:2013 tolerance class (Table of tolerance classes; class 3 applies below 0 °C). */
export interface IecToleranceClass {
  readonly standard: "IEC 60584-1";
  /** Tolerance class 1, 2 or 3. */
  readonly class: 1 | 2 | 3;
}

/** ASTM E230 initial tolerance (Table 1). */
export interface AstmToleranceGrade {
  readonly standard: "ASTM E230";
  /** `"standard"` or `"special"` limits of error. */
  readonly grade: "standard" | "special";
}

/**
 * A tolerance of one's own (e.g. from a calibration or a supplier's statement): the larger of a fixed
 * value and a fraction of |t|, valid over the thermocouple type's whole range unless limited.
 */
export interface CustomTolerance {
  readonly standard: "custom";
  /** Fixed part, ± °C, ≥ 0. */
  readonly toleranceC: number;
  /** Part proportional to |t| (t in °C), ± fraction, ≥ 0 (0.0075 = 0.75 %). Default 0. */
  readonly fractionOfReading?: number;
  /** Lowest temperature where the statement holds, °C. Default: the type's lowest temperature. */
  readonly minC?: number;
  /** Highest temperature where the statement holds, °C. Default: the type's highest temperature. */
  readonly maxC?: number;
}

/** How the tolerance of a thermocouple is stated. */
export type ThermocoupleTolerance = IecToleranceClass | AstmToleranceGrade | CustomTolerance;

/** The thermocouple (sensor and its wires up to the cold junction). */
export interface ThermocoupleElement {
  readonly kind: "thermocouple";
  /** Letter type: `"B"`, `"E"`, `"J"`, `"K"`, `"N"`, `"R"`, `"S"` or `"T"`. */
  readonly type: ThermocoupleType;
  /** Its tolerance statement; the standards' temperature ranges are enforced. */
  readonly tolerance: ThermocoupleTolerance;
  /** Optional label for reports. */
  readonly label?: string;
}

// ---------------------------------------------------------------------------------------------------
// Cold junction
// ---------------------------------------------------------------------------------------------------

/**
 * Software compensation: a temperature sensor near the terminals is read and E(t_sensor) is added to the
 * measured EMF in firmware (after the detector).
 */
export interface SoftwareColdJunction {
  readonly kind: "coldJunction";
  readonly method: "software";
  /** Accuracy of the cold-junction sensor, ± °C (≥ 0), over the ambient range. */
  readonly sensorAccuracyC: number;
  /**
   * Largest temperature difference between the sensor and the thermocouple terminals (isothermal block
   * quality), ± °C (≥ 0). Default 0.
   */
  readonly isothermalGradientC?: number;
  /** Optional label for reports. */
  readonly label?: string;
}

/**
 * Hardware compensation: a circuit adds a voltage that rises linearly with the cold-junction temperature,
 * E(t₀) + α·(t − t₀) (a linear stand-in for E(t)), to the EMF before the amplifier. Its residual against
 * the real E(t) over the ambient range is a computed error term.
 */
export interface HardwareColdJunction {
  readonly kind: "coldJunction";
  readonly method: "hardware";
  /** Slope α of the compensation voltage, µV/°C (> 0). */
  readonly compensationMicrovoltsPerC: number;
  /** Temperature t₀ where the compensation equals E(t₀) exactly, °C. Default 25. */
  readonly matchedAtC?: number;
  /** Accuracy of the compensator's temperature sensor, ± °C (≥ 0); enters as α·δ. Default 0. */
  readonly sensorAccuracyC?: number;
  /** Accuracy of the compensation voltage itself (circuit), ± µV (≥ 0). Default 0. */
  readonly compensationAccuracyMicrovolts?: number;
  /** Largest temperature difference between the compensating sensor and the terminals, ± °C. Default 0. */
  readonly isothermalGradientC?: number;
  /** Optional label for reports. */
  readonly label?: string;
}

/** Cold-junction compensation (not needed with a fixed-scale amplifier, which compensates internally). */
export type ColdJunctionElement = SoftwareColdJunction | HardwareColdJunction;

// ---------------------------------------------------------------------------------------------------
// Amplifier
// ---------------------------------------------------------------------------------------------------

/** Gain of a non-inverting stage set by two resistors: G = 1 + R_feedback/R_ground. */
export interface ResistorGain {
  readonly setBy: "resistors";
  /** Feedback resistor, Ω (> 0). */
  readonly feedbackOhms: number;
  /** Resistor from the inverting input to ground, Ω (> 0). */
  readonly groundOhms: number;
  /** Tolerance of each resistor, ± fraction (0.01 = 1 %). */
  readonly toleranceFraction: number;
  /** Temperature coefficient of each resistor, ± ppm/°C, from 25 °C. Default 0. */
  readonly tempcoPpmPerC?: number;
}

/** A gain fixed inside the part (instrumentation amplifier, programmable gain) with its gain error. */
export interface FixedGain {
  readonly setBy: "fixed";
  /** Nominal gain, V/V (> 0). */
  readonly gain: number;
  /** Gain error, ± fraction. Default 0. */
  readonly gainErrorFraction?: number;
  /** Gain drift, ± ppm/°C from 25 °C. Default 0. */
  readonly gainDriftPpmPerC?: number;
}

/** A voltage amplifier between the (compensated) thermocouple EMF and the detector. */
export interface AmplifierElement {
  readonly kind: "amplifier";
  readonly gain: ResistorGain | FixedGain;
  /** Input offset voltage at 25 °C, ± µV. Default 0. */
  readonly offsetMicrovolts?: number;
  /** Input offset drift, ± µV/°C from 25 °C over the ambient range. Default 0. */
  readonly offsetDriftMicrovoltsPerC?: number;
  /** Input bias current, ± nA. Default 0. */
  readonly biasCurrentNanoamps?: number;
  /** Resistance the bias current flows through (thermocouple loop, filter resistors), Ω. Default 0. */
  readonly sourceResistanceOhms?: number;
  /** Optional label for reports. */
  readonly label?: string;
}

/**
 * A fixed-scale thermocouple amplifier with internal, linear cold-junction compensation: its output is
 * `millivoltsPerC`·[(E(t_h) − E(t_c))/α + t_c], read as t = V_out / `millivoltsPerC`. Its nonlinearity
 * against ITS-90 is a computed error term.
 */
export interface FixedScaleAmplifierElement {
  readonly kind: "fixedScaleAmplifier";
  /** Thermocouple type the part is made for (must equal the chain's thermocouple type). */
  readonly type: ThermocoupleType;
  /** Output scale, mV/°C (> 0), e.g. 5 or 10. */
  readonly millivoltsPerC: number;
  /**
   * Seebeck coefficient α the part is trimmed to (its linear stand-in for E(t)), µV/°C (> 0). Default: the
   * secant slope of E from 0 to 25 °C, E(25 °C)/25.
   */
  readonly trimmedMicrovoltsPerC?: number;
  /** Stated accuracy of the part (gain, offset, internal compensation), ± °C. Default 0. */
  readonly accuracyC?: number;
  /** Largest temperature difference between the part's die and the thermocouple terminals, ± °C. Default 0. */
  readonly isothermalGradientC?: number;
  /** Optional label for reports. */
  readonly label?: string;
}

// ---------------------------------------------------------------------------------------------------
// Voltage reference
// ---------------------------------------------------------------------------------------------------

/**
 * How a tempco in ppm/°C turns into a ± bound over the ambient range: `"box"` (box method, the output may
 * move by TC·(maxC − minC) either side of its 25 °C value), `"from-25C"` (TC·largest |t − 25 °C|).
 */
export type TempcoMethod = "box" | "from-25C";

/** How long-term drift scales with service time: `"linear"` (t/1000 h) or `"sqrt"` (√(t/1000 h)). */
export type DriftScaling = "linear" | "sqrt";

/** Fields shared by every reference kind. */
export interface ReferenceCommon {
  readonly kind: "reference";
  /** Nominal output, V (> 0). */
  readonly nominalVolts: number;
  /** Lowest supply (input) voltage, V. */
  readonly supplyMinVolts?: number;
  /** Highest supply (input) voltage, V. */
  readonly supplyMaxVolts?: number;
  /** Optional label for reports. */
  readonly label?: string;
}

/** A series (three-terminal) voltage reference. */
export interface SeriesReference extends ReferenceCommon {
  readonly variant: "series";
  /** Initial accuracy at 25 °C, ± fraction. */
  readonly initialAccuracyFraction: number;
  /** Temperature coefficient, ppm/°C (box method by default). Default 0. */
  readonly tempcoPpmPerC?: number;
  /** Default `"box"`. */
  readonly tempcoMethod?: TempcoMethod;
  /** Line regulation, ± ppm/V. Needs supplyMinVolts and supplyMaxVolts. Default 0. */
  readonly lineRegulationPpmPerVolt?: number;
  /** Supply voltage at which the initial accuracy holds, V. Default: none (the supply span is used). */
  readonly ratedSupplyVolts?: number;
  /** Load regulation, ± ppm/mA. Needs loadMinMilliamps and loadMaxMilliamps. Default 0. */
  readonly loadRegulationPpmPerMilliamp?: number;
  /** Lowest load current, mA (≥ 0). */
  readonly loadMinMilliamps?: number;
  /** Highest load current, mA. */
  readonly loadMaxMilliamps?: number;
  /** Load current at which the initial accuracy holds, mA. Default: none (the load span is used). */
  readonly ratedLoadMilliamps?: number;
  /** Long-term drift, ± ppm per 1000 h. Default 0. */
  readonly longTermDriftPpmPer1000h?: number;
  /** Service time the drift accumulates over, h. Default 1000. */
  readonly serviceHours?: number;
  /** Default `"sqrt"`. */
  readonly driftScaling?: DriftScaling;
  /** Thermal hysteresis, ± ppm. Default 0. */
  readonly thermalHysteresisPpm?: number;
  /** Absolute maximum input voltage, V (for the headroom check). */
  readonly maxInputVolts?: number;
  /** Dropout voltage (least input − output), V (for the headroom check). */
  readonly dropoutVolts?: number;
}

/** A shunt (two-terminal) voltage reference fed through a series resistor. */
export interface ShuntReference extends ReferenceCommon {
  readonly variant: "shunt";
  /** Initial accuracy at 25 °C, ± fraction. */
  readonly initialAccuracyFraction: number;
  /** Temperature coefficient, ppm/°C. Default 0. */
  readonly tempcoPpmPerC?: number;
  /** Default `"box"`. */
  readonly tempcoMethod?: TempcoMethod;
  /** Dynamic impedance, Ω (≥ 0). Default 0. */
  readonly dynamicImpedanceOhms?: number;
  /** Series resistor from the supply, Ω (> 0). Needs supplyMinVolts/supplyMaxVolts. */
  readonly seriesOhms: number;
  /** Lowest load current drawn from the reference node, mA (≥ 0). Default 0. */
  readonly loadMinMilliamps?: number;
  /** Highest load current, mA. Default loadMinMilliamps. */
  readonly loadMaxMilliamps?: number;
  /** Least cathode current for regulation, mA. */
  readonly shuntMinMilliamps?: number;
  /** Greatest allowed cathode current, mA. */
  readonly shuntMaxMilliamps?: number;
  /** Cathode current at which the initial accuracy holds, mA. Default: none (the current span is used). */
  readonly ratedCurrentMilliamps?: number;
  /** Long-term drift, ± ppm per 1000 h. Default 0. */
  readonly longTermDriftPpmPer1000h?: number;
  /** Service time, h. Default 1000. */
  readonly serviceHours?: number;
  /** Default `"sqrt"`. */
  readonly driftScaling?: DriftScaling;
}

/** A linear regulator's output used as the reference (e.g. a 5 V rail). */
export interface RegulatorReference extends ReferenceCommon {
  readonly variant: "regulator";
  /**
   * Total tolerance over line, load and temperature, ± fraction (e.g. 0.04). Give this, or any of the parts
   * below (which then add).
   */
  readonly totalToleranceFraction?: number;
  /** Initial accuracy at 25 °C, ± fraction (the same key as the series and shunt references). */
  readonly initialAccuracyFraction?: number;
  /**
   * Initial accuracy at 25 °C, ± fraction.
   * @deprecated use `initialAccuracyFraction` (the same key as the series and shunt references); kept for one
   *   minor version. Giving both is an error.
   */
  readonly initialToleranceFraction?: number;
  /** Line regulation over the supply range, ± fraction. */
  readonly lineRegulationFraction?: number;
  /** Load regulation over the load range, ± fraction. */
  readonly loadRegulationFraction?: number;
  /** Drift over the temperature range, ± fraction. */
  readonly temperatureDriftFraction?: number;
  /** Absolute maximum input voltage, V (for the headroom check). */
  readonly maxInputVolts?: number;
  /** Dropout voltage, V (for the headroom check). */
  readonly dropoutVolts?: number;
}

/** A voltage reference of one of the three kinds. */
export type ReferenceElement = SeriesReference | ShuntReference | RegulatorReference;

// ---------------------------------------------------------------------------------------------------
// Divider
// ---------------------------------------------------------------------------------------------------

/** A matched resistor network: ratio tolerance and tracking tempco replace the absolute ones for the ratio. */
export interface MatchedNetwork {
  /** Ratio tolerance between any two resistors of the network, ± fraction. */
  readonly ratioToleranceFraction: number;
  /** Tracking tempco between any two resistors, ± ppm/°C. Default 0. */
  readonly trackingPpmPerC?: number;
}

/**
 * A resistor string from the reference (top) to ground (bottom). Tap i (0-based) is the node below
 * resistor i: its ratio is (R_{i+1} + … + R_{n−1}) / (R_0 + … + R_{n−1}). n resistors give n − 1 taps.
 */
export interface DividerElement {
  readonly kind: "divider";
  /** Resistances from top to bottom, Ω (each > 0), at least two. */
  readonly resistorsOhms: readonly number[];
  /** Tolerance of each resistor, ± fraction. */
  readonly toleranceFraction: number;
  /** Temperature coefficient of each resistor, ± ppm/°C from 25 °C. Default 0. */
  readonly tempcoPpmPerC?: number;
  /** When present, the resistors are one matched network. */
  readonly matched?: MatchedNetwork;
  /** Optional label for reports. */
  readonly label?: string;
}

// ---------------------------------------------------------------------------------------------------
// Detector
// ---------------------------------------------------------------------------------------------------

/** Where the hysteresis band sits about the threshold. */
export type HysteresisPlacement = "centered" | "above" | "below";

/** A comparator: trips when the signal rises through threshold + offset (+ hysteresis part). */
export interface ComparatorElement {
  readonly kind: "comparator";
  /** Input offset voltage, ± mV. Default 0. */
  readonly offsetMillivolts?: number;
  /** Hysteresis, full width between trip and release, mV (≥ 0). Default 0. */
  readonly hysteresisMillivolts?: number;
  /**
   * `"centered"` (default): trip at threshold + h/2, release at threshold − h/2; `"below"`: trip at the
   * threshold, release at threshold − h; `"above"`: trip at threshold + h, release at the threshold.
   */
  readonly hysteresisPlacement?: HysteresisPlacement;
  /** Optional label for reports. */
  readonly label?: string;
}

/** An analog-to-digital converter (end-point offset/gain/INL definitions). */
export interface AdcElement {
  readonly kind: "adc";
  /** Resolution, bits (integer 1…32). */
  readonly bits: number;
  /**
   * Full-scale voltage, V. Default: the chain's reference output (the reference is then required). When
   * given and the chain has a reference too, this value wins and the reference is not the ADC's.
   */
  readonly fullScaleVolts?: number;
  /** Offset error, ± LSB. Default 0. */
  readonly offsetLsb?: number;
  /** Gain error, ± fraction of reading. Default 0. */
  readonly gainErrorFraction?: number;
  /** Integral nonlinearity, ± LSB. Default 0. */
  readonly inlLsb?: number;
  /**
   * Whether the signal scales with the ADC's reference (bridges, excitation). A thermocouple channel is
   * not ratiometric: the reference's error enters the reading 1:1. Default false.
   */
  readonly ratiometric?: boolean;
  /** Optional label for reports. */
  readonly label?: string;
}

/** The detector at the end of the chain. */
export type DetectorElement = ComparatorElement | AdcElement;

// ---------------------------------------------------------------------------------------------------
// Chain
// ---------------------------------------------------------------------------------------------------

/**
 * Ambient range of the electronics and of the cold junction, °C. Drifts are taken from 25 °C (the
 * data-sheet convention) or over the span (box method); the cold junction sits anywhere in the range.
 */
export interface AmbientRange {
  /** Lowest ambient, °C. */
  readonly minC: number;
  /** Highest ambient, °C (≥ minC). */
  readonly maxC: number;
}

/** Any element. */
export type ChainElement =
  | ThermocoupleElement
  | ColdJunctionElement
  | AmplifierElement
  | FixedScaleAmplifierElement
  | ReferenceElement
  | DividerElement
  | ComparatorElement
  | AdcElement;

/** The `kind` discriminator of the elements. */
export type ChainElementKind = ChainElement["kind"];

/**
 * Roles under which an error source is listed (the element kind, `"ambient"`, or a role of the wire:
 * `"cable"`, `"connector"`, `"loop"`, `"probe"`).
 */
export type ChainSourceElement = ChainElementKind | "ambient" | WireSourceElement;

/**
 * Overrides the distribution of one named error source. The stated ± limit L stays; `"rectangular"`,
 * `"triangular"` and `"arcsine"` use it as half-width; `"normal"` reads it as an expanded value k·σ
 * (σ = L/k, k = `coverageFactor`, default 2); `"trapezoidal"` uses `beta` (default 0.5).
 */
export interface SourceDistributionOverride {
  readonly distribution: DistributionKind;
  /** Normal only: coverage factor k of the stated limit (> 0). Default 2. */
  readonly coverageFactor?: number;
  /** Trapezoidal only: top-to-base ratio β in [0, 1]. Default 0.5. */
  readonly beta?: number;
}

/**
 * A measurement chain, plain data. The signal runs thermocouple → cold-junction compensation → amplifier
 * (or fixed-scale amplifier) → detector (comparator against reference × divider tap, or ADC).
 */
export interface MeasurementChain {
  readonly thermocouple: ThermocoupleElement;
  /** Required unless the amplifier is a fixed-scale amplifier (which compensates internally). */
  readonly coldJunction?: ColdJunctionElement;
  /** Default: none (unity gain, no error). */
  readonly amplifier?: AmplifierElement | FixedScaleAmplifierElement;
  /** The comparator's threshold source, or the ADC's full scale. */
  readonly reference?: ReferenceElement;
  /** Threshold divider fed by the reference (comparator chains). Default: the reference directly. */
  readonly divider?: DividerElement;
  readonly detector: DetectorElement;
  readonly ambient: AmbientRange;
  /**
   * The wire between the probe and the amplifier input: extension or compensating cable, connectors and
   * terminal blocks, loop resistance with bias and open-circuit detection currents, insulation leakage and
   * ageing of the probe. Default: none (the thermocouple lands on the instrument's terminals).
   */
  readonly wire?: WireDescription;
  /** Per-source distribution overrides, keyed by source name (see {@link ChainErrorSource.name}). */
  readonly sourceDistributions?: Readonly<Record<string, SourceDistributionOverride>>;
  /** Optional label for reports. */
  readonly label?: string;
}

// ---------------------------------------------------------------------------------------------------
// Results
// ---------------------------------------------------------------------------------------------------

/** Units in which error sources are stated. */
export type ErrorSourceUnit = "°C" | "µV" | "mV" | "fraction" | "LSB";

/**
 * One named error source: an input of the chain models, a deviation from nominal (mean 0 unless stated)
 * in its own unit. Names are stable, dotted: `"<element>.<quantity>"`, e.g. `"thermocouple.tolerance"`,
 * `"reference.tempco"`, `"divider.resistor2.tolerance"`, `"ambient.coldJunctionC"`.
 */
export interface ChainErrorSource {
  readonly name: string;
  /** The element it belongs to. */
  readonly element: ChainSourceElement;
  /** What it is, in words. */
  readonly description: string;
  /** Unit of the input values. */
  readonly unit: ErrorSourceUnit;
  /** Stated ± limit (half-width), in `unit` (for the ambient: half the range). */
  readonly limit: number;
  /** Its distribution (mean, standard uncertainty, support), in `unit`. */
  readonly distribution: Distribution;
}

/** A model of the error sources, ready for `propagate(model, inputs, options)`. */
export interface ChainModel {
  /** Maps source values (by name) to the output in °C. Allocation-free. */
  readonly model: Model;
  /** Distribution of each input, by source name. */
  readonly inputs: Readonly<Record<string, Distribution>>;
  /** The sources in listing order. */
  readonly sources: readonly ChainErrorSource[];
  /** The model's output with every input at its mean, °C. */
  readonly nominalC: number;
  /**
   * Comparator trip models and reading models (with or without a wire): an interval enclosure of the model over a
   * box of its inputs ([low, high] by source name → [low, high] °C), for worst case's `modelEnclosure`.
   */
  readonly enclosure?: (box: Readonly<Record<string, readonly [number, number]>>) => readonly [number, number];
}

/** The raw reading of a chain at its detector. */
export interface ChainReading {
  /** Voltage at the detector input, V. */
  readonly volts: number;
  /** ADC chains: output code, unrounded (LSB); absent for comparator chains. */
  readonly code?: number;
}

/** Bounds by one method, °C. */
export interface ChainBound {
  readonly method: PropagationMethod;
  /** Estimate of the output, °C (Monte Carlo: mean of the trials). */
  readonly estimateC: number;
  /** Interval of the output, °C (worst case: the extremes). */
  readonly lowC: number;
  readonly highC: number;
  /** Interval minus the true (or nominal) value, °C. */
  readonly errorLowC: number;
  readonly errorHighC: number;
  /** Standard uncertainty of the output, °C. */
  readonly standardUncertaintyC: number;
  /** Coverage probability (1 for worst case). */
  readonly coverage: number;
  /** How the result was found. */
  readonly note: string;
  /**
   * Worst case of a model with an interval enclosure (reading models, with or without a wire), the bracket:
   * `lowC`/`highC` are the attained extremes (the model reaches them at points of the source box),
   * `enclosureLowC`/`enclosureHighC` a proven enclosure of the model over the whole box (outward-rounded interval
   * arithmetic, a monotonicity proof per source and subdivision of the cold-junction temperature), °C, and the gaps
   * between them (≥ 0), °C.
   */
  readonly enclosureLowC?: number;
  readonly enclosureHighC?: number;
  readonly enclosureGapLowC?: number;
  readonly enclosureGapHighC?: number;
}

/** One row of the per-source contribution table, °C. */
export interface ChainContribution {
  readonly source: string;
  readonly element: ChainSourceElement;
  readonly description: string;
  readonly unit: ErrorSourceUnit;
  /** Stated ± limit, in `unit`. */
  readonly limit: number;
  /** Sensitivity ∂t/∂x, °C per `unit`. */
  readonly sensitivityCPerUnit: number;
  /** Output swing this source alone causes over its bounds (normal: ±k·σ per `normalBoundCoverage`), °C. */
  readonly worstCaseSwingC: number;
  /** |c|·u(x), °C. */
  readonly standardUncertaintyC: number;
  /** Share of the RSS variance (sums to 1). */
  readonly varianceShare: number;
}

/** Result of {@link evaluateChain} at one hot-junction temperature. */
export interface ChainEvaluation {
  /** True hot-junction temperature, °C. */
  readonly hotJunctionC: number;
  /** Nominal reading (every source at its mean). */
  readonly reading: ChainReading;
  /** Temperature the chain indicates for that reading, °C (nominal conversion). */
  readonly indicatedC: number;
  /** One bound per requested method, in the order requested. */
  readonly bounds: readonly ChainBound[];
  /** Per-source table, in source listing order. */
  readonly contributions: readonly ChainContribution[];
}

/** Result of {@link temperatureFromChainReading}. */
export interface ChainTemperatureResult {
  /** Temperature by the nominal conversion, °C. */
  readonly temperatureC: number;
  /** Bounds of the true hot-junction temperature consistent with the reading, per method. */
  readonly bounds: readonly ChainBound[];
  readonly contributions: readonly ChainContribution[];
}

/** Which edge of a comparator with hysteresis. */
export type ComparatorEdge = "trip" | "release";

/** Nominal trip and release of one comparator threshold. */
export interface NominalTrip {
  /** Threshold voltage (reference × tap ratio), V. */
  readonly thresholdVolts: number;
  /** Divider tap ratio (1 without a divider). */
  readonly tapRatio: number;
  /** Hot-junction temperature at which the output trips (signal rising), °C. */
  readonly tripC: number;
  /** Hot-junction temperature at which it releases (signal falling), °C. */
  readonly releaseC: number;
}

/** An error source of the wire: a {@link ChainErrorSource} listed under a wire role. */
export type WireErrorSource = Omit<ChainErrorSource, "element"> & { readonly element: WireSourceElement };
