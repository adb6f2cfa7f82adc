/**
 * Shared checks and conversions of the safety figures.
 * @module
 * @internal
 */
import { _invalidChoice, _requireFinite, HotjunctionRangeError } from "../errors.js";
import type { CommonCauseFactors, DangerousRates, ProofTestParameters, ProofTestUsed } from "./types.js";

/** @internal FIT → per hour (a division, so 100 FIT is exactly the double nearest 1e-7). */
export function _perHour(fit: number): number {
  return fit / 1e9;
}

/** @internal Highest accepted rate, FIT (one failure per hour). */
export const _maxRateFit = 1e9;

/** @internal A finite number in [min, max], or a one-line typed error naming the path. */
export function _checkNumber(value: unknown, path: string, min: number, max: number, unit: string | undefined, context: string): number {
  const x = _requireFinite(value, path, unit, context);
  if (x < min || x > max) throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: path, value: x, min, max, unit, context });
  return x;
}

/** @internal A finite number > 0 (and ≤ max). */
export function _checkPositive(value: unknown, path: string, max: number, unit: string | undefined, context: string): number {
  const x = _requireFinite(value, path, unit, context);
  if (!(x > 0) || x > max) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: path, value: x, min: 0, max, unit, context, problem: "is not above 0 or is too large" });
  }
  return x;
}

/** @internal Checks an object. */
export function _checkObject(value: unknown, path: string, context: string): Record<string, unknown> {
  if (typeof value !== "object" || value === null || Array.isArray(value)) _invalidChoice(path, value, ["an object"], context);
  return value as Record<string, unknown>;
}

/** @internal Checked dangerous rates. */
export function _checkRates(rates: unknown, context: string, path = ""): DangerousRates {
  const r = _checkObject(rates, path === "" ? "rates" : path, context);
  const p = path === "" ? "" : `${path}.`;
  return {
    lambdaDuFit: _checkNumber(r.lambdaDuFit, `${p}lambdaDuFit`, 0, _maxRateFit, "FIT", context),
    lambdaDdFit: _checkNumber(r.lambdaDdFit, `${p}lambdaDdFit`, 0, _maxRateFit, "FIT", context),
  };
}

/** @internal Checked β and β_D (of an object: `path` names it when it is none). */
export function _checkCommonCause(f: CommonCauseFactors, context: string, path = "commonCause"): CommonCauseFactors {
  _checkObject(f, path, context);
  return { beta: _checkNumber(f.beta, "beta", 0, 1, undefined, context), betaD: _checkNumber(f.betaD, "betaD", 0, 1, undefined, context) };
}

/** @internal Checked proof-test parameters with defaults filled in. */
export function _checkProofTest(value: ProofTestParameters, context: string): ProofTestUsed {
  const p = _checkObject(value, "proofTest", context) as unknown as ProofTestParameters;
  const t1 = _checkPositive(p.proofTestIntervalHours, "proofTest.proofTestIntervalHours", 1e9, "h", context);
  const mttr = _checkNumber(p.meanTimeToRestorationHours, "proofTest.meanTimeToRestorationHours", 0, 1e9, "h", context);
  const mrt = p.meanRepairTimeHours === undefined ? mttr : _checkNumber(p.meanRepairTimeHours, "proofTest.meanRepairTimeHours", 0, 1e9, "h", context);
  const ptc = p.proofTestCoverage === undefined ? 1 : _checkNumber(p.proofTestCoverage, "proofTest.proofTestCoverage", 0, 1, undefined, context);
  let mission: number | null = null;
  if (p.missionTimeHours !== undefined) {
    mission = _checkNumber(p.missionTimeHours, "proofTest.missionTimeHours", t1, 1e9, "h", context);
  } else if (ptc < 1) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "proofTest.missionTimeHours",
      value: undefined,
      context,
      problem: `is required when proofTest.proofTestCoverage (${ptc}) is below 1`,
    });
  }
  return { proofTestIntervalHours: t1, meanTimeToRestorationHours: mttr, meanRepairTimeHours: mrt, proofTestCoverage: ptc, missionTimeHours: mission };
}

/** @internal The checked inputs of a 1oo2 figure (PFDavg and PFH): rates, common-cause factors, proof test, λ per hour. */
export function _check1oo2Inputs(
  rates: DangerousRates,
  commonCause: CommonCauseFactors,
  proofTest: ProofTestParameters,
  context: string,
): { r: DangerousRates; beta: number; betaD: number; p: ProofTestUsed; du: number; dd: number } {
  const r = _checkRates(rates, context);
  const { beta, betaD } = _checkCommonCause(commonCause, context);
  const p = _checkProofTest(proofTest, context);
  return { r, beta, betaD, p, du: _perHour(r.lambdaDuFit), dd: _perHour(r.lambdaDdFit) };
}

/**
 * @internal Mean time an undetected dangerous failure stays hidden plus its repair, weighted over the revealed
 * (share PTC, found at T1) and unrevealed (found at T_M) parts: PTC·(T1/`divisor` + MRT) + (1 − PTC)·(T_M/`divisor` + MRT).
 * `divisor` 2 gives the t_CE form, 3 the t_GE form of IEC 61508-6 Annex B.
 */
export function _undetectedDownTimeHours(p: ProofTestUsed, divisor: number, coverage = p.proofTestCoverage): number {
  const revealed = p.proofTestIntervalHours / divisor + p.meanRepairTimeHours;
  if (coverage >= 1) return revealed;
  const mission = p.missionTimeHours ?? p.proofTestIntervalHours;
  return coverage * revealed + (1 - coverage) * (mission / divisor + p.meanRepairTimeHours);
}

/**
 * @internal t_CE (divisor 2) or t_GE (divisor 3) of IEC 61508-6 Annex B, h: (λ_DU/λ_D)·(undetected down time) +
 * (λ_DD/λ_D)·MTTR; null when λ_D = 0.
 */
export function _downTimeHours(r: DangerousRates, p: ProofTestUsed, divisor: number, coverage = p.proofTestCoverage): number | null {
  const lambdaD = r.lambdaDuFit + r.lambdaDdFit;
  if (lambdaD === 0) return null;
  return (r.lambdaDuFit / lambdaD) * _undetectedDownTimeHours(p, divisor, coverage) + (r.lambdaDdFit / lambdaD) * p.meanTimeToRestorationHours;
}

/** @internal λ_D × the longest hiding time ≤ 0.1 (common practice, no source: the simplified equations assume λ·T ≪ 1). */
export function _simplifiedValid(r: DangerousRates, p: ProofTestUsed): boolean {
  const longest = Math.max(p.proofTestIntervalHours, p.proofTestCoverage < 1 ? (p.missionTimeHours ?? 0) : 0) + p.meanRepairTimeHours;
  return _perHour(r.lambdaDuFit + r.lambdaDdFit) * Math.max(longest, p.meanTimeToRestorationHours) <= 0.1;
}
