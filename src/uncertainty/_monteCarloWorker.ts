/**
 * Worker entry of `propagateParallel` (Node worker thread or browser module worker). It loads the model from
 * a module (dynamic `import` of a URL or specifier, then a named export), prepares the same inputs as the host,
 * and answers requests "the trials of these blocks" with the model outputs, drawn by the same
 * {@link _TrialStream} as the in-process path: same bits whichever thread runs a block.
 *
 * Messages in: `{ kind: "job", job, module, exportName, inputs, correlations, argument? }` (once per job; the
 * inputs are the JSON-serializable distributions; with `argument` the export is a model factory) and `{ kind: "run", job, id, state, count }`. Out: `{ kind: "done", id,
 * values }` (the buffer is transferred) or `{ kind: "error", id, error }`.
 * @module
 * @internal
 */
import { _Sampler, _TrialStream } from "./_monteCarloStream.js";
import { _correlationMatrix, _ModelEvaluator, _prepareInputs } from "./_prepare.js";
import { _loadModel, _serializeError, type _WorkerJob, type _WorkerRun } from "./_workerProtocol.js";

interface Prepared {
  readonly stream: (state: readonly number[]) => _TrialStream;
}

interface Port {
  post(message: unknown, transfer?: ArrayBuffer[]): void;
  listen(handler: (message: unknown) => void): void;
}

function serve(port: Port): void {
  const jobs = new Map<number, Promise<Prepared>>();
  let queue: Promise<void> = Promise.resolve();
  port.listen((raw) => {
    const message = raw as _WorkerJob | _WorkerRun;
    if (message.kind === "job") {
      const prepared = (async (): Promise<Prepared> => {
        const model = await _loadModel(message.module, message.exportName, "propagateParallel worker", message.argument);
        const inputs = _prepareInputs(message.inputs);
        const correlation = _correlationMatrix(message.correlations, inputs.names);
        const sampler = new _Sampler(inputs.distributions, correlation, inputs.names, undefined);
        const evaluator = new _ModelEvaluator(model, inputs.names);
        return { stream: (state) => new _TrialStream(sampler, [evaluator], state) };
      })();
      prepared.catch(() => undefined); // reported with the first run of the job
      jobs.set(message.job, prepared);
      return;
    }
    if (message.kind === "run") {
      queue = queue.then(async () => {
        try {
          const prepared = jobs.get(message.job);
          if (prepared === undefined) throw new Error(`unknown job ${message.job}`);
          const { stream } = await prepared;
          const values = new Float64Array(message.count);
          stream(message.state).take(message.count, [values], 0);
          port.post({ kind: "done", id: message.id, values }, [values.buffer]);
        } catch (error) {
          port.post({ kind: "error", id: message.id, error: _serializeError(error) });
        }
      });
    }
  });
}

const isNode = typeof process === "object" && typeof process.versions === "object" && typeof process.versions.node === "string";
if (isNode) {
  const specifier = "node:" + "worker_threads"; // computed: bundlers for the browser leave it alone
  void (import(/* @vite-ignore */ specifier) as Promise<typeof import("node:worker_threads")>).then(({ parentPort }) => {
    if (parentPort === null) return; // imported on the main thread: nothing to serve
    serve({
      post: (message, transfer) => parentPort.postMessage(message, transfer ?? []),
      listen: (handler) => parentPort.on("message", handler),
    });
  });
} else {
  const scope = globalThis as unknown as {
    postMessage(message: unknown, transfer?: ArrayBuffer[]): void;
    addEventListener(type: "message", handler: (event: { data: unknown }) => void): void;
  };
  if (typeof scope.postMessage === "function" && typeof scope.addEventListener === "function") {
    serve({
      post: (message, transfer) => scope.postMessage(message, transfer ?? []),
      listen: (handler) => scope.addEventListener("message", (event) => handler(event.data)),
    });
  }
}
