import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  amplifierTimeConstantSeconds,
  firstOrderRampLagC,
  heatedLoadEquilibrium,
  iirRampDelaySeconds,
  movingAverageRampDelaySeconds,
  rampLagThroughLagsC,
  simulateRunaway,
} from "../../src/dynamics/index.js";

describe("ramp through first-order lags", () => {
  it("one lag lags a ramp by R·τ·(1 − e^(−t/τ)) (textbook control theory: ramp response of 1/(τs+1))", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        fc.double({ min: 0.01, max: 1000, noNaN: true }),
        fc.double({ min: 0, max: 20, noNaN: true }),
        (rate, tau, tOverTau) => {
          const t = tOverTau * tau;
          const expected = rate * tau * (1 - Math.exp(-t / tau));
          const exact = rampLagThroughLagsC({ rateCPerSecond: rate, timeConstantsSeconds: [tau], timeSeconds: t });
          expect(exact).toBeCloseTo(expected, 8 - Math.max(0, Math.ceil(Math.log10(rate * tau))));
          expect(firstOrderRampLagC({ rateCPerSecond: rate, timeConstantSeconds: tau, timeSeconds: t })).toBeCloseTo(expected, 10);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("two cascaded lags follow R·[(τ1+τ2) − (τ1²e^(−t/τ1) − τ2²e^(−t/τ2))/(τ1 − τ2)] and approach R·(τ1 + τ2) (textbook control theory)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        fc.double({ min: 1.05, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 10, noNaN: true }),
        (rate, tau1, ratio, tOverTau) => {
          const tau2 = tau1 * ratio;
          const t = tOverTau * tau2;
          const closed = rate * (tau1 + tau2 - (tau1 * tau1 * Math.exp(-t / tau1) - tau2 * tau2 * Math.exp(-t / tau2)) / (tau1 - tau2));
          const exact = rampLagThroughLagsC({ rateCPerSecond: rate, timeConstantsSeconds: [tau1, tau2], timeSeconds: t });
          expect(Math.abs(exact - closed)).toBeLessThan(1e-9 * rate * (tau1 + tau2) * 10);
          const late = rampLagThroughLagsC({ rateCPerSecond: rate, timeConstantsSeconds: [tau1, tau2], timeSeconds: 60 * tau2 });
          expect(late / (rate * (tau1 + tau2))).toBeCloseTo(1, 8);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("the simulated indicated temperature of a sensor lag behind a constant-rate runaway matches the closed form at every series point (textbook control theory)", () => {
    const rate = 2;
    const tau = 10;
    const r = simulateRunaway(
      { runaway: { kind: "constantRate", rateCPerSecond: rate }, sensor: { kind: "firstOrder", timeConstantSeconds: tau }, outputStages: [{ kind: "relay", releaseTimeSeconds: 0.5 }] },
      { startC: 100, tripTemperatureC: 150, hazardLimitC: 200 },
    );
    const off = r.heatOffSeconds as number;
    let checked = 0;
    r.series.timeSeconds.forEach((t, k) => {
      if (t > off) return;
      expect(r.series.trueC[k]).toBeCloseTo(100 + rate * t, 9);
      expect(r.series.indicatedC[k]).toBeCloseTo(100 + rate * t - rate * tau * (1 - Math.exp(-t / tau)), 9);
      checked++;
    });
    expect(checked).toBeGreaterThan(100);
    // decision where 100 + R(t − τ(1 − e^(−t/τ))) = 150, solved here by Newton's method
    let t = 30;
    for (let i = 0; i < 50; i++) t -= (rate * (t - tau * (1 - Math.exp(-t / tau))) - 50) / (rate * (1 - Math.exp(-t / tau)));
    expect(r.decisionSeconds as number).toBeCloseTo(t, 9);
    expect(r.trueCrossingSeconds as number).toBeCloseTo(25, 9);
    expect(r.peakTrueC).toBeCloseTo(100 + rate * (t + 0.5), 8);
  });
});

describe("first-order heated process", () => {
  it("tends to Ta + P/G with time constant C/G (textbook heat transfer, lumped capacitance): series against Teq + (T0 − Teq)·e^(−t·G/C)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 200, max: 5000, noNaN: true }),
        fc.double({ min: 500, max: 50000, noNaN: true }),
        fc.double({ min: 0.5, max: 50, noNaN: true }),
        fc.double({ min: 0.05, max: 0.6, noNaN: true }),
        (power, capacity, loss, startFraction) => {
          const ambient = 20;
          const runaway = { kind: "heaterPower" as const, heaterWatts: power, loadCapacityJoulesPerK: capacity, lossWattsPerK: loss, ambientC: ambient };
          const eq = heatedLoadEquilibrium(runaway);
          expect(eq.equilibriumC).toBeCloseTo(ambient + power / loss, 9);
          expect(eq.timeConstantSeconds).toBeCloseTo(capacity / loss, 6);
          const start = ambient + startFraction * (power / loss);
          const trip = ambient + (startFraction + 0.3) * (power / loss);
          const r = simulateRunaway({ runaway }, { startC: start, tripTemperatureC: trip, hazardLimitC: trip + 10 }, { maxPoints: 50 });
          const teq = ambient + power / loss;
          const tau = capacity / loss;
          r.series.timeSeconds.forEach((t, k) => {
            if (t > (r.heatOffSeconds as number)) return;
            const expected = teq + (start - teq) * Math.exp(-t / tau);
            expect(Math.abs((r.series.trueC[k] as number) - expected)).toBeLessThan(1e-9 * teq);
          });
          expect(r.trueCrossingSeconds as number).toBeCloseTo(tau * Math.log((teq - start) / (teq - trip)), 6);
        },
      ),
      { numRuns: 60 },
    );
  });

  it("without a trip it settles at Ta + P/G: the reported peak is that equilibrium (energy balance)", () => {
    const r = simulateRunaway(
      { runaway: { kind: "heaterPower", heaterWatts: 1000, loadCapacityJoulesPerK: 10000, lossWattsPerK: 10, ambientC: 20 } },
      { startC: 100, tripTemperatureC: 130, hazardLimitC: 150 },
    );
    expect(r.tripped).toBe(false);
    expect(r.peakTrueC).toBe(120);
    expect(r.timeFromStartToHazardSeconds).toBeNull();
  });
});

describe("a hazard limit within rounding of the equilibrium (regression: found by the heated-load property above, unseeded)", () => {
  it("the time to the hazard is where the float64 state settles, near τ·ln((T_eq − T_0)/(T_eq − T_h)); no OVERFLOW from ever longer steps", () => {
    // 4999.999999775357 W, 500 J/K, 49.999999997754 W/K: T_eq = 119.99999999999913 °C, the hazard limit (trip + 10 °C)
    // 119.99999999999912 °C, 1 ulp below it. Exactly, the load reaches it at τ·ln(40/1.4e-14) ≈ 356 s (Newton's law of
    // cooling, first-order lag); the float64 state reaches its fixed point a little earlier.
    const power = 4999.999999775357;
    const loss = 49.999999997754;
    const start = 20 + 0.5999999999999991 * (power / loss);
    const trip = 20 + (0.5999999999999991 + 0.3) * (power / loss);
    const r = simulateRunaway(
      { runaway: { kind: "heaterPower", heaterWatts: power, loadCapacityJoulesPerK: 500, lossWattsPerK: loss, ambientC: 20 } },
      { startC: start, tripTemperatureC: trip, hazardLimitC: trip + 10 },
      { maxPoints: 50 },
    );
    const tau = 500 / loss;
    const exact = tau * Math.log((20 + power / loss - start) / (20 + power / loss - (trip + 10)));
    expect(r.timeFromStartToHazardSeconds).not.toBeNull();
    expect(r.timeFromStartToHazardSeconds as number).toBeGreaterThan(0.9 * exact);
    expect(r.timeFromStartToHazardSeconds as number).toBeLessThanOrEqual(exact);
    expect(r.trueCrossingSeconds as number).toBeCloseTo(tau * Math.log((20 + power / loss - start) / (20 + power / loss - trip)), 6);
  });
});

describe("sampled filters on a ramp", () => {
  it("a moving average of N samples delays a ramp by (N − 1)·Ts/2 (textbook DSP, boxcar group delay): decision = t_cross + (N−1)·Ts/2 + M·Ts", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 64 }),
        fc.double({ min: 0.001, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 5 }),
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        (samples, ts, debounce, rate) => {
          expect(movingAverageRampDelaySeconds({ samples, samplePeriodSeconds: ts })).toBeCloseTo(((samples - 1) * ts) / 2, 12);
          // the ramp must have filled the filter before the crossing: trip further away than N·Ts·R
          const rise = rate * ts * (samples + 5) * 2;
          const r = simulateRunaway(
            { runaway: { kind: "constantRate", rateCPerSecond: rate }, signalPath: { kind: "firmware", samplePeriodSeconds: ts, digitalFilter: { kind: "movingAverage", samples }, debounceSamples: debounce } },
            { startC: 0, tripTemperatureC: rise, hazardLimitC: 2 * rise },
            { maxPoints: 20 },
          );
          const delay = (r.decisionSeconds as number) - rise / rate - debounce * ts;
          expect(Math.abs(delay - ((samples - 1) * ts) / 2)).toBeLessThan(1e-9 * (rise / rate));
        },
      ),
      { numRuns: 60 },
    );
  });

  it("a first-order IIR with coefficient a delays a ramp by Ts·(1 − a)/a at steady state (textbook DSP: error recursion)", () => {
    for (const a of [1, 0.5, 0.25, 0.1]) {
      const ts = 0.05;
      expect(iirRampDelaySeconds({ coefficient: a, samplePeriodSeconds: ts })).toBeCloseTo((ts * (1 - a)) / a, 12);
      const rate = 1;
      const rise = (rate * ts * 600) / a;
      const r = simulateRunaway(
        { runaway: { kind: "constantRate", rateCPerSecond: rate }, signalPath: { kind: "firmware", samplePeriodSeconds: ts, digitalFilter: { kind: "firstOrderIir", coefficient: a } } },
        { startC: 0, tripTemperatureC: rise, hazardLimitC: 2 * rise },
        { maxPoints: 20 },
      );
      expect((r.decisionSeconds as number) - rise / rate - ts).toBeCloseTo((ts * (1 - a)) / a, 9);
    }
  });

  it("an amplifier's first-order roll-off has τ = 1/(2πf) (textbook circuit theory)", () => {
    expect(amplifierTimeConstantSeconds(1)).toBeCloseTo(0.15915494309189535, 15);
    expect(amplifierTimeConstantSeconds(50_000)).toBeCloseTo(1 / (2 * Math.PI * 50_000), 18);
  });
});
