/**
 * The exact inverse of the ITS-90 reference functions.
 *
 * How it works: on first use for a type, each forward sub-range (restricted to where E is strictly
 * increasing) is cut into segments of equal EMF width. On each segment the inverse t(E) is interpolated
 * at 8 Chebyshev nodes (degree 7), the node temperatures being roots of the forward polynomial found by
 * safeguarded Newton on the forward polynomial.
 * The interpolant's monomial coefficients come from the Björck–Pereyra algorithm; it is then checked at the 9 Chebyshev extrema of the segment, ends included, against the
 * same accurate roots. A segment that misses the tolerance (only where the Seebeck coefficient nearly
 * vanishes, at the cold end of K, N, E, T and the bottom of B's unambiguous range) is marked, and EMFs
 * falling in it are solved by safeguarded Newton on the forward function directly. A call is then one
 * segment index, one 8-term Horner evaluation and a clamp to the sub-range.
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
import {
  _emfInSubrange,
  _horner,
  _solveInSubrange,
  type CompiledSubrange,
  type CompiledType,
  type ExactInverse,
  type InversePiece,
} from "./compiled.js";

export type { ExactInverse, InversePiece } from "./compiled.js";

const NODE_COUNT = 8;

/** Fit tolerance: 2e-11 °C, or 2e-12 mV / S(t) where S is small (both well inside the promised bound). */
const FIT_TOLERANCE_C = 2e-11;
const FIT_TOLERANCE_MV = 2e-12;

function buildPiece(ct: CompiledType, range: number, lowC: number, highC: number, count: number): InversePiece {
  const emfStart = _emfInSubrange(ct, range, lowC);
  const width = (_emfInSubrange(ct, range, highC) - emfStart) / count;
  const half = 0.5 * width;
  const edgesC = new Float64Array(count + 1);
  edgesC[0] = lowC;
  edgesC[count] = highC;
  for (let k = 1; k < count; k++) {
    edgesC[k] = _solveInSubrange(ct, range, emfStart + k * width, lowC, highC);
  }
  const nodes = new Float64Array(NODE_COUNT);
  for (let j = 0; j < NODE_COUNT; j++) nodes[j] = Math.cos((Math.PI * (j + 0.5)) / NODE_COUNT);
  const coefficients = new Float64Array(count * NODE_COUNT);
  const newton = new Uint8Array(count);
  const d = NODE_COUNT - 1;
  for (let k = 0; k < count; k++) {
    const segLo = edgesC[k] as number;
    const segHi = edgesC[k + 1] as number;
    const mid = emfStart + (k + 0.5) * width;
    const a = coefficients.subarray(k * NODE_COUNT, (k + 1) * NODE_COUNT);
    for (let j = 0; j <= d; j++) a[j] = _solveInSubrange(ct, range, mid + half * (nodes[j] as number), segLo, segHi);
    // Monomial coefficients of the interpolant by the Björck–Pereyra algorithm (Golub & Van Loan, Matrix
    // Computations, Algorithm 4.6.1): Newton divided differences, then expansion into powers of s.
    for (let m = 0; m < d; m++) {
      for (let i = d; i > m; i--) a[i] = ((a[i] as number) - (a[i - 1] as number)) / ((nodes[i] as number) - (nodes[i - m - 1] as number));
    }
    for (let m = d - 1; m >= 0; m--) {
      for (let i = m; i < d; i++) a[i] = (a[i] as number) - (a[i + 1] as number) * (nodes[m] as number);
    }
    // Check the interpolant at the Chebyshev extrema (ends included) against the roots there; a segment
    // that misses (S nearly vanishing) is solved by Newton at run time instead.
    // 2e-12 mV over the segment's mean slope width / (segHi − segLo).
    const allowed = Math.max(FIT_TOLERANCE_C, (FIT_TOLERANCE_MV * (segHi - segLo)) / width);
    for (let j = 0; j <= NODE_COUNT; j++) {
      const s = Math.cos((Math.PI * j) / NODE_COUNT);
      const root = _solveInSubrange(ct, range, mid + half * s, segLo, segHi);
      if (!(Math.abs(_horner(a, s) - root) <= allowed)) {
        newton[k] = 1;
        break;
      }
    }
  }
  return { range, emfStart, perMillivolt: 1 / width, count, lowC, highC, coefficients, newton, edgesC };
}

function build(ct: CompiledType): ExactInverse {
  const pieces: InversePiece[] = [];
  ct.subranges.forEach((sub: CompiledSubrange, index: number) => {
    const lowC = Math.max(sub.minC, ct.monotonicFromC);
    // Segments about 4 °C wide: the interpolant then meets the tolerance everywhere but in the few segments
    // at a cold end where S(t) nearly vanishes, which fall back to Newton.
    if (sub.maxC > lowC) pieces.push(buildPiece(ct, index, lowC, sub.maxC, Math.max(4, Math.ceil((sub.maxC - lowC) / 4))));
  });
  return { pieces };
}

/** Returns the exact-inverse tables of a type, building them on first use (a few milliseconds). @internal */
export function _exactInverseTables(ct: CompiledType): ExactInverse {
  // Kept on the compiled type itself: one property read per call, no map lookup.
  return (ct.inverse ??= build(ct));
}

/**
 * t(E) in °C for an EMF already checked to lie in the unambiguous range. @internal
 */
export function _exactInverse(ct: CompiledType, inv: ExactInverse, emfMillivolts: number): number {
  const pieces = inv.pieces;
  let piece = pieces[0] as InversePiece;
  for (let i = 1; i < pieces.length; i++) {
    const next = pieces[i] as InversePiece;
    if (emfMillivolts >= next.emfStart) piece = next;
    else break;
  }
  const x = (emfMillivolts - piece.emfStart) * piece.perMillivolt;
  let k = Math.floor(x);
  if (k >= piece.count) k = piece.count - 1;
  else if (k < 0) k = 0;
  let t: number;
  if (piece.newton[k] === 1) {
    t = _solveInSubrange(
      ct,
      piece.range,
      emfMillivolts,
      piece.edgesC[k] as number,
      piece.edgesC[k + 1] as number,
    );
  } else {
    const s = 2 * (x - k) - 1;
    const c = piece.coefficients;
    const o = k * NODE_COUNT;
    t =
      (c[o] as number) +
      s *
        ((c[o + 1] as number) +
          s *
            ((c[o + 2] as number) +
              s *
                ((c[o + 3] as number) +
                  s * ((c[o + 4] as number) + s * ((c[o + 5] as number) + s * ((c[o + 6] as number) + s * (c[o + 7] as number)))))));
  }
  // Clamped to the segment's edge temperatures (increasing roots of the forward polynomial), so that the
  // inverse never steps backwards across a segment edge, where two interpolants meet; within the piece's
  // sub-range by the same token.
  const lo = piece.edgesC[k] as number;
  const hi = piece.edgesC[k + 1] as number;
  return t < lo ? lo : t > hi ? hi : t;
}
