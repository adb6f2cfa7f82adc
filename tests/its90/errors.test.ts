// Every error path of the conversion API: non-numbers, NaN, ±Infinity, -0, exact range limits, unknown type,
// type B ambiguity, cold-junction options, bulk arrays. Messages follow one grammar (src/errors.ts).
import { describe, expect, it } from "vitest";
import {
  emfFromTemperature,
  emfFromTemperatureArray,
  HotjunctionRangeError,
  HotjunctionTypeError,
  isHotjunctionError,
  seebeckCoefficient,
  temperatureFromEmf,
  temperatureFromEmfArray,
  temperatureRange,
  thermocoupleTypes,
  createThermocouple,
} from "../../src/index.js";

function caught(fn: () => unknown): unknown {
  try {
    fn();
  } catch (error) {
    return error;
  }
  throw new Error("expected a throw");
}

describe("bad input", () => {
  it("NaN, ±Infinity and non-numbers give a TypeError naming the quantity", () => {
    for (const bad of [Number.NaN, Infinity, -Infinity, "25", null, undefined, {}]) {
      const e1 = caught(() => emfFromTemperature("K", bad as number));
      expect(e1).toBeInstanceOf(TypeError);
      expect(e1).toBeInstanceOf(HotjunctionTypeError);
      expect((e1 as HotjunctionTypeError).code).toBe("NOT_A_FINITE_NUMBER");
      expect(String((e1 as Error).message)).toMatch(/^type K: temperature .* is not a finite number$/);
      expect(caught(() => temperatureFromEmf("K", bad as number))).toBeInstanceOf(TypeError);
      expect(caught(() => seebeckCoefficient("K", bad as number))).toBeInstanceOf(TypeError);
    }
  });

  it("a temperature outside the range gives a RangeError naming type, quantity, value and range", () => {
    const e = caught(() => emfFromTemperature("K", 1372.0000001)) as HotjunctionRangeError;
    expect(e).toBeInstanceOf(RangeError);
    expect(e.message).toBe("type K: temperature 1372.0000001 °C is out of range; valid range -270 to 1372 °C");
    expect(e.code).toBe("OUT_OF_RANGE");
    expect([e.min, e.max, e.unit, e.value]).toEqual([-270, 1372, "°C", 1372.0000001]);
    expect(isHotjunctionError(e)).toBe(true);
    expect(() => emfFromTemperature("T", -270.001)).toThrow("type T: temperature -270.001 °C is out of range; valid range -270 to 400 °C");
  });

  it("an EMF outside the range gives a RangeError with the range in mV", () => {
    const r = temperatureRange("J");
    const e = caught(() => temperatureFromEmf("J", 70)) as HotjunctionRangeError;
    expect(e).toBeInstanceOf(RangeError);
    expect(e.message).toBe(`type J: EMF 70 mV is out of range; valid range ${r.minEmfMillivolts} to ${r.maxEmfMillivolts} mV`);
  });

  it("exact range limits are accepted; -0 is accepted and equals +0", () => {
    for (const type of thermocoupleTypes) {
      const r = temperatureRange(type);
      expect(Number.isFinite(emfFromTemperature(type, r.minC))).toBe(true);
      expect(Number.isFinite(emfFromTemperature(type, r.maxC))).toBe(true);
      expect(temperatureFromEmf(type, r.maxEmfMillivolts)).toBeCloseTo(r.maxC, 9);
      if (type !== "B") expect(temperatureFromEmf(type, r.minEmfMillivolts)).toBeCloseTo(r.minC, 6);
    }
    expect(emfFromTemperature("K", -0)).toBe(emfFromTemperature("K", 0));
    expect(temperatureFromEmf("K", -0)).toBe(temperatureFromEmf("K", 0));
    expect(Math.abs(temperatureFromEmf("T", -0))).toBeLessThanOrEqual(1e-9);
  });

  it("an unknown type names the valid types", () => {
    expect(() => emfFromTemperature("k" as "K", 20)).toThrow('thermocouple type "k" is not a known type; valid: B, E, J, K, N, R, S, T');
    expect(() => emfFromTemperature("__proto__" as "K", 20)).toThrow(/not a known type/);
    expect(caught(() => emfFromTemperature(42 as unknown as "K", 20))).toBeInstanceOf(TypeError);
    expect(() => createThermocouple({} as never)).toThrow(/thermocouple data a value of type object is not a type's data/);
  });

  it("type B refuses EMFs whose temperature is ambiguous (E ≤ 0 mV) instead of guessing", () => {
    // NIST type_b.tab: E falls to −0.003 mV near 21 °C and is 0.000 again at 42 °C, so each EMF in
    // [−0.0025850, 0] mV belongs to two temperatures.
    for (const emf of [0, -0, -0.001, -0.0025]) {
      const e = caught(() => temperatureFromEmf("B", emf)) as HotjunctionRangeError;
      expect(e).toBeInstanceOf(RangeError);
      expect(e.code).toBe("AMBIGUOUS_EMF");
      expect(e.message).toMatch(/^type B: EMF .* mV is ambiguous \(E dips below 0 mV up to 42.13 °C: two temperatures\); use an EMF above 0 mV$/);
    }
    expect((caught(() => temperatureFromEmf("B", -0.003)) as HotjunctionRangeError).code).toBe("OUT_OF_RANGE");
    expect(temperatureFromEmf("B", 1e-6)).toBeGreaterThan(42.13);
    expect(temperatureRange("B").unambiguousFromC).toBeCloseTo(42.13, 2);
  });

  it("cold-junction options are checked: temperature range, non-numbers, compensated EMF range", () => {
    expect(() => temperatureFromEmf("K", 1, { coldJunctionC: 2000 })).toThrow(
      "type K: cold-junction temperature 2000 °C is out of range; valid range -270 to 1372 °C",
    );
    expect(caught(() => temperatureFromEmf("K", 1, { coldJunctionC: Number.NaN }))).toBeInstanceOf(TypeError);
    expect(() => temperatureFromEmf("K", 54.5, { coldJunctionC: 25 })).toThrow(/cold-junction-compensated EMF 55.5/);
    expect(caught(() => emfFromTemperature("K", 1, 5 as never))).toBeInstanceOf(TypeError);
  });

  it("bulk functions name the first bad element and check the output array", () => {
    expect(() => emfFromTemperatureArray("K", new Float64Array([0, 1, Number.NaN]))).toThrow(/temperature \[2\] NaN/);
    expect(() => emfFromTemperatureArray("K", new Float64Array([0, 5000]))).toThrow(/temperature \[1\] 5000 °C is out of range/);
    expect(() => temperatureFromEmfArray("B", new Float64Array([1, 0]))).toThrow(/EMF \[1\] 0 mV is ambiguous/);
    expect(() => temperatureFromEmfArray("K", new Float64Array([1, 2]), new Float64Array(1))).toThrow(/output array/);
    expect(() => emfFromTemperatureArray("K", [1, 2] as never)).toThrow(/is not a Float64Array/);
  });

  it("no conversion ever returns NaN over a sweep that crosses every range end", () => {
    for (const type of thermocoupleTypes) {
      const r = temperatureRange(type);
      for (let t = r.minC - 5; t <= r.maxC + 5; t += 0.37) {
        try {
          expect(Number.isNaN(emfFromTemperature(type, t))).toBe(false);
        } catch (error) {
          expect(error).toBeInstanceOf(RangeError);
        }
      }
    }
  });
});

describe("cold-junction compensation", () => {
  it("a type K junction at 25 °C adds E(25 °C) = 1.000 mV (NIST type K table, from memory)", () => {
    expect(emfFromTemperature("K", 25).toFixed(3)).toBe("1.000");
    // error-budget-checks.md §6 (NIST table points): V = 20.644 − 1.000 mV with t_c = 25 °C -> 500.0 °C (±0.01).
    expect(Math.abs(temperatureFromEmf("K", 19.644, { coldJunctionC: 25 }) - 500)).toBeLessThanOrEqual(0.01);
  });

  it("forward twin: the EMF an instrument sees is E(t_h) − E(t_cj), and the two directions invert", () => {
    for (const type of thermocoupleTypes) {
      const r = temperatureRange(type);
      const cold = Math.max(r.unambiguousFromC + 1, 23);
      for (const hot of [r.maxC * 0.3, r.maxC * 0.7]) {
        const seen = emfFromTemperature(type, hot, { coldJunctionC: cold });
        expect(seen).toBeCloseTo(emfFromTemperature(type, hot) - emfFromTemperature(type, cold), 12);
        expect(Math.abs(temperatureFromEmf(type, seen, { coldJunctionC: cold }) - hot)).toBeLessThan(1e-8);
      }
    }
  });
});
