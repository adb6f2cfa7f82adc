/**
 * Closed forms and exact evaluations of lags: a ramp through first-order lags, the delay of a sampled filter on a
 * ramp, the first-order heated process. Usable alone; the simulation uses the same models.
 * @module
 */
import { _invalidChoice, _requireFinite, _requireFiniteResult, _requireInRange, _requireOptionsObject } from "../errors.js";
import { _amplifierTimeConstantSeconds, _compileDynamics, _isLag } from "./_compileDynamics.js";
import { _buildLinearSystem, _propagator, _step } from "./_linearSystem.js";
import type { DigitalFilter, HeaterPowerRunaway } from "./types.js";

const CONTEXT = "dynamics";

/** The sample period and filter checked as the dynamics check checks them (a firmware-only signal path). */
function checkedSamplePeriod(samplePeriodSeconds: number, digitalFilter: DigitalFilter): number {
  const compiled = _compileDynamics({
    runaway: { kind: "constantRate", rateCPerSecond: 1 },
    signalPath: { kind: "firmware", samplePeriodSeconds, digitalFilter },
  });
  return (compiled.firmware as NonNullable<typeof compiled.firmware>).samplePeriodSeconds;
}

/**
 * Lag of a first-order stage behind a ramp that starts at t = 0 from steady state: R·τ·(1 − e^(−t/τ)), tending to
 * R·τ (textbook control theory: ramp response of 1/(τs + 1)).
 * @param options.rateCPerSecond - ramp rate R, °C/s (any finite).
 * @param options.timeConstantSeconds - τ, s; ≥ 0.
 * @param options.timeSeconds - time since the ramp began, s; ≥ 0.
 * @returns the lag, °C (input minus output).
 * @throws {@link HotjunctionTypeError} / {@link HotjunctionRangeError} for a non-finite or out-of-range value.
 * @example
 * ```ts
 * import { firstOrderRampLagC } from "hotjunction";
 * console.log(firstOrderRampLagC({ rateCPerSecond: 2, timeConstantSeconds: 10, timeSeconds: 10 }).toFixed(3)); // "12.642"
 * ```
 */
export function firstOrderRampLagC(options: { readonly rateCPerSecond: number; readonly timeConstantSeconds: number; readonly timeSeconds: number }): number {
  _requireOptionsObject(options, CONTEXT, false);
  const rate = _requireFinite(options.rateCPerSecond, "ramp rate (rateCPerSecond)", "°C/s", CONTEXT);
  const tau = _requireInRange(options.timeConstantSeconds, "time constant (timeConstantSeconds)", 0, Number.MAX_VALUE, "s", CONTEXT);
  const t = _requireInRange(options.timeSeconds, "time (timeSeconds)", 0, Number.MAX_VALUE, "s", CONTEXT);
  if (tau === 0) return 0;
  const lag = rate * tau * -Math.expm1(-t / tau); // t/τ = Infinity for a subnormal τ gives the limit 0 correctly
  // rate × τ can overflow where the lag (at most rate × t) does not: then τ·(1 − e^(−t/τ)) first
  return Number.isFinite(lag) ? lag : _requireFiniteResult(rate * (tau * -Math.expm1(-t / tau)), "ramp rate (rateCPerSecond)", rate, "°C/s", CONTEXT);
}

/**
 * Lag of a cascade of first-order stages behind a ramp that starts at t = 0 from steady state, evaluated exactly
 * (matrix exponential of the cascade); it tends to R·(τ1 + τ2 + …) (textbook control theory: the steady-state ramp
 * error of a unity-gain system is R times the sum of its time constants).
 * @param options.rateCPerSecond - ramp rate R, °C/s; > 0.
 * @param options.timeConstantsSeconds - the stages' τ, s; each ≥ 0.
 * @param options.timeSeconds - time since the ramp began, s; ≥ 0.
 * @returns the lag of the last stage's output behind the ramp, °C.
 * @throws {@link HotjunctionTypeError} / {@link HotjunctionRangeError} for a non-finite or out-of-range value.
 * @example
 * ```ts
 * import { rampLagThroughLagsC } from "hotjunction";
 * const lag = rampLagThroughLagsC({ rateCPerSecond: 1, timeConstantsSeconds: [20, 5], timeSeconds: 400 });
 * console.log(lag.toFixed(6)); // "25.000000"
 * ```
 */
export function rampLagThroughLagsC(options: { readonly rateCPerSecond: number; readonly timeConstantsSeconds: readonly number[]; readonly timeSeconds: number }): number {
  _requireOptionsObject(options, CONTEXT, false);
  const t = _requireInRange(options.timeSeconds, "time (timeSeconds)", 0, Number.MAX_VALUE, "s", CONTEXT);
  const taus = Array.isArray(options.timeConstantsSeconds) ? options.timeConstantsSeconds : _requireFinite(options.timeConstantsSeconds, "time constants (timeConstantsSeconds)", "s", CONTEXT);
  _requireInRange((taus as readonly number[]).length, "number of time constants (timeConstantsSeconds)", 0, 64, undefined, CONTEXT);
  const compiled = _compileDynamics({
    runaway: { kind: "constantRate", rateCPerSecond: options.rateCPerSecond },
    sensor: { kind: "firstOrder", timeConstantSeconds: 0 },
  });
  (taus as readonly number[]).forEach((tau, i) => _requireInRange(tau, `time constant ${i} (timeConstantsSeconds)`, 0, Number.MAX_VALUE, "s", CONTEXT));
  const lags = (taus as readonly number[]).filter(_isLag);
  const system = _buildLinearSystem({ ...compiled, sensorTimeConstantsSeconds: lags }, 0);
  const out = new Float64Array(system.n);
  // The transient of n stages is at most that of n equal stages of the longest τ: R·τ·Σ_{k<n} (n − k)·Poisson(k; t/τ),
  // below 1e-40 of the lag once t/τ ≥ 200 + 4n. There the lag is the steady state to the last bit, and a longer step
  // only loses digits in the exponential (1e308 s gave 3.6e293 °C).
  const settled = (200 + 4 * lags.length) * Math.max(0, ...lags);
  _step(_propagator(system, Math.min(t, settled)), system.n, system.x0, 1, out);
  return _requireFiniteResult((out[system.trueIndex] as number) - (out[system.indicatedIndex] as number), "time (timeSeconds)", t, "s", CONTEXT);
}

/**
 * Delay of a moving average of N samples on a ramp: (N − 1)·Ts/2 (the mean of the last N sample times lies
 * (N − 1)/2 periods behind the newest; textbook digital signal processing, group delay of a length-N boxcar).
 * @param options.samples - N, integer 1 … 100000.
 * @param options.samplePeriodSeconds - Ts, s; > 0.
 * @returns the delay, s.
 * @throws {@link HotjunctionRangeError} for a value out of range.
 * @example
 * ```ts
 * import { movingAverageRampDelaySeconds } from "hotjunction";
 * console.log(movingAverageRampDelaySeconds({ samples: 8, samplePeriodSeconds: 0.1 })); // 0.35000000000000003
 * ```
 */
export function movingAverageRampDelaySeconds(options: { readonly samples: number; readonly samplePeriodSeconds: number }): number {
  _requireOptionsObject(options, CONTEXT, false);
  const samplePeriodSeconds = checkedSamplePeriod(options.samplePeriodSeconds, { kind: "movingAverage", samples: options.samples });
  return _requireFiniteResult(((options.samples - 1) * samplePeriodSeconds) / 2, "sample period (samplePeriodSeconds)", samplePeriodSeconds, "s", CONTEXT);
}

/**
 * Delay of a first-order IIR filter y[n] = y[n−1] + a·(x[n] − y[n−1]) on a ramp at steady state: Ts·(1 − a)/a
 * (from the steady state of the error recursion e[n] = (1 − a)·(e[n−1] + R·Ts); textbook digital signal processing).
 * @param options.coefficient - a, 0 < a ≤ 1.
 * @param options.samplePeriodSeconds - Ts, s; > 0.
 * @returns the delay, s.
 * @throws {@link HotjunctionRangeError} for a value out of range.
 * @example
 * ```ts
 * import { iirRampDelaySeconds } from "hotjunction";
 * console.log(iirRampDelaySeconds({ coefficient: 0.25, samplePeriodSeconds: 0.1 }).toFixed(3)); // "0.300"
 * ```
 */
export function iirRampDelaySeconds(options: { readonly coefficient: number; readonly samplePeriodSeconds: number }): number {
  _requireOptionsObject(options, CONTEXT, false);
  const samplePeriodSeconds = checkedSamplePeriod(options.samplePeriodSeconds, { kind: "firstOrderIir", coefficient: options.coefficient });
  return _requireFiniteResult((samplePeriodSeconds * (1 - options.coefficient)) / options.coefficient, "filter coefficient (coefficient)", options.coefficient, undefined, CONTEXT);
}

/**
 * Time constant of an amplifier's first-order roll-off from its −3 dB bandwidth: τ = 1/(2πf).
 * @param bandwidthHz - f, Hz; > 0.
 * @returns τ, s.
 * @throws {@link HotjunctionRangeError} for f ≤ 0.
 * @example
 * ```ts
 * import { amplifierTimeConstantSeconds } from "hotjunction";
 * console.log(amplifierTimeConstantSeconds(1000).toExponential(4)); // "1.5915e-4"
 * ```
 */
export function amplifierTimeConstantSeconds(bandwidthHz: number): number {
  return _amplifierTimeConstantSeconds(bandwidthHz);
}

/**
 * Equilibrium and time constant of a first-order heated load (no element node): Ta + P/G and C/G (energy balance
 * C·dT/dt = P − G·(T − Ta); textbook heat transfer, lumped capacitance).
 * @param runaway - the heater-power runaway (its `element` is ignored here; G > 0 required).
 * @returns `{ equilibriumC, timeConstantSeconds }`.
 * @throws {@link HotjunctionRangeError} for G = 0 (no equilibrium) or another value out of range.
 * @example
 * ```ts
 * import { heatedLoadEquilibrium } from "hotjunction";
 * const e = heatedLoadEquilibrium({ kind: "heaterPower", heaterWatts: 2000, loadCapacityJoulesPerK: 40000, lossWattsPerK: 5, ambientC: 25 });
 * console.log(e.equilibriumC, e.timeConstantSeconds); // 425 8000
 * ```
 */
export function heatedLoadEquilibrium(runaway: HeaterPowerRunaway): { readonly equilibriumC: number; readonly timeConstantSeconds: number } {
  const compiled = _compileDynamics({ runaway });
  const p = compiled.process;
  if (p.kind !== "heaterPower") return _invalidChoice("runaway kind", p.kind, ["heaterPower"], CONTEXT);
  const g = _requireInRange(p.lossWattsPerK, "loss to ambient (lossWattsPerK)", Number.MIN_VALUE, Number.MAX_VALUE, "W/K", CONTEXT);
  return {
    equilibriumC: _requireFiniteResult(p.ambientC + p.heaterWatts / g, "loss to ambient (lossWattsPerK)", g, "W/K", CONTEXT),
    timeConstantSeconds: _requireFiniteResult(p.capacityJoulesPerK / g, "loss to ambient (lossWattsPerK)", g, "W/K", CONTEXT),
  };
}
