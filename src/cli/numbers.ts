/**
 * The number syntax of the command line, without an argument parser (the start-up fast path uses it; the
 * commander parsers in parseArgs.ts wrap it with their messages).
 * @module
 */

const decimalPattern = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const wholePattern = /^[+-]?\d+(?:[eE]\+?\d+)?$/;

/** A decimal number (`-12.5`, `1e3`), or undefined for anything else (`NaN`, `Infinity`, hex, blanks, text). @internal */
export function _readDecimal(text: string): number | undefined {
  const trimmed = text.trim();
  if (!decimalPattern.test(trimmed)) return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : undefined;
}

/** Whether the text has the shape of a whole number (it may still be out of range). @internal */
export function _looksWhole(text: string): boolean {
  return wholePattern.test(text.trim());
}

/** A whole number within [min, max], or undefined. @internal */
export function _readWhole(text: string, min: number, max: number): number | undefined {
  if (!_looksWhole(text)) return undefined;
  const value = Number(text.trim());
  return Number.isSafeInteger(value) && value >= min && value <= max ? value : undefined;
}
