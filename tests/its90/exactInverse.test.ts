// The exact inverse against the true root of the exact polynomial, found in 40-digit decimal arithmetic
// (coefficients of NIST Monograph 175 / NIST SRD 60). Bound promised: 1e-9 °C, or 1e-10 mV / S(t) where
// the Seebeck coefficient is small.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  approximateInverseRanges,
  approximateTemperatureFromEmf,
  emfFromTemperature,
  seebeckCoefficient,
  temperatureFromEmf,
  temperatureFromEmfArray,
  temperatureRange,
  thermocoupleTypes,
  type ThermocoupleType,
} from "../../src/index.js";
import { grid, residualMillivolts } from "./helpers.js";

/**
 * Distance from t to the true root of E_decimal(t*) = emf, by one decimal Newton step from t (t is within
 * 1e-9 °C, so the step's own error is of order 1e-18 °C).
 */
function distanceToRoot(type: ThermocoupleType, t: number, emf: number): number {
  const slopeMvPerC = seebeckCoefficient(type, t) / 1000;
  return Math.abs(residualMillivolts(type, t, emf) / slopeMvPerC);
}

function allowed(type: ThermocoupleType, t: number): number {
  const slopeMvPerC = Math.abs(seebeckCoefficient(type, t) / 1000);
  return Math.max(1e-9, 1e-10 / slopeMvPerC);
}

/** EMFs that fall in the tiny step between two sub-ranges have no root; skip them (tested in seams.test.ts). */
function inSeamGap(type: ThermocoupleType, emf: number): boolean {
  const r = temperatureRange(type);
  for (const seamC of seamTemperatures(type)) {
    if (seamC <= r.minC || seamC >= r.maxC) continue;
    const below = emfFromTemperature(type, seamC - 1e-7);
    const at = emfFromTemperature(type, seamC);
    if (emf >= Math.min(below, at) - 1e-9 && emf <= Math.max(below, at) + 1e-9) return true;
  }
  return false;
}

export function seamTemperatures(type: ThermocoupleType): number[] {
  const seams: Record<ThermocoupleType, number[]> = {
    B: [630.615], E: [0], J: [760], K: [0], N: [0], R: [1064.18, 1664.5], S: [1064.18, 1664.5], T: [0],
  };
  return seams[type];
}

describe("temperatureFromEmf is the exact inverse", () => {
  for (const type of thermocoupleTypes) {
    it(`type ${type}: within 1e-9 °C (or 1e-10 mV/S) of the decimal root, dense and random`, () => {
      const r = temperatureRange(type);
      const lowEmf = type === "B" ? 1e-9 : r.minEmfMillivolts;
      const check = (emf: number): void => {
        if (inSeamGap(type, emf)) return;
        const t = temperatureFromEmf(type, emf);
        expect(Number.isFinite(t)).toBe(true);
        const d = distanceToRoot(type, t, emf);
        expect(d, `type ${type} at ${emf} mV -> ${t} °C`).toBeLessThanOrEqual(allowed(type, t));
      };
      for (const emf of grid(lowEmf, r.maxEmfMillivolts, 800)) check(emf);
      fc.assert(
        fc.property(fc.double({ min: lowEmf, max: r.maxEmfMillivolts, noNaN: true }), (emf) => check(emf)),
        { seed: 175, numRuns: 300 },
      );
      // The exact range ends.
      check(r.maxEmfMillivolts);
      if (type !== "B") check(r.minEmfMillivolts);
    });
  }

  it("bulk inverse equals the scalar inverse bit for bit", () => {
    for (const type of thermocoupleTypes) {
      const r = temperatureRange(type);
      const emfs = new Float64Array(grid(type === "B" ? 0.001 : r.minEmfMillivolts, r.maxEmfMillivolts, 2000));
      const out = temperatureFromEmfArray(type, emfs);
      emfs.forEach((e, i) => expect(out[i]).toBe(temperatureFromEmf(type, e)));
    }
  });
});

describe("published approximate inverse (NIST Monograph 175 inverse coefficients and error bands)", () => {
  for (const type of thermocoupleTypes) {
    it(`type ${type}: stays inside the stated band per sub-range; the exact inverse is ≥ 10,000× closer`, () => {
      for (const range of approximateInverseRanges(type)) {
        let worstApprox = 0;
        let worstExact = 0;
        // The published EMF limits are rounded to 0.001 mV; scan the temperatures whose EMF lies inside them.
        for (const t of grid(range.minC, range.maxC, 3000)) {
          const emf = emfFromTemperature(type, t);
          if (emf < range.minEmfMillivolts || emf > range.maxEmfMillivolts) continue;
          // Within a hair of a sub-range seam the forward function is double-valued by the seam's step
          // (up to 1.2e-6 °C, type J); seams.test.ts covers that neighbourhood.
          if (seamTemperatures(type).some((seamC) => Math.abs(t - seamC) < 1e-3)) continue;
          // Each published polynomial on its own (the API picks one where R and S ranges overlap).
          let approx = 0;
          for (let i = range.coefficients.length - 1; i >= 0; i--) approx = approx * emf + (range.coefficients[i] as number);
          const err = approx - t;
          // Bands are printed to 0.01 °C (0.0001 °C for S range 3); allow half a printed digit.
          const slack = range.errorMaxC - range.errorMinC < 0.001 ? 0.00005 : 0.005;
          expect(err, `type ${type} at ${t} °C`).toBeGreaterThanOrEqual(range.errorMinC - slack);
          expect(err, `type ${type} at ${t} °C`).toBeLessThanOrEqual(range.errorMaxC + slack);
          worstApprox = Math.max(worstApprox, Math.abs(err));
          worstExact = Math.max(worstExact, Math.abs(temperatureFromEmf(type, emf) - t));
        }
        expect(worstApprox).toBeGreaterThan(0);
        // Round trip through float64 forward evaluation: a few 1e-11 °C at most.
        expect(worstExact * 10_000, `type ${type} range ${range.minC}..${range.maxC}`).toBeLessThanOrEqual(worstApprox);
      }
    });
  }

  it("where R and S published ranges overlap (1064…1200 °C) the narrower band (range 3) is used", () => {
    for (const type of ["R", "S"] as const) {
      const [, second, third] = approximateInverseRanges(type);
      const emf = emfFromTemperature(type, 1100);
      let expected = 0;
      const d = third?.coefficients ?? [];
      for (let i = d.length - 1; i >= 0; i--) expected = expected * emf + (d[i] as number);
      expect(second?.maxEmfMillivolts).toBeGreaterThan(emf);
      expect(approximateTemperatureFromEmf(type, emf)).toBe(expected);
    }
  });

  it("outside the published inverse's EMF range it throws a RangeError naming the range", () => {
    expect(() => approximateTemperatureFromEmf("K", -6)).toThrow(/type K published approximate inverse: EMF -6 mV is out of range; valid range -5.891 to 54.886 mV/);
    expect(() => approximateTemperatureFromEmf("B", 0.2)).toThrow(RangeError);
  });
});
