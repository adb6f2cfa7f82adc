/**
 * Monte Carlo speed: trials per second through `propagate` versus a bare hand-written loop that samples the same
 * 12 input distributions with the same generator and evaluates the same model, in the same run.
 * Also: 1e6 trials on worker threads (propagateParallel, a warm pool and a cold start) against the bare loop on one
 * core, and common random numbers (propagateCommonDraws, 2,001 points × 20,000 trials) against propagate per point.
 * Run: `npx tsx bench/monteCarlo.bench.ts`. Targets (issue 16): 1e6 trials ≤ 0.25 s on 2 cores and ≤ 1.2× the bare
 * loop's time per core; 2,001 × 20,000 common draws ≤ 10 s.
 * @module
 */
import { availableParallelism } from "node:os";
import { pathToFileURL } from "node:url";
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { Bench } from "tinybench";
import { createMonteCarloPool, propagate, propagateCommonDraws, propagateParallel, type Model } from "../src/uncertainty/index.js";
import { _Xoroshiro128Plus } from "../src/uncertainty/_xoroshiro128plus.js";
import { chainInputs, chainModel, type ChainName } from "../tests/uncertainty/fixtures/twelveSourceChain.js";

// The made-up 12-source chain (demo numbers) lives in a module so that worker threads can import it by URL.
const inputs = chainInputs;
const chainModelUrl = new URL("../tests/uncertainty/fixtures/twelveSourceChain.ts", import.meta.url).href;

/**
 * The same sampling and model written out by hand (trial by trial: no record, no blocks), with pure-rand's
 * xoroshiro128+ (the same bits as the package's generator); returns the 95 % interval.
 */
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

/**
 * The bare loop with the package's own xoroshiro128+ (the generator `propagate` draws from, inlined here): the
 * stricter baseline, since pure-rand's `uniformFloat64` costs more per draw than the own generator.
 */
function bareLoopOwnGenerator(trials: number, seed: number): [number, number] {
  const rng = new _Xoroshiro128Plus().seed(seed);
  const out = new Float64Array(trials);
  const twoPi = 2 * Math.PI;
  let spare = Number.NaN;
  const gauss = (): number => {
    if (spare === spare) {
      const z = spare;
      spare = Number.NaN;
      return z;
    }
    const radius = Math.sqrt(-2 * Math.log(1 - rng.uniform()));
    const angle = twoPi * rng.uniform();
    spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  };
  const rect = (c: number, a: number): number => c + a * (2 * rng.uniform() - 1);
  const trap = (c: number, a: number, beta: number): number =>
    c - a + a * ((1 + beta) * rng.uniform() + (1 - beta) * rng.uniform());
  for (let t = 0; t < trials; t++) {
    const x0 = 20 + 0.02 * gauss();
    const x1 = 0.01 * gauss();
    const x2 = rect(0, 0.05);
    const x3 = trap(0, 0.03, 0);
    const x4 = rect(1, 0.001);
    const x5 = 1 + 0.001 * gauss();
    const x6 = trap(1, 0.0015, 0.5);
    const x7 = 0.02 * Math.sin(twoPi * rng.uniform());
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
  /** Seconds for one 1e6-trial `propagate` call (one core). */
  readonly secondsForMillionTrials: number;
  /** Seconds of the bare loop for 1e6 trials, same run. */
  readonly bareSecondsForMillionTrials: number;
  /** Workers of the parallel runs. */
  readonly workers: number;
  /** Seconds for 1e6 trials through propagateParallel on a warm pool (target ≤ 0.25 s on 2 cores). */
  readonly parallelSecondsForMillionTrials: number;
  /** Same, pool started inside the call (cold). */
  readonly parallelColdSecondsForMillionTrials: number;
  /** Seconds for 1e6 trials through propagateParallel with workers: 1 (the calling thread), same run. */
  readonly oneWorkerSecondsForMillionTrials: number;
  /** Cores the machine reports (os.availableParallelism). */
  readonly cores: number;
  /** parallel (warm) time × workers / bare-loop time: time per core against the bare loop (target ≤ 1.2). */
  readonly parallelPerCoreRatio: number;
  /** Seconds for 2,001 points × 20,000 trials through propagateCommonDraws (target ≤ 10 s). */
  readonly commonDrawsSeconds: number;
  /** Seconds propagate would take for the same 2,001 points, one call per point (measured on 101, scaled). */
  readonly perPointSeconds: number;
  /** perPointSeconds / commonDrawsSeconds. */
  readonly commonDrawsSpeedup: number;
}

function bestOf<T>(runs: number, f: () => T): number {
  let best = Infinity;
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    f();
    best = Math.min(best, performance.now() - start);
  }
  return best / 1000;
}

async function bestOfAsync(runs: number, f: () => Promise<unknown>): Promise<number> {
  let best = Infinity;
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    await f();
    best = Math.min(best, performance.now() - start);
  }
  return best / 1000;
}

/**
 * One core only: `propagate` against the bare loop in interleaved rounds (propagate, bare, propagate, …), each
 * keeping its best round, so a busy machine disturbs both alike. Returns the ratio of the best times.
 */
export function runOneCoreInterleaved(
  trials = 200_000,
  rounds = 7,
): { propagateSeconds: number; bareSeconds: number; ratio: number; bareOwnSeconds: number; ratioOwn: number } {
  let bestPropagate = Infinity;
  let bestBare = Infinity;
  let bestOwn = Infinity;
  propagate(chainModel, inputs, { method: "monte-carlo", trials, seed: 3 });
  bareLoop(trials, 3);
  bareLoopOwnGenerator(trials, 3);
  for (let r = 0; r < rounds; r++) {
    let start = performance.now();
    propagate(chainModel, inputs, { method: "monte-carlo", trials, seed: 3 });
    bestPropagate = Math.min(bestPropagate, performance.now() - start);
    start = performance.now();
    bareLoop(trials, 3);
    bestBare = Math.min(bestBare, performance.now() - start);
    start = performance.now();
    bareLoopOwnGenerator(trials, 3);
    bestOwn = Math.min(bestOwn, performance.now() - start);
  }
  return {
    propagateSeconds: bestPropagate / 1000,
    bareSeconds: bestBare / 1000,
    ratio: bestPropagate / bestBare,
    bareOwnSeconds: bestOwn / 1000,
    ratioOwn: bestPropagate / bestOwn,
  };
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
  const million = { method: "monte-carlo" as const, trials: 1_000_000, seed: 5 };
  const secondsForMillionTrials = bestOf(2, () => propagate(chainModel, inputs, million));
  const bareSecondsForMillionTrials = bestOf(2, () => bareLoop(1_000_000, 5));
  const pool = await createMonteCarloPool();
  if (pool === undefined) throw new Error("worker threads are not available");
  const reference = { module: chainModelUrl, exportName: "chainModel" };
  await propagateParallel(reference, inputs, { ...million, trials: 300_000, pool }); // warm-up: workers load the model
  const parallelSecondsForMillionTrials = await bestOfAsync(3, () => propagateParallel(reference, inputs, { ...million, pool }));
  const workers = pool.size;
  // Speed-up over one worker in the same run (workers: 1 runs in the calling thread, same bits).
  const oneWorkerSecondsForMillionTrials = await bestOfAsync(2, () => propagateParallel(reference, inputs, { ...million, workers: 1 }));
  await pool.close();
  const parallelColdSecondsForMillionTrials = await bestOfAsync(1, () => propagateParallel(reference, inputs, { ...million, workers }));
  // Common random numbers: a sweep-like family, one model per point (the chain scaled by the point's gain).
  const points = Array.from({ length: 2001 }, (_, i) => 1 + i * 1e-4);
  const models: Model<ChainName>[] = points.map((g) => (x) => g * chainModel(x));
  const commonDrawsSeconds = bestOf(1, () => propagateCommonDraws(models, inputs, { trials: 20_000, seed: 5 }));
  const sample = models.filter((_, i) => i % 20 === 0);
  const perPointSeconds =
    (bestOf(1, () => sample.forEach((m) => propagate(m, inputs, { method: "monte-carlo", trials: 20_000, seed: 5 }))) * models.length) / sample.length;
  const result: MonteCarloBenchResult = {
    propagateTrialsPerSecond: (trials / propagateMs) * 1000,
    bareTrialsPerSecond: (trials / bareMs) * 1000,
    ratio: propagateMs / bareMs,
    secondsForMillionTrials,
    bareSecondsForMillionTrials,
    workers,
    parallelSecondsForMillionTrials,
    parallelColdSecondsForMillionTrials,
    oneWorkerSecondsForMillionTrials,
    cores: availableParallelism(),
    parallelPerCoreRatio: (parallelSecondsForMillionTrials * workers) / bareSecondsForMillionTrials,
    commonDrawsSeconds,
    perPointSeconds,
    commonDrawsSpeedup: perPointSeconds / commonDrawsSeconds,
  };
  console.log(`Monte Carlo, 12-source chain, ${trials} trials per run`);
  console.log(`  propagate : ${Math.round(result.propagateTrialsPerSecond).toLocaleString("en")} trials/s`);
  console.log(`  bare loop : ${Math.round(result.bareTrialsPerSecond).toLocaleString("en")} trials/s`);
  console.log(`  ratio (propagate time / bare time, one core): ${result.ratio.toFixed(2)} (target ≤ 1.2)`);
  console.log(`  1e6 trials: propagate ${secondsForMillionTrials.toFixed(3)} s, bare loop ${bareSecondsForMillionTrials.toFixed(3)} s (one core)`);
  console.log(
    `  1e6 trials on ${workers} workers: ${parallelSecondsForMillionTrials.toFixed(3)} s warm pool (target ≤ 0.25 s), ` +
      `${parallelColdSecondsForMillionTrials.toFixed(3)} s with start-up; ${(bareSecondsForMillionTrials / parallelSecondsForMillionTrials).toFixed(2)}x faster than the bare loop on one core`,
  );
  console.log(`  per core: parallel time × workers / bare time = ${result.parallelPerCoreRatio.toFixed(2)} (target ≤ 1.2)`);
  console.log(
    `  speed-up over 1 worker (${oneWorkerSecondsForMillionTrials.toFixed(3)} s): ${(oneWorkerSecondsForMillionTrials / parallelSecondsForMillionTrials).toFixed(2)}x ` +
      `on ${workers} workers, ${result.cores} cores reported (ideal ${Math.min(workers, result.cores)}x)`,
  );
  console.log(
    `  common draws, 2,001 points × 20,000 trials: ${commonDrawsSeconds.toFixed(2)} s (target ≤ 10 s) vs ` +
      `${perPointSeconds.toFixed(1)} s for propagate per point -> ${result.commonDrawsSpeedup.toFixed(1)}x`,
  );
  return result;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  if (process.argv[2] === "one-core") {
    // `npx tsx bench/monteCarlo.bench.ts one-core`: the one-core ratio alone (interleaved, best of 7 rounds).
    const r = runOneCoreInterleaved();
    console.log(
      `Monte Carlo one core, 200,000 trials, best of 7 interleaved rounds: propagate ${(r.propagateSeconds * 1000).toFixed(1)} ms, ` +
        `bare loop ${(r.bareSeconds * 1000).toFixed(1)} ms (pure-rand) -> ${r.ratio.toFixed(2)}x, ` +
        `${(r.bareOwnSeconds * 1000).toFixed(1)} ms (own generator) -> ${r.ratioOwn.toFixed(2)}x (target ≤ 1.2)`,
    );
  } else {
    await runMonteCarloBench();
  }
}
