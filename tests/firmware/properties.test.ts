/**
 * Properties of firmware tables (fast-check, seeded), and a check against published NIST tables.
 */
import { readFileSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  buildFirmwareTable,
  interpolateFirmwareTable,
  temperatureRange,
  type BuildFirmwareTableOptions,
  type FirmwareTable,
  type ThermocoupleType,
} from "../../src/index.js";
import { denseInputs, exactOutput } from "./helpers.js";

const seed = 20250611;

function denseMaxError(table: FirmwareTable): number {
  let worst = 0;
  for (const x of denseInputs(table, 40_000)) {
    const y = interpolateFirmwareTable(table, x) / table.output.scale;
    worst = Math.max(worst, Math.abs(y - exactOutput(table, x)));
  }
  return worst;
}

// Types whose EMF is monotonic over the whole range (all but B, NIST Monograph 175).
const monotonicTypes: ThermocoupleType[] = ["E", "J", "K", "N", "R", "S", "T"];

/** A random request: type, kind, a range of at least 40 °C inside the type, and an error in the output's unit. */
const requestArb = fc
  .record({
    type: fc.constantFrom(...monotonicTypes),
    kind: fc.constantFrom("emfToTemperature", "temperatureToEmf", "adcCodeToTemperature", "coldJunctionToEmf"),
    lowFraction: fc.double({ min: 0.02, max: 0.7, noNaN: true }),
    widthFraction: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
    errorFactor: fc.double({ min: 2, max: 40, noNaN: true }),
  })
  .map(({ type, kind, lowFraction, widthFraction, errorFactor }): BuildFirmwareTableOptions => {
    const r = temperatureRange(type);
    const span = r.maxC - r.minC;
    let minC = Math.round(r.minC + lowFraction * span);
    let maxC = Math.min(r.maxC, Math.round(minC + Math.max(40, widthFraction * span)));
    if (kind === "coldJunctionToEmf") {
      minC = -40 + Math.round(lowFraction * 40);
      maxC = minC + 40 + Math.round(widthFraction * 100);
    }
    const temperatureOut = kind === "emfToTemperature" || kind === "adcCodeToTemperature";
    // Output rounding is 0.001 °C (milli-degrees) or 1 µV; ask for a few times that.
    const maxErrorOutputUnits = temperatureOut ? 0.001 * errorFactor : 1 + 0.25 * errorFactor;
    const options: BuildFirmwareTableOptions = { type, kind, minC, maxC, maxErrorOutputUnits, maxBreakpoints: 65536 };
    if (kind === "adcCodeToTemperature") {
      // 24-bit ADC over 2.5 V with gain 32: 0.0047 µV per code at the thermocouple; cold junction 25 °C.
      return { ...options, chain: { gain: 32, referenceVolts: 2.5, bits: 24, offsetMillivolts: 300, coldJunctionC: 25 } };
    }
    return options;
  })
  .filter((o) => o.kind !== "adcCodeToTemperature" || o.minC >= -50);

describe("properties", () => {
  it("an adaptive table never exceeds its requested error anywhere (dense check), nor its own bound", () => {
    fc.assert(
      fc.property(requestArb, (options) => {
        const table = buildFirmwareTable(options);
        const worst = denseMaxError(table);
        expect(worst).toBeLessThanOrEqual(options.maxErrorOutputUnits);
        expect(worst).toBeLessThanOrEqual(table.errorBound.totalOutputUnits);
        expect(table.errorBound.totalOutputUnits).toBeLessThanOrEqual(options.maxErrorOutputUnits);
      }),
      { seed, numRuns: 20 },
    );
  });

  it("an adaptive table has fewer breakpoints than a uniform table of the same bound (when uniform needs more than 3)", () => {
    fc.assert(
      fc.property(requestArb, (options) => {
        const adaptive = buildFirmwareTable(options);
        const uniform = buildFirmwareTable({ ...options, placement: "uniform" });
        expect(uniform.errorBound.totalOutputUnits).toBeLessThanOrEqual(options.maxErrorOutputUnits);
        expect(adaptive.inputs.length).toBeLessThanOrEqual(uniform.inputs.length);
        if (uniform.inputs.length > 3) expect(adaptive.inputs.length).toBeLessThan(uniform.inputs.length);
      }),
      { seed, numRuns: 20 },
    );
  });

  it("monotone tables stay monotone after integer rounding (stored values and interpolated outputs)", () => {
    fc.assert(
      fc.property(
        requestArb,
        fc.constantFrom<[string, number]>(["int32", 1], ["int32", 10], ["int32", 1000]),
        fc.constantFrom("adaptive", "uniform"),
        (options, [numberType, scale], placement) => {
          const temperatureOut = options.kind === "emfToTemperature" || options.kind === "adcCodeToTemperature";
          const outScale = temperatureOut ? scale : Math.max(1, scale / 1000);
          const table = buildFirmwareTable({
            ...options,
            placement: placement as "adaptive" | "uniform",
            output: { numberType: numberType as "int32", scale: outScale },
            maxErrorOutputUnits: Math.max(options.maxErrorOutputUnits, 3 / outScale),
          });
          expect(table.monotonic).toBe("increasing");
          for (let i = 1; i < table.outputs.length; i++) {
            expect(table.outputs[i]).toBeGreaterThanOrEqual(table.outputs[i - 1] as number);
          }
          let previous = -Infinity;
          for (const x of denseInputs(table, 20_000)) {
            const y = interpolateFirmwareTable(table, x);
            expect(y).toBeGreaterThanOrEqual(previous);
            previous = y;
          }
        },
      ),
      { seed, numRuns: 15 },
    );
  });
});

describe("against published tables", () => {
  // ASTM E230 / NIST SRD 60 type K values at whole degrees (tests/fixtures/its90Tables.tsv, source named per row).
  const rows = readFileSync(join(import.meta.dirname, "..", "fixtures", "its90Tables.tsv"), "utf8")
    .trim()
    .split("\n")
    .slice(1)
    .map((line) => line.split("\t"))
    .filter((f) => f[0] === "K")
    .map((f) => ({ temperatureC: Number(f[1]), emfMillivolts: Number(f[2]) }))
    .filter((r) => r.temperatureC >= -200);

  it("type K temperature->EMF table matches the published EMFs within its bound plus the table's 0.5 µV rounding", () => {
    expect(rows.length).toBeGreaterThan(10);
    const table = buildFirmwareTable({ type: "K", kind: "temperatureToEmf", minC: -200, maxC: 1372, maxErrorOutputUnits: 2 });
    for (const r of rows) {
      const y = interpolateFirmwareTable(table, Math.round(r.temperatureC * 100));
      expect(Math.abs(y - r.emfMillivolts * 1000)).toBeLessThanOrEqual(table.errorBound.totalOutputUnits + 0.5);
    }
  });

  it("type K EMF->temperature table returns the published temperatures within its bound plus 0.5 µV / S", () => {
    const table = buildFirmwareTable({ type: "K", kind: "emfToTemperature", minC: -200, maxC: 1372, maxErrorOutputUnits: 0.02 });
    for (const r of rows) {
      const x = Math.round(r.emfMillivolts * 1000);
      if (x < table.input.min || x > table.input.max) continue;
      const t = interpolateFirmwareTable(table, x) / table.output.scale;
      // Seebeck coefficient of type K is at least about 15 µV/°C above -200 °C (NIST Monograph 175, from memory).
      expect(Math.abs(t - r.temperatureC)).toBeLessThanOrEqual(table.errorBound.totalOutputUnits + 0.5 / 15);
    }
  });
});
