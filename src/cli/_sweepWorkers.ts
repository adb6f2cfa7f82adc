/**
 * The `sweep` command's points on worker threads (internal): ranges of points handed to workers as they become
 * free, rows put back in point order. Each worker compiles the chain and makes the Monte Carlo draws once; a
 * row depends only on its temperature, so the sweep is the same, bit for bit, for any number of workers.
 * @module
 * @internal
 */
import type { MeasurementChain } from "../chain/types.js";
import { _deserializeError, type _SerializedError } from "../uncertainty/_workerProtocol.js";
import { _SweepRange, type _SweepPointOptions, type _SweepRow } from "./_sweepRows.js";

/** Fewest model evaluations (points × Monte Carlo trials) for which the sweep starts workers. */
const parallelWork = 2_000_000;

/** Where the worker entry is: from source the .ts beside this file; built, `dist/sweepWorker.js` (this code is in `dist/cli/`). */
function workerLocation(): { url: URL; fromSource: boolean } {
  const fromSource = import.meta.url.endsWith(".ts");
  return { url: new URL(fromSource ? "./_sweepWorker.ts" : "../sweepWorker.js", import.meta.url), fromSource };
}

interface SweepThread {
  post(message: unknown): void;
  on(handler: (message: unknown) => void, onError: (error: Error) => void): void;
  terminate(): Promise<unknown>;
}

async function startThreads(count: number): Promise<SweepThread[] | undefined> {
  const { Worker } = await import("node:worker_threads");
  const { existsSync } = await import("node:fs");
  const { fileURLToPath, pathToFileURL } = await import("node:url");
  const location = workerLocation();
  if (!existsSync(fileURLToPath(location.url))) return undefined;
  let bootstrap = "";
  if (location.fromSource) {
    // From source (tests under tsx) a one-line bootstrap registers the tsx loader in the worker, then imports the entry.
    const { createRequire } = await import("node:module");
    const api = pathToFileURL(createRequire(fileURLToPath(location.url)).resolve("tsx/esm/api").replace(/\.cjs$/, ".mjs")).href;
    bootstrap = `import(${JSON.stringify(api)}).then((api) => { api.register(); return import(${JSON.stringify(location.url.href)}); });`;
  }
  return Array.from({ length: count }, () => {
    const worker = location.fromSource ? new Worker(bootstrap, { eval: true }) : new Worker(location.url);
    return {
      post: (message: unknown) => worker.postMessage(message),
      on: (handler: (message: unknown) => void, onError: (error: Error) => void) => {
        worker.on("message", handler);
        worker.on("error", onError);
      },
      terminate: () => worker.terminate(),
    };
  });
}

/** How many workers a sweep of this size uses when none is asked for: 1 below the size where they pay. */
async function defaultWorkers(points: number, options: _SweepPointOptions): Promise<number> {
  const work = points * (options.methods.includes("monte-carlo") ? options.trials : 1);
  if (work < parallelWork) return 1;
  const { availableParallelism, cpus } = await import("node:os");
  const cores = typeof availableParallelism === "function" ? availableParallelism() : cpus().length;
  return Math.max(1, Math.min(cores, 8, points));
}

/**
 * The sweep's rows at `temperatures`, on `workers` worker threads (default: the cores available, at most 8, when
 * points × trials is at least 2,000,000; else 1). 1, or where no worker can start, runs in the calling thread.
 * The rows are the same for any number of workers; an error is the one of the first point that fails.
 * `onPoint(done)` as points complete.
 */
export async function _sweepRowsOnWorkers(
  chain: MeasurementChain,
  temperatures: readonly number[],
  options: _SweepPointOptions,
  workers: number | undefined,
  onPoint?: (done: number) => void,
): Promise<_SweepRow[]> {
  const here = new _SweepRange(chain, options); // a bad chain or option fails here, before any thread starts
  const count = Math.min(workers ?? (await defaultWorkers(temperatures.length, options)), temperatures.length);
  const threads = count > 1 ? await startThreads(count) : undefined;
  if (threads === undefined) return here.rows(temperatures, onPoint);
  const size = Math.max(1, Math.ceil(temperatures.length / (count * 8)));
  const ranges = Math.ceil(temperatures.length / size);
  const rows: _SweepRow[][] = [];
  const errors: (Error | undefined)[] = [];
  let next = 0;
  let done = 0;
  try {
    await new Promise<void>((resolve, reject) => {
      let finished = 0;
      const give = (thread: SweepThread): void => {
        if (next >= ranges) return;
        const id = next++;
        thread.post({ kind: "points", id, temperatures: temperatures.slice(id * size, (id + 1) * size) });
      };
      for (const thread of threads) {
        thread.on((raw) => {
          const message = raw as { kind: "rows" | "error"; id: number; rows?: _SweepRow[]; error?: _SerializedError };
          if (message.kind === "rows") rows[message.id] = message.rows as _SweepRow[];
          else errors[message.id] = _deserializeError(message.error as _SerializedError);
          done += Math.min(size, temperatures.length - message.id * size);
          onPoint?.(done);
          if (++finished === ranges) resolve();
          else give(thread);
        }, reject);
        thread.post({ kind: "job", chain, options });
        give(thread);
      }
    });
  } finally {
    await Promise.all(threads.map((t) => t.terminate()));
  }
  const failed = errors.find((e) => e !== undefined);
  if (failed !== undefined) throw failed;
  return rows.flat();
}
