import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  arcsine,
  distributionCoverageInterval,
  distributionQuantile,
  normal,
  rectangular,
  trapezoidal,
  triangular,
} from "../../src/uncertainty/index.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../../src/errors.js";
import {
  m1RectangularHalfWidthPerA,
  m3StandardUncertaintyPerA,
  m3TriangularHalfWidthPerA,
  m5ArcsineHalfWidthPerA,
  typeBChecks,
} from "../fixtures/uncertaintyChecks.js";

describe("distribution factories", () => {
  it.each(typeBChecks)("$id $kind: u per JCGM 100 4.3.7–4.3.9 ($source)", (check) => {
    const d =
      check.kind === "rectangular"
        ? rectangular({ center: 0, halfWidth: check.halfWidth })
        : check.kind === "triangular"
          ? triangular({ center: 0, halfWidth: check.halfWidth })
          : check.kind === "arcsine"
            ? arcsine({ center: 0, halfWidth: check.halfWidth })
            : trapezoidal({ center: 0, halfWidth: check.halfWidth, beta: 0.5 });
    expect(Math.abs(d.standardUncertainty - check.u)).toBeLessThanOrEqual(check.absTol);
  });

  it("normal from U and k gives U/k (JCGM 100 4.3.3)", () => {
    expect(normal({ mean: 5, expandedUncertainty: 0.3, coverageFactor: 2 }).standardUncertainty).toBe(0.15);
    expect(normal({ mean: 5, standardDeviation: 0.2, degreesOfFreedom: 8 })).toEqual({
      kind: "normal",
      mean: 5,
      standardUncertainty: 0.2,
      degreesOfFreedom: 8,
    });
  });

  it("rectangular from bounds equals rectangular from center and half-width", () => {
    expect(rectangular({ lower: -1, upper: 3 })).toEqual(rectangular({ center: 1, halfWidth: 2 }));
  });

  it("trapezoid β = 0 is triangular, β = 1 rectangular (JCGM 100 4.3.9)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1e6, noNaN: true }), (a) => {
        const t0 = trapezoidal({ center: 0, halfWidth: a, beta: 0 }).standardUncertainty;
        const t1 = trapezoidal({ center: 0, halfWidth: a, beta: 1 }).standardUncertainty;
        expect(Math.abs(t0 - triangular({ center: 0, halfWidth: a }).standardUncertainty)).toBeLessThan(1e-12 * a);
        expect(Math.abs(t1 - rectangular({ center: 0, halfWidth: a }).standardUncertainty)).toBeLessThan(1e-12 * a);
      }),
      { seed: 11, numRuns: 100 },
    );
  });

  it("results survive JSON round trips unchanged", () => {
    for (const d of [
      normal({ mean: 1, standardDeviation: 2 }),
      rectangular({ center: 1, halfWidth: 2, degreesOfFreedom: 12 }),
      trapezoidal({ center: 1, halfWidth: 2, beta: 0.25 }),
      arcsine({ center: -1, halfWidth: 0.5 }),
    ]) {
      expect(JSON.parse(JSON.stringify(d))).toEqual(d);
    }
  });

  it("rejects bad options with precise errors", () => {
    const cases: [() => unknown, unknown, string][] = [
      [() => rectangular({ center: 0, halfWidth: -1 }), HotjunctionRangeError, "half-width -1 is negative"],
      [() => rectangular({ lower: 2, upper: 1 }), HotjunctionRangeError, "lower bound 2 is above the upper bound"],
      [() => trapezoidal({ center: 0, halfWidth: 1, beta: 1.5 }), HotjunctionRangeError, "beta 1.5 is out of range; valid range 0 to 1"],
      [() => trapezoidal({ center: 0, halfWidth: 1, beta: -0.1 }), HotjunctionRangeError, "beta -0.1 is out of range"],
      [() => triangular({ center: Number.NaN, halfWidth: 1 }), HotjunctionTypeError, "center NaN is not a finite number"],
      [() => arcsine({ center: 0, halfWidth: Number.POSITIVE_INFINITY }), HotjunctionTypeError, "half-width Infinity is not a finite number"],
      [() => normal({ mean: 0, standardDeviation: -2 }), HotjunctionRangeError, "standard deviation -2 is negative"],
      [() => normal({ mean: 0, expandedUncertainty: 1, coverageFactor: 0 }), HotjunctionRangeError, "coverage factor 0 is not greater than 0"],
      [() => normal({ mean: 0, standardDeviation: 1, degreesOfFreedom: 0 }), HotjunctionRangeError, "degrees of freedom 0 is not greater than 0"],
      [
        () => normal({ mean: 0, standardDeviation: 1, expandedUncertainty: 2, coverageFactor: 2 } as never),
        HotjunctionTypeError,
        "mix more than one accepted form",
      ],
      [() => rectangular({ center: 0 } as never), HotjunctionTypeError, "half-width undefined is not a finite number"],
      [() => normal(null as never), HotjunctionTypeError, "options null is not an options object"],
    ];
    for (const [run, errorClass, message] of cases) {
      expect(run).toThrow(errorClass as never);
      expect(run).toThrow(message);
    }
  });
});

describe("closed-form coverage intervals of single distributions", () => {
  it("M1 rectangular ±a, 95 %: ±0.95a (c, exact)", () => {
    const [low, high] = distributionCoverageInterval(rectangular({ center: 0, halfWidth: 3 }));
    expect(high).toBeCloseTo(3 * m1RectangularHalfWidthPerA, 12);
    expect(low).toBeCloseTo(-3 * m1RectangularHalfWidthPerA, 12);
  });
  it("M3 sum of two rectangulars ±a is triangular ±2a: ±1.5527864a, u = 0.8164966a (c, exact)", () => {
    const sum = triangular({ center: 0, halfWidth: 2 });
    expect(distributionCoverageInterval(sum)[1]).toBeCloseTo(m3TriangularHalfWidthPerA, 7);
    expect(sum.standardUncertainty).toBeCloseTo(m3StandardUncertaintyPerA, 7);
  });
  it("M5 arcsine ±a, 95 %: ±0.9969173a (c, exact)", () => {
    expect(distributionCoverageInterval(arcsine({ center: 0, halfWidth: 1 }))[1]).toBeCloseTo(m5ArcsineHalfWidthPerA, 7);
  });
  it("quantiles are monotone and hit the bounds at 0 and 1 (property)", () => {
    fc.assert(
      fc.property(
        fc.constantFrom("rectangular", "triangular", "trapezoidal", "arcsine"),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (kind, p1, p2, beta) => {
          const d =
            kind === "rectangular"
              ? rectangular({ center: 1, halfWidth: 2 })
              : kind === "triangular"
                ? triangular({ center: 1, halfWidth: 2 })
                : kind === "arcsine"
                  ? arcsine({ center: 1, halfWidth: 2 })
                  : trapezoidal({ center: 1, halfWidth: 2, beta });
          const [lo, hi] = p1 <= p2 ? [p1, p2] : [p2, p1];
          expect(distributionQuantile(d, lo)).toBeLessThanOrEqual(distributionQuantile(d, hi) + 1e-12);
          expect(distributionQuantile(d, 0)).toBeCloseTo(-1, 12);
          expect(distributionQuantile(d, 1)).toBeCloseTo(3, 12);
        },
      ),
      { seed: 12, numRuns: 200 },
    );
  });
  it("trapezoid quantile at its own CDF knots (c): β = 0.5, a = 1 → tail mass 1/6 at x = −0.5", () => {
    expect(distributionQuantile(trapezoidal({ center: 0, halfWidth: 1, beta: 0.5 }), 1 / 6)).toBeCloseTo(-0.5, 12);
  });
});
