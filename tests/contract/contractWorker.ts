/**
 * Worker-thread entry of the contract test: builds the exports under test (harvesting the documented examples),
 * then runs the exports it is given in order and posts each export's outcome. The host (contract.test.ts) watches
 * the shared progress memory and stops this worker when a call overstays its budget.
 */
import { parentPort, workerData } from "node:worker_threads";
import { exportsUnderTest, ProgressWriter, runExport, type ContractSettings } from "./contractRun.js";

interface Job {
  readonly settings: ContractSettings;
  readonly progress: SharedArrayBuffer;
  /** This worker runs the exports `from`, `from + step`, `from + 2·step` … */
  readonly from: number;
  readonly step: number;
  /** For the first export: serial numbers up to this one were run before (a restart after a stopped call). */
  readonly skipThrough: number;
}

const job = workerData as Job;
const port = parentPort!;
const underTest = await exportsUnderTest();
port.postMessage({ kind: "ready", count: underTest.length, targets: underTest.map((u) => u.target) });
const progress = new ProgressWriter(job.progress);
for (let index = job.from; index < underTest.length; index += job.step) {
  const outcome = await runExport(underTest[index]!, index, job.settings, progress, index === job.from ? job.skipThrough : -1);
  port.postMessage({ kind: "export", outcome });
}
port.postMessage({ kind: "done" });
