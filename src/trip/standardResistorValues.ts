/**
 * Standard resistor values of a preferred series across decades.
 * @module
 */
import { _requireChoice, _requireFinite, HotjunctionRangeError } from "../errors.js";
import { preferredSeries, preferredSeriesNames, type PreferredSeriesName } from "../data/preferredSeries.js";

/** Decades searched: 0.1 Ω … 10 GΩ covers every practical threshold divider. */
const lowestDecadeExponent = -1;
const highestDecadeExponent = 10;

/**
 * Validates a series name (the series list bound to `_requireChoice` of the validator home, errors.ts).
 * @internal
 */
export function _requireSeries(series: unknown, context?: string): PreferredSeriesName {
  return _requireChoice(series, "resistor series", preferredSeriesNames, context);
}

/**
 * Lists the standard values of a preferred series (IEC 60063) that lie within [minOhms, maxOhms], across
 * every decade in range, ascending. Each value is the series significand times a power of ten, rounded to
 * the series' significant digits (so 4.7 kΩ is exactly 4700).
 * @param series - `"E6"`, `"E12"`, `"E24"`, `"E48"`, `"E96"` or `"E192"`
 * @param minOhms - lower bound, Ω, ≥ 0.1, finite
 * @param maxOhms - upper bound, Ω, ≥ minOhms, ≤ 1e11
 * @returns the standard values, Ω, ascending (empty when none lies in range)
 * @throws HotjunctionRangeError for an unknown series or bounds out of range or reversed;
 *   HotjunctionTypeError for a non-finite bound
 * @example
 * ```ts
 * import { standardResistorValues } from "hotjunction";
 * console.log(standardResistorValues("E12", 1000, 4000).join(" ")); // 1000 1200 1500 1800 2200 2700 3300 3900
 * console.log(standardResistorValues("E96", 9700, 10300).join(" ")); // 9760 10000 10200
 * ```
 * @see IEC 60063:2015
 */
export function standardResistorValues(series: PreferredSeriesName, minOhms: number, maxOhms: number): number[] {
  const name = _requireSeries(series, "standardResistorValues");
  const lo = _requireFinite(minOhms, "minOhms", "Ω", "standardResistorValues");
  const hi = _requireFinite(maxOhms, "maxOhms", "Ω", "standardResistorValues");
  if (lo < 0.1 || lo > 1e11) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "minOhms", value: lo, min: 0.1, max: 1e11, unit: "Ω", context: "standardResistorValues" });
  }
  if (hi < lo || hi > 1e11) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "maxOhms", value: hi, min: lo, max: 1e11, unit: "Ω", context: "standardResistorValues" });
  }
  const significands = preferredSeries[name];
  const values: number[] = [];
  for (let exponent = lowestDecadeExponent; exponent <= highestDecadeExponent; exponent++) {
    for (const significand of significands) {
      // toPrecision(3) removes binary noise of significand × 10^exponent (every significand has ≤ 3 digits).
      const ohms = Number((significand * 10 ** exponent).toPrecision(3));
      if (ohms >= lo && ohms <= hi) values.push(ohms);
    }
  }
  return values;
}

/**
 * Index of the largest value ≤ x in an ascending array (−1 when none).
 * @internal
 */
export function _indexAtOrBelow(sortedValues: readonly number[], x: number): number {
  let lo = 0;
  let hi = sortedValues.length - 1;
  let found = -1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if ((sortedValues[mid] as number) <= x) {
      found = mid;
      lo = mid + 1;
    } else {
      hi = mid - 1;
    }
  }
  return found;
}

/**
 * The standard value nearest to `ohms` on a logarithmic scale (ties to the lower value).
 * @param series - preferred series name
 * @param ohms - target, Ω, 0.1 … 1e11
 * @returns nearest standard value, Ω
 * @throws HotjunctionRangeError for an unknown series or a target out of range; HotjunctionTypeError for non-finite
 * @example
 * ```ts
 * import { nearestStandardResistor } from "hotjunction";
 * console.log(nearestStandardResistor("E24", 4400)); // 4300
 * console.log(nearestStandardResistor("E96", 12345)); // 12400
 * ```
 */
export function nearestStandardResistor(series: PreferredSeriesName, ohms: number): number {
  const target = _requireFinite(ohms, "ohms", "Ω", "nearestStandardResistor");
  if (target < 0.1 || target > 1e11) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "ohms", value: target, min: 0.1, max: 1e11, unit: "Ω", context: "nearestStandardResistor" });
  }
  const values = standardResistorValues(series, Math.max(0.1, target / 20), Math.min(1e11, target * 20));
  let best = values[0] as number;
  for (const v of values) {
    if (Math.abs(Math.log(v / target)) < Math.abs(Math.log(best / target)) - 1e-15) best = v;
  }
  return best;
}
