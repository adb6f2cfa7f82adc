/**
 * Worker entry of the `sweep` command (a Node worker thread): it evaluates ranges of the sweep's points with
 * {@link _sweepRows}, making the Monte Carlo draws once for all the ranges it gets. A point's row does not depend
 * on which thread computes it or with which other points, so the sweep is the same for any number of workers.
 *
 * Messages in: `{ kind: "job", chain, options }` once, then `{ kind: "points", id, temperatures }`. Out:
 * `{ kind: "rows", id, rows }` or `{ kind: "error", id, error }`.
 * @module
 * @internal
 */
import { parentPort } from "node:worker_threads";
import type { MeasurementChain } from "../chain/types.js";
import { _serializeError } from "../uncertainty/_workerProtocol.js";
import { _SweepRange, type _SweepPointOptions } from "./_sweepRows.js";

type Message =
  | { readonly kind: "job"; readonly chain: MeasurementChain; readonly options: _SweepPointOptions }
  | { readonly kind: "points"; readonly id: number; readonly temperatures: readonly number[] };

if (parentPort !== null) {
  const port = parentPort;
  let range: _SweepRange | undefined;
  let failure: unknown;
  port.on("message", (message: Message) => {
    if (message.kind === "job") {
      try {
        range = new _SweepRange(message.chain, message.options);
      } catch (error) {
        failure = error;
      }
      return;
    }
    try {
      if (range === undefined) throw failure ?? new Error("sweep worker: points before the job");
      port.postMessage({ kind: "rows", id: message.id, rows: range.rows(message.temperatures) });
    } catch (error) {
      port.postMessage({ kind: "error", id: message.id, error: _serializeError(error) });
    }
  });
}
