import { describe, expect, it } from "vitest";
import {
  customaryToleranceFractions,
  preferredSeries,
  seriesE12,
  seriesE192,
  seriesE24,
  seriesE48,
  seriesE6,
  seriesE96,
} from "../../src/data/preferredSeries.js";

/** round(10^(i/N), decimals) as the series rule writes it (IEC 60063). */
function ruleValue(i: number, n: number, decimals: number): number {
  return Number((10 ** (i / n)).toFixed(decimals));
}

describe("IEC 60063 preferred-number series", () => {
  it("E48 and E96 equal round(10^(i/N), 2) for every index", () => {
    // IEC 60063:2015 via error-budget-checks §4 (a, b): every E48/E96 value follows the rule
    expect(seriesE48).toHaveLength(48);
    expect(seriesE96).toHaveLength(96);
    seriesE48.forEach((v, i) => expect(v).toBe(ruleValue(i, 48, 2)));
    seriesE96.forEach((v, i) => expect(v).toBe(ruleValue(i, 96, 2)));
  });

  it("E192 equals round(10^(i/192), 2) except index 185, which is 9.20 (the rule gives 9.19)", () => {
    // IEC 60063:2015 via error-budget-checks §4 (a, b)
    expect(seriesE192).toHaveLength(192);
    seriesE192.forEach((v, i) => {
      if (i === 185) {
        expect(v).toBe(9.2);
        expect(ruleValue(i, 192, 2)).toBe(9.19);
      } else {
        expect(v).toBe(ruleValue(i, 192, 2));
      }
    });
  });

  it("E24 equals round(10^(i/24), 1) except the eight historical values", () => {
    // IEC 60063:2015 via error-budget-checks §4: historical 2.7 3.0 3.3 3.6 3.9 4.3 4.7 8.2 (rule 2.6 2.9 3.2 3.5 3.8 4.2 4.6 8.3)
    const historical = new Map([
      [10, [2.7, 2.6]],
      [11, [3.0, 2.9]],
      [12, [3.3, 3.2]],
      [13, [3.6, 3.5]],
      [14, [3.9, 3.8]],
      [15, [4.3, 4.2]],
      [16, [4.7, 4.6]],
      [22, [8.2, 8.3]],
    ]);
    seriesE24.forEach((v, i) => {
      const exception = historical.get(i);
      if (exception) {
        expect(v).toBe(exception[0]);
        expect(ruleValue(i, 24, 1)).toBe(exception[1]);
      } else {
        expect(v).toBe(ruleValue(i, 24, 1));
      }
    });
  });

  it("E24 matches the published two-digit list literally", () => {
    // IEC 60063:2015, list copied in error-budget-checks §4 (a)
    const published = "1.0 1.1 1.2 1.3 1.5 1.6 1.8 2.0 2.2 2.4 2.7 3.0 3.3 3.6 3.9 4.3 4.7 5.1 5.6 6.2 6.8 7.5 8.2 9.1";
    expect(seriesE24.map((v) => v.toFixed(1)).join(" ")).toBe(published);
  });

  it("E12 and E6 are every second and every fourth E24 value", () => {
    // IEC 60063 structure (from memory): E12 = 1.0 1.2 1.5 1.8 2.2 2.7 3.3 3.9 4.7 5.6 6.8 8.2
    expect(seriesE12).toEqual(seriesE24.filter((_, i) => i % 2 === 0));
    expect(seriesE6).toEqual(seriesE24.filter((_, i) => i % 4 === 0));
  });

  it("each finer E-series of the 2-decimal family contains the coarser one", () => {
    // IEC 60063 structure: E48 ⊂ E96 ⊂ E192 (every second value), from memory
    expect(seriesE48).toEqual(seriesE96.filter((_, i) => i % 2 === 0));
    expect(seriesE96).toEqual(seriesE192.filter((_, i) => i % 2 === 0));
  });

  it("every list ascends strictly within one decade", () => {
    for (const values of Object.values(preferredSeries)) {
      expect(values[0]).toBe(1);
      for (let i = 1; i < values.length; i++) expect(values[i]!).toBeGreaterThan(values[i - 1]!);
      expect(values[values.length - 1]!).toBeLessThan(10);
    }
  });

  it("lists the customary tolerances", () => {
    // error-budget-checks §4 (a): E24 5 % (also 2 %, 1 %), E48 2 %, E96 1 %, E192 0.5 % and tighter
    expect(customaryToleranceFractions.E24).toEqual([0.05, 0.02, 0.01]);
    expect(customaryToleranceFractions.E48[0]).toBe(0.02);
    expect(customaryToleranceFractions.E96[0]).toBe(0.01);
    expect(customaryToleranceFractions.E192[0]).toBe(0.005);
  });
});
