import { describe, expect, it } from "vitest";
import { HotjunctionRangeError, HotjunctionTypeError } from "../../src/errors.js";
import { checkDynamics, riceUpCrossingRatePerSecond, runawayChartSvg, simulateRunaway, type DynamicsModel } from "../../src/dynamics/index.js";

const scenario = { startC: 100, tripTemperatureC: 150, hazardLimitC: 200 };
const ramp = { kind: "constantRate" as const, rateCPerSecond: 1 };
const bad = (model: unknown) => () => simulateRunaway(model as DynamicsModel, scenario);

describe("typed errors name the quantity, the value and the valid range (project error contract)", () => {
  it.each([
    ["negative rate", { runaway: { kind: "constantRate", rateCPerSecond: -1 } }, HotjunctionRangeError, /runaway rate \(rateCPerSecond\) -1 °C\/s is not above zero; valid range/],
    ["NaN rate", { runaway: { kind: "constantRate", rateCPerSecond: Number.NaN } }, HotjunctionTypeError, /rateCPerSecond\) NaN .*not a finite number/],
    ["unknown runaway kind", { runaway: { kind: "steam" } }, HotjunctionRangeError, /runaway kind "steam" is not a valid choice; valid: constantRate, heaterPower/],
    ["negative sensor τ", { runaway: ramp, sensor: { kind: "firstOrder", timeConstantSeconds: -2 } }, HotjunctionRangeError, /sensor time constant \(timeConstantSeconds\) -2 s is out of range; valid range 0 to/],
    ["string response time", { runaway: ramp, sensor: { kind: "responseTime", responseTime632Seconds: "8" } }, HotjunctionTypeError, /responseTime632Seconds\) "8" is not a finite number/],
    ["zero amplifier bandwidth", { runaway: ramp, signalPath: { kind: "analog", amplifierBandwidthHz: 0 } }, HotjunctionRangeError, /amplifier bandwidth \(amplifierBandwidthHz\) 0 Hz is not above zero/],
    ["fractional moving average", { runaway: ramp, signalPath: { kind: "firmware", samplePeriodSeconds: 0.1, digitalFilter: { kind: "movingAverage", samples: 2.5 } } }, HotjunctionRangeError, /moving-average length \(samples\) 2.5 is not an integer; valid range 1 to 100000/],
    ["IIR coefficient above 1", { runaway: ramp, signalPath: { kind: "firmware", samplePeriodSeconds: 0.1, digitalFilter: { kind: "firstOrderIir", coefficient: 1.5 } } }, HotjunctionRangeError, /IIR coefficient \(coefficient\) 1.5 is not in \(0, 1\]/],
    ["zero sample period", { runaway: ramp, signalPath: { kind: "firmware", samplePeriodSeconds: 0 } }, HotjunctionRangeError, /sample period \(samplePeriodSeconds\) 0 s is not above zero/],
    ["SSR at 55 Hz", { runaway: ramp, outputStages: [{ kind: "solidStateRelay", mainsFrequencyHz: 55 }] }, HotjunctionRangeError, /output stage 0 mains frequency \(mainsFrequencyHz\) 55 Hz is not a mains frequency; valid: 50, 60/],
    ["negative relay release", { runaway: ramp, outputStages: [{ kind: "relay", releaseTimeSeconds: -0.01 }] }, HotjunctionRangeError, /output stage 0 release time \(releaseTimeSeconds\) -0.01 s is out of range; valid range 0 to/],
    ["element without coupling", { runaway: { kind: "heaterPower", heaterWatts: 100, loadCapacityJoulesPerK: 10, lossWattsPerK: 1, ambientC: 20, element: { capacityJoulesPerK: 5, couplingWattsPerK: 0 } } }, HotjunctionRangeError, /element coupling \(couplingWattsPerK\) 0 W\/K is not above zero/],
    ["output stages not an array", { runaway: ramp, outputStages: { kind: "relay" } }, HotjunctionTypeError, /output stages \(outputStages\) a value of type object is not an array/],
  ])("%s", (_, model, kind, message) => {
    expect(bad(model)).toThrow(kind);
    expect(bad(model)).toThrow(message);
  });

  it("a trip point at or below the start temperature is refused with the start as the minimum", () => {
    expect(() => simulateRunaway({ runaway: ramp }, { startC: 100, tripTemperatureC: 100, hazardLimitC: 200 })).toThrow(
      /trip temperature \(tripTemperatureC\) 100 °C is not above the start temperature .*; valid range 100 to Infinity °C/,
    );
  });

  it("checkDynamics refuses an empty threshold list, and the noise and chart helpers refuse bad numbers", () => {
    expect(() => checkDynamics({ model: { runaway: ramp }, maxNormalOperatingC: 100, hazardLimitC: 200, thresholds: [] })).toThrow(HotjunctionTypeError);
    expect(() => riceUpCrossingRatePerSecond({ levelVolts: 0, rmsVolts: 0.001, bandwidthHz: 0 })).toThrow(/noise bandwidth \(bandwidthHz\) 0 Hz is not above zero/);
    expect(() => riceUpCrossingRatePerSecond({ levelVolts: 0, rmsVolts: -1, bandwidthHz: 10 })).toThrow(HotjunctionRangeError);
    const r = simulateRunaway({ runaway: ramp }, scenario);
    expect(() => runawayChartSvg(r, { widthPixels: 100 })).toThrow(/chart width \(widthPixels\) 100 px is out of range; valid range 320 to 4000 px/);
  });
});
