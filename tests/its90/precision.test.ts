// Float64 evaluation against a 40-digit decimal.js evaluation of the same printed coefficients
// (NIST Monograph 175 reference functions, as in ../shared/its90/coefficients.json).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { emfFromTemperature, temperatureRange, thermocoupleTypes } from "../../src/index.js";
import { emfDecimal, grid } from "./helpers.js";

describe("float64 forward evaluation vs 40-digit decimal", () => {
  for (const type of thermocoupleTypes) {
    it(`type ${type}: |E_float − E_decimal| ≤ 1e-10 mV over a dense grid and random points`, () => {
      const r = temperatureRange(type);
      let worst = 0;
      const check = (t: number): void => {
        const diff = Math.abs(emfDecimal(type, t).minus(emfFromTemperature(type, t)).toNumber());
        worst = Math.max(worst, diff);
        expect(diff, `type ${type} at ${t} °C`).toBeLessThanOrEqual(1e-10);
      };
      for (const t of grid(r.minC, r.maxC, 1500)) check(t);
      fc.assert(
        fc.property(fc.double({ min: r.minC, max: r.maxC, noNaN: true }), (t) => {
          check(t);
        }),
        { seed: 90, numRuns: 300 },
      );
      // Plain Horner reaches about 3e-11 mV at the cold end of T and E; we require no worse than 1e-10.
      expect(worst).toBeLessThan(1e-10);
    });
  }
});
