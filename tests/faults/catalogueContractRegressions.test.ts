/**
 * Regressions found by tests/contract in the fault catalogue: the parts of a chain that go into the faults' ids,
 * words and effects are checked, so a forged amplifier kind, reference voltage or divider resistance is a typed
 * error naming it (the catalogue printed "NaN Ω", "to Infinity V" or "-Infinity.outputStuckLow", or threw a plain
 * TypeError).
 */
import { describe, expect, it } from "vitest";
import { typedErrorOf } from "../_typedError.js";
import { faultCatalogue, type MeasurementChain } from "../../src/index.js";


// the documented example's chain (an invented demo)
const chain: MeasurementChain = {
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
  amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
  reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001 },
  divider: { kind: "divider", resistorsOhms: [10000, 10000], toleranceFraction: 0.01 },
  detector: { kind: "comparator" },
  ambient: { minC: 15, maxC: 50 },
};
const forged = (patch: Record<string, unknown>): MeasurementChain => ({ ...chain, ...patch }) as never;

describe("faultCatalogue checks what it writes into ids and descriptions", () => {
  it("the divider's resistances: not an array, a hole, NaN, ±Infinity, an object without a string form", () => {
    expect(typedErrorOf(() => faultCatalogue(forged({ divider: { ...chain.divider, resistorsOhms: 0 } }))).quantity).toBe("chain.divider.resistorsOhms");
    // eslint-disable-next-line no-sparse-arrays
    for (const [ohms, at] of [[[10000, , 3], 1], [[Number.NaN, 1], 0], [[1, Number.POSITIVE_INFINITY], 1], [[-Infinity, 1], 0], [[Object.create(null), 1], 0], [[[Number.NaN], 1], 0]] as const) {
      expect(typedErrorOf(() => faultCatalogue(forged({ divider: { ...chain.divider, resistorsOhms: ohms } }))).quantity).toBe(`chain.divider.resistorsOhms[${at}]`);
    }
  });

  it("the reference: not an object, a non-finite or overflowing voltage", () => {
    for (const reference of [null, Number.POSITIVE_INFINITY]) expect(typedErrorOf(() => faultCatalogue(forged({ reference }))).quantity).toBe("chain.reference");
    for (const nominalVolts of [Number.POSITIVE_INFINITY, -Infinity, Number.NaN]) {
      expect(typedErrorOf(() => faultCatalogue(forged({ reference: { ...chain.reference, nominalVolts } }))).quantity).toBe("chain.reference.nominalVolts");
    }
    expect(typedErrorOf(() => faultCatalogue(forged({ reference: { ...chain.reference, nominalVolts: 1e308 } }))).code).toBe("OVERFLOW");
  });

  it("the amplifier's kind is one of the two kinds; options must be an object", () => {
    for (const kind of [Number.POSITIVE_INFINITY, -Infinity, [Number.NaN]]) {
      const e = typedErrorOf(() => faultCatalogue(forged({ amplifier: { ...chain.amplifier, kind } })));
      expect([e.code, e.quantity]).toEqual(["INVALID_OPTION", "chain.amplifier.kind"]);
    }
    expect(typedErrorOf(() => faultCatalogue(chain, null as never)).quantity).toBe("options");
  });

  it("the valid chain's catalogue is unchanged (the documented example: 20 faults, thermocouple open first)", () => {
    const faults = faultCatalogue(chain);
    expect(faults.length).toBe(20);
    expect(faults[0]?.id).toBe("thermocouple.open");
    expect(faults.find((f) => f.id === "reference.driftedLow")?.description).toBe("reference drifted 5 % low, to 2.375 V");
  });
});
