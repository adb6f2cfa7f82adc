// End to end: the `runaway` command, `check` folding the dynamic peak into its verdict, every format and the chart,
// on the invented kiln demo (examples/ceramic-kiln-cutout.json) and a firmware variant of the ADC demo.
import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { CAUTION_TEXT } from "../../src/caution.js";
import { oneLine, projectRoot, run, tempDir } from "./helpers.js";

const kiln = join(projectRoot, "examples/ceramic-kiln-cutout.json");
const enclosure = join(projectRoot, "examples/heated-enclosure-adc.json");
const reflow = join(projectRoot, "examples/reflow-oven-trip.json");

interface CaseJson { name: string; tripTemperatureC: number; peakTrueC: number; responseTimeSeconds: number | null; dynamicMarginC: number; trueAtHeatOffC: number | null; heatOffSeconds: number | null; trueCrossingSeconds: number | null; overshootC: number; exceedsHazard: boolean; tripped: boolean }
interface SetpointJson {
  name: string; bandLowC: number; bandHighC: number; nominalTripC: number; hazardLimitC: number; maxNormalOperatingC: number;
  cases: CaseJson[]; timeFromNormalToHazardSeconds: number | null; longestResponseTimeSeconds: number | null; responseShareOfTimeToHazard: number | null;
  staticPass: boolean; dynamicPass: boolean; pass: boolean; verdictUses: string; smallestDynamicMarginC: number; highestPeakTrueC: number;
  noise: null | { rmsC: number; mainsPeakC: number; falseTripsPerHour: number | null; hysteresisNeededC: number; hysteresisNeededVolts: number; designHysteresisVolts: number | null; designHysteresisC: number | null; hysteresisSufficient: boolean | null; sensitivityVoltsPerC: number; sensitivitySource: string };
}

describe("hotjunction runaway", () => {
  it("JSON: every figure a field; the static band passes at stoneware but the slowest unit's peak passes the hazard limit (invented demo)", async () => {
    const result = await run(["runaway", kiln, "--json"]);
    expect(result.code).toBe(3); // a failing verdict is a CI gate, as for check
    const json = JSON.parse(result.stdout) as { report: string; caution: string; pass: boolean; verdictUses: string; setpoints: SetpointJson[]; assumptions: string[]; model: { sensor: { kind: string } } };
    expect(json.report).toBe("runaway");
    expect(json.caution).toBe(CAUTION_TEXT);
    expect(json.verdictUses).toBe("dynamic peak");
    expect(json.model.sensor.kind).toBe("twoLags");
    const [stoneware, bisque] = json.setpoints;
    for (const s of [stoneware, bisque] as SetpointJson[]) {
      expect(s.cases.map((c) => c.name)).toEqual(["slowest unit", "nominal unit"]);
      expect(s.cases[0]?.tripTemperatureC).toBe(s.bandHighC);
      expect(s.cases[1]?.tripTemperatureC).toBe(s.nominalTripC);
      for (const c of s.cases) {
        expect(c.dynamicMarginC).toBeCloseTo(s.hazardLimitC - c.peakTrueC, 9);
        expect(c.responseTimeSeconds).toBeCloseTo((c.heatOffSeconds as number) - (c.trueCrossingSeconds as number), 9);
        expect(c.peakTrueC).toBeGreaterThanOrEqual(c.trueAtHeatOffC as number);
      }
      expect(s.pass).toBe(s.dynamicPass && s.bandLowC > s.maxNormalOperatingC);
      expect(s.responseShareOfTimeToHazard).toBeCloseTo((s.longestResponseTimeSeconds as number) / (s.timeFromNormalToHazardSeconds as number), 12);
      // the noise slope comes from the chain: Seebeck coefficient × gain 69, and the comparator's own 20 mV hysteresis
      expect(s.noise?.sensitivitySource).toMatch(/^Seebeck coefficient of type N at \d+ °C .* × gain 69$/);
      expect(s.noise?.designHysteresisVolts).toBe(0.02);
      expect(s.noise?.designHysteresisC).toBeCloseTo(0.02 / (s.noise?.sensitivityVoltsPerC as number), 12);
      expect(s.noise?.hysteresisSufficient).toBe(0.02 >= (s.noise?.hysteresisNeededVolts as number));
    }
    expect(stoneware?.staticPass).toBe(true);
    expect(stoneware?.dynamicPass).toBe(false);
    expect(stoneware?.cases[0]?.exceedsHazard).toBe(true);
    expect(json.pass).toBe(false);
    // the text report prints the same figures
    const text = (await run(["runaway", kiln, "--report-only"])).stdout;
    expect(text).toContain(CAUTION_TEXT);
    expect(text).toContain(`${stoneware?.cases[0]?.peakTrueC.toFixed(1)}`);
    expect(text).toContain(`${stoneware?.timeFromNormalToHazardSeconds?.toFixed(1)} s`);
    expect(text).toContain(`${bisque?.noise?.hysteresisNeededC.toFixed(2)} °C`);
    expect(text).toContain("verdict uses the dynamic peak; the static band alone: PASS");
  });

  it("--report-only exits 0; Markdown and CSV carry the caution; CSV has one row per setpoint and case", async () => {
    const md = await run(["runaway", kiln, "--markdown", "--report-only"]);
    expect(md.code).toBe(0);
    expect(md.stdout).toContain(`> **Caution.** ${CAUTION_TEXT}`);
    expect(md.stdout).toContain("| case | trip °C |");
    const csv = await run(["runaway", kiln, "--csv", "--report-only"]);
    const lines = csv.stdout.trimEnd().split("\n");
    expect(lines[0]).toContain(CAUTION_TEXT);
    const body = lines.filter((l) => !l.startsWith("#"));
    expect(body[0]?.startsWith("setpoint,case,trip_temperature_C,")).toBe(true);
    expect(body).toHaveLength(1 + 2 * 2);
    const header = (body[0] as string).split(",");
    const row = (body[1] as string).split(",");
    expect(row[header.indexOf("case")]).toBe("slowest unit");
    expect(row[header.indexOf("verdict_uses")]).toBe("dynamic peak");
    expect(row[header.indexOf("hysteresis_sufficient")]).toMatch(/^(true|false)$/);
  });

  it("--svg writes the runaway chart of the case with the smallest margin (or the one chosen); all-or-nothing with --out", async () => {
    const dir = tempDir();
    const result = await run(["runaway", kiln, "--svg", "r.svg", "--out", "r.txt", "--report-only"], dir);
    expect(result.code).toBe(0);
    expect(result.stdout).toBe("");
    const svg = readFileSync(join(dir, "r.svg"), "utf8");
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg).toContain("stoneware firing");
    expect(svg).toContain("slowest unit");
    expect(svg).toMatch(/hazard/i);
    expect(svg).toContain("do not certify a safety function");
    const chosen = await run(["runaway", kiln, "--svg", "b.svg", "--setpoint", "bisque firing", "--case", "nominal", "--report-only"], dir);
    expect(chosen.code).toBe(0);
    expect(readFileSync(join(dir, "b.svg"), "utf8")).toContain("bisque firing&quot;: nominal unit");
    // `--unit` was the case option's name before 0.2 (every other design command's `--unit` is the display unit).
    const old = await run(["runaway", kiln, "--svg", "u.svg", "--setpoint", "bisque firing", "--unit", "nominal", "--report-only"], dir);
    expect(old.code).toBe(0);
    expect(readFileSync(join(dir, "u.svg"), "utf8")).toBe(readFileSync(join(dir, "b.svg"), "utf8"));
    const badCase = await run(["runaway", kiln, "--svg", "x.svg", "--case", "F"], dir);
    expect(badCase.code).toBe(2);
    expect(oneLine(badCase.stderr)).toContain('--case "F" is not a case; valid: slowest, nominal');
    const both = await run(["runaway", kiln, "--svg", "y.svg", "--case", "nominal", "--unit", "slowest"], dir);
    expect(both.code).toBe(2);
    expect(oneLine(both.stderr)).toContain("--case and the deprecated --unit slowest|nominal both given");
    const bad = await run(["runaway", kiln, "--setpoint", "glaze"], dir);
    expect(bad.code).toBe(2);
    expect(oneLine(bad.stderr)).toContain('--setpoint "glaze" is not a setpoint');
  });

  it("--unit F shows the runaway's temperatures in °F (peaks with the offset, margins ×1.8); JSON stays in °C and records the unit", async () => {
    const dir = tempDir();
    const json = JSON.parse((await run(["runaway", kiln, "--json", "--unit", "F", "--report-only"], dir)).stdout);
    const plain = JSON.parse((await run(["runaway", kiln, "--json", "--report-only"], dir)).stdout);
    expect(json.temperatureUnit).toBe("°F");
    expect(plain.temperatureUnit).toBe("°C");
    // JSON fields stay in °C whatever the display unit
    expect(json.setpoints).toEqual(plain.setpoints);
    const csv = (await run(["runaway", kiln, "--csv", "--unit", "F", "--report-only"], dir)).stdout;
    const lines = csv.split("\n").filter((l) => l !== "" && !l.startsWith("#"));
    const head = (lines[0] as string).split(",");
    const first = (lines[1] as string).split(",");
    const c = plain.setpoints[0].cases[0];
    // t_F = 1.8·t_C + 32 for temperatures, Δt_F = 1.8·Δt_C for differences (NIST SP 811 B.8, from memory)
    expect(Number(first[head.indexOf("peak_true_F")])).toBeCloseTo(c.peakTrueC * 1.8 + 32, 9);
    expect(Number(first[head.indexOf("dynamic_margin_F")])).toBeCloseTo(c.dynamicMarginC * 1.8, 9);
    const text = (await run(["runaway", kiln, "--unit", "K", "--report-only"], dir)).stdout;
    expect(text).not.toMatch(/\d °C/);
    expect(text).toMatch(/\d K/);
  });

  it("a design without dynamics is a one-line usage error", async () => {
    const result = await run(["runaway", reflow]);
    expect(result.code).toBe(2);
    expect(oneLine(result.stderr)).toContain('states no "dynamics" section');
  });

  it("an ADC design takes a firmware path; its hysteresis comparison is n/a (firmware) and the slope is Seebeck × 200", async () => {
    const dir = tempDir();
    const design = JSON.parse(readFileSync(enclosure, "utf8")) as Record<string, unknown>;
    design["dynamics"] = {
      runaway: { kind: "constantRate", rateCPerSecond: 0.5 },
      sensor: { kind: "firstOrder", timeConstantSeconds: 3 },
      signalPath: { kind: "firmware", samplePeriodSeconds: 0.1, digitalFilter: { kind: "movingAverage", samples: 4 }, debounceSamples: 3 },
      outputStages: [{ kind: "solidStateRelay", mainsFrequencyHz: 60 }],
      noise: { white: { kind: "rms", rmsVolts: 0.0005, bandwidthHz: 50 }, chatterTargetPerHour: 1 },
    };
    writeFileSync(join(dir, "adc.json"), JSON.stringify(design));
    const json = JSON.parse((await run(["runaway", "adc.json", "--json", "--report-only"], dir)).stdout) as { setpoints: SetpointJson[] };
    const s = json.setpoints[0] as SetpointJson;
    expect(s.noise?.designHysteresisVolts).toBeNull();
    expect(s.noise?.hysteresisSufficient).toBeNull();
    expect(s.noise?.sensitivitySource).toMatch(/type T at 90 °C .* × gain 200$/);
    // a ramp through a 3 s lag lags by about R·τ (textbook control theory); the firmware adds (N−1)·Ts/2 and the debounce
    expect(s.cases[1]?.responseTimeSeconds as number).toBeGreaterThan(3 * (1 - Math.exp(-((90 - 80) / 0.5) / 3)));
    design["dynamics"] = { ...(design["dynamics"] as object), signalPath: { kind: "analog" } };
    writeFileSync(join(dir, "adc.json"), JSON.stringify(design));
    const wrong = await run(["runaway", "adc.json"], dir);
    expect(wrong.code).toBe(2);
    expect(oneLine(wrong.stderr)).toBe('hotjunction: adc.json: at dynamics.signalPath: must be kind "firmware" in an ADC design (the trip is decided by sampled firmware)');
  });
});

describe("check with dynamics", () => {
  it("folds the dynamic verdict in: JSON carries dynamics, the setpoint's static PASS becomes FAIL, exit 3; every format says which was used", async () => {
    const result = await run(["check", kiln, "--json"]);
    expect(result.code).toBe(3);
    const json = JSON.parse(result.stdout) as { pass: boolean; setpoints: { name: string; pass: boolean; reason: string; marginToHazardC: number }[]; dynamics: { pass: boolean; setpoints: SetpointJson[] }; notes: string[] };
    expect(json.setpoints[0]?.marginToHazardC).toBeGreaterThan(0); // the static band is clear of the hazard …
    expect(json.setpoints[0]?.pass).toBe(false); // … but the verdict uses the dynamic peak
    expect(json.setpoints[0]?.reason.startsWith("Verdict from the dynamic peak")).toBe(true);
    expect(json.dynamics.setpoints[0]?.staticPass).toBe(true);
    expect(json.pass).toBe(false);
    expect(json.notes.some((n) => n.includes("verdict uses the dynamic peak"))).toBe(true);
    const text = (await run(["check", kiln, "--report-only"])).stdout;
    expect(text).toContain("Runaway response (heater stuck on) — FAIL; the verdict uses the dynamic peak");
    const md = (await run(["check", kiln, "--markdown", "--report-only"])).stdout;
    expect(md).toContain("## Runaway response (heater stuck on): FAIL");
    const csv = (await run(["check", kiln, "--csv", "--report-only"])).stdout;
    expect(csv).toContain("# dynamics: runaway response per setpoint and case (the verdict uses the dynamic peak)");
    expect(csv).toContain("\nstoneware firing,slowest unit,");
  });

  it("a design without dynamics keeps the static verdict and has no dynamics field", async () => {
    const json = JSON.parse((await run(["check", reflow, "--json", "--report-only"])).stdout) as Record<string, unknown>;
    expect("dynamics" in json).toBe(false);
  });
});
