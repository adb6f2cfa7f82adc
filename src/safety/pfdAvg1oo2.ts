/**
 * PFDavg of two identical channels, either of which trips (1oo2), IEC 61508-6:2010 Annex B simplified
 * equations (B.3.2.2.3, `from memory`).
 * @module
 */
import { _check1oo2Inputs, _downTimeHours, _simplifiedValid, _undetectedDownTimeHours } from "./_safetyChecks.js";
import type { CommonCauseFactors, DangerousRates, PfdAvg1oo2Result, ProofTestParameters } from "./types.js";

/**
 * Average probability of failure on demand of a 1oo2 pair of identical channels (low demand).
 *
 * Source: IEC 61508-6:2010 Annex B, B.3.2.2.3 (`from memory`), with λ_DU, λ_DD the rates of ONE channel:
 * - t_CE = (λ_DU/λ_D)·(T1/2 + MRT) + (λ_DD/λ_D)·MTTR
 * - t_GE = (λ_DU/λ_D)·(T1/3 + MRT) + (λ_DD/λ_D)·MTTR
 * - PFDavg = 2·((1 − β_D)·λ_DD + (1 − β)·λ_DU)²·t_CE·t_GE + β_D·λ_DD·MTTR + β·λ_DU·(T1/2 + MRT)
 *
 * Proof-test coverage (PTC < 1), our generalisation: in t_CE, t_GE and the β term, every (T1/k + MRT) becomes
 * PTC·(T1/k + MRT) + (1 − PTC)·(T_M/k + MRT). The common-cause term is then exact (it is a 1oo1 term); the
 * independent term overestimates: for λ_DD = 0, β = 0, MRT = 0 and T_M a multiple of T1, the exact mean of the
 * product of the two channels' unavailabilities (a·x + b·y)², x = t mod T1, y = t mod T_M, a = PTC·λ_DU,
 * b = (1 − PTC)·λ_DU, is a²T1²/3 + b²T_M²/3 + 2ab·(T1²/3 + T1(T_M − T1)/4), and the form used exceeds it by
 * 2ab·T1(T_M − T1)/12 ≥ 0. It errs towards a higher PFDavg.
 * @param rates - one channel's λ_DU and λ_DD, FIT, each in [0, 1e9]
 * @param commonCause - β and β_D in [0, 1]
 * @param proofTest - as for {@link pfdAvg1oo1}
 * @returns PFDavg with its independent and common-cause terms, t_CE and t_GE (h)
 * @throws HotjunctionTypeError / HotjunctionRangeError naming the key
 * @example
 * ```ts
 * import { pfdAvg1oo2 } from "hotjunction";
 * // Invented rates per channel: λ_DU = 100 FIT, λ_DD = 400 FIT; β = 5 %, β_D = 2 %.
 * const r = pfdAvg1oo2({ lambdaDuFit: 100, lambdaDdFit: 400 }, { beta: 0.05, betaD: 0.02 }, { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 });
 * console.log(r.pfdAvg.toExponential(3), r.commonCausePfd.toExponential(3)); // "2.225e-5" "2.200e-5"
 * ```
 */
export function pfdAvg1oo2(rates: DangerousRates, commonCause: CommonCauseFactors, proofTest: ProofTestParameters): PfdAvg1oo2Result {
  const context = "pfdAvg1oo2";
  const { r, beta, betaD, p, du, dd } = _check1oo2Inputs(rates, commonCause, proofTest, context);
  const tCe = _downTimeHours(r, p, 2);
  const tGe = _downTimeHours(r, p, 3);
  const independentRate = (1 - betaD) * dd + (1 - beta) * du;
  const independentPfd = tCe === null || tGe === null ? 0 : 2 * independentRate * independentRate * tCe * tGe;
  const commonCausePfd = betaD * dd * p.meanTimeToRestorationHours + beta * du * _undetectedDownTimeHours(p, 2);
  return {
    architecture: "1oo2",
    pfdAvg: independentPfd + commonCausePfd,
    independentPfd,
    commonCausePfd,
    channelDownTimeHours: tCe,
    systemDownTimeHours: tGe,
    lambdaDuFit: r.lambdaDuFit,
    lambdaDdFit: r.lambdaDdFit,
    beta,
    betaD,
    proofTest: p,
    simplifiedEquationsValid: _simplifiedValid(r, p),
  };
}
