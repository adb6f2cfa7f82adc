import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  chatterRatePerHour,
  hysteresisForChatterVolts,
  mainsPickupPeakVolts,
  riceUpCrossingRatePerSecond,
  tripNoiseFigures,
  whiteNoiseRmsVolts,
} from "../../src/dynamics/index.js";

/** Seeded 32-bit generator (mulberry32), for a reproducible noise record. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe("Rice's level-crossing rate (S. O. Rice, Bell System Technical Journal 23 (1944), 24 (1945))", () => {
  it("ideal low-pass white noise: ν⁺(u) = (1/2π)·√(m2/m0)·e^(−u²/2σ²) with m0 = S0·B, m2 = (2π)²·S0·B³/3, by numerical quadrature of the moments", () => {
    for (const [b, sigma, u] of [
      [1000, 0.001, 0],
      [250, 0.002, 0.003],
      [10, 1e-5, 4e-5],
    ] as const) {
      const s0 = (sigma * sigma) / b;
      // spectral moments by the midpoint rule on 20000 intervals (not the closed form)
      let m0 = 0;
      let m2 = 0;
      const k = 20000;
      for (let i = 0; i < k; i++) {
        const f = ((i + 0.5) * b) / k;
        m0 += (s0 * b) / k;
        m2 += ((2 * Math.PI * f) ** 2 * s0 * b) / k;
      }
      const rice = (Math.sqrt(m2 / m0) / (2 * Math.PI)) * Math.exp(-(u * u) / (2 * m0));
      expect(riceUpCrossingRatePerSecond({ levelVolts: u, rmsVolts: sigma, bandwidthHz: b })).toBeCloseTo(rice, 6);
    }
  });

  it("agrees with a direct count of up-crossings in a simulated band-limited Gaussian record (sum of 300 random-phase tones at jittered frequencies over 0…B)", () => {
    const b = 100;
    const sigma = 1;
    const tones = 300;
    const rand = mulberry32(1945);
    // stratified random frequencies: not periodic, and the mean of f² stays close to B²/3
    const freqs = Array.from({ length: tones }, (_, i) => ((i + rand()) * b) / tones);
    const amp = sigma * Math.sqrt(2 / tones);
    const dt = 1 / (25 * b);
    const steps = 25 * b * 150; // 150 s: ≈ 8700 zero up-crossings expected
    // each tone as a rotating phasor (cos, sin), advanced by one complex multiplication per sample
    const re = new Float64Array(tones);
    const im = new Float64Array(tones);
    const cr = new Float64Array(tones);
    const ci = new Float64Array(tones);
    freqs.forEach((f, k) => {
      const phase = 2 * Math.PI * rand();
      re[k] = Math.cos(phase);
      im[k] = Math.sin(phase);
      cr[k] = Math.cos(2 * Math.PI * f * dt);
      ci[k] = Math.sin(2 * Math.PI * f * dt);
    });
    const levels = [0, 1, 2];
    const counts = [0, 0, 0];
    let prev = 0;
    for (let i = 0; i <= steps; i++) {
      let v = 0;
      for (let k = 0; k < tones; k++) {
        const r = re[k] as number;
        const m = im[k] as number;
        v += r;
        re[k] = r * (cr[k] as number) - m * (ci[k] as number);
        im[k] = r * (ci[k] as number) + m * (cr[k] as number);
      }
      v *= amp;
      if (i > 0) for (let j = 0; j < 3; j++) if (prev < (levels[j] as number) && v >= (levels[j] as number)) counts[j] = (counts[j] as number) + 1;
      prev = v;
    }
    const meanF2 = freqs.reduce((s, f) => s + f * f, 0) / tones;
    levels.forEach((u, j) => {
      const expected = riceUpCrossingRatePerSecond({ levelVolts: u, rmsVolts: sigma, bandwidthHz: b }) * steps * dt;
      // the tone set's own √(mean f²) differs from B/√3 by under 1 %
      expect(Math.abs(Math.sqrt(meanF2) / (b / Math.sqrt(3)) - 1)).toBeLessThan(0.01);
      // 3 % (sampling of the record at 25 points per period of B, finite tone count) plus 4 Poisson standard deviations
      expect(Math.abs((counts[j] as number) - expected)).toBeLessThan(0.03 * expected + 4 * Math.sqrt(expected));
    });
  }, 120_000);

  it("more hysteresis never raises the chatter rate (property, with and without mains pickup)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.1, noNaN: true }),
        fc.double({ min: 0, max: 0.1, noNaN: true }),
        fc.double({ min: 0, max: 0.01, noNaN: true }),
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        fc.double({ min: 0, max: 0.02, noNaN: true }),
        fc.constantFrom(50, 60),
        (h1, extra, sigma, b, mains, f) => {
          const lo = chatterRatePerHour({ hysteresisVolts: h1, rmsVolts: sigma, bandwidthHz: b, mainsPeakVolts: mains, mainsFrequencyHz: f });
          const hi = chatterRatePerHour({ hysteresisVolts: h1 + extra, rmsVolts: sigma, bandwidthHz: b, mainsPeakVolts: mains, mainsFrequencyHz: f });
          expect(hi).toBeLessThanOrEqual(lo);
        },
      ),
      { numRuns: 500 },
    );
  });

  it("the hysteresis returned meets the chatter target exactly (inverse of the rate)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 0.01, noNaN: true }),
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        fc.double({ min: 1e-4, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 0.02, noNaN: true }),
        (sigma, b, target, mains) => {
          const h = hysteresisForChatterVolts({ rmsVolts: sigma, bandwidthHz: b, targetPerHour: target, mainsPeakVolts: mains });
          const rate = chatterRatePerHour({ hysteresisVolts: h * (1 + 1e-12) + 1e-300, rmsVolts: sigma, bandwidthHz: b, mainsPeakVolts: mains });
          expect(rate).toBeLessThanOrEqual(target * (1 + 1e-6));
          expect(chatterRatePerHour({ hysteresisVolts: h * 0.99, rmsVolts: sigma, bandwidthHz: b, mainsPeakVolts: mains })).toBeGreaterThan(target);
        },
      ),
      { numRuns: 300 },
    );
  });
});

describe("noise inputs and mains pickup", () => {
  it("white noise σ = density·√B (definition of a one-sided density)", () => {
    expect(whiteNoiseRmsVolts({ kind: "density", densityVoltsPerRootHertz: 20e-9, bandwidthHz: 10_000 })).toBeCloseTo(2e-6, 15);
    expect(whiteNoiseRmsVolts({ kind: "rms", rmsVolts: 3e-4, bandwidthHz: 10 })).toBe(3e-4);
  });

  it("mains pickup after first-order lags: |H(j2πf)| = 1/√(1 + (2πfτ)²) per stage (textbook circuit theory)", () => {
    const tau = 0.01;
    const w = 2 * Math.PI * 60 * tau;
    expect(mainsPickupPeakVolts({ amplitudeVolts: 1, frequencyHz: 60, timeConstantsSeconds: [tau] })).toBeCloseTo(1 / Math.sqrt(1 + w * w), 15);
    expect(mainsPickupPeakVolts({ amplitudeVolts: 2, frequencyHz: 50, timeConstantsSeconds: [] })).toBe(2);
    // two stages multiply: 10 kΩ / 1 µF (τ = 10 ms) then a 10 Hz amplifier
    const t2 = 1 / (2 * Math.PI * 10);
    const expected = 1 / Math.sqrt(1 + (2 * Math.PI * 50 * 0.01) ** 2) / Math.sqrt(1 + (50 / 10) ** 2);
    expect(mainsPickupPeakVolts({ amplitudeVolts: 1, frequencyHz: 50, timeConstantsSeconds: [0.01, t2] })).toBeCloseTo(expected, 14);
  });

  it("tripNoiseFigures: false-trip rate from the distance to the band's low edge less the mains peak, hysteresis from the chatter target", () => {
    const model = {
      runaway: { kind: "constantRate" as const, rateCPerSecond: 1 },
      signalPath: { kind: "analog" as const, inputFilter: { resistanceOhms: 10_000, capacitanceFarads: 1e-6 } },
      noise: { sensitivityVoltsPerC: 0.002, white: { kind: "density" as const, densityVoltsPerRootHertz: 1e-4, bandwidthHz: 100 }, mainsPickup: { amplitudeVolts: 0.01, frequencyHz: 50 as const }, chatterTargetPerHour: 0.1 },
    };
    const f = tripNoiseFigures(model, { maxNormalOperatingC: 960, bandLowEdgeC: 965 });
    const sigma = 1e-4 * 10;
    const mains = 0.01 / Math.sqrt(1 + (2 * Math.PI * 50 * 0.01) ** 2);
    const u = 5 * 0.002 - mains;
    expect(f.rmsVolts).toBeCloseTo(sigma, 15);
    expect(f.mainsPeakVolts).toBeCloseTo(mains, 15);
    expect(f.falseTripDistanceVolts).toBeCloseTo(u, 15);
    expect(f.falseTripsPerHour as number).toBeCloseTo(3600 * (100 / Math.sqrt(3)) * Math.exp(-(u * u) / (2 * sigma * sigma)), 10);
    expect(f.hysteresisNeededVolts).toBeCloseTo(mains + sigma * Math.sqrt(2 * Math.log(100 / Math.sqrt(3) / (0.1 / 3600))), 14);
    expect(f.hysteresisNeededC).toBeCloseTo(f.hysteresisNeededVolts / 0.002, 12);
    expect(f.deterministicFalseTrip).toBe(false);
    const close = tripNoiseFigures(model, { maxNormalOperatingC: 960, bandLowEdgeC: 960.5 });
    expect(close.deterministicFalseTrip).toBe(true);
    expect(close.falseTripsPerHour).toBeNull();
  });
});
