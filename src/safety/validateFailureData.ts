/**
 * Validation of user-supplied failure data (rates in FIT, mode shares, fault ids), with one-line typed errors
 * naming the path.
 * @module
 */
import { _requireOptionsObject, _requireShape, HotjunctionRangeError, HotjunctionTypeError, isHotjunctionError, type HotjunctionError } from "../errors.js";
import { _checkNumber, _maxRateFit } from "./_safetyChecks.js";
import type { FailureData } from "./types.js";

/**
 * How far the mode shares of one element may sum from 1: |Σ share − 1| ≤ 0.0001 (shares written in percent
 * with one decimal, e.g. 33.3 %, 33.3 %, 33.4 %, sum exactly).
 * @example
 * ```ts
 * import { failureShareSumTolerance } from "hotjunction";
 * console.log(failureShareSumTolerance); // 0.0001
 * ```
 */
export const failureShareSumTolerance = 0.0001;

/** Options of {@link validateFailureData} and {@link failureDataProblems}. */
export interface ValidateFailureDataOptions {
  /** Fault ids that exist (the catalogue or the review of the chain); when given, every `faultId` must be one. */
  readonly faultIds?: readonly string[];
  /** Prefix of the paths in messages. Default `"failureData"`. */
  readonly path?: string;
}

const context = "failure data";
const safetyWords = ["safe", "dangerous", "degraded", "no-effect"] as const;

function typeError(path: string, value: unknown, problem: string): HotjunctionTypeError {
  return new HotjunctionTypeError({ code: "INVALID_DESIGN", quantity: path, value, context, problem });
}

function collect(data: unknown, options: ValidateFailureDataOptions): HotjunctionError[] {
  _requireOptionsObject(options, "failure data", false);
  _requireShape(options, { path: ["optional", "string"], faultIds: ["optional", ["array", "string"]] }, "options", "failure data");
  const root = options.path ?? "failureData";
  const known = options.faultIds === undefined ? undefined : new Set(options.faultIds);
  const problems: HotjunctionError[] = [];
  const attempt = (f: () => void): void => {
    try {
      f();
    } catch (e) {
      if (isHotjunctionError(e)) problems.push(e);
      else throw e;
    }
  };
  if (typeof data !== "object" || data === null || Array.isArray(data)) return [typeError(root, data, "is not an object")];
  const elements = (data as { elements?: unknown }).elements;
  if (!Array.isArray(elements)) return [typeError(`${root}.elements`, elements, "is not an array")];
  elements.forEach((el: unknown, i) => {
    const ep = `${root}.elements[${i}]`;
    if (typeof el !== "object" || el === null || Array.isArray(el)) {
      problems.push(typeError(ep, el, "is not an object"));
      return;
    }
    const e = el as Record<string, unknown>;
    if (typeof e.element !== "string" || e.element.trim() === "") problems.push(typeError(`${ep}.element`, e.element, "is not a non-empty string"));
    attempt(() => _checkNumber(e.rateFit, `${ep}.rateFit`, 0, _maxRateFit, "FIT", context));
    if (e.rateSource !== undefined && typeof e.rateSource !== "string") problems.push(typeError(`${ep}.rateSource`, e.rateSource, "is not a string"));
    if (!Array.isArray(e.modes) || e.modes.length === 0) {
      problems.push(typeError(`${ep}.modes`, e.modes, "is not a non-empty array"));
      return;
    }
    let sum = 0;
    let sharesFinite = true;
    e.modes.forEach((m: unknown, j) => {
      const mp = `${ep}.modes[${j}]`;
      if (typeof m !== "object" || m === null || Array.isArray(m)) {
        problems.push(typeError(mp, m, "is not an object"));
        sharesFinite = false;
        return;
      }
      const mode = m as Record<string, unknown>;
      if (typeof mode.mode !== "string" || mode.mode.trim() === "") problems.push(typeError(`${mp}.mode`, mode.mode, "is not a non-empty string"));
      try {
        sum += _checkNumber(mode.share, `${mp}.share`, 0, 1, undefined, context);
      } catch (err) {
        sharesFinite = false;
        if (isHotjunctionError(err)) problems.push(err);
        else throw err;
      }
      const hasId = mode.faultId !== undefined;
      const hasAssumed = mode.assumed !== undefined;
      if (hasId === hasAssumed) {
        problems.push(
          new HotjunctionRangeError({ code: "INVALID_DESIGN", quantity: mp, value: m, context, problem: "needs exactly one of faultId and assumed" }),
        );
      }
      if (hasId) {
        if (typeof mode.faultId !== "string") problems.push(typeError(`${mp}.faultId`, mode.faultId, "is not a string"));
        else if (known !== undefined && !known.has(mode.faultId)) {
          problems.push(
            new HotjunctionRangeError({
              code: "UNKNOWN_NAME",
              quantity: `${mp}.faultId`,
              value: mode.faultId,
              context,
              problem: "names no fault of the catalogue or review",
            }),
          );
        }
      }
      if (hasAssumed) {
        const a = mode.assumed as Record<string, unknown> | null;
        if (typeof a !== "object" || a === null || Array.isArray(a)) problems.push(typeError(`${mp}.assumed`, a, "is not an object"));
        else {
          if (!(safetyWords as readonly unknown[]).includes(a.safety)) {
            problems.push(
              new HotjunctionRangeError({
                code: "INVALID_OPTION",
                quantity: `${mp}.assumed.safety`,
                value: a.safety,
                context,
                allowed: safetyWords,
                problem: "is not a valid choice",
              }),
            );
          }
          if (typeof a.detected !== "boolean") problems.push(typeError(`${mp}.assumed.detected`, a.detected, "is not a boolean"));
        }
      }
    });
    if (sharesFinite && Math.abs(sum - 1) > failureShareSumTolerance) {
      problems.push(
        new HotjunctionRangeError({
          code: "INVALID_DESIGN",
          quantity: `${ep}.modes[*].share`,
          value: +sum.toPrecision(12),
          context,
          min: 1 - failureShareSumTolerance,
          max: 1 + failureShareSumTolerance,
          problem: "is the sum of the shares, not 1",
        }),
      );
    }
  });
  return problems;
}

/** True when no number in `value` (at any depth of plain objects and arrays) is NaN or ±Infinity. */
function isFiniteData(value: unknown, depth = 0): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  if (typeof value !== "object" || value === null || depth > 8) return true;
  return Object.values(value).every((v) => isFiniteData(v, depth + 1));
}

/**
 * Every problem of a failure-data object at once (for a `validate` listing), each a typed error with a one-line
 * message naming the path (`failureData.elements[2].modes[1].share`), the value and the valid range.
 * @param data - the failure data (any value)
 * @param options - known fault ids, path prefix
 * @returns the problems, empty when the data is valid (a value holding NaN or ±Infinity is a non-enumerable `value`)
 * @throws HotjunctionTypeError (code `INVALID_DESIGN`) when `data` is not an object with an `elements` array
 * @example
 * ```ts
 * import { failureDataProblems } from "hotjunction";
 * const problems = failureDataProblems({ elements: [{ element: "thermocouple", rateFit: -5, modes: [{ mode: "open", share: 0.5, faultId: "thermocouple.open" }] }] });
 * console.log(problems.length); // 2
 * console.log(problems[0]?.message); // "failure data: failureData.elements[0].rateFit -5 FIT is out of range; valid range 0 to 1000000000 FIT"
 * ```
 */
export function failureDataProblems(data: unknown, options: ValidateFailureDataOptions = {}): HotjunctionError[] {
  const problems = collect(data, options);
  // a value that is not failure data at all (no object, no elements array) is a wrong argument: thrown, not listed
  const elements = typeof data === "object" && data !== null && !Array.isArray(data) ? (data as { elements?: unknown }).elements : undefined;
  if (!Array.isArray(elements)) throw problems[0]!;
  // A listed problem keeps the value as given, but one holding NaN or ±Infinity keeps it as a non-enumerable field
  // (as `message` is): the listing is data that is spread and serialized (JSON would print NaN as null), and a
  // listing must carry no non-finite number; `value` and the message still show it.
  for (const problem of problems) {
    if (!isFiniteData(problem.value)) Object.defineProperty(problem, "value", { enumerable: false });
  }
  return problems;
}

/**
 * Checks failure data: every rate finite in [0, 1e9] FIT, every share in [0, 1], the shares of each element
 * summing to 1 within {@link failureShareSumTolerance}, each mode naming exactly one of a `faultId` (that exists,
 * when `faultIds` is given) and an `assumed` class.
 * @param data - the failure data (any value)
 * @param options - known fault ids, path prefix
 * @returns the data, typed
 * @throws the first problem of {@link failureDataProblems}: HotjunctionTypeError (non-finite or wrong kind) or
 *   HotjunctionRangeError (out of range, unknown fault id, shares not summing to 1), one line naming the path
 * @example
 * ```ts
 * import { validateFailureData } from "hotjunction";
 * try {
 *   validateFailureData({ elements: [{ element: "thermocouple", rateFit: 20, modes: [{ mode: "open", share: 1, faultId: "thermocouple.opn" }] }] }, { faultIds: ["thermocouple.open"] });
 * } catch (e) {
 *   console.log((e as Error).message); // "failure data: failureData.elements[0].modes[0].faultId \"thermocouple.opn\" names no fault of the catalogue or review"
 * }
 * ```
 */
export function validateFailureData(data: unknown, options: ValidateFailureDataOptions = {}): FailureData {
  const problems = collect(data, options);
  if (problems.length > 0) throw problems[0];
  return data as FailureData;
}
