/**
 * The progress line of long CLI runs: drawn only when standard error is a terminal, with the fraction done, the
 * time elapsed and an estimate of the time left (elapsed × (1 − f) / f, the rate so far: common practice, no
 * source), redrawn in place and cleared at the end. Tested with a fake terminal stream and a fake clock.
 */
import { describe, expect, it } from "vitest";
import type { CliIo } from "../../src/cli/io.js";
import { _formatDuration, _startProgress } from "../../src/cli/progress.js";

function fakeIo(isTty: boolean): { io: CliIo; written: string[] } {
  const written: string[] = [];
  return { io: { writeOut: () => undefined, writeErr: (t) => void written.push(t), stderrIsTty: isTty, cwd: "." }, written };
}

describe("progress line", () => {
  it("prints nothing when standard error is not a terminal", () => {
    const { io, written } = fakeIo(false);
    const p = _startProgress(io, "sweep", () => 0);
    p.update(0.5);
    p.update(1);
    p.stop();
    expect(written).toEqual([]);
  });

  it("on a terminal: fraction, elapsed time and an estimate from the rate so far; cleared at the end", () => {
    const { io, written } = fakeIo(true);
    let clock = 1000;
    const p = _startProgress(io, "Monte Carlo", () => clock);
    clock += 10_000; // 10 s for a quarter: 30 s left
    p.update(0.25);
    expect(written).toHaveLength(1);
    expect(written[0]).toMatch(/^\r\x1b\[2KMonte Carlo \[#{6}-{18}\] 25 % · 10 s elapsed · about 30 s left$/);
    clock += 50; // redraws are throttled (200 ms)
    p.update(0.26);
    expect(written).toHaveLength(1);
    clock += 110_000; // 120 s for 60 %: 80 s left
    p.update(0.6);
    expect(written[1]).toContain("60 % · 2 min 0 s elapsed · about 1 min 20 s left");
    p.stop();
    p.stop();
    expect(written.slice(2)).toEqual(["\r\x1b[2K"]);
    p.update(0.9); // after stop: nothing
    expect(written).toHaveLength(3);
  });

  it("never prints NaN or Infinity, whatever fraction it is given", () => {
    const { io, written } = fakeIo(true);
    let clock = 0;
    const p = _startProgress(io, "sweep", () => clock);
    for (const f of [0, Number.NaN, -1, Number.POSITIVE_INFINITY, 1e-320, 1e-300, 2]) {
      clock += 1000;
      p.update(f);
    }
    expect(written.join("")).not.toMatch(/NaN|Infinity/);
    expect(written[0]).toContain("estimating time left");
  });

  it("durations", () => {
    expect(_formatDuration(0)).toBe("0 s");
    expect(_formatDuration(59.4)).toBe("59 s");
    expect(_formatDuration(75)).toBe("1 min 15 s");
    expect(_formatDuration(7260)).toBe("2 h 1 min");
  });
});
