/**
 * Starter design files, one per topology, every section filled with an invented example value and a note per
 * section (`sectionNotes`): the file `hotjunction starter --topology …` writes. Demo figures, not data of real parts.
 * @module
 */

/** Topologies a starter file can be written for. */
export type StarterTopology = "divider" | "ladder" | "adc";

/** The topologies, in the order help lists them. */
export const starterTopologies: readonly StarterTopology[] = ["divider", "ladder", "adc"];

const common = {
  "$schema": "https://unpkg.com/hotjunction/schema/hotjunction-design.schema.json",
  hotjunctionDesign: 1,
};

const analysis = { acceptanceMethod: "worst-case", monteCarloTrials: 20000, seed: 1 };

/**
 * A starter design file for a topology (plain JSON data; invented example values, replace every one).
 * @param topology - `"divider"` (one comparator per setpoint, two resistors each), `"ladder"` (one resistor string
 *   whose taps give several setpoints) or `"adc"` (an ADC read by firmware that trips at the setpoint)
 * @returns the design file object (format 1)
 * @example
 * ```ts
 * import { starterDesign } from "hotjunction/design";
 * console.log(starterDesign("ladder").setpoints.length); // 3
 * ```
 */
export function starterDesign(topology: StarterTopology): Record<string, unknown> & { setpoints: unknown[] } {
  switch (topology) {
    // Deliberately alike: each case is one starter design of the same shape with its own values (data).
    case "divider":
      return {
        ...common,
        name: "Curing oven cutout (starter: comparator, two-resistor divider)",
        notes: "Starter file with invented example values: replace every value with your parts' data-sheet figures. Temperatures °C, voltages V, resistances Ω, tolerances as ± fractions (0.01 = 1 %).",
        sectionNotes: {
          setpoints: "One entry per trip; each gets its own two-resistor divider. Limits here override processLimits.",
          processLimits: "No trip at or below maxNormalOperatingC; the trip must come below hazardLimitC.",
          thermocouple: "Type letter and tolerance (IEC 60584-1 class, ASTM E230 grade or a custom statement).",
          amplifier: "A fixed-scale amplifier compensates the cold junction itself (no coldJunction section). Without trimmedMicrovoltsPerC it assumes the part is trimmed to E(25 °C)/25 of its type.",
          comparator: "Offset ± mV; hysteresis full width in mV; placement: below (trip at the threshold, release lower), above or centered.",
          reference: "The threshold divider hangs from this reference. kind: ideal, series, shunt or regulator-rail.",
          referenceAlternatives: "Other references `compare` weighs against the first (cost only ranks adequate ones).",
          resistors: "Preferred series (E6 … E192), tolerance and tempco of each divider resistor; total resistance bounds.",
          ambient: "Temperature range of the electronics and the cold junction.",
          analysis: "Which band decides pass/fail, Monte Carlo trials and seed.",
        },
        setpoints: [{ name: "cure limit", tripTemperatureC: 200, maxNormalOperatingC: 185, hazardLimitC: 220 }],
        processLimits: { maxNormalOperatingC: 185, hazardLimitC: 220 },
        thermocouple: { type: "K", tolerance: { standard: "IEC 60584-1", class: 1 }, label: "oven probe" },
        amplifier: { kind: "fixed-scale", millivoltsPerC: 5, accuracyC: 1, isothermalGradientC: 0.2, label: "fixed-scale amplifier" },
        comparator: { offsetMillivolts: 1, hysteresisMillivolts: 10, hysteresisPlacement: "below", label: "trip comparator" },
        reference: { kind: "series", name: "2.5 V series reference, 0.1 %", nominalVolts: 2.5, initialAccuracyFraction: 0.001, tempcoPpmPerC: 20, cost: 1 },
        referenceAlternatives: [{ kind: "regulator-rail", name: "5 V rail, ±3 %", nominalVolts: 5, totalToleranceFraction: 0.03, cost: 0 }],
        resistors: { series: "E96", toleranceFraction: 0.001, tempcoPpmPerC: 25, minTotalOhms: 10000, maxTotalOhms: 200000 },
        ambient: { minC: 10, maxC: 45 },
        analysis,
      };
    case "ladder":
      return {
        ...common,
        name: "Glass lehr selectable cutout (starter: comparator, resistor ladder)",
        notes: "Starter file with invented example values: replace every value with your parts' data-sheet figures. Temperatures °C, voltages V, resistances Ω, tolerances as ± fractions.",
        sectionNotes: {
          setpoints: "Each setpoint is one tap of the same resistor string (selected by a switch); taps are ordered by threshold, highest at the top.",
          thermocouple: "Type letter and tolerance.",
          coldJunction: "Hardware compensation adds a linear voltage (µV/°C) exact at matchedAtC; its residual is an error source.",
          amplifier: "A voltage amplifier: gain from two resistors (1 + feedback/ground) or a fixed gain; offset µV, drift µV/°C.",
          comparator: "Offset ± mV; hysteresis full width in mV and its placement.",
          reference: "A shunt reference without seriesOhms: the tool sizes the series resistor from the supply range and the loads.",
          resistors: "topology ladder: one string of setpoints + 1 resistors.",
          ambient: "Temperature range of the electronics and the cold junction.",
          analysis: "Which band decides pass/fail, Monte Carlo trials and seed.",
        },
        setpoints: [
          { name: "annealing", tripTemperatureC: 560, maxNormalOperatingC: 540, hazardLimitC: 590 },
          { name: "strain relief", tripTemperatureC: 480, maxNormalOperatingC: 460, hazardLimitC: 510 },
          { name: "cool-down", tripTemperatureC: 400, maxNormalOperatingC: 380, hazardLimitC: 430 },
        ],
        thermocouple: { type: "J", tolerance: { standard: "IEC 60584-1", class: 1 }, label: "lehr roof probe" },
        coldJunction: { method: "hardware", compensationMicrovoltsPerC: 51, matchedAtC: 25, sensorAccuracyC: 0.5, compensationAccuracyMicrovolts: 5, isothermalGradientC: 0.2 },
        amplifier: {
          kind: "voltage",
          gain: { setBy: "resistors", feedbackOhms: 49900, groundOhms: 1000, toleranceFraction: 0.001, tempcoPpmPerC: 25 },
          offsetMicrovolts: 20,
          offsetDriftMicrovoltsPerC: 0.1,
          biasCurrentNanoamps: 1,
          sourceResistanceOhms: 100,
          label: "gain stage",
        },
        comparator: { offsetMillivolts: 2, hysteresisMillivolts: 20, hysteresisPlacement: "below", label: "trip comparator" },
        reference: {
          kind: "shunt",
          name: "2.5 V shunt reference, 0.5 %",
          nominalVolts: 2.5,
          initialAccuracyFraction: 0.005,
          tempcoPpmPerC: 50,
          dynamicImpedanceOhms: 0.3,
          supplyMinVolts: 11.4,
          supplyMaxVolts: 12.6,
          shuntMinMilliamps: 0.5,
          shuntMaxMilliamps: 15,
          loadMinMilliamps: 0,
          loadMaxMilliamps: 0.1,
          seriesResistorToleranceFraction: 0.01,
          cost: 0.2,
        },
        resistors: { series: "E96", toleranceFraction: 0.001, tempcoPpmPerC: 25, topology: "ladder", minTotalOhms: 5000, maxTotalOhms: 100000 },
        ambient: { minC: 10, maxC: 50 },
        analysis,
      };
    case "adc":
      return {
        // Deliberately alike: the same design shape as the cases above, with the ADC's own sections (data).
        ...common,
        name: "Hot-plate firmware trip (starter: ADC read by firmware)",
        notes: "Starter file with invented example values: replace every value with your parts' data-sheet figures. Firmware trips when the temperature it computes from the ADC code reaches the setpoint.",
        sectionNotes: {
          setpoints: "Firmware compares the code against the threshold code of each setpoint (printed by check).",
          thermocouple: "Type letter and tolerance.",
          coldJunction: "Software compensation: firmware reads a sensor at the terminals and adds E(t_sensor).",
          amplifier: "A voltage amplifier with a fixed gain (gain error ± fraction, drift ppm/°C).",
          adc: "Bits, offset ± LSB, gain error ± fraction, INL ± LSB; full scale defaults to the reference voltage.",
          reference: "The ADC's reference (its full scale).",
          referenceAlternatives: "Other references `compare` weighs (an ideal one shows what a perfect part would give).",
          ambient: "Temperature range of the electronics and the cold junction.",
          analysis: "Which band decides pass/fail, Monte Carlo trials and seed.",
        },
        setpoints: [{ name: "plate limit", tripTemperatureC: 300, maxNormalOperatingC: 280, hazardLimitC: 320 }],
        thermocouple: { type: "K", tolerance: { standard: "IEC 60584-1", class: 1 }, label: "plate probe" },
        coldJunction: { method: "software", sensorAccuracyC: 0.5, isothermalGradientC: 0.2, label: "terminal sensor" },
        amplifier: { kind: "voltage", gain: { setBy: "fixed", gain: 100, gainErrorFraction: 0.001, gainDriftPpmPerC: 10 }, offsetMicrovolts: 10, offsetDriftMicrovoltsPerC: 0.05, label: "gain stage" },
        adc: { bits: 12, offsetLsb: 2, gainErrorFraction: 0.002, inlLsb: 1, label: "12-bit ADC" },
        reference: { kind: "series", name: "2.048 V series reference, 0.1 %", nominalVolts: 2.048, initialAccuracyFraction: 0.001, tempcoPpmPerC: 20, cost: 0.8 },
        referenceAlternatives: [{ kind: "ideal", name: "ideal 2.048 V", nominalVolts: 2.048 }],
        ambient: { minC: 0, maxC: 50 },
        analysis,
      };
  }
}
