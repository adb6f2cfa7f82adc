// One name per quantity: the new names compute exactly what the deprecated ones did (bit for bit), and a
// deprecated key is still accepted. Checks of identity and precise errors (common practice, no source).
import { describe, expect, it } from "vitest";
import {
  emfFromTemperature,
  evaluateChain,
  normal,
  normalDistribution,
  referenceErrorSources,
  thermocoupleEmfMillivolts,
  type MeasurementChain,
  type ReferenceElement,
} from "../src/index.js";
import { _requireAdcBits } from "../src/chain/adc.js";
import { _checkAdcChain } from "../src/firmware/firmwareAdcChain.js";

const ambient = { minC: 0, maxC: 50 };

describe("one name per quantity", () => {
  it("thermocoupleEmfMillivolts is emfFromTemperature with coldJunctionC, bit for bit, over many inputs", () => {
    for (const type of ["K", "J", "N", "T", "E", "R", "S", "B"] as const) {
      for (let t = 50; t <= 395; t += 17.25) {
        for (const cj of [0, 12.5, 25, 41]) {
          for (const dev of [0, -1.5, 2.25]) {
            expect(thermocoupleEmfMillivolts(type, t, cj, dev)).toBe(emfFromTemperature(type, t + dev, { coldJunctionC: cj }));
          }
        }
      }
    }
  });

  it("normal is the deprecated alias of normalDistribution", () => {
    expect(normal).toBe(normalDistribution);
  });

  it("a regulator's initialAccuracyFraction is the one key; the deprecated initialToleranceFraction gives the same source", () => {
    const base = { kind: "reference", variant: "regulator", nominalVolts: 5, lineRegulationFraction: 0.005 } as const;
    const byNew = referenceErrorSources({ ...base, initialAccuracyFraction: 0.02 } as ReferenceElement, ambient);
    const byOld = referenceErrorSources({ ...base, initialToleranceFraction: 0.02 } as ReferenceElement, ambient);
    expect(byNew).toEqual(byOld);
    expect(byNew.find((s) => s.name === "reference.initialTolerance")?.limit).toBe(0.02);
    expect(() =>
      referenceErrorSources({ ...base, initialAccuracyFraction: 0.02, initialToleranceFraction: 0.02 } as ReferenceElement, ambient),
    ).toThrow(/initialToleranceFraction 0.02 is the deprecated name of initialAccuracyFraction/);
    expect(() => referenceErrorSources({ ...base, initialAccuracyFraction: 1.5 } as ReferenceElement, ambient)).toThrow(
      /initialAccuracyFraction 1.5 fraction is 1 or more/,
    );
  });

  it("monteCarloTrials is the chain functions' name; trials stays accepted and gives the same band", () => {
    // The demo kiln chain of tests/chain/chain.test.ts (invented numbers, demo only).
    const chain: MeasurementChain = {
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
      coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0.5, isothermalGradientC: 0.3 },
      amplifier: {
        kind: "amplifier",
        gain: { setBy: "resistors", feedbackOhms: 49900, groundOhms: 1000, toleranceFraction: 0.001, tempcoPpmPerC: 25 },
        offsetMicrovolts: 10,
      },
      reference: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: 0.0005, tempcoPpmPerC: 10 },
      detector: { kind: "adc", bits: 16, offsetLsb: 2, gainErrorFraction: 0.0005, inlLsb: 2 },
      ambient: { minC: 10, maxC: 40 },
    };
    const options = { methods: ["monte-carlo"], seed: 4 } as const;
    const a = evaluateChain(chain, 500, { ...options, monteCarloTrials: 2000 });
    const b = evaluateChain(chain, 500, { ...options, trials: 2000 });
    expect(a).toEqual(b);
    expect(() => evaluateChain(chain, 500, { ...options, trials: 2000, monteCarloTrials: 2000 })).toThrow(/monteCarloTrials/);
  });

  it("ADC resolution: one range 1 … 32 bits for the chain and the firmware chain", () => {
    expect(_requireAdcBits(32, "ADC")).toBe(32);
    expect(() => _requireAdcBits(33, "ADC")).toThrow("ADC: bits 33 is not an integer from 1 to 32; valid range 1 to 32");
    const chain = { gain: 100, referenceVolts: 2.5, offsetMillivolts: 0 };
    expect(_checkAdcChain({ ...chain, bits: 32 }, "t").maxCode).toBe(2 ** 32 - 1);
    expect(() => _checkAdcChain({ ...chain, bits: 33 }, "t")).toThrow("ADC resolution 33 is not an integer from 1 to 32");
    expect(() => _checkAdcChain({ ...chain, bits: 12.5 }, "t")).toThrow("ADC resolution 12.5 is not an integer from 1 to 32");
  });
});
