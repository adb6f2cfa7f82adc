/**
 * The forward function's promise as the README states it: the a-priori Horner bound γ₂ₙ₊₂·Σ|cᵢ||t|ⁱ (Higham,
 * Accuracy and Stability of Numerical Algorithms, §5.1, from memory; `_emfEvaluationBound`) proves 1e-10 mV on
 * every sub-range of the eight types (NIST Monograph 175 coefficients) except the cold ends of types E and T
 * (−270…0 °C), where it is 4.62e-10 and 4.18e-9 mV (stated as 4.7e-10 and 4.2e-9) and the 1e-10 mV is measured only (tests/its90/precision).
 */
import { describe, expect, it } from "vitest";
import { _emfEvaluationBound } from "../../src/its90/curvatureEnclosure.js";
import { _compile } from "../../src/its90/compiled.js";
import { thermocoupleData, thermocoupleTypes } from "../../src/its90/resolveType.js";

describe("a-priori bound of the forward function", () => {
  it("proves 1e-10 mV everywhere but the cold ends of E and T, whose bounds are the stated exceptions", () => {
    for (const type of thermocoupleTypes) {
      const ct = _compile(thermocoupleData(type));
      ct.subranges.forEach((sub, i) => {
        const bound = _emfEvaluationBound(ct, i, [sub.minC, sub.maxC]);
        const coldEnd = (type === "E" || type === "T") && sub.maxC <= 0;
        if (!coldEnd) expect(bound, `type ${type} ${sub.minC}…${sub.maxC} °C`).toBeLessThanOrEqual(1e-10);
        else {
          expect(bound).toBeGreaterThan(1e-10);
          expect(bound).toBeLessThanOrEqual(type === "E" ? 4.7e-10 : 4.2e-9);
        }
      });
    }
  });
});
