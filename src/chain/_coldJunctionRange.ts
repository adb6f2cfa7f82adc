/**
 * The two steps the chain models' interval enclosures share (`_tripEnclosure.ts` for the comparator trip,
 * `_readingEnclosure.ts` for the reading through an ADC or a comparator's input):
 *
 * - `_cornerRange`: the range of an element's transfer that is monotone in each of its own sources, in a direction
 *   that does not depend on the others (proved per element in `_tripEnclosure.ts`, note 1): its values at the two
 *   corners, widened by (16 + 4k) unit roundoffs of their magnitude for the rounding of a k-source formula (a
 *   rounding count, stated, not machine-checked).
 * - `_overColdJunction`: a model argument over a cold-junction interval, cut at the ITS-90 seams (and a few ulps
 *   around seam − r for each Ê(t_cj + r) term with a fixed r), then per piece: where the enclosure of the
 *   argument's t_cj-derivative has one sign, the union of the two end values; where its second derivative has
 *   one sign, the turn located on point slopes and the sides proven monotone (`oneTurn`); else halved, down to
 *   2⁻²⁰ of the range (40 halvings, 4096 pieces), where the mean-value form is used (`_tripEnclosure.ts`, note 3).
 * @module
 * @internal
 */
import { _emfInSubrange, type CompiledType } from "../its90/compiled.js";
import { _emfEvaluationBound } from "../its90/curvatureEnclosure.js";
import { _EMF_END_TOLERANCE_MV, _temperatureFromEmf } from "../its90/engine.js";
import { _addInterval, _down, _hull, _mulInterval, _up, _widen, type _Interval } from "./_intervals.js";

type Box = Readonly<Record<string, readonly [number, number]>>;
type Values = Record<string, number>;
/** @internal A transfer of source values. */
export type _Transfer = (x: Readonly<Record<string, number>>) => number;

/** @internal 2⁻⁵³, the unit roundoff. */
export const _unitRoundoff = 1.1102230246251565e-16;
const minPieceFraction = 9.5367431640625e-7; // 2^-20
const maxHalvings = 40;
const maxPieces = 4096;

/** @internal A type's seams and the largest step between neighbouring sub-range polynomials there (with Ê's bounds). */
export function _seamsOf(ct: CompiledType): { readonly seams: readonly number[]; readonly seamStep: number } {
  let seamStep = 0;
  for (let i = 1; i < ct.subranges.length; i++) {
    const s = (ct.subranges[i] as (typeof ct.subranges)[number]).minC;
    const d = _emfEvaluationBound(ct, i - 1, [s, s]) + _emfEvaluationBound(ct, i, [s, s]);
    seamStep = Math.max(seamStep, Math.abs(_emfInSubrange(ct, i - 1, s) - _emfInSubrange(ct, i, s)) + d);
  }
  return { seams: ct.subranges.slice(1).map((s) => s.minC), seamStep };
}

/**
 * @internal How far the piecewise reference function can step back across the seams inside t, mV: E(t′) ≥
 * E(t″) − this for t′ ≥ t″ in t where E′ > 0 on each piece (E: each sub-range's polynomial in real arithmetic;
 * the standard's pieces need not meet at a seam). Σ over seams s in (t₀, t₁] of the lower polynomial's excess
 * over the upper one at s, from the float values with both evaluation bounds, when positive. A source taken at
 * an end of its range through E relies on it.
 */
export function _backwardSeamStep(ct: CompiledType, t: _Interval): number {
  let back = 0;
  for (let j = 1; j < ct.subranges.length; j++) {
    const s = (ct.subranges[j] as (typeof ct.subranges)[number]).minC;
    if (!(s > t[0] && s <= t[1])) continue;
    const step = _emfInSubrange(ct, j - 1, s) - _emfInSubrange(ct, j, s) + _emfEvaluationBound(ct, j - 1, [s, s]) + _emfEvaluationBound(ct, j, [s, s]);
    back += Math.max(0, step);
  }
  return back;
}

/** @internal The largest a-priori bound of |Ê − E| over the temperature intervals, mV. */
export function _emfBoundOver(ct: CompiledType, temps: readonly _Interval[]): number {
  let bound = 0;
  ct.subranges.forEach((sub, i) => {
    for (const t of temps) {
      const lo = Math.max(t[0], sub.minC);
      const hi = Math.min(t[1], sub.maxC);
      if (lo <= hi) bound = Math.max(bound, _emfEvaluationBound(ct, i, [lo, hi]));
    }
  });
  return bound;
}

/**
 * @internal E⁻¹ at an end of an enclosed argument: any argument the model can evaluate lies in the type's EMF
 * range widened by the end tolerance the inverse accepts, and the exact inverse is non-decreasing, so the clamped
 * end bounds every value the model returns.
 */
export function _enclosedInverse(ct: CompiledType, emf: number): number {
  // The model accepts EMFs up to its end tolerance beyond the range (mapped to the end temperature): so does the clamp.
  const lowest = ct.ambiguity === undefined ? ct.emfAtMinC - _EMF_END_TOLERANCE_MV : Math.max(ct.lowestEmf, ct.emfAtMinC);
  try {
    return _temperatureFromEmf(ct, Math.min(ct.emfAtMaxC + _EMF_END_TOLERANCE_MV, Math.max(lowest, emf)));
  } catch {
    return emf < 0.5 * (lowest + ct.emfAtMaxC) ? ct.minC : ct.maxC;
  }
}

/** The largest float below x (x finite). */
function previousFloat(x: number): number {
  if (x === 0) return -Number.MIN_VALUE;
  const buf = new DataView(new ArrayBuffer(8));
  buf.setFloat64(0, x);
  const bits = buf.getBigUint64(0);
  buf.setBigUint64(0, x > 0 ? bits - 1n : bits + 1n);
  return buf.getFloat64(0);
}

/**
 * @internal Range of a transfer monotone in each of `names` (direction independent of the others) over the box
 * (module note). `x` holds the box's centre on entry and on return.
 */
export function _cornerRange(f: _Transfer, x: Values, box: Box, names: readonly string[]): _Interval {
  if (names.length === 0) {
    const v = f(x); // no source of the box: one float value
    return [v, v];
  }
  const up: boolean[] = [];
  for (const name of names) {
    const [lo, hi] = box[name] as readonly [number, number];
    const mid = x[name] as number;
    x[name] = lo;
    const fl = f(x);
    x[name] = hi;
    const fh = f(x);
    x[name] = mid;
    up.push(fh >= fl);
  }
  const fMid = f(x);
  const corner = (high: boolean): number => {
    names.forEach((name, i) => {
      const b = box[name] as readonly [number, number];
      x[name] = up[i] === high ? b[1] : b[0];
    });
    const v = f(x);
    for (const name of names) {
      const b = box[name] as readonly [number, number];
      x[name] = 0.5 * (b[0] + b[1]);
    }
    return v;
  };
  const vHigh = corner(true);
  const vLow = corner(false);
  const allowance = (16 + 4 * names.length) * _unitRoundoff * (Math.abs(vHigh) + Math.abs(vLow) + Math.abs(fMid));
  return [_down(Math.min(vLow, vHigh, fMid) - allowance), _up(Math.max(vLow, vHigh, fMid) + allowance)];
}

/** @internal A model argument over cold-junction intervals, with its allowance and counters. */
export interface _ColdJunctionArgument {
  /** The argument over a t_cj interval (plain interval evaluation; a point interval for a point). */
  readonly argument: (tc: _Interval) => _Interval;
  /** An enclosure of the argument's derivative in t_cj over an interval (real derivatives). */
  readonly slope: (tc: _Interval) => _Interval;
  /** The float-evaluation allowance, read after each evaluation (it may grow with `state`). */
  readonly allowance: () => number;
  readonly state: { emfEvaluations: number; seamAllowance: number; pieces: number };
  /**
   * An enclosure of the argument's second derivative in t_cj over an interval (real derivatives), or undefined
   * when a term has none there (an E(t) whose interval crosses a seam inside: `_curvatureOver`).
   */
  readonly curvature?: (tc: _Interval) => _Interval | undefined;
}

/**
 * @internal The argument over t_cj ∈ `tcRange` (module note). `offsets` are the r of each Ê(t_cj + r) term: a fixed
 * r cuts the range a few ulps around seam − r (enclosed there by plain interval evaluation, no derivative across
 * the step); an interval r lets the step fall anywhere, and `seamWeight` × twice the largest seam step is allowed.
 */
export function _overColdJunction(
  tcRange: _Interval,
  seams: readonly number[],
  seamStep: number,
  offsets: readonly _Interval[],
  seamWeight: number,
  a: _ColdJunctionArgument,
): _Interval {
  const { argument, slope, allowance, state, curvature } = a;
  // Neighbouring pieces share their ends: each point's argument is evaluated once (the same value, and the
  // allowance read at each use as before, since a repeated evaluation cannot raise it).
  const seen = new Map<number, _Interval>();
  const atPoint = (t: number): _Interval => {
    let v = seen.get(t);
    if (v === undefined) {
      v = argument([t, t]);
      seen.set(t, v);
    }
    return _widen(v, allowance());
  };
  const monotone = (p: _Interval, rising: boolean): _Interval =>
    rising ? _widen([atPoint(p[0])[0], atPoint(p[1])[1]], allowance()) : _widen([atPoint(p[1])[0], atPoint(p[0])[1]], allowance());
  /** The mean-value form A(m) + A′(p)·(p − m) of a piece (`d` its slope enclosure). */
  const meanValue = (p: _Interval, d: _Interval): _Interval => {
    const m = 0.5 * (p[0] + p[1]);
    state.emfEvaluations += 1;
    return _widen(_addInterval(atPoint(m), _mulInterval(d, [_down(p[0] - m), _up(p[1] - m)])), allowance());
  };
  const smallest = (tcRange[1] - tcRange[0]) * minPieceFraction;
  const overPiece = (p: _Interval, depth: number): _Interval => {
    if (p[0] === p[1]) return atPoint(p[0]);
    state.pieces++;
    const d = slope(p);
    if (d[0] >= 0) return monotone(p, true);
    if (d[1] <= 0) return monotone(p, false);
    if (depth >= maxHalvings || state.pieces > maxPieces || p[1] - p[0] <= smallest) return meanValue(p, d);
    if (curvature !== undefined) {
      const c = curvature(p);
      if (c !== undefined && (c[0] > 0 || c[1] < 0)) return oneTurn(p, c[0] > 0, depth);
    }
    const m = 0.5 * (p[0] + p[1]);
    return _hull(overPiece([p[0], m], depth + 1), overPiece([m, p[1]], depth + 1));
  };
  /** A′ at a point, oriented so that it rises over the piece: +1 proven positive, −1 proven negative, 0 not proven. */
  const signAt = (t: number, rising: boolean): number => {
    const s = slope([t, t]);
    const sign = s[0] > 0 ? 1 : s[1] < 0 ? -1 : 0;
    return rising ? sign : -sign;
  };
  /**
   * A piece where A″ has one sign: A′ is monotone there, so its sign is read at points and A turns at most
   * once. Its turn r is located on point slopes (Illinois regula falsi; its accuracy only decides how much is
   * proven below); the two sides of [r − δ, r + δ] are monotone where A′'s sign at their inner end proves it
   * (else they are subdivided as any piece) and [r − δ, r + δ] takes the mean-value form (δ the smallest piece).
   */
  const oneTurn = (p: _Interval, rising: boolean, depth: number): _Interval => {
    // g = ±A′, increasing over p
    if (signAt(p[0], rising) > 0) return monotone(p, rising);
    if (signAt(p[1], rising) < 0) return monotone(p, !rising);
    const g = (t: number): number => {
      const s = slope([t, t]);
      return (rising ? 1 : -1) * 0.5 * (s[0] + s[1]);
    };
    let lo = p[0];
    let hi = p[1];
    let gLo = g(lo);
    let gHi = g(hi);
    let side = 0;
    for (let i = 0; i < 64 && hi - lo > 0.25 * smallest && gLo < 0 && gHi > 0; i++) {
      let t = (lo * gHi - hi * gLo) / (gHi - gLo);
      if (!(t > lo && t < hi)) t = 0.5 * (lo + hi);
      const gt = g(t);
      if (gt === 0) {
        lo = hi = t;
        break;
      }
      if (gt < 0) {
        lo = t;
        gLo = gt;
        if (side === -1) gHi *= 0.5;
        side = -1;
      } else {
        hi = t;
        gHi = gt;
        if (side === 1) gLo *= 0.5;
        side = 1;
      }
    }
    const r = gLo >= 0 ? lo : gHi <= 0 ? hi : 0.5 * (lo + hi);
    const a = Math.max(p[0], r - smallest);
    const b = Math.min(p[1], r + smallest);
    let out = b > a ? meanValue([a, b], slope([a, b])) : atPoint(a);
    if (a > p[0]) out = _hull(out, signAt(a, rising) < 0 ? monotone([p[0], a], !rising) : overPiece([p[0], a], depth + 1));
    if (b < p[1]) out = _hull(out, signAt(b, rising) > 0 ? monotone([b, p[1]], rising) : overPiece([b, p[1]], depth + 1));
    return out;
  };
  state.seamAllowance = 0;
  const nearCuts: number[] = [];
  for (const r of offsets) {
    const shifted = _addInterval(tcRange, r);
    for (const seam of seams) {
      if (!(seam > shifted[0] && seam <= shifted[1])) continue;
      if (r[0] === r[1]) nearCuts.push(seam - r[0]);
      else state.seamAllowance += 2 * seamStep * seamWeight;
    }
  }
  type Cut = { at: number; near: boolean };
  const cuts: Cut[] = [...seams.map((at) => ({ at, near: false })), ...nearCuts.map((at) => ({ at, near: true }))].sort((x, y) => x.at - y.at);
  let result: _Interval | undefined;
  const add = (piece: _Interval): void => {
    result = result === undefined ? piece : _hull(result, piece);
  };
  let start = tcRange[0];
  for (const cut of cuts) {
    if (!cut.near) {
      if (cut.at > start && cut.at <= tcRange[1]) {
        add(overPiece([start, previousFloat(cut.at)], 0));
        start = cut.at;
      }
      continue;
    }
    const width = 8 * 2 * _unitRoundoff * (Math.abs(cut.at) + Math.abs(tcRange[0]) + Math.abs(tcRange[1]) + 1);
    const lo = Math.max(start, cut.at - width);
    const hi = Math.min(tcRange[1], cut.at + width);
    if (!(hi >= lo) || hi < start) continue;
    if (lo > start) add(overPiece([start, lo], 0));
    add(_widen(argument([lo, hi]), allowance()));
    start = hi;
  }
  if (start <= tcRange[1]) add(overPiece([start, tcRange[1]], 0));
  return result as _Interval;
}
