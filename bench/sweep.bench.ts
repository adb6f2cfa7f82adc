// The sweep of issue 16: `sweep examples/heated-enclosure-adc.json --from 20 --to 120 --step 0.05` (2,001 points ×
// 20,000 trials, worst case + RSS + Monte Carlo). In process, in the same run: the sweep's rows on one thread and
// on the default workers (`_sweepRowsOnWorkers`: draws made once, selection, records kept) against the baseline,
// `evaluateChain` point by point (propagate per point, the sweep before this work; timed on every 20th point and
// scaled to 2,001). Then the built CLI (spawn to exit, --workers 1 and the default), wall and user + system CPU of
// the child from /usr/bin/time when present. Prints the ratios and the load average before and after.
// `npx tsx bench/sweep.bench.ts`. Not a test: nothing here passes or fails on a timing.
import { spawnSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import { fileURLToPath, pathToFileURL } from "node:url";
import { evaluateChain } from "../src/chain/evaluateChain.js";
import { sweepChainOfDesign } from "../src/cli/commands/sweep.js";
import { _sweepRowsOnWorkers } from "../src/cli/_sweepWorkers.js";
import type { DesignFile } from "../src/design/designSchema.js";

const root = fileURLToPath(new URL("..", import.meta.url));
const example = "examples/heated-enclosure-adc.json";

function seconds(start: bigint): number {
  return Number(process.hrtime.bigint() - start) / 1e9;
}

function load(): string {
  return loadavg().map((v) => v.toFixed(2)).join(" ");
}

/** The CLI once: wall seconds and the child's CPU seconds (user, system) when /usr/bin/time is there. */
function cliOnce(extra: readonly string[]): { wall: number; user?: number; system?: number } {
  const args = ["dist/cli.js", "sweep", example, "--from", "20", "--to", "120", "--step", "0.05", "--json", ...extra];
  const timed = existsSync("/usr/bin/time");
  const start = process.hrtime.bigint();
  const r = timed
    ? spawnSync("/usr/bin/time", ["-f", "%U %S", process.execPath, ...args], { cwd: root, encoding: "utf8", maxBuffer: 1 << 28 })
    : spawnSync(process.execPath, args, { cwd: root, encoding: "utf8", maxBuffer: 1 << 28 });
  const wall = seconds(start);
  if (r.status !== 0) throw new Error(`sweep exited ${r.status}: ${r.stderr}`);
  if (!timed) return { wall };
  const [user, system] = (r.stderr.trim().split("\n").at(-1) ?? "").split(" ").map(Number);
  return { wall, ...(user !== undefined ? { user } : {}), ...(system !== undefined ? { system } : {}) };
}

export async function runSweepBench(): Promise<string[]> {
  const design = JSON.parse(readFileSync(`${root}${example}`, "utf8")) as DesignFile;
  const chain = sweepChainOfDesign(design);
  const options = { methods: ["worst-case", "rss", "monte-carlo"] as const, coverage: 0.95, trials: 20_000, seed: 90 };
  const temperatures = Array.from({ length: 2001 }, (_, i) => Number((20 + i * 0.05).toPrecision(12)));
  const lines = [`Sweep, 2,001 points × 20,000 trials (${process.version}, ${availableParallelism()} cores), load average before: ${load()}`];
  const sample = temperatures.filter((_, i) => i % 20 === 0);
  let start = process.hrtime.bigint();
  const cpu0 = process.cpuUsage();
  for (const t of sample) evaluateChain(chain, t, options);
  const baseline = (seconds(start) * temperatures.length) / sample.length;
  const baselineCpu = ((process.cpuUsage(cpu0).user / 1e6) * temperatures.length) / sample.length;
  start = process.hrtime.bigint();
  const cpu1 = process.cpuUsage();
  await _sweepRowsOnWorkers(chain, temperatures, options, 1);
  const oneThread = seconds(start);
  const oneThreadCpu = process.cpuUsage(cpu1).user / 1e6;
  start = process.hrtime.bigint();
  await _sweepRowsOnWorkers(chain, temperatures, options, undefined);
  const workers = seconds(start);
  lines.push(
    `  baseline, evaluateChain per point (101 points scaled): ${baseline.toFixed(2)} s wall, ${baselineCpu.toFixed(2)} s user CPU`,
    `  sweep rows, one thread: ${oneThread.toFixed(2)} s wall, ${oneThreadCpu.toFixed(2)} s user CPU -> ${(oneThread / baseline).toFixed(3)}x the baseline`,
    `  sweep rows, default workers: ${workers.toFixed(2)} s wall -> ${(workers / baseline).toFixed(3)}x the baseline, ${(workers / oneThread).toFixed(2)}x one thread (target ≤ 10 s)`,
  );
  if (existsSync(`${root}dist/cli.js`)) {
    for (const extra of [["--workers", "1"], []] as const) {
      const r = cliOnce(extra);
      lines.push(
        `  built CLI${extra.length > 0 ? " --workers 1" : " (default workers)"}: ${r.wall.toFixed(2)} s wall` +
          (r.user !== undefined ? `, ${r.user.toFixed(2)} s user + ${(r.system ?? 0).toFixed(2)} s system CPU` : "") +
          ` -> ${(r.wall / baseline).toFixed(3)}x the in-process baseline`,
      );
    }
  } else {
    lines.push("  built CLI: dist/cli.js is missing (run `npm run build`); skipped");
  }
  lines.push(`  load average after: ${load()}`);
  return lines;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  for (const line of await runSweepBench()) console.log(line);
}
