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

function checkBits(bits: unknown, context: string): number {
  const b = _requireFinite(bits, "bits", undefined, context);
  if (!Number.isInteger(b) || b < 1 || b > 32) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "bits", value: b, min: 1, max: 32, context, problem: "is not an integer from 1 to 32" });
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
  const n = checkBits(bits, context);
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
  /** Inverse: the input (V) that gives a code. */
  voltsForCode(x: Readonly<Record<string, number>>, code: number, fullScaleVolts: number, nominalFullScaleVolts: number): number;
}

/** @internal Builds the stage. */
export function _adcStage(element: AdcElement, ctx: _SourceContext, context: string): _AdcStage {
  const o = _requireObject(element, "adc", context);
  const bits = checkBits(o["bits"], context);
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
  return {
    sources,
    bits,
    codes,
    ratiometric,
    code: (x, volts, fs, fsNom) => {
      const g = 1 + (hg ? (x["adc.gainError"] as number) : 0);
      const signal = ratiometric ? (volts * fs) / fsNom : volts;
      return (signal * g * codes) / fs + lsbErrors(x);
    },
    voltsForCode: (x, code, fs, fsNom) => {
      const g = 1 + (hg ? (x["adc.gainError"] as number) : 0);
      const signal = ((code - lsbErrors(x)) * fs) / (codes * g);
      return ratiometric ? (signal * fsNom) / fs : signal;
    },
  };
}
