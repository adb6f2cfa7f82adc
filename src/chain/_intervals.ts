/**
 * Interval tools of the trip enclosure (`_tripEnclosure.ts`): outward-rounded interval arithmetic and the ITS-90
 * reference function and its Seebeck coefficient over a temperature interval, as the library evaluates them in
 * float64.
 *
 * - Outward rounding: each operation widens the round-to-nearest result by two ulps (`_down`, `_up` of
 *   `its90/curvatureEnclosure.ts`), so it holds the exact result of the operation on any points of its
 *   operands and also the float64 result of the same operation on any float64 points of them (rounding to
 *   nearest is monotone). Applied in the order the model computes, the enclosure holds the model as computed.
 * - `_emfOver(ct, t)`: the float64 value Ê(t) = `_emf(ct, t)` for every t in the interval. A point interval
 *   gives Ê(t) itself. Otherwise, per sub-range piece (the piece that is only a seam, where Ê takes the upper
 *   sub-range, left out): when the interval enclosure of E′ over the piece is
 *   positive, [Ê(a) − 2δ, Ê(b) + 2δ] (E increasing; δ the a-priori Horner bound of |Ê − E| over the piece),
 *   else the mean-value form Ê(m) ± 2δ + E′([a, b])·([a, b] − m).
 * - `_seebeckOver(ct, t)`: an enclosure of the real E′(t) over the interval (interval Horner in mean-value
 *   form per sub-range piece).
 * @module
 * @internal
 */
import { _addInterval as addOutward, _down, _emfEvaluationBound, _encloseEmfDerivative, _mulInterval, _up, type _Interval } from "../its90/curvatureEnclosure.js";
import { _emf, _emfInSubrange, type CompiledType } from "../its90/compiled.js";

export type { _Interval };
export { _down, _mulInterval, _up };

/** Lower end of x + y: the float sum, rounded down only when the exact sum is below it (TwoSum error, Knuth). */
function sumDown(x: number, y: number): number {
  const s = x + y;
  const yy = s - x;
  const e = x - (s - yy) + (y - yy);
  return e < 0 || !Number.isFinite(e) ? _down(s) : s;
}

/** Upper end of x + y: the float sum, rounded up only when the exact sum is above it. */
function sumUp(x: number, y: number): number {
  const s = x + y;
  const yy = s - x;
  const e = x - (s - yy) + (y - yy);
  return e > 0 || !Number.isFinite(e) ? _up(s) : s;
}

/** @internal a + b, outward rounded (exact sums stay exact, so a point plus a point is a point). */
export function _addInterval(a: _Interval, b: _Interval): _Interval {
  return [sumDown(a[0], b[0]), sumUp(a[1], b[1])];
}

/** @internal a − b, outward rounded (exact differences stay exact). */
export function _subInterval(a: _Interval, b: _Interval): _Interval {
  return [sumDown(a[0], -b[1]), sumUp(a[1], -b[0])];
}

/** @internal a / b for b not containing 0, outward rounded. */
export function _divInterval(a: _Interval, b: _Interval): _Interval {
  if (!(b[0] > 0 || b[1] < 0)) return [Number.NEGATIVE_INFINITY, Number.POSITIVE_INFINITY];
  const q = [a[0] / b[0], a[0] / b[1], a[1] / b[0], a[1] / b[1]];
  return [_down(Math.min(...q)), _up(Math.max(...q))];
}

/** @internal The smallest interval holding both. */
export function _hull(a: _Interval, b: _Interval): _Interval {
  return [Math.min(a[0], b[0]), Math.max(a[1], b[1])];
}

/** @internal An interval widened by `by` (≥ 0) on both sides, outward rounded. */
export function _widen(a: _Interval, by: number): _Interval {
  return [_down(a[0] - by), _up(a[1] + by)];
}

/** @internal Largest magnitude in an interval. */
export function _mag(a: _Interval): number {
  return Math.max(Math.abs(a[0]), Math.abs(a[1]));
}

/**
 * Calls `f` for each sub-range piece [a′, b′] of t (the sub-range's own polynomial; shared ends in both). With
 * `asEvaluated`, a piece that is only the shared end of a sub-range with the next one is left out: Ê takes the
 * upper sub-range there (`_subrangeIndex`), so the lower polynomial's value at the seam is no value of Ê.
 */
function eachPiece(ct: CompiledType, t: _Interval, f: (index: number, piece: _Interval) => void, asEvaluated = false): void {
  const subs = ct.subranges;
  for (let i = 0; i < subs.length; i++) {
    const s = subs[i] as CompiledType["subranges"][number];
    const lo = Math.max(t[0], s.minC);
    const hi = Math.min(t[1], s.maxC);
    if (asEvaluated && lo === hi && lo === s.maxC && subs[i + 1]?.minC === s.maxC) continue;
    if (lo <= hi) f(i, [lo, hi]);
  }
}

/** @internal Every float64 value Ê(t) of the library's reference function for t in the interval, mV. */
export function _emfOver(ct: CompiledType, t: _Interval): _Interval {
  if (t[0] === t[1]) {
    const v = _emf(ct, t[0]);
    return [v, v];
  }
  let out: _Interval | undefined;
  eachPiece(ct, t, (i, piece) => {
    const d = 2 * _emfEvaluationBound(ct, i, piece);
    const slope = _encloseEmfDerivative(ct, i, 1, piece);
    let r: _Interval;
    if (slope[0] > 0) {
      r = [_down(_emfInSubrange(ct, i, piece[0]) - d), _up(_emfInSubrange(ct, i, piece[1]) + d)];
    } else {
      const m = 0.5 * (piece[0] + piece[1]);
      const em = _emfInSubrange(ct, i, m);
      r = addOutward([_down(em - d), _up(em + d)], _mulInterval(slope, [_down(piece[0] - m), _up(piece[1] - m)]));
    }
    out = out === undefined ? r : _hull(out, r);
  }, true);
  return out ?? [Number.NEGATIVE_INFINITY, Number.POSITIVE_INFINITY];
}

/** @internal An enclosure of the real Seebeck coefficient E′(t) (mV/°C), or of E″(t) (k = 2, mV/°C²), for t in the interval. */
export function _seebeckOver(ct: CompiledType, t: _Interval, k: 1 | 2 = 1): _Interval {
  // A slope of the trip argument asks for E′ over the same t_cj interval once per term (the cold junction, a
  // connector, a cable): the last few results are kept (a pure function of its arguments).
  for (let j = 0; j < recent.length; j++) {
    const r = recent[j] as Recent;
    if (r.ct === ct && r.lo === t[0] && r.hi === t[1] && r.k === k) return r.value;
  }
  const value = seebeckOverUncached(ct, t, k);
  recent[next] = { ct, lo: t[0], hi: t[1], k, value };
  next = (next + 1) % 4;
  return value;
}

interface Recent {
  readonly ct: CompiledType;
  readonly lo: number;
  readonly hi: number;
  readonly k: 1 | 2;
  readonly value: _Interval;
}
const recent: Recent[] = [];
let next = 0;

function seebeckOverUncached(ct: CompiledType, t: _Interval, k: 1 | 2): _Interval {
  let out: _Interval | undefined;
  eachPiece(ct, t, (i, piece) => {
    const r = _encloseEmfDerivative(ct, i, k, piece);
    out = out === undefined ? r : _hull(out, r);
  });
  return out ?? [Number.NEGATIVE_INFINITY, Number.POSITIVE_INFINITY];
}

/**
 * @internal An enclosure of the real E″(t) (mV/°C²) over the interval, or undefined when a seam lies strictly
 * inside it (there the function is two polynomials and its second derivative is not a function).
 */
export function _curvatureOver(ct: CompiledType, t: _Interval): _Interval | undefined {
  const subs = ct.subranges;
  for (let i = 1; i < subs.length; i++) {
    const seam = (subs[i] as CompiledType["subranges"][number]).minC;
    if (seam > t[0] && seam < t[1]) return undefined;
  }
  return _seebeckOver(ct, t, 2);
}
