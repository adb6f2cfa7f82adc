// A new user's three designs of our own (invented figures), through every design command and format: a
// glass-annealing lehr cutout on type J with a shunt reference the tool sizes, a heat-treat furnace on type N read by
// an ADC with a firmware trip, a hot plate on type K with a comparator on the 5 V rail. Each command must run (exit 0,
// or 3 for a design that fails its margins), every JSON report must follow the report schema, the SVGs and the
// parts list must be written, and no figure may be NaN.
import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { _reportSchema } from "../../src/report/_reportSchema.js";
import { projectRoot, run, tempDir } from "./helpers.js";

const example = (name: string): Record<string, any> => JSON.parse(readFileSync(join(projectRoot, "examples", name), "utf8"));

function designs(): Record<string, { design: Record<string, unknown>; from: number; to: number }> {
  const lehr = example("reflow-oven-trip.json");
  lehr["name"] = "Glass-annealing lehr cutout";
  lehr["thermocouple"].type = "J";
  lehr["setpoints"] = [{ name: "anneal limit", tripTemperatureC: 560 }];
  lehr["processLimits"] = { maxNormalOperatingC: 545, hazardLimitC: 590 };
  delete lehr["reference"].seriesOhms; // the tool sizes the shunt's series resistor
  // 5 mV/°C would put 560 °C at 2.8 V, above the 2.5 V reference (check refuses it, naming the threshold and range):
  // a ×70 amplifier on the compensated EMF instead (E_J(560 °C) ≈ 31 mV → about 2.2 V).
  lehr["amplifier"] = { kind: "voltage", gain: { setBy: "fixed", gain: 70, gainErrorFraction: 0.002 }, offsetMicrovolts: 20 };
  lehr["coldJunction"] = { method: "hardware", compensationMicrovoltsPerC: 51.7, matchedAtC: 25, sensorAccuracyC: 1 };
  const furnace = example("heated-enclosure-adc.json");
  furnace["name"] = "Heat-treat furnace firmware cutout";
  furnace["thermocouple"] = { type: "N", tolerance: { standard: "IEC 60584-1", class: 1 } };
  furnace["setpoints"] = [{ name: "soak limit", tripTemperatureC: 900, maxNormalOperatingC: 870, hazardLimitC: 950 }];
  delete furnace["processLimits"];
  delete furnace["dynamics"];
  // ×60: E_N(950 °C) ≈ 32 mV → about 1.9 V inside the 2.048 V full scale (the example's ×200 saturates; see below)
  furnace["amplifier"].gain.gain = 60;
  const plate = {
    hotjunctionDesign: 1,
    name: "Hot plate over-temperature guard",
    setpoints: [{ name: "plate limit", tripTemperatureC: 300 }],
    processLimits: { maxNormalOperatingC: 280, hazardLimitC: 330 },
    thermocouple: { type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
    amplifier: { kind: "fixed-scale", millivoltsPerC: 5, accuracyC: 1 },
    comparator: { offsetMillivolts: 1, hysteresisMillivolts: 10 },
    reference: { kind: "regulator-rail", name: "5 V rail ±2 %", nominalVolts: 5, totalToleranceFraction: 0.02, cost: 0 },
    referenceAlternatives: [{ kind: "series", name: "2.5 V series reference, 0.1 %", nominalVolts: 2.5, initialAccuracyFraction: 0.001, tempcoPpmPerC: 20, cost: 1 }],
    resistors: { series: "E96", toleranceFraction: 0.001, tempcoPpmPerC: 25 },
    ambient: { minC: 10, maxC: 45 },
  };
  return { lehr: { design: lehr, from: 500, to: 600 }, furnace: { design: furnace, from: 800, to: 1000 }, plate: { design: plate, from: 250, to: 350 } };
}

describe("a new user's three designs through every command", () => {
  for (const [name, { design, from, to }] of Object.entries(designs())) {
    it(`${name}: validate, check (+ --svg, --parts-csv), compare (+ --svg), sweep (+ --svg), faults; every format, °C and °F`, async () => {
      const dir = tempDir();
      writeFileSync(join(dir, `${name}.json`), JSON.stringify(design));
      const file = `${name}.json`;
      const validated = await run(["validate", file], dir);
      expect(validated.code, validated.stderr).toBe(0);
      const common = ["--trials", "300", "--report-only"];
      const jobs: string[][] = [
        ["check", file, ...common, "--svg", "c.svg", "--parts-csv", "parts.csv"],
        ["compare", file, ...common, "--svg", "cmp.svg"],
        ["sweep", file, "--from", String(from), "--to", String(to), "--step", "25", "--trials", "300", "--svg", "s.svg"],
        ["faults", file],
      ];
      for (const job of jobs) {
        for (const format of [[], ["--json"], ["--markdown"], ["--csv"], ["--html"], ["--unit", "F"]]) {
          const args = format.length === 0 || format[0] === "--unit" ? [...job, "--force", ...format] : [...job.filter((a, i, all) => !a.endsWith(".svg") && !a.endsWith(".csv") && all[i + 1]?.endsWith(".svg") !== true && all[i + 1]?.endsWith(".csv") !== true), ...format];
          const result = await run(args, dir);
          expect(result.code, `${args.join(" ")}: ${result.stderr}`).toBe(0);
          expect(result.stdout, args.join(" ")).not.toMatch(/\bNaN\b|undefined/);
          expect(result.stdout, args.join(" ")).toMatch(/do not certify a safety function/);
          if (format[0] === "--json" && job[0] !== "faults") {
            const parsed = _reportSchema.safeParse(JSON.parse(result.stdout));
            expect(parsed.success, `${args.join(" ")}: ${parsed.success ? "" : JSON.stringify(parsed.error.issues.slice(0, 3))}`).toBe(true);
          }
        }
      }
      for (const out of ["c.svg", "cmp.svg", "s.svg"]) expect(readFileSync(join(dir, out), "utf8").startsWith("<svg"), out).toBe(true);
      expect(readFileSync(join(dir, "parts.csv"), "utf8")).toMatch(/thermocouple/);
      // the build sheet names what to build: thresholds (comparator) or the code firmware compares against (ADC)
      const sheet = JSON.parse((await run(["check", file, "--json", ...common], dir)).stdout).buildSheet;
      if ((design as { adc?: unknown }).adc !== undefined) expect(sheet.adcSetpoints[0].thresholdCode).toBeGreaterThan(0);
      else expect(sheet.setpoints[0].resistorsAbove[0].designator).toBe("top");
      if (name === "lehr") expect(sheet.shuntSeriesResistor.ohms).toBeGreaterThan(0);
    });
  }

  it("an ADC design whose threshold code lies beyond the converter's largest code fails with the reason in figures", async () => {
    // the enclosure's ×200 chain on type N at 900 °C: 200 × [E_N(900 °C) − E_N(25 °C)] ≈ 200 × (32.37 − 0.65) mV ≈ 6.34 V
    // (NIST SRD 60 type N table values, from memory) against a 2.048 V full scale of 12 bits (largest code 4095)
    const dir = tempDir();
    const furnace = designs()["furnace"]!.design as Record<string, any>;
    furnace["amplifier"].gain.gain = 200;
    writeFileSync(join(dir, "sat.json"), JSON.stringify(furnace));
    const result = await run(["check", "sat.json", "--json", "--trials", "200"], dir);
    expect(result.code).toBe(3);
    const report = JSON.parse(result.stdout);
    expect(report.pass).toBe(false);
    expect(report.setpoints[0].pass).toBe(false);
    expect(report.setpoints[0].reason).toMatch(/^the ADC saturates: the signal at the setpoint is 6\.3\d{3} V, beyond the full scale 2\.048 V \(threshold code \d+ above the largest code 4095 of 12 bits\)/);
    expect(report.buildSheet.adcSetpoints[0].thresholdCode).toBeGreaterThan(4095);
    const compared = JSON.parse((await run(["compare", "sat.json", "--json", "--trials", "200", "--report-only"], dir)).stdout);
    expect(compared.options[0].verdict).toBe("inadequate");
  });
});
