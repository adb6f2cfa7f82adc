/**
 * Trip report renderers: terminal table, Markdown, CSV and JSON; and the adapter from `designTrip`'s result.
 * Every format carries the caution and the methods (with the Monte Carlo seed).
 * @module
 */
import type { TripDesignResult } from "../trip/types.js";
import { CAUTION_TEXT } from "./caution.js";
import {
  _cautionLine,
  _csv,
  _describeMethods,
  _fixed,
  _markdownTable,
  _methodShortName,
  _signed,
  _textTable,
} from "./formatting.js";
import type { ReportFormat, ReportMethodInfo, TripReport } from "./reportTypes.js";
import { _dynamicsCsv, _dynamicsMarkdownLines, _dynamicsTextLines } from "./runawayReport.js";

function formatOhms(ohms: number): string {
  if (ohms >= 1e6) return `${+(ohms / 1e6).toPrecision(4)} MΩ`;
  if (ohms >= 1e3) return `${+(ohms / 1e3).toPrecision(4)} kΩ`;
  return `${+ohms.toPrecision(4)} Ω`;
}

/**
 * The report data of a `designTrip` result.
 * @param result - the trip design result
 * @param methods - methods, coverage, trials and seed used
 * @returns the report data for {@link formatTripReport}
 * @example
 * ```ts
 * import { CAUTION_TEXT, tripReportFromResult } from "hotjunction/report";
 * const report = tripReportFromResult(
 *   {
 *     networks: [],
 *     reference: { name: "ideal", kind: "ideal", nominalVolts: 2.5, toleranceFraction: 0, problems: [] },
 *     midRail: { nominalVolts: 1.25, worstCaseLowVolts: 1.2375, worstCaseHighVolts: 1.2625, worstCaseFraction: 0.01, relativeStandardUncertainty: 0.004 },
 *     setpoints: [],
 *     acceptanceMethod: "worst-case",
 *     pass: true,
 *     notes: [],
 *     caution: CAUTION_TEXT,
 *   },
 *   { methods: ["worst-case"], coverage: 0.95 },
 * );
 * console.log(report.title); // "Trip design"
 * ```
 */
export function tripReportFromResult(result: TripDesignResult, methods: ReportMethodInfo): TripReport {
  const reference = result.reference;
  const details = [
    `Reference: ${reference.name} (${reference.kind}), ${_fixed(reference.nominalVolts, 3)} V, ±${_fixed(reference.toleranceFraction * 100, 3)} % total.`,
    ...(reference.shuntCurrentMinMilliamps !== undefined && reference.shuntCurrentMaxMilliamps !== undefined
      ? [`Shunt current in service: ${_fixed(reference.shuntCurrentMinMilliamps, 3)} to ${_fixed(reference.shuntCurrentMaxMilliamps, 3)} mA.`]
      : []),
    ...(reference.seriesResistorPowerWatts !== undefined
      ? [`Series resistor dissipation: up to ${_fixed(reference.seriesResistorPowerWatts * 1000, 1)} mW.`]
      : []),
    ...reference.problems.map((p) => `Reference problem: ${p}`),
    ...result.networks.map(
      (n, i) =>
        `Threshold network ${i + 1} (${n.topology}): ${n.resistorsOhms.map(formatOhms).join(" + ")} from the reference to ground, ${_fixed(n.currentMilliamps, 3)} mA.`,
    ),
    ...[
          `Mid-rail divider (two equal resistors of the same tolerance on this reference): ${_fixed(result.midRail.nominalVolts, 4)} V, ` +
            `worst case ${_fixed(result.midRail.worstCaseLowVolts, 4)} to ${_fixed(result.midRail.worstCaseHighVolts, 4)} V ` +
            `(±${_fixed(result.midRail.worstCaseFraction * 100, 3)} %), relative standard uncertainty ${_fixed(result.midRail.relativeStandardUncertainty * 100, 3)} %.`,
        ],
  ];
  return {
    title: "Trip design",
    ...(result.name !== undefined ? { designName: result.name } : {}),
    pass: result.pass,
    setpoints: result.setpoints.map((s) => ({
      name: s.name,
      tripTemperatureC: s.tripTemperatureC,
      nominalTripC: s.nominalTripC,
      bands: [s.worstCase, s.rss, s.monteCarlo].filter((b) => methods.methods.includes(b.method)),
      maxNormalOperatingC: s.maxNormalOperatingC,
      hazardLimitC: s.hazardLimitC,
      marginToNormalC: s.marginToNormalC,
      marginToHazardC: s.marginToHazardC,
      pass: s.pass,
      reason: s.reason,
      errorSources: s.errorSources,
    })),
    details,
    // The caution is printed once by the renderer; drop a copy the engine may add to its notes.
    notes: result.notes.filter((n) => !/do not certify/i.test(n)),
    methods: { ...methods, acceptanceMethod: result.acceptanceMethod },
  };
}

function bandText(low: number, high: number): string {
  return `${_fixed(low)} to ${_fixed(high)}`;
}

function setpointRows(report: TripReport): string[][] {
  const methods = report.setpoints[0]?.bands.map((b) => b.method) ?? [];
  const header = [
    "setpoint",
    "target °C",
    "nominal °C",
    ...methods.map((m) => `${_methodShortName(m)} °C`),
    "normal ≤ °C",
    "hazard < °C",
    "margin low °C",
    "margin high °C",
    "result",
  ];
  return [
    header,
    ...report.setpoints.map((s) => [
      s.name,
      _fixed(s.tripTemperatureC),
      _fixed(s.nominalTripC, 2),
      ...s.bands.map((b) => bandText(b.lowC, b.highC)),
      _fixed(s.maxNormalOperatingC),
      _fixed(s.hazardLimitC),
      _signed(s.marginToNormalC),
      _signed(s.marginToHazardC),
      s.pass ? "PASS" : "FAIL",
    ]),
  ];
}

function sourceRows(report: TripReport, limit: number): { name: string; rows: string[][] }[] {
  return report.setpoints.map((s) => ({
    name: s.name,
    rows: [
      ["error source", "worst-case swing ±°C", "standard uncertainty °C", "what it is"],
      ...s.errorSources.slice(0, limit).map((e) => [e.name, _fixed(e.worstCaseC, 2), _fixed(e.standardUncertaintyC, 2), e.description]),
    ],
  }));
}

function renderText(report: TripReport): string {
  const heading = `${report.title}${report.designName !== undefined ? `: ${report.designName}` : ""} — ${report.pass ? "PASS" : "FAIL"}`;
  const out = [heading, "=".repeat([...heading].length), "", ...report.details, "", _textTable(setpointRows(report)), ""];
  for (const s of report.setpoints) out.push(`${s.name}: ${s.reason}`);
  for (const block of sourceRows(report, 8)) {
    out.push("", `Largest error sources at "${block.name}":`, _textTable(block.rows));
  }
  if (report.dynamics !== undefined) out.push(..._dynamicsTextLines(report.dynamics));
  out.push("", _describeMethods(report.methods));
  for (const note of report.notes) out.push(`Note: ${note}`);
  out.push("", _cautionLine(), "");
  return out.join("\n");
}

function renderMarkdown(report: TripReport): string {
  const out = [
    `# ${report.title}${report.designName !== undefined ? `: ${report.designName}` : ""}`,
    "",
    `**Result: ${report.pass ? "PASS" : "FAIL"}**`,
    "",
    `> **Caution.** ${CAUTION_TEXT}`,
    "",
    ...report.details.map((d) => `- ${d}`),
    "",
    _markdownTable(setpointRows(report)),
    "",
    ...report.setpoints.map((s) => `- **${s.name}**: ${s.reason}`),
  ];
  for (const block of sourceRows(report, 8)) out.push("", `## Largest error sources at "${block.name}"`, "", _markdownTable(block.rows));
  if (report.dynamics !== undefined) out.push(..._dynamicsMarkdownLines(report.dynamics));
  out.push("", "## Method", "", _describeMethods(report.methods));
  if (report.notes.length > 0) out.push("", ...report.notes.map((n) => `- ${n}`));
  out.push("");
  return out.join("\n");
}

function renderCsv(report: TripReport): string {
  const rows: (string | number | boolean)[][] = [
    ["setpoint", "target_C", "nominal_trip_C", "method", "low_C", "high_C", "coverage", "standard_uncertainty_C", "trials", "seed",
      "max_normal_operating_C", "hazard_limit_C", "margin_to_normal_C", "margin_to_hazard_C", "pass"],
  ];
  for (const s of report.setpoints) {
    for (const b of s.bands) {
      rows.push([s.name, s.tripTemperatureC, s.nominalTripC, b.method, b.lowC, b.highC, b.coverage, b.standardUncertaintyC,
        b.trials ?? "", b.seed ?? "", s.maxNormalOperatingC, s.hazardLimitC, s.marginToNormalC, s.marginToHazardC, s.pass]);
    }
  }
  const dynamics = report.dynamics === undefined ? "" : `# dynamics: runaway response per setpoint and case (the verdict uses the dynamic peak)\n${_dynamicsCsv(report.dynamics)}`;
  return `# ${_cautionLine()}\n# ${_describeMethods(report.methods)}\n${_csv(rows)}${dynamics}`;
}

/**
 * Renders a trip report. Every format includes the caution and the methods with the seed.
 * @param report - report data (see {@link tripReportFromResult})
 * @param format - `"text"` (terminal table), `"markdown"`, `"csv"` (caution and method as leading `#` lines) or `"json"`
 * @returns the report text
 * @example
 * ```ts
 * import { formatTripReport } from "hotjunction/report";
 * const text = formatTripReport(
 *   { title: "Trip design", pass: true, setpoints: [], details: [], notes: [], methods: { methods: ["worst-case"], coverage: 0.95 } },
 *   "text",
 * );
 * console.log(text.includes("do not certify a safety function")); // true
 * ```
 */
export function formatTripReport(report: TripReport, format: ReportFormat): string {
  switch (format) {
    case "markdown":
      return renderMarkdown(report);
    case "csv":
      return renderCsv(report);
    case "json":
      return `${JSON.stringify({ report: "trip", caution: CAUTION_TEXT, method: report.methods, ...report }, null, 2)}\n`;
    default:
      return renderText(report);
  }
}

/** @deprecated use {@link formatTripReport} (the one `format…` family of renderers); kept for one minor version. */
export const renderTripReport = formatTripReport;
