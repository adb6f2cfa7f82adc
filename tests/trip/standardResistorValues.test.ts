import { describe, expect, it } from "vitest";
import { nearestStandardResistor, standardResistorValues } from "../../src/trip/standardResistorValues.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../../src/errors.js";

describe("standardResistorValues", () => {
  it("lists E12 across a decade boundary", () => {
    // IEC 60063 E12 significands (from memory, also every second E24 value)
    expect(standardResistorValues("E12", 680, 1500)).toEqual([680, 820, 1000, 1200, 1500]);
  });
  it("keeps inclusive bounds and exact decimal values", () => {
    const values = standardResistorValues("E96", 0.1, 1e6);
    expect(values).toContain(4.99);
    expect(values).toContain(49900);
    expect(values).toContain(1e6);
    expect(values.length).toBe(96 * 7 + 1); // 0.1 Ω … 976 kΩ is seven decades, plus 1 MΩ
    expect(standardResistorValues("E24", 4700, 4700)).toEqual([4700]);
    expect(standardResistorValues("E24", 4710, 4990)).toEqual([]);
  });
  it("throws on unknown series, reversed or non-finite bounds", () => {
    expect(() => standardResistorValues("E3" as never, 1, 10)).toThrow(HotjunctionRangeError);
    expect(() => standardResistorValues("E24", 100, 10)).toThrow(HotjunctionRangeError);
    expect(() => standardResistorValues("E24", Number.NaN, 10)).toThrow(HotjunctionTypeError);
    expect(() => standardResistorValues("E24", 0.01, 10)).toThrow(HotjunctionRangeError);
  });
  it("nearestStandardResistor picks the nearest on a log scale", () => {
    expect(nearestStandardResistor("E24", 4400)).toBe(4300);
    expect(nearestStandardResistor("E24", 4500)).toBe(4700); // log-midpoint of 4.3 and 4.7 is 4.496
    expect(nearestStandardResistor("E96", 12345)).toBe(12400);
    expect(nearestStandardResistor("E6", 9999)).toBe(10000);
  });
});
