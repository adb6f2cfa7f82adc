/**
 * Regressions found by tests/contract (issue "typed-error promise everywhere"): tripReportFromResult took the
 * designTrip result on trust, so a forged or truncated result threw plain TypeErrors ("result.setpoints.map is not
 * a function") or came back with NaN in the report. The result and the methods are now checked at the entry (the
 * shared shape guard, then no NaN/±Infinity anywhere in what the report copies).
 */
import { describe, expect, it } from "vitest";
import { typedErrorOf } from "../_typedError.js";
import { CAUTION_TEXT, tripReportFromResult } from "../../src/report/index.js";
import { designTrip, type TripDesignResult } from "../../src/index.js";
import { parseDesign, tripDesignFromDesign } from "../../src/design/index.js";
import { readFileSync } from "node:fs";
import { join } from "node:path";


const empty = {
  networks: [],
  reference: { name: "ideal", kind: "ideal", nominalVolts: 2.5, toleranceFraction: 0, problems: [] },
  midRail: { nominalVolts: 1.25, worstCaseLowVolts: 1.2375, worstCaseHighVolts: 1.2625, worstCaseFraction: 0.01, relativeStandardUncertainty: 0.004 },
  setpoints: [],
  acceptanceMethod: "worst-case",
  pass: true,
  notes: [],
  caution: CAUTION_TEXT,
} as unknown as TripDesignResult;
const methods = { methods: ["worst-case"] as const, coverage: 0.95 };

describe("tripReportFromResult checks the result it is given", () => {
  it.each([undefined, null, Number.NaN, "report", []])("result %s is a typed INVALID_OPTION error naming result", (result) => {
    const e = typedErrorOf(() => tripReportFromResult(result as never, methods));
    expect(e.code).toBe("INVALID_OPTION");
    expect(e.quantity).toBe("result");
  });

  it.each([
    ["setpoints", -1e308, "result.setpoints"],
    ["notes", null, "result.notes"],
    ["networks", Object.create(null), "result.networks"],
    ["pass", Number.NaN, "result.pass"],
    ["acceptanceMethod", Number.POSITIVE_INFINITY, "result.acceptanceMethod"],
    ["midRail", undefined, "result.midRail"],
  ] as const)("result.%s = %s names %s", (key, value, quantity) => {
    const e = typedErrorOf(() => tripReportFromResult({ ...empty, [key]: value } as never, methods));
    expect(e.quantity).toBe(quantity);
  });

  it.each([
    ["problems", "K", "result.reference.problems"],
    ["kind", Number.NaN, "result.reference.kind"],
    ["name", [Number.NaN], "result.reference.name"],
  ] as const)("result.reference.%s = %s names %s", (key, value, quantity) => {
    const e = typedErrorOf(() => tripReportFromResult({ ...empty, reference: { ...empty.reference, [key]: value } } as never, methods));
    expect(e.quantity).toBe(quantity);
  });

  it.each([
    [{ methods: Number.NaN, coverage: 0.95 }, "methods.methods"],
    [{ methods: ["worst-case"], coverage: Number.NEGATIVE_INFINITY }, "methods.coverage"],
    [[Number.NaN], "methods"],
  ] as const)("methods %j names %s", (m, quantity) => {
    expect(typedErrorOf(() => tripReportFromResult(empty, m as never)).quantity).toBe(quantity);
  });

  it("a real designTrip result (with bands, error sources and a build sheet) reports as before; a NaN inside its build sheet is named", () => {
    const design = parseDesign(readFileSync(join(import.meta.dirname, "../../examples/reflow-oven-trip.json"), "utf8"));
    const result = designTrip(tripDesignFromDesign(design), { monteCarloTrials: 2000, seed: 1 });
    const report = tripReportFromResult(result, { methods: ["worst-case", "rss", "monte-carlo"], coverage: 0.95, trials: 2000, seed: 1 });
    expect(report.setpoints.length).toBe(result.setpoints.length);
    expect(report.setpoints[0]?.bands.map((b) => b.method)).toEqual(["worst-case", "rss", "monte-carlo"]);
    expect(report.buildSheet).toBe(result.buildSheet);
    const sheet = result.buildSheet!;
    const forged = { ...result, buildSheet: { ...sheet, parts: sheet.parts.map((p, i) => (i === 0 ? { ...p, value: Number.NaN } : p)) } };
    const e = typedErrorOf(() => tripReportFromResult(forged, { methods: ["worst-case"], coverage: 0.95 }));
    expect(e.code).toBe("NOT_A_FINITE_NUMBER");
    expect(e.quantity).toBe("result.buildSheet.parts[0].value");
    const band = { ...result, setpoints: result.setpoints.map((s) => ({ ...s, worstCase: { ...s.worstCase, enclosureLowC: Number.POSITIVE_INFINITY } })) };
    expect(typedErrorOf(() => tripReportFromResult(band, { methods: ["worst-case"], coverage: 0.95 })).quantity).toBe("result.setpoints[0].worstCase.enclosureLowC");
  });
});
