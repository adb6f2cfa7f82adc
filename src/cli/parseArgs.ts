/**
 * Strict parsers for numeric command-line values: decimal numbers only, never NaN, never a partial parse.
 * @module
 */
import { InvalidArgumentError } from "commander";

const decimalPattern = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/**
 * Parses a decimal number (`-12.5`, `1e3`); rejects `NaN`, `Infinity`, hex, blanks and trailing text.
 * @throws InvalidArgumentError (commander reports it as a usage error)
 */
export function _parseNumber(text: string): number {
  const trimmed = text.trim();
  if (!decimalPattern.test(trimmed)) throw new InvalidArgumentError(`expected a decimal number, found "${text}"`);
  const value = Number(trimmed);
  if (!Number.isFinite(value)) throw new InvalidArgumentError(`expected a finite number, found "${text}"`);
  return value;
}

/** Parses a number that must be greater than zero. */
export function _parsePositiveNumber(text: string): number {
  const value = _parseNumber(text);
  if (!(value > 0)) throw new InvalidArgumentError(`expected a number greater than 0, found "${text}"`);
  return value;
}

/** Parses a whole number within [min, max]. */
export function _integerParser(min: number, max: number): (text: string) => number {
  return (text: string) => {
    const trimmed = text.trim();
    if (!/^[+-]?\d+(?:[eE]\+?\d+)?$/.test(trimmed)) {
      throw new InvalidArgumentError(`expected a whole number, found "${text}"`);
    }
    const value = Number(trimmed);
    if (!Number.isSafeInteger(value) || value < min || value > max) {
      throw new InvalidArgumentError(`expected a whole number from ${min} to ${max}, found "${text}"`);
    }
    return value;
  };
}
