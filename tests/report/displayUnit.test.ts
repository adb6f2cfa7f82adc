// The display unit of every design report (check, compare, sweep, faults; text, Markdown, CSV, HTML, SVG):
// absolute temperatures convert with the offset (t_F = 1.8·t_C + 32, T = t_C + 273.15; ITS-90 / SI Brochure
// definitions of the degree Fahrenheit and the kelvin), temperature differences (half-widths, margins, shifts,
// standard uncertainties) by the scale only (×1.8 for °F, ×1 for K). JSON keeps its °C fields and records the unit.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { formatTripReport } from "../../src/report/renderTripReport.js";
import { formatSweepReport } from "../../src/report/renderSweepReport.js";
import { tripBandChartSvg } from "../../src/report/tripBandChart.js";
import type { TripReport } from "../../src/report/reportTypes.js";
import { _reportSchema } from "../../src/report/_reportSchema.js";
import { isHotjunctionError } from "../../src/errors.js";
import { oneLine, projectRoot, run } from "../cli/helpers.js";

const reflow = join(projectRoot, "examples/reflow-oven-trip.json");
const kiln = join(projectRoot, "examples/ceramic-kiln-cutout.json");
const enclosure = join(projectRoot, "examples/heated-enclosure-adc.json");

/** A hand-made report: trip 50 °C, worst-case band 48–52 °C, normal ≤ 45 °C, hazard < 60 °C (demo figures). */
const report: TripReport = {
  title: "Trip design",
  pass: true,
  details: [],
  notes: [],
  methods: { methods: ["worst-case"], acceptanceMethod: "worst-case", coverage: 0.95 },
  setpoints: [
    {
      name: "guard", tripTemperatureC: 50, nominalTripC: 50, maxNormalOperatingC: 45, hazardLimitC: 60,
      bands: [{ method: "worst-case", lowC: 48, highC: 52, coverage: 1, standardUncertaintyC: 1.25 }],
      marginToNormalC: 3, marginToHazardC: 8, pass: true, reason: "Setpoint \"guard\" trips between 48.0 and 52.0 °C (worst case).",
      errorSources: [{ name: "reference.initialTolerance", description: "rail tolerance at 50 °C", worstCaseC: 2, standardUncertaintyC: 1.1547 }],
    },
  ],
};

/** One CSV line's fields (RFC 4180 quotes). */
function fields(line: string): string[] {
  const out: string[] = [];
  const re = /("(?:[^"]|"")*"|[^,]*)(,|$)/g;
  for (let m = re.exec(line); m !== null && m.index < line.length; m = re.exec(line)) {
    const f = m[1] as string;
    out.push(f.startsWith('"') ? f.slice(1, -1).replace(/""/g, '"') : f);
    if (m[2] === "") break;
  }
  return out;
}

/** The CSV's first table (after the # lines) as objects by column name. */
function csvRows(text: string): Record<string, string>[] {
  const lines = text.split("\n").filter((l) => !l.startsWith("#"));
  const end = lines.indexOf("");
  const table = lines.slice(0, end < 0 ? undefined : end);
  const header = fields(table[0] as string);
  return table.slice(1).map((line) => Object.fromEntries(fields(line).map((v, i) => [header[i] as string, v])));
}

describe("hand values: absolute with the offset, differences by the scale", () => {
  it("°F: 50 °C → 122 °F; band 48–52 °C → 118.4–125.6 °F; margins 3 and 8 °C → 5.4 and 14.4 °F; u 1.25 °C → 2.25 °F", () => {
    const row = csvRows(formatTripReport(report, "csv", { temperatureUnit: "F" }))[0]!;
    expect(Number(row["target_F"])).toBe(122);
    expect(Number(row["low_F"])).toBe(118.4);
    expect(Number(row["high_F"])).toBe(125.6);
    expect(Number(row["max_normal_operating_F"])).toBe(113);
    expect(Number(row["hazard_limit_F"])).toBe(140);
    expect(Number(row["margin_to_normal_F"])).toBe(5.4);
    expect(Number(row["margin_to_hazard_F"])).toBe(14.4);
    expect(Number(row["standard_uncertainty_F"])).toBe(2.25);
    const text = formatTripReport(report, "text", { temperatureUnit: "F" });
    expect(text).toContain("target °F");
    expect(text).toContain("118.4 to 125.6");
    expect(text).toContain("+5.4");
    expect(text).toContain("+14.4");
    // the source table: swing ±2 °C → ±3.60 °F, its description's 50 °C → 122.0 °F
    expect(text).toMatch(/reference\.initialTolerance\s+3\.60\s+2\.08\s+rail tolerance at 122\.0 °F/);
    // the verdict sentence is built from the fields in °F (the engine's °C sentence is not printed)
    expect(text).toContain("trips between 118.4 and 125.6 °F (worst case): margin +5.4 °F to the highest normal operating temperature 113.0 °F, +14.4 °F to the hazard limit 140.0 °F.");
    expect(text).not.toMatch(/\d °C/);
  });

  it("K: 50 °C → 323.15 K, band 321.15–325.15 K; margins stay 3 and 8 K; a K report has no °C figure", () => {
    const row = csvRows(formatTripReport(report, "csv", { temperatureUnit: "K" }))[0]!;
    expect(Number(row["target_K"])).toBe(323.15);
    expect(Number(row["low_K"])).toBe(321.15);
    expect(Number(row["high_K"])).toBe(325.15);
    expect(Number(row["margin_to_normal_K"])).toBe(3);
    expect(Number(row["margin_to_hazard_K"])).toBe(8);
    expect(Number(row["standard_uncertainty_K"])).toBe(1.25);
    const markdown = formatTripReport(report, "markdown", { temperatureUnit: "K" });
    expect(markdown).toContain("| target K |");
    expect(markdown).not.toMatch(/\d °C/);
  });

  it("JSON keeps the °C fields and records the unit; it validates against the report schema", () => {
    const json = JSON.parse(formatTripReport(report, "json", { temperatureUnit: "F" }));
    expect(json.temperatureUnit).toBe("°F");
    expect(json.setpoints[0].tripTemperatureC).toBe(50);
    expect(json.setpoints[0].bands[0].lowC).toBe(48);
    expect(_reportSchema.safeParse(json).success).toBe(true);
    expect(JSON.parse(formatTripReport(report, "json")).temperatureUnit).toBe("°C");
  });

  it("the chart's axis and figures follow the unit; °C output is unchanged by the option's default", () => {
    const svg = tripBandChartSvg(report, { temperatureUnit: "F" });
    expect(svg).toContain("hot-junction temperature, °F");
    expect(svg).toContain("worst case: 118.4 to 125.6 °F");
    expect(tripBandChartSvg(report)).toBe(tripBandChartSvg(report, { temperatureUnit: "C" }));
    expect(formatTripReport(report, "text")).toBe(formatTripReport(report, "text", { temperatureUnit: "C" }));
  });

  it("sweep: true temperatures with the offset, errors by the scale (error −2…+2 °C at 100 °C → −3.6…+3.6 at 212 °F)", () => {
    const sweep = { title: "Error sweep", rows: [{ temperatureC: 100, nominalErrorC: 0.5, bands: [{ method: "worst-case" as const, errorLowC: -2, errorHighC: 2 }] }], notes: [], methods: { methods: ["worst-case" as const], coverage: 0.95 } };
    const row = csvRows(formatSweepReport(sweep, "csv", { temperatureUnit: "F" }))[0]!;
    expect(row).toEqual({ true_F: "212", nominal_error_F: "0.9", method: "worst-case", error_low_F: "-3.6", error_high_F: "3.6" });
    const k = csvRows(formatSweepReport(sweep, "csv", { temperatureUnit: "K" }))[0]!;
    expect(k).toEqual({ true_K: "373.15", nominal_error_K: "0.5", method: "worst-case", error_low_K: "-2", error_high_K: "2" });
  });

  it("an unknown unit is a typed error naming the quantity and the choices", () => {
    let error: unknown;
    try {
      formatTripReport(report, "text", { temperatureUnit: "R" as "F" });
    } catch (e) {
      error = e;
    }
    expect(isHotjunctionError(error)).toBe(true);
    expect((error as Error).message).toContain("temperature unit");
    expect((error as Error).message).toContain("C, F, K");
  });
});

describe("through the CLI: every design command takes --unit C|F|K", () => {
  it("check --unit F: the CSV figures are the JSON's °C figures converted (offset for temperatures, ×1.8 for margins)", async () => {
    const json = JSON.parse((await run(["check", reflow, "--json", "--unit", "F", "--trials", "200"])).stdout);
    expect(json.temperatureUnit).toBe("°F");
    const csv = (await run(["check", reflow, "--csv", "--unit", "F", "--trials", "200"])).stdout;
    expect(csv).toContain("# temperatures in °F");
    const rows = csvRows(csv);
    const s = json.setpoints[0];
    for (const row of rows) {
      const band = s.bands.find((b: { method: string }) => b.method === row["method"]);
      expect(Number(row["low_F"])).toBeCloseTo(band.lowC * 1.8 + 32, 9);
      expect(Number(row["high_F"])).toBeCloseTo(band.highC * 1.8 + 32, 9);
      expect(Number(row["margin_to_normal_F"])).toBeCloseTo(s.marginToNormalC * 1.8, 9);
      expect(Number(row["margin_to_hazard_F"])).toBeCloseTo(s.marginToHazardC * 1.8, 9);
    }
    // the build sheet's release: nominal with the offset, margin by the scale
    const sheet = csv.split("# build sheet\n")[1]!;
    const release = csvRows(sheet)[0]!;
    expect(Number(release["nominal_release_F"])).toBeCloseTo(json.buildSheet.setpoints[0].nominalReleaseC * 1.8 + 32, 9);
    expect(Number(release["release_margin_to_normal_F"])).toBeCloseTo(json.buildSheet.setpoints[0].releaseMarginToNormalC * 1.8, 9);
    expect(Number(release["hysteresis_F"])).toBeCloseTo(json.buildSheet.setpoints[0].hysteresisC * 1.8, 9);
  });

  it("check --unit K on the kiln (dynamics section too) and the enclosure (ADC codes per K): no °C figure in the text", async () => {
    for (const design of [kiln, enclosure]) {
      const text = (await run(["check", design, "--unit", "K", "--trials", "200", "--report-only"])).stdout;
      expect(text).toContain("target K");
      expect(text, design).not.toMatch(/\d °C/);
    }
  });

  it("compare --unit K: bands with the offset, extra width and margins unchanged (scale 1); the HTML form too", async () => {
    const json = JSON.parse((await run(["compare", reflow, "--json", "--trials", "200", "--report-only"])).stdout);
    const rows = csvRows((await run(["compare", reflow, "--csv", "--unit", "K", "--trials", "200", "--report-only"])).stdout);
    rows.forEach((row, i) => {
      const s = json.options[i].setpoints[0];
      expect(Number(row["low_K"])).toBeCloseTo(s.lowC + 273.15, 9);
      expect(Number(row["extra_width_K"])).toBeCloseTo(s.extraWidthC, 12);
      expect(Number(row["margin_to_hazard_K"])).toBeCloseTo(s.marginToHazardC, 12);
    });
    const html = (await run(["compare", reflow, "--html", "--unit", "K", "--trials", "200", "--report-only"])).stdout;
    expect(html).toContain("band K");
    expect(html).not.toMatch(/\d °C/);
  });

  it("sweep --unit F: --from/--to/--step in °F (392–572 °F = 200–300 °C by hand), rows in °F, JSON in °C", async () => {
    const json = JSON.parse((await run(["sweep", reflow, "--from", "392", "--to", "572", "--step", "36", "--unit", "F", "--json", "--trials", "200"])).stdout);
    expect(json.temperatureUnit).toBe("°F");
    expect(json.rows.map((r: { temperatureC: number }) => r.temperatureC)).toEqual([200, 220, 240, 260, 280, 300].map((t) => expect.closeTo(t, 9)));
    const rows = csvRows((await run(["sweep", reflow, "--from", "392", "--to", "572", "--step", "36", "--unit", "F", "--csv", "--trials", "200"])).stdout);
    expect([...new Set(rows.map((r) => r["true_F"]))]).toEqual(["392", "428", "464", "500", "536", "572"]);
    const first = rows[0]!;
    expect(Number(first["error_low_F"])).toBeCloseTo(json.rows[0].bands[0].errorLowC * 1.8, 9);
    const text = (await run(["sweep", reflow, "--from", "392", "--to", "572", "--step", "36", "--unit", "F", "--trials", "200"])).stdout;
    expect(text).toContain('Setpoint "reflow peak guard": trip 503.6 °F, highest normal operating 482.0 °F, hazard limit 536.0 °F.');
  });

  it("faults --unit F: no °C figure left in text or Markdown of the three examples; CSV trips with the offset, shifts ×1.8", async () => {
    for (const design of [kiln, reflow, enclosure]) {
      for (const format of [[], ["--markdown"]]) {
        const out = await run(["faults", design, "--unit", "F", ...format]);
        expect(out.code).toBe(0);
        expect(out.stdout, `${design} ${format}`).not.toMatch(/\d ?°C/);
      }
    }
    const c = csvRows((await run(["faults", reflow, "--csv"])).stdout);
    const f = csvRows((await run(["faults", reflow, "--csv", "--unit", "F"])).stdout);
    expect(f.length).toBe(c.length);
    c.forEach((row, i) => {
      const g = f[i]!;
      if (row["tripC"] !== "") expect(Number(g["tripF"])).toBeCloseTo(Number(row["tripC"]) * 1.8 + 32, 9);
      if (row["shiftC"] !== "") expect(Number(g["shiftF"])).toBeCloseTo(Number(row["shiftC"]) * 1.8, 9);
      if (row["marginC"] !== "") expect(Number(g["marginF"])).toBeCloseTo(Number(row["marginC"]) * 1.8, 9);
      expect(Number(g["noEffectThresholdF"])).toBeCloseTo(Number(row["noEffectThresholdC"]) * 1.8, 12);
    });
    const json = JSON.parse((await run(["faults", reflow, "--json", "--unit", "F"])).stdout);
    expect(json.temperatureUnit).toBe("°F");
    expect(json.reviews[0].hazardLimitC).toBe(JSON.parse(readFileSync(reflow, "utf8")).processLimits.hazardLimitC);
  });

  it("an unknown --unit is a usage error (exit 2) naming the choices", async () => {
    const result = await run(["check", reflow, "--unit", "R"]);
    expect(result.code).toBe(2);
    expect(oneLine(result.stderr)).toContain("C, F, K");
  });
});
