/**
 * The exact inverse of the ITS-90 reference functions.
 *
 * How it works: on first use for a type, each forward sub-range (restricted to where E is strictly
 * increasing) is cut into segments of equal EMF width. On each segment the inverse t(E) is interpolated
 * at 8 Chebyshev nodes (degree 7), the node temperatures being roots of the forward polynomial found by
 * safeguarded Newton with a compensated Horner evaluation (accurate to about one unit in the last place).
 * The interpolant is then checked at the 9 Chebyshev extrema of the segment, ends included, against the
 * same accurate roots. A segment that misses the tolerance (only where the Seebeck coefficient nearly
 * vanishes, at the cold end of K, N, E, T and the bottom of B's unambiguous range) is marked, and EMFs
 * falling in it are solved by safeguarded Newton on the forward function directly. A call is then one
 * segment index, one 8-term Horner evaluation and a clamp to the sub-range.
 *
 * Where two sub-ranges meet, the forward function steps by up to 7.5e-8 mV (type J at 760 °C). The
 * inverse selects the sub-range by comparing the EMF with E of the upper sub-range at the seam (the
 * forward convention gives a shared end point to the upper sub-range), and clamps the result to the
 * selected sub-range, so the inverse is monotone and continuous to within step/S(t) at every seam.
 * @internal
 * @module
 */
import {
  _emfAccurateInSubrange,
  _solveInSubrange,
  type CompiledSubrange,
  type CompiledType,
} from "./compiled.js";

const NODE_COUNT = 8;

/** @internal */
export interface InversePiece {
  readonly subrangeIndex: number;
  /** EMF at the piece's lower end (start of the segment grid), mV. */
  readonly emfStart: number;
  /** EMF from which this piece is selected, mV (E of this sub-range at its lower end). */
  readonly selectFromEmf: number;
  readonly segmentsPerMillivolt: number;
  readonly count: number;
  readonly lowC: number;
  readonly highC: number;
  /** count × 8 monomial coefficients in the local variable s ∈ [−1, 1]. */
  readonly coefficients: Float64Array;
  /** 1 where the segment is solved by Newton instead of the interpolant. */
  readonly solveFlags: Uint8Array;
  /** Temperatures of the count + 1 segment boundaries, °C. */
  readonly boundaryC: Float64Array;
}

/** @internal */
export interface ExactInverse {
  readonly pieces: readonly InversePiece[];
  /** Number of segments solved by Newton, over all pieces (diagnostics). */
  readonly newtonSegments: number;
  /** Total number of segments (diagnostics). */
  readonly totalSegments: number;
}

/** Fit tolerance: 2e-11 °C, or 2e-12 mV / S(t) where S is small (both well inside the promised bound). */
const FIT_TOLERANCE_C = 2e-11;
const FIT_TOLERANCE_MV = 2e-12;

const chebyshevNodes = (() => {
  const nodes = new Float64Array(NODE_COUNT);
  for (let j = 0; j < NODE_COUNT; j++) nodes[j] = Math.cos((Math.PI * (j + 0.5)) / NODE_COUNT);
  return nodes;
});

/** Monomial coefficients of T₀…T₇. */
function chebyshevMonomials(): Float64Array[] {
  const polys: Float64Array[] = [new Float64Array(NODE_COUNT), new Float64Array(NODE_COUNT)];
  (polys[0] as Float64Array)[0] = 1;
  (polys[1] as Float64Array)[1] = 1;
  for (let k = 2; k < NODE_COUNT; k++) {
    const p = new Float64Array(NODE_COUNT);
    const a = polys[k - 1] as Float64Array;
    const b = polys[k - 2] as Float64Array;
    for (let i = 0; i < NODE_COUNT; i++) {
      p[i] = (i > 0 ? 2 * (a[i - 1] as number) : 0) - (b[i] as number);
    }
    polys.push(p);
  }
  return polys;
}

function evaluateLocal(coefficients: Float64Array, offset: number, s: number): number {
  let t = coefficients[offset + 7] as number;
  for (let i = 6; i >= 0; i--) t = t * s + (coefficients[offset + i] as number);
  return t;
}

function buildPiece(
  ct: CompiledType,
  subrangeIndex: number,
  lowC: number,
  highC: number,
  count: number,
  nodes: Float64Array,
  monomials: Float64Array[],
): InversePiece {
  const emfStart = _emfAccurateInSubrange(ct, subrangeIndex, lowC);
  const emfEnd = _emfAccurateInSubrange(ct, subrangeIndex, highC);
  const width = (emfEnd - emfStart) / count;
  const boundaryC = new Float64Array(count + 1);
  boundaryC[0] = lowC;
  boundaryC[count] = highC;
  for (let k = 1; k < count; k++) {
    boundaryC[k] = _solveInSubrange(ct, subrangeIndex, emfStart + k * width, lowC, highC, true);
  }
  const coefficients = new Float64Array(count * NODE_COUNT);
  const solveFlags = new Uint8Array(count);
  const values = new Float64Array(NODE_COUNT);
  for (let k = 0; k < count; k++) {
    const segLo = boundaryC[k] as number;
    const segHi = boundaryC[k + 1] as number;
    const mid = emfStart + (k + 0.5) * width;
    const half = 0.5 * width;
    for (let j = 0; j < NODE_COUNT; j++) {
      values[j] = _solveInSubrange(ct, subrangeIndex, mid + half * (nodes[j] as number), segLo, segHi, true);
    }
    const offset = k * NODE_COUNT;
    for (let m = 0; m < NODE_COUNT; m++) {
      let a = 0;
      for (let j = 0; j < NODE_COUNT; j++) a += (values[j] as number) * Math.cos((Math.PI * m * (j + 0.5)) / NODE_COUNT);
      a *= (m === 0 ? 1 : 2) / NODE_COUNT;
      const mono = monomials[m] as Float64Array;
      for (let i = 0; i < NODE_COUNT; i++) coefficients[offset + i] = (coefficients[offset + i] as number) + a * (mono[i] as number);
    }
    // Check the interpolant at the Chebyshev extrema (ends included) against accurate roots.
    for (let j = 0; j <= NODE_COUNT; j++) {
      const s = Math.cos((Math.PI * j) / NODE_COUNT);
      const emf = mid + half * s;
      const root = _solveInSubrange(ct, subrangeIndex, emf, segLo, segHi, true);
      const fit = evaluateLocal(coefficients, offset, s);
      const slopeMvPerC = (segHi - segLo) > 0 ? width / (segHi - segLo) : 0;
      const allowed = Math.max(FIT_TOLERANCE_C, slopeMvPerC > 0 ? FIT_TOLERANCE_MV / slopeMvPerC : 0);
      if (!(Math.abs(fit - root) <= allowed) || slopeMvPerC <= 0) {
        solveFlags[k] = 1;
        break;
      }
    }
  }
  return {
    subrangeIndex,
    emfStart,
    selectFromEmf: emfStart,
    segmentsPerMillivolt: 1 / width,
    count,
    lowC,
    highC,
    coefficients,
    solveFlags,
    boundaryC,
  };
}

function countFlags(piece: InversePiece): number {
  let n = 0;
  for (let k = 0; k < piece.count; k++) n += piece.solveFlags[k] as number;
  return n;
}

function build(ct: CompiledType): ExactInverse {
  const nodes = chebyshevNodes();
  const monomials = chebyshevMonomials();
  const pieces: InversePiece[] = [];
  ct.subranges.forEach((sub: CompiledSubrange, index: number) => {
    const lowC = Math.max(sub.minC, ct.monotonicFromC);
    const highC = sub.maxC;
    if (highC <= lowC) return;
    // Start with segments about 8 °C wide; refine while refinement removes Newton segments.
    let count = Math.max(4, Math.ceil((highC - lowC) / 8));
    let piece = buildPiece(ct, index, lowC, highC, count, nodes, monomials);
    for (let round = 0; round < 3; round++) {
      const flagged = countFlags(piece);
      if (flagged <= 2) break;
      count *= 2;
      const finer = buildPiece(ct, index, lowC, highC, count, nodes, monomials);
      if (countFlags(finer) >= flagged * 2) break;
      piece = finer;
    }
    pieces.push(piece);
  });
  let newtonSegments = 0;
  let totalSegments = 0;
  for (const p of pieces) {
    newtonSegments += countFlags(p);
    totalSegments += p.count;
  }
  return { pieces, newtonSegments, totalSegments };
}

const cache = new WeakMap<CompiledType, ExactInverse>();
let lastType: CompiledType | undefined;
let lastInverse: ExactInverse | undefined;

/** Returns the exact-inverse tables of a type, building them on first use (a few milliseconds). @internal */
export function _exactInverseTables(ct: CompiledType): ExactInverse {
  if (ct === lastType) return lastInverse as ExactInverse;
  let inv = cache.get(ct);
  if (inv === undefined) {
    inv = build(ct);
    cache.set(ct, inv);
  }
  lastType = ct;
  lastInverse = inv;
  return inv;
}

/**
 * t(E) in °C for an EMF already checked to lie in the unambiguous range. @internal
 */
export function _exactInverse(ct: CompiledType, inv: ExactInverse, emfMillivolts: number): number {
  const pieces = inv.pieces;
  let piece = pieces[0] as InversePiece;
  for (let i = 1; i < pieces.length; i++) {
    const next = pieces[i] as InversePiece;
    if (emfMillivolts >= next.selectFromEmf) piece = next;
    else break;
  }
  const x = (emfMillivolts - piece.emfStart) * piece.segmentsPerMillivolt;
  let k = Math.floor(x);
  if (k >= piece.count) k = piece.count - 1;
  else if (k < 0) k = 0;
  let t: number;
  if (piece.solveFlags[k] === 1) {
    t = _solveInSubrange(
      ct,
      piece.subrangeIndex,
      emfMillivolts,
      piece.boundaryC[k] as number,
      piece.boundaryC[k + 1] as number,
      true,
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
  if (t < piece.lowC) return piece.lowC;
  if (t > piece.highC) return piece.highC;
  return t;
}
