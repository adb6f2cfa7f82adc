/**
 * The results of an analysis as DOM: verdict, trip bands (with the CLI's chart), error sources by share, the
 * build sheet, the reference comparison and the fault review. The same nodes make the page's results panel and
 * the exported HTML report. Every figure is also an attribute (`data-value`) at full precision.
 * @module
 */
import { CAUTION_TEXT } from "../design/index.js";
import type { TripBand } from "../index.js";
import type { WorkbenchAnalysis } from "./analysis.js";

type Cell = string | number | Node;

function el<K extends keyof HTMLElementTagNameMap>(tag: K, attrs: Record<string, string> = {}, ...children: (string | Node)[]): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  for (const [k, v] of Object.entries(attrs)) node.setAttribute(k, v);
  node.append(...children);
  return node;
}

/** A number shown with `decimals`, carrying its full value. */
export function num(value: number | null | undefined, decimals: number, unit = ""): HTMLElement {
  if (value === null || value === undefined || !Number.isFinite(value)) return el("span", { class: "hj-num" }, "—");
  const text = value.toFixed(decimals).replace(/^-/, "−");
  return el("span", { class: "hj-num", "data-value": String(value) }, unit !== "" ? `${text} ${unit}` : text);
}

function table(caption: string, head: readonly string[], rows: readonly (readonly Cell[])[], id: string): HTMLTableElement {
  const t = el("table", { class: "hj-table", id });
  t.append(el("caption", {}, caption));
  const thead = el("thead");
  const hr = el("tr");
  for (const h of head) hr.append(el("th", { scope: "col" }, h));
  thead.append(hr);
  t.append(thead);
  const body = el("tbody");
  for (const row of rows) {
    const tr = el("tr");
    row.forEach((cell, i) => {
      const c = i === 0 ? el("th", { scope: "row" }) : el("td");
      c.append(typeof cell === "number" ? String(cell) : cell);
      tr.append(c);
    });
    body.append(tr);
  }
  t.append(body);
  return t;
}

function section(id: string, title: string, ...children: Node[]): HTMLElement {
  const s = el("section", { class: "hj-result", id, "aria-labelledby": `${id}-h` });
  s.append(el("h2", { id: `${id}-h` }, title), ...children);
  return s;
}

function verdict(pass: boolean): HTMLElement {
  return el("strong", { class: pass ? "hj-pass" : "hj-fail" }, pass ? "✓ PASS" : "✗ FAIL");
}

function methodName(method: TripBand["method"]): string {
  return method === "worst-case" ? "worst case" : method === "rss" ? "RSS" : "Monte Carlo";
}

function ohms(value: number): string {
  if (value >= 1e6) return `${+(value / 1e6).toPrecision(4)} MΩ`;
  if (value >= 1e3) return `${+(value / 1e3).toPrecision(4)} kΩ`;
  return `${+value.toPrecision(4)} Ω`;
}

/** The methods sentence (methods, coverage, trials, seed, acceptance). */
export function methodsSentence(a: WorkbenchAnalysis): string {
  const m = a.methods;
  return (
    `Methods: worst case; RSS (GUM, JCGM 100); Monte Carlo (JCGM 101). Coverage of RSS and Monte Carlo intervals: ${Math.round(m.coverage * 100)} %. ` +
    `Monte Carlo: ${m.trials ?? "default"} trials, seed ${m.seed ?? "default"}${a.monteCarloFinal ? "" : " (a quick first pass; the full run follows)"}. ` +
    `Pass/fail judged on the ${methodName(m.acceptanceMethod ?? "worst-case")} band.`
  );
}

/** The caution block. */
export function cautionBlock(): HTMLElement {
  return el("p", { class: "hj-caution", role: "note" }, el("strong", {}, "Caution: "), CAUTION_TEXT);
}

/** What a part of the analysis shows while the worker computes it. */
export type Pending = "comparison" | "faults";

/** Builds the result sections of an analysis. `pending` parts show a placeholder. */
export function resultSections(a: WorkbenchAnalysis, pending: readonly Pending[] = []): HTMLElement[] {
  const out: HTMLElement[] = [];
  const report = a.report;
  for (const p of a.problems) {
    out.push(el("p", { class: "hj-problem hj-analysis-problem", role: "alert" }, `✗ ${p.part === "trip" ? "Trip design" : p.part === "comparison" ? "Reference comparison" : "Fault review"}: ${p.message}`));
  }
  if (report !== undefined) reportSections(a, report, out);
  buildSheetSection(a, out);
  comparisonSection(a, pending, out);
  faultSection(a, pending, out);
  return out;
}

/** The verdict, trip-band and error-source sections of a trip report. */
function reportSections(a: WorkbenchAnalysis, report: NonNullable<WorkbenchAnalysis["report"]>, out: HTMLElement[]): void {
  const summary = el("div", { class: "hj-summary", id: "hj-summary" });
  summary.append(el("p", {}, "Design verdict: ", verdict(report.pass), ` (${report.setpoints.length} setpoint${report.setpoints.length === 1 ? "" : "s"}, judged on the ${methodName(a.methods.acceptanceMethod ?? "worst-case")} band)`));
  for (const s of report.setpoints) summary.append(el("p", { class: "hj-reason" }, `${s.name}: `, verdict(s.pass), ` — ${s.reason}`));
  out.push(section("hj-verdict", "Verdict", summary, el("p", { class: "hj-methods" }, methodsSentence(a))));

  const rows: Cell[][] = [];
  for (const [si, s] of report.setpoints.entries()) {
    for (const b of s.bands) {
      const low = num(b.lowC, 2);
      const high = num(b.highC, 2);
      low.dataset["band"] = `${si}:${b.method}:low`;
      high.dataset["band"] = `${si}:${b.method}:high`;
      const mcPending = b.method === "monte-carlo" && !a.monteCarloFinal;
      rows.push([
        `${s.name} — ${methodName(b.method)}${mcPending ? " (first pass)" : ""}`,
        low,
        high,
        num(b.highC - b.lowC, 2),
        num(b.standardUncertaintyC, 3),
        num(s.maxNormalOperatingC, 1),
        num(s.hazardLimitC, 1),
      ]);
    }
  }
  const bands = table("Trip bands by method, °C", ["setpoint — method", "low °C", "high °C", "width °C", "u °C", "normal limit °C", "hazard limit °C"], rows, "hj-bands-table");
  const margins = table(
    "Margins of the accepted band, °C",
    ["setpoint", "target °C", "nominal trip °C", "margin to normal °C", "margin to hazard °C", "verdict"],
    report.setpoints.map((s) => [s.name, num(s.tripTemperatureC, 1), num(s.nominalTripC, 2), num(s.marginToNormalC, 2), num(s.marginToHazardC, 2), verdict(s.pass)]),
    "hj-margins-table",
  );
  const chart = el("figure", { class: "hj-chart" });
  if (a.bandsSvg !== undefined) {
    const holder = el("div", { class: "hj-svg", role: "img", "aria-label": "Trip bands chart: each setpoint's bands by method against the normal and hazard limits (the same figures as the tables)" });
    holder.innerHTML = a.bandsSvg;
    chart.append(holder, el("figcaption", {}, "Trip bands against the normal and hazard limits (the chart of check --svg)."));
  }
  out.push(section("hj-bands", "Trip bands", chart, bands, margins));

  const sourceTables = report.setpoints.map((s, si) => {
    const total = s.errorSources.reduce((sum, e) => sum + e.worstCaseC, 0);
    const sorted = [...s.errorSources].sort((x, y) => y.worstCaseC - x.worstCaseC);
    return table(
      `Error sources of ${s.name}, by share of the worst-case band`,
      ["source", "what it is", "worst case ±°C", "share %", "u °C"],
      sorted.map((e) => [e.name, e.description, num(e.worstCaseC, 3), num(total > 0 ? (100 * e.worstCaseC) / total : 0, 1), num(e.standardUncertaintyC, 3)]),
      `hj-sources-${si}`,
    );
  });
  out.push(section("hj-sources", "Error sources", ...sourceTables));
}

/** The build-sheet section (comparator designs: thresholds, networks, reference; ADC designs: the report's details). */
function buildSheetSection(a: WorkbenchAnalysis, out: HTMLElement[]): void {
  const report = a.report;
  const trip = a.trip;
  if (trip !== undefined) {
    const rows = trip.setpoints.map((s) => {
      const net = trip.networks[s.networkIndex];
      const position = net?.topology === "ladder" ? `ladder tap ${s.tapIndex + 1}` : `divider ${s.networkIndex + 1}`;
      return [
        s.name,
        num(s.idealThresholdVolts, 4, "V"),
        num(s.realizedThresholdVolts, 4, "V"),
        `${position}: ${ohms(s.resistorsOhms[0])} above, ${ohms(s.resistorsOhms[1])} below`,
        num(net?.currentMilliamps, 3, "mA"),
        num(s.nominalTripC, 2),
        num(s.nominalReleaseC, 2),
        num(s.nominalReleaseC - s.maxNormalOperatingC, 2),
      ] as Cell[];
    });
    const sheet = table(
      "Thresholds and release per setpoint",
      ["setpoint", "ideal threshold", "realized threshold", "resistors", "divider current", "nominal trip °C", "nominal release °C", "release − normal °C"],
      rows,
      "hj-build-table",
    );
    const networks = table(
      "Threshold networks (from the reference to ground)",
      ["network", "topology", "resistors", "total", "current"],
      trip.networks.map((n, i) => [`network ${i + 1}`, n.topology, n.resistorsOhms.map((r, j) => `R${j + 1} ${ohms(r)}`).join(", "), ohms(n.totalOhms), num(n.currentMilliamps, 3, "mA")]),
      "hj-networks-table",
    );
    const ref = trip.reference;
    const element = ref.element as { seriesOhms?: number } | undefined;
    const refLines = el("ul", { class: "hj-list" });
    refLines.append(el("li", {}, `Reference: ${ref.name} (${ref.kind}), `, num(ref.nominalVolts, 3, "V"), ", ±", num(ref.toleranceFraction * 100, 3, "%"), " total."));
    if (element?.seriesOhms !== undefined) refLines.append(el("li", {}, "Shunt series resistor: ", el("span", { class: "hj-num", "data-value": String(element.seriesOhms) }, ohms(element.seriesOhms)), ...(ref.seriesResistorPowerWatts !== undefined ? [", dissipating up to ", num(ref.seriesResistorPowerWatts * 1000, 1, "mW")] : [])));
    if (ref.shuntCurrentMinMilliamps !== undefined) refLines.append(el("li", {}, "Shunt current in service: ", num(ref.shuntCurrentMinMilliamps, 3, "mA"), " to ", num(ref.shuntCurrentMaxMilliamps, 3, "mA")));
    for (const p of ref.problems) refLines.append(el("li", { class: "hj-problem" }, `✗ Reference problem: ${p}`));
    refLines.append(el("li", {}, "Mid-rail divider: ", num(trip.midRail.nominalVolts, 4, "V"), ", worst case ", num(trip.midRail.worstCaseLowVolts, 4, "V"), " to ", num(trip.midRail.worstCaseHighVolts, 4, "V")));
    out.push(section("hj-build", "Build sheet", sheet, networks, refLines));
  } else if (report !== undefined && a.kind === "adc") {
    out.push(section("hj-build", "Build sheet", el("ul", { class: "hj-list" }, ...report.details.map((d) => el("li", {}, d)))));
  }
}

/** The reference-comparison section, or its placeholder while the worker computes it. */
function comparisonSection(a: WorkbenchAnalysis, pending: readonly Pending[], out: HTMLElement[]): void {
  if (a.comparison !== undefined) {
    const c = a.comparison;
    const rows: Cell[][] = [];
    for (const o of c.options) {
      for (const s of o.setpoints) {
        rows.push([`${o.name} — ${s.name}`, o.cost === null ? "—" : String(o.cost), num(s.lowC, 2), num(s.highC, 2), num(s.extraWidthC, 2), num(s.marginToNormalC, 2), num(s.marginToHazardC, 2), el("span", {}, o.verdict === "adequate" ? "✓ adequate" : "✗ inadequate")]);
      }
    }
    out.push(
      section(
        "hj-comparison",
        "Reference comparison",
        table("Each reference option on its own standard resistors", ["option — setpoint", "cost", "low °C", "high °C", "extra width °C", "margin to normal °C", "margin to hazard °C", "verdict"], rows, "hj-comparison-table"),
        el("p", {}, `Recommended: ${c.recommended ?? "none of the options is adequate"}. ${c.summary}`),
      ),
    );
  } else if (pending.includes("comparison") && a.kind === "comparator") {
    out.push(section("hj-comparison", "Reference comparison", el("p", { class: "hj-pending" }, "Computing in the background…")));
  }
}

/** The fault-review section, or its placeholder while the worker computes it. */
function faultSection(a: WorkbenchAnalysis, pending: readonly Pending[], out: HTMLElement[]): void {
  if (a.faults !== undefined) {
    const f = a.faults;
    const counts = table(
      "Single faults by class",
      ["class", "count"],
      [
        ["dangerous, undetected", String(f.counts.dangerousUndetected)],
        ["dangerous, detected", String(f.counts.dangerousDetected)],
        ["safe, undetected", String(f.counts.safeUndetected)],
        ["safe, detected", String(f.counts.safeDetected)],
        ["no effect", String(f.counts.noEffect)],
        ["total", String(f.counts.total)],
      ],
      "hj-fault-counts",
    );
    const rows: Cell[][] = [];
    for (const r of f.reviews) {
      for (const row of r.rows) {
        if (row.category === "no-effect" && r.rows.length > 12) continue;
        rows.push([`${r.name}: ${row.faultId}`, row.description, row.effectText, row.safety, row.detectionText]);
      }
    }
    out.push(
      section(
        "hj-faults",
        "Fault review",
        counts,
        table("Faults that change the trip (no-effect faults omitted when the list is long)", ["fault", "what fails", "effect", "safety", "detection"], rows, "hj-fault-table"),
        el("p", { class: "hj-methods" }, f.scope),
      ),
    );
  } else if (pending.includes("faults")) {
    out.push(section("hj-faults", "Fault review", el("p", { class: "hj-pending" }, "Computing in the background…")));
  }
}
