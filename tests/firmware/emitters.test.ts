/**
 * JSON and CSV round trips, determinism, and golden files (byte for byte; UPDATE_GOLDEN=1 regenerates).
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import {
  buildFirmwareTable,
  firmwareTableCaution,
  firmwareTableFromSpec,
  formatFirmwareTableC,
  formatFirmwareTableCsv,
  formatFirmwareTableJson,
  type BuildFirmwareTableOptions,
  type FirmwareTable,
} from "../../src/index.js";

const goldenDir = join(import.meta.dirname, "..", "golden");

// One small table: a heated enclosure's cold-junction compensation, type T, 0..100 °C, 5 µV.
const small: BuildFirmwareTableOptions = {
  type: "T",
  kind: "temperatureToEmf",
  minC: 0,
  maxC: 100,
  maxErrorOutputUnits: 5,
};

const various: BuildFirmwareTableOptions[] = [
  small,
  { type: "K", kind: "emfToTemperature", minC: -200, maxC: 1372, maxErrorOutputUnits: 0.05, placement: "uniform" },
  {
    type: "J",
    kind: "emfToTemperature",
    minC: -100,
    maxC: 700,
    maxErrorOutputUnits: 0.01,
    input: { numberType: "float64" },
    output: { numberType: "float32" },
  },
  {
    type: "K",
    kind: "adcCodeToTemperature",
    minC: 0,
    maxC: 1200,
    maxErrorOutputUnits: 0.1,
    chain: { gain: 40, referenceVolts: 2.5, bits: 18 },
  },
];

function parseCsv(text: string): { header: string[]; rows: number[][] } {
  const lines = text.trimEnd().split("\n");
  const header = (lines[0] as string).split(",");
  return { header, rows: lines.slice(1).map((l) => l.split(",").map(Number)) };
}

describe("JSON round trip", () => {
  for (const options of various) {
    it(`${options.type} ${options.kind} ${options.placement ?? "adaptive"}: parses back to the same values`, () => {
      const table = buildFirmwareTable(options);
      const parsed = JSON.parse(formatFirmwareTableJson(table)) as FirmwareTable & {
        format: string;
        caution: string;
      };
      expect(parsed.format).toBe("hotjunction-firmware-table");
      expect(parsed.caution).toBe(firmwareTableCaution);
      const { format: _f, formatVersion: _v, caution: _c, ...rest } = parsed as unknown as Record<string, unknown>;
      expect(rest).toEqual(JSON.parse(JSON.stringify(table)));
      expect(parsed.inputs).toEqual(table.inputs);
      expect(parsed.outputs).toEqual(table.outputs);
    });
  }
});

describe("CSV round trip", () => {
  for (const options of various) {
    it(`${options.type} ${options.kind} ${options.placement ?? "adaptive"}: parses back to the same values`, () => {
      const table = buildFirmwareTable(options);
      const { header, rows } = parseCsv(formatFirmwareTableCsv(table));
      expect(header.slice(0, 3)).toEqual(["index", "input_stored", "output_stored"]);
      expect(rows.length).toBe(table.inputs.length);
      rows.forEach((row, i) => {
        expect(row[0]).toBe(i);
        expect(row[1]).toBe(table.inputs[i]);
        expect(row[2]).toBe(table.outputs[i]);
        expect(row[3]).toBe((table.inputs[i] as number) / table.input.scale);
        expect(row[4]).toBe((table.outputs[i] as number) / table.output.scale);
      });
    });
  }
});

describe("determinism", () => {
  it("the same spec gives byte-identical text in every format", () => {
    for (const format of ["c", "json", "csv"] as const) {
      const a = firmwareTableFromSpec({ ...various[1]!, format, prefix: "kiln" });
      const b = firmwareTableFromSpec({ ...various[1]!, format, prefix: "kiln" });
      expect(a).toBe(b);
    }
  });

  it("the spec entry gives the emitters' text", () => {
    const table = buildFirmwareTable(small);
    expect(firmwareTableFromSpec({ ...small, format: "c", prefix: "enc_cj" })).toBe(
      formatFirmwareTableC(table, { prefix: "enc_cj" }),
    );
    expect(firmwareTableFromSpec({ ...small, format: "c" })).toBe(formatFirmwareTableC(table));
    expect(firmwareTableFromSpec({ ...small, format: "json" })).toBe(formatFirmwareTableJson(table));
    expect(firmwareTableFromSpec({ ...small, format: "csv" })).toBe(formatFirmwareTableCsv(table));
  });

  it("the C header carries the caution, ASCII only", () => {
    const header = formatFirmwareTableC(buildFirmwareTable(small), { prefix: "enc_cj" });
    expect(header).toContain("not a certified safety function");
    expect(header).toContain("non-resettable thermal cutoff");
    expect(/^[\x20-\x7e\n]*$/.test(header)).toBe(true);
    expect(header).toContain("#define ENC_CJ_COUNT");
  });
});

describe("golden files", () => {
  const table = buildFirmwareTable(small);
  const files: [string, string][] = [
    ["firmwareTableSmall.h", formatFirmwareTableC(table, { prefix: "enclosure_cj" })],
    ["firmwareTableSmall.json", formatFirmwareTableJson(table)],
    ["firmwareTableSmall.csv", formatFirmwareTableCsv(table)],
  ];
  for (const [name, text] of files) {
    it(`${name} matches byte for byte`, () => {
      const path = join(goldenDir, name);
      if (process.env["UPDATE_GOLDEN"] === "1" || !existsSync(path)) {
        if (process.env["UPDATE_GOLDEN"] !== "1") throw new Error(`missing golden file ${path}; run with UPDATE_GOLDEN=1`);
        writeFileSync(path, text);
      }
      expect(text).toBe(readFileSync(path, "utf8"));
    });
  }
});
