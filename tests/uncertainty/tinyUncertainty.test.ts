// Regression: an input whose standard uncertainty is so small that x ± u/100 rounds back to x (or underflows)
// must still give finite sensitivities and a finite result (found by property testing of the chain models).
import { describe, expect, it } from "vitest";
import { propagate, rectangular } from "../../src/index.js";

describe("propagate with vanishing input uncertainty", () => {
  for (const halfWidth of [5e-324, 1e-300, 1e-200, 1e-20]) {
    it(`rss stays finite and exact for y = 2a + b with a's half-width ${halfWidth}`, () => {
      const result = propagate((x) => 2 * (x["a"] as number) + (x["b"] as number), {
        a: rectangular({ center: 1, halfWidth }),
        b: rectangular({ center: 0, halfWidth: 1 }),
      }, { method: "rss" });
      // u(y) = u(b) = 1/√3 (JCGM 100 4.3.7 rectangular), a's share vanishes.
      expect(result.standardUncertainty).toBeCloseTo(1 / Math.sqrt(3), 12);
      expect(result.contributions["a"]?.sensitivity).toBeCloseTo(2, 6);
      expect(Number.isFinite(result.interval[0]) && Number.isFinite(result.interval[1])).toBe(true);
    });
  }
});
