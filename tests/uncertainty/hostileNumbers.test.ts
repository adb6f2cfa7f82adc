/**
 * Extreme and hostile arguments to the uncertainty exports: a finite result or a typed error naming the
 * quantity, the value and the valid range (never NaN or Infinity, never a plain TypeError).
 */
import { describe, expect, it } from "vitest";
import {
  distributionCoverageInterval,
  normal,
  normalCdf,
  normalQuantile,
  propagate,
  rectangular,
  studentTQuantile,
} from "../../src/uncertainty/index.js";
import { HotjunctionRangeError, HotjunctionTypeError, isHotjunctionError } from "../../src/errors.js";

function caught(f: () => unknown): unknown {
  try {
    f();
  } catch (error) {
    return error;
  }
  throw new Error("expected an error");
}

describe("normalQuantile in the far tails", () => {
  it("finite and increasing down to the smallest subnormal (1e-320, 5e-324)", () => {
    const ps = [5e-324, 1e-320, 1e-310, 1e-300, 1e-250, 1e-201, 1e-200, 1e-199, 1e-100, 1e-20];
    const zs = ps.map((p) => normalQuantile(p));
    for (const z of zs) expect(Number.isFinite(z)).toBe(true);
    for (let i = 1; i < zs.length; i++) expect(zs[i] as number).toBeGreaterThan(zs[i - 1] as number);
    expect(normalQuantile(1 - 2 ** -53)).toBe(-normalQuantile(2 ** -53)); // 1 − p is exact here
  });

  it("satisfies the Mills-ratio asymptotic series of Φ (Abramowitz & Stegun 26.2.12) to 1e-12 in log p below 1e-200", () => {
    for (const p of [5e-324, 1e-320, 1e-308, 1e-300, 1e-250, 1e-201]) {
      const x = normalQuantile(p);
      // independent evaluation of log Φ(x) with two more series terms than the implementation
      const r = 1 / (x * x);
      const series = 1 - r + 3 * r ** 2 - 15 * r ** 3 + 105 * r ** 4 - 945 * r ** 5 + 10395 * r ** 6 - 135135 * r ** 7;
      const logPhi = -0.5 * x * x - Math.log(-x) - 0.5 * Math.log(2 * Math.PI) + Math.log(series);
      // p = 5e-324 is one subnormal step: its own value is only known to ±50 %, so compare at ln 2 there
      const tolerance = p < 1e-320 ? Math.LN2 : 1e-12 * Math.abs(Math.log(p));
      expect(Math.abs(logPhi - Math.log(p))).toBeLessThan(tolerance);
    }
  });

  it("round-trips through normalCdf (erfc) from 1e-300 to 1e-17 within 1e-10 relative, both sides of the 1e-200 switch", () => {
    for (let e = -300; e <= -17; e += 7) {
      const p = 10 ** e;
      expect(Math.abs(normalCdf(normalQuantile(p)) / p - 1)).toBeLessThan(1e-10);
    }
  });
});

describe("studentTQuantile in the far tails", () => {
  it("ν = 2 has the closed form t = (2p − 1)/√(2p(1 − p)) (derivation of the t₂ distribution function, (c)), finite at p = 1e-320", () => {
    for (const p of [1e-320, 1e-200, 1e-30, 1e-5]) {
      const exact = (2 * p - 1) / Math.sqrt(2 * p * (1 - p));
      expect(Math.abs(studentTQuantile(p, 2) / exact - 1)).toBeLessThan(1e-12);
    }
  });

  it("ν = 1 (Cauchy, t = −1/tan(πp)) beyond the float64 range is an OVERFLOW error naming the probability", () => {
    const error = caught(() => studentTQuantile(1e-320, 1)) as HotjunctionRangeError;
    expect(error).toBeInstanceOf(HotjunctionRangeError);
    expect(error).toMatchObject({ code: "OVERFLOW", quantity: "probability", value: 1e-320 });
    expect(studentTQuantile(1e-300, 1)).toBeCloseTo(-1 / (Math.PI * 1e-300) / 1e299, -300);
  });

  it("small lower-tail p keeps its precision: t(p) = −t(1 − p) where 1 − p is exact, finite for ν = 5 at 1e-30", () => {
    expect(studentTQuantile(0.25, 7)).toBe(-studentTQuantile(0.75, 7)); // 1 − 0.75 is exact
    const t = studentTQuantile(1e-30, 5);
    expect(Number.isFinite(t)).toBe(true);
    expect(t).toBeLessThan(studentTQuantile(1e-20, 5));
  });
});

describe("distributions whose numbers leave the float64 range", () => {
  it("a rectangular from −1e308 to 1e308 (width overflows) is refused, naming the half-width 1e308 and the range ±1e150", () => {
    const error = caught(() => rectangular({ lower: -1e308, upper: 1e308 }));
    expect(error).toBeInstanceOf(HotjunctionRangeError);
    expect(error).toMatchObject({ code: "OUT_OF_RANGE", quantity: "half-width", value: 1e308, min: -1e150, max: 1e150 });
  });

  it("a forged distribution with a mean of 1e308 is refused by propagate and distributionCoverageInterval", () => {
    const forged = { kind: "normal", mean: 1e308, standardUncertainty: 1 } as never;
    expect(caught(() => propagate(({ x }) => x, { x: forged }))).toMatchObject({ code: "OUT_OF_RANGE", quantity: "mean", value: 1e308 });
    expect(caught(() => distributionCoverageInterval(forged))).toMatchObject({ code: "OUT_OF_RANGE", quantity: "mean" });
  });

  it("a model whose finite outputs overflow the squares gives OVERFLOW for rss and Monte Carlo, never Infinity", () => {
    const inputs = { x: normal({ mean: 1, standardDeviation: 0.1 }) };
    for (const method of ["rss", "monte-carlo"] as const) {
      const error = caught(() => propagate(({ x }) => x * 1e200, inputs, { method, trials: 1000 }));
      expect(error).toBeInstanceOf(HotjunctionRangeError);
      expect(error).toMatchObject({ code: "OVERFLOW", max: Number.MAX_VALUE });
    }
  });
});

describe("options with null, missing or forged values", () => {
  const inputs = { a: normal({ mean: 0, standardDeviation: 1 }), b: rectangular({ center: 0, halfWidth: 1 }) };
  const add = ({ a, b }: { a: number; b: number }) => a + b;
  const cases: [string, unknown, string, string][] = [
    ["method null", { method: null }, "INVALID_OPTION", "method"],
    ["interval null", { method: "monte-carlo", trials: 100, interval: null }, "INVALID_OPTION", "interval"],
    ["adaptive null", { method: "monte-carlo", adaptive: null }, "INVALID_OPTION", "options"],
    ["adaptive digits forged", { method: "monte-carlo", adaptive: { significantDigits: { valueOf: () => 2 } } }, "NOT_A_FINITE_NUMBER", "significantDigits"],
    ["seed null", { method: "monte-carlo", trials: 100, seed: null }, "NOT_A_FINITE_NUMBER", "seed"],
    ["trials NaN", { method: "monte-carlo", trials: Number.NaN }, "NOT_A_FINITE_NUMBER", "trials"],
    ["trials 1e10", { method: "monte-carlo", trials: 1e10 }, "OUT_OF_RANGE", "trials"],
    ["coverage true", { coverage: true }, "NOT_A_FINITE_NUMBER", "coverage"],
    ["correlation NaN", { correlations: [["a", "b", Number.NaN]] }, "NOT_A_FINITE_NUMBER", "correlation coefficient"],
    // eslint-disable-next-line no-sparse-arrays
    ["correlation with a hole", { correlations: [[, "b", 0.5]] }, "UNKNOWN_NAME", "input name"],
    ["correlations null", { correlations: null }, "INVALID_OPTION", "correlations"],
    ["normalBoundCoverage null", { method: "worst-case", normalBoundCoverage: null }, "NOT_A_FINITE_NUMBER", "normalBoundCoverage"],
    ["onProgress null", { method: "monte-carlo", trials: 100, onProgress: null }, "INVALID_OPTION", "onProgress"],
    ["options null", null, "INVALID_OPTION", "options"],
  ];
  it.each(cases)("%s → typed error %s naming %s", (_name, options, code, quantity) => {
    const error = caught(() => propagate(add, inputs, options as never));
    expect(isHotjunctionError(error)).toBe(true);
    expect(error instanceof HotjunctionRangeError || error instanceof HotjunctionTypeError).toBe(true);
    expect(error).toMatchObject({ code, quantity });
    expect("value" in (error as object)).toBe(true);
  });

  it("NaN inside an inputs record, a distribution given as an array, a mean with valueOf: typed errors", () => {
    expect(caught(() => propagate(add, { a: inputs.a, b: Number.NaN } as never))).toMatchObject({ code: "INVALID_OPTION", quantity: "distribution" });
    expect(caught(() => propagate(add, { a: inputs.a, b: [Number.NaN] } as never))).toMatchObject({ code: "INVALID_OPTION", quantity: "distribution" });
    expect(caught(() => normal({ mean: { valueOf: () => 1 }, standardDeviation: 1 } as never))).toMatchObject({ code: "NOT_A_FINITE_NUMBER", quantity: "mean" });
  });
});
