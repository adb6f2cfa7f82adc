/**
 * Breakpoint placement: adaptive (fewest breakpoints: greedy farthest reach with bisection) and uniform
 * (the widest power-of-two spacing of stored input units that meets the error, for shift-based indexing).
 * @internal
 * @module
 */
import { HotjunctionRangeError } from "../errors.js";
import { _roundToNumberType, type FirmwareNumberType } from "./firmwareNumberType.js";

/** What placement needs of a request. @internal */
export interface _PlacementRequest {
  readonly lo: number;
  readonly hi: number;
  readonly integerInput: boolean;
  readonly inputNumberType: FirmwareNumberType;
  readonly cap: number;
  readonly context: string;
  /** Whether segment [a, b] (stored input units) meets the budget. */
  fits(a: number, b: number): boolean;
  /** Error raised when the error cannot be met at the input's resolution. */
  unmet(): never;
}

/** @internal */
export function _tooManyBreakpoints(needed: number, cap: number, context: string): never {
  throw new HotjunctionRangeError({
    code: "OUT_OF_RANGE",
    quantity: "breakpoint count",
    value: needed,
    min: 2,
    max: cap,
    context,
    problem: "is above the cap maxBreakpoints (raise the cap, loosen maxErrorOutputUnits or narrow the range)",
  });
}

/** Farthest b > a with fits(a, b), by doubling from `guess` then bisection. */
function farthestReach(r: _PlacementRequest, a: number, guess: number): number {
  const { hi, integerInput } = r;
  if (r.fits(a, hi)) return hi;
  const tolerance = (hi - r.lo) * 1e-9;
  const roundInput = (v: number): number => (integerInput ? Math.floor(v) : _roundToNumberType(v, r.inputNumberType));
  let good = integerInput ? a + 1 : a;
  let bad = hi;
  let step = guess;
  for (;;) {
    const trial = roundInput(a + step);
    if (trial >= hi) break;
    if (trial > good) {
      if (r.fits(a, trial)) good = trial;
      else {
        bad = trial;
        break;
      }
    }
    step *= 2;
  }
  for (;;) {
    const gap = bad - good;
    if (integerInput ? gap <= 1 : gap <= tolerance) break;
    const mid = roundInput(good + gap / 2);
    if (mid <= good || mid >= bad) break;
    if (r.fits(a, mid)) good = mid;
    else bad = mid;
  }
  // The first candidate (a + 1 for an integer input) was never tested: its reference error must fit too.
  if (good <= a || !r.fits(a, good)) r.unmet();
  return good;
}

/** Adaptive placement: breakpoint inputs, stored units, from lo to hi. @internal */
export function _placeAdaptive(r: _PlacementRequest): number[] {
  const inputs = [r.lo];
  let a = r.lo;
  let guess = r.integerInput ? Math.max(1, Math.floor((r.hi - r.lo) / 16)) : (r.hi - r.lo) / 16;
  while (a < r.hi) {
    const b = farthestReach(r, a, guess);
    inputs.push(b);
    if (inputs.length > r.cap) _tooManyBreakpoints(inputs.length, r.cap, r.context);
    guess = Math.max(r.integerInput ? 1 : 0, (b - a) / 2);
    a = b;
  }
  return inputs;
}

/** Uniform placement: log2 of the spacing and the breakpoint inputs (the last may lie beyond hi). @internal */
export function _placeUniform(r: _PlacementRequest): { spacingLog2: number; inputs: number[] } {
  const span = r.hi - r.lo;
  let chosen: number | null = null;
  for (let k = Math.ceil(Math.log2(span)); k >= 0; k--) {
    const step = 2 ** k;
    const segments = Math.ceil(span / step);
    if (segments + 1 > r.cap) _tooManyBreakpoints(segments + 1, r.cap, r.context);
    let ok = true;
    for (let i = 0; i < segments && ok; i++) {
      const a = r.lo + i * step;
      ok = r.fits(a, Math.min(a + step, r.hi));
    }
    if (ok) {
      chosen = k;
      break;
    }
  }
  // Spacing 1 is exact between breakpoints, so only the reference error can fail it.
  if (chosen === null) r.unmet();
  const step = 2 ** chosen;
  const segments = Math.ceil(span / step);
  const inputs: number[] = [];
  for (let i = 0; i <= segments; i++) inputs.push(r.lo + i * step);
  return { spacingLog2: chosen, inputs };
}
