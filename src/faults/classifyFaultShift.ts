/**
 * The one classification rule of a fault's trip shift, judged with the healthy worst-case band: dangerous, safe,
 * degraded or no effect. The single-fault review ({@link reviewFaults}) classifies every row with it, and the
 * safety figures read those classes.
 * @module
 */
import { _requireFinite, _requireInRange, _requireOptionsObject, HotjunctionRangeError } from "../errors.js";
import type { FaultSafety } from "./types.js";

/**
 * Default shift below which a fault is "no effect", °C (a stated few °C; common practice, no source).
 * @example
 * ```ts
 * import { defaultNoEffectThresholdC } from "hotjunction";
 * console.log(defaultNoEffectThresholdC); // 3
 * ```
 */
export const defaultNoEffectThresholdC = 3;

/** Input of {@link classifyFaultShift}. */
export interface ClassifyFaultShiftInput {
  /** Trip shift of the nominal unit under the fault, °C; null when the output never trips. */
  readonly shiftC: number | null;
  /** The fault trips at once (at any temperature): a safe failure. Default false. */
  readonly tripsImmediately?: boolean;
  /** Healthy trip band of the worst-case budget, °C (lowC ≤ highC); the nominal trip alone gives a zero-width band. */
  readonly healthyBandC: { readonly lowC: number; readonly highC: number };
  /** Highest temperature of normal operation, °C. */
  readonly maxNormalOperatingC: number;
  /** Hazard limit, °C, above maxNormalOperatingC. */
  readonly hazardLimitC: number;
  /** Shift below which the fault is "no effect", °C, in [0, 100]. Default {@link defaultNoEffectThresholdC}. */
  readonly noEffectThresholdC?: number;
}

/** Result of {@link classifyFaultShift}. */
export interface FaultShiftClass {
  /** The class (IEC 61508-4 vocabulary, plus "degraded": moved beyond the no-effect threshold, still inside the limits). */
  readonly safety: FaultSafety;
  /**
   * Margin the worst unit keeps: hazard limit − shifted band top, or shifted band bottom − highest normal
   * temperature, whichever is smaller, °C (negative when crossed; null when it never trips).
   */
  readonly marginC: number | null;
  readonly noEffectThresholdC: number;
}

/**
 * Classifies a fault by moving the healthy worst-case trip band by the fault's shift (rules in order):
 * 1. never trips, or the shifted band's top reaches the hazard limit → `"dangerous"` (a fault that leaves a
 *    nominal unit below the hazard limit but not the worst unit counts as dangerous);
 * 2. trips at once, or the shifted band's bottom reaches down to normal operation → `"safe"` (a nuisance trip);
 * 3. |shift| above the no-effect threshold → `"degraded"` (inside the limits, with the margin left);
 * 4. otherwise `"no effect"`.
 * @param input - shift °C (null: never trips), healthy band °C, process limits °C, threshold °C
 * @returns the class, the margin left °C and the threshold used
 * @throws HotjunctionTypeError / HotjunctionRangeError for a non-finite value, lowC > highC, a hazard limit not
 *   above the normal limit, or a threshold outside [0, 100] °C
 * @example
 * ```ts
 * import { classifyFaultShift } from "hotjunction";
 * // Healthy worst-case band 248–256 °C; normal operation to 230 °C, hazard at 280 °C.
 * const limits = { healthyBandC: { lowC: 248, highC: 256 }, maxNormalOperatingC: 230, hazardLimitC: 280 };
 * console.log(classifyFaultShift({ ...limits, shiftC: 20 }).safety); // "degraded"
 * console.log(classifyFaultShift({ ...limits, shiftC: 26 }).safety); // "dangerous"
 * console.log(classifyFaultShift({ ...limits, shiftC: -1.5 }).safety); // "no-effect"
 * console.log(classifyFaultShift({ ...limits, shiftC: -20 }).safety); // "safe"
 * ```
 */
export function classifyFaultShift(input: ClassifyFaultShiftInput): FaultShiftClass {
  const context = "classifyFaultShift";
  _requireOptionsObject(input, context, false);
  const threshold =
    input.noEffectThresholdC === undefined ? defaultNoEffectThresholdC : _requireInRange(input.noEffectThresholdC, "noEffectThresholdC", 0, 100, "°C", context);
  const lowC = _requireFinite(input.healthyBandC?.lowC, "healthyBandC.lowC", "°C", context);
  const highC = _requireFinite(input.healthyBandC?.highC, "healthyBandC.highC", "°C", context);
  if (lowC > highC) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "healthyBandC.lowC", value: lowC, max: highC, unit: "°C", context, problem: "is above healthyBandC.highC" });
  }
  const normal = _requireFinite(input.maxNormalOperatingC, "maxNormalOperatingC", "°C", context);
  const hazard = _requireFinite(input.hazardLimitC, "hazardLimitC", "°C", context);
  if (!(hazard > normal)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "hazardLimitC", value: hazard, min: normal, unit: "°C", context, problem: "is not above maxNormalOperatingC" });
  }
  if (input.shiftC === null) return { safety: "dangerous", marginC: null, noEffectThresholdC: threshold };
  const shift = _requireFinite(input.shiftC, "shiftC", "°C", context);
  const top = highC + shift;
  const bottom = lowC + shift;
  const marginC = Math.min(hazard - top, bottom - normal);
  let safety: FaultSafety;
  if (top >= hazard) safety = "dangerous";
  else if (input.tripsImmediately === true || bottom <= normal) safety = "safe";
  else if (Math.abs(shift) > threshold) safety = "degraded";
  else safety = "no-effect";
  return { safety, marginC, noEffectThresholdC: threshold };
}
