/**
 * The single-fault review of one trip of a chain: each fault of the catalogue applied alone, the hot junction
 * swept from the cold junction up past the hazard limit, the trip found and classified.
 * @module
 */
import type { MeasurementChain } from "../chain/types.js";
import { _invalidChoice, _requireFinite, _requireInRange, HotjunctionRangeError } from "../errors.js";
import { _checkFault, _resolveFault, type _Alternative, type _ResolveFacts } from "./_faultEffects.js";
import { _buildPlant, _emptyMods, _evaluateSignals, type _Mods, type _Plant, type _PlantFacts } from "./_faultPlant.js";
import { faultCatalogue } from "./faultCatalogue.js";
import type {
  Fault,
  FaultCategory,
  FaultCategoryCounts,
  FaultDetection,
  FaultDetectionMethod,
  FaultReview,
  FaultReviewRow,
  FaultReviewTrip,
  FaultSafety,
  FaultSignals,
  FaultTripEffect,
  ReviewFaultsOptions,
} from "./types.js";

const detectionWords: Readonly<Record<FaultDetectionMethod, string>> = {
  "out-of-range-window": "out-of-range window",
  "open-thermocouple-detection": "open-thermocouple detection",
  "second-comparator": "second comparator",
  "supervisory-reading": "supervisory reading",
};

const methodOrder: readonly FaultDetectionMethod[] = [
  "out-of-range-window",
  "open-thermocouple-detection",
  "second-comparator",
  "supervisory-reading",
];

/** One evaluated point with the second comparator. */
interface Point {
  readonly s: FaultSignals;
  readonly secondTripped: boolean;
  readonly outputTripped: boolean;
}

interface AlternativeResult {
  readonly label: string | undefined;
  readonly immediate: boolean;
  readonly tripC: number | null;
  readonly firstFlagC: ReadonlyMap<FaultDetectionMethod, number>;
}

function fmt(x: number): string {
  const v = x.toFixed(1);
  return v === "-0.0" ? "0.0" : v;
}

function checkDetection(d: unknown, context: string): FaultDetection {
  if (d === undefined) return {};
  if (typeof d !== "object" || d === null) _invalidChoice("detection", d, ["an object"], context);
  const o = d as FaultDetection;
  const ctx = `${context}, detection`;
  const w = o.outOfRangeWindow as Record<string, unknown> | undefined;
  if (w !== undefined) {
    const [lo, hi, unit] = "lowVolts" in w || "highVolts" in w ? ["lowVolts", "highVolts", "V"] : ["lowC", "highC", "°C"];
    const low = _requireFinite(w[lo], `outOfRangeWindow.${lo}`, unit, ctx);
    const high = _requireFinite(w[hi], `outOfRangeWindow.${hi}`, unit, ctx);
    if (!(high > low)) _requireInRange(high, `outOfRangeWindow.${hi}`, low, Infinity, unit, ctx);
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
 * Reviews one trip of a chain against single faults: for each fault (the built-in {@link faultCatalogue}, or
 * your own list, plus extras) it sweeps the hot junction from the cold junction up past the hazard limit with
 * every error source nominal, finds where the output trips, and classifies the result: trips immediately,
 * early or late (by how many °C), never, or no change; safe (a trip at or below the highest normal
 * temperature: a nuisance), dangerous (no trip below the hazard limit) or no effect; detected or undetected by
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
  let context = "fault review";
  if (typeof trip !== "object" || trip === null) _invalidChoice("trip", trip, ["an object"], context);
  if (typeof trip.name !== "string") _invalidChoice("trip name", trip.name, ["a string"], context);
  context = `fault review (${trip.name})`;
  const maxNormal = _requireFinite(trip.maxNormalOperatingC, "maxNormalOperatingC", "°C", context);
  const hazard = _requireFinite(trip.hazardLimitC, "hazardLimitC", "°C", context);
  if (!(hazard > maxNormal)) _requireInRange(hazard, "hazardLimitC", maxNormal, Infinity, "°C", `${context} (must exceed maxNormalOperatingC)`);
  if (trip.tripTemperatureC !== undefined) _requireFinite(trip.tripTemperatureC, "tripTemperatureC", "°C", context);
  if (typeof options !== "object" || options === null) _invalidChoice("options", options, ["an object"], context);

  const bias = options.openCircuitBias ?? "none";
  if (!["pull-up", "pull-down", "none"].includes(bias)) _invalidChoice("openCircuitBias", bias, ["pull-up", "pull-down", "none"], context);
  const biasMv =
    options.openCircuitBiasMillivolts === undefined ? 1000 : _requireInRange(options.openCircuitBiasMillivolts, "openCircuitBiasMillivolts", 1e-3, 1e5, "mV", context);
  const rails = options.amplifierRailsVolts ?? { lowVolts: 0, highVolts: 5 };
  const railLow = _requireFinite(rails?.lowVolts, "amplifierRailsVolts.lowVolts", "V", context);
  const railHigh = _requireFinite(rails?.highVolts, "amplifierRailsVolts.highVolts", "V", context);
  if (!(railHigh > railLow)) _requireInRange(railHigh, "amplifierRailsVolts.highVolts", railLow, Infinity, "V", `${context} (must exceed lowVolts)`);
  const outputStage = options.outputStage ?? "energize-to-trip";
  if (outputStage !== "energize-to-trip" && outputStage !== "de-energize-to-trip") {
    _invalidChoice("outputStage", outputStage, ["energize-to-trip", "de-energize-to-trip"], context);
  }
  const tripLevel = options.comparatorTripLevel ?? "high";
  if (tripLevel !== "high" && tripLevel !== "low") _invalidChoice("comparatorTripLevel", tripLevel, ["high", "low"], context);
  const detection = checkDetection(options.detection, context);
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
  const tap = trip.tap ?? 0;

  const facts: _PlantFacts = {
    coldJunctionC,
    railLowVolts: railLow,
    railHighVolts: railHigh,
    tap,
    adcTripC: trip.tripTemperatureC,
    outputStage,
    shuntSupplyVolts: shuntSupply,
  };
  const healthy = _buildPlant(chain, facts, context);
  if (coldJunctionC < healthy.minC || hazard > healthy.maxC) {
    _requireInRange(coldJunctionC, "coldJunctionC", healthy.minC, healthy.maxC, "°C", context);
    _requireInRange(hazard, "hazardLimitC", healthy.minC, healthy.maxC, "°C", `${context} (type ${healthy.type} range)`);
  }
  if (!(hazard > coldJunctionC)) _requireInRange(hazard, "hazardLimitC", coldJunctionC, Infinity, "°C", `${context} (must exceed the cold junction)`);
  const fromC = coldJunctionC;
  const toC = Math.min(hazard + margin, healthy.maxC);
  const points: number[] = [];
  for (let k = 0; ; k++) {
    const t = fromC + k * step;
    if (t >= toC) {
      points.push(toC);
      break;
    }
    points.push(t);
  }

  // Second comparator threshold: the healthy amplifier output at its trip temperature.
  const second = detection.secondComparator;
  let secondVolts = Number.NaN;
  if (second !== undefined) {
    _requireInRange(second.thresholdC, "secondComparator.thresholdC", healthy.minC, healthy.maxC, "°C", context);
    secondVolts = _evaluateSignals(healthy, _emptyMods(), second.thresholdC).amplifierOutputVolts;
  }
  const sharesReference = second?.sharesReference ?? true;
  const evaluate = (plant: _Plant, mods: _Mods, t: number): Point => {
    const s = _evaluateSignals(plant, mods, t);
    let secondTripped = false;
    if (second !== undefined && s.boardPowered) {
      const thr = sharesReference && healthy.referenceVolts > 0 ? (secondVolts * s.referenceVolts) / healthy.referenceVolts : secondVolts;
      secondTripped = s.amplifierOutputVolts >= thr;
    }
    return { s, secondTripped, outputTripped: s.outputTripped || secondTripped };
  };

  const findTrip = (
    plant: _Plant,
    mods: _Mods,
    tripped: (p: Point) => boolean = (p) => p.outputTripped,
  ): { immediate: boolean; tripC: number | null; pts: Point[] } => {
    const pts: Point[] = [];
    let found = -1;
    for (let k = 0; k < points.length; k++) {
      const p = evaluate(plant, mods, points[k] as number);
      pts.push(p);
      if (found < 0 && tripped(p)) found = k;
    }
    if (found === 0) return { immediate: true, tripC: fromC, pts };
    if (found < 0) return { immediate: false, tripC: null, pts };
    let lo = points[found - 1] as number;
    let hi = points[found] as number;
    while (hi - lo > 1e-3) {
      const mid = (lo + hi) / 2;
      if (tripped(evaluate(plant, mods, mid))) hi = mid;
      else lo = mid;
    }
    return { immediate: false, tripC: hi, pts };
  };

  const healthyRun = findTrip(healthy, _emptyMods());
  if (healthyRun.immediate || healthyRun.tripC === null) {
    throw new HotjunctionRangeError({
      code: "INVALID_DESIGN",
      quantity: "healthy trip",
      value: healthyRun.immediate ? fromC : null,
      context,
      problem: healthyRun.immediate
        ? `is at the start of the sweep: the chain without faults is already tripped at the cold junction (${fmt(fromC)} °C)`
        : `is missing: the chain without faults does not trip up to ${fmt(toC)} °C`,
    });
  }
  const healthyTripC = healthyRun.tripC;
  // The supervisor compares the reading with the main detector's own healthy trip (a second comparator aside).
  const detectorTripC = second === undefined ? healthyTripC : (findTrip(healthy, _emptyMods(), (p) => p.s.detectorTripped).tripC ?? Infinity);

  const tol = detection.supervisoryReading?.toleranceC ?? 10;
  const window = detection.outOfRangeWindow as Record<string, number> | undefined;
  const flags = (p: Point, t: number): Set<FaultDetectionMethod> => {
    const out = new Set<FaultDetectionMethod>();
    const s = p.s;
    if (!s.boardPowered) return out;
    if (window !== undefined) {
      const v = "lowVolts" in window ? s.amplifierOutputVolts : s.readingC;
      const lo = ("lowVolts" in window ? window["lowVolts"] : window["lowC"]) as number;
      const hi = ("lowVolts" in window ? window["highVolts"] : window["highC"]) as number;
      if (v < lo || v > hi) out.add("out-of-range-window");
    }
    if (detection.openThermocoupleDetection === true && s.openThermocouple) out.add("open-thermocouple-detection");
    if (second !== undefined && p.secondTripped && !s.detectorTripped) out.add("second-comparator");
    const sv = detection.supervisoryReading;
    if (sv !== undefined) {
      const r = s.readingC;
      let f = (sv.plausibleLowC !== undefined && r < sv.plausibleLowC) || (sv.plausibleHighC !== undefined && r > sv.plausibleHighC);
      if (sv.checksDetector ?? true) f ||= (s.detectorTripped && r < detectorTripC - tol) || (!s.detectorTripped && r > detectorTripC + tol);
      if (sv.independentSensor === true) f ||= Math.abs(r - t) > tol;
      if (f) out.add("supervisory-reading");
    }
    return out;
  };
  const healthyFlags = healthyRun.pts.map((p, k) => flags(p, points[k] as number));
  const notes: string[] = [];
  for (const method of methodOrder) {
    const k = healthyFlags.findIndex((f, i) => f.has(method) && (points[i] as number) < hazard);
    if (k >= 0) {
      notes.push(
        `The ${detectionWords[method]} flags the healthy chain from ${fmt(points[k] as number)} °C; a fault counts as detected by it only where the healthy chain is not flagged.`,
      );
    }
  }

  const wireShortC = options.wireShortC ?? Math.round((coldJunctionC + healthyTripC) / 2);
  if (options.wireShortC !== undefined) _requireInRange(wireShortC, "wireShortC", healthy.minC, healthy.maxC, "°C", context);
  const resolveFacts: _ResolveFacts = {
    railLowVolts: railLow,
    railHighVolts: railHigh,
    openCircuitBias: bias,
    openCircuitBiasMillivolts: biasMv,
    wireShortC,
    coldJunctionC,
  };

  const base = options.faults ?? faultCatalogue(chain, { groundOffsetMillivolts: groundMv, referenceDriftFraction: drift, comparatorTripLevel: tripLevel });
  if (!Array.isArray(base)) _invalidChoice("faults", base, ["an array of faults"], context);
  const extra = options.extraFaults ?? [];
  if (!Array.isArray(extra)) _invalidChoice("extraFaults", extra, ["an array of faults"], context);
  const faults = [...base, ...extra].map((f, i) => _checkFault(f, `${context}, fault [${i}]`));
  const seen = new Set<string>();
  for (const f of faults) {
    if (seen.has(f.id)) throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: "fault id", value: f.id, context, problem: "is given twice" });
    seen.add(f.id);
  }

  const runAlternative = (fault: Fault, alt: _Alternative): AlternativeResult => {
    let plant = healthy;
    if (alt.chainTransforms.length > 0) {
      let c = chain;
      for (const tr of alt.chainTransforms) c = tr(c);
      plant = _buildPlant(c, facts, `${context}, fault ${fault.id}`);
    }
    for (const index of alt.mods.dividerStates.keys()) {
      const n = plant.dividerOhms?.length ?? 0;
      if (index >= n) _requireInRange(index, "divider resistor index", 0, n - 1, undefined, `${context}, fault ${fault.id}`);
    }
    if (alt.mods.shortAtC !== undefined) _requireInRange(alt.mods.shortAtC, "short temperature", plant.minC, plant.maxC, "°C", `${context}, fault ${fault.id}`);
    const run = findTrip(plant, alt.mods);
    const firstFlagC = new Map<FaultDetectionMethod, number>();
    run.pts.forEach((p, k) => {
      const t = points[k] as number;
      if (t >= hazard) return;
      for (const m of flags(p, t)) if (!healthyFlags[k]?.has(m) && !firstFlagC.has(m)) firstFlagC.set(m, t);
    });
    return { label: alt.label, immediate: run.immediate, tripC: run.tripC, firstFlagC };
  };

  const rows: FaultReviewRow[] = faults.map((fault) => {
    const results = _resolveFault(fault, resolveFacts).map((alt) => runAlternative(fault, alt));
    const key = (r: AlternativeResult): number => (r.immediate ? -Infinity : (r.tripC ?? Infinity));
    let worst = results[0] as AlternativeResult;
    for (const r of results) if (key(r) > key(worst)) worst = r;
    const detectedBy = methodOrder.filter((m) => results.every((r) => r.firstFlagC.has(m)));
    const tripC = worst.tripC;
    const shiftC = tripC === null ? null : tripC - healthyTripC;
    let effect: FaultTripEffect;
    if (worst.immediate) effect = "trips-immediately";
    else if (tripC === null) effect = "never-trips";
    else if (Math.abs(shiftC as number) <= noChange) effect = "no-change";
    else effect = (shiftC as number) < 0 ? "trips-early" : "trips-late";
    const safety: FaultSafety =
      tripC === null || tripC >= hazard ? "dangerous" : worst.immediate || tripC <= maxNormal ? "safe" : "no-effect";
    const detected = detectedBy.length > 0;
    const category: FaultCategory = safety === "no-effect" ? "no-effect" : `${safety}-${detected ? "detected" : "undetected"}`;

    let effectText: string;
    switch (effect) {
      case "trips-immediately":
        effectText = `trips immediately (already tripped at ${fmt(fromC)} °C, the start of the sweep)`;
        break;
      case "never-trips":
        effectText = `never trips up to ${fmt(toC)} °C`;
        break;
      case "no-change":
        effectText = `no change (trip moves ${fmt(shiftC as number)} °C)`;
        break;
      default: {
        const by = Math.abs(shiftC as number);
        effectText = `trips ${effect === "trips-early" ? "early" : "late"} by ${fmt(by)} °C, at ${fmt(tripC as number)} °C`;
        if ((tripC as number) <= maxNormal) effectText += " (within normal operation: a nuisance trip)";
        else if ((tripC as number) >= hazard) effectText += " (at or above the hazard limit)";
      }
    }
    if (worst.label !== undefined && results.length > 1) effectText += ` [worst case: ${worst.label}]`;
    const detectionText = detected
      ? detectedBy
          .map((m) => `${detectionWords[m]} (from ${fmt(worst.firstFlagC.get(m) ?? (results[0] as AlternativeResult).firstFlagC.get(m) as number)} °C)`)
          .join("; ")
      : "not detected";
    const mitigations: string[] = [];
    if (safety !== "no-effect") {
      if (fault.mitigation !== undefined) mitigations.push(fault.mitigation);
      else if (!detected) mitigations.push("a window comparator or supervisory reading that tells this fault from normal operation");
      if (safety === "dangerous") mitigations.push("an independent, non-resettable thermal cutoff");
    }
    return {
      faultId: fault.id,
      element: fault.element,
      description: fault.description,
      effect,
      tripC,
      shiftC,
      effectText,
      safety,
      detected,
      detectedBy,
      detectionText,
      category,
      ...(worst.label !== undefined && results.length > 1 ? { decidingAlternative: worst.label } : {}),
      mitigations,
    };
  });

  notes.unshift(
    `Cold junction held at ${fmt(coldJunctionC)} °C; hot junction swept from ${fmt(fromC)} to ${fmt(toC)} °C in ${step} °C steps (trips refined to 0.001 °C); every error source at its nominal value.`,
    `Healthy trip of the modelled chain: ${fmt(healthyTripC)} °C${trip.tripTemperatureC !== undefined ? ` (intended ${fmt(trip.tripTemperatureC)} °C)` : ""}; normal operation up to ${fmt(maxNormal)} °C, hazard limit ${fmt(hazard)} °C.`,
    bias === "none"
      ? "Open-circuit bias: none stated, so an open thermocouple input is taken as floating (up, near zero or down; the worst counts)."
      : `Open-circuit bias: ${bias} (an open input is driven ${bias === "pull-up" ? "up" : "down"} by ${biasMv} mV).`,
    `Output stage: ${outputStage}${options.outputStage === undefined ? " (assumed; state it if the design de-energises to trip)" : ""}.`,
  );

  return {
    name: trip.name,
    healthyTripC,
    maxNormalOperatingC: maxNormal,
    hazardLimitC: hazard,
    coldJunctionC,
    sweep: { fromC, toC, stepC: step },
    context: {
      openCircuitBias: bias,
      openCircuitBiasMillivolts: biasMv,
      amplifierRailsVolts: { lowVolts: railLow, highVolts: railHigh },
      outputStage,
      comparatorTripLevel: tripLevel,
      detection,
      wireShortC,
      groundOffsetMillivolts: groundMv,
      referenceDriftFraction: drift,
    },
    rows,
    counts: _countCategories(rows),
    notes,
  };
}

/** @internal Counts rows per category. */
export function _countCategories(rows: readonly { readonly category: FaultCategory }[]): FaultCategoryCounts {
  const c = { safeDetected: 0, safeUndetected: 0, dangerousDetected: 0, dangerousUndetected: 0, noEffect: 0, total: rows.length };
  for (const r of rows) {
    if (r.category === "safe-detected") c.safeDetected++;
    else if (r.category === "safe-undetected") c.safeUndetected++;
    else if (r.category === "dangerous-detected") c.dangerousDetected++;
    else if (r.category === "dangerous-undetected") c.dangerousUndetected++;
    else c.noEffect++;
  }
  return c;
}
