import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { simulateRunaway, type DynamicsModel, type OutputStage, type RunawayProcess, type SensorResponse } from "../../src/dynamics/index.js";
import { referenceRunaway } from "./odexReference.js";

// Generated analog designs, kept non-stiff for the explicit reference solver (lags 0.03 s … 30 s).
const processArb: fc.Arbitrary<{ runaway: RunawayProcess; startC: number; tripC: number }> = fc.oneof(
  fc.record({ rate: fc.double({ min: 0.2, max: 5, noNaN: true }), rise: fc.double({ min: 5, max: 60, noNaN: true }) }).map(({ rate, rise }) => ({
    runaway: { kind: "constantRate" as const, rateCPerSecond: rate },
    startC: 300,
    tripC: 300 + rise,
  })),
  fc
    .record({
      power: fc.double({ min: 500, max: 5000, noNaN: true }),
      capacity: fc.double({ min: 1000, max: 20000, noNaN: true }),
      loss: fc.double({ min: 0.5, max: 20, noNaN: true }),
      a: fc.double({ min: 0.1, max: 0.5, noNaN: true }),
      b: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
      element: fc.option(fc.record({ capacityJoulesPerK: fc.double({ min: 100, max: 2000, noNaN: true }), couplingWattsPerK: fc.double({ min: 5, max: 100, noNaN: true }) }), { nil: undefined }),
    })
    .map(({ power, capacity, loss, a, b, element }) => ({
      runaway: { kind: "heaterPower" as const, heaterWatts: power, loadCapacityJoulesPerK: capacity, lossWattsPerK: loss, ambientC: 25, ...(element === undefined ? {} : { element }) },
      startC: 25 + a * (power / loss),
      tripC: 25 + (a + b) * (power / loss),
    })),
);
const sensorArb: fc.Arbitrary<SensorResponse | undefined> = fc.option(
  fc.oneof(
    fc.double({ min: 0.1, max: 30, noNaN: true }).map((t) => ({ kind: "firstOrder" as const, timeConstantSeconds: t })),
    fc.double({ min: 0.1, max: 30, noNaN: true }).map((t) => ({ kind: "responseTime" as const, responseTime632Seconds: t })),
    fc.tuple(fc.double({ min: 0.1, max: 30, noNaN: true }), fc.double({ min: 0.1, max: 10, noNaN: true })).map(([w, p]) => ({ kind: "twoLags" as const, wellTimeConstantSeconds: w, probeTimeConstantSeconds: p })),
  ),
  { nil: undefined },
);
const stageArb: fc.Arbitrary<OutputStage> = fc.oneof(
  fc.double({ min: 0, max: 0.5, noNaN: true }).map((t) => ({ kind: "relay" as const, releaseTimeSeconds: t })),
  fc.constantFrom(50 as const, 60 as const).map((f) => ({ kind: "solidStateRelay" as const, mainsFrequencyHz: f })),
  fc.double({ min: 0, max: 2, noNaN: true }).map((t) => ({ kind: "deEnergiseDelay" as const, delaySeconds: t })),
);
const designArb = fc
  .record({
    process: processArb,
    sensor: sensorArb,
    rcSeconds: fc.option(fc.double({ min: 0.03, max: 2, noNaN: true }), { nil: undefined }),
    bandwidthHz: fc.option(fc.double({ min: 0.1, max: 5, noNaN: true }), { nil: undefined }),
    comparatorDelaySeconds: fc.option(fc.double({ min: 0, max: 0.2, noNaN: true }), { nil: undefined }),
    stages: fc.array(stageArb, { maxLength: 3 }),
  })
  .map(({ process, sensor, rcSeconds, bandwidthHz, comparatorDelaySeconds, stages }) => {
    const model: DynamicsModel = {
      runaway: process.runaway,
      ...(sensor === undefined ? {} : { sensor }),
      signalPath: {
        kind: "analog",
        ...(rcSeconds === undefined ? {} : { inputFilter: { resistanceOhms: 10_000, capacitanceFarads: rcSeconds / 10_000 } }),
        ...(bandwidthHz === undefined ? {} : { amplifierBandwidthHz: bandwidthHz }),
        ...(comparatorDelaySeconds === undefined ? {} : { comparatorDelaySeconds }),
      },
      outputStages: stages,
    };
    return { model, scenario: { startC: process.startC, tripTemperatureC: process.tripC, hazardLimitC: process.tripC + 40 } };
  });

describe("simulateRunaway against a general-purpose ODE integrator (odex, Gragg–Bulirsch–Stoer extrapolation)", () => {
  it("decision time, temperature at heat off and peak agree over generated analog designs", () => {
    fc.assert(
      fc.property(designArb, ({ model, scenario }) => {
        const ours = simulateRunaway(model, scenario, { maxPoints: 50 });
        const ref = referenceRunaway(model, scenario);
        const scale = Math.abs(scenario.startC) + 100;
        expect(ours.tripped).toBe(true);
        expect(Math.abs((ours.decisionSeconds as number) - ref.decisionSeconds)).toBeLessThan(1e-6 * (ref.decisionSeconds + 1));
        expect(Math.abs((ours.heatOffSeconds as number) - ref.heatOffSeconds)).toBeLessThan(1e-6 * (ref.heatOffSeconds + 1));
        expect(Math.abs((ours.trueAtHeatOffC as number) - ref.trueAtHeatOffC)).toBeLessThan(1e-7 * scale);
        expect(Math.abs(ours.peakTrueC - ref.peakTrueC)).toBeLessThan(1e-7 * scale);
      }),
      { numRuns: 40, seed: 14 },
    );
  });
});

describe("properties of the peak", () => {
  it("with every lag and delay zero the peak equals the trip temperature, the static band's edge (to rounding)", () => {
    fc.assert(
      fc.property(processArb, ({ runaway, startC, tripC }) => {
        const model: DynamicsModel = {
          runaway: runaway.kind === "heaterPower" ? { ...runaway, element: undefined as never } : runaway,
          sensor: { kind: "firstOrder", timeConstantSeconds: 0 },
          signalPath: { kind: "analog", inputFilter: { resistanceOhms: 0, capacitanceFarads: 1e-6 }, comparatorDelaySeconds: 0 },
          outputStages: [{ kind: "relay", releaseTimeSeconds: 0 }],
        };
        const clean = JSON.parse(JSON.stringify(model)) as DynamicsModel; // drops the element: no stored heat
        const r = simulateRunaway(clean, { startC, tripTemperatureC: tripC, hazardLimitC: tripC + 10 });
        expect(Math.abs(r.peakTrueC - tripC)).toBeLessThanOrEqual(1e-9 * Math.abs(tripC));
        expect(r.responseTimeSeconds).toBe(0);
        expect(r.decisionSeconds).toBe(r.trueCrossingSeconds);
      }),
      { numRuns: 100 },
    );
  });

  it("a slower sensor, a longer filter or a later output stage never lowers the peak", () => {
    fc.assert(
      fc.property(
        designArb,
        fc.double({ min: 1, max: 3, noNaN: true }),
        fc.constantFrom("sensor", "filter", "output", "firmware") as fc.Arbitrary<"sensor" | "filter" | "output" | "firmware">,
        ({ model, scenario }, factor, which) => {
          let slower: DynamicsModel;
          let base: DynamicsModel = model;
          if (which === "sensor") slower = { ...model, sensor: { kind: "firstOrder", timeConstantSeconds: 5 * factor } };
          else if (which === "filter") slower = { ...model, signalPath: { kind: "analog", inputFilter: { resistanceOhms: 10_000, capacitanceFarads: factor * 1e-4 } } };
          else if (which === "output") slower = { ...model, outputStages: [...(model.outputStages ?? []), { kind: "deEnergiseDelay", delaySeconds: factor - 1 }] };
          else {
            base = { ...model, signalPath: { kind: "firmware", samplePeriodSeconds: 0.2, digitalFilter: { kind: "movingAverage", samples: 4 } } };
            slower = { ...model, signalPath: { kind: "firmware", samplePeriodSeconds: 0.2, digitalFilter: { kind: "movingAverage", samples: 4 + Math.round(4 * factor) } } };
          }
          if (which === "sensor") base = { ...model, sensor: { kind: "firstOrder", timeConstantSeconds: 5 } };
          if (which === "filter") base = { ...model, signalPath: { kind: "analog", inputFilter: { resistanceOhms: 10_000, capacitanceFarads: 1e-4 } } };
          const a = simulateRunaway(base, scenario, { maxPoints: 20 });
          const b = simulateRunaway(slower, scenario, { maxPoints: 20 });
          expect(b.peakTrueC).toBeGreaterThanOrEqual(a.peakTrueC - 1e-9 * Math.abs(a.peakTrueC));
          expect(b.responseTimeSeconds as number).toBeGreaterThanOrEqual((a.responseTimeSeconds as number) - 1e-9);
        },
      ),
      { numRuns: 80 },
    );
  });

  it("the heater element's stored heat raises the peak after heat off and delays it (energy balance)", () => {
    const base = { kind: "heaterPower" as const, heaterWatts: 3000, loadCapacityJoulesPerK: 2000, lossWattsPerK: 2, ambientC: 25 };
    const scenario = { startC: 260, tripTemperatureC: 280, hazardLimitC: 320 };
    const bare = simulateRunaway({ runaway: base }, scenario);
    const withElement = simulateRunaway({ runaway: { ...base, element: { capacityJoulesPerK: 300, couplingWattsPerK: 20 } } }, scenario);
    expect(bare.peakTrueC).toBeCloseTo(280, 9);
    expect(withElement.peakTrueC).toBeGreaterThan(280.5);
    expect(withElement.peakSeconds as number).toBeGreaterThan(withElement.heatOffSeconds as number);
  });
});
