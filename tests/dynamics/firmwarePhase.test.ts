import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { simulateRunaway } from "../../src/dynamics/index.js";

/**
 * An explicit sampled trip at one sample phase φ: samples at φ + k·Ts of a ramp R through a first-order lag τ
 * (closed form y = R·(t − τ·(1 − e^(−t/τ))) for t ≥ 0, 0 before: textbook control theory), a moving average of the
 * last N samples, and a trip at the M-th consecutive sample at or above the threshold.
 */
function sampledTripSeconds(rate: number, tau: number, ts: number, samples: number, debounce: number, thr: number, phase: number): number {
  const y = (t: number) => (t <= 0 ? 0 : rate * (t - (tau === 0 ? 0 : tau * -Math.expm1(-t / tau))));
  const window: number[] = [];
  let run = 0;
  for (let k = -samples; ; k++) {
    const t = phase + k * ts;
    window.push(y(t));
    if (window.length > samples) window.shift();
    const g = window.reduce((s, v) => s + v, 0) / samples;
    run = g >= thr ? run + 1 : 0;
    if (run >= debounce && t >= 0) return t;
  }
}

describe("firmware path: the decision is the worst case over the unknown sample phase", () => {
  it("no sample phase trips later than the reported decision, and the latest phase comes within 1/100 of a period of it", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 20, noNaN: true }),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 16 }),
        fc.integer({ min: 1, max: 4 }),
        fc.double({ min: 5, max: 30, noNaN: true }),
        (rate, tau, ts, samples, debounce, rise) => {
          const r = simulateRunaway(
            {
              runaway: { kind: "constantRate", rateCPerSecond: rate },
              sensor: { kind: "firstOrder", timeConstantSeconds: tau },
              signalPath: { kind: "firmware", samplePeriodSeconds: ts, digitalFilter: { kind: "movingAverage", samples }, debounceSamples: debounce },
            },
            { startC: 0, tripTemperatureC: rise, hazardLimitC: 2 * rise },
            { maxPoints: 20 },
          );
          const decision = r.decisionSeconds as number;
          let latest = -Infinity;
          const phases = 100;
          for (let i = 0; i < phases; i++) latest = Math.max(latest, sampledTripSeconds(rate, tau, ts, samples, debounce, rise, (i * ts) / phases));
          expect(latest).toBeLessThanOrEqual(decision + 1e-9 * decision);
          expect(latest).toBeGreaterThanOrEqual(decision - ts / phases - 1e-9 * decision);
        },
      ),
      { numRuns: 30 },
    );
  });
});
