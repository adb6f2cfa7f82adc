/**
 * Unit conversions whose result leaves the float64 range are a typed OVERFLOW error naming the quantity, not
 * ±Infinity (found by tests/contract; the float64 limit, IEEE 754, is about 1.8e308).
 */
import { describe, expect, it } from "vitest";
import { celsiusToFahrenheit, HotjunctionRangeError, millivoltsToMicrovolts, voltsToMillivolts } from "../src/index.js";

describe("unit conversions at the float64 edge", () => {
  it.each([
    ["voltsToMillivolts", () => voltsToMillivolts(1e308)],
    ["voltsToMillivolts", () => voltsToMillivolts(-1e308)],
    ["millivoltsToMicrovolts", () => millivoltsToMicrovolts(1e308)],
    ["celsiusToFahrenheit", () => celsiusToFahrenheit(1e308)],
  ])("%s refuses a result beyond ±1.8e308", (_, call) => {
    let error: unknown;
    try {
      call();
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(HotjunctionRangeError);
    expect((error as HotjunctionRangeError).code).toBe("OVERFLOW");
    expect((error as HotjunctionRangeError).message).toMatch(/(voltage|temperature) 1e\+308|-1e\+308/);
  });

  it("the largest finite inputs that fit still convert exactly (1e305 V = 1e308 mV)", () => {
    expect(voltsToMillivolts(1e305)).toBe(1e308);
    expect(millivoltsToMicrovolts(-1e305)).toBe(-1e308);
  });
});
