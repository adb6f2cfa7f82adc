/**
 * The exact inverse of the ITS-90 reference functions.
 *
 * How it works: each forward sub-range (restricted to where E is strictly increasing) is cut into segments
 * of equal EMF width. A segment is built when an EMF first falls in it (one at a time: the first conversion
 * of a type costs one segment, not the type's whole table; each segment is fitted on its own, so the bits do
 * not depend on the order segments are built in). On each segment the inverse t(E) is interpolated at 8
 * Chebyshev nodes (degree 7), the node temperatures being roots of the forward polynomial found by
 * safeguarded Newton on the forward polynomial. The interpolant's monomial coefficients come from the
 * Björck–Pereyra algorithm; it is then checked at the 9 Chebyshev extrema of the segment, ends included,
 * against the same accurate roots. A segment that misses the tolerance (only where the Seebeck coefficient
 * nearly vanishes, at the cold end of K, N, E, T and the bottom of B's unambiguous range) is marked, and EMFs
 * falling in it are solved by safeguarded Newton on the forward function directly. A call is then one
 * segment index, one 8-term Horner evaluation and a clamp to the segment.
 *
 * Where two sub-ranges meet, the forward function steps by up to 7.5e-8 mV (type J at 760 °C). The
 * inverse selects the sub-range by comparing the EMF with E of the upper sub-range at the seam (the
 * forward convention gives a shared end point to the upper sub-range), and clamps the result to the
 * selected sub-range, so the inverse is monotone and continuous to within step/S(t) at every seam. Every
 * result is clamped to its segment's edge temperatures, so the interpolants of neighbouring segments (which
 * meet only to within the fit tolerance) never step backwards: non-decreasing across every edge.
 * @internal
 * @module
 */
import { _emfInSubrange, _horner, _solveInSubrange, type CompiledType, type ExactInverse, type InversePiece } from "./compiled.js";

export type { ExactInverse, InversePiece } from "./compiled.js";

/**
 * Builds segment k of a piece: its edge temperatures (if not yet solved), the interpolant through the roots
 * at the 8 Chebyshev nodes and the check at the 9 extrema; returns its state (1 Newton, 2 interpolant).
 */
function buildSegment(ct: CompiledType, p: InversePiece, k: number): number {
  const range = p.range;
  const width = p.width;
  const edges = p.edgesC;
  for (let j = k; j <= k + 1; j++) {
    if (edges[j] !== edges[j]) edges[j] = _solveInSubrange(ct, range, p.emfStart + j * width, edges[0] as number, edges[p.count] as number);
  }
  const segLo = edges[k] as number;
  const segHi = edges[k + 1] as number;
  const mid = p.emfStart + (k + 0.5) * width;
  // cos(πj/16): odd j are the 8 Chebyshev nodes cos(π(i + ½)/8), even j the 9 extrema cos(πi/8) (the same
  // floats: scaling by 2 is exact), r[j] the root at each.
  const s = new Float64Array(17);
  const r = new Float64Array(17);
  for (let j = 0; j < 17; j++) {
    s[j] = Math.cos((Math.PI * j) / 16);
    r[j] = _solveInSubrange(ct, range, mid + 0.5 * width * (s[j] as number), segLo, segHi);
  }
  // The 8 coefficients are worked out in `a`, then stored at the segment's place in the piece's table.
  const a = new Float64Array(8);
  for (let i = 0; i < 8; i++) a[i] = r[2 * i + 1] as number;
  // Monomial coefficients of the interpolant by the Björck–Pereyra algorithm (Golub & Van Loan, Matrix
  // Computations, Algorithm 4.6.1): Newton divided differences, then expansion into powers of s.
  for (let m = 0; m < 7; m++) {
    for (let i = 7; i > m; i--) a[i] = ((a[i] as number) - (a[i - 1] as number)) / ((s[2 * i + 1] as number) - (s[2 * (i - m) - 1] as number));
  }
  for (let m = 6; m >= 0; m--) {
    for (let i = m; i < 7; i++) a[i] = (a[i] as number) - (a[i + 1] as number) * (s[2 * m + 1] as number);
  }
  p.coefficients.set(a, k * 8);
  // Check at the extrema (ends included) against the roots there, within 2e-11 °C or 2e-12 mV over the
  // segment's mean slope width / (segHi − segLo); a segment that misses (S nearly vanishing) is solved by
  // Newton at run time instead.
  const allowed = Math.max(2e-11, (2e-12 * (segHi - segLo)) / width);
  let state = 2;
  for (let j = 0; j < 17; j += 2) {
    if (!(Math.abs(_horner(a, s[j] as number) - (r[j] as number)) <= allowed)) state = 1;
  }
  return (p.state[k] = state);
}

function build(ct: CompiledType): ExactInverse {
  // A sub-range wholly below where E becomes unique (none of today's types) has no piece.
  const pieces = ct.subranges.flatMap((sub, range): InversePiece[] => {
    const lowC = Math.max(sub.minC, ct.monotonicFromC);
    const highC = sub.maxC;
    // Segments about 4 °C wide: the interpolant then meets the tolerance everywhere but in the few segments
    // at a cold end where S(t) nearly vanishes, which fall back to Newton.
    const count = Math.max(4, Math.ceil((highC - lowC) / 4));
    const emfStart = _emfInSubrange(ct, range, lowC);
    const width = (_emfInSubrange(ct, range, highC) - emfStart) / count;
    const edgesC = new Float64Array(count + 1).fill(NaN);
    edgesC[0] = lowC;
    edgesC[count] = highC;
    return highC > lowC
      ? [{ range, emfStart, width, perMillivolt: 1 / width, count, coefficients: new Float64Array(count * 8), state: new Uint8Array(count), edgesC }]
      : [];
  });
  return { pieces };
}

/** Returns the exact-inverse tables of a type (segments are built as EMFs reach them). @internal */
export function _exactInverseTables(ct: CompiledType): ExactInverse {
  // Kept on the compiled type itself: one property read per call, no map lookup.
  return (ct.inverse ??= build(ct));
}

/**
 * Builds every segment not built yet, in order (what the tables used to do on first use; for tests and
 * for code that scans the segments). @internal
 */
export function _completeExactInverse(ct: CompiledType, inv: ExactInverse = _exactInverseTables(ct)): ExactInverse {
  for (const p of inv.pieces) for (let k = 0; k < p.count; k++) if (p.state[k] === 0) buildSegment(ct, p, k);
  return inv;
}

/** Fresh tables of a type, not cached, every segment built in order (tests compare them with the lazy ones). @internal */
export function _eagerExactInverse(ct: CompiledType): ExactInverse {
  return _completeExactInverse(ct, build(ct));
}

/**
 * t(E) in °C for an EMF already checked to lie in the unambiguous range. @internal
 */
export function _exactInverse(ct: CompiledType, inv: ExactInverse, emfMillivolts: number): number {
  const pieces = inv.pieces;
  // The pieces in order up to the first that starts above the EMF; the first piece if it does.
  let piece = pieces[0] as InversePiece;
  for (const next of pieces) {
    if (emfMillivolts < next.emfStart) break;
    piece = next;
  }
  const x = (emfMillivolts - piece.emfStart) * piece.perMillivolt;
  const k = Math.min(Math.max(Math.floor(x), 0), piece.count - 1);
  // 0: not built yet (states 1 and 2 are truthy).
  const state = piece.state[k] || buildSegment(ct, piece, k);
  const lo = piece.edgesC[k] as number;
  const hi = piece.edgesC[k + 1] as number;
  const t = state === 1 ? _solveInSubrange(ct, piece.range, emfMillivolts, lo, hi) : _horner(piece.coefficients, 2 * (x - k) - 1, k * 8, k * 8 + 7);
  // Clamped to the segment's edge temperatures (increasing roots of the forward polynomial), so that the
  // inverse never steps backwards across a segment edge, where two interpolants meet; within the piece's
  // sub-range by the same token.
  return t < lo ? lo : t > hi ? hi : t;
}
