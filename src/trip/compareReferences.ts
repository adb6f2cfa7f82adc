/**
 * The same trip design evaluated with several reference options side by side.
 * @module
 */
import { _requireFinite, _requireObject, _requireOptionsObject, _requireWorkWithin, HotjunctionRangeError } from "../errors.js";
import { _maxModelEvaluations } from "../uncertainty/_propagateMonteCarlo.js";
import { _parallelSettings, createMonteCarloPool } from "../uncertainty/propagateParallel.js";
import { designTrip, type DesignTripOptions } from "./designTrip.js";
import { designTripParallel, type DesignTripParallelOptions } from "./designTripParallel.js";
import type {
  ReferenceComparison,
  ReferenceComparisonEntry,
  ReferenceOption,
  TripBand,
  TripDesign,
  TripDesignResult,
} from "./types.js";

/** Options of {@link compareReferences}: those of {@link designTrip} (acceptance method, coverage, trials, seed). */
export type CompareReferencesOptions = Omit<DesignTripOptions, "networks">;

function acceptedBand(result: TripDesignResult, index: number): TripBand {
  const sp = result.setpoints[index];
  if (sp === undefined) throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "setpoint index", value: index, context: "compareReferences" });
  return result.acceptanceMethod === "worst-case" ? sp.worstCase : result.acceptanceMethod === "rss" ? sp.rss : sp.monteCarlo;
}

function nominalVoltsOf(option: ReferenceOption): number {
  return option.kind === "ideal" ? option.nominalVolts : option.element.nominalVolts;
}

/**
 * Evaluates one trip design with each of several reference options (e.g. a precision series reference, a
 * shunt reference with its series resistor sized from the supply, the 5 V regulator rail used directly) and
 * answers, per option, whether it is good enough for the design's margins. For each option the threshold
 * resistors are chosen for its voltage, the trip bands computed as in {@link designTrip}, and the same
 * design with a perfect reference of the same voltage on the same resistors gives the yardstick: the extra
 * band width is what the reference itself costs in °C. Verdict "adequate" when every setpoint passes and the
 * reference has no problem (such as a shunt current above its maximum). The recommendation is the cheapest
 * adequate option by the user's cost (options without a cost come after those with one; ties by input order).
 * @param design - the trip design (its own `reference` is ignored)
 * @param referenceOptions - at least one option; names must differ
 * @param options - {@link CompareReferencesOptions}
 * @returns {@link ReferenceComparison}: per option its bands (°C), extra width over an ideal reference (°C),
 *   cost and verdict, the recommendation and a summary sentence
 * @throws HotjunctionRangeError (code `INVALID_DESIGN`) for no options or repeated names; `OUT_OF_RANGE` when
 *   setpoints × reference options × 2 × Monte Carlo trials exceed 10⁹ model evaluations; as {@link designTrip}
 * @example
 * ```ts
 * import { compareReferences } from "hotjunction";
 * const design = {
 *   setpoints: [{ name: "glaze", tripTemperatureC: 400, maxNormalOperatingC: 385, hazardLimitC: 420 }],
 *   thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
 *   amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
 *   comparator: { kind: "comparator", offsetMillivolts: 2 },
 *   reference: { kind: "ideal", name: "any", nominalVolts: 5 },
 *   resistors: { series: "E96", toleranceFraction: 0.001 },
 *   ambient: { minC: 20, maxC: 30 },
 * } as const;
 * const c = compareReferences(design, [
 *   { kind: "element", name: "5 V regulator rail", cost: 0, element: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 } },
 *   { kind: "element", name: "4.096 V series reference", cost: 1.2, element: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: 0.001 } },
 * ], { monteCarloTrials: 2000 });
 * console.log(c.options.map((o) => o.verdict).join(" "), c.recommended); // inadequate adequate 4.096 V series reference
 * ```
 */
export function compareReferences(
  design: TripDesign,
  referenceOptions: readonly ReferenceOption[],
  options: CompareReferencesOptions = {},
): ReferenceComparison {
  return _compareReferencesWith(design, referenceOptions, options, designTrip);
}

/**
 * @internal {@link compareReferences} with the trip designs made by `trip` (designTrip, or a lookup of results made
 * on worker threads with the same arguments).
 */
export function _compareReferencesWith(
  design: TripDesign,
  referenceOptions: readonly ReferenceOption[],
  options: CompareReferencesOptions,
  trip: (design: TripDesign, options: DesignTripOptions) => TripDesignResult,
): ReferenceComparison {
  checkComparison(design, referenceOptions, options);
  const { onProgress, ...designOptions } = options;
  // Two designs per option (with the option, and with an ideal reference on the same resistors).
  const runs = referenceOptions.length * 2;
  const progressOf = (run: number): Pick<DesignTripOptions, "onProgress"> =>
    onProgress === undefined ? {} : { onProgress: (f: number) => onProgress((run + f) / runs) };
  let acceptanceMethod: ReferenceComparison["acceptanceMethod"] = options.acceptanceMethod ?? "worst-case";

  // The yardstick depends only on the voltage and the resistors: options of one voltage that choose the same
  // networks (e.g. a series and a shunt reference of 2.5 V) share one ideal-reference design.
  const yardsticks = new Map<string, TripDesignResult>();
  const entries: ReferenceComparisonEntry[] = referenceOptions.map((option, k) => {
    const withOption = trip({ ...design, reference: option }, { ...designOptions, ...progressOf(2 * k) });
    acceptanceMethod = withOption.acceptanceMethod;
    const volts = nominalVoltsOf(option);
    const yardstickKey = yardstickKeyOf(volts, withOption);
    let ideal = yardsticks.get(yardstickKey);
    if (ideal === undefined) {
      ideal = trip(idealDesignOf(design, volts), { ...designOptions, ...progressOf(2 * k + 1), networks: withOption.networks });
      yardsticks.set(yardstickKey, ideal);
    } else {
      onProgress?.((2 * k + 2) / runs);
    }
    return entryOf(option, withOption, ideal);
  });
  return rankedComparison(entries, acceptanceMethod);
}

/** The design with an ideal reference of `volts` (the yardstick of every option of that voltage). */
function idealDesignOf(design: TripDesign, volts: number): TripDesign {
  return { ...design, reference: { kind: "ideal", name: "ideal reference", nominalVolts: volts } };
}

/** Options of one voltage whose designs choose the same networks share one yardstick. */
function yardstickKeyOf(volts: number, withOption: TripDesignResult): string {
  return JSON.stringify([Object.is(volts, -0) ? "-0" : String(volts), withOption.networks]);
}

/** compareReferences' checks of its arguments (before any design runs). */
function checkComparison(design: TripDesign, referenceOptions: readonly ReferenceOption[], options: CompareReferencesOptions): void {
  const context = "compareReferences";
  _requireOptionsObject(options, context, true);
  if (Array.isArray(referenceOptions) && typeof design === "object" && design !== null && Array.isArray(design.setpoints)) {
    // each option is designed twice (with the option, and with an ideal reference on the same resistors)
    _requireWorkWithin(
      { setpoints: design.setpoints.length, "reference options × 2": referenceOptions.length * 2, trials: options.monteCarloTrials ?? 100_000 },
      _maxModelEvaluations,
      context,
    );
  }
  if (!Array.isArray(referenceOptions) || referenceOptions.length === 0) {
    throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "reference options", value: referenceOptions, context, problem: "must be a non-empty array" });
  }
  const names = new Set<string>();
  for (const [k, option] of referenceOptions.entries()) {
    _requireObject(option, `reference options[${k}]`, context);
    if (names.has(option?.name)) {
      throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "reference option name", value: option.name, context, problem: "appears twice" });
    }
    names.add(option?.name);
    if (option?.cost !== undefined) _requireFinite(option.cost, "cost", undefined, context);
  }
}

/** One option's entry: its bands beside the yardstick's, the extra width, the verdict. */
function entryOf(option: ReferenceOption, withOption: TripDesignResult, ideal: TripDesignResult): ReferenceComparisonEntry {
  // Alike in shape only (deliberately): faults/reviewFaults.ts builds its fault rows the same way; the rows differ.
  const setpoints = withOption.setpoints.map((sp, i) => {
    const b = acceptedBand(withOption, i);
    const yardstick = acceptedBand(ideal, i);
    return {
      name: sp.name,
      lowC: b.lowC,
      highC: b.highC,
      idealLowC: yardstick.lowC,
      idealHighC: yardstick.highC,
      extraWidthC: b.highC - b.lowC - (yardstick.highC - yardstick.lowC),
      marginToNormalC: sp.marginToNormalC,
      marginToHazardC: sp.marginToHazardC,
      pass: sp.pass,
    };
  });
  const adequate = withOption.pass;
  const worstExtra = Math.max(...setpoints.map((s) => s.extraWidthC));
  const smallestMargin = Math.min(...setpoints.map((s) => Math.min(s.marginToNormalC, s.marginToHazardC)));
  let verdictText: string;
  if (adequate) {
    verdictText = `${option.name} is good enough: every setpoint trips between normal operation and the hazard limit (smallest margin ${smallestMargin.toFixed(1)} °C); it widens the band by up to ${worstExtra.toFixed(1)} °C over an ideal reference.`;
  } else {
    const failing = withOption.setpoints.find((s) => !s.pass);
    const why = failing !== undefined ? failing.reason : (withOption.reference.problems[0] ?? "it has a problem.");
    verdictText = `${option.name} is not good enough: ${why}`;
  }
  return {
    name: option.name,
    kind: option.kind,
    cost: option.cost ?? null,
    reference: withOption.reference,
    networks: withOption.networks,
    setpoints,
    verdict: adequate ? "adequate" : "inadequate",
    verdictText,
  };
}

/** The comparison of the entries: the cheapest adequate one recommended, and the summary sentence. */
function rankedComparison(entries: ReferenceComparisonEntry[], acceptanceMethod: ReferenceComparison["acceptanceMethod"]): ReferenceComparison {
  const ranked = entries
    .map((entry, index) => ({ entry, index }))
    .filter(({ entry }) => entry.verdict === "adequate")
    .sort((a, b) => (a.entry.cost ?? Infinity) - (b.entry.cost ?? Infinity) || a.index - b.index);
  const recommended = ranked[0]?.entry.name ?? null;
  const adequateCount = ranked.length;
  const summary =
    recommended === null
      ? `None of the ${entries.length} reference options keeps every setpoint between normal operation and the hazard limit (${acceptanceMethod} band).`
      : `${adequateCount} of ${entries.length} reference options keep every setpoint between normal operation and the hazard limit (${acceptanceMethod} band); the cheapest adequate one is ${recommended}.`;
  return { acceptanceMethod, options: entries, recommended, summary };
}


/**
 * The same comparison as {@link compareReferences}, every number to the last bit, with each trip design's Monte
 * Carlo on worker threads ({@link designTripParallel}) when it has at least `parallelThreshold` trials.
 * @param design - the trip design (its own `reference` is ignored; plain data: it is sent to the workers)
 * @param referenceOptions - at least one option; names must differ
 * @param options - {@link CompareReferencesOptions} plus `workers` and `parallelThreshold` as for `designTripParallel`
 * @returns a promise of the {@link ReferenceComparison}
 * @throws (rejects with) the errors of `compareReferences` and `designTripParallel`
 * @example
 * ```ts no-run
 * import { compareReferencesParallel } from "hotjunction";
 * const c = await compareReferencesParallel(design, options, { monteCarloTrials: 1_000_000 });
 * ```
 */
export async function compareReferencesParallel(
  design: TripDesign,
  referenceOptions: readonly ReferenceOption[],
  options: CompareReferencesOptions & Pick<DesignTripParallelOptions, "workers" | "parallelThreshold"> = {},
): Promise<ReferenceComparison> {
  _requireOptionsObject(options, "compareReferences", true);
  const { workers, parallelThreshold, ...rest } = options;
  const { threshold } = _parallelSettings(options, "compareReferences");
  if (workers === 1 || !(typeof rest.monteCarloTrials === "number" ? rest.monteCarloTrials >= threshold : 100_000 >= threshold)) {
    return compareReferences(design, referenceOptions, rest);
  }
  // The same designs, in the same order, as compareReferences makes (each option, then its yardstick unless an
  // option of that voltage with those networks made it already), each on the workers; then the comparison is
  // assembled from them.
  checkComparison(design, referenceOptions, rest);
  const { onProgress, ...designOptions } = rest;
  const made = new Map<string, TripDesignResult>();
  const keyOf = (d: TripDesign, o: DesignTripOptions): string => JSON.stringify([d.reference, o.networks ?? null]);
  const pool = await createMonteCarloPool(workers === undefined ? {} : { workers });
  const onWorkers = { ...(pool !== undefined ? { pool } : { workers: 1 }), ...(parallelThreshold !== undefined ? { parallelThreshold } : {}) };
  const runs = referenceOptions.length * 2;
  try {
    const yardsticks = new Set<string>();
    for (const [k, option] of referenceOptions.entries()) {
      const withDesign = { ...design, reference: option };
      const withOption = await designTripParallel(withDesign, { ...designOptions, ...onWorkers });
      made.set(keyOf(withDesign, designOptions), withOption);
      onProgress?.((2 * k + 1) / runs);
      const volts = nominalVoltsOf(option);
      const yardstickKey = yardstickKeyOf(volts, withOption);
      if (!yardsticks.has(yardstickKey)) {
        yardsticks.add(yardstickKey);
        const idealDesign = idealDesignOf(design, volts);
        const idealOptions = { ...designOptions, networks: withOption.networks };
        made.set(keyOf(idealDesign, idealOptions), await designTripParallel(idealDesign, { ...idealOptions, ...onWorkers }));
      }
      onProgress?.((2 * k + 2) / runs);
    }
  } finally {
    await pool?.close();
  }
  return _compareReferencesWith(design, referenceOptions, designOptions, (d, o) => made.get(keyOf(d, o)) ?? designTrip(d, o));
}
