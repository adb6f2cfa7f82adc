/**
 * The single-fault review of one trip of a chain: each fault of the catalogue applied alone, the hot junction
 * swept from the cold junction up past the hazard limit, the trip found and classified. The parts live
 * beside it: option normalisation (`_faultReviewOptions`), the sweep (`_faultSweep`), detection
 * (`_faultDetection`), classification (`_faultClassification`) and the words (`_faultReviewWords`).
 * @module
 */
import type { MeasurementChain } from "../chain/types.js";
import { _invalidChoice, _requireInRange, HotjunctionRangeError } from "../errors.js";
import { _classifyFault, _countCategories, type _AlternativeResult } from "./_faultClassification.js";
import { _detectionFlags, _firstFlags, _methodOrder } from "./_faultDetection.js";
import { _checkFault, _resolveFault, type _Alternative, type _ResolveFacts } from "./_faultEffects.js";
import { _buildPlant, _emptyMods } from "./_faultPlant.js";
import { _reviewSettings } from "./_faultReviewOptions.js";
import { _detectionText, _effectText, _healthyFlagNote, _healthyTripProblem, _mitigations, _reviewNotes } from "./_faultReviewWords.js";
import { _findTrip, _sweepEvaluator, _sweepPoints } from "./_faultSweep.js";
import { faultCatalogue } from "./faultCatalogue.js";
import type { Fault, FaultReview, FaultReviewRow, FaultReviewTrip, ReviewFaultsOptions } from "./types.js";

/**
 * Reviews one trip of a chain against single faults: for each fault (the built-in {@link faultCatalogue}, or
 * your own list, plus extras) it sweeps the hot junction from the cold junction up past the hazard limit with
 * every error source nominal, finds where the output trips, and classifies the result: trips immediately,
 * early or late (by how many °C), never, or no change. The class comes from one rule ({@link classifyFaultShift}):
 * the healthy worst-case band (`trip.healthyBandC`, default the nominal trip) moved by the fault's shift is
 * dangerous when its top reaches the hazard limit (or it never trips), safe when its bottom reaches down to
 * normal operation (a nuisance trip) or it trips at once, degraded when the shift exceeds the no-effect threshold
 * (default 3 °C) yet the band stays inside (with the margin left), else no effect; detected or undetected by
 * the design's detection methods (a method detects a fault when it flags it at some temperature below the
 * hazard limit where it does not flag the healthy chain). Vocabulary after IEC 61508-4; no certification is
 * claimed. Covers single faults of the modelled elements only.
 * @param chain - a comparator chain (with its divider) or an ADC chain (firmware trip at `trip.tripTemperatureC`)
 * @param trip - name, divider tap (default 0), process limits °C (maxNormalOperatingC < hazardLimitC)
 * @param options - design facts ({@link FaultContext}; conservative defaults), fault list, cold junction °C
 *   (default mid ambient), sweep step °C [0.05, 50] (default 1), margin past the hazard °C [0, 500] (default 50),
 *   no-change tolerance °C (default 0.5)
 * @returns the fault table with counts per class and notes
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad chain, trip, option or fault; INVALID_DESIGN when
 *   the healthy chain trips at the start of the sweep or never
 * @example
 * ```ts
 * import { reviewFaults, type MeasurementChain } from "hotjunction";
 * const chain: MeasurementChain = {
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
 *   reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001 },
 *   divider: { kind: "divider", resistorsOhms: [12000, 13000], toleranceFraction: 0.01 },
 *   detector: { kind: "comparator" },
 *   ambient: { minC: 25, maxC: 25 },
 * };
 * const review = reviewFaults(chain, { name: "oven", maxNormalOperatingC: 250, hazardLimitC: 280 }, { openCircuitBias: "pull-up" });
 * console.log(review.healthyTripC.toFixed(1)); // "256.1"
 * const open = review.rows.find((r) => r.faultId === "thermocouple.open");
 * console.log(open?.effect, open?.category); // "trips-immediately" "safe-undetected"
 * const short = review.rows.find((r) => r.faultId === "thermocouple.shortAtTerminals");
 * console.log(short?.effect, short?.category); // "never-trips" "dangerous-undetected"
 * ```
 */
export function reviewFaults(chain: MeasurementChain, trip: FaultReviewTrip, options: ReviewFaultsOptions = {}): FaultReview {
  const set = _reviewSettings(chain, trip, options);
  const { context, hazard, coldJunctionC, detection } = set;
  const healthy = _buildPlant(chain, set.facts, context);
  if (coldJunctionC < healthy.minC || hazard > healthy.maxC) {
    _requireInRange(coldJunctionC, "coldJunctionC", healthy.minC, healthy.maxC, "°C", context);
    _requireInRange(hazard, "hazardLimitC", healthy.minC, healthy.maxC, "°C", `${context} (type ${healthy.type} range)`);
  }
  if (!(hazard > coldJunctionC)) _requireInRange(hazard, "hazardLimitC", coldJunctionC, Infinity, "°C", `${context} (must exceed the cold junction)`);
  const fromC = coldJunctionC;
  const toC = Math.min(hazard + set.margin, healthy.maxC);
  const points = _sweepPoints(fromC, toC, set.step);

  const second = detection.secondComparator;
  if (second !== undefined) _requireInRange(second.thresholdC, "secondComparator.thresholdC", healthy.minC, healthy.maxC, "°C", context);
  const evaluate = _sweepEvaluator(healthy, _emptyMods(), second);
  const healthyRun = _findTrip(evaluate, points, healthy, _emptyMods());
  if (healthyRun.immediate || healthyRun.tripC === null) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "healthy trip",
      value: healthyRun.immediate ? fromC : null,
      context,
      problem: _healthyTripProblem(healthyRun.immediate, fromC, toC),
    });
  }
  const healthyTripC = healthyRun.tripC;
  // The supervisor compares the reading with the main detector's own healthy trip (a second comparator aside).
  const detectorTripC =
    second === undefined ? healthyTripC : (_findTrip(evaluate, points, healthy, _emptyMods(), (p) => p.s.detectorTripped).tripC ?? Infinity);
  const flags = _detectionFlags(detection, detectorTripC);
  const healthyFlags = healthyRun.pts.map((p, k) => flags(p, points[k] as number));
  const notes: string[] = [];
  for (const method of _methodOrder) {
    const k = healthyFlags.findIndex((f, i) => f.has(method) && (points[i] as number) < hazard);
    if (k >= 0) notes.push(_healthyFlagNote(method, points[k] as number));
  }

  const wireShortC = options.wireShortC ?? Math.round((coldJunctionC + healthyTripC) / 2);
  if (options.wireShortC !== undefined) _requireInRange(wireShortC, "wireShortC", healthy.minC, healthy.maxC, "°C", context);
  const resolveFacts: _ResolveFacts = {
    railLowVolts: set.railLow,
    railHighVolts: set.railHigh,
    openCircuitBias: set.bias,
    openCircuitBiasMillivolts: set.biasMv,
    wireShortC,
    coldJunctionC,
  };
  const faults = faultList(chain, options, set.groundMv, set.drift, set.tripLevel, context);

  const runAlternative = (fault: Fault, alt: _Alternative): _AlternativeResult => {
    let plant = healthy;
    if (alt.chainTransforms.length > 0) {
      let c = chain;
      for (const tr of alt.chainTransforms) c = tr(c);
      plant = _buildPlant(c, set.facts, `${context}, fault ${fault.id}`);
    }
    for (const index of alt.mods.dividerStates.keys()) {
      const n = plant.dividerOhms?.length ?? 0;
      if (index >= n) _requireInRange(index, "divider resistor index", 0, n - 1, undefined, `${context}, fault ${fault.id}`);
    }
    if (alt.mods.shortAtC !== undefined) _requireInRange(alt.mods.shortAtC, "short temperature", plant.minC, plant.maxC, "°C", `${context}, fault ${fault.id}`);
    const run = _findTrip(evaluate, points, plant, alt.mods);
    const firstFlagC = _firstFlags(run.pts, points, hazard, flags, healthyFlags);
    return { label: alt.label, immediate: run.immediate, tripC: run.tripC, firstFlagC };
  };

  const bandC = set.band ?? { lowC: healthyTripC, highC: healthyTripC };
  const limits = { healthyTripC, maxNormalC: set.maxNormal, hazardC: hazard, noChangeC: set.noChange, bandC, noEffectC: set.noEffect, fromC, toC };
  // Alike in shape only (deliberately): trip/compareReferences.ts builds its setpoint rows the same way (derived
  // values, then a row literal); the rows and what derives them differ.
  const rows: FaultReviewRow[] = faults.map((fault) => {
    const results = _resolveFault(fault, resolveFacts).map((alt) => runAlternative(fault, alt));
    const c = _classifyFault(results, limits);
    return {
      faultId: fault.id,
      element: fault.element,
      description: fault.description,
      effect: c.effect,
      tripC: c.tripC,
      shiftC: c.shiftC,
      effectText: _effectText(c, results.length, limits),
      safety: c.safety,
      marginC: c.marginC,
      detected: c.detected,
      detectedBy: c.detectedBy,
      detectionText: _detectionText(c, results),
      category: c.category,
      ...(c.worst.label !== undefined && results.length > 1 ? { decidingAlternative: c.worst.label } : {}),
      mitigations: _mitigations(fault, c),
    };
  });

  notes.unshift(
    ..._reviewNotes({
      coldJunctionC,
      fromC,
      toC,
      stepC: set.step,
      healthyTripC,
      intendedTripC: trip.tripTemperatureC,
      maxNormalC: set.maxNormal,
      hazardC: hazard,
      bias: set.bias,
      biasMv: set.biasMv,
      outputStage: set.outputStage,
      outputStageAssumed: options.outputStage === undefined,
      bandC,
      bandGiven: set.band !== undefined,
      noEffectC: set.noEffect,
    }),
  );

  return {
    name: trip.name,
    healthyTripC,
    maxNormalOperatingC: set.maxNormal,
    hazardLimitC: hazard,
    healthyBandC: bandC,
    healthyBandGiven: set.band !== undefined,
    noEffectThresholdC: set.noEffect,
    coldJunctionC,
    sweep: { fromC, toC, stepC: set.step },
    context: {
      openCircuitBias: set.bias,
      openCircuitBiasMillivolts: set.biasMv,
      amplifierRailsVolts: { lowVolts: set.railLow, highVolts: set.railHigh },
      outputStage: set.outputStage,
      comparatorTripLevel: set.tripLevel,
      detection,
      wireShortC,
      groundOffsetMillivolts: set.groundMv,
      referenceDriftFraction: set.drift,
    },
    rows,
    counts: _countCategories(rows),
    notes,
  };
}

/** The checked faults of a review: the catalogue (or the given list) plus extras, ids unique. */
function faultList(
  chain: MeasurementChain,
  options: ReviewFaultsOptions,
  groundOffsetMillivolts: number,
  referenceDriftFraction: number,
  comparatorTripLevel: "high" | "low",
  context: string,
): Fault[] {
  const base = options.faults ?? faultCatalogue(chain, { groundOffsetMillivolts, referenceDriftFraction, comparatorTripLevel });
  if (!Array.isArray(base)) _invalidChoice("faults", base, ["an array of faults"], context);
  const extra = options.extraFaults ?? [];
  if (!Array.isArray(extra)) _invalidChoice("extraFaults", extra, ["an array of faults"], context);
  const faults = [...base, ...extra].map((f, i) => _checkFault(f, `${context}, fault [${i}]`));
  const seen = new Set<string>();
  for (const f of faults) {
    if (seen.has(f.id)) throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: "fault id", value: f.id, context, problem: "is given twice" });
    seen.add(f.id);
  }
  return faults;
}
