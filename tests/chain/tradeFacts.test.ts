/**
 * Trade facts about comparator trip chains fed from a reference (common practice, no source).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  nominalTripTemperature,
  propagate,
  readingFromChain,
  tripTemperatureModel,
  type MeasurementChain,
} from "../../src/index.js";

// A linear 5 mV/°C signal (fixed-scale amplifier) against thresholds from a 5 V rail through a divider.
// Thermocouple and divider ideal, so the rail's tolerance is the only source.
function chain(railFraction: number, resistorsOhms: number[], extras: Partial<MeasurementChain> = {}): MeasurementChain {
  return {
    thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
    amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
    reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: railFraction },
    divider: { kind: "divider", resistorsOhms, toleranceFraction: 0 },
    detector: { kind: "comparator" },
    ambient: { minC: 25, maxC: 25 },
    ...extras,
  };
}

/** Worst-case trip band, read back as the temperatures the 5 mV/°C signal indicates there. */
function indicatedTripBand(c: MeasurementChain, tap: number): [number, number] {
  const m = tripTemperatureModel(c, tap);
  const w = propagate(m.model, m.inputs, { method: "worst-case" });
  return [readingFromChain(c, w.interval[0]).indicatedC, readingFromChain(c, w.interval[1]).indicatedC];
}

describe("trade facts (common practice, no source)", () => {
  it("5 mV/°C against a 5 V rail good to ±4 %: the 250 mV threshold for 50 °C lands anywhere in 240–260 mV, i.e. 48–52 °C", () => {
    const c = chain(0.04, [95000, 5000]);
    expect(nominalTripTemperature(c, 0).thresholdVolts).toBeCloseTo(0.25, 12);
    const [lo, hi] = indicatedTripBand(c, 0);
    expect(lo).toBeCloseTo(48, 6);
    expect(hi).toBeCloseTo(52, 6);
  });
  it("the 2.00 V threshold for 400 °C can be as high as 2.08 V, i.e. 416 °C", () => {
    const c = chain(0.04, [3000, 2000]);
    expect(nominalTripTemperature(c, 0).thresholdVolts).toBeCloseTo(2.0, 12);
    const [lo, hi] = indicatedTripBand(c, 0);
    expect(hi).toBeCloseTo(416, 6);
    expect(lo).toBeCloseTo(384, 6);
  });
  it("when temperature is proportional to voltage, a reference error becomes the same relative temperature error", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.001, max: 0.05, noNaN: true }), fc.integer({ min: 1000, max: 9000 }), (fraction, bottom) => {
        const c = chain(fraction, [10000 - bottom, bottom]);
        const nominal = (5 * bottom) / 10000 / 0.005;
        const [lo, hi] = indicatedTripBand(c, 0);
        expect((hi - nominal) / nominal).toBeCloseTo(fraction, 9);
        expect((nominal - lo) / nominal).toBeCloseTo(fraction, 9);
      }),
      { seed: 11, numRuns: 25 },
    );
  });
  it("a 1 % reference in such a chain can do no better than 1 % in temperature", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.01, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        (dividerTol, offsetMv, tempco) => {
          const c = chain(0, [3000, 2000], {
            reference: { kind: "reference", variant: "series", nominalVolts: 5, initialAccuracyFraction: 0.01, tempcoPpmPerC: tempco },
            divider: { kind: "divider", resistorsOhms: [3000, 2000], toleranceFraction: dividerTol },
            detector: { kind: "comparator", offsetMillivolts: offsetMv },
            ambient: { minC: 0, maxC: 50 },
          });
          const nominal = readingFromChain(c, nominalTripTemperature(c, 0).tripC).indicatedC;
          const [lo, hi] = indicatedTripBand(c, 0);
          expect((hi - lo) / 2 / nominal).toBeGreaterThanOrEqual(0.01 - 1e-9);
        },
      ),
      { seed: 5, numRuns: 20 },
    );
  });
});
