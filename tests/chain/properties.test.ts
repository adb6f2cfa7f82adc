/**
 * Properties of the chain models (fast-check, seeded): widening a tolerance never narrows the worst-case
 * band; the source listing and results do not depend on the key order of the description; RSS variance
 * shares sum to 1.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { chainErrorSources, evaluateChain, propagate, tripTemperatureModel, type MeasurementChain } from "../../src/index.js";

interface Knobs {
  sensorC: number;
  gainError: number;
  offsetUv: number;
  refFraction: number;
  refTempco: number;
  inlLsb: number;
  dividerTol: number;
  compOffsetMv: number;
}

// Subnormal limits are mapped to 0: a half-width of 5e-324 has a standard uncertainty that underflows to 0.
const limitArb = (max: number) => fc.double({ min: 0, max, noNaN: true }).map((v) => (v < 1e-12 ? 0 : v));

const knobs = fc.record({
  sensorC: limitArb(2),
  gainError: limitArb(0.01),
  offsetUv: limitArb(50),
  refFraction: limitArb(0.02),
  refTempco: limitArb(50),
  inlLsb: limitArb(4),
  dividerTol: limitArb(0.01),
  compOffsetMv: limitArb(5),
});

function adcChain(k: Knobs): MeasurementChain {
  return {
    thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
    coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: k.sensorC },
    amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 50, gainErrorFraction: k.gainError }, offsetMicrovolts: k.offsetUv },
    reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: k.refFraction, tempcoPpmPerC: k.refTempco },
    detector: { kind: "adc", bits: 14, inlLsb: k.inlLsb },
    ambient: { minC: 0, maxC: 50 },
  };
}

function tripChain(k: Knobs): MeasurementChain {
  return {
    thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
    coldJunction: { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 40.6, sensorAccuracyC: k.sensorC },
    amplifier: { kind: "amplifier", gain: { setBy: "resistors", feedbackOhms: 99000, groundOhms: 1000, toleranceFraction: k.gainError }, offsetMicrovolts: k.offsetUv },
    reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: k.refFraction, tempcoPpmPerC: k.refTempco },
    divider: { kind: "divider", resistorsOhms: [10000, 10000], toleranceFraction: k.dividerTol },
    detector: { kind: "comparator", offsetMillivolts: k.compOffsetMv },
    ambient: { minC: 0, maxC: 50 },
  };
}

const fields: (keyof Knobs)[] = ["sensorC", "gainError", "offsetUv", "refFraction", "refTempco", "inlLsb", "dividerTol", "compOffsetMv"];

describe("chain properties", () => {
  it("widening any tolerance never narrows the worst-case band (reading model, ADC chain)", () => {
    fc.assert(
      fc.property(knobs, fc.constantFrom(...fields), fc.double({ min: 1, max: 3, noNaN: true }), (k, field, factor) => {
        const wide = { ...k, [field]: k[field] * factor + 1e-4 };
        if (field === "gainError" || field === "refFraction" || field === "dividerTol") wide[field] = Math.min(wide[field], 0.05);
        const a = evaluateChain(adcChain(k), 400, { methods: ["worst-case"] }).bounds[0];
        const b = evaluateChain(adcChain(wide), 400, { methods: ["worst-case"] }).bounds[0];
        expect(b?.lowC).toBeLessThanOrEqual((a?.lowC as number) + 1e-9);
        expect(b?.highC).toBeGreaterThanOrEqual((a?.highC as number) - 1e-9);
      }),
      { seed: 42, numRuns: 30 },
    );
  });

  it("widening any tolerance never narrows the worst-case trip band (comparator chain)", () => {
    fc.assert(
      fc.property(knobs, fc.constantFrom(...fields), fc.double({ min: 1, max: 3, noNaN: true }), (k, field, factor) => {
        const wide = { ...k, [field]: k[field] * factor + 1e-4 };
        if (field === "gainError" || field === "refFraction" || field === "dividerTol") wide[field] = Math.min(wide[field], 0.05);
        const band = (c: MeasurementChain) => {
          const m = tripTemperatureModel(c, 0);
          return propagate(m.model, m.inputs, { method: "worst-case" }).interval;
        };
        const a = band(tripChain(k));
        const b = band(tripChain(wide));
        expect(b[0]).toBeLessThanOrEqual(a[0] + 1e-9);
        expect(b[1]).toBeGreaterThanOrEqual(a[1] - 1e-9);
      }),
      { seed: 43, numRuns: 30 },
    );
  });

  it("the source listing and results do not depend on the key order of the description", () => {
    const shuffle = <T extends object>(o: T, order: number[]): T => {
      const entries = Object.entries(o);
      const out: Record<string, unknown> = {};
      const idx = order.slice(0, entries.length).map((v, i) => [v, i] as const).sort((p, q) => p[0] - q[0]).map((p) => p[1]);
      for (const i of idx) {
        const [key, value] = entries[i] as [string, unknown];
        out[key] = typeof value === "object" && value !== null && !Array.isArray(value) ? shuffle(value, order) : value;
      }
      for (const [key, value] of entries) if (!(key in out)) out[key] = value;
      return out as T;
    };
    fc.assert(
      fc.property(knobs, fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 10, maxLength: 10 }), (k, order) => {
        for (const c of [adcChain(k), tripChain(k)]) {
          const s = shuffle(c, order);
          expect(JSON.stringify(chainErrorSources(s, 300))).toBe(JSON.stringify(chainErrorSources(c, 300)));
        }
        const a = evaluateChain(adcChain(k), 300, { methods: ["rss"] });
        const b = evaluateChain(shuffle(adcChain(k), order), 300, { methods: ["rss"] });
        expect(b).toEqual(a);
      }),
      { seed: 44, numRuns: 25 },
    );
  });

  it("RSS variance shares sum to 1", () => {
    fc.assert(
      fc.property(knobs, fc.double({ min: 50, max: 1000, noNaN: true }), (k, t) => {
        const e = evaluateChain(adcChain(k), t, { methods: ["rss"] });
        const total = e.contributions.reduce((a, c) => a + c.varianceShare, 0);
        expect(total).toBeCloseTo(1, 9);
        const u2 = e.contributions.reduce((a, c) => a + c.standardUncertaintyC ** 2, 0);
        expect(Math.sqrt(u2)).toBeCloseTo(e.bounds[0]?.standardUncertaintyC as number, 9);
      }),
      { seed: 45, numRuns: 40 },
    );
  });
});
