/**
 * Helpers shared by the wire element modules (internal): temperature-range checks and the construction of
 * named error sources under a wire role.
 * @module
 * @internal
 */
import { HotjunctionRangeError } from "../../errors.js";
import { rectangular } from "../../uncertainty/rectangular.js";
import { _checkTemperatureRange, _source, type _SourceContext } from "../_common.js";
import type { ErrorSourceUnit } from "../types.js";
import type { WireErrorSource } from "../types.js";
import type { TemperatureRangeC, WireSourceElement } from "../wireTypes.js";

/** @internal Source values by name (as in the chain models). */
export type _Inputs = Readonly<Record<string, number>>;

/** @internal A box of source values: [low, high] by name. */
export type _Box = Readonly<Record<string, readonly [number, number]>>;

/** @internal Checks a temperature range object `{ minC, maxC }` (finite, min ≤ max, not below absolute zero). */
export function _checkRange(value: unknown, quantity: string, context: string): TemperatureRangeC {
  return _checkTemperatureRange(value, quantity, `${quantity}.minC`, `${quantity}.maxC`, context);
}

/** @internal Throws unless `inner` lies within `outer` (both °C ranges). */
export function _requireWithin(
  inner: TemperatureRangeC,
  outer: TemperatureRangeC,
  quantity: string,
  context: string,
  problem: string,
): void {
  for (const [end, v] of [["minC", inner.minC], ["maxC", inner.maxC]] as const) {
    if (v < outer.minC || v > outer.maxC) {
      throw new HotjunctionRangeError({
        code: "OUT_OF_RANGE",
        quantity: `${quantity}.${end}`,
        value: v,
        min: outer.minC,
        max: outer.maxC,
        unit: "°C",
        context,
        problem,
      });
    }
  }
}

/** @internal One named ± source of the wire (rectangular unless overridden by name), about `center`. */
export function _wireSource(
  ctx: _SourceContext,
  name: string,
  element: WireSourceElement,
  description: string,
  unit: ErrorSourceUnit,
  limit: number,
  center = 0,
): WireErrorSource {
  // The chain's one source builder; only the element's type is narrower here.
  return _source(ctx, name, element, description, unit, limit, center) as WireErrorSource;
}

/**
 * @internal A source spread over a range [lower, upper] (a temperature anywhere in a range): rectangular
 * with limit half the range, like the chain's ambient input (not overridable: it is a range, not a tolerance).
 */
export function _rangeSource(
  name: string,
  element: WireSourceElement,
  description: string,
  lower: number,
  upper: number,
): WireErrorSource {
  return {
    name,
    element,
    description,
    unit: "°C",
    limit: (upper - lower) / 2,
    distribution: rectangular({ lower, upper }),
  };
}
