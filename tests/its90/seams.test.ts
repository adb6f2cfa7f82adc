// Where two sub-range polynomials meet. The step values below were measured here in 40-digit decimal
// arithmetic from the printed coefficients (NIST Monograph 175 / SRD 60); ../shared/its90/README.md reports
// the same order (J at 760 °C: 7.5e-8 mV; K at 0 °C: 2e-9 mV; B at 630.615 °C: 2.2e-9 mV).
import type { Decimal } from "decimal.js";
import { describe, expect, it } from "vitest";
import { emfFromTemperature, seebeckCoefficient, temperatureFromEmf, thermocoupleData, type ThermocoupleType } from "../../src/index.js";
import { _decimalContext } from "../../src/its90/exactDecimal.js";

/** E of sub-range `index` at t, 40 digits (the lower polynomial evaluated at its own upper end). */
function subrangeDecimal(type: ThermocoupleType, index: number, t: string): Decimal {
  const data = thermocoupleData(type);
  const sub = data.forward[index];
  if (sub === undefined) throw new Error("no such sub-range");
  const D = _decimalContext(40);
  const x = new D(t);
  let acc = new D(0);
  for (let i = sub.coefficients.length - 1; i >= 0; i--) acc = acc.times(x).plus(new D(String(sub.coefficients[i])));
  if (data.exponential !== undefined && sub.minC >= 0) {
    const d = x.minus(new D(String(data.exponential.a2)));
    acc = acc.plus(new D(String(data.exponential.a0)).times(D.exp(new D(String(data.exponential.a1)).times(d).times(d))));
  }
  return acc;
}

// [type, lower sub-range index, seam °C, measured step E_upper − E_lower in mV]
const seams: [ThermocoupleType, number, string, number][] = [
  ["B", 0, "630.615", -2.168e-9],
  ["E", 0, "0", 0],
  ["J", 0, "760", 7.493e-8],
  ["K", 0, "0", 1.974e-9],
  ["N", 0, "0", 0],
  ["R", 0, "1064.18", 1.637e-11],
  ["R", 1, "1664.5", -1.714e-9],
  ["S", 0, "1064.18", -5.811e-11],
  ["S", 1, "1664.5", -2.735e-10],
  ["T", 0, "0", 0],
];

describe("sub-range seams", () => {
  for (const [type, index, seam, step] of seams) {
    it(`type ${type} at ${seam} °C: step ${step} mV, inverse monotone and within |step|/S of the seam`, () => {
      const measured = subrangeDecimal(type, index + 1, seam).minus(subrangeDecimal(type, index, seam)).toNumber();
      expect(Math.abs(measured - step)).toBeLessThanOrEqual(Math.max(Math.abs(step) * 1e-3, 1e-15));
      expect(Math.abs(measured)).toBeLessThan(1e-7);
      const seamC = Number(seam);
      const slope = seebeckCoefficient(type, seamC) / 1000;
      const emfAtSeam = emfFromTemperature(type, seamC);
      // Dense EMFs across the seam neighbourhood: the inverse never decreases, and near the seam it returns the
      // seam temperature to within the step's size in °C.
      let previous = -Infinity;
      for (let i = -200; i <= 200; i++) {
        const emf = emfAtSeam + i * 1e-11 * 50;
        const t = temperatureFromEmf(type, emf);
        expect(t).toBeGreaterThanOrEqual(previous);
        previous = t;
        // Type N's slope has a real kink at 0 °C (26.159 vs 25.929 µV/°C), so use each side's own slope.
        const sideSlope = emf < emfAtSeam ? seebeckCoefficient(type, seamC - 1e-9) / 1000 : slope;
        const expected = seamC + (emf - emfAtSeam) / sideSlope;
        expect(Math.abs(t - expected)).toBeLessThanOrEqual(Math.abs(step) / slope + 1e-9);
      }
    });
  }
  it("type N's slope kink at 0 °C: 26.159 µV/°C below, 25.929 µV/°C above (../shared/its90/README.md)", () => {
    expect(seebeckCoefficient("N", -1e-9)).toBeCloseTo(26.159, 3);
    expect(seebeckCoefficient("N", 0)).toBeCloseTo(25.929, 3);
  });
});
