/**
 * Multi-tap resistor ladder for several selectable thresholds from one reference.
 * @module
 */
import { _requireFinite, _requireOptionsObject, HotjunctionRangeError } from "../errors.js";
import type { PreferredSeriesName } from "../data/preferredSeries.js";
import { _noNetworkInBounds, _totalBounds } from "./selectDividerPair.js";
import { _indexAtOrBelow, _requireSeries, standardResistorValues } from "./standardResistorValues.js";

/** Options of {@link selectLadder}. */
export interface SelectLadderOptions {
  /** Preferred series of every resistor of the string. */
  readonly series: PreferredSeriesName;
  /** Bounds on the string's total resistance, Ω. Defaults 1000 and 1e6. */
  readonly minTotalOhms?: number;
  readonly maxTotalOhms?: number;
  /** Smallest single resistor allowed, Ω, ≥ 0.1. Default 1. */
  readonly minResistorOhms?: number;
  /**
   * Signed error of tap `tapIndex` (index into the target ratios as given) at a realized ratio, in the
   * caller's unit (e.g. °C); non-decreasing in the ratio and zero at that tap's target. Default realized −
   * target ratio. The search minimises the largest |error| over the taps, then the sum of |error|.
   */
  readonly errorOfRatio?: (tapIndex: number, realizedRatio: number) => number;
}

/** Result of {@link selectLadder}. */
export interface LadderSelection {
  /**
   * The string, Ω, from the reference end (R_0) to ground (R_N). Taps are sorted by ratio, highest first:
   * the highest tap lies between R_0 and R_1, the lowest between R_{N−1} and R_N.
   */
  readonly resistorsOhms: readonly number[];
  readonly totalOhms: number;
  /** For each target (input order): the index i of the resistor just above its tap (tap between R_i and R_{i+1}). */
  readonly tapBelowResistor: readonly number[];
  /** Realized ratio of each tap, input order. */
  readonly ratios: readonly number[];
  /** Signed error of each tap, input order, unit of `errorOfRatio`. */
  readonly errors: readonly number[];
  /** Largest |error| over the taps. */
  readonly maxAbsError: number;
  /** Bottom-resistor candidates tried (each is a start of the greedy build and the improvement pass). */
  readonly startsTried: number;
}

/**
 * Chooses a string of N+1 standard resistors whose N taps give N target ratios of the reference (a ladder
 * for selectable setpoints). How it works: for every standard value B of the bottom resistor, the ideal
 * total is T = B/k_lowest; going up the string, each next resistor is the standard value nearest (on a log
 * scale) to k_tap·T minus the resistance already below, and the top one closes the string to T. From this
 * greedy start, an improvement pass moves one resistor at a time to a neighbouring standard value while that
 * lowers the largest |tap error| (then the sum of |errors|), keeping the total within bounds; the best string
 * over all starts is returned (ties keep the smallest bottom resistor). Limits: the pass moves one resistor at a time, so an optimum that needs two
 * resistors to move together can be missed — the result is a very good string, not a proven optimum for N ≥ 2
 * (for N = 1 it matches {@link selectDividerPair}, which tests/trip check). Each tap's ratio depends on every
 * resistor, so tolerances of a ladder partly cancel between neighbouring taps; {@link designTrip} propagates
 * each resistor separately.
 * @param targetRatios - wanted tap ratios V_tap/V_ref, each in (0, 1), all different, any order
 * @param options - series, bounds (Ω) and error measure; see {@link SelectLadderOptions}
 * @returns the string and each tap's realized ratio and error (input order)
 * @throws HotjunctionRangeError for ratios outside (0, 1) or repeated, bad bounds or an unknown series
 *   (code `INVALID_DESIGN` when no string fits the bounds); HotjunctionTypeError for non-finite input
 * @example
 * ```ts
 * import { selectLadder } from "hotjunction";
 * // taps at 1/2 and 1/4 of the reference: 1.5 kΩ + 750 Ω + 750 Ω (E24) is exact (smallest bottom first)
 * const ladder = selectLadder([0.5, 0.25], { series: "E24", minTotalOhms: 3000, maxTotalOhms: 5000 });
 * console.log(ladder.resistorsOhms.join(" "), ladder.maxAbsError); // 1500 750 750 0
 * ```
 */
export function selectLadder(targetRatios: readonly number[], options: SelectLadderOptions): LadderSelection {
  const context = "selectLadder";
  if (!Array.isArray(targetRatios) || targetRatios.length === 0) {
    throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "target ratios", value: targetRatios, context, problem: "must be a non-empty array" });
  }
  _requireOptionsObject(options, context, false);
  // Array.from, not map: a hole ([0.5, , 0.25]) is checked as undefined, not kept as a hole
  const targets = Array.from(targetRatios, (k: unknown, i) => {
    const value = _requireFinite(k, `target ratio ${i}`, undefined, context);
    if (!(value > 0 && value < 1)) {
      throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: `target ratio ${i}`, value, min: 0, max: 1, context, problem: "is not strictly between 0 and 1" });
    }
    return value;
  });
  const order = targets.map((_, i) => i).sort((a, b) => (targets[b] as number) - (targets[a] as number));
  for (let t = 1; t < order.length; t++) {
    if (targets[order[t] as number] === targets[order[t - 1] as number]) {
      throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "target ratio", value: targets[order[t] as number], context, problem: "appears twice; one tap serves both" });
    }
  }
  const series = _requireSeries(options.series, context);
  const { minTotal, maxTotal } = _totalBounds(options.minTotalOhms, options.maxTotalOhms, context);
  const minResistor = _requireFinite(options.minResistorOhms ?? 1, "minResistorOhms", "Ω", context);
  if (minResistor < 0.1 || minResistor > maxTotal) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "minResistorOhms", value: minResistor, min: 0.1, max: maxTotal, unit: "Ω", context });
  }
  const errorOf = options.errorOfRatio ?? ((tap: number, ratio: number) => ratio - (targets[tap] as number));
  const values = standardResistorValues(series, minResistor, maxTotal);
  const tapCount = targets.length;
  const lowest = targets[order[tapCount - 1] as number] as number;

  const nearestIndex = (ohms: number): number => {
    if (ohms <= (values[0] as number)) return 0;
    const below = _indexAtOrBelow(values, ohms);
    if (below >= values.length - 1) return values.length - 1;
    const lo = values[below] as number;
    const hi = values[below + 1] as number;
    return Math.log(ohms / lo) <= Math.log(hi / ohms) ? below : below + 1;
  };

  interface Score {
    readonly maxAbs: number;
    readonly sumAbs: number;
  }
  const ratiosOf = (indices: readonly number[]): number[] | undefined => {
    let total = 0;
    for (const index of indices) total += values[index] as number;
    if (total < minTotal || total > maxTotal) return undefined;
    // Sorted tap t (highest first) lies below R_t: its ratio is the sum of R_{t+1..N} over the total.
    const ratios = new Array<number>(tapCount);
    let below = 0;
    for (let t = tapCount - 1; t >= 0; t--) {
      below += values[indices[t + 1] as number] as number;
      ratios[order[t] as number] = below / total;
    }
    return ratios;
  };
  const scoreOf = (indices: readonly number[]): Score => {
    const ratios = ratiosOf(indices);
    if (ratios === undefined) return { maxAbs: Infinity, sumAbs: Infinity };
    let maxAbs = 0;
    let sumAbs = 0;
    for (let tap = 0; tap < tapCount; tap++) {
      const error = errorOf(tap, ratios[tap] as number);
      if (!Number.isFinite(error)) {
        throw new HotjunctionRangeError({ code: "MODEL_NOT_FINITE", quantity: "error of ratio", value: error, context, problem: `is not finite at tap ${tap}` });
      }
      maxAbs = Math.max(maxAbs, Math.abs(error));
      sumAbs += Math.abs(error);
    }
    return { maxAbs, sumAbs };
  };
  const better = (a: Score, b: Score): boolean => a.maxAbs < b.maxAbs || (a.maxAbs === b.maxAbs && a.sumAbs < b.sumAbs);

  let best: { indices: number[]; score: Score } | undefined;
  let startsTried = 0;
  for (let bottomIndex = 0; bottomIndex < values.length; bottomIndex++) {
    const idealTotal = (values[bottomIndex] as number) / lowest;
    if (idealTotal < minTotal / 2) continue;
    if (idealTotal > maxTotal * 2) break;
    startsTried++;
    const indices = new Array<number>(tapCount + 1);
    indices[tapCount] = bottomIndex;
    let below = values[bottomIndex] as number;
    for (let t = tapCount - 2; t >= 0; t--) {
      const index = nearestIndex(targets[order[t] as number]! * idealTotal - below);
      indices[t + 1] = index;
      below += values[index] as number;
    }
    indices[0] = nearestIndex(idealTotal - below);
    let score = scoreOf(indices);
    // Improvement pass: single-resistor moves to a neighbouring standard value.
    for (let pass = 0; pass < 200; pass++) {
      let improved = false;
      for (let r = 0; r <= tapCount; r++) {
        for (const step of [-1, 1]) {
          const moved = (indices[r] as number) + step;
          if (moved < 0 || moved >= values.length) continue;
          const trial = indices.slice();
          trial[r] = moved;
          const trialScore = scoreOf(trial);
          if (better(trialScore, score)) {
            indices[r] = moved;
            score = trialScore;
            improved = true;
          }
        }
      }
      if (!improved) break;
    }
    if (score.maxAbs !== Infinity && (best === undefined || better(score, best.score))) {
      best = { indices: indices.slice(), score };
    }
  }
  if (best === undefined) {
    _noNetworkInBounds(minTotal, maxTotal, context, `leave no ${series} ladder for these taps`);
  }
  const resistorsOhms = best.indices.map((index) => values[index] as number);
  const ratios = ratiosOf(best.indices) as number[];
  const tapBelowResistor = new Array<number>(tapCount);
  order.forEach((tap, t) => {
    tapBelowResistor[tap] = t;
  });
  return {
    resistorsOhms,
    totalOhms: resistorsOhms.reduce((a, b) => a + b, 0),
    tapBelowResistor,
    ratios,
    errors: ratios.map((ratio, tap) => errorOf(tap, ratio)),
    maxAbsError: best.score.maxAbs,
    startsTried,
  };
}
