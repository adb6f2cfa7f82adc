/**
 * The ADC side of a design file's trip report, shared by `check` (and `compare`, `runaway` through it) and the
 * workbench: the build sheet of an ADC design (threshold codes, code slope and band, bill of materials) and the
 * full-scale verdict (a threshold code beyond the converter's largest code can never trip).
 * @internal
 * @module
 */
import { readingFromChain } from "../chain/readingFromChain.js";
import type { ChainEvaluation, MeasurementChain } from "../chain/types.js";
import type { DesignFile } from "../design/designSchema.js";
import type { TripReport } from "../report/reportTypes.js";
import { thermocouplePart } from "../trip/buildSheet.js";
import type { BuildSheetAdcSetpoint, BuildSheetPart, TripBuildSheet } from "../trip/types.js";

/**
 * An ADC design whose firmware threshold code lies beyond the converter's largest code (2^bits − 1) can never trip:
 * the reading saturates below it. Such a setpoint fails, whatever its bands say, with the reason in figures (the
 * signal at the setpoint against the full scale). The bands of a saturating chain are not a trip band. @internal
 */
export function _withAdcFullScale(report: TripReport, bits: number, fullScaleVolts: number): TripReport {
  const maxCode = 2 ** bits - 1;
  const sheet = report.buildSheet;
  if (sheet === undefined || !(bits >= 1)) return report;
  let changed = false;
  const setpoints = report.setpoints.map((s) => {
    const code = sheet.adcSetpoints.find((a) => a.name === s.name);
    if (code === undefined || code.thresholdCode <= maxCode) return s;
    changed = true;
    return {
      ...s,
      pass: false,
      reason:
        `the ADC saturates: the signal at the setpoint is ${code.signalVolts.toFixed(4)} V, beyond the full scale ${fullScaleVolts} V ` +
        `(threshold code ${code.thresholdCode} above the largest code ${maxCode} of ${bits} bits), so the firmware never sees the trip; lower the gain or raise the full scale.`,
    };
  });
  return changed ? { ...report, setpoints, pass: false } : report;
}

/** An ADC chain's reading always carries its code; a reading without one is a bug, said so (never a NaN code). */
function adcCode(code: number | undefined, setpoint: string): number {
  if (code === undefined) throw new Error(`internal: the ADC chain gave no code at setpoint "${setpoint}"`);
  return code;
}

/**
 * The build sheet of an ADC design: per setpoint the nominal code at the setpoint, the integer code firmware
 * compares against (the smallest integer at or above the nominal unrounded code, so the trip comes no earlier),
 * the code slope and the band of the code read at the true setpoint (slope × the acceptance band's reading
 * error, first order); the bill of materials (reference, thermocouple). @internal
 */
export function _adcBuildSheet(design: DesignFile, chain: MeasurementChain, report: TripReport, evaluations: readonly ChainEvaluation[]): TripBuildSheet {
  const acceptance = report.methods.acceptanceMethod ?? "worst-case";
  const adcSetpoints: BuildSheetAdcSetpoint[] = report.setpoints.map((s, i) => {
    const evaluation = evaluations[i] as ChainEvaluation;
    const t = s.tripTemperatureC;
    const stepC = 0.05;
    const up = adcCode(readingFromChain(chain, t + stepC).code, s.name);
    const down = adcCode(readingFromChain(chain, t - stepC).code, s.name);
    const codesPerC = (up - down) / (2 * stepC);
    const nominalCode = adcCode(evaluation.reading.code, s.name);
    const bound = evaluation.bounds.find((b) => b.method === acceptance) ?? evaluation.bounds[0];
    const errLow = bound?.errorLowC ?? 0;
    const errHigh = bound?.errorHighC ?? 0;
    return {
      name: s.name,
      signalVolts: evaluation.reading.volts,
      nominalCode,
      thresholdCode: Math.ceil(nominalCode - 1e-9),
      codesPerC,
      codeLow: nominalCode + codesPerC * errLow,
      codeHigh: nominalCode + codesPerC * errHigh,
    };
  });
  const reference = design.reference;
  const parts: BuildSheetPart[] = [];
  if (reference.kind !== "ideal") {
    const tolerance = "initialAccuracyFraction" in reference ? (reference.initialAccuracyFraction ?? 0) : "totalToleranceFraction" in reference ? (reference.totalToleranceFraction ?? 0) : 0;
    const tempco = "tempcoPpmPerC" in reference ? (reference.tempcoPpmPerC ?? 0) : 0;
    parts.push({ designators: "reference", part: "reference", value: reference.nominalVolts, unit: "V", tolerance, toleranceUnit: "fraction", tempcoPpmPerC: tempco, count: 1 });
  }
  const first = evaluations[0]?.contributions.find((c) => c.source === "thermocouple.tolerance");
  parts.push(thermocouplePart(chain.thermocouple, first?.limit ?? 0));
  return { sheetVersion: 1, setpoints: [], adcSetpoints, networks: [], parts };
}
