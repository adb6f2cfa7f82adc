/**
 * The curvature enclosure (interval arithmetic with outward rounding, src/its90/curvatureEnclosure.ts) is at
 * least every sampled value of |f''| (a property over random segments of every type and kind, fast-check,
 * seeded), and tight float64 tables either meet their request or are refused with a typed error: never
 * returned with a bound above the request; every stated bound holds at 40 digits (decimal.js) at the worst points
 * a dense search finds. Reference functions: NIST SRD 60 / Monograph 175.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { _tableFunction } from "../../src/firmware/tableFunction.js";
import { buildFirmwareTable, HotjunctionRangeError, interpolateFirmwareTable, seebeckCoefficient, temperatureRange, type FirmwareTable, type ThermocoupleType } from "../../src/index.js";
import { _decimalContext, _emfDecimal } from "../../src/its90/exactDecimal.js";
import { thermocoupleData } from "../../src/its90/resolveType.js";
import { denseInputs, exactOutput } from "./helpers.js";

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

describe("stated bounds at 40 digits", () => {
  const D = _decimalContext(40);
  /** 40-digit output (natural units) at a stored input: the decimal forward function, or Newton on it. */
  function exact40(table: FirmwareTable, x: number): InstanceType<typeof D> {
    const data = thermocoupleData(table.thermocoupleType);
    const natural = new D(x).div(table.input.scale);
    if (table.kind === "temperatureToEmf") return _emfDecimal(data, natural.toString(), 40).times(1000);
    const emf = natural.div(1000);
    const range = temperatureRange(table.thermocoupleType);
    let t = new D(exactOutput(table, x));
    for (let i = 0; i < 5; i++) {
      const s = new D(seebeckCoefficient(table.thermocoupleType, Math.min(Math.max(t.toNumber(), range.minC), range.maxC)) / 1000);
      t = t.minus(_emfDecimal(data, t.toString(), 40).minus(emf).div(s));
    }
    return t;
  }
  const tables = [
    { type: "K" as const, kind: "temperatureToEmf" as const, minC: 0, maxC: 1372, input: { numberType: "int32" as const, scale: 10 }, output: { numberType: "int32" as const }, maxErrorOutputUnits: 2 },
    { type: "T" as const, kind: "emfToTemperature" as const, minC: -200, maxC: 400, input: { numberType: "int32" as const }, output: { numberType: "int32" as const, scale: 100 }, maxErrorOutputUnits: 0.05 },
    { type: "N" as const, kind: "emfToTemperature" as const, minC: 0, maxC: 1300, input: { numberType: "float64" as const }, output: { numberType: "float64" as const }, maxErrorOutputUnits: 1e-3 },
    { type: "E" as const, kind: "temperatureToEmf" as const, minC: -270, maxC: -200, input: { numberType: "float64" as const }, output: { numberType: "float64" as const }, maxErrorOutputUnits: 1e-3 },
    { type: "S" as const, kind: "emfToTemperature" as const, minC: 0, maxC: 1768, input: { numberType: "int32" as const }, output: { numberType: "int32" as const, scale: 10 }, maxErrorOutputUnits: 0.5 },
    { type: "B" as const, kind: "emfToTemperature" as const, minC: 250, maxC: 1820, input: { numberType: "float64" as const }, output: { numberType: "float64" as const }, maxErrorOutputUnits: 1e-3 },
  ];
  for (const options of tables) {
    it(`type ${options.type} ${options.kind} ${options.input.numberType}: the 8 worst points of a dense search are within the bound at 40 digits`, () => {
      const table = buildFirmwareTable(options);
      const bound = table.errorBound.totalOutputUnits;
      const errors = denseInputs(table).map((x): [number, number] => [Math.abs(interpolateFirmwareTable(table, x) / table.output.scale - exactOutput(table, x)), x]);
      errors.sort((a, b) => b[0] - a[0]);
      expect(errors.length).toBeGreaterThan(1000);
      for (const [, x] of [...errors.slice(0, 8), [0, table.maxErrorFound.atInputStored] as [number, number]]) {
        const e40 = new D(interpolateFirmwareTable(table, x)).div(table.output.scale).minus(exact40(table, x)).abs().toNumber();
        expect(e40, `input ${x}`).toBeLessThanOrEqual(bound);
      }
    }, 60_000);
  }
});
