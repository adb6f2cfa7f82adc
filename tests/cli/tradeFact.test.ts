// Trade fact through a whole design file and the `check` command: a 5 V regulator rail of ±4 % used as the
// comparator reference for a 5 mV/°C amplifier output with a 250 mV (50 °C) threshold trips anywhere from
// 48 to 52 °C (250 mV ± 4 % = 240…260 mV). Common practice, no source.
import { writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { emfFromTemperature } from "../../src/its90/convert.js";
import { run, tempDir } from "./helpers.js";

// Trim the amplifier's linear compensator to the secant of type K between 25 and 50 °C, so the part itself reads
// exactly at the trip point and only the rail's tolerance remains (everything else ideal or negligible).
const trimmedMicrovoltsPerC = ((emfFromTemperature("K", 50) - emfFromTemperature("K", 25)) / 25) * 1000;

const design = {
  hotjunctionDesign: 1,
  name: "rail tolerance check",
  setpoints: [{ name: "50 °C", tripTemperatureC: 50, maxNormalOperatingC: 40, hazardLimitC: 60 }],
  thermocouple: { type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
  amplifier: { kind: "fixed-scale", millivoltsPerC: 5, trimmedMicrovoltsPerC },
  comparator: {},
  reference: { kind: "regulator-rail", name: "5 V rail ±4 %", nominalVolts: 5, totalToleranceFraction: 0.04 },
  resistors: { series: "E192", toleranceFraction: 1e-6 },
  ambient: { minC: 25, maxC: 25 },
};

describe("trade fact through a design file", () => {
  it("5 V rail ±4 % with 5 mV/°C and a 250 mV threshold: worst-case trip band 48 to 52 °C", async () => {
    const dir = tempDir();
    writeFileSync(join(dir, "rail.json"), JSON.stringify(design));
    const result = await run(["check", "rail.json", "--json", "--trials", "1000"], dir);
    expect(result.stderr).toBe("");
    const report = JSON.parse(result.stdout);
    const band = report.setpoints[0].bands.find((b: { method: string }) => b.method === "worst-case");
    // Tolerance 0.1 °C: the E192 divider rounds the 250 mV threshold slightly (here the nominal trip is 49.94 °C).
    expect(band.lowC).toBeGreaterThan(47.9);
    expect(band.lowC).toBeLessThan(48.1);
    expect(band.highC).toBeGreaterThan(51.9);
    expect(band.highC).toBeLessThan(52.1);
    expect(band.highC - band.lowC).toBeCloseTo(4, 1);
  });

  it("the threshold voltages are printed: 250 mV for 50 °C lands at 240–260 mV (250 mV ± 4 %, common practice, no source)", async () => {
    const dir = tempDir();
    writeFileSync(join(dir, "rail.json"), JSON.stringify(design));
    const json = JSON.parse((await run(["check", "rail.json", "--json", "--trials", "1000"], dir)).stdout);
    const sheet = json.buildSheet.setpoints[0];
    // 5 mV/°C × 50 °C = 250 mV ideal (the part is trimmed to read exactly at 25 and 50 °C)
    expect(sheet.idealThresholdVolts).toBeCloseTo(0.25, 9);
    // E192 values realize it within the series' step (< 0.5 %), and the ±4 % rail moves it by ±4 % of itself
    expect(Math.abs(sheet.realizedThresholdVolts / 0.25 - 1)).toBeLessThan(0.005);
    expect(sheet.thresholdLowVolts / sheet.realizedThresholdVolts).toBeCloseTo(0.96, 5);
    expect(sheet.thresholdHighVolts / sheet.realizedThresholdVolts).toBeCloseTo(1.04, 5);
    expect(sheet.thresholdLowVolts).toBeGreaterThan(0.2385);
    expect(sheet.thresholdLowVolts).toBeLessThan(0.2415);
    expect(sheet.thresholdHighVolts).toBeGreaterThan(0.2585);
    expect(sheet.thresholdHighVolts).toBeLessThan(0.2615);
    // the text and Markdown reports print the same figures (4 decimals in the band column, 5 for the thresholds)
    for (const format of [[], ["--markdown"]]) {
      const out = (await run(["check", "rail.json", "--trials", "1000", ...format], dir)).stdout;
      expect(out).toContain(sheet.idealThresholdVolts.toFixed(5));
      expect(out).toContain(sheet.realizedThresholdVolts.toFixed(5));
      expect(out).toContain(`${sheet.thresholdLowVolts.toFixed(4)} to ${sheet.thresholdHighVolts.toFixed(4)}`);
    }
    // and the CSV carries them as columns
    const csv = (await run(["check", "rail.json", "--csv", "--trials", "1000"], dir)).stdout;
    expect(csv).toContain(`,${sheet.thresholdLowVolts},${sheet.thresholdHighVolts},`);
  });
});
