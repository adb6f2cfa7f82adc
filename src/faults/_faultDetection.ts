/**
 * Detection in the fault review: which of the design's detection methods flag one evaluated point, and the
 * first temperature below the hazard limit where a method flags a faulted chain but not the healthy one.
 * @module
 * @internal
 */
import type { _SweepPoint } from "./_faultSweep.js";
import type { FaultDetection, FaultDetectionMethod } from "./types.js";

/** @internal The detection methods, in report order. */
export const _methodOrder: readonly FaultDetectionMethod[] = [
  "out-of-range-window",
  "open-thermocouple-detection",
  "second-comparator",
  "supervisory-reading",
];

/** @internal The methods that flag a point at a hot-junction temperature. */
export type _Flags = (p: _SweepPoint, hotJunctionC: number) => Set<FaultDetectionMethod>;

/**
 * @internal The flag function of a design's detection methods. The supervisor compares the reading with
 * the main detector's own healthy trip `detectorTripC` (°C).
 */
export function _detectionFlags(detection: FaultDetection, detectorTripC: number): _Flags {
  const tol = detection.supervisoryReading?.toleranceC ?? 10;
  const window = detection.outOfRangeWindow as Record<string, number> | undefined;
  const second = detection.secondComparator;
  return (p, t) => {
    const out = new Set<FaultDetectionMethod>();
    const s = p.s;
    if (!s.boardPowered) return out;
    if (window !== undefined) {
      const v = "lowVolts" in window ? s.amplifierOutputVolts : s.readingC;
      const lo = ("lowVolts" in window ? window["lowVolts"] : window["lowC"]) as number;
      const hi = ("lowVolts" in window ? window["highVolts"] : window["highC"]) as number;
      if (v < lo || v > hi) out.add("out-of-range-window");
    }
    if (detection.openThermocoupleDetection === true && s.openThermocouple) out.add("open-thermocouple-detection");
    if (second !== undefined && p.secondTripped && !s.detectorTripped) out.add("second-comparator");
    const sv = detection.supervisoryReading;
    if (sv !== undefined) {
      const r = s.readingC;
      let f = (sv.plausibleLowC !== undefined && r < sv.plausibleLowC) || (sv.plausibleHighC !== undefined && r > sv.plausibleHighC);
      if (sv.checksDetector ?? true) f ||= (s.detectorTripped && r < detectorTripC - tol) || (!s.detectorTripped && r > detectorTripC + tol);
      if (sv.independentSensor === true) f ||= Math.abs(r - t) > tol;
      if (f) out.add("supervisory-reading");
    }
    return out;
  };
}

/**
 * @internal First swept temperature below the hazard limit at which each method flags a faulted run where
 * it does not flag the healthy run, °C.
 */
export function _firstFlags(
  pts: readonly _SweepPoint[],
  points: readonly number[],
  hazardC: number,
  flags: _Flags,
  healthyFlags: readonly Set<FaultDetectionMethod>[],
): Map<FaultDetectionMethod, number> {
  const firstFlagC = new Map<FaultDetectionMethod, number>();
  pts.forEach((p, k) => {
    const t = points[k] as number;
    if (t >= hazardC) return;
    for (const m of flags(p, t)) if (!healthyFlags[k]?.has(m) && !firstFlagC.has(m)) firstFlagC.set(m, t);
  });
  return firstFlagC;
}
