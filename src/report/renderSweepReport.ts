/**
 * Error-sweep renderers: a chain's reading error bounds over a range of true temperatures.
 * @module
 */
import { CAUTION_TEXT } from "./caution.js";
import { _cautionLine, _csv, _describeMethods, _fixed, _markdownTable, _methodShortName, _signed, _textTable } from "./formatting.js";
import type { ErrorSweep, ReportFormat } from "./reportTypes.js";
import { _sentenceInUnit } from "../faults/_faultReviewWords.js";
import { _csvUnitLine, _displayOf, _jsonUnitField, type ReportDisplayOptions, type _TemperatureDisplay } from "./displayUnit.js";
import { _requireShape } from "../errors.js";
import { _errorSweepShape } from "./_reportShapes.js";

function rows(sweep: ErrorSweep, d: _TemperatureDisplay): string[][] {
  const methods = sweep.rows[0]?.bands.map((b) => b.method) ?? [];
  const withSources = sweep.rows.some((r) => r.largestSources !== undefined);
  const u = d.symbol;
  return [
    [`true ${u}`, `nominal error ${u}`, ...methods.map((m) => `${_methodShortName(m)} error ${u}`), ...(withSources ? [`largest sources ±${u}`] : [])],
    ...sweep.rows.map((r) => [
      _fixed(d.at(r.temperatureC), 1),
      _signed(d.diff(r.nominalErrorC), 2),
      ...r.bands.map((b) => `${_signed(d.diff(b.errorLowC), 2)} to ${_signed(d.diff(b.errorHighC), 2)}`),
      ...(withSources ? [(r.largestSources ?? []).map((s) => `${s.source} ${_fixed(d.diff(s.halfSwingC), 2)}`).join(", ")] : []),
    ]),
  ];
}

/** The line naming the design's setpoints and limits (marked on the chart), empty without them. */
function setpointLines(sweep: ErrorSweep, d: _TemperatureDisplay): string[] {
  const u = d.symbol;
  return (sweep.setpoints ?? []).map(
    (s) => `Setpoint "${s.name}": trip ${_fixed(d.at(s.tripTemperatureC))} ${u}, highest normal operating ${_fixed(d.at(s.maxNormalOperatingC))} ${u}, hazard limit ${_fixed(d.at(s.hazardLimitC))} ${u}.`,
  );
}

/**
 * The worst case's bracket over the sweep in one sentence (the words `check` uses for one setpoint), empty without
 * one: attained and enclosure at how many points, the largest gap and where, the stated tolerance.
 */
function bracketLines(sweep: ErrorSweep, d: _TemperatureDisplay): string[] {
  const b = sweep.worstCaseBracket;
  if (b === undefined) return [];
  const u = d.symbol;
  const gap = b.largestGapC === 0 ? "0" : d.diff(b.largestGapC).toExponential(1);
  const rest = b.points - b.enclosedPoints;
  return [
    `Worst case over the sweep: attained (points of the source box reach them) and enclosure (over the whole box: interval arithmetic with outward rounding) at ${b.enclosedPoints} of ${b.points} points, largest gap ${gap} ${u} at ${_fixed(d.at(b.largestGapAtC), 1)} ${u} (stated tolerance ${d.diff(b.gapToleranceC)} ${u})` +
      (rest > 0 ? `; the other ${rest} points have no enclosure (attained only, by search).` : "."),
  ];
}

/** CSV rows, with the worst case's bracket columns when any point has one (empty for the other methods). */
function csvTable(sweep: ErrorSweep, d: _TemperatureDisplay): (string | number)[][] {
  const x = d.csvSuffix;
  const bracket = sweep.rows.some((r) => r.bands.some((b) => b.enclosureErrorLowC !== undefined));
  const head = [`true_${x}`, `nominal_error_${x}`, "method", `error_low_${x}`, `error_high_${x}`];
  const table: (string | number)[][] = [bracket ? [...head, `enclosure_error_low_${x}`, `enclosure_error_high_${x}`, `gap_low_${x}`, `gap_high_${x}`] : head];
  const cell = (v: number | undefined): string | number => (v === undefined ? "" : d.diff(v));
  for (const r of sweep.rows) {
    for (const b of r.bands) {
      const row = [d.at(r.temperatureC), d.diff(r.nominalErrorC), b.method, d.diff(b.errorLowC), d.diff(b.errorHighC)];
      table.push(bracket ? [...row, cell(b.enclosureErrorLowC), cell(b.enclosureErrorHighC), cell(b.enclosureGapLowC), cell(b.enclosureGapHighC)] : row);
    }
  }
  return table;
}

/**
 * Renders an error sweep.
 * @param sweep - sweep data
 * @param format - `"text"`, `"markdown"`, `"csv"` or `"json"`
 * @param options - `temperatureUnit` `"C"` (default), `"F"` or `"K"` for text, Markdown and CSV (true
 *   temperatures with the offset, errors by the scale); JSON keeps °C and records the unit as `temperatureUnit`
 * @returns the report text
 * @example
 * ```ts
 * import { formatSweepReport } from "hotjunction/report";
 * const csv = formatSweepReport(
 *   { title: "Error sweep", rows: [{ temperatureC: 100, nominalErrorC: 0, bands: [{ method: "worst-case", errorLowC: -2, errorHighC: 2 }] }], notes: [], methods: { methods: ["worst-case"], coverage: 0.95 } },
 *   "csv",
 * );
 * console.log(csv.trim().split("\n").at(-1)); // "100,0,worst-case,-2,2"
 * ```
 */
export function formatSweepReport(sweep: ErrorSweep, format: ReportFormat, options?: ReportDisplayOptions): string {
  _requireShape(sweep, _errorSweepShape, "sweep", "formatSweepReport");
  const d = _displayOf(options);
  const heading = `${sweep.title}${sweep.designName !== undefined ? `: ${sweep.designName}` : ""}`;
  switch (format) {
    case "json":
      return `${JSON.stringify({ report: "error-sweep", reportSchemaVersion: 1, caution: CAUTION_TEXT, method: sweep.methods, ..._jsonUnitField(d), ...sweep }, null, 2)}\n`;
    case "csv": {
      const marks = [...setpointLines(sweep, d), ...bracketLines(sweep, d)].map((l) => `# ${l}\n`).join("");
      return `# ${_cautionLine()}\n# ${_describeMethods(sweep.methods)}\n${_csvUnitLine(d)}${marks}${_csv(csvTable(sweep, d))}`;
    }
    case "markdown":
      return [
        `# ${heading}`,
        "",
        `> **Caution.** ${CAUTION_TEXT}`,
        "",
        "Error = indicated minus true temperature.",
        "",
        _markdownTable(rows(sweep, d)),
        "",
        ...[...setpointLines(sweep, d), ...bracketLines(sweep, d)].map((l) => `- ${l}`),
        ...((sweep.setpoints !== undefined && sweep.setpoints.length > 0) || sweep.worstCaseBracket !== undefined ? [""] : []),
        "## Method",
        "",
        _describeMethods(sweep.methods),
        ...(sweep.notes.length > 0 ? ["", ...sweep.notes.map((n) => `- ${_sentenceInUnit(n, d)}`)] : []),
        "",
      ].join("\n");
    default:
      // Deliberately alike: every text report opens with its heading underlined (the comparison report too).
      return [
        heading,
        "=".repeat([...heading].length),
        "Error = indicated minus true temperature.",
        "",
        _textTable(rows(sweep, d)),
        "",
        ...setpointLines(sweep, d),
        ...bracketLines(sweep, d),
        _describeMethods(sweep.methods),
        ...sweep.notes.map((n) => `Note: ${_sentenceInUnit(n, d)}`),
        "",
        _cautionLine(),
        "",
      ].join("\n");
  }
}

/** @deprecated use {@link formatSweepReport} (the one `format…` family of renderers); kept for one minor version. */
export const renderSweepReport = formatSweepReport;
