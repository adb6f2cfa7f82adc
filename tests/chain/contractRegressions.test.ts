/**
 * Regressions found by tests/contract in the chain's element functions: a missing or forged tolerance or cable
 * statement, a type given as an object without a string form, a forged rated range (the 1 °C search walked it
 * for ever) and an unbounded step count are typed errors naming the quantity.
 */
import { describe, expect, it } from "vitest";
import {
  ageingBandOverService,
  cableMismatchBound,
  cableTipErrorC,
  cableToleranceMicrovolts,
  cableToleranceStatement,
  isHotjunctionError,
  legSeebeckVsContact,
  thermocoupleLoopOhmsPerMetre,
  thermocoupleToleranceC,
  toleranceRange,
} from "../../src/index.js";

function thrown(call: () => unknown): unknown {
  try {
    call();
  } catch (e) {
    return e;
  }
  return undefined;
}

function expectTyped(call: () => unknown, pattern: RegExp): void {
  const e = thrown(call);
  expect(isHotjunctionError(e), String(e)).toBe(true);
  expect((e as Error).message).toMatch(pattern);
}

describe("element functions refuse forged arguments", () => {
  const noStringForm = Object.create(null) as never;
  it("a tolerance that is missing or has no string form", () => {
    expectTyped(() => toleranceRange("K", undefined as never), /tolerance/);
    expectTyped(() => thermocoupleToleranceC("K", undefined as never, 100), /tolerance/);
    expectTyped(() => toleranceRange(noStringForm, { standard: "IEC 60584-1", class: 1 }), /thermocouple type a value of type object/);
  });

  it("a cable statement that is missing, and a type without a string form", () => {
    expectTyped(() => cableToleranceMicrovolts("K", undefined as never, 20), /cable tolerance statement/);
    expectTyped(() => cableTipErrorC("K", undefined as never, 600, 200, 0), /cable tolerance statement/);
    expectTyped(() => thermocoupleLoopOhmsPerMetre(noStringForm, 0.5), /thermocouple type/);
  });

  it("a forged rated range is refused at once instead of walked in 1 °C steps", () => {
    const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
    const start = performance.now();
    expectTyped(() => cableMismatchBound("K", { ...s, maxC: 1e308 }), /rated maxC 1e\+308 °C is out of range; valid range -270 to 1820 °C/);
    expectTyped(() => cableMismatchBound("K", { ...s, minC: Number.NaN }), /rated minC NaN/);
    expect(performance.now() - start).toBeLessThan(1000);
    // the genuine statement still gives its documented bound (ASTM E230 standard limits, rating point 200 °C)
    expect(cableMismatchBound("K", s).ratingPointC).toBe(200);
  });

  it("ageingBandOverService bounds its steps", () => {
    const a = { kind: "ageing", totalDriftC: 3, statedAtC: 900, serviceHours: 6000, direction: "symmetric" } as const;
    expectTyped(() => ageingBandOverService(a, 1e308), /steps 1e\+308 is out of range; valid range 1 to 10000/);
    expect(ageingBandOverService(a, 10_000)).toHaveLength(10_001);
  });
});
