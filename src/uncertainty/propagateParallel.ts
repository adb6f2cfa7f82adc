/**
 * Monte Carlo on every core: `propagateParallel` and its worker pool.
 * @module
 */
import { HotjunctionTypeError } from "../errors.js";
import { _requireInteger, _requireOptionsObject, _requireProbability } from "./_checks.js";
import { _blockSize, _firstBlockState, _nextBlockState, _Sampler, _TrialStream } from "./_monteCarloStream.js";
import {
  _driveInProcess,
  _monteCarloResult,
  _monteCarloRun,
  _requestSize,
  _usesCopula,
  type _RunOutcome,
} from "./_propagateMonteCarlo.js";
import { _choleskyFactor, _correlationMatrix, _meansOf, _ModelEvaluator, _prepareInputs } from "./_prepare.js";
import { _deserializeError, _loadModel, type _SerializedError } from "./_workerProtocol.js";
import { _monteCarloSettings, _requireFiniteResult, propagate } from "./propagate.js";
import type { Distribution, Model, PropagateOptions, PropagationResult } from "./types.js";

/**
 * Where a worker finds the model: a module and the name of the function it exports. Workers cannot receive a
 * function (closures do not cross threads), so each worker imports the module itself.
 */
export interface ModelReference {
  /**
   * What `import()` is given, in the host and in every worker: an absolute URL (`file:`, `https:`, or a
   * `new URL("./model.js", import.meta.url).href`) or a bare package specifier. A relative path would be
   * resolved against this library's own file, so give a URL.
   */
  readonly module: string;
  /** Name of the exported model function; default `"default"`. */
  readonly exportName?: string;
  /**
   * When given, the export is a model factory: the host and every worker call it once with this value (sent
   * by structured clone, so plain data) and use the model it returns.
   */
  readonly argument?: unknown;
}

/** Options of {@link propagateParallel}: those of `propagate` plus where the work runs. */
export interface PropagateParallelOptions<Name extends string = string> extends PropagateOptions<Name> {
  /**
   * Worker threads (Node) or module workers (browser), an integer 1–64; default: the cores available, at most
   * 8. 1 runs in the calling thread. Ignored when `pool` is given.
   */
  readonly workers?: number;
  /** A pool from {@link createMonteCarloPool} to reuse (no start-up per call); the caller closes it. */
  readonly pool?: MonteCarloPool;
  /** Fewest trials for which workers are used (below, the run stays in the calling thread); default 262,144. */
  readonly parallelThreshold?: number;
}

/** Worker threads that run Monte Carlo blocks; reusable across calls and models. */
export interface MonteCarloPool {
  /** Number of workers. */
  readonly size: number;
  /** Stops the workers. Pending runs reject. */
  close(): Promise<void>;
}

interface Endpoint {
  post(message: unknown): void;
  onMessage(handler: (message: unknown) => void): void;
  onError(handler: (error: unknown) => void): void;
  terminate(): Promise<void>;
}

type Pending = { resolve: (values: Float64Array) => void; reject: (error: Error) => void };

class Pool implements MonteCarloPool {
  private nextId = 1;
  private nextJob = 1;
  private readonly pending = new Map<number, Pending>();
  private turn = 0;
  private closed = false;

  constructor(private readonly endpoints: readonly Endpoint[]) {
    for (const endpoint of endpoints) {
      endpoint.onMessage((raw) => {
        const message = raw as { kind: string; id: number; values?: Float64Array; error?: _SerializedError };
        const waiting = this.pending.get(message.id);
        if (waiting === undefined) return;
        this.pending.delete(message.id);
        if (message.kind === "done") waiting.resolve(message.values as Float64Array);
        else waiting.reject(_deserializeError(message.error as _SerializedError));
      });
      endpoint.onError((error) => this.failAll(error instanceof Error ? error : new Error(String(error))));
    }
  }

  get size(): number {
    return this.endpoints.length;
  }

  private failAll(error: Error): void {
    for (const [, waiting] of this.pending) waiting.reject(error);
    this.pending.clear();
  }

  /** Sends a job to every worker; returns its number. */
  job(module: string, exportName: string, inputs: Record<string, unknown>, correlations: unknown, argument: unknown): number {
    const job = this.nextJob++;
    for (const endpoint of this.endpoints) {
      endpoint.post({ kind: "job", job, module, exportName, inputs, correlations, ...(argument !== undefined ? { argument } : {}) });
    }
    return job;
  }

  /** Asks the next worker (round robin) for `count` outputs from a block boundary with stream `state`. */
  run(job: number, state: readonly number[], count: number): Promise<Float64Array> {
    if (this.closed) return Promise.reject(new Error("the Monte Carlo pool is closed"));
    const id = this.nextId++;
    const endpoint = this.endpoints[this.turn++ % this.endpoints.length] as Endpoint;
    return new Promise((resolve, reject) => {
      this.pending.set(id, { resolve, reject });
      endpoint.post({ kind: "run", job, id, state, count });
    });
  }

  async close(): Promise<void> {
    if (this.closed) return;
    this.closed = true;
    this.failAll(new Error("the Monte Carlo pool was closed"));
    await Promise.all(this.endpoints.map((e) => e.terminate()));
  }
}

/**
 * Imports a Node built-in by a computed specifier, so that application bundlers (browser or neutral targets)
 * leave it alone instead of failing to resolve it; it only runs on Node.
 */
function importNode<T>(name: string): Promise<T> {
  const specifier = `node:${name}`;
  return import(/* @vite-ignore */ specifier) as Promise<T>;
}

/** Whether this runs on Node (a function, not a module-level constant: nothing runs at import time). */
function isNodeRuntime(): boolean {
  return typeof process === "object" && typeof process.versions === "object" && typeof process.versions.node === "string";
}

/**
 * @internal The checked `parallelThreshold` (default 262,144 trials) and `workers` (1–64, or undefined for the
 * cores) of every function that can run on worker threads.
 */
export function _parallelSettings(
  o: { readonly workers?: number; readonly parallelThreshold?: number },
  context: string,
): { threshold: number; workers: number | undefined } {
  return {
    threshold: o.parallelThreshold === undefined ? 262_144 : _requireInteger(o.parallelThreshold, "parallelThreshold", 1, 1e9, context),
    workers: o.workers === undefined ? undefined : _requireInteger(o.workers, "workers", 1, 64, context),
  };
}

/**
 * @internal Where a module that workers load is: from source (tests, benches under tsx) `sourcePath` relative to
 * this file; built, `builtName` beside the chunk this code is in (`dist/`, or `dist/cli/` for the CLI's build,
 * which has its own copies of the worker entries). Undefined where there is no module URL (CommonJS).
 */
export function _workerModuleLocation(sourcePath: string, builtName: string): { url: URL; fromSource: boolean } | undefined {
  try {
    const here = import.meta.url;
    if (typeof here !== "string" || here === "") return undefined;
    const fromSource = here.endsWith(".ts");
    return { url: new URL(fromSource ? sourcePath : `./${builtName}`, here), fromSource };
  } catch {
    return undefined;
  }
}

/** Where the worker entry is: beside this file (built: `monteCarloWorker.js` in `dist/`; source: the .ts). */
function workerLocation(): { url: URL; fromSource: boolean } | undefined {
  return _workerModuleLocation("./_monteCarloWorker.ts", "monteCarloWorker.js");
}

async function availableCores(): Promise<number> {
  if (isNodeRuntime()) {
    const os = await importNode<typeof import("node:os")>("os");
    return typeof os.availableParallelism === "function" ? os.availableParallelism() : os.cpus().length;
  }
  const hardware = (globalThis as { navigator?: { hardwareConcurrency?: number } }).navigator?.hardwareConcurrency;
  return typeof hardware === "number" && hardware >= 1 ? hardware : 1;
}

async function startEndpoints(count: number): Promise<Endpoint[] | undefined> {
  const location = workerLocation();
  if (location === undefined) return undefined;
  if (isNodeRuntime()) {
    const { Worker } = await importNode<typeof import("node:worker_threads")>("worker_threads");
    const { existsSync } = await importNode<typeof import("node:fs")>("fs");
    const { fileURLToPath, pathToFileURL } = await importNode<typeof import("node:url")>("url");
    if (!existsSync(fileURLToPath(location.url))) return undefined;
    let bootstrap = "";
    if (location.fromSource) {
      // From source (tests, benches under tsx) the entry is TypeScript: a one-line bootstrap registers the tsx
      // loader in the worker (a worker does not inherit the host's loader hooks), then imports the entry.
      const { createRequire } = await importNode<typeof import("node:module")>("module");
      const api = pathToFileURL(createRequire(fileURLToPath(location.url)).resolve("tsx/esm/api").replace(/\.cjs$/, ".mjs")).href;
      bootstrap =
        `import(${JSON.stringify(api)}).then((api) => { api.register(); ` +
        `return import(${JSON.stringify(location.url.href)}); });`;
    }
    return Array.from({ length: count }, () => {
      const worker = location.fromSource ? new Worker(bootstrap, { eval: true }) : new Worker(location.url);
      worker.unref();
      return {
        post: (message: unknown) => worker.postMessage(message),
        onMessage: (handler: (message: unknown) => void) => worker.on("message", handler),
        onError: (handler: (error: unknown) => void) => worker.on("error", handler),
        terminate: async () => {
          await worker.terminate();
        },
      };
    });
  }
  const WorkerClass = (globalThis as { Worker?: new (url: URL, options: { type: "module" }) => BrowserWorker }).Worker;
  if (WorkerClass === undefined) return undefined;
  return Array.from({ length: count }, () => {
    const worker = new WorkerClass(location.url, { type: "module" });
    return {
      post: (message: unknown) => worker.postMessage(message),
      onMessage: (handler: (message: unknown) => void) => worker.addEventListener("message", (e) => handler((e as { data: unknown }).data)),
      onError: (handler: (error: unknown) => void) => worker.addEventListener("error", (e) => handler(e)),
      terminate: () => {
        worker.terminate();
        return Promise.resolve();
      },
    };
  });
}

interface BrowserWorker {
  postMessage(message: unknown): void;
  addEventListener(type: "message" | "error", handler: (event: unknown) => void): void;
  terminate(): void;
}

/**
 * Starts worker threads (Node `node:worker_threads`) or module workers (browser) for {@link propagateParallel}.
 * Reuse one pool for many calls; close it when done.
 * @param options - `workers`: integer 1–64, default the cores available (at most 8)
 * @returns the pool, or `undefined` where workers cannot start (no worker support, or the worker file is not
 *   beside the library, e.g. the CommonJS build); `propagateParallel` then runs in the calling thread (same bits)
 * @throws HotjunctionRangeError for a worker count outside 1–64
 */
export async function createMonteCarloPool(options?: { readonly workers?: number }): Promise<MonteCarloPool | undefined> {
  _requireOptionsObject(options, "createMonteCarloPool", true);
  const count =
    options?.workers === undefined
      ? Math.min(await availableCores(), 8)
      : _requireInteger(options.workers, "workers", 1, 64, "createMonteCarloPool");
  const endpoints = await startEndpoints(count);
  return endpoints === undefined ? undefined : new Pool(endpoints);
}

/**
 * Answers a run from the pool: the trials are cut at block boundaries into chunks of `_requestSize`, at most
 * two chunks per worker in flight (memory stays bounded), and handed to the run in trial order.
 */
async function driveOnPool(
  run: Generator<number, _RunOutcome, Float64Array>,
  pool: Pool,
  job: number,
  seed: number,
  maxTrials: number,
): Promise<_RunOutcome> {
  const inFlight: Promise<Float64Array>[] = [];
  const limit = 2 * pool.size;
  let scheduled = 0;
  let state = _firstBlockState(seed);
  const schedule = (): void => {
    while (inFlight.length < limit && scheduled < maxTrials) {
      const count = Math.min(_requestSize, maxTrials - scheduled);
      const promise = pool.run(job, state, count);
      promise.catch(() => undefined); // awaited in order below; an unawaited rejection must not crash
      inFlight.push(promise);
      for (let b = 0; b < count / _blockSize; b++) state = _nextBlockState(state);
      scheduled += count;
    }
  };
  let leftover: Float64Array = new Float64Array(0);
  let leftoverAt = 0;
  let buffer = new Float64Array(0);
  let step = run.next(buffer);
  while (!step.done) {
    const need = step.value;
    if (buffer.length < need) buffer = new Float64Array(need);
    let filled = 0;
    while (filled < need) {
      if (leftoverAt === leftover.length) {
        schedule();
        const next = inFlight.shift();
        if (next === undefined) throw new Error("Monte Carlo run asked for more trials than planned");
        leftover = await next;
        leftoverAt = 0;
        schedule();
      }
      const take = Math.min(need - filled, leftover.length - leftoverAt);
      buffer.set(leftover.subarray(leftoverAt, leftoverAt + take), filled);
      leftoverAt += take;
      filled += take;
    }
    step = run.next(buffer.subarray(0, need));
  }
  // Chunks still in flight (an adaptive run that stopped early) finish and are dropped.
  return step.value;
}

/**
 * Monte Carlo propagation (JCGM 101) on every core: the same result as `propagate` with
 * `method: "monte-carlo"`, to the last bit, for any number of workers.
 *
 * How it stays bit-identical: trial t belongs to block ⌊t/8192⌋, and each block draws from its own stream (the
 * seeded xoroshiro128+ advanced by one 2⁶⁴-step jump per block), sampled whole, so a block's outputs are the
 * same whichever thread computes them. The host cuts the run at block boundaries, receives the outputs in
 * trial order and reduces them in one place (mean, standard deviation, sort, interval), exactly as the
 * in-process path does.
 *
 * How a worker gets the model: give `model` as a {@link ModelReference} `{ module, exportName }`; the host and
 * every worker `import()` that module and call the export (a plain function of the input record). A function
 * given directly runs in the calling thread (closures cannot cross threads) with the same bits. Input
 * distributions and correlations are plain data and are sent as they are. Workers are used when the run has at
 * least `parallelThreshold` trials and more than one worker is available; otherwise, or where workers cannot
 * start, the run stays in the calling thread. Methods other than Monte Carlo run `propagate` in the calling
 * thread.
 *
 * Memory is bounded at any trial count: at most 2 chunks of 131,072 outputs per worker in flight, and the
 * reduction keeps at most 4,194,304 outputs (above that, the interval is the average over segments, with
 * `intervalStandardError`).
 * @param model - a {@link Model} function, or a {@link ModelReference} to an exported one
 * @param inputs - record of named {@link Distribution}s
 * @param options - {@link PropagateParallelOptions}: those of `propagate`, plus `workers`, `pool`,
 *   `parallelThreshold`
 * @returns a promise of the {@link PropagationResult}
 * @throws (rejects with) the errors of `propagate`; HotjunctionTypeError `INVALID_OPTION` when the module
 *   cannot be imported or has no such function export
 * @example
 * ```ts no-run
 * import { propagateParallel, rectangular } from "hotjunction";
 * const result = await propagateParallel(
 *   { module: new URL("./ovenModel.js", import.meta.url).href, exportName: "ovenError" },
 *   { gain: rectangular({ center: 1, halfWidth: 0.001 }), offset: rectangular({ center: 0, halfWidth: 0.2 }) },
 *   { method: "monte-carlo", trials: 2_000_000, seed: 7 },
 * );
 * ```
 */
export async function propagateParallel<Name extends string>(
  model: Model<Name> | ModelReference,
  inputs: Readonly<Record<Name, Distribution>>,
  options?: PropagateParallelOptions<Name>,
): Promise<PropagationResult<Name>> {
  const context = "propagateParallel";
  _requireOptionsObject(options, context, true);
  const o: PropagateParallelOptions<Name> = options ?? {};
  let fn: Model;
  let reference: { module: string; exportName: string; argument: unknown } | undefined;
  if (typeof model === "function") {
    fn = model as Model;
  } else {
    if (typeof model !== "object" || model === null || typeof (model as { module?: unknown }).module !== "string") {
      throw new HotjunctionTypeError({
        code: "INVALID_OPTION",
        quantity: "model",
        value: model,
        context,
        problem: "is neither a function nor a { module, exportName } reference",
      });
    }
    const exportName = (model as ModelReference).exportName === undefined ? "default" : (model as ModelReference).exportName;
    if (typeof exportName !== "string") {
      throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "exportName", value: exportName, context, problem: "is not a string" });
    }
    const argument = (model as ModelReference).argument;
    reference = { module: (model as ModelReference).module, exportName, argument };
    fn = await _loadModel(reference.module, exportName, context, argument);
  }
  const { workers: _w, pool: givenPool, parallelThreshold: _t, ...rest } = o;
  if (o.method !== "monte-carlo") return propagate(fn as Model<Name>, inputs, rest);
  const { threshold, workers } = _parallelSettings(o, context);
  if (givenPool !== undefined && !(givenPool instanceof Pool)) {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "pool", value: givenPool, context, problem: "is not a pool from createMonteCarloPool" });
  }
  // Same checks, in the same order, as propagate.
  const coverage = o.coverage === undefined ? 0.95 : _requireProbability(o.coverage, "coverage", context);
  const prepared = _prepareInputs(inputs);
  const correlation = _correlationMatrix(o.correlations, prepared.names);
  if (correlation !== undefined) _choleskyFactor(correlation, prepared.names);
  const evaluator = new _ModelEvaluator(fn, prepared.names);
  evaluator.probeNames(_meansOf(prepared.distributions));
  const settings = _monteCarloSettings(o, coverage, 1, context);
  const planned = settings.adaptive === undefined ? settings.trials : settings.adaptive.maxTrials;
  const sampler = new _Sampler(prepared.distributions, correlation, prepared.names, undefined);
  const copula = _usesCopula(prepared, sampler, correlation);
  const wantWorkers = workers ?? (givenPool === undefined ? Math.min(await availableCores(), 8) : givenPool.size);
  if (reference !== undefined && planned >= threshold && (givenPool !== undefined || wantWorkers > 1)) {
    const pool = (givenPool as Pool | undefined) ?? ((await createMonteCarloPool({ workers: wantWorkers })) as Pool | undefined);
    if (pool !== undefined) {
      try {
        const job = pool.job(reference.module, reference.exportName, inputs as Record<string, unknown>, o.correlations, reference.argument);
        const outcome = await driveOnPool(_monteCarloRun(settings), pool, job, settings.seed, planned);
        return _requireFiniteResult(_monteCarloResult(prepared, evaluator, correlation, copula, settings, outcome, pool.size), context) as PropagationResult<Name>;
      } finally {
        if (givenPool === undefined) await pool.close();
      }
    }
  }
  const stream = new _TrialStream(sampler, [evaluator], _firstBlockState(settings.seed));
  const outcome = _driveInProcess(_monteCarloRun(settings), stream);
  return _requireFiniteResult(_monteCarloResult(prepared, evaluator, correlation, copula, settings, outcome, 1), context) as PropagationResult<Name>;
}

