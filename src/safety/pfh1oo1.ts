/**
 * PFH of a single channel (1oo1), IEC 61508-6:2010 Annex B (B.3.3.2.1, `from memory`).
 * @module
 */
import { _checkRates, _perHour } from "./_safetyChecks.js";
import type { DangerousRates, PfhResult } from "./types.js";

/**
 * PFH of one channel: PFH = λ_DU (IEC 61508-6:2010 Annex B, B.3.3.2.1, `from memory`; detected dangerous
 * failures are taken to reach the safe state, so only λ_DU counts).
 * @param rates - λ_DU and λ_DD, FIT, each in [0, 1e9] (λ_DD is checked but does not enter)
 * @returns PFH per hour and in FIT
 * @throws HotjunctionTypeError / HotjunctionRangeError naming the key
 * @example
 * ```ts
 * import { pfh1oo1 } from "hotjunction";
 * const r = pfh1oo1({ lambdaDuFit: 100, lambdaDdFit: 400 }); // invented rates
 * console.log(r.pfhPerHour, r.pfhFit); // 1e-7 100
 * ```
 */
export function pfh1oo1(rates: DangerousRates): PfhResult {
  const r = _checkRates(rates, "pfh1oo1");
  return { architecture: "1oo1", pfhPerHour: _perHour(r.lambdaDuFit), pfhFit: r.lambdaDuFit, commonCausePfhPerHour: 0 };
}
