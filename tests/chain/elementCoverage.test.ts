/**
 * Every reference variant and every chain element kind the chain compiles is reachable from the design file
 * (schema → design objects), and the fault catalogue has faults for it. The lists come from the chain's own
 * compile switches (the valid choices their errors name), so a variant or kind wired into `_compileChain`
 * but not into the schema or the catalogue fails here. Common practice, no source: a structural check of the
 * code, not of a published value.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { _compileChain, _sourcesAt } from "../../src/chain/_compileChain.js";
import type { MeasurementChain } from "../../src/chain/types.js";
import { measurementChainFromDesign, referenceOptionFromDesign, tripDesignFromDesign } from "../../src/design/designToObjects.js";
import { parseDesign } from "../../src/design/parseDesign.js";
import { HotjunctionRangeError } from "../../src/errors.js";
import { faultCatalogue } from "../../src/faults/faultCatalogue.js";
import { realizeReference } from "../../src/trip/realizeReference.js";

const base: MeasurementChain = {
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
  amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
  reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001 },
  detector: { kind: "comparator" },
  ambient: { minC: 25, maxC: 25 },
};

/** The valid choices a compile switch names when given an unknown value. */
function choices(make: () => unknown): string[] {
  try {
    make();
  } catch (e) {
    if (e instanceof HotjunctionRangeError && e.allowed !== undefined) return [...e.allowed];
    throw e;
  }
  throw new Error("the switch accepted an unknown value");
}

const bogus = "no-such-kind";
const referenceVariants = choices(() => _compileChain({ ...base, reference: { ...base.reference, variant: bogus } } as unknown as MeasurementChain));
const amplifierKinds = choices(() => _compileChain({ ...base, amplifier: { kind: bogus } } as unknown as MeasurementChain));
const detectorKinds = choices(() => _compileChain({ ...base, detector: { kind: bogus } } as unknown as MeasurementChain));
const wireSlots = choices(() => _compileChain({ ...base, wire: { [bogus]: {} } } as unknown as MeasurementChain));
const coldJunctionMethods = choices(() =>
  _compileChain({ ...base, amplifier: undefined, coldJunction: { kind: "coldJunction", method: bogus } } as unknown as MeasurementChain),
);

/** Every chain the example design files give: each reference and alternative, as a trip builds it. */
function exampleChains(): MeasurementChain[] {
  const out: MeasurementChain[] = [];
  for (const file of ["ceramic-kiln-cutout.json", "heated-enclosure-adc.json", "reflow-oven-trip.json", "heat-treat-furnace-wire.json"]) {
    const design = parseDesign(readFileSync(`examples/${file}`, "utf8"));
    for (const reference of [design.reference, ...(design.referenceAlternatives ?? [])]) {
      const chain = measurementChainFromDesign(design, reference);
      if (chain.detector.kind !== "comparator") {
        out.push(chain);
        continue;
      }
      // A trip realizes its reference (a shunt's series resistor is sized here) and adds the threshold divider.
      const trip = tripDesignFromDesign(design);
      const { element } = realizeReference(referenceOptionFromDesign(reference), trip.ambient, { dividerCurrentMilliamps: 0.1 });
      out.push({ ...chain, reference: element, divider: { kind: "divider", resistorsOhms: [10000, 10000], toleranceFraction: trip.resistors.toleranceFraction } });
    }
  }
  return out;
}

describe("every element kind and reference variant is in the schema, the catalogue and the chain", () => {
  it("the compile switches name the known lists (so a new entry shows up below)", () => {
    expect(referenceVariants).toEqual(["series", "shunt", "regulator"]);
    expect(amplifierKinds).toEqual(["amplifier", "fixedScaleAmplifier"]);
    expect(detectorKinds).toEqual(["comparator", "adc"]);
    expect(coldJunctionMethods).toEqual(["software", "hardware"]);
    expect(wireSlots).toEqual(["cable", "connectors", "loop", "leakage", "ageing"]);
  });

  const chains = exampleChains();
  const cases: [string, readonly string[], (c: MeasurementChain) => string | undefined, string][] = [
    ["reference variant", referenceVariants, (c) => c.reference?.variant, "reference"],
    ["amplifier kind", amplifierKinds, (c) => c.amplifier?.kind, ""],
    ["detector kind", detectorKinds, (c) => c.detector.kind, ""],
    ["cold-junction method", coldJunctionMethods, (c) => c.coldJunction?.method, ""],
  ];
  for (const [what, list, pick, faultElement] of cases) {
    for (const value of list) {
      it(`${what} "${value}": a design file reaches it, it compiles, and the fault catalogue covers it`, () => {
        const withIt = chains.filter((c) => pick(c) === value);
        expect(withIt.length, `no example design file gives a chain with ${what} ${value}`).toBeGreaterThan(0);
        for (const chain of withIt) {
          expect(() => _compileChain(chain)).not.toThrow();
          const elements = new Set(faultCatalogue(chain).map((f) => f.element));
          // The element's own faults: a reference by its slot, amplifiers and detectors by their kind.
          const expected = faultElement !== "" ? faultElement : what === "cold-junction method" ? "coldJunction" : value;
          if (what === "cold-junction method" && value === "software") {
            // Software compensation happens after the ADC: its faults are the ADC's and the reading's.
            expect(elements.has("adc")).toBe(true);
          } else {
            expect(elements.has(expected), `${[...elements].join(", ")} lacks ${expected}`).toBe(true);
          }
        }
      });
    }
  }

  // The wire's slots: each reached by an example design file, compiled, its sources in the chain's list by
  // their role, and faults of its role in the catalogue.
  const wireRole: Record<string, string> = { cable: "cable", connectors: "connector", loop: "loop", leakage: "probe", ageing: "probe" };
  const wireSource: Record<string, RegExp> = {
    cable: /^cable\./,
    connectors: /^connector\d*\./,
    loop: /^loop\./,
    leakage: /^probe\.leakage$/,
    ageing: /^probe\.ageing$/,
  };
  for (const slot of wireSlots) {
    it(`wire slot "${slot}": a design file reaches it, it compiles, its sources are listed and the fault catalogue covers it`, () => {
      const withIt = chains.filter((c) => (c.wire as Record<string, unknown> | undefined)?.[slot] !== undefined);
      expect(withIt.length, `no example design file gives a chain with wire.${slot}`).toBeGreaterThan(0);
      for (const chain of withIt) {
        const cc = _compileChain(chain);
        const names = _sourcesAt(cc, 500).map((s) => s.name);
        expect(names.some((n) => wireSource[slot]?.test(n)), `${names.join(", ")} lacks a ${slot} source`).toBe(true);
        const elements = new Set(faultCatalogue(chain).map((f) => f.element));
        expect(elements.has(wireRole[slot] as string), `${[...elements].join(", ")} lacks ${wireRole[slot]}`).toBe(true);
      }
    });
  }

  it("the fixed slots (thermocouple, divider) are reached and have faults", () => {
    const withDivider = chains.filter((c) => c.divider !== undefined);
    expect(withDivider.length).toBeGreaterThan(0);
    for (const chain of chains) expect(faultCatalogue(chain).some((f) => f.element === "thermocouple")).toBe(true);
    for (const chain of withDivider) expect(faultCatalogue(chain).some((f) => f.element === "divider")).toBe(true);
  });
});
