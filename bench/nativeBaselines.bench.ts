/**
 * The physical limit of bulk conversion: our `Float64Array` paths (the WebAssembly SIMD kernel of
 * `hotjunction/bulk` and the root entry's JavaScript loops) against small C loops of the same work, compiled
 * here with gcc -O3 -march=native -ffp-contract=off (no fused multiply-add, so the forward loop is the same
 * arithmetic and the same bits as ours) into a temporary directory, each kernel file linked with the one timing
 * harness `bench/c/harness.c`. Skipped with a note when gcc is missing. Rounds interleave JavaScript and C (C runs as a child process between the JavaScript rounds);
 * each side keeps its best round. Targets (issue 16): bulk forward ≤ 1.5× the C forward loop, bulk exact
 * inverse ≤ 3× the C loop of the published approximate inverse. A third line gives the memory floor: a C copy loop
 * over the same arrays (`bench/c/copy.c`), the same through a 32 KiB buffer (`bench/c/chunkCopy.c`), and our chunk
 * copies into the kernel's memory and back with no kernel call, so the kernel's own share is the difference. Not a
 * test: nothing passes or fails on a timing.
 * Run: `npx tsx bench/nativeBaselines.bench.ts [rounds]` (default 9; part of `npm run bench`).
 * @module
 */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { bulkBackend, emfFromTemperatureArray as wasmForward, temperatureFromEmfArray as wasmInverse } from "../src/bulk/index.js";
import { _bulkKernel, _CHUNK_ELEMENTS, _views } from "../src/bulk/wasmKernel.js";
import { emfFromTemperatureArray, temperatureFromEmfArray } from "../src/index.js";

const here = fileURLToPath(new URL(".", import.meta.url));

function bestNsPerElement(n: number, rounds: number, f: () => void): number {
  let best = Infinity;
  for (let r = 0; r < rounds; r++) {
    const start = process.hrtime.bigint();
    f();
    best = Math.min(best, Number(process.hrtime.bigint() - start));
  }
  return best / n;
}

/** The C forward loop written in JavaScript (same coefficients, same order): what plain JavaScript reaches. */
function bareForward(t: Float64Array, e: Float64Array): void {
  const c = [-0.017600413686, 0.038921204975, 1.8558770032e-5, -9.9457592874e-8, 3.1840945719e-10, -5.6072844889e-13, 5.6075059059e-16, -3.2020720003e-19, 9.7151147152e-23, -1.2104721275e-26];
  for (let i = 0; i < t.length; i++) {
    const x = t[i] as number;
    let acc = c[9] as number;
    for (let k = 8; k >= 0; k--) acc = acc * x + (c[k] as number);
    const d = x - 126.9686;
    e[i] = acc + 0.1185976 * Math.exp(-0.0001183432 * d * d);
  }
}

/**
 * hotjunction/bulk's chunk copies alone: each chunk into the kernel's memory and back out, as the bulk functions do
 * around a kernel call, with no kernel call (what moving the arrays costs us; compare the C copy loop).
 */
function chunkCopies(input: Float64Array, out: Float64Array): void {
  const k = _bulkKernel();
  if (k === null) return;
  const base = k.chunk / 8;
  for (let start = 0; start < input.length; start += _CHUNK_ELEMENTS) {
    const m = Math.min(_CHUNK_ELEMENTS, input.length - start);
    _views(k).f64.set(input.subarray(start, start + m), base);
    out.set(k.f64.subarray(base, base + m), start);
  }
}

/** Runs the comparison; returns the report lines. */
export function runNativeBaselinesBench(n = 1_000_000, rounds = 9): string[] {
  const gcc = spawnSync("gcc", ["--version"], { encoding: "utf8" });
  if (gcc.status !== 0) return ["native baselines: skipped (gcc not found; install gcc to compare with compiled C)"];
  const dir = mkdtempSync(join(tmpdir(), "hotjunction-native-"));
  try {
    const flags = ["-O3", "-march=native", "-ffp-contract=off", "-std=c99"];
    const forwardBin = join(dir, "forward");
    const inverseBin = join(dir, "approxInverse");
    const copyBin = join(dir, "copy");
    const chunkCopyBin = join(dir, "chunkCopy");
    const harness = join(here, "c", "harness.c");
    execFileSync("gcc", [...flags, "-o", forwardBin, harness, join(here, "c", "forward.c"), "-lm"]);
    execFileSync("gcc", [...flags, "-o", inverseBin, harness, join(here, "c", "approxInverse.c"), "-lm"]);
    execFileSync("gcc", [...flags, "-o", copyBin, harness, join(here, "c", "copy.c"), "-lm"]);
    execFileSync("gcc", [...flags, "-o", chunkCopyBin, harness, join(here, "c", "chunkCopy.c"), "-lm"]);
    const temps = new Float64Array(n).map((_, i) => (1372 * i) / n);
    const emfs = new Float64Array(n).map((_, i) => (54.886 * i) / n + 1e-9);
    const out = new Float64Array(n);
    // The same EMFs in a scrambled order (a fixed linear congruential shuffle): neighbours rarely share a segment,
    // so the kernel gathers each lane's coefficients instead of loading them once for a run.
    const shuffled = emfs.slice();
    for (let i = n - 1, seed = 12345; i > 0; i--) {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      const j = seed % (i + 1);
      [shuffled[i], shuffled[j]] = [shuffled[j] as number, shuffled[i] as number];
    }
    const c = (bin: string): number => Number(execFileSync(bin, [String(n), "3"], { encoding: "utf8" }).split(" ")[0]);
    let jsForward = Infinity;
    let cForward = Infinity;
    let bare = Infinity;
    let jsInverse = Infinity;
    let cInverse = Infinity;
    let wasmF = Infinity;
    let wasmI = Infinity;
    let cCopy = Infinity;
    let cChunkCopy = Infinity;
    let wasmShuffled = Infinity;
    let copies = Infinity;
    emfFromTemperatureArray("K", temps, out);
    temperatureFromEmfArray("K", emfs, out);
    wasmForward("K", temps, out);
    wasmInverse("K", emfs, out);
    for (let r = 0; r < rounds; r++) {
      wasmF = Math.min(wasmF, bestNsPerElement(n, 3, () => wasmForward("K", temps, out)));
      jsForward = Math.min(jsForward, bestNsPerElement(n, 3, () => emfFromTemperatureArray("K", temps, out)));
      cForward = Math.min(cForward, c(forwardBin));
      bare = Math.min(bare, bestNsPerElement(n, 3, () => bareForward(temps, out)));
      wasmI = Math.min(wasmI, bestNsPerElement(n, 3, () => wasmInverse("K", emfs, out)));
      jsInverse = Math.min(jsInverse, bestNsPerElement(n, 3, () => temperatureFromEmfArray("K", emfs, out)));
      cInverse = Math.min(cInverse, c(inverseBin));
      cCopy = Math.min(cCopy, c(copyBin));
      cChunkCopy = Math.min(cChunkCopy, c(chunkCopyBin));
      wasmShuffled = Math.min(wasmShuffled, bestNsPerElement(n, 3, () => wasmInverse("K", shuffled, out)));
      copies = Math.min(copies, bestNsPerElement(n, 3, () => chunkCopies(emfs, out)));
    }
    const ns = (x: number): string => `${x.toFixed(2)} ns`;
    const ratio = (x: number, base: number): string => `${(x / base).toFixed(2)}x`;
    return [
      `native baselines (gcc ${gcc.stdout.split("\n")[0]?.split(" ").pop()}, ${flags.join(" ")}; ${n.toLocaleString("en")} elements, best of ${rounds} interleaved rounds; hotjunction/bulk backend: ${bulkBackend()})`,
      `  bulk forward, type K 0-1372 °C, C ${ns(cForward)} per element: hotjunction/bulk ${ns(wasmF)} -> ${ratio(wasmF, cForward)} (target ≤ 1.5x); root entry (JavaScript) ${ns(jsForward)} -> ${ratio(jsForward, cForward)}; the C loop written in plain JavaScript ${ns(bare)} -> ${ratio(bare, cForward)}`,
      `  bulk exact inverse vs C published approximate inverse ${ns(cInverse)}: hotjunction/bulk ${ns(wasmI)} -> ${ratio(wasmI, cInverse)} (target ≤ 3x); root entry (JavaScript) ${ns(jsInverse)} -> ${ratio(jsInverse, cInverse)}; hotjunction/bulk on the same EMFs scrambled ${ns(wasmShuffled)} -> ${ratio(wasmShuffled, cInverse)}`,
      `  memory floor: C copy loop over the same arrays ${ns(cCopy)} (the C approximate inverse ${ratio(cInverse, cCopy)} of it), through a 32 KiB buffer with memcpy ${ns(cChunkCopy)}; hotjunction/bulk's chunk copies in and out alone ${ns(copies)}, leaving ${ns(wasmI - copies)} per element for the kernel`,
    ];
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const rounds = Number(process.argv[2] ?? 9);
  for (const line of runNativeBaselinesBench(1_000_000, rounds)) console.log(line);
}
