/**
 * Cold-junction mapping (law of intermediate temperatures, reference sheet §6) and the fixed-scale
 * amplifier's nonlinearity (§7).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  coldJunctionIndicatedC,
  coldJunctionSensitivity,
  emfFromTemperature,
  fixedScaleNonlinearityC,
  hardwareCompensationMillivolts,
  hardwareCompensationResidual,
  readingFromChain,
  seebeckCoefficient,
  temperatureFromChainReading,
  temperatureFromEmf,
  type FixedScaleAmplifierElement,
  type HardwareColdJunction,
  type MeasurementChain,
} from "../../src/index.js";

describe("cold-junction compensation", () => {
  it("V = 20.644 − 1.000 mV at t_c = 25 °C gives t_h = 500.0 °C ±0.01 (NIST SRD 60 type K table)", () => {
    const chain: MeasurementChain = {
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
      coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0.5 },
      detector: { kind: "adc", bits: 24, fullScaleVolts: 0.05 },
      ambient: { minC: 25, maxC: 25 },
    };
    const r = temperatureFromChainReading(chain, { volts: 0.019644 }, { coldJunctionSensorC: 25 });
    expect(Math.abs(r.temperatureC - 500)).toBeLessThan(0.01);
  });

  it("an error δ of the cold junction maps exactly through E⁻¹(E(t_h) − E(t_c) + E(t_c + δ)) (reference sheet §6, (c))", () => {
    for (const [type, th, tc, d] of [["K", 500, 25, 1], ["K", 1000, 40, -2], ["J", 300, 0, 0.5], ["T", 200, 30, 1], ["S", 1400, 25, 2]] as const) {
      const expected = temperatureFromEmf(type, emfFromTemperature(type, th) - emfFromTemperature(type, tc) + emfFromTemperature(type, tc + d));
      expect(coldJunctionIndicatedC(type, th, tc, d)).toBeCloseTo(expected, 9);
    }
  });

  it("to first order the hot-junction error is δ·S(t_c)/S(t_h), not 1:1 (reference sheet §6, (c))", () => {
    for (const [type, th] of [["K", 500], ["K", 1000], ["S", 1200], ["T", 300]] as const) {
      const ratio = coldJunctionSensitivity(type, th, 25);
      expect(ratio).toBeCloseTo(seebeckCoefficient(type, 25) / seebeckCoefficient(type, th), 12);
      const d = 0.01;
      const err = coldJunctionIndicatedC(type, th, 25, d) - th;
      expect(err / d).toBeCloseTo(ratio, 3);
    }
    // Type S: S(25 °C) ≈ 5.9 µV/°C, S(1200 °C) ≈ 11.5 µV/°C, so a 1 °C error shows as about 0.5 °C (NIST SRD 60 type S).
    expect(coldJunctionSensitivity("S", 1200, 25)).toBeGreaterThan(0.45);
    expect(coldJunctionSensitivity("S", 1200, 25)).toBeLessThan(0.55);
  });

  it("with software compensation the reading model reproduces the exact mapping for a sensor error", () => {
    const chain: MeasurementChain = {
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
      coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 2 },
      amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 100 } },
      detector: { kind: "adc", bits: 24, fullScaleVolts: 5 },
      ambient: { minC: 25, maxC: 25 },
    };
    const r = readingFromChain(chain, 500, { sourceValues: { "coldJunction.sensorAccuracy": 2, "adc.quantization": 0 } });
    expect(r.indicatedC).toBeCloseTo(coldJunctionIndicatedC("K", 500, 25, 2), 6);
  });

  it("hardware compensation: E(t₀) + α(t − t₀), residual zero at t₀ and equal to comp − E(t) (reference sheet §7, (c))", () => {
    const cj: HardwareColdJunction = { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 40.6, matchedAtC: 25 };
    // E(25 °C) = 1.000 mV (NIST SRD 60 type K table).
    expect(hardwareCompensationMillivolts(cj, "K", 25)).toBeCloseTo(1.0, 3);
    const r = hardwareCompensationResidual(cj, "K", { minC: 0, maxC: 50 });
    // At 0 °C: 1.000 − 0.0406·25 − 0 = −0.015 mV = −15 µV, using the table's E(25) = 1.000 mV.
    expect(r.minMicrovolts).toBeCloseTo((emfFromTemperature("K", 25) - 0.0406 * 25) * 1000, 4);
    expect(r.minAtC).toBe(0);
    expect(Math.abs(r.minMicrovolts + 15)).toBeLessThan(0.5);
    expect(r.maxMicrovolts).toBeGreaterThanOrEqual(0);
  });
});

describe("fixed-scale amplifier nonlinearity (reference sheet §7, (c))", () => {
  const amp: FixedScaleAmplifierElement = { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5, trimmedMicrovoltsPerC: 41.276 };

  it("vanishes at t_h = t_c", () => {
    fc.assert(
      fc.property(fc.double({ min: -20, max: 80, noNaN: true }), (t) => {
        expect(Math.abs(fixedScaleNonlinearityC(amp, t, t))).toBeLessThan(1e-9);
        expect(Math.abs(fixedScaleNonlinearityC(amp, t + 1e-6, t))).toBeLessThan(1e-5);
      }),
      { seed: 7, numRuns: 200 },
    );
  });

  it("equals [E(t_h) − E(t_c)]/α + t_c − t_h", () => {
    for (const [th, tc] of [[500, 25], [1000, 0], [200, 40]] as const) {
      const expected = (emfFromTemperature("K", th) - emfFromTemperature("K", tc)) / 0.041276 + tc - th;
      expect(fixedScaleNonlinearityC(amp, th, tc)).toBeCloseTo(expected, 9);
    }
  });

  it("a chain with the part reads t_ind = V/S with that nonlinearity", () => {
    const chain: MeasurementChain = {
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
      amplifier: amp,
      reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.01 },
      detector: { kind: "comparator" },
      ambient: { minC: 25, maxC: 25 },
    };
    const r = readingFromChain(chain, 500);
    expect(r.indicatedC - 500).toBeCloseTo(fixedScaleNonlinearityC(amp, 500, 25), 9);
    expect(r.volts).toBeCloseTo((r.indicatedC * 5) / 1000, 12);
  });
});
