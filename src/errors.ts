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
  if (typeof value === "number") {
    if (Object.is(value, -0)) return "-0";
    return String(value);
  }
  if (typeof value === "string") return JSON.stringify(value.length > 60 ? `${value.slice(0, 57)}...` : value);
  if (value === null) return "null";
  if (value === undefined) return "undefined";
  if (typeof value === "bigint") return `${value}n`;
  if (Array.isArray(value)) return `an array of length ${value.length}`;
  return `a value of type ${typeof value}`;
}

/**
 * Builds the one-line message of an error of the family from its fields.
 * @internal
 */
export function _formatErrorMessage(details: ErrorDetails): string {
  const head = details.context !== undefined ? `${details.context}: ` : "";
  const unit = details.unit !== undefined ? ` ${details.unit}` : "";
  let text = `${head}${details.quantity} ${formatValue(details.value)}${typeof details.value === "number" ? unit : ""}`;
  text += ` ${details.problem ?? "is out of range"}`;
  if (details.min !== undefined || details.max !== undefined) {
    const lo = details.min !== undefined ? String(details.min) : "-Infinity";
    const hi = details.max !== undefined ? String(details.max) : "Infinity";
    text += `; valid range ${lo} to ${hi}${unit}`;
  }
  if (details.allowed !== undefined) {
    text += `; valid: ${details.allowed.join(", ")}`;
  }
  return text;
}

/** A value outside what its quantity allows (out of range, unknown choice, ambiguous inverse...). */
export class HotjunctionRangeError extends RangeError implements ErrorDetails {
  override readonly name = "HotjunctionRangeError";
  readonly code: ErrorCode;
  readonly quantity: string;
  readonly value: unknown;
  readonly min: number | undefined;
  readonly max: number | undefined;
  readonly unit: string | undefined;
  readonly context: string | undefined;
  readonly problem: string | undefined;
  readonly allowed: readonly string[] | undefined;
  constructor(details: ErrorDetails) {
    super(_formatErrorMessage(details));
    this.code = details.code;
    this.quantity = details.quantity;
    this.value = details.value;
    this.min = details.min;
    this.max = details.max;
    this.unit = details.unit;
    this.context = details.context;
    this.problem = details.problem;
    this.allowed = details.allowed;
  }
}

/** A value that is not of a usable kind at all (NaN, ±Infinity, a string where a number belongs...). */
export class HotjunctionTypeError extends TypeError implements ErrorDetails {
  override readonly name = "HotjunctionTypeError";
  readonly code: ErrorCode;
  readonly quantity: string;
  readonly value: unknown;
  readonly min: number | undefined;
  readonly max: number | undefined;
  readonly unit: string | undefined;
  readonly context: string | undefined;
  readonly problem: string | undefined;
  readonly allowed: readonly string[] | undefined;
  constructor(details: ErrorDetails) {
    super(_formatErrorMessage(details));
    this.code = details.code;
    this.quantity = details.quantity;
    this.value = details.value;
    this.min = details.min;
    this.max = details.max;
    this.unit = details.unit;
    this.context = details.context;
    this.problem = details.problem;
    this.allowed = details.allowed;
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
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new HotjunctionTypeError({
      code: "NOT_A_FINITE_NUMBER",
      quantity,
      value,
      unit,
      context,
      problem: "is not a finite number",
    });
  }
  return value;
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
