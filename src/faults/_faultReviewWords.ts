/**
 * Words of the fault review: the sentences the review writes into its rows and notes, and the shared words
 * of its renderers.
 * @module
 * @internal
 */
import { _invalidChoice, _requireShape, type _Shape } from "../errors.js";
import type { _AlternativeResult, _Classification } from "./_faultClassification.js";
import type { Fault, FaultCategory, FaultCategoryCounts, FaultDetectionMethod, FaultReview, FaultReviewReport } from "./types.js";

/** @internal Category labels for tables. */
export const _categoryWords: Readonly<Record<FaultCategory, string>> = {
  "safe-detected": "safe, detected",
  "safe-undetected": "safe, undetected",
  "dangerous-detected": "DANGEROUS, detected",
  "dangerous-undetected": "DANGEROUS, undetected",
  degraded: "degraded",
  "no-effect": "no effect",
};

/** @internal The counts as label/value pairs. */
export function _countEntries(c: FaultCategoryCounts): [string, number][] {
  return [
    ["safe, detected", c.safeDetected],
    ["safe, undetected", c.safeUndetected],
    ["dangerous, detected", c.dangerousDetected],
    ["dangerous, undetected", c.dangerousUndetected],
    ["degraded", c.degraded],
    ["no effect", c.noEffect],
    ["total", c.total],
  ];
}

/** @internal One decimal, without a negative zero. */
export function _fmt1(x: number): string {
  const v = x.toFixed(1);
  return v === "-0.0" ? "0.0" : v;
}

/** @internal The line saying which band and threshold the classes were judged with. */
export function _bandLine(review: FaultReview): string {
  const band = review.healthyBandC;
  const judged =
    band === undefined || review.healthyBandGiven !== true
      ? "Classes judged with the nominal healthy trip (no worst-case band given)"
      : `Classes judged with the healthy worst-case band ${_fmt1(band.lowC)}–${_fmt1(band.highC)} °C moved by each fault's shift`;
  return `${judged}; a shift above ${review.noEffectThresholdC ?? 3} °C inside the limits is degraded, below it no effect.`;
}

const countsShape: _Shape = {
  safeDetected: "number",
  safeUndetected: "number",
  dangerousDetected: "number",
  dangerousUndetected: "number",
  degraded: "number",
  noEffect: "number",
  total: "number",
};
const strings: _Shape = ["array", "string"];

/** @internal What the renderers read of one fault review (and `faultReviewReport` checks of the reviews it is given). */
export const _reviewShape: _Shape = {
  name: "string",
  healthyTripC: "number",
  maxNormalOperatingC: "number",
  hazardLimitC: "number",
  healthyBandC: ["optional", { lowC: "number", highC: "number" }],
  noEffectThresholdC: ["optional", "number"],
  counts: countsShape,
  notes: strings,
  rows: [
    "array",
    {
      faultId: "string",
      element: "string",
      description: "string",
      effectText: "string",
      detectionText: "string",
      category: ["oneOf", ["safe-detected", "safe-undetected", "dangerous-detected", "dangerous-undetected", "degraded", "no-effect"]],
      tripC: ["nullable", "number"],
      shiftC: ["nullable", "number"],
      marginC: ["nullable", "number"],
      mitigations: strings,
    },
  ],
};

/** What the renderers read of a fault review report (checked at their entry, {@link _checkReport}). */
const reportShape: _Shape = {
  name: ["optional", "string"],
  scope: "string",
  caution: "string",
  counts: countsShape,
  reviews: ["array", _reviewShape],
};

/** @internal Checks that a value is a fault review report, field by field (the shared shape guard). */
export function _checkReport(report: unknown, context: string): FaultReviewReport {
  const ok = typeof report === "object" && report !== null && Array.isArray((report as { reviews?: unknown }).reviews);
  if (!ok) _invalidChoice("report", report, ["a fault review report"], context);
  _requireShape(report, reportShape, "report", context);
  return report as FaultReviewReport;
}

/** @internal Detection methods in words. */
export const _detectionWords: Readonly<Record<FaultDetectionMethod, string>> = {
  "out-of-range-window": "out-of-range window",
  "open-thermocouple-detection": "open-thermocouple detection",
  "second-comparator": "second comparator",
  "supervisory-reading": "supervisory reading",
};

/** @internal The sentence of a fault's effect on the trip (`fromC`/`toC`: the sweep, °C). */
export function _effectText(
  c: _Classification,
  alternatives: number,
  limits: { readonly maxNormalC: number; readonly hazardC: number; readonly fromC: number; readonly toC: number },
): string {
  let text: string;
  switch (c.effect) {
    case "trips-immediately":
      text = `trips immediately (already tripped at ${_fmt1(limits.fromC)} °C, the start of the sweep)`;
      break;
    case "never-trips":
      text = `never trips up to ${_fmt1(limits.toC)} °C`;
      break;
    case "no-change":
      text = `no change (trip moves ${_fmt1(c.shiftC as number)} °C)`;
      break;
    default: {
      const by = Math.abs(c.shiftC as number);
      text = `trips ${c.effect === "trips-early" ? "early" : "late"} by ${_fmt1(by)} °C, at ${_fmt1(c.tripC as number)} °C`;
      if ((c.tripC as number) <= limits.maxNormalC) text += " (within normal operation: a nuisance trip)";
      else if ((c.tripC as number) >= limits.hazardC) text += " (at or above the hazard limit)";
      else if (c.safety === "dangerous") text += " (the worst unit of the moved worst-case band reaches the hazard limit)";
      else if (c.safety === "safe") text += " (the worst unit of the moved worst-case band trips within normal operation)";
    }
  }
  if (c.safety === "degraded" && c.marginC !== null) text += `; degraded: the worst unit keeps ${_fmt1(c.marginC)} °C to the nearer limit`;
  if (c.worst.label !== undefined && alternatives > 1) text += ` [worst case: ${c.worst.label}]`;
  return text;
}

/** @internal The sentence of how a fault is detected (from which temperature, per method). */
export function _detectionText(c: _Classification, results: readonly _AlternativeResult[]): string {
  if (!c.detected) return "not detected";
  return c.detectedBy
    .map((m) => `${_detectionWords[m]} (from ${_fmt1(c.worst.firstFlagC.get(m) ?? ((results[0] as _AlternativeResult).firstFlagC.get(m) as number))} °C)`)
    .join("; ");
}

/** @internal The mitigations a row suggests. */
export function _mitigations(fault: Fault, c: _Classification): string[] {
  const out: string[] = [];
  if (c.safety === "degraded") {
    out.push("check that the margin left covers drift over the service life, or detect the shift");
  } else if (c.safety !== "no-effect") {
    if (fault.mitigation !== undefined) out.push(fault.mitigation);
    else if (!c.detected) out.push("a window comparator or supervisory reading that tells this fault from normal operation");
    if (c.safety === "dangerous") out.push("an independent, non-resettable thermal cutoff");
  }
  return out;
}

/** @internal Note: a method already flags the healthy chain from a temperature. */
export function _healthyFlagNote(method: FaultDetectionMethod, fromC: number): string {
  return `The ${_detectionWords[method]} flags the healthy chain from ${_fmt1(fromC)} °C; a fault counts as detected by it only where the healthy chain is not flagged.`;
}

/** @internal Why the healthy chain cannot be reviewed. */
export function _healthyTripProblem(immediate: boolean, fromC: number, toC: number): string {
  return immediate
    ? `is at the start of the sweep: the chain without faults is already tripped at the cold junction (${_fmt1(fromC)} °C)`
    : `is missing: the chain without faults does not trip up to ${_fmt1(toC)} °C`;
}

/** @internal The review's leading notes: sweep, healthy trip, open-circuit bias, output stage. */
export function _reviewNotes(r: {
  readonly coldJunctionC: number;
  readonly fromC: number;
  readonly toC: number;
  readonly stepC: number;
  readonly healthyTripC: number;
  readonly intendedTripC: number | undefined;
  readonly maxNormalC: number;
  readonly hazardC: number;
  readonly bias: "pull-up" | "pull-down" | "none";
  readonly biasMv: number;
  readonly outputStage: string;
  readonly outputStageAssumed: boolean;
  readonly bandC: { readonly lowC: number; readonly highC: number };
  readonly bandGiven: boolean;
  readonly noEffectC: number;
}): string[] {
  const bandNote = r.bandGiven
    ? `Faults judged with the healthy worst-case band ${_fmt1(r.bandC.lowC)}–${_fmt1(r.bandC.highC)} °C moved by each fault's shift: dangerous when its top reaches the hazard limit, safe when its bottom reaches normal operation, degraded when the shift exceeds ${r.noEffectC} °C inside the limits (margin given), else no effect.`
    : `No worst-case band given: faults judged with the nominal healthy trip alone (a zero-width band); degraded when the shift exceeds ${r.noEffectC} °C inside the limits, else no effect.`;
  const crossing: string[] = [];
  if (r.bandC.highC >= r.hazardC) crossing.push(`The healthy worst-case band already reaches the hazard limit (${_fmt1(r.bandC.highC)} °C): every fault that does not pull the trip down counts as dangerous.`);
  if (r.bandC.lowC <= r.maxNormalC) crossing.push(`The healthy worst-case band already reaches down to normal operation (${_fmt1(r.bandC.lowC)} °C).`);
  return [
    `Cold junction held at ${_fmt1(r.coldJunctionC)} °C; hot junction swept from ${_fmt1(r.fromC)} to ${_fmt1(r.toC)} °C in ${r.stepC} °C steps (trips refined to 0.001 °C); every error source at its nominal value.`,
    `Healthy trip of the modelled chain: ${_fmt1(r.healthyTripC)} °C${r.intendedTripC !== undefined ? ` (intended ${_fmt1(r.intendedTripC)} °C)` : ""}; normal operation up to ${_fmt1(r.maxNormalC)} °C, hazard limit ${_fmt1(r.hazardC)} °C.`,
    r.bias === "none"
      ? "Open-circuit bias: none stated, so an open thermocouple input is taken as floating (up, near zero or down; the worst counts)."
      : `Open-circuit bias: ${r.bias} (an open input is driven ${r.bias === "pull-up" ? "up" : "down"} by ${r.biasMv} mV).`,
    `Output stage: ${r.outputStage}${r.outputStageAssumed ? " (assumed; state it if the design de-energises to trip)" : ""}.`,
    bandNote,
    ...crossing,
  ];
}

/** A temperature display for the review's renderers (kept free of the report entry: plain functions). @internal */
export interface _FaultDisplay {
  readonly unit: "C" | "F" | "K";
  readonly symbol: string;
  readonly at: (temperatureC: number) => number;
  readonly diff: (differenceC: number) => number;
}

/** The display of a unit for the fault review (°C default; °F and K as in every design report). @internal */
export function _faultDisplay(unit: "C" | "F" | "K" | undefined, context: string): _FaultDisplay {
  const clean = (v: number): number => Number(v.toPrecision(15));
  if (unit === undefined || unit === "C") return { unit: "C", symbol: "°C", at: (t) => t, diff: (d) => d };
  if (unit === "F") return { unit, symbol: "°F", at: (t) => clean(t * 1.8 + 32), diff: (d) => clean(d * 1.8) };
  if (unit === "K") return { unit, symbol: "K", at: (t) => clean(t + 273.15), diff: (d) => d };
  return _invalidChoice("temperature unit", unit, ["C", "F", "K"], context);
}

/**
 * Which figures of the review's own sentences are temperature differences (scale only): the word before each
 * figure says so, or a leading `+`. Every other "<n> °C" of those sentences is an absolute temperature (offset and
 * scale), and so are both ends of a range "<a>–<b> °C" / "<a> to <b> °C".
 */
const differenceBefore = /(?:moves|by|keeps|above|exceeds|in|refined to|drift runs on to)\s*$/;

function _shown(value: number, decimals: number, plus: boolean): string {
  const text = value.toFixed(Math.max(decimals, 1));
  return plus && value > 0 ? `+${text}` : text;
}

const figure = "([+−-]?)(\\d+(?:\\.\\d+)?)";

/**
 * A sentence of the review (effect, detection, notes, descriptions) with its °C figures in the display unit:
 * differences (a shift, a margin, a threshold, a step) by the scale, temperatures with the offset; the same text
 * in °C. `tests/faults/displayUnit.test.ts` checks that no °C figure is left in the examples' reviews. @internal
 */
export function _sentenceInUnit(text: string, d: _FaultDisplay): string {
  if (d.unit === "C") return text;
  const read = (sign: string, digits: string): { value: number; decimals: number } => ({
    value: Number(digits) * (sign === "−" || sign === "-" ? -1 : 1),
    decimals: digits.includes(".") ? (digits.split(".")[1] as string).length : 0,
  });
  const ranges = new RegExp(`${figure}(–| to )${figure} ?°C`, "g");
  const withRanges = text.replace(ranges, (_m, s1: string, d1: string, joiner: string, s2: string, d2: string) => {
    const a = read(s1, d1);
    const b = read(s2, d2);
    return `${_shown(d.at(a.value), a.decimals, false)}${joiner}${_shown(d.at(b.value), b.decimals, false)} ${d.symbol}`;
  });
  const singles = new RegExp(`${figure} ?°C`, "g");
  return withRanges.replace(singles, (_m, sign: string, digits: string, offset: number, whole: string) => {
    const { value, decimals } = read(sign, digits);
    const isDifference = sign === "+" || differenceBefore.test(whole.slice(Math.max(0, offset - 24), offset));
    return `${_shown(isDifference ? d.diff(value) : d.at(value), decimals, sign === "+")} ${d.symbol}`;
  });
}
