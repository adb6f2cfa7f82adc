import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { normalCdf, normalQuantile, studentTQuantile } from "../../src/uncertainty/index.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../../src/errors.js";
import { g13, normalCoverageFactors, t95Table } from "../fixtures/uncertaintyChecks.js";

describe("normalQuantile / normalCdf", () => {
  it("matches known quantiles to 1e-12 (values from memory, standard normal tables (b))", () => {
    expect(Math.abs(normalQuantile(0.975) - 1.959963984540054)).toBeLessThan(1e-12);
    expect(Math.abs(normalQuantile(0.95) - 1.6448536269514722)).toBeLessThan(1e-12);
    expect(Math.abs(normalQuantile(0.995) - 2.5758293035489004)).toBeLessThan(1e-12);
    expect(Math.abs(normalQuantile(0.8413447460685429) - 1)).toBeLessThan(1e-12);
    expect(normalQuantile(0.5)).toBe(0);
  });
  it.each(normalCoverageFactors)("k for $coverage coverage is $k (NIST TN 1297 §6 (a))", ({ coverage, k }) => {
    expect(Math.abs(normalQuantile((1 + coverage) / 2) - k)).toBeLessThan(0.0006);
  });
  it("Φ(Φ⁻¹(p)) = p to 1e-13 relative over (1e-12, 1 − 1e-12) (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-12, max: 1 - 1e-12, noNaN: true }), (p) => {
        const z = normalQuantile(p);
        const back = p < 0.5 ? normalCdf(z) : 1 - normalCdf(-z);
        expect(Math.abs(back - p)).toBeLessThanOrEqual(1e-13 * Math.min(p, 1 - p) + 1e-16);
      }),
      { seed: 21, numRuns: 500 },
    );
  });
  it("Φ(−1) and Φ(−5) (values from memory, standard normal tables (b))", () => {
    expect(normalCdf(-1) / 0.15865525393145707 - 1).toBeLessThan(1e-13);
    expect(Math.abs(normalCdf(-5) / 2.866515718791939e-7 - 1)).toBeLessThan(1e-12);
  });
  it("rejects p outside (0, 1) and non-finite z", () => {
    expect(() => normalQuantile(0)).toThrow(HotjunctionRangeError);
    expect(() => normalQuantile(1)).toThrow("probability 1 is not strictly between 0 and 1");
    expect(() => normalQuantile(Number.NaN)).toThrow(HotjunctionTypeError);
    expect(() => normalCdf(Number.POSITIVE_INFINITY)).toThrow(HotjunctionTypeError);
  });
});

describe("studentTQuantile", () => {
  it.each(t95Table)("G9 t95($nu) = $t (JCGM 100:2008 Table G.2, from memory (b))", ({ nu, t }) => {
    expect(Math.abs(studentTQuantile(0.975, nu) - t)).toBeLessThan(0.0005 + 1e-9);
  });
  it("G13 t95(19) = 2.093 (JCGM 100:2008 G.4.1, from memory (b))", () => {
    expect(Math.abs(studentTQuantile(0.975, 19) - g13.t95)).toBeLessThan(0.0005);
  });
  it("closed forms for ν = 1 (Cauchy) and ν = 2 agree with the general iteration's neighbours (c)", () => {
    expect(studentTQuantile(0.975, 1)).toBeCloseTo(1 / Math.tan(Math.PI * 0.025), 12);
    expect(studentTQuantile(0.975, 2)).toBeCloseTo(0.95 / Math.sqrt(2 * 0.025 * 0.975), 12);
    expect(studentTQuantile(0.975, 1.000001)).toBeCloseTo(studentTQuantile(0.975, 1), 3);
    expect(studentTQuantile(0.975, 2.000001)).toBeCloseTo(studentTQuantile(0.975, 2), 4);
    expect(studentTQuantile(0.975, 1e5)).toBeCloseTo(studentTQuantile(0.975, 99999.9), 9);
  });
  it("is odd in p − ½ and falls toward the normal quantile as ν grows (property)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5001, max: 0.9999, noNaN: true }), fc.double({ min: 0.5, max: 1e4, noNaN: true }), (p, nu) => {
        const t = studentTQuantile(p, nu);
        expect(studentTQuantile(1 - p, nu)).toBeCloseTo(-t, 8);
        expect(t).toBeGreaterThanOrEqual(normalQuantile(p) - 1e-9);
        expect(studentTQuantile(p, nu * 2)).toBeLessThanOrEqual(t + 1e-9);
      }),
      { seed: 22, numRuns: 150 },
    );
  });
  it("rejects bad arguments", () => {
    expect(() => studentTQuantile(0.975, 0)).toThrow("degrees of freedom 0 is not greater than 0");
    expect(() => studentTQuantile(1.2, 3)).toThrow(HotjunctionRangeError);
  });
});
