// The build sheet and the band rules of designTrip: hand-checked cases written out, with their sources.
import fc from "fast-check";
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { designTrip } from "../../src/trip/designTrip.js";
import { resistorDesignator, resistorPositionNames } from "../../src/trip/buildSheet.js";
import { _rssCoverageFactor, _selfConsistentEdge } from "../../src/trip/_bandRules.js";
import { _comparatorTripModel, _compileComparatorChain } from "../../src/chain/tripTemperatureModel.js";
import { propagate } from "../../src/uncertainty/propagate.js";
import { rectangular } from "../../src/uncertainty/rectangular.js";
import { normalDistribution } from "../../src/uncertainty/normal.js";
import { emfFromTemperature, temperatureFromEmf } from "../../src/its90/convert.js";
import { parseDesign } from "../../src/design/parseDesign.js";
import { tripDesignFromDesign } from "../../src/design/designToObjects.js";
import type { TripDesign } from "../../src/trip/types.js";

const fast = { monteCarloTrials: 400, seed: 5 } as const;

/** Type J, a ×100 fixed-gain amplifier, hardware cold-junction compensation exact at 25 °C, ideal 5 V reference. */
function gainDesign(hysteresisMillivolts: number): TripDesign {
  return {
    setpoints: [{ name: "lehr", tripTemperatureC: 350, maxNormalOperatingC: 320, hazardLimitC: 380 }],
    thermocouple: { kind: "thermocouple", type: "J", tolerance: { standard: "custom", toleranceC: 0 } },
    coldJunction: { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 52, matchedAtC: 25 },
    amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 100 } },
    comparator: { kind: "comparator", hysteresisMillivolts, hysteresisPlacement: "below" },
    reference: { kind: "ideal", name: "ideal 5 V", nominalVolts: 5 },
    resistors: { series: "E192", toleranceFraction: 0 },
    ambient: { minC: 25, maxC: 25 },
  };
}

describe("build sheet: hand-checked thresholds and release", () => {
  it("threshold = gain × EMF: type J at 350 °C is 19.090 mV (NIST SRD 60 table, 3 decimals), ×100 = 1.9090 V", () => {
    const r = designTrip(gainDesign(0), fast);
    const sheet = r.buildSheet!.setpoints[0]!;
    // NIST table value 19.090 mV printed to 0.001 mV: ×100 → ±0.05 mV of the printed rounding.
    expect(Math.abs(sheet.idealThresholdVolts - 1.909)).toBeLessThan(0.5e-3 * 100 / 1000 + 1e-12);
    expect(sheet.idealThresholdVolts).toBeCloseTo((100 * emfFromTemperature("J", 350)) / 1000, 12);
    // the E192 pair realizes it within the series' rounding; the sheet names the resistors by position
    expect(Math.abs(sheet.realizedThresholdVolts - sheet.idealThresholdVolts) / sheet.idealThresholdVolts).toBeLessThan(0.005);
    expect(sheet.resistorsAbove.map((x) => x.designator)).toEqual(["top"]);
    expect(sheet.resistorsBelow.map((x) => x.designator)).toEqual(["bottom"]);
    const [top, bottom] = r.networks[0]!.resistorsOhms as [number, number];
    expect(sheet.realizedThresholdVolts).toBeCloseTo((5 * bottom) / (top + bottom), 12);
    // divider current = V / (R_top + R_bottom) (Ohm's law)
    expect(sheet.dividerCurrentMilliamps).toBeCloseTo((5 / (top + bottom)) * 1000, 12);
    // an ideal design: every band is a point, so the threshold band is the realized threshold
    expect(sheet.thresholdLowVolts).toBeCloseTo(sheet.realizedThresholdVolts, 12);
  });

  it("release = threshold − hysteresis: 20 mV below a ×100 signal is 0.2 mV of EMF below the trip's EMF", () => {
    const r = designTrip(gainDesign(20), fast);
    const sheet = r.buildSheet!.setpoints[0]!;
    // placement "below": the trip is at the threshold, the release 20 mV lower (comparator convention of the chain).
    const tripEmf = (sheet.realizedThresholdVolts * 1000) / 100;
    const releaseEmf = ((sheet.realizedThresholdVolts - 0.02) * 1000) / 100;
    expect(sheet.nominalTripC).toBeCloseTo(temperatureFromEmf("J", tripEmf), 6);
    expect(sheet.nominalReleaseC).toBeCloseTo(temperatureFromEmf("J", releaseEmf), 6);
    // Seebeck coefficient of type J near 350 °C ≈ 55.6 µV/°C (NIST SRD 60 table differences, 19.090 − 19.035 mV per °C at 349→350 °C, from memory): 0.2 mV ≈ 3.6 °C
    expect(sheet.hysteresisC).toBeGreaterThan(3.4);
    expect(sheet.hysteresisC).toBeLessThan(3.8);
    expect(sheet.releaseLowC).toBeCloseTo(sheet.nominalReleaseC, 9);
    expect(sheet.releaseMarginToNormalC).toBeCloseTo(sheet.releaseLowC - 320, 12);
  });

  it("shunt resistor from (Vs,min − Vref)/(Iload + Ishunt,min): reflow example, 2.25 V / 0.810 mA → E96 2.74 kΩ", () => {
    const design = tripDesignFromDesign(parseDesign(readFileSync("examples/reflow-oven-trip.json", "utf8")));
    const r = designTrip(design, fast);
    const sheet = r.buildSheet!;
    const iload = r.networks[0]!.currentMilliamps; // the divider is the only load
    const bound = (4.75 - 2.5) / ((iload + 0.1) / 1000); // Ω
    expect(bound).toBeGreaterThan(2767.4); // 2740 Ω·1.01 fits …
    expect(bound).toBeLessThan(2828); // … 2800 Ω·1.01 (the next E96 value) does not (IEC 60063 E96: 2.67, 2.74, 2.80)
    expect(sheet.shuntSeriesResistor?.ohms).toBe(2740);
    expect(sheet.shuntSeriesResistor?.series).toBe("E96");
    // P = (Vs,max − Vref)² / (R·(1 − t)) = 2.75² / 2712.6 Ω = 2.788 mW (Joule's law)
    expect(sheet.shuntSeriesResistor?.powerWatts).toBeCloseTo(2.75 ** 2 / (2740 * 0.99), 9);
    expect(sheet.shuntSeriesResistor?.ratingWatts).toBe(0.0625);
    // the bill of materials lists every chosen part with a count
    const designators = sheet.parts.map((p) => p.designators).join("; ");
    expect(designators).toContain("top");
    expect(designators).toContain("shunt series");
    expect(sheet.parts.find((p) => p.designators.startsWith("mid-rail"))?.count).toBe(2);
    expect(sheet.parts.find((p) => p.part === "thermocouple")?.tolerance).toBe(1.5); // IEC 60584-1 class 1 at 262 °C: ±1.5 °C
  });

  it("trade fact: 250 mV for 50 °C from a ±4 % 5 V rail lands at 240–260 mV (common practice, no source)", () => {
    const design: TripDesign = {
      setpoints: [{ name: "50 °C", tripTemperatureC: 50, maxNormalOperatingC: 40, hazardLimitC: 60 }],
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
      amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
      comparator: { kind: "comparator" },
      reference: { kind: "element", name: "5 V rail", element: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 } },
      resistors: { series: "E96", toleranceFraction: 0 },
      ambient: { minC: 25, maxC: 25 },
    };
    const r = designTrip(design, { ...fast, networks: [{ topology: "two-resistor", resistorsOhms: [95000, 5000], totalOhms: 100000, currentMilliamps: 0.05 }] });
    const sheet = r.buildSheet!.setpoints[0]!;
    expect(sheet.realizedThresholdVolts).toBeCloseTo(0.25, 12);
    expect(sheet.thresholdLowVolts).toBeCloseTo(0.24, 12);
    expect(sheet.thresholdHighVolts).toBeCloseTo(0.26, 12);
  });
});

describe("resistor names by position (one function for every report)", () => {
  it("two resistors are top and bottom; a ladder counts its middle resistors from the reference", () => {
    expect(resistorPositionNames(2)).toEqual(["top", "bottom"]);
    expect(resistorPositionNames(5)).toEqual(["top", "ladder 1", "ladder 2", "ladder 3", "bottom"]);
    expect(resistorDesignator(0, 2, 1, 3)).toBe("divider 2 top");
    expect(resistorDesignator(1, 2)).toBe("bottom");
  });

  it("check's error-source descriptions use the position names", () => {
    const design = tripDesignFromDesign(parseDesign(readFileSync("examples/reflow-oven-trip.json", "utf8")));
    const r = designTrip(design, fast);
    const d = r.setpoints[0]!.errorSources.find((s) => s.name === "divider.resistor2.tolerance")!.description;
    expect(d.startsWith("bottom resistor")).toBe(true);
  });
});

describe("RSS coverage factor (JCGM 100 G.2.3, G.6.5–G.6.6)", () => {
  it("a lone rectangular term: k = p·√3 (95 %: 1.6454); a lone normal term: 1.9600", () => {
    const rect = rectangular({ center: 0, halfWidth: 1 });
    expect(_rssCoverageFactor([{ contribution: 1 / Math.sqrt(3), distribution: rect }], 0.95).k).toBeCloseTo(0.95 * Math.sqrt(3), 9);
    const normal = normalDistribution({ mean: 0, standardDeviation: 1 });
    expect(_rssCoverageFactor([{ contribution: 1, distribution: normal }], 0.95).k).toBeCloseTo(1.959964, 5);
  });

  it("a rectangular half-width a with a normal of σ = a/√3 (equal variances): between the two limits", () => {
    const k = _rssCoverageFactor(
      [
        { contribution: 1 / Math.sqrt(3), distribution: rectangular({ center: 0, halfWidth: 1 }) },
        { contribution: 1 / Math.sqrt(3), distribution: normalDistribution({ mean: 0, standardDeviation: 1 }) },
      ],
      0.95,
    ).k;
    expect(k).toBeGreaterThan(1.6454);
    expect(k).toBeLessThan(1.96);
  });

  it("issue case: a dominant rectangular rail (5 mV/°C, ±4 % of 250 mV) gives an RSS band inside 48.0–52.0 °C indicated", () => {
    const design: TripDesign = {
      setpoints: [{ name: "50 °C", tripTemperatureC: 50, maxNormalOperatingC: 40, hazardLimitC: 60 }],
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "custom", toleranceC: 0 } },
      amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
      comparator: { kind: "comparator" },
      reference: { kind: "element", name: "5 V rail", element: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 } },
      resistors: { series: "E96", toleranceFraction: 0 },
      ambient: { minC: 25, maxC: 25 },
    };
    const sp = designTrip(design, { ...fast, networks: [{ topology: "two-resistor", resistorsOhms: [95000, 5000], totalOhms: 100000, currentMilliamps: 0.05 }] }).setpoints[0]!;
    expect(sp.rss.lowC).toBeGreaterThanOrEqual(sp.worstCase.lowC);
    expect(sp.rss.highC).toBeLessThanOrEqual(sp.worstCase.highC);
    expect(sp.rss.coverageFactorRule).toBe("rectangular-dominant");
    expect(sp.rss.coverageFactor).toBeCloseTo(0.95 * Math.sqrt(3), 3);
  });

  it("property: over generated designs the RSS band lies within the worst-case band", () => {
    fc.assert(
      fc.property(
        fc.record({
          tripC: fc.integer({ min: 60, max: 900 }),
          cls: fc.constantFrom(1, 2),
          refTol: fc.double({ min: 0, max: 0.05, noNaN: true }),
          resTol: fc.constantFrom(0, 0.001, 0.01, 0.05),
          accuracyC: fc.double({ min: 0, max: 5, noNaN: true }),
          span: fc.integer({ min: 0, max: 40 }),
        }),
        ({ tripC, cls, refTol, resTol, accuracyC, span }) => {
          const design: TripDesign = {
            setpoints: [{ name: "sp", tripTemperatureC: tripC, maxNormalOperatingC: tripC - 200, hazardLimitC: tripC + 200 }],
            thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: cls as 1 | 2 } },
            amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 2, accuracyC },
            comparator: { kind: "comparator", offsetMillivolts: 1 },
            reference: { kind: "element", name: "rail", element: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: refTol } },
            resistors: { series: "E96", toleranceFraction: resTol },
            ambient: { minC: 25 - span / 2, maxC: 25 + span / 2 },
          };
          const sp = designTrip(design, { monteCarloTrials: 100, seed: 1 }).setpoints[0]!;
          expect(sp.rss.lowC).toBeGreaterThanOrEqual(sp.worstCase.lowC);
          expect(sp.rss.highC).toBeLessThanOrEqual(sp.worstCase.highC);
          expect(sp.rss.coverageFactor ?? 0).toBeLessThanOrEqual(1.96);
        },
      ),
      { numRuns: 25, seed: 11 },
    );
  });
});

describe("self-consistent worst case (issue 13)", () => {
  it("type K class 2 near 330 °C: the high edge equals the chain with the tolerance at its own trip temperature", () => {
    // IEC 60584-1 class 2, type K: ±2.5 °C or ±0.0075·|t|, whichever is greater: 2.5 °C at 330 °C, 2.557 °C at 341 °C.
    const design: TripDesign = {
      setpoints: [{ name: "kiln", tripTemperatureC: 330, maxNormalOperatingC: 300, hazardLimitC: 360 }],
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
      amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5, accuracyC: 2 },
      comparator: { kind: "comparator" },
      reference: { kind: "element", name: "rail", element: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.01 } },
      resistors: { series: "E96", toleranceFraction: 0.001 },
      ambient: { minC: 20, maxC: 30 },
    };
    const r = designTrip(design, fast);
    const sp = r.setpoints[0]!;
    const high = sp.worstCase.highC;
    expect(high).toBeGreaterThan(333.4); // past 333.3 °C the class-2 tolerance grows with temperature
    // Rebuild the same chain and take the tolerance at the edge itself: the worst-case high edge reproduces it.
    const net = r.networks[0]!;
    const cc = _compileComparatorChain(
      {
        thermocouple: design.thermocouple,
        amplifier: design.amplifier!,
        reference: design.reference.kind === "element" ? design.reference.element : (undefined as never),
        divider: { kind: "divider", resistorsOhms: net.resistorsOhms, toleranceFraction: 0.001 },
        detector: design.comparator,
        ambient: design.ambient,
      },
      "test",
    );
    const at = (t: number) => {
      const m = _comparatorTripModel(cc, 0, "trip", t);
      return propagate(m.model, m.inputs, { method: "worst-case", normalBoundCoverage: 0.9973 }).interval;
    };
    expect(at(high)[1]).toBeCloseTo(high, 7);
    // and it lies above the edge with the tolerance at the setpoint
    expect(high).toBeGreaterThan(at(330)[1]);
    expect(sp.worstCase.toleranceAtHighC).toBeCloseTo(high, 7);
    expect(sp.worstCase.lowC).toBeCloseTo(at(sp.worstCase.lowC)[0], 7);
  });

  it("the fixed-point helper solves t = f(t) for a contraction (f(t) = 10 + 0.0075 t: t = 10/0.9925)", () => {
    const r = _selfConsistentEdge((t) => 10 + 0.0075 * t, 0);
    expect(r.edgeC).toBeCloseTo(10 / 0.9925, 9);
    expect(r.iterations).toBeLessThan(10);
  });
});
