/**
 * The sweep of the fault review: the hot-junction temperatures visited, one evaluated point (the chain's
 * nodes plus an optional second comparator), and the search for the temperature where the output trips.
 * @module
 * @internal
 */
import { _evaluateSignals, type _Mods, type _Plant } from "./_faultPlant.js";
import type { FaultSignals, SecondComparator } from "./types.js";

/** @internal One evaluated point with the second comparator. */
export interface _SweepPoint {
  readonly s: FaultSignals;
  readonly secondTripped: boolean;
  readonly outputTripped: boolean;
}

/** @internal Evaluates one point of a (faulted) plant. */
export type _Evaluate = (plant: _Plant, mods: _Mods, hotJunctionC: number) => _SweepPoint;

/** @internal Where a run trips: at the start of the sweep, at a temperature (°C, to 0.001 °C), or never. */
export interface _TripRun {
  readonly immediate: boolean;
  readonly tripC: number | null;
  readonly pts: readonly _SweepPoint[];
}

/** @internal The swept temperatures: from `fromC` in steps of `stepC`, ending exactly at `toC`, °C. */
export function _sweepPoints(fromC: number, toC: number, stepC: number): number[] {
  const points: number[] = [];
  for (let k = 0; ; k++) {
    const t = fromC + k * stepC;
    if (t >= toC) {
      points.push(toC);
      break;
    }
    points.push(t);
  }
  return points;
}

/**
 * @internal The point evaluator. A second comparator trips at the healthy amplifier output of its threshold
 * temperature, scaled with the reference when it shares it.
 */
export function _sweepEvaluator(healthy: _Plant, healthyMods: _Mods, second: SecondComparator | undefined): _Evaluate {
  const secondVolts = second === undefined ? Number.NaN : _evaluateSignals(healthy, healthyMods, second.thresholdC).amplifierOutputVolts;
  const sharesReference = second?.sharesReference ?? true;
  return (plant, mods, t) => {
    const s = _evaluateSignals(plant, mods, t);
    let secondTripped = false;
    if (second !== undefined && s.boardPowered) {
      const thr = sharesReference && healthy.referenceVolts > 0 ? (secondVolts * s.referenceVolts) / healthy.referenceVolts : secondVolts;
      secondTripped = s.amplifierOutputVolts >= thr;
    }
    return { s, secondTripped, outputTripped: s.outputTripped || secondTripped };
  };
}

/** @internal Sweeps the points, then refines the first trip by bisection to 0.001 °C. */
export function _findTrip(
  evaluate: _Evaluate,
  points: readonly number[],
  plant: _Plant,
  mods: _Mods,
  tripped: (p: _SweepPoint) => boolean = (p) => p.outputTripped,
): _TripRun {
  const pts: _SweepPoint[] = [];
  let found = -1;
  for (let k = 0; k < points.length; k++) {
    const p = evaluate(plant, mods, points[k] as number);
    pts.push(p);
    if (found < 0 && tripped(p)) found = k;
  }
  if (found === 0) return { immediate: true, tripC: points[0] as number, pts };
  if (found < 0) return { immediate: false, tripC: null, pts };
  let lo = points[found - 1] as number;
  let hi = points[found] as number;
  while (hi - lo > 1e-3) {
    const mid = (lo + hi) / 2;
    if (tripped(evaluate(plant, mods, mid))) hi = mid;
    else lo = mid;
  }
  return { immediate: false, tripC: hi, pts };
}
