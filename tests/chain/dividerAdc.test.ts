/**
 * Divider (reference sheet §9) and ADC (§8) checks.
 */
import { describe, expect, it } from "vitest";
import {
  adcLsbVolts,
  dividerRatioModel,
  dividerTapRatio,
  propagate,
  readingFromChain,
  temperatureFromChainReading,
  type MeasurementChain,
} from "../../src/index.js";

describe("divider", () => {
  const divider = { kind: "divider", resistorsOhms: [100000, 10000], toleranceFraction: 0.01 } as const;
  it("R₁ = 100 kΩ, R₂ = 10 kΩ: k = 0.0909091 (reference sheet §9, (c))", () => {
    expect(dividerTapRatio(divider, 0)).toBeCloseTo(0.0909091, 7);
  });
  it("1 % each: worst case 0.0892696 … 0.0925756 (reference sheet §9, (c))", () => {
    const m = dividerRatioModel(divider, 0);
    const w = propagate(m.model, m.inputs, { method: "worst-case" });
    expect(w.interval[0]).toBeCloseTo(0.0892696, 7);
    expect(w.interval[1]).toBeCloseTo(0.0925756, 7);
  });
  it("first-order bound 1.818 %, RSS with rectangular tolerances u(k)/k = 0.742 % (reference sheet §9, (c))", () => {
    const m = dividerRatioModel(divider, 0);
    const r = propagate(m.model, m.inputs, { method: "rss" });
    expect((r.standardUncertainty / m.nominalRatio) * 100).toBeCloseTo(0.742, 3);
    const firstOrder = Object.values(r.contributions).reduce((a, c) => a + Math.abs(c.sensitivity) * 0.01, 0) / m.nominalRatio;
    expect(firstOrder * 100).toBeCloseTo(1.818, 3);
  });
  it("equal tempcos track and cancel to first order; a matched network's ratio tolerance replaces the absolute one (reference sheet §9, (c))", () => {
    const hot = { minC: 25, maxC: 125 };
    const tempco = dividerRatioModel({ ...divider, toleranceFraction: 0, tempcoPpmPerC: 100 }, 0, { ambient: hot });
    const x = Object.fromEntries(Object.keys(tempco.inputs).map((n) => [n, 0.01]));
    expect(tempco.model(x)).toBeCloseTo(tempco.nominalRatio, 15);
    const matched = dividerRatioModel({ ...divider, matched: { ratioToleranceFraction: 0.001 } }, 0);
    const w = propagate(matched.model, matched.inputs, { method: "worst-case" });
    // ±r/2 on each resistor: ratio error (1 − k)·r to first order.
    expect((w.interval[1] - matched.nominalRatio) / matched.nominalRatio).toBeCloseTo((1 - 1 / 11) * 0.001, 6);
  });
  it("a string of n resistors gives n − 1 taps, ratios from the bottom up", () => {
    const d = { kind: "divider", resistorsOhms: [1000, 2000, 3000, 4000], toleranceFraction: 0.001 } as const;
    expect([0, 1, 2].map((i) => dividerTapRatio(d, i))).toEqual([0.9, 0.7, 0.4]);
    expect(() => dividerTapRatio(d, 3)).toThrow(/tap index 3 is not the index of a tap.*valid range 0 to 2/);
    expect(() => dividerTapRatio({ resistorsOhms: [1000] }, 0)).toThrow(/resistorsOhms an array of length 1 is not an array of at least two/);
  });
});

describe("ADC", () => {
  it("12 bit, 3.3 V: q = 805.664 µV, q/√12 = 232.575 µV (reference sheet §8, (c))", () => {
    expect(adcLsbVolts(12, 3.3) * 1e6).toBeCloseTo(805.664, 3);
    expect((adcLsbVolts(12, 3.3) / Math.sqrt(12)) * 1e6).toBeCloseTo(232.575, 3);
  });

  const chain = (ratiometric: boolean): MeasurementChain => ({
    thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
    coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0 },
    amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 100 } },
    reference: { kind: "reference", variant: "series", nominalVolts: 3.3, initialAccuracyFraction: 0.01 },
    detector: { kind: "adc", bits: 12, ratiometric },
    ambient: { minC: 25, maxC: 25 },
  });

  it("a thermocouple channel is not ratiometric: the ADC reference's error enters the reading 1:1 as a gain error (reference sheet §8, (c))", () => {
    const exact = readingFromChain(chain(false), 500, { sourceValues: { "adc.quantization": 0 } });
    const high = readingFromChain(chain(false), 500, { sourceValues: { "adc.quantization": 0, "reference.initialAccuracy": 0.01 } });
    expect((exact.code as number) / (high.code as number)).toBeCloseTo(1.01, 12);
    const ratio = readingFromChain(chain(true), 500, { sourceValues: { "adc.quantization": 0, "reference.initialAccuracy": 0.01 } });
    expect(ratio.code).toBeCloseTo(exact.code as number, 9);
  });
  it("quantisation: ±½ LSB rectangular; the code → temperature round trip lands within it", () => {
    const c = chain(false);
    const r = readingFromChain(c, 500);
    const code = Math.round(r.code as number);
    const t = temperatureFromChainReading(c, { code }, { coldJunctionSensorC: 25, methods: ["worst-case"] });
    const b = t.bounds[0];
    expect(b?.lowC).toBeLessThan(500);
    expect(b?.highC).toBeGreaterThan(500);
    const q = t.contributions.find((x) => x.source === "adc.quantization");
    // ½ LSB = 402.8 µV at the ADC = 4.028 µV at the thermocouple ≈ 0.0945 °C at 500 °C (S ≈ 42.6 µV/°C, NIST SRD 60).
    expect(q?.worstCaseSwingC).toBeCloseTo((2 * 4.028) / 42.63, 3);
  });
  it("bits outside 1…32 and codes outside 0…2ᴺ − 1 are refused", () => {
    expect(() => adcLsbVolts(0, 3.3)).toThrow(/bits 0 is not an integer from 1 to 32/);
    expect(() => adcLsbVolts(12.5, 3.3)).toThrow(/bits 12.5/);
    expect(() => temperatureFromChainReading(chain(false), { code: 4096 })).toThrow(/reading code 4096 LSB is out of range; valid range 0 to 4095 LSB/);
  });
});
