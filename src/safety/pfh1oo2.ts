/**
 * PFH of two identical channels (1oo2), IEC 61508-6:2010 Annex B (B.3.3.2.2, `from memory`).
 * @module
 */
import { _check1oo2Inputs, _downTimeHours } from "./_safetyChecks.js";
import type { CommonCauseFactors, DangerousRates, PfhResult, ProofTestParameters } from "./types.js";

/**
 * PFH of a 1oo2 pair of identical channels (IEC 61508-6:2010 Annex B, B.3.3.2.2, `from memory`):
 * PFH = 2·((1 − β_D)·λ_DD + (1 − β)·λ_DU)·(1 − β)·λ_DU·t_CE + β_D·λ_DD + β·λ_DU, with
 * t_CE = (λ_DU/λ_D)·(T1/2 + MRT) + (λ_DD/λ_D)·MTTR (the proof-test coverage enters t_CE as in {@link pfdAvg1oo2}).
 * @param rates - one channel's λ_DU and λ_DD, FIT
 * @param commonCause - β and β_D in [0, 1]
 * @param proofTest - as for {@link pfdAvg1oo1}
 * @returns PFH per hour and in FIT, with the common-cause part
 * @throws HotjunctionTypeError / HotjunctionRangeError naming the key
 * @example
 * ```ts
 * import { pfh1oo2 } from "hotjunction";
 * const r = pfh1oo2({ lambdaDuFit: 100, lambdaDdFit: 400 }, { beta: 0.05, betaD: 0.02 }, { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 });
 * console.log(r.pfhFit.toPrecision(3), r.commonCausePfhPerHour.toPrecision(3)); // "13.1" "1.30e-8"
 * ```
 */
export function pfh1oo2(rates: DangerousRates, commonCause: CommonCauseFactors, proofTest: ProofTestParameters): PfhResult {
  const context = "pfh1oo2";
  const { r, beta, betaD, p, du, dd } = _check1oo2Inputs(rates, commonCause, proofTest, context);
  const tCe = _downTimeHours(r, p, 2) ?? 0;
  const common = betaD * dd + beta * du;
  const pfhPerHour = 2 * ((1 - betaD) * dd + (1 - beta) * du) * (1 - beta) * du * tCe + common;
  return { architecture: "1oo2", pfhPerHour, pfhFit: pfhPerHour * 1e9, commonCausePfhPerHour: common };
}
