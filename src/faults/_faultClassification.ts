/**
 * Classification in the fault review: of a fault's alternatives the latest trip decides; its effect (trips
 * immediately, early, late, never, no change), safety by the one rule {@link classifyFaultShift} (the healthy
 * worst-case band moved by the shift: safe, dangerous, degraded, no effect), detection and category.
 * @module
 * @internal
 */
import { _methodOrder } from "./_faultDetection.js";
import { classifyFaultShift } from "./classifyFaultShift.js";
import type { FaultCategory, FaultCategoryCounts, FaultDetectionMethod, FaultSafety, FaultTripEffect } from "./types.js";

/** @internal The outcome of one alternative of a fault. */
export interface _AlternativeResult {
  readonly label: string | undefined;
  readonly immediate: boolean;
  readonly tripC: number | null;
  readonly firstFlagC: ReadonlyMap<FaultDetectionMethod, number>;
}

/** @internal The limits a fault is judged against, °C. */
export interface _ClassificationLimits {
  readonly healthyTripC: number;
  readonly maxNormalC: number;
  readonly hazardC: number;
  /** A trip that moves by at most this much is "no change". */
  readonly noChangeC: number;
  /** Healthy worst-case band, °C. */
  readonly bandC: { readonly lowC: number; readonly highC: number };
  /** Shift up to which a fault inside the limits is "no effect", °C. */
  readonly noEffectC: number;
}

/** @internal A classified fault. */
export interface _Classification {
  /** The deciding alternative (the latest trip; never tripping is latest). */
  readonly worst: _AlternativeResult;
  readonly effect: FaultTripEffect;
  readonly tripC: number | null;
  readonly shiftC: number | null;
  readonly safety: FaultSafety;
  /** Margin the worst unit of the moved band keeps, °C (null when it never trips). */
  readonly marginC: number | null;
  /** Methods that detect every alternative. */
  readonly detectedBy: FaultDetectionMethod[];
  readonly detected: boolean;
  readonly category: FaultCategory;
}

/** @internal Classifies a fault from its alternatives' outcomes (at least one). */
export function _classifyFault(results: readonly _AlternativeResult[], limits: _ClassificationLimits): _Classification {
  const key = (r: _AlternativeResult): number => (r.immediate ? -Infinity : (r.tripC ?? Infinity));
  let worst = results[0] as _AlternativeResult;
  for (const r of results) if (key(r) > key(worst)) worst = r;
  const detectedBy = _methodOrder.filter((m) => results.every((r) => r.firstFlagC.has(m)));
  const tripC = worst.tripC;
  const shiftC = tripC === null ? null : tripC - limits.healthyTripC;
  let effect: FaultTripEffect;
  if (worst.immediate) effect = "trips-immediately";
  else if (tripC === null) effect = "never-trips";
  else if (Math.abs(shiftC as number) <= limits.noChangeC) effect = "no-change";
  else effect = (shiftC as number) < 0 ? "trips-early" : "trips-late";
  const cls = classifyFaultShift({
    shiftC,
    tripsImmediately: worst.immediate,
    healthyBandC: limits.bandC,
    maxNormalOperatingC: limits.maxNormalC,
    hazardLimitC: limits.hazardC,
    noEffectThresholdC: limits.noEffectC,
  });
  const safety: FaultSafety = cls.safety;
  const detected = detectedBy.length > 0;
  const category: FaultCategory = safety === "no-effect" || safety === "degraded" ? safety : `${safety}-${detected ? "detected" : "undetected"}`;
  return { worst, effect, tripC, shiftC, safety, marginC: cls.marginC, detectedBy, detected, category };
}

/** @internal Counts rows per category. */
export function _countCategories(rows: readonly { readonly category: FaultCategory }[]): FaultCategoryCounts {
  const c = { safeDetected: 0, safeUndetected: 0, dangerousDetected: 0, dangerousUndetected: 0, degraded: 0, noEffect: 0, total: rows.length };
  for (const r of rows) {
    if (r.category === "safe-detected") c.safeDetected++;
    else if (r.category === "safe-undetected") c.safeUndetected++;
    else if (r.category === "dangerous-detected") c.dangerousDetected++;
    else if (r.category === "dangerous-undetected") c.dangerousUndetected++;
    else if (r.category === "degraded") c.degraded++;
    else c.noEffect++;
  }
  return c;
}
