/**
 * Regressions found by tests/contract: options that are not objects, a bandwidth so small that 1/(2πf) overflows,
 * and a time so long that the matrix exponential's scaling would never end (it hung) are typed errors; a forged
 * response or check given to the renderers is refused by field name; results that leave float64 are OVERFLOW.
 */
import { describe, expect, it } from "vitest";
import {
  amplifierTimeConstantSeconds,
  chatterRatePerHour,
  firstOrderRampLagC,
  hysteresisForChatterVolts,
  iirRampDelaySeconds,
  mainsPickupPeakVolts,
  movingAverageRampDelaySeconds,
  rampLagThroughLagsC,
  riceUpCrossingRatePerSecond,
  checkDynamics,
  dynamicsCheckJson,
  heatedLoadEquilibrium,
  runawayChartSvg,
  simulateRunaway,
  tripNoiseFigures,
  whiteNoiseRmsVolts,
} from "../../src/index.js";
import { typedErrorOf } from "../_typedError.js";

describe("dynamics formulas refuse what they cannot compute", () => {
  const optionFunctions = { chatterRatePerHour, firstOrderRampLagC, hysteresisForChatterVolts, iirRampDelaySeconds, mainsPickupPeakVolts, movingAverageRampDelaySeconds, rampLagThroughLagsC, riceUpCrossingRatePerSecond } as Record<string, (o: unknown) => unknown>;
  it.each(Object.keys(optionFunctions))("%s: undefined, null or a number as options is a typed error", (name) => {
    for (const bad of [undefined, null, 3]) {
      expect(typedErrorOf(() => optionFunctions[name]!(bad)).message, `${name}(${String(bad)})`).toMatch(/options/);
    }
  });

  it("a bandwidth whose time constant overflows (1e-320 Hz) is OVERFLOW, not Infinity", () => {
    expect(typedErrorOf(() => amplifierTimeConstantSeconds(1e-320)).code).toBe("OVERFLOW");
    // τ = 1/(2πf) (single-pole amplifier, textbook electronics) is still finite at 1e-300 Hz
    expect(amplifierTimeConstantSeconds(1e-300)).toBe(1 / (2 * Math.PI * 1e-300));
  });

  it("a ramp lag at 1e308 s returns or throws typed, at once (it looped forever)", () => {
    // It returns (a typed error would fail the steady-state check below as well), at once.
    const start = performance.now();
    const lag = rampLagThroughLagsC({ rateCPerSecond: 1, timeConstantsSeconds: [20, 5], timeSeconds: 1e308 });
    expect(performance.now() - start).toBeLessThan(5000);
    // and it is the steady state R·Στ, not the digits an exponential of 1e308 s loses (it gave 3.6e293 °C)
    expect(lag).toBeCloseTo(25, 6);
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
      expect(typedErrorOf(() => simulateRunaway(model(k), scenario)).message).toMatch(/element coupling \/ element capacity .* 1\/s is faster than any heated load .*; valid range 0 to 1000000 1\/s/);
      expect(performance.now() - start).toBeLessThan(5000);
    }
    // a real coupling still simulates: the heat reaches the load (true temperature rises past the trip point)
    expect(simulateRunaway(model(60), scenario).peakTrueC).toBeGreaterThan(580);
  });

  it("a firmware sample period of 1e308 s is refused by name (the decision time was Infinity)", () => {
    const model = (samplePeriodSeconds: number) =>
      ({ runaway: { kind: "constantRate", rateCPerSecond: 2 }, signalPath: { kind: "firmware", samplePeriodSeconds, digitalFilter: { kind: "movingAverage", samples: 4 } } }) as never;
    const scenario = { startC: 960, tripTemperatureC: 1000, hazardLimitC: 1040 };
    // refused as OVERFLOW (by the step guard or by the decision time), never an Infinity decision
    expect(typedErrorOf(() => simulateRunaway(model(1e308), scenario)).code).toBe("OVERFLOW");
    // a real sample period decides at a finite time after the crossing of 1000 °C at 20 s (2 °C/s from 960 °C)
    const ok = simulateRunaway(model(0.1), scenario);
    expect(ok.decisionSeconds).toBeGreaterThan(20);
    expect(Number.isFinite(ok.decisionSeconds as number)).toBe(true);
  });
});

describe("the dynamics renderers refuse a result that is not one (contract: plain TypeError or NaN in the SVG before)", () => {
  const scenario = { startC: 960, tripTemperatureC: 1000, hazardLimitC: 1040 };
  const response = simulateRunaway({ runaway: { kind: "constantRate", rateCPerSecond: 2 }, sensor: { kind: "firstOrder", timeConstantSeconds: 10 } }, scenario);
  const check = checkDynamics({ model: { runaway: { kind: "constantRate", rateCPerSecond: 2 } }, maxNormalOperatingC: 960, hazardLimitC: 1040, thresholds: [{ name: "nominal", tripTemperatureC: 1000 }] });

  it("runawayChartSvg: no response, a number, a hole in a series, unequal series, a temperature past ±1e6 °C", () => {
    expect(typedErrorOf(() => runawayChartSvg(undefined as never)).quantity).toBe("response");
    expect(typedErrorOf(() => runawayChartSvg(Number.NaN as never)).code).toBe("INVALID_OPTION");
    const holed = [...response.series.indicatedC];
    holed[5] = undefined as never;
    expect(typedErrorOf(() => runawayChartSvg({ ...response, series: { ...response.series, indicatedC: holed } })).quantity).toBe("response.series.indicatedC[5]");
    const short = typedErrorOf(() => runawayChartSvg({ ...response, series: { ...response.series, trueC: response.series.trueC.slice(1) } }));
    expect([short.code, short.quantity]).toEqual(["INVALID_OPTION", "response.series.trueC"]);
    const hot = typedErrorOf(() => runawayChartSvg({ ...response, peakTrueC: 1e308 }));
    expect([hot.code, hot.quantity, hot.min, hot.max]).toEqual(["OUT_OF_RANGE", "response.peakTrueC", -1e6, 1e6]);
    const backwards = [...response.series.timeSeconds];
    backwards[3] = -1;
    expect(typedErrorOf(() => runawayChartSvg({ ...response, series: { ...response.series, timeSeconds: backwards } })).quantity).toBe("response.series.timeSeconds[3]");
    expect(typedErrorOf(() => runawayChartSvg(response, null as never)).quantity).toBe("options");
    expect(typedErrorOf(() => runawayChartSvg(response, { title: 3 as never })).quantity).toBe("title");
    // a marker time far past the series is drawn off the canvas, in finite pixels
    expect(runawayChartSvg({ ...response, heatOffSeconds: 1e308 })).not.toMatch(/NaN|Infinity/);
    // the valid call is unchanged: it still draws the hazard line (the documented example)
    expect(runawayChartSvg(response).includes("hazard limit 1040 °C")).toBe(true);
  });

  it("dynamicsCheckJson: no check, a NaN figure, a forged case, options that are not an object", () => {
    expect(typedErrorOf(() => dynamicsCheckJson(undefined as never)).quantity).toBe("check");
    expect(typedErrorOf(() => dynamicsCheckJson({ ...check, highestPeakTrueC: Number.NaN })).quantity).toBe("check.highestPeakTrueC");
    expect(typedErrorOf(() => dynamicsCheckJson({ ...check, cases: [{ name: "x", response: { ...check.cases[0]!.response, peakTrueC: Number.POSITIVE_INFINITY } }] })).quantity).toBe("check.cases[0].response.peakTrueC");
    expect(typedErrorOf(() => dynamicsCheckJson(check, null as never)).quantity).toBe("options");
    expect(dynamicsCheckJson(check).passes).toBe(true);
  });
});

describe("dynamics formulas whose result leaves float64 are OVERFLOW (contract: returned Infinity before)", () => {
  it("firstOrderRampLagC: τ = 1e308 s computes τ·(1 − e^(−t/τ)) first (≈ rate × t); an overflowing lag is OVERFLOW", () => {
    // first-order lag on a ramp, R·τ·(1 − e^(−t/τ)) (textbook control): for t ≪ τ it is R·t
    expect(firstOrderRampLagC({ rateCPerSecond: 2, timeConstantSeconds: 1e308, timeSeconds: 10 })).toBeCloseTo(20, 10);
    expect(typedErrorOf(() => firstOrderRampLagC({ rateCPerSecond: -1e308, timeConstantSeconds: 10, timeSeconds: 100 })).code).toBe("OVERFLOW");
  });

  it("movingAverageRampDelaySeconds, iirRampDelaySeconds, hysteresisForChatterVolts, whiteNoiseRmsVolts, heatedLoadEquilibrium", () => {
    expect(typedErrorOf(() => movingAverageRampDelaySeconds({ samples: 8, samplePeriodSeconds: 1e308 })).code).toBe("OVERFLOW");
    const iir = typedErrorOf(() => iirRampDelaySeconds({ coefficient: 1e-320, samplePeriodSeconds: 0.25 }));
    expect([iir.code, iir.quantity]).toEqual(["OVERFLOW", "filter coefficient (coefficient)"]);
    expect(typedErrorOf(() => hysteresisForChatterVolts({ rmsVolts: 1e308, bandwidthHz: 100, targetPerHour: 0.1 })).code).toBe("OVERFLOW");
    // Rice: h = σ·√(2 ln(B/√3 / target)) (S. O. Rice 1944/1945); the ratio past float64 is taken in logarithms
    const h = hysteresisForChatterVolts({ rmsVolts: 1e-3, bandwidthHz: 1e308, targetPerHour: 0.1 });
    expect(h).toBeCloseTo(1e-3 * Math.sqrt(2 * (Math.log(1e308 / Math.sqrt(3)) - Math.log(0.1 / 3600))), 12);
    expect(typedErrorOf(() => whiteNoiseRmsVolts({ kind: "density", densityVoltsPerRootHertz: 1e308, bandwidthHz: 100 })).code).toBe("OVERFLOW");
    const eq = typedErrorOf(() => heatedLoadEquilibrium({ kind: "heaterPower", heaterWatts: 6000, loadCapacityJoulesPerK: 90_000, lossWattsPerK: 1e-320, ambientC: 30 }));
    expect([eq.code, eq.quantity]).toEqual(["OVERFLOW", "loss to ambient (lossWattsPerK)"]);
  });

  it("mainsPickupPeakVolts: time constants that are not an array, or hold a hole, are typed errors", () => {
    for (const bad of [1e15, null, undefined]) {
      expect(typedErrorOf(() => mainsPickupPeakVolts({ amplitudeVolts: 1, frequencyHz: 50, timeConstantsSeconds: bad as never })).quantity).toBe("time constants (timeConstantsSeconds)");
    }
    // eslint-disable-next-line no-sparse-arrays
    expect(typedErrorOf(() => mainsPickupPeakVolts({ amplitudeVolts: 1, frequencyHz: 50, timeConstantsSeconds: [0.01, , 0.02] as never })).quantity).toBe("time constant 1 (timeConstantsSeconds)");
  });

  it("tripNoiseFigures: missing options, a subnormal sensitivity or chatter target, a 1e308 Hz bandwidth", () => {
    const model = (noise: object) => ({
      runaway: { kind: "constantRate" as const, rateCPerSecond: 1 },
      noise: { sensitivityVoltsPerC: 0.002, white: { kind: "density" as const, densityVoltsPerRootHertz: 1e-4, bandwidthHz: 100 }, chatterTargetPerHour: 0.1, ...noise },
    });
    const limits = { maxNormalOperatingC: 960, bandLowEdgeC: 965 };
    for (const bad of [undefined, null]) expect(typedErrorOf(() => tripNoiseFigures(model({}), bad as never)).quantity).toBe("options");
    const s = typedErrorOf(() => tripNoiseFigures(model({ sensitivityVoltsPerC: 1e-320 }), limits));
    expect([s.code, s.quantity]).toEqual(["OVERFLOW", "sensitivity (sensitivityVoltsPerC)"]);
    // a subnormal chatter target needs a finite hysteresis: ln(B/√3 / target) stays about 740
    expect(Number.isFinite(tripNoiseFigures(model({ chatterTargetPerHour: 1e-320 }), limits).hysteresisNeededVolts)).toBe(true);
    const b = typedErrorOf(() => tripNoiseFigures(model({ white: { kind: "rms", rmsVolts: 1e-3, bandwidthHz: 1e308 } }), { maxNormalOperatingC: 960, bandLowEdgeC: 960.5 }));
    expect([b.code, b.quantity]).toEqual(["OVERFLOW", "noise bandwidth (bandwidthHz)"]);
  });
});
