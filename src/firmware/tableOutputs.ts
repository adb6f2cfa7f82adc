/**
 * Stored outputs of a table (rounded to the output type, a uniform table's last breakpoint beyond the range
 * continuing the last chord), the rounding part of the bound, and the dense search of the interpolated
 * result (the C routine's arithmetic) against the float64 reference.
 * @internal
 * @module
 */
import { HotjunctionRangeError } from "../errors.js";
import { _roundToNumberType, type _NumberTypeInfo, type FirmwareNumberType } from "./firmwareNumberType.js";
import { _interpolateStored } from "./interpolateFirmwareTable.js";
import type { _TableFunction } from "./tableFunction.js";
import type { _InterpolationData, FirmwareTableErrorFound } from "./types.js";

/** A checked column format. @internal */
export interface _Column {
  readonly numberType: FirmwareNumberType;
  readonly scale: number;
  readonly info: _NumberTypeInfo;
}

const DENSE_ALL_INTEGERS_UP_TO = 300_000;
const DENSE_POINTS_PER_SEGMENT = 128;

/** @internal */
export function _overflow(quantity: string, value: number, info: _NumberTypeInfo, numberType: string, context: string): never {
  throw new HotjunctionRangeError({
    code: "OVERFLOW",
    quantity,
    value,
    min: info.min,
    max: info.max,
    unit: "stored units",
    context,
    problem: `does not fit the ${numberType} storage type (change the scale or use a wider type)`,
  });
}

/**
 * Rounding part of the bound: for integer outputs half a stored unit at the breakpoints plus half a stored
 * unit in the nearest-rounded interpolation (1 stored unit); for float outputs 6 unit roundoffs of the
 * largest output magnitude (the stored values and the operations of the routine; the 1 % margin covers
 * double rounding through wider intermediates). @internal
 */
export function _roundingBound(fn: _TableFunction, input: _Column, output: _Column, lo: number, hi: number): number {
  if (output.info.integer) return 1 / output.scale;
  let maxAbsOutput = 0;
  for (let k = 0; k <= 64; k++) {
    const xs = k === 64 ? hi : lo + ((hi - lo) * k) / 64;
    maxAbsOutput = Math.max(maxAbsOutput, Math.abs(fn.value(xs / input.scale)));
  }
  return 6 * Math.max(output.info.unitRoundoff, input.info.unitRoundoff) * maxAbsOutput * 1.01;
}

/** Stored outputs at the breakpoints, with the range and 64-bit product checks. @internal */
export function _storeOutputs(fn: _TableFunction, inputs: readonly number[], hi: number, input: _Column, output: _Column, context: string): number[] {
  const outputs: number[] = [];
  const last = inputs.length - 1;
  const toNatural = (xs: number): number => xs / input.scale;
  for (let i = 0; i <= last; i++) {
    const xs = inputs[i] as number;
    if (xs < input.info.min || xs > input.info.max) _overflow(`table input [${i}]`, xs, input.info, input.numberType, context);
    let natural: number;
    if (xs > hi) {
      const xa = inputs[i - 1] as number;
      const ya = fn.value(toNatural(xa));
      const yh = fn.value(toNatural(hi));
      natural = ya + ((yh - ya) * (xs - xa)) / (hi - xa);
    } else {
      natural = fn.value(toNatural(xs));
    }
    const stored = _roundToNumberType(natural * output.scale, output.numberType);
    if (!(stored >= output.info.min && stored <= output.info.max)) {
      _overflow(`table output [${i}]`, natural * output.scale, output.info, output.numberType, context);
    }
    outputs.push(stored);
  }
  if (output.info.integer) {
    for (let i = 0; i < last; i++) {
      const dx = (inputs[i + 1] as number) - (inputs[i] as number);
      const product = Math.abs((outputs[i + 1] as number) - (outputs[i] as number)) * dx;
      if (product + dx > 2 ** 53) {
        _overflow(`interpolation product of segment ${i}`, product, { ...output.info, min: -(2 ** 53), max: 2 ** 53 }, "64-bit (exact below 2^53)", context);
      }
    }
  }
  return outputs;
}

/**
 * Dense search: every integer input up to 300,000 of them, else 128 points per segment and the last input;
 * returns the largest |table − reference| and where. @internal
 */
export function _denseSearch(fn: _TableFunction, data: _InterpolationData, input: _Column, output: _Column, lo: number, hi: number): FirmwareTableErrorFound {
  let found = -1;
  let foundAt = lo;
  let points = 0;
  const check = (xs: number): void => {
    const y = _interpolateStored(data, output.info, xs) / output.scale;
    const error = Math.abs(y - fn.value(xs / input.scale));
    points++;
    if (error > found) {
      found = error;
      foundAt = xs;
    }
  };
  if (input.info.integer && hi - lo + 1 <= DENSE_ALL_INTEGERS_UP_TO) {
    for (let xs = lo; xs <= hi; xs++) check(xs);
  } else {
    const inputs = data.inputs;
    for (let i = 0; i + 1 < inputs.length; i++) {
      const a = inputs[i] as number;
      const b = Math.min(inputs[i + 1] as number, hi);
      for (let k = 0; k < DENSE_POINTS_PER_SEGMENT; k++) {
        let xs = a + ((b - a) * k) / DENSE_POINTS_PER_SEGMENT;
        xs = input.info.integer ? Math.round(xs) : _roundToNumberType(xs, input.numberType);
        if (xs >= a && xs <= b) check(xs);
      }
    }
    check(hi);
  }
  return { errorOutputUnits: found, atInputStored: foundAt, atTemperatureC: fn.temperatureAt(foundAt / input.scale), pointsChecked: points };
}

/** Order of the stored outputs. @internal */
export function _monotonic(outputs: readonly number[]): "increasing" | "decreasing" | "none" {
  let up = true;
  let down = true;
  for (let i = 0; i + 1 < outputs.length; i++) {
    if ((outputs[i + 1] as number) < (outputs[i] as number)) up = false;
    if ((outputs[i + 1] as number) > (outputs[i] as number)) down = false;
  }
  return up ? "increasing" : down ? "decreasing" : "none";
}
