/**
 * Renderers of the response-time results (`tripDynamics`): the section the trip report carries when a design
 * states dynamics, and the stand-alone runaway report (text, Markdown, CSV, JSON). Every figure printed is a field
 * of the JSON.
 * @module
 */
import type { TripDynamicsSetpoint } from "../trip/tripDynamics.js";
import { CAUTION_TEXT } from "./caution.js";
import { _cautionLine, _csv, _fixed, _markdownTable, _signed, _textTable } from "./formatting.js";
import type { ReportFormat, TripReportDynamics } from "./reportTypes.js";
import { _csvUnitLine, _displayOf, _jsonUnitField, type ReportDisplayOptions, type _TemperatureDisplay } from "./displayUnit.js";
import { _requireShape } from "../errors.js";

const celsius = /* @__PURE__ */ _displayOf(undefined);

/** A stand-alone runaway report. */
export interface RunawayReport {
  /** Heading, e.g. "Runaway response". */
  readonly title: string;
  readonly designName?: string;
  readonly dynamics: TripReportDynamics;
  /** Lines on the static check the trip points come from (method, band). */
  readonly details: readonly string[];
}

function optional(value: number | null, decimals = 1): string {
  return value === null ? "n/a" : _fixed(value, decimals);
}

function caseRows(s: TripDynamicsSetpoint, d: _TemperatureDisplay): string[][] {
  const u = d.symbol;
  return [
    ["case", `trip ${u}`, "true crossing s", "heat off s", "response s", `at heat off ${u}`, `peak ${u}`, `overshoot ${u}`, `margin to hazard ${u}`, "result"],
    ...s.cases.map((c) => [
      c.name,
      _fixed(d.at(c.tripTemperatureC), 1),
      optional(c.trueCrossingSeconds, 2),
      optional(c.heatOffSeconds, 2),
      optional(c.responseTimeSeconds, 2),
      optional(c.trueAtHeatOffC === null ? null : d.at(c.trueAtHeatOffC), 1),
      _fixed(d.at(c.peakTrueC), 1),
      _signed(d.diff(c.overshootC), 1),
      _signed(d.diff(c.dynamicMarginC), 1),
      c.tripped && !c.exceedsHazard ? "below hazard" : c.tripped ? "REACHES HAZARD" : "NO TRIP",
    ]),
  ];
}

function timeLine(s: TripDynamicsSetpoint, d: _TemperatureDisplay): string {
  const toHazard = s.timeFromNormalToHazardSeconds;
  const u = d.symbol;
  const head =
    toHazard === null
      ? `Uncontrolled, the runaway from ${_fixed(d.at(s.maxNormalOperatingC))} ${u} never reaches the hazard limit ${_fixed(d.at(s.hazardLimitC))} ${u}`
      : `Uncontrolled, the runaway takes ${_fixed(toHazard, 1)} s from the highest normal operating temperature ${_fixed(d.at(s.maxNormalOperatingC))} ${u} to the hazard limit ${_fixed(d.at(s.hazardLimitC))} ${u}`;
  const response = s.longestResponseTimeSeconds;
  const tail =
    response === null
      ? "; no case trips."
      : `; the longest response time (true crossing to heat off) is ${_fixed(response, 2)} s${s.responseShareOfTimeToHazard === null ? "" : ` (${_fixed(s.responseShareOfTimeToHazard * 100, 0)} % of it)`}.`;
  return head + tail;
}

function noiseLines(s: TripDynamicsSetpoint, d: _TemperatureDisplay): string[] {
  const n = s.noise;
  if (n === null) return [];
  const u = d.symbol;
  const mv = (volts: number): string => `${_fixed(volts * 1000, 2)} mV`;
  const falseTrips = n.deterministicFalseTrip
    ? `the mains peak alone reaches the band's low edge ${_fixed(d.at(s.bandLowC))} ${u}: a false trip every mains cycle`
    : `${n.falseTripsPerHour === null ? "n/a" : n.falseTripsPerHour.toExponential(2)} false trips per hour at ${_fixed(d.at(s.maxNormalOperatingC))} ${u} (band low edge ${_fixed(d.at(s.bandLowC))} ${u})`;
  const design =
    n.designHysteresisVolts === null || n.designHysteresisC === null
      ? "the firmware's own hysteresis is not stated in the design"
      : `the comparator has ${mv(n.designHysteresisVolts)} (${_fixed(d.diff(n.designHysteresisC), 2)} ${u}): ${n.hysteresisSufficient === true ? "enough" : "NOT ENOUGH"}`;
  // The sensitivity source names the Seebeck coefficient in µV/°C: quoted in °C only.
  const slope = d.unit === "C" ? `slope ${_fixed(n.sensitivityVoltsPerC * 1000, 4)} mV/°C (${n.sensitivitySource})` : `slope ${_fixed(d.perDegree(n.sensitivityVoltsPerC * 1000), 4)} mV/${u}`;
  return [
    `Noise: ${_fixed(d.diff(n.rmsC), 3)} ${u} rms (${mv(n.rmsVolts)})${n.bandwidthHz === null ? "" : ` in ${_fixed(n.bandwidthHz, 1)} Hz`}, mains pickup peak ${_fixed(d.diff(n.mainsPeakC), 3)} ${u} (${mv(n.mainsPeakVolts)}); ${slope}.`,
    `False trips: ${falseTrips}.`,
    `Chatter: hysteresis needed for fewer than ${n.chatterTargetPerHour} re-crossings per hour at the threshold: ${_fixed(d.diff(n.hysteresisNeededC), 2)} ${u} (${mv(n.hysteresisNeededVolts)}); ${design}.`,
    `Noise spectrum: ${n.spectrumAssumption}`,
  ];
}

function verdictLine(s: TripDynamicsSetpoint, d: _TemperatureDisplay): string {
  // The engine's sentence quotes °C; in another unit the case table above carries its figures.
  const reason = d.unit === "C" ? ` ${s.reason}` : "";
  return `${s.name}: ${s.pass ? "PASS" : "FAIL"} (verdict uses the ${s.verdictUses}; the static band alone: ${s.staticPass ? "PASS" : "FAIL"}).${reason}`;
}

/** The dynamics section of a text report. @internal */
export function _dynamicsTextLines(dyn: TripReportDynamics, d: _TemperatureDisplay = celsius): string[] {
  const out = ["", `Runaway response (heater stuck on) — ${dyn.pass ? "PASS" : "FAIL"}; the verdict uses the dynamic peak`];
  for (const s of dyn.setpoints) {
    out.push("", `At "${s.name}" (static band ${_fixed(d.at(s.bandLowC))} to ${_fixed(d.at(s.bandHighC))} ${d.symbol}, nominal ${_fixed(d.at(s.nominalTripC), 2)} ${d.symbol}):`, _textTable(caseRows(s, d)));
    out.push(timeLine(s, d), ...noiseLines(s, d), verdictLine(s, d));
  }
  out.push("", "Response-time assumptions:", ...dyn.assumptions.map((a) => `- ${a}`));
  return out;
}

/** The dynamics section of a Markdown report. @internal */
export function _dynamicsMarkdownLines(dyn: TripReportDynamics, level = "##", d: _TemperatureDisplay = celsius): string[] {
  const out = ["", `${level} Runaway response (heater stuck on): ${dyn.pass ? "PASS" : "FAIL"}`, "", "The verdict uses the dynamic peak against the hazard limit."];
  for (const s of dyn.setpoints) {
    out.push("", `${level}# ${s.name}`, "", `Static band ${_fixed(d.at(s.bandLowC))} to ${_fixed(d.at(s.bandHighC))} ${d.symbol}, nominal ${_fixed(d.at(s.nominalTripC), 2)} ${d.symbol}.`, "", _markdownTable(caseRows(s, d)), "");
    out.push(`- ${timeLine(s, d)}`, ...noiseLines(s, d).map((l) => `- ${l}`), `- **${verdictLine(s, d)}**`);
  }
  out.push("", `${level}# Response-time assumptions`, "", ...dyn.assumptions.map((a) => `- ${a}`));
  return out;
}

/** The dynamics table of a CSV report: one row per setpoint and case, every figure a column. @internal */
export function _dynamicsCsv(dyn: TripReportDynamics, d: _TemperatureDisplay = celsius): string {
  const x = d.csvSuffix;
  const orNull = (v: number | null | undefined, f: (t: number) => number): number | null => (v === null || v === undefined ? null : f(v));
  const rows: (string | number | boolean | null)[][] = [
    ["setpoint", "case", `trip_temperature_${x}`, `max_normal_operating_${x}`, `hazard_limit_${x}`, `band_low_${x}`, `band_high_${x}`, `nominal_trip_${x}`,
      "tripped", "true_crossing_s", "decision_s", "heat_off_s", "response_time_s", `true_at_heat_off_${x}`, `peak_true_${x}`, "peak_s",
      `overshoot_${x}`, `dynamic_margin_${x}`, "exceeds_hazard", "time_normal_to_hazard_s", "response_share_of_time_to_hazard",
      "static_pass", "dynamic_pass", "pass", "verdict_uses", `noise_rms_${x}`, "noise_rms_V", "noise_bandwidth_Hz", `mains_peak_${x}`, "mains_peak_V",
      "false_trips_per_hour", "deterministic_false_trip", "chatter_target_per_hour", `hysteresis_needed_${x}`, "hysteresis_needed_V",
      `design_hysteresis_${x}`, "design_hysteresis_V", "hysteresis_sufficient", `sensitivity_V_per_${x}`],
  ];
  for (const s of dyn.setpoints) {
    const n = s.noise;
    for (const c of s.cases) {
      rows.push([s.name, c.name, d.at(c.tripTemperatureC), d.at(s.maxNormalOperatingC), d.at(s.hazardLimitC), d.at(s.bandLowC), d.at(s.bandHighC), d.at(s.nominalTripC),
        c.tripped, c.trueCrossingSeconds, c.decisionSeconds, c.heatOffSeconds, c.responseTimeSeconds, orNull(c.trueAtHeatOffC, d.at), d.at(c.peakTrueC), c.peakSeconds,
        d.diff(c.overshootC), d.diff(c.dynamicMarginC), c.exceedsHazard, s.timeFromNormalToHazardSeconds, s.responseShareOfTimeToHazard,
        s.staticPass, s.dynamicPass, s.pass, s.verdictUses, orNull(n?.rmsC, d.diff), n?.rmsVolts ?? null, n?.bandwidthHz ?? null, orNull(n?.mainsPeakC, d.diff), n?.mainsPeakVolts ?? null,
        n?.falseTripsPerHour ?? null, n?.deterministicFalseTrip ?? null, n?.chatterTargetPerHour ?? null, orNull(n?.hysteresisNeededC, d.diff), n?.hysteresisNeededVolts ?? null,
        orNull(n?.designHysteresisC, d.diff), n?.designHysteresisVolts ?? null, n?.hysteresisSufficient ?? null, orNull(n?.sensitivityVoltsPerC, d.perDegree)]);
    }
  }
  return _csv(rows);
}

/**
 * Renders a runaway report: per setpoint the slowest and the nominal unit through a runaway, the time the process
 * leaves before the hazard, the noise figures, and the verdict from the dynamic peak. Every format carries the
 * caution.
 * @param report - the report data (`dynamics` from `tripDynamics` without its `responses`)
 * @param format - `"text"`, `"markdown"`, `"csv"` (caution as a leading `#` line) or `"json"`
 * @param options - `temperatureUnit` (`"C"`, `"F"`, `"K"`; default `"C"`) the text, Markdown and CSV show
 *   temperatures in; the JSON keeps its °C fields and records the unit
 * @returns the report text
 * @example
 * ```ts
 * import { formatRunawayReport } from "hotjunction/report";
 * const text = formatRunawayReport({ title: "Runaway response", details: [], dynamics: { setpoints: [], pass: true, assumptions: [],
 *   model: { runaway: { kind: "constantRate", rateCPerSecond: 1 } } } }, "text");
 * console.log(text.includes("do not certify a safety function")); // true
 * ```
 */
export function formatRunawayReport(report: RunawayReport, format: ReportFormat, options?: ReportDisplayOptions): string {
  // the top level of the report (the per-setpoint cases are not shape-checked yet)
  _requireShape(
    report,
    { title: "string", designName: ["optional", "string"], details: ["array", "string"], dynamics: { pass: "boolean", assumptions: ["array", "string"], setpoints: ["array", { cases: ["array", {}] }] } },
    "report",
    "formatRunawayReport",
  );
  const name = report.designName !== undefined ? `: ${report.designName}` : "";
  const d = _displayOf(options);
  switch (format) {
    case "json":
      return `${JSON.stringify({ report: "runaway", caution: CAUTION_TEXT, title: report.title, ...(report.designName !== undefined ? { designName: report.designName } : {}), verdictUses: "dynamic peak", details: report.details, ...report.dynamics, ..._jsonUnitField(d) }, null, 2)}\n`;
    case "csv":
      return `# ${_cautionLine()}\n${_csvUnitLine(d)}${report.details.map((l) => `# ${l}\n`).join("")}${_dynamicsCsv(report.dynamics, d)}`;
    case "markdown":
      return [
        `# ${report.title}${name}`,
        "",
        `**Result: ${report.dynamics.pass ? "PASS" : "FAIL"}** (verdict from the dynamic peak)`,
        "",
        `> **Caution.** ${CAUTION_TEXT}`,
        "",
        ...report.details.map((l) => `- ${l}`),
        ..._dynamicsMarkdownLines(report.dynamics, "##", d).slice(1),
        "",
      ].join("\n");
    default: {
      const heading = `${report.title}${name} — ${report.dynamics.pass ? "PASS" : "FAIL"}`;
      return [heading, "=".repeat([...heading].length), "", ...report.details, ..._dynamicsTextLines(report.dynamics, d).slice(1), "", _cautionLine(), ""].join("\n");
    }
  }
}
