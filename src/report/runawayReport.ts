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

function caseRows(s: TripDynamicsSetpoint): string[][] {
  return [
    ["case", "trip °C", "true crossing s", "heat off s", "response s", "at heat off °C", "peak °C", "overshoot °C", "margin to hazard °C", "result"],
    ...s.cases.map((c) => [
      c.name,
      _fixed(c.tripTemperatureC, 1),
      optional(c.trueCrossingSeconds, 2),
      optional(c.heatOffSeconds, 2),
      optional(c.responseTimeSeconds, 2),
      optional(c.trueAtHeatOffC, 1),
      _fixed(c.peakTrueC, 1),
      _signed(c.overshootC, 1),
      _signed(c.dynamicMarginC, 1),
      c.tripped && !c.exceedsHazard ? "below hazard" : c.tripped ? "REACHES HAZARD" : "NO TRIP",
    ]),
  ];
}

function timeLine(s: TripDynamicsSetpoint): string {
  const toHazard = s.timeFromNormalToHazardSeconds;
  const head =
    toHazard === null
      ? `Uncontrolled, the runaway from ${_fixed(s.maxNormalOperatingC)} °C never reaches the hazard limit ${_fixed(s.hazardLimitC)} °C`
      : `Uncontrolled, the runaway takes ${_fixed(toHazard, 1)} s from the highest normal operating temperature ${_fixed(s.maxNormalOperatingC)} °C to the hazard limit ${_fixed(s.hazardLimitC)} °C`;
  const response = s.longestResponseTimeSeconds;
  const tail =
    response === null
      ? "; no case trips."
      : `; the longest response time (true crossing to heat off) is ${_fixed(response, 2)} s${s.responseShareOfTimeToHazard === null ? "" : ` (${_fixed(s.responseShareOfTimeToHazard * 100, 0)} % of it)`}.`;
  return head + tail;
}

function noiseLines(s: TripDynamicsSetpoint): string[] {
  const n = s.noise;
  if (n === null) return [];
  const mv = (volts: number): string => `${_fixed(volts * 1000, 2)} mV`;
  const falseTrips = n.deterministicFalseTrip
    ? `the mains peak alone reaches the band's low edge ${_fixed(s.bandLowC)} °C: a false trip every mains cycle`
    : `${n.falseTripsPerHour === null ? "n/a" : n.falseTripsPerHour.toExponential(2)} false trips per hour at ${_fixed(s.maxNormalOperatingC)} °C (band low edge ${_fixed(s.bandLowC)} °C)`;
  const design =
    n.designHysteresisVolts === null || n.designHysteresisC === null
      ? "the firmware's own hysteresis is not stated in the design"
      : `the comparator has ${mv(n.designHysteresisVolts)} (${_fixed(n.designHysteresisC, 2)} °C): ${n.hysteresisSufficient === true ? "enough" : "NOT ENOUGH"}`;
  return [
    `Noise: ${_fixed(n.rmsC, 3)} °C rms (${mv(n.rmsVolts)})${n.bandwidthHz === null ? "" : ` in ${_fixed(n.bandwidthHz, 1)} Hz`}, mains pickup peak ${_fixed(n.mainsPeakC, 3)} °C (${mv(n.mainsPeakVolts)}); slope ${_fixed(n.sensitivityVoltsPerC * 1000, 4)} mV/°C (${n.sensitivitySource}).`,
    `False trips: ${falseTrips}.`,
    `Chatter: hysteresis needed for fewer than ${n.chatterTargetPerHour} re-crossings per hour at the threshold: ${_fixed(n.hysteresisNeededC, 2)} °C (${mv(n.hysteresisNeededVolts)}); ${design}.`,
    `Noise spectrum: ${n.spectrumAssumption}`,
  ];
}

function verdictLine(s: TripDynamicsSetpoint): string {
  return `${s.name}: ${s.pass ? "PASS" : "FAIL"} (verdict uses the ${s.verdictUses}; the static band alone: ${s.staticPass ? "PASS" : "FAIL"}). ${s.reason}`;
}

/** The dynamics section of a text report. @internal */
export function _dynamicsTextLines(d: TripReportDynamics): string[] {
  const out = ["", `Runaway response (heater stuck on) — ${d.pass ? "PASS" : "FAIL"}; the verdict uses the dynamic peak`];
  for (const s of d.setpoints) {
    out.push("", `At "${s.name}" (static band ${_fixed(s.bandLowC)} to ${_fixed(s.bandHighC)} °C, nominal ${_fixed(s.nominalTripC, 2)} °C):`, _textTable(caseRows(s)));
    out.push(timeLine(s), ...noiseLines(s), verdictLine(s));
  }
  out.push("", "Response-time assumptions:", ...d.assumptions.map((a) => `- ${a}`));
  return out;
}

/** The dynamics section of a Markdown report. @internal */
export function _dynamicsMarkdownLines(d: TripReportDynamics, level = "##"): string[] {
  const out = ["", `${level} Runaway response (heater stuck on): ${d.pass ? "PASS" : "FAIL"}`, "", "The verdict uses the dynamic peak against the hazard limit."];
  for (const s of d.setpoints) {
    out.push("", `${level}# ${s.name}`, "", `Static band ${_fixed(s.bandLowC)} to ${_fixed(s.bandHighC)} °C, nominal ${_fixed(s.nominalTripC, 2)} °C.`, "", _markdownTable(caseRows(s)), "");
    out.push(`- ${timeLine(s)}`, ...noiseLines(s).map((l) => `- ${l}`), `- **${verdictLine(s)}**`);
  }
  out.push("", `${level}# Response-time assumptions`, "", ...d.assumptions.map((a) => `- ${a}`));
  return out;
}

/** The dynamics table of a CSV report: one row per setpoint and case, every figure a column. @internal */
export function _dynamicsCsv(d: TripReportDynamics): string {
  const rows: (string | number | boolean | null)[][] = [
    ["setpoint", "case", "trip_temperature_C", "max_normal_operating_C", "hazard_limit_C", "band_low_C", "band_high_C", "nominal_trip_C",
      "tripped", "true_crossing_s", "decision_s", "heat_off_s", "response_time_s", "true_at_heat_off_C", "peak_true_C", "peak_s",
      "overshoot_C", "dynamic_margin_C", "exceeds_hazard", "time_normal_to_hazard_s", "response_share_of_time_to_hazard",
      "static_pass", "dynamic_pass", "pass", "verdict_uses", "noise_rms_C", "noise_rms_V", "noise_bandwidth_Hz", "mains_peak_C", "mains_peak_V",
      "false_trips_per_hour", "deterministic_false_trip", "chatter_target_per_hour", "hysteresis_needed_C", "hysteresis_needed_V",
      "design_hysteresis_C", "design_hysteresis_V", "hysteresis_sufficient", "sensitivity_V_per_C"],
  ];
  for (const s of d.setpoints) {
    const n = s.noise;
    for (const c of s.cases) {
      rows.push([s.name, c.name, c.tripTemperatureC, s.maxNormalOperatingC, s.hazardLimitC, s.bandLowC, s.bandHighC, s.nominalTripC,
        c.tripped, c.trueCrossingSeconds, c.decisionSeconds, c.heatOffSeconds, c.responseTimeSeconds, c.trueAtHeatOffC, c.peakTrueC, c.peakSeconds,
        c.overshootC, c.dynamicMarginC, c.exceedsHazard, s.timeFromNormalToHazardSeconds, s.responseShareOfTimeToHazard,
        s.staticPass, s.dynamicPass, s.pass, s.verdictUses, n?.rmsC ?? null, n?.rmsVolts ?? null, n?.bandwidthHz ?? null, n?.mainsPeakC ?? null, n?.mainsPeakVolts ?? null,
        n?.falseTripsPerHour ?? null, n?.deterministicFalseTrip ?? null, n?.chatterTargetPerHour ?? null, n?.hysteresisNeededC ?? null, n?.hysteresisNeededVolts ?? null,
        n?.designHysteresisC ?? null, n?.designHysteresisVolts ?? null, n?.hysteresisSufficient ?? null, n?.sensitivityVoltsPerC ?? null]);
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
 * @returns the report text
 * @example
 * ```ts
 * import { formatRunawayReport } from "hotjunction/report";
 * const text = formatRunawayReport({ title: "Runaway response", details: [], dynamics: { setpoints: [], pass: true, assumptions: [],
 *   model: { runaway: { kind: "constantRate", rateCPerSecond: 1 } } } }, "text");
 * console.log(text.includes("do not certify a safety function")); // true
 * ```
 */
export function formatRunawayReport(report: RunawayReport, format: ReportFormat): string {
  const name = report.designName !== undefined ? `: ${report.designName}` : "";
  switch (format) {
    case "json":
      return `${JSON.stringify({ report: "runaway", caution: CAUTION_TEXT, title: report.title, ...(report.designName !== undefined ? { designName: report.designName } : {}), verdictUses: "dynamic peak", details: report.details, ...report.dynamics }, null, 2)}\n`;
    case "csv":
      return `# ${_cautionLine()}\n${report.details.map((d) => `# ${d}\n`).join("")}${_dynamicsCsv(report.dynamics)}`;
    case "markdown":
      return [
        `# ${report.title}${name}`,
        "",
        `**Result: ${report.dynamics.pass ? "PASS" : "FAIL"}** (verdict from the dynamic peak)`,
        "",
        `> **Caution.** ${CAUTION_TEXT}`,
        "",
        ...report.details.map((d) => `- ${d}`),
        ..._dynamicsMarkdownLines(report.dynamics).slice(1),
        "",
      ].join("\n");
    default: {
      const heading = `${report.title}${name} — ${report.dynamics.pass ? "PASS" : "FAIL"}`;
      return [heading, "=".repeat([...heading].length), "", ...report.details, ..._dynamicsTextLines(report.dynamics).slice(1), "", _cautionLine(), ""].join("\n");
    }
  }
}
