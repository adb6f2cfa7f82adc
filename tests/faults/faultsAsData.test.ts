/**
 * Faults given as data (JSON) or as pure transforms, precise errors for bad input, and the rendered report
 * (caution, scope, tables) in text, Markdown and JSON.
 */
import { describe, expect, it } from "vitest";
import {
  faultReviewReport,
  faultsFromJson,
  formatFaultReviewJson,
  formatFaultReviewMarkdown,
  formatFaultReviewText,
  isHotjunctionError,
  reviewFaults,
  type Fault,
} from "../../src/index.js";
import { ovenChain, ovenTrip } from "./helpers.js";

function codeOf(fn: () => unknown): string | undefined {
  try {
    fn();
  } catch (e) {
    if (isHotjunctionError(e)) return e.code;
    throw e;
  }
  return undefined;
}

describe("faults as data", () => {
  it("a JSON fault on a custom element is classified like a built-in one", () => {
    // Hand check: an input filter capacitor shorted puts 0 mV on the fixed-scale amplifier's input, which then
    // indicates the cold junction (25 °C) at every temperature: never trips (common practice, no source).
    const extra = faultsFromJson(
      JSON.stringify([
        {
          id: "inputFilter.capacitorShort",
          element: "input filter",
          description: "filter capacitor across the input shorted",
          effects: [{ kind: "override-node", node: "amplifierInput", millivolts: 0 }],
          mitigation: "a supervisory plausibility check",
        },
        {
          id: "inputFilter.leakage",
          element: "input filter",
          description: "leaky filter capacitor halves the signal",
          effects: [{ kind: "scale-node", node: "amplifierInput", factor: 0.5 }],
        },
      ]),
    );
    const review = reviewFaults(ovenChain, ovenTrip, { extraFaults: extra });
    const short = review.rows.find((r) => r.faultId === "inputFilter.capacitorShort");
    expect(short?.effect).toBe("never-trips");
    expect(short?.element).toBe("input filter");
    expect(short?.mitigations).toEqual(["a supervisory plausibility check", "an independent, non-resettable thermal cutoff"]);
    const leak = review.rows.find((r) => r.faultId === "inputFilter.leakage");
    // Half the EMF: trips where E(t) − E(25) = 2 × 9.400 mV, i.e. E(t) = 19.80 mV, about 482 °C, past the sweep end (330 °C).
    expect(leak?.effect).toBe("never-trips");
  });

  it("a custom transform and a chain change act like the equivalent data fault", () => {
    const asData: Fault = {
      id: "x.data",
      element: "custom",
      description: "output offset +0.1 V",
      effects: [{ kind: "offset-node", node: "amplifierOutput", volts: 0.1 }],
    };
    const asFunction: Fault = {
      id: "x.function",
      element: "custom",
      description: "output offset +0.1 V",
      effects: [{ kind: "custom", node: "amplifierOutput", transformNode: (v) => v + 0.1 }],
    };
    const asChain: Fault = {
      id: "x.chain",
      element: "divider",
      description: "bottom resistor drifted to 12 kΩ",
      effects: [{ kind: "custom", transformChain: (c) => ({ ...c, divider: { kind: "divider", resistorsOhms: [12000, 12000], toleranceFraction: 0.01 } }) }],
    };
    const review = reviewFaults(ovenChain, ovenTrip, { faults: [asData, asFunction, asChain] });
    const [a, b, c] = review.rows;
    expect(a?.tripC).toBe(b?.tripC);
    // +0.1 V = 20 °C of the 5 mV/°C scale: early by about 20 °C × α/S ≈ 19.4 °C (S(250 °C) ≈ 0.0412 mV/°C, from memory).
    expect(a?.shiftC as number).toBeLessThan(-18.5);
    expect(a?.shiftC as number).toBeGreaterThan(-20.5);
    // Threshold 2.5 V × 12/24 = 1.25 V instead of 1.3 V: the signal reaches it where signal + 0.05 V reaches 1.3 V.
    const plus50 = { id: "y", element: "custom", description: "output offset +0.05 V", effects: [{ kind: "offset-node", node: "amplifierOutput", volts: 0.05 }] } as const;
    const half = reviewFaults(ovenChain, ovenTrip, { faults: [plus50] });
    expect(c?.tripC as number).toBeCloseTo(half.rows[0]?.tripC as number, 2);
  });

  it("any-of takes the latest trip and counts as detected only if every alternative is", () => {
    const fault: Fault = {
      id: "amp.unknown",
      element: "amplifier",
      description: "output goes to either rail",
      effects: [
        {
          kind: "any-of",
          alternatives: [
            { label: "high rail", effects: [{ kind: "override-node", node: "amplifierOutput", rail: "high" }] },
            { label: "low rail", effects: [{ kind: "override-node", node: "amplifierOutput", rail: "low" }] },
          ],
        },
      ],
    };
    const review = reviewFaults(ovenChain, ovenTrip, { faults: [fault], detection: { outOfRangeWindow: { lowVolts: 0.05, highVolts: 4.5 } } });
    const r = review.rows[0];
    expect(r?.decidingAlternative).toBe("low rail");
    expect(r?.effect).toBe("never-trips");
    expect(r?.category).toBe("dangerous-detected"); // both rails are outside the 0.05…4.5 V window
    const narrow = reviewFaults(ovenChain, ovenTrip, { faults: [fault], detection: { outOfRangeWindow: { lowVolts: -0.1, highVolts: 4.5 } } });
    expect(narrow.rows[0]?.category).toBe("dangerous-undetected"); // 0 V is inside: the low rail goes unseen
  });
});

describe("precise errors", () => {
  it("bad options and faults", () => {
    expect(codeOf(() => reviewFaults(ovenChain, ovenTrip, { openCircuitBias: "sideways" as "none" }))).toBe("INVALID_OPTION");
    expect(codeOf(() => reviewFaults(ovenChain, ovenTrip, { amplifierRailsVolts: { lowVolts: 5, highVolts: 0 } }))).toBe("OUT_OF_RANGE");
    expect(codeOf(() => reviewFaults(ovenChain, ovenTrip, { sweepStepC: 0 }))).toBe("OUT_OF_RANGE");
    expect(codeOf(() => reviewFaults(ovenChain, { ...ovenTrip, hazardLimitC: 240 }))).toBe("OUT_OF_RANGE");
    expect(codeOf(() => reviewFaults(ovenChain, { ...ovenTrip, tap: 1 }))).toBe("OUT_OF_RANGE");
    expect(codeOf(() => reviewFaults(ovenChain, { ...ovenTrip, hazardLimitC: Number.NaN }))).toBe("NOT_A_FINITE_NUMBER");
    const f: Fault = { id: "a", element: "x", description: "d", effects: [{ kind: "board-supply-loss" }] };
    expect(codeOf(() => reviewFaults(ovenChain, ovenTrip, { faults: [f, f] }))).toBe("INVALID_OPTION");
    const farDivider: Fault = { id: "b", element: "divider", description: "d", effects: [{ kind: "resistor-fault", element: "divider", index: 5, state: "open" }] };
    expect(codeOf(() => reviewFaults(ovenChain, ovenTrip, { faults: [farDivider] }))).toBe("OUT_OF_RANGE");
  });

  it("refuses a hazard limit equal to the normal limit (strictly above; equal limits used to pass)", () => {
    // Regression: `!(hazard > maxNormal)` was checked with an inclusive range, so 250 = 250 went through.
    const equal = () => reviewFaults(ovenChain, { ...ovenTrip, hazardLimitC: ovenTrip.maxNormalOperatingC });
    expect(codeOf(equal)).toBe("OUT_OF_RANGE");
    expect(equal).toThrow(/hazardLimitC 250 °C is not greater than maxNormalOperatingC 250 °C; valid range 250 to Infinity °C/);
    // The same strict check for equal amplifier rails and an empty out-of-range window.
    expect(() => reviewFaults(ovenChain, ovenTrip, { amplifierRailsVolts: { lowVolts: 5, highVolts: 5 } })).toThrow(
      /amplifierRailsVolts.highVolts 5 V is not greater than amplifierRailsVolts.lowVolts 5 V/,
    );
    expect(() => reviewFaults(ovenChain, ovenTrip, { detection: { outOfRangeWindow: { lowC: 0, highC: 0 } } })).toThrow(
      /outOfRangeWindow.highC 0 °C is not greater than outOfRangeWindow.lowC 0 °C/,
    );
    // Just above is accepted: a limit 0.1 °C over the normal one is a valid (if tight) review.
    expect(reviewFaults(ovenChain, { ...ovenTrip, hazardLimitC: ovenTrip.maxNormalOperatingC + 0.1 }).hazardLimitC).toBe(250.1);
  });

  it("a healthy chain that never trips within the sweep is a design error", () => {
    const high = { ...ovenChain, divider: { kind: "divider", resistorsOhms: [1000, 24000], toleranceFraction: 0.01 } } as const;
    expect(codeOf(() => reviewFaults(high, ovenTrip))).toBe("INVALID_DESIGN");
  });

  it("faultsFromJson rejects a unit that does not fit the node, a custom effect, and bad JSON", () => {
    const wrongUnit = [{ id: "a", element: "x", description: "d", effects: [{ kind: "override-node", node: "thermocoupleEmf", volts: 0 }] }];
    expect(codeOf(() => faultsFromJson(wrongUnit))).toBe("INVALID_OPTION");
    expect(() => faultsFromJson(wrongUnit)).toThrow(/must be exactly one of: millivolts/);
    expect(codeOf(() => faultsFromJson([{ id: "a", element: "x", description: "d", effects: [{ kind: "custom" }] }]))).toBe("INVALID_OPTION");
    expect(codeOf(() => faultsFromJson("[{"))).toBe("INVALID_OPTION");
    expect(codeOf(() => faultsFromJson({}))).toBe("INVALID_OPTION");
    expect(codeOf(() => faultsFromJson([{ id: "a", element: "x", description: "d", effects: [{ kind: "melt" }] }]))).toBe("INVALID_OPTION");
    expect(codeOf(() => faultsFromJson([{ id: "a", element: "x", description: "d", effects: [{ kind: "scale-node", node: "threshold", factor: Infinity }] }]))).toBe(
      "NOT_A_FINITE_NUMBER",
    );
  });
});

describe("rendered report", () => {
  const report = faultReviewReport([reviewFaults(ovenChain, ovenTrip, { outputStage: "de-energize-to-trip", openCircuitBias: "pull-up" })], "oven watchdog");

  it("text carries every fault, the counts, the scope and the caution", () => {
    const text = formatFaultReviewText(report);
    for (const r of report.reviews[0]?.rows ?? []) expect(text).toContain(r.faultId);
    expect(text).toContain("CAUTION: These numbers do not certify a safety function.");
    expect(text).toContain("Scope: Single faults of the modelled elements only");
    expect(text).toMatch(/dangerous, undetected\s+\d+/);
  });

  it("Markdown has one table row per fault and the caution before the tables", () => {
    const md = formatFaultReviewMarkdown(report);
    const rows = md.split("\n").filter((l) => l.startsWith("| `"));
    expect(rows.length).toBe(report.reviews[0]?.rows.length);
    expect(md.indexOf("**Caution.**")).toBeLessThan(md.indexOf("| Fault |"));
    expect(md).toContain("## Scope");
  });

  it("JSON round-trips the counts and rows", () => {
    const data = JSON.parse(formatFaultReviewJson(report)) as typeof report & { format: string };
    expect(data.format).toBe("hotjunction-fault-review/1");
    expect(data.counts).toEqual(report.counts);
    expect(data.reviews[0]?.rows).toEqual(report.reviews[0]?.rows);
    expect(data.caution).toBe(report.caution);
  });
});
