/**
 * Bad input paths: precise errors of the project's family, never NaN or silent clamping.
 */
import { describe, expect, it } from "vitest";
import {
  chainErrorSources,
  evaluateChain,
  HotjunctionRangeError,
  HotjunctionTypeError,
  readingFromChain,
  tripTemperatureModel,
  type MeasurementChain,
} from "../../src/index.js";

const base: MeasurementChain = {
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
  coldJunction: { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 40.6 },
  amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 100 } },
  reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 0.04 },
  divider: { kind: "divider", resistorsOhms: [9000, 1000], toleranceFraction: 0.01 },
  detector: { kind: "comparator" },
  ambient: { minC: 0, maxC: 50 },
};
const bad = (patch: Record<string, unknown>): MeasurementChain => ({ ...base, ...patch }) as unknown as MeasurementChain;

function expectError(f: () => unknown, cls: typeof HotjunctionRangeError | typeof HotjunctionTypeError, code: string, message: RegExp): void {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(cls);
    expect((e as HotjunctionRangeError).code).toBe(code);
    expect((e as Error).message).toMatch(message);
    return;
  }
  expect.unreachable("no error thrown");
}

describe("chain description errors", () => {
  it("software compensation cannot feed a comparator", () => {
    expectError(
      () => chainErrorSources(bad({ coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0.5 } }), 500),
      HotjunctionRangeError,
      "INVALID_DESIGN",
      /software compensation happens after an ADC/,
    );
  });
  it("a missing cold junction, or one next to a fixed-scale amplifier", () => {
    expectError(() => chainErrorSources(bad({ coldJunction: undefined }), 500), HotjunctionRangeError, "INVALID_DESIGN", /coldJunction undefined is missing/);
    expectError(
      () => chainErrorSources(bad({ amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 } }), 500),
      HotjunctionRangeError,
      "INVALID_DESIGN",
      /compensates internally/,
    );
  });
  it("a fixed-scale amplifier made for another type", () => {
    expectError(
      () => chainErrorSources(bad({ coldJunction: undefined, amplifier: { kind: "fixedScaleAmplifier", type: "J", millivoltsPerC: 5 } }), 500),
      HotjunctionRangeError,
      "INVALID_OPTION",
      /fixed-scale amplifier type "J" is not a valid choice; valid: K/,
    );
  });
  it("a comparator without a reference, an ADC without a full scale, a divider on an ADC chain", () => {
    expectError(() => chainErrorSources(bad({ reference: undefined }), 500), HotjunctionRangeError, "INVALID_DESIGN", /takes its threshold from the reference/);
    expectError(
      () => chainErrorSources(bad({ reference: undefined, divider: undefined, detector: { kind: "adc", bits: 12 } }), 500),
      HotjunctionRangeError,
      "INVALID_DESIGN",
      /ADC full scale undefined is unknown/,
    );
    expectError(() => chainErrorSources(bad({ detector: { kind: "adc", bits: 12 } }), 500), HotjunctionRangeError, "INVALID_DESIGN", /belongs to comparator chains/);
  });
  it("unknown kinds, methods and variants name the valid choices", () => {
    expectError(() => chainErrorSources(bad({ detector: { kind: "scope" } }), 500), HotjunctionRangeError, "INVALID_OPTION", /detector kind "scope".*valid: comparator, adc/);
    expectError(
      () => chainErrorSources(bad({ coldJunction: { kind: "coldJunction", method: "ice" } }), 500),
      HotjunctionRangeError,
      "INVALID_OPTION",
      /cold-junction method "ice".*valid: software, hardware/,
    );
    expectError(
      () => chainErrorSources(bad({ reference: { kind: "reference", variant: "zener", nominalVolts: 5 } }), 500),
      HotjunctionRangeError,
      "INVALID_OPTION",
      /reference variant "zener".*valid: series, shunt, regulator/,
    );
  });
  it("negative limits, fractions of 1 or more, inverted ranges, non-finite numbers", () => {
    expectError(
      () => chainErrorSources(bad({ divider: { kind: "divider", resistorsOhms: [9000, 1000], toleranceFraction: -0.01 } }), 500),
      HotjunctionRangeError,
      "OUT_OF_RANGE",
      /toleranceFraction -0.01 fraction is negative/,
    );
    expectError(
      () => chainErrorSources(bad({ reference: { kind: "reference", variant: "regulator", nominalVolts: 5, totalToleranceFraction: 4 } }), 500),
      HotjunctionRangeError,
      "OUT_OF_RANGE",
      /totalToleranceFraction 4 fraction is 1 or more/,
    );
    expectError(() => chainErrorSources(bad({ ambient: { minC: 50, maxC: 0 } }), 500), HotjunctionRangeError, "OUT_OF_RANGE", /ambient maxC 0 °C is below ambient minC 50 °C/);
    expectError(
      () => chainErrorSources(bad({ amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: Number.NaN } } }), 500),
      HotjunctionTypeError,
      "NOT_A_FINITE_NUMBER",
      /gain NaN V\/V is not a finite number/,
    );
    expectError(() => evaluateChain(base, Number.POSITIVE_INFINITY), HotjunctionTypeError, "NOT_A_FINITE_NUMBER", /hot-junction temperature Infinity °C/);
  });
  it("a temperature outside the thermocouple tolerance's range", () => {
    expectError(() => evaluateChain(base, 1100), HotjunctionRangeError, "OUT_OF_RANGE", /type K IEC 60584-1 class 1: temperature 1100 °C is outside the range where the tolerance is defined; valid range -40 to 1000 °C/);
  });
  it("unknown source names in overrides and sourceValues", () => {
    expectError(
      () => chainErrorSources({ ...base, sourceDistributions: { "reference.tempco": { distribution: "normal" } } }, 500),
      HotjunctionRangeError,
      "UNKNOWN_NAME",
      /sourceDistributions key "reference.tempco" names no error source/,
    );
    expectError(
      () => readingFromChain(base, 500, { sourceValues: { "adc.offset": 1 } }),
      HotjunctionRangeError,
      "UNKNOWN_NAME",
      /sourceValues key "adc.offset" names no error source/,
    );
  });
  it("trip models belong to comparator chains and real taps", () => {
    expectError(() => tripTemperatureModel(base, 1), HotjunctionRangeError, "OUT_OF_RANGE", /tap index 1 is not the index of a tap/);
    expectError(
      () => tripTemperatureModel(bad({ divider: undefined, detector: { kind: "adc", bits: 12 } }), 0),
      HotjunctionRangeError,
      "INVALID_DESIGN",
      /is not a comparator/,
    );
    expectError(() => tripTemperatureModel(base, 0, { edge: "up" as "trip" }), HotjunctionRangeError, "INVALID_OPTION", /edge "up"/);
  });
  it("evaluateChain options are checked", () => {
    expectError(() => evaluateChain(base, 500, { methods: ["guess" as "rss"] }), HotjunctionRangeError, "INVALID_OPTION", /method "guess" is not a valid choice/);
  });
});
