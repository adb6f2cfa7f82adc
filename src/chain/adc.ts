/**
 * The ADC element: resolution, full scale (its reference), offset, gain error, INL in LSB and
 * quantisation (±½ LSB, rectangular); ratiometric or not. Transfer function (unrounded code):
 * code = V·(1 + gain error)·2ᴺ/FS + offset + INL + quantisation, FS the actual full scale (a
 * ratiometric signal scales with it, so the reference's error cancels).
 * @module
 */
import { _requireFinite, HotjunctionRangeError } from "../errors.js";
import { _optionalLimit, _requireFraction, _requireObject, _requirePositive, _source, type _SourceContext } from "./_common.js";
import type { AdcElement, ChainErrorSource } from "./types.js";

/**
 * The one ADC resolution range of the library, bits: the chain's ADC element and the firmware table's ADC chain
 * both check through {@link _requireAdcBits}. 1 … 32 is every converter made (a 1-bit comparator-like converter
 * up to a 32-bit sigma-delta); 2³² − 1 codes are still exact in a double and fit an unsigned 32-bit integer.
 * @internal
 */
export const _adcBitsMin = 1;
/** @internal Highest ADC resolution, bits (see {@link _adcBitsMin}). */
export const _adcBitsMax = 32;

/** @internal Throws unless `bits` is an integer from 1 to 32 (the one ADC resolution range). */
export function _requireAdcBits(bits: unknown, context: string, quantity = "bits"): number {
  const b = _requireFinite(bits, quantity, undefined, context);
  // Deliberately alike: errors.ts `_requireInteger` is the same check; this one keeps its own message (`is not an integer from 1 to 32`).
  if (!Number.isInteger(b) || b < _adcBitsMin || b > _adcBitsMax) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity,
      value: b,
      min: _adcBitsMin,
      max: _adcBitsMax,
      context,
      problem: `is not an integer from ${_adcBitsMin} to ${_adcBitsMax}`,
    });
  }
  return b;
}

/**
 * The size of one LSB, q = FS/2ᴺ.
 * @param bits - resolution N, integer 1…32
 * @param fullScaleVolts - full scale FS, V (> 0)
 * @returns q, V
 * @throws HotjunctionRangeError for a bad resolution or full scale
 * @example
 * ```ts
 * import { adcLsbVolts } from "hotjunction";
 * console.log((adcLsbVolts(12, 3.3) * 1e6).toFixed(3)); // "805.664"
 * console.log((adcLsbVolts(12, 3.3) / Math.sqrt(12) * 1e6).toFixed(3)); // "232.575"
 * ```
 * @see quantisation noise q/√12 (standard ADC texts)
 */
export function adcLsbVolts(bits: number, fullScaleVolts: number): number {
  const context = "ADC";
  const n = _requireAdcBits(bits, context);
  const fs = _requirePositive(fullScaleVolts, "fullScaleVolts", "V", context);
  return fs / 2 ** n;
}

/** @internal The ADC stage of a compiled chain. */
export interface _AdcStage {
  readonly sources: readonly ChainErrorSource[];
  readonly bits: number;
  readonly codes: number;
  readonly ratiometric: boolean;
  /** Unrounded code for an input (V), the actual and nominal full scale (V). */
  code(x: Readonly<Record<string, number>>, volts: number, fullScaleVolts: number, nominalFullScaleVolts: number): number;
  /** The gain factor 1 + gain error for the source values (the code's factor on the input). */
  gainFactor(x: Readonly<Record<string, number>>): number;
  /** The errors added in LSB (offset + INL + quantisation) for the source values. */
  lsbErrors(x: Readonly<Record<string, number>>): number;
  /** Inverse: the input (V) that gives a code. */
  voltsForCode(x: Readonly<Record<string, number>>, code: number, fullScaleVolts: number, nominalFullScaleVolts: number): number;
}

/** @internal Builds the stage. */
export function _adcStage(element: AdcElement, ctx: _SourceContext, context: string): _AdcStage {
  const o = _requireObject(element, "adc", context);
  const bits = _requireAdcBits(o["bits"], context);
  const codes = 2 ** bits;
  const offset = _optionalLimit(o["offsetLsb"], "offsetLsb", "LSB", context);
  const gainErr = o["gainErrorFraction"] === undefined ? 0 : _requireFraction(o["gainErrorFraction"], "gainErrorFraction", context);
  const inl = _optionalLimit(o["inlLsb"], "inlLsb", "LSB", context);
  if (o["ratiometric"] !== undefined && typeof o["ratiometric"] !== "boolean") {
    throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: "ratiometric", value: o["ratiometric"], context, problem: "is not a boolean" });
  }
  const ratiometric = o["ratiometric"] === true;
  const sources: ChainErrorSource[] = [];
  if (offset > 0) sources.push(_source(ctx, "adc.offset", "adc", "offset error", "LSB", offset));
  if (gainErr > 0) sources.push(_source(ctx, "adc.gainError", "adc", "gain error", "fraction", gainErr));
  if (inl > 0) sources.push(_source(ctx, "adc.inl", "adc", "integral nonlinearity", "LSB", inl));
  sources.push(_source(ctx, "adc.quantization", "adc", "quantisation (±½ LSB)", "LSB", 0.5));
  const ho = offset > 0;
  const hg = gainErr > 0;
  const hi = inl > 0;
  const lsbErrors = (x: Readonly<Record<string, number>>): number =>
    (ho ? (x["adc.offset"] as number) : 0) + (hi ? (x["adc.inl"] as number) : 0) + (x["adc.quantization"] as number);
  const gainFactor = (x: Readonly<Record<string, number>>): number => 1 + (hg ? (x["adc.gainError"] as number) : 0);
  return {
    sources,
    bits,
    codes,
    ratiometric,
    gainFactor,
    lsbErrors,
    code: (x, volts, fs, fsNom) => {
      const g = gainFactor(x);
      const signal = ratiometric ? (volts * fs) / fsNom : volts;
      return (signal * g * codes) / fs + lsbErrors(x);
    },
    voltsForCode: (x, code, fs, fsNom) => {
      const g = gainFactor(x);
      const signal = ((code - lsbErrors(x)) * fs) / (codes * g);
      return ratiometric ? (signal * fsNom) / fs : signal;
    },
  };
}
