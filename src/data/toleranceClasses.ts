/**
 * Thermocouple tolerance tables (data only): IEC 60584-1:2013 tolerance classes 1, 2, 3 and ASTM E230
 * Table 1 initial tolerances (standard and special limits). Evaluated by `thermocoupleToleranceC` in
 * `chain/`.
 *
 * A band's tolerance at t (°C) is the larger of `toleranceC + slopePerC·(t − slopeFromC)` and
 * `fractionOfReading·|t|`. Bands of one grade are contiguous and in ascending temperature order.
 * @module
 */
import { _deepFreeze } from "./deepFreeze.js";
import type { ThermocoupleType } from "./thermocoupleData.js";

/** One temperature band of a tolerance statement. */
export interface ToleranceBand {
  /** Lowest temperature of the band, °C. */
  readonly minC: number;
  /** Highest temperature of the band, °C. */
  readonly maxC: number;
  /** Fixed part, ± °C (0 when the band is proportional only). */
  readonly toleranceC: number;
  /** Part proportional to |t|, ± fraction (0 when the band is fixed only). */
  readonly fractionOfReading: number;
  /** Linear growth of the fixed part, °C per °C above `slopeFromC` (IEC types R and S class 1 above 1100 °C). */
  readonly slopePerC?: number;
  /** Start of the linear growth, °C. */
  readonly slopeFromC?: number;
}

/** A tolerance table: per grade, per type, the bands (a type absent from a grade has no such grade). */
export interface ToleranceTable<Grade extends string | number> {
  /** Document and table the values come from. */
  readonly source: string;
  readonly grades: Readonly<Record<Grade, Readonly<Partial<Record<ThermocoupleType, readonly ToleranceBand[]>>>>>;
}

// The helpers are marked free of side effects so that bundles which never read the tables drop them.
// @__NO_SIDE_EFFECTS__
const fixed = (minC: number, maxC: number, toleranceC: number): ToleranceBand => ({
  minC,
  maxC,
  toleranceC,
  fractionOfReading: 0,
});
// @__NO_SIDE_EFFECTS__
const proportional = (minC: number, maxC: number, fractionOfReading: number): ToleranceBand => ({
  minC,
  maxC,
  toleranceC: 0,
  fractionOfReading,
});
// @__NO_SIDE_EFFECTS__
const largerOf = (minC: number, maxC: number, toleranceC: number, fractionOfReading: number): ToleranceBand => ({
  minC,
  maxC,
  toleranceC,
  fractionOfReading,
});

/**
 * IEC 60584-1:2013 tolerance classes (table of tolerance classes for thermocouples), as reproduced in
 * published copies of the standard's table. Types R and S class 2 start at 0 °C (some reproductions
 * start it at −40 °C; the narrower range is kept).
 */
export const iecToleranceClasses: ToleranceTable<1 | 2 | 3> = /* @__PURE__ */ _deepFreeze({
  source: "IEC 60584-1:2013, table of tolerance classes",
  // Deliberately alike: one row per type and class, the same shape with the standard's own values (data).
  grades: {
    1: {
      T: [fixed(-40, 125, 0.5), proportional(125, 350, 0.004)],
      E: [fixed(-40, 375, 1.5), proportional(375, 800, 0.004)],
      J: [fixed(-40, 375, 1.5), proportional(375, 750, 0.004)],
      K: [fixed(-40, 375, 1.5), proportional(375, 1000, 0.004)],
      N: [fixed(-40, 375, 1.5), proportional(375, 1000, 0.004)],
      R: [fixed(0, 1100, 1.0), { minC: 1100, maxC: 1600, toleranceC: 1.0, fractionOfReading: 0, slopePerC: 0.003, slopeFromC: 1100 }],
      S: [fixed(0, 1100, 1.0), { minC: 1100, maxC: 1600, toleranceC: 1.0, fractionOfReading: 0, slopePerC: 0.003, slopeFromC: 1100 }],
    },
    2: {
      T: [fixed(-40, 133, 1.0), proportional(133, 350, 0.0075)],
      E: [fixed(-40, 333, 2.5), proportional(333, 900, 0.0075)],
      J: [fixed(-40, 333, 2.5), proportional(333, 750, 0.0075)],
      K: [fixed(-40, 333, 2.5), proportional(333, 1200, 0.0075)],
      N: [fixed(-40, 333, 2.5), proportional(333, 1200, 0.0075)],
      R: [fixed(0, 600, 1.5), proportional(600, 1600, 0.0025)],
      S: [fixed(0, 600, 1.5), proportional(600, 1600, 0.0025)],
      B: [proportional(600, 1700, 0.0025)],
    },
    3: {
      T: [proportional(-200, -67, 0.015), fixed(-67, 40, 1.0)],
      E: [proportional(-200, -167, 0.015), fixed(-167, 40, 2.5)],
      K: [proportional(-200, -167, 0.015), fixed(-167, 40, 2.5)],
      N: [proportional(-200, -167, 0.015), fixed(-167, 40, 2.5)],
      B: [fixed(600, 800, 4.0), proportional(800, 1700, 0.005)],
    },
  },
});

/**
 * ASTM E230 Table 1 initial tolerances (larger of a fixed value and a percentage of the temperature in
 * °C). Below 0 °C only types T, E and K have standard limits; special limits are not established there.
 */
export const astmE230Tolerances: ToleranceTable<"standard" | "special"> = /* @__PURE__ */ _deepFreeze({
  source: "ASTM E230, Table 1 (initial tolerances)",
  grades: {
    standard: {
      T: [largerOf(-200, 0, 1.0, 0.015), largerOf(0, 370, 1.0, 0.0075)],
      J: [largerOf(0, 760, 2.2, 0.0075)],
      E: [largerOf(-200, 0, 1.7, 0.01), largerOf(0, 870, 1.7, 0.005)],
      K: [largerOf(-200, 0, 2.2, 0.02), largerOf(0, 1260, 2.2, 0.0075)],
      N: [largerOf(0, 1260, 2.2, 0.0075)],
      R: [largerOf(0, 1480, 1.5, 0.0025)],
      S: [largerOf(0, 1480, 1.5, 0.0025)],
      B: [largerOf(870, 1700, 0, 0.005)],
    },
    special: {
      T: [largerOf(0, 370, 0.5, 0.004)],
      J: [largerOf(0, 760, 1.1, 0.004)],
      E: [largerOf(0, 870, 1.0, 0.004)],
      K: [largerOf(0, 1260, 1.1, 0.004)],
      N: [largerOf(0, 1260, 1.1, 0.004)],
      R: [largerOf(0, 1480, 0.6, 0.001)],
      S: [largerOf(0, 1480, 0.6, 0.001)],
      B: [largerOf(870, 1700, 0, 0.0025)],
    },
  },
});
