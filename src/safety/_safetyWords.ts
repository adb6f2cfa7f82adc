/**
 * Shared words and number formats of the safety-figures renderers.
 * @module
 * @internal
 */
import { _invalidChoice, _requireShape, type _Shape } from "../errors.js";
import type { SafetyFiguresReport, SetpointSafetyFigures, TwoChannelCutout } from "./types.js";

/** @internal A rate in FIT, 4 significant digits. */
export function _fit(x: number): string {
  return x === 0 ? "0" : String(+x.toPrecision(4));
}

/** @internal A probability or per-hour figure in exponent form. */
export function _exp(x: number): string {
  return x === 0 ? "0" : x.toExponential(2);
}

/** @internal A fraction as a percentage (or "—" for null). */
export function _pct(x: number | null): string {
  return x === null ? "—" : `${(x * 100).toFixed(1)} %`;
}

/** @internal Hours, 6 significant digits. */
export function _hours(x: number | null): string {
  return x === null ? "—" : `${+x.toPrecision(6)} h`;
}

/** @internal A ratio like "×12.3" (or "—"). */
export function _times(x: number | null): string {
  return x === null ? "—" : `×${x >= 100 ? x.toFixed(0) : x.toPrecision(3)}`;
}

/** @internal The rates of a setpoint as label/value pairs. */
export function _rateEntries(s: SetpointSafetyFigures): [string, string][] {
  return [
    ["λ_SD (safe, detected)", `${_fit(s.lambdaSdFit)} FIT`],
    ["λ_SU (safe, undetected)", `${_fit(s.lambdaSuFit)} FIT`],
    ["λ_DD (dangerous, detected)", `${_fit(s.lambdaDdFit)} FIT`],
    ["λ_DU (dangerous, undetected)", `${_fit(s.lambdaDuFit)} FIT`],
    ["λ_S", `${_fit(s.lambdaSafeFit)} FIT`],
    ["λ_D", `${_fit(s.lambdaDangerousFit)} FIT`],
    ["degraded", `${_fit(s.lambdaDegradedFit)} FIT`],
    ["no effect", `${_fit(s.lambdaNoEffectFit)} FIT`],
    ["total", `${_fit(s.lambdaTotalFit)} FIT`],
    ["safe failure fraction (SFF)", _pct(s.safeFailureFraction)],
    ["diagnostic coverage (DC)", _pct(s.diagnosticCoverage)],
    ...(s.pfdAvg1oo1 === null
      ? []
      : ([
          ["proof-test interval T1", _hours(s.pfdAvg1oo1.proofTest.proofTestIntervalHours)],
          ["MTTR / MRT", `${_hours(s.pfdAvg1oo1.proofTest.meanTimeToRestorationHours)} / ${_hours(s.pfdAvg1oo1.proofTest.meanRepairTimeHours)}`],
          ["proof-test coverage (PTC)", _pct(s.proofTestCoverage)],
          ...(s.pfdAvg1oo1.proofTest.missionTimeHours !== null ? [["mission time T_M", _hours(s.pfdAvg1oo1.proofTest.missionTimeHours)] as [string, string]] : []),
          ["PFDavg (1oo1)", _exp(s.pfdAvg1oo1.pfdAvg)],
          ["PFH (1oo1)", `${_exp(s.pfh1oo1?.pfhPerHour ?? 0)} /h`],
        ] as [string, string][])),
  ];
}

/** @internal The figures of a pair as label/value pairs. */
export function _pairEntries(t: TwoChannelCutout): [string, string][] {
  return [
    [`PFDavg ${t.channelA.name} alone (1oo1)`, _exp(t.channelA.pfdAvg1oo1)],
    [`PFDavg ${t.channelB.name} alone (1oo1)`, _exp(t.channelB.pfdAvg1oo1)],
    ["β / β_D", `${_pct(t.beta)} / ${_pct(t.betaD)}`],
    ["PFDavg pair (1oo2)", _exp(t.pfdAvg1oo2)],
    ["  independent term", _exp(t.independentPfd)],
    ["  common-cause term", _exp(t.commonCausePfd)],
    ["common-cause share of the pair", _pct(t.commonCauseShare)],
    ["PFH pair (1oo2)", `${_exp(t.pfh1oo2PerHour)} /h`],
    ["second channel buys (better single / pair)", _times(t.improvementFactor)],
    ["... with no common cause (β = β_D = 0)", _times(t.improvementFactorWithoutCommonCause)],
  ];
}

const n: _Shape = "number";
const nullableNumber: _Shape = ["nullable", "number"];
const strings: _Shape = ["array", "string"];
const f: _Shape = "fraction";
const nullableFraction: _Shape = ["nullable", "fraction"];
const proofTestShape: _Shape = { proofTestIntervalHours: n, meanTimeToRestorationHours: n, meanRepairTimeHours: n, proofTestCoverage: f, missionTimeHours: nullableNumber };
const channelShape: _Shape = { name: "string", lambdaDuFit: n, lambdaDdFit: n, pfdAvg1oo1: n, pfh1oo1PerHour: n };

/** What the renderers read of a safety-figures report (checked at their entry, {@link _checkSafetyReport}). */
const safetyReportShape: _Shape = {
  name: ["optional", "string"],
  scope: "string",
  certification: "string",
  caution: "string",
  setpoints: [
    "array",
    {
      name: "string",
      lambdaSdFit: n,
      lambdaSuFit: n,
      lambdaDdFit: n,
      lambdaDuFit: n,
      lambdaSafeFit: n,
      lambdaDangerousFit: n,
      lambdaDegradedFit: n,
      lambdaNoEffectFit: n,
      lambdaTotalFit: n,
      safeFailureFraction: nullableFraction,
      diagnosticCoverage: nullableFraction,
      proofTestCoverage: nullableFraction,
      noEffectThresholdC: nullableNumber,
      modes: ["array", { element: "string", mode: "string", faultId: ["nullable", "string"], share: f, rateFit: n, counted: "string" }],
      unratedFaultIds: strings,
      pfdAvg1oo1: ["nullable", { pfdAvg: n, channelDownTimeHours: nullableNumber, lambdaDuFit: n, lambdaDdFit: n, proofTest: proofTestShape }],
      pfh1oo1: ["nullable", { pfhPerHour: n, pfhFit: n, commonCausePfhPerHour: n }],
      notes: strings,
    },
  ],
  twoChannel: [
    "array",
    {
      channelA: channelShape,
      channelB: channelShape,
      beta: f,
      betaD: f,
      pfdAvg1oo2: n,
      independentPfd: n,
      commonCausePfd: n,
      commonCauseShare: nullableFraction,
      pfh1oo2PerHour: n,
      commonCausePfhPerHour: n,
      improvementFactor: nullableNumber,
      improvementFactorWithoutCommonCause: nullableNumber,
      betaSensitivity: ["array", { beta: f, betaD: f, pfdAvg1oo2: n, pfh1oo2PerHour: n, improvementFactor: nullableNumber }],
      proofTest: proofTestShape,
      notes: strings,
    },
  ],
  curves: [
    "array",
    {
      channelName: "string",
      pairName: ["nullable", "string"],
      beta: nullableFraction,
      betaD: nullableFraction,
      points: ["array", { proofTestIntervalHours: "positive", pfdAvg1oo1: n, pfdAvg1oo2: nullableNumber }],
    },
  ],
};

/** @internal Checks that a value is a safety-figures report, field by field (the shared shape guard). */
export function _checkSafetyReport(report: unknown, context: string): SafetyFiguresReport {
  const r = report as Partial<SafetyFiguresReport> | null;
  const ok = typeof r === "object" && r !== null && Array.isArray(r.setpoints) && Array.isArray(r.twoChannel) && Array.isArray(r.curves);
  if (!ok) _invalidChoice("report", report, ["a safety-figures report"], context);
  _requireShape(report, safetyReportShape, "report", context);
  return report as SafetyFiguresReport;
}
