/**
 * Over-temperature trip design: thresholds from standard resistors, trip bands by worst case, RSS and
 * Monte Carlo, and margins to the process limits.
 * @module
 */
import { CAUTION_TEXT } from "../caution.js";
import { midRailDivider } from "./midRailDivider.js";
import { _invalidChoice, _requireFinite, _requireOptionsObject, _requireWorkWithin, HotjunctionRangeError } from "../errors.js";
import { _maxModelEvaluations } from "../uncertainty/_propagateMonteCarlo.js";
import type { DividerElement, MeasurementChain, ReferenceElement } from "../chain/types.js";
import { _worstCaseBracketFrom, propagate } from "../uncertainty/propagate.js";
import { rectangular } from "../uncertainty/rectangular.js";
import { _enclosureGapToleranceC, _propagationMethods, type Distribution, type Model } from "../uncertainty/types.js";
import { ageingBandAt } from "../chain/wire/probe.js";
import type { PropagationMethod, PropagationResult } from "../uncertainty/types.js";
import { _realizeReference } from "./realizeReference.js";
import { selectDividerPair } from "./selectDividerPair.js";
import { selectLadder } from "./selectLadder.js";
import { _comparatorBuildSheet, resistorDesignator } from "./buildSheet.js";
import { _rssCoverageFactor, _selfConsistentEdge } from "./_bandRules.js";
import { _requireSeries } from "./standardResistorValues.js";
import {
  type _TripModel,
  _comparatorTripModel,
  _compileComparatorChain,
  _edgeMillivolts,
  _nominalSignalVolts,
  _nominalSwitchingC,
} from "../chain/tripTemperatureModel.js";
import type { _CompiledChain, _PrebuiltStages } from "../chain/_compileChain.js";
// Deliberately alike: the trip barrel (trip/index.ts) lists the same type names to export them.
import type {
  ProcessLimits,
  ReferenceOption,
  SetpointTripResult,
  ThresholdNetwork,
  TripBand,
  TripDesign,
  TripDesignResult,
  TripErrorSource,
  TripServicePoint,
} from "./types.js";

/** Options of {@link designTrip}. */
export interface DesignTripOptions {
  /** Band that decides pass/fail. Default `"worst-case"` (the only one that bounds every unit built). */
  readonly acceptanceMethod?: PropagationMethod;
  /** Coverage probability of the RSS and Monte Carlo bands, in (0, 1). Default 0.95. */
  readonly coverage?: number;
  /** Monte Carlo trials per setpoint, integer ≥ 1/(1 − coverage). Default 100 000. */
  readonly monteCarloTrials?: number;
  /** Monte Carlo seed, integer 0 … 2³² − 1 (recorded in the result). Default 1. */
  readonly seed?: number;
  /** Worst case: coverage at which inputs overridden to normal are bounded (±k·u). Default 0.9973 (k = 3). */
  readonly normalBoundCoverage?: number;
  /**
   * Use these threshold networks instead of searching (to evaluate a built board, or to compare references
   * on the same resistors): either one two-resistor network per setpoint (input order) or one ladder of
   * N + 1 resistors (taps assigned by threshold, highest first).
   */
  readonly networks?: readonly ThresholdNetwork[];
  /** Called now and then with the fraction of the Monte Carlo work done (0–1), for a progress display. */
  readonly onProgress?: (fractionDone: number) => void;
}

const methods: readonly PropagationMethod[] = _propagationMethods;

/** Nominal voltage of a reference option, V. */
function optionVolts(option: ReferenceOption): number {
  const volts = option?.kind === "ideal" ? option.nominalVolts : option?.element?.nominalVolts;
  const v = _requireFinite(volts, "reference nominalVolts", "V", "trip design");
  if (!(v > 0)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "reference nominalVolts", value: v, min: 0, unit: "V", context: "trip design", problem: "is not positive" });
  }
  return v;
}

function designError(quantity: string, value: unknown, problem: string): never {
  throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity, value, context: "trip design", problem });
}

function fmt(x: number): string {
  return x.toFixed(1);
}

/** Resistance bounds of the divider from the ohm and current bounds, Ω. */
function totalBounds(design: TripDesign, volts: number): { minTotalOhms: number; maxTotalOhms: number } {
  const r = design.resistors;
  let minTotalOhms = r.minTotalOhms ?? 1000;
  let maxTotalOhms = r.maxTotalOhms ?? 1e6;
  // R = V / I; currents in mA.
  if (r.maxDividerCurrentMilliamps !== undefined) {
    const i = _requireFinite(r.maxDividerCurrentMilliamps, "maxDividerCurrentMilliamps", "mA", "trip design");
    if (!(i > 0)) designError("maxDividerCurrentMilliamps", i, "is not positive");
    minTotalOhms = Math.max(minTotalOhms, (volts / i) * 1000);
  }
  if (r.minDividerCurrentMilliamps !== undefined) {
    const i = _requireFinite(r.minDividerCurrentMilliamps, "minDividerCurrentMilliamps", "mA", "trip design");
    if (!(i > 0)) designError("minDividerCurrentMilliamps", i, "is not positive");
    maxTotalOhms = Math.min(maxTotalOhms, (volts / i) * 1000);
  }
  if (!(maxTotalOhms >= minTotalOhms)) {
    designError("divider resistance bounds", [minTotalOhms, maxTotalOhms], `are empty (${minTotalOhms} Ω to ${maxTotalOhms} Ω after the current bounds)`);
  }
  return { minTotalOhms, maxTotalOhms };
}

/** A compiled comparator chain of the design and the cold-junction temperature thresholds are designed at. */
interface TripChain {
  readonly compiled: _CompiledChain;
  readonly designColdJunctionC: number;
}

/** Builds and compiles the comparator chain of a design with a given reference and divider. */
function buildTripChain(
  design: TripDesign,
  reference: ReferenceElement,
  divider: DividerElement | undefined,
  prebuilt?: _PrebuiltStages,
): TripChain {
  const chain: MeasurementChain = {
    thermocouple: design.thermocouple,
    ...(design.coldJunction !== undefined ? { coldJunction: design.coldJunction } : {}),
    ...(design.amplifier !== undefined ? { amplifier: design.amplifier } : {}),
    reference,
    ...(divider !== undefined ? { divider } : {}),
    detector: design.comparator,
    ambient: design.ambient,
    ...(design.wire !== undefined ? { wire: design.wire } : {}),
    ...(design.sourceDistributions !== undefined ? { sourceDistributions: design.sourceDistributions } : {}),
    ...(design.name !== undefined ? { label: design.name } : {}),
  };
  const compiled = _compileComparatorChain(chain, "trip design", prebuilt);
  // Without an ambient span the chain holds the cold junction at the single ambient value.
  const designColdJunctionC = compiled.hasAmbientInput ? (design.designColdJunctionC ?? compiled.ambientCenterC) : design.ambient.minC;
  return { compiled, designColdJunctionC };
}

interface SetpointPlan {
  readonly name: string;
  readonly tripC: number;
  readonly limits: ProcessLimits;
  readonly idealThresholdVolts: number;
  readonly idealRatio: number;
  /** Nominal signal slope at the setpoint, V/°C. */
  readonly slopeVoltsPerC: number;
}

function checkLimits(design: TripDesign): { name: string; tripC: number; limits: ProcessLimits }[] {
  if (!Array.isArray(design.setpoints) || design.setpoints.length === 0) {
    designError("setpoints", design.setpoints, "must be a non-empty array");
  }
  return design.setpoints.map((sp, i) => {
    const context = `trip design, setpoint ${i}`;
    if (typeof sp?.name !== "string") designError(`setpoint ${i} name`, sp?.name, "is not a string");
    const tripC = _requireFinite(sp.tripTemperatureC, "tripTemperatureC", "°C", context);
    const maxNormal = _requireFinite(sp.maxNormalOperatingC ?? design.processLimits?.maxNormalOperatingC, "maxNormalOperatingC", "°C", context);
    const hazard = _requireFinite(sp.hazardLimitC ?? design.processLimits?.hazardLimitC, "hazardLimitC", "°C", context);
    if (!(hazard > maxNormal)) {
      throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "hazardLimitC", value: hazard, min: maxNormal, unit: "°C", context, problem: "is not above the highest normal operating temperature" });
    }
    return { name: sp.name, tripC, limits: { maxNormalOperatingC: maxNormal, hazardLimitC: hazard } };
  });
}

/** The result of "propagating" through a model with no uncertain input: its one value, zero width. */
function pointResult(model: (x: Readonly<Record<string, number>>) => number, seed: number, coverage: number) {
  const value = model({});
  return (method: PropagationMethod): PropagationResult => ({
    method,
    estimate: value,
    standardUncertainty: 0,
    interval: [value, value],
    coverage: method === "worst-case" ? 1 : coverage,
    contributions: {},
    ...(method === "monte-carlo" ? { trials: 0, seed } : {}),
    note: "no error source is non-zero: the band is the nominal value",
  });
}

/**
 * A key that is equal exactly when two input records hold the same names (in the same order) and the same
 * distributions to the last bit (`String` of a double round-trips; −0 kept apart from 0).
 */
function inputsKey(inputs: Readonly<Record<string, Distribution>>): string {
  const parts: string[] = [];
  const num = (v: number | undefined): string => (v === undefined ? "u" : Object.is(v, -0) ? "-0" : String(v));
  for (const [name, d] of Object.entries(inputs)) {
    parts.push(name, d.kind, num(d.mean), num(d.standardUncertainty), num(d.halfWidth), num(d.beta), num(d.degreesOfFreedom));
  }
  return JSON.stringify(parts);
}

/** What a self-consistent edge reads of a worst case: the band and its enclosure. */
type EdgeBracket = Pick<PropagationResult, "interval" | "enclosure">;

/**
 * The worst case of a comparator edge with the thermocouple tolerance taken at a temperature, remembered by
 * the inputs it gives: the self-consistent edges call it again and again (both edges start at the setpoint, and
 * where the tolerance does not change with temperature every step gives the same inputs), and the model depends
 * on the temperature only through the inputs, so an equal record gives the same result bit for bit. `full(t)` is
 * the whole worst case (contributions included); `bracket(t)` after it is warm-started from the first full result's
 * attained points (only the tolerance's bounds move between steps) and proven by the enclosure, or else the whole
 * worst case again.
 */
function worstCaseAtTolerance(
  tc: TripChain,
  tap: number,
  edge: "trip" | "release",
  seed: number,
  coverage: number,
  normalBoundCoverage: number,
): { full: (toleranceAtC: number) => PropagationResult; bracket: (toleranceAtC: number) => EdgeBracket } {
  const known = new Map<string, EdgeBracket>();
  const fullKnown = new Map<string, PropagationResult>();
  let first: { inputs: Readonly<Record<string, Distribution>>; result: PropagationResult } | undefined;
  const full = (toleranceAtC: number): PropagationResult => {
    const m = _comparatorTripModel(tc.compiled, tap, edge, toleranceAtC);
    if (Object.keys(m.inputs).length === 0) return worstCaseOf(m, seed, coverage, normalBoundCoverage);
    const key = inputsKey(m.inputs);
    let result = fullKnown.get(key);
    if (result === undefined) {
      result = worstCaseOf(m, seed, coverage, normalBoundCoverage);
      fullKnown.set(key, result);
      known.set(key, result);
    }
    first ??= { inputs: m.inputs, result };
    return result;
  };
  const bracket = (toleranceAtC: number): EdgeBracket => {
    const m = _comparatorTripModel(tc.compiled, tap, edge, toleranceAtC);
    if (first === undefined || m.enclosure === undefined || Object.keys(m.inputs).length === 0) return full(toleranceAtC);
    const key = inputsKey(m.inputs);
    let result = known.get(key);
    if (result === undefined) {
      result = _worstCaseBracketFrom(m.model as Model, m.inputs, normalBoundCoverage, m.enclosure, first) ?? full(toleranceAtC);
      known.set(key, result);
    }
    return result;
  };
  return { full, bracket };
}

/** Worst case of a trip model, with its interval enclosure (a bracket whose gap closes, see chain/_tripEnclosure.ts). */
function worstCaseOf(m: _TripModel, seed: number, coverage: number, normalBoundCoverage: number): PropagationResult {
  if (Object.keys(m.inputs).length === 0) return pointResult(m.model, seed, coverage)("worst-case");
  return propagate(m.model, m.inputs, { method: "worst-case", normalBoundCoverage, modelEnclosure: m.enclosure });
}

export { _enclosureGapToleranceC };

/** The bracket fields of a worst-case band from the results its low and high edges were read from. */
function bracketOf(low: EdgeBracket, high: EdgeBracket): Partial<TripBand> {
  if (low.enclosure === undefined || high.enclosure === undefined) return {};
  return {
    enclosureLowC: low.enclosure[0],
    enclosureHighC: high.enclosure[1],
    enclosureGapLowC: low.interval[0] - low.enclosure[0],
    enclosureGapHighC: high.enclosure[1] - high.interval[1],
    enclosureGapToleranceC: _enclosureGapToleranceC,
  };
}

function band(method: PropagationMethod, r: PropagationResult): TripBand {
  for (const value of [r.interval[0], r.interval[1], r.standardUncertainty]) {
    if (!Number.isFinite(value)) {
      throw new HotjunctionRangeError({ code: "MODEL_NOT_FINITE", quantity: `${method} trip band`, value, context: "trip design", problem: "is not finite (a tolerance too small for numerical differentiation?)" });
    }
  }
  return {
    method,
    lowC: r.interval[0],
    highC: r.interval[1],
    coverage: r.coverage,
    standardUncertaintyC: r.standardUncertainty,
    ...(r.trials !== undefined ? { trials: r.trials } : {}),
    ...(r.seed !== undefined ? { seed: r.seed } : {}),
  };
}

/** A chain source description with the divider resistor named by its position ("resistor 2 (…)" → "bottom resistor (…)"). */
function positionDescription(description: string, net: ThresholdNetwork, networkIndex: number, networkCount: number): string {
  return description.replace(/^resistor (\d+) /, (_m, n: string) => `${resistorDesignator(Number(n) - 1, net.resistorsOhms.length, networkIndex, networkCount)} resistor `);
}

/** The sentence that explains a verdict. */
function reasonFor(name: string, b: TripBand, limits: ProcessLimits, label: string): { pass: boolean; reason: string } {
  const low = b.lowC - limits.maxNormalOperatingC;
  const high = limits.hazardLimitC - b.highC;
  const where = `Setpoint "${name}" trips between ${fmt(b.lowC)} and ${fmt(b.highC)} °C (${label})`;
  if (low > 0 && high > 0) {
    return {
      pass: true,
      reason: `${where}: ${fmt(low)} °C above the highest normal operating temperature ${limits.maxNormalOperatingC} °C and ${fmt(high)} °C below the hazard limit ${limits.hazardLimitC} °C.`,
    };
  }
  const problems: string[] = [];
  if (!(low > 0)) problems.push(`it can trip ${fmt(-low)} °C at or below the highest normal operating temperature ${limits.maxNormalOperatingC} °C (nuisance trips)`);
  if (!(high > 0)) problems.push(`it can fail to trip until ${fmt(-high)} °C at or beyond the hazard limit ${limits.hazardLimitC} °C`);
  return { pass: false, reason: `${where}: ${problems.join(", and ")}.` };
}

/**
 * The worst-case trip band at five times in service (0, ¼, ½, ¾ and the whole service life): the probe's
 * ageing source is replaced by its band at that time (linear accumulation, `ageingBandAt`); undefined
 * without an ageing drift. The setpoint model's enclosure serves every time (a source left out is enclosed at 0,
 * as the model reads it).
 */
function serviceBands(
  design: TripDesign,
  model: (x: Readonly<Record<string, number>>) => number,
  inputs: Readonly<Record<string, Distribution>>,
  normalBoundCoverage: number,
  enclosure: _TripModel["enclosure"],
): TripServicePoint[] | undefined {
  const ageing = design.wire?.ageing;
  if (ageing === undefined || inputs["probe.ageing"] === undefined) return undefined;
  const out: TripServicePoint[] = [];
  for (const f of [0, 0.25, 0.5, 0.75, 1]) {
    const at = ageingBandAt(ageing, f * ageing.serviceHours);
    const rest: Record<string, Distribution> = { ...inputs };
    delete rest["probe.ageing"];
    if (at.highC > at.lowC) rest["probe.ageing"] = rectangular({ lower: at.lowC, upper: at.highC });
    const r =
      Object.keys(rest).length === 0
        ? { interval: [model({}), model({})] as const }
        : propagate(model, rest, { method: "worst-case", normalBoundCoverage, ...(enclosure !== undefined ? { modelEnclosure: enclosure } : {}) });
    out.push({ hours: at.hours, lowC: r.interval[0], highC: r.interval[1] });
  }
  return out;
}

/** Resolves the threshold networks (searched, or given) and where each setpoint sits in them. */
function planNetworks(
  design: TripDesign,
  plans: readonly SetpointPlan[],
  volts: number,
  given: readonly ThresholdNetwork[] | undefined,
): { networks: ThresholdNetwork[]; place: { network: number; tap: number }[]; notes: string[] } {
  const series = _requireSeries(design.resistors.series, "trip design");
  const topology = design.resistors.topology ?? "separate";
  if (topology !== "separate" && topology !== "ladder") _invalidChoice("resistors.topology", topology, ["separate", "ladder"], "trip design");
  const network = (resistorsOhms: readonly number[], topologyName: ThresholdNetwork["topology"]): ThresholdNetwork => {
    const totalOhms = resistorsOhms.reduce((a, b) => a + b, 0);
    return { topology: topologyName, resistorsOhms: [...resistorsOhms], totalOhms, currentMilliamps: (volts / totalOhms) * 1000 };
  };
  // Taps of a ladder by threshold, highest first.
  const byThreshold = plans.map((_, i) => i).sort((a, b) => (plans[b] as SetpointPlan).idealRatio - (plans[a] as SetpointPlan).idealRatio);
  if (given !== undefined) {
    if (!Array.isArray(given)) designError("networks", given, "is not an array");
    if (given.length === plans.length && given.every((n) => n?.resistorsOhms?.length === 2)) {
      return {
        networks: given.map((n) => network(n.resistorsOhms, "two-resistor")),
        place: plans.map((_, i) => ({ network: i, tap: 0 })),
        notes: ["Threshold networks were given, not searched."],
      };
    }
    if (given.length === 1 && given[0]?.resistorsOhms?.length === plans.length + 1) {
      const place = new Array<{ network: number; tap: number }>(plans.length);
      byThreshold.forEach((sp, t) => (place[sp] = { network: 0, tap: t }));
      return { networks: [network(given[0].resistorsOhms, "ladder")], place, notes: ["The threshold ladder was given, not searched."] };
    }
    designError("networks", given, `must be ${plans.length} two-resistor networks or one ladder of ${plans.length + 1} resistors`);
  }
  const bounds = totalBounds(design, volts);
  // Error of a realized ratio in °C of trip temperature, through the chain's local slope at the setpoint.
  const errorOf = (plan: SetpointPlan) => (ratio: number) => ((ratio - plan.idealRatio) * volts) / plan.slopeVoltsPerC;
  if (topology === "separate") {
    const networks = plans.map((plan) => {
      const pair = selectDividerPair(plan.idealRatio, { series, ...bounds, errorOfRatio: errorOf(plan) });
      return network([pair.topOhms, pair.bottomOhms], "two-resistor");
    });
    return {
      networks,
      place: plans.map((_, i) => ({ network: i, tap: 0 })),
      notes: [
        `Each threshold is a two-resistor ${series} divider found by an exhaustive search (for every top resistor, the two standard neighbours of the ideal bottom resistor) minimising the trip-temperature error through the chain's local slope, total ${bounds.minTotalOhms} to ${bounds.maxTotalOhms} Ω.`,
      ],
    };
  }
  const ladder = selectLadder(
    plans.map((p) => p.idealRatio),
    { series, ...bounds, errorOfRatio: (tap, ratio) => errorOf(plans[tap] as SetpointPlan)(ratio) },
  );
  return {
    networks: [network(ladder.resistorsOhms, "ladder")],
    place: plans.map((_, i) => ({ network: 0, tap: ladder.tapBelowResistor[i] as number })),
    notes: [
      `The thresholds are taps of one ${series} ladder: for each bottom resistor a greedy build to the nearest standard value of each cumulative ideal, then single-resistor moves lowering the largest tap error; ${ladder.startsTried} starts tried (a very good string, not a proven optimum).`,
    ],
  };
}

/**
 * Designs an over-temperature trip: for each setpoint, the ideal threshold voltage (the nominal chain's
 * signal at the trip temperature, less the comparator's hysteresis placement), standard resistors for it
 * (exhaustive two-resistor search, or one multi-tap ladder), the realized nominal trip and release
 * temperatures, the trip band by worst case, RSS and Monte Carlo through `propagate` (every chain error
 * source: thermocouple tolerance at the setpoint, cold junction anywhere in the ambient range, amplifier,
 * reference, each divider resistor, comparator offset), and the margins: the band's low end must lie above
 * the highest normal operating temperature (no nuisance trip) and its high end below the hazard limit. The
 * band of `acceptanceMethod` (default worst case) decides pass or fail; `reason` says why in one sentence.
 * Numbers do not certify a safety function: keep an independent, non-resettable thermal cutoff.
 * @param design - the {@link TripDesign} (chain elements as in `chain/`, °C, V, Ω, mA)
 * @param options - {@link DesignTripOptions}: acceptance method, coverage (0, 1), Monte Carlo trials and seed,
 *   given networks
 * @returns {@link TripDesignResult}: networks, reference realization, one result per setpoint (°C, V)
 * @throws HotjunctionRangeError (code `INVALID_DESIGN`) for a threshold outside the reference's reach, empty
 *   resistance bounds, missing process limits or a chain that cannot serve a comparator; errors of the chain
 *   and propagation engines for malformed elements or options
 * @example
 * ```ts
 * import { designTrip } from "hotjunction";
 * // Heated enclosure: type K, 5 mV/°C fixed-scale amplifier, threshold from a 2.5 V series reference.
 * const result = designTrip({
 *   setpoints: [{ name: "enclosure", tripTemperatureC: 120, maxNormalOperatingC: 100, hazardLimitC: 140 }],
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5, accuracyC: 2 },
 *   comparator: { kind: "comparator", offsetMillivolts: 5, hysteresisMillivolts: 20, hysteresisPlacement: "below" },
 *   reference: { kind: "element", name: "2.5 V series reference", element: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.002 } },
 *   resistors: { series: "E96", toleranceFraction: 0.01, minTotalOhms: 10000, maxTotalOhms: 100000 },
 *   ambient: { minC: 15, maxC: 35 },
 * }, { monteCarloTrials: 2000 });
 * const sp = result.setpoints[0]!;
 * console.log(sp.idealThresholdVolts.toFixed(3), sp.resistorsOhms.join("/")); // 0.615 10200/3320
 * console.log(sp.pass, sp.nominalReleaseC.toFixed(1)); // true 115.9
 * ```
 */
/** @internal Everything of a trip design before propagation: plans, networks, the realized reference, chains. */
interface _TripPlan {
  readonly setpoints: { name: string; tripC: number; limits: ProcessLimits }[];
  readonly volts: number;
  readonly resistorTolerance: number;
  readonly plans: SetpointPlan[];
  readonly networks: ThresholdNetwork[];
  readonly place: { network: number; tap: number }[];
  readonly notes: string[];
  readonly realized: ReturnType<typeof _realizeReference>;
  readonly chains: TripChain[];
}

function planTrip(design: TripDesign, given: readonly ThresholdNetwork[] | undefined): _TripPlan {
  const setpoints = checkLimits(design);
  const volts = optionVolts(design.reference);
  const resistorTolerance = _requireFinite(design.resistors?.toleranceFraction, "resistors.toleranceFraction", "", "trip design");

  // The signal path alone, with an error-free reference and no divider, gives the ideal thresholds.
  const probe = buildTripChain(design, { kind: "reference", variant: "series", nominalVolts: volts, initialAccuracyFraction: 0 }, undefined);
  const tripEdgeVolts = _edgeMillivolts(probe.compiled, "trip") / 1000;
  const signalVolts = (hotJunctionC: number): number => _nominalSignalVolts(probe.compiled, hotJunctionC, probe.designColdJunctionC);
  const plans: SetpointPlan[] = setpoints.map((sp) => {
    const idealThresholdVolts = signalVolts(sp.tripC) - tripEdgeVolts;
    const idealRatio = idealThresholdVolts / volts;
    if (!(idealRatio > 0 && idealRatio < 1)) {
      throw new HotjunctionRangeError({
        code: "INVALID_DESIGN",
        quantity: `threshold of setpoint "${sp.name}"`,
        value: idealThresholdVolts,
        min: 0,
        max: volts,
        unit: "V",
        context: "trip design",
        problem: "is not within the reference voltage, so no divider can make it",
      });
    }
    const stepC = 0.05;
    const slopeVoltsPerC = (signalVolts(sp.tripC + stepC) - signalVolts(sp.tripC - stepC)) / (2 * stepC);
    if (!(slopeVoltsPerC > 0)) designError(`signal slope at setpoint "${sp.name}"`, slopeVoltsPerC, "is not positive; the comparator needs a rising signal");
    return { ...sp, idealThresholdVolts, idealRatio, slopeVoltsPerC };
  });

  const { networks, place, notes } = planNetworks(design, plans, volts, given);
  const dividerCurrentMilliamps = networks.reduce((sum, n) => sum + n.currentMilliamps, 0);
  // The reference's sources are computed once, here, and every threshold network's chain reuses them.
  const realized = _realizeReference(
    design.reference,
    design.ambient,
    { dividerCurrentMilliamps, resistorSeries: design.resistors.series, resistorToleranceFraction: resistorTolerance },
    { overrides: design.sourceDistributions },
  );

  const chains: TripChain[] = networks.map((n) => {
    const divider: DividerElement = {
      kind: "divider",
      resistorsOhms: n.resistorsOhms,
      toleranceFraction: resistorTolerance,
      ...(design.resistors.tempcoPpmPerC !== undefined ? { tempcoPpmPerC: design.resistors.tempcoPpmPerC } : {}),
      ...(design.resistors.matched !== undefined ? { matched: design.resistors.matched } : {}),
    };
    return buildTripChain(design, realized.element, divider, { reference: realized.stage });
  });

  return { setpoints, volts, resistorTolerance, plans, networks, place, notes, realized, chains };
}

/**
 * @internal The model and inputs {@link designTrip} gives Monte Carlo at setpoint `index` (the thermocouple
 * tolerance at the setpoint), rebuilt from the design (and the networks designTrip was given): the same chain and model, so a worker
 * that calls this draws the same outputs. `inputs` is empty for an error-free chain (no Monte Carlo run).
 */
export function _setpointMonteCarloModel(
  design: TripDesign,
  index: number,
  networks: readonly ThresholdNetwork[] | undefined,
): Pick<ReturnType<typeof _comparatorTripModel>, "model" | "inputs"> {
  const all = _setpointMonteCarloModels(design, networks);
  const one = all[index];
  if (one === undefined) designError("setpoint index", index, `is not an index of the ${all.length} setpoints`);
  return one;
}

/** @internal {@link _setpointMonteCarloModel} for every setpoint, from one plan of the design. */
export function _setpointMonteCarloModels(
  design: TripDesign,
  networks: readonly ThresholdNetwork[] | undefined,
): Pick<ReturnType<typeof _comparatorTripModel>, "model" | "inputs">[] {
  if (typeof design !== "object" || design === null) designError("design", design, "is not an object");
  const { plans, place, chains } = planTrip(design, networks);
  return plans.map((plan, i) => {
    const { network, tap } = place[i] as { network: number; tap: number };
    const { model, inputs } = _comparatorTripModel((chains[network] as TripChain).compiled, tap, "trip", plan.tripC);
    return { model, inputs };
  });
}

/** @internal designTrip's checks of its arguments before any planning: the design object, the options, the work cap, the acceptance method. */
export function _checkTripArguments(design: TripDesign, options: DesignTripOptions): void {
  if (typeof design !== "object" || design === null) designError("design", design, "is not an object");
  _requireOptionsObject(options, "designTrip", true);
  if (Array.isArray(design.setpoints) && typeof options.monteCarloTrials === "number") {
    _requireWorkWithin({ setpoints: design.setpoints.length, trials: options.monteCarloTrials }, _maxModelEvaluations, "designTrip");
  }
  const acceptanceMethod = options.acceptanceMethod ?? "worst-case";
  if (!methods.includes(acceptanceMethod)) _invalidChoice("acceptanceMethod", acceptanceMethod, methods, "designTrip");
}

/**
 * @internal The reference element a comparator design uses once realized (a shunt's series resistor sized for
 * the threshold networks the design finds): the chain `sweep` evaluates.
 */
export function _realizedTripReference(design: TripDesign): ReferenceElement {
  if (typeof design !== "object" || design === null) designError("design", design, "is not an object");
  return planTrip(design, undefined).realized.element;
}

/**
 * Designs the thresholds of an over-temperature trip: standard resistor values per setpoint (or one ladder),
 * nominal trip and release, trip bands by worst case, RSS and Monte Carlo, margins, the build sheet and the caution.
 * @param design - the trip design (setpoints, chain elements, reference, resistors, ambient)
 * @param options - propagation options (trials, seed, acceptance method, progress)
 * @returns the per-setpoint results, networks, reference realization, build sheet and notes
 * @throws HotjunctionRangeError / HotjunctionTypeError for an invalid design; `OUT_OF_RANGE` when setpoints ×
 *   Monte Carlo trials exceed 10⁹ model evaluations
 */
export function designTrip(design: TripDesign, options: DesignTripOptions = {}): TripDesignResult {
  return _designTripWith(design, options, undefined);
}

/**
 * @internal {@link designTrip} with each setpoint's Monte Carlo result given (computed elsewhere from
 * {@link _setpointMonteCarloModel}'s model and inputs with the same options, e.g. on worker threads); an
 * undefined entry is computed here.
 */
export function _designTripWith(
  design: TripDesign,
  options: DesignTripOptions,
  monteCarlo: readonly (PropagationResult | undefined)[] | undefined,
): TripDesignResult {
  _checkTripArguments(design, options);
  const acceptanceMethod = options.acceptanceMethod ?? "worst-case";
  const coverage = options.coverage ?? 0.95;
  const trials = options.monteCarloTrials ?? 100_000;
  const seed = options.seed ?? 1;
  const normalBoundCoverage = options.normalBoundCoverage ?? 0.9973;
  const { volts, resistorTolerance, plans, networks, place, notes, realized, chains } = planTrip(design, options.networks);
  let thermocoupleToleranceC = 0;
  const results: SetpointTripResult[] = plans.map((plan, i) => {
    const { network: networkIndex, tap } = place[i] as { network: number; tap: number };
    const tc = chains[networkIndex] as TripChain;
    const net = networks[networkIndex] as ThresholdNetwork;
    const above = net.resistorsOhms.slice(0, tap + 1).reduce((a, b) => a + b, 0);
    const below = net.totalOhms - above;
    const realizedRatio = below / net.totalOhms;
    const nominalTripC = _nominalSwitchingC(tc.compiled, tap, "trip", tc.designColdJunctionC);
    const nominalReleaseC = _nominalSwitchingC(tc.compiled, tap, "release", tc.designColdJunctionC);
    // RSS and Monte Carlo take the thermocouple tolerance at the setpoint; the worst case at the temperature each
    // band edge lands on (self-consistent, see _selfConsistentEdge).
    const { model, inputs, sources, enclosure } = _comparatorTripModel(tc.compiled, tap, "trip", plan.tripC);
    const onProgress = options.onProgress;
    // A chain with every error source at zero (an ideal design) has nothing to propagate: its band is the
    // nominal trip itself, by every method.
    const exact = Object.keys(inputs).length === 0 ? pointResult(model, seed, coverage) : undefined;
    const worstAt = worstCaseAtTolerance(tc, tap, "trip", seed, coverage, normalBoundCoverage);
    const worstAtSetpoint = exact?.("worst-case") ?? worstAt.full(plan.tripC);
    // Each edge keeps the result it was read from: its bracket (attained, enclosure, gap) is that edge's.
    let atHigh: EdgeBracket = worstAtSetpoint;
    let atLow: EdgeBracket = worstAtSetpoint;
    const highEdge = _selfConsistentEdge((t) => (atHigh = worstAt.bracket(t)).interval[1], plan.tripC);
    const lowEdge = _selfConsistentEdge((t) => (atLow = worstAt.bracket(t)).interval[0], plan.tripC);
    const worst: PropagationResult = {
      ...worstAtSetpoint,
      interval: [lowEdge.edgeC, highEdge.edgeC],
    };
    const rssRaw = exact?.("rss") ?? propagate(model, inputs, { method: "rss", coverage });
    const factor = _rssCoverageFactor(
      sources.map((s) => ({ contribution: rssRaw.contributions[s.name]?.contribution ?? 0, distribution: s.distribution })),
      coverage,
    );
    const rssHalf = factor.k * rssRaw.standardUncertainty;
    // Never wider than the guaranteed band: the RSS interval is cut to the worst case where it would reach past it.
    const rssLow = Math.max(rssRaw.estimate - rssHalf, worst.interval[0]);
    const rssHigh = Math.min(rssRaw.estimate + rssHalf, worst.interval[1]);
    const rssLimited = rssLow > rssRaw.estimate - rssHalf || rssHigh < rssRaw.estimate + rssHalf;
    const rss: PropagationResult = { ...rssRaw, interval: [rssLow, rssHigh] };
    const mc =
      exact?.("monte-carlo") ??
      monteCarlo?.[i] ??
      propagate(model, inputs, {
        method: "monte-carlo",
        coverage,
        trials,
        seed,
        ...(onProgress !== undefined ? { onProgress: (f: number) => onProgress((i + f) / plans.length) } : {}),
      });
    onProgress?.((i + 1) / plans.length);
    const rssBand: TripBand = {
      ...band("rss", rss),
      coverageFactor: exact !== undefined ? 0 : factor.k,
      coverageFactorRule: exact !== undefined ? "none" : factor.rule,
      limitedToWorstCase: rssLimited,
    };
    const worstBand: TripBand = {
      ...band("worst-case", worst),
      toleranceAtLowC: lowEdge.edgeC,
      toleranceAtHighC: highEdge.edgeC,
      iterations: Math.max(lowEdge.iterations, highEdge.iterations),
      ...bracketOf(atLow, atHigh),
    };
    const bands = { "worst-case": worstBand, rss: rssBand, "monte-carlo": band("monte-carlo", mc) };
    // Release: the worst case of the falling edge, also self-consistent.
    const releaseAt = worstCaseAtTolerance(tc, tap, "release", seed, coverage, normalBoundCoverage);
    releaseAt.full(nominalReleaseC);
    const releaseLow = _selfConsistentEdge((t) => releaseAt.bracket(t).interval[0], nominalReleaseC).edgeC;
    const releaseHigh = _selfConsistentEdge((t) => releaseAt.bracket(t).interval[1], nominalReleaseC).edgeC;
    const accepted = bands[acceptanceMethod];
    const label = acceptanceMethod === "worst-case" ? "worst case" : `${acceptanceMethod === "rss" ? "RSS" : "Monte Carlo"}, ${coverage * 100} % coverage`;
    const verdict = reasonFor(plan.name, accepted, plan.limits, label);
    if (i === 0) thermocoupleToleranceC = sources.find((s) => s.name === "thermocouple.tolerance")?.limit ?? 0;
    const errorSources: TripErrorSource[] = sources
      .map((s) => ({
        name: s.name,
        description: positionDescription(s.description, net, networkIndex, networks.length),
        worstCaseC: (worst.contributions[s.name]?.contribution ?? 0) / 2,
        standardUncertaintyC: rss.contributions[s.name]?.contribution ?? 0,
      }))
      .sort((a, b) => b.worstCaseC - a.worstCaseC);
    const bandOverService = serviceBands(design, model, inputs, normalBoundCoverage, enclosure);
    return {
      name: plan.name,
      tripTemperatureC: plan.tripC,
      idealThresholdVolts: plan.idealThresholdVolts,
      realizedThresholdVolts: realizedRatio * volts,
      realizedRatio,
      idealRatio: plan.idealRatio,
      networkIndex,
      tapIndex: tap,
      resistorsOhms: [above, below] as const,
      nominalTripC,
      nominalReleaseC,
      roundingErrorC: nominalTripC - plan.tripC,
      worstCase: bands["worst-case"],
      rss: bands.rss,
      monteCarlo: bands["monte-carlo"],
      maxNormalOperatingC: plan.limits.maxNormalOperatingC,
      hazardLimitC: plan.limits.hazardLimitC,
      marginToNormalC: accepted.lowC - plan.limits.maxNormalOperatingC,
      marginToHazardC: plan.limits.hazardLimitC - accepted.highC,
      pass: verdict.pass,
      reason: verdict.reason,
      errorSources,
      releaseWorstCase: { lowC: releaseLow, highC: releaseHigh },
      releaseMarginToNormalC: releaseLow - plan.limits.maxNormalOperatingC,
      ...(bandOverService !== undefined ? { bandOverService } : {}),
    };
  });

  const allNotes = [
    ...notes,
    `Trip bands: worst case over every source's bounds; RSS (GUM, ${coverage * 100} % coverage); Monte Carlo (JCGM 101, ${trials} trials, seed ${seed}). The worst case takes the thermocouple tolerance at the trip temperature each band edge lands on (self-consistent, fixed-point iteration); RSS and Monte Carlo at the setpoint. The RSS coverage factor is that of the convolution of the largest rectangular source with a normal of the rest (JCGM 100 G.2.3, G.6.5–G.6.6) and the RSS interval never reaches past the worst case; the cold junction anywhere in the ambient range ${design.ambient.minC} to ${design.ambient.maxC} °C.`,
    CAUTION_TEXT,
  ];
  const midRail = midRailDivider(realized.realization.nominalVolts, resistorTolerance, {
    referenceToleranceFraction: Math.min(0.5, realized.realization.toleranceFraction),
  });
  return {
    ...(design.name !== undefined ? { name: design.name } : {}),
    networks,
    reference: realized.realization,
    setpoints: results,
    acceptanceMethod,
    midRail,
    buildSheet: _comparatorBuildSheet(design, networks, results, realized.realization, midRail, thermocoupleToleranceC),
    pass: results.every((r) => r.pass) && realized.realization.problems.length === 0,
    notes: allNotes,
    caution: CAUTION_TEXT,
  };
}
