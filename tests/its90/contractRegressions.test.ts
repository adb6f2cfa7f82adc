/**
 * Regressions found by tests/contract in the data check of foreign thermocouple data (`defineThermocoupleData`;
 * `createThermocouple` takes only built-in or defined data and refuses anything else as UNKNOWN_TYPE): a type or
 * source that is not a string, a non-finite first sub-range end, an exponential term that is not an object of
 * finite numbers, and a sub-range end without a string form are refused (they came back in the result as
 * NaN/Infinity, or threw a plain TypeError). An exponential term that carries other keys is read as its three numbers
 * (its `minC` replaced the range of the compiled type: −5000 °C was converted; an `inverse` key replaced the tables).
 */
import { describe, expect, it } from "vitest";
import { typedErrorOf } from "../_typedError.js";
import { createThermocouple, defineThermocoupleData, emfFromTemperature, temperatureFromEmf, typeK, type ThermocoupleData } from "../../src/index.js";


const forged = (patch: Record<string, unknown>): ThermocoupleData => ({ ...typeK, ...patch }) as never;
const withSubrange = (i: number, patch: Record<string, unknown>): ThermocoupleData =>
  forged({ forward: typeK.forward.map((f, k) => (k === i ? { ...f, ...patch } : f)) });

describe("defineThermocoupleData refuses forged data (and createThermocouple refuses it undefined)", () => {
  it("a type or source that is not a string is no type's data (UNKNOWN_TYPE)", () => {
    for (const type of [Object.create(null), Number.NaN, Number.POSITIVE_INFINITY, [Number.NaN]]) expect(typedErrorOf(() => defineThermocoupleData(forged({ type }))).code).toBe("UNKNOWN_TYPE");
    for (const source of [Number.NaN, Number.NEGATIVE_INFINITY, [Number.NaN]]) expect(typedErrorOf(() => defineThermocoupleData(forged({ source }))).code).toBe("UNKNOWN_TYPE");
  });

  it("a non-finite or non-numeric sub-range end, and an exponential term that is not finite numbers (INVALID_OPTION)", () => {
    expect(typedErrorOf(() => defineThermocoupleData(withSubrange(0, { minC: Number.NEGATIVE_INFINITY }))).code).toBe("INVALID_OPTION");
    const noStringForm = typedErrorOf(() => defineThermocoupleData(withSubrange(1, { maxC: Object.create(null) })));
    expect([noStringForm.code, noStringForm.quantity]).toEqual(["INVALID_OPTION", "thermocouple data range"]);
    for (const exponential of [Number.NaN, null, 0, { a0: 1, a1: Number.NaN, a2: 1 }]) expect(typedErrorOf(() => defineThermocoupleData(forged({ exponential }))).code).toBe("INVALID_OPTION");
  });

  it("type K's own data still builds, a defined copy too (NIST SRD 60: E(500 °C) = 20.644 mV); a forged object is refused by createThermocouple", () => {
    expect(createThermocouple(typeK).emfFromTemperature(500)).toBeCloseTo(20.644, 3);
    expect(createThermocouple(defineThermocoupleData(forged({}))).emfFromTemperature(500)).toBeCloseTo(20.644, 3);
    expect(typedErrorOf(() => createThermocouple(withSubrange(0, { minC: Number.NEGATIVE_INFINITY }))).code).toBe("UNKNOWN_TYPE");
  });

  it("an exponential term with other keys is read as its three numbers only (letter API and defineThermocoupleData)", () => {
    const exponential = { ...typeK.exponential, minC: -1e9, maxC: 1e9, subranges: [], inverse: { pieces: [] } };
    const data = forged({ exponential });
    // the range stays type K's, −270 to 1372 °C (NIST SRD 60)
    const e = typedErrorOf(() => emfFromTemperature(data, -5000));
    expect([e.code, e.min, e.max]).toEqual(["OUT_OF_RANGE", -270, 1372]);
    // NIST SRD 60, type K: E(500 °C) = 20.644 mV; the exact inverse returns 500 °C for the exact forward value
    expect(emfFromTemperature(data, 500)).toBeCloseTo(20.644, 3);
    expect(temperatureFromEmf(data, emfFromTemperature("K", 500))).toBeCloseTo(500, 9);
    expect(Object.keys(defineThermocoupleData(data).exponential ?? {})).toEqual(["a0", "a1", "a2"]);
  });
});
