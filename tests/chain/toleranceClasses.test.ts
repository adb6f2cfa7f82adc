/**
 * Thermocouple tolerance classes: IEC 60584-1:2013 classes 1/2/3 and ASTM E230 Table 1, at the check
 * points of the reference sheet and on both sides of every break point, with the ranges enforced.
 */
import { describe, expect, it } from "vitest";
import {
  HotjunctionRangeError,
  thermocoupleToleranceC,
  toleranceRange,
  type ThermocoupleTolerance,
  type ThermocoupleType,
} from "../../src/index.js";

const iec = (cls: 1 | 2 | 3): ThermocoupleTolerance => ({ standard: "IEC 60584-1", class: cls });
const astm = (grade: "standard" | "special"): ThermocoupleTolerance => ({ standard: "ASTM E230", grade });

describe("thermocoupleToleranceC at the published check points", () => {
  // Computed from the IEC 60584-1:2013 table of tolerance classes (reference sheet §3, (c)).
  it.each([
    ["K", 1, 800, 3.2],
    ["K", 1, 1000, 4.0],
    ["K", 2, 500, 3.75],
    ["K", 2, 1200, 9.0],
    ["T", 1, 300, 1.2],
    ["R", 1, 1400, 1.9],
    ["B", 3, 1500, 7.5],
  ] as const)("IEC 60584-1 type %s class %i at %i °C is ±%f °C", (type, cls, t, tol) => {
    expect(thermocoupleToleranceC(type, iec(cls), t)).toBeCloseTo(tol, 9);
  });
  // Computed from ASTM E230 Table 1 (reference sheet §3, (c)).
  it.each([
    ["K", "standard", 500, 3.75],
    ["K", "standard", 1000, 7.5],
    ["J", "standard", 700, 5.25],
    ["R", "special", 1200, 1.2],
  ] as const)("ASTM E230 type %s %s at %i °C is ±%f °C", (type, grade, t, tol) => {
    expect(thermocoupleToleranceC(type, astm(grade), t)).toBeCloseTo(tol, 9);
  });
});

// The IEC 60584-1:2013 table, copied row by row from the reference sheet §3 (source: IEC 60584-1:2013,
// published reproductions of its table of tolerance classes): [type, class, break °C, below, above(t)].
const iecBreaks: readonly [ThermocoupleType, 1 | 2 | 3, number, (t: number) => number, (t: number) => number][] = [
  ["T", 1, 125, () => 0.5, (t) => 0.004 * Math.abs(t)],
  ["E", 1, 375, () => 1.5, (t) => 0.004 * Math.abs(t)],
  ["J", 1, 375, () => 1.5, (t) => 0.004 * Math.abs(t)],
  ["K", 1, 375, () => 1.5, (t) => 0.004 * Math.abs(t)],
  ["N", 1, 375, () => 1.5, (t) => 0.004 * Math.abs(t)],
  ["R", 1, 1100, () => 1.0, (t) => 1 + 0.003 * (t - 1100)],
  ["S", 1, 1100, () => 1.0, (t) => 1 + 0.003 * (t - 1100)],
  ["T", 2, 133, () => 1.0, (t) => 0.0075 * Math.abs(t)],
  ["E", 2, 333, () => 2.5, (t) => 0.0075 * Math.abs(t)],
  ["J", 2, 333, () => 2.5, (t) => 0.0075 * Math.abs(t)],
  ["K", 2, 333, () => 2.5, (t) => 0.0075 * Math.abs(t)],
  ["N", 2, 333, () => 2.5, (t) => 0.0075 * Math.abs(t)],
  ["R", 2, 600, () => 1.5, (t) => 0.0025 * Math.abs(t)],
  ["S", 2, 600, () => 1.5, (t) => 0.0025 * Math.abs(t)],
  ["T", 3, -67, (t) => 0.015 * Math.abs(t), () => 1.0],
  ["E", 3, -167, (t) => 0.015 * Math.abs(t), () => 2.5],
  ["K", 3, -167, (t) => 0.015 * Math.abs(t), () => 2.5],
  ["N", 3, -167, (t) => 0.015 * Math.abs(t), () => 2.5],
  ["B", 3, 800, () => 4.0, (t) => 0.005 * Math.abs(t)],
];

describe("thermocoupleToleranceC on both sides of every IEC 60584-1 break point", () => {
  it.each(iecBreaks)("type %s class %i around %i °C", (type, cls, at, below, above) => {
    for (const d of [0.5, 0.01]) {
      expect(thermocoupleToleranceC(type, iec(cls), at - d)).toBeCloseTo(below(at - d), 9);
      expect(thermocoupleToleranceC(type, iec(cls), at + d)).toBeCloseTo(above(at + d), 9);
    }
    // At the shared point the larger of the two applies (conservative reading of the table).
    expect(thermocoupleToleranceC(type, iec(cls), at)).toBeCloseTo(Math.max(below(at), above(at)), 9);
  });
});

// ASTM E230 Table 1 (reference sheet §3, (a)): [type, grade, fixed °C, fraction]; break where they cross.
const astmRows: readonly [ThermocoupleType, "standard" | "special", number, number, number, number][] = [
  ["T", "standard", 1.0, 0.0075, 0, 370],
  ["J", "standard", 2.2, 0.0075, 0, 760],
  ["E", "standard", 1.7, 0.005, 0, 870],
  ["K", "standard", 2.2, 0.0075, 0, 1260],
  ["N", "standard", 2.2, 0.0075, 0, 1260],
  ["R", "standard", 1.5, 0.0025, 0, 1480],
  ["S", "standard", 1.5, 0.0025, 0, 1480],
  ["T", "special", 0.5, 0.004, 0, 370],
  ["J", "special", 1.1, 0.004, 0, 760],
  ["E", "special", 1.0, 0.004, 0, 870],
  ["K", "special", 1.1, 0.004, 0, 1260],
  ["N", "special", 1.1, 0.004, 0, 1260],
  ["R", "special", 0.6, 0.001, 0, 1480],
  ["S", "special", 0.6, 0.001, 0, 1480],
];

describe("ASTM E230 larger-of rule on both sides of each crossing", () => {
  it.each(astmRows)("type %s %s: ±%f °C or %f of t", (type, grade, fixedC, fraction, minC, maxC) => {
    const cross = fixedC / fraction;
    for (const t of [cross - 1, cross + 1, minC, maxC]) {
      expect(thermocoupleToleranceC(type, astm(grade), t)).toBeCloseTo(Math.max(fixedC, fraction * t), 9);
    }
    expect(toleranceRange(type, astm(grade)).minC).toBe(type === "T" || type === "E" || type === "K" ? (grade === "standard" ? -200 : 0) : 0);
    expect(toleranceRange(type, astm(grade)).maxC).toBe(maxC);
  });
  it("below 0 °C: T ±1.0 °C or 1.5 %, E ±1.7 °C or 1.0 %, K ±2.2 °C or 2.0 % (ASTM E230 Table 1)", () => {
    expect(thermocoupleToleranceC("T", astm("standard"), -150)).toBeCloseTo(2.25, 9);
    expect(thermocoupleToleranceC("T", astm("standard"), -50)).toBeCloseTo(1.0, 9);
    expect(thermocoupleToleranceC("E", astm("standard"), -200)).toBeCloseTo(2.0, 9);
    expect(thermocoupleToleranceC("K", astm("standard"), -200)).toBeCloseTo(4.0, 9);
    expect(thermocoupleToleranceC("K", astm("standard"), -100)).toBeCloseTo(2.2, 9);
  });
  it("type B is proportional only: standard 0.5 %, special 0.25 % from 870 to 1700 °C (ASTM E230 Table 1)", () => {
    expect(thermocoupleToleranceC("B", astm("standard"), 1000)).toBeCloseTo(5, 9);
    expect(thermocoupleToleranceC("B", astm("special"), 1700)).toBeCloseTo(4.25, 9);
    expect(() => thermocoupleToleranceC("B", astm("standard"), 869)).toThrow(HotjunctionRangeError);
  });
});

describe("ranges are enforced", () => {
  it.each([
    ["K", 1, -40, 1000],
    ["K", 2, -40, 1200],
    ["K", 3, -200, 40],
    ["T", 1, -40, 350],
    ["T", 3, -200, 40],
    ["R", 1, 0, 1600],
    ["B", 2, 600, 1700],
    ["B", 3, 600, 1700],
    ["E", 2, -40, 900],
    ["J", 1, -40, 750],
  ] as const)("IEC type %s class %i holds from %i to %i °C only", (type, cls, minC, maxC) => {
    expect(toleranceRange(type, iec(cls))).toEqual({ minC, maxC });
    expect(() => thermocoupleToleranceC(type, iec(cls), minC)).not.toThrow();
    expect(() => thermocoupleToleranceC(type, iec(cls), maxC)).not.toThrow();
    for (const t of [minC - 0.001, maxC + 0.001]) {
      try {
        thermocoupleToleranceC(type, iec(cls), t);
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(HotjunctionRangeError);
        expect(e).toMatchObject({ code: "OUT_OF_RANGE", min: minC, max: maxC, unit: "°C", value: t });
      }
    }
  });
  it("classes the standard does not define throw INVALID_OPTION (IEC 60584-1: no class 3 for J, R, S; no class 1 for B)", () => {
    for (const [type, cls] of [["J", 3], ["R", 3], ["S", 3], ["B", 1]] as const) {
      expect(() => thermocoupleToleranceC(type, iec(cls), 500)).toThrow(/is not defined for type/);
    }
  });
  it("a custom tolerance is the larger of ±toleranceC and fractionOfReading·|t| within its range", () => {
    const custom: ThermocoupleTolerance = { standard: "custom", toleranceC: 1, fractionOfReading: 0.002, minC: 0, maxC: 1000 };
    expect(thermocoupleToleranceC("K", custom, 100)).toBe(1);
    expect(thermocoupleToleranceC("K", custom, 900)).toBeCloseTo(1.8, 12);
    expect(() => thermocoupleToleranceC("K", custom, 1001)).toThrow(HotjunctionRangeError);
    expect(() => thermocoupleToleranceC("K", { standard: "custom", toleranceC: -1 }, 100)).toThrow(/negative/);
  });
  it("bad type, standard, class and temperature give precise errors", () => {
    expect(() => thermocoupleToleranceC("X" as ThermocoupleType, iec(1), 100)).toThrow(/thermocouple type "X" is not a valid choice/);
    expect(() => thermocoupleToleranceC("K", { standard: "DIN" } as unknown as ThermocoupleTolerance, 100)).toThrow(
      /tolerance standard "DIN" is not a valid choice/,
    );
    expect(() => thermocoupleToleranceC("K", { standard: "IEC 60584-1", class: 4 } as unknown as ThermocoupleTolerance, 100)).toThrow(
      /class 4 is not a valid choice/,
    );
    expect(() => thermocoupleToleranceC("K", iec(1), Number.NaN)).toThrow(/temperature NaN .*is not a finite number/);
  });
});
