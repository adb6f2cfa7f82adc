/**
 * Types of the trip-design engine: the input `TripDesign` (setpoints, chain, reference, resistor series and
 * process limits) and the outputs `TripDesignResult` (per setpoint) and `ReferenceComparison`.
 * Every type is plain JSON-serializable data; every numeric key carries its unit.
 *
 * The trip chain is an over-temperature comparator chain of `chain/` elements: thermocouple -> cold-junction
 * compensation -> amplifier or fixed-scale amplifier -> comparator; the comparator's other input is a
 * threshold made by a resistor divider (two resistors per setpoint, or one multi-tap ladder) from a voltage
 * reference. The comparator trips when the signal rises through the threshold (plus its hysteresis
 * placement) and releases below it.
 * @module
 */
import type { MidRailDivider } from "./midRailDivider.js";
import type { WireDescription } from "../chain/wire/wireStage.js";
import type { PreferredSeriesName } from "../data/preferredSeries.js";
import type {
  AmbientRange,
  AmplifierElement,
  ColdJunctionElement,
  ComparatorElement,
  FixedScaleAmplifierElement,
  MatchedNetwork,
  ReferenceElement,
  RegulatorReference,
  SeriesReference,
  ShuntReference,
  SourceDistributionOverride,
  ThermocoupleElement,
} from "../chain/types.js";
import type { PropagationMethod } from "../uncertainty/types.js";

// ---------------------------------------------------------------------------------------------------------
// Input
// ---------------------------------------------------------------------------------------------------------

/** Fields shared by every reference option. */
export interface ReferenceOptionCommon {
  /** Label of the option in results (e.g. "2.5 V series reference, 0.1 %"). */
  readonly name: string;
  /** User-supplied cost of the option (any currency, per unit), ≥ 0; used only in comparisons. */
  readonly cost?: number;
}

/** An error-free reference of a given voltage (the yardstick of comparisons). */
export interface IdealReferenceOption extends ReferenceOptionCommon {
  readonly kind: "ideal";
  /** Output, V, > 0. */
  readonly nominalVolts: number;
}

/** A reference element of the chain used as given (series reference, regulator rail, or shunt with its resistor). */
export interface ElementReferenceOption extends ReferenceOptionCommon {
  readonly kind: "element";
  readonly element: SeriesReference | RegulatorReference | ShuntReference;
}

/** A shunt reference whose series resistor is still to be chosen (every other field as in the chain). */
export type ShuntReferenceToSize = Omit<ShuntReference, "seriesOhms">;

/**
 * A shunt reference whose series resistor the engine sizes from the supply: the largest standard value R with
 * R·(1 + tolerance) ≤ (V_s,min − V_ref)/(I_load,max + I_shunt,min), where the load includes the threshold
 * divider's current; then checks the cathode current at V_s,max and minimum load against I_shunt,max and
 * reports the resistor's dissipation. Needs supplyMinVolts, supplyMaxVolts, shuntMinMilliamps and
 * shuntMaxMilliamps; `loadMinMilliamps`/`loadMaxMilliamps` are the loads besides the divider.
 */
export interface SizedShuntReferenceOption extends ReferenceOptionCommon {
  readonly kind: "sized-shunt";
  readonly element: ShuntReferenceToSize;
  /** Series of the series resistor. Default the design's resistor series. */
  readonly seriesResistorSeries?: PreferredSeriesName;
  /** Tolerance of the series resistor, ±fraction. Default the design's resistor tolerance. */
  readonly seriesResistorToleranceFraction?: number;
}

/** One way to make the reference voltage the threshold divider starts from. */
export type ReferenceOption = IdealReferenceOption | ElementReferenceOption | SizedShuntReferenceOption;

/** Resistors of the threshold divider and the bounds of their search. */
export interface TripResistors {
  /** Preferred series the values come from. */
  readonly series: PreferredSeriesName;
  /** Tolerance of each resistor, ±fraction, in (0, 0.5] (e.g. 0.01). */
  readonly toleranceFraction: number;
  /** Temperature coefficient of each resistor, ±ppm/°C from 25 °C. Default 0. */
  readonly tempcoPpmPerC?: number;
  /** When present, the divider is one matched network (ratio tolerance and tracking replace the absolute ones). */
  readonly matched?: MatchedNetwork;
  /** Bounds on the total divider resistance, Ω. Defaults 1000 and 1e6. */
  readonly minTotalOhms?: number;
  readonly maxTotalOhms?: number;
  /** Bounds on the divider current at nominal reference voltage, mA; they tighten the resistance bounds. */
  readonly minDividerCurrentMilliamps?: number;
  readonly maxDividerCurrentMilliamps?: number;
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

/**
 * A complete trip design: the input of `designTrip` and `compareReferences`. The chain elements are those
 * of `chain/` (same names and units); the divider is what the engine designs.
 */
export interface TripDesign {
  /** Label of the design. */
  readonly name?: string;
  readonly setpoints: readonly TripSetpoint[];
  readonly thermocouple: ThermocoupleElement;
  /** Required unless the amplifier is a fixed-scale amplifier (which compensates internally). */
  readonly coldJunction?: ColdJunctionElement;
  /** Default: none (the comparator sees the compensated EMF directly). */
  readonly amplifier?: AmplifierElement | FixedScaleAmplifierElement;
  /** The comparator (offset, hysteresis and its placement). */
  readonly comparator: ComparatorElement;
  readonly reference: ReferenceOption;
  readonly resistors: TripResistors;
  /** Ambient range of the electronics and the cold junction, °C. */
  readonly ambient: AmbientRange;
  /** The wire between the probe and the amplifier (cable, connectors, loop, leakage, ageing). Default: none. */
  readonly wire?: WireDescription;
  /** Cold-junction temperature at which thresholds are designed, °C. Default the middle of the ambient range. */
  readonly designColdJunctionC?: number;
  /** Default process limits for setpoints that do not give their own. */
  readonly processLimits?: ProcessLimits;
  /** Per-source distribution overrides, by chain source name. */
  readonly sourceDistributions?: Readonly<Record<string, SourceDistributionOverride>>;
}

// ---------------------------------------------------------------------------------------------------------
// Output
// ---------------------------------------------------------------------------------------------------------

/** A temperature band [lowC, highC] by one propagation method. */
export interface TripBand {
  readonly method: PropagationMethod;
  readonly lowC: number;
  readonly highC: number;
  /** Coverage probability (1 for worst case). */
  readonly coverage: number;
  /** Standard uncertainty of the trip temperature, °C (worst case: 0 when not defined). */
  readonly standardUncertaintyC: number;
  /** Monte Carlo only: trials and seed (same seed, same band). */
  readonly trials?: number;
  readonly seed?: number;
  /**
   * RSS only: the coverage factor k of the interval estimate ± k·u (JCGM 100 G.6.5–G.6.6; 0 when nothing is
   * propagated), the rule that chose it, and whether the interval was cut to the worst-case band.
   */
  readonly coverageFactor?: number;
  readonly coverageFactorRule?: "normal" | "rectangular-dominant" | "none";
  readonly limitedToWorstCase?: boolean;
  /**
   * Worst case only: the temperatures at which the thermocouple tolerance was taken for the low and high edge
   * (self-consistent: each equals its edge), °C, and the fixed-point iterations used.
   */
  readonly toleranceAtLowC?: number;
  readonly toleranceAtHighC?: number;
  readonly iterations?: number;
  /**
   * Worst case only, the bracket: `lowC`/`highC` are the attained extremes (values the model reaches at points of
   * the source box); `enclosureLowC`/`enclosureHighC` a proven enclosure of the model over the whole box (interval
   * arithmetic with outward rounding, a monotonicity proof per source and subdivision of the cold-junction
   * temperature; see DEVELOPERS.md), °C; the gaps between them (≥ 0), °C; and the largest gap we state for the
   * chain models, °C. Absent when nothing is propagated.
   */
  readonly enclosureLowC?: number;
  readonly enclosureHighC?: number;
  readonly enclosureGapLowC?: number;
  readonly enclosureGapHighC?: number;
  readonly enclosureGapToleranceC?: number;
}

/** One error source's share of the trip band. */
export interface TripErrorSource {
  /** Chain source name (e.g. "thermocouple.tolerance", "reference.initialAccuracy", "divider.resistor1.tolerance"). */
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
  /** Divider current at nominal reference voltage, mA. */
  readonly currentMilliamps: number;
}

/** How the reference was realized (sized shunt: the chosen series resistor and the current span). */
export interface ReferenceRealization {
  readonly name: string;
  readonly kind: ReferenceOption["kind"];
  readonly nominalVolts: number;
  /** The chain element used (absent for the ideal reference). */
  readonly element?: ReferenceElement;
  /** Sum of the reference's error bounds, ±fraction of nominalVolts (0 for the ideal reference). */
  readonly toleranceFraction: number;
  /** Shunt: the cathode current range in service, mA. */
  readonly shuntCurrentMinMilliamps?: number;
  readonly shuntCurrentMaxMilliamps?: number;
  /** Shunt: worst dissipation of the series resistor, W. */
  readonly seriesResistorPowerWatts?: number;
  /** Problems (e.g. a cathode current above its maximum); empty when none. */
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
  /** Index into `networks` of the divider this setpoint uses, and its tap there (0 = below the top resistor). */
  readonly networkIndex: number;
  readonly tapIndex: number;
  /** Resistance above and below this setpoint's tap, Ω (two-resistor: [top, bottom]; ladder: the sums). */
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
  // Deliberately alike: report/reportTypes.ts TripReportSetpoint writes these limit, margin and verdict fields
  // out again for the report's JSON (its own schema).
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
  /** Worst-case band of the release temperature (signal falling), °C (self-consistent like the trip's). */
  readonly releaseWorstCase: { readonly lowC: number; readonly highC: number };
  /**
   * releaseWorstCase.lowC − maxNormalOperatingC, °C: > 0 means every unit releases (re-arms) once the process is
   * back at its highest normal operating temperature; ≤ 0 means it must cool that much further.
   */
  readonly releaseMarginToNormalC: number;
  /**
   * How the worst-case trip band widens with time in service since the last recalibration (the probe's
   * ageing drift grows linearly to its stated total at the service life); present when the wire has an
   * ageing element with a drift.
   */
  readonly bandOverService?: readonly TripServicePoint[];
}

/** The worst-case trip band after a time in service. */
export interface TripServicePoint {
  /** Time in service since the last recalibration, h. */
  readonly hours: number;
  /** Worst-case trip band, °C. */
  readonly lowC: number;
  readonly highC: number;
}

/** Result of `designTrip`. */
export interface TripDesignResult {
  readonly name?: string;
  /** Threshold networks: one two-resistor divider per setpoint (input order), or one ladder for all. */
  readonly networks: readonly ThresholdNetwork[];
  readonly reference: ReferenceRealization;
  /** One entry per setpoint, in input order. */
  readonly setpoints: readonly SetpointTripResult[];
  /** Method whose band decides pass/fail. */
  readonly acceptanceMethod: PropagationMethod;
  /**
   * A mid-rail divider of two equal resistors of the design's tolerance across the same reference (e.g. a
   * comparator's second input or a bias point), with its own error: resistors and the reference at their bounds.
   */
  readonly midRail: MidRailDivider;
  /** What to build: thresholds, resistors by position, currents, release band, shunt resistor, bill of materials. */
  readonly buildSheet?: TripBuildSheet;
  /** True when every setpoint passes and the reference has no problems. */
  readonly pass: boolean;
  /** How the network was found and what was assumed, in sentences (the last one is the caution). */
  readonly notes: readonly string[];
  /** The safety caution (`CAUTION_TEXT`): these numbers do not certify a safety function. */
  readonly caution: string;
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
  readonly networks: readonly ThresholdNetwork[];
  readonly setpoints: readonly ReferenceComparisonSetpoint[];
  /** "adequate" when every setpoint passes with this reference and it has no problems. */
  readonly verdict: "adequate" | "inadequate";
  /** One sentence answering "is this reference good enough for the margins?". */
  readonly verdictText: string;
}

/** Result of `compareReferences`. */
export interface ReferenceComparison {
  readonly acceptanceMethod: PropagationMethod;
  /** Options in input order. */
  readonly options: readonly ReferenceComparisonEntry[];
  /** Name of the cheapest adequate option (by cost; ties and missing costs by input order), or null. */
  readonly recommended: string | null;
  /** One sentence summarizing the comparison. */
  readonly summary: string;
}

/** One resistor of a threshold network on the build sheet. */
export interface BuildSheetResistor {
  /** Position name (see {@link resistorDesignator}). */
  readonly designator: string;
  /** Standard value, Ω. */
  readonly ohms: number;
}

/** One threshold network on the build sheet. */
export interface BuildSheetNetwork {
  readonly topology: ThresholdNetwork["topology"];
  /** From the reference end to ground. */
  readonly resistors: readonly BuildSheetResistor[];
  readonly totalOhms: number;
  /** Divider current at nominal reference voltage, mA. */
  readonly currentMilliamps: number;
}

/** One comparator setpoint on the build sheet. */
export interface BuildSheetSetpoint {
  readonly name: string;
  /** Threshold at the comparator's reference input with nominal parts: ideal and from the standard resistors, V. */
  readonly idealThresholdVolts: number;
  readonly realizedThresholdVolts: number;
  /** realized − ideal, V. */
  readonly thresholdErrorVolts: number;
  /**
   * Worst-case extremes of the threshold voltage, V: the reference at ± its total tolerance and every resistor
   * above the tap at one end of its tolerance (plus tempco over the ambient span from 25 °C) and every one below
   * at the other (exact for the divider ratio; a matched network is bounded by its absolute tolerances here).
   */
  readonly thresholdLowVolts: number;
  readonly thresholdHighVolts: number;
  /** Index into `networks`, and the resistors above and below this setpoint's tap (by designator). */
  readonly networkIndex: number;
  readonly resistorsAbove: readonly BuildSheetResistor[];
  readonly resistorsBelow: readonly BuildSheetResistor[];
  /** Current through this setpoint's divider, mA. */
  readonly dividerCurrentMilliamps: number;
  /** Nominal trip and release (from the hysteresis), °C, and their difference, °C. */
  readonly nominalTripC: number;
  readonly nominalReleaseC: number;
  readonly hysteresisC: number;
  /** Worst-case release band, °C. */
  readonly releaseLowC: number;
  readonly releaseHighC: number;
  /** releaseLowC − highest normal operating temperature, °C (> 0: every unit re-arms at normal operation). */
  readonly releaseMarginToNormalC: number;
}

/** One setpoint of an ADC (firmware) design on the build sheet. */
export interface BuildSheetAdcSetpoint {
  readonly name: string;
  /** Detector-input voltage at the setpoint with nominal parts, V. */
  readonly signalVolts: number;
  /** Unrounded nominal code at the setpoint, LSB, and the integer code firmware compares against (code ≥ it trips). */
  readonly nominalCode: number;
  readonly thresholdCode: number;
  /** Nominal code slope at the setpoint, LSB/°C. */
  readonly codesPerC: number;
  /** Worst-case band of the code read at the true setpoint temperature, LSB (first order: slope × reading error). */
  readonly codeLow: number;
  readonly codeHigh: number;
}

/** The sized shunt series resistor. */
export interface BuildSheetShuntResistor {
  readonly ohms: number;
  readonly series: PreferredSeriesName;
  readonly toleranceFraction: number;
  /** Worst dissipation, W, and the smallest standard rating with at least 2× that (50 % derating, common practice). */
  readonly powerWatts: number;
  readonly ratingWatts: number;
}

/** The mid-rail divider: two equal resistors (suggested value: the standard value nearest half the first threshold network's total). */
export interface BuildSheetMidRail {
  readonly topOhms: number;
  readonly bottomOhms: number;
  readonly nominalVolts: number;
  readonly worstCaseLowVolts: number;
  readonly worstCaseHighVolts: number;
}

/** One line of the bill of materials. */
export interface BuildSheetPart {
  /** Designators this line covers, comma-separated. */
  readonly designators: string;
  /** `resistor`, `reference`, `thermocouple`. */
  readonly part: string;
  /** Value in `unit` (Ω, V) or, for a thermocouple, the type letter. */
  readonly value: number | string;
  readonly unit: string;
  /** ±fraction (thermocouple: the tolerance in °C at the first setpoint). */
  readonly tolerance: number;
  readonly toleranceUnit: "fraction" | "°C";
  /** ±ppm/°C (0 where not given). */
  readonly tempcoPpmPerC: number;
  readonly count: number;
}

/** The build sheet (a plain, JSON-serializable object; every number a field). */
export interface TripBuildSheet {
  /** Layout version of this object (1). */
  readonly sheetVersion: 1;
  readonly setpoints: readonly BuildSheetSetpoint[];
  readonly adcSetpoints: readonly BuildSheetAdcSetpoint[];
  readonly networks: readonly BuildSheetNetwork[];
  readonly shuntSeriesResistor?: BuildSheetShuntResistor;
  readonly midRail?: BuildSheetMidRail;
  readonly parts: readonly BuildSheetPart[];
}
