/**
 * Trip report of a design whose detector is an ADC: firmware trips when the indicated temperature reaches the
 * setpoint. The chain is evaluated at each setpoint; with reading error e = indicated − true in [eLow, eHigh],
 * the firmware trips at a true temperature in [setpoint − eHigh, setpoint − eLow] (first order: the error
 * changes little over the width of the band).
 * @module
 */
import type { ChainEvaluation } from "../chain/types.js";
import type { TripBand } from "../trip/types.js";
import { _enclosureGapToleranceC } from "../uncertainty/types.js";
import type { ReportMethodInfo, TripReport, TripReportSetpoint } from "./reportTypes.js";
import { _requireFiniteResult, _requireShape, HotjunctionRangeError, type _Shape } from "../errors.js";
import { _methodInfoShape } from "./_reportShapes.js";

/** What {@link firmwareTripReport} reads of a chain evaluation (checked at its entry). */
const evaluationShape: _Shape = {
  hotJunctionC: "number",
  indicatedC: "number",
  bounds: ["array", { method: ["oneOf", ["worst-case", "rss", "monte-carlo"]], errorLowC: "number", errorHighC: "number", coverage: "number", standardUncertaintyC: "number" }],
  contributions: ["array", { source: "string", description: "string", worstCaseSwingC: "number", standardUncertaintyC: "number" }],
};

/**
 * The worst-case bracket of a band from the reading error's: the band is setpoint − error, so its low edge comes
 * from the error's high end (and the gaps swap sides). The gaps are those of the reading model's enclosure, and
 * `_enclosureGapToleranceC` (1e-9 °C) is the largest we state (tests/chain/readingEnclosure.test.ts).
 */
function bracketOf(setpointC: number, trueC: number, b: ChainEvaluation["bounds"][number]): Partial<TripBand> {
  if (b.method !== "worst-case" || b.enclosureLowC === undefined || b.enclosureHighC === undefined) return {};
  return {
    enclosureLowC: setpointC - (b.enclosureHighC - trueC),
    enclosureHighC: setpointC - (b.enclosureLowC - trueC),
    ...(b.enclosureGapHighC !== undefined ? { enclosureGapLowC: b.enclosureGapHighC } : {}),
    ...(b.enclosureGapLowC !== undefined ? { enclosureGapHighC: b.enclosureGapLowC } : {}),
    enclosureGapToleranceC: _enclosureGapToleranceC,
  };
}

/** A setpoint of a firmware-trip design. */
export interface FirmwareTripSetpoint {
  readonly name: string;
  readonly tripTemperatureC: number;
  readonly maxNormalOperatingC: number;
  readonly hazardLimitC: number;
}

/**
 * Builds the trip report of a firmware (ADC) trip from chain evaluations at the setpoints.
 * @param setpoints - setpoints with their limits, °C
 * @param evaluations - `evaluateChain` at each setpoint's temperature, same order
 * @param methods - methods, coverage, trials and seed used (acceptanceMethod decides pass/fail)
 * @param details - lines describing the hardware
 * @returns report data for `formatTripReport` and `tripBandChartSvg`
 * @example
 * ```ts
 * import { firmwareTripReport } from "hotjunction/report";
 * const report = firmwareTripReport(
 *   [{ name: "plate", tripTemperatureC: 90, maxNormalOperatingC: 80, hazardLimitC: 100 }],
 *   [{ hotJunctionC: 90, reading: { volts: 1 }, indicatedC: 90.2, contributions: [],
 *      bounds: [{ method: "worst-case", estimateC: 90.2, lowC: 88, highC: 92.5, errorLowC: -2, errorHighC: 2.5, standardUncertaintyC: 0, coverage: 1, note: "" }] }],
 *   { methods: ["worst-case"], acceptanceMethod: "worst-case", coverage: 0.95 },
 * );
 * console.log(report.setpoints[0]?.bands[0]?.lowC, report.setpoints[0]?.bands[0]?.highC); // 87.5 92
 * ```
 */
export function firmwareTripReport(
  setpoints: readonly FirmwareTripSetpoint[],
  evaluations: readonly ChainEvaluation[],
  methods: ReportMethodInfo,
  details: readonly string[] = [],
): TripReport {
  const context = "firmwareTripReport";
  _requireShape(setpoints, ["array", { name: "string", tripTemperatureC: "number", maxNormalOperatingC: "number", hazardLimitC: "number" }], "setpoints", context);
  _requireShape(evaluations, ["array", evaluationShape], "evaluations", context);
  _requireShape(methods, _methodInfoShape, "methods", context);
  _requireShape(details, ["array", "string"], "details", context);
  const acceptance = methods.acceptanceMethod ?? "worst-case";
  const rows: TripReportSetpoint[] = setpoints.map((s, i) => {
    const evaluation = evaluations[i];
    if (evaluation === undefined || evaluation.bounds.length === 0) {
      throw new HotjunctionRangeError({
        code: "INVALID_OPTION",
        quantity: `evaluations[${i}]`,
        value: evaluation,
        context,
        problem: `is missing or has no bounds: setpoint ${JSON.stringify(s.name)} needs a chain evaluation with at least one band`,
      });
    }
    const bands: TripBand[] = evaluation.bounds.map((b) => ({
      method: b.method,
      lowC: s.tripTemperatureC - b.errorHighC,
      highC: s.tripTemperatureC - b.errorLowC,
      coverage: b.coverage,
      standardUncertaintyC: b.standardUncertaintyC,
      ...(b.method === "monte-carlo" && methods.trials !== undefined ? { trials: methods.trials } : {}),
      ...(b.method === "monte-carlo" && methods.seed !== undefined ? { seed: methods.seed } : {}),
      ...bracketOf(s.tripTemperatureC, evaluation.hotJunctionC, b),
    }));
    for (const [k, b] of bands.entries()) {
      _requireFiniteResult(b.lowC, `evaluations[${i}].bounds[${k}].errorHighC`, evaluation.bounds[k]!.errorHighC, "°C", context);
      _requireFiniteResult(b.highC, `evaluations[${i}].bounds[${k}].errorLowC`, evaluation.bounds[k]!.errorLowC, "°C", context);
    }
    const judged = bands.find((b) => b.method === acceptance) ?? bands[0]!;
    const marginToNormalC = _requireFiniteResult(judged.lowC - s.maxNormalOperatingC, `setpoints[${i}].maxNormalOperatingC`, s.maxNormalOperatingC, "°C", context);
    const marginToHazardC = _requireFiniteResult(s.hazardLimitC - judged.highC, `setpoints[${i}].hazardLimitC`, s.hazardLimitC, "°C", context);
    const pass = marginToNormalC > 0 && marginToHazardC > 0;
    const reason = pass
      ? `the ${acceptance} band lies above the highest normal operating temperature and below the hazard limit`
      : marginToNormalC <= 0
        ? `the ${acceptance} band reaches down to the normal operating range (nuisance trips possible)`
        : `the ${acceptance} band reaches the hazard limit (the trip may come too late)`;
    return {
      name: s.name,
      tripTemperatureC: s.tripTemperatureC,
      nominalTripC: _requireFiniteResult(s.tripTemperatureC - (evaluation.indicatedC - evaluation.hotJunctionC), `evaluations[${i}].indicatedC`, evaluation.indicatedC, "°C", context),
      bands,
      maxNormalOperatingC: s.maxNormalOperatingC,
      hazardLimitC: s.hazardLimitC,
      marginToNormalC,
      marginToHazardC,
      pass,
      reason,
      errorSources: [...evaluation.contributions]
        // worstCaseSwingC is the full swing (max − min); the report prints the half-width (±), as comparator reports do.
        .sort((a, b) => b.worstCaseSwingC - a.worstCaseSwingC)
        .map((c) => ({ name: c.source, description: c.description, worstCaseC: c.worstCaseSwingC / 2, standardUncertaintyC: c.standardUncertaintyC })),
    };
  });
  return {
    title: "Firmware trip check",
    pass: rows.every((r) => r.pass),
    setpoints: rows,
    details,
    notes: [
      "Firmware trips when the indicated temperature reaches the setpoint; the true trip temperature is the setpoint minus the reading error, evaluated at the setpoint (first order).",
    ],
    methods: { ...methods, acceptanceMethod: acceptance },
  };
}
