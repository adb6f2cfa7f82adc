/**
 * The symmetric interval by selection and the sweep's common draws. Properties over many inputs, against the
 * library's own references (the radix sort; `propagate` point by point): selection returns the bits the sort puts
 * at the two indices (ties, runs of equal values, ±0 included); `_CommonDrawsFamily` returns, bit for bit,
 * `propagate(…, { method: "monte-carlo" })` for each member, for every distribution shape, with widths that change
 * from member to member, and declines (undefined) where it does not apply.
 */
import { describe, expect, it } from "vitest";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { arcsine, normal, propagate, rectangular, trapezoidal, triangular, type Distribution, type PropagationResult } from "../../src/uncertainty/index.js";
import { _CommonDrawsFamily } from "../../src/uncertainty/_commonDrawsFamily.js";
import { _selectFloat64, _sortFloat64 } from "../../src/uncertainty/_sortFloat64.js";

function sameBits(a: PropagationResult | undefined, b: PropagationResult): void {
  expect(a).toBeDefined();
  const r = a as PropagationResult;
  for (const [x, y] of [
    [r.estimate, b.estimate],
    [r.standardUncertainty, b.standardUncertainty],
    [r.interval[0], b.interval[0]],
    [r.interval[1], b.interval[1]],
  ] as const) {
    expect(Object.is(x, y)).toBe(true);
  }
  expect(r.note).toBe(b.note);
  expect(r.contributions).toEqual(b.contributions);
}

describe("_selectFloat64", () => {
  it("gives the sorted array's values at both indices for 400 random arrays (ties, ±0, constant runs)", () => {
    const rng = xoroshiro128plus(11);
    const next = (): number => (rng.next() >>> 0) / 2 ** 32;
    for (let c = 0; c < 400; c++) {
      const n = 1 + Math.floor(next() * (c % 4 === 0 ? 20 : 6000));
      const kind = c % 5;
      const values = Float64Array.from({ length: n }, () => {
        const u = next();
        if (kind === 0) return u - 0.5;
        if (kind === 1) return Math.round(u * 6) - 3; // many ties
        if (kind === 2) return u < 0.5 ? -0 : u < 0.7 ? 0 : u - 0.6; // signed zeros
        if (kind === 3) return 7; // constant
        return (u - 0.5) * 10 ** Math.floor(next() * 40 - 20);
      });
      const sorted = Float64Array.from(values);
      _sortFloat64(sorted);
      const k1 = Math.floor(next() * n);
      const k2 = k1 + Math.floor(next() * (n - k1));
      // The selection itself (sortBelow 0), and the default, which sorts arrays this short.
      for (const sortBelow of [0, undefined]) {
        const [low, high] = _selectFloat64(Float64Array.from(values), k1, k2, sortBelow);
        expect(Object.is(low, sorted[k1])).toBe(true);
        expect(Object.is(high, sorted[k2])).toBe(true);
      }
    }
  });
});

describe("_CommonDrawsFamily (a sweep's common draws)", () => {
  const shapes = (w: number): Record<string, Distribution> => ({
    a: normal({ mean: 0.1 * w, standardDeviation: 0.3 * w }),
    b: rectangular({ center: 2, halfWidth: 0.5 }),
    c: triangular({ center: -1, halfWidth: 0.2 * w }),
    d: trapezoidal({ center: 0, halfWidth: 1, beta: 0.4 }),
    e: arcsine({ center: 3, halfWidth: 0.1 + w }),
  });
  const model = (k: number) => (x: Readonly<Record<string, number>>) => (1 + 1e-3 * k) * x["a"]! * x["b"]! + Math.sin(x["c"]!) + x["d"]! ** 2 - x["e"]! / (k + 1);

  for (const [trials, interval] of [[20_000, "symmetric"], [9_000, "shortest"], [100, "symmetric"]] as const) {
    it(`each of 12 members with changing widths equals propagate bit for bit (${trials} trials, ${interval})`, () => {
      const options = { method: "monte-carlo" as const, trials, seed: 42, coverage: 0.95, interval };
      const family = new _CommonDrawsFamily(options);
      for (let k = 0; k < 12; k++) {
        const inputs = shapes(1 + (k % 3) * 0.25);
        sameBits(family.run(model(k), inputs), propagate(model(k), inputs, options));
      }
    });
  }

  it("declines other names or shapes, correlations, adaptive runs and progress; a bad model is propagate's error", () => {
    const options = { method: "monte-carlo" as const, trials: 2_000, seed: 3 };
    const family = new _CommonDrawsFamily(options);
    expect(family.run(model(0), shapes(1))).toBeDefined();
    const { e: _e, ...fewer } = shapes(1);
    expect(family.run((x) => x["a"]!, { ...fewer, f: arcsine({ center: 3, halfWidth: 1 }) })).toBeUndefined();
    expect(family.run(model(0), { ...shapes(1), b: normal({ mean: 2, standardDeviation: 0.5 }) })).toBeUndefined();
    expect(new _CommonDrawsFamily({ ...options, correlations: [["a", "b", 0.5]] }).run(model(0), shapes(1))).toBeUndefined();
    expect(new _CommonDrawsFamily({ ...options, onProgress: () => undefined }).run(model(0), shapes(1))).toBeUndefined();
    const nan = () => Number.NaN;
    expect(() => family.run(nan, shapes(1))).toThrow(expect.objectContaining({ code: "MODEL_NOT_FINITE" }));
    expect(() => propagate(nan, shapes(1), options)).toThrow(expect.objectContaining({ code: "MODEL_NOT_FINITE" }));
  });
});
