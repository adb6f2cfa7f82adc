/**
 * Extension and compensating cable tolerances (data only), evaluated by `chain/wire/extensionCable.ts`.
 *
 * **Every value here is from memory** (not copied from a seen copy of the standards); check it against your
 * copy of the standard before relying on it, or state the cable's tolerance yourself (`standard: "custom"`).
 *
 * - IEC 60584-3 (extension and compensating cables, tolerance classes 1 and 2) states the tolerance as an
 *   EMF, ± µV, valid while the cable's junction lies in the stated temperature range; the °C figure printed
 *   beside it is that EMF at a stated measuring-junction temperature (kept here as `equivalentC` /
 *   `equivalentAtC` for reports only). Compensating cables (`…CA`, `…CB`, `NC`, `BC`) have class 2 only.
 * - ASTM E230 (extension-wire initial tolerances, standard and special limits) states the tolerance in °C over
 *   the extension wire's temperature range; it is converted to an EMF through the Seebeck coefficient at the
 *   cable's temperature (not at the tip). Compensating extension wires for types R, S and B have standard
 *   limits only.
 * @module
 */
import type { ThermocoupleType } from "./thermocoupleData.js";

/** One cable tolerance statement. */
export interface CableToleranceEntry {
  /** Cable code (IEC: `KX`, `KCA` …; ASTM: `KX`, `SX` …). */
  readonly code: string;
  /** `"extension"` (same alloys as the thermocouple) or `"compensating"` (other alloys matching its EMF over a narrow range). */
  readonly grade: "extension" | "compensating";
  /** IEC compensating cables of type K, R and S come in variants A and B (different alloys and ranges). */
  readonly variant?: "A" | "B";
  /** Lowest cable temperature where the tolerance holds, °C. */
  readonly minC: number;
  /** Highest cable temperature where the tolerance holds, °C. */
  readonly maxC: number;
  /** The tolerance as an EMF, ± µV (IEC 60584-3 entries). */
  readonly toleranceMicrovolts?: number;
  /** The tolerance in °C at the cable's temperature (ASTM E230 entries). */
  readonly toleranceC?: number;
  /** IEC: the °C equivalent printed beside the µV value, ± °C (reports only). */
  readonly equivalentC?: number;
  /** IEC: the measuring-junction temperature at which `equivalentC` is stated, °C. */
  readonly equivalentAtC?: number;
}

/** A cable tolerance table: per grade (class or limits), per thermocouple type, the entries. */
export interface CableToleranceTable<Grade extends string | number> {
  /** Document the values come from and how they were obtained. */
  readonly source: string;
  readonly grades: Readonly<Record<Grade, Readonly<Partial<Record<ThermocoupleType, readonly CableToleranceEntry[]>>>>>;
}

/** IEC 60584-3 cable tolerance classes 1 and 2 (from memory; see the module note). */
export const iecCableTolerances: CableToleranceTable<1 | 2> = {
  source: "IEC 60584-3 (extension and compensating cables, tolerance classes), values from memory",
  grades: {
    1: {
      J: [{ code: "JX", grade: "extension", minC: -25, maxC: 200, toleranceMicrovolts: 85, equivalentC: 1.5, equivalentAtC: 500 }],
      T: [{ code: "TX", grade: "extension", minC: -25, maxC: 100, toleranceMicrovolts: 30, equivalentC: 0.5, equivalentAtC: 300 }],
      E: [{ code: "EX", grade: "extension", minC: -25, maxC: 200, toleranceMicrovolts: 120, equivalentC: 1.5, equivalentAtC: 500 }],
      K: [{ code: "KX", grade: "extension", minC: -25, maxC: 200, toleranceMicrovolts: 60, equivalentC: 1.5, equivalentAtC: 900 }],
      N: [{ code: "NX", grade: "extension", minC: -25, maxC: 200, toleranceMicrovolts: 60, equivalentC: 1.5, equivalentAtC: 900 }],
    },
    2: {
      J: [{ code: "JX", grade: "extension", minC: -25, maxC: 200, toleranceMicrovolts: 140, equivalentC: 2.5, equivalentAtC: 500 }],
      T: [{ code: "TX", grade: "extension", minC: -25, maxC: 100, toleranceMicrovolts: 60, equivalentC: 1.0, equivalentAtC: 300 }],
      E: [{ code: "EX", grade: "extension", minC: -25, maxC: 200, toleranceMicrovolts: 200, equivalentC: 2.5, equivalentAtC: 500 }],
      K: [
        { code: "KX", grade: "extension", minC: -25, maxC: 200, toleranceMicrovolts: 100, equivalentC: 2.5, equivalentAtC: 900 },
        { code: "KCA", grade: "compensating", variant: "A", minC: 0, maxC: 150, toleranceMicrovolts: 100, equivalentC: 2.5, equivalentAtC: 900 },
        { code: "KCB", grade: "compensating", variant: "B", minC: 0, maxC: 100, toleranceMicrovolts: 100, equivalentC: 2.5, equivalentAtC: 900 },
      ],
      N: [
        { code: "NX", grade: "extension", minC: -25, maxC: 200, toleranceMicrovolts: 100, equivalentC: 2.5, equivalentAtC: 900 },
        { code: "NC", grade: "compensating", minC: 0, maxC: 150, toleranceMicrovolts: 100, equivalentC: 2.5, equivalentAtC: 900 },
      ],
      R: [
        { code: "RCA", grade: "compensating", variant: "A", minC: 0, maxC: 100, toleranceMicrovolts: 30, equivalentC: 2.5, equivalentAtC: 1000 },
        { code: "RCB", grade: "compensating", variant: "B", minC: 0, maxC: 200, toleranceMicrovolts: 60, equivalentC: 5.0, equivalentAtC: 1000 },
      ],
      S: [
        { code: "SCA", grade: "compensating", variant: "A", minC: 0, maxC: 100, toleranceMicrovolts: 30, equivalentC: 2.5, equivalentAtC: 1000 },
        { code: "SCB", grade: "compensating", variant: "B", minC: 0, maxC: 200, toleranceMicrovolts: 60, equivalentC: 5.0, equivalentAtC: 1000 },
      ],
      B: [{ code: "BC", grade: "compensating", minC: 0, maxC: 100, toleranceMicrovolts: 40, equivalentC: 3.5, equivalentAtC: 1400 }],
    },
  },
};

/** ASTM E230 extension-wire initial tolerances, standard and special limits (from memory; see the module note). */
export const astmExtensionWireTolerances: CableToleranceTable<"standard" | "special"> = {
  source: "ASTM E230 (tolerances of extension wires), values from memory",
  grades: {
    // Deliberately alike: standard and special limits are two tables of one shape with their own values (data).
    standard: {
      T: [{ code: "TX", grade: "extension", minC: -60, maxC: 100, toleranceC: 1.0 }],
      J: [{ code: "JX", grade: "extension", minC: 0, maxC: 200, toleranceC: 2.2 }],
      E: [{ code: "EX", grade: "extension", minC: 0, maxC: 200, toleranceC: 1.7 }],
      K: [{ code: "KX", grade: "extension", minC: 0, maxC: 200, toleranceC: 2.2 }],
      N: [{ code: "NX", grade: "extension", minC: 0, maxC: 200, toleranceC: 2.2 }],
      R: [{ code: "SX", grade: "compensating", minC: 0, maxC: 200, toleranceC: 5.0 }],
      S: [{ code: "SX", grade: "compensating", minC: 0, maxC: 200, toleranceC: 5.0 }],
      B: [{ code: "BX", grade: "compensating", minC: 0, maxC: 100, toleranceC: 3.7 }],
    },
    // Deliberately alike: the special limits repeat the standard table's shape with their own values (data).
    special: {
      T: [{ code: "TX", grade: "extension", minC: -60, maxC: 100, toleranceC: 0.5 }],
      J: [{ code: "JX", grade: "extension", minC: 0, maxC: 200, toleranceC: 1.1 }],
      E: [{ code: "EX", grade: "extension", minC: 0, maxC: 200, toleranceC: 1.0 }],
      K: [{ code: "KX", grade: "extension", minC: 0, maxC: 200, toleranceC: 1.1 }],
      N: [{ code: "NX", grade: "extension", minC: 0, maxC: 200, toleranceC: 1.1 }],
    },
  },
};
