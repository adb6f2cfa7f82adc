/**
 * PFDavg of a single channel (1oo1), IEC 61508-6:2010 Annex B simplified equations (B.3.2.2.1, `from memory`).
 * @module
 */
import { _checkProofTest, _checkRates, _downTimeHours, _perHour, _simplifiedValid, _undetectedDownTimeHours } from "./_safetyChecks.js";
import type { DangerousRates, PfdAvg1oo1Result, ProofTestParameters } from "./types.js";

/**
 * Average probability of failure on demand of one channel (1oo1, low demand).
 *
 * Source: IEC 61508-6:2010 Annex B, B.3.2.2.1 (`from memory`):
 * - λ_D = λ_DU + λ_DD
 * - t_CE = (λ_DU/λ_D)·(T1/2 + MRT) + (λ_DD/λ_D)·MTTR
 * - PFDavg = (λ_DU + λ_DD)·t_CE = λ_DU·(T1/2 + MRT) + λ_DD·MTTR
 *
 * Proof-test coverage (PTC < 1): the share PTC of λ_DU is revealed at every proof test (interval T1), the rest
 * only at the mission time T_M. Because the 1oo1 PFDavg is linear in λ_DU, the Annex B form is applied to each
 * part with its own interval (our derivation; the 2010 edition discusses imperfect proof tests, its text not seen):
 * PFDavg = PTC·λ_DU·(T1/2 + MRT) + (1 − PTC)·λ_DU·(T_M/2 + MRT) + λ_DD·MTTR, and t_CE is that sum / λ_D.
 * With MRT = 0 this is the familiar PTC·λ_DU·T1/2 + (1 − PTC)·λ_DU·T_M/2 + λ_DD·MTTR.
 *
 * The equations assume λ·T ≪ 1; `simplifiedEquationsValid` says whether λ_D × the longest hiding time ≤ 0.1.
 * @param rates - λ_DU and λ_DD, FIT (failures per 10⁹ h), each in [0, 1e9]
 * @param proofTest - T1 > 0 h, MTTR ≥ 0 h, MRT ≥ 0 h (default MTTR), PTC in [0, 1] (default 1), T_M ≥ T1 h (required when PTC < 1)
 * @returns PFDavg, t_CE (h), the rates and the proof-test parameters used
 * @throws HotjunctionTypeError for a non-finite value, HotjunctionRangeError for a value out of range (naming the key)
 * @example
 * ```ts
 * import { pfdAvg1oo1 } from "hotjunction";
 * // Invented rates: λ_DU = 100 FIT, λ_DD = 400 FIT; yearly proof test, 8 h repair.
 * const r = pfdAvg1oo1({ lambdaDuFit: 100, lambdaDdFit: 400 }, { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 });
 * console.log(r.pfdAvg.toExponential(3), r.channelDownTimeHours?.toFixed(1)); // "4.420e-4" "884.0"
 * ```
 */
export function pfdAvg1oo1(rates: DangerousRates, proofTest: ProofTestParameters): PfdAvg1oo1Result {
  const context = "pfdAvg1oo1";
  const r = _checkRates(rates, context);
  const p = _checkProofTest(proofTest, context);
  const pfdAvg = _perHour(r.lambdaDuFit) * _undetectedDownTimeHours(p, 2) + _perHour(r.lambdaDdFit) * p.meanTimeToRestorationHours;
  return {
    architecture: "1oo1",
    pfdAvg,
    channelDownTimeHours: _downTimeHours(r, p, 2),
    lambdaDuFit: r.lambdaDuFit,
    lambdaDdFit: r.lambdaDdFit,
    proofTest: p,
    simplifiedEquationsValid: _simplifiedValid(r, p),
  };
}
