/**
 * Strict parsers for numeric command-line values: decimal numbers only, never NaN, never a partial parse.
 * @module
 */
import { InvalidArgumentError } from "commander";
import { _looksWhole, _readDecimal, _readWhole } from "./numbers.js";

/**
 * Parses a decimal number (`-12.5`, `1e3`); rejects `NaN`, `Infinity`, hex, blanks and trailing text.
 * @throws InvalidArgumentError (commander reports it as a usage error)
 */
export function _parseNumber(text: string): number {
  const value = _readDecimal(text);
  if (value !== undefined) return value;
  if (!/^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/.test(text.trim())) {
    throw new InvalidArgumentError(`expected a decimal number, found "${text}"`);
  }
  throw new InvalidArgumentError(`expected a finite number, found "${text}"`);
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
    if (!_looksWhole(text)) throw new InvalidArgumentError(`expected a whole number, found "${text}"`);
    const value = _readWhole(text, min, max);
    if (value === undefined) throw new InvalidArgumentError(`expected a whole number from ${min} to ${max}, found "${text}"`);
    return value;
  };
}
