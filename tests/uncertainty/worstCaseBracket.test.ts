/**
 * Worst case as a bracket: the attained extremes (with a point of the box that reaches each) and, given an
 * interval extension of the model, a branch-and-bound enclosure; the true range lies between them.
 */
import { describe, expect, it } from "vitest";
import { propagate, rectangular } from "../../src/uncertainty/index.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../../src/errors.js";

type I = readonly [number, number];
// Naive interval arithmetic with outward rounding by one relative ulp plus the smallest normal (common practice).
const out = (lo: number, hi: number): I => [lo - Math.abs(lo) * 2 ** -52 - 2 ** -1022, hi + Math.abs(hi) * 2 ** -52 + 2 ** -1022];
const add = (a: I, b: I): I => out(a[0] + b[0], a[1] + b[1]);
const sub = (a: I, b: I): I => out(a[0] - b[1], a[1] - b[0]);
const mul = (a: I, b: I): I => {
  const p = [a[0] * b[0], a[0] * b[1], a[1] * b[0], a[1] * b[1]];
  return out(Math.min(...p), Math.max(...p));
};
const k = (c: number): I => [c, c];

describe("worst-case bracket", () => {
  // f(x, y) = (x − 0.3)² − (y + 0.2)² on x, y in [−1, 1]: non-monotone in both inputs. Exact extremes (c):
  // max 1.69 at (−1, −0.2), min −1.44 at (0.3, 1).
  const inputs = { x: rectangular({ center: 0, halfWidth: 1 }), y: rectangular({ center: 0, halfWidth: 1 }) };
  const f = ({ x, y }: { x: number; y: number }) => x * x - 0.6 * x + 0.09 - (y * y + 0.4 * y + 0.04);
  // Written with x and y repeated, so the natural extension overestimates on wide boxes (branch and bound must work).
  const enclosure = (box: Readonly<Record<"x" | "y", I>>): I =>
    sub(add(sub(mul(box.x, box.x), mul(k(0.6), box.x)), k(0.09)), add(add(mul(box.y, box.y), mul(k(0.4), box.y)), k(0.04)));

  it("non-monotone model: attained extremes with their points, an enclosure that contains them, and a small gap", () => {
    const result = propagate(f, inputs, { method: "worst-case", modelEnclosure: enclosure });
    const attained = result.attained as NonNullable<typeof result.attained>;
    expect(attained.high.value).toBeCloseTo(1.69, 9);
    expect(attained.low.value).toBeCloseTo(-1.44, 9);
    expect(f(attained.high.at as { x: number; y: number })).toBe(attained.high.value);
    expect(f(attained.low.at as { x: number; y: number })).toBe(attained.low.value);
    const [lo, hi] = result.enclosure as readonly [number, number];
    expect(lo).toBeLessThanOrEqual(-1.44);
    expect(hi).toBeGreaterThanOrEqual(1.69);
    const [gapLow, gapHigh] = result.enclosureGap as readonly [number, number];
    expect(gapLow).toBeGreaterThanOrEqual(0);
    expect(gapHigh).toBeGreaterThanOrEqual(0);
    expect(gapLow).toBeLessThan(1e-3);
    expect(gapHigh).toBeLessThan(1e-3);
    expect(result.interval).toEqual([attained.low.value, attained.high.value]);
    expect(result.note).toMatch(/branch and bound/);
  });

  it("monotone model with an exact extension: the attained corners and the enclosure meet (gap 0 up to outward rounding)", () => {
    const three = { a: rectangular({ center: 1, halfWidth: 0.1 }), b: rectangular({ center: 2, halfWidth: 0.2 }), c: rectangular({ center: -1, halfWidth: 0.3 }) };
    const result = propagate(({ a, b, c }) => a + 2 * b - c, three, {
      method: "worst-case",
      modelEnclosure: (box) => add(add(box.a, mul(k(2), box.b)), mul(k(-1), box.c)),
    });
    const attained = result.attained as NonNullable<typeof result.attained>;
    expect(attained.high.at).toEqual({ a: 1.1, b: 2.2, c: -1.3 });
    expect(attained.low.at).toEqual({ a: 0.9, b: 1.8, c: -0.7 });
    const [gapLow, gapHigh] = result.enclosureGap as readonly [number, number];
    expect(gapLow).toBeLessThan(1e-14);
    expect(gapHigh).toBeLessThan(1e-14);
  });

  it("without an extension: attained extremes and points, no enclosure, and the note says so", () => {
    const result = propagate(f, inputs, { method: "worst-case" });
    expect(result.attained?.high.value).toBeCloseTo(1.69, 9);
    expect(result.enclosure).toBeUndefined();
    expect(result.note).toMatch(/no enclosure/);
  });

  it("an extension that misses the attained extreme, or returns NaN, is a typed error", () => {
    expect(() => propagate(f, inputs, { method: "worst-case", modelEnclosure: () => [-1, 1] })).toThrow(HotjunctionRangeError);
    expect(() => propagate(f, inputs, { method: "worst-case", modelEnclosure: () => [Number.NaN, 1] })).toThrow(
      expect.objectContaining({ code: "INVALID_OPTION", quantity: "modelEnclosure result" }),
    );
    expect(() => propagate(f, inputs, { method: "worst-case", modelEnclosure: 3 as never })).toThrow(HotjunctionTypeError);
  });
});
