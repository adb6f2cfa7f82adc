/**
 * Types of the safety figures: failure data as plain JSON (per element a failure rate in FIT and a
 * distribution over its failure modes, each mode mapped onto a fault of the single-fault review or given an
 * assumed class), the classified faults of one setpoint, the proof-test parameters, and the results
 * (λ_SD, λ_SU, λ_DD, λ_DU, SFF, DC, PFDavg, PFH for 1oo1 and 1oo2).
 *
 * Units are in every key: `Fit` = failures per 10⁹ h, `Hours`, `PerHour`; β, β_D, shares, SFF, DC and the
 * proof-test coverage are fractions in [0, 1]. The package ships no failure rates: the user supplies them.
 * Vocabulary follows the functional-safety standards (IEC 61508-4 terms, IEC 61508-6 Annex B equations);
 * nothing here certifies a safety function.
 * @module
 */

// ---------------------------------------------------------------------------------------------------------
// Failure data (user-supplied)
// ---------------------------------------------------------------------------------------------------------

import type { FaultSafety } from "../faults/types.js";

/** Effect of a failure on the safety function, judged with the healthy worst-case band (see {@link classifyFaultShift}); the review's {@link FaultSafety}. */
export type SafetyFaultSafety = FaultSafety;

/** A class stated by the user for a failure mode the review does not model (e.g. a slow resistor drift). */
export interface AssumedFaultClass {
  readonly safety: SafetyFaultSafety;
  /** Whether a diagnostic reveals the failure (and brings the safe state) within the restoration time. */
  readonly detected: boolean;
}

/**
 * One failure mode of an element and its share of the element's rate. Give exactly one of `faultId` (a fault of
 * the catalogue / review, whose class per setpoint comes from the review) and `assumed` (a class stated by the
 * user, the same for every setpoint).
 */
export interface FailureModeShare {
  /** The mode in words, e.g. `"open"`, `"short"`, `"drift"`, `"output stuck low"`. */
  readonly mode: string;
  /** Share of the element's rate, in [0, 1]; the shares of one element sum to 1 (±{@link failureShareSumTolerance}). */
  readonly share: number;
  /** Fault id of the review, e.g. `"divider.resistor0.open"`. */
  readonly faultId?: string;
  /** Stated class when the mode has no fault in the review. */
  readonly assumed?: AssumedFaultClass;
}

/** One element's failure data. */
export interface ElementFailureData {
  /** The element in words or by position, e.g. `"divider resistor 0 (top)"`, `"thermocouple"`. */
  readonly element: string;
  /** Total failure rate of the element, FIT (failures per 10⁹ h), finite, in [0, 1e9]. */
  readonly rateFit: number;
  /** Where the rate comes from (handbook, standard, field data), in the user's words. Reported only. */
  readonly rateSource?: string;
  /** The modes; shares sum to 1. */
  readonly modes: readonly FailureModeShare[];
}

/** Failure data of one channel (the design's elements). */
export interface FailureData {
  readonly elements: readonly ElementFailureData[];
}

// ---------------------------------------------------------------------------------------------------------
// Classified faults of one setpoint
// ---------------------------------------------------------------------------------------------------------

/** One fault of a setpoint's review as the safety figures read it. */
export interface SafetyFaultClass {
  readonly faultId: string;
  readonly safety: SafetyFaultSafety;
  readonly detected: boolean;
  /** Trip shift of the nominal unit, °C (null: never trips or not given). */
  readonly shiftC: number | null;
  /** Margin left to the nearer process limit by the worst unit of the shifted band, °C (null when not computed). */
  readonly marginC: number | null;
}

/** The classified faults of one setpoint (one trip). */
export interface SetpointFaultClasses {
  /** Setpoint label. */
  readonly name: string;
  readonly faults: readonly SafetyFaultClass[];
  /** Shift below which a fault is "no effect", °C (reported). */
  readonly noEffectThresholdC?: number;
}

// ---------------------------------------------------------------------------------------------------------
// Proof test and repair
// ---------------------------------------------------------------------------------------------------------

/**
 * Proof test and repair times (IEC 61508-6 Annex B symbols in brackets).
 */
export interface ProofTestParameters {
  /** Proof-test interval [T1], h, > 0. */
  readonly proofTestIntervalHours: number;
  /** Mean time to restoration after a detected failure [MTTR], h, ≥ 0 (detection plus repair). */
  readonly meanTimeToRestorationHours: number;
  /** Mean repair time after a proof test revealed a failure [MRT], h, ≥ 0. Default: `meanTimeToRestorationHours`. */
  readonly meanRepairTimeHours?: number;
  /**
   * Proof-test coverage [PTC]: the share of λ_DU the proof test reveals, in [0, 1]. Default 1 (a perfect test,
   * as Annex B assumes). Below 1, `missionTimeHours` is required.
   */
  readonly proofTestCoverage?: number;
  /** Mission time [T_M], h, ≥ the proof-test interval: when the failures the proof test misses are found (overhaul, replacement). */
  readonly missionTimeHours?: number;
}

/** The proof-test parameters with defaults filled in (as used). */
export interface ProofTestUsed {
  readonly proofTestIntervalHours: number;
  readonly meanTimeToRestorationHours: number;
  readonly meanRepairTimeHours: number;
  readonly proofTestCoverage: number;
  /** null when the coverage is 1 and no mission time was given. */
  readonly missionTimeHours: number | null;
}

/** Dangerous failure rates of one channel, FIT. */
export interface DangerousRates {
  /** λ_DU, FIT, ≥ 0. */
  readonly lambdaDuFit: number;
  /** λ_DD, FIT, ≥ 0. */
  readonly lambdaDdFit: number;
}

/** Common-cause factors of a 1oo2 pair, fractions in [0, 1]. */
export interface CommonCauseFactors {
  /** β: share of undetected dangerous failures that fail both channels. */
  readonly beta: number;
  /** β_D: share of detected dangerous failures that fail both channels. */
  readonly betaD: number;
}

// ---------------------------------------------------------------------------------------------------------
// Equation results
// ---------------------------------------------------------------------------------------------------------

/** Result of {@link pfdAvg1oo1}. */
export interface PfdAvg1oo1Result {
  readonly architecture: "1oo1";
  /** Average probability of failure on demand. */
  readonly pfdAvg: number;
  /** Channel equivalent mean down time [t_CE], h (null when λ_D = 0). */
  readonly channelDownTimeHours: number | null;
  readonly lambdaDuFit: number;
  readonly lambdaDdFit: number;
  readonly proofTest: ProofTestUsed;
  /** λ_D × (longest interval a failure can stay hidden) ≤ 0.1, where the simplified equations hold (common practice, no source). */
  readonly simplifiedEquationsValid: boolean;
}

/** Result of {@link pfdAvg1oo2}. */
export interface PfdAvg1oo2Result {
  readonly architecture: "1oo2";
  readonly pfdAvg: number;
  /** The term of independent failures of both channels. */
  readonly independentPfd: number;
  /** The common-cause terms β_D·λ_DD·MTTR + β·λ_DU·(T1/2 + MRT) (with the proof-test coverage split, see the module). */
  readonly commonCausePfd: number;
  /** Channel equivalent mean down time [t_CE], h (null when λ_D = 0). */
  readonly channelDownTimeHours: number | null;
  /** System equivalent down time [t_GE], h (null when λ_D = 0). */
  readonly systemDownTimeHours: number | null;
  readonly lambdaDuFit: number;
  readonly lambdaDdFit: number;
  readonly beta: number;
  readonly betaD: number;
  readonly proofTest: ProofTestUsed;
  readonly simplifiedEquationsValid: boolean;
}

/** Result of {@link pfh1oo1} and {@link pfh1oo2}. */
export interface PfhResult {
  readonly architecture: "1oo1" | "1oo2";
  /** Average frequency of dangerous failure, per hour. */
  readonly pfhPerHour: number;
  /** The same in FIT. */
  readonly pfhFit: number;
  /** 1oo2: the common-cause part, per hour (1oo1: 0). */
  readonly commonCausePfhPerHour: number;
}

// ---------------------------------------------------------------------------------------------------------
// Setpoint summary
// ---------------------------------------------------------------------------------------------------------

/** One failure mode of one element with its rate and class at a setpoint. */
export interface SafetyModeRow {
  readonly element: string;
  readonly mode: string;
  /** Fault id of the review, or null for an assumed class. */
  readonly faultId: string | null;
  readonly share: number;
  /** rateFit × share, FIT. */
  readonly rateFit: number;
  readonly safety: SafetyFaultSafety;
  readonly detected: boolean;
  /** Where the rate is counted. */
  readonly counted: "SD" | "SU" | "DD" | "DU" | "degraded" | "no-effect";
  /** True when the class came from the user (`assumed`), not from the review. */
  readonly assumed: boolean;
}

/** Failure rates of one setpoint by class, FIT. */
export interface SafetyRates {
  readonly lambdaSdFit: number;
  readonly lambdaSuFit: number;
  readonly lambdaDdFit: number;
  readonly lambdaDuFit: number;
  /** λ_S = λ_SD + λ_SU. */
  readonly lambdaSafeFit: number;
  /** λ_D = λ_DD + λ_DU. */
  readonly lambdaDangerousFit: number;
  /** Degraded (shift above the threshold, still inside the limits): not in λ_S or λ_D unless counted as dangerous. */
  readonly lambdaDegradedFit: number;
  readonly lambdaNoEffectFit: number;
  /** Sum of every mode's rate. */
  readonly lambdaTotalFit: number;
}

/** Options of {@link safetyFigures}. */
export interface SafetyFiguresOptions {
  /** With it, the summary carries PFDavg and PFH for 1oo1. */
  readonly proofTest?: ProofTestParameters;
  /**
   * Faults an injected-signal proof test reveals: the proof-test coverage is then λ_DU of these faults / λ_DU
   * (instead of `proofTest.proofTestCoverage`).
   */
  readonly proofTestRevealsFaultIds?: readonly string[];
  /** Count "degraded" modes as dangerous (DD/DU by detection) instead of leaving them out of λ_D. Default false. */
  readonly countDegradedAsDangerous?: boolean;
}

/** Result of {@link safetyFigures}: the failure-modes-effects-and-diagnostics summary of one setpoint. */
export interface SetpointSafetyFigures extends SafetyRates {
  readonly name: string;
  /** Safe failure fraction (λ_SD + λ_SU + λ_DD) / (λ_S + λ_D); null when λ_S + λ_D = 0. */
  readonly safeFailureFraction: number | null;
  /** Diagnostic coverage λ_DD / λ_D; null when λ_D = 0. */
  readonly diagnosticCoverage: number | null;
  /** Proof-test coverage used (null without a proof test). */
  readonly proofTestCoverage: number | null;
  readonly countDegradedAsDangerous: boolean;
  readonly noEffectThresholdC: number | null;
  readonly modes: readonly SafetyModeRow[];
  /** Faults of the review that no failure mode names: they carry no rate. */
  readonly unratedFaultIds: readonly string[];
  readonly pfdAvg1oo1: PfdAvg1oo1Result | null;
  readonly pfh1oo1: PfhResult | null;
  readonly notes: readonly string[];
}

// ---------------------------------------------------------------------------------------------------------
// Two channels
// ---------------------------------------------------------------------------------------------------------

/** One channel of a pair: its name and dangerous rates (e.g. a {@link SetpointSafetyFigures}). */
export interface ChannelRates extends DangerousRates {
  readonly name?: string;
  /** This channel's proof-test coverage (e.g. from its summary); default the pair's. */
  readonly proofTestCoverage?: number | null;
}

/** Which channel's rate the common-cause share applies to when the two differ. */
export type CommonCauseBasis = "larger" | "smaller" | "geometric-mean";

/** Options of {@link twoChannelCutout}. */
export interface TwoChannelCutoutOptions extends CommonCauseFactors {
  readonly proofTest: ProofTestParameters;
  /** Default `"larger"` (the higher PFDavg). */
  readonly commonCauseBasis?: CommonCauseBasis;
  /** β values of the sensitivity table (β_D kept in the ratio given). Default [0, 0.01, 0.02, 0.05, 0.1, 0.2]. */
  readonly betaSensitivity?: readonly number[];
}

/** One row of the β sensitivity table of a pair. */
export interface BetaSensitivityRow {
  readonly beta: number;
  readonly betaD: number;
  readonly pfdAvg1oo2: number;
  readonly pfh1oo2PerHour: number;
  /** PFDavg of the better single channel / PFDavg of the pair (null when the pair's is 0). */
  readonly improvementFactor: number | null;
}

/** Result of {@link twoChannelCutout}. */
export interface TwoChannelCutout {
  readonly channelA: { readonly name: string; readonly lambdaDuFit: number; readonly lambdaDdFit: number; readonly pfdAvg1oo1: number; readonly pfh1oo1PerHour: number };
  readonly channelB: { readonly name: string; readonly lambdaDuFit: number; readonly lambdaDdFit: number; readonly pfdAvg1oo1: number; readonly pfh1oo1PerHour: number };
  readonly beta: number;
  readonly betaD: number;
  readonly commonCauseBasis: CommonCauseBasis;
  /** True when both channels have the same rates and coverage (the Annex B 1oo2 form applies as printed). */
  readonly identicalChannels: boolean;
  readonly pfdAvg1oo2: number;
  readonly independentPfd: number;
  readonly commonCausePfd: number;
  /** commonCausePfd / pfdAvg1oo2 (null when the pair's PFDavg is 0). */
  readonly commonCauseShare: number | null;
  readonly pfh1oo2PerHour: number;
  readonly commonCausePfhPerHour: number;
  /** PFDavg of the better single channel / PFDavg of the pair (null when the pair's is 0). */
  readonly improvementFactor: number | null;
  /** The improvement with β = β_D = 0 (what independence alone would buy; null when 0). */
  readonly improvementFactorWithoutCommonCause: number | null;
  readonly betaSensitivity: readonly BetaSensitivityRow[];
  readonly proofTest: ProofTestUsed;
  readonly simplifiedEquationsValid: boolean;
  readonly notes: readonly string[];
}

// ---------------------------------------------------------------------------------------------------------
// Curve and report
// ---------------------------------------------------------------------------------------------------------

/** One point of {@link pfdAvgCurve}. */
export interface PfdAvgCurvePoint {
  readonly proofTestIntervalHours: number;
  readonly pfdAvg1oo1: number;
  /** null without a second channel. */
  readonly pfdAvg1oo2: number | null;
}

/** Result of {@link pfdAvgCurve}. */
export interface PfdAvgCurve {
  /** Label of the 1oo1 channel. */
  readonly channelName: string;
  /** Label of the 1oo2 pair (null without a second channel). */
  readonly pairName: string | null;
  readonly beta: number | null;
  readonly betaD: number | null;
  readonly points: readonly PfdAvgCurvePoint[];
}

/** The safety figures of a design: setpoint summaries, pairs and curves, with the scope and the caution. */
export interface SafetyFiguresReport {
  readonly name?: string;
  readonly setpoints: readonly SetpointSafetyFigures[];
  readonly twoChannel: readonly TwoChannelCutout[];
  readonly curves: readonly PfdAvgCurve[];
  /** What the figures cover: single faults of the modelled elements, rates supplied by the user. */
  readonly scope: string;
  /** States that no certification is claimed. */
  readonly certification: string;
  readonly caution: string;
}
