/**
 * Chains shared by the fault-review tests (invented demo figures; the values checked against them are named in
 * each test).
 */
import type { MeasurementChain } from "../../src/chain/types.js";

/**
 * Reflow-oven style comparator watchdog: type K, fixed-scale amplifier 5 mV/°C trimmed to α = E(25 °C)/25,
 * 2.5 V series reference, divider 12 kΩ over 13 kΩ (threshold 1.3 V), cold junction 25 °C.
 */
export const ovenChain: MeasurementChain = {
  thermocouple: { kind: "thermocouple", type: "K", tolerance: { standard: "IEC 60584-1", class: 1 } },
  amplifier: { kind: "fixedScaleAmplifier", type: "K", millivoltsPerC: 5 },
  reference: { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001 },
  divider: { kind: "divider", resistorsOhms: [12000, 13000], toleranceFraction: 0.01 },
  detector: { kind: "comparator" },
  ambient: { minC: 25, maxC: 25 },
};

export const ovenTrip = { name: "oven", maxNormalOperatingC: 250, hazardLimitC: 280 } as const;

/**
 * Kiln style chain: type N, hardware cold-junction compensation 26.5 µV/°C matched at 25 °C, non-inverting
 * amplifier G = 1 + 68k/1k = 69, 4.096 V series reference, two-resistor divider, ambient 10…55 °C.
 */
export const kilnChain: MeasurementChain = {
  thermocouple: { kind: "thermocouple", type: "N", tolerance: { standard: "IEC 60584-1", class: 1 } },
  coldJunction: { kind: "coldJunction", method: "hardware", compensationMicrovoltsPerC: 26.5 },
  amplifier: {
    kind: "amplifier",
    gain: { setBy: "resistors", feedbackOhms: 68000, groundOhms: 1000, toleranceFraction: 0.001 },
  },
  reference: { kind: "reference", variant: "series", nominalVolts: 4.096, initialAccuracyFraction: 0.001 },
  divider: { kind: "divider", resistorsOhms: [3320, 10000], toleranceFraction: 0.001 },
  detector: { kind: "comparator", hysteresisMillivolts: 20, hysteresisPlacement: "below" },
  ambient: { minC: 10, maxC: 55 },
};

export const kilnTrip = { name: "stoneware", maxNormalOperatingC: 1150, hazardLimitC: 1285 } as const;

/** Heated-enclosure style ADC chain: type T, software compensation, G = 200, 12-bit ADC on 2.048 V. */
export const enclosureChain: MeasurementChain = {
  thermocouple: { kind: "thermocouple", type: "T", tolerance: { standard: "IEC 60584-1", class: 1 } },
  coldJunction: { kind: "coldJunction", method: "software", sensorAccuracyC: 0.5 },
  amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 200 } },
  reference: { kind: "reference", variant: "series", nominalVolts: 2.048, initialAccuracyFraction: 0.002 },
  detector: { kind: "adc", bits: 12 },
  ambient: { minC: 0, maxC: 50 },
};

export const enclosureTrip = { name: "plate", tripTemperatureC: 90, maxNormalOperatingC: 80, hazardLimitC: 100 } as const;
