/**
 * Chain functions end to end: amplifier terms, evaluateChain by each method, reading → temperature,
 * trip and release, distribution overrides.
 */
import { describe, expect, it } from "vitest";
import {
  amplifierGain,
  chainErrorSources,
  emfFromTemperature,
  evaluateChain,
  nominalTripTemperature,
  propagate,
  readingFromChain,
  requiredThresholdVolts,
  seebeckCoefficient,
  temperatureFromChainReading,
  tripTemperatureModel,
  type MeasurementChain,
} from "../../src/index.js";

const kiln: MeasurementChain = {
  label: "ceramic kiln controller (demo)",
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
  coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0.5, isothermalGradientC: 0.3 },
  amplifier: {
    kind: "amplifier",
    gain: { setBy: "resistors", feedbackOhms: 49900, groundOhms: 1000, toleranceFraction: 0.001, tempcoPpmPerC: 25 },
    offsetMicrovolts: 10,
    offsetDriftMicrovoltsPerC: 0.05,
    biasCurrentNanoamps: 1,
    sourceResistanceOhms: 200,
  },
  reference: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: 0.0005, tempcoPpmPerC: 10 },
  detector: { kind: "adc", bits: 16, offsetLsb: 2, gainErrorFraction: 0.0005, inlLsb: 2 },
  ambient: { minC: 10, maxC: 40 },
};

describe("amplifier", () => {
  it("gain 1 + R_f/R_g; resistor tolerance moves the gain by (1 − 1/G) of it (non-inverting stage, textbook)", () => {
    const amp = { kind: "amplifier", gain: { setBy: "resistors", feedbackOhms: 99000, groundOhms: 1000, toleranceFraction: 0.01 } } as const;
    expect(amplifierGain(amp)).toBe(100);
    const c: MeasurementChain = {
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
      coldJunction: { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 40.6 },
      amplifier: amp,
      reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.01 },
      detector: { kind: "comparator" },
      ambient: { minC: 25, maxC: 25 },
    };
    const base = readingFromChain(c, 500).volts;
    const high = readingFromChain(c, 500, { sourceValues: { "amplifier.feedbackTolerance": 0.01 } }).volts;
    expect(high / base).toBeCloseTo((1 + 99 * 1.01) / 100, 12);
  });
  it("offset, drift over the ambient range and bias current × source resistance are input-referred µV", () => {
    const sources = chainErrorSources(kiln, 800);
    const byName = Object.fromEntries(sources.map((s) => [s.name, s.limit]));
    expect(byName["amplifier.offset"]).toBe(10);
    expect(byName["amplifier.offsetDrift"]).toBeCloseTo(0.05 * 15, 12); // largest |t − 25 °C| over 10…40 °C
    expect(byName["amplifier.biasCurrent"]).toBeCloseTo(0.2, 12); // 1 nA × 200 Ω = 0.2 µV
    expect(byName["amplifier.feedbackTempco"]).toBeCloseTo(25e-6 * 15, 15);
    // 10 µV at the input reads as 10/S(800 °C) °C (S from the ITS-90 function).
    const e = evaluateChain(kiln, 800, { methods: ["rss"] });
    const row = e.contributions.find((c) => c.source === "amplifier.offset");
    expect(row?.worstCaseSwingC).toBeCloseTo((2 * 10) / seebeckCoefficient("K", 800), 3);
  });
});

describe("evaluateChain", () => {
  it("nominal reading, and bounds by worst case, RSS and Monte Carlo that nest as expected", () => {
    const e = evaluateChain(kiln, 1000, { methods: ["worst-case", "rss", "monte-carlo"], monteCarloTrials: 20000, seed: 3 });
    expect(e.hotJunctionC).toBe(1000);
    expect(e.indicatedC).toBeCloseTo(1000, 1);
    const [w, r, m] = e.bounds;
    expect(w?.method).toBe("worst-case");
    expect(w?.coverage).toBe(1);
    // Class 2 at 1000 °C is ±7.5 °C (IEC 60584-1:2013), and it dominates.
    expect(w?.errorHighC).toBeGreaterThan(7.5);
    expect(w?.errorLowC).toBeLessThan(-7.5);
    expect(r?.lowC).toBeGreaterThan(w?.lowC as number);
    expect(r?.highC).toBeLessThan(w?.highC as number);
    expect(Math.abs((m?.standardUncertaintyC as number) / (r?.standardUncertaintyC as number) - 1)).toBeLessThan(0.03);
    expect(e.contributions[0]?.source).toBe("thermocouple.tolerance");
    expect(e.contributions[0]?.varianceShare).toBeGreaterThan(0.9);
  });
  it("evaluates many temperatures at once, each with its own thermocouple tolerance", () => {
    const list = evaluateChain(kiln, [100, 500, 1200], { methods: ["worst-case"] });
    expect(list.map((e) => e.contributions[0]?.limit)).toEqual([2.5, 3.75, 9]);
  });
  it("a distribution override turns a stated limit into a normal with σ = L/k", () => {
    const c: MeasurementChain = { ...kiln, sourceDistributions: { "coldJunction.sensorAccuracy": { distribution: "normal", coverageFactor: 2 } } };
    const s = chainErrorSources(c, 500).find((x) => x.name === "coldJunction.sensorAccuracy");
    expect(s?.distribution.kind).toBe("normal");
    expect(s?.distribution.standardUncertainty).toBeCloseTo(0.25, 15);
  });
});

describe("reading → temperature", () => {
  it("code from readingFromChain converts back within the bounds, and the nominal conversion is exact", () => {
    for (const t of [50, 400, 1150]) {
      const r = readingFromChain(kiln, t, { sourceValues: { "adc.quantization": 0 } });
      const back = temperatureFromChainReading(kiln, { code: r.code as number }, { coldJunctionSensorC: 25, methods: ["worst-case", "rss"] });
      expect(back.temperatureC).toBeCloseTo(t, 6);
      expect(back.bounds[0]?.lowC).toBeLessThan(t);
      expect(back.bounds[0]?.highC).toBeGreaterThan(t);
    }
  });
  it("hardware compensation: volts at the comparator input convert back through E⁻¹", () => {
    const c: MeasurementChain = {
      thermocouple: { kind: "thermocouple", type: "J", tolerance: { standard: "ASTM E230", grade: "special" } },
      coldJunction: { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 51.7, matchedAtC: 25, sensorAccuracyC: 0.5 },
      amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 100 } },
      reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.02 },
      detector: { kind: "comparator" },
      ambient: { minC: 25, maxC: 25 },
    };
    // At t_c = t₀ the compensator adds exactly E(t₀), so the amplifier sees E(t_h) (ITS-90 type J).
    expect(readingFromChain(c, 300).volts).toBeCloseTo((100 * emfFromTemperature("J", 300)) / 1000, 12);
    const back = temperatureFromChainReading(c, { volts: (100 * emfFromTemperature("J", 300)) / 1000 }, { methods: ["worst-case"] });
    expect(back.temperatureC).toBeCloseTo(300, 9);
    // ASTM E230 special limits for type J at 300 °C: ±1.2 °C (0.4 %).
    expect(back.contributions[0]?.limit).toBeCloseTo(1.2, 12);
  });
});

describe("comparator trip model", () => {
  const oven: MeasurementChain = {
    label: "reflow oven over-temperature trip (demo)",
    thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
    amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 10, accuracyC: 2 },
    reference: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: 0.001, tempcoPpmPerC: 20 },
    divider: { kind: "divider", resistorsOhms: [10000, 2490, 5110], toleranceFraction: 0.001 },
    detector: { kind: "comparator", offsetMillivolts: 1, hysteresisMillivolts: 20, hysteresisPlacement: "below" },
    ambient: { minC: 0, maxC: 50 },
  };
  it("threshold = reference × tap ratio; release below trip by the hysteresis over the signal slope", () => {
    const n = nominalTripTemperature(oven, 1);
    expect(n.tapRatio).toBeCloseTo(5110 / 17600, 12);
    expect(n.thresholdVolts).toBeCloseTo((4.096 * 5110) / 17600, 12);
    expect(n.tripC - n.releaseC).toBeGreaterThan(1.9);
    expect(n.tripC - n.releaseC).toBeLessThan(2.1);
    expect(requiredThresholdVolts(oven, n.tripC)).toBeCloseTo(n.thresholdVolts, 9);
    expect(requiredThresholdVolts(oven, n.releaseC, { edge: "release" })).toBeCloseTo(n.thresholdVolts, 9);
  });
  it("the model's nominal is the nominal trip, and its bounds contain it", () => {
    const m = tripTemperatureModel(oven, 0);
    expect(m.nominalC).toBeCloseTo(nominalTripTemperature(oven, 0).tripC, 9);
    const w = propagate(m.model, m.inputs, { method: "worst-case" });
    const mc = propagate(m.model, m.inputs, { method: "monte-carlo", trials: 20000, seed: 9 });
    expect(w.interval[0]).toBeLessThan(m.nominalC);
    expect(w.interval[1]).toBeGreaterThan(m.nominalC);
    expect(mc.interval[0]).toBeGreaterThan(w.interval[0]);
    expect(mc.interval[1]).toBeLessThan(w.interval[1]);
    expect(Object.keys(m.inputs)).toContain("ambient.coldJunctionC");
  });
  it("a release model sits below the trip model by the hysteresis", () => {
    const trip = tripTemperatureModel(oven, 0);
    const release = tripTemperatureModel(oven, 0, { edge: "release" });
    expect(trip.nominalC - release.nominalC).toBeGreaterThan(1.9);
  });
});
