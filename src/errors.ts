/**
 * The one error family of hotjunction.
 *
 * Every error the library throws on bad input is one of two classes: {@link HotjunctionTypeError}
 * (a value that is not a usable number, string or object at all) or {@link HotjunctionRangeError}
 * (a well-formed value outside what the quantity allows). Both carry a stable `code`, the
 * `quantity` that failed, the offending `value`, and, where there is one, the valid range and
 * unit. The message is built from those fields by one helper, so every message reads the same way:
 *
 * `<context>: <quantity> <value> <unit> is <problem>; valid range <min> to <max> <unit>`
 *
 * This module is also the one home of the input checks (`_require*`, `_invalidChoice`): every other module
 * imports them from here (`chain/_common.ts` and `uncertainty/_checks.ts` only re-export them), so a message
 * reads the same wherever it is thrown. They are plain function declarations: a bundle keeps only the checks
 * it calls.
 *
 * @module
 */

/** Stable machine-readable codes of the error family. */
export type ErrorCode =
  | "NOT_A_FINITE_NUMBER"
  | "OUT_OF_RANGE"
  | "UNKNOWN_TYPE"
  | "AMBIGUOUS_EMF"
  | "INVALID_OPTION"
  | "UNKNOWN_NAME"
  | "NOT_POSITIVE_DEFINITE"
  | "MODEL_NOT_FINITE"
  | "INVALID_DESIGN"
  | "OVERFLOW";

/** Structured fields of an error of the family. */
export interface ErrorDetails {
  /** Stable code, safe to branch on. */
  readonly code: ErrorCode;
  /** The quantity that failed, in words (e.g. `"temperature"`, `"EMF"`, `"coverage"`). */
  readonly quantity: string;
  /** The offending value as given. */
  readonly value: unknown;
  /** Lowest valid value, where a range applies. */
  readonly min?: number | undefined;
  /** Highest valid value, where a range applies. */
  readonly max?: number | undefined;
  /** Unit of `value`, `min` and `max` (e.g. `"°C"`, `"mV"`). */
  readonly unit?: string | undefined;
  /** What the value belongs to (e.g. `"type K"`). */
  readonly context?: string | undefined;
  /** What is wrong, when the range alone does not say it. */
  readonly problem?: string | undefined;
  /** The valid choices, for enumerations. */
  readonly allowed?: readonly string[] | undefined;
}

function formatValue(value: unknown): string {
  if (typeof value === "string") return JSON.stringify(value.length > 60 ? value.slice(0, 57) + "..." : value);
  if (typeof value === "function") return "a function";
  if (Array.isArray(value)) return `an array of length ${value.length}`;
  if (typeof value === "object" && value) return "a value of type object";
  return Object.is(value, -0) ? "-0" : String(value);
}

/**
 * Builds the one-line message of an error of the family from its fields.
 * @internal
 */
export function _formatErrorMessage({ context, quantity, value, unit, problem, min, max, allowed }: ErrorDetails): string {
  const unitText = unit === undefined ? "" : ` ${unit}`;
  // One template: the optional parts are empty strings when their field is absent.
  return `${context === undefined ? "" : `${context}: `}${quantity} ${formatValue(value)}${typeof value === "number" ? unitText : ""} ${
    problem ?? "is out of range"
  }${min === undefined && max === undefined ? "" : `; valid range ${min ?? -Infinity} to ${max ?? Infinity}${unitText}`}${
    allowed === undefined ? "" : `; valid: ${allowed.join(", ")}`
  }`;
}

// Deliberately alike: the two error classes carry the same fields; each extends its own built-in (RangeError,
// TypeError) so that `instanceof` works with either, which one shared base class cannot give.
/** A value outside what its quantity allows (out of range, unknown choice, ambiguous inverse...). */
export class HotjunctionRangeError extends RangeError implements ErrorDetails {
  override readonly name = "HotjunctionRangeError";
  declare readonly code: ErrorCode;
  declare readonly quantity: string;
  declare readonly value: unknown;
  declare readonly min: number | undefined;
  declare readonly max: number | undefined;
  declare readonly unit: string | undefined;
  declare readonly context: string | undefined;
  declare readonly problem: string | undefined;
  declare readonly allowed: readonly string[] | undefined;
  constructor(details: ErrorDetails) {
    super(_formatErrorMessage(details));
    Object.assign(this, details);
  }
}

// Deliberately alike: the fields of HotjunctionRangeError above, on TypeError (see there).
/** A value that is not of a usable kind at all (NaN, ±Infinity, a string where a number belongs...). */
export class HotjunctionTypeError extends TypeError implements ErrorDetails {
  override readonly name = "HotjunctionTypeError";
  declare readonly code: ErrorCode;
  declare readonly quantity: string;
  declare readonly value: unknown;
  declare readonly min: number | undefined;
  declare readonly max: number | undefined;
  declare readonly unit: string | undefined;
  declare readonly context: string | undefined;
  declare readonly problem: string | undefined;
  declare readonly allowed: readonly string[] | undefined;
  constructor(details: ErrorDetails) {
    super(_formatErrorMessage(details));
    Object.assign(this, details);
  }
}

/** Either error of the family. */
export type HotjunctionError = HotjunctionRangeError | HotjunctionTypeError;

/**
 * Tells whether a caught value is an error of the hotjunction family.
 * @example
 * ```ts
 * import { isHotjunctionError, emfFromTemperature } from "hotjunction";
 * try { emfFromTemperature("K", 5000); } catch (e) { console.log(isHotjunctionError(e)); } // true
 * ```
 */
export function isHotjunctionError(error: unknown): error is HotjunctionError {
  return error instanceof HotjunctionRangeError || error instanceof HotjunctionTypeError;
}

/**
 * Throws a {@link HotjunctionTypeError} unless `value` is a finite number.
 * @internal
 */
export function _requireFinite(value: unknown, quantity: string, unit?: string, context?: string): number {
  // Number.isFinite is false for every non-number (no coercion), so this one test refuses both.
  if (!Number.isFinite(value)) {
    throw new HotjunctionTypeError({
      code: "NOT_A_FINITE_NUMBER",
      quantity,
      value,
      unit,
      context,
      problem: "is not a finite number",
    });
  }
  return value as number;
}

/**
 * Throws unless `value` is a finite number within `[min, max]`.
 * @internal
 */
export function _requireInRange(
  value: unknown,
  quantity: string,
  min: number,
  max: number,
  unit?: string,
  context?: string,
): number {
  const x = _requireFinite(value, quantity, unit, context);
  if (x < min || x > max) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: x, min, max, unit, context });
  }
  return x;
}

/**
 * Throws an `INVALID_OPTION` range error for an option that is not one of `allowed`.
 * @internal
 */
export function _invalidChoice(quantity: string, value: unknown, allowed: readonly string[], context?: string): never {
  throw new HotjunctionRangeError({
    code: "INVALID_OPTION",
    quantity,
    value,
    allowed,
    context,
    problem: "is not a valid choice",
  });
}

/**
 * Throws an `INVALID_OPTION` range error unless `value` is one of `allowed` (a string enumeration).
 * @internal
 */
export function _requireChoice<T extends string>(value: unknown, quantity: string, allowed: readonly T[], context?: string): T {
  if (typeof value !== "string" || !(allowed as readonly string[]).includes(value)) _invalidChoice(quantity, value, allowed, context);
  return value as T;
}

/**
 * Throws unless `value` is a finite number strictly greater than `bound` (an equal value is refused).
 * `boundName` names the bound in the message when it is another quantity (e.g. `"maxNormalOperatingC 80 °C"`).
 * @internal
 */
export function _requireGreaterThan(
  value: unknown,
  quantity: string,
  bound: number,
  unit?: string,
  context?: string,
  boundName?: string,
): number {
  const x = _requireFinite(value, quantity, unit, context);
  if (!(x > bound)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: x,
      min: bound,
      unit,
      context,
      problem: `is not greater than ${boundName ?? bound}`,
    });
  }
  return x;
}

/**
 * Throws unless `value` is a finite number > 0.
 * @internal
 */
export function _requirePositive(value: unknown, quantity: string, unit?: string, context?: string): number {
  return _requireGreaterThan(value, quantity, 0, unit, context);
}

/**
 * Throws unless `value` is a finite number ≥ 0 (a ± limit, a half-width, a standard deviation).
 * @internal
 */
export function _requireNonNegative(value: unknown, quantity: string, unit?: string, context?: string): number {
  const x = _requireFinite(value, quantity, unit, context);
  if (x < 0) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: x, min: 0, unit, context, problem: "is negative" });
  }
  return x;
}

/**
 * Throws unless `value` is a fraction limit in [0, 1) (0.01 for 1 %).
 * @internal
 */
// Deliberately alike: _requireProbability below has the same error object with its own bound and problem text.
export function _requireFraction(value: unknown, quantity: string, context?: string): number {
  const x = _requireNonNegative(value, quantity, "fraction", context);
  if (x >= 1) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: x,
      min: 0,
      max: 1,
      unit: "fraction",
      context,
      problem: "is 1 or more (fractions are stated as 0.01 for 1 %)",
    });
  }
  return x;
}

/**
 * Throws unless `value` is a number in the open interval (0, 1).
 * @internal
 */
// Deliberately alike: _requireFraction above has the same error object with its own bound and problem text.
export function _requireProbability(value: unknown, quantity: string, context?: string): number {
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

/**
 * Throws unless `value` is an integer in [min, max].
 * @internal
 */
export function _requireInteger(value: unknown, quantity: string, min: number, max: number, context?: string): number {
  const x = _requireFinite(value, quantity, undefined, context);
  // Deliberately alike: chain/adc.ts `_requireAdcBits` is the same check with its own message for ADC bits.
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

/**
 * Throws unless `value` is β of a trapezoid, in [0, 1].
 * @internal
 */
export function _requireBeta(value: unknown, context?: string): number {
  return _requireInRange(value, "beta", 0, 1, undefined, context);
}

/**
 * Degrees of freedom: a number > 0, or `Infinity`; `undefined` means `Infinity`.
 * @internal
 */
export function _requireDegreesOfFreedom(value: unknown, context?: string): number {
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

/**
 * Throws unless `value` is a plain object (not null, not an array).
 * @internal
 */
export function _requireObject(value: unknown, quantity: string, context?: string): Record<string, unknown> {
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity, value, context, problem: "is not an object" });
  }
  return value as Record<string, unknown>;
}

/**
 * Throws unless `options` is a plain object (or undefined when `optional`).
 * @internal
 */
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

/**
 * Throws when two mutually exclusive option groups are both given or neither is; returns the index of the
 * group given.
 * @internal
 */
export function _requireOneOf(options: object, groups: readonly (readonly string[])[], context: string): number {
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

/**
 * Throws unless `min ≤ max` (both finite); returns the pair.
 * @internal
 */
export function _requireOrderedPair(
  min: unknown,
  max: unknown,
  quantityMin: string,
  quantityMax: string,
  unit: string,
  context?: string,
): readonly [number, number] {
  const lo = _requireFinite(min, quantityMin, unit, context);
  const hi = _requireFinite(max, quantityMax, unit, context);
  if (lo > hi) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: quantityMax,
      value: hi,
      min: lo,
      unit,
      context,
      problem: `is below ${quantityMin} ${lo} ${unit}`,
    });
  }
  return [lo, hi];
}

/**
 * Throws an `OVERFLOW` range error unless a computed `result` is finite (inputs that are finite but so large or
 * so small that the result leaves the float64 range, e.g. 1e308 V in mV); `input` is the value given.
 * @internal
 */
export function _requireFiniteResult(result: number, quantity: string, input: number, unit?: string, context?: string): number {
  if (!Number.isFinite(result)) {
    throw new HotjunctionRangeError({
      code: "OVERFLOW",
      quantity,
      value: input,
      unit,
      context,
      problem: `gives a result outside the float64 range (${result > 0 ? "above" : "below"} ±1.8e308)`,
    });
  }
  return result;
}

/**
 * The text of a value inside a context (`type ${…} cable`): a string as it is, anything else as the error
 * messages show it (never throws, even for an object without a string form).
 * @internal
 */
export function _label(value: unknown): string {
  return typeof value === "string" ? value : formatValue(value);
}

/**
 * Throws an `OUT_OF_RANGE` range error when the work a call would do — the product of `factors` (each named,
 * e.g. `{ setpoints: 3, "reference options": 4, trials: 1e7 }`) — exceeds `limit`; the message names the product,
 * its factors and the limit.
 * @internal
 */
export function _requireWorkWithin(factors: Readonly<Record<string, number>>, limit: number, context?: string): void {
  const names = Object.keys(factors);
  let product = 1;
  for (const name of names) product *= factors[name] as number;
  if (product > limit) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: names.join(" × "),
      value: product,
      min: 0,
      max: limit,
      context,
      problem: `is more work than one call may do (${names.map((n) => `${factors[n]} ${n}`).join(" × ")}); use fewer`,
    });
  }
}

/**
 * The shape a formatter expects of a result object it is given (a report, a review, a curve): `"number"` a finite
 * number, `"positive"` a finite number > 0, `"fraction"` a number in [0, 1], `"string"`, `"boolean"`, `"any"` (not checked), `["array", shape]`
 * an array of that shape, `["optional", shape]` undefined or that shape, `["nullable", shape]` null or that shape,
 * `["oneOf", [choices]]` one of those strings, or an object literal: a plain object whose listed keys have those shapes (other keys are not checked).
 * @internal
 */
export type _Shape =
  | "number"
  | "positive"
  | "fraction"
  | "string"
  | "boolean"
  | "any"
  | readonly ["array" | "optional" | "nullable", _Shape]
  | readonly ["oneOf", readonly string[]]
  | { readonly [key: string]: _Shape };

function shapeWords(shape: _Shape): string {
  if (typeof shape === "string") return shape === "number" ? "a finite number" : shape === "positive" ? "a finite number > 0" : shape === "fraction" ? "a number from 0 to 1" : `a ${shape}`;
  if (Array.isArray(shape) && shape[0] === "oneOf") return `one of ${(shape[1] as string[]).join(", ")}`;
  if (Array.isArray(shape)) return shape[0] === "array" ? "an array" : `${shapeWords(shape[1] as _Shape)}${shape[0] === "optional" ? " or undefined" : " or null"}`;
  return "an object";
}

/**
 * Throws a {@link HotjunctionTypeError} (`INVALID_OPTION`) naming the field (`quantity.path[0].key`), the expected
 * kind and the value found, unless `value` has `shape`: the one guard at the entry of every formatter, so a forged
 * or truncated result object is refused before it reaches a loop, a log scale or a string (no NaN, no hang).
 * @internal
 */
export function _requireShape(value: unknown, shape: _Shape, quantity: string, context?: string): void {
  const fail = (): never => {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity, value, context, problem: `is not ${shapeWords(shape)}` });
  };
  if (typeof shape === "string") {
    if (shape === "any") return;
    if (shape === "number" || shape === "positive" || shape === "fraction") {
      if (typeof value !== "number" || !Number.isFinite(value) || (shape === "positive" && !(value > 0)) || (shape === "fraction" && !(value >= 0 && value <= 1))) fail();
    } else if (typeof value !== shape) fail();
    return;
  }
  if (Array.isArray(shape)) {
    const [kind, inner] = shape as readonly [string, _Shape];
    if (kind === "oneOf") {
      if (!(inner as readonly unknown[]).includes(value)) fail();
      return;
    }
    if (kind === "optional" && value === undefined) return;
    if (kind === "nullable" && value === null) return;
    if (kind !== "array") {
      // a leaf names the whole expectation ("a finite number or null"); a nested shape names the field that fails
      if (typeof inner === "string" && inner !== "any") {
        try {
          _requireShape(value, inner, quantity, context);
        } catch {
          fail();
        }
        return;
      }
      return _requireShape(value, inner, quantity, context);
    }
    if (!Array.isArray(value)) return fail();
    for (let i = 0; i < value.length; i++) _requireShape(value[i], inner, `${quantity}[${i}]`, context);
    return;
  }
  if (typeof value !== "object" || value === null || Array.isArray(value)) return fail();
  for (const key of Object.keys(shape)) _requireShape((value as Record<string, unknown>)[key], (shape as Record<string, _Shape>)[key]!, `${quantity}.${key}`, context);
}

/**
 * Throws a {@link HotjunctionTypeError} (`NOT_A_FINITE_NUMBER`) naming the path (`quantity.rows[3].shiftC`) of the
 * first number that is not finite anywhere in `value` (plain objects and arrays at any depth; an object seen twice
 * is walked once; deeper than 64 levels is refused): the guard of a function that returns data it was given as it
 * is (a review, a part of a report), so NaN or ±Infinity in a forged field, whatever its expected kind, is refused
 * by name instead of returned.
 * @internal
 */
export function _requireFiniteData(value: unknown, quantity: string, context?: string, seen: Set<object> = new Set(), depth = 0): void {
  if (typeof value === "number") {
    _requireFinite(value, quantity, undefined, context);
    return;
  }
  if (typeof value !== "object" || value === null || seen.has(value)) return;
  if (depth > 64) throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity, value, context, problem: "is nested more than 64 levels deep" });
  seen.add(value);
  const list = Array.isArray(value);
  for (const key of Object.keys(value)) {
    _requireFiniteData((value as Record<string, unknown>)[key], list ? `${quantity}[${key}]` : `${quantity}.${key}`, context, seen, depth + 1);
  }
}
