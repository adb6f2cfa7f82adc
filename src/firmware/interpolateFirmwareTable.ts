/**
 * Evaluation of a firmware table in TypeScript, with exactly the arithmetic of the emitted C routine.
 * @module
 */
import { _requireFinite, _requireFiniteResult, HotjunctionRangeError } from "../errors.js";
import { _numberTypeInfo, type _NumberTypeInfo } from "./firmwareNumberType.js";
import type { _InterpolationData, FirmwareTable } from "./types.js";
import { _checkFirmwareTable } from "./_firmwareTableShape.js";

export type { _InterpolationData } from "./types.js";

/**
 * Integer division rounded to nearest, halves away from zero, as the C routine computes it:
 * `num >= 0 ? (num + den/2)/den : -((-num + den/2)/den)` with C's truncating division. `den` > 0;
 * all magnitudes below 2^53. @internal
 */
export function _roundedDivide(num: number, den: number): number {
  const half = Math.floor(den / 2);
  const a = Math.abs(num) + half;
  let q = Math.floor(a / den);
  // Correct a possible one-off from the floating division.
  if (q * den > a) q -= 1;
  else if ((q + 1) * den <= a) q += 1;
  return num < 0 ? -q : q;
}

/** Segment index holding x (x within the table's input range). @internal */
export function _segmentIndex(data: _InterpolationData, x: number): number {
  const inputs = data.inputs;
  const last = inputs.length - 2;
  if (data.spacingLog2 !== null) {
    const i = Math.floor((x - (inputs[0] as number)) / 2 ** data.spacingLog2);
    return i > last ? last : i;
  }
  let lo = 0;
  let hi = inputs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (x < (inputs[mid] as number)) hi = mid;
    else lo = mid;
  }
  return lo;
}

/** Interpolated stored output at stored input x, no checks. @internal */
export function _interpolateStored(data: _InterpolationData, outInfo: _NumberTypeInfo, x: number): number {
  const i = _segmentIndex(data, x);
  const xl = data.inputs[i] as number;
  const xh = data.inputs[i + 1] as number;
  const yl = data.outputs[i] as number;
  const yh = data.outputs[i + 1] as number;
  if (outInfo.integer) {
    return yl + _roundedDivide((yh - yl) * (x - xl), xh - xl);
  }
  const identity = (v: number): number => v;
  const p = data.outputNumberType === "float32" ? Math.fround : identity;
  // The difference is taken in the input type's arithmetic, then converted to the output type.
  const pin = data.inputNumberType === "float32" ? Math.fround : identity;
  const u = p(pin(x - xl));
  const dx = p(pin(xh - xl));
  return p(yl + p(p(yh - yl) * p(u / dx)));
}

/**
 * Evaluates a firmware table at one input, in stored units, with the same arithmetic as the emitted C
 * routine (nearest-rounded integer interpolation in 64 bits, or float/double arithmetic), so the result
 * equals what the firmware computes. Use it to simulate firmware, or as a fast table lookup in
 * TypeScript.
 * @param table - a table from {@link buildFirmwareTable} (treated as immutable: its arrays are copied once
 *   and cached on first use)
 * @param inputStored - input in stored units (e.g. µV for the default EMF input, a raw ADC code), within
 *   `table.input.min` … `table.input.max`; a whole number for an integer input type
 * @returns output in stored units (divide by `table.output.scale` for natural units)
 * @throws HotjunctionTypeError for a non-finite input; HotjunctionRangeError outside the table's input
 *   range or for a fractional input to an integer table
 * @example
 * ```ts
 * import { buildFirmwareTable, interpolateFirmwareTable } from "hotjunction";
 * const table = buildFirmwareTable({ type: "K", kind: "emfToTemperature", minC: 0, maxC: 500, maxErrorOutputUnits: 0.05 });
 * console.log(interpolateFirmwareTable(table, 20644) / table.output.scale); // 499.994
 * ```
 */
export function interpolateFirmwareTable(table: FirmwareTable, inputStored: number): number {
  let prepared = PREPARED.get(table);
  if (prepared === undefined) {
    _checkFirmwareTable(table, "interpolateFirmwareTable");
    prepared = prepare(table);
    PREPARED.set(table, prepared);
  }
  const x = inputStored;
  // One comparison pair accepts the common case; NaN, ±Infinity and out-of-range inputs take the slow path.
  if (typeof x !== "number" || !(x >= table.input.min && x <= table.input.max)) {
    const context = `firmware table (${table.kind}, type ${table.thermocoupleType})`;
    _requireFinite(x, "table input", "stored units", context);
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "table input",
      value: x,
      min: table.input.min,
      max: table.input.max,
      unit: "stored units",
      context,
    });
  }
  if (prepared.integerInput && !Number.isInteger(x)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "table input",
      value: x,
      unit: "stored units",
      context: `firmware table (${table.kind}, type ${table.thermocoupleType})`,
      problem: `is not a whole number (the input type is ${table.input.numberType})`,
    });
  }
  const y = _interpolateStored(prepared.data, prepared.outInfo, x);
  // finite steps can still give a product past float64 (an output step of 1e308 over a 10-unit input step)
  return Number.isFinite(y) ? y : _requireFiniteResult(y, "table output step", x, "stored units", `firmware table (${table.kind}, type ${table.thermocoupleType})`);
}

interface Prepared {
  readonly data: _InterpolationData;
  readonly outInfo: _NumberTypeInfo;
  readonly integerInput: boolean;
}

const PREPARED = new WeakMap<FirmwareTable, Prepared>();

function prepare(table: FirmwareTable): Prepared {
  const context = `firmware table (${table.kind}, type ${table.thermocoupleType})`;
  const inInfo = _numberTypeInfo(table.input.numberType, "input number type", context);
  const outInfo = _numberTypeInfo(table.output.numberType, "output number type", context);
  return {
    data: {
      inputs: Float64Array.from(table.inputs),
      outputs: Float64Array.from(table.outputs),
      spacingLog2: table.spacingLog2,
      inputNumberType: table.input.numberType,
      outputNumberType: table.output.numberType,
    },
    outInfo,
    integerInput: inInfo.integer,
  };
}
