/**
 * The `faults` command file, registered on a bare program here (wiring it into runCli belongs to the CLI area).
 */
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { Command } from "commander";
import { describe, expect, it } from "vitest";
import { registerFaultsCommand } from "../../src/cli/commands/faults.js";

const root = fileURLToPath(new URL("../..", import.meta.url));

async function run(args: string[]): Promise<string> {
  let out = "";
  const io = { writeOut: (t: string) => (out += t), writeErr: () => undefined, stderrIsTty: false, cwd: root };
  const program = new Command("hotjunction").exitOverride();
  registerFaultsCommand(program, { io });
  await program.parseAsync(["node", "hotjunction", ...args]);
  return out;
}

describe("faults command", () => {
  it("text report of a comparator design carries the caution", async () => {
    const out = await run(["faults", "examples/reflow-oven-trip.json", "--bias", "pull-up", "--step", "2"]);
    expect(out).toContain("Single-fault review: Reflow and curing oven trip");
    expect(out).toMatch(/thermocouple\.open\s+safe, undetected\s+trips immediately/);
    expect(out).toContain("CAUTION: These numbers do not certify a safety function.");
  });

  it("JSON of an ADC design, with detection options and extra faults from a file", async () => {
    const dir = mkdtempSync(join(tmpdir(), "hotjunction-faults-"));
    const extra = join(dir, "extra.json");
    writeFileSync(
      extra,
      JSON.stringify([{ id: "mux.stuck", element: "multiplexer", description: "input multiplexer stuck on a grounded channel", effects: [{ kind: "override-node", node: "amplifierInput", millivolts: 0 }] }]),
    );
    const out = await run(["faults", "examples/heated-enclosure-adc.json", "--json", "--supervisor-independent", "--extra-faults", extra, "--output-stage", "de-energize-to-trip"]);
    const data = JSON.parse(out) as { reviews: { rows: { faultId: string; category: string }[] }[] };
    const rows = data.reviews[0]?.rows ?? [];
    expect(rows.find((r) => r.faultId === "mux.stuck")?.category).toBe("dangerous-detected");
    expect(rows.find((r) => r.faultId === "board.supplyLost")?.category).toMatch(/^safe-/);
  });

  it("takes bias, output stage and detection from the design's protection section; options override it", async () => {
    // examples/ceramic-kiln-cutout.json states pull-up bias and de-energize-to-trip (our own demo design).
    // Common practice, no source: with pull-up bias an open thermocouple reads high and trips (safe); with
    // de-energize-to-trip, loss of the board supply trips (safe); with pull-down bias the open loop never trips.
    const fromFile = JSON.parse(await run(["faults", "examples/ceramic-kiln-cutout.json", "--json", "--step", "5"])) as {
      reviews: { rows: { faultId: string; category: string }[] }[];
    };
    const rows = fromFile.reviews[0]?.rows ?? [];
    expect(rows.find((r) => r.faultId === "thermocouple.open")?.category).toMatch(/^safe-/);
    expect(rows.find((r) => r.faultId === "board.supplyLost")?.category).toMatch(/^safe-/);
    const overridden = JSON.parse(
      await run(["faults", "examples/ceramic-kiln-cutout.json", "--json", "--step", "5", "--bias", "pull-down", "--output-stage", "energize-to-trip"]),
    ) as { reviews: { rows: { faultId: string; category: string }[] }[] };
    const rows2 = overridden.reviews[0]?.rows ?? [];
    expect(rows2.find((r) => r.faultId === "thermocouple.open")?.category).toMatch(/^dangerous-/);
    expect(rows2.find((r) => r.faultId === "board.supplyLost")?.category).toMatch(/^dangerous-/);
  });

  it("rejects a malformed pair", async () => {
    await expect(run(["faults", "examples/reflow-oven-trip.json", "--rails", "5"])).rejects.toThrow(/two numbers/);
  });
});
