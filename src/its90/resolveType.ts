/**
 * Letter → data registry. Importing this module brings all eight types' data; code that needs one type
 * only should import that type's data module and use {@link createThermocouple}.
 * @module
 */
import type { ApproximateInverseData, ThermocoupleData, ThermocoupleType } from "../data/thermocoupleData.js";
import { typeB, typeBApproximateInverse } from "../data/typeB.js";
import { typeE, typeEApproximateInverse } from "../data/typeE.js";
import { typeJ, typeJApproximateInverse } from "../data/typeJ.js";
import { typeK, typeKApproximateInverse } from "../data/typeK.js";
import { typeN, typeNApproximateInverse } from "../data/typeN.js";
import { typeR, typeRApproximateInverse } from "../data/typeR.js";
import { typeS, typeSApproximateInverse } from "../data/typeS.js";
import { typeT, typeTApproximateInverse } from "../data/typeT.js";
import { _deepFreeze } from "../data/deepFreeze.js";
import { HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";

/** The eight letter-designated types of IEC 60584-1 / NIST Monograph 175, in alphabetical order. */
export const thermocoupleTypes: readonly ThermocoupleType[] = /* @__PURE__ */ _deepFreeze(["B", "E", "J", "K", "N", "R", "S", "T"]);

/**
 * Returns the reference data of a type given by letter (or passes a data object through).
 * @param type - `"B"`, `"E"`, `"J"`, `"K"`, `"N"`, `"R"`, `"S"` or `"T"` (case-sensitive), or a data object
 * @throws HotjunctionRangeError (code `UNKNOWN_TYPE`) naming the valid types
 * @example
 * ```ts
 * import { thermocoupleData } from "hotjunction";
 * console.log(thermocoupleData("K").maxC); // 1372
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

/**
 * Returns the published approximate inverse data of a type (coefficients and stated error bands).
 * @param type - a type letter, or a type's data object (its letter is used)
 * @throws HotjunctionRangeError (code `UNKNOWN_TYPE`) naming the valid types
 * @example
 * ```ts
 * import { approximateInverseData } from "hotjunction";
 * console.log(approximateInverseData("K").ranges.length); // 3
 * ```
 */
export function approximateInverseData(type: ThermocoupleType | ThermocoupleData): ApproximateInverseData {
  switch (thermocoupleData(type).type) {
    case "B": return typeBApproximateInverse;
    case "E": return typeEApproximateInverse;
    case "J": return typeJApproximateInverse;
    case "K": return typeKApproximateInverse;
    case "N": return typeNApproximateInverse;
    case "R": return typeRApproximateInverse;
    case "S": return typeSApproximateInverse;
    case "T": return typeTApproximateInverse;
  }
}
