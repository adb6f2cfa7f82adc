// The Monte Carlo outputs' sort (src/uncertainty/_sortFloat64.ts): a radix sort on the IEEE-754 bit patterns
// from 131,072 values, the native sort below. Property: the same order as `Float64Array.prototype.sort`
// (ECMAScript 2024, 23.2.3.29: numeric order, −0 before +0), bit for bit, on both sides of the switch, for
// values of every kind a model can return (normal, subnormal, ±0, ±Infinity, ties).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { _sortFloat64 } from "../../src/uncertainty/_sortFloat64.js";

const bits = (a: Float64Array): Uint32Array => new Uint32Array(a.buffer.slice(0));

describe("_sortFloat64", () => {
  it("sorts as the native sort does, bit for bit, below and above the radix switch", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(0, 1, 2, 1000, 131_071, 131_072, 140_000),
        fc.integer({ min: 1, max: 2 ** 31 - 1 }),
        fc.constantFrom("wide", "ties", "specials"),
        (n, seed, kind) => {
          let s = seed;
          const next = (): number => ((s = (Math.imul(s, 1103515245) + 12345) >>> 0) / 2 ** 32);
          const specials = [0, -0, Number.MIN_VALUE, -Number.MIN_VALUE, Number.MAX_VALUE, -Number.MAX_VALUE, Infinity, -Infinity, 2.2250738585072014e-308];
          const a = new Float64Array(n);
          for (let i = 0; i < n; i++) {
            const u = next();
            a[i] =
              kind === "ties"
                ? Math.round(u * 20) - 10
                : kind === "specials" && u < 0.05
                  ? (specials[Math.floor(next() * specials.length)] as number)
                  : (u - 0.5) * 10 ** Math.floor(next() * 40 - 20);
          }
          const expected = a.slice().sort();
          _sortFloat64(a);
          const got = bits(a);
          const want = bits(expected);
          let firstDifference = -1;
          for (let i = 0; i < got.length && firstDifference < 0; i++) if (got[i] !== want[i]) firstDifference = i >> 1;
          expect(firstDifference).toBe(-1);
        },
      ),
      { numRuns: 30, seed: 11 },
    );
  });
});
