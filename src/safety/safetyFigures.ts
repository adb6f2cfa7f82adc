/**
 * The failure-modes-effects-and-diagnostics summary of one setpoint: failure data × classified faults →
 * λ_SD, λ_SU, λ_DD, λ_DU, SFF, DC, and (with a proof test) PFDavg and PFH for 1oo1.
 * @module
 */
import { _invalidChoice, _requireOptionsObject, _requireShape, HotjunctionRangeError } from "../errors.js";
import { _checkProofTest } from "./_safetyChecks.js";
import { pfdAvg1oo1 } from "./pfdAvg1oo1.js";
import { pfh1oo1 } from "./pfh1oo1.js";
import type { SafetyFaultClass, SafetyFiguresOptions, SafetyModeRow, SetpointFaultClasses, SetpointSafetyFigures, FailureData } from "./types.js";
import { validateFailureData } from "./validateFailureData.js";

const safetyWords = ["safe", "dangerous", "degraded", "no-effect"] as const;

function countedAs(safety: SafetyModeRow["safety"], detected: boolean, degradedAsDangerous: boolean): SafetyModeRow["counted"] {
  if (safety === "safe") return detected ? "SD" : "SU";
  if (safety === "dangerous" || (safety === "degraded" && degradedAsDangerous)) return detected ? "DD" : "DU";
  return safety;
}

/**
 * The safety figures of one setpoint. Each element's rate is split over its modes by share; a mode with a
 * `faultId` takes that fault's class at this setpoint, a mode with `assumed` its stated class. Rates by class:
 * - λ_SD, λ_SU, λ_DD, λ_DU (FIT); λ_S = λ_SD + λ_SU, λ_D = λ_DD + λ_DU;
 * - SFF = (λ_SD + λ_SU + λ_DD) / (λ_S + λ_D) and DC = λ_DD / λ_D (IEC 61508-2:2010 Annex C and IEC 61508-4 3.8,
 *   `from memory`). "No effect" failures stay out of both (as IEC 61508-2:2010 asks, `from memory`);
 *   "degraded" ones too, unless `countDegradedAsDangerous`.
 * With `proofTest`, PFDavg ({@link pfdAvg1oo1}) and PFH ({@link pfh1oo1}) of the setpoint as one channel; the
 * proof-test coverage is the stated one, or, with `proofTestRevealsFaultIds`, λ_DU of the revealed faults / λ_DU
 * (modes with an `assumed` class have no fault id, so they count as not revealed).
 * @param failureData - per element a rate (FIT) and mode shares (validated, see {@link validateFailureData})
 * @param setpoint - the classified faults (e.g. from {@link safetyFaultClassesFromReview})
 * @param options - proof test, revealed faults, degraded counting
 * @returns the summary (every figure a field; per-mode rows; unrated faults; notes)
 * @throws as {@link validateFailureData} (a faultId not in `setpoint.faults` is refused with its path);
 *   HotjunctionRangeError for a classified fault with a bad id, safety word or detected flag, or an id given twice;
 *   HotjunctionRangeError for a revealed fault id that is not in the review, or bad proof-test values
 * @example
 * ```ts
 * import { safetyFigures, type FailureData } from "hotjunction";
 * // Invented rates of a kiln watchdog's thermocouple and comparator (demo only).
 * const data: FailureData = { elements: [
 *   { element: "thermocouple", rateFit: 1000, modes: [
 *     { mode: "open", share: 0.7, faultId: "thermocouple.open" },
 *     { mode: "short", share: 0.2, faultId: "thermocouple.shortAtTerminals" },
 *     { mode: "drift", share: 0.1, assumed: { safety: "degraded", detected: false } } ] },
 *   { element: "comparator", rateFit: 50, modes: [
 *     { mode: "output stuck high", share: 0.5, faultId: "comparator.outputStuckHigh" },
 *     { mode: "output stuck low", share: 0.5, faultId: "comparator.outputStuckLow" } ] },
 * ] };
 * const setpoint = { name: "kiln", faults: [
 *   { faultId: "thermocouple.open", safety: "safe" as const, detected: true, shiftC: null, marginC: null },
 *   { faultId: "thermocouple.shortAtTerminals", safety: "dangerous" as const, detected: false, shiftC: null, marginC: null },
 *   { faultId: "comparator.outputStuckHigh", safety: "safe" as const, detected: false, shiftC: null, marginC: null },
 *   { faultId: "comparator.outputStuckLow", safety: "dangerous" as const, detected: false, shiftC: null, marginC: null },
 * ] };
 * const f = safetyFigures(data, setpoint, { proofTest: { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 } });
 * console.log(f.lambdaSdFit, f.lambdaSuFit, f.lambdaDdFit, f.lambdaDuFit, f.lambdaDegradedFit); // 700 25 0 225 100
 * console.log(f.safeFailureFraction?.toFixed(3), f.diagnosticCoverage); // "0.763" 0
 * console.log(f.pfdAvg1oo1?.pfdAvg.toExponential(3)); // "9.873e-4"
 * ```
 */
export function safetyFigures(failureData: FailureData, setpoint: SetpointFaultClasses, options: SafetyFiguresOptions = {}): SetpointSafetyFigures {
  const context = "safetyFigures";
  if (typeof setpoint !== "object" || setpoint === null || !Array.isArray(setpoint.faults)) {
    _invalidChoice("setpoint", setpoint, ["classified faults of a setpoint ({ name, faults })"], context);
  }
  _requireShape(setpoint.name, "string", "setpoint.name", context);
  _requireShape(setpoint.noEffectThresholdC, ["optional", "number"], "setpoint.noEffectThresholdC", context);
  _requireOptionsObject(options, context, true);
  const classes = new Map<string, SafetyFaultClass>();
  setpoint.faults.forEach((f: SafetyFaultClass, i) => {
    const path = `setpoint.faults[${i}]`;
    if (typeof f !== "object" || f === null) _invalidChoice(path, f, ["a classified fault { faultId, safety, detected }"], context);
    if (typeof f.faultId !== "string" || f.faultId === "") _invalidChoice(`${path}.faultId`, f.faultId, ["a non-empty fault id"], context);
    if (!(safetyWords as readonly string[]).includes(f.safety)) _invalidChoice(`${path}.safety`, f.safety, safetyWords, context);
    if (typeof f.detected !== "boolean") _invalidChoice(`${path}.detected`, f.detected, ["true", "false"], context);
    if (classes.has(f.faultId)) {
      throw new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: `${path}.faultId`, value: f.faultId, context, problem: "appears twice in the setpoint" });
    }
    classes.set(f.faultId, f);
  });
  const data = validateFailureData(failureData, { faultIds: [...classes.keys()] });
  const degradedAsDangerous = options.countDegradedAsDangerous === true;

  const modes: SafetyModeRow[] = [];
  const named = new Set<string>();
  for (const el of data.elements) {
    for (const m of el.modes) {
      const cls = m.faultId !== undefined ? classes.get(m.faultId) : undefined;
      if (m.faultId !== undefined) named.add(m.faultId);
      const safety = cls?.safety ?? m.assumed?.safety ?? "no-effect";
      const detected = cls?.detected ?? m.assumed?.detected ?? false;
      modes.push({
        element: el.element,
        mode: m.mode,
        faultId: m.faultId ?? null,
        share: m.share,
        rateFit: el.rateFit * m.share,
        safety,
        detected,
        counted: countedAs(safety, detected, degradedAsDangerous),
        assumed: cls === undefined,
      });
    }
  }
  const sum = (c: SafetyModeRow["counted"]): number => modes.reduce((s, m) => (m.counted === c ? s + m.rateFit : s), 0);
  const lambdaSdFit = sum("SD");
  const lambdaSuFit = sum("SU");
  const lambdaDdFit = sum("DD");
  const lambdaDuFit = sum("DU");
  const lambdaDegradedFit = sum("degraded");
  const lambdaNoEffectFit = sum("no-effect");
  const lambdaSafeFit = lambdaSdFit + lambdaSuFit;
  const lambdaDangerousFit = lambdaDdFit + lambdaDuFit;
  const lambdaTotalFit = modes.reduce((s, m) => s + m.rateFit, 0);
  const sAndD = lambdaSafeFit + lambdaDangerousFit;
  const unratedFaultIds = setpoint.faults.map((f) => f.faultId).filter((id) => !named.has(id));
  const notes: string[] = [];
  if (unratedFaultIds.length > 0) {
    notes.push(`${unratedFaultIds.length} fault(s) of the review carry no failure rate and do not enter the figures: ${unratedFaultIds.join(", ")}.`);
  }
  if (modes.some((m) => m.assumed)) notes.push("Modes marked assumed carry a class stated in the failure data, not one found by the review.");
  if (lambdaDegradedFit > 0) {
    notes.push(
      degradedAsDangerous
        ? "Degraded failures (trip moved beyond the no-effect threshold but inside the limits) are counted as dangerous."
        : "Degraded failures (trip moved beyond the no-effect threshold but inside the limits) are left out of λ_S and λ_D, as no-effect failures are.",
    );
  }

  let pfd: SetpointSafetyFigures["pfdAvg1oo1"] = null;
  let pfh: SetpointSafetyFigures["pfh1oo1"] = null;
  let coverage: number | null = null;
  if (options.proofTest !== undefined) {
    const used = _checkProofTest(options.proofTest, context);
    coverage = used.proofTestCoverage;
    if (options.proofTestRevealsFaultIds !== undefined) {
      if (!Array.isArray(options.proofTestRevealsFaultIds)) _invalidChoice("proofTestRevealsFaultIds", options.proofTestRevealsFaultIds, ["an array of fault ids"], context);
      options.proofTestRevealsFaultIds.forEach((id, i) => {
        if (!classes.has(id)) {
          throw new HotjunctionRangeError({ code: "UNKNOWN_NAME", quantity: `proofTestRevealsFaultIds[${i}]`, value: id, context, problem: "names no fault of the review" });
        }
      });
      const revealed = new Set(options.proofTestRevealsFaultIds);
      const revealedDu = modes.reduce((s, m) => (m.counted === "DU" && m.faultId !== null && revealed.has(m.faultId) ? s + m.rateFit : s), 0);
      coverage = lambdaDuFit === 0 ? 1 : revealedDu / lambdaDuFit;
      notes.push(`Proof-test coverage ${(coverage * 100).toFixed(1)} % of λ_DU: the share of λ_DU in the faults the proof test reveals.`);
    }
    if (coverage < 1 && used.missionTimeHours === null) {
      throw new HotjunctionRangeError({
        code: "INVALID_OPTION",
        quantity: "proofTest.missionTimeHours",
        value: undefined,
        context,
        problem: `is required when the proof-test coverage (${coverage}) is below 1`,
      });
    }
    if (coverage === 1 && options.proofTestRevealsFaultIds === undefined && options.proofTest.proofTestCoverage === undefined) {
      notes.push("The proof test is taken to reveal every dangerous undetected failure (coverage 1, as the Annex B equations assume).");
    }
    const rates = { lambdaDuFit, lambdaDdFit };
    pfd = pfdAvg1oo1(rates, { ...options.proofTest, proofTestCoverage: coverage });
    pfh = pfh1oo1(rates);
  }

  return {
    name: setpoint.name,
    lambdaSdFit,
    lambdaSuFit,
    lambdaDdFit,
    lambdaDuFit,
    lambdaSafeFit,
    lambdaDangerousFit,
    lambdaDegradedFit,
    lambdaNoEffectFit,
    lambdaTotalFit,
    safeFailureFraction: sAndD === 0 ? null : (lambdaSafeFit + lambdaDdFit) / sAndD,
    diagnosticCoverage: lambdaDangerousFit === 0 ? null : lambdaDdFit / lambdaDangerousFit,
    proofTestCoverage: coverage,
    countDegradedAsDangerous: degradedAsDangerous,
    noEffectThresholdC: setpoint.noEffectThresholdC ?? null,
    modes,
    unratedFaultIds,
    pfdAvg1oo1: pfd,
    pfh1oo1: pfh,
    notes,
  };
}
