/**
 * Entry guards found by the contract test (contract.test.ts, issue 12), each held by a precise error here so the
 * default suite keeps them beside the contract test (which runs in the default suite too). Common practice, no source:
 * the contract is the README's promise (typed error naming the quantity, the value and the valid range).
 */
import { describe, expect, it } from "vitest";
import { ageingBandAt, compareReferences, failureDataProblems, pfdAvgCurve, validateFailureData } from "../../src/index.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../../src/errors.js";
import { pfdAvgChartSvg } from "../../src/report/index.js";

const curve = pfdAvgCurve({ name: "kiln", lambdaDuFit: 225, lambdaDdFit: 0 }, { // invented rates (demo)
  proofTestIntervalsHours: [730, 8760, 87600], proofTest: { meanTimeToRestorationHours: 8 }, pair: { beta: 0.05, betaD: 0.02 } });
const chart = { title: "PFDavg", curves: [curve], statedIntervalHours: 8760, scope: "demo" };

describe("entry guards (typed errors, never a hang)", () => {
  it("pfdAvgChartSvg refuses a forged point (null interval: a log axis from 0 looped for ever)", () => {
    const points = curve.points.map((p, i) => (i === 1 ? { ...p, proofTestIntervalHours: null } : p));
    const call = () => pfdAvgChartSvg({ ...chart, curves: [{ ...curve, points }] } as never);
    expect(call).toThrow(HotjunctionTypeError);
    expect(call).toThrow("pfdAvgChartSvg: input.curves[0].points[1].proofTestIntervalHours null is not a finite number > 0");
    expect(() => pfdAvgChartSvg({ ...chart, curves: [] })).toThrow("input.curves an array of length 0 is empty");
    expect(() => pfdAvgChartSvg({ ...chart, curves: [{ ...curve, beta: {} }] } as never)).toThrow("input.curves[0].beta a value of type object is not a number from 0 to 1 or null");
  });

  it("pfdAvgChartSvg draws intervals near the float64 limit without a hang or NaN", () => {
    const points = curve.points.map((p) => ({ ...p, proofTestIntervalHours: 1e308 }));
    expect(pfdAvgChartSvg({ ...chart, curves: [{ ...curve, points }] })).not.toMatch(/NaN|Infinity/);
  });

  it("validateFailureData and failureDataProblems refuse null options by name", () => {
    expect(() => validateFailureData({ elements: [] }, null as never)).toThrow("failure data: options null is not an options object");
    expect(() => failureDataProblems({ elements: [] }, null as never)).toThrow(HotjunctionTypeError);
    expect(() => validateFailureData({ elements: [] }, { faultIds: 5 } as never)).toThrow("failure data: options.faultIds 5 is not an array");
  });

  it("compareReferences names a null reference option", () => {
    const design = {
      setpoints: [{ name: "glaze", tripTemperatureC: 400, maxNormalOperatingC: 385, hazardLimitC: 420 }],
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
      amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
      comparator: { kind: "comparator", offsetMillivolts: 2 },
      reference: { kind: "ideal", name: "any", nominalVolts: 5 },
    };
    expect(() => compareReferences(design as never, [{ kind: "ideal", name: "a", nominalVolts: 5 }, null] as never)).toThrow(
      "compareReferences: reference options[1] null is not an object",
    );
  });

  it("ageingBandAt refuses a huge drift rate by its own name (not as an infinite total)", () => {
    const a = { kind: "ageing", driftCPer1000Hours: 1e308, statedAtC: 1000, serviceHours: 4000, direction: "up" } as const;
    expect(() => ageingBandAt(a, 2000)).toThrow(HotjunctionRangeError);
    expect(() => ageingBandAt(a, 2000)).toThrow("ageing: driftCPer1000Hours 1e+308 °C is out of range; valid range 0 to 250 °C");
  });
});
