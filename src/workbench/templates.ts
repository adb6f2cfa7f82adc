/**
 * Starter templates: a small design of each topology to begin from. Every figure is an invented example value
 * (the `notes` line says so); replace each with the figure of the parts you choose.
 * @module
 */

/** A starter template. */
export interface StarterTemplate {
  readonly id: string;
  readonly title: string;
  readonly design: Readonly<Record<string, unknown>>;
}

const common = {
  hotjunctionDesign: 1,
  thermocouple: { type: "K", tolerance: { standard: "IEC 60584-1", class: 2 } },
  ambient: { minC: 10, maxC: 45 },
  analysis: { acceptanceMethod: "worst-case", monteCarloTrials: 20000, seed: 1 },
} as const;

/** The starter templates, in the order offered. */
export const starterTemplates: readonly StarterTemplate[] = [
  {
    id: "comparator-divider",
    title: "Starter: comparator with a two-resistor divider",
    design: {
      ...common,
      name: "Starter: comparator cutout with a divider",
      notes: "Starter template with invented example values: one setpoint, a gain stage, a series reference and a two-resistor divider.",
      setpoints: [{ name: "over-temperature", tripTemperatureC: 300 }],
      processLimits: { maxNormalOperatingC: 280, hazardLimitC: 330 },
      coldJunction: { method: "hardware", compensationMicrovoltsPerC: 40.6, matchedAtC: 25, sensorAccuracyC: 1, isothermalGradientC: 0.5 },
      amplifier: { kind: "voltage", gain: { setBy: "resistors", feedbackOhms: 100000, groundOhms: 1000, toleranceFraction: 0.001, tempcoPpmPerC: 25 }, offsetMicrovolts: 25, offsetDriftMicrovoltsPerC: 0.2 },
      comparator: { offsetMillivolts: 2, hysteresisMillivolts: 20, hysteresisPlacement: "below" },
      reference: { kind: "series", name: "2.5 V series reference, 0.2 %", nominalVolts: 2.5, initialAccuracyFraction: 0.002, tempcoPpmPerC: 25 },
      resistors: { series: "E96", toleranceFraction: 0.001, tempcoPpmPerC: 25 },
    },
  },
  {
    id: "comparator-ladder",
    title: "Starter: comparator with a ladder of selectable setpoints",
    design: {
      ...common,
      name: "Starter: selectable setpoints on one ladder",
      notes: "Starter template with invented example values: two setpoints from one resistor ladder on a 5 V regulator rail.",
      setpoints: [
        { name: "high", tripTemperatureC: 400, maxNormalOperatingC: 380, hazardLimitC: 440 },
        { name: "low", tripTemperatureC: 250, maxNormalOperatingC: 230, hazardLimitC: 290 },
      ],
      coldJunction: { method: "hardware", compensationMicrovoltsPerC: 40.6, matchedAtC: 25, sensorAccuracyC: 1, isothermalGradientC: 0.5 },
      amplifier: { kind: "voltage", gain: { setBy: "fixed", gain: 100, gainErrorFraction: 0.002, gainDriftPpmPerC: 10 }, offsetMicrovolts: 20, offsetDriftMicrovoltsPerC: 0.1 },
      comparator: { offsetMillivolts: 2, hysteresisMillivolts: 20, hysteresisPlacement: "below" },
      reference: { kind: "regulator-rail", name: "5 V regulator rail, ±2 %", nominalVolts: 5, totalToleranceFraction: 0.02 },
      resistors: { series: "E96", toleranceFraction: 0.001, tempcoPpmPerC: 25, topology: "ladder" },
    },
  },
  {
    id: "adc-firmware",
    title: "Starter: ADC read by firmware that trips",
    design: {
      ...common,
      name: "Starter: firmware trip from an ADC",
      notes: "Starter template with invented example values: software cold-junction compensation, a gain stage and a 12-bit ADC.",
      setpoints: [{ name: "limit", tripTemperatureC: 150, maxNormalOperatingC: 135, hazardLimitC: 170 }],
      coldJunction: { method: "software", sensorAccuracyC: 0.5, isothermalGradientC: 0.3 },
      amplifier: { kind: "voltage", gain: { setBy: "fixed", gain: 200, gainErrorFraction: 0.001, gainDriftPpmPerC: 10 }, offsetMicrovolts: 10, offsetDriftMicrovoltsPerC: 0.05 },
      adc: { bits: 12, offsetLsb: 2, gainErrorFraction: 0.002, inlLsb: 1 },
      reference: { kind: "series", name: "2.5 V series reference, 0.2 %", nominalVolts: 2.5, initialAccuracyFraction: 0.002, tempcoPpmPerC: 25 },
    },
  },
];
