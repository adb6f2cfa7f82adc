/**
 * Progress display for long Monte Carlo runs: a bar on standard error when it is a terminal, nothing otherwise
 * (so pipes, logs and tests stay clean).
 * @module
 */
import { SingleBar } from "cli-progress";
import type { CliIo } from "./io.js";

/** A progress sink: `update(fraction)` as work proceeds, `stop()` when done (safe to call twice). */
export interface ProgressSink {
  readonly update: (fractionDone: number) => void;
  readonly stop: () => void;
}

const silent: ProgressSink = { update: () => undefined, stop: () => undefined };

/**
 * Starts a progress bar labelled `label` when standard error is a terminal; otherwise returns a silent sink.
 * @internal
 */
export function _startProgress(io: CliIo, label: string): ProgressSink {
  if (!io.stderrIsTty) return silent;
  const bar = new SingleBar({
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
