/**
 * What the dynamics renderers (`runawayChartSvg`, `dynamicsCheckJson`) read of the results they are given, as
 * shapes for the shared guard (`_requireShape`, src/errors.ts), plus the series checks a shape cannot state (equal
 * lengths, times from 0 upward, temperatures within the drawable bound): a forged or truncated result is refused by
 * field name instead of printing NaN or throwing a plain TypeError.
 * @module
 * @internal
 */
import { HotjunctionRangeError, _requireInRange, _requireShape, type _Shape } from "../errors.js";
import type { RunawayResponse } from "./simulateRunaway.js";

const n: _Shape = "number";
const nn: _Shape = ["nullable", "number"];
const numbers: _Shape = ["array", "number"];

/** @internal A runaway response: the fields a chart or a JSON case reads. */
export const _runawayResponseShape: _Shape = {
  scenario: { startC: n, tripTemperatureC: n, hazardLimitC: n },
  tripped: "boolean",
  stepSeconds: n,
  trueCrossingSeconds: nn,
  decisionSeconds: nn,
  heatOffSeconds: nn,
  responseTimeSeconds: nn,
  trueAtHeatOffC: nn,
  peakTrueC: n,
  peakSeconds: nn,
  overshootC: n,
  dynamicMarginC: n,
  exceedsHazard: "boolean",
  timeFromTripToHazardSeconds: nn,
  series: { timeSeconds: numbers, trueC: numbers, indicatedC: numbers, filteredC: ["nullable", numbers] },
};

const noiseShape: _Shape = {
  spectrumAssumption: "string",
  rmsVolts: n,
  rmsC: n,
  bandwidthHz: nn,
  mainsPeakVolts: n,
  mainsPeakC: n,
  falseTripDistanceVolts: n,
  falseTripsPerHour: nn,
  deterministicFalseTrip: "boolean",
  chatterTargetPerHour: n,
  hysteresisNeededVolts: n,
  hysteresisNeededC: n,
};

/** @internal A dynamic check (checkDynamics). */
export const _dynamicsCheckShape: _Shape = {
  cases: ["array", { name: "string", response: _runawayResponseShape }],
  timeFromNormalToHazardSeconds: nn,
  longestResponseTimeSeconds: nn,
  highestPeakTrueC: n,
  smallestDynamicMarginC: n,
  passes: "boolean",
  noise: ["nullable", noiseShape],
  assumptions: ["array", "string"],
};

/**
 * Largest temperature magnitude a runaway chart draws, °C: far above any physical load (the hottest thermocouple
 * range ends at 1820 °C), and small enough that the axis ticks of a flat curve still advance in float64.
 * @internal
 */
export const _CHART_MAX_ABS_C = 1e6;

/**
 * Checks a runaway response for a renderer: its shape, series of one length each with times from 0 upward, and
 * (for a chart, `boundC`) every temperature within ±`boundC` °C.
 * @internal
 */
export function _checkRunawayResponse(value: unknown, quantity: string, context: string, boundC?: number): RunawayResponse {
  _requireShape(value, _runawayResponseShape, quantity, context);
  const r = value as RunawayResponse;
  const s = r.series;
  const count = s.timeSeconds.length;
  for (const [key, list] of [["trueC", s.trueC], ["indicatedC", s.indicatedC], ["filteredC", s.filteredC ?? s.trueC]] as const) {
    if (list.length !== count) {
      throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: `${quantity}.series.${key}`, value: list, context, problem: `must hold ${count} values (one per time)` });
    }
  }
  let previous = 0;
  s.timeSeconds.forEach((t, i) => {
    previous = _requireInRange(t, `${quantity}.series.timeSeconds[${i}]`, previous, Number.MAX_VALUE, "s", context);
  });
  if (boundC !== undefined) {
    const check = (c: number, key: string): void => void _requireInRange(c, `${quantity}.${key}`, -boundC, boundC, "°C", context);
    for (const key of ["trueC", "indicatedC", "filteredC"] as const) (s[key] ?? []).forEach((c, i) => check(c, `series.${key}[${i}]`));
    check(r.scenario.tripTemperatureC, "scenario.tripTemperatureC");
    check(r.scenario.hazardLimitC, "scenario.hazardLimitC");
    check(r.peakTrueC, "peakTrueC");
  }
  return r;
}
