import { describe, expect, it } from "vitest";
import { compareReferences } from "../../src/trip/compareReferences.js";
import { HotjunctionRangeError } from "../../src/errors.js";
import { realizeReference } from "../../src/trip/realizeReference.js";
import type { ReferenceOption, TripDesign } from "../../src/trip/types.js";

const fast = { monteCarloTrials: 500, seed: 8 } as const;

// Ceramic kiln demo (invented numbers): type K, 5 mV/°C fixed-scale amplifier, trip at 400 °C.
const kiln: TripDesign = {
  setpoints: [{ name: "glaze", tripTemperatureC: 400, maxNormalOperatingC: 385, hazardLimitC: 420 }],
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
  amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
  comparator: { kind: "comparator", offsetMillivolts: 2 },
  reference: { kind: "ideal", name: "placeholder", nominalVolts: 5 },
  resistors: { series: "E96", toleranceFraction: 0.001 },
  ambient: { minC: 20, maxC: 30 },
};
const rail: ReferenceOption = { kind: "element", name: "5 V regulator rail", cost: 0, element: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 } };
const series: ReferenceOption = { kind: "element", name: "4.096 V series reference", cost: 1.2, element: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: 0.001, tempcoPpmPerC: 10 } };
const shunt: ReferenceOption = {
  kind: "sized-shunt",
  name: "2.5 V shunt reference",
  cost: 0.3,
  element: { kind: "reference", variant: "shunt", nominalVolts: 2.5, initialAccuracyFraction: 0.005, tempcoPpmPerC: 50, dynamicImpedanceOhms: 0.5, supplyMinVolts: 4.75, supplyMaxVolts: 5.25, shuntMinMilliamps: 0.5, shuntMaxMilliamps: 15 },
};

describe("compareReferences", () => {
  it("judges the ±4 % rail inadequate for a 15 °C margin and recommends the cheapest adequate option", () => {
    // ±4 % of ≈2.07 V is ±83 mV ≈ ±16 °C at 5 mV/°C (common practice, no source): beyond 385…420 °C.
    const c = compareReferences(kiln, [rail, series, shunt], fast);
    expect(c.options.map((o) => o.verdict)).toEqual(["inadequate", "adequate", "adequate"]);
    expect(c.recommended).toBe("2.5 V shunt reference");
    expect(c.options[0]!.verdictText).toMatch(/^5 V regulator rail is not good enough: Setpoint "glaze"/);
    expect(c.options[1]!.verdictText).toMatch(/^4.096 V series reference is good enough/);
    expect(c.summary).toMatch(/2 of 3 reference options/);
    // the rail adds most of its band: extra width ≈ 2·16 °C (hand calculation above), the series reference < 1 °C
    expect(c.options[0]!.setpoints[0]!.extraWidthC).toBeGreaterThan(25);
    expect(c.options[1]!.setpoints[0]!.extraWidthC).toBeLessThan(1);
    expect(c.options[1]!.setpoints[0]!.extraWidthC).toBeGreaterThanOrEqual(0);
  });

  it("an ideal option adds nothing over the ideal reference", () => {
    const c = compareReferences(kiln, [{ kind: "ideal", name: "perfect 5 V", nominalVolts: 5 }], fast);
    expect(c.options[0]!.setpoints[0]!.extraWidthC).toBe(0);
    expect(c.options[0]!.cost).toBeNull();
  });

  it("sizes the shunt's series resistor with the divider current in the load", () => {
    const c = compareReferences(kiln, [shunt], fast);
    const r = c.options[0]!.reference;
    const divider = c.options[0]!.networks[0]!;
    // R ≤ (4.75 − 2.5) V / (I_div + 0.5 mA), with 1 % (design default) tolerance margin: error-budget-checks §5 (a)
    const bound = (2.25 / (divider.currentMilliamps + 0.5)) * 1000;
    const seriesOhms = r.element?.variant === "shunt" ? r.element.seriesOhms : Number.NaN;
    expect(seriesOhms * 1.001).toBeLessThanOrEqual(bound);
    expect(r.shuntCurrentMinMilliamps!).toBeGreaterThanOrEqual(0.5);
    expect(r.problems).toEqual([]);
  });

  it("flags a shunt whose current exceeds its maximum at high supply", () => {
    const greedy: ReferenceOption = { ...shunt, name: "tight shunt", element: { ...shunt.element, supplyMaxVolts: 12, shuntMaxMilliamps: 2 } } as ReferenceOption;
    const c = compareReferences(kiln, [greedy], fast);
    expect(c.options[0]!.verdict).toBe("inadequate");
    expect(c.options[0]!.reference.problems[0]).toMatch(/exceeds the maximum 2 mA/);
    expect(c.recommended).toBeNull();
  });

  it("throws for repeated names and no options", () => {
    expect(() => compareReferences(kiln, [rail, rail], fast)).toThrow(/appears twice/);
    expect(() => compareReferences(kiln, [], fast)).toThrow(/non-empty/);
  });
});

describe("realizeReference", () => {
  it("sizes a 2.5 V shunt from 4.75…5.25 V: largest E24 value with 1 % margin", () => {
    // R ≤ 2.25 V / (0.25 + 0.1) mA = 6428.6 Ω; 6428.6/1.01 = 6364.9 Ω → 6.2 kΩ (E24); error-budget-checks §5 (a)
    const { realization } = realizeReference(
      { kind: "sized-shunt", name: "shunt", element: { kind: "reference", variant: "shunt", nominalVolts: 2.5, initialAccuracyFraction: 0.005, supplyMinVolts: 4.75, supplyMaxVolts: 5.25, shuntMinMilliamps: 0.1, shuntMaxMilliamps: 15 } },
      { minC: -20, maxC: 60 },
      { dividerCurrentMilliamps: 0.25, resistorSeries: "E24", resistorToleranceFraction: 0.01 },
    );
    expect(realization.element?.variant === "shunt" && realization.element.seriesOhms).toBe(6200);
    // worst current at 5.25 V, R·0.99, least load: 2.75/6138 Ω − 0.25 mA = 0.198 mA (hand calculation)
    expect(realization.shuntCurrentMaxMilliamps!).toBeCloseTo(2.75 / (6200 * 0.99) * 1000 - 0.25, 9);
    expect(realization.seriesResistorPowerWatts!).toBeCloseTo(2.75 ** 2 / (6200 * 0.99), 12);
  });
  it("rejects a supply that cannot feed the shunt", () => {
    expect(() =>
      realizeReference(
        { kind: "sized-shunt", name: "shunt", element: { kind: "reference", variant: "shunt", nominalVolts: 2.5, initialAccuracyFraction: 0.005, supplyMinVolts: 2.4, supplyMaxVolts: 5, shuntMinMilliamps: 0.1, shuntMaxMilliamps: 15 } },
        { minC: 0, maxC: 50 },
      ),
    ).toThrow(/not above the reference voltage/);
  });
});

describe("realizeReference refuses an unknown reference variant", () => {
  // Regression: a variant outside series/shunt/regulator used to be read as a regulator
  // ("regulator tolerance undefined is missing"); the chain's reference module names the variant and the choices.
  it("throws INVALID_OPTION naming the variant and series, shunt, regulator", () => {
    const option = {
      kind: "element",
      name: "mystery",
      element: { kind: "reference", variant: "bandgap", nominalVolts: 2.5, initialAccuracyFraction: 0.001 },
    } as unknown as ReferenceOption;
    let caught: unknown;
    try {
      realizeReference(option, { minC: 0, maxC: 50 });
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(HotjunctionRangeError);
    const err = caught as HotjunctionRangeError;
    expect(err.code).toBe("INVALID_OPTION");
    expect(err.message).toMatch(/reference variant "bandgap" is not a valid choice/);
    expect(err.message).toMatch(/series, shunt, regulator/);
    expect(err.message).not.toMatch(/regulator tolerance/);
  });
  it("designTrip refuses it the same way", () => {
    const design = { ...kiln, reference: { kind: "element", name: "mystery", element: { kind: "reference", variant: "bandgap", nominalVolts: 5 } } } as unknown as TripDesign;
    expect(() => compareReferences(design, [design.reference], fast)).toThrow(/reference variant "bandgap" is not a valid choice/);
  });
});
