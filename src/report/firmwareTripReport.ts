/**
 * Trip report of a design whose detector is an ADC: firmware trips when the indicated temperature reaches the
 * setpoint. The chain is evaluated at each setpoint; with reading error e = indicated − true in [eLow, eHigh],
 * the firmware trips at a true temperature in [setpoint − eHigh, setpoint − eLow] (first order: the error
 * changes little over the width of the band).
 * @module
 */
import type { ChainEvaluation } from "../chain/types.js";
import type { TripBand } from "../trip/types.js";
import type { ReportMethodInfo, TripReport, TripReportSetpoint } from "./reportTypes.js";

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
  const acceptance = methods.acceptanceMethod ?? "worst-case";
  const rows: TripReportSetpoint[] = setpoints.map((s, i) => {
    const evaluation = evaluations[i];
    if (evaluation === undefined) throw new Error(`no chain evaluation for setpoint ${s.name}`);
    const bands: TripBand[] = evaluation.bounds.map((b) => ({
      method: b.method,
      lowC: s.tripTemperatureC - b.errorHighC,
      highC: s.tripTemperatureC - b.errorLowC,
      coverage: b.coverage,
      standardUncertaintyC: b.standardUncertaintyC,
      ...(b.method === "monte-carlo" && methods.trials !== undefined ? { trials: methods.trials } : {}),
      ...(b.method === "monte-carlo" && methods.seed !== undefined ? { seed: methods.seed } : {}),
    }));
    const judged = bands.find((b) => b.method === acceptance) ?? bands[0];
    const marginToNormalC = judged === undefined ? Number.NaN : judged.lowC - s.maxNormalOperatingC;
    const marginToHazardC = judged === undefined ? Number.NaN : s.hazardLimitC - judged.highC;
    const pass = marginToNormalC > 0 && marginToHazardC > 0;
    const reason = pass
      ? `the ${acceptance} band lies above the highest normal operating temperature and below the hazard limit`
      : marginToNormalC <= 0
        ? `the ${acceptance} band reaches down to the normal operating range (nuisance trips possible)`
        : `the ${acceptance} band reaches the hazard limit (the trip may come too late)`;
    return {
      name: s.name,
      tripTemperatureC: s.tripTemperatureC,
      nominalTripC: s.tripTemperatureC - (evaluation.indicatedC - evaluation.hotJunctionC),
      bands,
      maxNormalOperatingC: s.maxNormalOperatingC,
      hazardLimitC: s.hazardLimitC,
      marginToNormalC,
      marginToHazardC,
      pass,
      reason,
      errorSources: [...evaluation.contributions]
        .sort((a, b) => b.worstCaseSwingC - a.worstCaseSwingC)
        .map((c) => ({ name: c.source, description: c.description, worstCaseC: c.worstCaseSwingC, standardUncertaintyC: c.standardUncertaintyC })),
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
