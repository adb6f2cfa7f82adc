/**
 * Reading a design file safely: size cap, strict JSON syntax check with line and column, nesting cap, refused
 * keys, then the zod schema, then cross-field rules. Every failure is one {@link DesignFileError}; nothing else
 * escapes, whatever the input.
 * @module
 */
import type * as z from "zod";
import { DesignFileError } from "./designFileError.js";
import { designFileSchema, referenceSchema, type DesignFile, type DesignReference } from "./designSchema.js";
import { _checkDesignRules, _checkReferenceRules, type DesignRuleProblem } from "./designRules.js";
import { HotjunctionTypeError, _requireObject, _requireOptionsObject } from "../errors.js";
import { _formatPath, _scanJson } from "./scanJson.js";

/** Largest design file accepted, bytes (1 MiB). */
export const designFileMaxBytes = 1_048_576;
/** Deepest nesting of objects and arrays accepted in a design file. */
export const designFileMaxDepth = 32;

/** Options of {@link parseDesign}. */
export interface ParseDesignOptions {
  /** Name shown at the start of error messages. Default `"design"`. */
  readonly fileName?: string;
}

/** Result of {@link safeParseDesign}. */
export type SafeParseDesignResult =
  | { readonly success: true; readonly design: DesignFile }
  | { readonly success: false; readonly error: DesignFileError };

function utf8Length(text: string): number {
  return new TextEncoder().encode(text).length;
}

function describeFound(value: unknown): string {
  if (value === undefined) return "nothing";
  if (value === null) return "null";
  if (typeof value === "string") return JSON.stringify(value.length > 40 ? `${value.slice(0, 37)}...` : value);
  if (typeof value === "number") return String(value);
  if (typeof value === "boolean") return String(value);
  if (Array.isArray(value)) return `an array of ${value.length} item${value.length === 1 ? "" : "s"}`;
  if (typeof value === "object") return "an object";
  return `a ${typeof value}`;
}

const expectedNames: Record<string, string> = {
  number: "a number",
  int: "a whole number",
  string: "a text string",
  object: "an object",
  array: "an array",
  boolean: "true or false",
  literal: "a fixed value",
};

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let current: unknown = root;
  for (const key of path) {
    if (current === null || typeof current !== "object") return undefined;
    if (!Object.prototype.hasOwnProperty.call(current, key)) return undefined;
    current = (current as Record<PropertyKey, unknown>)[key];
  }
  return current;
}

function listChoices(values: readonly unknown[]): string {
  return values.map((v) => JSON.stringify(v)).join(", ");
}

function bound(issue: { minimum?: unknown; maximum?: unknown; inclusive?: boolean; origin?: string }, low: boolean): string {
  const limit = String(low ? issue.minimum : issue.maximum);
  if (issue.origin === "array") return low ? `at least ${limit} item(s)` : `at most ${limit} items`;
  if (issue.origin === "string") return low ? `at least ${limit} character(s)` : `at most ${limit} characters`;
  const op = low ? (issue.inclusive === false ? ">" : "≥") : issue.inclusive === false ? "<" : "≤";
  return `a number ${op} ${limit}`;
}

/** One zod issue as `{ path, problem }` in the file's words. @internal */
export function _describeIssue(issue: z.core.$ZodIssue, input: unknown): { path: string; problem: string } {
  const path = issue.path.filter((p): p is string | number => typeof p !== "symbol");
  const found = valueAt(input, issue.path);
  const foundText = describeFound(found);
  switch (issue.code) {
    case "invalid_type": {
      const expected = expectedNames[issue.expected] ?? issue.expected;
      if (found === undefined) return { path: _formatPath(path), problem: `required key is missing (expected ${expected})` };
      if (issue.expected === "number" && typeof found === "number") {
        return { path: _formatPath(path), problem: `expected a finite number, found ${foundText}` };
      }
      return { path: _formatPath(path), problem: `expected ${expected}, found ${foundText}` };
    }
    case "unrecognized_keys": {
      const keys = issue.keys.map((k) => JSON.stringify(k.length > 40 ? `${k.slice(0, 37)}...` : k));
      return {
        path: _formatPath(path),
        problem: `unknown key${keys.length === 1 ? "" : "s"} ${keys.join(", ")} (keys are case-sensitive; see the JSON Schema)`,
      };
    }
    case "invalid_value":
      return {
        path: _formatPath(path),
        problem:
          issue.values.length === 1
            ? `expected ${listChoices(issue.values)}, found ${foundText}`
            : `expected one of ${listChoices(issue.values)}, found ${foundText}`,
      };
    case "invalid_union": {
      const options = (issue as { options?: readonly unknown[] }).options;
      if (options !== undefined) {
        return {
          path: _formatPath(path),
          problem: `expected one of ${listChoices(options)}, found ${foundText}`,
        };
      }
      return { path: _formatPath(path), problem: `does not match any allowed form, found ${foundText}` };
    }
    case "too_small":
      return { path: _formatPath(path), problem: `expected ${bound(issue, true)}, found ${foundText}` };
    case "too_big":
      return { path: _formatPath(path), problem: `expected ${bound(issue, false)}, found ${foundText}` };
    default:
      return { path: _formatPath(path), problem: `${issue.message}, found ${foundText}` };
  }
}

/** Keys refused anywhere in a design, as `parseDesign`'s scanner refuses them in the text. */
const forbiddenKeys: readonly string[] = ["__proto__", "constructor", "prototype"];

/**
 * The first own key `__proto__`, `constructor` or `prototype` anywhere in `value` (as `JSON.parse` makes them:
 * own properties), with the path of the object holding it. Objects seen twice (cycles) are walked once.
 */
function findForbiddenKey(value: unknown): { key: string; path: (string | number)[] } | undefined {
  const seen = new Set<object>();
  const path: (string | number)[] = [];
  const walk = (node: unknown): string | undefined => {
    if (node === null || typeof node !== "object" || seen.has(node)) return undefined;
    seen.add(node);
    const keys = Object.keys(node);
    if (!Array.isArray(node)) for (const key of forbiddenKeys) if (Object.prototype.hasOwnProperty.call(node, key)) return key;
    for (const key of keys) {
      path.push(Array.isArray(node) ? Number(key) : key);
      const found = walk((node as Record<string, unknown>)[key]);
      if (found !== undefined) return found;
      path.pop();
    }
    return undefined;
  };
  const key = walk(value);
  return key === undefined ? undefined : { key, path };
}

/**
 * Validates an already-parsed value (e.g. from `JSON.parse`) as a design: schema, then cross-field rules.
 * @param value - anything
 * @param options - `fileName` for messages
 * @returns the design, typed
 * @throws DesignFileError (code `INVALID_DESIGN`) naming the first problem and counting the others
 * @example
 * ```ts
 * import { validateDesign } from "hotjunction/design";
 * try { validateDesign({ hotjunctionDesign: 2 }, { fileName: "oven.json" }); }
 * catch (e) { console.log((e as Error).message.startsWith("oven.json: at hotjunctionDesign: expected 1, found 2")); } // true
 * ```
 */
export function validateDesign(value: unknown, options: ParseDesignOptions = {}): DesignFile {
  const fileName = fileNameOf(options, "validateDesign");
  const forbidden = findForbiddenKey(value);
  if (forbidden !== undefined) {
    const path = _formatPath(forbidden.path);
    throw new DesignFileError({ fileName, path, problem: `key "${forbidden.key}" is not allowed`, quantity: quantityAt(path), value: forbidden.key });
  }
  // jitless: the compiled fast path costs more to generate (about 30 ms of a one-file CLI run) than it saves on one document
  const result = designFileSchema.safeParse(value, { jitless: true });
  if (!result.success) throw schemaFailure(result.error.issues, value, fileName);
  const problems = _checkDesignRules(result.data);
  if (problems.length > 0) throw rulesFailure(problems, value, fileName);
  return result.data;
}

/** The quantity an error names for a problem at `path` (`"design.reference.nominalVolts"`). */
function quantityAt(path: string, root = "design"): string {
  if (root === "") return path;
  return path === "" ? root : path.startsWith("[") ? `design${path}` : `design.${path}`;
}

/** The keys of a path as `_formatPath` writes it (`a.b[1]["c d"]`). */
function pathKeys(path: string): (string | number)[] {
  const keys: (string | number)[] = [];
  for (const m of path.matchAll(/([A-Za-z_$][\w$]*)|\[(\d+)\]|\[("(?:[^"\\]|\\.)*")\]/g)) {
    keys.push(m[1] ?? (m[2] !== undefined ? Number(m[2]) : (JSON.parse(m[3]!) as string)));
  }
  return keys;
}

/** The error of the first schema issue (unknown keys first: a misspelt key explains the "missing" issue it causes). */
function schemaFailure(found: readonly z.core.$ZodIssue[], value: unknown, fileName: string, root?: string): DesignFileError {
  const issues = [...found];
  issues.sort((a, b) => Number(b.code === "unrecognized_keys") - Number(a.code === "unrecognized_keys"));
  const first = issues[0];
  const described = first === undefined ? { path: "", problem: "is not a valid design" } : _describeIssue(first, value);
  const all = issues.map((issue) => _describeIssue(issue, value));
  const range = first?.code === "too_small" || first?.code === "too_big" ? first : undefined;
  const limit = (x: unknown): number | undefined => (typeof x === "number" && range?.origin === "number" ? x : undefined);
  return new DesignFileError({
    fileName,
    path: described.path,
    problem: described.problem,
    moreProblems: issues.length - 1,
    problems: all.length > 0 ? all : [described],
    quantity: quantityAt(described.path, root),
    value: first === undefined ? value : valueAt(value, first.path),
    min: limit(range?.code === "too_small" ? range.minimum : undefined),
    max: limit(range?.code === "too_big" ? range.maximum : undefined),
  });
}

/** The error of the first broken cross-field rule. */
function rulesFailure(problems: readonly DesignRuleProblem[], value: unknown, fileName: string, root?: string): DesignFileError {
  const first = problems[0]!;
  return new DesignFileError({
    fileName,
    path: first.path,
    problem: first.problem,
    moreProblems: problems.length - 1,
    problems: problems.map((p) => ({ path: p.path, problem: p.problem })),
    quantity: quantityAt(first.path, root),
    value: valueAt(value, pathKeys(first.path)),
  });
}

/** `options.fileName`, checked (a string; default `"design"`). */
function fileNameOf(options: unknown, context: string): string {
  _requireOptionsObject(options, context, true);
  const fileName = (options as ParseDesignOptions | undefined)?.fileName;
  if (fileName !== undefined && typeof fileName !== "string") {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "options.fileName", value: fileName, context, problem: "is not a string" });
  }
  return fileName ?? "design";
}

/**
 * The entry guard of the design converters (`tripDesignFromDesign`, …): the design as {@link validateDesign}
 * accepts it, or a {@link DesignFileError} (a `HotjunctionRangeError`, code `INVALID_DESIGN`) whose `quantity` is
 * the path of the first problem (`design.reference.nominalVolts`), whose `value` is the value found there and whose
 * message names the function, the path, what was expected (the valid range) and what was found.
 * @internal
 */
export function _requireDesign(design: unknown, context: string): DesignFile {
  _requireObject(design, "design", context);
  return validateDesign(design, { fileName: context });
}

/**
 * The entry guard of a converter given one reference entry: the schema of a design's `reference` and its rules.
 * @internal
 */
export function _requireDesignReference(reference: unknown, context: string): DesignReference {
  _requireObject(reference, "reference", context);
  const forbidden = findForbiddenKey(reference);
  if (forbidden !== undefined) {
    const path = _formatPath(["reference", ...forbidden.path]);
    throw new DesignFileError({ fileName: context, path, problem: `key "${forbidden.key}" is not allowed`, quantity: path, value: forbidden.key });
  }
  const result = referenceSchema.safeParse(reference, { jitless: true });
  if (!result.success) {
    const prefixed = result.error.issues.map((issue) => ({ ...issue, path: ["reference", ...issue.path] }) as z.core.$ZodIssue);
    throw schemaFailure(prefixed, { reference }, context, "");
  }
  const problems = _checkReferenceRules(result.data, "reference");
  if (problems.length > 0) throw rulesFailure(problems, { reference }, context, "");
  return result.data;
}

/**
 * Parses the text of a design file (JSON, UTF-8, at most {@link designFileMaxBytes} bytes and
 * {@link designFileMaxDepth} levels deep) and validates it.
 * @param text - the file's text
 * @param options - `fileName` for messages
 * @returns the design, typed
 * @throws DesignFileError (code `INVALID_DESIGN`) with a one-line message
 * @example
 * ```ts
 * import { parseDesign } from "hotjunction/design";
 * try { parseDesign(" ", { fileName: "kiln.json" }); }
 * catch (e) { console.log((e as Error).message); } // "kiln.json: not valid JSON at line 1, column 2: the file is empty"
 * ```
 */
export function parseDesign(text: string, options: ParseDesignOptions = {}): DesignFile {
  const fileName = fileNameOf(options, "parseDesign");
  if (typeof text !== "string") {
    // "a number", not the number: safeParseDesign returns this error, and its text must not read NaN or Infinity
    const found = typeof text === "number" ? "a number" : describeFound(text);
    throw new DesignFileError({ fileName, path: "", problem: `expected the file's text, found ${found}` });
  }
  if (text.length > designFileMaxBytes || (text.length * 3 > designFileMaxBytes && utf8Length(text) > designFileMaxBytes)) {
    throw new DesignFileError({ fileName, path: "", problem: `file is larger than ${designFileMaxBytes} bytes (1 MiB)` });
  }
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const syntax = _scanJson(body, { maxDepth: designFileMaxDepth });
  if (syntax !== undefined) {
    const where = syntax.path.length > 0 ? ` (at ${syntax.path})` : "";
    throw new DesignFileError({
      fileName,
      path: "",
      problem: `not valid JSON at line ${syntax.line}, column ${syntax.column}${where}: ${syntax.problem}`,
    });
  }
  return validateDesign(JSON.parse(body) as unknown, { fileName });
}

/**
 * The non-throwing twin of {@link parseDesign}.
 * @param text - the file's text
 * @param options - `fileName` for messages
 * @returns `{ success: true, design }` or `{ success: false, error }`
 * @example
 * ```ts
 * import { safeParseDesign } from "hotjunction/design";
 * const result = safeParseDesign("[]");
 * console.log(result.success); // false
 * ```
 */
export function safeParseDesign(text: string, options: ParseDesignOptions = {}): SafeParseDesignResult {
  try {
    return { success: true, design: parseDesign(text, options) };
  } catch (error) {
    if (error instanceof DesignFileError) return { success: false, error };
    throw error;
  }
}
