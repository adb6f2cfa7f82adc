/**
 * Progress display for long runs (Monte Carlo, sweeps): one line on standard error, redrawn in place, with the
 * fraction done, the time elapsed and an estimate of the time left — only when standard error is a terminal (so
 * pipes, logs and tests stay clean). Written through the run's `CliIo`, so a test can hand it a fake terminal.
 * @module
 */
import type { CliIo } from "./io.js";

/** A progress sink: `update(fraction)` as work proceeds, `stop()` when done (safe to call twice). */
export interface ProgressSink {
  readonly update: (fractionDone: number) => void;
  readonly stop: () => void;
}

const silent: ProgressSink = { update: () => undefined, stop: () => undefined };

/** Least time between two redraws, ms (a terminal needs no more). */
const redrawIntervalMs = 200;
const barWidth = 24;

/** `75 s` → `1 min 15 s`; under a minute in seconds. @internal */
export function _formatDuration(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  if (s < 60) return `${s} s`;
  const m = Math.floor(s / 60);
  if (m < 60) return `${m} min ${s % 60} s`;
  return `${Math.floor(m / 60)} h ${m % 60} min`;
}

/**
 * Starts a progress line labelled `label` when standard error is a terminal; otherwise returns a silent sink.
 * The estimate is elapsed × (1 − f) / f (the rate so far), shown once a first fraction is done.
 * @param now - clock in ms (tests pass a fake one)
 * @internal
 */
export function _startProgress(io: CliIo, label: string, now: () => number = () => performance.now()): ProgressSink {
  if (!io.stderrIsTty) return silent;
  const start = now();
  let lastDraw = Number.NEGATIVE_INFINITY;
  let drawn = false;
  let stopped = false;
  return {
    update: (fractionDone) => {
      if (stopped || !Number.isFinite(fractionDone)) return;
      const t = now();
      const f = Math.min(1, Math.max(0, fractionDone));
      if (t - lastDraw < redrawIntervalMs && f < 1) return;
      lastDraw = t;
      const elapsed = (t - start) / 1000;
      const filled = Math.round(f * barWidth);
      const left = (elapsed * (1 - f)) / f;
      const estimate = !(f > 0) ? "estimating time left" : left < 8_640_000 ? `about ${_formatDuration(left)} left` : "over 100 days left";
      io.writeErr(`\r\x1b[2K${label} [${"#".repeat(filled)}${"-".repeat(barWidth - filled)}] ${Math.floor(f * 100)} % · ${_formatDuration(elapsed)} elapsed · ${estimate}`);
      drawn = true;
    },
    stop: () => {
      if (stopped) return;
      stopped = true;
      if (drawn) io.writeErr("\r\x1b[2K");
    },
  };
}
