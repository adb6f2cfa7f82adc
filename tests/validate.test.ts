// The one validator home (src/errors.ts): every check throws a typed error of the family whose message follows
// `<context>: <quantity> <value> <unit> <problem>; valid range …`. Precise-error checks (common practice, no source).
import { describe, expect, it } from "vitest";
import {
  _requireBeta,
  _requireChoice,
  _requireFraction,
  _requireGreaterThan,
  _requireInteger,
  _requireNonNegative,
  _requireObject,
  _requireOrderedPair,
  _requirePositive,
  _requireProbability,
  HotjunctionRangeError,
  HotjunctionTypeError,
} from "../src/errors.js";
import * as chainCommon from "../src/chain/_common.js";
import * as uncertaintyChecks from "../src/uncertainty/_checks.js";

describe("validators", () => {
  it("_requireGreaterThan refuses an equal value (strict inequality)", () => {
    expect(_requireGreaterThan(80.000001, "hazardLimitC", 80, "°C", "review")).toBe(80.000001);
    expect(() => _requireGreaterThan(80, "hazardLimitC", 80, "°C", "review", "maxNormalOperatingC 80 °C")).toThrow(
      new HotjunctionRangeError({
        code: "OUT_OF_RANGE",
        quantity: "hazardLimitC",
        value: 80,
        min: 80,
        unit: "°C",
        context: "review",
        problem: "is not greater than maxNormalOperatingC 80 °C",
      }),
    );
    try {
      _requireGreaterThan(80, "hazardLimitC", 80, "°C", "review", "maxNormalOperatingC 80 °C");
      expect.unreachable();
    } catch (e) {
      expect((e as Error).message).toBe(
        "review: hazardLimitC 80 °C is not greater than maxNormalOperatingC 80 °C; valid range 80 to Infinity °C",
      );
    }
    expect(() => _requireGreaterThan(Number.NaN, "x", 0)).toThrow(HotjunctionTypeError);
  });

  it("one message grammar for every check", () => {
    const cases: [() => unknown, string][] = [
      [() => _requirePositive(0, "gain", "V/V", "amplifier"), "amplifier: gain 0 V/V is not greater than 0; valid range 0 to Infinity V/V"],
      [() => _requireNonNegative(-1, "half-width", undefined, "rectangular"), "rectangular: half-width -1 is negative; valid range 0 to Infinity"],
      [() => _requireFraction(1, "toleranceFraction", "divider"), "divider: toleranceFraction 1 fraction is 1 or more (fractions are stated as 0.01 for 1 %); valid range 0 to 1 fraction"],
      [() => _requireProbability(1, "coverage", "propagate"), "propagate: coverage 1 is not strictly between 0 and 1; valid range 0 to 1"],
      [() => _requireInteger(2.5, "trials", 1, 10, "propagate"), "propagate: trials 2.5 is not an integer; valid range 1 to 10"],
      [() => _requireBeta(2, "trapezoidal"), "trapezoidal: beta 2 is out of range; valid range 0 to 1"],
      [() => _requireOrderedPair(5, 4, "minC", "maxC", "°C", "ambient"), "ambient: maxC 4 °C is below minC 5 °C; valid range 5 to Infinity °C"],
      [() => _requireObject(null, "amplifier", "chain"), "chain: amplifier null is not an object"],
      [() => _requireChoice("E7", "resistor series", ["E12", "E24"], "trip"), 'trip: resistor series "E7" is not a valid choice; valid: E12, E24'],
    ];
    for (const [run, message] of cases) expect(run).toThrow(message);
  });

  it("the old locations re-export the same functions", () => {
    expect(chainCommon._requirePositive).toBe(_requirePositive);
    expect(chainCommon._requireObject).toBe(_requireObject);
    expect(uncertaintyChecks._requireNonNegative).toBe(_requireNonNegative);
    expect(uncertaintyChecks._requireProbability).toBe(_requireProbability);
  });
});
