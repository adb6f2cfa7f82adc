/**
 * Option checks shared by the propagation engine (internal).
 * @module
 * @internal
 */
import { _requireFinite, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";

/** @internal Throws unless `value` is a finite number ≥ 0. */
export function _requireNonNegative(value: unknown, quantity: string, context: string): number {
  const x = _requireFinite(value, quantity, undefined, context);
  if (x < 0) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: x,
      min: 0,
      context,
      problem: "is negative",
    });
  }
  return x;
}

/** @internal Throws unless `value` is a finite number > 0. */
export function _requirePositive(value: unknown, quantity: string, context: string): number {
  const x = _requireFinite(value, quantity, undefined, context);
  if (!(x > 0)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: x,
      min: 0,
      context,
      problem: "is not greater than 0",
    });
  }
  return x;
}

/** @internal Throws unless `value` is a number in the open interval (0, 1). */
export function _requireProbability(value: unknown, quantity: string, context: string): number {
  const x = _requireFinite(value, quantity, undefined, context);
  if (!(x > 0 && x < 1)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: x,
      min: 0,
      max: 1,
      context,
      problem: "is not strictly between 0 and 1",
    });
  }
  return x;
}

/** @internal Throws unless `value` is an integer in [min, max]. */
export function _requireInteger(value: unknown, quantity: string, min: number, max: number, context: string): number {
  const x = _requireFinite(value, quantity, undefined, context);
  if (!Number.isInteger(x) || x < min || x > max) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: x,
      min,
      max,
      context,
      problem: Number.isInteger(x) ? "is out of range" : "is not an integer",
    });
  }
  return x;
}

/** @internal Degrees of freedom: a number > 0, or `Infinity`; `undefined` means `Infinity`. */
export function _requireDegreesOfFreedom(value: unknown, context: string): number {
  if (value === undefined || value === Number.POSITIVE_INFINITY) return Number.POSITIVE_INFINITY;
  if (typeof value !== "number" || Number.isNaN(value)) {
    throw new HotjunctionTypeError({
      code: "NOT_A_FINITE_NUMBER",
      quantity: "degrees of freedom",
      value,
      context,
      problem: "is not a number",
    });
  }
  if (!(value > 0)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "degrees of freedom",
      value,
      min: 0,
      context,
      problem: "is not greater than 0",
    });
  }
  return value;
}

/** @internal Throws unless `options` is a plain object (or undefined when `optional`). */
export function _requireOptionsObject(options: unknown, context: string, optional: boolean): void {
  if (options === undefined && optional) return;
  if (typeof options !== "object" || options === null || Array.isArray(options)) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "options",
      value: options,
      context,
      problem: "is not an options object",
    });
  }
}

/** @internal Throws when two mutually exclusive option groups are both given or neither is. */
export function _requireOneOf(
  options: object,
  groups: readonly (readonly string[])[],
  context: string,
): number {
  const present = groups.map((group) => group.some((key) => (options as Record<string, unknown>)[key] !== undefined));
  const count = present.filter(Boolean).length;
  if (count !== 1) {
    const described = groups.map((group) => `{ ${group.join(", ")} }`);
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "options",
      value: Object.keys(options).join(", "),
      context,
      problem: count === 0 ? "give none of the accepted forms" : "mix more than one accepted form",
      allowed: described,
    });
  }
  return present.indexOf(true);
}
