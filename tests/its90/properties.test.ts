// Properties over every type's full range (fast-check, fixed seeds; dense grids).
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  createThermocouple,
  emfFromTemperature,
  emfFromTemperatureArray,
  seebeckCoefficient,
  temperatureFromEmf,
  temperatureRange,
  thermocoupleData,
  thermocoupleTypes,
} from "../../src/index.js";
import { grid } from "./helpers.js";

describe("ITS-90 properties", () => {
  for (const type of thermocoupleTypes) {
    const r = temperatureRange(type);
    const bound = (t: number): number => Math.max(1e-9, 1e-10 / Math.abs(seebeckCoefficient(type, t) / 1000));

    it(`type ${type}: round trip t -> E -> t within the bound, 5,000 random points`, () => {
      fc.assert(
        fc.property(fc.double({ min: r.unambiguousFromC, max: r.maxC, noNaN: true }), (t) => {
          const emf = emfFromTemperature(type, t);
          if (type === "B" && emf <= 0) return;
          // Round trip adds the float forward evaluation's own error (≤ 1e-10 mV, see precision.test.ts).
          expect(Math.abs(temperatureFromEmf(type, emf) - t)).toBeLessThanOrEqual(bound(t) + 1e-10 / Math.abs(seebeckCoefficient(type, t) / 1000) + 2e-6 * (Math.abs(t - 760) < 1e-3 ? 1 : 0));
        }),
        { seed: 60584, numRuns: 5000 },
      );
    });

    it(`type ${type}: E strictly increasing from ${r.unambiguousFromC.toFixed(2)} °C (dense, 0.05 °C steps)`, () => {
      let previous = -Infinity;
      for (let t = r.unambiguousFromC; t <= r.maxC; t += 0.05) {
        const e = emfFromTemperature(type, t);
        expect(e, `${type} at ${t}`).toBeGreaterThan(previous);
        previous = e;
      }
    });

    it(`type ${type}: seebeckCoefficient agrees with a central difference of the forward function`, () => {
      const ranges = thermocoupleData(type).forward.map((f) => [Number(f.minC), Number(f.maxC)] as const);
      for (const [lo, hi] of ranges) {
        for (const t of grid(lo + 0.02, hi - 0.02, 300)) {
          // Central differences with Richardson extrapolation (error O(h⁴)); h large enough that the forward
          // function's float noise (≤ 1e-10 mV) stays below 1e-5 µV/°C.
          const d = (h: number): number => (emfFromTemperature(type, t + h) - emfFromTemperature(type, t - h)) / (2 * h);
          const central = ((4 * d(0.005) - d(0.01)) / 3) * 1000;
          const analytic = seebeckCoefficient(type, t);
          expect(Math.abs(central - analytic), `${type} at ${t}`).toBeLessThanOrEqual(2e-5 + 1e-6 * Math.abs(analytic));
        }
      }
    });

    it(`type ${type}: bulk forward equals scalar bit for bit and writes into the given array`, () => {
      const ts = new Float64Array(grid(r.minC, r.maxC, 997));
      const out = new Float64Array(ts.length);
      const returned = emfFromTemperatureArray(type, ts, out);
      expect(returned).toBe(out);
      ts.forEach((t, i) => expect(out[i]).toBe(emfFromTemperature(type, t)));
    });

    it(`type ${type}: createThermocouple(data) gives the same numbers as the letter API`, () => {
      const tc = createThermocouple(thermocoupleData(type));
      for (const t of grid(r.unambiguousFromC, r.maxC, 50)) {
        expect(tc.emfFromTemperature(t)).toBe(emfFromTemperature(type, t));
        expect(tc.seebeckCoefficient(t)).toBe(seebeckCoefficient(type, t));
        const e = emfFromTemperature(type, t);
        if (type === "B" && e <= 0) continue;
        expect(tc.temperatureFromEmf(e)).toBe(temperatureFromEmf(type, e));
      }
    });
  }

  it("inputs are never mutated by the bulk functions", () => {
    const ts = new Float64Array([0, 100, 200]);
    const copy = Float64Array.from(ts);
    emfFromTemperatureArray("K", ts);
    expect(Array.from(ts)).toEqual(Array.from(copy));
  });
});
