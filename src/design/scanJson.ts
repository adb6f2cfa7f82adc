/**
 * A strict JSON syntax check run before `JSON.parse`, so every malformed or hostile design file gets the same
 * one-line message on every Node version: position as line and column, nesting depth capped (checked before
 * anything is built), duplicate keys and the keys `__proto__`, `constructor` and `prototype` refused, numbers
 * that overflow to Infinity refused. Recursion depth is bounded by the depth cap, so no input can exhaust the stack.
 * @module
 */

/** Where and why a text is not acceptable JSON. */
export interface JsonScanProblem {
  /** 1-based line and column of the offending character. */
  readonly line: number;
  readonly column: number;
  /** Dotted path of the enclosing value (`"reference.kind"`), empty at the top. */
  readonly path: string;
  /** What is wrong, in words. */
  readonly problem: string;
}

/** Options of {@link _scanJson}. */
export interface ScanJsonOptions {
  /** Deepest nesting of objects and arrays allowed. */
  readonly maxDepth: number;
}

const forbiddenKeys = new Set(["__proto__", "constructor", "prototype"]);
const numberPattern = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;

class ScanFailure extends Error {
  constructor(
    readonly index: number,
    readonly problem: string,
    readonly pathText: string,
  ) {
    super(problem);
  }
}

function describeChar(ch: string | undefined): string {
  if (ch === undefined) return "the end of the file";
  const code = ch.codePointAt(0) ?? 0;
  if (code < 0x20 || code === 0x7f) return `control character U+${code.toString(16).toUpperCase().padStart(4, "0")}`;
  return `"${ch}"`;
}

// Deliberately alike: the workbench's form (src/workbench/schemaForm.ts `formatPath`) formats paths the same way
// for its message slots; it reaches the library through public entries only.
/** Formats a path of keys and indices the way the messages show it: `a.b[2].c`. @internal */
export function _formatPath(path: readonly (string | number)[]): string {
  let text = "";
  for (const part of path) {
    if (typeof part === "number") text += `[${part}]`;
    else if (/^[A-Za-z_$][\w$]*$/.test(part)) text += text.length === 0 ? part : `.${part}`;
    else text += `[${JSON.stringify(part.length > 40 ? `${part.slice(0, 37)}...` : part)}]`;
  }
  return text;
}

/**
 * Checks `text` is one JSON value within the limits; returns the first problem or `undefined`.
 * @internal
 */
export function _scanJson(text: string, options: ScanJsonOptions): JsonScanProblem | undefined {
  let index = 0;
  const path: (string | number)[] = [];

  const fail = (problem: string, at: number = index): never => {
    throw new ScanFailure(at, problem, _formatPath(path));
  };
  const skipBlanks = (): void => {
    while (index < text.length) {
      const ch = text.charCodeAt(index);
      if (ch === 0x20 || ch === 0x0a || ch === 0x0d || ch === 0x09) index++;
      else break;
    }
  };
  const unexpected = (expected: string): never =>
    fail(`expected ${expected}, found ${describeChar(text[index])}`);

  const scanString = (): string => {
    const start = index;
    index++; // opening quote
    for (;;) {
      if (index >= text.length) fail("a string is not closed before the end of the file", start);
      const ch = text.charCodeAt(index);
      if (ch === 0x22) {
        index++;
        return JSON.parse(text.slice(start, index)) as string;
      }
      if (ch < 0x20) fail(`${describeChar(text[index])} inside a string (escape it)`);
      if (ch === 0x5c) {
        const next = text[index + 1];
        if (next === "u") {
          if (!/^[0-9a-fA-F]{4}$/.test(text.slice(index + 2, index + 6))) fail("bad \\u escape in a string");
          index += 6;
        } else if (next !== undefined && '"\\/bfnrt'.includes(next)) {
          index += 2;
        } else {
          fail(`bad escape \\${next ?? ""} in a string`);
        }
      } else {
        index++;
      }
    }
  };

  const scanValue = (depth: number): void => {
    skipBlanks();
    const ch = text[index];
    if (ch === "{" || ch === "[") {
      if (depth + 1 > options.maxDepth) fail(`nesting deeper than ${options.maxDepth} levels`);
      if (ch === "{") scanObject(depth + 1);
      else scanArray(depth + 1);
      return;
    }
    if (ch === '"') {
      scanString();
      return;
    }
    if (ch === "-" || (ch !== undefined && ch >= "0" && ch <= "9")) {
      numberPattern.lastIndex = index;
      const match = numberPattern.exec(text);
      if (match === null) return unexpected("a value");
      const token = match[0];
      if (!Number.isFinite(Number(token))) fail(`number ${token.length > 30 ? `${token.slice(0, 27)}...` : token} is too large`);
      index += token.length;
      return;
    }
    for (const word of ["true", "false", "null"]) {
      if (text.startsWith(word, index)) {
        index += word.length;
        return;
      }
    }
    if (text.startsWith("NaN", index) || text.startsWith("Infinity", index)) fail("NaN and Infinity are not JSON numbers");
    unexpected("a value");
  };

  // One member of an object (after its key) or of an array, then "," (false: another member follows) or the
  // closing bracket (true: the container ends).
  const scanMember = (at: string | number, depth: number, close: "}" | "]"): boolean => {
    path.push(at);
    scanValue(depth);
    path.pop();
    skipBlanks();
    if (text[index] === ",") {
      index++;
      return false;
    }
    if (text[index] === close) {
      index++;
      return true;
    }
    return unexpected(`"," or "${close}"`);
  };

  const scanObject = (depth: number): void => {
    index++; // {
    const seen = new Set<string>();
    skipBlanks();
    if (text[index] === "}") {
      index++;
      return;
    }
    for (;;) {
      skipBlanks();
      if (text[index] !== '"') unexpected("a key in double quotes");
      const keyStart = index;
      const key = scanString();
      if (forbiddenKeys.has(key)) fail(`key "${key}" is not allowed`, keyStart);
      if (seen.has(key)) fail(`key ${JSON.stringify(key.length > 40 ? `${key.slice(0, 37)}...` : key)} appears twice`, keyStart);
      seen.add(key);
      skipBlanks();
      if (text[index] !== ":") unexpected('":" after a key');
      index++;
      if (scanMember(key, depth, "}")) return;
    }
  };

  const scanArray = (depth: number): void => {
    index++; // [
    skipBlanks();
    if (text[index] === "]") {
      index++;
      return;
    }
    for (let i = 0; ; i++) {
      if (scanMember(i, depth, "]")) return;
    }
  };

  try {
    skipBlanks();
    if (index >= text.length) fail("the file is empty");
    scanValue(0);
    skipBlanks();
    if (index < text.length) unexpected("the end of the file after the JSON value");
    return undefined;
  } catch (error) {
    if (!(error instanceof ScanFailure)) throw error;
    return problemAt(text, error);
  }
}

/** The problem of a failed scan with the line and column (1-based) of its offset in `text`. */
function problemAt(text: string, failure: ScanFailure): JsonScanProblem {
  let line = 1;
  let lineStart = 0;
  const limit = Math.min(failure.index, text.length);
  for (let i = 0; i < limit; i++) {
    if (text.charCodeAt(i) === 0x0a) {
      line++;
      lineStart = i + 1;
    }
  }
  return { line, column: limit - lineStart + 1, path: failure.pathText, problem: failure.problem };
}
