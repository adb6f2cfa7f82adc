/**
 * The number types a firmware table can store its input breakpoints and output values in.
 * @module
 */
import { _invalidChoice } from "../errors.js";

/**
 * Storage type of a firmware table column: a C99 `<stdint.h>` integer or an IEEE-754 binary float.
 * `"float32"` is C `float`, `"float64"` is C `double`.
 */
export type FirmwareNumberType = "int16" | "uint16" | "int32" | "uint32" | "float32" | "float64";

/** The allowed number types, in a fixed order. @internal */
export const _firmwareNumberTypes: readonly FirmwareNumberType[] = [
  "int16",
  "uint16",
  "int32",
  "uint32",
  "float32",
  "float64",
];

/** Facts about one number type. @internal */
export interface _NumberTypeInfo {
  readonly integer: boolean;
  readonly min: number;
  readonly max: number;
  readonly cType: string;
  /** Unit roundoff (half an ulp, relative) for floats; 0 for integers. */
  readonly unitRoundoff: number;
}

const INFO: Record<FirmwareNumberType, _NumberTypeInfo> = {
  int16: { integer: true, min: -32768, max: 32767, cType: "int16_t", unitRoundoff: 0 },
  uint16: { integer: true, min: 0, max: 65535, cType: "uint16_t", unitRoundoff: 0 },
  int32: { integer: true, min: -2147483648, max: 2147483647, cType: "int32_t", unitRoundoff: 0 },
  uint32: { integer: true, min: 0, max: 4294967295, cType: "uint32_t", unitRoundoff: 0 },
  float32: { integer: false, min: -3.4028234663852886e38, max: 3.4028234663852886e38, cType: "float", unitRoundoff: 5.960464477539063e-8 /* 2^-24 */ },
  // Literal values (not Number.MAX_VALUE) keep this table free of global reads, so bundlers can drop it.
  float64: { integer: false, min: -1.7976931348623157e308, max: 1.7976931348623157e308, cType: "double", unitRoundoff: 1.1102230246251565e-16 /* 2^-53 */ },
};

/** Looks up a number type, throwing `INVALID_OPTION` for anything else. @internal */
export function _numberTypeInfo(numberType: unknown, quantity: string, context?: string): _NumberTypeInfo {
  if (typeof numberType === "string" && Object.prototype.hasOwnProperty.call(INFO, numberType)) {
    return INFO[numberType as FirmwareNumberType];
  }
  return _invalidChoice(quantity, numberType, _firmwareNumberTypes, context);
}

/**
 * Rounds a stored value to what the number type holds: nearest integer (halves away from zero) for
 * integer types, nearest float32 for `"float32"`, unchanged for `"float64"`. No range check. @internal
 */
export function _roundToNumberType(value: number, numberType: FirmwareNumberType): number {
  if (numberType === "float64") return value;
  if (numberType === "float32") return Math.fround(value);
  const r = Math.sign(value) * Math.round(Math.abs(value));
  return r === 0 ? 0 : r;
}
