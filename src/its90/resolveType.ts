/**
 * Letter → data registry. Importing this module brings all eight types' data; code that needs one type
 * only should import that type's data module and use {@link createThermocouple}.
 * @module
 */
import type { ThermocoupleData, ThermocoupleType } from "../data/thermocoupleData.js";
import { typeB } from "../data/typeB.js";
import { typeE } from "../data/typeE.js";
import { typeJ } from "../data/typeJ.js";
import { typeK } from "../data/typeK.js";
import { typeN } from "../data/typeN.js";
import { typeR } from "../data/typeR.js";
import { typeS } from "../data/typeS.js";
import { typeT } from "../data/typeT.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";

/** The eight letter-designated types of IEC 60584-1 / NIST Monograph 175, in alphabetical order. */
export const thermocoupleTypes: readonly ThermocoupleType[] = ["B", "E", "J", "K", "N", "R", "S", "T"];

/**
 * Returns the reference data of a type given by letter (or passes a data object through).
 * @param type - `"B"`, `"E"`, `"J"`, `"K"`, `"N"`, `"R"`, `"S"` or `"T"` (case-sensitive), or a data object
 * @throws HotjunctionRangeError (code `UNKNOWN_TYPE`) naming the valid types
 * @example
 * ```ts
 * import { thermocoupleData } from "hotjunction";
 * console.log(thermocoupleData("K").maxC); // "1372.000"
 * ```
 */
export function thermocoupleData(type: ThermocoupleType | ThermocoupleData): ThermocoupleData {
  if (typeof type === "string") {
    // A switch is the fastest lookup and cannot reach inherited keys such as "__proto__".
    switch (type) {
      case "B": return typeB;
      case "E": return typeE;
      case "J": return typeJ;
      case "K": return typeK;
      case "N": return typeN;
      case "R": return typeR;
      case "S": return typeS;
      case "T": return typeT;
    }
  } else if (typeof type === "object" && type !== null && Array.isArray((type as ThermocoupleData).forward)) {
    return type;
  }
  const details = {
    code: "UNKNOWN_TYPE" as const,
    quantity: "thermocouple type",
    value: type,
    allowed: thermocoupleTypes,
    problem: "is not a known type",
  };
  if (typeof type === "string") throw new HotjunctionRangeError(details);
  throw new HotjunctionTypeError(details);
}
