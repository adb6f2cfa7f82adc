/**
 * Regressions found by tests/contract in the chain's element functions: a missing or forged tolerance or cable
 * statement, a type given as an object without a string form, a forged rated range (the 1 °C search walked it
 * for ever) and an unbounded step count are typed errors naming the quantity; so are a hole in a resistor list
 * (it summed to NaN), a missing temperature (it reached the engine as NaN) and a finite figure whose result leaves
 * float64 (OVERFLOW, it returned ±Infinity).
 */
import { describe, expect, it } from "vitest";
import {
  ageingBandOverService,
  cableMismatchBound,
  cableTipErrorC,
  cableToleranceMicrovolts,
  cableToleranceStatement,
  detectionOffsetMicrovolts,
  dividerTapRatio,
  fixedScaleNonlinearityC,
  hardwareCompensationMillivolts,
  hardwareCompensationResidual,
  legSeebeckVsContact,
  longTermDriftPpm,
  loopResistanceOhms,
  nominalTripTemperature,
  readingFromChain,
  requiredThresholdVolts,
  shuntDynamicChangeMillivolts,
  shuntResistorSizing,
  tempcoExcursionPpm,
  thermocoupleEmfMillivolts,
  thermocoupleLoopOhmsPerMetre,
  thermocoupleToleranceC,
  toleranceRange,
  wireEmfMillivolts,
} from "../../src/index.js";
import { emfFromTemperatureDecimal } from "../../src/exact.js";
import { typedErrorOf } from "../_typedError.js";

function expectTyped(call: () => unknown, pattern: RegExp): void {
  expect(typedErrorOf(call).message).toMatch(pattern);
}

describe("element functions refuse forged arguments", () => {
  const noStringForm = Object.create(null) as never;
  it("a tolerance that is missing or has no string form", () => {
    expectTyped(() => toleranceRange("K", undefined as never), /tolerance/);
    expectTyped(() => thermocoupleToleranceC("K", undefined as never, 100), /tolerance/);
    expectTyped(() => toleranceRange(noStringForm, { standard: "IEC 60584-1", class: 1 }), /thermocouple type a value of type object/);
  });

  it("a cable statement that is missing, and a type without a string form", () => {
    expectTyped(() => cableToleranceMicrovolts("K", undefined as never, 20), /cable tolerance statement/);
    expectTyped(() => cableTipErrorC("K", undefined as never, 600, 200, 0), /cable tolerance statement/);
    expectTyped(() => thermocoupleLoopOhmsPerMetre(noStringForm, 0.5), /thermocouple type/);
  });

  it("a forged rated range is refused at once instead of walked in 1 °C steps", () => {
    const s = cableToleranceStatement("K", "extension", { standard: "ASTM E230", limits: "standard" });
    const start = performance.now();
    expectTyped(() => cableMismatchBound("K", { ...s, maxC: 1e308 }), /rated maxC 1e\+308 °C is out of range; valid range -270 to 1820 °C/);
    expectTyped(() => cableMismatchBound("K", { ...s, minC: Number.NaN }), /rated minC NaN/);
    expect(performance.now() - start).toBeLessThan(1000);
    // the genuine statement still gives its documented bound (ASTM E230 standard limits, rating point 200 °C)
    expect(cableMismatchBound("K", s).ratingPointC).toBe(200);
  });

  it("ageingBandOverService bounds its steps", () => {
    const a = { kind: "ageing", totalDriftC: 3, statedAtC: 900, serviceHours: 6000, direction: "symmetric" } as const;
    expectTyped(() => ageingBandOverService(a, 1e308), /steps 1e\+308 is out of range; valid range 1 to 10000/);
    expect(ageingBandOverService(a, 10_000)).toHaveLength(10_001);
  });
});

describe("keys that are not own keys, and missing temperatures (contract: plain TypeError, NaN, or NaN in a message before)", () => {
  const noStringForm = Object.create(null) as never;
  it("legSeebeckVsContact: a type or metal without a string form, or \"__proto__\", is not a choice", () => {
    expect(typedErrorOf(() => legSeebeckVsContact(noStringForm, "copper", 25)).code).toBe("INVALID_OPTION");
    expect(typedErrorOf(() => legSeebeckVsContact("__proto__" as never, "copper", 25)).quantity).toBe("thermocouple type");
    expect(typedErrorOf(() => legSeebeckVsContact("K", "__proto__" as never, 25)).quantity).toBe("contactMetal");
  });

  it("a class or grade without a string form is named in the error, not converted", () => {
    expect(typedErrorOf(() => toleranceRange("K", { standard: "IEC 60584-1", class: noStringForm })).quantity).toBe("IEC 60584-1 class");
    expect(typedErrorOf(() => thermocoupleToleranceC("K", { standard: "ASTM E230", grade: noStringForm }, 100)).quantity).toBe("ASTM E230 grade");
  });

  it("thermocoupleEmfMillivolts, wireEmfMillivolts, emfFromTemperatureDecimal: a missing temperature is named as given", () => {
    const hot = typedErrorOf(() => thermocoupleEmfMillivolts("K", undefined as never, 25));
    expect([hot.quantity, hot.value]).toEqual(["hot-junction temperature", undefined]);
    expect(hot.message).not.toMatch(/NaN/);
    expect(typedErrorOf(() => thermocoupleEmfMillivolts("K", noStringForm, 25)).quantity).toBe("hot-junction temperature");
    expect(typedErrorOf(() => thermocoupleEmfMillivolts("K", 500, 25, null as never)).quantity).toBe("deviation (deviationC)");
    // NIST SRD 60, type K: E(500 °C) = 20.644 mV, E(25 °C) = 1.000 mV (unchanged for valid input)
    expect(thermocoupleEmfMillivolts("K", 500, 25)).toBeCloseTo(19.644, 3);
    const block = { kind: "connector", arrangement: "terminates", contactMetal: "copper", temperatureC: { minC: 35, maxC: 35 } } as const;
    expect(typedErrorOf(() => wireEmfMillivolts({ connectors: [block] }, "K", { minC: 25, maxC: 25 }, undefined as never, 25)).quantity).toBe("hot-junction temperature");
    expect(typedErrorOf(() => wireEmfMillivolts({ connectors: [block] }, "K", { minC: 25, maxC: 25 }, 500, noStringForm)).quantity).toBe("cold-junction temperature");
    const d = typedErrorOf(() => emfFromTemperatureDecimal("K", undefined as never));
    expect([d.quantity, d.value]).toEqual(["temperature", undefined]);
    expect(typedErrorOf(() => emfFromTemperatureDecimal("K", "hot")).value).toBe("hot");
  });

  it("a hole in a divider's resistor list is named (it summed to NaN)", () => {
    // eslint-disable-next-line no-sparse-arrays
    expect(typedErrorOf(() => dividerTapRatio({ resistorsOhms: [1, , 3] as never }, 0)).quantity).toBe("resistorsOhms[1]");
    const chain = {
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
      amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
      // eslint-disable-next-line no-sparse-arrays
      divider: { kind: "divider", resistorsOhms: [95000, , 5000], toleranceFraction: 0.01 },
      reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
      detector: { kind: "comparator" },
      ambient: { minC: 25, maxC: 25 },
    } as never;
    expect(typedErrorOf(() => nominalTripTemperature(chain, 0)).quantity).toBe("resistorsOhms[1]");
  });
});

describe("finite figures whose result leaves float64 are OVERFLOW (contract: returned ±Infinity before)", () => {
  const over = (call: () => unknown): string => {
    const e = typedErrorOf(call);
    expect(e.code).toBe("OVERFLOW");
    return e.quantity;
  };
  it("loop, detection and wire-resistance figures", () => {
    expect(over(() => thermocoupleLoopOhmsPerMetre("K", 1e-320))).toBe("diameterMm");
    expect(over(() => loopResistanceOhms({ kind: "loopResistance", thermocoupleWire: { lengthMetres: 1e308, diameterMm: 0.5 } }, "K"))).toBe("thermocoupleWire.lengthMetres");
    expect(over(() => detectionOffsetMicrovolts(100, 1e308, "pullUp"))).toBe("loopOhms");
    // Ohm's law: 100 nA × 200 Ω = 20 µV (unchanged for valid input)
    expect(detectionOffsetMicrovolts(100, 200, "pullDown")).toBe(-20);
  });

  it("reference, drift and compensation figures", () => {
    expect(over(() => tempcoExcursionPpm(7, { minC: -1e308, maxC: 85 }))).toBe("tempcoPpmPerC");
    expect(tempcoExcursionPpm(7, { minC: -40, maxC: 85 })).toBe(875); // box method: 7 ppm/°C × 125 °C (arithmetic)
    expect(over(() => longTermDriftPpm(1e308, 1e8))).toBe("longTermDriftPpmPer1000h");
    expect(over(() => shuntDynamicChangeMillivolts(1e308, -1e8, 1e8))).toBe("dynamicImpedanceOhms");
    const sizing = { referenceVolts: 2.5, supplyMinVolts: 4.75, supplyMaxVolts: 5.25, loadMaxMilliamps: 1, shuntMinMilliamps: 1, shuntMaxMilliamps: 15 };
    expect(over(() => shuntResistorSizing({ ...sizing, supplyMaxVolts: 1e308 }))).toBe("supplyMaxVolts");
    expect(over(() => shuntResistorSizing({ ...sizing, loadMaxMilliamps: 1e308 }))).toBe("loadMaxMilliamps");
    const cj = { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 40.6 } as const;
    expect(over(() => hardwareCompensationMillivolts(cj, "K", 1e308))).toBe("cold-junction temperature");
    expect(over(() => hardwareCompensationResidual({ ...cj, compensationMicrovoltsPerC: 1e308 }, "K", { minC: 0, maxC: 50 }))).toBe("compensationMicrovoltsPerC");
    const wide = typedErrorOf(() => hardwareCompensationResidual(cj, "K", { minC: 0, maxC: 1e308 }));
    expect([wide.code, wide.quantity]).toEqual(["OUT_OF_RANGE", "ambient maxC"]);
    expect(wide.message).not.toMatch(/NaN/);
    const amp = { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5, trimmedMicrovoltsPerC: 1e-320 } as const;
    expect(over(() => fixedScaleNonlinearityC(amp, 1000, 0))).toBe("trimmedMicrovoltsPerC");
  });

  it("a chain with a 1e308 mV/°C amplifier: reading and threshold are OVERFLOW", () => {
    const chain = (millivoltsPerC: number) => ({
      thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
      amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC },
      reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
      detector: { kind: "comparator" },
      ambient: { minC: 25, maxC: 25 },
    }) as never;
    expect(over(() => readingFromChain(chain(1e308), 25))).toBe("hot-junction temperature");
    expect(over(() => requiredThresholdVolts(chain(1e308), 50))).toBe("hot-junction temperature");
    // 5 mV/°C at 25 °C: 0.125 V (the documented example's figure)
    expect(readingFromChain(chain(5), 25).volts).toBeCloseTo(0.125, 3);
  });
});
