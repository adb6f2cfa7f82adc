/**
 * Regression found by tests/contract: classifyFaultShift without an input object threw "Cannot read properties
 * of undefined"; it is a typed error naming the options.
 */
import { describe, expect, it } from "vitest";
import { typedErrorOf } from "../_typedError.js";
import {
  classifyFaultShift,
  failureDataProblems,
  isHotjunctionError,
  logSpacedHours,
  pfdAvg1oo2,
  pfdAvgCurve,
  pfh1oo2,
  safetyFaultClassesFromReview,
  safetyFigures,
  safetyFiguresFromReviews,
  safetyFiguresReport,
  twoChannelCutout,
  } from "../../src/index.js";

describe("classifyFaultShift input", () => {
  it.each([undefined, null, 7, "shift"])("classifyFaultShift(%s) is a typed error", (input) => {
    let error: unknown;
    try {
      classifyFaultShift(input as never);
    } catch (e) {
      error = e;
    }
    expect(isHotjunctionError(error), String(error)).toBe(true);
    expect((error as Error).message).toMatch(/^classifyFaultShift: options .* is not an options object/);
  });
});

/**
 * Regressions found by tests/contract (issue "typed-error promise everywhere"): missing objects read as plain
 * TypeErrors, names and forged fields copied into results as NaN/±Infinity, and subnormal inputs whose ratios
 * overflow. Each is now a typed error naming the quantity, or a finite result.
 */

/** True when no number in `value` is NaN or ±Infinity, at any depth. */
function allFinite(value: unknown): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  if (typeof value !== "object" || value === null) return true;
  return Object.values(value).every(allFinite);
}

const proofTest = { proofTestIntervalHours: 8760, meanTimeToRestorationHours: 8 };
const rates = { lambdaDuFit: 100, lambdaDdFit: 400 };
const review = {
  name: "kiln", healthyTripC: 252, maxNormalOperatingC: 230, hazardLimitC: 280,
  rows: [
    { faultId: "reference.driftedLow", effect: "trips-late" as const, shiftC: 24, detected: false },
    { faultId: "thermocouple.open", effect: "trips-immediately" as const, shiftC: -227, detected: true },
  ],
};

describe("1oo2 formulas and the PFDavg curve: missing objects", () => {
  it.each([undefined, null, 0.05])("pfdAvg1oo2 and pfh1oo2 with common-cause factors %s name commonCause", (cc) => {
    for (const f of [pfdAvg1oo2, pfh1oo2]) {
      const e = typedErrorOf(() => f(rates, cc as never, proofTest));
      expect(e.quantity).toBe("commonCause");
      expect(e.code).toBe("INVALID_OPTION");
    }
  });

  it("pfdAvgCurve with a null pair names pair; without proofTest names proofTest", () => {
    const channel = { name: "kiln", lambdaDuFit: 225, lambdaDdFit: 0 };
    expect(typedErrorOf(() => pfdAvgCurve(channel, { proofTestIntervalsHours: [730], proofTest: { meanTimeToRestorationHours: 8 }, pair: null as never })).quantity).toBe("pair");
    expect(typedErrorOf(() => pfdAvgCurve(channel, { proofTestIntervalsHours: [730] } as never)).quantity).toBe("proofTest");
    expect(typedErrorOf(() => pfdAvgCurve(channel, { proofTestIntervalsHours: [730], proofTest: null as never })).quantity).toBe("proofTest");
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, [0, Number.NaN, 1]])("a channel or pair name %s is a typed error naming it", (name) => {
    const base = { proofTestIntervalsHours: [730], proofTest: { meanTimeToRestorationHours: 8 } };
    expect(typedErrorOf(() => pfdAvgCurve({ name: name as never, ...rates }, base)).quantity).toBe("channel.name");
    expect(typedErrorOf(() => pfdAvgCurve(rates, { ...base, pair: { beta: 0.05, betaD: 0.02, name: name as never } })).quantity).toBe("pair.name");
    const options = { beta: 0.05, betaD: 0.02, proofTest };
    expect(typedErrorOf(() => twoChannelCutout({ name: name as never, ...rates }, rates, options)).quantity).toBe("channelA.name");
    expect(typedErrorOf(() => twoChannelCutout(rates, { name: name as never, ...rates }, options)).quantity).toBe("channelB.name");
  });
});

describe("subnormal inputs give finite results", () => {
  it("logSpacedHours from 1e-320 h: finite, increasing, ends exact (to/from overflows float64)", () => {
    for (const to of [1, 8760, 1e9]) {
      const hours = logSpacedHours(1e-320, to, 5);
      expect(hours.every(Number.isFinite)).toBe(true);
      expect(hours[0]).toBe(1e-320);
      expect(hours[4]).toBe(to);
      for (let i = 1; i < hours.length; i++) expect(hours[i]!).toBeGreaterThan(hours[i - 1]!);
    }
    // in range, the spacing is unchanged: log-spaced ends and middle of 100…10000 h (the documented example)
    expect(logSpacedHours(100, 10000, 3).map((h) => Math.round(h))).toEqual([100, 1000, 10000]);
  });

  it("twoChannelCutout with β = 1e-320 keeps β_D of the β = 0 row at 0 (β_D/β overflows; 0·Infinity was NaN)", () => {
    const pair = twoChannelCutout(rates, rates, { beta: 1e-320, betaD: 0.02, proofTest });
    expect(allFinite(pair)).toBe(true);
    expect(pair.betaSensitivity[0]).toMatchObject({ beta: 0, betaD: 0 });
    expect(pair.betaSensitivity[1]?.betaD).toBe(1);
  });
});

describe("classes and figures check the fields they copy", () => {
  it.each([
    [["name"], Number.NaN, "review.name"],
    [["rows", 0, "faultId"], Number.POSITIVE_INFINITY, "review.rows[0].faultId"],
    [["rows", 0, "detected"], Number.NaN, "review.rows[0].detected"],
    [["rows", 1, "shiftC"], Number.NEGATIVE_INFINITY, "review.rows[1].shiftC"],
    [["rows", 1, "effect"], "late", "review.rows[1].effect"],
    [["rows", 0], null, "review.rows[0]"],
  ] as const)("safetyFaultClassesFromReview with %s = %s names %s", (path, value, quantity) => {
    const forged = structuredClone(review) as unknown as Record<string | number, unknown>;
    let node = forged;
    for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
    node[path[path.length - 1]!] = value;
    const e = typedErrorOf(() => safetyFaultClassesFromReview(forged as never));
    expect(e.quantity).toBe(quantity);
    expect(e.code).toBe("INVALID_OPTION");
  });

  it("safetyFaultClassesFromReview, safetyFigures and safetyFiguresFromReviews refuse null options by name", () => {
    expect(typedErrorOf(() => safetyFaultClassesFromReview(review, null as never)).quantity).toBe("options");
    const data = { elements: [{ element: "thermocouple", rateFit: 20, modes: [{ mode: "open", share: 1, faultId: "thermocouple.open" }] }] };
    const classes = safetyFaultClassesFromReview(review);
    expect(typedErrorOf(() => safetyFigures(data, classes, null as never)).quantity).toBe("options");
    expect(typedErrorOf(() => safetyFiguresFromReviews(data, [review], null as never)).quantity).toBe("options");
    expect(typedErrorOf(() => safetyFiguresFromReviews(data, [review], { healthyBandsC: 3 as never })).quantity).toBe("options.healthyBandsC");
    expect(typedErrorOf(() => safetyFigures(data, { ...classes, name: Number.NaN as never })).quantity).toBe("setpoint.name");
  });

  it("safetyFiguresReport refuses a non-finite value in any field of a part (identicalChannels NaN)", () => {
    const pair = twoChannelCutout(rates, rates, { beta: 0.05, betaD: 0.02, proofTest });
    for (const [key, value] of [["identicalChannels", Number.NaN], ["commonCauseBasis", Number.POSITIVE_INFINITY], ["simplifiedEquationsValid", [0, Number.NaN, 1]]] as const) {
      const e = typedErrorOf(() => safetyFiguresReport({ twoChannel: [{ ...pair, [key]: value }] }));
      expect(e.code).toBe("NOT_A_FINITE_NUMBER");
      expect(e.quantity.startsWith(`input.twoChannel[0].${key}`)).toBe(true);
    }
    expect(allFinite(safetyFiguresReport({ twoChannel: [pair] }))).toBe(true);
  });

  it.each([Number.NaN, Number.POSITIVE_INFINITY, [Number.NaN], { elements: Number.NaN }])("failureDataProblems(%s) is thrown (not failure data), not listed with a NaN value", (data) => {
    const e = typedErrorOf(() => failureDataProblems(data));
    expect(e.code).toBe("INVALID_DESIGN");
    expect(e.quantity).toMatch(/^failureData(\.elements)?$/);
  });
});

describe("failureDataProblems lists a non-finite value without returning it as data", () => {
  it("rateFit NaN and modes [0, NaN, 1] are listed; their value stays readable, not enumerable (no NaN in the listing's data)", () => {
    const problems = failureDataProblems({ elements: [{ element: "b", rateFit: Number.NaN, modes: [0, Number.NaN, 1] }] });
    const rate = problems.find((p) => p.quantity === "failureData.elements[0].rateFit");
    expect(rate?.code).toBe("NOT_A_FINITE_NUMBER");
    expect(rate?.value).toBeNaN();
    expect(Object.keys(rate!)).not.toContain("value");
    expect(problems.find((p) => p.quantity === "failureData.elements[0].modes[1]")?.value).toBeNaN();
    expect(allFinite(problems.map((p) => ({ ...p })))).toBe(true);
    // a finite offending value stays an ordinary field
    const [negative] = failureDataProblems({ elements: [{ element: "b", rateFit: -3, modes: [{ mode: "open", share: 1, faultId: "x" }] }] });
    expect(Object.keys(negative!)).toContain("value");
    expect(negative?.value).toBe(-3);
  });
});
