/**
 * Worst case: true extremes of the model over the box of input bounds (internal part of `propagate`).
 * @module
 * @internal
 */
import { HotjunctionRangeError } from "../errors.js";
import { _normalQuantile } from "./normalQuantile.js";
import { _contributionsRecord, _linearise } from "./_propagateRss.js";
import { _meansOf, type _ModelEvaluator, type _PreparedInputs } from "./_prepare.js";
import type { PropagationResult } from "./types.js";

/** All corners are evaluated up to this many inputs (2¹⁶ = 65 536 model calls). */
const maxCornerInputs = 16;
const gridIntervals = 16;
const goldenIterations = 40;
const maxSweeps = 4;
const invPhi = 0.6180339887498949; // (√5 − 1)/2 as a literal: no call at module level (tree-shaking)

/**
 * Maximises sign·f over coordinate `i` in [lo, hi], the other coordinates fixed in `x`: a 17-point grid, then a
 * golden-section search in the grid cell pair around the best grid point. Leaves x[i] at the best point found
 * and returns sign·f there.
 */
function optimiseCoordinate(
  evaluator: _ModelEvaluator,
  x: Float64Array,
  i: number,
  lo: number,
  hi: number,
  sign: number,
  current: number,
): number {
  const start = x[i] as number;
  let bestValue = current;
  let bestX = start;
  if (!(hi > lo)) return current;
  const step = (hi - lo) / gridIntervals;
  let bestGrid = -1;
  let bestGridValue = Number.NEGATIVE_INFINITY;
  for (let g = 0; g <= gridIntervals; g++) {
    const t = g === gridIntervals ? hi : lo + g * step;
    x[i] = t;
    const v = sign * evaluator.evaluate(x);
    if (v > bestGridValue) {
      bestGridValue = v;
      bestGrid = g;
    }
  }
  if (bestGridValue > bestValue) {
    bestValue = bestGridValue;
    bestX = bestGrid === gridIntervals ? hi : lo + bestGrid * step;
  }
  // Golden section on [t(g−1), t(g+1)] for an interior maximum that the grid missed.
  let a = Math.max(lo, lo + (bestGrid - 1) * step);
  let b = Math.min(hi, lo + (bestGrid + 1) * step);
  let c = b - invPhi * (b - a);
  let d = a + invPhi * (b - a);
  x[i] = c;
  let fc = sign * evaluator.evaluate(x);
  x[i] = d;
  let fd = sign * evaluator.evaluate(x);
  for (let k = 0; k < goldenIterations; k++) {
    if (fc >= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - invPhi * (b - a);
      x[i] = c;
      fc = sign * evaluator.evaluate(x);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + invPhi * (b - a);
      x[i] = d;
      fd = sign * evaluator.evaluate(x);
    }
  }
  if (fc > bestValue) {
    bestValue = fc;
    bestX = c;
  }
  if (fd > bestValue) {
    bestValue = fd;
    bestX = d;
  }
  x[i] = bestX;
  return bestValue;
}

/** Coordinate-wise ascent of sign·f from `x` (modified in place); returns the best sign·f. */
function coordinateSearch(
  evaluator: _ModelEvaluator,
  x: Float64Array,
  lower: Float64Array,
  upper: Float64Array,
  sign: number,
): number {
  let value = sign * evaluator.evaluate(x);
  for (let sweep = 0; sweep < maxSweeps; sweep++) {
    const before = value;
    for (let i = 0; i < x.length; i++) {
      value = optimiseCoordinate(evaluator, x, i, lower[i] as number, upper[i] as number, sign, value);
    }
    if (!(value > before + 1e-15 * Math.abs(before))) break;
  }
  return value;
}

/** @internal */
export function _propagateWorstCase(
  prepared: _PreparedInputs,
  evaluator: _ModelEvaluator,
  correlation: Float64Array | undefined,
  normalBoundCoverage: number | undefined,
): PropagationResult {
  const { distributions, names } = prepared;
  const n = distributions.length;
  const lower = new Float64Array(n);
  const upper = new Float64Array(n);
  let normalK: number | undefined;
  distributions.forEach((d, i) => {
    let halfWidth = d.halfWidth;
    if (d.kind === "normal") {
      if (normalBoundCoverage === undefined) {
        throw new HotjunctionRangeError({
          code: "INVALID_OPTION",
          quantity: "normalBoundCoverage",
          value: undefined,
          context: "propagate worst-case",
          problem: `is required because input "${names[i] as string}" is normal (unbounded); give a coverage such as 0.9973 to bound normal inputs at ±k·u`,
        });
      }
      normalK = _normalQuantile((1 + normalBoundCoverage) / 2);
      halfWidth = normalK * d.standardUncertainty;
    }
    lower[i] = d.mean - halfWidth;
    upper[i] = d.mean + halfWidth;
  });
  const means = _meansOf(distributions);
  const x = new Float64Array(n);
  const bestCorner = [new Float64Array(n), new Float64Array(n)]; // [max, min]
  let strategy: string;
  if (n <= maxCornerInputs) {
    let maxValue = Number.NEGATIVE_INFINITY;
    let minValue = Number.POSITIVE_INFINITY;
    const count = 2 ** n;
    for (let mask = 0; mask < count; mask++) {
      for (let i = 0; i < n; i++) x[i] = (mask >>> i) & 1 ? (upper[i] as number) : (lower[i] as number);
      const v = evaluator.evaluate(x);
      if (v > maxValue) {
        maxValue = v;
        bestCorner[0]?.set(x);
      }
      if (v < minValue) {
        minValue = v;
        bestCorner[1]?.set(x);
      }
    }
    strategy = `all ${count} corners of the input box evaluated, then`;
  } else {
    // Per-input extremes: each input alone pushed to the end that raises (or lowers) the output.
    for (let s = 0; s < 2; s++) {
      const sign = s === 0 ? 1 : -1;
      const corner = bestCorner[s] as Float64Array;
      x.set(means);
      for (let i = 0; i < n; i++) {
        x[i] = lower[i] as number;
        const atLower = sign * evaluator.evaluate(x);
        x[i] = upper[i] as number;
        const atUpper = sign * evaluator.evaluate(x);
        x[i] = means[i] as number;
        corner[i] = atUpper >= atLower ? (upper[i] as number) : (lower[i] as number);
      }
    }
    strategy = `${n} inputs are too many for all 2^${n} corners, so the corner of per-input (one-at-a-time) extremes was used, then`;
  }
  const extremes = [Number.NEGATIVE_INFINITY, Number.POSITIVE_INFINITY];
  for (let s = 0; s < 2; s++) {
    const sign = s === 0 ? 1 : -1;
    for (const start of [bestCorner[s] as Float64Array, means]) {
      x.set(start);
      const v = sign * coordinateSearch(evaluator, x, lower, upper, sign);
      if (s === 0) extremes[0] = Math.max(extremes[0] as number, v);
      else extremes[1] = Math.min(extremes[1] as number, v);
    }
  }
  // One-at-a-time swings for the contributions.
  const swings = new Float64Array(n);
  let swingSquares = 0;
  const base = evaluator.evaluate(means);
  for (let i = 0; i < n; i++) {
    x.set(means);
    const high = optimiseCoordinate(evaluator, x, i, lower[i] as number, upper[i] as number, 1, base);
    x.set(means);
    const low = -optimiseCoordinate(evaluator, x, i, lower[i] as number, upper[i] as number, -1, -base);
    swings[i] = high - low;
    swingSquares += (high - low) ** 2;
  }
  const lin = _linearise(prepared, evaluator, correlation);
  const low = extremes[1] as number;
  const high = extremes[0] as number;
  return {
    method: "worst-case",
    estimate: lin.estimate,
    standardUncertainty: lin.standardUncertainty,
    interval: [Math.min(low, lin.estimate), Math.max(high, lin.estimate)],
    coverage: 1,
    contributions: _contributionsRecord(prepared, (i) => ({
      sensitivity: lin.sensitivities[i] as number,
      contribution: swings[i] as number,
      varianceShare: swingSquares > 0 ? (swings[i] as number) ** 2 / swingSquares : 0,
    })),
    note:
      `Worst case over the box of input bounds: ${strategy} a coordinate-wise search (17-point grid and golden-section ` +
      `refinement per input, up to ${maxSweeps} sweeps) from the best corner and from the estimates, so interior extremes of ` +
      `non-monotone models are found` +
      (normalK !== undefined ? `; normal inputs bounded at ±${normalK.toPrecision(4)}·u (${normalBoundCoverage as number} coverage)` : "") +
      (correlation !== undefined ? "; correlations are not used (the box bounds any dependence)" : "") +
      `; contributions are one-at-a-time output swings, varianceShare their squared shares; standardUncertainty is the GUM (RSS) value.`,
  };
}
