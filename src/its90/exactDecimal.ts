/**
 * Decimal (arbitrary-precision) evaluation of the reference functions with decimal.js, from the same
 * decimal-text coefficients as the float64 path. Used for published-style reference tables (rounding
 * on the exact decimal value, so no float rounding flips a digit) and as the check path of the tests.
 * Lives in the `hotjunction/exact` entry so that the core entry carries no decimal.js.
 * @module
 */
import { Decimal } from "decimal.js";
import type { ThermocoupleData } from "../data/thermocoupleData.js";
import { _requireFinite, HotjunctionRangeError } from "../errors.js";
import { thermocoupleData } from "./resolveType.js";
import type { ThermocoupleTypeInput } from "./convert.js";

/** A decimal.js constructor working at `digits` significant digits. @internal */
export function _decimalContext(digits: number): typeof Decimal {
  return Decimal.clone({ precision: digits, rounding: Decimal.ROUND_HALF_EVEN, toExpNeg: -60, toExpPos: 60 });
}

/**
 * E(t) evaluated in decimal arithmetic at `digits` significant digits (default 40), from the standard's
 * printed coefficients; the sub-range rule is the float path's (a shared end point belongs to the upper
 * sub-range).
 * @param type - thermocouple type
 * @param temperatureC - temperature, °C, as a number or decimal text (text keeps every digit)
 * @param digits - working precision in significant digits, 20 to 200 (default 40)
 * @returns EMF, mV, as decimal text with `digits` significant digits
 * @throws HotjunctionRangeError outside the type's range or for `digits` outside 20–200
 * @example
 * ```ts
 * import { emfFromTemperatureDecimal } from "hotjunction/exact";
 * console.log(emfFromTemperatureDecimal("K", "500").slice(0, 12)); // 20.644286390
 * ```
 */
export function emfFromTemperatureDecimal(
  type: ThermocoupleTypeInput,
  temperatureC: number | string,
  digits = 40,
): string {
  const data = thermocoupleData(type);
  return _emfDecimal(data, temperatureC, digits).toString();
}

/** @internal */
export function _emfDecimal(data: ThermocoupleData, temperatureC: number | string, digits: number): Decimal {
  if (typeof digits !== "number" || !Number.isInteger(digits) || digits < 20 || digits > 200) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "digits",
      value: digits,
      min: 20,
      max: 200,
      problem: "is not an integer in range",
    });
  }
  const D = _decimalContext(digits);
  let t: Decimal;
  if (typeof temperatureC !== "string") {
    t = new D(_requireFinite(temperatureC, "temperature", "°C", `type ${data.type}`));
  } else {
    let parsed: Decimal | undefined;
    try {
      parsed = new D(temperatureC);
    } catch {
      parsed = undefined;
    }
    if (parsed === undefined || !parsed.isFinite()) {
      _requireFinite(temperatureC, "temperature", "°C", `type ${data.type}`);
      throw new Error("unreachable");
    }
    t = parsed;
  }
  const minC = new D(String(data.minC));
  const maxC = new D(String(data.maxC));
  if (t.lt(minC) || t.gt(maxC)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "temperature",
      value: typeof temperatureC === "number" ? temperatureC : t.toNumber(),
      min: minC.toNumber(),
      max: maxC.toNumber(),
      unit: "°C",
      context: `type ${data.type}`,
    });
  }
  let index = 0;
  for (let i = data.forward.length - 1; i > 0; i--) {
    if (t.gte(new D(String((data.forward[i] as { minC: number }).minC)))) {
      index = i;
      break;
    }
  }
  const sub = data.forward[index];
  if (sub === undefined) throw new Error("unreachable");
  let acc = new D(0);
  // String(x) of each coefficient is exactly the printed decimal (at most 12 significant digits).
  for (let i = sub.coefficients.length - 1; i >= 0; i--) acc = acc.times(t).plus(new D(String(sub.coefficients[i])));
  if (data.exponential !== undefined && sub.minC >= 0) {
    const e = data.exponential;
    const d = t.minus(new D(String(e.a2)));
    acc = acc.plus(new D(String(e.a0)).times(D.exp(new D(String(e.a1)).times(d).times(d))));
  }
  return acc;
}
