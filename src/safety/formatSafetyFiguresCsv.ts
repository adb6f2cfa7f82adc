/**
 * CSV rendering of a safety-figures report.
 * @module
 */
import { _csvField } from "../csvField.js";
import { _checkSafetyReport } from "./_safetyWords.js";
import type { SafetyFiguresReport } from "./types.js";


function row(values: readonly (string | number | boolean | null)[]): string {
  return values.map(_csvField).join(",");
}

/**
 * The report as CSV (RFC 4180 quoting, "\n" line ends), one figure per line so a spreadsheet can filter it:
 * columns `section,name,item,quantity,value,unit`. Sections: `setpoint` (λ_SD … λ_DU and totals in FIT, SFF, DC,
 * proof-test coverage, PFDavg, PFH, T1, MTTR), `mode` (each element's mode: share, rate in FIT, where counted),
 * `pair` (1oo2: β, β_D, PFDavg, PFH, the common-cause share, what the second channel buys, each channel alone),
 * `beta` (the β table), `curve` (PFDavg against T1) and `statement` (scope, no-certification statement,
 * caution). Numbers are written in full precision (JavaScript's shortest round-trip form); an undefined figure
 * is an empty field.
 * @param input - from {@link safetyFiguresReport}
 * @returns CSV text with a header line, ending with a newline
 * @throws HotjunctionRangeError when `input` is not a safety-figures report
 * @example
 * ```ts
 * import { formatSafetyFiguresCsv, safetyFiguresReport } from "hotjunction";
 * const csv = formatSafetyFiguresCsv(safetyFiguresReport({ name: "kiln" }));
 * console.log(csv.split("\n")[0]); // "section,name,item,quantity,value,unit"
 * console.log(csv.includes("statement,kiln,,caution,")); // true
 * ```
 */
export function formatSafetyFiguresCsv(input: SafetyFiguresReport): string {
  const report = _checkSafetyReport(input, "formatSafetyFiguresCsv");
  const lines: string[] = [row(["section", "name", "item", "quantity", "value", "unit"])];
  for (const s of report.setpoints) {
    const put = (quantity: string, value: number | null, unit: string): void => {
      lines.push(row(["setpoint", s.name, "", quantity, value, unit]));
    };
    put("lambdaSdFit", s.lambdaSdFit, "FIT");
    put("lambdaSuFit", s.lambdaSuFit, "FIT");
    put("lambdaDdFit", s.lambdaDdFit, "FIT");
    put("lambdaDuFit", s.lambdaDuFit, "FIT");
    put("lambdaSafeFit", s.lambdaSafeFit, "FIT");
    put("lambdaDangerousFit", s.lambdaDangerousFit, "FIT");
    put("lambdaDegradedFit", s.lambdaDegradedFit, "FIT");
    put("lambdaNoEffectFit", s.lambdaNoEffectFit, "FIT");
    put("lambdaTotalFit", s.lambdaTotalFit, "FIT");
    put("safeFailureFraction", s.safeFailureFraction, "fraction");
    put("diagnosticCoverage", s.diagnosticCoverage, "fraction");
    put("proofTestCoverage", s.proofTestCoverage, "fraction");
    put("noEffectThresholdC", s.noEffectThresholdC, "°C");
    if (s.pfdAvg1oo1 !== null) {
      put("proofTestIntervalHours", s.pfdAvg1oo1.proofTest.proofTestIntervalHours, "h");
      put("meanTimeToRestorationHours", s.pfdAvg1oo1.proofTest.meanTimeToRestorationHours, "h");
      put("meanRepairTimeHours", s.pfdAvg1oo1.proofTest.meanRepairTimeHours, "h");
      put("missionTimeHours", s.pfdAvg1oo1.proofTest.missionTimeHours, "h");
      put("pfdAvg1oo1", s.pfdAvg1oo1.pfdAvg, "probability");
    }
    if (s.pfh1oo1 !== null) put("pfh1oo1PerHour", s.pfh1oo1.pfhPerHour, "1/h");
    for (const m of s.modes) {
      const item = `${m.element}: ${m.mode}`;
      lines.push(row(["mode", s.name, item, "share", m.share, "fraction"]));
      lines.push(row(["mode", s.name, item, "rateFit", m.rateFit, "FIT"]));
      lines.push(row(["mode", s.name, item, "counted", m.counted, m.faultId ?? "assumed"]));
    }
  }
  for (const t of report.twoChannel) {
    const name = `${t.channelA.name} + ${t.channelB.name}`;
    const put = (quantity: string, value: number | null, unit: string): void => {
      lines.push(row(["pair", name, "", quantity, value, unit]));
    };
    put("beta", t.beta, "fraction");
    put("betaD", t.betaD, "fraction");
    put("channelA.pfdAvg1oo1", t.channelA.pfdAvg1oo1, "probability");
    put("channelB.pfdAvg1oo1", t.channelB.pfdAvg1oo1, "probability");
    put("pfdAvg1oo2", t.pfdAvg1oo2, "probability");
    put("independentPfd", t.independentPfd, "probability");
    put("commonCausePfd", t.commonCausePfd, "probability");
    put("commonCauseShare", t.commonCauseShare, "fraction");
    put("pfh1oo2PerHour", t.pfh1oo2PerHour, "1/h");
    put("improvementFactor", t.improvementFactor, "ratio");
    put("improvementFactorWithoutCommonCause", t.improvementFactorWithoutCommonCause, "ratio");
    for (const b of t.betaSensitivity) {
      const item = `beta ${b.beta}`;
      lines.push(row(["beta", name, item, "betaD", b.betaD, "fraction"]));
      lines.push(row(["beta", name, item, "pfdAvg1oo2", b.pfdAvg1oo2, "probability"]));
      lines.push(row(["beta", name, item, "improvementFactor", b.improvementFactor, "ratio"]));
    }
  }
  for (const c of report.curves) {
    const name = c.pairName === null ? c.channelName : `${c.channelName} / ${c.pairName}`;
    for (const p of c.points) {
      const item = `T1 ${p.proofTestIntervalHours} h`;
      lines.push(row(["curve", name, item, "pfdAvg1oo1", p.pfdAvg1oo1, "probability"]));
      if (p.pfdAvg1oo2 !== null) lines.push(row(["curve", name, item, "pfdAvg1oo2", p.pfdAvg1oo2, "probability"]));
    }
  }
  const reportName = report.name ?? "";
  lines.push(row(["statement", reportName, "", "scope", report.scope, ""]));
  lines.push(row(["statement", reportName, "", "certification", report.certification, ""]));
  lines.push(row(["statement", reportName, "", "caution", report.caution, ""]));
  return `${lines.join("\n")}\n`;
}
