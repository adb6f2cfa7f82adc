/**
 * The workbench page: a design editor generated from the design file's schema, results that follow every edit
 * (a quick pass on the page, the full Monte Carlo run in a web worker made from this same script), undo and
 * redo, the design in the address fragment, open and save, and the exports. The same script runs as the worker.
 * @module
 */
import { designJsonSchema, safeParseDesign, tripDesignFromDesign, CAUTION_TEXT, type DesignFile } from "../design/index.js";
import { designTrip, evaluateChain } from "../index.js";
import { measurementChainFromDesign } from "../design/index.js";
import { analyseDesign, settingsOfDesign, validationProblems, withDynamics, type WorkbenchAnalysis } from "./analysis.js";
import { csvExport, htmlExport, markdownExport, partsListCsv } from "./exports.js";
import { decodeFragment, encodeFragment } from "./fragment.js";
import { cautionBlock, resultSections } from "./results.js";
import { DesignForm, formatPath, type DraftPath, type SchemaNode } from "./schemaForm.js";
import { starterTemplates } from "./templates.js";

/** Messages between the page and its worker. */
type ToWorker = { readonly id: number; readonly designText: string };
type FromWorker =
  | { readonly id: number; readonly type: "progress"; readonly fraction: number }
  | { readonly id: number; readonly type: "result"; readonly analysis: WorkbenchAnalysis }
  | { readonly id: number; readonly type: "error"; readonly message: string };

/** Trials of the quick pass on the page (the band edges of worst case and RSS do not depend on them). */
const quickTrials = 200;
/** Pause after a keystroke before the page recomputes, ms. */
const debounceMs = 40;

function workerMain(scope: { postMessage(m: FromWorker): void; onmessage: ((e: MessageEvent<ToWorker>) => void) | null }): void {
  scope.onmessage = (event) => {
    const { id, designText } = event.data;
    try {
      const parsed = safeParseDesign(designText, { fileName: "design" });
      if (!parsed.success) throw parsed.error;
      let last = 0;
      const analysis = analyseDesign(parsed.design, {
        onProgress: (fraction) => {
          if (fraction - last >= 0.02 || fraction === 1) {
            last = fraction;
            scope.postMessage({ id, type: "progress", fraction });
          }
        },
      });
      scope.postMessage({ id, type: "result", analysis });
    } catch (error) {
      scope.postMessage({ id, type: "error", message: error instanceof Error ? error.message : String(error) });
    }
  };
}

interface Example {
  readonly id: string;
  readonly title: string;
  readonly text: string;
}

function byId<T extends HTMLElement>(id: string): T {
  const node = document.getElementById(id);
  if (node === null) throw new Error(`workbench page: element #${id} is missing`);
  return node as T;
}

function download(name: string, type: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const a = document.createElement("a");
  a.href = url;
  a.download = name;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

function fileStem(design: unknown): string {
  const name = typeof (design as { name?: unknown })?.name === "string" ? ((design as { name: string }).name) : "design";
  return name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "").slice(0, 60) || "design";
}

function setAt(root: unknown, path: DraftPath, value: unknown): unknown {
  if (path.length === 0) return value;
  const [head, ...rest] = path as [string | number, ...(string | number)[]];
  const container: Record<string | number, unknown> | unknown[] =
    typeof head === "number" ? (Array.isArray(root) ? [...root] : []) : root !== null && typeof root === "object" && !Array.isArray(root) ? { ...(root as Record<string, unknown>) } : {};
  const next = setAt((container as Record<string | number, unknown>)[head], rest, value);
  if (next === undefined && !Array.isArray(container)) delete (container as Record<string, unknown>)[head as string];
  else (container as Record<string | number, unknown>)[head] = next;
  return container;
}

class Workbench {
  private draft: unknown = {};
  private history: string[] = [];
  private historyIndex = -1;
  private lastEditKey = "";
  private lastEditTime = 0;
  private form: DesignForm;
  private analysisTimer: ReturnType<typeof setTimeout> | undefined;
  private fragmentTimer: ReturnType<typeof setTimeout> | undefined;
  private worker: Worker | undefined;
  private generation = 0;
  private current: { analysis: WorkbenchAnalysis; design: DesignFile; text: string } | undefined;
  private idleWaiters: (() => void)[] = [];
  private busy = false;
  private workerUrl: string | undefined;
  readonly examples: readonly Example[];

  constructor() {
    const examplesNode = document.getElementById("hj-examples");
    this.examples = examplesNode !== null ? (JSON.parse(examplesNode.textContent ?? "[]") as Example[]) : [];
    this.form = new DesignForm(byId("hj-form"), designJsonSchema() as SchemaNode, { draft: () => this.draft, set: (p, v, s) => this.set(p, v, s) }, byId("hj-form-top-messages"));
    byId("hj-caution").replaceChildren(...cautionBlock().childNodes);
    this.wireToolbar();
  }

  // ---- state ----------------------------------------------------------------------------------------------

  private set(path: DraftPath, value: unknown, structural: boolean): void {
    this.draft = setAt(this.draft, path, value);
    const key = formatPath(path);
    const now = Date.now();
    const coalesce = !structural && key === this.lastEditKey && now - this.lastEditTime < 1500;
    this.lastEditKey = structural ? "" : key;
    this.lastEditTime = now;
    this.record(coalesce);
    if (structural) this.form.render();
    this.scheduleAnalysis();
  }

  private record(replaceTop: boolean): void {
    const text = JSON.stringify(this.draft, null, 2);
    if (this.history[this.historyIndex] === text) return;
    if (replaceTop && this.historyIndex > 0) {
      this.history[this.historyIndex] = text;
    } else {
      this.history = this.history.slice(0, this.historyIndex + 1);
      this.history.push(text);
      this.historyIndex = this.history.length - 1;
      if (this.history.length > 500) {
        this.history.shift();
        this.historyIndex--;
      }
    }
    this.updateUndoButtons();
  }

  private updateUndoButtons(): void {
    byId<HTMLButtonElement>("hj-undo").disabled = this.historyIndex <= 0;
    byId<HTMLButtonElement>("hj-redo").disabled = this.historyIndex >= this.history.length - 1;
  }

  undo(): void {
    if (this.historyIndex <= 0) return;
    this.historyIndex--;
    this.restore("Undone");
  }

  redo(): void {
    if (this.historyIndex >= this.history.length - 1) return;
    this.historyIndex++;
    this.restore("Redone");
  }

  private restore(what: string): void {
    this.draft = JSON.parse(this.history[this.historyIndex] ?? "{}") as unknown;
    this.lastEditKey = "";
    this.form.render();
    this.updateUndoButtons();
    this.announce(`${what}.`);
    this.scheduleAnalysis(0);
  }

  /** Loads a design's text (from a file, an example, a template or the address) as a new starting point. */
  loadText(text: string, source: string): void {
    let value: unknown;
    try {
      value = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text) as unknown;
    } catch (error) {
      const parsed = safeParseDesign(text, { fileName: source });
      this.announce(parsed.success ? `${source} could not be read.` : parsed.error.message);
      byId("hj-form-top-messages").hidden = false;
      byId("hj-form-top-messages").textContent = `✗ ${parsed.success ? String(error) : parsed.error.message}`;
      return;
    }
    this.draft = value;
    this.history = [];
    this.historyIndex = -1;
    this.record(false);
    this.form.render();
    this.announce(`Loaded ${source}.`);
    this.scheduleAnalysis(0);
  }

  designText(): string {
    return JSON.stringify(this.draft, null, 2);
  }

  // ---- analysis -------------------------------------------------------------------------------------------

  private scheduleAnalysis(delay = debounceMs): void {
    if (this.analysisTimer !== undefined) clearTimeout(this.analysisTimer);
    this.busy = true;
    this.analysisTimer = setTimeout(() => this.analyse(), delay);
    if (this.fragmentTimer !== undefined) clearTimeout(this.fragmentTimer);
    this.fragmentTimer = setTimeout(() => void this.writeFragment(), 250);
  }

  private async writeFragment(): Promise<void> {
    const fragment = await encodeFragment(JSON.stringify(this.draft));
    history.replaceState(null, "", `#${fragment}`);
  }

  private stopWorker(): void {
    this.worker?.terminate();
    this.worker = undefined;
  }

  private analyse(): void {
    this.analysisTimer = undefined;
    const id = ++this.generation;
    this.stopWorker();
    const text = this.designText();
    const parsed = safeParseDesign(text, { fileName: "design" });
    const results = byId("hj-results-body");
    if (!parsed.success) {
      const error = parsed.error;
      // Every problem `validate` lists (path, expected, found), each beside its own field.
      const all = error.problems.map((p) => ({ path: p.path, message: p.problem }));
      this.form.showProblems(all);
      this.current = undefined;
      const note = document.createElement("p");
      note.className = "hj-pending";
      note.id = "hj-invalid-note";
      const where = (p: { path: string }): string => (p.path === "" ? "the file" : p.path);
      note.textContent = `The design is not valid yet (${all.length === 1 ? where(all[0] ?? error) : `${all.length} problems: ${all.map(where).join(", ")}`}): results return when it is.`;
      results.replaceChildren(note);
      this.setProgress(undefined);
      this.announce(all.length === 1 ? `Problem at ${where(error)}: ${all[0]?.message ?? error.problem}` : `${all.length} problems: ${all.map((p) => `at ${where(p)}: ${p.message}`).join("; ")}`);
      this.settle();
      return;
    }
    const design = parsed.design;
    // What `validate` checks beyond the format (failure-data fault ids against the catalogue), also beside the fields.
    this.form.showProblems(validationProblems(design));
    const trials = settingsOfDesign(design).trials;
    // The first answer: every band by worst case and RSS, Monte Carlo on a few trials (it refines in the worker).
    const quick = analyseDesign(design, { trials: Math.min(quickTrials, trials), bandsOnly: true, skipDynamics: true });
    this.current = { analysis: quick, design, text };
    const hasDynamics = design.dynamics !== undefined;
    this.show(quick, ["comparison", "faults", ...(hasDynamics ? (["dynamics"] as const) : [])]);
    this.announceResult(quick, false);
    // The full run after the first answer (started before it, the worker took the CPU the first answer needs).
    this.startWorker(id, text);
    // The runaway next, on the page (it needs only the worst-case band and the nominal trip, final already).
    if (hasDynamics) {
      setTimeout(() => {
        if (id !== this.generation || this.current?.analysis !== quick) return;
        const folded = withDynamics(design, quick);
        this.current = { ...this.current, analysis: folded };
        this.show(folded, ["comparison", "faults"]);
        this.announceResult(folded, false);
      }, 0);
    }
  }

  private startWorker(id: number, text: string): void {
    const script = document.getElementById("hj-script");
    let worker: Worker;
    try {
      if (this.workerUrl === undefined) this.workerUrl = URL.createObjectURL(new Blob([script?.textContent ?? ""], { type: "text/javascript" }));
      worker = new Worker(this.workerUrl);
    } catch (error) {
      this.announce(`Monte Carlo could not start in the background (${String(error)}); running it here.`);
      setTimeout(() => {
        const parsed = safeParseDesign(text, { fileName: "design" });
        if (parsed.success && id === this.generation) this.finish(id, analyseDesign(parsed.design));
      }, 0);
      return;
    }
    this.worker = worker;
    this.setProgress(0);
    worker.onmessage = (event: MessageEvent<FromWorker>) => {
      const m = event.data;
      if (m.id !== this.generation) return;
      if (m.type === "progress") this.setProgress(m.fraction);
      else if (m.type === "result") this.finish(id, m.analysis);
      else {
        this.setProgress(undefined);
        this.announce(`The full run failed: ${m.message}`);
        this.settle();
      }
    };
    worker.onerror = (event) => {
      event.preventDefault();
      if (id !== this.generation) return;
      this.setProgress(undefined);
      this.announce(`The background run stopped: ${event.message}`);
      this.settle();
    };
    worker.postMessage({ id, designText: text } satisfies ToWorker);
  }

  private finish(id: number, analysis: WorkbenchAnalysis): void {
    if (id !== this.generation || this.current === undefined) return;
    this.stopWorker();
    this.current = { ...this.current, analysis };
    this.show(analysis, []);
    this.setProgress(undefined);
    this.announceResult(analysis, true);
    this.settle();
  }

  private settle(): void {
    this.busy = false;
    const waiters = this.idleWaiters;
    this.idleWaiters = [];
    for (const w of waiters) w();
  }

  /** Resolves when the latest edit's full results are shown (or the design is invalid). */
  idle(): Promise<void> {
    if (!this.busy) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  private show(analysis: WorkbenchAnalysis, pending: readonly ("comparison" | "faults" | "dynamics")[]): void {
    byId("hj-results-body").replaceChildren(...resultSections(analysis, pending));
    for (const b of document.querySelectorAll<HTMLButtonElement>(".hj-export")) b.disabled = false;
  }

  private setProgress(fraction: number | undefined): void {
    const bar = byId<HTMLProgressElement>("hj-progress");
    const row = byId("hj-progress-row");
    if (fraction === undefined) {
      row.hidden = true;
      return;
    }
    row.hidden = false;
    bar.value = fraction;
    byId("hj-progress-text").textContent = `${Math.round(fraction * 100)} %`;
  }

  private announce(text: string): void {
    byId("hj-status").textContent = text;
  }

  private announceResult(a: WorkbenchAnalysis, final: boolean): void {
    const r = a.report;
    if (r === undefined) {
      this.announce(a.problems.map((p) => p.message).join(" ") || "No results.");
      return;
    }
    const accepted = a.methods.acceptanceMethod ?? "worst-case";
    const parts = r.setpoints.map((s) => {
      const band = s.bands.find((b) => b.method === accepted) ?? s.bands[0];
      return `${s.name} ${band !== undefined ? `${band.lowC.toFixed(1)} to ${band.highC.toFixed(1)} °C` : ""} ${s.pass ? "pass" : "fail"}`;
    });
    const dynamic = r.dynamics !== undefined ? ` Runaway: ${r.dynamics.setpoints.map((s) => `${s.name} peak ${s.highestPeakTrueC.toFixed(1)} °C, ${s.pass ? "pass" : "fail"}`).join("; ")}.` : "";
    this.announce(`${final ? "Full results" : "Results updated"}: ${r.pass ? "PASS" : "FAIL"}. ${parts.join("; ")}.${dynamic}${final ? " Monte Carlo done." : " Monte Carlo running."}`);
  }

  // ---- exports --------------------------------------------------------------------------------------------

  exportText(kind: "html" | "markdown" | "csv" | "parts" | "design"): string | undefined {
    if (kind === "design") return `${this.designText()}\n`;
    const c = this.current;
    if (c === undefined) return undefined;
    const design = c.design as unknown as Record<string, unknown>;
    switch (kind) {
      case "html":
        return htmlExport(c.analysis, design, c.text);
      case "markdown":
        return markdownExport(c.analysis, c.design.name);
      case "csv":
        return csvExport(c.analysis);
      default:
        return partsListCsv(c.analysis);
    }
  }

  private exportFile(kind: "html" | "markdown" | "csv" | "parts" | "design"): void {
    const text = this.exportText(kind);
    if (text === undefined) {
      this.announce("Nothing to export until the design is valid.");
      return;
    }
    const stem = fileStem(this.draft);
    const [name, type] =
      kind === "html" ? [`${stem}-report.html`, "text/html"] : kind === "markdown" ? [`${stem}-report.md`, "text/markdown"] : kind === "csv" ? [`${stem}-bands.csv`, "text/csv"] : kind === "parts" ? [`${stem}-parts.csv`, "text/csv"] : [`${stem}.json`, "application/json"];
    download(name, type, text);
    this.announce(`Saved ${name}.`);
  }

  /**
   * The plain recomputation the speed figure is compared with: parse the text and run the library's full analysis
   * of the bands (design's trials), as a page without a quick pass or worker would on every edit. ms per run.
   */
  plainRecompute(iterations: number): number {
    const text = this.designText();
    const start = performance.now();
    for (let i = 0; i < iterations; i++) {
      const parsed = safeParseDesign(text, { fileName: "design" });
      if (!parsed.success) throw parsed.error;
      const d = parsed.design;
      const s = settingsOfDesign(d);
      if (d.comparator !== undefined) designTrip(tripDesignFromDesign(d), { acceptanceMethod: s.acceptanceMethod, monteCarloTrials: s.trials, seed: s.seed });
      else {
        const chain = measurementChainFromDesign(d);
        for (const sp of d.setpoints) evaluateChain(chain, sp.tripTemperatureC, { methods: ["worst-case", "rss", "monte-carlo"], monteCarloTrials: s.trials, seed: s.seed });
      }
    }
    return (performance.now() - start) / iterations;
  }

  // ---- toolbar --------------------------------------------------------------------------------------------

  private wireToolbar(): void {
    const start = byId<HTMLSelectElement>("hj-start");
    for (const e of this.examples) start.append(new Option(`Example: ${e.title}`, `example:${e.id}`));
    for (const t of starterTemplates) start.append(new Option(t.title, `template:${t.id}`));
    byId("hj-start-load").addEventListener("click", () => this.loadChoice(start.value));
    const file = byId<HTMLInputElement>("hj-file");
    file.addEventListener("change", () => {
      const chosen = file.files?.[0];
      if (chosen !== undefined) void chosen.text().then((t) => this.loadText(t, chosen.name));
      file.value = "";
    });
    document.addEventListener("dragover", (event) => {
      event.preventDefault();
      document.body.classList.add("hj-dropping");
    });
    document.addEventListener("dragleave", () => document.body.classList.remove("hj-dropping"));
    document.addEventListener("drop", (event) => {
      event.preventDefault();
      document.body.classList.remove("hj-dropping");
      const dropped = event.dataTransfer?.files?.[0];
      if (dropped !== undefined) void dropped.text().then((t) => this.loadText(t, dropped.name));
    });
    byId("hj-undo").addEventListener("click", () => this.undo());
    byId("hj-redo").addEventListener("click", () => this.redo());
    byId("hj-save").addEventListener("click", () => this.exportFile("design"));
    byId("hj-copy-link").addEventListener("click", () => void this.copyLink());
    for (const button of document.querySelectorAll<HTMLButtonElement>(".hj-export")) {
      button.addEventListener("click", () => this.exportFile(button.dataset["export"] as "html" | "markdown" | "csv" | "parts"));
    }
    document.addEventListener("keydown", (event) => {
      if (!(event.ctrlKey || event.metaKey) || event.altKey) return;
      const key = event.key.toLowerCase();
      if (key === "z" && !event.shiftKey) {
        event.preventDefault();
        this.undo();
      } else if ((key === "z" && event.shiftKey) || key === "y") {
        event.preventDefault();
        this.redo();
      }
    });
    window.addEventListener("hashchange", () => void this.loadFromFragment());
  }

  loadChoice(value: string): void {
    const [kind, id] = value.split(":");
    if (kind === "example") {
      const e = this.examples.find((x) => x.id === id);
      if (e !== undefined) this.loadText(e.text, `example ${e.title}`);
    } else if (kind === "template") {
      const t = starterTemplates.find((x) => x.id === id);
      if (t !== undefined) this.loadText(JSON.stringify(t.design, null, 2), t.title);
    }
  }

  private async copyLink(): Promise<void> {
    await this.writeFragment();
    const link = byId<HTMLInputElement>("hj-link");
    link.value = location.href;
    byId("hj-link-row").hidden = false;
    link.select();
    try {
      await navigator.clipboard.writeText(location.href);
      this.announce("Link copied: it reproduces this design exactly.");
    } catch {
      this.announce("The link is shown below the toolbar, selected: copy it with Ctrl+C.");
    }
  }

  /** Loads the design in the address, if any. @returns whether one was loaded */
  async loadFromFragment(): Promise<boolean> {
    try {
      const text = await decodeFragment(location.hash);
      if (text === undefined) return false;
      if (text === JSON.stringify(this.draft)) return true;
      this.loadText(text, "the link");
      return true;
    } catch (error) {
      this.announce(`The design in the address could not be read (${error instanceof Error ? error.message : String(error)}).`);
      return false;
    }
  }
}

async function pageMain(): Promise<void> {
  const bench = new Workbench();
  const api = {
    designText: () => bench.designText(),
    loadText: (text: string) => bench.loadText(text, "text"),
    loadChoice: (value: string) => bench.loadChoice(value),
    idle: () => bench.idle(),
    exportText: (kind: "html" | "markdown" | "csv" | "parts" | "design") => bench.exportText(kind),
    plainRecompute: (iterations: number) => bench.plainRecompute(iterations),
    caution: CAUTION_TEXT,
    examples: bench.examples.map((e) => e.id),
  };
  (window as unknown as { hotjunctionWorkbench: typeof api }).hotjunctionWorkbench = api;
  if (!(await bench.loadFromFragment())) {
    const initial = document.getElementById("hj-initial-design");
    const first = bench.examples[0];
    if (initial !== null && (initial.textContent ?? "").trim() !== "") bench.loadText(initial.textContent ?? "", initial.dataset["name"] ?? "the design");
    else if (first !== undefined) bench.loadText(first.text, `example ${first.title}`);
  }
  document.documentElement.dataset["ready"] = "true";
}

if (typeof document === "undefined") {
  workerMain(self as unknown as Parameters<typeof workerMain>[0]);
} else {
  void pageMain();
}
