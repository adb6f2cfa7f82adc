/**
 * Regressions found by tests/contract in the firmware-table readers: a forged table (a type without a string form,
 * a NaN uniform spacing, outputs whose step leaves float64, inputs out of order) and a forged error report given to
 * the C header formatter are typed errors naming the field; they returned NaN/Infinity, printed "NaN" or "Infinity"
 * into the header, or threw a plain TypeError.
 */
import { describe, expect, it } from "vitest";
import { typedErrorOf } from "../_typedError.js";
import { buildFirmwareTable, formatFirmwareTableC, interpolateFirmwareTable, type FirmwareTable } from "../../src/index.js";


// the documented examples' tables
const adaptive = buildFirmwareTable({ type: "K", kind: "emfToTemperature", minC: 0, maxC: 500, maxErrorOutputUnits: 0.05 });
const header = buildFirmwareTable({ type: "T", kind: "temperatureToEmf", minC: 0, maxC: 100, maxErrorOutputUnits: 5 });
const forged = (table: FirmwareTable, patch: Record<string, unknown>): FirmwareTable => ({ ...table, ...patch }) as never;

describe("interpolateFirmwareTable refuses a forged table or input", () => {
  it("a type or kind without a string form, a spacing that is not an integer, an input without a number form", () => {
    expect(typedErrorOf(() => interpolateFirmwareTable(forged(adaptive, { thermocoupleType: Object.create(null) }), 20644)).quantity).toBe("table.thermocoupleType");
    expect(typedErrorOf(() => interpolateFirmwareTable(forged(adaptive, { spacingLog2: [Number.NaN] }), 20644)).quantity).toBe("table.spacingLog2");
    expect(typedErrorOf(() => interpolateFirmwareTable(forged(adaptive, { spacingLog2: 0.5 }), 20644)).quantity).toBe("table.spacingLog2");
    // an adaptive table's inputs are not on any 2^k grid: claiming one is refused, not read at the wrong segment
    expect(typedErrorOf(() => interpolateFirmwareTable(forged(adaptive, { spacingLog2: 4 }), 20644)).quantity).toMatch(/^table\.inputs\[\d+\]$/);
    expect(typedErrorOf(() => interpolateFirmwareTable(adaptive, Object.create(null) as never)).quantity).toBe("table input");
  });

  it("outputs whose step leaves float64, inputs out of order, an input range past the breakpoints", () => {
    const outputs = [...adaptive.outputs];
    outputs[15] = -1e308;
    outputs[16] = 1e308;
    expect(typedErrorOf(() => interpolateFirmwareTable(forged(adaptive, { outputs }), 20644)).quantity).toBe("table.outputs[16]");
    const inputs = [...adaptive.inputs];
    [inputs[3], inputs[4]] = [inputs[4]!, inputs[3]!];
    expect(typedErrorOf(() => interpolateFirmwareTable(forged(adaptive, { inputs }), 20644)).quantity).toBe("table.inputs[4]");
    expect(typedErrorOf(() => interpolateFirmwareTable(forged(adaptive, { input: { ...adaptive.input, max: 1e9 } }), 20644)).quantity).toBe("table.input");
    // the documented example is unchanged: 20644 µV reads 499.994 °C (NIST SRD 60 type K: E(500 °C) = 20.644 mV)
    expect(interpolateFirmwareTable(adaptive, 20644) / adaptive.output.scale).toBe(499.994);
  });
});

describe("formatFirmwareTableC refuses a forged error report (it printed NaN/Infinity into the header)", () => {
  it.each([
    ["maxErrorFound.atInputStored", "K"],
    ["maxErrorFound.pointsChecked", Number.POSITIVE_INFINITY],
    ["errorBound.toC", undefined],
    ["errorBound.totalOutputUnits", null],
    ["errorBound.segmentIndex", Number.NaN],
    ["requestedMaxErrorOutputUnits", [Number.NaN]],
    ["requestedMinC", Number.NEGATIVE_INFINITY],
    ["coveredMaxC", Number.NaN],
    ["placement", [Number.NaN]],
    ["chain", undefined],
    ["maxErrorFound", null],
  ] as const)("%s = %s", (path, value) => {
    const [key, sub] = path.split(".") as [string, string | undefined];
    const patched = sub === undefined ? { [key]: value } : { [key]: { ...(header as unknown as Record<string, object>)[key], [sub]: value } };
    expect(typedErrorOf(() => formatFirmwareTableC(forged(header, patched), { prefix: "oven_tc" })).quantity).toBe(`table.${path}`);
  });

  it("the documented header is unchanged", () => {
    expect(formatFirmwareTableC(header, { prefix: "oven_tc" }).includes("static inline int oven_tc_lookup(int32_t x, int32_t *out)")).toBe(true);
  });
});
