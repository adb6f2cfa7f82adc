// Shared benchmark helpers: run tinybench tasks and report throughput per item and ratios to a baseline
// measured in the same run (never absolute timings as pass/fail).
import { Bench } from "tinybench";

export interface BenchCase {
  readonly name: string;
  /** Items processed per call (conversions, trials...). */
  readonly itemsPerCall: number;
  readonly fn: () => void;
}

export interface BenchFigure {
  readonly name: string;
  /** Items per second. */
  readonly itemsPerSecond: number;
  /** Mean time of one call, ms. */
  readonly msPerCall: number;
}

/** Runs the cases in one tinybench and returns items per second for each. */
export async function measure(cases: readonly BenchCase[], timeMs = 400, rounds = 3): Promise<BenchFigure[]> {
  // Several interleaved rounds, best period of each case kept: on a shared machine the best run is the one
  // least disturbed by other processes, for the case and its baseline alike.
  const best = cases.map(() => Infinity);
  for (let round = 0; round < rounds; round++) {
    const bench = new Bench({ time: timeMs, warmupTime: 100 });
    for (const c of cases) bench.add(c.name, c.fn);
    await bench.run();
    cases.forEach((c, i) => {
      const result = bench.tasks[i]?.result as { state: string; period?: number } | undefined;
      if (result === undefined || result.period === undefined) throw new Error(`benchmark ${c.name} did not complete`);
      best[i] = Math.min(best[i] as number, result.period);
    });
  }
  return cases.map((c, i) => {
    const period = best[i] as number;
    return { name: c.name, itemsPerSecond: (c.itemsPerCall * 1000) / period, msPerCall: period };
  });
}

/** Formats a figure line with a ratio to a baseline figure (baseline time / our time; ≥ 1 means slower by that factor). */
export function ratioLine(ours: BenchFigure, baseline: BenchFigure, target: number): string {
  const slowdown = baseline.itemsPerSecond / ours.itemsPerSecond;
  const verdict = slowdown <= target ? "meets" : "MISSES";
  return (
    `${ours.name.padEnd(46)} ${formatRate(ours.itemsPerSecond)}  vs ${baseline.name}: ${formatRate(baseline.itemsPerSecond)}` +
    `  -> ${slowdown.toFixed(2)}x the baseline's time (target ≤ ${target}x: ${verdict})`
  );
}

export function formatRate(perSecond: number): string {
  if (perSecond >= 1e6) return `${(perSecond / 1e6).toFixed(2)} M/s`;
  if (perSecond >= 1e3) return `${(perSecond / 1e3).toFixed(1)} k/s`;
  return `${perSecond.toFixed(1)} /s`;
}
