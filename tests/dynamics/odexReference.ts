// A reference runaway written out independently of src/dynamics: the same model as plain derivatives, integrated
// by the general-purpose Gragg–Bulirsch–Stoer extrapolation solver of the `odex` package (E. Hairer and G. Wanner's
// ODEX, ported to JavaScript), with events found by bisection on repeated solves. Test helper only.
import { createRequire } from "node:module";
import type { DynamicsModel, RunawayScenario } from "../../src/dynamics/index.js";

interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  maxSteps: number;
  solve(f: (x: number, y: number[]) => number[], x: number, y0: number[], xEnd: number): { y: number[]; outcome: number };
}
const { Solver } = createRequire(import.meta.url)("odex") as { Solver: new (n: number) => OdexSolver };

export interface ReferenceRunaway {
  readonly decisionSeconds: number;
  readonly heatOffSeconds: number;
  readonly trueAtHeatOffC: number;
  readonly peakTrueC: number;
}

/** Reference for an analog path (the firmware path is checked against its closed forms instead). */
export function referenceRunaway(model: DynamicsModel, scenario: RunawayScenario): ReferenceRunaway {
  const r = model.runaway;
  const lags: number[] = [];
  const s = model.sensor;
  if (s?.kind === "firstOrder") lags.push(s.timeConstantSeconds);
  if (s?.kind === "responseTime") lags.push(s.responseTime632Seconds);
  if (s?.kind === "twoLags") lags.push(s.wellTimeConstantSeconds, s.probeTimeConstantSeconds);
  const path = model.signalPath;
  if (path?.kind !== undefined && path.kind !== "analog") throw new Error("reference handles the analog path only");
  if (path?.inputFilter !== undefined) lags.push(path.inputFilter.resistanceOhms * path.inputFilter.capacitanceFarads);
  if (path?.amplifierBandwidthHz !== undefined) lags.push(1 / (2 * Math.PI * path.amplifierBandwidthHz));
  const taus = lags.filter((t) => t > 0);
  let delay = path?.comparatorDelaySeconds ?? 0;
  for (const o of model.outputStages ?? []) delay += o.kind === "relay" ? o.releaseTimeSeconds : o.kind === "deEnergiseDelay" ? o.delaySeconds : 0.5 / o.mainsFrequencyHz;

  const hasElement = r.kind === "heaterPower" && r.element !== undefined;
  const iT = hasElement ? 1 : 0; // absolute temperatures in °C, element first when present
  const n = iT + 1 + taus.length;
  const iY = n - 1;
  const deriv = (on: number) => (_x: number, y: number[]): number[] => {
    const d = new Array<number>(n).fill(0);
    const T = y[iT] as number;
    if (r.kind === "constantRate") d[iT] = r.rateCPerSecond * on;
    else if (r.element === undefined) d[iT] = (r.heaterWatts * on - r.lossWattsPerK * (T - r.ambientC)) / r.loadCapacityJoulesPerK;
    else {
      const Te = y[0] as number;
      d[0] = (r.heaterWatts * on - r.element.couplingWattsPerK * (Te - T)) / r.element.capacityJoulesPerK;
      d[iT] = (r.element.couplingWattsPerK * (Te - T) - r.lossWattsPerK * (T - r.ambientC)) / r.loadCapacityJoulesPerK;
    }
    taus.forEach((tau, k) => {
      d[iT + 1 + k] = ((y[iT + k] as number) - (y[iT + 1 + k] as number)) / tau;
    });
    return d;
  };
  const y0 = new Array<number>(n).fill(scenario.startC);
  if (hasElement && r.kind === "heaterPower" && r.element !== undefined) {
    y0[0] = scenario.startC + (r.lossWattsPerK * (scenario.startC - r.ambientC)) / r.element.couplingWattsPerK;
  }
  const solver = new Solver(n);
  solver.absoluteTolerance = 1e-11;
  solver.relativeTolerance = 1e-11;
  solver.maxSteps = 1_000_000;
  const advance = (y: number[], dt: number, on: number): number[] => (dt === 0 ? y.slice() : solver.solve(deriv(on), 0, y, dt).y);
  const bisect = (y: number[], dt: number, on: number, g: (state: number[]) => number): [number, number[]] => {
    let lo = 0;
    let hi = dt;
    for (let i = 0; i < 60; i++) {
      const mid = 0.5 * (lo + hi);
      if (g(advance(y, mid, on)) >= 0) hi = mid;
      else lo = mid;
    }
    return [hi, advance(y, hi, on)];
  };

  // heater on until the indicated value reaches the trip temperature
  const thr = scenario.tripTemperatureC;
  const dt = (thr - scenario.startC) / (r.kind === "constantRate" ? r.rateCPerSecond : r.heaterWatts / r.loadCapacityJoulesPerK) / 200;
  let t = 0;
  let y = y0;
  for (;;) {
    const next = advance(y, dt, 1);
    if ((next[iY] as number) >= thr) {
      const [d, state] = bisect(y, dt, 1, (st) => (st[iY] as number) - thr);
      t += d;
      y = state;
      break;
    }
    t += dt;
    y = next;
  }
  const decisionSeconds = t;
  y = advance(y, delay, 1);
  const heatOffSeconds = t + delay;
  const trueAtHeatOffC = y[iT] as number;
  // heater off until dT/dt ≤ 0
  const slope = (st: number[]) => deriv(0)(0, st)[iT] as number;
  let peak = trueAtHeatOffC;
  if (slope(y) > 0) {
    for (;;) {
      const next = advance(y, dt, 0);
      if (slope(next) <= 0) {
        const [, state] = bisect(y, dt, 0, (st) => -slope(st));
        peak = Math.max(state[iT] as number, y[iT] as number);
        break;
      }
      y = next;
    }
  }
  return { decisionSeconds, heatOffSeconds, trueAtHeatOffC, peakTrueC: peak };
}
