// `check` and `compare` of every example design (their own 20,000 Monte Carlo trials) against a bare `node -e 0`
// and the CLI's own start (`emf K 500`), in the same run, interleaved, each process timed from spawn to exit.
// The CLI's code cache (src/cli/_compileCache.ts) lives in a temporary directory of this run and is warm (the
// first, untimed round writes it), as on a user's machine from the second run of a command on; `check` also
// runs with the cache turned off (HOTJUNCTION_NO_CACHE=1), the first run after an install or an upgrade.
// Reports the medians, the work beyond start-up (median minus the baseline's median) and the ratio; target
// (issue 16): at most 150 ms of work beyond start-up for `check`. Needs `npm run build` first.
// `npx tsx bench/cliCommands.bench.ts [runs]`. Not a test: nothing here passes or fails on a timing.
import { spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, readdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL("..", import.meta.url));
const cli = `${root}dist/cli.js`;

interface Case {
  readonly name: string;
  readonly args: readonly string[];
  readonly env?: Readonly<Record<string, string>>;
}

let cacheDir = "";

function timeOnce(args: readonly string[], env: Readonly<Record<string, string>> = {}): number {
  const start = process.hrtime.bigint();
  const result = spawnSync(process.execPath, [...args], { cwd: root, stdio: ["ignore", "ignore", "pipe"], env: { ...process.env, HOTJUNCTION_CACHE_DIR: cacheDir, ...env } });
  const ms = Number(process.hrtime.bigint() - start) / 1e6;
  // check/compare exit 3 when a design fails its margins (the kiln example's dynamics): still a full run.
  if (result.status !== 0 && result.status !== 3) throw new Error(`${args.join(" ")} exited ${result.status}: ${String(result.stderr)}`);
  return ms;
}

function median(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? (sorted[mid] as number) : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

/** Runs the cases interleaved `runs` times; returns one line per case. */
export function runCliCommandsBench(runs = 7, budgetMs = 150): string[] {
  if (!existsSync(cli)) return ["CLI commands: dist/cli.js is missing (run `npm run build`); skipped"];
  const examples = readdirSync(`${root}examples`).filter((f) => f.endsWith(".json")).sort();
  const baseline: Case = { name: "node -e 0", args: ["-e", "0"] };
  const start: Case = { name: "hotjunction emf K 500", args: [cli, "emf", "K", "500"] };
  const cases: Case[] = [];
  for (const e of examples) {
    cases.push({ name: `check ${e}`, args: [cli, "check", `examples/${e}`] });
    cases.push({ name: `check ${e} (no code cache)`, args: [cli, "check", `examples/${e}`], env: { HOTJUNCTION_NO_CACHE: "1" } });
    cases.push({ name: `compare ${e}`, args: [cli, "compare", `examples/${e}`] });
  }
  const all = [baseline, start, ...cases];
  const times = all.map(() => [] as number[]);
  cacheDir = mkdtempSync(join(tmpdir(), "hotjunction-bench-cache-"));
  try {
    for (const c of all) timeOnce(c.args, c.env); // warm the file cache and write the code cache
    for (let r = 0; r < runs; r++) all.forEach((c, i) => times[i]?.push(timeOnce(c.args, c.env)));
  } finally {
    rmSync(cacheDir, { recursive: true, force: true });
  }
  const base = median(times[0] as number[]);
  const cliStart = median(times[1] as number[]);
  const lines = [
    `CLI commands (${runs} interleaved runs each, spawn to exit, medians; ${process.version}; code cache warm unless said)`,
    `${baseline.name.padEnd(46)} ${base.toFixed(1)} ms`,
    `${start.name.padEnd(46)} ${cliStart.toFixed(1)} ms (${(cliStart / base).toFixed(2)}x)`,
  ];
  cases.forEach((c, i) => {
    const m = median(times[i + 2] as number[]);
    const beyond = m - base;
    lines.push(
      `${c.name.padEnd(46)} ${m.toFixed(1)} ms: ${(m / base).toFixed(2)}x node -e 0, ${beyond.toFixed(0)} ms beyond it, ` +
        `${(m - cliStart).toFixed(0)} ms beyond the CLI's own start` +
        (c.name.startsWith("check") && c.env === undefined ? ` (budget ${budgetMs} ms beyond start-up: ${beyond <= budgetMs ? "meets" : "MISSES"})` : ""),
    );
  });
  return lines;
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1]) {
  const runs = process.argv[2] !== undefined ? Number(process.argv[2]) : 7;
  for (const line of runCliCommandsBench(runs)) console.log(line);
}
