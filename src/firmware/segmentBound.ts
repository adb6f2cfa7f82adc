/**
 * The error bound of one table segment. On a segment [a, b] of length h, linear interpolation of a C²
 * function f errs by at most max|f''|·(x−a)(b−x)/2 ≤ max|f''|·h²/8 (the linear interpolation error theorem;
 * any numerical analysis text, from memory); for an integer input only whole x occur, so the factor is
 * ⌊h/2⌋·⌈h/2⌉/2. max|f''| is an interval enclosure with outward rounding over the segment
 * (`its90/curvatureEnclosure.ts`): E''(t) for temperature inputs, t'' = −E''/E'³ for EMF or code inputs.
 * Where a segment contains a seam between sub-ranges, the jump J of f' there (type N: S jumps by
 * 0.23 µV/°C at 0 °C) adds |J|·(s−a)(b−s)/(b−a), and any jump D of f adds |D|. The float64 error of the
 * reference values at the breakpoints is a separate term of the segment (`referenceError`).
 * @internal
 * @module
 */
import type { _TableFunction } from "./tableFunction.js";

/** Interpolation and reference parts of one segment's bound, output natural units. @internal */
export interface _SegmentBound {
  readonly interpolation: number;
  readonly reference: number;
}

/** The bound of segment [a, b] (stored input units) of a table over `fn`. @internal */
export function _segmentBound(fn: _TableFunction, integerInput: boolean, inputScale: number, a: number, b: number): _SegmentBound {
  const h = b - a;
  const reference = fn.referenceError(a / inputScale, b / inputScale);
  if (integerInput && h <= 1) return { interpolation: 0, reference };
  const curvature = fn.curvatureBound(a / inputScale, b / inputScale);
  const factor = integerInput ? (Math.floor(h / 2) * Math.ceil(h / 2)) / 2 : (h * h) / 8;
  let interpolation = (curvature * factor) / (inputScale * inputScale);
  // A seam inside the segment: f = smooth part + J·(x − s)₊ + D·step, and linear interpolation of the
  // kink errs by at most |J|·(s − a)(b − s)/(b − a); of the value jump by at most |D|.
  for (const seam of fn.seams) {
    const s = seam.input * inputScale;
    if (s > a && s < b) interpolation += (Math.abs(seam.slopeJump) * ((s - a) * (b - s))) / h / inputScale + seam.valueJump;
  }
  return { interpolation: interpolation * (1 + 2 ** -50), reference };
}
