/**
 * Input preparation shared by the propagation methods (internal): checked inputs in a canonical order,
 * correlation matrix and its Cholesky factor, a model evaluator that checks every output, and sensitivities.
 * @module
 * @internal
 */
import { HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { _checkDistribution, type _CheckedDistribution } from "./_distribution.js";
import type { Model } from "./types.js";

/** @internal Inputs in canonical (sorted) name order, so results do not depend on the caller's key order. */
export interface _PreparedInputs {
  /** Names sorted by UTF-16 code units. */
  readonly names: readonly string[];
  /** Names in the caller's order (for the contributions record). */
  readonly callerOrder: readonly string[];
  readonly distributions: readonly _CheckedDistribution[];
}

/** @internal Checks the inputs record. */
export function _prepareInputs(inputs: unknown): _PreparedInputs {
  if (typeof inputs !== "object" || inputs === null || Array.isArray(inputs)) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "inputs",
      value: inputs,
      context: "propagate",
      problem: "is not a record of named distributions",
    });
  }
  const callerOrder = Object.keys(inputs);
  if (callerOrder.length === 0) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "inputs",
      value: 0,
      context: "propagate",
      problem: "names no input (at least one is needed)",
    });
  }
  const names = [...callerOrder].sort();
  const distributions = names.map((name) => _checkDistribution((inputs as Record<string, unknown>)[name], name));
  return { names, callerOrder, distributions };
}

/**
 * @internal Builds the full correlation matrix (row-major, n×n, canonical order) from `[a, b, r]` triples.
 * Returns `undefined` when no non-zero correlation is given.
 */
export function _correlationMatrix(correlations: unknown, names: readonly string[]): Float64Array | undefined {
  if (correlations === undefined) return undefined;
  const context = "propagate correlations";
  if (!Array.isArray(correlations)) {
    // Same error shape as other typed-error checks (deliberate: each names its own quantity and problem).
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "correlations",
      value: correlations,
      context,
      problem: "is not a list of [nameA, nameB, r] triples",
    });
  }
  const n = names.length;
  const matrix = new Float64Array(n * n);
  for (let i = 0; i < n; i++) matrix[i * n + i] = 1;
  const seen = new Set<string>();
  let any = false;
  correlations.forEach((entry: unknown, index) => {
    const where = `${context}[${index}]`;
    if (!Array.isArray(entry) || entry.length !== 3) {
      throw new HotjunctionTypeError({
        code: "INVALID_OPTION",
        quantity: "correlation",
        value: entry,
        context: where,
        problem: "is not a [nameA, nameB, r] triple",
      });
    }
    const [a, b, r] = entry as [unknown, unknown, unknown];
    for (const name of [a, b]) {
      if (typeof name !== "string" || !names.includes(name)) {
        // Same error shape as other typed-error checks (deliberate: each names its own quantity and problem).
        throw new HotjunctionRangeError({
          code: "UNKNOWN_NAME",
          quantity: "input name",
          value: name,
          context: where,
          problem: "is not one of the inputs",
          allowed: names,
        });
      }
    }
    if (a === b) {
      throw new HotjunctionRangeError({
        code: "INVALID_OPTION",
        quantity: "input name",
        value: a,
        context: where,
        problem: "is correlated with itself (self-correlation is always 1 and must not be given)",
      });
    }
    const key = [a as string, b as string].sort().join("\u0000");
    if (seen.has(key)) {
      // Same error shape as other typed-error checks (deliberate: each names its own quantity and problem).
      throw new HotjunctionRangeError({
        code: "INVALID_OPTION",
        quantity: "correlation",
        value: `${String(a)}, ${String(b)}`,
        context: where,
        problem: "is given twice for the same pair of inputs",
      });
    }
    seen.add(key);
    if (typeof r !== "number" || !Number.isFinite(r)) {
      throw new HotjunctionTypeError({
        code: "NOT_A_FINITE_NUMBER",
        quantity: "correlation coefficient",
        value: r,
        context: where,
        problem: "is not a finite number",
      });
    }
    if (r < -1 || r > 1) {
      throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "correlation coefficient", value: r, min: -1, max: 1, context: where });
    }
    const i = names.indexOf(a as string);
    const j = names.indexOf(b as string);
    matrix[i * n + j] = r;
    matrix[j * n + i] = r;
    if (r !== 0) any = true;
  });
  return any ? matrix : undefined;
}

/**
 * @internal Lower Cholesky factor L (row-major) with C = L·Lᵀ of a positive semi-definite correlation matrix.
 * Zero pivots (e.g. r = ±1) are allowed; a matrix that is not positive semi-definite throws.
 */
export function _choleskyFactor(matrix: Float64Array, names: readonly string[]): Float64Array {
  const n = names.length;
  const lower = new Float64Array(n * n);
  const tolerance = 1e-10;
  const fail = (): never => {
    throw new HotjunctionRangeError({
      code: "NOT_POSITIVE_DEFINITE",
      quantity: "correlation matrix",
      value: names.join(", "),
      context: "propagate correlations",
      problem: "is not positive semi-definite (the correlation coefficients contradict each other)",
    });
  };
  for (let j = 0; j < n; j++) {
    let pivot = matrix[j * n + j] as number;
    for (let k = 0; k < j; k++) pivot -= (lower[j * n + k] as number) ** 2;
    if (pivot < -tolerance) fail();
    const diagonal = pivot > tolerance ? Math.sqrt(pivot) : 0;
    lower[j * n + j] = diagonal;
    for (let i = j + 1; i < n; i++) {
      let value = matrix[i * n + j] as number;
      for (let k = 0; k < j; k++) value -= (lower[i * n + k] as number) * (lower[j * n + k] as number);
      if (diagonal === 0) {
        if (Math.abs(value) > 1e-8) fail();
        lower[i * n + j] = 0;
      } else {
        lower[i * n + j] = value / diagonal;
      }
    }
  }
  return lower;
}

/**
 * @internal Copies one point into the record: input i from `values[i · stride + at]` (stride 1: a point's
 * values in canonical order; Monte Carlo: trial `at` of the sampled columns).
 */
export type _RecordFill = (record: Record<string, number>, values: ArrayLike<number>, at: number) => void;

/**
 * @internal The record fill for these names (canonical order). A loop `record[names[i]] = …` is one store site
 * that sees every name, so V8 treats it as megamorphic and looks each name up (most of the time of a cheap model
 * was spent there); here the first 32 names each have their own store site with a name fixed per fill, which
 * stays monomorphic while a process evaluates one set of names. Same values, same order. 32, not 16: the
 * examples with a wire or two channels have 20–22 inputs, and with 16 sites the loop's four to six stores cost
 * more than the sixteen others (into a `_numberRecord`, hot, 4 Dec 2026: 20 names 85–95 ns with 16 sites, 50 ns
 * with 32; 22 names 125–188 ns against 44 ns).
 */
export function _recordFill(names: readonly string[], stride: number): _RecordFill {
  const n = names.length;
  const s = stride;
  const k0 = names[0] as string;
  const k1 = names[1] as string;
  const k2 = names[2] as string;
  const k3 = names[3] as string;
  const k4 = names[4] as string;
  const k5 = names[5] as string;
  const k6 = names[6] as string;
  const k7 = names[7] as string;
  const k8 = names[8] as string;
  const k9 = names[9] as string;
  const k10 = names[10] as string;
  const k11 = names[11] as string;
  const k12 = names[12] as string;
  const k13 = names[13] as string;
  const k14 = names[14] as string;
  const k15 = names[15] as string;
  const k16 = names[16] as string;
  const k17 = names[17] as string;
  const k18 = names[18] as string;
  const k19 = names[19] as string;
  const k20 = names[20] as string;
  const k21 = names[21] as string;
  const k22 = names[22] as string;
  const k23 = names[23] as string;
  const k24 = names[24] as string;
  const k25 = names[25] as string;
  const k26 = names[26] as string;
  const k27 = names[27] as string;
  const k28 = names[28] as string;
  const k29 = names[29] as string;
  const k30 = names[30] as string;
  const k31 = names[31] as string;
  return (record, col, t) => {
    record[k0] = col[t] as number;
    if (n === 1) return;
    record[k1] = col[1 * s + t] as number;
    if (n === 2) return;
    record[k2] = col[2 * s + t] as number;
    if (n === 3) return;
    record[k3] = col[3 * s + t] as number;
    if (n === 4) return;
    record[k4] = col[4 * s + t] as number;
    if (n === 5) return;
    record[k5] = col[5 * s + t] as number;
    if (n === 6) return;
    record[k6] = col[6 * s + t] as number;
    if (n === 7) return;
    record[k7] = col[7 * s + t] as number;
    if (n === 8) return;
    record[k8] = col[8 * s + t] as number;
    if (n === 9) return;
    record[k9] = col[9 * s + t] as number;
    if (n === 10) return;
    record[k10] = col[10 * s + t] as number;
    if (n === 11) return;
    record[k11] = col[11 * s + t] as number;
    if (n === 12) return;
    record[k12] = col[12 * s + t] as number;
    if (n === 13) return;
    record[k13] = col[13 * s + t] as number;
    if (n === 14) return;
    record[k14] = col[14 * s + t] as number;
    if (n === 15) return;
    record[k15] = col[15 * s + t] as number;
    if (n === 16) return;
    record[k16] = col[16 * s + t] as number;
    if (n === 17) return;
    record[k17] = col[17 * s + t] as number;
    if (n === 18) return;
    record[k18] = col[18 * s + t] as number;
    if (n === 19) return;
    record[k19] = col[19 * s + t] as number;
    if (n === 20) return;
    record[k20] = col[20 * s + t] as number;
    if (n === 21) return;
    record[k21] = col[21 * s + t] as number;
    if (n === 22) return;
    record[k22] = col[22 * s + t] as number;
    if (n === 23) return;
    record[k23] = col[23 * s + t] as number;
    if (n === 24) return;
    record[k24] = col[24 * s + t] as number;
    if (n === 25) return;
    record[k25] = col[25 * s + t] as number;
    if (n === 26) return;
    record[k26] = col[26 * s + t] as number;
    if (n === 27) return;
    record[k27] = col[27 * s + t] as number;
    if (n === 28) return;
    record[k28] = col[28 * s + t] as number;
    if (n === 29) return;
    record[k29] = col[29 * s + t] as number;
    if (n === 30) return;
    record[k30] = col[30 * s + t] as number;
    if (n === 31) return;
    record[k31] = col[31 * s + t] as number;
    if (n === 32) return;
    for (let i = 32; i < n; i++) record[names[i] as string] = col[i * s + t] as number;
  };
}

/**
 * @internal A record of numbers, `names[i]` → `valueOf(i)` in this order, with fast (not dictionary) properties
 * that hold doubles in place. Two V8 behaviours decide the cost of every evaluation through a record (measured
 * hot on 4 Dec 2026):
 * - an object turns into a hash table once more than 12 properties beyond its 4 in-object slots are added by
 *   keyed stores (`record[name] = v` in a loop), and then every store and every read by name is a lookup (a
 *   fill of 20 names 250 ns against 21 ns for 16; the examples with a wire or two channels have 20–22 inputs):
 *   so the record is built at once, by `Object.fromEntries`;
 * - a field first given a small integer (such as 0) holds tagged values, so every later store of a double
 *   allocates a number on the heap (20 ns and 16 bytes per store, against 2 ns in place): so each field starts
 *   at 0.5 and is then given its value.
 * Same keys, order and values as the loop. Default value 0.
 */
export function _numberRecord(names: readonly string[], valueOf: (i: number) => number = () => 0): Record<string, number> {
  const record: Record<string, number> = Object.fromEntries(names.map((name) => [name, 0.5]));
  names.forEach((name, i) => (record[name] = valueOf(i)));
  return record;
}

/** @internal Calls the model with one reused record and checks every output. */
export class _ModelEvaluator {
  readonly record: Record<string, number>;
  private readonly fill: _RecordFill;
  constructor(
    readonly model: Model,
    readonly names: readonly string[],
  ) {
    this.record = _numberRecord(names);
    this.fill = _recordFill(names, 1);
  }

  /** Evaluates at `values` (canonical order). */
  evaluate(values: ArrayLike<number>): number {
    const record = this.record;
    this.fill(record, values, 0);
    const y = this.model(record);
    if (typeof y !== "number" || y - y !== 0) this.fail(y);
    return y;
  }

  /** Throws MODEL_NOT_FINITE naming the input values of the current record. */
  fail(y: unknown): never {
    const at = this.names.map((name) => `${name} = ${String(this.record[name])}`).join(", ");
    const ErrorClass = typeof y === "number" ? HotjunctionRangeError : HotjunctionTypeError;
    throw new ErrorClass({
      code: "MODEL_NOT_FINITE",
      quantity: "model output",
      value: y,
      context: "propagate",
      problem: `is not a finite number at inputs ${at}`,
    });
  }

  /**
   * Calls the model once through a proxy that reports a read of a name that is not an input (a missing input
   * would otherwise only show as NaN).
   */
  probeNames(values: ArrayLike<number>): void {
    const known = new Set(this.names);
    const record: Record<string, number> = {};
    this.names.forEach((name, i) => (record[name] = values[i] as number));
    const guarded = new Proxy(record, {
      get(target, key, receiver) {
        if (typeof key === "string" && !known.has(key) && !(key in Object.prototype)) {
          throw new HotjunctionRangeError({
            code: "UNKNOWN_NAME",
            quantity: "input name",
            value: key,
            context: "propagate model",
            problem: "is read by the model but is not one of the inputs (missing input)",
            allowed: [...known],
          });
        }
        return Reflect.get(target, key, receiver) as unknown;
      },
    });
    const y = this.model(guarded);
    if (typeof y !== "number" || y - y !== 0) {
      this.evaluate(values); // sets the record and throws with the input values
    }
  }
}

/**
 * @internal Sensitivity coefficients ∂f/∂xᵢ at `point` by Richardson-extrapolated central differences,
 * c = (4·D(h/2) − D(h))/3 with D(h) = (f(x+h) − f(x−h))/(2h), h = u(xᵢ)/100 (or 1e-6·max(|xᵢ|, 1) when u = 0).
 */
export function _sensitivities(
  evaluator: _ModelEvaluator,
  point: Float64Array,
  distributions: readonly _CheckedDistribution[],
): Float64Array {
  const n = distributions.length;
  const result = new Float64Array(n);
  const x = Float64Array.from(point);
  for (let i = 0; i < n; i++) {
    const d = distributions[i] as _CheckedDistribution;
    const x0 = point[i] as number;
    let h = d.standardUncertainty > 0 ? d.standardUncertainty / 100 : 1e-6 * Math.max(Math.abs(x0), 1);
    // A standard uncertainty so small that x0 ± h/2 rounds back to x0 (or h underflows to 0) would give 0/0:
    // take the smallest step that still moves the input, relative to its size.
    if (!(h > 0) || x0 + h / 2 === x0) h = 1e-7 * Math.max(Math.abs(x0), 1e-9);
    const difference = (step: number): number => {
      x[i] = x0 + step;
      const up = evaluator.evaluate(x);
      x[i] = x0 - step;
      const down = evaluator.evaluate(x);
      x[i] = x0;
      return (up - down) / (2 * step);
    };
    const coarse = difference(h);
    const fine = difference(h / 2);
    result[i] = (4 * fine - coarse) / 3;
  }
  return result;
}

/** @internal Means of the inputs in canonical order. */
export function _meansOf(distributions: readonly _CheckedDistribution[]): Float64Array {
  return Float64Array.from(distributions, (d) => d.mean);
}
