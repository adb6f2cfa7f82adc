// Hand-checked cases through a design file and the `check` command (what a designer writes, what the report
// prints): "what if this part were perfect" (zero tolerances and an ideal reference give the ideal trip, every band
// a point), threshold = gain × EMF from the NIST table, release = threshold − hysteresis.
import { writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { emfFromTemperature, temperatureFromEmf } from "../../src/its90/convert.js";
import { run, tempDir } from "../cli/helpers.js";

/** A lehr cutout on type J at 350 °C, ×100 fixed gain, hardware compensation exact at the only ambient 25 °C. */
function perfectDesign(hysteresisMillivolts: number): Record<string, unknown> {
  return {
    hotjunctionDesign: 1,
    name: "perfect-part lehr cutout",
    setpoints: [{ name: "lehr limit", tripTemperatureC: 350 }],
    processLimits: { maxNormalOperatingC: 320, hazardLimitC: 380 },
    thermocouple: { type: "J", tolerance: { standard: "custom", toleranceC: 0 } },
    coldJunction: { method: "hardware", compensationMicrovoltsPerC: 52, matchedAtC: 25, sensorAccuracyC: 0, compensationAccuracyMicrovolts: 0, isothermalGradientC: 0 },
    amplifier: { kind: "voltage", gain: { setBy: "fixed", gain: 100, gainErrorFraction: 0, gainDriftPpmPerC: 0 }, offsetMicrovolts: 0, offsetDriftMicrovoltsPerC: 0 },
    comparator: { offsetMillivolts: 0, hysteresisMillivolts, hysteresisPlacement: "below" },
    reference: { kind: "ideal", name: "ideal 5 V", nominalVolts: 5 },
    resistors: { series: "E192", toleranceFraction: 0, tempcoPpmPerC: 0 },
    ambient: { minC: 25, maxC: 25 },
    analysis: { monteCarloTrials: 500, seed: 3 },
  };
}

async function check(design: Record<string, unknown>, format: string[] = ["--json"]): Promise<{ code: number; stdout: string; stderr: string }> {
  const dir = tempDir();
  writeFileSync(join(dir, "design.json"), JSON.stringify(design));
  const validated = await run(["validate", "design.json"], dir);
  expect(validated.code, validated.stderr).toBe(0);
  return run(["check", "design.json", ...format], dir);
}

describe("what if this part were perfect: zero tolerances and an ideal part through a design file", () => {
  it("is accepted (validate and check exit 0) and every band is the ideal trip itself", async () => {
    const result = await check(perfectDesign(0));
    expect(result.code, result.stderr).toBe(0);
    const report = JSON.parse(result.stdout);
    const s = report.setpoints[0];
    for (const band of s.bands) {
      expect(band.highC - band.lowC, band.method).toBeLessThan(1e-9);
      expect(Math.abs(band.lowC - s.nominalTripC), band.method).toBeLessThan(1e-9);
    }
    // the ideal trip: the hot junction whose EMF × 100 equals the realized threshold (ITS-90 inverse, NIST SRD 60)
    const sheet = report.buildSheet.setpoints[0];
    expect(s.nominalTripC).toBeCloseTo(temperatureFromEmf("J", (sheet.realizedThresholdVolts * 1000) / 100), 6);
    // and the standard resistors are the only departure from 350 °C: E192 steps are < 0.5 %·(1/S) ≈ 0.35 °C here
    expect(Math.abs(s.nominalTripC - 350)).toBeLessThan(0.4);
    for (const e of s.errorSources) expect(e.worstCaseC, e.name).toBe(0);
  });
});

describe("hand-checked threshold and release through a design file", () => {
  it("threshold = gain × EMF: type J at 350 °C is 19.090 mV (NIST SRD 60 / Monograph 175 table), ×100 = 1.9090 V, printed", async () => {
    const json = JSON.parse((await check(perfectDesign(0))).stdout);
    const sheet = json.buildSheet.setpoints[0];
    // NIST SRD 60 type J table, 350 °C: 19.090 mV (3 decimals) → 1.9090 V ± 0.05 mV × 100 of the table's rounding
    expect(Math.abs(sheet.idealThresholdVolts - 1.909)).toBeLessThanOrEqual(0.0005 * 100 / 1000);
    expect(sheet.idealThresholdVolts).toBeCloseTo((100 * emfFromTemperature("J", 350)) / 1000, 12);
    const text = (await check(perfectDesign(0), [])).stdout;
    expect(text).toContain(sheet.idealThresholdVolts.toFixed(5));
    expect(text).toContain(sheet.realizedThresholdVolts.toFixed(5));
  });

  it("release = threshold − hysteresis: 20 mV below a 1.9 V threshold of a ×100 chain is 0.2 mV of EMF lower", async () => {
    const json = JSON.parse((await check(perfectDesign(20))).stdout);
    const sheet = json.buildSheet.setpoints[0];
    // trip at the threshold; release when the amplifier output falls 20 mV below it (hysteresis placed below)
    const releaseEmfMillivolts = ((sheet.realizedThresholdVolts - 0.02) * 1000) / 100;
    expect(sheet.nominalReleaseC).toBeCloseTo(temperatureFromEmf("J", releaseEmfMillivolts), 6);
    // type J near 347 °C: S ≈ 55.6 µV/°C (NIST SRD 60 table: 19.090 − 19.035 mV from 349 to 350 °C, from memory), 0.2 mV ≈ 3.6 °C
    expect(sheet.hysteresisC).toBeGreaterThan(3.4);
    expect(sheet.hysteresisC).toBeLessThan(3.8);
    expect(sheet.hysteresisC).toBeCloseTo(sheet.nominalTripC - sheet.nominalReleaseC, 9);
    // perfect parts: the release band is the nominal release; its margin is to the 320 °C normal limit
    expect(sheet.releaseHighC - sheet.releaseLowC).toBeLessThan(1e-9);
    expect(sheet.releaseMarginToNormalC).toBeCloseTo(sheet.releaseLowC - 320, 9);
  });
});
