// The workbench page in headless Chromium (Debian's /usr/bin/chromium through playwright-core, never a downloaded
// browser), opened from disk. Checks: each example loads and shows the library's numbers (computed here in Node with
// the same library calls the CLI makes); a reference tolerance change from 4 % to 1 % narrows the worst-case band by
// what the library computes for the same change; a field made invalid shows the library's validation message beside
// it, results return when it is fixed, undo and redo; the address round-trips the design exactly; a saved design file
// passes `validate` and gives the CLI's numbers; the exported HTML report opens and carries the caution; no network
// request, no console error, non-blank screenshots at 1280×800 and 420 wide; every control has a name. The speed of
// an edit is reported as a ratio to a plain recomputation of the same design in the same page (no timed assertion).
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CAUTION_TEXT, safeParseDesign, tripDesignFromDesign, validateDesign, type DesignFile } from "../../src/design/index.js";
import { designTrip } from "../../src/index.js";
import { analyseDesign } from "../../src/workbench/analysis.js";
import { buildWorkbenchPage } from "../../scripts/buildWorkbench.js";
import { run } from "../cli/helpers.js";
import { countInkPixels } from "./png.js";

const chromiumPath = "/usr/bin/chromium";
const available = existsSync(chromiumPath);
if (!available && process.env["CI"] === "true") throw new Error(`Chromium is required in CI but ${chromiumPath} is missing`);
if (!available) console.warn(`skipping the workbench browser tests: ${chromiumPath} not found`);

const projectDir = join(import.meta.dirname, "..", "..");
const exampleIds = readdirSync(join(projectDir, "examples"))
  .filter((f) => f.endsWith(".json"))
  .sort()
  .map((f) => f.replace(/\.json$/, ""));
const exampleText = (id: string): string => readFileSync(join(projectDir, "examples", `${id}.json`), "utf8");

let scratch = "";
let pageUrl = "";
let context: BrowserContext;
const problems: string[] = [];

interface WorkbenchApi {
  designText(): string;
  loadText(text: string): void;
  loadChoice(value: string): void;
  idle(): Promise<void>;
  exportText(kind: string): string | undefined;
  plainRecompute(iterations: number): number;
  examples: string[];
}
declare global {
  interface Window {
    hotjunctionWorkbench: WorkbenchApi;
  }
}

async function openPage(url = pageUrl): Promise<Page> {
  const page = await context.newPage();
  page.on("console", (m) => {
    if (m.type() === "error") problems.push(`console error: ${m.text()}`);
  });
  page.on("pageerror", (e) => problems.push(`page error: ${e.message}`));
  await page.goto(url);
  await page.waitForFunction(() => document.documentElement.dataset["ready"] === "true", null, { timeout: 60_000 });
  await page.evaluate(() => window.hotjunctionWorkbench.idle());
  return page;
}

/** The page's band figures (full precision, from the cells' data-value), by "setpoint:method:edge". */
async function bandsOf(page: Page): Promise<Record<string, number>> {
  return page.evaluate(() => {
    const out: Record<string, number> = {};
    for (const cell of document.querySelectorAll<HTMLElement>("[data-band]")) out[cell.dataset["band"] ?? ""] = Number(cell.dataset["value"]);
    return out;
  });
}

/** The library's bands for a design (the calls `check` makes), by the same keys. */
function libraryBands(design: DesignFile): Record<string, number> {
  const report = analyseDesign(design, { bandsOnly: true }).report;
  const out: Record<string, number> = {};
  report?.setpoints.forEach((s, i) => {
    for (const b of s.bands) {
      out[`${i}:${b.method}:low`] = b.lowC;
      out[`${i}:${b.method}:high`] = b.highC;
    }
  });
  return out;
}

/** Edits a field the way typing does and returns how long until the first band cell changed, ms. */
async function timedEdit(page: Page, fieldId: string, value: string): Promise<number> {
  return page.evaluate(
    async ({ fieldId, value }) => {
      const input = document.getElementById(fieldId) as HTMLInputElement;
      const key = '[data-band="0:worst-case:high"]';
      const before = document.querySelector<HTMLElement>(key)?.dataset["value"];
      const body = document.getElementById("hj-results-body") as HTMLElement;
      const start = performance.now();
      const changed = new Promise<number>((resolve) => {
        const observer = new MutationObserver(() => {
          const now = document.querySelector<HTMLElement>(key)?.dataset["value"];
          if (now !== undefined && now !== before) {
            observer.disconnect();
            resolve(performance.now() - start);
          }
        });
        observer.observe(body, { childList: true, subtree: true });
      });
      input.value = value;
      input.dispatchEvent(new Event("input", { bubbles: true }));
      return changed;
    },
    { fieldId, value },
  );
}

describe.skipIf(!available)("workbench page in headless Chromium", () => {
  beforeAll(async () => {
    scratch = mkdtempSync(join(tmpdir(), "hotjunction-workbench-"));
    const file = join(scratch, "workbench.html");
    writeFileSync(file, await buildWorkbenchPage());
    pageUrl = pathToFileURL(file).href;
    context = await chromium.launchPersistentContext(join(scratch, "profile"), {
      executablePath: chromiumPath,
      headless: true,
      acceptDownloads: true,
      viewport: { width: 1280, height: 800 },
      args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
    });
    await context.route("**", (route) => {
      const url = route.request().url();
      if (/^(file|data|blob):/.test(url)) return route.continue();
      problems.push(`network request: ${url}`);
      return route.abort();
    });
  });

  afterAll(async () => {
    await context?.close();
    if (scratch !== "") rmSync(scratch, { recursive: true, force: true });
  });

  it("loads each example and shows the library's bands; an edit's speed is reported against a plain recomputation", async () => {
    const page = await openPage();
    expect(await page.evaluate(() => window.hotjunctionWorkbench.examples)).toEqual(exampleIds);
    const ratios: string[] = [];
    for (const id of exampleIds) {
      await page.evaluate((v) => window.hotjunctionWorkbench.loadChoice(v), `example:${id}`);
      await page.evaluate(() => window.hotjunctionWorkbench.idle());
      const design = validateDesign(JSON.parse(exampleText(id)) as unknown);
      // Exactly the example's text is being edited.
      expect(JSON.parse(await page.evaluate(() => window.hotjunctionWorkbench.designText()))).toEqual(JSON.parse(exampleText(id)));
      const shown = await bandsOf(page);
      const expected = libraryBands(design);
      expect(Object.keys(shown).sort()).toEqual(Object.keys(expected).sort());
      // Same library, same seed: worst case and RSS are the same numbers; Monte Carlo the same draws.
      for (const [key, value] of Object.entries(expected)) expect(shown[key], key).toBeCloseTo(value, 9);
      expect(await page.locator("#hj-status").textContent()).toMatch(/Full results: (PASS|FAIL)/);
      expect(await page.locator("#hj-fault-counts").count()).toBe(1);
      // The bands chart, and the runaway chart for a design with dynamics.
      expect(await page.locator(".hj-svg svg").count()).toBe(design.dynamics !== undefined ? 2 : 1);
      expect(await page.locator("#hj-dynamics").count()).toBe(design.dynamics !== undefined ? 1 : 0);
      expect(await page.locator("#hj-parts-table").count()).toBe(1);
      if (design.comparator === undefined) expect(await page.locator("#hj-adc-codes-table").count()).toBe(1);
      if (design.comparator !== undefined) {
        expect(await page.locator("#hj-build-table").count()).toBe(1);
        expect(await page.locator("#hj-comparison-table").count()).toBe(1);
      }
      // Speed: the first setpoint's trip temperature 1 °C lower, to an updated band; beside a plain recomputation
      // (parse and the full band analysis at the design's trials) of the same design in the same page.
      const trip = design.setpoints[0]?.tripTemperatureC ?? 0;
      const firstEditMs = await timedEdit(page, "hj-f-setpoints_0__tripTemperatureC", String(trip - 1));
      await page.evaluate(() => window.hotjunctionWorkbench.idle());
      // Five edits after the first (alternating 2 and 1 °C lower), each to its updated band: median and largest.
      const edits: number[] = [];
      for (let k = 0; k < 5; k++) {
        edits.push(await timedEdit(page, "hj-f-setpoints_0__tripTemperatureC", String(trip - (k % 2 === 0 ? 2 : 1))));
        await page.evaluate(() => window.hotjunctionWorkbench.idle());
      }
      edits.sort((a, b) => a - b);
      const editMs = edits[2] as number;
      const plainMs = await page.evaluate(() => window.hotjunctionWorkbench.plainRecompute(2));
      ratios.push(
        `${id}: edit to band median ${editMs.toFixed(0)} ms, largest ${(edits[4] as number).toFixed(0)} ms of 5 (first edit ${firstEditMs.toFixed(0)} ms), plain recomputation ${plainMs.toFixed(0)} ms, ratio ${(editMs / plainMs).toFixed(2)}`,
      );
      expect(editMs).toBeGreaterThan(0);
    }
    console.log(`workbench speed (trials as in each example):\n  ${ratios.join("\n  ")}`);
    await page.close();
  }, 600_000);

  it("narrows the worst-case band by the library's amount when the reference tolerance goes from 4 % to 1 %", async () => {
    const example = JSON.parse(exampleText("reflow-oven-trip")) as Record<string, unknown> & { referenceAlternatives: Record<string, unknown>[] };
    const rail = example.referenceAlternatives.find((r) => r["kind"] === "regulator-rail");
    expect(rail?.["totalToleranceFraction"]).toBe(0.04);
    // The rail becomes the design's reference; the shunt it replaces joins the alternatives.
    const others = [example["reference"], ...example.referenceAlternatives.filter((r) => r !== rail)];
    const at4 = { ...example, reference: rail, referenceAlternatives: others };
    const at1 = { ...at4, reference: { ...rail, totalToleranceFraction: 0.01 } };
    const width = (d: unknown): number => {
      const band = designTrip(tripDesignFromDesign(validateDesign(d)), { monteCarloTrials: 100 }).setpoints[0]!.worstCase;
      return band.highC - band.lowC;
    };
    const libraryNarrowing = width(at4) - width(at1);
    expect(libraryNarrowing).toBeGreaterThan(1);

    const page = await openPage();
    await page.evaluate((t) => window.hotjunctionWorkbench.loadText(t), JSON.stringify(at4, null, 2));
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    const before = await bandsOf(page);
    const field = page.locator("#hj-f-reference_totalToleranceFraction");
    expect(await field.inputValue()).toBe("0.04");
    await field.fill("0.01");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    const after = await bandsOf(page);
    const shownNarrowing = before["0:worst-case:high"]! - before["0:worst-case:low"]! - (after["0:worst-case:high"]! - after["0:worst-case:low"]!);
    expect(shownNarrowing).toBeCloseTo(libraryNarrowing, 9);
    await page.close();
  });

  it("shows a field's validation message beside it, gives results back when fixed, and undoes and redoes", async () => {
    const page = await openPage();
    await page.evaluate(() => window.hotjunctionWorkbench.loadChoice("example:reflow-oven-trip"));
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    const original = await page.evaluate(() => window.hotjunctionWorkbench.designText());
    const field = page.locator("#hj-f-setpoints_0__tripTemperatureC");
    await field.fill("abc");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    // The library's message for the same text, shown at the field's own message slot.
    const draft = await page.evaluate(() => window.hotjunctionWorkbench.designText());
    const parsed = safeParseDesign(draft, { fileName: "design" });
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    expect(parsed.error.path).toBe("setpoints[0].tripTemperatureC");
    const message = page.locator("#hj-f-setpoints_0__tripTemperatureC-msg");
    await expect.poll(() => message.textContent()).toContain(parsed.error.problem);
    expect(await field.getAttribute("aria-invalid")).toBe("true");
    expect(await page.locator("#hj-invalid-note").count()).toBe(1);
    expect(await page.locator("[data-band]").count()).toBe(0);
    expect(await page.locator("#hj-status").textContent()).toContain("setpoints[0].tripTemperatureC");
    // A bound: below absolute zero.
    await field.fill("-300");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    const bound = safeParseDesign(await page.evaluate(() => window.hotjunctionWorkbench.designText()));
    expect(bound.success).toBe(false);
    if (!bound.success) expect(await message.textContent()).toContain(bound.error.problem);
    // Fixed: results return.
    await field.fill("255");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    expect(await message.isHidden()).toBe(true);
    expect(await field.getAttribute("aria-invalid")).toBeNull();
    expect(await page.locator("[data-band]").count()).toBeGreaterThan(0);
    const edited = JSON.parse(await page.evaluate(() => window.hotjunctionWorkbench.designText())) as DesignFile;
    expect(edited.setpoints[0]?.tripTemperatureC).toBe(255);
    expect((await bandsOf(page))["0:worst-case:low"]).toBeCloseTo(libraryBands(validateDesign(edited))["0:worst-case:low"]!, 9);
    // A second field, so there are two steps to undo. Undo with the keyboard, redo with the button.
    await page.waitForTimeout(1600);
    const hysteresis = page.locator("#hj-f-comparator_hysteresisMillivolts");
    await hysteresis.fill("20");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    await page.keyboard.press("Control+z");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    expect(await page.locator("#hj-f-comparator_hysteresisMillivolts").inputValue()).toBe("10");
    expect(await page.locator("#hj-f-setpoints_0__tripTemperatureC").inputValue()).toBe("255");
    await page.keyboard.press("Control+z");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    expect(await page.evaluate(() => window.hotjunctionWorkbench.designText())).toBe(original);
    expect(await page.locator("#hj-undo").isDisabled()).toBe(true);
    await page.locator("#hj-redo").click();
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    expect(await page.locator("#hj-f-setpoints_0__tripTemperatureC").inputValue()).toBe("255");
    await page.close();
  });

  it("carries the design in the address: a link reproduces it exactly", async () => {
    const page = await openPage();
    await page.evaluate(() => window.hotjunctionWorkbench.loadChoice("example:ceramic-kiln-cutout"));
    await page.locator("#hj-f-reference_initialAccuracyFraction").fill("0.0025");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    const text = await page.evaluate(() => window.hotjunctionWorkbench.designText());
    await page.waitForFunction((t) => location.hash.startsWith("#design=") && t !== "", text);
    await page.waitForTimeout(400);
    const url = page.url();
    expect(url.startsWith(`${pageUrl}#design=z.`)).toBe(true);
    const copy = await openPage(url);
    expect(await copy.evaluate(() => window.hotjunctionWorkbench.designText())).toBe(text);
    expect(await bandsOf(copy)).toEqual(await bandsOf(page));
    await copy.close();
    await page.close();
  });

  it("saves a design file that passes validate, gives the CLI's numbers and opens again; the exports carry the caution, methods and seed", async () => {
    const page = await openPage();
    await page.evaluate(() => window.hotjunctionWorkbench.loadChoice("example:reflow-oven-trip"));
    await page.locator("#hj-f-resistors_toleranceFraction").fill("0.001");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    const [saved] = await Promise.all([page.waitForEvent("download"), page.locator("#hj-save").click()]);
    const designPath = join(scratch, "saved.json");
    await saved.saveAs(designPath);
    const validated = await run(["validate", designPath]);
    expect(validated.code, validated.stderr).toBe(0);
    const checked = await run(["check", designPath, "--json"]);
    const cli = JSON.parse(checked.stdout) as { setpoints: { bands: { method: string; lowC: number; highC: number }[] }[] };
    const shown = await bandsOf(page);
    cli.setpoints.forEach((s, i) => {
      for (const b of s.bands) {
        expect(shown[`${i}:${b.method}:low`]).toBeCloseTo(b.lowC, 9);
        expect(shown[`${i}:${b.method}:high`]).toBeCloseTo(b.highC, 9);
      }
    });

    // The saved file opens again through the file picker, as it was saved.
    const reopened = await openPage();
    await reopened.locator("#hj-file").setInputFiles(designPath);
    await expect.poll(() => reopened.evaluate(() => window.hotjunctionWorkbench.designText())).toBe(readFileSync(designPath, "utf8").trimEnd());
    await reopened.evaluate(() => window.hotjunctionWorkbench.idle());
    expect(await bandsOf(reopened)).toEqual(shown);
    await reopened.close();

    const [report] = await Promise.all([page.waitForEvent("download"), page.locator('.hj-export[data-export="html"]').click()]);
    const reportPath = join(scratch, "report.html");
    await report.saveAs(reportPath);
    const opened = await openReport(pathToFileURL(reportPath).href);
    expect(opened.text).toContain(CAUTION_TEXT);
    expect(opened.text).toMatch(/seed 260/);
    expect(opened.svgs).toBe(1);
    for (const kind of ["markdown", "csv", "parts"]) {
      const text = await page.evaluate((k) => window.hotjunctionWorkbench.exportText(k), kind);
      expect(text, kind).toContain(CAUTION_TEXT);
      expect(text, kind).toMatch(/seed 260/);
    }
    const parts = (await page.evaluate(() => window.hotjunctionWorkbench.exportText("parts"))) ?? "";
    // The parts list is the build sheet's (as check --parts-csv): the sized shunt's series resistor among them.
    expect(parts).toMatch(/\nshunt series,resistor,\d+,Ω,/);
    await page.close();
  });

  it("shows the build sheet from the report's buildSheet (every figure as check --json gives it) and exports the parts list check --parts-csv writes", async () => {
    const page = await openPage();
    for (const id of exampleIds) {
      await page.evaluate((v) => window.hotjunctionWorkbench.loadChoice(v), `example:${id}`);
      await page.evaluate(() => window.hotjunctionWorkbench.idle());
      const dir = mkdtempSync(join(scratch, `sheet-${id}-`));
      const checked = await run(["check", join(projectDir, "examples", `${id}.json`), "--json", "--report-only", "--parts-csv", join(dir, "parts.csv")]);
      expect(checked.code, checked.stderr).toBe(0);
      const sheet = (JSON.parse(checked.stdout) as { buildSheet: Record<string, unknown> }).buildSheet;
      expect(sheet, id).toBeDefined();
      // Every cell that names a build-sheet field shows that field's value (scaled where the name says ×1000, ×100).
      const cells = await page.evaluate(() => [...document.querySelectorAll<HTMLElement>("#hj-build [data-sheet]")].map((c) => [c.dataset["sheet"] ?? "", Number(c.dataset["value"])] as const));
      const fieldOf = (name: string): number => {
        const [path, scale] = name.split("×");
        const value = (path ?? "").split(".").reduce<unknown>((v, k) => (v as Record<string, unknown>)[k], sheet);
        return Number(value) * Number(scale ?? 1);
      };
      for (const [name, value] of cells) expect(value, `${id} ${name}`).toBe(fieldOf(name));
      const shownNames = new Set(cells.map(([n]) => n.replace(/\.\d+\./, ".#.")));
      const s = sheet as { setpoints: unknown[]; adcSetpoints: unknown[]; shuntSeriesResistor?: unknown; midRail?: unknown; parts: unknown[] };
      if (s.setpoints.length > 0) {
        for (const f of ["idealThresholdVolts", "realizedThresholdVolts", "thresholdLowVolts", "thresholdHighVolts", "dividerCurrentMilliamps", "nominalReleaseC", "releaseLowC", "releaseHighC", "releaseMarginToNormalC"]) {
          expect(shownNames.has(`setpoints.#.${f}`), `${id} ${f}`).toBe(true);
        }
        // Resistors by position, each with its standard value, as the build sheet names them.
        const firstAbove = (s.setpoints[0] as { resistorsAbove: { designator: string; ohms: number }[] }).resistorsAbove[0];
        expect(await page.locator("#hj-build-table tbody tr").first().textContent()).toContain(firstAbove?.designator);
      }
      if (s.adcSetpoints.length > 0) for (const f of ["signalVolts", "nominalCode", "thresholdCode", "codesPerC", "codeLow", "codeHigh"]) expect(shownNames.has(`adcSetpoints.#.${f}`), `${id} ${f}`).toBe(true);
      if (s.shuntSeriesResistor !== undefined) for (const f of ["shuntSeriesResistor.ohms", "shuntSeriesResistor.powerWatts×1000", "shuntSeriesResistor.ratingWatts"]) expect(shownNames.has(f), `${id} ${f}`).toBe(true);
      if (s.midRail !== undefined) expect(shownNames.has("midRail.nominalVolts"), id).toBe(true);
      expect(await page.locator("#hj-parts-table tbody tr").count(), id).toBe(s.parts.length);
      // The parts list export is check --parts-csv, with the methods and seed as a second comment line.
      const parts = (await page.evaluate(() => window.hotjunctionWorkbench.exportText("parts"))) ?? "";
      const lines = parts.split("\n");
      expect(lines[1], id).toMatch(/^# Methods: .* seed \d+/);
      expect([lines[0], ...lines.slice(2)].join("\n"), id).toBe(readFileSync(join(dir, "parts.csv"), "utf8"));
    }
    // The page's build sheet code reads the report: no page code recomputes a threshold or a resistor.
    const source = readFileSync(join(projectDir, "src", "workbench", "results.ts"), "utf8");
    expect(source).not.toMatch(/resistorsOhms|idealRatio|nearestStandardResistor/);
    await page.close();
  }, 300_000);

  it("shows the runaway response and the dynamic verdict as check and runaway give them, follows an edit, and exports them", async () => {
    const id = "ceramic-kiln-cutout";
    const path = join(projectDir, "examples", `${id}.json`);
    const design = JSON.parse(exampleText(id)) as { dynamics?: unknown };
    expect(design.dynamics).toBeDefined();
    const page = await openPage();
    await page.evaluate((v) => window.hotjunctionWorkbench.loadChoice(v), `example:${id}`);
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    const dir = mkdtempSync(join(scratch, "runaway-"));
    const runaway = await run(["runaway", path, "--json", "--report-only", "--svg", join(dir, "runaway.svg")]);
    expect(runaway.code, runaway.stderr).toBe(0);
    // runaway --json spreads the dynamic figures at the top level.
    const figures = { dynamics: JSON.parse(runaway.stdout) as { pass: boolean; setpoints: { cases: { peakTrueC: number; dynamicMarginC: number }[] }[] } };
    expect(figures.dynamics.setpoints.length).toBeGreaterThan(0);
    // The chart is the one runaway --svg writes, byte for byte (same code, same case).
    const svg = await page.evaluate(() => document.querySelector("#hj-dynamics .hj-svg")?.innerHTML ?? "");
    const cliSvg = readFileSync(join(dir, "runaway.svg"), "utf8");
    const normalise = (t: string): string => t.replace(/^<\?xml[^>]*>\s*/, "").trim();
    expect(await page.evaluate((t) => new DOMParser().parseFromString(t, "image/svg+xml").documentElement.outerHTML, normalise(cliSvg))).toBe(
      await page.evaluate((t) => new DOMParser().parseFromString(t, "image/svg+xml").documentElement.outerHTML, normalise(svg)),
    );
    const dyn = async (): Promise<Record<string, number>> =>
      page.evaluate(() => Object.fromEntries([...document.querySelectorAll<HTMLElement>("[data-dyn]")].map((c) => [c.dataset["dyn"] ?? "", Number(c.dataset["value"])])));
    const shown = await dyn();
    figures.dynamics.setpoints.forEach((s, i) =>
      s.cases.forEach((c, k) => {
        expect(shown[`${i}:${k}:peakTrueC`]).toBe(c.peakTrueC);
        expect(shown[`${i}:${k}:dynamicMarginC`]).toBe(c.dynamicMarginC);
      }),
    );
    // The verdict is check's, with the dynamics folded in.
    const checked = await run(["check", path, "--json", "--report-only"]);
    const report = JSON.parse(checked.stdout) as { pass: boolean; setpoints: { pass: boolean; reason: string }[] };
    expect(await page.locator("#hj-verdict").textContent()).toContain(report.pass ? "PASS" : "FAIL");
    for (const s of report.setpoints) expect(await page.locator("#hj-verdict").textContent()).toContain(s.reason);
    // The Markdown export is check --markdown (trip report with build sheet and runaway), then compare and faults.
    const markdown = (await page.evaluate(() => window.hotjunctionWorkbench.exportText("markdown"))) ?? "";
    const cliMarkdown = await run(["check", path, "--markdown", "--report-only"]);
    expect(markdown.startsWith(cliMarkdown.stdout), "markdown export starts with check --markdown").toBe(true);
    const csv = (await page.evaluate(() => window.hotjunctionWorkbench.exportText("csv"))) ?? "";
    // The CSV export is check --csv. Cell by cell: text exactly, numbers to 1e-12 relative, since Chromium's V8 and
    // Node's may round a Math function differently in the last bits (seen: a 1e-195 false-trip rate, 2 ulp apart).
    const cliCsv = (await run(["check", path, "--csv", "--report-only"])).stdout;
    const cellsOf = (t: string): string[][] => t.split("\n").map((l) => l.split(","));
    const [pageCells, cliCells] = [cellsOf(csv), cellsOf(cliCsv)];
    expect(pageCells.map((r) => r.length)).toEqual(cliCells.map((r) => r.length));
    pageCells.forEach((row, i) =>
      row.forEach((cell, j) => {
        const other = cliCells[i]?.[j] ?? "";
        const [x, y] = [Number(cell), Number(other)];
        if (cell !== "" && Number.isFinite(x) && Number.isFinite(y) && cell !== other) expect(Math.abs(x - y), `${i}:${j}`).toBeLessThanOrEqual(1e-12 * Math.abs(y));
        else expect(cell, `${i}:${j}`).toBe(other);
      }),
    );
    const html = (await page.evaluate(() => window.hotjunctionWorkbench.exportText("html"))) ?? "";
    const reportPath = join(dir, "report.html");
    writeFileSync(reportPath, html);
    const opened = await openReport(pathToFileURL(reportPath).href);
    expect(opened.svgs).toBe(2);
    expect(opened.text).toContain("Response time (runaway)");
    expect(opened.text).toContain(CAUTION_TEXT);
    // A slower probe: the peak follows, to the library's figure for the edited design.
    const field = page.locator("#hj-f-dynamics_sensor_probeTimeConstantSeconds");
    expect(await field.inputValue()).toBe("5");
    await field.fill("40");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    const edited = validateDesign(JSON.parse(await page.evaluate(() => window.hotjunctionWorkbench.designText())) as unknown);
    const expected = analyseDesign(edited, { bandsOnly: true }).report?.dynamics;
    const after = await dyn();
    expect(after["0:0:peakTrueC"]).toBe(expected?.setpoints[0]?.cases[0]?.peakTrueC);
    expect(after["0:0:peakTrueC"]).toBeGreaterThan(shown["0:0:peakTrueC"]!);
    await page.close();
  }, 300_000);

  it("shows every validation problem at once, each beside its field, as validate lists them", async () => {
    const page = await openPage();
    await page.evaluate(() => window.hotjunctionWorkbench.loadChoice("example:reflow-oven-trip"));
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    await page.locator("#hj-f-setpoints_0__tripTemperatureC").fill("abc");
    await page.locator("#hj-f-comparator_hysteresisMillivolts").fill("x1");
    await page.locator("#hj-f-resistors_toleranceFraction").fill("-0.01");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    const draft = await page.evaluate(() => window.hotjunctionWorkbench.designText());
    const parsed = safeParseDesign(draft, { fileName: "design" });
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    expect(parsed.error.problems.length).toBeGreaterThanOrEqual(3);
    // validate prints the same list (path, expected, found), one line each.
    const file = join(scratch, "three-problems.json");
    writeFileSync(file, draft);
    const validated = await run(["validate", file]);
    expect(validated.code).toBe(2);
    for (const p of parsed.error.problems) {
      expect(validated.stderr).toContain(`at ${p.path}: ${p.problem}`);
      const slot = page.locator(`#hj-f-${p.path.replace(/[^A-Za-z0-9_-]/g, "_")}-msg`);
      expect(await slot.isVisible(), p.path).toBe(true);
      expect(await slot.textContent(), p.path).toContain(p.problem);
      expect(await page.locator(`#hj-f-${p.path.replace(/[^A-Za-z0-9_-]/g, "_")}`).getAttribute("aria-invalid"), p.path).toBe("true");
    }
    expect(await page.locator(".hj-form .hj-problem:visible").count()).toBe(parsed.error.problems.length);
    expect(await page.locator("#hj-status").textContent()).toContain(`${parsed.error.problems.length} problems`);
    await page.close();
  });

  it("is used with the keyboard alone: natural focus order, shortcuts, results announced, verdicts readable without colour", async () => {
    const page = await openPage();
    // No positive tabindex: the focus order is the document order.
    expect(await page.locator("[tabindex]:not([tabindex='-1']):not([tabindex='0'])").count()).toBe(0);
    const order: string[] = [];
    await page.locator("body").focus();
    for (let i = 0; i < 14; i++) {
      await page.keyboard.press("Tab");
      order.push(await page.evaluate(() => document.activeElement?.id || document.activeElement?.className || document.activeElement?.tagName || ""));
    }
    expect(order.slice(0, 3)).toEqual(["hj-skip", "hj-start", "hj-start-load"]);
    // Undo and redo are disabled (so skipped) before the first edit; then the save and link buttons.
    expect(order.indexOf("hj-save"), order.join(" ")).toBeGreaterThan(order.indexOf("hj-start-load"));
    expect(order.indexOf("hj-copy-link"), order.join(" ")).toBe(order.indexOf("hj-save") + 1);
    // After the toolbar, focus goes on into the form's fields.
    expect(order.some((x) => x.startsWith("hj-f-"))).toBe(true);
    // Load an example with the keyboard: choose it, press Enter on Load; the result is announced in the live region.
    await page.locator("#hj-start").focus();
    await page.locator("#hj-start").selectOption("example:heated-enclosure-adc");
    await page.locator("#hj-start-load").focus();
    await page.keyboard.press("Enter");
    await page.evaluate(() => window.hotjunctionWorkbench.idle());
    expect(await page.locator("#hj-status[role=status][aria-live=polite]").textContent()).toMatch(/^Full results: (PASS|FAIL)\./);
    // Verdicts carry a mark and a word, not only a colour.
    for (const text of await page.locator(".hj-pass, .hj-fail").allTextContents()) expect(text).toMatch(/^(✓ PASS|✗ FAIL)$/);
    await page.close();
  });

  async function openReport(url: string): Promise<{ text: string; svgs: number }> {
    const page = await context.newPage();
    page.on("console", (m) => {
      if (m.type() === "error") problems.push(`report console error: ${m.text()}`);
    });
    await page.goto(url);
    const result = { text: (await page.locator("body").textContent()) ?? "", svgs: await page.locator("svg").count() };
    await page.close();
    return result;
  }

  it("is readable at 1280×800 and at 420 wide, with every control named, and made no request and logged no error", async () => {
    const page = await openPage();
    const unnamed = await page.evaluate(() =>
      [...document.querySelectorAll<HTMLElement>("input, select, textarea, button")]
        .filter((c) => !(c instanceof HTMLInputElement && c.type === "file") || true)
        .filter((c) => {
          const labelled = c.id !== "" && document.querySelector(`label[for="${c.id}"]`) !== null;
          return !labelled && (c.getAttribute("aria-label") ?? "") === "" && (c.textContent ?? "").trim() === "";
        })
        .map((c) => c.id || c.outerHTML.slice(0, 80)),
    );
    expect(unnamed).toEqual([]);
    expect(await page.locator('[aria-live="polite"]').count()).toBeGreaterThan(0);
    for (const [width, height] of [[1280, 800], [420, 800]] as const) {
      await page.setViewportSize({ width, height });
      const png = await page.screenshot({ path: join(scratch, `workbench-${width}.png`) });
      const { ink, total } = countInkPixels(png);
      expect(ink / total, `${width}px`).toBeGreaterThan(0.03);
      // Nothing wider than the window (no sideways scrolling of the page itself).
      expect(await page.evaluate(() => document.documentElement.scrollWidth), `${width}px`).toBeLessThanOrEqual(width);
    }
    await page.close();
    expect(problems).toEqual([]);
  });
});
