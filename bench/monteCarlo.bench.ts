/**
 * Monte Carlo speed: trials per second through `propagate` versus a bare hand-written loop that samples the same
 * 12 input distributions with the same generator and evaluates the same model, in the same run.
 * Run: `npx tsx bench/monteCarlo.bench.ts`. Target: 1e6 trials ≤ 0.5 s, and ≤ 2× the bare loop's time.
 * @module
 */
import { pathToFileURL } from "node:url";
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { Bench } from "tinybench";
import { arcsine, normal, propagate, rectangular, trapezoidal, triangular } from "../src/uncertainty/index.js";

type Name = `x${0 | 1 | 2 | 3 | 4 | 5 | 6 | 7 | 8 | 9 | 10 | 11}`;

// A made-up 12-source chain: a sensor signal through three gain stages with offsets (demo numbers).
const inputs: Record<Name, ReturnType<typeof normal>> = {
  x0: normal({ mean: 20, standardDeviation: 0.02 }),
  x1: normal({ mean: 0, standardDeviation: 0.01 }),
  x2: rectangular({ center: 0, halfWidth: 0.05 }),
  x3: triangular({ center: 0, halfWidth: 0.03 }),
  x4: rectangular({ center: 1, halfWidth: 0.001 }),
  x5: normal({ mean: 1, expandedUncertainty: 0.002, coverageFactor: 2 }),
  x6: trapezoidal({ center: 1, halfWidth: 0.0015, beta: 0.5 }),
  x7: arcsine({ center: 0, halfWidth: 0.02 }),
  x8: rectangular({ center: 0, halfWidth: 0.01 }),
  x9: normal({ mean: 0, standardDeviation: 0.005 }),
  x10: triangular({ center: 0, halfWidth: 0.01 }),
  x11: rectangular({ center: 2.5, halfWidth: 0.0025 }),
};

function chainModel(x: Readonly<Record<Name, number>>): number {
  return ((x.x0 + x.x1 + x.x2 + x.x3) * x.x4 * x.x5 * x.x6 + x.x7 + x.x8 + x.x9 + x.x10) / x.x11;
}

/** The same sampling and model written out by hand, with the same generator; returns the 95 % interval. */
function bareLoop(trials: number, seed: number): [number, number] {
  const rng = xoroshiro128plus(seed);
  const out = new Float64Array(trials);
  const twoPi = 2 * Math.PI;
  let spare = Number.NaN;
  const gauss = (): number => {
    if (spare === spare) {
      const z = spare;
      spare = Number.NaN;
      return z;
    }
    const radius = Math.sqrt(-2 * Math.log(1 - uniformFloat64(rng)));
    const angle = twoPi * uniformFloat64(rng);
    spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  };
  const rect = (c: number, a: number): number => c + a * (2 * uniformFloat64(rng) - 1);
  const trap = (c: number, a: number, beta: number): number =>
    c - a + a * ((1 + beta) * uniformFloat64(rng) + (1 - beta) * uniformFloat64(rng));
  for (let t = 0; t < trials; t++) {
    const x0 = 20 + 0.02 * gauss();
    const x1 = 0.01 * gauss();
    const x2 = rect(0, 0.05);
    const x3 = trap(0, 0.03, 0);
    const x4 = rect(1, 0.001);
    const x5 = 1 + 0.001 * gauss();
    const x6 = trap(1, 0.0015, 0.5);
    const x7 = 0.02 * Math.sin(twoPi * uniformFloat64(rng));
    const x8 = rect(0, 0.01);
    const x9 = 0.005 * gauss();
    const x10 = trap(0, 0.01, 0);
    const x11 = rect(2.5, 0.0025);
    out[t] = ((x0 + x1 + x2 + x3) * x4 * x5 * x6 + x7 + x8 + x9 + x10) / x11;
  }
  let sum = 0;
  for (let t = 0; t < trials; t++) sum += out[t] as number;
  const mean = sum / trials;
  let squares = 0;
  for (let t = 0; t < trials; t++) squares += ((out[t] as number) - mean) ** 2;
  out.sort();
  const q = Math.round(0.95 * trials);
  const r = Math.floor((trials - q + 1) / 2);
  return [(out[r - 1] as number) + 0 * squares, out[r - 1 + q] as number];
}

/** Figures of one bench run. */
export interface MonteCarloBenchResult {
  /** Trials per second through `propagate`. */
  readonly propagateTrialsPerSecond: number;
  /** Trials per second of the bare loop. */
  readonly bareTrialsPerSecond: number;
  /** propagate time / bare-loop time (target ≤ 2). */
  readonly ratio: number;
  /** Seconds for one 1e6-trial `propagate` call (target ≤ 0.5 s). */
  readonly secondsForMillionTrials: number;
}

/**
 * Runs the Monte Carlo bench and prints trials/s of both loops and their ratio.
 * @returns the measured figures
 */
export async function runMonteCarloBench(): Promise<MonteCarloBenchResult> {
  const trials = 200_000;
  const bench = new Bench({ name: "Monte Carlo, 12-source chain", time: 3000, iterations: 5, warmupIterations: 2 });
  bench
    .add("propagate (monte-carlo)", () => {
      propagate(chainModel, inputs, { method: "monte-carlo", trials, seed: 3 });
    })
    .add("bare loop", () => {
      bareLoop(trials, 3);
    });
  await bench.run();
  const meanMs = (name: string): number => {
    const task = bench.getTask(name);
    const result = task?.result as { latency?: { mean: number } } | undefined;
    if (result?.latency === undefined) throw new Error(`bench task ${name} has no result`);
    return result.latency.mean;
  };
  const propagateMs = meanMs("propagate (monte-carlo)");
  const bareMs = meanMs("bare loop");
  const start = performance.now();
  propagate(chainModel, inputs, { method: "monte-carlo", trials: 1_000_000, seed: 5 });
  const secondsForMillionTrials = (performance.now() - start) / 1000;
  const result: MonteCarloBenchResult = {
    propagateTrialsPerSecond: (trials / propagateMs) * 1000,
    bareTrialsPerSecond: (trials / bareMs) * 1000,
    ratio: propagateMs / bareMs,
    secondsForMillionTrials,
  };
  console.log(`Monte Carlo, 12-source chain, ${trials} trials per run`);
  console.log(`  propagate : ${Math.round(result.propagateTrialsPerSecond).toLocaleString("en")} trials/s`);
  console.log(`  bare loop : ${Math.round(result.bareTrialsPerSecond).toLocaleString("en")} trials/s`);
  console.log(`  ratio (propagate time / bare time): ${result.ratio.toFixed(2)} (target ≤ 2)`);
  console.log(`  1e6 trials through propagate: ${secondsForMillionTrials.toFixed(3)} s (target ≤ 0.5 s)`);
  return result;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  await runMonteCarloBench();
}
