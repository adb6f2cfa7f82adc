/**
 * The response-time fold-in of a design file, shared by `check` and `runaway`: the design's `dynamics` section run
 * against each setpoint's static band (slowest unit at the worst-case band's high edge, nominal unit at the
 * nominal trip), noise slopes from the chain, the comparator's hysteresis; and the trip report with the verdict
 * taken from the dynamic peak. Library code (the workbench uses it too).
 * @internal
 * @module
 */
import type { DesignFile } from "../design/designSchema.js";
import type { RunawayResponse } from "../dynamics/simulateRunaway.js";
import { dynamicsModelFromDesign, measurementChainFromDesign } from "../design/designToObjects.js";
import type { TripReport, TripReportDynamics } from "../report/reportTypes.js";
import { chainSignalSlope, tripDynamics, type TripDynamicsResult } from "../trip/tripDynamics.js";

/**
 * Runs the design's dynamics against the static results of its trip report; undefined when the design states none.
 * @internal
 */
export function _tripDynamicsOfDesign(design: DesignFile, report: TripReport, maxPoints?: number): TripDynamicsResult | undefined {
  const model = dynamicsModelFromDesign(design);
  if (model === undefined) return undefined;
  const chain = measurementChainFromDesign(design);
  const hysteresisMillivolts = design.comparator?.hysteresisMillivolts;
  return tripDynamics({
    model,
    setpoints: report.setpoints.map((s) => {
      // The slowest unit trips at the worst-case band's high edge; the accepted band when worst case was not run.
      const band = s.bands.find((b) => b.method === "worst-case") ?? s.bands.find((b) => b.method === report.methods.acceptanceMethod) ?? s.bands[0];
      const slope = model.noise !== undefined && model.noise.sensitivityVoltsPerC === undefined ? chainSignalSlope({ type: chain.thermocouple.type, amplifier: chain.amplifier }, s.tripTemperatureC) : undefined;
      return {
        name: s.name,
        maxNormalOperatingC: s.maxNormalOperatingC,
        hazardLimitC: s.hazardLimitC,
        nominalTripC: s.nominalTripC,
        bandLowC: band?.lowC ?? s.nominalTripC,
        bandHighC: band?.highC ?? s.nominalTripC,
        lowSidePass: s.marginToNormalC > 0,
        staticPass: s.pass,
        ...(slope !== undefined ? { sensitivityVoltsPerC: slope.voltsPerC, sensitivitySource: slope.source } : {}),
      };
    }),
    ...(design.comparator !== undefined ? { comparatorHysteresisVolts: (hysteresisMillivolts ?? 0) / 1000 } : {}),
    ...(maxPoints !== undefined ? { maxPoints } : {}),
  });
}

/** The figures of a dynamic result without its time series. @internal */
export function _dynamicsFigures(result: TripDynamicsResult): TripReportDynamics {
  const { responses: _responses, ...figures } = result;
  return figures;
}

/**
 * The runaway `runaway --svg` charts (and the workbench beside the report): of the cases left by the filters
 * (`setpoint` name; `chartCase` "slowest" is each setpoint's first case, "nominal" its second), the one with the
 * smallest dynamic margin, and the chart's title. @internal
 */
export function _runawayToChart(
  design: DesignFile,
  result: TripDynamicsResult,
  filters: { readonly setpoint?: string | undefined; readonly chartCase?: string | undefined } = {},
): { readonly response: RunawayResponse; readonly title: string } {
  let chosen = { setpoint: 0, unit: 0 };
  let smallest = Infinity;
  result.setpoints.forEach((s, i) => {
    if (filters.setpoint !== undefined && s.name !== filters.setpoint) return;
    s.cases.forEach((c, k) => {
      if (filters.chartCase !== undefined && (filters.chartCase === "slowest") !== (k === 0)) return;
      if (c.dynamicMarginC < smallest) {
        smallest = c.dynamicMarginC;
        chosen = { setpoint: i, unit: k };
      }
    });
  });
  const response = result.responses[chosen.setpoint]?.[chosen.unit];
  const s = result.setpoints[chosen.setpoint];
  if (response === undefined || s === undefined) throw new Error("internal: no runaway to chart");
  return { response, title: `Runaway at "${s.name}": ${s.cases[chosen.unit]?.name ?? ""}${design.name !== undefined ? ` (${design.name})` : ""}` };
}

/**
 * The trip report with the dynamic results folded in: each setpoint's verdict and reason from the dynamic peak,
 * the report's verdict from them (a failure outside the setpoints, such as a reference problem, still fails).
 * @internal
 */
export function _foldDynamics(report: TripReport, result: TripDynamicsResult): TripReport {
  const staticSetpointsPass = report.setpoints.every((s) => s.pass);
  const otherFailure = staticSetpointsPass ? !report.pass : report.details.some((d) => d.startsWith("Reference problem:"));
  const setpoints = report.setpoints.map((s, i) => {
    const d = result.setpoints[i];
    return d === undefined ? s : { ...s, pass: d.pass, reason: `${d.reason} Static band: ${s.reason}` };
  });
  return {
    ...report,
    pass: !otherFailure && setpoints.every((s) => s.pass),
    setpoints,
    notes: [...report.notes, "The verdict uses the dynamic peak (runaway response) against the hazard limit; the static band decides the side of normal operation."],
    dynamics: _dynamicsFigures(result),
  };
}

/** The trip report, with the dynamics folded in when the design states them. @internal */
export function _withDesignDynamics(design: DesignFile, report: TripReport): TripReport {
  const result = _tripDynamicsOfDesign(design, report);
  return result === undefined ? report : _foldDynamics(report, result);
}
