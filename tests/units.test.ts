// Unit helpers. Definitions: ITS-90 T90/K = t90/°C + 273.15; t_F = 1.8·t_C + 32 (common practice, no source).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  celsiusToFahrenheit,
  celsiusToKelvin,
  fahrenheitToCelsius,
  kelvinToCelsius,
  microvoltsToMillivolts,
  millivoltsToMicrovolts,
  millivoltsToVolts,
  voltsToMillivolts,
} from "../src/index.js";

describe("units", () => {
  it("fixed points: 0 °C = 273.15 K = 32 °F; 100 °C = 212 °F; −40 °C = −40 °F", () => {
    expect(celsiusToKelvin(0)).toBe(273.15);
    expect(kelvinToCelsius(273.15)).toBe(0);
    expect(celsiusToFahrenheit(100)).toBe(212);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    expect(fahrenheitToCelsius(32)).toBe(0);
  });
  it("round trips over many inputs", () => {
    fc.assert(
      fc.property(fc.double({ min: -273.15, max: 1e5, noNaN: true }), (t) => {
        expect(kelvinToCelsius(celsiusToKelvin(t))).toBeCloseTo(t, 9);
        expect(fahrenheitToCelsius(celsiusToFahrenheit(t))).toBeCloseTo(t, 9);
      }),
      { seed: 1 },
    );
    expect(millivoltsToVolts(voltsToMillivolts(1.25))).toBe(1.25);
    expect(microvoltsToMillivolts(millivoltsToMicrovolts(3.5))).toBe(3.5);
  });
  it("below absolute zero and non-finite values are refused", () => {
    expect(() => celsiusToKelvin(-273.16)).toThrow("temperature -273.16 °C is below absolute zero");
    expect(() => kelvinToCelsius(-1)).toThrow(RangeError);
    expect(() => fahrenheitToCelsius(-460)).toThrow(RangeError);
    expect(() => voltsToMillivolts(Number.NaN)).toThrow(TypeError);
  });
});
