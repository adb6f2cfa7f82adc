/**
 * The published approximate inverse t = Σ dᵢ·Eⁱ over its own data object (NIST Monograph 175's inverse
 * coefficients, with their stated error bands).
 * @internal
 * @module
 */
import type { ApproximateInverseData, ApproximateInverseRange } from "../data/thermocoupleData.js";
import { _requireFinite, HotjunctionRangeError } from "../errors.js";
import { _horner } from "./compiled.js";

export type { ApproximateInverseRange } from "../data/thermocoupleData.js";

interface CompiledApproximateInverse {
  readonly minEmfMillivolts: number;
  readonly maxEmfMillivolts: number;
  readonly errorMinC: number;
  readonly errorMaxC: number;
  readonly d: Float64Array;
}

const approximateCache = new WeakMap<ApproximateInverseData, readonly CompiledApproximateInverse[]>();

/** @internal */
export function _approximateTemperatureFromEmf(inverse: ApproximateInverseData, emfMillivolts: number): number {
  const context = `type ${inverse.type} published approximate inverse`;
  _requireFinite(emfMillivolts, "EMF", "mV", context);
  let ranges = approximateCache.get(inverse);
  if (ranges === undefined) {
    ranges = inverse.ranges.map((r) => ({ ...r, d: Float64Array.from(r.coefficients) }));
    approximateCache.set(inverse, ranges);
  }
  // Where published ranges overlap (R and S, 1064 to 1200 °C) take the one with the narrowest stated band.
  let best: CompiledApproximateInverse | undefined;
  let lo = Infinity;
  let hi = -Infinity;
  for (const r of ranges) {
    lo = Math.min(lo, r.minEmfMillivolts);
    hi = Math.max(hi, r.maxEmfMillivolts);
    if (emfMillivolts >= r.minEmfMillivolts && emfMillivolts <= r.maxEmfMillivolts) {
      if (best === undefined || r.errorMaxC - r.errorMinC < best.errorMaxC - best.errorMinC) best = r;
    }
  }
  if (best !== undefined) return _horner(best.d, emfMillivolts);
  throw new HotjunctionRangeError({
    code: "OUT_OF_RANGE",
    quantity: "EMF",
    value: emfMillivolts,
    min: lo,
    max: hi,
    unit: "mV",
    context,
  });
}

/** @internal */
export function _approximateInverseRanges(inverse: ApproximateInverseData): ApproximateInverseRange[] {
  return inverse.ranges.map((r) => ({ ...r, coefficients: [...r.coefficients] }));
}

