/**
 * The data the report renderers take: plain objects, independent of how they were computed (comparator trip
 * design, firmware trip from an ADC chain, error sweep).
 * @module
 */
import type { TripBand, TripErrorSource, TripServicePoint } from "../trip/types.js";
import type { TripBuildSheet } from "../trip/types.js";
import type { TripDynamicsResult } from "../trip/tripDynamics.js";
import type { PropagationMethod } from "../uncertainty/types.js";

/** Report output formats. `text` is the terminal table (readable without colour). */
export type ReportFormat = "text" | "json" | "markdown" | "csv";

/** How the numbers were found: methods, coverage, Monte Carlo trials and seed. Printed with every report. */
export interface ReportMethodInfo {
  /** Methods shown (e.g. `["worst-case", "rss", "monte-carlo"]`). */
  readonly methods: readonly PropagationMethod[];
  /** Method whose band decides pass/fail, when the report judges. */
  readonly acceptanceMethod?: PropagationMethod;
  /** Coverage probability of the RSS and Monte Carlo intervals (e.g. 0.95). */
  readonly coverage: number;
  /** Monte Carlo trials, when Monte Carlo ran. */
  readonly trials?: number;
  /** Monte Carlo seed, when Monte Carlo ran. */
  readonly seed?: number;
}

/** One setpoint in a trip report. */
export interface TripReportSetpoint {
  readonly name: string;
  /** Desired trip temperature, °C. */
  readonly tripTemperatureC: number;
  /** Trip temperature with all parts nominal, °C. */
  readonly nominalTripC: number;
  /** Bands by method, in the order shown. */
  readonly bands: readonly TripBand[];
  // Deliberately alike: trip/types.ts SetpointTripResult carries the same limit, margin and verdict fields; the
  // report is JSON with its own schema (report/_reportSchema.ts), so its fields are written out here.
  readonly maxNormalOperatingC: number;
  readonly hazardLimitC: number;
  readonly marginToNormalC: number;
  readonly marginToHazardC: number;
  readonly pass: boolean;
  readonly reason: string;
  /** Error sources, largest first. */
  readonly errorSources: readonly TripErrorSource[];
  /** Worst-case trip band against time in service (the probe's ageing drift grows); present with an ageing drift. */
  readonly bandOverService?: readonly TripServicePoint[];
}

/** A trip report. */
export interface TripReport {
  /** Heading (e.g. "Trip design"). */
  readonly title: string;
  readonly designName?: string;
  readonly pass: boolean;
  readonly setpoints: readonly TripReportSetpoint[];
  /** Lines describing the hardware found (reference, resistor networks...). */
  readonly details: readonly string[];
  /** Assumptions and how results were found. */
  readonly notes: readonly string[];
  readonly methods: ReportMethodInfo;
  /** What to build (thresholds, resistors by position, release, shunt resistor, mid-rail, bill of materials). */
  readonly buildSheet?: TripBuildSheet;
  /** Response-time results when the design states dynamics; the verdict (`pass`) then uses the dynamic peak. */
  readonly dynamics?: TripReportDynamics;
}

/** The dynamic results in a report: the figures of `tripDynamics` without the time series. */
export type TripReportDynamics = Omit<TripDynamicsResult, "responses">;

/** One row of an error sweep: the chain's reading error bounds at one true temperature. */
export interface ErrorSweepRow {
  /** True hot-junction temperature, °C. */
  readonly temperatureC: number;
  /** Nominal indicated minus true, °C. */
  readonly nominalErrorC: number;
  /** Error bounds (indicated − true) by method, °C. */
  readonly bands: readonly ErrorSweepBand[];
  /**
   * The largest error sources at this temperature by name, largest first, with half the worst-case swing each
   * causes alone (± °C, the trip table's measure); absent when not computed.
   */
  readonly largestSources?: readonly { readonly source: string; readonly halfSwingC: number }[];
}

/**
 * One method's error bounds at a sweep point, °C. For the worst case of a chain with an enclosure the bracket
 * comes with it, as in `check`: `errorLowC`/`errorHighC` are attained (points of the source box reach them),
 * `enclosureErrorLowC`/`enclosureErrorHighC` a proven enclosure over the whole box (interval arithmetic with
 * outward rounding), and the gaps between the two (attained low − enclosure low, enclosure high − attained high).
 */
export interface ErrorSweepBand {
  readonly method: PropagationMethod;
  readonly errorLowC: number;
  readonly errorHighC: number;
  readonly enclosureErrorLowC?: number;
  readonly enclosureErrorHighC?: number;
  readonly enclosureGapLowC?: number;
  readonly enclosureGapHighC?: number;
}

/** The worst case's bracket over a whole sweep: how many points have one and the largest gap, °C. */
export interface ErrorSweepBracket {
  /** Points of the sweep. */
  readonly points: number;
  /** Points whose worst case has an enclosure (chains with a wire have none yet: attained only, by search). */
  readonly enclosedPoints: number;
  /** Largest gap (either side) over the enclosed points, °C. */
  readonly largestGapC: number;
  /** True temperature of the point with the largest gap, °C. */
  readonly largestGapAtC: number;
  /** The largest gap the library states for chain models, °C. */
  readonly gapToleranceC: number;
}

/** A setpoint of the design a sweep belongs to: where the chart marks it and its limits, °C. */
export interface ErrorSweepSetpoint {
  readonly name: string;
  readonly tripTemperatureC: number;
  readonly maxNormalOperatingC: number;
  readonly hazardLimitC: number;
}

/** An error sweep of a chain over temperature. */
export interface ErrorSweep {
  readonly title: string;
  readonly designName?: string;
  readonly rows: readonly ErrorSweepRow[];
  /** The design's setpoints and limits, marked on the chart and listed by the reports; absent for a bare chain. */
  readonly setpoints?: readonly ErrorSweepSetpoint[];
  /** The worst case's bracket over the sweep (absent without the worst case or without any enclosure). */
  readonly worstCaseBracket?: ErrorSweepBracket;
  readonly notes: readonly string[];
  readonly methods: ReportMethodInfo;
}
