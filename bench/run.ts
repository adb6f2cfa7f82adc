// Runs every benchmark of the project in one process and prints the figures as ratios to baselines measured
// in the same run. `npm run bench`. Not a test: nothing here passes or fails on a timing.
import { runIts90Bench } from "./its90.bench.js";
import { runMonteCarloBench } from "./monteCarlo.bench.js";
import { runFirmwareBench } from "./firmwareTables.bench.js";
import { runCliStartBench } from "./cliStart.bench.js";
import { runCliCommandsBench } from "./cliCommands.bench.js";
import { runSweepBench } from "./sweep.bench.js";
import { runDynamicsBench } from "./dynamics.bench.js";
import { runNativeBaselinesBench } from "./nativeBaselines.bench.js";

console.log(`hotjunction benchmarks, Node ${process.version}, ${new Date().toISOString()}\n`);
for (const line of await runIts90Bench()) console.log(line);
console.log("");
// The bulk paths against compiled C (gcc; skipped with a note without it).
for (const line of runNativeBaselinesBench()) console.log(line);
console.log("");
await runMonteCarloBench();
console.log("");
for (const line of await runFirmwareBench()) console.log(line);
console.log("");
for (const line of runCliStartBench()) console.log(line);
console.log("");
for (const line of runCliCommandsBench()) console.log(line);
console.log("");
for (const line of await runSweepBench()) console.log(line);
console.log("");
for (const line of await runDynamicsBench()) console.log(line);
