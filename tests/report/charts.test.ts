// The band charts: `compare --svg` (each reference option's band side by side on one temperature axis against the
// normal and hazard limits, drawn by the same band-panel code as `check --svg`) and the sweep chart's marks
// (setpoints, normal limit, hazard limit). Geometry is checked against the report's own JSON figures through the
// axis the chart prints (a property of every drawn band: x = axis(value)).
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { comparisonChartSvg } from "../../src/report/comparisonChart.js";
import { tripBandChartSvg } from "../../src/report/tripBandChart.js";
import { errorBandChartSvg } from "../../src/report/errorBandChart.js";
import type { ReferenceComparison } from "../../src/trip/types.js";
import { isHotjunctionError } from "../../src/errors.js";
import { projectRoot, run, tempDir } from "../cli/helpers.js";

const reflow = join(projectRoot, "examples/reflow-oven-trip.json");
const enclosure = join(projectRoot, "examples/heated-enclosure-adc.json");
const kiln = join(projectRoot, "examples/ceramic-kiln-cutout.json");

/** The linear map value → px of one printed axis (from its tick positions and labels), checked to be linear. */
function axisMap(axisSvg: string): (value: number) => number {
  const ticks = [...axisSvg.matchAll(/<g class="tick" transform="translate\(([-\d.]+),([-\d.]+)\)">.*?<text[^>]*>([^<]+)<\/text><\/g>/g)].map((m) => ({
    px: Number(m[1]),
    py: Number(m[2]),
    value: Number((m[3] as string).replace("−", "-")),
  }));
  expect(ticks.length).toBeGreaterThanOrEqual(3);
  const vertical = ticks[0]!.px === ticks[1]!.px;
  const pos = (t: (typeof ticks)[number]): number => (vertical ? t.py : t.px);
  const a = ticks[0]!;
  const b = ticks.at(-1)!;
  const slope = (pos(b) - pos(a)) / (b.value - a.value);
  for (const t of ticks) expect(Math.abs(pos(a) + slope * (t.value - a.value) - pos(t))).toBeLessThan(0.02);
  return (value) => pos(a) + slope * (value - a.value);
}

function xAxes(svg: string): string[] {
  return [...svg.matchAll(/<g class="axis axis-x">.*?<text[^>]*class="axis-title"[^>]*>[^<]*<\/text><\/g>/g)].map((m) => m[0]);
}

describe("compare --svg: the options' bands side by side against the limits", () => {
  it("reflow oven: one row per reference option at the x of its JSON band, verdicts labelled, limits at their values", async () => {
    const dir = tempDir();
    const json = await run(["compare", reflow, "--json", "--trials", "300", "--report-only"]);
    const report = JSON.parse(json.stdout);
    const drawn = await run(["compare", reflow, "--svg", join(dir, "c.svg"), "--trials", "300", "--report-only"]);
    expect(drawn.code).toBe(0);
    const svg = readFileSync(join(dir, "c.svg"), "utf8");
    const design = JSON.parse(readFileSync(reflow, "utf8"));
    const [axis] = xAxes(svg);
    const x = axisMap(axis!);
    const rects = [...svg.matchAll(/<rect class="band option option-(pass|fail)" x="([-\d.]+)" y="[-\d.]+" width="([-\d.]+)"/g)];
    expect(rects.length).toBe(report.options.length);
    report.options.forEach((o: { name: string; setpoints: { lowC: number; highC: number; pass: boolean }[] }, i: number) => {
      const s = o.setpoints[0]!;
      const r = rects[i]!;
      expect(r[1]).toBe(s.pass ? "pass" : "fail");
      expect(Math.abs(Number(r[2]) - x(s.lowC))).toBeLessThan(0.02);
      expect(Math.abs(Number(r[2]) + Number(r[3]) - x(s.highC))).toBeLessThan(0.03);
      expect(svg).toContain(`${o.name} — ${s.pass ? "PASS" : "FAIL"}`);
    });
    const line = (cls: string): number => Number(svg.match(new RegExp(`<line class="${cls}" x1="([-\\d.]+)"`))![1]);
    expect(Math.abs(line("limit-normal") - x(design.processLimits.maxNormalOperatingC))).toBeLessThan(0.02);
    expect(Math.abs(line("limit-hazard") - x(design.processLimits.hazardLimitC))).toBeLessThan(0.02);
    expect(Math.abs(line("target") - x(design.setpoints[0].tripTemperatureC))).toBeLessThan(0.02);
    expect(svg).toContain(`Recommended: ${report.recommended}.`);
    expect(svg).toContain("do not certify a safety function");
    expect(svg).toContain("seed 260");
  });

  it("works for an ADC (firmware-trip) design and for two setpoints (one panel and axis each)", async () => {
    const dir = tempDir();
    const adc = await run(["compare", enclosure, "--svg", join(dir, "e.svg"), "--trials", "200", "--report-only"]);
    expect(adc.code).toBe(0);
    const adcSvg = readFileSync(join(dir, "e.svg"), "utf8");
    expect(adcSvg).toMatch(/class="band option option-(pass|fail)"/);
    const two = await run(["compare", kiln, "--svg", join(dir, "k.svg"), "--trials", "200", "--report-only"]);
    expect(two.code).toBe(0);
    const kilnSvg = readFileSync(join(dir, "k.svg"), "utf8");
    expect(xAxes(kilnSvg).length).toBe(2);
    expect(kilnSvg).toContain("stoneware firing: target 1250.0 °C");
  });

  it("a compared setpoint without its limits is a typed error naming it", () => {
    const comparison: ReferenceComparison = { acceptanceMethod: "worst-case", options: [], recommended: null, summary: "" };
    try {
      comparisonChartSvg({ comparison, methods: { methods: ["worst-case"], coverage: 0.95 }, setpoints: [] });
      // no options and no setpoints: an empty chart is drawn
    } catch {
      expect.unreachable();
    }
    const option = {
      name: "rail", kind: "element" as const, cost: null, networks: [], verdict: "adequate" as const, verdictText: "",
      reference: { name: "rail", kind: "element" as const, nominalVolts: 5, toleranceFraction: 0.04, problems: [] },
      setpoints: [{ name: "guard", lowC: 48, highC: 52, idealLowC: 50, idealHighC: 50, extraWidthC: 4, marginToNormalC: 8, marginToHazardC: 8, pass: true }],
    };
    let error: unknown;
    try {
      comparisonChartSvg({ comparison: { ...comparison, options: [option] }, methods: { methods: ["worst-case"], coverage: 0.95 }, setpoints: [{ name: "other", tripTemperatureC: 50, maxNormalOperatingC: 40, hazardLimitC: 60 }] });
    } catch (e) {
      error = e;
    }
    expect(isHotjunctionError(error)).toBe(true);
    expect(String((error as Error).message)).toContain("guard");
  });

  it("the trip chart and the comparison chart are one drawing: same limit lines, legend lines and caution", async () => {
    const report = JSON.parse((await run(["check", reflow, "--json", "--trials", "200", "--report-only"])).stdout);
    const trip = tripBandChartSvg(report);
    for (const fragment of ['class="limit-normal"', 'class="limit-hazard"', 'class="target"', "highest normal operating", "Caution: "]) expect(trip).toContain(fragment);
  });
});

describe("sweep charts mark the setpoints, the normal limit and the hazard limit", () => {
  it("reflow oven 200–300 °C: the marks sit at 262, 250 and 280 °C on the printed axis; the JSON carries them", async () => {
    const dir = tempDir();
    const result = await run(["sweep", reflow, "--from", "200", "--to", "300", "--step", "20", "--trials", "200", "--json", "--svg", join(dir, "s.svg")]);
    expect(result.code).toBe(0);
    const json = JSON.parse(result.stdout);
    // design file values (examples/reflow-oven-trip.json): setpoint 262 °C, normal 250 °C, hazard 280 °C
    expect(json.setpoints).toEqual([{ name: "reflow peak guard", tripTemperatureC: 262, maxNormalOperatingC: 250, hazardLimitC: 280 }]);
    const svg = readFileSync(join(dir, "s.svg"), "utf8");
    const x = axisMap(xAxes(svg)[0]!);
    const at = (cls: string): number => Number(svg.match(new RegExp(`<line class="${cls}" x1="([-\\d.]+)"`))![1]);
    expect(Math.abs(at("mark-setpoint") - x(262))).toBeLessThan(0.02);
    expect(Math.abs(at("limit-normal") - x(250))).toBeLessThan(0.02);
    expect(Math.abs(at("limit-hazard") - x(280))).toBeLessThan(0.02);
    expect(svg).toContain("setpoint &quot;reflow peak guard&quot; 262.0 °C");
    expect(svg).toContain("hazard &lt; 280.0 °C");
  });

  it("marks outside the swept range are listed under the chart, not drawn; shared limits are drawn once", () => {
    const rows = [100, 150, 200].map((t) => ({ temperatureC: t, nominalErrorC: 0, bands: [{ method: "worst-case" as const, errorLowC: -1, errorHighC: 1 }] }));
    const svg = errorBandChartSvg({
      title: "Error sweep", rows, notes: [], methods: { methods: ["worst-case"], coverage: 0.95 },
      setpoints: [
        { name: "low", tripTemperatureC: 160, maxNormalOperatingC: 140, hazardLimitC: 250 },
        { name: "high", tripTemperatureC: 190, maxNormalOperatingC: 140, hazardLimitC: 250 },
      ],
    });
    expect([...svg.matchAll(/<line class="mark-setpoint"/g)].length).toBe(2);
    expect([...svg.matchAll(/<line class="limit-normal"/g)].length).toBe(1);
    expect(svg).not.toContain('<line class="limit-hazard"');
    expect(svg).toContain("Outside the swept range: hazard &lt; 250.0 °C.");
  });
});
