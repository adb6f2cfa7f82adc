// tripDynamics: the per-setpoint fold-in of the response time, checked against closed forms, the ITS-90 tables,
// and its error paths.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { HotjunctionRangeError, HotjunctionTypeError } from "../../src/errors.js";
import { seebeckCoefficient } from "../../src/its90/convert.js";
import { chainSignalSlope, tripDynamics, type TripDynamicsSetpointInput } from "../../src/trip/index.js";

const setpoint: TripDynamicsSetpointInput = {
  name: "bisque", maxNormalOperatingC: 1000, hazardLimitC: 1060, nominalTripC: 1020, bandLowC: 1012, bandHighC: 1028, lowSidePass: true, staticPass: true,
};

/** Time at which a ramp R from S through one first-order lag τ shows `level`: S + R·(t − τ(1 − e^(−t/τ))) = level. */
function indicatedCrossing(rate: number, tau: number, rise: number): number {
  let lo = 0;
  let hi = rise / rate + 50 * tau + 1;
  for (let k = 0; k < 200; k++) {
    const mid = (lo + hi) / 2;
    if (rate * (mid - tau * (1 - Math.exp(-mid / tau))) < rise) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

describe("tripDynamics", () => {
  it("a constant-rate runaway through one first-order sensor peaks where the closed form says, for both units (ramp through a first-order lag: R·τ(1 − e^(−t/τ)), textbook control theory; 100 cases)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 5, noNaN: true }), fc.double({ min: 0.1, max: 40, noNaN: true }), fc.double({ min: 0, max: 0.5, noNaN: true }), (rate, tau, relay) => {
        const result = tripDynamics({
          model: { runaway: { kind: "constantRate", rateCPerSecond: rate }, sensor: { kind: "firstOrder", timeConstantSeconds: tau }, outputStages: [{ kind: "relay", releaseTimeSeconds: relay }] },
          setpoints: [setpoint],
        });
        const s = result.setpoints[0];
        for (const [k, trip] of [[0, setpoint.bandHighC], [1, setpoint.nominalTripC]] as const) {
          const heatOff = indicatedCrossing(rate, tau, trip - setpoint.maxNormalOperatingC) + relay;
          const peak = setpoint.maxNormalOperatingC + rate * heatOff; // a stated rate holds the load after heat off
          expect(s?.cases[k]?.peakTrueC).toBeCloseTo(peak, 4);
          expect(s?.cases[k]?.dynamicMarginC).toBeCloseTo(setpoint.hazardLimitC - peak, 4);
        }
        expect(s?.timeFromNormalToHazardSeconds).toBeCloseTo(60 / rate, 9);
        expect(s?.dynamicPass).toBe((s?.cases[0]?.peakTrueC as number) < setpoint.hazardLimitC);
        expect(s?.pass).toBe(s?.dynamicPass);
      }),
      { numRuns: 100, seed: 14 },
    );
  });

  it("the low side still comes from the static band: a band touching normal operation fails however fast the trip", () => {
    const result = tripDynamics({ model: { runaway: { kind: "constantRate", rateCPerSecond: 1 } }, setpoints: [{ ...setpoint, lowSidePass: false, staticPass: false }] });
    expect(result.setpoints[0]?.dynamicPass).toBe(true);
    expect(result.setpoints[0]?.pass).toBe(false);
    expect(result.pass).toBe(false);
  });

  it("noise: the slope comes from the setpoint unless stated; the comparator hysteresis is compared in volts; more hysteresis is never worse", () => {
    const noise = { white: { kind: "rms" as const, rmsVolts: 0.001, bandwidthHz: 1000 }, chatterTargetPerHour: 1 };
    const at = (hysteresis: number) =>
      tripDynamics({ model: { runaway: { kind: "constantRate", rateCPerSecond: 1 }, noise }, setpoints: [{ ...setpoint, sensitivityVoltsPerC: 0.002, sensitivitySource: "test" }], comparatorHysteresisVolts: hysteresis }).setpoints[0]?.noise;
    const needed = at(0)?.hysteresisNeededVolts as number;
    // H = σ·√(2·ln(B/(√3·ν))) for band-limited white noise (Rice, 1944/1945), ν = 1/h
    expect(needed).toBeCloseTo(0.001 * Math.sqrt(2 * Math.log(1000 / (Math.sqrt(3) * (1 / 3600)))), 12);
    expect(at(needed * 0.99)?.hysteresisSufficient).toBe(false);
    expect(at(needed * 1.01)?.hysteresisSufficient).toBe(true);
    expect(at(0.01)?.designHysteresisC).toBeCloseTo(5, 12);
    expect(at(0.01)?.sensitivitySource).toBe("test");
    const stated = tripDynamics({ model: { runaway: { kind: "constantRate", rateCPerSecond: 1 }, noise: { ...noise, sensitivityVoltsPerC: 0.004 } }, setpoints: [{ ...setpoint, sensitivityVoltsPerC: 0.002 }] });
    expect(stated.setpoints[0]?.noise?.sensitivityVoltsPerC).toBe(0.004);
    expect(stated.setpoints[0]?.noise?.designHysteresisVolts).toBeNull();
  });

  it("precise errors: noise without any slope, a negative hysteresis, no setpoints", () => {
    const noise = { white: { kind: "rms" as const, rmsVolts: 0.001, bandwidthHz: 1000 }, chatterTargetPerHour: 1 };
    expect(() => tripDynamics({ model: { runaway: { kind: "constantRate", rateCPerSecond: 1 }, noise }, setpoints: [setpoint] })).toThrow(HotjunctionTypeError);
    expect(() => tripDynamics({ model: { runaway: { kind: "constantRate", rateCPerSecond: 1 }, noise }, setpoints: [setpoint] })).toThrow(/noise sensitivity \(sensitivityVoltsPerC\) at setpoint "bisque".*is missing/);
    expect(() => tripDynamics({ model: { runaway: { kind: "constantRate", rateCPerSecond: 1 } }, setpoints: [setpoint], comparatorHysteresisVolts: -0.001 })).toThrow(HotjunctionRangeError);
    expect(() => tripDynamics({ model: { runaway: { kind: "constantRate", rateCPerSecond: 1 } }, setpoints: [] })).toThrow(/setpoints .*is not a non-empty array/);
  });
});

describe("chainSignalSlope", () => {
  it("type K at 25 °C: 40.5 µV/°C from the table's 20 and 30 °C entries (NIST Monograph 175 type K: 0.798 and 1.203 mV), × gain", () => {
    const slope = chainSignalSlope({ type: "K", amplifier: { kind: "amplifier", gain: { setBy: "resistors", feedbackOhms: 99_000, groundOhms: 1000, toleranceFraction: 0.001 } } }, 25);
    expect(slope.voltsPerC / 100).toBeCloseTo((1.203 - 0.798) / 10 / 1000, 6);
    expect(slope.voltsPerC).toBe(seebeckCoefficient("K", 25) * 1e-6 * 100);
    expect(slope.source).toBe(`Seebeck coefficient of type K at 25 °C (${seebeckCoefficient("K", 25).toFixed(2)} µV/°C) × gain 100`);
  });

  it("a fixed-scale amplifier gives its stated scale; no amplifier gives the bare Seebeck coefficient", () => {
    expect(chainSignalSlope({ type: "K", amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 } }, 400).voltsPerC).toBe(0.005);
    expect(chainSignalSlope({ type: "N" }, 1000).voltsPerC).toBe(seebeckCoefficient("N", 1000) * 1e-6);
    expect(() => chainSignalSlope({ type: "K" }, 5000)).toThrow(HotjunctionRangeError);
  });
});
