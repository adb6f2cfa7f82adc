/**
 * Bad input: each a typed error of the family (src/errors.ts) with a one-line message naming the path, the value
 * and, where there is one, the valid range (the project's error convention, DEVELOPERS.md).
 */
import { describe, expect, it } from "vitest";
import {
  classifyFaultShift,
  failureDataProblems,
  HotjunctionRangeError,
  HotjunctionTypeError,
  logSpacedHours,
  pfdAvg1oo1,
  pfdAvg1oo2,
  pfdAvgCurve,
  safetyFigures,
  twoChannelCutout,
  validateFailureData,
} from "../../src/index.js";
import { handData, handSetpoint } from "./helpers.js";

function caught(f: () => unknown): Error {
  try {
    f();
  } catch (e) {
    return e as Error;
  }
  throw new Error("did not throw");
}

function oneLine(e: Error, cls: typeof HotjunctionRangeError | typeof HotjunctionTypeError, ...parts: string[]): void {
  expect(e).toBeInstanceOf(cls);
  expect(e.message).not.toContain("\n");
  for (const p of parts) expect(e.message).toContain(p);
}

const el = (over: object) => ({ elements: [{ element: "resistor", rateFit: 10, modes: [{ mode: "open", share: 1, faultId: "a.open" }], ...over }] });

describe("failure data", () => {
  it("negative rate", () => {
    const e = caught(() => validateFailureData(el({ rateFit: -1 })));
    oneLine(e, HotjunctionRangeError, "failureData.elements[0].rateFit -1 FIT", "valid range 0 to 1000000000 FIT");
  });
  it("non-finite rates: NaN, Infinity, a string", () => {
    for (const v of [Number.NaN, Number.POSITIVE_INFINITY, "10"]) {
      oneLine(caught(() => validateFailureData(el({ rateFit: v }))), HotjunctionTypeError, "failureData.elements[0].rateFit", "is not a finite number");
    }
  });
  it("shares that do not sum to one (tolerance stated in the message)", () => {
    const data = { elements: [{ element: "r", rateFit: 1, modes: [{ mode: "open", share: 0.6, faultId: "a.open" }, { mode: "short", share: 0.3, faultId: "a.short" }] }] };
    const e = caught(() => validateFailureData(data));
    oneLine(e, HotjunctionRangeError, "failureData.elements[0].modes[*].share 0.9", "is the sum of the shares, not 1", "valid range 0.9999 to 1.0001");
  });
  it("a share outside [0, 1]", () => {
    const e = caught(() => validateFailureData(el({ modes: [{ mode: "open", share: 1.5, faultId: "a.open" }] })));
    oneLine(e, HotjunctionRangeError, "failureData.elements[0].modes[0].share 1.5", "valid range 0 to 1");
  });
  it("a mode naming a fault that does not exist in the catalogue", () => {
    const e = caught(() => validateFailureData(el({ modes: [{ mode: "open", share: 1, faultId: "divider.resistor7.open" }] }), { faultIds: ["a.open"] }));
    oneLine(e, HotjunctionRangeError, 'failureData.elements[0].modes[0].faultId "divider.resistor7.open" names no fault');
    expect((e as HotjunctionRangeError).code).toBe("UNKNOWN_NAME");
  });
  it("... and through safetyFigures, against the setpoint's review", () => {
    const data = { elements: [...handData.elements, { element: "c", rateFit: 5, modes: [{ mode: "stuck", share: 1, faultId: "c.missing" }] }] };
    oneLine(caught(() => safetyFigures(data, handSetpoint)), HotjunctionRangeError, "failureData.elements[2].modes[0].faultId", "c.missing");
  });
  it("a mode with both or neither of faultId and assumed; a bad assumed class", () => {
    oneLine(caught(() => validateFailureData(el({ modes: [{ mode: "open", share: 1 }] }))), HotjunctionRangeError, "failureData.elements[0].modes[0]", "exactly one of faultId and assumed");
    oneLine(
      caught(() => validateFailureData(el({ modes: [{ mode: "open", share: 1, assumed: { safety: "risky", detected: false } }] }))),
      HotjunctionRangeError,
      "failureData.elements[0].modes[0].assumed.safety",
      "valid: safe, dangerous, degraded, no-effect",
    );
  });
  it("not an object, no elements array, empty modes", () => {
    oneLine(caught(() => validateFailureData(null)), HotjunctionTypeError, "failureData");
    oneLine(caught(() => validateFailureData({ elements: 3 })), HotjunctionTypeError, "failureData.elements");
    oneLine(caught(() => validateFailureData(el({ modes: [] }))), HotjunctionTypeError, "failureData.elements[0].modes");
  });
  it("failureDataProblems lists every problem at once, each with its path", () => {
    const problems = failureDataProblems({
      elements: [
        { element: "", rateFit: -3, modes: [{ mode: "open", share: 0.5, faultId: "nope" }] },
        { element: "b", rateFit: Number.NaN, modes: [{ mode: "x", share: 1, assumed: { safety: "safe", detected: "yes" } }] },
      ],
    }, { faultIds: ["a.open"] });
    expect(problems.map((p) => p.quantity)).toEqual([
      "failureData.elements[0].element",
      "failureData.elements[0].rateFit",
      "failureData.elements[0].modes[0].faultId",
      "failureData.elements[0].modes[*].share",
      "failureData.elements[1].rateFit",
      "failureData.elements[1].modes[0].assumed.detected",
    ]);
  });
});

describe("equations and options", () => {
  const proofTest = { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 };
  it("negative or non-finite λ", () => {
    oneLine(caught(() => pfdAvg1oo1({ lambdaDuFit: -1, lambdaDdFit: 0 }, proofTest)), HotjunctionRangeError, "pfdAvg1oo1: lambdaDuFit -1 FIT");
    oneLine(caught(() => pfdAvg1oo1({ lambdaDuFit: 1, lambdaDdFit: Number.NaN }, proofTest)), HotjunctionTypeError, "pfdAvg1oo1: lambdaDdFit NaN");
    oneLine(caught(() => twoChannelCutout({ lambdaDuFit: 1, lambdaDdFit: 1 }, { lambdaDuFit: -2, lambdaDdFit: 0 }, { beta: 0.1, betaD: 0.1, proofTest })), HotjunctionRangeError, "channelB.lambdaDuFit -2 FIT");
  });
  it("β, β_D outside [0, 1]", () => {
    oneLine(caught(() => pfdAvg1oo2({ lambdaDuFit: 1, lambdaDdFit: 1 }, { beta: 1.2, betaD: 0 }, proofTest)), HotjunctionRangeError, "beta 1.2", "valid range 0 to 1");
    oneLine(caught(() => pfdAvg1oo2({ lambdaDuFit: 1, lambdaDdFit: 1 }, { beta: 0.1, betaD: -0.1 }, proofTest)), HotjunctionRangeError, "betaD -0.1");
  });
  it("proof-test interval not above 0, repair times negative, coverage below 1 without a mission time, mission shorter than T1", () => {
    const r = { lambdaDuFit: 1, lambdaDdFit: 1 };
    oneLine(caught(() => pfdAvg1oo1(r, { ...proofTest, proofTestIntervalHours: 0 })), HotjunctionRangeError, "proofTest.proofTestIntervalHours 0 h");
    oneLine(caught(() => pfdAvg1oo1(r, { ...proofTest, meanTimeToRestorationHours: -8 })), HotjunctionRangeError, "proofTest.meanTimeToRestorationHours -8 h");
    oneLine(caught(() => pfdAvg1oo1(r, { ...proofTest, proofTestCoverage: 0.9 })), HotjunctionRangeError, "proofTest.missionTimeHours", "is required");
    oneLine(caught(() => pfdAvg1oo1(r, { ...proofTest, proofTestCoverage: 0.9, missionTimeHours: 100 })), HotjunctionRangeError, "proofTest.missionTimeHours 100 h", "valid range 8760");
  });
  it("classified faults of a setpoint: a bad safety word, a non-boolean detected flag, an id given twice", () => {
    const bad = (f: object) => ({ name: "s", faults: [{ faultId: "a.open", safety: "safe", detected: true, shiftC: null, marginC: null, ...f }] }) as never;
    oneLine(caught(() => safetyFigures(handData, bad({ safety: "fine" }))), HotjunctionRangeError, 'setpoint.faults[0].safety "fine"', "valid: safe, dangerous, degraded, no-effect");
    oneLine(caught(() => safetyFigures(handData, bad({ detected: "yes" }))), HotjunctionRangeError, 'setpoint.faults[0].detected "yes"');
    const twice = { name: "s", faults: [...handSetpoint.faults, handSetpoint.faults[0] as never] };
    oneLine(caught(() => safetyFigures(handData, twice)), HotjunctionRangeError, 'setpoint.faults[5].faultId "a.open" appears twice');
  });
  it("a revealed fault id the review does not have", () => {
    oneLine(
      caught(() => safetyFigures(handData, handSetpoint, { proofTest, proofTestRevealsFaultIds: ["a.short", "zz"] })),
      HotjunctionRangeError,
      'proofTestRevealsFaultIds[1] "zz" names no fault of the review',
    );
  });
  it("classification limits and curve intervals", () => {
    oneLine(caught(() => classifyFaultShift({ shiftC: 1, healthyBandC: { lowC: 5, highC: 1 }, maxNormalOperatingC: 0, hazardLimitC: 10 })), HotjunctionRangeError, "healthyBandC.lowC 5 °C");
    oneLine(caught(() => classifyFaultShift({ shiftC: 1, healthyBandC: { lowC: 1, highC: 1 }, maxNormalOperatingC: 10, hazardLimitC: 10 })), HotjunctionRangeError, "hazardLimitC 10 °C is not above");
    oneLine(caught(() => classifyFaultShift({ shiftC: Number.NaN, healthyBandC: { lowC: 1, highC: 1 }, maxNormalOperatingC: 0, hazardLimitC: 10 })), HotjunctionTypeError, "shiftC NaN");
    oneLine(caught(() => pfdAvgCurve({ lambdaDuFit: 1, lambdaDdFit: 0 }, { proofTestIntervalsHours: [100, -5], proofTest: { meanTimeToRestorationHours: 8 } })), HotjunctionRangeError, "proofTestIntervalsHours[1] -5 h");
    oneLine(caught(() => logSpacedHours(10, 5, 3)), HotjunctionRangeError, "toHours 5 h");
    oneLine(caught(() => logSpacedHours(10, 50, 2.5)), HotjunctionRangeError, "count 2.5 is not an integer");
  });
});
