/**
 * Gathers setpoint summaries, two-channel pairs and curves into one report with the scope, the
 * no-certification statement and the safety caution.
 * @module
 */
import { _invalidChoice, _requireFiniteData, _requireOptionsObject } from "../errors.js";
import { _checkSafetyReport } from "./_safetyWords.js";
import { CAUTION_TEXT } from "../caution.js";
import type { PfdAvgCurve, SafetyFiguresReport, SetpointSafetyFigures, TwoChannelCutout } from "./types.js";

/**
 * What the safety figures cover, in words.
 * @example
 * ```ts
 * import { safetyFiguresScope } from "hotjunction";
 * console.log(safetyFiguresScope.startsWith("Single faults of the modelled elements")); // true
 * ```
 */
export const safetyFiguresScope: string =
  "Single faults of the modelled elements only, each classified by the single-fault review against the healthy " +
  "worst-case trip band; failure rates and mode shares are supplied by the user and the package ships none. " +
  "Faults that no failure mode names carry no rate. PFDavg and PFH use the simplified equations of IEC 61508-6 " +
  "Annex B (λ·T ≪ 1, constant rates); software, systematic failures and multiple faults beyond the common-cause " +
  "factor are not covered.";

/**
 * The no-certification statement of every safety-figures report.
 * @example
 * ```ts
 * import { safetyFiguresCertification } from "hotjunction";
 * console.log(safetyFiguresCertification.includes("no certification")); // true
 * ```
 */
export const safetyFiguresCertification: string =
  "These figures use the vocabulary and equations of the functional-safety standards; no certification, " +
  "safety integrity level or compliance is claimed or implied. A safety case needs the full analysis, " +
  "systematic capability and independent assessment the standards require.";

/** Input of {@link safetyFiguresReport}. */
export interface SafetyFiguresReportInput {
  readonly name?: string;
  readonly setpoints?: readonly SetpointSafetyFigures[];
  readonly twoChannel?: readonly TwoChannelCutout[];
  readonly curves?: readonly PfdAvgCurve[];
}

/**
 * A report of safety figures with the scope, the no-certification statement and the caution.
 * @param input - setpoint summaries ({@link safetyFigures}), pairs ({@link twoChannelCutout}), curves ({@link pfdAvgCurve})
 * @returns the report (plain, JSON-ready)
 * @throws HotjunctionRangeError when a part is given but is not an array
 * @example
 * ```ts
 * import { safetyFiguresReport } from "hotjunction";
 * const report = safetyFiguresReport({ name: "kiln" });
 * console.log(report.setpoints.length, report.caution.startsWith("These numbers do not certify")); // 0 true
 * ```
 */
export function safetyFiguresReport(input: SafetyFiguresReportInput = {}): SafetyFiguresReport {
  const context = "safetyFiguresReport";
  _requireOptionsObject(input, context, false);
  for (const key of ["setpoints", "twoChannel", "curves"] as const) {
    const v = input[key];
    if (v !== undefined && !Array.isArray(v)) _invalidChoice(key, v, ["an array"], context);
  }
  // the parts are checked as the renderers will read them (one shape guard), so a forged part is refused here;
  // they are returned as they are: no NaN or ±Infinity in any field, whatever its kind
  _requireFiniteData(input, "input", context);
  return _checkSafetyReport({
    ...(input.name !== undefined ? { name: input.name } : {}),
    setpoints: input.setpoints ?? [],
    twoChannel: input.twoChannel ?? [],
    curves: input.curves ?? [],
    scope: safetyFiguresScope,
    certification: safetyFiguresCertification,
    caution: CAUTION_TEXT,
  }, context);
}
