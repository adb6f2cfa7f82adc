// Regressions of issue 11: every example sweeps; firmware (ADC) reports print the half-width of a source's swing;
// check writes the bill of materials; the JSON carries the build sheet.
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { projectRoot, run, tempDir } from "./helpers.js";

const examples = readdirSync(join(projectRoot, "examples")).filter((f) => f.endsWith(".json"));

describe("sweep runs on every example", () => {
  it.each(examples)("%s sweeps (a shunt series resistor the tool sizes is sized as check sizes it)", async (file) => {
    const r = await run(["sweep", `examples/${file}`, "--from", "100", "--to", "200", "--step", "50", "--json", "--trials", "200"]);
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).rows).toHaveLength(3);
  });
});

describe("firmware trip report: one definition of the worst-case swing", () => {
  it("type T class 1 at 90 °C prints ±0.50 °C (IEC 60584-1: ±0.5 °C or ±0.004·|t|, the greater)", async () => {
    const r = await run(["check", "examples/heated-enclosure-adc.json", "--json", "--trials", "200"]);
    const report = JSON.parse(r.stdout);
    const tc = report.setpoints[0].errorSources.find((s: { name: string }) => s.name === "thermocouple.tolerance");
    // through a chain whose reading is the thermocouple's own temperature the swing is ±0.5 °C (rectangular u = 0.5/√3 = 0.289 °C)
    expect(tc.worstCaseC).toBeCloseTo(0.5, 2);
    expect(tc.standardUncertaintyC).toBeCloseTo(0.5 / Math.sqrt(3), 2);
    expect(r.stdout.length).toBeGreaterThan(0);
    const text = await run(["check", "examples/heated-enclosure-adc.json", "--trials", "200"]);
    expect(text.stdout).toMatch(/thermocouple\.tolerance\s+0\.50\s+0\.29/);
  });

  it("the ADC build sheet gives the code firmware compares against and its band in codes", async () => {
    const r = await run(["check", "examples/heated-enclosure-adc.json", "--json", "--trials", "200"]);
    const sheet = JSON.parse(r.stdout).buildSheet;
    const sp = sheet.adcSetpoints[0];
    // 12-bit ADC, 2.048 V full scale: code = V·4096/2.048 (unrounded, nominal parts; ADC offset 2 LSB is a ± bound)
    expect(sp.nominalCode).toBeCloseTo((sp.signalVolts * 4096) / 2.048, 6);
    expect(sp.thresholdCode).toBe(Math.ceil(sp.nominalCode));
    expect(sp.codeLow).toBeLessThan(sp.nominalCode);
    expect(sp.codeHigh).toBeGreaterThan(sp.nominalCode);
  });
});

describe("check --parts-csv", () => {
  it("writes the bill of materials with the caution, value, tolerance, tempco and count", async () => {
    const dir = tempDir();
    const r = await run(["check", join(projectRoot, "examples/reflow-oven-trip.json"), "--trials", "200", "--parts-csv", "bom.csv"], dir);
    expect(r.code).toBe(0);
    const csv = readFileSync(join(dir, "bom.csv"), "utf8");
    const lines = csv.trim().split("\n");
    expect(lines[0]).toMatch(/^# CAUTION: .*do not certify a safety function/);
    expect(lines[1]).toBe("designators,part,value,unit,tolerance,tolerance_unit,tempco_ppm_per_C,count");
    expect(lines).toContain("shunt series,resistor,2740,Ω,0.01,fraction,100,1");
    expect(lines.some((l) => l.startsWith('"mid-rail top, mid-rail bottom",resistor,') && l.endsWith(",2"))).toBe(true);
  });
});

describe("compare on an ADC design", () => {
  it("compares the firmware trip bands of each reference beside an ideal one of the same voltage", async () => {
    const r = await run(["compare", "examples/heated-enclosure-adc.json", "--json", "--trials", "200"]);
    expect(r.stderr).toBe("");
    const c = JSON.parse(r.stdout);
    expect(c.options.map((o: { name: string }) => o.name)).toEqual(["2.048 V series reference, 0.2 %", "ideal 2.048 V"]);
    const [real, ideal] = c.options;
    // an ideal reference adds no width: its band is its own ideal band; the 0.2 % reference widens it (never narrows)
    expect(ideal.setpoints[0].extraWidthC).toBe(0);
    expect(real.setpoints[0].highC - real.setpoints[0].lowC).toBeGreaterThan(ideal.setpoints[0].highC - ideal.setpoints[0].lowC);
    expect(real.setpoints[0].idealLowC).toBeCloseTo(ideal.setpoints[0].lowC, 9);
    // costed adequate option first (the ideal one has no cost)
    expect(c.recommended).toBe("2.048 V series reference, 0.2 %");
  });
});
