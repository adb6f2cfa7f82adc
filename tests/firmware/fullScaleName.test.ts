/**
 * The firmware ADC chain names the ADC's full-scale voltage `fullScaleVolts`, as the design file and the chain's
 * ADC element do; the former name `referenceVolts` is accepted (deprecated) and gives the same table.
 * Facts checked: code = (gain · E + offset) / (1000 · FS / 2^bits) is the chain's own definition (common
 * practice, no source); the tables must be identical field by field.
 */
import { describe, expect, it } from "vitest";
import { buildFirmwareTable, HotjunctionRangeError, type BuildFirmwareTableOptions } from "../../src/index.js";

const base: BuildFirmwareTableOptions = {
  type: "K",
  kind: "adcCodeToTemperature",
  minC: 25,
  maxC: 400,
  maxErrorOutputUnits: 0.1,
  chain: { gain: 100, fullScaleVolts: 2.5, bits: 16, coldJunctionC: 25 },
};

describe("ADC chain full-scale voltage", () => {
  it("fullScaleVolts and the deprecated referenceVolts build the same table, and the result carries both names", () => {
    const table = buildFirmwareTable(base);
    const former = buildFirmwareTable({ ...base, chain: { gain: 100, referenceVolts: 2.5, bits: 16, coldJunctionC: 25 } });
    expect(former).toEqual(table);
    expect(table.chain?.fullScaleVolts).toBe(2.5);
    expect(table.chain?.referenceVolts).toBe(2.5);
  });

  it("both names with different values are refused, naming both", () => {
    expect(() => buildFirmwareTable({ ...base, chain: { gain: 100, fullScaleVolts: 2.5, referenceVolts: 3, bits: 16 } })).toThrow(HotjunctionRangeError);
    expect(() => buildFirmwareTable({ ...base, chain: { gain: 100, fullScaleVolts: 2.5, referenceVolts: 3, bits: 16 } })).toThrow(
      /referenceVolts \(deprecated name of fullScaleVolts\) 3 V differs from fullScaleVolts 2.5 V/,
    );
  });

  it("neither name is refused as a missing number", () => {
    expect(() => buildFirmwareTable({ ...base, chain: { gain: 100, bits: 16 } })).toThrow(/ADC full-scale voltage undefined is not a finite number/);
  });
});
