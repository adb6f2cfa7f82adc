/**
 * Exhaustive search for the two-resistor divider closest to a target ratio.
 * @module
 */
import { _requireFinite, _requireOptionsObject, HotjunctionRangeError } from "../errors.js";
import type { PreferredSeriesName } from "../data/preferredSeries.js";
import { _indexAtOrBelow, _requireSeries, standardResistorValues } from "./standardResistorValues.js";

/** Options of {@link selectDividerPair}. */
export interface SelectDividerPairOptions {
  /** Preferred series of both resistors. */
  readonly series: PreferredSeriesName;
  /** Bounds on R_top + R_bottom, Ω. Defaults 1000 and 1e6. */
  readonly minTotalOhms?: number;
  readonly maxTotalOhms?: number;
  /** Smallest single resistor allowed, Ω, ≥ 0.1. Default 1. */
  readonly minResistorOhms?: number;
  /**
   * Signed error of a realized ratio in the caller's unit (e.g. °C of trip temperature, or volts). It must be
   * non-decreasing in the ratio and zero at the target; the search minimises its absolute value. Default
   * realized ratio − target ratio.
   */
  readonly errorOfRatio?: (realizedRatio: number) => number;
}

/** Result of {@link selectDividerPair}. */
export interface DividerPairSelection {
  /** Resistor from the reference to the tap, Ω. */
  readonly topOhms: number;
  /** Resistor from the tap to ground, Ω. */
  readonly bottomOhms: number;
  readonly totalOhms: number;
  /** Realized ratio bottom/(top+bottom). */
  readonly ratio: number;
  /** Signed error of the realized ratio, unit of `errorOfRatio` (default: ratio). */
  readonly error: number;
  /** Number of (top, bottom) pairs evaluated. */
  readonly pairsChecked: number;
}

/**
 * Resolves and checks total-resistance bounds.
 * @internal
 */
export function _totalBounds(
  minTotalOhms: number | undefined,
  maxTotalOhms: number | undefined,
  context: string,
): { readonly minTotal: number; readonly maxTotal: number } {
  const minTotal = _requireFinite(minTotalOhms ?? 1000, "minTotalOhms", "Ω", context);
  const maxTotal = _requireFinite(maxTotalOhms ?? 1e6, "maxTotalOhms", "Ω", context);
  if (minTotal < 0.2 || minTotal > 1e11) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "minTotalOhms", value: minTotal, min: 0.2, max: 1e11, unit: "Ω", context });
  }
  if (maxTotal < minTotal || maxTotal > 1e11) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "maxTotalOhms", value: maxTotal, min: minTotal, max: 1e11, unit: "Ω", context });
  }
  return { minTotal, maxTotal };
}

/** @internal Throws the error of total-resistance bounds that leave no network (`problem` says which). */
export function _noNetworkInBounds(minTotal: number, maxTotal: number, context: string, problem: string): never {
  throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: "total resistance bounds", value: maxTotal, min: minTotal, max: maxTotal, unit: "Ω", context, problem });
}

/**
 * Finds the pair of standard resistors (top R1 from the reference to the tap, bottom R2 from the tap to
 * ground) whose ratio k = R2/(R1+R2) has the least |error| against a target ratio, with R1 + R2 within
 * the total-resistance bounds. The search is exhaustive yet linear in the number of series values:
 * for a fixed R1, k increases with R2, and the error is non-decreasing in k and zero at the target, so
 * among the allowed R2 (a contiguous run of the sorted values, by the total bounds) the best one is the
 * largest at or below the ideal R2 = R1·k/(1−k) or the smallest at or above it. Checking those two for every
 * R1 gives the global optimum (tests/trip compare it with a brute force over all pairs). Ties keep the
 * smaller R1.
 * @param targetRatio - wanted k = V_tap/V_ref, in (0, 1)
 * @param options - series, bounds (Ω) and error measure; see {@link SelectDividerPairOptions}
 * @returns the best pair, its ratio and error
 * @throws HotjunctionRangeError for a ratio outside (0, 1), bad bounds or an unknown series
 *   (code `INVALID_DESIGN` when no pair fits the bounds); HotjunctionTypeError for non-finite input
 * @example
 * ```ts
 * import { selectDividerPair } from "hotjunction";
 * // 1.25 V from 5 V: k = 0.25, exactly 30 kΩ over 10 kΩ in E24 (smallest top that fits)
 * const pair = selectDividerPair(0.25, { series: "E24", minTotalOhms: 10000, maxTotalOhms: 100000 });
 * console.log(pair.topOhms, pair.bottomOhms, pair.ratio); // 30000 10000 0.25
 * ```
 */
export function selectDividerPair(targetRatio: number, options: SelectDividerPairOptions): DividerPairSelection {
  const context = "selectDividerPair";
  const k = _requireFinite(targetRatio, "target ratio", undefined, context);
  if (!(k > 0 && k < 1)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "target ratio", value: k, min: 0, max: 1, context, problem: "is not strictly between 0 and 1" });
  }
  _requireOptionsObject(options, context, false);
  const series = _requireSeries(options.series, context);
  const { minTotal, maxTotal } = _totalBounds(options.minTotalOhms, options.maxTotalOhms, context);
  const minResistor = _requireFinite(options.minResistorOhms ?? 1, "minResistorOhms", "Ω", context);
  if (minResistor < 0.1 || minResistor > maxTotal) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "minResistorOhms", value: minResistor, min: 0.1, max: maxTotal, unit: "Ω", context });
  }
  const errorOf = options.errorOfRatio ?? ((ratio: number) => ratio - k);
  const values = standardResistorValues(series, minResistor, maxTotal);

  let best: DividerPairSelection | undefined;
  let bestAbs = Infinity;
  let pairsChecked = 0;
  for (const top of values) {
    // Allowed bottoms: minTotal − top ≤ bottom ≤ maxTotal − top, a contiguous run [first, last] of `values`.
    const last = _indexAtOrBelow(values, maxTotal - top);
    if (last < 0) break; // values ascend: larger tops leave no room either
    const floorIndex = _indexAtOrBelow(values, minTotal - top);
    const first = floorIndex >= 0 && (values[floorIndex] as number) === minTotal - top ? floorIndex : floorIndex + 1;
    if (first > last) continue;
    const idealBottom = (top * k) / (1 - k);
    const below = Math.min(_indexAtOrBelow(values, idealBottom), last);
    // The ideal lies below the allowed run: its lowest value is best; otherwise the two neighbours.
    const candidates = below < first ? [first] : below + 1 <= last ? [below, below + 1] : [below];
    for (const index of candidates) {
      const bottom = values[index] as number;
      const ratio = bottom / (top + bottom);
      const error = errorOf(ratio);
      if (!Number.isFinite(error)) {
        throw new HotjunctionRangeError({ code: "MODEL_NOT_FINITE", quantity: "error of ratio", value: error, context, problem: `is not finite at ratio ${ratio}` });
      }
      pairsChecked++;
      if (Math.abs(error) < bestAbs) {
        bestAbs = Math.abs(error);
        best = { topOhms: top, bottomOhms: bottom, totalOhms: top + bottom, ratio, error, pairsChecked: 0 };
      }
    }
  }
  if (best === undefined) {
    _noNetworkInBounds(minTotal, maxTotal, context, `leave no pair of ${series} values`);
  }
  return { ...best, pairsChecked };
}
