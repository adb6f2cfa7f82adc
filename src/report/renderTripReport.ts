/**
 * Trip report renderers: terminal table, Markdown, CSV and JSON; and the adapter from `designTrip`'s result.
 * Every format carries the caution and the methods (with the Monte Carlo seed).
 * @module
 */
import type { TripDesignResult } from "../trip/types.js";
import type { TripBuildSheet } from "../trip/types.js";
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
import type { ReportFormat, ReportMethodInfo, TripReport, TripReportSetpoint } from "./reportTypes.js";
import { _sentenceInUnit } from "../faults/_faultReviewWords.js";
import { _csvUnitLine, _displayOf, _jsonUnitField, type ReportDisplayOptions, type _TemperatureDisplay } from "./displayUnit.js";
import { _dynamicsCsv, _dynamicsMarkdownLines, _dynamicsTextLines } from "./runawayReport.js";
import { _requireFiniteData, _requireShape } from "../errors.js";
import { _methodInfoShape, _tripReportShape, _tripResultShape } from "./_reportShapes.js";

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
  _requireShape(result, _tripResultShape, "result", "tripReportFromResult");
  _requireShape(methods, _methodInfoShape, "methods", "tripReportFromResult");
  // the report copies the bands, the error sources and the build sheet as they are: no NaN or ±Infinity anywhere
  _requireFiniteData(result, "result", "tripReportFromResult");
  _requireFiniteData(methods, "methods", "tripReportFromResult");
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
      ...(s.bandOverService !== undefined ? { bandOverService: s.bandOverService } : {}),
    })),
    details,
    // The caution is printed once by the renderer; drop a copy the engine may add to its notes.
    notes: result.notes.filter((n) => !/do not certify/i.test(n)),
    methods: { ...methods, acceptanceMethod: result.acceptanceMethod },
    ...(result.buildSheet !== undefined ? { buildSheet: result.buildSheet } : {}),
  };
}

function bandText(low: number, high: number, d?: _TemperatureDisplay): string {
  return d === undefined ? `${_fixed(low)} to ${_fixed(high)}` : `${_fixed(d.at(low))} to ${_fixed(d.at(high))}`;
}

function setpointRows(report: TripReport, d: _TemperatureDisplay): string[][] {
  const methods = report.setpoints[0]?.bands.map((b) => b.method) ?? [];
  const u = d.symbol;
  const header = [
    "setpoint",
    `target ${u}`,
    `nominal ${u}`,
    ...methods.map((m) => `${_methodShortName(m)} ${u}`),
    `normal ≤ ${u}`,
    `hazard < ${u}`,
    `margin low ${u}`,
    `margin high ${u}`,
    "result",
  ];
  return [
    header,
    ...report.setpoints.map((s) => [
      s.name,
      _fixed(d.at(s.tripTemperatureC)),
      _fixed(d.at(s.nominalTripC), 2),
      ...s.bands.map((b) => bandText(b.lowC, b.highC, d)),
      _fixed(d.at(s.maxNormalOperatingC)),
      _fixed(d.at(s.hazardLimitC)),
      _signed(d.diff(s.marginToNormalC)),
      _signed(d.diff(s.marginToHazardC)),
      s.pass ? "PASS" : "FAIL",
    ]),
  ];
}

/**
 * Temperatures named in an engine's description text ("… at 1250 °C", a rating point): absolute, in the display
 * unit (°C text unchanged). @internal
 */
export function _descriptionInUnit(text: string, d: _TemperatureDisplay): string {
  return _sentenceInUnit(text, d);
}

/**
 * The verdict sentence of a setpoint. In °C the engine's own sentence; in another unit one built from the
 * setpoint's fields (the engine's sentences quote °C), naming the band of the acceptance method. @internal
 */
export function _reasonInUnit(report: TripReport, s: TripReportSetpoint, d: _TemperatureDisplay): string {
  if (d.unit === "C") return s.reason;
  const method = report.methods.acceptanceMethod ?? s.bands[0]?.method ?? "worst-case";
  const band = s.bands.find((b) => b.method === method) ?? s.bands[0];
  const u = d.symbol;
  const where = band === undefined ? "" : `trips between ${_fixed(d.at(band.lowC))} and ${_fixed(d.at(band.highC))} ${u} (${_methodShortName(band.method)}): `;
  const dynamic = report.dynamics?.setpoints.find((x) => x.name === s.name) !== undefined ? " The verdict uses the dynamic peak (runaway section)." : "";
  return (
    `${s.pass ? "PASS" : "FAIL"}: ${where}margin ${_signed(d.diff(s.marginToNormalC))} ${u} to the highest normal operating temperature ${_fixed(d.at(s.maxNormalOperatingC))} ${u}, ` +
    `${_signed(d.diff(s.marginToHazardC))} ${u} to the hazard limit ${_fixed(d.at(s.hazardLimitC))} ${u}.${dynamic}`
  );
}

function sourceRows(report: TripReport, limit: number, d: _TemperatureDisplay): { name: string; rows: string[][] }[] {
  return report.setpoints.map((s) => ({
    name: s.name,
    rows: [
      ["error source", `worst-case swing ±${d.symbol}`, `standard uncertainty ${d.symbol}`, "what it is"],
      ...s.errorSources.slice(0, limit).map((e) => [e.name, _fixed(d.diff(e.worstCaseC), 2), _fixed(d.diff(e.standardUncertaintyC), 2), _descriptionInUnit(e.description, d)]),
    ],
  }));
}

function bandText4(low: number, high: number): string {
  return `${_fixed(low, 4)} to ${_fixed(high, 4)}`;
}

function resistorList(list: readonly { designator: string; ohms: number }[]): string {
  return list.map((r) => `${r.designator} ${formatOhms(r.ohms)}`).join(" + ");
}

/** The build sheet's tables: per setpoint, per ADC setpoint, and the bill of materials. @internal */
export function _buildSheetTables(sheet: TripBuildSheet, d: _TemperatureDisplay = _displayOf(undefined)): { title: string; rows: string[][] }[] {
  const u = d.symbol;
  const tables: { title: string; rows: string[][] }[] = [];
  if (sheet.setpoints.length > 0) {
    tables.push({
      title: "Build sheet: thresholds",
      rows: [
        ["setpoint", "ideal threshold V", "realized V", "threshold band V", "above tap", "below tap", "divider mA", `nominal release ${u}`, `release band ${u}`, `release margin ${u}`],
        ...sheet.setpoints.map((s) => [
          s.name,
          _fixed(s.idealThresholdVolts, 5),
          _fixed(s.realizedThresholdVolts, 5),
          bandText4(s.thresholdLowVolts, s.thresholdHighVolts),
          resistorList(s.resistorsAbove),
          resistorList(s.resistorsBelow),
          _fixed(s.dividerCurrentMilliamps, 4),
          _fixed(d.at(s.nominalReleaseC), 2),
          bandText(s.releaseLowC, s.releaseHighC, d),
          _signed(d.diff(s.releaseMarginToNormalC)),
        ]),
      ],
    });
  }
  if (sheet.adcSetpoints.length > 0) {
    tables.push({
      title: "Build sheet: firmware codes",
      rows: [
        ["setpoint", "signal V", "nominal code", "trip at code ≥", `LSB/${u}`, "code band"],
        ...sheet.adcSetpoints.map((s) => [
          s.name,
          _fixed(s.signalVolts, 5),
          _fixed(s.nominalCode, 2),
          String(s.thresholdCode),
          _fixed(d.perDegree(s.codesPerC), 3),
          bandText(s.codeLow, s.codeHigh),
        ]),
      ],
    });
  }
  if (sheet.parts.length > 0) {
    tables.push({
      title: "Bill of materials",
      rows: [
        ["designators", "part", "value", "tolerance", `tempco ppm/${u}`, "count"],
        ...sheet.parts.map((p) => [
          p.designators,
          p.part,
          typeof p.value === "number" ? (p.unit === "Ω" ? formatOhms(p.value) : `${p.value} ${p.unit}`) : p.value,
          p.toleranceUnit === "°C" ? `±${_fixed(d.diff(p.tolerance), 2)} ${u}` : `±${+(p.tolerance * 100).toPrecision(4)} %`,
          _fixed(d.perDegree(p.tempcoPpmPerC), 0),
          String(p.count),
        ]),
      ],
    });
  }
  return tables;
}

/** The build sheet's sentences (shunt series resistor, mid-rail divider). @internal */
export function _buildSheetLines(sheet: TripBuildSheet): string[] {
  const lines: string[] = [];
  const r = sheet.shuntSeriesResistor;
  if (r !== undefined) {
    lines.push(
      `Shunt series resistor: ${formatOhms(r.ohms)} (${r.series}, ±${+(r.toleranceFraction * 100).toPrecision(4)} %), dissipates up to ${_fixed(r.powerWatts * 1000, 1)} mW; choose a rating of ${r.ratingWatts} W or more.`,
    );
  }
  const m = sheet.midRail;
  if (m !== undefined) {
    lines.push(`Mid-rail divider: top ${formatOhms(m.topOhms)}, bottom ${formatOhms(m.bottomOhms)}: ${_fixed(m.nominalVolts, 4)} V (${_fixed(m.worstCaseLowVolts, 4)} to ${_fixed(m.worstCaseHighVolts, 4)} V).`);
  }
  return lines;
}

/** The bill of materials as CSV (caution as a leading `#` line). */
export function formatPartsCsv(sheet: TripBuildSheet): string {
  const rows: (string | number)[][] = [["designators", "part", "value", "unit", "tolerance", "tolerance_unit", "tempco_ppm_per_C", "count"]];
  for (const p of sheet.parts) rows.push([p.designators, p.part, p.value, p.unit, p.tolerance, p.toleranceUnit, p.tempcoPpmPerC, p.count]);
  return `# ${_cautionLine()}\n${_csv(rows)}`;
}

function coverageLines(report: TripReport, d: _TemperatureDisplay): string[] {
  // Coverage factors are pure numbers: no unit.
  const out: string[] = [];
  for (const s of report.setpoints) {
    const w = s.bands.find((b) => b.method === "worst-case");
    if (w?.enclosureLowC !== undefined && w.enclosureHighC !== undefined) {
      // Attained and enclosure keep every digit (the gap is ~1e-10 °C); gaps and the tolerance are differences.
      const at = (t: number): number => (d.unit === "C" ? t : d.unit === "K" ? t + 273.15 : t * 1.8 + 32);
      const gap = (g: number | undefined): string => (g === undefined ? "not stated" : g === 0 ? "0" : d.diff(g).toExponential(1));
      const u = d.symbol;
      out.push(
        `Worst case at "${s.name}": attained ${at(w.lowC)} to ${at(w.highC)} ${u} (points of the source box reach them), enclosure ${at(w.enclosureLowC)} to ${at(w.enclosureHighC)} ${u} (over the whole box: interval arithmetic with outward rounding), gap ${gap(w.enclosureGapLowC)} / ${gap(w.enclosureGapHighC)} ${u}` +
          (w.enclosureGapToleranceC !== undefined ? ` (stated tolerance ${d.diff(w.enclosureGapToleranceC)} ${u}).` : "."),
      );
    }
    const rss = s.bands.find((b) => b.method === "rss");
    if (rss?.coverageFactor !== undefined && rss.coverageFactor > 0) {
      out.push(
        `RSS at "${s.name}": coverage factor k = ${_fixed(rss.coverageFactor, 3)} (${rss.coverageFactorRule === "rectangular-dominant" ? "a rectangular source dominates: quantile of its convolution with the rest" : "normal"})${rss.limitedToWorstCase === true ? ", interval cut to the worst case" : ""}.`,
      );
    }
  }
  return out;
}

/** One line per setpoint with an ageing drift: how the worst-case band widens with time in service. */
function serviceLines(report: TripReport, d: _TemperatureDisplay): string[] {
  return report.setpoints
    .filter((s) => s.bandOverService !== undefined)
    .map(
      (s) =>
        `${s.name}: worst-case band over time in service (probe ageing): ` +
        (s.bandOverService ?? []).map((p) => `${+p.hours.toPrecision(6)} h ${bandText(p.lowC, p.highC, d)} ${d.symbol}`).join("; ") +
        ".",
    );
}

function renderText(report: TripReport, d: _TemperatureDisplay): string {
  const heading = `${report.title}${report.designName !== undefined ? `: ${report.designName}` : ""} — ${report.pass ? "PASS" : "FAIL"}`;
  const out = [heading, "=".repeat([...heading].length), "", ...report.details.map((l) => _sentenceInUnit(l, d)), "", _textTable(setpointRows(report, d)), ""];
  for (const s of report.setpoints) out.push(`${s.name}: ${_reasonInUnit(report, s, d)}`);
  out.push(...coverageLines(report, d));
  if (report.buildSheet !== undefined) {
    for (const t of _buildSheetTables(report.buildSheet, d)) out.push("", `${t.title}:`, _textTable(t.rows));
    const lines = _buildSheetLines(report.buildSheet);
    if (lines.length > 0) out.push("", ...lines);
  }
  out.push(...serviceLines(report, d));
  for (const block of sourceRows(report, 8, d)) {
    out.push("", `Largest error sources at "${block.name}":`, _textTable(block.rows));
  }
  if (report.dynamics !== undefined) out.push(..._dynamicsTextLines(report.dynamics, d));
  out.push("", _describeMethods(report.methods));
  for (const note of report.notes) out.push(`Note: ${_sentenceInUnit(note, d)}`);
  out.push("", _cautionLine(), "");
  return out.join("\n");
}

function renderMarkdown(report: TripReport, d: _TemperatureDisplay): string {
  const out = [
    `# ${report.title}${report.designName !== undefined ? `: ${report.designName}` : ""}`,
    "",
    `**Result: ${report.pass ? "PASS" : "FAIL"}**`,
    "",
    `> **Caution.** ${CAUTION_TEXT}`,
    "",
    ...report.details.map((l) => `- ${_sentenceInUnit(l, d)}`),
    "",
    _markdownTable(setpointRows(report, d)),
    "",
    ...report.setpoints.map((s) => `- **${s.name}**: ${_reasonInUnit(report, s, d)}`),
    ...coverageLines(report, d).map((l) => `- ${l}`),
    ...serviceLines(report, d).map((l) => `- ${l}`),
  ];
  if (report.buildSheet !== undefined) {
    for (const t of _buildSheetTables(report.buildSheet, d)) out.push("", `## ${t.title}`, "", _markdownTable(t.rows));
    const lines = _buildSheetLines(report.buildSheet);
    if (lines.length > 0) out.push("", ...lines.map((l) => `- ${l}`));
  }
  for (const block of sourceRows(report, 8, d)) out.push("", `## Largest error sources at "${block.name}"`, "", _markdownTable(block.rows));
  if (report.dynamics !== undefined) out.push(..._dynamicsMarkdownLines(report.dynamics, "##", d));
  out.push("", "## Method", "", _describeMethods(report.methods));
  if (report.notes.length > 0) out.push("", ...report.notes.map((n) => `- ${_sentenceInUnit(n, d)}`));
  out.push("");
  return out.join("\n");
}

function renderCsv(report: TripReport, d: _TemperatureDisplay): string {
  const x = d.csvSuffix;
  const rows: (string | number | boolean)[][] = [
    ["setpoint", `target_${x}`, `nominal_trip_${x}`, "method", `low_${x}`, `high_${x}`, "coverage", `standard_uncertainty_${x}`, "trials", "seed",
      `max_normal_operating_${x}`, `hazard_limit_${x}`, `margin_to_normal_${x}`, `margin_to_hazard_${x}`, "pass", "coverage_factor"],
  ];
  for (const s of report.setpoints) {
    for (const b of s.bands) {
      rows.push([s.name, d.at(s.tripTemperatureC), d.at(s.nominalTripC), b.method, d.at(b.lowC), d.at(b.highC), b.coverage, d.diff(b.standardUncertaintyC),
        b.trials ?? "", b.seed ?? "", d.at(s.maxNormalOperatingC), d.at(s.hazardLimitC), d.diff(s.marginToNormalC), d.diff(s.marginToHazardC), s.pass, b.coverageFactor ?? ""]);
    }
  }
  const unitLine = _csvUnitLine(d);
  let text = `# ${_cautionLine()}\n# ${_describeMethods(report.methods)}\n${unitLine}${_csv(rows)}`;
  const sheet = report.buildSheet;
  if (sheet !== undefined && sheet.setpoints.length > 0) {
    const sheetRows: (string | number)[][] = [["setpoint", "ideal_threshold_V", "realized_threshold_V", "threshold_low_V", "threshold_high_V", "resistors_above", "resistors_below", "divider_current_mA",
      `nominal_trip_${x}`, `nominal_release_${x}`, `hysteresis_${x}`, `release_low_${x}`, `release_high_${x}`, `release_margin_to_normal_${x}`]];
    for (const s of sheet.setpoints) {
      sheetRows.push([s.name, s.idealThresholdVolts, s.realizedThresholdVolts, s.thresholdLowVolts, s.thresholdHighVolts, s.resistorsAbove.map((r) => `${r.designator}=${r.ohms}`).join(" "),
        s.resistorsBelow.map((r) => `${r.designator}=${r.ohms}`).join(" "), s.dividerCurrentMilliamps, d.at(s.nominalTripC), d.at(s.nominalReleaseC), d.diff(s.hysteresisC),
        d.at(s.releaseLowC), d.at(s.releaseHighC), d.diff(s.releaseMarginToNormalC)]);
    }
    text += `\n# build sheet\n${_csv(sheetRows)}`;
  }
  if (sheet !== undefined && sheet.adcSetpoints.length > 0) {
    const codeRows: (string | number)[][] = [["setpoint", "signal_V", "nominal_code", "threshold_code", `codes_per_${x}`, "code_low", "code_high"]];
    for (const s of sheet.adcSetpoints) codeRows.push([s.name, s.signalVolts, s.nominalCode, s.thresholdCode, d.perDegree(s.codesPerC), s.codeLow, s.codeHigh]);
    text += `\n# build sheet\n${_csv(codeRows)}`;
  }
  const dynamics = report.dynamics === undefined ? "" : `# dynamics: runaway response per setpoint and case (the verdict uses the dynamic peak)\n${_dynamicsCsv(report.dynamics, d)}`;
  return `${text}${dynamics}`;
}

/**
 * Renders a trip report. Every format includes the caution and the methods with the seed.
 * @param report - report data (see {@link tripReportFromResult})
 * @param format - `"text"` (terminal table), `"markdown"`, `"csv"` (caution and method as leading `#` lines) or `"json"`
 * @param options - `temperatureUnit` `"C"` (default), `"F"` or `"K"`: the unit text, Markdown and CSV show
 *   temperatures in (absolute values with the offset, differences such as margins and half-widths by the scale;
 *   CSV column names end in the unit). JSON keeps every field in °C and records the unit as `temperatureUnit`.
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
export function formatTripReport(report: TripReport, format: ReportFormat, options?: ReportDisplayOptions): string {
  // Deliberately alike: every format… entry switches on the format to its own renderers (formatFaultReview too).
  _requireShape(report, _tripReportShape, "report", "formatTripReport");
  const d = _displayOf(options);
  switch (format) {
    case "markdown":
      return renderMarkdown(report, d);
    case "csv":
      return renderCsv(report, d);
    case "json":
      return `${JSON.stringify({ report: "trip", reportSchemaVersion: 1, caution: CAUTION_TEXT, method: report.methods, ..._jsonUnitField(d), ...report }, null, 2)}\n`;
    default:
      return renderText(report, d);
  }
}

/** @deprecated use {@link formatTripReport} (the one `format…` family of renderers); kept for one minor version. */
export const renderTripReport = formatTripReport;
