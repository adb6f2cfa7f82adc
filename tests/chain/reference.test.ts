/**
 * Voltage-reference conventions (reference sheet §5): box-method tempco, line and load regulation,
 * long-term drift with √t scaling, shunt sizing and power check, headroom; plus trade facts.
 */
import { describe, expect, it } from "vitest";
import {
  boxMethodTempcoPpmPerC,
  HotjunctionRangeError,
  longTermDriftPpm,
  referenceErrorSources,
  referenceHeadroom,
  shuntDynamicChangeMillivolts,
  shuntResistorSizing,
  tempcoExcursionPpm,
  type ReferenceElement,
  type SeriesReference,
  type ShuntReference,
} from "../../src/index.js";

const ambient = { minC: -40, maxC: 85 };
const limit = (ref: ReferenceElement, name: string, range = ambient): number | undefined =>
  referenceErrorSources(ref, range).find((s) => s.name === name)?.limit;

describe("series reference", () => {
  it("box-method tempco: 7 ppm/°C over −40…85 °C allows 875 ppm (reference sheet §5, (a) published article)", () => {
    expect(tempcoExcursionPpm(7, ambient)).toBe(875);
    const ref: SeriesReference = { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001, tempcoPpmPerC: 7 };
    expect(limit(ref, "reference.tempco")).toBeCloseTo(875e-6, 15);
  });
  it("box-method tempco from extremes: 2.5010/2.4995 V on 2.5 V over 125 °C is 4.8 ppm/°C (reference sheet §5, (c))", () => {
    expect(boxMethodTempcoPpmPerC(2.501, 2.4995, 2.5, -40, 85)).toBeCloseTo(4.8, 9);
  });
  it("load regulation: 10 µV change on 2.048 V for 2 mA is 2.441 ppm/mA; error = spec × change (reference sheet §5, (a) data-sheet example)", () => {
    // The sheet's figure as printed (4 significant digits) goes in; the library must give back its 10 µV.
    const ppmPerMilliamp = 2.441;
    const ref: SeriesReference = {
      kind: "reference",
      variant: "series",
      nominalVolts: 2.048,
      initialAccuracyFraction: 0.001,
      loadRegulationPpmPerMilliamp: ppmPerMilliamp,
      loadMinMilliamps: 0,
      loadMaxMilliamps: 2,
    };
    // Back to volts: the whole 2 mA span moves the output by the 10 µV it was measured from.
    // (2.441 ppm/mA × 2 mA × 2.048 V = 9.998 µV: within the sheet's rounding of 2.441, 5e-9 V.)
    expect((limit(ref, "reference.loadRegulation") as number) * 2.048).toBeCloseTo(10e-6, 8);
    // With the rated point known, the largest distance from it counts (common practice, no source):
    // 0.5 mA rated, 0…2 mA → 1.5 mA, 2.441 ppm/mA × 1.5 mA = 3.6615 ppm.
    expect(limit({ ...ref, ratedLoadMilliamps: 0.5 }, "reference.loadRegulation")).toBeCloseTo(3.6615e-6, 15);
  });
  it("line regulation: ppm/V × supply span (reference sheet §5, (a))", () => {
    const ref: SeriesReference = {
      kind: "reference",
      variant: "series",
      nominalVolts: 2.5,
      initialAccuracyFraction: 0.001,
      lineRegulationPpmPerVolt: 20,
      supplyMinVolts: 4.5,
      supplyMaxVolts: 5.5,
    };
    expect(limit(ref, "reference.lineRegulation")).toBeCloseTo(20e-6, 15);
    expect(() => referenceErrorSources({ ...ref, supplyMaxVolts: undefined } as unknown as SeriesReference, ambient)).toThrow(
      /supplyMaxVolts undefined .*is not a finite number/,
    );
  });
  it("long-term drift: 50 ppm/1000 h scaled by √(t/1000 h) is 158.11 ppm at 10 000 h (reference sheet §5, common practice, no source)", () => {
    expect(longTermDriftPpm(50, 10000)).toBeCloseTo(158.11, 2);
    expect(longTermDriftPpm(50, 10000, "linear")).toBe(500);
    const ref: SeriesReference = {
      kind: "reference",
      variant: "series",
      nominalVolts: 2.5,
      initialAccuracyFraction: 0.001,
      longTermDriftPpmPer1000h: 50,
      serviceHours: 10000,
      thermalHysteresisPpm: 100,
    };
    expect(limit(ref, "reference.longTermDrift")).toBeCloseTo(158.11e-6, 8);
    expect(limit(ref, "reference.thermalHysteresis")).toBeCloseTo(100e-6, 15);
  });
  it("headroom: a series reference rated 5.5 V maximum input on a 5 V rail has only 10 % margin (common practice, no source)", () => {
    const ref: SeriesReference = {
      kind: "reference",
      variant: "series",
      nominalVolts: 4.096,
      initialAccuracyFraction: 0.001,
      supplyMinVolts: 4.75,
      supplyMaxVolts: 5,
      maxInputVolts: 5.5,
      dropoutVolts: 0.2,
    };
    const h = referenceHeadroom(ref);
    expect(h.overvoltageMarginFraction).toBe(0.1);
    expect(h.overvoltageMarginVolts).toBeCloseTo(0.5, 12);
    expect(h.dropoutMarginVolts).toBeCloseTo(0.454, 12);
    expect(h.ok).toBe(true);
    expect(referenceHeadroom({ ...ref, supplyMaxVolts: 5.6 }).ok).toBe(false);
    expect(() => referenceHeadroom({ kind: "reference", variant: "shunt", nominalVolts: 2.5, initialAccuracyFraction: 0.001, seriesOhms: 1000 })).toThrow(
      /no input pin/,
    );
  });
  it("series references typically 20–50 ppm/°C against ≈15 ppm/°C for good shunt references (common practice, no source)", () => {
    // Over 0…70 °C, box method: 20 ppm/°C → 0.14 %, 50 ppm/°C → 0.35 %, 15 ppm/°C → 0.105 %. The fact checked:
    // with otherwise equal parts, a good shunt reference's tempco source is below a typical series reference's
    // at both ends of the series range, through each variant's own source model.
    const range = { minC: 0, maxC: 70 };
    const seriesAt = (ppm: number) =>
      limit({ kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001, tempcoPpmPerC: ppm }, "reference.tempco", range);
    const shunt: ShuntReference = {
      kind: "reference",
      variant: "shunt",
      nominalVolts: 2.5,
      initialAccuracyFraction: 0.001,
      tempcoPpmPerC: 15,
      seriesOhms: 1000,
      supplyMinVolts: 4.75,
      supplyMaxVolts: 5.25,
    };
    const shuntTempco = limit(shunt, "reference.tempco", range) as number;
    expect(seriesAt(20)).toBeCloseTo(1400e-6, 15);
    expect(seriesAt(50)).toBeCloseTo(3500e-6, 15);
    expect(shuntTempco).toBeCloseTo(1050e-6, 15);
    expect(shuntTempco).toBeLessThan(seriesAt(20) as number);
    expect(shuntTempco / (seriesAt(50) as number)).toBeCloseTo(0.3, 12);
  });
});

describe("shunt reference", () => {
  it("series resistor R ≤ (V_s,min − V_ref)/(I_load,max + I_shunt,min), current and power checks (reference sheet §5, (a))", () => {
    const s = shuntResistorSizing({
      referenceVolts: 2.5,
      supplyMinVolts: 4.75,
      supplyMaxVolts: 5.25,
      loadMaxMilliamps: 1,
      shuntMinMilliamps: 1,
      shuntMaxMilliamps: 15,
      resistorPowerRatingWatts: 0.125,
    });
    expect(s.maxSeriesOhms).toBeCloseTo(1125, 9);
    expect(s.shuntCurrentMinMilliamps).toBeCloseTo(1, 9);
    expect(s.shuntCurrentMaxMilliamps).toBeCloseTo((2.75 / 1125) * 1000, 9);
    expect(s.resistorPowerWatts).toBeCloseTo(2.75 ** 2 / 1125, 12);
    expect(s.ok).toBe(true);
    const tooSmall = shuntResistorSizing({
      referenceVolts: 2.5,
      supplyMinVolts: 4.75,
      supplyMaxVolts: 12,
      loadMaxMilliamps: 1,
      shuntMinMilliamps: 1,
      shuntMaxMilliamps: 5,
      resistorPowerRatingWatts: 0.05,
      seriesOhms: 1000,
    });
    expect(tooSmall.ok).toBe(false);
    expect(tooSmall.problems.join(" | ")).toMatch(/exceeds the maximum 5 mA.*exceeds its rating 0.05 W/);
    const tooLarge = shuntResistorSizing({
      referenceVolts: 2.5,
      supplyMinVolts: 4.75,
      supplyMaxVolts: 5.25,
      loadMaxMilliamps: 1,
      shuntMinMilliamps: 1,
      shuntMaxMilliamps: 15,
      seriesOhms: 1500,
    });
    expect(tooLarge.problems[0]).toMatch(/below the minimum 1 mA/);
    expect(() =>
      shuntResistorSizing({ referenceVolts: 5, supplyMinVolts: 4.75, supplyMaxVolts: 5.25, loadMaxMilliamps: 1, shuntMinMilliamps: 1, shuntMaxMilliamps: 15 }),
    ).toThrow(/supplyMinVolts 4.75 V is not above the reference voltage/);
  });
  it("shunt references of the common kind change by roughly 8 mV over 1–15 mA (dynamic impedance ≈ 0.57 Ω) (common practice, no source)", () => {
    expect(shuntDynamicChangeMillivolts(0.57, 1, 15)).toBeCloseTo(8, 1);
  });
  it("dynamic impedance × the current swing that the supply range and the series resistor cause", () => {
    const ref: ShuntReference = {
      kind: "reference",
      variant: "shunt",
      nominalVolts: 2.5,
      initialAccuracyFraction: 0.001,
      dynamicImpedanceOhms: 0.5,
      seriesOhms: 1000,
      supplyMinVolts: 4.5,
      supplyMaxVolts: 5.5,
      loadMinMilliamps: 0,
      loadMaxMilliamps: 1,
      shuntMinMilliamps: 0.5,
    };
    // I from (4.5 − 2.5)/1 kΩ − 1 mA = 1 mA to (5.5 − 2.5)/1 kΩ − 0 = 3 mA: 2 mA × 0.5 Ω = 1 mV on 2.5 V.
    expect(limit(ref, "reference.dynamicImpedance")).toBeCloseTo(1e-3 / 2.5, 12);
    expect(() => referenceErrorSources({ ...ref, seriesOhms: 3000 }, ambient)).toThrow(/below the least current for regulation/);
  });
  it("over-temperature tolerance 0.1 % + 100 ppm/°C from 25 °C over −40…85 °C is ±0.75 % (reference sheet §5, (a))", () => {
    const ref: ShuntReference = {
      kind: "reference",
      variant: "shunt",
      nominalVolts: 2.5,
      initialAccuracyFraction: 0.001,
      tempcoPpmPerC: 100,
      tempcoMethod: "from-25C",
      seriesOhms: 1000,
      supplyMinVolts: 5,
      supplyMaxVolts: 5,
    };
    const sources = referenceErrorSources(ref, ambient);
    const total = sources.reduce((a, s) => a + s.limit, 0);
    expect(total).toBeCloseTo(0.0075, 12);
  });
});

describe("regulator used as the reference", () => {
  it("total tolerance or its parts, never both (5 V linear regulators ±4 % over line, load and temperature, reference sheet §5 (a))", () => {
    const total: ReferenceElement = { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 };
    expect(limit(total, "reference.totalTolerance")).toBe(0.04);
    const parts: ReferenceElement = {
      kind: "reference",
      variant: "regulator",
      nominalVolts: 5,
      initialToleranceFraction: 0.02,
      lineRegulationFraction: 0.005,
      loadRegulationFraction: 0.005,
      temperatureDriftFraction: 0.01,
    };
    expect(referenceErrorSources(parts, ambient).map((s) => s.name)).toEqual([
      "reference.initialTolerance",
      "reference.lineRegulation",
      "reference.loadRegulation",
      "reference.temperatureDrift",
    ]);
    expect(() => referenceErrorSources({ ...parts, totalToleranceFraction: 0.04 }, ambient)).toThrow(/both as a total and as parts/);
    expect(() => referenceErrorSources({ kind: "reference", variant: "regulator", nominalVolts: 5 }, ambient)).toThrow(
      HotjunctionRangeError,
    );
  });
});
