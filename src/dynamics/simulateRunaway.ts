/**
 * Simulates one runaway through the sensor, the signal path and the output stages, and returns the time series and
 * the figures: when the true temperature crosses the trip point, when the trip is decided, when heat stops, and how
 * hot the load gets.
 * @module
 */
import { HotjunctionRangeError, _requireFiniteResult, _requireInRange } from "../errors.js";
import { _checkScenario, _compileDynamics, type _CompiledDynamics } from "./_compileDynamics.js";
import { _buildLinearSystem, _derivative, _locate, _propagator, _step, type _LinearSystem } from "./_linearSystem.js";
import type { DynamicsModel, RunawayScenario } from "./types.js";

/** Options of {@link simulateRunaway}. */
export interface SimulateRunawayOptions {
  /** Target number of points kept in the time series (decimated; event points always kept), 10 … 100000; default 600. */
  readonly maxPoints?: number;
}

/** Time series of a runaway (plain arrays, JSON-ready). */
export interface RunawaySeries {
  /** Time since the heater stuck on, s. */
  readonly timeSeconds: number[];
  /** True temperature of the load, °C. */
  readonly trueC: number[];
  /** Indicated temperature at the comparator or ADC input (after the sensor and electronic lags), °C. */
  readonly indicatedC: number[];
  /** Firmware path: the digital filter's output at the worst sample phase (continuous phase), °C; else null. */
  readonly filteredC: number[] | null;
}

/** Figures and series of one runaway. */
export interface RunawayResponse {
  readonly scenario: RunawayScenario;
  /** Whether the trip acts at all (false: the runaway settles below the trip point, or the indicated value never reaches it). */
  readonly tripped: boolean;
  /** Integration grid step, s. */
  readonly stepSeconds: number;
  /** When the true temperature crosses the trip temperature, s; null if it never does. */
  readonly trueCrossingSeconds: number | null;
  /** When the trip is decided (comparator switches, or the firmware's last debounce sample at the worst phase), s. */
  readonly decisionSeconds: number | null;
  /** When heat stops (decision plus comparator and output-stage delays), s. */
  readonly heatOffSeconds: number | null;
  /** Time from the true crossing of the trip temperature to heat off, s. */
  readonly responseTimeSeconds: number | null;
  /** True temperature at heat off, °C. */
  readonly trueAtHeatOffC: number | null;
  /** Highest true temperature reached (after heat off; without a trip, the equilibrium it approaches), °C. */
  readonly peakTrueC: number;
  /** When the peak is reached, s; null when it is an asymptote (no trip). */
  readonly peakSeconds: number | null;
  /** Peak minus trip temperature, °C. */
  readonly overshootC: number;
  /** Hazard limit minus peak, °C (negative: the hazard limit is exceeded). */
  readonly dynamicMarginC: number;
  /** Whether the peak reaches the hazard limit (or there is no trip and the equilibrium does). */
  readonly exceedsHazard: boolean;
  /** Uncontrolled runaway: time from the start to the hazard limit, s; null if it settles below it. */
  readonly timeFromStartToHazardSeconds: number | null;
  /** Uncontrolled runaway: time from the true trip crossing to the hazard limit, s (negative: hazard below the trip point). */
  readonly timeFromTripToHazardSeconds: number | null;
  readonly series: RunawaySeries;
}

const MAX_SEGMENTS = 5_000_000;
const STEPS_TARGET = 2000;

/** Equilibrium deviation of the load with the heater stuck on (Infinity if unbounded). @internal */
export function _equilibriumDeviationC(model: _CompiledDynamics, startC: number): number {
  const p = model.process;
  if (p.kind === "constantRate" || p.lossWattsPerK === 0) return Infinity;
  return p.ambientC + p.heaterWatts / p.lossWattsPerK - startC;
}

/** Time for the uncontrolled runaway (heater on, no trip) to bring the load to `levelDeviationC`; null if never. @internal */
export function _timeToTrueLevelSeconds(model: _CompiledDynamics, system: _LinearSystem, startC: number, levelDeviationC: number): number | null {
  if (levelDeviationC <= 0) return 0;
  const p = model.process;
  if (p.kind === "constantRate") return levelDeviationC / p.rateCPerSecond;
  if (!(_equilibriumDeviationC(model, startC) > levelDeviationC)) return null;
  const totalCapacity = p.capacityJoulesPerK + (p.element === null ? 0 : p.element.capacityJoulesPerK);
  // First guess of the step from the adiabatic rate P/C_total; doubled every 64 steps so a slow approach ends.
  let h = (levelDeviationC * totalCapacity) / p.heaterWatts / 64;
  let x = Float64Array.from(system.x0);
  let next = new Float64Array(system.n);
  let t = 0;
  let prop = _propagator(system, h);
  for (let i = 0; i < MAX_SEGMENTS; i++) {
    _step(prop, system.n, x, 1, next);
    if ((next[system.trueIndex] as number) >= levelDeviationC) {
      const hit = _locate(system, x, 1, h, (s) => (s[system.trueIndex] as number) - levelDeviationC);
      return t + hit.deltaSeconds;
    }
    t += h;
    // A level within rounding of the equilibrium (above it by a few ulps) is never reached by the float64 state,
    // which settles at its fixed point instead: the level is reached, to float64, when the state stops moving.
    if (stationary(x, next)) return t;
    [x, next] = [next, x];
    if (i % 64 === 63) {
      h *= 2;
      prop = _propagator(system, h);
    }
  }
  throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity: "runaway duration", value: t, unit: "s", context: "dynamics", problem: "does not reach the level within the step budget" });
}

/** Whether a step left every state component where it was (to 4 ulps of its magnitude): the float64 fixed point. */
function stationary(before: Float64Array, after: Float64Array): boolean {
  for (let k = 0; k < before.length; k++) {
    const a = before[k] as number;
    const b = after[k] as number;
    if (Math.abs(b - a) > 8.881784197001252e-16 * Math.max(Math.abs(a), Math.abs(b))) return false;
  }
  return true;
}

/** Ramp delay of the digital filter at steady state, s. @internal */
export function _digitalFilterDelaySeconds(model: _CompiledDynamics): number {
  const fw = model.firmware;
  if (fw === null || fw.filter === null) return 0;
  const ts = fw.samplePeriodSeconds;
  return fw.filter.kind === "movingAverage" ? ((fw.filter.samples - 1) * ts) / 2 : (ts * (1 - fw.filter.coefficient)) / fw.filter.coefficient;
}

/** Series recorder that keeps about `maxPoints` points by halving the density when full; event points stay. */
class Recorder {
  readonly time: number[] = [];
  readonly trueC: number[] = [];
  readonly indicatedC: number[] = [];
  readonly filteredC: number[] = [];
  private readonly event: boolean[] = [];
  private stride: number;
  private count = 0;
  constructor(
    private readonly maxPoints: number,
    stride: number,
    private readonly withFiltered: boolean,
  ) {
    this.stride = Math.max(1, stride);
  }
  add(t: number, trueC: number, indicatedC: number, filteredC: number, isEvent: boolean): void {
    if (!isEvent && this.count++ % this.stride !== 0) return;
    this.time.push(t);
    this.trueC.push(trueC);
    this.indicatedC.push(indicatedC);
    if (this.withFiltered) this.filteredC.push(filteredC);
    this.event.push(isEvent);
    if (this.time.length >= 2 * this.maxPoints) this.compact();
  }
  private compact(): void {
    let w = 0;
    let regular = 0;
    for (let r = 0; r < this.time.length; r++) {
      const keep = this.event[r] === true || regular++ % 2 === 0;
      if (!keep) continue;
      this.time[w] = this.time[r] as number;
      this.trueC[w] = this.trueC[r] as number;
      this.indicatedC[w] = this.indicatedC[r] as number;
      if (this.withFiltered) this.filteredC[w] = this.filteredC[r] as number;
      this.event[w] = this.event[r] as boolean;
      w++;
    }
    for (const a of [this.time, this.trueC, this.indicatedC, this.event, ...(this.withFiltered ? [this.filteredC] : [])]) a.length = w;
    this.stride *= 2;
  }
  series(): RunawaySeries {
    return { timeSeconds: this.time, trueC: this.trueC, indicatedC: this.indicatedC, filteredC: this.withFiltered ? this.filteredC : null };
  }
}

/** The firmware's decision value at every grid point: the digital filter over samples one period apart. */
class ContinuousPhaseFilter {
  private readonly ring: Float64Array;
  private readonly phaseSum: Float64Array;
  private index = 0;
  value = 0;
  constructor(
    private readonly model: NonNullable<_CompiledDynamics["firmware"]>,
    private readonly gridPerSample: number,
  ) {
    const n = model.filter?.kind === "movingAverage" ? model.filter.samples : 1;
    this.ring = new Float64Array(model.filter?.kind === "firstOrderIir" ? 0 : n * gridPerSample);
    this.phaseSum = new Float64Array(gridPerSample);
  }
  /** Takes the indicated deviation at the next grid point; returns the decision value there. */
  push(y: number): number {
    const k = this.gridPerSample;
    const phase = this.index % k;
    const f = this.model.filter;
    if (f?.kind === "firstOrderIir") {
      const prev = this.phaseSum[phase] as number;
      this.value = prev + f.coefficient * (y - prev);
      this.phaseSum[phase] = this.value;
    } else {
      const n = f === null ? 1 : f.samples;
      const slot = this.index % (n * k);
      this.phaseSum[phase] = (this.phaseSum[phase] as number) + y - (this.ring[slot] as number);
      this.ring[slot] = y;
      this.value = (this.phaseSum[phase] as number) / n;
    }
    this.index++;
    return this.value;
  }
}

/**
 * Simulates the runaway: the heater sticks on at t = 0 with everything at steady state at `startC`; the true
 * temperature rises, the sensor and electronics lag it, the trip is decided when the indicated value reaches the
 * trip temperature, heat stops after the comparator and output-stage delays, and the load peaks.
 *
 * Method. The process, sensor and electronic lags are one linear system, advanced by its exact zero-order-hold
 * discretisation (matrix exponential), so the grid step does not enter the values at grid points; the step is
 * chosen as 1/2000 of an estimate of the time to heat off (for the firmware path an integer fraction of the sample
 * period) and sets only the chart's resolution and the bracketing of events. Events are located by bisection on the
 * exact propagation within the bracketing step: the true crossing, the comparator's decision, heat off (an exact
 * partial step) and the peak (where dT/dt reaches 0 with the heater off). The firmware path samples every period at
 * an unknown phase: the filter output is evaluated at every phase on the grid (continuous phase), its crossing t* of
 * the trip temperature is interpolated linearly between grid points, and the decision is taken at t* + M·Ts, the
 * supremum over phases of the M-th sample at or above it (worst case). With every lag and delay zero, heat stops at
 * the instant the true temperature reaches the trip point, so the peak equals it (to rounding).
 *
 * @param model - the response-time model (plain data; see {@link DynamicsModel}).
 * @param scenario - start (highest normal operating temperature), trip temperature (true), hazard limit, °C.
 * @param options - series density.
 * @returns figures (s, °C) and the decimated series.
 * @throws {@link HotjunctionTypeError} for a missing or non-finite number; {@link HotjunctionRangeError} for a value
 * out of range (named with its valid range), or a runaway that does not reach heat off within 5e6 steps.
 * @example
 * ```ts
 * import { simulateRunaway } from "hotjunction";
 * // 2 °C/s through a 10 s probe and a 0.1 s relay (invented demo numbers)
 * const r = simulateRunaway(
 *   { runaway: { kind: "constantRate", rateCPerSecond: 2 }, sensor: { kind: "firstOrder", timeConstantSeconds: 10 },
 *     outputStages: [{ kind: "relay", releaseTimeSeconds: 0.1 }] },
 *   { startC: 960, tripTemperatureC: 1000, hazardLimitC: 1040 },
 * );
 * console.log(r.responseTimeSeconds?.toFixed(2), r.peakTrueC.toFixed(1), r.dynamicMarginC.toFixed(1)); // "9.58" "1019.2" "20.8"
 * ```
 */
export function simulateRunaway(model: DynamicsModel, scenario: RunawayScenario, options: SimulateRunawayOptions = {}): RunawayResponse {
  const compiled = _compileDynamics(model);
  const sc = _checkScenario(scenario);
  const maxPoints = options.maxPoints === undefined ? 600 : _requireInRange(options.maxPoints, "series points (maxPoints)", 10, 100_000, undefined, "dynamics");
  return _simulateCompiled(compiled, sc, maxPoints);
}

/** The firmware's decision time after a crossing; a sample period near 1e308 s puts it past float64: refused by name. */
function decisionAfter(crossing: number, fw: { readonly debounceSamples: number; readonly samplePeriodSeconds: number }): number {
  const ts = fw.samplePeriodSeconds;
  return _requireFiniteResult(crossing + fw.debounceSamples * ts, "sample period (samplePeriodSeconds)", ts, "s", "simulateRunaway");
}

/** {@link simulateRunaway} on a compiled model and checked scenario. @internal */
export function _simulateCompiled(compiled: _CompiledDynamics, sc: RunawayScenario, maxPoints: number): RunawayResponse {
  const system = _buildLinearSystem(compiled, sc.startC);
  const start = sc.startC;
  const thr = sc.tripTemperatureC - start;
  const hazardDev = sc.hazardLimitC - start;
  const eqDev = _equilibriumDeviationC(compiled, start);
  const lagSum = [...compiled.sensorTimeConstantsSeconds, ...compiled.electronicTimeConstantsSeconds].reduce((s, t) => s + t, 0);
  const fw = compiled.firmware;
  const delay = compiled.comparatorDelaySeconds + compiled.outputDelaySeconds;
  const timeToHazard = _timeToTrueLevelSeconds(compiled, system, start, hazardDev);
  const p = compiled.process;
  const coupleTau = p.kind === "heaterPower" && p.element !== null ? 1 / (p.element.couplingWattsPerK / p.element.capacityJoulesPerK + p.element.couplingWattsPerK / p.capacityJoulesPerK) : 0;

  if (!(eqDev > thr)) {
    // Settles at or below the trip point: the trip never acts.
    const tauProcess = p.kind === "heaterPower" ? p.capacityJoulesPerK / Math.max(p.lossWattsPerK, Number.MIN_VALUE) + coupleTau : 0;
    return settlesBelowTrip(system, sc, eqDev, 5 * (tauProcess + lagSum), timeToHazard, maxPoints);
  }

  const crossEstimate = _timeToTrueLevelSeconds(compiled, system, start, thr) as number;
  const fwDelay = fw === null ? 0 : _digitalFilterDelaySeconds(compiled) + (fw.debounceSamples + 1) * fw.samplePeriodSeconds;
  const estimate = crossEstimate + lagSum + fwDelay + delay + 10 * coupleTau;
  let h = estimate / STEPS_TARGET;
  let gridPerSample = 1;
  if (fw !== null) {
    const ts = fw.samplePeriodSeconds;
    const n = fw.filter?.kind === "movingAverage" ? fw.filter.samples : 1;
    gridPerSample = Math.max(1, Math.min(Math.ceil(ts / h), Math.floor(1e6 / n)));
    h = ts / gridPerSample;
  }
  const prop = _propagator(system, h);
  const n = system.n;
  const ti = system.trueIndex;
  const yi = system.indicatedIndex;
  const filter = fw === null ? null : new ContinuousPhaseFilter(fw, gridPerSample);
  const rec = new Recorder(maxPoints, Math.floor((1.3 * estimate) / h / maxPoints), fw !== null);

  let x = Float64Array.from(system.x0);
  let next = new Float64Array(n);
  let t = 0;
  let grid = 0;
  let heaterOn = 1;
  let trueCrossing: number | null = null;
  let decision: number | null = null;
  let heatOff: number | null = null;
  let trueAtOff: number | null = null;
  let peakC: number | null = null;
  let peakAt: number | null = null;
  let end = Infinity;
  let gPrev = 0;
  let onGrid = true;
  const record = (time: number, s: Float64Array, isEvent: boolean) =>
    rec.add(time, start + (s[ti] as number), start + (s[yi] as number), start + (filter === null ? 0 : filter.value), isEvent);
  record(0, x, true);

  for (let segment = 0; ; segment++) {
    if (segment >= MAX_SEGMENTS) {
      throw new HotjunctionRangeError({
        code: "OUT_OF_RANGE",
        quantity: "simulated steps",
        value: segment,
        max: MAX_SEGMENTS,
        context: "dynamics",
        problem: `exceed the budget before the ${heatOff === null ? "trip" : "peak"}`,
      });
    }
    const u = heaterOn;
    const gridNext = (grid + 1) * h;
    let segEnd: number = u === 1 && heatOff !== null && heatOff < gridNext ? heatOff : gridNext;
    let dt: number = onGrid && segEnd === gridNext ? h : segEnd - t;
    if (dt === h) _step(prop, n, x, u, next);
    else _step(_propagator(system, dt), n, x, u, next);
    if (!Number.isFinite(next[ti] as number) || !Number.isFinite(next[yi] as number)) {
      throw new HotjunctionRangeError({ code: "MODEL_NOT_FINITE", quantity: "simulated temperature", value: next[ti], context: "dynamics", problem: "is not finite (a model value is too extreme for double precision)" });
    }

    if (u === 1 && trueCrossing === null && (next[ti] as number) >= thr) {
      const hit = _locate(system, x, 1, dt, (s) => (s[ti] as number) - thr);
      trueCrossing = t + hit.deltaSeconds;
      record(trueCrossing, hit.state, true);
    }
    if (u === 1 && fw === null && decision === null && (next[yi] as number) >= thr) {
      const hit = _locate(system, x, 1, dt, (s) => (s[yi] as number) - thr);
      decision = t + hit.deltaSeconds;
      heatOff = decision + delay;
      if (heatOff < segEnd) {
        // Heat stops inside this step: end the segment there, with an exact partial step (none when there is no delay).
        if (delay === 0) next.set(hit.state);
        else _step(_propagator(system, heatOff - t), n, x, 1, next);
        segEnd = heatOff;
        dt = segEnd - t;
      }
    }
    const atGrid = segEnd === gridNext;
    if (atGrid && filter !== null) {
      const g = filter.push(next[yi] as number);
      if (u === 1 && decision === null && g >= thr) {
        const crossing: number = t + (dt * (thr - gPrev)) / (g - gPrev);
        const decided: number = decisionAfter(crossing, fw as NonNullable<typeof fw>);
        decision = decided;
        heatOff = decided + delay;
      }
      gPrev = g;
    }
    if (u === 1 && heatOff !== null && segEnd === heatOff) {
      heaterOn = 0;
      trueAtOff = start + (next[ti] as number);
      if (!atGrid) record(segEnd, next, true);
      if (_derivative(system, next, 0, ti) <= 0) {
        // The load already holds or falls once heat stops: the peak is the temperature at heat off.
        peakC = trueAtOff;
        peakAt = heatOff;
        end = heatOff + Math.max(0.25 * heatOff, 20 * h);
      }
    } else if (u === 0 && peakC === null && _derivative(system, next, 0, ti) <= 0) {
      const hit = _locate(system, x, 0, dt, (s) => -_derivative(system, s, 0, ti));
      peakAt = t + hit.deltaSeconds;
      peakC = start + Math.max(hit.state[ti] as number, x[ti] as number);
      record(peakAt, hit.state, true);
      end = peakAt + Math.max(0.25 * peakAt, 20 * h);
    }
    t = segEnd;
    onGrid = atGrid;
    if (atGrid) grid++;
    [x, next] = [next, x];
    if (atGrid) record(t, x, t >= end || t === heatOff);
    if (t >= end) break;
  }

  const peak = peakC as number;
  // Deliberately alike: settlesBelowTrip below returns the same fields for the other outcome (no trip).
  return {
    scenario: sc,
    tripped: true,
    stepSeconds: h,
    trueCrossingSeconds: trueCrossing,
    decisionSeconds: decision,
    heatOffSeconds: heatOff,
    responseTimeSeconds: (heatOff as number) - (trueCrossing as number),
    trueAtHeatOffC: trueAtOff,
    peakTrueC: peak,
    peakSeconds: peakAt,
    overshootC: peak - sc.tripTemperatureC,
    dynamicMarginC: sc.hazardLimitC - peak,
    exceedsHazard: peak >= sc.hazardLimitC,
    timeFromStartToHazardSeconds: timeToHazard,
    timeFromTripToHazardSeconds: timeToHazard === null ? null : timeToHazard - (trueCrossing as number),
    series: rec.series(),
  };
}

/**
 * The response of a process that settles at or below the trip point (equilibrium deviation `eqDev` from the
 * start): the trip never acts; the peak is the equilibrium, approached from below over `horizon` seconds.
 */
function settlesBelowTrip(
  system: _LinearSystem,
  sc: RunawayScenario,
  eqDev: number,
  horizon: number,
  timeToHazard: number | null,
  maxPoints: number,
): RunawayResponse {
  const start = sc.startC;
  const h = horizon / STEPS_TARGET;
  const rec = new Recorder(maxPoints, Math.ceil(STEPS_TARGET / maxPoints), false);
  const prop = _propagator(system, h);
  let x = Float64Array.from(system.x0);
  let next = new Float64Array(system.n);
  rec.add(0, start + (x[system.trueIndex] as number), start + (x[system.indicatedIndex] as number), 0, true);
  for (let i = 1; i <= STEPS_TARGET; i++) {
    _step(prop, system.n, x, 1, next);
    [x, next] = [next, x];
    rec.add(i * h, start + (x[system.trueIndex] as number), start + (x[system.indicatedIndex] as number), 0, i === STEPS_TARGET);
  }
  const peak = start + eqDev;
  // Deliberately alike: _simulateCompiled returns the same fields for a trip.
  return {
    scenario: sc,
    tripped: false,
    stepSeconds: h,
    trueCrossingSeconds: null,
    decisionSeconds: null,
    heatOffSeconds: null,
    responseTimeSeconds: null,
    trueAtHeatOffC: null,
    peakTrueC: peak,
    peakSeconds: null,
    overshootC: peak - sc.tripTemperatureC,
    dynamicMarginC: sc.hazardLimitC - peak,
    exceedsHazard: peak >= sc.hazardLimitC,
    timeFromStartToHazardSeconds: timeToHazard,
    timeFromTripToHazardSeconds: null,
    series: rec.series(),
  };
}
