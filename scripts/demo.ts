/**
 * `npm run demo`: runs the example designs through the CLI in-process (from src, no build needed), prints the
 * reports and writes the SVG charts into out/ (replacing earlier demo charts there). `check`, `compare` and `runaway` run
 * with --report-only: the demo shows reports, including options that fail their margins, and is not a CI gate.
 * The last run shows the safety figures (λ by class, SFF, DC, PFDavg/PFH for 1oo1 and the 1oo2 pair, the PFDavg
 * chart) on `examples/kiln-two-channel-cutout.json`, whose failure rates are invented for the demo.
 */
import { mkdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { _processIo } from "../src/cli/io.js";
import { runCli } from "../src/cli/runCli.js";

const root = fileURLToPath(new URL("..", import.meta.url));
process.chdir(root);
mkdirSync("out", { recursive: true });
const io = { ..._processIo(), cwd: root };

const runs: string[][] = [
  ["check", "examples/ceramic-kiln-cutout.json", "--svg", "out/ceramic-kiln-trip-bands.svg", "--force", "--report-only"],
  ["compare", "examples/ceramic-kiln-cutout.json", "--report-only"],
  // The kiln states invented dynamics: its static bands pass, but the slowest unit's runaway peak at stoneware
  // passes the hazard limit (check folds that into its verdict; runaway shows it alone and draws the chart).
  ["runaway", "examples/ceramic-kiln-cutout.json", "--svg", "out/ceramic-kiln-runaway.svg", "--force", "--report-only"],
  ["check", "examples/reflow-oven-trip.json", "--svg", "out/reflow-oven-trip-bands.svg", "--force", "--report-only"],
  ["compare", "examples/reflow-oven-trip.json", "--svg", "out/reflow-oven-references.svg", "--force", "--report-only"],
  ["check", "examples/heated-enclosure-adc.json", "--svg", "out/heated-enclosure-trip-bands.svg", "--force", "--report-only"],
  ["sweep", "examples/heated-enclosure-adc.json", "--from", "0", "--to", "150", "--step", "10", "--svg", "out/heated-enclosure-error-sweep.svg", "--force"],
  ["sweep", "examples/ceramic-kiln-cutout.json", "--from", "900", "--to", "1275", "--step", "25", "--svg", "out/ceramic-kiln-error-sweep.svg", "--force"],
  ["faults", "examples/ceramic-kiln-cutout.json"],
  ["faults", "examples/reflow-oven-trip.json"],
  ["faults", "examples/heated-enclosure-adc.json"],
  // Safety figures from invented failure data (marked so in the file's notes), with a second, firmware channel as 1oo2.
  ["faults", "examples/kiln-two-channel-cutout.json", "--svg", "out/kiln-two-channel-pfdavg.svg", "--force"],
  // The wire matters here: a long extension cable along a warm furnace shell, a terminal block warmer than the
  // cold-junction sensor, bias and detection currents through a filtered loop, leakage and ageing.
  ["check", "examples/heat-treat-furnace-wire.json", "--svg", "out/heat-treat-furnace-trip-bands.svg", "--force", "--report-only"],
  ["sweep", "examples/heat-treat-furnace-wire.json", "--from", "600", "--to", "900", "--step", "50", "--svg", "out/heat-treat-furnace-error-sweep.svg", "--force"],
  ["faults", "examples/heat-treat-furnace-wire.json"],
];

let failures = 0;
for (const args of runs) {
  process.stdout.write(`\n$ hotjunction ${args.join(" ")}\n\n`);
  const code = await runCli(args, io);
  if (code !== 0) failures++;
}
process.stdout.write(`\nCharts written to ${root}out/\n`);
process.exitCode = failures === 0 ? 0 : 1;
