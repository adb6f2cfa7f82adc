import { describe, expect, it } from "vitest";
import { checkDynamics, dynamicsCheckJson, runawayChartSvg, type DynamicsModel } from "../../src/dynamics/index.js";

// An invented demo: a glass-annealing lehr zone with a sheathed probe in a well and a firmware trip.
const lehr: DynamicsModel = {
  runaway: { kind: "heaterPower", heaterWatts: 6000, loadCapacityJoulesPerK: 90_000, lossWattsPerK: 8, ambientC: 30, element: { capacityJoulesPerK: 4000, couplingWattsPerK: 60 } },
  sensor: { kind: "twoLags", wellTimeConstantSeconds: 25, probeTimeConstantSeconds: 6 },
  signalPath: { kind: "firmware", inputFilter: { resistanceOhms: 10_000, capacitanceFarads: 10e-6 }, samplePeriodSeconds: 0.25, digitalFilter: { kind: "movingAverage", samples: 8 }, debounceSamples: 3 },
  outputStages: [{ kind: "solidStateRelay", mainsFrequencyHz: 50 }, { kind: "deEnergiseDelay", delaySeconds: 0.02 }],
  noise: { sensitivityVoltsPerC: 0.0021, white: { kind: "density", densityVoltsPerRootHertz: 50e-6, bandwidthHz: 16 }, mainsPickup: { amplitudeVolts: 0.02, frequencyHz: 50 }, chatterTargetPerHour: 0.01 },
};

describe("report pieces", () => {
  const check = checkDynamics({
    model: lehr,
    maxNormalOperatingC: 560,
    hazardLimitC: 610,
    bandLowEdgeC: 572,
    thresholds: [
      { name: "slowest unit (band high edge)", tripTemperatureC: 588 },
      { name: "nominal", tripTemperatureC: 580 },
    ],
  });

  it("the JSON figures round-trip through JSON.stringify with every figure a field (project rule: a figure in a report is a field in its JSON)", () => {
    const json = dynamicsCheckJson(check, { includeSeries: true });
    expect(JSON.parse(JSON.stringify(json))).toEqual(json);
    const c = json.cases[0];
    expect(c?.peakTrueC).toBe(check.cases[0]?.response.peakTrueC);
    expect(c?.responseTimeSeconds).toBe(check.cases[0]?.response.responseTimeSeconds);
    expect(c?.series?.timeSeconds.length).toBe(check.cases[0]?.response.series.timeSeconds.length);
    expect(json.noise?.hysteresisNeededC).toBe(check.noise?.hysteresisNeededC);
    expect(json.verdictUses).toBe("dynamic peak");
    // the slowest unit trips later and peaks higher than the nominal one
    expect(check.cases[0]?.response.peakTrueC as number).toBeGreaterThan(check.cases[1]?.response.peakTrueC as number);
    expect(check.highestPeakTrueC).toBe(check.cases[0]?.response.peakTrueC);
    expect(check.passes).toBe(check.smallestDynamicMarginC > 0);
  });

  it("the chart marks the crossing, decision, heat off and peak against the trip point and hazard limit, and carries the caution", () => {
    const svg = runawayChartSvg(check.cases[0]!.response, { title: "Lehr zone 2 (demo)" });
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg.trimEnd().endsWith("</svg>")).toBe(true);
    for (const text of ["true crossing", "trip decided", "heat off", "peak ", "hazard limit 610 °C", "trip 588 °C", "filtered (firmware)", "do not certify a safety function"]) expect(svg).toContain(text);
    expect(svg).not.toMatch(/NaN|undefined|Infinity/);
    // every opened element is closed
    const opened = (svg.match(/<(svg|text|path|line|rect|circle)\b/g) ?? []).length;
    const closed = (svg.match(/<\/(svg|text)>|\/>/g) ?? []).length;
    expect(closed).toBe(opened);
  });
});
