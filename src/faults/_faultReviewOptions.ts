/**
 * Option normalisation of the fault review: the trip, the design facts and the sweep settings checked once,
 * with their defaults, into one settled record.
 * @module
 * @internal
 */
import type { MeasurementChain } from "../chain/types.js";
import { _invalidChoice, _requireFinite, _requireGreaterThan, _requireInRange } from "../errors.js";
import type { _PlantFacts } from "./_faultPlant.js";
import type { FaultDetection, FaultReviewTrip, ReviewFaultsOptions } from "./types.js";

/** @internal The review's settled inputs. */
export interface _ReviewSettings {
  readonly context: string;
  readonly maxNormal: number;
  readonly hazard: number;
  readonly bias: "pull-up" | "pull-down" | "none";
  readonly biasMv: number;
  readonly railLow: number;
  readonly railHigh: number;
  readonly outputStage: "energize-to-trip" | "de-energize-to-trip";
  readonly tripLevel: "high" | "low";
  readonly detection: FaultDetection;
  readonly groundMv: number;
  readonly drift: number;
  readonly coldJunctionC: number;
  readonly step: number;
  readonly margin: number;
  readonly noChange: number;
  readonly facts: _PlantFacts;
}

/** @internal Checks the detection methods. */
export function _checkDetection(d: unknown, context: string): FaultDetection {
  if (d === undefined) return {};
  if (typeof d !== "object" || d === null) _invalidChoice("detection", d, ["an object"], context);
  const o = d as FaultDetection;
  const ctx = `${context}, detection`;
  const w = o.outOfRangeWindow as Record<string, unknown> | undefined;
  if (w !== undefined) {
    const [lo, hi, unit] = "lowVolts" in w || "highVolts" in w ? ["lowVolts", "highVolts", "V"] : ["lowC", "highC", "°C"];
    const low = _requireFinite(w[lo], `outOfRangeWindow.${lo}`, unit, ctx);
    _requireGreaterThan(w[hi], `outOfRangeWindow.${hi}`, low, unit, ctx, `outOfRangeWindow.${lo} ${low} ${unit}`);
  }
  if (o.openThermocoupleDetection !== undefined && typeof o.openThermocoupleDetection !== "boolean") {
    _invalidChoice("openThermocoupleDetection", o.openThermocoupleDetection, ["true", "false"], ctx);
  }
  if (o.secondComparator !== undefined) {
    _requireFinite(o.secondComparator.thresholdC, "secondComparator.thresholdC", "°C", ctx);
    const sr = o.secondComparator.sharesReference;
    if (sr !== undefined && typeof sr !== "boolean") _invalidChoice("secondComparator.sharesReference", sr, ["true", "false"], ctx);
  }
  const sv = o.supervisoryReading;
  if (sv !== undefined) {
    if (sv.plausibleLowC !== undefined) _requireFinite(sv.plausibleLowC, "supervisoryReading.plausibleLowC", "°C", ctx);
    if (sv.plausibleHighC !== undefined) _requireFinite(sv.plausibleHighC, "supervisoryReading.plausibleHighC", "°C", ctx);
    if (sv.toleranceC !== undefined) _requireInRange(sv.toleranceC, "supervisoryReading.toleranceC", 1e-6, 1e4, "°C", ctx);
    for (const key of ["checksDetector", "independentSensor"] as const) {
      if (sv[key] !== undefined && typeof sv[key] !== "boolean") _invalidChoice(`supervisoryReading.${key}`, sv[key], ["true", "false"], ctx);
    }
  }
  return o;
}

/**
 * @internal Checks the trip and the options of a review and applies the defaults. The hazard limit must lie
 * strictly above the highest normal operating temperature (equal limits leave no room for a trip).
 */
export function _reviewSettings(chain: MeasurementChain, trip: FaultReviewTrip, options: ReviewFaultsOptions): _ReviewSettings {
  let context = "fault review";
  if (typeof trip !== "object" || trip === null) _invalidChoice("trip", trip, ["an object"], context);
  if (typeof trip.name !== "string") _invalidChoice("trip name", trip.name, ["a string"], context);
  context = `fault review (${trip.name})`;
  const maxNormal = _requireFinite(trip.maxNormalOperatingC, "maxNormalOperatingC", "°C", context);
  const hazard = _requireGreaterThan(trip.hazardLimitC, "hazardLimitC", maxNormal, "°C", context, `maxNormalOperatingC ${maxNormal} °C`);
  if (trip.tripTemperatureC !== undefined) _requireFinite(trip.tripTemperatureC, "tripTemperatureC", "°C", context);
  if (typeof options !== "object" || options === null) _invalidChoice("options", options, ["an object"], context);

  const bias = options.openCircuitBias ?? "none";
  if (!["pull-up", "pull-down", "none"].includes(bias)) _invalidChoice("openCircuitBias", bias, ["pull-up", "pull-down", "none"], context);
  const biasMv =
    options.openCircuitBiasMillivolts === undefined ? 1000 : _requireInRange(options.openCircuitBiasMillivolts, "openCircuitBiasMillivolts", 1e-3, 1e5, "mV", context);
  const rails = options.amplifierRailsVolts ?? { lowVolts: 0, highVolts: 5 };
  const railLow = _requireFinite(rails?.lowVolts, "amplifierRailsVolts.lowVolts", "V", context);
  const railHigh = _requireGreaterThan(rails?.highVolts, "amplifierRailsVolts.highVolts", railLow, "V", context, `amplifierRailsVolts.lowVolts ${railLow} V`);
  const outputStage = options.outputStage ?? "energize-to-trip";
  if (outputStage !== "energize-to-trip" && outputStage !== "de-energize-to-trip") {
    _invalidChoice("outputStage", outputStage, ["energize-to-trip", "de-energize-to-trip"], context);
  }
  const tripLevel = options.comparatorTripLevel ?? "high";
  if (tripLevel !== "high" && tripLevel !== "low") _invalidChoice("comparatorTripLevel", tripLevel, ["high", "low"], context);
  const detection = _checkDetection(options.detection, context);
  const groundMv = options.groundOffsetMillivolts ?? 1;
  const drift = options.referenceDriftFraction ?? 0.05;
  const ambient = (chain as { ambient?: { minC?: unknown; maxC?: unknown } } | null)?.ambient;
  const coldJunctionC =
    options.coldJunctionC !== undefined
      ? _requireFinite(options.coldJunctionC, "coldJunctionC", "°C", context)
      : (_requireFinite(ambient?.minC, "ambient.minC", "°C", context) + _requireFinite(ambient?.maxC, "ambient.maxC", "°C", context)) / 2;
  const step = options.sweepStepC === undefined ? 1 : _requireInRange(options.sweepStepC, "sweepStepC", 0.05, 50, "°C", context);
  const margin = options.sweepMarginC === undefined ? 50 : _requireInRange(options.sweepMarginC, "sweepMarginC", 0, 500, "°C", context);
  const noChange = options.noChangeToleranceC === undefined ? 0.5 : _requireInRange(options.noChangeToleranceC, "noChangeToleranceC", 0, 100, "°C", context);
  const shuntSupply = options.shuntSupplyVolts === undefined ? undefined : _requireInRange(options.shuntSupplyVolts, "shuntSupplyVolts", 0, 1000, "V", context);
  const facts: _PlantFacts = {
    coldJunctionC,
    railLowVolts: railLow,
    railHighVolts: railHigh,
    tap: trip.tap ?? 0,
    adcTripC: trip.tripTemperatureC,
    outputStage,
    shuntSupplyVolts: shuntSupply,
  };
  return { context, maxNormal, hazard, bias, biasMv, railLow, railHigh, outputStage, tripLevel, detection, groundMv, drift, coldJunctionC, step, margin, noChange, facts };
}
