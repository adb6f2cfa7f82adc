// The design file's `dynamics` section: bad input gives one line naming the path; the section maps onto the
// library's DynamicsModel; and, through a design file, with every lag zero the dynamic peak equals the static
// trip band's edge (the slowest unit's high edge, the nominal unit's nominal trip).
import { readFileSync } from "node:fs";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { _tripDynamicsOfDesign } from "../../src/designAnalysis/dynamicsOfDesign.js";
import { _tripReportOfDesign } from "../../src/cli/commands/check.js";
import { DesignFileError, dynamicsModelFromDesign, parseDesign, type DesignFile } from "../../src/design/index.js";

const kilnText = readFileSync(new URL("../../examples/ceramic-kiln-cutout.json", import.meta.url), "utf8");
const kiln = JSON.parse(kilnText) as Record<string, any>;
const quietIo = { writeOut: () => undefined, writeErr: () => undefined, stderrIsTty: false, cwd: "." };

function messageOf(change: (d: Record<string, any>) => void): string {
  const copy = structuredClone(kiln);
  change(copy);
  try {
    parseDesign(JSON.stringify(copy), { fileName: "kiln.json" });
  } catch (error) {
    expect(error).toBeInstanceOf(DesignFileError);
    return (error as Error).message;
  }
  throw new Error("expected a DesignFileError");
}

describe("design file: dynamics section", () => {
  it("bad input: one line with the path, the expectation and the value found", () => {
    const cases: [(d: Record<string, any>) => void, string][] = [
      [(d) => (d.dynamics.sensor.wellTimeConstantSeconds = -1), "kiln.json: at dynamics.sensor.wellTimeConstantSeconds: expected a number ≥ 0, found -1"],
      [(d) => (d.dynamics.sensor.extra = 1), 'kiln.json: at dynamics.sensor: unknown key "extra" (keys are case-sensitive; see the JSON Schema)'],
      [(d) => (d.dynamics.outputStages[0] = { kind: "solidStateRelay", mainsFrequencyHz: 55 }), "kiln.json: at dynamics.outputStages[0].mainsFrequencyHz: expected one of 50, 60, found 55"],
      [(d) => (d.dynamics.runaway = { kind: "constantRate" }), "kiln.json: at dynamics.runaway.rateCPerSecond: required key is missing (expected a number)"],
      [(d) => (d.dynamics.noise.chatterTargetPerHour = 0), "kiln.json: at dynamics.noise.chatterTargetPerHour: expected a number > 0, found 0"],
      [(d) => (d.dynamics.runaway.kind = "stuck"), 'kiln.json: at dynamics.runaway.kind: expected one of "constantRate", "heaterPower", found "stuck"'],
      [(d) => (d.dynamics.signalPath = { kind: "firmware", samplePeriodSeconds: 0.1 }), 'kiln.json: at dynamics.signalPath.kind: must be "analog" in a comparator design (the comparator decides the trip)'],
    ];
    for (const [change, message] of cases) {
      const text = messageOf(change);
      expect(text).toBe(message);
      expect(text).not.toMatch(/[\r\n]/);
    }
  });

  it("maps onto the library's DynamicsModel key for key (no undefined members)", () => {
    const design = parseDesign(kilnText);
    const model = dynamicsModelFromDesign(design);
    expect(model).toEqual(kiln["dynamics"]);
    expect(JSON.stringify(model)).toBe(JSON.stringify(kiln["dynamics"]));
    const without = structuredClone(kiln);
    delete without["dynamics"];
    expect(dynamicsModelFromDesign(parseDesign(JSON.stringify(without)))).toBeUndefined();
  });

  it("property: with every lag zero the dynamic peak equals the static band's edge (slowest unit) and the nominal trip (200 generated designs)", () => {
    const base = parseDesign(kilnText);
    // the static report does not depend on the dynamics section: compute it once (worst case decides)
    const report = _tripReportOfDesign(quietIo, base, { acceptanceMethod: "worst-case", coverage: 0.95, trials: 200, seed: 1 });
    const zeroLagPaths = fc.constantFrom<Record<string, unknown>[]>(
      [{}],
      [{ sensor: { kind: "firstOrder", timeConstantSeconds: 0 } }],
      [{ sensor: { kind: "twoLags", wellTimeConstantSeconds: 0, probeTimeConstantSeconds: 0 }, signalPath: { kind: "analog", inputFilter: { resistanceOhms: 0, capacitanceFarads: 1e-6 }, comparatorDelaySeconds: 0 } }],
      [{ sensor: { kind: "responseTime", responseTime632Seconds: 0 }, outputStages: [{ kind: "relay", releaseTimeSeconds: 0 }, { kind: "deEnergiseDelay", delaySeconds: 0 }] }],
    );
    const runaway = fc.oneof(
      fc.record({ kind: fc.constant("constantRate"), rateCPerSecond: fc.double({ min: 0.01, max: 50, noNaN: true }) }),
      fc.record({
        kind: fc.constant("heaterPower"),
        heaterWatts: fc.double({ min: 5000, max: 100_000, noNaN: true }),
        loadCapacityJoulesPerK: fc.double({ min: 1000, max: 1e6, noNaN: true }),
        lossWattsPerK: fc.double({ min: 0, max: 3, noNaN: true }),
        ambientC: fc.double({ min: 0, max: 40, noNaN: true }),
      }),
    );
    fc.assert(
      fc.property(runaway, zeroLagPaths, (r, [lags]) => {
        const text = JSON.stringify({ ...kiln, dynamics: { runaway: r, ...lags } });
        const design: DesignFile = parseDesign(text, { fileName: "zero.json" });
        const result = _tripDynamicsOfDesign(design, report);
        expect(result).toBeDefined();
        result?.setpoints.forEach((s, i) => {
          const staticSetpoint = report.setpoints[i];
          const band = staticSetpoint?.bands.find((b) => b.method === "worst-case");
          expect(s.cases[0]?.peakTrueC).toBeCloseTo(band?.highC as number, 6);
          expect(s.cases[1]?.peakTrueC).toBeCloseTo(staticSetpoint?.nominalTripC as number, 6);
          expect(s.cases[0]?.responseTimeSeconds).toBeCloseTo(0, 9);
          // zero lag: the dynamic verdict is the static one
          expect(s.pass).toBe(staticSetpoint?.pass);
        });
      }),
      { numRuns: 200, seed: 14 },
    );
  });
});
