/**
 * Regressions found by tests/contract: options that are not objects, a bandwidth so small that 1/(2πf) overflows,
 * and a time so long that the matrix exponential's scaling would never end (it hung) are typed errors.
 */
import { describe, expect, it } from "vitest";
import {
  amplifierTimeConstantSeconds,
  chatterRatePerHour,
  firstOrderRampLagC,
  hysteresisForChatterVolts,
  iirRampDelaySeconds,
  isHotjunctionError,
  mainsPickupPeakVolts,
  movingAverageRampDelaySeconds,
  rampLagThroughLagsC,
  riceUpCrossingRatePerSecond,
  simulateRunaway,
} from "../../src/index.js";

function thrown(call: () => unknown): unknown {
  try {
    call();
  } catch (e) {
    return e;
  }
  return undefined;
}

describe("dynamics formulas refuse what they cannot compute", () => {
  const optionFunctions = { chatterRatePerHour, firstOrderRampLagC, hysteresisForChatterVolts, iirRampDelaySeconds, mainsPickupPeakVolts, movingAverageRampDelaySeconds, rampLagThroughLagsC, riceUpCrossingRatePerSecond } as Record<string, (o: unknown) => unknown>;
  it.each(Object.keys(optionFunctions))("%s: undefined, null or a number as options is a typed error", (name) => {
    for (const bad of [undefined, null, 3]) {
      const e = thrown(() => optionFunctions[name]!(bad));
      expect(isHotjunctionError(e), `${name}(${String(bad)}): ${String(e)}`).toBe(true);
      expect((e as Error).message).toMatch(/options/);
    }
  });

  it("a bandwidth whose time constant overflows (1e-320 Hz) is OVERFLOW, not Infinity", () => {
    const e = thrown(() => amplifierTimeConstantSeconds(1e-320));
    expect(isHotjunctionError(e)).toBe(true);
    expect((e as { code: string }).code).toBe("OVERFLOW");
    // τ = 1/(2πf) (single-pole amplifier, textbook electronics) is still finite at 1e-300 Hz
    expect(amplifierTimeConstantSeconds(1e-300)).toBe(1 / (2 * Math.PI * 1e-300));
  });

  it("a ramp lag at 1e308 s returns or throws typed, at once (it looped forever)", () => {
    const start = performance.now();
    const e = thrown(() => rampLagThroughLagsC({ rateCPerSecond: 1, timeConstantsSeconds: [20, 5], timeSeconds: 1e308 }));
    expect(e === undefined || isHotjunctionError(e), String(e)).toBe(true);
    expect(performance.now() - start).toBeLessThan(5000);
    // and it is the steady state R·Στ, not the digits an exponential of 1e308 s loses (it gave 3.6e293 °C)
    expect(rampLagThroughLagsC({ rateCPerSecond: 1, timeConstantsSeconds: [20, 5], timeSeconds: 1e308 })).toBeCloseTo(25, 6);
    // first-order lags in series on a ramp settle to rate × Στ (textbook control: steady-state ramp error)
    expect(rampLagThroughLagsC({ rateCPerSecond: 1, timeConstantsSeconds: [20, 5], timeSeconds: 400 })).toBeCloseTo(25, 6);
  });

  it("a heater element coupled 1e20 W/K (a time constant of femtoseconds) is refused at once (it hung the worker)", () => {
    const model = (couplingWattsPerK: number) => ({
      runaway: { kind: "heaterPower", heaterWatts: 6000, loadCapacityJoulesPerK: 90_000, lossWattsPerK: 8, ambientC: 30, element: { capacityJoulesPerK: 4000, couplingWattsPerK } },
      sensor: { kind: "firstOrder", timeConstantSeconds: 8 },
    }) as never;
    const scenario = { startC: 560, tripTemperatureC: 580, hazardLimitC: 600 };
    for (const k of [1e20, 1e308]) {
      const start = performance.now();
      const e = thrown(() => simulateRunaway(model(k), scenario));
      expect(isHotjunctionError(e), String(e)).toBe(true);
      expect((e as Error).message).toMatch(/element coupling \/ element capacity .* 1\/s is faster than any heated load .*; valid range 0 to 1000000 1\/s/);
      expect(performance.now() - start).toBeLessThan(5000);
    }
    // a real coupling still simulates: the heat reaches the load (true temperature rises past the trip point)
    expect(simulateRunaway(model(60), scenario).peakTrueC).toBeGreaterThan(580);
  });
});
