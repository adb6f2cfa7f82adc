/**
 * The response-time fold-in of a trip design: per setpoint, the runaway with the slowest unit (trip at the high
 * edge of the static worst-case band) and with the nominal unit, the dynamic margin to the hazard limit, the
 * uncontrolled time from the highest normal operating temperature to the hazard limit against the response time,
 * and the noise figures with the band's low edge (false trips, hysteresis needed against chatter, compared with
 * the comparator's own hysteresis). The verdict of a setpoint then uses the dynamic peak on the hazard side.
 * @module
 */
import { HotjunctionTypeError, _requireFiniteResult, _requireNonNegative, _requireObject, _requirePositive, _requireShape, type _Shape } from "../errors.js";
import { _runawayFigures, checkDynamics, DYNAMICS_ASSUMPTIONS, type DynamicsCheck, type RunawayFigures } from "../dynamics/checkDynamics.js";
import type { TripNoiseFigures } from "../dynamics/levelCrossing.js";
import type { RunawayResponse } from "../dynamics/simulateRunaway.js";
import type { DynamicsModel, NoiseSpec } from "../dynamics/types.js";
import type { AmplifierElement, FixedScaleAmplifierElement } from "../chain/types.js";
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { seebeckCoefficient } from "../its90/convert.js";

const CONTEXT = "tripDynamics";

/** Noise as a trip design states it: the signal slope may be left to the chain (per setpoint). */
export type TripDynamicsNoise = Omit<NoiseSpec, "sensitivityVoltsPerC"> & {
  /** Signal slope at the comparator or ADC input, V/°C; omitted: each setpoint's `sensitivityVoltsPerC`. */
  readonly sensitivityVoltsPerC?: number;
};

/** A response-time model whose noise slope may come from the chain. */
export type TripDynamicsModel = Omit<DynamicsModel, "noise"> & { readonly noise?: TripDynamicsNoise };

/** One setpoint's static results, as the dynamic check needs them. */
export interface TripDynamicsSetpointInput {
  readonly name: string;
  /** Highest normal operating temperature, °C (the runaway starts here). */
  readonly maxNormalOperatingC: number;
  /** Hazard limit, °C. */
  readonly hazardLimitC: number;
  /** Trip temperature with every part nominal, °C. */
  readonly nominalTripC: number;
  /** Static worst-case band: earliest-tripping unit, °C. */
  readonly bandLowC: number;
  /** Static worst-case band: slowest unit, °C. */
  readonly bandHighC: number;
  /** Whether the static check passes on the low side (the accepted band stays above normal operation). */
  readonly lowSidePass: boolean;
  /** Whether the static check passes as a whole (both sides). */
  readonly staticPass: boolean;
  /** Signal slope at the comparator or ADC input at this setpoint, V/°C; used when the noise states none. */
  readonly sensitivityVoltsPerC?: number;
  /** Where the slope comes from, in words (printed). */
  readonly sensitivitySource?: string;
}

/** Inputs of {@link tripDynamics}. */
export interface TripDynamicsInput {
  readonly model: TripDynamicsModel;
  readonly setpoints: readonly TripDynamicsSetpointInput[];
  /** The comparator's own hysteresis at its input, V (full width); omitted for a firmware trip. */
  readonly comparatorHysteresisVolts?: number;
  /** Points kept per time series, 10 … 100000; default 600. */
  readonly maxPoints?: number;
}

/** One runaway case of a setpoint, as JSON-ready figures (those of {@link RunawayResponse}, see `RunawayFigures`). */
export interface TripDynamicsCase extends RunawayFigures {
  /** `"slowest unit"` (band high edge) or `"nominal unit"`. */
  readonly name: string;
  /** True-temperature trip point, °C. */
  readonly tripTemperatureC: number;
}

/** Noise figures of a setpoint with the comparison against the design's hysteresis. */
export interface TripDynamicsNoiseFigures extends TripNoiseFigures {
  /** Signal slope used, V/°C. */
  readonly sensitivityVoltsPerC: number;
  /** Where the slope comes from. */
  readonly sensitivitySource: string;
  /** The comparator's own hysteresis, V; null for a firmware trip. */
  readonly designHysteresisVolts: number | null;
  /** The same in °C at this setpoint; null for a firmware trip. */
  readonly designHysteresisC: number | null;
  /** Whether the design's hysteresis covers the hysteresis needed; null for a firmware trip. */
  readonly hysteresisSufficient: boolean | null;
}

/** One setpoint's dynamic results. */
export interface TripDynamicsSetpoint {
  readonly name: string;
  readonly maxNormalOperatingC: number;
  readonly hazardLimitC: number;
  readonly bandLowC: number;
  readonly bandHighC: number;
  readonly nominalTripC: number;
  /** Slowest unit first, then the nominal unit. */
  readonly cases: readonly TripDynamicsCase[];
  /** Uncontrolled runaway from the highest normal operating temperature to the hazard limit, s; null: never. */
  readonly timeFromNormalToHazardSeconds: number | null;
  /** Longest response time of the cases, s; null if no case trips. */
  readonly longestResponseTimeSeconds: number | null;
  /** Longest response time over the time from normal to hazard; null when either is null. */
  readonly responseShareOfTimeToHazard: number | null;
  readonly highestPeakTrueC: number;
  readonly smallestDynamicMarginC: number;
  /** Static verdict (band between normal operation and the hazard limit). */
  readonly staticPass: boolean;
  /** Every case trips and peaks below the hazard limit. */
  readonly dynamicPass: boolean;
  /** The verdict: the static low side and the dynamic peak on the hazard side. */
  readonly pass: boolean;
  /** Always `"dynamic peak"` here: the hazard side of the verdict uses the peak. */
  readonly verdictUses: "dynamic peak";
  /** One sentence on the verdict. */
  readonly reason: string;
  /** Noise figures; null when the model states no noise. */
  readonly noise: TripDynamicsNoiseFigures | null;
}

/** Result of {@link tripDynamics}. */
export interface TripDynamicsResult {
  readonly setpoints: readonly TripDynamicsSetpoint[];
  /** Every setpoint passes with the dynamic peak. */
  readonly pass: boolean;
  /** The model used (noise slope as stated; per setpoint it may come from the chain). */
  readonly model: TripDynamicsModel;
  readonly assumptions: readonly string[];
  /** The runaway responses with their time series, per setpoint in the order of `cases` (for charts). */
  readonly responses: readonly (readonly RunawayResponse[])[];
}

function fmt(value: number, decimals = 1): string {
  return value.toFixed(decimals);
}

function caseOf(name: string, r: RunawayResponse): TripDynamicsCase {
  return { name, tripTemperatureC: r.scenario.tripTemperatureC, ..._runawayFigures(r) };
}

function reasonOf(s: TripDynamicsSetpointInput, check: DynamicsCheck): string {
  const [slow, nominal] = check.cases;
  const parts: string[] = [];
  if (!s.lowSidePass) parts.push(`the static band reaches down to the highest normal operating temperature ${s.maxNormalOperatingC} °C`);
  if (slow !== undefined) {
    const r = slow.response;
    parts.push(
      r.tripped
        ? `the slowest unit (trip ${fmt(s.bandHighC)} °C) stops the heat ${fmt(r.responseTimeSeconds ?? 0, 2)} s after the true crossing and peaks at ${fmt(r.peakTrueC)} °C, ${fmt(Math.abs(r.dynamicMarginC))} °C ${r.dynamicMarginC > 0 ? "below" : "above"} the hazard limit ${s.hazardLimitC} °C`
        : `the slowest unit (trip ${fmt(s.bandHighC)} °C) never trips; the runaway approaches ${fmt(r.peakTrueC)} °C`,
    );
  }
  if (nominal !== undefined) parts.push(`the nominal unit peaks at ${fmt(nominal.response.peakTrueC)} °C`);
  return `Verdict from the dynamic peak: ${parts.join("; ")}.`;
}

/** What tripDynamics reads of each setpoint (its figures are copied into the result, so each must be finite). */
const setpointShape: _Shape = {
  name: "string",
  maxNormalOperatingC: "number",
  hazardLimitC: "number",
  nominalTripC: "number",
  bandLowC: "number",
  bandHighC: "number",
  lowSidePass: "boolean",
  staticPass: "boolean",
  sensitivitySource: ["optional", "string"],
};

/**
 * The dynamic check of every setpoint of a trip design. Per setpoint the runaway starts at the highest normal
 * operating temperature and runs against two trip points: the slowest unit (the static worst-case band's high
 * edge) and the nominal unit. The setpoint passes when the static band stays above normal operation and every
 * case trips and peaks below the hazard limit (the verdict uses the dynamic peak). With noise stated, the
 * false-trip rate (Rice) uses the band's low edge, and the hysteresis needed against chatter is compared with
 * the comparator's own hysteresis.
 * @param input - the model, each setpoint's static figures, and the comparator hysteresis.
 * @returns figures per setpoint (JSON-ready apart from `responses`, which carries the time series for charts).
 * @throws {@link HotjunctionTypeError} / {@link HotjunctionRangeError} for bad input (e.g. noise without a slope).
 * @example
 * ```ts
 * import { tripDynamics } from "hotjunction";
 * const result = tripDynamics({
 *   model: { runaway: { kind: "constantRate", rateCPerSecond: 1.2 }, sensor: { kind: "firstOrder", timeConstantSeconds: 20 } },
 *   setpoints: [{ name: "bisque", maxNormalOperatingC: 1000, hazardLimitC: 1060, nominalTripC: 1020, bandLowC: 1012,
 *     bandHighC: 1028, lowSidePass: true, staticPass: true }],
 * });
 * console.log(result.pass, result.setpoints[0]?.highestPeakTrueC.toFixed(1)); // true "1048.9"
 * ```
 */
export function tripDynamics(input: TripDynamicsInput): TripDynamicsResult {
  if (typeof input !== "object" || input === null) {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "trip dynamics input", value: input, context: CONTEXT, problem: "is not an object" });
  }
  if (!Array.isArray(input.setpoints) || input.setpoints.length === 0) {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "setpoints", value: input.setpoints, context: CONTEXT, problem: "is not a non-empty array" });
  }
  _requireObject(input.model, "model", CONTEXT);
  input.setpoints.forEach((s, i) => _requireShape(s, setpointShape, `setpoints[${i}]`, CONTEXT));
  const hysteresis =
    input.comparatorHysteresisVolts === undefined
      ? null
      : _requireNonNegative(input.comparatorHysteresisVolts, "comparator hysteresis (comparatorHysteresisVolts)", "V", CONTEXT);
  const responses: RunawayResponse[][] = [];
  const setpoints = input.setpoints.map((s) => {
    const noise = input.model.noise;
    let model: DynamicsModel;
    let sensitivity: number | null = null;
    let sensitivitySource = "stated in the design";
    if (noise === undefined) {
      const { noise: _n, ...rest } = input.model;
      model = rest;
    } else {
      const stated = noise.sensitivityVoltsPerC;
      if (stated === undefined && s.sensitivityVoltsPerC === undefined) {
        throw new HotjunctionTypeError({
          code: "INVALID_OPTION",
          quantity: `noise sensitivity (sensitivityVoltsPerC) at setpoint ${JSON.stringify(s.name)}`,
          value: undefined,
          context: CONTEXT,
          problem: "is missing: state it in the noise or give the setpoint's slope from the chain",
        });
      }
      sensitivity = stated ?? _requirePositive(s.sensitivityVoltsPerC, "setpoint sensitivity (sensitivityVoltsPerC)", "V/°C", CONTEXT);
      if (stated === undefined) sensitivitySource = s.sensitivitySource ?? "from the chain at the setpoint";
      model = { ...input.model, noise: { ...noise, sensitivityVoltsPerC: sensitivity } };
    }
    const check = checkDynamics({
      model,
      maxNormalOperatingC: s.maxNormalOperatingC,
      hazardLimitC: s.hazardLimitC,
      thresholds: [
        { name: "slowest unit", tripTemperatureC: s.bandHighC },
        { name: "nominal unit", tripTemperatureC: s.nominalTripC },
      ],
      ...(noise !== undefined ? { bandLowEdgeC: s.bandLowC } : {}),
      ...(input.maxPoints !== undefined ? { maxPoints: input.maxPoints } : {}),
    });
    responses.push(check.cases.map((c) => c.response));
    const toHazard = check.timeFromNormalToHazardSeconds;
    const longest = check.longestResponseTimeSeconds;
    const pass = s.lowSidePass && check.passes;
    const noiseFigures: TripDynamicsNoiseFigures | null =
      check.noise === null || sensitivity === null
        ? null
        : {
            ...check.noise,
            sensitivityVoltsPerC: sensitivity,
            sensitivitySource,
            designHysteresisVolts: hysteresis,
            designHysteresisC: hysteresis === null ? null : hysteresis / sensitivity,
            hysteresisSufficient: hysteresis === null ? null : hysteresis >= check.noise.hysteresisNeededVolts,
          };
    const setpoint: TripDynamicsSetpoint = {
      name: s.name,
      maxNormalOperatingC: s.maxNormalOperatingC,
      hazardLimitC: s.hazardLimitC,
      bandLowC: s.bandLowC,
      bandHighC: s.bandHighC,
      nominalTripC: s.nominalTripC,
      cases: check.cases.map((c) => caseOf(c.name, c.response)),
      timeFromNormalToHazardSeconds: toHazard,
      longestResponseTimeSeconds: longest,
      responseShareOfTimeToHazard: toHazard === null || longest === null || toHazard === 0 ? null : longest / toHazard,
      highestPeakTrueC: check.highestPeakTrueC,
      smallestDynamicMarginC: check.smallestDynamicMarginC,
      staticPass: s.staticPass,
      dynamicPass: check.passes,
      pass,
      verdictUses: "dynamic peak",
      reason: reasonOf(s, check),
      noise: noiseFigures,
    };
    return setpoint;
  });
  return {
    setpoints,
    pass: setpoints.every((s) => s.pass),
    model: input.model,
    assumptions: [
      ...DYNAMICS_ASSUMPTIONS,
      "Slowest unit: trip at the high edge of the static worst-case band; nominal unit: the nominal trip.",
      "Verdict: the static band's low side against normal operation, the dynamic peak against the hazard limit.",
    ],
    responses,
  };
}

/** The slope of the signal at the comparator or ADC input, with where it comes from. */
export interface ChainSignalSlope {
  /** V/°C. */
  readonly voltsPerC: number;
  /** In words, e.g. "Seebeck coefficient of type N at 1250 °C (37.42 µV/°C) × gain 69". */
  readonly source: string;
}

/**
 * The nominal slope of a chain's signal at the comparator or ADC input at a hot-junction temperature: the Seebeck
 * coefficient there (ITS-90 reference function) times the amplifier's nominal gain (1 + Rf/Rg, or the fixed
 * gain; 1 without an amplifier), or a fixed-scale amplifier's stated mV/°C. It turns noise volts into °C.
 * @param chain - the thermocouple type and the amplifier element (if any).
 * @param temperatureC - hot-junction temperature, °C, within the type's range.
 * @returns the slope and its source.
 * @throws {@link HotjunctionRangeError} for a temperature outside the type's range.
 * @example
 * ```ts
 * import { chainSignalSlope } from "hotjunction";
 * const slope = chainSignalSlope({ type: "K", amplifier: { kind: "amplifier", gain: { setBy: "fixed", gain: 100 } } }, 25);
 * console.log((slope.voltsPerC * 1000).toFixed(3)); // "4.052"
 * ```
 */
export function chainSignalSlope(
  chain: { readonly type: ThermocoupleType; readonly amplifier?: AmplifierElement | FixedScaleAmplifierElement | undefined },
  temperatureC: number,
): ChainSignalSlope {
  _requireObject(chain, "chain", CONTEXT);
  const amplifier = chain.amplifier;
  if (amplifier !== undefined) {
    _requireObject(amplifier, "amplifier", CONTEXT);
    if (amplifier.kind !== "fixedScaleAmplifier") _requireObject(amplifier.gain, "amplifier gain (gain)", CONTEXT);
  }
  if (amplifier?.kind === "fixedScaleAmplifier") {
    const mv = _requirePositive(amplifier.millivoltsPerC, "fixed-scale amplifier scale (millivoltsPerC)", "mV/°C", CONTEXT);
    return { voltsPerC: mv / 1000, source: `fixed-scale amplifier, ${mv} mV/°C` };
  }
  const seebeckMicrovoltsPerC = seebeckCoefficient(chain.type, temperatureC);
  let gain = 1;
  if (amplifier !== undefined) {
    gain =
      amplifier.gain.setBy === "fixed"
        ? _requirePositive(amplifier.gain.gain, "amplifier gain (gain)", "V/V", CONTEXT)
        : 1 + _requirePositive(amplifier.gain.feedbackOhms, "feedback resistor (feedbackOhms)", "Ω", CONTEXT) / _requirePositive(amplifier.gain.groundOhms, "ground resistor (groundOhms)", "Ω", CONTEXT);
    _requireFiniteResult(gain * seebeckMicrovoltsPerC, "amplifier gain", gain, "V/V", CONTEXT);
  }
  return {
    voltsPerC: seebeckMicrovoltsPerC * 1e-6 * gain,
    source: `Seebeck coefficient of type ${chain.type} at ${temperatureC} °C (${seebeckMicrovoltsPerC.toFixed(2)} µV/°C) × gain ${+gain.toPrecision(6)}`,
  };
}
