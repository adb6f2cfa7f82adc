import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { selectDividerPair } from "../../src/trip/selectDividerPair.js";
import { selectLadder } from "../../src/trip/selectLadder.js";
import { standardResistorValues } from "../../src/trip/standardResistorValues.js";
import type { PreferredSeriesName } from "../../src/data/preferredSeries.js";
import { HotjunctionRangeError } from "../../src/errors.js";

/** Brute force over every (top, bottom) pair of the same value list, same total bounds. */
function bruteForce(k: number, series: PreferredSeriesName, minTotal: number, maxTotal: number, minResistor: number,
  errorOf: (ratio: number) => number): number {
  const values = standardResistorValues(series, minResistor, maxTotal);
  let best = Infinity;
  for (const top of values) {
    for (const bottom of values) {
      const total = top + bottom;
      if (total < minTotal || total > maxTotal) continue;
      best = Math.min(best, Math.abs(errorOf(bottom / (top + bottom))));
    }
  }
  return best;
}

describe("selectDividerPair", () => {
  it("finds an exact E24 pair when one exists", () => {
    // 1.25 V from 5 V: 30 kΩ over 10 kΩ, k = 0.25 exactly (hand calculation)
    const pair = selectDividerPair(0.25, { series: "E24", minTotalOhms: 10000, maxTotalOhms: 100000 });
    expect(pair.ratio).toBe(0.25);
    expect(pair.error).toBe(0);
    expect(pair.bottomOhms / pair.topOhms).toBe(1 / 3);
  });

  it("equals a brute force over all pairs (random targets, series and bounds)", () => {
    // Property: the two-neighbour search is exhaustive (k monotone in R2 for fixed R1).
    fc.assert(
      fc.property(
        fc.double({ min: 0.002, max: 0.998, noNaN: true }),
        fc.constantFrom<PreferredSeriesName>("E6", "E12", "E24", "E48", "E96"),
        fc.integer({ min: 10, max: 5000 }),
        fc.double({ min: 1.5, max: 300, noNaN: true }),
        fc.boolean(),
        (k, series, minTotal, spread, voltsOrNonlinear) => {
          const maxTotal = Math.round(minTotal * spread);
          // Error measures: volts from 5 V, or a nonlinear monotone (cubic-ish) trip-temperature error.
          const errorOf = voltsOrNonlinear
            ? (ratio: number) => 5 * (ratio - k)
            : (ratio: number) => 400 * (Math.sqrt(ratio) - Math.sqrt(k)) + 30 * (ratio ** 3 - k ** 3);
          let pair;
          try {
            pair = selectDividerPair(k, { series, minTotalOhms: minTotal, maxTotalOhms: maxTotal, minResistorOhms: 10, errorOfRatio: errorOf });
          } catch (e) {
            // only when no pair fits: brute force must agree
            expect(e).toBeInstanceOf(HotjunctionRangeError);
            expect(bruteForce(k, series, minTotal, maxTotal, 10, errorOf)).toBe(Infinity);
            return;
          }
          expect(pair.totalOhms).toBeGreaterThanOrEqual(minTotal);
          expect(pair.totalOhms).toBeLessThanOrEqual(maxTotal);
          expect(Math.abs(pair.error)).toBe(bruteForce(k, series, minTotal, maxTotal, 10, errorOf));
        },
      ),
      { seed: 20261201, numRuns: 150 },
    );
  });

  it("checks at most two pairs per top resistor", () => {
    const pair = selectDividerPair(0.123, { series: "E192", minTotalOhms: 1000, maxTotalOhms: 1e6 });
    expect(pair.pairsChecked).toBeLessThanOrEqual(2 * standardResistorValues("E192", 1, 1e6).length);
    // E192 ratio rounding is below half a step (±0.6 %) in k — 1e-3 of 0.123 is generous
    expect(Math.abs(pair.ratio - 0.123)).toBeLessThan(1.3e-4);
  });

  it("throws on a ratio outside (0, 1) and on bounds that hold no pair", () => {
    expect(() => selectDividerPair(1, { series: "E24" })).toThrow(HotjunctionRangeError);
    expect(() => selectDividerPair(0, { series: "E24" })).toThrow(HotjunctionRangeError);
    expect(() => selectDividerPair(0.5, { series: "E6", minTotalOhms: 1, maxTotalOhms: 1.5 })).toThrow(/leave no pair/);
  });
});

describe("selectLadder", () => {
  it("with one tap matches the exhaustive two-resistor optimum", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.constantFrom<PreferredSeriesName>("E12", "E24", "E96"),
        (k, series) => {
          const options = { series, minTotalOhms: 2000, maxTotalOhms: 200000, minResistorOhms: 10 };
          const pair = selectDividerPair(k, options);
          const ladder = selectLadder([k], options);
          expect(ladder.resistorsOhms).toHaveLength(2);
          expect(ladder.maxAbsError).toBe(Math.abs(pair.error));
        },
      ),
      { seed: 7, numRuns: 60 },
    );
  });

  it("gives exact taps when the series allows them, taps ordered from the top", () => {
    // 1.5 kΩ + 750 Ω + 750 Ω: taps at 2/4 and 1/4 (hand calculation); ties keep the smallest bottom resistor
    const ladder = selectLadder([0.25, 0.5], { series: "E24", minTotalOhms: 3000, maxTotalOhms: 5000 });
    expect(ladder.resistorsOhms).toEqual([1500, 750, 750]);
    expect(ladder.ratios).toEqual([0.25, 0.5]);
    expect(ladder.tapBelowResistor).toEqual([1, 0]);
  });

  it("keeps every tap within the worst single-pair rounding of the series for three taps", () => {
    // Property (our own bound): E96 steps are ≈2.4 %; each tap's ratio error stays below one step.
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.double({ min: 0.05, max: 0.95, noNaN: true }), { minLength: 3, maxLength: 3, comparator: (a, b) => Math.abs(a - b) < 0.02 }),
        (ks) => {
          const ladder = selectLadder(ks, { series: "E96", minTotalOhms: 10000, maxTotalOhms: 1e6 });
          ladder.ratios.forEach((r, i) => expect(Math.abs(r / ks[i]! - 1)).toBeLessThan(0.024));
          expect(ladder.totalOhms).toBeLessThanOrEqual(1e6);
          expect(ladder.totalOhms).toBeGreaterThanOrEqual(10000);
        },
      ),
      { seed: 11, numRuns: 25 },
    );
  });

  it("throws on repeated ratios", () => {
    expect(() => selectLadder([0.3, 0.3], { series: "E24" })).toThrow(/appears twice/);
  });
});
