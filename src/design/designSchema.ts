/**
 * The design file format (version 1), as zod schemas. Sections follow the library's chain and trip vocabulary
 * (same key names, units in the names: `tripTemperatureC`, `hazardLimitC`, `nominalVolts`,
 * `initialAccuracyFraction`, `offsetMillivolts`, `tempcoPpmPerC`...), so a file reads like the objects the
 * library takes. Every object is strict: an unknown key is an error, so a misspelt key never falls back to a
 * default. The published JSON Schema (`schema/hotjunction-design.schema.json`) is generated from these.
 * @module
 */
import * as z from "zod";
import { _propagationMethods } from "../uncertainty/types.js";

const temperatureC = (description: string) => z.number().min(-273.15).max(3000).describe(`${description}, °C`);
const fraction = (description: string) => z.number().min(0).max(1).describe(`${description}, ± fraction (0.01 = 1 %)`);
const nonNegative = (description: string) => z.number().min(0).describe(description);
const positive = (description: string) => z.number().positive().describe(description);
const label = (description: string) => z.string().min(1).max(200).describe(description);
const seriesName = z.enum(["E6", "E12", "E24", "E48", "E96", "E192"]);

// Deliberately alike: every section below is a strictObject of described fields with .describe(); the shape repeats,
// the fields and words are each section's own (zod's way of writing a schema).
const setpointSchema = z
  .strictObject({
    name: label("label of the setpoint in reports"),
    tripTemperatureC: temperatureC("hot-junction temperature at which the protection should trip (rising)"),
    maxNormalOperatingC: temperatureC("highest temperature of normal operation (overrides processLimits)").optional(),
    hazardLimitC: temperatureC("temperature the trip must occur below (overrides processLimits)").optional(),
  })
  .describe("one trip setpoint");

const processLimitsSchema = z
  .strictObject({
    maxNormalOperatingC: temperatureC("highest temperature of normal operation: no trip at or below it"),
    hazardLimitC: temperatureC("hazard limit: the trip must occur below it"),
  })
  .describe("process limits shared by the setpoints");

const toleranceSchema = z.discriminatedUnion("standard", [
  z
    .strictObject({ standard: z.literal("IEC 60584-1"), class: z.union([z.literal(1), z.literal(2), z.literal(3)]) })
    .describe("IEC 60584-1 tolerance class"),
  z
    .strictObject({ standard: z.literal("ASTM E230"), grade: z.enum(["standard", "special"]) })
    .describe("ASTM E230 limits of error"),
  z
    .strictObject({
      standard: z.literal("custom"),
      toleranceC: nonNegative("fixed part, ± °C"),
      fractionOfReading: fraction("part proportional to |t| in °C").optional(),
      minC: temperatureC("lowest temperature where the statement holds").optional(),
      maxC: temperatureC("highest temperature where the statement holds").optional(),
    })
    .describe("a tolerance of one's own: the larger of toleranceC and fractionOfReading·|t|"),
]);

const thermocoupleSchema = z
  .strictObject({
    type: z.enum(["B", "E", "J", "K", "N", "R", "S", "T"]).describe("thermocouple type letter"),
    tolerance: toleranceSchema,
    label: label("label in reports").optional(),
  })
  .describe("the thermocouple");

const coldJunctionSchema = z.discriminatedUnion("method", [
  z
    .strictObject({
      method: z.literal("software"),
      sensorAccuracyC: nonNegative("accuracy of the cold-junction sensor, ± °C"),
      isothermalGradientC: nonNegative("largest sensor-to-terminal temperature difference, ± °C").optional(),
      label: label("label in reports").optional(),
    })
    .describe("a sensor near the terminals; E(t_sensor) added in firmware"),
  z
    .strictObject({
      method: z.literal("hardware"),
      compensationMicrovoltsPerC: positive("slope of the compensation voltage, µV/°C"),
      matchedAtC: temperatureC("temperature where the compensation is exact (default 25)").optional(),
      sensorAccuracyC: nonNegative("accuracy of the compensator's sensor, ± °C").optional(),
      compensationAccuracyMicrovolts: nonNegative("accuracy of the compensation voltage, ± µV").optional(),
      isothermalGradientC: nonNegative("largest sensor-to-terminal temperature difference, ± °C").optional(),
      label: label("label in reports").optional(),
    })
    .describe("a circuit adding a voltage linear in the cold-junction temperature"),
]);

const gainSchema = z.discriminatedUnion("setBy", [
  z
    .strictObject({
      setBy: z.literal("resistors"),
      feedbackOhms: positive("feedback resistor, Ω"),
      groundOhms: positive("resistor from the inverting input to ground, Ω"),
      toleranceFraction: fraction("tolerance of each resistor"),
      tempcoPpmPerC: nonNegative("tempco of each resistor, ± ppm/°C").optional(),
    })
    .describe("non-inverting gain 1 + feedbackOhms/groundOhms"),
  z
    .strictObject({
      setBy: z.literal("fixed"),
      gain: positive("nominal gain, V/V"),
      gainErrorFraction: fraction("gain error").optional(),
      gainDriftPpmPerC: nonNegative("gain drift, ± ppm/°C").optional(),
    })
    .describe("a gain fixed inside the part"),
]);

const amplifierSchema = z.discriminatedUnion("kind", [
  z
    .strictObject({
      kind: z.literal("voltage"),
      gain: gainSchema,
      offsetMicrovolts: nonNegative("input offset at 25 °C, ± µV").optional(),
      offsetDriftMicrovoltsPerC: nonNegative("input offset drift, ± µV/°C").optional(),
      biasCurrentNanoamps: nonNegative("input bias current, ± nA").optional(),
      sourceResistanceOhms: nonNegative("resistance the bias current flows through, Ω").optional(),
      label: label("label in reports").optional(),
    })
    .describe("a voltage amplifier on the compensated EMF"),
  z
    .strictObject({
      kind: z.literal("fixed-scale"),
      millivoltsPerC: positive("output scale, mV/°C (e.g. 5)"),
      trimmedMicrovoltsPerC: positive("Seebeck coefficient the part is trimmed to, µV/°C").optional(),
      accuracyC: nonNegative("stated accuracy of the part, ± °C").optional(),
      isothermalGradientC: nonNegative("largest die-to-terminal temperature difference, ± °C").optional(),
      label: label("label in reports").optional(),
    })
    .describe("a fixed-scale thermocouple amplifier with internal cold-junction compensation (same type as the thermocouple)"),
]);

const comparatorSchema = z
  .strictObject({
    offsetMillivolts: nonNegative("input offset, ± mV").optional(),
    hysteresisMillivolts: nonNegative("hysteresis, full width between trip and release, mV").optional(),
    hysteresisPlacement: z.enum(["centered", "above", "below"]).optional().describe("where the hysteresis sits about the threshold"),
    label: label("label in reports").optional(),
  })
  .describe("the comparator that trips on a rising signal (hardware trip)");

const adcSchema = z
  .strictObject({
    bits: z.number().int().min(1).max(32).describe("resolution, bits"),
    fullScaleVolts: positive("full-scale voltage, V (default: the reference's nominal voltage)").optional(),
    offsetLsb: nonNegative("offset error, ± LSB").optional(),
    gainErrorFraction: fraction("gain error, of reading").optional(),
    inlLsb: nonNegative("integral nonlinearity, ± LSB").optional(),
    label: label("label in reports").optional(),
  })
  .describe("an ADC whose readings firmware compares with the setpoints (instead of comparators)");

const referenceCommon = {
  name: label("label of the reference option"),
  nominalVolts: positive("nominal output, V"),
  cost: nonNegative("cost per unit, any currency (only ranks adequate options)").optional(),
  supplyMinVolts: positive("lowest supply voltage, V").optional(),
  supplyMaxVolts: positive("highest supply voltage, V").optional(),
};
const tempcoMethod = z.enum(["box", "from-25C"]).optional().describe("how a tempco becomes a bound (default box)");
const driftScaling = z.enum(["linear", "sqrt"]).optional().describe("how drift scales with service time (default sqrt)");

const referenceSchemaList = [
  z
    .strictObject({ kind: z.literal("ideal"), name: referenceCommon.name, nominalVolts: referenceCommon.nominalVolts, cost: referenceCommon.cost })
    .describe("an error-free reference (a yardstick)"),
  z
    .strictObject({
      kind: z.literal("series"),
      ...referenceCommon,
      initialAccuracyFraction: fraction("initial accuracy at 25 °C"),
      tempcoPpmPerC: nonNegative("temperature coefficient, ppm/°C").optional(),
      tempcoMethod,
      lineRegulationPpmPerVolt: nonNegative("line regulation, ± ppm/V").optional(),
      ratedSupplyVolts: positive("supply at which the initial accuracy holds, V").optional(),
      loadRegulationPpmPerMilliamp: nonNegative("load regulation, ± ppm/mA").optional(),
      loadMinMilliamps: nonNegative("lowest load current, mA").optional(),
      loadMaxMilliamps: nonNegative("highest load current, mA").optional(),
      ratedLoadMilliamps: nonNegative("load at which the initial accuracy holds, mA").optional(),
      longTermDriftPpmPer1000h: nonNegative("long-term drift, ± ppm per 1000 h").optional(),
      serviceHours: positive("service time the drift accumulates over, h").optional(),
      driftScaling,
      thermalHysteresisPpm: nonNegative("thermal hysteresis, ± ppm").optional(),
      maxInputVolts: positive("absolute maximum input, V").optional(),
      dropoutVolts: nonNegative("dropout voltage, V").optional(),
    })
    .describe("a series (three-terminal) voltage reference"),
  z
    .strictObject({
      kind: z.literal("shunt"),
      ...referenceCommon,
      initialAccuracyFraction: fraction("initial accuracy at 25 °C"),
      tempcoPpmPerC: nonNegative("temperature coefficient, ppm/°C").optional(),
      tempcoMethod,
      dynamicImpedanceOhms: nonNegative("dynamic impedance, Ω").optional(),
      seriesOhms: positive("series resistor from the supply, Ω (omit to let the tool choose a standard value)").optional(),
      seriesResistorSeries: seriesName.optional().describe("preferred series for the chosen series resistor"),
      seriesResistorToleranceFraction: fraction("tolerance of the chosen series resistor").optional(),
      loadMinMilliamps: nonNegative("lowest load current besides the threshold divider, mA").optional(),
      loadMaxMilliamps: nonNegative("highest load current besides the threshold divider, mA").optional(),
      shuntMinMilliamps: positive("least cathode current for regulation, mA").optional(),
      shuntMaxMilliamps: positive("greatest allowed cathode current, mA").optional(),
      ratedCurrentMilliamps: positive("cathode current at which the initial accuracy holds, mA").optional(),
      longTermDriftPpmPer1000h: nonNegative("long-term drift, ± ppm per 1000 h").optional(),
      serviceHours: positive("service time, h").optional(),
      driftScaling,
    })
    .describe("a shunt (two-terminal) reference fed through a series resistor"),
  z
    .strictObject({
      kind: z.literal("regulator-rail"),
      ...referenceCommon,
      totalToleranceFraction: fraction("total tolerance over line, load and temperature").optional(),
      initialAccuracyFraction: fraction("initial accuracy at 25 °C").optional(),
      initialToleranceFraction: fraction("deprecated name of initialAccuracyFraction (accepted for one minor version)").optional(),
      lineRegulationFraction: fraction("line regulation over the supply range").optional(),
      loadRegulationFraction: fraction("load regulation over the load range").optional(),
      temperatureDriftFraction: fraction("drift over the temperature range").optional(),
      maxInputVolts: positive("absolute maximum input, V").optional(),
      dropoutVolts: nonNegative("dropout voltage, V").optional(),
    })
    .describe("a regulator's output rail used as the reference (e.g. a 5 V linear regulator)"),
] as const;

/** One reference option. */
export const referenceSchema = z.discriminatedUnion("kind", referenceSchemaList);

const resistorsSchema = z
  .strictObject({
    series: seriesName.describe("preferred series (IEC 60063)"),
    toleranceFraction: z.number().min(0).max(0.5).describe("tolerance of each resistor, ± fraction (0.01 = 1 %; 0 for a perfect part)"),
    tempcoPpmPerC: nonNegative("tempco of each resistor, ± ppm/°C").optional(),
    matched: z
      .strictObject({
        ratioToleranceFraction: fraction("ratio tolerance between any two resistors"),
        trackingPpmPerC: nonNegative("tracking tempco, ± ppm/°C").optional(),
      })
      .optional()
      .describe("the divider is one matched network"),
    minTotalOhms: positive("least total divider resistance, Ω (default 1000)").optional(),
    maxTotalOhms: positive("greatest total divider resistance, Ω (default 1e6)").optional(),
    minDividerCurrentMilliamps: positive("least divider current, mA").optional(),
    maxDividerCurrentMilliamps: positive("greatest divider current, mA").optional(),
    topology: z
      .enum(["separate", "ladder"])
      .optional()
      .describe('"separate" (default): a divider per setpoint; "ladder": one string whose taps give the thresholds'),
  })
  .describe("resistors of the threshold divider (the tool picks the values)");

const ambientSchema = z
  .strictObject({
    minC: temperatureC("lowest ambient of the electronics and the cold junction"),
    maxC: temperatureC("highest ambient of the electronics and the cold junction"),
  })
  .describe("ambient range of the electronics and the cold junction");

const distributionOverrideSchema = z
  .strictObject({
    distribution: z.enum(["normal", "rectangular", "triangular", "trapezoidal", "arcsine"]),
    coverageFactor: positive("normal only: coverage factor k of the stated limit (default 2)").optional(),
    beta: z.number().min(0).max(1).optional().describe("trapezoidal only: top-to-base ratio (default 0.5)"),
  })
  .describe("distribution of one named error source");

const analysisSchema = z
  .strictObject({
    acceptanceMethod: z
      .enum(_propagationMethods)
      .optional()
      .describe("method whose band decides pass/fail (default worst-case)"),
    monteCarloTrials: z.number().int().min(100).max(10_000_000).optional().describe("Monte Carlo trials"),
    seed: z.number().int().min(0).max(4_294_967_295).optional().describe("Monte Carlo seed"),
  })
  .describe("how the design is analysed (command-line options override)");

const protectionSchema = z
  .strictObject({
    openCircuitBias: z
      .enum(["pull-up", "pull-down", "none"])
      .optional()
      .describe('where an open thermocouple input goes: "pull-up" (reads high), "pull-down" (reads low), "none" (floats; default)'),
    outputStage: z
      .enum(["energize-to-trip", "de-energize-to-trip"])
      .optional()
      .describe('behaviour on loss of power: "energize-to-trip" (power loss = no trip; default) or "de-energize-to-trip" (power loss = trip)'),
    comparatorTripLevel: z.enum(["high", "low"]).optional().describe('comparator output level that means trip (default "high")'),
    amplifierRailsVolts: z
      .strictObject({ lowVolts: z.number().min(-100).max(100), highVolts: z.number().min(-100).max(100) })
      .optional()
      .describe("output rails of the amplifier, V (default 0 and 5)"),
    noEffectThresholdC: z
      .number()
      .min(0)
      .max(100)
      .optional()
      .describe("a fault moving the trip by at most this much, its moved worst-case band inside the limits, is \"no effect\"; beyond it \"degraded\", °C (default 3)"),
    detection: z
      .strictObject({
        outOfRangeWindowC: z
          .strictObject({ lowC: temperatureC("lowest plausible indicated temperature"), highC: temperatureC("highest plausible indicated temperature") })
          .optional()
          .describe("a window check on the indicated temperature"),
        outOfRangeWindowVolts: z
          .strictObject({ lowVolts: z.number().min(-100).max(100), highVolts: z.number().min(-100).max(100) })
          .optional()
          .describe("a window comparator on the amplifier output, V"),
        openThermocoupleDetection: z.boolean().optional().describe("the design detects an open thermocouple loop"),
        secondComparatorC: temperatureC("a second comparator on the amplifier output tripping here").optional(),
        supervisoryReading: z
          .strictObject({
            plausibleLowC: temperatureC("readings below this are flagged").optional(),
            plausibleHighC: temperatureC("readings above this are flagged").optional(),
            independentSensor: z.boolean().optional().describe("the supervisor has its own sensor"),
            toleranceC: positive("disagreement the supervisor tolerates, °C (default 10)").optional(),
          })
          .optional()
          .describe("firmware reads the signal and flags implausible values"),
      })
      .optional()
      .describe("how the design notices faults"),
  })
  .describe("protection facts for the single-fault review (`faults`); command-line options override");


// The wire between the probe and the amplifier (chain/wire/): cable, connectors, loop, leakage, ageing.
const rangeC = (description: string) =>
  z
    .strictObject({ minC: temperatureC("lowest"), maxC: temperatureC("highest") })
    .describe(`${description}, °C (a single temperature: minC = maxC)`);

const cableToleranceSchema = z.discriminatedUnion("standard", [
  z
    .strictObject({
      standard: z.literal("IEC 60584-3"),
      class: z.union([z.literal(1), z.literal(2)]),
      variant: z.enum(["A", "B"]).optional().describe("compensating cables of types K, R, S: variant A or B"),
    })
    .describe("IEC 60584-3 cable tolerance class (compensating cables: class 2)"),
  z.strictObject({ standard: z.literal("ASTM E230"), limits: z.enum(["standard", "special"]) }).describe("ASTM E230 extension-wire limits"),
  z
    .strictObject({
      standard: z.literal("custom"),
      toleranceC: nonNegative("± °C at the cable's temperature"),
      minC: temperatureC("lowest cable temperature where it holds"),
      maxC: temperatureC("highest cable temperature where it holds"),
    })
    .describe("a cable maker's own statement"),
]);

const cableSchema = z
  .strictObject({
    grade: z.enum(["extension", "compensating"]).describe("extension (the thermocouple's alloys) or compensating (other alloys, narrow range)"),
    tolerance: cableToleranceSchema,
    runTemperatureC: rangeC("every temperature the cable passes through, both ends included (must lie in the rated range)"),
    junctionTemperatureC: rangeC("temperature of the cable's junction with the thermocouple (probe head)"),
    mismatch: z
      .enum(["envelope", "proportional"])
      .optional()
      .describe('"envelope" (default, conservative: what the statement guarantees) or "proportional" (a relative alloy mismatch; vanishes for an isothermal run)'),
    label: label("label in reports").optional(),
  })
  .describe("an extension or compensating cable between the probe head and the instrument's terminals");

const contactMetalSchema = z.union([
  z.enum(["copper", "platinum", "matching"]).describe('a tabulated contact metal, or "matching" (the thermocouple\'s own alloys)'),
  z
    .strictObject({
      name: label("name of the metal"),
      seebeckVsPlatinumMicrovoltsPerC: z.number().min(-100).max(100).describe("Seebeck coefficient against platinum, µV/°C"),
    })
    .describe("a contact metal stated by the user"),
]);

const connectorSchema = z
  .strictObject({
    arrangement: z
      .enum(["terminates", "inline"])
      .describe('"terminates": copper runs on to the instrument (the de facto reference junction); "inline": the same alloy continues'),
    contactMetal: contactMetalSchema,
    temperatureC: rangeC("temperature of the connector (absolute)").optional(),
    aboveColdJunctionC: rangeC('temperature of the connector above the cold-junction sensor ("terminates" only)').optional(),
    legDifferenceC: nonNegative('"terminates": difference between the two legs\' contact temperatures, ± °C').optional(),
    positiveLegDifferenceC: nonNegative('"inline": temperature difference across the positive leg\'s contacts, ± °C').optional(),
    negativeLegDifferenceC: nonNegative('"inline": temperature difference across the negative leg\'s contacts, ± °C').optional(),
    legSeebeck: z
      .strictObject({
        positiveMicrovoltsPerC: z.number().min(-200).max(200).describe("positive leg against the contact metal, µV/°C"),
        negativeMicrovoltsPerC: z.number().min(-200).max(200).describe("negative leg against the contact metal, µV/°C"),
      })
      .optional()
      .describe("leg coefficients against the contact metal (default: the tables, from memory)"),
    label: label("label in reports").optional(),
  })
  .describe("a connector or terminal block in the thermocouple circuit");

const wireRunSchema = z
  .strictObject({
    lengthMetres: nonNegative("length of the pair (each leg), m"),
    diameterMm: positive("diameter of each leg, mm").optional(),
    awg: z.number().int().min(-3).max(40).optional().describe("American Wire Gauge of each leg"),
  })
  .describe("a length of thermocouple-alloy wire by gauge");

const loopSchema = z
  .strictObject({
    thermocoupleWire: wireRunSchema.optional(),
    thermocoupleOhms: nonNegative("loop resistance of the thermocouple, both legs, Ω").optional(),
    cableWire: wireRunSchema.optional(),
    cableOhms: nonNegative("loop resistance of the cable, both conductors, Ω").optional(),
    otherOhms: nonNegative("other series resistance (filter resistors), Ω").optional(),
    resistanceToleranceFraction: fraction("tolerance of the loop resistance").optional(),
    biasCurrentNanoamps: nonNegative("amplifier input bias current, ± nA (sign unknown)").optional(),
    detectionCurrentNanoamps: nonNegative("open-circuit detection current, nA").optional(),
    detectionCurrentToleranceFraction: fraction("tolerance of the detection current").optional(),
    detectionDirection: z
      .enum(["pullUp", "pullDown"])
      .optional()
      .describe('"pullUp": reads high by I·R (an open loop goes upscale); "pullDown": reads low'),
    label: label("label in reports").optional(),
  })
  .describe("the thermocouple loop's resistance and the bias and detection currents through it");

// Deliberately alike: the same strictObject shape as every section (see the note at setpointSchema).
const leakageSchema = z
  .strictObject({
    minimumShuntOhms: positive("lowest insulation (shunt) resistance at the operating temperature, Ω"),
    loopOhms: nonNegative("loop resistance between the shunt and the amplifier, Ω"),
    statedAtC: temperatureC("temperature at which the insulation resistance is stated").optional(),
    label: label("label in reports").optional(),
  })
  .describe("insulation leakage at temperature across the hot end (design-specific: take it from the probe maker)");

const ageingSchema = z
  .strictObject({
    driftCPer1000Hours: nonNegative("drift rate, °C per 1000 h at statedAtC").optional(),
    totalDriftC: nonNegative("total drift over serviceHours, °C").optional(),
    statedAtC: temperatureC("temperature the drift is stated at (the hot junction must not exceed it)"),
    serviceHours: positive("service life between recalibrations, h"),
    direction: z.enum(["up", "down", "symmetric"]).describe('"up": reads high by 0 … D; "down": low by 0 … D; "symmetric": ±D'),
    label: label("label in reports").optional(),
  })
  .describe("ageing of the probe: a stated drift, accumulating linearly with time in service");

const wireSchema = z
  .strictObject({
    cable: cableSchema.optional(),
    connectors: z.array(connectorSchema).max(16).optional().describe("connectors and terminal blocks, probe side first"),
    loop: loopSchema.optional(),
    leakage: leakageSchema.optional(),
    ageing: ageingSchema.optional(),
  })
  .describe("the wire between the probe and the amplifier input");

const inputFilterSchema = z
  .strictObject({
    resistanceOhms: nonNegative("series resistance of the input RC filter, Ω"),
    capacitanceFarads: nonNegative("shunt capacitance of the input RC filter, F"),
  })
  .describe("first-order input RC filter, τ = R·C");
const amplifierBandwidthHz = positive("amplifier −3 dB bandwidth, Hz (first-order roll-off, τ = 1/(2πf))").optional();
const mainsHz = z.literal([50, 60]).describe("mains frequency, Hz: 50 or 60");

const dynamicsSchema = z
  .strictObject({
    runaway: z.discriminatedUnion("kind", [
      z
        .strictObject({ kind: z.literal("constantRate"), rateCPerSecond: positive("rate of rise with the heater stuck on, °C/s") })
        .describe("a stated constant rate of rise; the load holds its temperature after heat off"),
      z
        .strictObject({
          kind: z.literal("heaterPower"),
          heaterWatts: positive("heater power with the heater stuck on, W"),
          loadCapacityJoulesPerK: positive("thermal capacity of the heated load, J/K"),
          lossWattsPerK: nonNegative("loss conductance from the load to ambient, W/K (0: adiabatic)"),
          ambientC: temperatureC("ambient the load loses heat to"),
          element: z
            .strictObject({
              capacityJoulesPerK: positive("thermal capacity of the heater element, J/K"),
              couplingWattsPerK: positive("conductance from element to load, W/K"),
            })
            .optional()
            .describe("the heater element as a second thermal node (stored heat after the cut)"),
        })
        .describe("a first-order load heated by a stated power, approaching ambientC + heaterWatts/lossWattsPerK"),
    ]),
    sensor: z
      .discriminatedUnion("kind", [
        z.strictObject({ kind: z.literal("firstOrder"), timeConstantSeconds: nonNegative("time constant τ, s") }).describe("first-order probe"),
        z
          .strictObject({ kind: z.literal("responseTime"), responseTime632Seconds: nonNegative("63.2 % step response time, s") })
          .describe("first-order probe given by its 63.2 % response time"),
        z
          .strictObject({
            kind: z.literal("twoLags"),
            wellTimeConstantSeconds: nonNegative("time constant of the thermowell, s"),
            probeTimeConstantSeconds: nonNegative("time constant of the probe in the well, s"),
          })
          .describe("a sheathed probe in a thermowell: two cascaded first-order lags"),
      ])
      .optional(),
    signalPath: z
      .discriminatedUnion("kind", [
        z
          .strictObject({
            kind: z.literal("analog"),
            inputFilter: inputFilterSchema.optional(),
            amplifierBandwidthHz,
            comparatorDelaySeconds: nonNegative("comparator propagation delay, s").optional(),
          })
          .describe("comparator path (designs with a comparator)"),
        z
          .strictObject({
            kind: z.literal("firmware"),
            inputFilter: inputFilterSchema.optional(),
            amplifierBandwidthHz,
            samplePeriodSeconds: positive("ADC sample (decision) period, s"),
            digitalFilter: z
              .discriminatedUnion("kind", [
                z.strictObject({ kind: z.literal("movingAverage"), samples: z.number().int().min(1).max(100_000).describe("samples averaged") }),
                z.strictObject({
                  kind: z.literal("firstOrderIir"),
                  coefficient: z.number().gt(0).max(1).describe("coefficient a of y[n] = y[n−1] + a·(x[n] − y[n−1]), 0 < a ≤ 1"),
                }),
              ])
              .optional()
              .describe("digital filter of the firmware"),
            debounceSamples: z.number().int().min(1).max(100_000).optional().describe("consecutive samples at or above the threshold before the trip (default 1)"),
          })
          .describe("firmware path (designs with an ADC): sampling, digital filter, debounce"),
      ])
      .optional()
      .describe("signal path from sensor to trip decision (omitted: no lag)"),
    outputStages: z
      .array(
        z.discriminatedUnion("kind", [
          z.strictObject({ kind: z.literal("relay"), releaseTimeSeconds: nonNegative("release (drop-out) time, s") }).describe("relay or contactor"),
          z.strictObject({ kind: z.literal("solidStateRelay"), mainsFrequencyHz: mainsHz }).describe("turns off at the next current zero (up to half a mains period)"),
          z.strictObject({ kind: z.literal("deEnergiseDelay"), delaySeconds: nonNegative("own delay of a de-energise-to-trip stage, s") }).describe("driver, watchdog or hold-up delay"),
        ]),
      )
      .max(16)
      .optional()
      .describe("output stages between the trip decision and heat off, in series"),
    noise: z
      .strictObject({
        sensitivityVoltsPerC: positive("signal slope at the comparator or ADC input, V/°C (default: from the chain at each setpoint)").optional(),
        white: z
          .discriminatedUnion("kind", [
            z.strictObject({
              kind: z.literal("density"),
              densityVoltsPerRootHertz: nonNegative("one-sided noise density at the comparator or ADC input, V/√Hz"),
              bandwidthHz: positive("bandwidth of the ideal low-pass the noise is flat within, Hz"),
            }),
            z.strictObject({
              kind: z.literal("rms"),
              rmsVolts: nonNegative("rms noise at the comparator or ADC input, V"),
              bandwidthHz: positive("bandwidth of the ideal low-pass the noise is flat within, Hz"),
            }),
          ])
          .optional()
          .describe("band-limited white noise"),
        mainsPickup: z
          .strictObject({
            amplitudeVolts: nonNegative("peak pickup at the comparator or ADC input scale, before the filter's attenuation, V"),
            frequencyHz: mainsHz,
          })
          .optional()
          .describe("mains pickup, a deterministic sinusoid"),
        chatterTargetPerHour: positive("highest acceptable rate of output re-crossings at the threshold, per hour"),
      })
      .optional()
      .describe("noise at the comparator or ADC input"),
  })
  .describe("response time of the trip through a runaway (heater stuck on): process, sensor, signal path, output stages, noise");
const assumedClassSchema = z
  .strictObject({
    safety: z.enum(["safe", "dangerous", "degraded", "no-effect"]).describe("the class stated for this mode"),
    detected: z.boolean().describe("a diagnostic reveals it (and brings the safe state) in time"),
  })
  .describe("a class stated by the user for a mode the review does not model");

const failureModeSchema = z
  .strictObject({
    mode: label("the failure mode in words, e.g. open, short, drift, output stuck low"),
    share: z.number().min(0).max(1).describe("share of the element's rate, 0 to 1; the shares of one element sum to 1 (±0.0001)"),
    faultId: z.string().min(1).max(200).optional().describe("the fault of the review this mode is, e.g. divider.resistor0.open (see `faults --json`)"),
    assumed: assumedClassSchema.optional(),
  })
  .describe("one failure mode of an element: give exactly one of faultId and assumed");

const elementFailureSchema = z
  .strictObject({
    element: label("the element in words or by position, e.g. thermocouple, top resistor of the divider (positions as the reports name them: top, ladder 1 …, bottom)"),
    rateFit: z.number().min(0).max(1e9).describe("failure rate of the element, FIT (failures per 10⁹ h)"),
    rateSource: z.string().max(500).optional().describe("where the rate comes from (handbook, standard, field data); reported only"),
    modes: z.array(failureModeSchema).min(1).max(64).describe("the element's failure modes"),
  })
  .describe("failure data of one element");

const proofTestSchema = z
  .strictObject({
    proofTestIntervalHours: z.number().positive().max(1e9).describe("proof-test interval T1, h"),
    meanTimeToRestorationHours: z.number().min(0).max(1e9).describe("mean time to restoration after a detected failure (MTTR), h"),
    meanRepairTimeHours: z.number().min(0).max(1e9).optional().describe("mean repair time after a proof test found a failure (MRT), h (default MTTR)"),
    missionTimeHours: z.number().positive().max(1e9).optional().describe("mission time T_M, h: when what the proof test misses is found (needed when the coverage is below 1)"),
    proofTestCoverage: z.number().min(0).max(1).optional().describe("share of λ_DU the proof test reveals, 0 to 1 (default 1; ignored when revealsFaultIds is given)"),
    revealsFaultIds: z
      .array(z.string().min(1).max(200))
      .max(256)
      .optional()
      .describe("faults an injected-signal test at the interval reveals; the coverage is then their share of λ_DU"),
  })
  .describe("the proof test and repair times (IEC 61508-6 Annex B symbols)");

const failureElementsSchema = z.array(elementFailureSchema).min(1).max(256).describe("per element a rate in FIT and mode shares mapped onto fault ids");

const secondChannelSchema = z
  .strictObject({
    name: label("label of the second channel in reports"),
    notes: z.string().max(10_000).optional().describe("free text"),
    thermocouple: thermocoupleSchema.optional().describe("its own thermocouple (default: a second probe like the first channel's)"),
    coldJunction: coldJunctionSchema.optional(),
    amplifier: amplifierSchema.optional(),
    adc: adcSchema.describe("the ADC whose readings the second channel's firmware compares with the setpoints"),
    reference: referenceSchema.optional().describe("reference of the second channel's ADC (default the first channel's)"),
    tripTemperaturesC: z
      .array(temperatureC("firmware trip of the second channel"))
      .min(1)
      .max(64)
      .optional()
      .describe("one per setpoint, in order (default each setpoint's tripTemperatureC)"),
    protection: protectionSchema.optional().describe("the second channel's protection facts (default the first channel's)"),
    beta: z.number().min(0).max(1).describe("common-cause factor β of undetected dangerous failures, 0 to 1"),
    betaD: z.number().min(0).max(1).describe("common-cause factor β_D of detected dangerous failures, 0 to 1"),
    elements: failureElementsSchema,
  })
  .describe("a second, independent channel (a thermocouple and a firmware ADC path) combined with the first as 1oo2");

const failureDataSchema = z
  .strictObject({
    notes: z.string().max(10_000).optional().describe("free text: where the rates come from, what is invented"),
    elements: failureElementsSchema,
    proofTest: proofTestSchema.optional(),
    countDegradedAsDangerous: z.boolean().optional().describe("count degraded faults as dangerous (default false: left out of λ_S and λ_D)"),
    secondChannel: secondChannelSchema.optional(),
  })
  .describe("failure rates and mode shares for the safety figures of `faults` (supplied by you; the package ships none)");

/** The whole design file, version 1. */
export const designFileSchema = z
  .strictObject({
    $schema: z.string().max(2000).optional().describe("path or URL of this JSON Schema (ignored)"),
    hotjunctionDesign: z.literal(1).describe("design file format version"),
    name: label("name of the design").optional(),
    notes: z.string().max(10_000).optional().describe("free text"),
    sectionNotes: z
      .record(z.string().min(1).max(64), z.string().max(2000))
      .optional()
      .describe("free text per section, by section name (e.g. `{ \"thermocouple\": \"probe in the roof\" }`); ignored by the analysis"),
    setpoints: z.array(setpointSchema).min(1).max(64).describe("trip setpoints"),
    processLimits: processLimitsSchema.optional(),
    thermocouple: thermocoupleSchema,
    coldJunction: coldJunctionSchema.optional(),
    designColdJunctionC: temperatureC("cold-junction temperature the thresholds are designed at (default mid-ambient)").optional(),
    amplifier: amplifierSchema.optional(),
    comparator: comparatorSchema.optional(),
    adc: adcSchema.optional(),
    reference: referenceSchema,
    referenceAlternatives: z.array(referenceSchema).max(32).optional().describe("other reference options for `compare`"),
    resistors: resistorsSchema.optional(),
    ambient: ambientSchema,
    wire: wireSchema.optional(),
    sourceDistributions: z
      .record(z.string().min(1).max(200), distributionOverrideSchema)
      .optional()
      .describe("distribution overrides by error-source name"),
    analysis: analysisSchema.optional(),
    protection: protectionSchema.optional(),
    dynamics: dynamicsSchema.optional(),
    failureData: failureDataSchema.optional(),
  })
  .describe("a hotjunction over-temperature protection design");

/** A design file as validated (shape only; cross-field rules are checked by `parseDesign`). */
export type DesignFile = z.infer<typeof designFileSchema>;
/** The `failureData` section of a design file. */
export type DesignFailureData = z.infer<typeof failureDataSchema>;
/** One reference option as written in a design file. */
export type DesignReference = z.infer<typeof referenceSchema>;
/** The `dynamics` section as written in a design file. */
export type DesignDynamics = z.infer<typeof dynamicsSchema>;
