/**
 * Properties of the safety figures over many generated inputs (fast-check): detection never raises λ_DU,
 * shorter proof-test intervals never raise PFDavg, rates scale linearly, and mode shares sum to one or the data
 * is refused. The monotonicity follows from the Annex B forms (IEC 61508-6:2010 Annex B, `from memory`): every
 * term grows with T1; the rest follows from the definitions of λ_DD/λ_DU (IEC 61508-4, `from memory`).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  failureShareSumTolerance,
  HotjunctionRangeError,
  pfdAvg1oo1,
  pfdAvg1oo2,
  safetyFigures,
  twoChannelCutout,
  validateFailureData,
  type FailureData,
  type SafetyFaultSafety,
  type SetpointFaultClasses,
} from "../../src/index.js";

// Rates are 0 or at least 1e-6 FIT: subnormal doubles would make "scales linearly" a test of underflow.
const safetyArb = fc.constantFrom<SafetyFaultSafety>("safe", "dangerous", "degraded", "no-effect");

/** A random design: n faults with classes, and elements whose modes name them (shares normalized to sum 1). */
const designArb = fc
  .array(fc.record({ safety: safetyArb, detected: fc.boolean() }), { minLength: 1, maxLength: 12 })
  .chain((faults) =>
    fc.record({
      faults: fc.constant(faults),
      rates: fc.array(fc.oneof(fc.constant(0), fc.double({ min: 1e-6, max: 1e5, noNaN: true })), { minLength: faults.length, maxLength: faults.length }),
      weights: fc.array(fc.integer({ min: 1, max: 100 }), { minLength: faults.length, maxLength: faults.length }),
      groups: fc.integer({ min: 1, max: faults.length }),
    }),
  )
  .map(({ faults, rates, weights, groups }) => {
    const setpoint: SetpointFaultClasses = {
      name: "generated",
      faults: faults.map((f, i) => ({ faultId: `f${i}`, safety: f.safety, detected: f.detected, shiftC: null, marginC: null })),
    };
    // Element k holds the faults i with i % groups === k.
    const elements = Array.from({ length: groups }, (_, k) => {
      const idx = faults.map((_, i) => i).filter((i) => i % groups === k);
      const total = idx.reduce((s, i) => s + (weights[i] as number), 0);
      return {
        element: `e${k}`,
        rateFit: rates[k] as number,
        modes: idx.map((i) => ({ mode: `m${i}`, share: (weights[i] as number) / total, faultId: `f${i}` })),
      };
    });
    return { setpoint, data: { elements } as FailureData };
  });

describe("properties (fast-check)", () => {
  it("adding a detection method (a fault moved from undetected to detected) never raises λ_DU and never lowers DC", () => {
    fc.assert(
      fc.property(designArb, fc.nat(), (d, pick) => {
        const before = safetyFigures(d.data, d.setpoint);
        const undetected = d.setpoint.faults.filter((f) => !f.detected);
        if (undetected.length === 0) return;
        const target = undetected[pick % undetected.length]?.faultId;
        const after = safetyFigures(d.data, { ...d.setpoint, faults: d.setpoint.faults.map((f) => (f.faultId === target ? { ...f, detected: true } : f)) });
        expect(after.lambdaDuFit).toBeLessThanOrEqual(before.lambdaDuFit * (1 + 1e-12) + 1e-12);
        expect(after.lambdaDangerousFit).toBeCloseTo(before.lambdaDangerousFit, 6);
        if (before.diagnosticCoverage !== null && after.diagnosticCoverage !== null) {
          expect(after.diagnosticCoverage).toBeGreaterThanOrEqual(before.diagnosticCoverage - 1e-12);
        }
      }),
      { numRuns: 300 },
    );
  });

  it("shortening the proof-test interval never raises PFDavg (1oo1, 1oo2, two different channels; with proof-test coverage)", () => {
    const r = fc.double({ min: 0, max: 1e4, noNaN: true });
    fc.assert(
      fc.property(
        r,
        r,
        r,
        r,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (du, dd, du2, dd2, beta, betaD, t1, shorter, ptc) => {
          const tShort = t1 * shorter;
          const base = { meanTimeToRestorationHours: 8, meanRepairTimeHours: 12, proofTestCoverage: ptc, missionTimeHours: 2e5 };
          const long = { ...base, proofTestIntervalHours: t1 };
          const short = { ...base, proofTestIntervalHours: tShort };
          const a = { lambdaDuFit: du, lambdaDdFit: dd };
          const b = { lambdaDuFit: du2, lambdaDdFit: dd2 };
          const eps = (x: number) => x * 1e-12;
          const p1 = pfdAvg1oo1(a, long).pfdAvg;
          expect(pfdAvg1oo1(a, short).pfdAvg).toBeLessThanOrEqual(p1 + eps(p1));
          const p2 = pfdAvg1oo2(a, { beta, betaD }, long).pfdAvg;
          expect(pfdAvg1oo2(a, { beta, betaD }, short).pfdAvg).toBeLessThanOrEqual(p2 + eps(p2));
          const opts = { beta, betaD, betaSensitivity: [] };
          const pp = twoChannelCutout(a, b, { ...opts, proofTest: long }).pfdAvg1oo2;
          expect(twoChannelCutout(a, b, { ...opts, proofTest: short }).pfdAvg1oo2).toBeLessThanOrEqual(pp + eps(pp));
        },
      ),
      { numRuns: 400 },
    );
  });

  it("rates scale linearly: every λ, and the 1oo1 PFDavg and PFH, scale by k with the element rates", () => {
    fc.assert(
      fc.property(designArb, fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (d, k) => {
        const proofTest = { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 };
        const f = safetyFigures(d.data, d.setpoint, { proofTest });
        const scaled = { elements: d.data.elements.map((e) => ({ ...e, rateFit: e.rateFit * k })) };
        const g = safetyFigures(scaled, d.setpoint, { proofTest });
        for (const key of ["lambdaSdFit", "lambdaSuFit", "lambdaDdFit", "lambdaDuFit", "lambdaDegradedFit", "lambdaNoEffectFit", "lambdaTotalFit"] as const) {
          expect(Math.abs(g[key] - k * f[key])).toBeLessThanOrEqual(1e-9 * Math.max(1, k * f[key]));
        }
        const pf = f.pfdAvg1oo1?.pfdAvg as number;
        expect(Math.abs((g.pfdAvg1oo1?.pfdAvg as number) - k * pf)).toBeLessThanOrEqual(1e-9 * Math.max(1e-12, k * pf));
        if (f.safeFailureFraction !== null && g.safeFailureFraction !== null) expect(g.safeFailureFraction).toBeCloseTo(f.safeFailureFraction, 9);
      }),
      { numRuns: 300 },
    );
  });

  it(`the shares of each element sum to one within ${failureShareSumTolerance}, or the data is refused with the path`, () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 6 }), (shares) => {
        const data = { elements: [{ element: "resistor", rateFit: 10, modes: shares.map((share, i) => ({ mode: `m${i}`, share, assumed: { safety: "safe" as const, detected: false } })) }] };
        const sum = shares.reduce((s, x) => s + x, 0);
        if (Math.abs(sum - 1) <= failureShareSumTolerance) expect(() => validateFailureData(data)).not.toThrow();
        else {
          let error: unknown;
          try {
            validateFailureData(data);
          } catch (e) {
            error = e;
          }
          expect(error).toBeInstanceOf(HotjunctionRangeError);
          expect((error as HotjunctionRangeError).quantity).toBe("failureData.elements[0].modes[*].share");
        }
      }),
      { numRuns: 500 },
    );
    // normalized shares are always accepted
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1, max: 1000 }), { minLength: 1, maxLength: 8 }), (w) => {
        const total = w.reduce((s, x) => s + x, 0);
        const data = { elements: [{ element: "x", rateFit: 1, modes: w.map((x, i) => ({ mode: `m${i}`, share: x / total, assumed: { safety: "safe" as const, detected: true } })) }] };
        expect(() => validateFailureData(data)).not.toThrow();
      }),
    );
  });
});
