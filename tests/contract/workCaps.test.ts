/**
 * Work caps (issue 12): a call that would run for hours is refused at once with an OUT_OF_RANGE error naming the
 * product of its work and the limit (10⁹ model evaluations, the Monte Carlo engine's cap), before any work starts;
 * evaluateChain refuses more than 10,000 temperatures. Precise errors, common practice, no source.
 */
import { describe, expect, it } from "vitest";
import { compareReferences, designTrip, evaluateChain, resistorPositionNames, type TripDesign } from "../../src/index.js";
import { run } from "../cli/helpers.js";
import { projectRoot } from "../cli/helpers.js";
import { join } from "node:path";

function thrown(call: () => unknown): { code?: string; message: string; name: string } {
  try {
    call();
  } catch (e) {
    return e as { code?: string; message: string; name: string };
  }
  throw new Error("expected an error");
}

const chain = {
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
  amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5, trimmedMicrovoltsPerC: 40.96 },
  reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
  detector: { kind: "comparator" },
  ambient: { minC: 25, maxC: 25 },
} as const;

const design: TripDesign = {
  setpoints: [
    { name: "glaze", tripTemperatureC: 400, maxNormalOperatingC: 385, hazardLimitC: 420 },
    { name: "bisque", tripTemperatureC: 300, maxNormalOperatingC: 285, hazardLimitC: 320 },
  ],
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
  amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
  comparator: { kind: "comparator", offsetMillivolts: 2 },
  reference: { kind: "ideal", name: "any", nominalVolts: 5 },
  resistors: { series: "E96", toleranceFraction: 0.001 },
  ambient: { minC: 20, maxC: 30 },
} as TripDesign;

describe("work caps", () => {
  it("evaluateChain refuses more than 10,000 temperatures, and temperatures × trials above 10⁹", () => {
    const many = thrown(() => evaluateChain(chain, Array.from({ length: 10_001 }, () => 100)));
    expect(many.code).toBe("OUT_OF_RANGE");
    expect(many.message).toMatch(/number of hot-junction temperatures 10001 is more than one call evaluates; valid range 0 to 10000/);
    const work = thrown(() => evaluateChain(chain, Array.from({ length: 2000 }, () => 100), { methods: ["monte-carlo"], trials: 1_000_000 }));
    expect(work.message).toMatch(/temperatures × trials 2000000000 is more work than one call may do \(2000 temperatures × 1000000 trials\); use fewer; valid range 0 to 1000000000/);
  });

  it("designTrip refuses setpoints × trials above 10⁹; compareReferences setpoints × options × 2 × trials", () => {
    const trip = thrown(() => designTrip(design, { monteCarloTrials: 1e9 }));
    expect(trip.message).toMatch(/designTrip: setpoints × trials 2000000000 is more work than one call may do \(2 setpoints × 1000000000 trials\)/);
    const options = [
      { kind: "element", name: "a", element: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 } },
      { kind: "element", name: "b", element: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: 0.001 } },
      { kind: "element", name: "c", element: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001 } },
    ] as const;
    const compared = thrown(() => compareReferences(design, options as never, { monteCarloTrials: 1e8 }));
    expect(compared.message).toMatch(/compareReferences: setpoints × reference options × 2 × trials 1200000000 is more work than one call may do \(2 setpoints × 6 reference options × 2 × 100000000 trials\)/);
    // options that are not an object are refused (they used to run 100,000 default trials per setpoint)
    expect(thrown(() => designTrip(design, 0 as never)).message).toMatch(/designTrip: options 0 is not an options object/);
  });

  it("resistorPositionNames refuses a count it cannot name (it allocated without end for 1439533727)", () => {
    expect(thrown(() => resistorPositionNames(1_439_533_727)).message).toMatch(/resistor count 1439533727 is out of range; valid range 1 to 1000/);
    expect(thrown(() => resistorPositionNames(2.5)).message).toMatch(/is not an integer/);
    expect(resistorPositionNames(1)).toEqual(["top"]);
  });

  it("sweep refuses points × trials above 10⁹, naming the product and the limit", async () => {
    const r = await run(["sweep", join(projectRoot, "examples/heated-enclosure-adc.json"), "--from", "0", "--to", "200", "--step", "0.1", "--trials", "1000000", "--json"]);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(/2001 points × 1000000 trials = 2001000000 model evaluations, is above the limit of 1000000000/);
  });
});
