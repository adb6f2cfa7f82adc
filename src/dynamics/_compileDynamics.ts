/**
 * Checks a response-time model and compiles it into numbers the integrator uses: the process, the list of
 * first-order lags from the load to the trip decision, the firmware sampling, and the total pure delay.
 * @internal
 * @module
 */
import { HotjunctionRangeError, HotjunctionTypeError, _invalidChoice, _requireFinite, _requireFiniteResult, _requireInRange } from "../errors.js";
import type { DigitalFilter, DynamicsModel, OutputStage, RunawayScenario, SignalPath } from "./types.js";

/** Fastest thermal rate of the heated process, 1/s (a time constant of 1 µs). */
const maxThermalRatePerSecond = 1e6;

const CONTEXT = "dynamics";

/** Compiled process: deviation form around the start temperature. @internal */
export type _CompiledProcess =
  | { readonly kind: "constantRate"; readonly rateCPerSecond: number }
  | {
      readonly kind: "heaterPower";
      readonly heaterWatts: number;
      readonly capacityJoulesPerK: number;
      readonly lossWattsPerK: number;
      readonly ambientC: number;
      readonly element: { readonly capacityJoulesPerK: number; readonly couplingWattsPerK: number } | null;
    };

/** Compiled firmware sampling. @internal */
export interface _CompiledFirmware {
  readonly samplePeriodSeconds: number;
  readonly filter: DigitalFilter | null;
  readonly debounceSamples: number;
}

/** A model in numbers. @internal */
export interface _CompiledDynamics {
  readonly process: _CompiledProcess;
  /** Sensor lags, s (zeros dropped), load side first. */
  readonly sensorTimeConstantsSeconds: readonly number[];
  /** Electronic lags before the comparator or ADC (input RC, amplifier), s (zeros dropped). */
  readonly electronicTimeConstantsSeconds: readonly number[];
  readonly firmware: _CompiledFirmware | null;
  /** Comparator delay (analog path), s. */
  readonly comparatorDelaySeconds: number;
  /** Sum of the output stages' delays (worst case), s. */
  readonly outputDelaySeconds: number;
}

/** Throws a type error unless `value` is a plain object. @internal */
export function _requireObject(value: unknown, quantity: string): Record<string, unknown> {
  if (typeof value !== "object" || value === null || Array.isArray(value)) {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity, value, context: CONTEXT, problem: "is not an object" });
  }
  return value as Record<string, unknown>;
}

function nonNegative(value: unknown, quantity: string, unit: string): number {
  return _requireInRange(value, quantity, 0, Number.MAX_VALUE, unit, CONTEXT);
}

function positive(value: unknown, quantity: string, unit: string): number {
  const x = _requireFinite(value, quantity, unit, CONTEXT);
  if (!(x > 0)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: x, min: Number.MIN_VALUE, max: Number.MAX_VALUE, unit, context: CONTEXT, problem: "is not above zero" });
  }
  return x;
}

function integerIn(value: unknown, quantity: string, min: number, max: number): number {
  const x = _requireInRange(value, quantity, min, max, undefined, CONTEXT);
  if (!Number.isInteger(x)) {
    throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: x, min, max, context: CONTEXT, problem: "is not an integer" });
  }
  return x;
}

function mains(value: unknown, quantity: string): 50 | 60 {
  if (value !== 50 && value !== 60) {
    throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity, value, unit: "Hz", allowed: ["50", "60"], context: CONTEXT, problem: "is not a mains frequency" });
  }
  return value;
}

/** Checks a scenario; returns it with numbers checked. @internal */
export function _checkScenario(scenario: RunawayScenario): RunawayScenario {
  const s = _requireObject(scenario, "runaway scenario");
  const startC = _requireFinite(s.startC, "start temperature (startC)", "°C", CONTEXT);
  const tripTemperatureC = _requireFinite(s.tripTemperatureC, "trip temperature (tripTemperatureC)", "°C", CONTEXT);
  const hazardLimitC = _requireFinite(s.hazardLimitC, "hazard limit (hazardLimitC)", "°C", CONTEXT);
  // Same error shape as other ordered-value checks (deliberate: trip above start, its own quantities).
  if (!(tripTemperatureC > startC)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "trip temperature (tripTemperatureC)",
      value: tripTemperatureC,
      min: startC,
      unit: "°C",
      context: CONTEXT,
      problem: "is not above the start temperature (it would trip in normal operation)",
    });
  }
  return { startC, tripTemperatureC, hazardLimitC };
}

/** A time constant that acts as a lag: above zero, and large enough that 1/τ is finite (below ~1e-308 s it is none). @internal */
export function _isLag(tau: number): boolean {
  return tau > 0 && Number.isFinite(1 / tau);
}

/** Time constant of an amplifier's first-order roll-off, τ = 1/(2πf), s. @internal */
export function _amplifierTimeConstantSeconds(bandwidthHz: unknown): number {
  const hz = positive(bandwidthHz, "amplifier bandwidth (amplifierBandwidthHz)", "Hz");
  return _requireFiniteResult(1 / (2 * Math.PI * hz), "amplifier bandwidth (amplifierBandwidthHz)", hz, "Hz");
}

function electronicLags(path: SignalPath | undefined): number[] {
  if (path === undefined) return [];
  const lags: number[] = [];
  if (path.inputFilter !== undefined) {
    const f = _requireObject(path.inputFilter, "input filter (inputFilter)");
    const r = nonNegative(f.resistanceOhms, "input filter resistance (resistanceOhms)", "Ω");
    const c = nonNegative(f.capacitanceFarads, "input filter capacitance (capacitanceFarads)", "F");
    lags.push(r * c);
  }
  if (path.amplifierBandwidthHz !== undefined) lags.push(_amplifierTimeConstantSeconds(path.amplifierBandwidthHz));
  return lags.filter(_isLag);
}

function outputDelay(stage: OutputStage, index: number): number {
  const s = _requireObject(stage, `output stage ${index}`);
  switch (s.kind) {
    case "relay":
      return nonNegative(s.releaseTimeSeconds, `output stage ${index} release time (releaseTimeSeconds)`, "s");
    case "solidStateRelay":
      return 1 / (2 * mains(s.mainsFrequencyHz, `output stage ${index} mains frequency (mainsFrequencyHz)`));
    case "deEnergiseDelay":
      return nonNegative(s.delaySeconds, `output stage ${index} delay (delaySeconds)`, "s");
    default:
      return _invalidChoice(`output stage ${index} kind`, s.kind, ["relay", "solidStateRelay", "deEnergiseDelay"], CONTEXT);
  }
}

function digitalFilter(value: unknown): DigitalFilter {
  const f = _requireObject(value, "digital filter (digitalFilter)");
  if (f.kind === "movingAverage") return { kind: "movingAverage", samples: integerIn(f.samples, "moving-average length (samples)", 1, 100_000) };
  if (f.kind === "firstOrderIir") {
    const a = _requireFinite(f.coefficient, "IIR coefficient (coefficient)", undefined, CONTEXT);
    if (!(a > 0 && a <= 1)) {
      throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "IIR coefficient (coefficient)", value: a, min: Number.MIN_VALUE, max: 1, context: CONTEXT, problem: "is not in (0, 1]" });
    }
    return { kind: "firstOrderIir", coefficient: a };
  }
  return _invalidChoice("digital filter kind", f.kind, ["movingAverage", "firstOrderIir"], CONTEXT);
}

/** Checks and compiles a model. @internal */
export function _compileDynamics(model: DynamicsModel): _CompiledDynamics {
  const m = _requireObject(model, "dynamics model");
  const r = _requireObject(m.runaway, "runaway");
  let process: _CompiledProcess;
  if (r.kind === "constantRate") {
    process = { kind: "constantRate", rateCPerSecond: positive(r.rateCPerSecond, "runaway rate (rateCPerSecond)", "°C/s") };
  } else if (r.kind === "heaterPower") {
    let element: { capacityJoulesPerK: number; couplingWattsPerK: number } | null = null;
    if (r.element !== undefined) {
      const e = _requireObject(r.element, "heater element (element)");
      element = {
        capacityJoulesPerK: positive(e.capacityJoulesPerK, "element capacity (capacityJoulesPerK)", "J/K"),
        couplingWattsPerK: positive(e.couplingWattsPerK, "element coupling (couplingWattsPerK)", "W/K"),
      };
    }
    process = {
      kind: "heaterPower",
      heaterWatts: positive(r.heaterWatts, "heater power (heaterWatts)", "W"),
      capacityJoulesPerK: positive(r.loadCapacityJoulesPerK, "load capacity (loadCapacityJoulesPerK)", "J/K"),
      lossWattsPerK: nonNegative(r.lossWattsPerK, "loss to ambient (lossWattsPerK)", "W/K"),
      ambientC: _requireFinite(r.ambientC, "ambient temperature (ambientC)", "°C", CONTEXT),
      element,
    };
    // A thermal time constant far below any real load's makes the system so stiff that its exact steps (matrix
    // exponentials of rate × step) lose every digit and the event search never settles: refused, not simulated.
    const rates: [string, number][] = [["loss to ambient / load capacity", process.lossWattsPerK / process.capacityJoulesPerK]];
    if (element !== null) {
      rates.push(["element coupling / element capacity", element.couplingWattsPerK / element.capacityJoulesPerK]);
      rates.push(["element coupling / load capacity", element.couplingWattsPerK / process.capacityJoulesPerK]);
    }
    for (const [quantity, rate] of rates) {
      if (!(rate <= maxThermalRatePerSecond)) {
        throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: rate, min: 0, max: maxThermalRatePerSecond, unit: "1/s", context: CONTEXT, problem: "is faster than any heated load (a thermal time constant below 1 µs)" });
      }
    }
  } else {
    return _invalidChoice("runaway kind", r.kind, ["constantRate", "heaterPower"], CONTEXT);
  }

  const sensorLags: number[] = [];
  if (m.sensor !== undefined) {
    const s = _requireObject(m.sensor, "sensor");
    if (s.kind === "firstOrder") sensorLags.push(nonNegative(s.timeConstantSeconds, "sensor time constant (timeConstantSeconds)", "s"));
    else if (s.kind === "responseTime") sensorLags.push(nonNegative(s.responseTime632Seconds, "sensor 63.2 % response time (responseTime632Seconds)", "s"));
    else if (s.kind === "twoLags") {
      sensorLags.push(nonNegative(s.wellTimeConstantSeconds, "thermowell time constant (wellTimeConstantSeconds)", "s"));
      sensorLags.push(nonNegative(s.probeTimeConstantSeconds, "probe time constant (probeTimeConstantSeconds)", "s"));
    } else _invalidChoice("sensor kind", s.kind, ["firstOrder", "responseTime", "twoLags"], CONTEXT);
  }

  let firmware: _CompiledFirmware | null = null;
  let comparatorDelaySeconds = 0;
  let path: SignalPath | undefined;
  if (m.signalPath !== undefined) {
    const p = _requireObject(m.signalPath, "signal path (signalPath)");
    if (p.kind === "analog") {
      path = p as unknown as SignalPath;
      if (p.comparatorDelaySeconds !== undefined) comparatorDelaySeconds = nonNegative(p.comparatorDelaySeconds, "comparator delay (comparatorDelaySeconds)", "s");
    } else if (p.kind === "firmware") {
      path = p as unknown as SignalPath;
      firmware = {
        samplePeriodSeconds: positive(p.samplePeriodSeconds, "sample period (samplePeriodSeconds)", "s"),
        filter: p.digitalFilter === undefined ? null : digitalFilter(p.digitalFilter),
        debounceSamples: p.debounceSamples === undefined ? 1 : integerIn(p.debounceSamples, "debounce (debounceSamples)", 1, 100_000),
      };
    } else _invalidChoice("signal path kind", p.kind, ["analog", "firmware"], CONTEXT);
  }

  let outputDelaySeconds = 0;
  if (m.outputStages !== undefined) {
    if (!Array.isArray(m.outputStages)) {
      throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "output stages (outputStages)", value: m.outputStages, context: CONTEXT, problem: "is not an array" });
    }
    (m.outputStages as OutputStage[]).forEach((stage, i) => {
      outputDelaySeconds += outputDelay(stage, i);
    });
  }

  return {
    process,
    sensorTimeConstantsSeconds: sensorLags.filter(_isLag),
    electronicTimeConstantsSeconds: electronicLags(path),
    firmware,
    comparatorDelaySeconds,
    outputDelaySeconds,
  };
}
