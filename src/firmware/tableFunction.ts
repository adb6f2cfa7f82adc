/**
 * The exact function a firmware table approximates, per table kind, in natural units (input µV, ADC code
 * or °C; output °C, µV or code), with its second derivative for the interpolation-error bound.
 * @internal
 * @module
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { HotjunctionRangeError } from "../errors.js";
import {
  _compile,
  _emf,
  _emfInSubrange,
  _slope,
  _slopeInSubrange,
  _subrangeIndex,
  type CompiledType,
} from "../its90/compiled.js";
import { _exactInverse, _exactInverseTables } from "../its90/exactInverse.js";
import { thermocoupleData } from "../its90/resolveType.js";
import { _emfEvaluationBound, _encloseEmfDerivative, _magnitude, type _Interval } from "../its90/curvatureEnclosure.js";
import { _checkAdcChain, type _CheckedAdcChain } from "./firmwareAdcChain.js";

/**
 * What a firmware table converts:
 * - `"emfToTemperature"`: thermocouple EMF (µV, reference junction at 0 °C) to temperature (°C);
 * - `"adcCodeToTemperature"`: ADC code of a {@link FirmwareAdcChain} to temperature (°C);
 * - `"temperatureToEmf"`: temperature (°C) to EMF (µV), for thresholds and alarms;
 * - `"temperatureToAdcCode"`: temperature (°C) to the ADC code of a chain, for thresholds and alarms;
 * - `"coldJunctionToEmf"`: cold-junction sensor temperature near ambient (°C) to E(t) (µV), to add to a
 *   measured EMF before an `"emfToTemperature"` table;
 * - `"coldJunctionToAdcCode"`: the same in ADC codes of a chain (gain · E(t) / LSB, no offset), to add to
 *   a raw code before an `"adcCodeToTemperature"` table built without `coldJunctionC`.
 */
export type FirmwareTableKind =
  | "emfToTemperature"
  | "adcCodeToTemperature"
  | "temperatureToEmf"
  | "temperatureToAdcCode"
  | "coldJunctionToEmf"
  | "coldJunctionToAdcCode";

/** @internal */
export const _firmwareTableKinds: readonly FirmwareTableKind[] = [
  "emfToTemperature",
  "adcCodeToTemperature",
  "temperatureToEmf",
  "temperatureToAdcCode",
  "coldJunctionToEmf",
  "coldJunctionToAdcCode",
];

/** Unit labels of table columns. */
export type FirmwareTableUnit = "µV" | "code" | "°C";

/** @internal */
export interface _TableFunction {
  readonly ct: CompiledType;
  readonly chain: _CheckedAdcChain | undefined;
  readonly inputQuantity: string;
  readonly inputUnit: FirmwareTableUnit;
  readonly outputQuantity: string;
  readonly outputUnit: FirmwareTableUnit;
  /** Lowest and highest hot-junction temperatures the request may span, °C. */
  readonly allowedMinC: number;
  readonly allowedMaxC: number;
  /** Natural input value at a temperature, monotone increasing. */
  inputAtTemperature(temperatureC: number): number;
  /** Whether a natural input value lies where the exact function is defined. */
  inDomain(input: number): boolean;
  /** Exact output, natural units. */
  value(input: number): number;
  /** d²(output)/d(input)², natural units (a point value: for tests and sampling). */
  curvature(input: number): number;
  /**
   * Upper bound on |d²(output)/d(input)²| over natural inputs [a, b] (an interval enclosure with outward
   * rounding, sub-range by sub-range; seams are bounded separately). Infinity where it cannot be bounded
   * (the Seebeck coefficient's enclosure reaches 0 on an inverse segment).
   */
  curvatureBound(a: number, b: number): number;
  /** Bound on |value(x) − exact(x)| over natural inputs [a, b], output natural units (see `referenceErrorProof`). */
  referenceError(a: number, b: number): number;
  /** How `curvatureBound` is obtained, in words, for the table's metadata. */
  readonly curvatureMethod: string;
  /** Hot-junction (or cold-junction sensor) temperature belonging to an input, °C. */
  temperatureAt(input: number): number;
  /**
   * Seams of the reference function (sub-range boundaries) inside the domain, where f'' is not defined:
   * position (natural input), jump of df/dx across it, and jump of f itself (both natural units).
   */
  readonly seams: readonly _Seam[];
}

/** A sub-range boundary of the reference function, in table units. @internal */
export interface _Seam {
  readonly input: number;
  readonly slopeJump: number;
  readonly valueJump: number;
}

/** x rounded up by a few ulps (a product or quotient of enclosed magnitudes, rounded outward). */
function up3(x: number): number {
  return x * (1 + 8 * U) + 2 ** -1000;
}

function seebeckMicrovolts(ct: CompiledType, temperatureC: number): number {
  return _slope(ct, temperatureC) * 1000;
}

/**
 * dS/dt in µV/°C² by a central difference (0.01 °C step) of the analytic Seebeck coefficient of the
 * sub-range holding t, so that a seam between sub-ranges (where S may jump: type N, 0.23 µV/°C at 0 °C)
 * is not smeared into a spurious spike; the seams are bounded separately.
 */
function seebeckSlope(ct: CompiledType, temperatureC: number): number {
  const step = 0.01;
  const index = _subrangeIndex(ct, temperatureC);
  const a = temperatureC - step;
  const b = temperatureC + step;
  return ((_slopeInSubrange(ct, index, b) - _slopeInSubrange(ct, index, a)) * 1000) / (b - a);
}

/** Sub-range boundaries strictly inside the type's range, with the jumps of E (mV) and S (mV/°C) across them. */
function temperatureSeams(ct: CompiledType): { temperatureC: number; emfJump: number; slopeBelow: number; slopeAbove: number }[] {
  const seams = [];
  for (let i = 1; i < ct.subranges.length; i++) {
    const t = (ct.subranges[i] as { minC: number }).minC;
    seams.push({
      temperatureC: t,
      emfJump: _emfInSubrange(ct, i, t) - _emfInSubrange(ct, i - 1, t),
      slopeBelow: _slopeInSubrange(ct, i - 1, t),
      slopeAbove: _slopeInSubrange(ct, i, t),
    });
  }
  return seams;
}

const U = 1.1102230246251565e-16; // 2^-53 (a literal: a module-level `**` is kept by every bundle)

/** Sub-range pieces of a temperature interval: [index, clipped interval] for every sub-range it meets. */
function pieces(ct: CompiledType, t: _Interval): [number, _Interval][] {
  const out: [number, _Interval][] = [];
  ct.subranges.forEach((sub, i) => {
    const lo = Math.max(t[0], sub.minC);
    const hi = Math.min(t[1], sub.maxC);
    if (lo <= hi) out.push([i, [lo, hi]]);
  });
  return out;
}

/** max over the pieces of |E''| and the evaluation bound, and min of E' (mV, °C). */
function encloseOver(ct: CompiledType, t: _Interval): { maxSecond: number; minFirst: number; maxFirst: number; evaluation: number } {
  let maxSecond = 0;
  let minFirst = Infinity;
  let maxFirst = 0;
  let evaluation = 0;
  for (const [i, piece] of pieces(ct, t)) {
    maxSecond = Math.max(maxSecond, _magnitude(_encloseEmfDerivative(ct, i, 2, piece)));
    const first = _encloseEmfDerivative(ct, i, 1, piece);
    minFirst = Math.min(minFirst, first[0]);
    maxFirst = Math.max(maxFirst, _magnitude(first));
    evaluation = Math.max(evaluation, _emfEvaluationBound(ct, i, piece));
  }
  return { maxSecond, minFirst, maxFirst, evaluation };
}

/** Fit tolerance of the exact inverse's interpolants (`its90/exactInverse.ts`), °C and mV. */
const INVERSE_FIT_C = 2e-11;
const INVERSE_FIT_MV = 2e-12;

/** @internal */
export function _tableFunction(
  type: ThermocoupleType,
  kind: FirmwareTableKind,
  chainInput: unknown,
  context: string,
): _TableFunction {
  const ct = _compile(thermocoupleData(type));
  const needsChain = kind === "adcCodeToTemperature" || kind === "temperatureToAdcCode" || kind === "coldJunctionToAdcCode";
  const chain = needsChain ? _checkAdcChain(chainInput, context) : undefined;
  const coldEmfMillivolts = chainColdJunctionEmf(ct, kind, chain, context);
  return kind === "emfToTemperature" || kind === "adcCodeToTemperature"
    ? inverseTableFunction(ct, chain, coldEmfMillivolts)
    : forwardTableFunction(ct, kind, chain, coldEmfMillivolts);
}

/** E(chain cold junction) in mV, 0 without a fixed cold junction; checked against the type's range. */
function chainColdJunctionEmf(ct: CompiledType, kind: FirmwareTableKind, chain: _CheckedAdcChain | undefined, context: string): number {
  if (chain?.coldJunctionC === undefined) return 0;
  if (kind === "coldJunctionToAdcCode") {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "ADC chain coldJunctionC",
      value: chain.coldJunctionC,
      context,
      problem: "does not apply to a cold-junction table (its input is the cold-junction temperature)",
    });
  }
  if (chain.coldJunctionC < ct.minC || chain.coldJunctionC > ct.maxC) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "cold-junction temperature",
      value: chain.coldJunctionC,
      min: ct.minC,
      max: ct.maxC,
      unit: "°C",
      context,
    });
  }
  return _emf(ct, chain.coldJunctionC);
}

/** The table function of an inverse kind (EMF or ADC code to temperature). */
function inverseTableFunction(ct: CompiledType, chain: _CheckedAdcChain | undefined, coldEmfMillivolts: number): _TableFunction {
  const tables = _exactInverseTables(ct);
  const lowExclusive = ct.monotonicFromC > ct.minC;
  // Input → reference EMF (junction at 0 °C) in mV is linear: emf = emfPerInput·x + emfAtZeroInput.
  let emfPerInput: number;
  let emfAtZeroInput: number;
  if (chain !== undefined) {
    emfPerInput = chain.lsbMillivolts / chain.gain;
    emfAtZeroInput = -chain.offsetMillivolts / chain.gain + coldEmfMillivolts;
  } else {
    emfPerInput = 1e-3;
    emfAtZeroInput = 0;
  }
  const emfOf = (x: number): number => emfPerInput * x + emfAtZeroInput;
  // Reference error of t̂(E(x)): the EMF's own rounding (2 ulps of |E| and |E₀|) and the forward
  // evaluation error, both over the smallest Seebeck coefficient; the Newton roots the interpolant passes
  // through carry the forward error once more; the interpolant's fit (tested at 9 points per segment, not
  // proven: its90/exactInverse.ts) and 20 ulps of t for the Horner step in s.
  const inverseReferenceError = (a: number, b: number): number => {
    const t = inverseTemperatures(a, b);
    const e = encloseOver(ct, t);
    if (!(e.minFirst > 0)) return Infinity;
    const emfMagnitude = Math.max(Math.abs(emfOf(a)), Math.abs(emfOf(b))) + Math.abs(emfAtZeroInput);
    const emfError = 2 * e.evaluation + 4 * U * emfMagnitude;
    const fit = Math.max(INVERSE_FIT_C, INVERSE_FIT_MV / e.minFirst);
    return up3(emfError / e.minFirst + fit + 20 * U * Math.max(Math.abs(t[0]), Math.abs(t[1])));
  };
  // Temperatures of a segment of inputs, widened by 1e-7 °C (the reference error is far below it).
  const inverseTemperatures = (a: number, b: number): _Interval => {
    const ta = _exactInverse(ct, tables, emfOf(a));
    const tb = _exactInverse(ct, tables, emfOf(b));
    return [Math.max(ct.monotonicFromC, Math.min(ta, tb) - 1e-7), Math.min(ct.maxC, Math.max(ta, tb) + 1e-7)];
  };
  const kx = emfPerInput * 1000; // µV per input unit
  const seams: _Seam[] = temperatureSeams(ct)
    .filter((m) => m.temperatureC > ct.monotonicFromC)
    .map((m) => ({
      input: (_emf(ct, m.temperatureC) - emfAtZeroInput) / emfPerInput,
      slopeJump: (kx / 1000) * (1 / m.slopeAbove - 1 / m.slopeBelow),
      valueJump: Math.abs(m.emfJump / m.slopeAbove),
    }));
  return {
    seams,
    ct,
    chain,
    inputQuantity: chain !== undefined ? (chain.coldJunctionC !== undefined ? "ADC code" : "compensated ADC code") : "EMF",
    inputUnit: chain !== undefined ? "code" : "µV",
    outputQuantity: "temperature",
    outputUnit: "°C",
    allowedMinC: ct.monotonicFromC,
    allowedMaxC: ct.maxC,
    inputAtTemperature: (t) => (_emf(ct, t) - emfAtZeroInput) / emfPerInput,
    inDomain: (x) => {
      const e = emfOf(x);
      return e <= ct.emfAtMaxC && (lowExclusive ? e > ct.emfAtMinC : e >= ct.emfAtMinC);
    },
    value: (x) => _exactInverse(ct, tables, emfOf(x)),
    curvature: (x) => {
      const t = _exactInverse(ct, tables, emfOf(x));
      const s = seebeckMicrovolts(ct, t);
      return (-kx * kx * seebeckSlope(ct, t)) / (s * s * s);
    },
    temperatureAt: (x) => _exactInverse(ct, tables, emfOf(x)),
    curvatureMethod: "interval enclosure of t''(E) = -E''(t)/E'(t)^3 over each segment's temperatures",
    curvatureBound: (a, b) => {
      // In 4 parts: the maximum of |E''| and the minimum of E' then come from nearby temperatures.
      const t = inverseTemperatures(a, b);
      const k = emfPerInput * emfPerInput;
      let bound = 0;
      for (let p = 0; p < 4; p++) {
        const lo = p === 0 ? t[0] : t[0] + ((t[1] - t[0]) * p) / 4;
        const hi = p === 3 ? t[1] : t[0] + ((t[1] - t[0]) * (p + 1)) / 4;
        const e = encloseOver(ct, [lo, hi]);
        if (!(e.minFirst > 0)) return Infinity;
        bound = Math.max(bound, up3((k * e.maxSecond) / (e.minFirst * e.minFirst * e.minFirst)));
      }
      return bound;
    },
    referenceError: (a, b) => inverseReferenceError(a, b),
  };
}

/** The table function of a forward kind (temperature or cold-junction temperature to EMF or ADC code). */
function forwardTableFunction(
  ct: CompiledType,
  kind: FirmwareTableKind,
  chain: _CheckedAdcChain | undefined,
  coldEmfMillivolts: number,
): _TableFunction {
  // Temperature input: output = outputPerMillivolt · (E(t) − subtracted) + outputAtZero.
  let outputPerMillivolt = 1000;
  let outputAtZero = 0;
  let subtracted = 0;
  if (chain !== undefined) {
    outputPerMillivolt = chain.gain / chain.lsbMillivolts;
    if (kind === "temperatureToAdcCode") {
      outputAtZero = chain.offsetMillivolts / chain.lsbMillivolts;
      subtracted = coldEmfMillivolts;
    }
  }
  const coldTable = kind === "coldJunctionToEmf" || kind === "coldJunctionToAdcCode";
  const seams: _Seam[] = temperatureSeams(ct).map((m) => ({
    input: m.temperatureC,
    slopeJump: outputPerMillivolt * (m.slopeAbove - m.slopeBelow),
    valueJump: Math.abs(outputPerMillivolt * m.emfJump),
  }));
  return {
    seams,
    ct,
    chain,
    inputQuantity: coldTable ? "cold-junction temperature" : "temperature",
    inputUnit: "°C",
    outputQuantity: chain !== undefined ? (coldTable ? "cold-junction ADC code" : "ADC code") : coldTable ? "cold-junction EMF" : "EMF",
    outputUnit: chain !== undefined ? "code" : "µV",
    allowedMinC: ct.minC,
    allowedMaxC: ct.maxC,
    inputAtTemperature: (t) => t,
    inDomain: (x) => x >= ct.minC && x <= ct.maxC,
    value: (t) => outputPerMillivolt * (_emf(ct, t) - subtracted) + outputAtZero,
    curvature: (t) => (outputPerMillivolt / 1000) * seebeckSlope(ct, t),
    temperatureAt: (t) => t,
    curvatureMethod: "interval enclosure of E''(t) over each segment",
    curvatureBound: (a, b) => up3(Math.abs(outputPerMillivolt) * encloseOver(ct, [a, b]).maxSecond),
    // The forward evaluation error plus the input's own rounding (x/scale: 1 ulp of t times the slope),
    // then 4 ulps of the affine map to the output.
    referenceError: (a, b) => {
      const e = encloseOver(ct, [a, b]);
      const t = Math.max(Math.abs(a), Math.abs(b));
      const emf = Math.max(Math.abs(_emf(ct, a)), Math.abs(_emf(ct, b))) * 1.01 + e.maxFirst * (b - a);
      const outputMagnitude = Math.abs(outputPerMillivolt) * (emf + Math.abs(subtracted)) + Math.abs(outputAtZero);
      return up3(Math.abs(outputPerMillivolt) * (e.evaluation + 2 * U * t * e.maxFirst) + 8 * U * outputMagnitude);
    },
  };
}
