// CLI start-up: `node dist/cli.js emf K 500` and `temp K 20.644` against a bare `node -e 0`, in the same run,
// interleaved, each process timed from spawn to exit. Reports the ratio of the medians and of the fastest runs
// (on a shared machine the fastest run is the one least disturbed). Needs `npm run build` first.
// `npx tsx bench/cliStart.bench.ts [runs]`. Not a test: nothing here passes or fails on a timing.
import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));
const cli = `${root}dist/cli.js`;

interface StartCase {
  readonly name: string;
  readonly args: readonly string[];
}

function timeOnce(args: readonly string[]): number {
  const start = process.hrtime.bigint();
  const result = spawnSync(process.execPath, [...args], { cwd: root, stdio: ["ignore", "ignore", "pipe"] });
  const ms = Number(process.hrtime.bigint() - start) / 1e6;
  if (result.status !== 0) throw new Error(`${args.join(" ")} exited ${result.status}: ${String(result.stderr)}`);
  return ms;
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? (sorted[mid] as number) : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

/** Runs the start-up cases interleaved `runs` times; returns one line per case. */
export function runCliStartBench(runs = 20, target = 1.3): string[] {
  if (!existsSync(cli)) return ["CLI start: dist/cli.js is missing (run `npm run build`); skipped"];
  const baseline: StartCase = { name: "node -e 0", args: ["-e", "0"] };
  const cases: StartCase[] = [
    { name: "hotjunction emf K 500", args: [cli, "emf", "K", "500"] },
    { name: "hotjunction temp K 20.644", args: [cli, "temp", "K", "20.644"] },
  ];
  const all = [baseline, ...cases];
  const times = all.map(() => [] as number[]);
  // Warm the file cache once, then alternate so a busy spell hits every case alike.
  for (const c of all) timeOnce(c.args);
  for (let r = 0; r < runs; r++) all.forEach((c, i) => times[i]?.push(timeOnce(c.args)));
  const base = times[0] as number[];
  const lines = [
    `CLI start (${runs} interleaved runs each, spawn to exit; ${process.version})`,
    `${baseline.name.padEnd(28)} median ${median(base).toFixed(1)} ms, fastest ${Math.min(...base).toFixed(1)} ms`,
  ];
  cases.forEach((c, i) => {
    const t = times[i + 1] as number[];
    const ratioMedian = median(t) / median(base);
    const ratioFastest = Math.min(...t) / Math.min(...base);
    lines.push(
      `${c.name.padEnd(28)} median ${median(t).toFixed(1)} ms, fastest ${Math.min(...t).toFixed(1)} ms` +
        ` -> ${ratioMedian.toFixed(2)}x (median), ${ratioFastest.toFixed(2)}x (fastest) the baseline's time` +
        ` (target ≤ ${target}x: ${ratioMedian <= target ? "meets" : "MISSES"})`,
    );
  });
  return lines;
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1]) {
  const runs = process.argv[2] !== undefined ? Number(process.argv[2]) : 20;
  for (const line of runCliStartBench(runs)) console.log(line);
}
