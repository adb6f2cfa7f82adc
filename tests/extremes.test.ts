/**
 * `_minOf` / `_maxOf` (src/extremes.ts) give what `Math.min(...values)` / `Math.max(...values)` give (the
 * ECMAScript definition: NaN if any value is NaN, −0 below +0, ±Infinity for none), for lists of any length,
 * where the spread call throws past about 10⁵ arguments. Property over random lists with NaN, ±0 and ±Infinity.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { _maxOf, _minOf } from "../src/extremes.js";

describe("_minOf / _maxOf", () => {
  it("equal Math.min(...) / Math.max(...) bit for bit on lists up to 2,000 values", () => {
    const value = fc.oneof(fc.double(), fc.constantFrom(0, -0, NaN, Infinity, -Infinity));
    fc.assert(
      fc.property(fc.array(value, { maxLength: 2000 }), (values) => {
        expect(Object.is(_minOf(values), Math.min(...values))).toBe(true);
        expect(Object.is(_maxOf(values), Math.max(...values))).toBe(true);
        expect(Object.is(_minOf(Float64Array.from(values)), Math.min(...values))).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it("take a million values, where the spread call overflows the stack", () => {
    const values = Float64Array.from({ length: 1_000_000 }, (_, i) => Math.sin(i));
    expect(() => Math.max(...values)).toThrow(RangeError);
    let lo = Infinity;
    let hi = -Infinity;
    for (const v of values) {
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    expect(_minOf(values)).toBe(lo);
    expect(_maxOf(values)).toBe(hi);
  });
});
