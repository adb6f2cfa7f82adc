/**
 * The worst case takes the thermocouple tolerance where the chain trips, not at the setpoint (regression of the
 * audit case: type K class 2 near 330 °C, where the tolerance changes from ±2.5 °C to ±0.0075·|t| at 333.3 °C,
 * IEC 60584-1:2013 Table 1 class 2). The high edge is a fixed point: the chain with the tolerance taken at the
 * edge trips exactly there, and it lies above the edge with the tolerance taken at the setpoint.
 */
import { describe, expect, it } from "vitest";
import { designTrip, propagate, tripTemperatureModel } from "../../src/index.js";
import type { MeasurementChain, TripDesign } from "../../src/index.js";

const design = {
  setpoints: [{ name: "oven guard", tripTemperatureC: 330, maxNormalOperatingC: 300, hazardLimitC: 360 }],
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
  amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5, accuracyC: 2 },
  comparator: { kind: "comparator", offsetMillivolts: 5, hysteresisMillivolts: 20, hysteresisPlacement: "below" },
  reference: { kind: "element", name: "2.5 V series reference", element: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.002 } },
  resistors: { series: "E96", toleranceFraction: 0.01, minTotalOhms: 10000, maxTotalOhms: 100000 },
  ambient: { minC: 25, maxC: 25 },
} as unknown as TripDesign;

function chainWith(tolerance: MeasurementChain["thermocouple"]["tolerance"], resistorsOhms: readonly number[]): MeasurementChain {
  return {
    thermocouple: { kind: "thermocouple", type: "K", tolerance },
    amplifier: design.amplifier,
    reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.002 },
    divider: { kind: "divider", resistorsOhms, toleranceFraction: 0.01 },
    detector: design.comparator,
    ambient: design.ambient,
  } as unknown as MeasurementChain;
}

describe("self-consistent worst case", () => {
  it("type K class 2 near 330 °C: the high edge is where the tolerance is taken, above the setpoint-tolerance edge", () => {
    const result = designTrip(design, { monteCarloTrials: 500 });
    const sp = result.setpoints[0]!;
    const high = sp.worstCase.highC;
    expect(high).toBeGreaterThan(1000 / 3); // beyond 333.3 °C, where class 2 grows with temperature
    expect(sp.worstCase.toleranceAtHighC).toBeCloseTo(high, 6);
    const resistors = result.networks[0]!.resistorsOhms;
    // The chain with the class 2 tolerance at the edge (0.0075·t, stated as a custom ±°C) trips at the edge.
    const atEdge = tripTemperatureModel(chainWith({ standard: "custom", toleranceC: 0.0075 * high }, resistors), 0);
    const edge = propagate(atEdge.model, atEdge.inputs, { method: "worst-case" }).interval[1];
    expect(Math.abs(edge - high)).toBeLessThan(1e-6);
    // With the tolerance at the setpoint (±2.5 °C), the edge is lower by about 0.0075·high − 2.5 °C.
    const atSetpoint = tripTemperatureModel(chainWith({ standard: "custom", toleranceC: 2.5 }, resistors), 0);
    const old = propagate(atSetpoint.model, atSetpoint.inputs, { method: "worst-case" }).interval[1];
    expect(high - old).toBeGreaterThan(0.01);
    expect(high - old).toBeCloseTo(0.0075 * high - 2.5, 3);
  });
});
