/**
 * Every error path of the firmware tables throws the project's error family with a precise code.
 */
import { describe, expect, it } from "vitest";
import {
  buildFirmwareTable,
  firmwareTableFromSpec,
  formatFirmwareTableC,
  HotjunctionRangeError,
  HotjunctionTypeError,
  interpolateFirmwareTable,
  type BuildFirmwareTableOptions,
} from "../../src/index.js";

const base: BuildFirmwareTableOptions = { type: "K", kind: "emfToTemperature", minC: 0, maxC: 500, maxErrorOutputUnits: 0.05 };

function fails(f: () => unknown, cls: typeof HotjunctionRangeError | typeof HotjunctionTypeError, code: string): Error {
  let caught: unknown;
  try {
    f();
  } catch (e) {
    caught = e;
  }
  expect(caught).toBeInstanceOf(cls);
  expect((caught as { code: string }).code).toBe(code);
  return caught as Error;
}

const build = (patch: Record<string, unknown>) => () =>
  buildFirmwareTable({ ...base, ...patch } as unknown as BuildFirmwareTableOptions);

describe("range outside the type", () => {
  it("type K below -270 °C or above 1372 °C (ITS-90 type K range, NIST Monograph 175)", () => {
    const e = fails(build({ minC: -300 }), HotjunctionRangeError, "OUT_OF_RANGE") as HotjunctionRangeError;
    expect(e.min).toBe(-270);
    expect(e.max).toBe(1372);
    fails(build({ maxC: 1400 }), HotjunctionRangeError, "OUT_OF_RANGE");
  });
  it("type B EMF input below the unambiguous range (E(t) is not monotonic below about 42 °C, NIST Monograph 175)", () => {
    fails(build({ type: "B", minC: 20, maxC: 1000 }), HotjunctionRangeError, "OUT_OF_RANGE");
  });
  it("maxC not above minC", () => {
    fails(build({ minC: 100, maxC: 100 }), HotjunctionRangeError, "OUT_OF_RANGE");
  });
  it("a temperature range beyond the ADC's codes", () => {
    fails(
      build({
        kind: "adcCodeToTemperature",
        maxC: 1300,
        chain: { gain: 100, referenceVolts: 2.5, bits: 16, coldJunctionC: 25 },
      }),
      HotjunctionRangeError,
      "OUT_OF_RANGE",
    );
  });
  it("a cold-junction temperature outside the type", () => {
    fails(
      build({ kind: "temperatureToAdcCode", chain: { gain: 10, referenceVolts: 2.5, bits: 16, coldJunctionC: -300 } }),
      HotjunctionRangeError,
      "OUT_OF_RANGE",
    );
  });
});

describe("non-finite numbers", () => {
  for (const [name, patch] of [
    ["minC NaN", { minC: Number.NaN }],
    ["maxC Infinity", { maxC: Number.POSITIVE_INFINITY }],
    ["maxError NaN", { maxErrorOutputUnits: Number.NaN }],
    ["maxError as a string", { maxErrorOutputUnits: "0.1" }],
    ["output scale NaN", { output: { numberType: "int32", scale: Number.NaN } }],
    [
      "chain gain NaN",
      { kind: "adcCodeToTemperature", chain: { gain: Number.NaN, referenceVolts: 2.5, bits: 16 } },
    ],
    [
      "chain reference Infinity",
      { kind: "adcCodeToTemperature", chain: { gain: 10, referenceVolts: Number.POSITIVE_INFINITY, bits: 16 } },
    ],
  ] as const) {
    it(name, () => {
      fails(build(patch), HotjunctionTypeError, "NOT_A_FINITE_NUMBER");
    });
  }
  it("interpolating at NaN", () => {
    fails(() => interpolateFirmwareTable(buildFirmwareTable(base), Number.NaN), HotjunctionTypeError, "NOT_A_FINITE_NUMBER");
  });
});

describe("maximum error", () => {
  it("zero or negative", () => {
    fails(build({ maxErrorOutputUnits: 0 }), HotjunctionRangeError, "OUT_OF_RANGE");
    fails(build({ maxErrorOutputUnits: -0.1 }), HotjunctionRangeError, "OUT_OF_RANGE");
  });
  it("not above the rounding bound (centi-degree output: 0.01 °C)", () => {
    const e = fails(
      build({ maxErrorOutputUnits: 0.01, output: { numberType: "int32", scale: 100 } }),
      HotjunctionRangeError,
      "OUT_OF_RANGE",
    ) as HotjunctionRangeError;
    expect(e.min).toBe(0.01);
  });
});

describe("overflow", () => {
  it("milli-degrees do not fit int16", () => {
    const e = fails(build({ output: { numberType: "int16", scale: 1000 } }), HotjunctionRangeError, "OVERFLOW") as HotjunctionRangeError;
    expect(e.max).toBe(32767);
  });
  it("type K µV up to 1372 °C (54886 µV, NIST Monograph 175) do not fit an int16 input", () => {
    fails(build({ maxC: 1372, input: { numberType: "int16" } }), HotjunctionRangeError, "OVERFLOW");
  });
  it("negative EMF in an unsigned input", () => {
    fails(build({ minC: -100, input: { numberType: "uint32" } }), HotjunctionRangeError, "OVERFLOW");
  });
  it("a 64-bit interpolation product above 2^53", () => {
    fails(
      build({
        kind: "temperatureToEmf",
        minC: 0,
        maxC: 1372,
        maxErrorOutputUnits: 1e5,
        input: { numberType: "uint32", scale: 1e6 },
        output: { numberType: "int32", scale: 1e4 },
      }),
      HotjunctionRangeError,
      "OVERFLOW",
    );
  });
});

describe("bad prefix", () => {
  const table = buildFirmwareTable(base);
  for (const prefix of ["1abc", "a-b", "", "_reserved", "int", "static", "x".repeat(41), "tempé"]) {
    it(JSON.stringify(prefix), () => {
      fails(() => formatFirmwareTableC(table, { prefix }), HotjunctionRangeError, "INVALID_OPTION");
    });
  }
  it("not a string", () => {
    fails(() => formatFirmwareTableC(table, { prefix: 5 as unknown as string }), HotjunctionTypeError, "INVALID_OPTION");
  });
});

describe("breakpoint cap", () => {
  it("adaptive table needing more than maxBreakpoints", () => {
    const e = fails(
      build({ minC: -200, maxC: 1372, maxErrorOutputUnits: 0.01, maxBreakpoints: 50 }),
      HotjunctionRangeError,
      "OUT_OF_RANGE",
    ) as HotjunctionRangeError;
    expect(e.quantity).toBe("breakpoint count");
    expect(e.max).toBe(50);
  });
  it("uniform table needing more than maxBreakpoints", () => {
    fails(build({ placement: "uniform", maxBreakpoints: 8 }), HotjunctionRangeError, "OUT_OF_RANGE");
  });
  it("a cap outside 2 … 65536 or not whole", () => {
    fails(build({ maxBreakpoints: 1 }), HotjunctionRangeError, "OUT_OF_RANGE");
    fails(build({ maxBreakpoints: 70000 }), HotjunctionRangeError, "OUT_OF_RANGE");
    fails(build({ maxBreakpoints: 10.5 }), HotjunctionRangeError, "OUT_OF_RANGE");
  });
});

describe("invalid choices and shapes", () => {
  it("unknown type, kind, placement, number type, format", () => {
    fails(build({ type: "Q" }), HotjunctionRangeError, "INVALID_OPTION");
    fails(build({ kind: "emfToKelvin" }), HotjunctionRangeError, "INVALID_OPTION");
    fails(build({ placement: "chebyshev" }), HotjunctionRangeError, "INVALID_OPTION");
    fails(build({ output: { numberType: "int8" } }), HotjunctionRangeError, "INVALID_OPTION");
    fails(
      () => firmwareTableFromSpec({ ...base, format: "xml" as "c" }),
      HotjunctionRangeError,
      "INVALID_OPTION",
    );
  });
  it("an ADC kind without a chain, or with a malformed one", () => {
    fails(build({ kind: "adcCodeToTemperature" }), HotjunctionTypeError, "INVALID_OPTION");
    fails(build({ kind: "adcCodeToTemperature", chain: { gain: -5, referenceVolts: 2.5, bits: 16 } }), HotjunctionRangeError, "OUT_OF_RANGE");
    fails(build({ kind: "adcCodeToTemperature", chain: { gain: 5, referenceVolts: 2.5, bits: 12.5 } }), HotjunctionRangeError, "OUT_OF_RANGE");
    fails(build({ kind: "adcCodeToTemperature", chain: { gain: 5, referenceVolts: 2.5, bits: 40 } }), HotjunctionRangeError, "OUT_OF_RANGE");
  });
  it("a cold-junction table given a fixed cold junction", () => {
    fails(
      build({ kind: "coldJunctionToAdcCode", chain: { gain: 5, referenceVolts: 2.5, bits: 16, coldJunctionC: 25 } }),
      HotjunctionRangeError,
      "INVALID_OPTION",
    );
  });
  it("integer output fed by a float input; uniform placement with a float input", () => {
    fails(build({ input: { numberType: "float32" } }), HotjunctionRangeError, "INVALID_OPTION");
    fails(
      build({ placement: "uniform", input: { numberType: "float64" }, output: { numberType: "float64" } }),
      HotjunctionRangeError,
      "INVALID_OPTION",
    );
  });
  it("options or spec not an object", () => {
    fails(() => buildFirmwareTable(null as unknown as BuildFirmwareTableOptions), HotjunctionTypeError, "INVALID_OPTION");
    fails(() => firmwareTableFromSpec(undefined as never), HotjunctionTypeError, "INVALID_OPTION");
  });
});

describe("interpolating outside the table", () => {
  const table = buildFirmwareTable(base);
  it("below, above, fractional", () => {
    fails(() => interpolateFirmwareTable(table, table.input.min - 1), HotjunctionRangeError, "OUT_OF_RANGE");
    fails(() => interpolateFirmwareTable(table, table.input.max + 1), HotjunctionRangeError, "OUT_OF_RANGE");
    fails(() => interpolateFirmwareTable(table, 100.5), HotjunctionRangeError, "OUT_OF_RANGE");
  });
});
