/**
 * Reference data cannot be changed under later results (deeply frozen), a data object the package did not
 * generate is validated once (by defineThermocoupleData, or by the letter API on first use; createThermocouple
 * refuses it unchecked), and booleans or null are never read as temperatures. The widened-range case is the one reported
 * in review: type K's polynomial evaluated at 4000 °C (far outside its 0…1372 °C sub-range of NIST SRD 60)
 * returned −254,308 mV.
 */
import { describe, expect, it } from "vitest";
import * as hj from "../../src/index.js";
import {
  HotjunctionRangeError,
  HotjunctionTypeError,
  createThermocouple,
  defineThermocoupleData,
  typeK,
  type ThermocoupleData,
} from "../../src/index.js";

function caught(f: () => unknown): unknown {
  try {
    f();
  } catch (error) {
    return error;
  }
  return undefined;
}

/** Every object reachable from `value` (arrays and plain objects), with its path. */
function reachable(value: unknown, path: string, out: [string, object][] = []): [string, object][] {
  if (typeof value === "object" && value !== null) {
    out.push([path, value]);
    for (const [k, v] of Object.entries(value)) reachable(v, `${path}.${k}`, out);
  }
  return out;
}

const exportedData: Record<string, unknown> = {
  typeB: hj.typeB, typeE: hj.typeE, typeJ: hj.typeJ, typeK: hj.typeK, typeN: hj.typeN, typeR: hj.typeR, typeS: hj.typeS, typeT: hj.typeT,
  typeBApproximateInverse: hj.typeBApproximateInverse, typeEApproximateInverse: hj.typeEApproximateInverse,
  typeJApproximateInverse: hj.typeJApproximateInverse, typeKApproximateInverse: hj.typeKApproximateInverse,
  typeNApproximateInverse: hj.typeNApproximateInverse, typeRApproximateInverse: hj.typeRApproximateInverse,
  typeSApproximateInverse: hj.typeSApproximateInverse, typeTApproximateInverse: hj.typeTApproximateInverse,
  thermocoupleTypes: hj.thermocoupleTypes,
};

describe("exported reference data is deeply frozen", () => {
  it("every object and array reachable from the type data, inverse data and type list", () => {
    let objects = 0;
    for (const [name, value] of Object.entries(exportedData)) {
      for (const [path, obj] of reachable(value, name)) {
        objects++;
        expect(Object.isFrozen(obj), path).toBe(true);
      }
    }
    expect(objects).toBeGreaterThan(16 * 3);
  });

  it("an attempt to change a coefficient throws in strict mode and changes no result", () => {
    const before = hj.emfFromTemperature("K", 500);
    const coefficients = typeK.forward[1]?.coefficients as number[];
    expect(() => {
      coefficients[1] = 1;
    }).toThrow(TypeError);
    expect(hj.emfFromTemperature("K", 500)).toBe(before);
  });
});

describe("a data object the package did not generate is validated (defineThermocoupleData, or the letter API on first use)", () => {
  const forged = (patch: Partial<ThermocoupleData>): ThermocoupleData => ({ ...typeK, ...patch });
  // Both ways a foreign data object enters the engine run the same check.
  const entries: [string, (data: ThermocoupleData) => unknown][] = [
    ["defineThermocoupleData", (data) => defineThermocoupleData(data)],
    ["the letter API", (data) => hj.emfFromTemperature(data, 100)],
  ];

  for (const [name, enter] of entries) {
    it(`${name}: a range widened beyond the sub-ranges is refused (it extrapolated to −254,308 mV at 4000 °C)`, () => {
      const e = (() => {
        try {
          enter(forged({ maxC: 4000 }));
        } catch (error) {
          return error;
        }
        return undefined;
      })();
      expect(e).toBeInstanceOf(HotjunctionRangeError);
      expect((e as HotjunctionRangeError).code).toBe("INVALID_OPTION");
      expect((e as Error).message).toMatch(/thermocouple data range .*; valid range -270 to 1372 °C/);
      expect(() => enter(forged({ minC: -300 }))).toThrow(HotjunctionRangeError);
      expect(() => enter(forged({ minC: 100, maxC: 100 }))).toThrow(HotjunctionRangeError);
    });

    it(`${name}: non-finite or missing coefficients, gaps between sub-ranges and a broken exponential term are refused`, () => {
      const [low, high] = typeK.forward as [ThermocoupleData["forward"][number], ThermocoupleData["forward"][number]];
      const cases: ThermocoupleData["forward"][] = [
        [low, { ...high, coefficients: [...high.coefficients.slice(0, 3), Number.NaN] }],
        [low, { ...high, coefficients: [...high.coefficients.slice(0, 3), Infinity] }],
        [low, { ...high, coefficients: ["1" as unknown as number] }],
        [low, { ...high, coefficients: [] }],
        [low, { ...high, minC: 10 }],
        [{ ...low, maxC: -300 }, high],
        [low, null as unknown as typeof high],
        [],
      ];
      for (const forward of cases) expect(() => enter(forged({ forward }))).toThrow(/thermocouple data|data/);
      expect(() => enter(forged({ exponential: { a0: Number.NaN, a1: 0, a2: 0 } }))).toThrow(HotjunctionRangeError);
      expect(caught(() => enter({ forward: 3 } as unknown as ThermocoupleData))).toBeInstanceOf(HotjunctionTypeError);
    });
  }

  it("a valid copy of a type's data gives the same numbers as the original (the check accepts the standard's data)", () => {
    for (const letter of hj.thermocoupleTypes) {
      const data = hj[`type${letter}`];
      const copy = JSON.parse(JSON.stringify(data)) as ThermocoupleData;
      const checked = createThermocouple(defineThermocoupleData(copy));
      const t = (data.minC + data.maxC) / 2;
      expect(checked.emfFromTemperature(t)).toBe(hj.emfFromTemperature(letter, t));
      expect(hj.emfFromTemperature(copy, t)).toBe(hj.emfFromTemperature(letter, t));
    }
  });

  it("createThermocouple takes checked data only: an unchecked object, even a valid copy, is UNKNOWN_TYPE", () => {
    for (const bad of [JSON.parse(JSON.stringify(typeK)), forged({}), forged({ maxC: 4000 }), {}, null, "K"]) {
      const e = caught(() => createThermocouple(bad as ThermocoupleData)) as HotjunctionTypeError;
      expect(e).toBeInstanceOf(HotjunctionTypeError);
      expect(e.code).toBe("UNKNOWN_TYPE");
      expect(e.message).toMatch(/^thermocouple data .* is not a type's data \(typeB … typeT, defineThermocoupleData\)$/);
    }
  });
});

describe("null and booleans are not temperatures", () => {
  it("every scalar its90 input refuses null, true and false with a typed error", () => {
    const k = createThermocouple(typeK);
    for (const bad of [null, true, false]) {
      const calls: (() => unknown)[] = [
        () => hj.emfFromTemperature("K", bad as unknown as number),
        () => hj.temperatureFromEmf("K", bad as unknown as number),
        () => hj.seebeckCoefficient("K", bad as unknown as number),
        () => hj.approximateTemperatureFromEmf("K", bad as unknown as number),
        () => hj.emfFromTemperature("K", 100, { coldJunctionC: bad as unknown as number }),
        () => hj.temperatureFromEmf("K", 1, { coldJunctionC: bad as unknown as number }),
        () => k.emfFromTemperature(bad as unknown as number),
        () => k.temperatureFromEmf(bad as unknown as number),
        () => k.seebeckCoefficient(bad as unknown as number),
      ];
      for (const call of calls) expect(call).toThrow(HotjunctionTypeError);
    }
  });
});
