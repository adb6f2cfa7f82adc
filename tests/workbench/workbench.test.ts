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
      expect(await page.locator(".hj-svg svg").count()).toBe(1);
      if (design.comparator !== undefined) {
        expect(await page.locator("#hj-build-table").count()).toBe(1);
        expect(await page.locator("#hj-comparison-table").count()).toBe(1);
      }
      // Speed: the first setpoint's trip temperature 1 °C lower, to an updated band; beside a plain recomputation
      // (parse and the full band analysis at the design's trials) of the same design in the same page.
      const trip = design.setpoints[0]?.tripTemperatureC ?? 0;
      const firstEditMs = await timedEdit(page, "hj-f-setpoints_0__tripTemperatureC", String(trip - 1));
      await page.evaluate(() => window.hotjunctionWorkbench.idle());
      const editMs = await timedEdit(page, "hj-f-setpoints_0__tripTemperatureC", String(trip - 2));
      await page.evaluate(() => window.hotjunctionWorkbench.idle());
      const plainMs = await page.evaluate(() => window.hotjunctionWorkbench.plainRecompute(2));
      ratios.push(`${id}: edit to band ${editMs.toFixed(0)} ms (first edit ${firstEditMs.toFixed(0)} ms), plain recomputation ${plainMs.toFixed(0)} ms, ratio ${(editMs / plainMs).toFixed(2)}`);
      expect(editMs).toBeGreaterThan(0);
    }
    console.log(`workbench speed (trials as in each example):\n  ${ratios.join("\n  ")}`);
    await page.close();
  });

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
    expect(parts).toMatch(/shunt series resistor,\d+/);
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
