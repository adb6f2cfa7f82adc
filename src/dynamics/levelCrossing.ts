/**
 * Noise at the comparator or ADC input: Rice's level-crossing rate for Gaussian noise, the false-trip rate at the
 * highest normal operating temperature, the hysteresis that keeps the output from chattering, and mains pickup as a
 * deterministic peak.
 *
 * Spectrum assumed throughout: ideal low-pass band-limited white noise, one-sided density S0 flat from 0 to B and
 * zero above. Its spectral moments are m0 = S0·B = σ² and m2 = ∫(2πf)²·S0 df = (2π)²·S0·B³/3. Rice's formula for a
 * stationary zero-mean Gaussian process gives the expected rate of up-crossings of a level u as
 * ν⁺(u) = (1/2π)·√(m2/m0)·exp(−u²/(2σ²)) (S. O. Rice, "Mathematical analysis of random noise", Bell System
 * Technical Journal 23 (1944) and 24 (1945), section 3.3), which here is ν⁺(u) = (B/√3)·exp(−u²/(2σ²)). A real
 * single-pole filter has no finite m2 (its noise crosses infinitely often); for it, state the noise bandwidth of
 * the stage that limits the noise at the decision point.
 * @module
 */
import { HotjunctionRangeError, _requireFiniteResult, _requireInRange, _requireOptionsObject, _requireShape } from "../errors.js";
import { _compileDynamics, _requireObject } from "./_compileDynamics.js";
import type { DynamicsModel, NoiseSpec, WhiteNoiseDensity, WhiteNoiseRms } from "./types.js";

const CONTEXT = "dynamics";
const NONNEG = 1.7976931348623157e308; // Number.MAX_VALUE as a literal (no global read at module level)

/** Words on the spectrum and formula, for reports. */
export const NOISE_SPECTRUM_ASSUMPTION =
  "Gaussian noise with an ideal low-pass white spectrum (flat from 0 to the stated bandwidth B, none above); " +
  "up-crossing rate of a level u by Rice's formula (S. O. Rice 1944/1945): (B/√3)·exp(−u²/(2σ²))";

function positive(value: unknown, quantity: string, unit: string): number {
  const x = _requireInRange(value, quantity, 0, NONNEG, unit, CONTEXT);
  if (x === 0) throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: x, min: Number.MIN_VALUE, max: NONNEG, unit, context: CONTEXT, problem: "is not above zero" });
  return x;
}

/**
 * Rice's expected rate of up-crossings of a level by band-limited white Gaussian noise: (B/√3)·exp(−u²/(2σ²)).
 * @param options.levelVolts - level above the noise mean, V (any finite; the rate is even in u).
 * @param options.rmsVolts - σ, V; ≥ 0 (0: no crossings unless u = 0… which then counts as none).
 * @param options.bandwidthHz - B, Hz; > 0.
 * @returns up-crossings per second.
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for a value out of range or not finite.
 * @example
 * ```ts
 * import { riceUpCrossingRatePerSecond } from "hotjunction";
 * // zero crossings of 1 kHz band-limited noise: 1000/√3 per second
 * console.log(riceUpCrossingRatePerSecond({ levelVolts: 0, rmsVolts: 0.001, bandwidthHz: 1000 }).toFixed(2)); // "577.35"
 * ```
 */
export function riceUpCrossingRatePerSecond(options: { readonly levelVolts: number; readonly rmsVolts: number; readonly bandwidthHz: number }): number {
  _requireOptionsObject(options, CONTEXT, false);
  const u = _requireInRange(options.levelVolts, "level (levelVolts)", -NONNEG, NONNEG, "V", CONTEXT);
  const sigma = _requireInRange(options.rmsVolts, "noise rms (rmsVolts)", 0, NONNEG, "V", CONTEXT);
  const b = positive(options.bandwidthHz, "noise bandwidth (bandwidthHz)", "Hz");
  if (sigma === 0) return 0;
  const z = u / sigma; // ratio first: σ² can underflow where u/σ does not
  return (b / Math.sqrt(3)) * Math.exp(-0.5 * z * z);
}

/**
 * rms of white noise given by density (σ = density·√B) or by rms.
 * @param white - the noise as stated.
 * @returns σ, V.
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for a value out of range or not finite.
 * @example
 * ```ts
 * import { whiteNoiseRmsVolts } from "hotjunction";
 * console.log(whiteNoiseRmsVolts({ kind: "density", densityVoltsPerRootHertz: 1e-6, bandwidthHz: 100 }).toExponential(3)); // "1.000e-5"
 * ```
 */
export function whiteNoiseRmsVolts(white: WhiteNoiseDensity | WhiteNoiseRms): number {
  const w = _requireObject(white, "white noise (white)");
  positive(w.bandwidthHz, "noise bandwidth (bandwidthHz)", "Hz");
  if (w.kind === "density") {
    const density = _requireInRange(w.densityVoltsPerRootHertz, "noise density (densityVoltsPerRootHertz)", 0, NONNEG, "V/√Hz", CONTEXT);
    return _requireFiniteResult(density * Math.sqrt(w.bandwidthHz as number), "noise density (densityVoltsPerRootHertz)", density, "V/√Hz", CONTEXT);
  }
  if (w.kind === "rms") return _requireInRange(w.rmsVolts, "noise rms (rmsVolts)", 0, NONNEG, "V", CONTEXT);
  throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: "white noise kind", value: w.kind, allowed: ["density", "rms"], context: CONTEXT, problem: "is not a valid choice" });
}

/**
 * Peak of mains pickup after first-order lags: A·Π 1/√(1 + (2πf·τᵢ)²) (magnitude of 1/(τs + 1) at s = j2πf).
 * @param options.amplitudeVolts - peak before the lags, V; ≥ 0.
 * @param options.frequencyHz - mains frequency, Hz; > 0.
 * @param options.timeConstantsSeconds - the lags it passes, s; each ≥ 0.
 * @returns the peak at the decision point, V.
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for a value out of range or not finite.
 * @example
 * ```ts
 * import { mainsPickupPeakVolts } from "hotjunction";
 * // 10 mV through a 10 kΩ / 10 µF filter (τ = 0.1 s) at 50 Hz
 * console.log(mainsPickupPeakVolts({ amplitudeVolts: 0.01, frequencyHz: 50, timeConstantsSeconds: [0.1] }).toExponential(4)); // "3.1815e-4"
 * ```
 */
export function mainsPickupPeakVolts(options: { readonly amplitudeVolts: number; readonly frequencyHz: number; readonly timeConstantsSeconds: readonly number[] }): number {
  _requireOptionsObject(options, CONTEXT, false);
  const a = _requireInRange(options.amplitudeVolts, "mains pickup amplitude (amplitudeVolts)", 0, NONNEG, "V", CONTEXT);
  const f = positive(options.frequencyHz, "mains frequency (frequencyHz)", "Hz");
  _requireShape(options.timeConstantsSeconds, ["array", "any"], "time constants (timeConstantsSeconds)", CONTEXT);
  let gain = 1;
  // an index loop, not forEach: a hole in the array is refused, not skipped
  for (let i = 0; i < options.timeConstantsSeconds.length; i++) {
    const t = _requireInRange(options.timeConstantsSeconds[i], `time constant ${i} (timeConstantsSeconds)`, 0, NONNEG, "s", CONTEXT);
    const w = 2 * Math.PI * f * t;
    gain /= Math.sqrt(1 + w * w); // w² = Infinity gives the limit 0
  }
  return a * gain;
}

/** Inputs of {@link chatterRatePerHour}. */
export interface ChatterRateOptions {
  /** Hysteresis at the decision point, V; ≥ 0. */
  readonly hysteresisVolts: number;
  /** Noise σ, V; ≥ 0. */
  readonly rmsVolts: number;
  /** Noise bandwidth B, Hz; > 0. */
  readonly bandwidthHz: number;
  /** Deterministic mains peak at the decision point, V; ≥ 0; default 0. */
  readonly mainsPeakVolts?: number;
  /** Mains frequency, Hz (used when the pickup alone spans the hysteresis); default 50. */
  readonly mainsFrequencyHz?: number;
}

/**
 * Rate of output re-crossings (chatter) with the signal sitting at the trip threshold: the output, once tripped,
 * releases when noise plus the mains peak reach the hysteresis below; by Rice's formula (see module notes) the rate
 * is (B/√3)·exp(−(H − Am)²/(2σ²)) for H > Am. When the mains peak Am alone spans the hysteresis (H ≤ Am, Am > 0)
 * the output chatters every mains cycle: the rate is then the larger of the mains frequency and B/√3. Never rises
 * as H grows (property tested).
 * @returns re-crossings per hour.
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for a value out of range or not finite.
 * @example
 * ```ts
 * import { chatterRatePerHour } from "hotjunction";
 * console.log(chatterRatePerHour({ hysteresisVolts: 0.006, rmsVolts: 0.001, bandwidthHz: 1000 }).toExponential(3)); // "3.165e-2"
 * ```
 */
export function chatterRatePerHour(options: ChatterRateOptions): number {
  _requireOptionsObject(options, CONTEXT, false);
  const h = _requireInRange(options.hysteresisVolts, "hysteresis (hysteresisVolts)", 0, NONNEG, "V", CONTEXT);
  const sigma = _requireInRange(options.rmsVolts, "noise rms (rmsVolts)", 0, NONNEG, "V", CONTEXT);
  const b = positive(options.bandwidthHz, "noise bandwidth (bandwidthHz)", "Hz");
  const am = options.mainsPeakVolts === undefined ? 0 : _requireInRange(options.mainsPeakVolts, "mains peak (mainsPeakVolts)", 0, NONNEG, "V", CONTEXT);
  const fm = options.mainsFrequencyHz === undefined ? 50 : positive(options.mainsFrequencyHz, "mains frequency (mainsFrequencyHz)", "Hz");
  if (am > 0 && h <= am) return 3600 * Math.max(fm, sigma > 0 ? b / Math.sqrt(3) : 0);
  return 3600 * riceUpCrossingRatePerSecond({ levelVolts: h - am, rmsVolts: sigma, bandwidthHz: b });
}

/**
 * Smallest hysteresis that keeps chatter at or below a target rate: H = Am + σ·√(2·ln(B/(√3·ν))) when B/√3 > ν,
 * else Am (the inverse of {@link chatterRatePerHour}; with Am > 0 take any H strictly above the value returned).
 * @param options.rmsVolts - σ, V; ≥ 0.
 * @param options.bandwidthHz - B, Hz; > 0.
 * @param options.targetPerHour - ν, re-crossings per hour; > 0.
 * @param options.mainsPeakVolts - deterministic mains peak, V; ≥ 0; default 0.
 * @returns H, V.
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for a value out of range or not finite.
 * @example
 * ```ts
 * import { hysteresisForChatterVolts } from "hotjunction";
 * console.log(hysteresisForChatterVolts({ rmsVolts: 0.001, bandwidthHz: 1000, targetPerHour: 1 }).toFixed(5)); // "0.00539"
 * ```
 */
export function hysteresisForChatterVolts(options: { readonly rmsVolts: number; readonly bandwidthHz: number; readonly targetPerHour: number; readonly mainsPeakVolts?: number }): number {
  _requireOptionsObject(options, CONTEXT, false);
  const sigma = _requireInRange(options.rmsVolts, "noise rms (rmsVolts)", 0, NONNEG, "V", CONTEXT);
  const b = positive(options.bandwidthHz, "noise bandwidth (bandwidthHz)", "Hz");
  const target = positive(options.targetPerHour, "chatter target (targetPerHour)", "1/h") / 3600;
  const am = options.mainsPeakVolts === undefined ? 0 : _requireInRange(options.mainsPeakVolts, "mains peak (mainsPeakVolts)", 0, NONNEG, "V", CONTEXT);
  const zeroRate = b / Math.sqrt(3);
  if (!(zeroRate > target)) return am;
  const ratio = zeroRate / target;
  // a ratio beyond float64 (a subnormal target, a bandwidth near 1e308): its logarithm from the logarithms
  const lnRatio = Number.isFinite(ratio) ? Math.log(ratio) : Math.log(zeroRate) - Math.log(options.targetPerHour) + Math.log(3600);
  return _requireFiniteResult(am + sigma * Math.sqrt(2 * lnRatio), "noise rms (rmsVolts)", sigma, "V", CONTEXT);
}

/** Noise figures of a trip channel. */
export interface TripNoiseFigures {
  /** Words on the spectrum shape and formula used. */
  readonly spectrumAssumption: string;
  /** Noise σ at the decision point, V (0 without white noise). */
  readonly rmsVolts: number;
  /** Noise σ in °C (σ / sensitivity). */
  readonly rmsC: number;
  /** Bandwidth assumed, Hz; null without white noise. */
  readonly bandwidthHz: number | null;
  /** Mains pickup peak after the analog lags (input filter, amplifier), V. */
  readonly mainsPeakVolts: number;
  /** The same in °C. */
  readonly mainsPeakC: number;
  /** Distance from the signal at the highest normal operating temperature to the band's low edge, less the mains peak, V. */
  readonly falseTripDistanceVolts: number;
  /** Expected false trips per hour at the highest normal operating temperature; null when the mains peak alone reaches the edge. */
  readonly falseTripsPerHour: number | null;
  /** Whether the mains peak alone reaches the band's low edge (a false trip every cycle). */
  readonly deterministicFalseTrip: boolean;
  /** Chatter target, re-crossings per hour. */
  readonly chatterTargetPerHour: number;
  /** Hysteresis needed at the decision point for the chatter target, V. */
  readonly hysteresisNeededVolts: number;
  /** The same in °C. */
  readonly hysteresisNeededC: number;
}

/**
 * Noise figures of a trip channel: σ, mains peak after the analog lags, the false-trip rate at the highest normal
 * operating temperature (Rice, distance to the band's low edge less the mains peak; a firmware debounce is not
 * credited, which can only overstate the rate), and the hysteresis for the chatter target. The model's sensor
 * lag is not applied to pickup (it enters at the wiring); a firmware digital filter is not credited either.
 * @param model - a model with `noise` stated.
 * @param options.maxNormalOperatingC - highest normal operating temperature, °C.
 * @param options.bandLowEdgeC - low edge of the static trip band (the earliest-tripping unit), °C; > maxNormalOperatingC.
 * @returns the figures.
 * @throws {@link HotjunctionRangeError} / {@link HotjunctionTypeError} for a missing noise spec or a value out of range.
 * @example
 * ```ts
 * import { tripNoiseFigures } from "hotjunction";
 * const f = tripNoiseFigures(
 *   { runaway: { kind: "constantRate", rateCPerSecond: 1 },
 *     noise: { sensitivityVoltsPerC: 0.002, white: { kind: "rms", rmsVolts: 0.002, bandwidthHz: 1000 }, chatterTargetPerHour: 1 } },
 *   { maxNormalOperatingC: 960, bandLowEdgeC: 990 },
 * );
 * console.log(f.falseTripsPerHour?.toExponential(2), f.hysteresisNeededC.toFixed(2)); // "7.68e-190" "5.39"
 * ```
 */
export function tripNoiseFigures(model: DynamicsModel, options: { readonly maxNormalOperatingC: number; readonly bandLowEdgeC: number }): TripNoiseFigures {
  const compiled = _compileDynamics(model);
  _requireOptionsObject(options, CONTEXT, false);
  const noise = _requireObject(model.noise, "noise") as unknown as NoiseSpec;
  const s = positive(noise.sensitivityVoltsPerC, "sensitivity (sensitivityVoltsPerC)", "V/°C");
  const target = positive(noise.chatterTargetPerHour, "chatter target (chatterTargetPerHour)", "1/h");
  const normal = _requireInRange(options.maxNormalOperatingC, "highest normal operating temperature (maxNormalOperatingC)", -NONNEG, NONNEG, "°C", CONTEXT);
  const low = _requireInRange(options.bandLowEdgeC, "band low edge (bandLowEdgeC)", normal, NONNEG, "°C", CONTEXT);
  const sigma = noise.white === undefined ? 0 : whiteNoiseRmsVolts(noise.white);
  const bandwidth = noise.white === undefined ? null : noise.white.bandwidthHz;
  let mainsPeak = 0;
  let mainsHz = 50;
  if (noise.mainsPickup !== undefined) {
    const mp = _requireObject(noise.mainsPickup, "mains pickup (mainsPickup)");
    if (mp.frequencyHz !== 50 && mp.frequencyHz !== 60) {
      throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: "mains frequency (frequencyHz)", value: mp.frequencyHz, unit: "Hz", allowed: ["50", "60"], context: CONTEXT, problem: "is not a mains frequency" });
    }
    mainsHz = mp.frequencyHz;
    mainsPeak = mainsPickupPeakVolts({ amplitudeVolts: mp.amplitudeVolts as number, frequencyHz: mainsHz, timeConstantsSeconds: compiled.electronicTimeConstantsSeconds });
  }
  const distance = (low - normal) * s - mainsPeak;
  const deterministic = distance <= 0;
  const b = bandwidth ?? 1;
  const falseTrips = deterministic ? null : _requireFiniteResult(3600 * riceUpCrossingRatePerSecond({ levelVolts: distance, rmsVolts: sigma, bandwidthHz: b }), "noise bandwidth (bandwidthHz)", b, "Hz", CONTEXT);
  // a figure in °C is a figure in V over the sensitivity: a subnormal sensitivity overflows it
  const inC = (volts: number): number => _requireFiniteResult(volts / s, "sensitivity (sensitivityVoltsPerC)", s, "V/°C", CONTEXT);
  const hyst = sigma === 0 ? mainsPeak : hysteresisForChatterVolts({ rmsVolts: sigma, bandwidthHz: b, targetPerHour: target, mainsPeakVolts: mainsPeak });
  return {
    spectrumAssumption: NOISE_SPECTRUM_ASSUMPTION,
    rmsVolts: sigma,
    rmsC: inC(sigma),
    bandwidthHz: bandwidth,
    mainsPeakVolts: mainsPeak,
    mainsPeakC: inC(mainsPeak),
    falseTripDistanceVolts: distance,
    falseTripsPerHour: falseTrips,
    deterministicFalseTrip: deterministic,
    chatterTargetPerHour: target,
    hysteresisNeededVolts: hyst,
    hysteresisNeededC: inC(hyst),
  };
}
