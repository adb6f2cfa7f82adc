/**
 * Types of the single-fault review of a trip chain: faults as data (effects on named signal nodes or on
 * element descriptions), the design facts the chain description does not carry (open-circuit bias, amplifier
 * rails, output-stage polarity, detection methods), and the review results.
 *
 * Signal nodes, in the order the review evaluates them (unit in brackets):
 * - `thermocoupleEmf` [mV]: EMF at the thermocouple terminals, E(t_hot) − E(t_cold).
 * - `compensation` [mV]: hardware cold-junction compensation voltage added to the EMF (0 without one).
 * - `amplifierInput` [mV]: the amplifier's differential input (EMF plus hardware cold-junction compensation;
 *   with a fixed-scale amplifier, the thermocouple EMF it sees).
 * - `amplifierOutput` [V]: the detector's input signal (the compensated EMF itself when there is no amplifier).
 * - `reference` [V]: the reference output (comparator threshold source, or the ADC full scale).
 * - `threshold` [V]: comparator chains: reference × divider tap ratio.
 * - `adcCode` [LSB]: ADC chains: output code (0 … 2ⁿ − 1).
 * - `detectorOutput` [boolean]: comparator output, or the firmware's trip decision, as "trip asserted".
 *
 * Classification vocabulary follows the functional-safety standards (IEC 61508-4: safe / dangerous / no-effect
 * failure, detected / undetected); the review claims no certification.
 * @module
 */
import type { MeasurementChain } from "../chain/types.js";

// ---------------------------------------------------------------------------------------------------------
// Faults as data
// ---------------------------------------------------------------------------------------------------------

/** A named point of the signal path (see the module comment for units). */
export type FaultNodeName =
  | "thermocoupleEmf"
  | "compensation"
  | "amplifierInput"
  | "amplifierOutput"
  | "reference"
  | "threshold"
  | "adcCode"
  | "detectorOutput";

/**
 * Replaces a node's value. Give exactly one value key, in the node's unit: `millivolts` (thermocoupleEmf,
 * compensation, amplifierInput), `volts` (amplifierOutput, reference, threshold), `rail` (amplifierOutput: the amplifier's
 * low or high output rail), `code` (adcCode), `tripped` (detectorOutput).
 */
export interface OverrideNodeEffect {
  readonly kind: "override-node";
  readonly node: FaultNodeName;
  readonly millivolts?: number;
  readonly volts?: number;
  readonly rail?: "low" | "high";
  readonly code?: number;
  readonly tripped?: boolean;
}

/** Adds to a numeric node, in its unit (`millivolts`, `volts` or `code`; exactly one). */
export interface OffsetNodeEffect {
  readonly kind: "offset-node";
  readonly node: Exclude<FaultNodeName, "detectorOutput">;
  readonly millivolts?: number;
  readonly volts?: number;
  readonly code?: number;
}

/** Multiplies a numeric node by a factor (e.g. −1 on thermocoupleEmf for reversed polarity). */
export interface ScaleNodeEffect {
  readonly kind: "scale-node";
  readonly node: Exclude<FaultNodeName, "detectorOutput">;
  /** Finite factor. */
  readonly factor: number;
}

/**
 * The two thermocouple wires touch: the measuring junction moves to the short, so the EMF is
 * E(atC) − E(t_cold). Without `atC` the short is at the terminals (the chain reads the cold junction).
 */
export interface ThermocoupleShortEffect {
  readonly kind: "thermocouple-short";
  /** Temperature of the wire at the short, °C (inside the type's range). Default: see `alongWire`. */
  readonly atC?: number;
  /**
   * Without `atC`: `true` puts the short along the wire at the review's `wireShortC`; `false` (default) puts it
   * at the terminals (the cold junction).
   */
  readonly alongWire?: boolean;
}

/**
 * The thermocouple loop is open. Where the input goes is decided by the design's open-circuit bias
 * ({@link FaultContext.openCircuitBias}); an open-thermocouple detector flags it.
 */
export interface OpenThermocoupleEffect {
  readonly kind: "open-thermocouple";
}

/** One divider resistor open or shorted (index from the top, as in `DividerElement.resistorsOhms`). */
export interface DividerResistorFaultEffect {
  readonly kind: "resistor-fault";
  readonly element: "divider";
  /** Resistor index, 0 = top (reference end). */
  readonly index: number;
  readonly state: "open" | "short";
}

/**
 * A gain-setting resistor of a resistor-gain amplifier (G = 1 + R_feedback/R_ground) open or shorted:
 * feedback open or ground shorted gives an open loop (output to the rail of the input's sign); feedback shorted
 * or ground open gives unity gain.
 */
export interface AmplifierResistorFaultEffect {
  readonly kind: "resistor-fault";
  readonly element: "amplifier";
  readonly resistor: "feedback" | "ground";
  readonly state: "open" | "short";
}

/**
 * The reference output is open: a shunt reference's node rises toward its supply through the series resistor
 * (loaded by the divider); a series reference or regulator output falls to 0 V.
 */
export interface ReferenceOpenEffect {
  readonly kind: "reference-open";
}

/**
 * The board supply is lost: every circuit is unpowered, no detection works, and the output stage does what
 * its polarity gives on power loss ({@link FaultContext.outputStage}).
 */
export interface BoardSupplyLossEffect {
  readonly kind: "board-supply-loss";
}

/**
 * The fault may end in any of several states (e.g. a floating input): each alternative is evaluated and the
 * worst (latest trip) decides the class; it counts as detected only if every alternative is detected.
 */
export interface AnyOfEffect {
  readonly kind: "any-of";
  readonly alternatives: readonly { readonly label: string; readonly effects: readonly FaultEffect[] }[];
}

/** Values of every node at one hot-junction temperature (what a custom transform sees). */
export interface FaultSignals {
  readonly hotJunctionC: number;
  readonly coldJunctionC: number;
  readonly thermocoupleEmfMillivolts: number;
  readonly compensationMillivolts: number;
  readonly amplifierInputMillivolts: number;
  readonly amplifierOutputVolts: number;
  readonly referenceVolts: number;
  /** Comparator chains; `null` for ADC chains. */
  readonly thresholdVolts: number | null;
  /** ADC chains; `null` for comparator chains. */
  readonly adcCode: number | null;
  /** Temperature the chain indicates from its signal (nominal conversion), °C; ±Infinity beyond the type's range. */
  readonly readingC: number;
  readonly detectorTripped: boolean;
  /** The main channel plus a second comparator (when present), through the output stage. */
  readonly outputTripped: boolean;
  readonly boardPowered: boolean;
  readonly openThermocouple: boolean;
}

/**
 * A programmatic effect (not expressible in JSON): `transformNode` replaces the value of `node` when it is
 * computed (numeric nodes: a number in the node's unit; `detectorOutput`: 1 = tripped, 0 = not), and/or
 * `transformChain` changes the chain description before evaluation. Both must be pure.
 */
export interface CustomEffect {
  readonly kind: "custom";
  readonly node?: FaultNodeName;
  /** Replaces the value of `node` when it is computed (pure). */
  readonly transformNode?: (value: number, signals: Partial<FaultSignals>) => number;
  /** Changes the chain description before evaluation (pure). */
  readonly transformChain?: (chain: MeasurementChain) => MeasurementChain;
}

/** One deterministic change of the chain's model. */
export type FaultEffect =
  | OverrideNodeEffect
  | OffsetNodeEffect
  | ScaleNodeEffect
  | ThermocoupleShortEffect
  | OpenThermocoupleEffect
  | DividerResistorFaultEffect
  | AmplifierResistorFaultEffect
  | ReferenceOpenEffect
  | BoardSupplyLossEffect
  | AnyOfEffect
  | CustomEffect;

/**
 * A single fault: an id, the element it belongs to (a chain element kind, `"board"`, or any name of one's own
 * for a custom element), words, and its effects (applied together).
 */
export interface FaultDefinition {
  /** Stable id, e.g. `"thermocouple.open"`, `"divider.resistor1.short"`. */
  readonly id: string;
  readonly element: string;
  readonly description: string;
  readonly effects: readonly FaultEffect[];
  /** Suggested mitigation, in words (optional; the review adds general ones by class). */
  readonly mitigation?: string;
}

// ---------------------------------------------------------------------------------------------------------
// Design facts the chain description lacks
// ---------------------------------------------------------------------------------------------------------

/** Out-of-range window on the amplifier output (V) or on the indicated temperature (°C). */
export type OutOfRangeWindow =
  | { readonly lowVolts: number; readonly highVolts: number }
  | { readonly lowC: number; readonly highC: number };

/**
 * A second comparator on the same amplifier output, tripping at `thresholdC` (nominal), driving the same output
 * stage (a backup channel). It notices a fault when it trips while the main detector has not.
 */
export interface SecondComparator {
  /** Nominal trip temperature of the second comparator, °C. */
  readonly thresholdC: number;
  /** Whether its threshold comes from the same reference (reference faults move it too). Default true. */
  readonly sharesReference?: boolean;
}

/**
 * A supervisory reading: firmware reads the amplifier output (ADC chains: the chain's own reading) and flags
 * an implausible value, a disagreement with the detector's state, or (with an independent sensor) a
 * disagreement with the true temperature.
 */
export interface SupervisoryReading {
  /** Readings below this are flagged, °C. Default: none. */
  readonly plausibleLowC?: number;
  /** Readings above this are flagged, °C. Default: none. */
  readonly plausibleHighC?: number;
  /**
   * Flag when the detector is tripped though the reading is more than `toleranceC` below the healthy trip, or
   * not tripped though the reading is more than `toleranceC` above it. Default true.
   */
  readonly checksDetector?: boolean;
  /** The supervisor has its own sensor and flags readings off the true temperature by more than `toleranceC`. Default false. */
  readonly independentSensor?: boolean;
  /** Disagreement tolerated, °C (> 0). Default 10. */
  readonly toleranceC?: number;
}

/** Detection methods of the design. Default: none. */
export interface FaultDetection {
  readonly outOfRangeWindow?: OutOfRangeWindow;
  /** The design detects an open thermocouple loop (test current, fault pin). Default false. */
  readonly openThermocoupleDetection?: boolean;
  readonly secondComparator?: SecondComparator;
  readonly supervisoryReading?: SupervisoryReading;
}

/**
 * Design facts the review needs beyond the chain description. Defaults are the conservative choices (the ones
 * under which more faults are dangerous), so a review never looks better than the design stated.
 */
export interface FaultContext {
  /**
   * Where an open thermocouple input goes: `"pull-up"` (burnout bias drives the reading up), `"pull-down"`
   * (drives it down), `"none"` (floats: any of up, zero and down; the worst counts). Default `"none"`.
   */
  readonly openCircuitBias?: "pull-up" | "pull-down" | "none";
  /** Magnitude the bias drives the open input to, mV (> 0). Default 1000 (any gain then saturates). */
  readonly openCircuitBiasMillivolts?: number;
  /** Output rails of the amplifier (and the fixed-scale amplifier), V. Default { lowVolts: 0, highVolts: 5 }. */
  readonly amplifierRailsVolts?: { readonly lowVolts: number; readonly highVolts: number };
  /**
   * `"energize-to-trip"`: the output stage needs power to trip (power loss = no trip); `"de-energize-to-trip"`:
   * power keeps it untripped (power loss = trip). Default `"energize-to-trip"`.
   */
  readonly outputStage?: "energize-to-trip" | "de-energize-to-trip";
  /** Comparator output level that means "trip": `"high"` (default) or `"low"`. */
  readonly comparatorTripLevel?: "high" | "low";
  /** Detection methods. Default none. */
  readonly detection?: FaultDetection;
  /** Temperature at a short along the wire, °C. Default: halfway between the cold junction and the healthy trip. */
  readonly wireShortC?: number;
  /** Size of a common-mode / ground offset fault seen as differential input, mV (> 0). Default 1. */
  readonly groundOffsetMillivolts?: number;
  /** Stated drift of the reference for the drifted-low/high faults, fraction (0 … 1). Default 0.05. */
  readonly referenceDriftFraction?: number;
  /** Supply of a shunt reference's series resistor, V. Default the mean of its supplyMin/MaxVolts, else the high rail. */
  readonly shuntSupplyVolts?: number;
}

/** One trip of a chain to review (one setpoint). */
export interface FaultReviewTrip {
  /** Label (setpoint name). */
  readonly name: string;
  /** Comparator chains: divider tap of this setpoint (0-based). Default 0. */
  readonly tap?: number;
  /** ADC chains: the firmware's trip setpoint, °C (required). Comparator chains: the intended trip (reported only). */
  readonly tripTemperatureC?: number;
  /** Highest temperature of normal operation, °C: a trip at or below it is a nuisance (safe) trip. */
  readonly maxNormalOperatingC: number;
  /** Hazard limit, °C: no trip below it is a dangerous failure. */
  readonly hazardLimitC: number;
  /**
   * Healthy worst-case trip band of this trip, °C (e.g. a `designTrip` setpoint's `worstCase` band). Each fault
   * moves it by the fault's shift of the nominal trip; the moved band is judged against the limits. Default: the
   * nominal healthy trip alone (a zero-width band).
   */
  readonly healthyBandC?: { readonly lowC: number; readonly highC: number };
}

/** Options of {@link reviewFaults}: the design facts plus the fault list and sweep. */
export interface ReviewFaultsOptions extends FaultContext {
  /** Faults to review instead of the built-in catalogue. */
  readonly faults?: readonly Fault[];
  /** Faults added to the catalogue (or to `faults`). */
  readonly extraFaults?: readonly Fault[];
  /** Cold-junction (ambient) temperature of the review, °C; the sweep starts here. Default the middle of the ambient range. */
  readonly coldJunctionC?: number;
  /** Sweep step, °C, in [0.05, 50]. Default 1 (each trip is then refined by bisection to 0.001 °C). */
  readonly sweepStepC?: number;
  /** How far past the hazard limit the sweep runs, °C, in [0, 500]. Default 50 (capped at the type's range). */
  readonly sweepMarginC?: number;
  /** A trip moving less than this is "no change", °C, ≥ 0. Default 0.5. */
  readonly noChangeToleranceC?: number;
  /**
   * A fault moving the trip by at most this much, with its moved band inside the limits, is "no effect"; beyond it
   * "degraded", °C, in [0, 100]. Default {@link defaultNoEffectThresholdC} (3 °C).
   */
  readonly noEffectThresholdC?: number;
}

// ---------------------------------------------------------------------------------------------------------
// Results
// ---------------------------------------------------------------------------------------------------------

/** What a fault does to the trip. */
export type FaultTripEffect = "trips-immediately" | "trips-early" | "trips-late" | "never-trips" | "no-change";

/**
 * Effect on the safety function, judged with the healthy worst-case band (see {@link classifyFaultShift}):
 * `"safe"` and `"dangerous"` (IEC 61508-4 vocabulary), `"degraded"` (the trip moves by more than the no-effect
 * threshold yet the shifted band stays inside the limits; the margin left is in the row) and `"no-effect"`.
 */
export type FaultSafety = "safe" | "dangerous" | "degraded" | "no-effect";

/** Safety class with detection (degraded and no-effect faults are not split by detection; the row keeps `detected`). */
export type FaultCategory = "safe-detected" | "safe-undetected" | "dangerous-detected" | "dangerous-undetected" | "degraded" | "no-effect";

/** A detection method that noticed a fault. */
export type FaultDetectionMethod = "out-of-range-window" | "open-thermocouple-detection" | "second-comparator" | "supervisory-reading";

/** One row of the fault table. */
export interface FaultReviewRow {
  readonly faultId: string;
  readonly element: string;
  readonly description: string;
  readonly effect: FaultTripEffect;
  /** Temperature at which the output trips under the fault, °C (null: never within the sweep). */
  readonly tripC: number | null;
  /** tripC − healthy trip, °C (null when it never trips). */
  readonly shiftC: number | null;
  /** The effect in words. */
  readonly effectText: string;
  readonly safety: FaultSafety;
  /**
   * Margin the worst unit keeps under the fault: hazard limit − top of the moved band, or bottom of the moved
   * band − highest normal temperature, whichever is smaller, °C (negative when crossed; null when it never trips).
   */
  readonly marginC: number | null;
  readonly detected: boolean;
  readonly detectedBy: readonly FaultDetectionMethod[];
  /** How it is detected, in words ("not detected" when not). */
  readonly detectionText: string;
  readonly category: FaultCategory;
  /** Alternatives of an any-of fault: the label of the one that decided the class. */
  readonly decidingAlternative?: string;
  readonly mitigations: readonly string[];
}

/** Count of faults per category. */
export interface FaultCategoryCounts {
  readonly safeDetected: number;
  readonly safeUndetected: number;
  readonly dangerousDetected: number;
  readonly dangerousUndetected: number;
  readonly degraded: number;
  readonly noEffect: number;
  readonly total: number;
}

/** Result of {@link reviewFaults}: one trip of one chain. */
export interface FaultReview {
  readonly name: string;
  /** Healthy trip of the modelled chain (nominal parts), °C. */
  readonly healthyTripC: number;
  readonly maxNormalOperatingC: number;
  readonly hazardLimitC: number;
  /** Healthy worst-case band the faults were judged with, °C (the nominal trip when none was given: zero width). */
  readonly healthyBandC: { readonly lowC: number; readonly highC: number };
  /** True when `healthyBandC` came from the caller (a worst-case budget), false when it is the nominal trip alone. */
  readonly healthyBandGiven: boolean;
  /** Shift of the nominal trip below which a fault inside the limits is "no effect", °C. */
  readonly noEffectThresholdC: number;
  readonly coldJunctionC: number;
  readonly sweep: { readonly fromC: number; readonly toC: number; readonly stepC: number };
  /** The design facts used, with defaults filled in. */
  readonly context: Required<Omit<FaultContext, "detection" | "wireShortC" | "shuntSupplyVolts">> & {
    readonly detection: FaultDetection;
    readonly wireShortC: number;
  };
  readonly rows: readonly FaultReviewRow[];
  readonly counts: FaultCategoryCounts;
  /** Assumptions and remarks, in sentences. */
  readonly notes: readonly string[];
}

/**
 * How the text, Markdown and CSV fault reviews show temperatures: `temperatureUnit` `"C"` (default), `"F"` or `"K"`
 * (temperatures with the offset; shifts, margins, thresholds and steps by the scale). The review's data and its
 * JSON stay in °C.
 */
export interface FaultReviewDisplayOptions {
  readonly temperatureUnit?: "C" | "F" | "K";
}

/** Several trips (setpoints) of one design, with the scope statement and the safety caution. */
export interface FaultReviewReport {
  readonly name?: string;
  readonly reviews: readonly FaultReview[];
  /** Sum over the reviews. */
  readonly counts: FaultCategoryCounts;
  /** What the review covers (single faults of the modelled elements only). */
  readonly scope: string;
  readonly caution: string;
}

/** @deprecated use {@link FaultDefinition}; kept for one minor version. */
export type Fault = FaultDefinition;
