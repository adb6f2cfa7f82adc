// End-to-end check of the SVG charts in headless Chromium (Debian's /usr/bin/chromium via playwright-core):
// the chart renders, has its axes, tick labels, title and legend (queried in the DOM), and the screenshot is not blank.
import { existsSync } from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { chromium, type Browser } from "playwright-core";
import { errorBandChartSvg, tripBandChartSvg } from "../../src/report/index.js";
import type { ErrorSweep, TripReport } from "../../src/report/index.js";
import { countInkPixels } from "../workbench/png.js";

const chromiumPath = "/usr/bin/chromium";
const available = existsSync(chromiumPath);
if (!available && process.env["CI"] === "true") throw new Error(`Chromium is required in CI but ${chromiumPath} is missing`);
if (!available) console.warn(`skipping the Chromium SVG tests: ${chromiumPath} not found`);

const report: TripReport = {
  title: "Trip design",
  designName: "Test oven",
  pass: true,
  details: [],
  notes: [],
  methods: { methods: ["worst-case", "rss", "monte-carlo"], acceptanceMethod: "worst-case", coverage: 0.95, trials: 2000, seed: 9 },
  setpoints: [260, 1250].map((t) => ({
    name: `guard ${t}`,
    tripTemperatureC: t,
    nominalTripC: t + 0.3,
    bands: [
      { method: "worst-case" as const, lowC: t - 8, highC: t + 9, coverage: 1, standardUncertaintyC: 0 },
      { method: "rss" as const, lowC: t - 4, highC: t + 4, coverage: 0.95, standardUncertaintyC: 2 },
      { method: "monte-carlo" as const, lowC: t - 3.9, highC: t + 4.1, coverage: 0.95, standardUncertaintyC: 2, trials: 2000, seed: 9 },
    ],
    maxNormalOperatingC: t - 12,
    hazardLimitC: t + 20,
    marginToNormalC: 4,
    marginToHazardC: 11,
    pass: true,
    reason: "inside",
    errorSources: [],
  })),
};

const sweep: ErrorSweep = {
  title: "Reading error sweep",
  rows: Array.from({ length: 11 }, (_, i) => {
    const t = i * 10;
    return {
      temperatureC: t,
      nominalErrorC: 0.01 * t - 0.5,
      bands: [
        { method: "worst-case" as const, errorLowC: -2 - 0.01 * t, errorHighC: 2 + 0.01 * t },
        { method: "rss" as const, errorLowC: -1, errorHighC: 1 },
      ],
    };
  }),
  notes: [],
  methods: { methods: ["worst-case", "rss"], coverage: 0.95 },
};

describe.skipIf(!available)("SVG charts in headless Chromium", () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await chromium.launch({
      executablePath: chromiumPath,
      args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
    });
  });
  afterAll(async () => {
    await browser?.close();
  });

  async function render(svg: string) {
    const page = await browser.newPage({ viewport: { width: 1000, height: 900 } });
    await page.setContent(`<!doctype html><html><body style="margin:0;background:#fff">${svg}</body></html>`);
    return page;
  }

  it("draws the trip-band chart with axes, tick labels, bands, limits, legend and caption", async () => {
    const page = await render(tripBandChartSvg(report));
    const box = await page.locator("svg").first().boundingBox();
    expect(box?.width).toBeGreaterThan(500);
    expect(await page.locator("g.axis-x").count()).toBe(2);
    expect(await page.locator("g.axis-x .tick").count()).toBeGreaterThan(6);
    expect(await page.locator(".axis-title").first().textContent()).toBe("hot-junction temperature, °C");
    expect(await page.locator(".chart-title").textContent()).toBe("Trip design: Test oven — trip bands");
    expect(await page.locator("rect.band").count()).toBe(6);
    expect(await page.locator("line.limit-hazard").count()).toBe(2);
    expect(await page.locator("line.limit-normal").count()).toBe(2);
    const legend = await page.locator("g.legend").textContent();
    for (const word of ["worst case band", "RSS band", "Monte Carlo band", "highest normal operating", "hazard limit"]) expect(legend).toContain(word);
    expect(await page.locator("text.caution").first().textContent()).toContain("do not certify a safety function");
    expect((await page.locator("text.method-note").allTextContents()).join(" ")).toContain("seed 9");
    // Bands sit where the scale puts them: the worst-case band is wider than the RSS band on screen.
    const wc = await page.locator("rect.band-worst-case").first().boundingBox();
    const rss = await page.locator("rect.band-rss").first().boundingBox();
    expect(wc!.width).toBeGreaterThan(rss!.width * 1.8);
    const { ink, total } = countInkPixels(await page.screenshot({ type: "png" }));
    expect(ink / total).toBeGreaterThan(0.01);
    await page.close();
  });

  it("draws the error-band chart with both axes, labelled ticks and non-blank pixels", async () => {
    const page = await render(errorBandChartSvg(sweep));
    expect(await page.locator("g.axis-x .tick").count()).toBeGreaterThan(5);
    expect(await page.locator("g.axis-y .tick").count()).toBeGreaterThan(3);
    const xLabels = await page.locator("g.axis-x .tick text").allTextContents();
    expect(xLabels).toContain("0");
    expect(xLabels).toContain("100");
    expect(await page.locator("g.axis-y .axis-title").textContent()).toBe("error (indicated − true), °C");
    expect(await page.locator("path.band-worst-case").getAttribute("d")).toMatch(/^M[\d.]+,[\d.]+L/);
    expect(await page.locator("text.direct-label").count()).toBe(4);
    const blank = countInkPixels(await (await render("<svg xmlns='http://www.w3.org/2000/svg' width='900' height='520'></svg>")).screenshot({ type: "png" }));
    expect(blank.ink).toBe(0);
    const { ink, total } = countInkPixels(await page.screenshot({ type: "png" }));
    expect(ink / total).toBeGreaterThan(0.02);
    await page.close();
  });

  it("renders the demo's kind of chart from the CLI output file (well-formed XML)", async () => {
    const svg = tripBandChartSvg(report);
    const page = await browser.newPage();
    await page.goto(`data:image/svg+xml;base64,${Buffer.from(svg).toString("base64")}`);
    // An XML parse error shows a parsererror element instead of the chart.
    expect(await page.locator("parsererror").count()).toBe(0);
    expect(await page.locator("text.chart-title").count()).toBe(1);
    await page.close();
  });
});
