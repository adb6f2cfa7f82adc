/**
 * Worst case: true extremes of the model over the box of input bounds (internal part of `propagate`).
 * @module
 * @internal
 */
import { HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { _normalQuantile } from "./normalQuantile.js";
import { _contributionsRecord, _linearise } from "./_propagateRss.js";
import { _meansOf, _numberRecord, type _ModelEvaluator, type _PreparedInputs } from "./_prepare.js";
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
  // Alike in shape only with its90/bulk.ts (the end of forwardRun beside forwardRun10's opening): other jobs.
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

// (Alike in shape only with the bulk forward loop's end in its90/bulk.ts: another job.)
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

/** @internal An interval extension of the model over a box (the caller's `modelEnclosure`). */
export type _Enclosure = (box: Readonly<Record<string, readonly [number, number]>>) => readonly [number, number];

/** Enclosure calls per side (maximum, minimum) of the branch and bound. */
const maxEnclosureCalls = 4096;

/**
 * @internal Branch and bound over the input box with an interval extension: for each side, boxes are kept in
 * order of their bound; the best box is split in half along its widest input (relative to the input's range),
 * the model is evaluated at each half's midpoint (raising the attained extreme when it is better), and halves
 * whose bound cannot beat the attained extreme are dropped. The enclosure is the attained extreme joined with
 * the bounds of the boxes left: it holds whenever the extension does, however early the search stops. Updates
 * `attained` and `points` (canonical order) in place.
 */
export function _branchAndBound(
  enclosure: _Enclosure,
  names: readonly string[],
  lower: Float64Array,
  upper: Float64Array,
  evaluator: _ModelEvaluator,
  attained: { low: { value: number }; high: { value: number } },
  points: Float64Array[],
): { low: number; high: number; calls: number; complete: boolean } {
  const n = names.length;
  let calls = 0;
  const bound = (lo: Float64Array, hi: Float64Array): readonly [number, number] => {
    const box: Record<string, readonly [number, number]> = {};
    for (let i = 0; i < n; i++) box[names[i] as string] = [lo[i] as number, hi[i] as number];
    calls++;
    const r: unknown = enclosure(box);
    if (!Array.isArray(r) || r.length !== 2 || typeof r[0] !== "number" || typeof r[1] !== "number" || !Number.isFinite(r[0]) || !Number.isFinite(r[1]) || r[0] > r[1]) {
      throw new HotjunctionTypeError({
        code: "INVALID_OPTION",
        quantity: "modelEnclosure result",
        value: r,
        context: "propagate worst-case",
        problem: "is not a [low, high] pair of finite numbers with low ≤ high",
      });
    }
    return r as unknown as readonly [number, number];
  };
  const root = bound(lower, upper);
  const result = { low: root[0], high: root[1], calls: 0, complete: true };
  const mid = new Float64Array(n);
  for (let s = 0; s < 2; s++) {
    const sign = s === 0 ? 1 : -1; // 0: maximum, 1: minimum
    const best = () => (s === 0 ? attained.high.value : -attained.low.value);
    const rootBound = sign * (s === 0 ? root[1] : root[0]);
    if (rootBound < best()) {
      throw new HotjunctionRangeError({
        code: "INVALID_OPTION",
        quantity: "modelEnclosure",
        value: s === 0 ? root[1] : root[0],
        context: "propagate worst-case",
        problem: `does not contain the attained ${s === 0 ? "maximum" : "minimum"} ${s === 0 ? attained.high.value : attained.low.value} (it is not an enclosure of the model)`,
      });
    }
    let boxes: { lo: Float64Array; hi: Float64Array; ub: number }[] = [{ lo: Float64Array.from(lower), hi: Float64Array.from(upper), ub: rootBound }];
    const tolerance = 1e-12 * (Math.abs(root[1] - root[0]) + Math.abs(best()));
    const budget = calls + maxEnclosureCalls;
    // Boxes dropped because their bound is within the tolerance of the attained value still bound the model:
    // the largest such bound stays part of the enclosure (dropping them must not shrink it to the attained value).
    let dropped = Number.NEGATIVE_INFINITY;
    while (boxes.length > 0 && calls < budget) {
      let top = 0;
      for (let b = 1; b < boxes.length; b++) if ((boxes[b]?.ub as number) > (boxes[top]?.ub as number)) top = b;
      const box = boxes[top] as { lo: Float64Array; hi: Float64Array; ub: number };
      if (box.ub <= best() + tolerance) {
        dropped = Math.max(dropped, box.ub);
        boxes = [];
        break;
      }
      boxes.splice(top, 1);
      let split = 0;
      let widest = -1;
      for (let i = 0; i < n; i++) {
        const range = (upper[i] as number) - (lower[i] as number);
        const w = range > 0 ? ((box.hi[i] as number) - (box.lo[i] as number)) / range : 0;
        if (w > widest) {
          widest = w;
          split = i;
        }
      }
      if (!(widest > 0)) {
        // a point box: its bound stays
        boxes.push(box);
        break;
      }
      const cut = ((box.lo[split] as number) + (box.hi[split] as number)) / 2;
      for (const half of [0, 1]) {
        const lo = Float64Array.from(box.lo);
        const hi = Float64Array.from(box.hi);
        if (half === 0) hi[split] = cut;
        else lo[split] = cut;
        for (let i = 0; i < n; i++) mid[i] = ((lo[i] as number) + (hi[i] as number)) / 2;
        const v = sign * evaluator.evaluate(mid);
        if (v > best()) {
          if (s === 0) attained.high.value = v;
          else attained.low.value = -v;
          points[s]?.set(mid);
        }
        const e = bound(lo, hi);
        const ub = sign * (s === 0 ? e[1] : e[0]);
        if (ub > best() + tolerance) boxes.push({ lo, hi, ub });
        else dropped = Math.max(dropped, ub);
      }
    }
    let remaining = Math.max(best(), dropped);
    for (const b of boxes) remaining = Math.max(remaining, b.ub);
    if (boxes.length > 0) result.complete = false;
    if (s === 0) result.high = Math.min(root[1], remaining);
    else result.low = Math.max(root[0], -remaining);
  }
  result.calls = calls;
  return result;
}

/**
 * @internal Whether the worst case may skip the corner scan and the coordinate search when the model's enclosure
 * already meets the per-input-extreme corners (`_enclosureMetAtCorners`). On by default; benches and tests turn it
 * off to compare with the full search in the same process.
 */
export const _worstCaseFastPath = { enabled: true };

/**
 * Per-input extremes: each input alone pushed, from the estimates, to the end that raises (corners[0]) or lowers
 * (corners[1]) the output (2n evaluations per side). `x` is scratch.
 */
function perInputCorners(evaluator: _ModelEvaluator, x: Float64Array, lower: Float64Array, upper: Float64Array, means: Float64Array, corners: Float64Array[]): void {
  const n = lower.length;
  for (let s = 0; s < 2; s++) {
    const sign = s === 0 ? 1 : -1;
    const corner = corners[s] as Float64Array;
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
}

/**
 * Whether the enclosure r meets the attained values [low, high] within the branch and bound's own tolerance (its
 * "gap closed": 1e-12 of the enclosure's width plus the value, per side), containing them.
 */
function meetsEnclosure(r: readonly [number, number], low: number, high: number): boolean {
  const width = Math.abs(r[1] - r[0]);
  return r[0] <= low && high <= r[1] && r[1] - high <= 1e-12 * (width + Math.abs(high)) && low - r[0] <= 1e-12 * (width + Math.abs(low));
}

/** The values of a point (canonical order) as a record in the caller's order of names. */
function pointRecord(prepared: _PreparedInputs, values: Float64Array): Record<string, number> {
  return _numberRecord(prepared.callerOrder, (i) => values[prepared.names.indexOf(prepared.callerOrder[i] as string)] as number);
}

/**
 * @internal The fast path of a worst case with an enclosure. For each side, the start is the point of one-at-a-time
 * extremes (`corners[s]`: each input at the value that alone, the others at their estimates, raises (maximum) or
 * lowers (minimum) the model most — an end of its range for a monotone input, an interior value for one with an
 * interior extreme); the inputs whose value there lies inside their range are then refined by the coordinate-wise
 * search (the others' ends move their interior extreme), the rest kept. One enclosure call over the whole box then
 * bounds the model. When each attained value lies within the branch and bound's tolerance of its enclosure end
 * (`1e-12 · (enclosure width + |attained|)`), nothing a search could attain is farther than that from it, and the
 * attained pair [max, min] is returned with the enclosure [low, high] (the points are left in `corners`). Otherwise
 * (or when the enclosure does not contain an attained value: the branch and bound then reports it) undefined, and the
 * full search runs.
 */
export function _enclosureMetAtCorners(
  enclosure: _Enclosure,
  names: readonly string[],
  evaluator: _ModelEvaluator,
  lower: Float64Array,
  upper: Float64Array,
  corners: Float64Array[],
): readonly [high: number, low: number, enclosureLow: number, enclosureHigh: number] | undefined {
  const n = names.length;
  const attained = [0, 0];
  for (let s = 0; s < 2; s++) {
    const sign = s === 0 ? 1 : -1;
    const x = corners[s] as Float64Array;
    let value = sign * evaluator.evaluate(x);
    const inside: number[] = [];
    for (let i = 0; i < n; i++) if ((x[i] as number) > (lower[i] as number) && (x[i] as number) < (upper[i] as number)) inside.push(i);
    for (let sweep = 0; inside.length > 0 && sweep < maxSweeps; sweep++) {
      const before = value;
      for (const i of inside) value = optimiseCoordinate(evaluator, x, i, lower[i] as number, upper[i] as number, sign, value);
      if (!(value > before + 1e-15 * Math.abs(before))) break;
    }
    // the value at the point itself (the search returns its best sign·f; the point is where it was found)
    attained[s] = evaluator.evaluate(x);
  }
  const box: Record<string, readonly [number, number]> = {};
  for (let i = 0; i < n; i++) box[names[i] as string] = [lower[i] as number, upper[i] as number];
  const r: unknown = enclosure(box);
  if (!Array.isArray(r) || r.length !== 2 || typeof r[0] !== "number" || typeof r[1] !== "number" || !Number.isFinite(r[0]) || !Number.isFinite(r[1])) return undefined;
  const high = attained[0] as number;
  const low = attained[1] as number;
  return meetsEnclosure(r as [number, number], low, high) ? [high, low, r[0], r[1]] : undefined;
}

/**
 * One-at-a-time: each input alone over its range, the others at their estimates. The output swings (high − low)
 * are the worst case's contributions; the values reached are the fast path's start (`best[0]` raises the model,
 * `best[1]` lowers it). With an enclosure, an input whose two end values meet the enclosure of its one-input box
 * (within the branch and bound's tolerance) is monotone there to that tolerance, and its swing is read off the
 * ends (2 evaluations and an enclosure call); otherwise, and without an enclosure, a 17-point grid and a
 * golden-section refinement per side find it.
 */
function oneAtATime(
  evaluator: _ModelEvaluator,
  lower: Float64Array,
  upper: Float64Array,
  means: Float64Array,
  enclosure: _Enclosure | undefined,
  names: readonly string[],
): { swings: Float64Array; swingSquares: number; best: Float64Array[] } {
  const n = lower.length;
  const x = new Float64Array(n);
  const swings = new Float64Array(n);
  const best = [new Float64Array(means), new Float64Array(means)];
  let swingSquares = 0;
  const base = evaluator.evaluate(means);
  const box: Record<string, readonly [number, number]> = {};
  if (enclosure !== undefined) for (let i = 0; i < n; i++) box[names[i] as string] = [means[i] as number, means[i] as number];
  for (let i = 0; i < n; i++) {
    const lo = lower[i] as number;
    const hi = upper[i] as number;
    let high: number | undefined;
    let low: number | undefined;
    if (enclosure !== undefined && hi > lo) {
      x.set(means);
      x[i] = lo;
      const atLo = evaluator.evaluate(x);
      x[i] = hi;
      const atHi = evaluator.evaluate(x);
      const name = names[i] as string;
      box[name] = [lo, hi];
      const r = enclosure(box);
      box[name] = [means[i] as number, means[i] as number];
      const top = Math.max(atLo, atHi, base);
      const bottom = Math.min(atLo, atHi, base);
      if (meetsEnclosure(r, bottom, top)) {
        high = top;
        low = bottom;
        (best[0] as Float64Array)[i] = top === base ? (means[i] as number) : top === atHi ? hi : lo;
        (best[1] as Float64Array)[i] = bottom === base ? (means[i] as number) : bottom === atLo ? lo : hi;
      }
    }
    if (high === undefined || low === undefined) {
      x.set(means);
      high = optimiseCoordinate(evaluator, x, i, lo, hi, 1, base);
      (best[0] as Float64Array)[i] = x[i] as number;
      x.set(means);
      low = -optimiseCoordinate(evaluator, x, i, lo, hi, -1, -base);
      (best[1] as Float64Array)[i] = x[i] as number;
    }
    swings[i] = high - low;
    swingSquares += (high - low) ** 2;
  }
  return { swings, swingSquares, best };
}

/** @internal The box of input bounds: bounded inputs at ± their half-width, normal ones at ±k·u for `normalBoundCoverage`. */
export function _inputBox(prepared: _PreparedInputs, normalBoundCoverage: number | undefined): { lower: Float64Array; upper: Float64Array; normalK: number | undefined } {
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
  return { lower, upper, normalK };
}

/** @internal */
export function _propagateWorstCase(
  prepared: _PreparedInputs,
  evaluator: _ModelEvaluator,
  correlation: Float64Array | undefined,
  normalBoundCoverage: number | undefined,
  enclosure?: _Enclosure,
  fastPath: boolean = _worstCaseFastPath.enabled,
): PropagationResult {
  const { distributions, names } = prepared;
  const n = distributions.length;
  const { lower, upper, normalK } = _inputBox(prepared, normalBoundCoverage);
  const means = _meansOf(distributions);
  const x = new Float64Array(n);
  const bestCorner = [new Float64Array(n), new Float64Array(n)]; // [max, min]
  const extremes = [Number.NEGATIVE_INFINITY, Number.POSITIVE_INFINITY];
  const points = [Float64Array.from(means), Float64Array.from(means)]; // [argmax, argmin]
  let strategy: string;
  const oat = oneAtATime(evaluator, lower, upper, means, enclosure, names);
  if (fastPath && enclosure !== undefined) {
    bestCorner[0]?.set(oat.best[0] as Float64Array);
    bestCorner[1]?.set(oat.best[1] as Float64Array);
  }
  const met = fastPath && enclosure !== undefined ? _enclosureMetAtCorners(enclosure, names, evaluator, lower, upper, bestCorner) : undefined;
  if (met !== undefined) {
    extremes[0] = met[0];
    extremes[1] = met[1];
    points[0]?.set(bestCorner[0] as Float64Array);
    points[1]?.set(bestCorner[1] as Float64Array);
    strategy =
      `the point of one-at-a-time extremes for each side (each input alone at its most raising or lowering value, ` +
      `inputs with an interior extreme refined by a coordinate-wise search); the enclosure of the whole box met both ` +
      `attained values within the tolerance (1e-12 of its width plus the value), so the ${n <= maxCornerInputs ? `scan of all 2^${n} corners and the ` : ""}` +
      `coordinate-wise search were skipped (they run when the two do not meet)`;
  } else if (n <= maxCornerInputs) {
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
    perInputCorners(evaluator, x, lower, upper, means, bestCorner);
    strategy = `${n} inputs are too many for all 2^${n} corners, so the corner of per-input (one-at-a-time) extremes was used, then`;
  }
  const searchNote =
    met !== undefined
      ? strategy
      : `${strategy} a coordinate-wise search (17-point grid and golden-section refinement per input, up to ${maxSweeps} sweeps) from the best corner and from the estimates, so interior extremes of non-monotone models are found`;
  for (let s = 0; met === undefined && s < 2; s++) {
    const sign = s === 0 ? 1 : -1;
    for (const start of [bestCorner[s] as Float64Array, means]) {
      x.set(start);
      const v = sign * coordinateSearch(evaluator, x, lower, upper, sign);
      if (s === 0 ? v > (extremes[0] as number) : v < (extremes[1] as number)) {
        extremes[s] = v;
        points[s]?.set(x);
      }
    }
  }
  // One-at-a-time swings for the contributions.
  const { swings, swingSquares } = oat;
  const lin = _linearise(prepared, evaluator, correlation);
  let low = extremes[1] as number;
  let high = extremes[0] as number;
  // The estimate is a point of the box too.
  if (lin.estimate < low) {
    low = lin.estimate;
    points[1]?.set(means);
  }
  if (lin.estimate > high) {
    high = lin.estimate;
    points[0]?.set(means);
  }
  const attained = {
    low: { value: low, at: pointRecord(prepared, points[1] as Float64Array) },
    high: { value: high, at: pointRecord(prepared, points[0] as Float64Array) },
  };
  let bracketNote = "; no enclosure was computed (the model is a black box: give modelEnclosure for a proven bracket)";
  let enclosureFields: { enclosure: readonly [number, number]; enclosureGap: readonly [number, number] } | undefined;
  if (enclosure !== undefined) {
    // the fast path's enclosure met the attained values: it is the branch and bound's root, with nothing to split
    const bound =
      met !== undefined && low === met[1] && high === met[0]
        ? { low: met[2], high: met[3], calls: 1, complete: true }
        : _branchAndBound(enclosure, names, lower, upper, evaluator, attained, points);
    low = attained.low.value;
    high = attained.high.value;
    attained.low.at = pointRecord(prepared, points[1] as Float64Array);
    attained.high.at = pointRecord(prepared, points[0] as Float64Array);
    enclosureFields = { enclosure: [bound.low, bound.high], enclosureGap: [low - bound.low, bound.high - high] };
    bracketNote =
      `; enclosure [${bound.low}, ${bound.high}] by branch and bound over the input box with the given interval extension ` +
      `(${bound.calls} enclosure calls${bound.complete ? ", gap closed" : ", budget reached"}), gap ${low - bound.low} below and ${bound.high - high} above the attained extremes`;
  }
  return {
    method: "worst-case",
    estimate: lin.estimate,
    standardUncertainty: lin.standardUncertainty,
    interval: [low, high],
    attained,
    ...enclosureFields,
    coverage: 1,
    contributions: _contributionsRecord(prepared, (i) => ({
      sensitivity: lin.sensitivities[i] as number,
      contribution: swings[i] as number,
      varianceShare: swingSquares > 0 ? (swings[i] as number) ** 2 / swingSquares : 0,
    })),
    note:
      `Worst case over the box of input bounds: ${searchNote}` +
      (normalK !== undefined ? `; normal inputs bounded at ±${normalK.toPrecision(4)}·u (${normalBoundCoverage as number} coverage)` : "") +
      (correlation !== undefined ? "; correlations are not used (the box bounds any dependence)" : "") +
      bracketNote +
      `; contributions are one-at-a-time output swings, varianceShare their squared shares; standardUncertainty is the GUM (RSS) value.`,
  };
}

/** @internal The bracket of a worst case from start points (`_worstCaseFrom`): interval, attained points, enclosure. */
export interface _WorstCaseBracket {
  readonly interval: readonly [number, number];
  readonly attained: { readonly low: { readonly value: number; readonly at: Record<string, number> }; readonly high: { readonly value: number; readonly at: Record<string, number> } };
  readonly enclosure: readonly [number, number];
  readonly enclosureGap: readonly [number, number];
}

/**
 * @internal The worst-case bracket of a model over a box, started from points of an earlier box of the same inputs
 * (`from`: the earlier inputs' box and its attained points, canonical order): each start is moved to the same
 * relative place in the new box, the inputs that lie inside their range there are refined by the coordinate-wise
 * search, and one enclosure call over the new box must meet both attained values within the branch and bound's
 * tolerance (as `_enclosureMetAtCorners`). Undefined when it does not (the caller runs the full worst case). No
 * contributions: for the fixed-point iterations of a self-consistent edge, whose contributions are the first box's.
 */
export function _worstCaseFrom(
  prepared: _PreparedInputs,
  evaluator: _ModelEvaluator,
  normalBoundCoverage: number | undefined,
  enclosure: _Enclosure,
  from: { readonly lower: Float64Array; readonly upper: Float64Array; readonly high: Float64Array; readonly low: Float64Array },
): _WorstCaseBracket | undefined {
  const { names } = prepared;
  const n = names.length;
  const { lower, upper } = _inputBox(prepared, normalBoundCoverage);
  const starts = [from.high, from.low].map((point) => {
    const x = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const span = (from.upper[i] as number) - (from.lower[i] as number);
      const fraction = span > 0 ? ((point[i] as number) - (from.lower[i] as number)) / span : 0.5;
      x[i] = fraction === 0 ? (lower[i] as number) : fraction === 1 ? (upper[i] as number) : (lower[i] as number) + fraction * ((upper[i] as number) - (lower[i] as number));
    }
    return x;
  });
  const met = _enclosureMetAtCorners(enclosure, names, evaluator, lower, upper, starts);
  if (met === undefined) return undefined;
  return {
    interval: [met[1], met[0]],
    attained: { low: { value: met[1], at: pointRecord(prepared, starts[1] as Float64Array) }, high: { value: met[0], at: pointRecord(prepared, starts[0] as Float64Array) } },
    enclosure: [met[2], met[3]],
    enclosureGap: [met[1] - met[2], met[3] - met[0]],
  };
}
