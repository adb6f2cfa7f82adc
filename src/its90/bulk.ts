/**
 * Bulk conversions over Float64Arrays: runs of elements in one sub-range through tight loops with the
 * sub-range's coefficients hoisted, and the exact inverse element by element.
 * @internal
 * @module
 */
import { HotjunctionTypeError, _requireFinite } from "../errors.js";
import { _subrangeIndex, type CompiledSubrange, type CompiledType } from "./compiled.js";
import { _checkEmf, _checkTemperature, _EMF_END_TOLERANCE_MV } from "./engine.js";
import { _exactInverse, _exactInverseTables } from "./exactInverse.js";

/** @internal Checks a bulk call's arrays (the root entry's loops and `hotjunction/bulk` both); returns the length. */
export function _checkBulkArrays(input: unknown, out: unknown, quantity: string, context: string): number {
  if (!(input instanceof Float64Array)) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity,
      value: input,
      problem: "is not a Float64Array",
      context,
    });
  }
  if (out !== undefined && (!(out instanceof Float64Array) || out.length < input.length)) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "output array",
      value: out,
      problem: `is not a Float64Array of length at least ${input.length}`,
      context,
    });
  }
  return input.length;
}

// Deliberately alike: forwardRun and forwardRun10 are the same loop; forwardRun10 holds ≤ 10 coefficients in
// locals and unrolls Horner over them (bit-identical, the bulk speed target), forwardRun takes any degree.
/**
 * Converts elements from `start` while they stay in [lo, hi) and ≤ maxC, adding type K's exponential term
 * a0·exp(a1·(t − a2)²) when `hasExp`; returns the index it stopped at.
 */
function forwardRun(
  temperaturesC: Float64Array,
  result: Float64Array,
  start: number,
  n: number,
  c: Float64Array,
  degree: number,
  lo: number,
  hi: number,
  maxC: number,
  hasExp: boolean,
  a0: number,
  a1: number,
  a2: number,
): number {
  // Lengths come in as arguments: no property access inside, which keeps the optimised loop stable.
  let i = start;
  for (; i < n; i++) {
    const t = temperaturesC[i] as number;
    if (!(t >= lo && t < hi && t <= maxC)) break;
    let acc = 0;
    for (let k = degree; k >= 0; k--) acc = acc * t + (c[k] as number);
    if (hasExp) {
      const d = t - a2;
      result[i] = acc + a0 * Math.exp(a1 * d * d);
    } else {
      result[i] = acc;
    }
  }
  return i;
}

// Deliberately alike: the unrolled twin of forwardRun above (same arithmetic, same bits). Alike in shape only
// with the golden-section step's end in uncertainty/_propagateWorstCase.ts (another job).
/**
 * {@link forwardRun} for sub-ranges of at most 10 coefficients (most of them), zero-padded to 10: the Horner
 * scheme unrolled over coefficients held in locals runs faster than a loop over the array. Leading zero
 * coefficients add exact zeros, so the result is bit for bit that of the loop.
 */
function forwardRun10(
  temperaturesC: Float64Array,
  result: Float64Array,
  start: number,
  n: number,
  c: Float64Array,
  lo: number,
  hi: number,
  maxC: number,
  hasExp: boolean,
  a0: number,
  a1: number,
  a2: number,
): number {
  const c0 = c[0] as number, c1 = c[1] as number, c2 = c[2] as number, c3 = c[3] as number, c4 = c[4] as number;
  const c5 = c[5] as number, c6 = c[6] as number, c7 = c[7] as number, c8 = c[8] as number, c9 = c[9] as number;
  let i = start;
  for (; i < n; i++) {
    const t = temperaturesC[i] as number;
    if (!(t >= lo && t < hi && t <= maxC)) break;
    const acc = c0 + t * (c1 + t * (c2 + t * (c3 + t * (c4 + t * (c5 + t * (c6 + t * (c7 + t * (c8 + t * c9))))))));
    if (hasExp) {
      const d = t - a2;
      result[i] = acc + a0 * Math.exp(a1 * d * d);
    } else {
      result[i] = acc;
    }
  }
  return i;
}

const padded10 = new WeakMap<CompiledSubrange, Float64Array>();

/** A sub-range's coefficients zero-padded to 10 (built once per sub-range). @internal */
export function _coefficients10(sub: CompiledSubrange): Float64Array {
  let c = padded10.get(sub);
  if (c === undefined) {
    c = new Float64Array(10);
    c.set(sub.c);
    padded10.set(sub, c);
  }
  return c;
}

/** Throws the error that names a bad element of a bulk call (kept out of the hot function). */
function badElement(ct: CompiledType, temperatureC: number, index: number): never {
  _checkTemperature(ct, temperatureC, `temperature [${index}]`);
  throw new Error("unreachable: the element passed the check it failed");
}

/** @internal */
export function _emfFromTemperatureArray(
  ct: CompiledType,
  temperaturesC: Float64Array,
  out?: Float64Array,
): Float64Array {
  const n = _checkBulkArrays(temperaturesC, out, "temperatures", ct.context);
  const result = out ?? new Float64Array(n);
  const minC = ct.minC;
  const maxC = ct.maxC;
  const subs = ct.subranges;
  const last = subs.length - 1;
  const a0 = ct.a0;
  const a1 = ct.a1;
  const a2 = ct.a2;
  // Runs of elements in one sub-range go through a tight loop with that sub-range's coefficients and
  // exponential flag hoisted: per element the same Horner pass as a hand-written loop plus three comparisons.
  let i = 0;
  while (i < n) {
    const first = temperaturesC[i] as number;
    // NaN fails the comparisons, so it also takes the slow path, which names the element.
    if (!(first >= minC && first <= maxC)) badElement(ct, first, i);
    const index = _subrangeIndex(ct, first);
    const sub = subs[index] as CompiledSubrange;
    const c = sub.c;
    const lo = index === 0 ? minC : sub.minC;
    const hi = index === last ? Infinity : (subs[index + 1] as CompiledSubrange).minC;
    const next =
      c.length <= 10
        ? forwardRun10(temperaturesC, result, i, n, _coefficients10(sub), lo, hi, maxC, sub.hasExp, a0, a1, a2)
        : forwardRun(temperaturesC, result, i, n, c, c.length - 1, lo, hi, maxC, sub.hasExp, a0, a1, a2);
    // The first element lies in its own sub-range, so a run always converts at least one element.
    i = next;
  }
  return result;
}

/** @internal */
export function _temperatureFromEmfArray(
  ct: CompiledType,
  emfsMillivolts: Float64Array,
  out?: Float64Array,
): Float64Array {
  const n = _checkBulkArrays(emfsMillivolts, out, "EMFs", ct.context);
  const result = out ?? new Float64Array(n);
  const inv = _exactInverseTables(ct);
  // Fast acceptance test: inside (E at the unambiguous start, E(maxC)]; anything else is checked in full.
  const lowOk = ct.monotonicFromC > ct.minC ? ct.emfAtMinC : ct.emfAtMinC - _EMF_END_TOLERANCE_MV;
  const highOk = ct.emfAtMaxC + _EMF_END_TOLERANCE_MV;
  for (let i = 0; i < n; i++) {
    const e = emfsMillivolts[i] as number;
    if (!(e > lowOk && e <= highOk)) {
      _requireFinite(e, `EMF [${i}]`, "mV", ct.context);
      _checkEmf(ct, e, `EMF [${i}]`, ct.context);
    }
    result[i] = _exactInverse(ct, inv, e);
  }
  return result;
}

