/**
 * The results of an analysis as DOM: verdict, trip bands (with the CLI's chart), error sources by share, the
 * build sheet, the reference comparison and the fault review. The same nodes make the page's results panel and
 * the exported HTML report. Every figure is also an attribute (`data-value`) at full precision.
 * @module
 */
import { CAUTION_TEXT } from "../design/index.js";
import type { TripBand, TripBuildSheet } from "../index.js";
import type { TripReportDynamics } from "../report/index.js";
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

/** A resistance in engineering notation, carrying its value in ohms. */
function ohmsNum(value: number): HTMLElement {
  return el("span", { class: "hj-num", "data-value": String(value) }, ohms(value));
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
export type Pending = "comparison" | "faults" | "dynamics";

/** Builds the result sections of an analysis. `pending` parts show a placeholder. */
export function resultSections(a: WorkbenchAnalysis, pending: readonly Pending[] = []): HTMLElement[] {
  const out: HTMLElement[] = [];
  const report = a.report;
  for (const p of a.problems) {
    out.push(el("p", { class: "hj-problem hj-analysis-problem", role: "alert" }, `✗ ${p.part === "trip" ? "Trip design" : p.part === "comparison" ? "Reference comparison" : "Fault review"}: ${p.message}`));
  }
  if (report !== undefined) {
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

  const sheet = report?.buildSheet;
  if (sheet !== undefined) out.push(buildSheetSection(sheet, a));
  else if (report !== undefined) out.push(section("hj-build", "Build sheet", el("ul", { class: "hj-list" }, ...report.details.map((d) => el("li", {}, d)))));

  if (report?.dynamics !== undefined) out.push(dynamicsSection(report.dynamics, a.runawaySvg));
  else if (pending.includes("dynamics")) {
    out.push(section("hj-dynamics", "Response time (runaway)", el("p", { class: "hj-pending" }, "Running the runaway (heater stuck on)…; the verdict above is the static band's until it is done.")));
  }

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
  return out;
}

/** A list of resistors by designator (`top 8.2 kΩ + ladder 1 1 kΩ`), each value carried. */
function resistorCell(list: readonly { readonly designator: string; readonly ohms: number }[]): HTMLElement {
  const span = el("span", { class: "hj-resistors" });
  list.forEach((r, i) => span.append(...(i > 0 ? [" + "] : []), `${r.designator} `, ohmsNum(r.ohms)));
  return span;
}

/** `data-sheet` names the build-sheet field a cell shows (`setpoints.0.realizedThresholdVolts`), for tests and tools. */
function field<T extends HTMLElement>(node: T, name: string): T {
  node.dataset["sheet"] = name;
  return node;
}

/**
 * The build sheet, every figure taken from the report's `buildSheet` (the same object `check` prints and writes
 * as JSON): thresholds with their band, resistors by position, divider current, release and its band and margin;
 * ADC codes; the shunt series resistor with its power and rating; the mid-rail divider; the parts list.
 */
function buildSheetSection(sheet: TripBuildSheet, a: WorkbenchAnalysis): HTMLElement {
  const parts: HTMLElement[] = [];
  if (sheet.setpoints.length > 0) {
    // Deliberately alike: the ADC sheet's codes table below is built the same way (field-tagged cells per setpoint), its own columns.
    parts.push(
      table(
        "Thresholds, resistors and release per setpoint",
        ["setpoint", "ideal threshold V", "realized V", "threshold band V (worst case)", "above the tap", "below the tap", "divider mA", "nominal release °C", "release band °C (worst case)", "release margin to normal °C"],
        sheet.setpoints.map((s, i) => {
          const f = (name: string, node: HTMLElement): HTMLElement => field(node, `setpoints.${i}.${name}`);
          return [
            s.name,
            f("idealThresholdVolts", num(s.idealThresholdVolts, 5)),
            f("realizedThresholdVolts", num(s.realizedThresholdVolts, 5)),
            el("span", {}, f("thresholdLowVolts", num(s.thresholdLowVolts, 4)), " to ", f("thresholdHighVolts", num(s.thresholdHighVolts, 4))),
            resistorCell(s.resistorsAbove),
            resistorCell(s.resistorsBelow),
            f("dividerCurrentMilliamps", num(s.dividerCurrentMilliamps, 4)),
            f("nominalReleaseC", num(s.nominalReleaseC, 2)),
            el("span", {}, f("releaseLowC", num(s.releaseLowC, 2)), " to ", f("releaseHighC", num(s.releaseHighC, 2))),
            f("releaseMarginToNormalC", num(s.releaseMarginToNormalC, 2)),
          ] as Cell[];
        }),
        "hj-build-table",
      ),
    );
  }
  if (sheet.adcSetpoints.length > 0) {
    // Deliberately alike: the comparator sheet's thresholds table above is built the same way, its own columns.
    parts.push(
      table(
        "Firmware codes per setpoint",
        ["setpoint", "signal V", "nominal code", "trip at code ≥", "LSB/°C", "code band (accepted method)"],
        sheet.adcSetpoints.map((s, i) => {
          const f = (name: string, node: HTMLElement): HTMLElement => field(node, `adcSetpoints.${i}.${name}`);
          return [
            s.name,
            f("signalVolts", num(s.signalVolts, 5)),
            f("nominalCode", num(s.nominalCode, 2)),
            f("thresholdCode", num(s.thresholdCode, 0)),
            f("codesPerC", num(s.codesPerC, 3)),
            el("span", {}, f("codeLow", num(s.codeLow, 1)), " to ", f("codeHigh", num(s.codeHigh, 1))),
          ] as Cell[];
        }),
        "hj-adc-codes-table",
      ),
    );
  }
  if (sheet.networks.length > 0) {
    parts.push(
      table(
        "Threshold networks (from the reference to ground)",
        ["network", "topology", "resistors", "total", "current mA"],
        sheet.networks.map((n, i) => [`network ${i + 1}`, n.topology, resistorCell(n.resistors), ohmsNum(n.totalOhms), field(num(n.currentMilliamps, 4), `networks.${i}.currentMilliamps`)]),
        "hj-networks-table",
      ),
    );
  }
  const lines = el("ul", { class: "hj-list" });
  const r = sheet.shuntSeriesResistor;
  if (r !== undefined) {
    lines.append(
      el(
        "li",
        { id: "hj-shunt-resistor" },
        "Shunt series resistor: ",
        field(ohmsNum(r.ohms), "shuntSeriesResistor.ohms"),
        ` (${r.series}, ±${+(r.toleranceFraction * 100).toPrecision(4)} %), dissipates up to `,
        field(num(r.powerWatts * 1000, 1, "mW"), "shuntSeriesResistor.powerWatts×1000"),
        "; choose a rating of ",
        field(num(r.ratingWatts, 3, "W"), "shuntSeriesResistor.ratingWatts"),
        " or more.",
      ),
    );
  }
  const m = sheet.midRail;
  if (m !== undefined) {
    lines.append(
      el(
        "li",
        { id: "hj-mid-rail" },
        "Mid-rail divider: top ",
        field(ohmsNum(m.topOhms), "midRail.topOhms"),
        ", bottom ",
        field(ohmsNum(m.bottomOhms), "midRail.bottomOhms"),
        ": ",
        field(num(m.nominalVolts, 4, "V"), "midRail.nominalVolts"),
        " (worst case ",
        field(num(m.worstCaseLowVolts, 4), "midRail.worstCaseLowVolts"),
        " to ",
        field(num(m.worstCaseHighVolts, 4, "V"), "midRail.worstCaseHighVolts"),
        ").",
      ),
    );
  }
  const ref = a.trip?.reference;
  if (ref !== undefined) {
    if (ref.shuntCurrentMinMilliamps !== undefined) lines.append(el("li", {}, "Shunt current in service: ", num(ref.shuntCurrentMinMilliamps, 3, "mA"), " to ", num(ref.shuntCurrentMaxMilliamps, 3, "mA")));
    for (const p of ref.problems) lines.append(el("li", { class: "hj-problem" }, `✗ Reference problem: ${p}`));
  }
  if (lines.childNodes.length > 0) parts.push(lines);
  if (sheet.parts.length > 0) {
    parts.push(
      table(
        "Parts list (bill of materials)",
        ["designators", "part", "value", "tolerance", "tempco ppm/°C", "count"],
        sheet.parts.map((p, i) => [
          p.designators,
          p.part,
          typeof p.value === "number" ? (p.unit === "Ω" ? field(ohmsNum(p.value), `parts.${i}.value`) : field(num(p.value, 4, p.unit), `parts.${i}.value`)) : p.value,
          p.toleranceUnit === "°C" ? el("span", {}, "±", field(num(p.tolerance, 2, "°C"), `parts.${i}.tolerance`)) : el("span", {}, "±", field(num(p.tolerance * 100, 3, "%"), `parts.${i}.tolerance×100`)),
          field(num(p.tempcoPpmPerC, 0), `parts.${i}.tempcoPpmPerC`),
          field(num(p.count, 0), `parts.${i}.count`),
        ]),
        "hj-parts-table",
      ),
    );
  }
  return section("hj-build", "Build sheet", ...parts);
}

function seconds(value: number | null): HTMLElement {
  return value === null ? el("span", { class: "hj-num" }, "never") : num(value, 1, "s");
}

/**
 * The response time through a runaway (the `runaway` command's figures, from `report.dynamics`) and its chart,
 * drawn by the code that writes `runaway --svg`.
 */
function dynamicsSection(d: TripReportDynamics, svg: string | undefined): HTMLElement {
  const rows: Cell[][] = [];
  d.setpoints.forEach((s, si) => {
    s.cases.forEach((c, ci) => {
      const peak = num(c.peakTrueC, 1);
      peak.dataset["dyn"] = `${si}:${ci}:peakTrueC`;
      const margin = num(c.dynamicMarginC, 1);
      margin.dataset["dyn"] = `${si}:${ci}:dynamicMarginC`;
      rows.push([`${s.name} — ${c.name}`, num(c.tripTemperatureC, 1), c.tripped ? seconds(c.responseTimeSeconds) : el("span", {}, "never trips"), seconds(c.heatOffSeconds), peak, num(c.overshootC, 1), margin, verdict(!c.exceedsHazard && c.tripped)]);
    });
  });
  const cases = table(
    "Runaway (heater stuck on) per setpoint and unit",
    ["setpoint — unit", "trips at °C", "response time", "heat off at", "peak °C", "overshoot °C", "margin to hazard °C", "peak below hazard"],
    rows,
    "hj-dynamics-table",
  );
  const summary = el("ul", { class: "hj-list" });
  d.setpoints.forEach((s) => {
    summary.append(el("li", {}, `${s.name}: `, verdict(s.pass), ` — ${s.reason}`, ...(s.timeFromNormalToHazardSeconds !== null ? [" Uncontrolled from normal to hazard: ", seconds(s.timeFromNormalToHazardSeconds), "."] : [])));
    if (s.noise !== null) {
      const n = s.noise;
      summary.append(el("li", {}, `${s.name} noise: hysteresis `, n.designHysteresisC === null ? "—" : num(n.designHysteresisC, 2, "°C"), n.hysteresisSufficient === null ? "" : n.hysteresisSufficient ? " (sufficient)" : " (✗ not sufficient)"));
    }
  });
  const chart = el("figure", { class: "hj-chart" });
  if (svg !== undefined) {
    const holder = el("div", { class: "hj-svg", role: "img", "aria-label": "Runaway chart: true and indicated temperature against time for the case with the smallest margin to the hazard limit (the same figures as the table)" });
    holder.innerHTML = svg;
    chart.append(holder, el("figcaption", {}, "True and indicated temperature through the runaway with the smallest margin (the chart of runaway --svg)."));
  }
  return section(
    "hj-dynamics",
    "Response time (runaway)",
    el("p", {}, "Dynamic verdict: ", verdict(d.pass), " — judged on the runaway peak against the hazard limit; the static band decides the side of normal operation."),
    chart,
    cases,
    summary,
    el("ul", { class: "hj-list hj-methods" }, ...d.assumptions.map((x) => el("li", {}, x))),
  );
}
