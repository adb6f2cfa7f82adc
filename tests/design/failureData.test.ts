/**
 * The design file's failureData section: parsed into the safety figures' objects, and bad input refused with the
 * path (precise errors; common practice, no source). Fault-id checks need the catalogue and are in
 * tests/cli/safetyFigures.test.ts.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { failureDataFromDesign, parseDesign, secondChannelDesign, validateDesign } from "../../src/design/index.js";
import { validateFailureData } from "../../src/index.js";

const text = readFileSync(new URL("../../examples/kiln-two-channel-cutout.json", import.meta.url), "utf8");
const base = (): Record<string, any> => JSON.parse(text) as Record<string, any>;
const refused = (edit: (d: Record<string, any>) => void): string => {
  const d = base();
  edit(d);
  try {
    validateDesign(d, { fileName: "kiln.json" });
  } catch (e) {
    return (e as Error).message;
  }
  throw new Error("accepted");
};

describe("failureData in the design file", () => {
  it("becomes FailureData for each channel (shares kept, ids kept, assumed classes kept) that validates", () => {
    const design = parseDesign(text);
    const first = failureDataFromDesign(design);
    const second = failureDataFromDesign(design, "second");
    expect(first?.elements.length).toBe(10);
    expect(second?.elements.length).toBe(4);
    expect(first?.elements[0]?.modes[4]).toEqual({ mode: "ageing drift", share: 0.2, assumed: { safety: "degraded", detected: false } });
    for (const data of [first, second]) expect(() => validateFailureData(data)).not.toThrow();
    expect(failureDataFromDesign(parseDesign(readFileSync(new URL("../../examples/reflow-oven-trip.json", import.meta.url), "utf8")))).toBeUndefined();
  });

  it("the second channel is an ADC design of its own: its thermocouple, ADC, trips and protection; the first channel's reference", () => {
    const design = parseDesign(text);
    const second = secondChannelDesign(design);
    expect(second.comparator).toBeUndefined();
    expect(second.adc?.bits).toBe(12);
    expect(second.setpoints.map((s) => s.tripTemperatureC)).toEqual([1255, 1025]);
    expect(second.reference).toEqual(design.reference);
    expect(second.protection?.detection?.supervisoryReading?.plausibleHighC).toBe(1320);
    expect(second.failureData).toBeUndefined();
    expect(() => validateDesign(second)).not.toThrow();
  });

  const cases: [string, (d: Record<string, any>) => void, string][] = [
    ["negative rate", (d) => { d.failureData.elements[3].rateFit = -1; }, "kiln.json: at failureData.elements[3].rateFit: expected a number ≥ 0, found -1"],
    ["NaN rate", (d) => { d.failureData.elements[3].rateFit = Number.NaN; }, "kiln.json: at failureData.elements[3].rateFit: expected a finite number, found NaN"],
    ["infinite rate", (d) => { d.failureData.secondChannel.elements[0].rateFit = Number.POSITIVE_INFINITY; }, "kiln.json: at failureData.secondChannel.elements[0].rateFit: expected a finite number, found Infinity"],
    ["share above 1", (d) => { d.failureData.elements[1].modes[0].share = 1.2; }, "kiln.json: at failureData.elements[1].modes[0].share: expected a number ≤ 1, found 1.2"],
    ["shares summing to 1.1", (d) => { d.failureData.elements[5].modes[0].share = 0.8; }, "kiln.json: at failureData.elements[5].modes[*].share: 1.1 is the sum of the shares, not 1; valid range 0.9999 to 1.0001"],
    ["second channel shares", (d) => { d.failureData.secondChannel.elements[2].modes[1].share = 0.4; }, "kiln.json: at failureData.secondChannel.elements[2].modes[*].share: 0.9 is the sum of the shares, not 1; valid range 0.9999 to 1.0001"],
    ["a mode with neither faultId nor assumed", (d) => { delete d.failureData.elements[1].modes[0].faultId; }, "needs exactly one of faultId and assumed"],
    ["an unknown key", (d) => { d.failureData.elements[0].rate = 5; }, "kiln.json: at failureData.elements[0]: unknown key \"rate\""],
    ["a second channel without cold-junction compensation", (d) => { delete d.failureData.secondChannel.coldJunction; }, "kiln.json: at failureData.secondChannel.coldJunction: required key is missing (only a fixed-scale amplifier compensates internally)"],
    ["a zero proof-test interval", (d) => { d.failureData.proofTest.proofTestIntervalHours = 0; }, "kiln.json: at failureData.proofTest.proofTestIntervalHours: expected a number > 0, found 0"],
  ];
  for (const [what, edit, message] of cases) {
    it(`refuses ${what} in one line with the path`, () => {
      const m = refused(edit);
      expect(m.split("\n").length).toBe(1);
      expect(m).toContain(message);
    });
  }
});
