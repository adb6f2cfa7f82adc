/**
 * Headroom check of a series reference or regulator on its supply: margin to the absolute maximum input
 * and to dropout.
 * @module
 */
import { HotjunctionRangeError } from "../errors.js";
import { _requireObject, _requireOrderedPair, _requirePositive } from "./_common.js";
import type { ReferenceElement } from "./types.js";

/** Result of {@link referenceHeadroom}. */
export interface ReferenceHeadroom {
  /** Absolute maximum input − highest supply, V (when maxInputVolts is given). */
  readonly overvoltageMarginVolts?: number;
  /** The same as a fraction of the highest supply (0.1 = 10 %). */
  readonly overvoltageMarginFraction?: number;
  /** Lowest supply − output − dropout, V (when dropoutVolts is given). */
  readonly dropoutMarginVolts?: number;
  /** Whether both margins that could be checked are ≥ 0. */
  readonly ok: boolean;
}

/**
 * Supply headroom of a reference: how far the highest supply sits below the part's absolute maximum
 * input (a small margin leaves little room for supply transients), and how far the lowest supply sits
 * above output + dropout.
 * @param reference - a series or regulator reference with supplyMinVolts/supplyMaxVolts and at least
 *   one of maxInputVolts, dropoutVolts
 * @returns margins in V and as a fraction
 * @throws HotjunctionRangeError for a shunt reference (no input pin), a missing supply range, or neither
 *   limit given
 * @example
 * ```ts
 * import { referenceHeadroom } from "hotjunction";
 * const ref = { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001,
 *   supplyMinVolts: 4.75, supplyMaxVolts: 5, maxInputVolts: 5.5, dropoutVolts: 0.2 } as const;
 * const h = referenceHeadroom(ref);
 * console.log(h.overvoltageMarginFraction, h.dropoutMarginVolts?.toFixed(2), h.ok); // 0.1 "2.05" true
 * ```
 */
export function referenceHeadroom(reference: ReferenceElement): ReferenceHeadroom {
  const context = "reference headroom";
  const o = _requireObject(reference, "reference", context);
  if (o["variant"] === "shunt") {
    // Same error shape as other typed-error checks (deliberate: each names its own quantity and problem).
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "reference variant",
      value: "shunt",
      context,
      problem: "has no input pin; size its series resistor with shuntResistorSizing instead",
    });
  }
  const vOut = _requirePositive(o["nominalVolts"], "nominalVolts", "V", context);
  const [vsMin, vsMax] = _requireOrderedPair(o["supplyMinVolts"], o["supplyMaxVolts"], "supplyMinVolts", "supplyMaxVolts", "V", context);
  if (o["maxInputVolts"] === undefined && o["dropoutVolts"] === undefined) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "maxInputVolts and dropoutVolts",
      value: undefined,
      context,
      problem: "are both missing; give at least one",
    });
  }
  const result: { overvoltageMarginVolts?: number; overvoltageMarginFraction?: number; dropoutMarginVolts?: number; ok: boolean } = {
    ok: true,
  };
  if (o["maxInputVolts"] !== undefined) {
    const vMax = _requirePositive(o["maxInputVolts"], "maxInputVolts", "V", context);
    result.overvoltageMarginVolts = vMax - vsMax;
    result.overvoltageMarginFraction = Number(((vMax - vsMax) / vsMax).toPrecision(12));
    if (vMax < vsMax) result.ok = false;
  }
  if (o["dropoutVolts"] !== undefined) {
    const dropout = _requirePositive(o["dropoutVolts"], "dropoutVolts", "V", context);
    result.dropoutMarginVolts = vsMin - vOut - dropout;
    if (result.dropoutMarginVolts < 0) result.ok = false;
  }
  return result;
}
