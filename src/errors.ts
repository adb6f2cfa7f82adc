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
  if (typeof value === "string") return JSON.stringify(value.length > 60 ? `${value.slice(0, 57)}...` : value);
  if (typeof value === "function") return "a function";
  if (Array.isArray(value)) return `an array of length ${value.length}`;
  if (typeof value === "object" && value !== null) return "a value of type object";
  return Object.is(value, -0) ? "-0" : String(value);
}

/**
 * Builds the one-line message of an error of the family from its fields.
 * @internal
 */
export function _formatErrorMessage({ context, quantity, value, unit, problem, min, max, allowed }: ErrorDetails): string {
  const unitText = unit === undefined ? "" : ` ${unit}`;
  let text = `${context === undefined ? "" : `${context}: `}${quantity} ${formatValue(value)}`;
  text += `${typeof value === "number" ? unitText : ""} ${problem ?? "is out of range"}`;
  if (min !== undefined || max !== undefined) text += `; valid range ${min ?? -Infinity} to ${max ?? Infinity}${unitText}`;
  return allowed === undefined ? text : `${text}; valid: ${allowed.join(", ")}`;
}

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
    _assignDetails(this, details);
  }
}

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
    _assignDetails(this, details);
  }
}

/** Copies the structured fields onto an error. @internal */
function _assignDetails(target: object, details: ErrorDetails): void {
  Object.assign(target, details);
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
