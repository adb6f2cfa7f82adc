/**
 * The runaway, sensor and electronics as one linear state-space system x' = A·x + B·u in deviations from the start
 * temperature (°C), with the input u = [heater on (1 or 0), 1 (constant terms: ambient loss)].
 *
 * Exact discretisation: over a step h with u held constant (zero-order hold; the heater switch is the only input
 * and it changes once), x(t+h) = Φ(h)·x(t) + Γ(h)·u with Φ = e^{Ah}, Γ = ∫₀ʰ e^{As} ds·B, both read from one
 * matrix exponential of the augmented matrix [[A, B], [0, 0]]·h (Van Loan, "Computing integrals involving the
 * matrix exponential", IEEE Trans. Autom. Control 23, 1978). The exponential is by scaling and squaring with a
 * Taylor series on the scaled matrix (norm ≤ 1/2, 16 terms: truncation below 2e-19 relative). For the cascade of unity-gain
 * lags, e^{At} of the lag rows is a nonnegative matrix with unit row sums, so squaring does not amplify rounding.
 * @internal
 * @module
 */
import { HotjunctionRangeError } from "../errors.js";
import type { _CompiledDynamics } from "./_compileDynamics.js";

/** The system matrices and where the signals sit in the state. @internal */
export interface _LinearSystem {
  readonly n: number;
  /** Row-major n×n. */
  readonly a: Float64Array;
  /** Row-major n×2. */
  readonly b: Float64Array;
  /** State at t = 0 (steady state at the start temperature, heater just stuck on). */
  readonly x0: Float64Array;
  /** Index of the load's true temperature. */
  readonly trueIndex: number;
  /** Index of the signal at the comparator or ADC input (after every lag). */
  readonly indicatedIndex: number;
  /** Index of the element node, or −1. */
  readonly elementIndex: number;
}

/** A step propagator Φ(h), Γ(h). @internal */
export interface _Propagator {
  readonly stepSeconds: number;
  readonly phi: Float64Array;
  readonly gamma: Float64Array;
}

/** Builds the state-space system of a compiled model for a start temperature. @internal */
export function _buildLinearSystem(model: _CompiledDynamics, startC: number): _LinearSystem {
  const p = model.process;
  const hasElement = p.kind === "heaterPower" && p.element !== null;
  const lags = [...model.sensorTimeConstantsSeconds, ...model.electronicTimeConstantsSeconds];
  const n = (hasElement ? 2 : 1) + lags.length;
  const a = new Float64Array(n * n);
  const b = new Float64Array(n * 2);
  const x0 = new Float64Array(n);
  const elementIndex = hasElement ? 0 : -1;
  const trueIndex = hasElement ? 1 : 0;
  if (p.kind === "constantRate") {
    b[trueIndex * 2] = p.rateCPerSecond;
  } else {
    const c = p.capacityJoulesPerK;
    const g = p.lossWattsPerK;
    const holdingLoss = g * (startC - p.ambientC);
    b[trueIndex * 2 + 1] = -holdingLoss / c;
    if (p.element === null) {
      a[trueIndex * n + trueIndex] = -g / c;
      b[trueIndex * 2] = p.heaterWatts / c;
    } else {
      const ce = p.element.capacityJoulesPerK;
      const k = p.element.couplingWattsPerK;
      a[elementIndex * n + elementIndex] = -k / ce;
      a[elementIndex * n + trueIndex] = k / ce;
      b[elementIndex * 2] = p.heaterWatts / ce;
      a[trueIndex * n + trueIndex] = -(k + g) / c;
      a[trueIndex * n + elementIndex] = k / c;
      // Before the runaway the element carries the holding power into the load: Te − T = G·(T0 − Ta)/K.
      x0[elementIndex] = holdingLoss / k;
    }
  }
  lags.forEach((tau, i) => {
    const row = trueIndex + 1 + i;
    a[row * n + row] = -1 / tau;
    a[row * n + row - 1] = 1 / tau;
  });
  return { n, a, b, x0, trueIndex, indicatedIndex: trueIndex + lags.length, elementIndex };
}

/** Most squarings of one matrix exponential: a norm up to the float64 maximum needs 1,025. */
const maxSquarings = 1100;

/** e^{M} of a row-major m×m matrix by scaling and squaring with a Taylor series. @internal */
export function _expm(matrix: Float64Array, m: number): Float64Array {
  let norm = 0;
  for (let i = 0; i < m; i++) {
    let row = 0;
    for (let j = 0; j < m; j++) row += Math.abs(matrix[i * m + j] as number);
    norm = Math.max(norm, row);
  }
  if (!Number.isFinite(norm)) {
    // NaN comes from an infinite step times a zero rate: the same overflow
    // a time step so long (or rates so large) that rate × step overflows: squaring would never end
    throw new HotjunctionRangeError({ code: "OVERFLOW", quantity: "time step × system rate (matrix norm)", value: Number.isNaN(norm) ? Number.POSITIVE_INFINITY : norm, context: "dynamics", problem: "is beyond the float64 range; give a shorter time" });
  }
  // log2(norm / 0.5) written as log2(norm) + 1: norm / 0.5 overflows to Infinity above 9e307, and an infinite
  // count of squarings never ended (the hang of rampLagThroughLagsC at 1e308 s)
  const squarings = norm > 0.5 ? Math.ceil(Math.log2(norm) + 1) : 0;
  if (!(squarings <= maxSquarings)) {
    throw new HotjunctionRangeError({ code: "OVERFLOW", quantity: "matrix exponential squarings", value: squarings, min: 0, max: maxSquarings, context: "dynamics", problem: "exceed the limit; give a shorter time" });
  }
  const scale = 2 ** -squarings;
  const x = new Float64Array(m * m);
  for (let i = 0; i < m * m; i++) x[i] = (matrix[i] as number) * scale;
  let result = new Float64Array(m * m);
  let term = new Float64Array(m * m);
  let next = new Float64Array(m * m);
  for (let i = 0; i < m; i++) {
    result[i * m + i] = 1;
    term[i * m + i] = 1;
  }
  for (let k = 1; k <= 16; k++) {
    multiply(term, x, next, m);
    for (let i = 0; i < m * m; i++) {
      const v = (next[i] as number) / k;
      next[i] = v;
      result[i] = (result[i] as number) + v;
    }
    [term, next] = [next, term];
  }
  for (let s = 0; s < squarings; s++) {
    multiply(result, result, next, m);
    [result, next] = [next, result];
  }
  return result;
}

function multiply(left: Float64Array, right: Float64Array, out: Float64Array, m: number): void {
  for (let i = 0; i < m; i++) {
    for (let j = 0; j < m; j++) {
      let sum = 0;
      for (let k = 0; k < m; k++) sum += (left[i * m + k] as number) * (right[k * m + j] as number);
      out[i * m + j] = sum;
    }
  }
}

/** Φ(h) and Γ(h) of a system for a step h ≥ 0. @internal */
export function _propagator(system: _LinearSystem, stepSeconds: number): _Propagator {
  const { n, a, b } = system;
  const m = n + 2;
  const aug = new Float64Array(m * m);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) aug[i * m + j] = (a[i * n + j] as number) * stepSeconds;
    aug[i * m + n] = (b[i * 2] as number) * stepSeconds;
    aug[i * m + n + 1] = (b[i * 2 + 1] as number) * stepSeconds;
  }
  const e = _expm(aug, m);
  const phi = new Float64Array(n * n);
  const gamma = new Float64Array(n * 2);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) phi[i * n + j] = e[i * m + j] as number;
    gamma[i * 2] = e[i * m + n] as number;
    gamma[i * 2 + 1] = e[i * m + n + 1] as number;
  }
  return { stepSeconds, phi, gamma };
}

/** out = Φ·x + Γ·[heaterOn, 1]; `out` must not be `x`. @internal */
export function _step(prop: _Propagator, n: number, x: Float64Array, heaterOn: number, out: Float64Array): void {
  const { phi, gamma } = prop;
  for (let i = 0; i < n; i++) {
    let sum = (gamma[i * 2] as number) * heaterOn + (gamma[i * 2 + 1] as number);
    for (let j = 0; j < n; j++) sum += (phi[i * n + j] as number) * (x[j] as number);
    out[i] = sum;
  }
}

/** Time derivative of state component `index`: (A·x + B·u)[index]. @internal */
export function _derivative(system: _LinearSystem, x: Float64Array, heaterOn: number, index: number): number {
  const { n, a, b } = system;
  let sum = (b[index * 2] as number) * heaterOn + (b[index * 2 + 1] as number);
  for (let j = 0; j < n; j++) sum += (a[index * n + j] as number) * (x[j] as number);
  return sum;
}

/**
 * Finds δ in [0, h] where `value(x(δ))` reaches zero from below, given it is below zero at 0 and not below at h:
 * regula falsi with the Illinois modification on the exact propagation (superlinear, the bracket is kept), until
 * the value at the upper end is within 1e-13 of the bracket's initial spread or the bracket is a few ulps wide.
 * Returns δ at the upper end of the final bracket (the value there is ≥ 0) and the state there.
 * @internal
 */
export function _locate(
  system: _LinearSystem,
  x: Float64Array,
  heaterOn: number,
  stepSeconds: number,
  value: (state: Float64Array) => number,
): { readonly deltaSeconds: number; readonly state: Float64Array } {
  let lo = 0;
  let hi = stepSeconds;
  let hiState = new Float64Array(system.n);
  _step(_propagator(system, hi), system.n, x, heaterOn, hiState);
  let fLo = value(x);
  let fHi = value(hiState);
  let fHiValue = fHi;
  const tolerance = 1e-13 * Math.max(Math.abs(fLo), Math.abs(fHi));
  const trial = new Float64Array(system.n);
  let side = 0;
  for (let i = 0; i < 200 && fHiValue > tolerance && hi - lo > 4 * Number.EPSILON * Math.max(hi, 1e-300); i++) {
    let c = (lo * fHi - hi * fLo) / (fHi - fLo);
    if (!(c > lo && c < hi) || i % 8 === 7) c = 0.5 * (lo + hi);
    _step(_propagator(system, c), system.n, x, heaterOn, trial);
    const fc = value(trial);
    if (fc >= 0) {
      hi = c;
      fHi = fc;
      fHiValue = fc;
      hiState = Float64Array.from(trial);
      if (side === 1) fLo /= 2;
      side = 1;
    } else {
      lo = c;
      fLo = fc;
      if (side === -1) fHi /= 2;
      side = -1;
    }
  }
  return { deltaSeconds: hi, state: hiState };
}
