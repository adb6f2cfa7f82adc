/**
 * The curvature enclosure (interval arithmetic with outward rounding, src/firmware/curvatureEnclosure.ts) is at
 * least every sampled value of |f''| (a property over random segments of every type and kind, fast-check,
 * seeded), and tight float64 tables either meet their request or are refused with a typed error: never
 * returned with a bound above the request. Reference functions: NIST SRD 60 / Monograph 175.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { _tableFunction } from "../../src/firmware/tableFunction.js";
import { buildFirmwareTable, HotjunctionRangeError, type ThermocoupleType } from "../../src/index.js";

const types: ThermocoupleType[] = ["B", "E", "J", "K", "N", "R", "S", "T"];

describe("curvature enclosure", () => {
  it("encloses |f''| sampled at 65 points of random segments (forward and inverse, every type)", () => {
    let samples = 0;
    fc.assert(
      fc.property(
        fc.constantFrom(...types),
        fc.constantFrom("temperatureToEmf" as const, "emfToTemperature" as const),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 1e-4, max: 0.05, noNaN: true }),
        (type, kind, where, width) => {
          const fn = _tableFunction(type, kind, undefined, "test");
          const lo = fn.inputAtTemperature(fn.allowedMinC);
          const hi = fn.inputAtTemperature(fn.allowedMaxC);
          const a = lo + (hi - lo) * where * (1 - width) + (hi - lo) * 1e-6;
          const b = Math.min(a + (hi - lo) * width, hi);
          if (!fn.inDomain(a) || !fn.inDomain(b)) return;
          const seamInside = fn.seams.some((s) => s.input > a - (b - a) * 0.01 && s.input < b + (b - a) * 0.01);
          if (seamInside) return; // f'' is not defined at a seam; seams are bounded separately
          const bound = fn.curvatureBound(a, b);
          for (let k = 0; k <= 64; k++) {
            const x = a + ((b - a) * k) / 64;
            // The sampled value uses a central difference of S (0.01 °C step), so allow its truncation error.
            expect(Math.abs(fn.curvature(x))).toBeLessThanOrEqual(bound * (1 + 1e-6) + 1e-12);
            samples++;
          }
        },
      ),
      { seed: 42, numRuns: 400 },
    );
    expect(samples).toBeGreaterThan(10_000);
  });
});

describe("tight float64 tables (the review's cases)", () => {
  const cases = [
    { type: "B" as const, kind: "emfToTemperature" as const, minC: 42.2, maxC: 400, maxErrorOutputUnits: 1e-6 },
    { type: "E" as const, kind: "temperatureToEmf" as const, minC: -270, maxC: -200, maxErrorOutputUnits: 1e-6 },
    { type: "E" as const, kind: "emfToTemperature" as const, minC: -270, maxC: -200, maxErrorOutputUnits: 1e-6 },
    { type: "T" as const, kind: "emfToTemperature" as const, minC: -270, maxC: -200, maxErrorOutputUnits: 1e-5 },
  ];
  for (const c of cases) {
    it(`type ${c.type} ${c.kind} ${c.minC}…${c.maxC} °C at ${c.maxErrorOutputUnits}: within the request or refused`, () => {
      const options = { ...c, input: { numberType: "float64" as const }, output: { numberType: "float64" as const }, maxBreakpoints: 8192 };
      try {
        const table = buildFirmwareTable(options);
        expect(table.errorBound.totalOutputUnits).toBeLessThanOrEqual(c.maxErrorOutputUnits);
        expect(table.errorBound.referenceOutputUnits).toBeGreaterThan(0);
        expect(table.maxErrorFound.errorOutputUnits + table.errorBound.referenceOutputUnits).toBeLessThanOrEqual(table.errorBound.totalOutputUnits);
      } catch (error) {
        expect(error).toBeInstanceOf(HotjunctionRangeError);
        expect((error as HotjunctionRangeError).quantity).toMatch(/maximum error|breakpoint count/);
      }
    }, 60_000);
  }
});
