// Warm in-process `designTrip` of every comparator example (its own trials and settings, as `check` runs it), with
// the worst case's fast path (the enclosure met at the per-input-extreme corners: no corner scan, no coordinate
// search) against the full search (`_worstCaseFastPath.enabled = false`), in the same process, interleaved; each
// case keeps its best of `rounds` (after one warm-up call of each). Prints times and the ratio fast / full, and the
// largest difference of the worst-case band edges between the two (it may move only within the enclosure gap).
// `npx tsx bench/worstCaseFastPath.bench.ts [rounds]`. Not a test: nothing here passes or fails on a timing.
import { readdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { loadDesignFile } from "../src/design/loadDesignFile.js";
import { tripDesignFromDesign } from "../src/design/designToObjects.js";
import { _analysisSettings } from "../src/cli/designOptions.js";
import { designTrip } from "../src/trip/designTrip.js";
import { _worstCaseFastPath } from "../src/uncertainty/_propagateWorstCase.js";

const root = fileURLToPath(new URL("..", import.meta.url));

function worstEdges(result: ReturnType<typeof designTrip>): number[] {
  const out: number[] = [];
  for (const sp of result.setpoints) {
    out.push(sp.worstCase.lowC, sp.worstCase.highC, sp.releaseWorstCase.lowC, sp.releaseWorstCase.highC);
  }
  return out;
}

/** One line per comparator example: best warm time with the fast path and with the full search, ratio. */
export function runWorstCaseFastPathBench(rounds = 3): string[] {
  const lines = [`designTrip warm, in process, best of ${rounds} interleaved rounds (${process.version}); fast path / full search`];
  for (const file of readdirSync(`${root}examples`).filter((f) => f.endsWith(".json")).sort()) {
    const design = loadDesignFile(`${root}examples/${file}`);
    if (design.comparator === undefined) continue;
    const s = _analysisSettings(design, {});
    const run = (fast: boolean) => {
      _worstCaseFastPath.enabled = fast;
      const start = process.hrtime.bigint();
      const result = designTrip(tripDesignFromDesign(design), { acceptanceMethod: s.acceptanceMethod, coverage: s.coverage, monteCarloTrials: s.trials, seed: s.seed });
      return { ms: Number(process.hrtime.bigint() - start) / 1e6, edges: worstEdges(result) };
    };
    run(true);
    run(false);
    let fast = Number.POSITIVE_INFINITY;
    let full = Number.POSITIVE_INFINITY;
    let moved = 0;
    for (let r = 0; r < rounds; r++) {
      const a = run(true);
      const b = run(false);
      fast = Math.min(fast, a.ms);
      full = Math.min(full, b.ms);
      a.edges.forEach((v, i) => (moved = Math.max(moved, Math.abs(v - (b.edges[i] as number)))));
    }
    _worstCaseFastPath.enabled = true;
    lines.push(`${file.padEnd(34)} fast ${fast.toFixed(1)} ms, full ${full.toFixed(1)} ms: ${(fast / full).toFixed(3)}x; band edges moved ≤ ${moved.toExponential(2)} °C`);
  }
  return lines;
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1]) {
  const rounds = process.argv[2] !== undefined ? Number(process.argv[2]) : 3;
  for (const line of runWorstCaseFastPathBench(rounds)) console.log(line);
}
