/**
 * The dynamic check of one setpoint: a runaway per trip threshold (e.g. the static band's high edge for the slowest
 * unit, and the nominal trip), the time the process leaves before the hazard, and the noise figures; plus the
 * JSON-ready figures for reports.
 * @module
 */
import { HotjunctionTypeError, _requireFinite, _requireInRange, _requireOptionsObject, _requireShape } from "../errors.js";
import { _checkRunawayResponse, _dynamicsCheckShape } from "./_dynamicsShapes.js";
import { _checkScenario, _compileDynamics, _requireObject } from "./_compileDynamics.js";
import { _buildLinearSystem } from "./_linearSystem.js";
import { tripNoiseFigures, type TripNoiseFigures } from "./levelCrossing.js";
import { _simulateCompiled, _timeToTrueLevelSeconds, type RunawayResponse } from "./simulateRunaway.js";
import type { DynamicsModel } from "./types.js";

const CONTEXT = "dynamics";

/** One trip threshold to run the runaway against. */
export interface DynamicsThreshold {
  /** What it stands for, e.g. `"slowest unit (band high edge)"`, `"nominal"`. */
  readonly name: string;
  /** True-temperature trip point, °C; above `maxNormalOperatingC`. */
  readonly tripTemperatureC: number;
}

/** Inputs of {@link checkDynamics}. */
export interface DynamicsCheckInput {
  readonly model: DynamicsModel;
  /** Highest normal operating temperature (the runaway starts here), °C. */
  readonly maxNormalOperatingC: number;
  /** Hazard limit, °C. */
  readonly hazardLimitC: number;
  /** At least one threshold; the verdict uses every one. */
  readonly thresholds: readonly DynamicsThreshold[];
  /** Low edge of the static trip band, °C; needed for the false-trip rate when the model states noise. */
  readonly bandLowEdgeC?: number;
  /** Points kept per time series (10 … 100000); default 600. */
  readonly maxPoints?: number;
}

/** One threshold's runaway. */
export interface DynamicsCase {
  readonly name: string;
  readonly response: RunawayResponse;
}

/** Result of {@link checkDynamics}. */
export interface DynamicsCheck {
  readonly cases: readonly DynamicsCase[];
  /** Uncontrolled runaway from the highest normal operating temperature to the hazard limit, s; null if it never gets there. */
  readonly timeFromNormalToHazardSeconds: number | null;
  /** Longest time from a true crossing to heat off over the cases, s; null if no case trips. */
  readonly longestResponseTimeSeconds: number | null;
  /** Highest peak over the cases, °C. */
  readonly highestPeakTrueC: number;
  /** Smallest dynamic margin (hazard − peak) over the cases, °C. */
  readonly smallestDynamicMarginC: number;
  /** Every case trips and peaks below the hazard limit. */
  readonly passes: boolean;
  /** Noise figures, when the model states noise and `bandLowEdgeC` is given; else null. */
  readonly noise: TripNoiseFigures | null;
  /** The assumptions of the method, in words. */
  readonly assumptions: readonly string[];
}

/** Assumptions every dynamic check states. */
export const DYNAMICS_ASSUMPTIONS: readonly string[] = [
  "Heater stuck on at t = 0, all at steady state at the highest normal operating temperature.",
  "Sensor, filter and amplifier: unity-gain first-order lags in cascade; comparator and output stages: pure delays (solid-state relay: half a mains period).",
  "Firmware: worst sample phase, trip at the M-th sample after the filtered value crosses.",
  "A stated rate holds the load after heat off; a heater-power load cools by its loss and takes the element's stored heat.",
  "Exact integration of the linear model (matrix exponential); events located on the exact propagation.",
];

/**
 * Runs the runaway against every threshold and gathers the figures a verdict needs: response time, temperature at
 * heat off, peak, dynamic margin, the uncontrolled time from the highest normal operating temperature to the
 * hazard limit, and (with noise stated) false-trip rate and hysteresis needed.
 * @param input - model, temperatures (°C) and thresholds.
 * @returns the check; `passes` is true when every threshold trips and peaks below the hazard limit.
 * @throws {@link HotjunctionTypeError} / {@link HotjunctionRangeError} for bad input, naming the quantity and range.
 * @example
 * ```ts
 * import { checkDynamics } from "hotjunction";
 * const check = checkDynamics({
 *   model: { runaway: { kind: "constantRate", rateCPerSecond: 1.5 }, sensor: { kind: "responseTime", responseTime632Seconds: 8 },
 *            outputStages: [{ kind: "relay", releaseTimeSeconds: 0.05 }] },
 *   maxNormalOperatingC: 960, hazardLimitC: 1040,
 *   thresholds: [{ name: "slowest unit", tripTemperatureC: 1012 }, { name: "nominal", tripTemperatureC: 1000 }],
 * });
 * console.log(check.passes, check.smallestDynamicMarginC.toFixed(1), check.timeFromNormalToHazardSeconds?.toFixed(1)); // true "16.0" "53.3"
 * ```
 */
export function checkDynamics(input: DynamicsCheckInput): DynamicsCheck {
  const i = _requireObject(input, "dynamics check input");
  const compiled = _compileDynamics(input.model);
  const normal = _requireFinite(i.maxNormalOperatingC, "highest normal operating temperature (maxNormalOperatingC)", "°C", CONTEXT);
  const hazard = _requireFinite(i.hazardLimitC, "hazard limit (hazardLimitC)", "°C", CONTEXT);
  const maxPoints = input.maxPoints === undefined ? 600 : _requireInRange(input.maxPoints, "series points (maxPoints)", 10, 100_000, undefined, CONTEXT);
  if (!Array.isArray(input.thresholds) || input.thresholds.length === 0) {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "thresholds", value: input.thresholds, context: CONTEXT, problem: "is not a non-empty array" });
  }
  const cases = input.thresholds.map((th, k) => {
    const t = _requireObject(th, `threshold ${k}`);
    if (typeof t.name !== "string") throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: `threshold ${k} name`, value: t.name, context: CONTEXT, problem: "is not a string" });
    const scenario = _checkScenario({ startC: normal, tripTemperatureC: t.tripTemperatureC as number, hazardLimitC: hazard });
    return { name: t.name, response: _simulateCompiled(compiled, scenario, maxPoints) };
  });
  const system = _buildLinearSystem(compiled, normal);
  const toHazard = _timeToTrueLevelSeconds(compiled, system, normal, hazard - normal);
  const responseTimes = cases.map((c) => c.response.responseTimeSeconds).filter((r): r is number => r !== null);
  const noise =
    input.model.noise !== undefined && input.bandLowEdgeC !== undefined
      ? tripNoiseFigures(input.model, { maxNormalOperatingC: normal, bandLowEdgeC: input.bandLowEdgeC })
      : null;
  return {
    cases,
    timeFromNormalToHazardSeconds: toHazard,
    longestResponseTimeSeconds: responseTimes.length === 0 ? null : Math.max(...responseTimes),
    highestPeakTrueC: Math.max(...cases.map((c) => c.response.peakTrueC)),
    smallestDynamicMarginC: Math.min(...cases.map((c) => c.response.dynamicMarginC)),
    passes: cases.every((c) => c.response.tripped && !c.response.exceedsHazard),
    noise,
    assumptions: DYNAMICS_ASSUMPTIONS,
  };
}

/** Options of {@link dynamicsCheckJson}. */
export interface DynamicsCheckJsonOptions {
  /** Include each case's time series (arrays of numbers); default false. */
  readonly includeSeries?: boolean;
}

/**
 * The figures of a dynamic check as plain JSON-ready objects (numbers or null, units in every key), for the JSON,
 * Markdown and text reports of a later layer.
 * @param check - from {@link checkDynamics}.
 * @param options - whether to include the series.
 * @returns a plain object; `JSON.stringify` of it round-trips.
 * @throws {@link HotjunctionTypeError} / {@link HotjunctionRangeError} for a check that is not one (a field missing or
 * not finite, series of unequal lengths, times not from 0 upward), naming the field.
 * @example
 * ```ts
 * import { checkDynamics, dynamicsCheckJson } from "hotjunction";
 * const json = dynamicsCheckJson(checkDynamics({
 *   model: { runaway: { kind: "constantRate", rateCPerSecond: 2 } },
 *   maxNormalOperatingC: 960, hazardLimitC: 1040, thresholds: [{ name: "nominal", tripTemperatureC: 1000 }],
 * }));
 * console.log(json.cases[0]?.peakTrueC, json.cases[0]?.responseTimeSeconds, json.passes); // 1000 0 true
 * ```
 */
export function dynamicsCheckJson(check: DynamicsCheck, options: DynamicsCheckJsonOptions = {}) {
  _requireShape(check, _dynamicsCheckShape, "check", CONTEXT);
  check.cases.forEach((c, i) => _checkRunawayResponse(c.response, `check.cases[${i}].response`, CONTEXT));
  _requireOptionsObject(options, CONTEXT, false);
  _requireShape(options.includeSeries, ["optional", "boolean"], "includeSeries", CONTEXT);
  return {
    passes: check.passes,
    verdictUses: "dynamic peak" as const,
    timeFromNormalToHazardSeconds: check.timeFromNormalToHazardSeconds,
    longestResponseTimeSeconds: check.longestResponseTimeSeconds,
    highestPeakTrueC: check.highestPeakTrueC,
    smallestDynamicMarginC: check.smallestDynamicMarginC,
    cases: check.cases.map(({ name, response: r }) => ({
      name,
      startC: r.scenario.startC,
      tripTemperatureC: r.scenario.tripTemperatureC,
      hazardLimitC: r.scenario.hazardLimitC,
      ..._runawayFigures(r),
      timeFromTripToHazardSeconds: r.timeFromTripToHazardSeconds,
      stepSeconds: r.stepSeconds,
      ...(options.includeSeries === true
        ? { series: { timeSeconds: [...r.series.timeSeconds], trueC: [...r.series.trueC], indicatedC: [...r.series.indicatedC], filteredC: r.series.filteredC === null ? null : [...r.series.filteredC] } }
        : {}),
    })),
    noise: check.noise === null ? null : { ...check.noise },
    assumptions: [...check.assumptions],
  };
}

/** The figures of a runaway that every JSON case carries, in their printed order (no series, no scenario). */
export type RunawayFigures = Pick<
  RunawayResponse,
  | "tripped"
  | "trueCrossingSeconds"
  | "decisionSeconds"
  | "heatOffSeconds"
  | "responseTimeSeconds"
  | "trueAtHeatOffC"
  | "peakTrueC"
  | "peakSeconds"
  | "overshootC"
  | "dynamicMarginC"
  | "exceedsHazard"
>;

/**
 * The figures of a runaway response in their printed order: one assembly for {@link dynamicsCheckJson} and the
 * trip design's dynamics cases (`trip/tripDynamics.ts`). @internal
 */
export function _runawayFigures(r: RunawayResponse): RunawayFigures {
  return {
    tripped: r.tripped,
    trueCrossingSeconds: r.trueCrossingSeconds,
    decisionSeconds: r.decisionSeconds,
    heatOffSeconds: r.heatOffSeconds,
    responseTimeSeconds: r.responseTimeSeconds,
    trueAtHeatOffC: r.trueAtHeatOffC,
    peakTrueC: r.peakTrueC,
    peakSeconds: r.peakSeconds,
    overshootC: r.overshootC,
    dynamicMarginC: r.dynamicMarginC,
    exceedsHazard: r.exceedsHazard,
  };
}
