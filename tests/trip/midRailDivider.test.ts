import { describe, expect, it } from "vitest";
import { midRailDivider } from "../../src/trip/midRailDivider.js";
import { HotjunctionRangeError } from "../../src/errors.js";

describe("midRailDivider", () => {
  it("two equal 1 % resistors on 5 V: 2.5 V ± 1 %, u_rel = t/√6", () => {
    // error-budget-checks §9 (c): ∂ln k/∂ln R = ±(1 − k) = ±½; exact extremes (1 ± t)/2 (hand calculation)
    const mid = midRailDivider(5, 0.01);
    expect(mid.nominalVolts).toBe(2.5);
    expect(mid.worstCaseLowVolts).toBeCloseTo(2.475, 12);
    expect(mid.worstCaseHighVolts).toBeCloseTo(2.525, 12);
    expect(mid.worstCaseFraction).toBeCloseTo(0.01, 12);
    expect(mid.relativeStandardUncertainty).toBeCloseTo(0.01 / Math.sqrt(6), 12);
  });
  it("adds the rail tolerance: 5 V ±4 % rail with 1 % resistors", () => {
    // 5 V regulator ±4 % (error-budget-checks §5 (a)); extremes 2.5·(1 ± 0.04)(1 ± 0.01) (hand calculation)
    const mid = midRailDivider(5, 0.01, { referenceToleranceFraction: 0.04 });
    expect(mid.worstCaseHighVolts).toBeCloseTo(2.5 * 1.04 * 1.01, 12);
    expect(mid.worstCaseLowVolts).toBeCloseTo(2.5 * 0.96 * 0.99, 12);
  });
  it("throws on a negative tolerance or a zero rail", () => {
    expect(() => midRailDivider(5, -0.01)).toThrow(HotjunctionRangeError);
    expect(() => midRailDivider(0, 0.01)).toThrow(HotjunctionRangeError);
  });
});
