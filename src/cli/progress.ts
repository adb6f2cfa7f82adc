/**
 * Progress display for long Monte Carlo runs: a bar on standard error when it is a terminal, nothing otherwise
 * (so pipes, logs and tests stay clean).
 * @module
 */
import type { SingleBar } from "cli-progress";
import type { CliIo } from "./io.js";

/** cli-progress's bar, loaded by {@link _loadProgress} only when standard error is a terminal. */
let barClass: typeof SingleBar | undefined;

/**
 * Loads the progress-bar library when standard error is a terminal (a command calls it before its work, so
 * pipes, logs and tests never load it). @internal
 */
export async function _loadProgress(io: CliIo): Promise<void> {
  if (io.stderrIsTty && barClass === undefined) barClass = (await import("cli-progress")).SingleBar;
}

/** A progress sink: `update(fraction)` as work proceeds, `stop()` when done (safe to call twice). */
export interface ProgressSink {
  readonly update: (fractionDone: number) => void;
  readonly stop: () => void;
}

const silent: ProgressSink = { update: () => undefined, stop: () => undefined };

/**
 * Starts a progress bar labelled `label` when standard error is a terminal (after {@link _loadProgress});
 * otherwise returns a silent sink.
 * @internal
 */
export function _startProgress(io: CliIo, label: string): ProgressSink {
  if (!io.stderrIsTty || barClass === undefined) return silent;
  const bar = new barClass({
    format: `${label} [{bar}] {percentage}% | {eta_formatted} left`,
    stream: process.stderr,
    hideCursor: true,
    clearOnComplete: true,
    barsize: 30,
  });
  bar.start(1000, 0);
  let stopped = false;
  return {
    update: (fractionDone) => {
      if (!stopped && Number.isFinite(fractionDone)) bar.update(Math.round(Math.min(1, Math.max(0, fractionDone)) * 1000));
    },
    stop: () => {
      if (!stopped) {
        stopped = true;
        bar.stop();
      }
    },
  };
}
