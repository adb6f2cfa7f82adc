/**
 * The CLI's start-up path loads only what the command uses: the built `dist/cli.js` runs under a module hook
 * that logs every module URL loaded; the source modules inside each loaded ESM chunk are read from the
 * `// src/...` markers esbuild writes. Commands other than the fast path run in the program bundle
 * `dist/cli/program.cjs`, whose loader logs the bundle's URL and whose module-start hook logs each module the
 * run starts (`bundle:<path>`, see scripts/finishProgramBundle.ts) to the same file. `emf` and `temp` must load neither the schema library (zod), the chart
 * libraries (d3), the argument parser's other commands, nor the design, trip, fault, report or uncertainty code.
 * And the fast path prints what the full parser prints, byte for byte.
 */
import { spawnSync } from "node:child_process";
import { readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { beforeAll, describe, expect, it } from "vitest";
import { _fastPathTypes } from "../../src/cli/fastPath.js";
import { _runCli } from "../../src/cli/runCli.js";
import { thermocoupleTypes } from "../../src/its90/resolveType.js";
import { distDir, ensureDist } from "../package/distBuild.js";
import { projectRoot, tempDir } from "./helpers.js";

interface Loaded {
  /** Every module URL the run loaded. */
  readonly urls: readonly string[];
  /** Source modules (`src/...`) inside the loaded dist files. */
  readonly sources: readonly string[];
  readonly status: number | null;
  readonly stdout: string;
}

let hookPath = "";

function loadedModules(args: readonly string[]): Loaded {
  const dir = tempDir();
  const log = join(dir, "modules.log");
  writeFileSync(log, "");
  const result = spawnSync(process.execPath, ["--import", hookPath, join(distDir, "cli.js"), ...args], {
    cwd: projectRoot,
    encoding: "utf8",
    env: { ...process.env, HOTJUNCTION_MODULE_LOG: log },
    timeout: 60_000,
  });
  const urls: string[] = [];
  const sources = new Set<string>();
  for (const line of readFileSync(log, "utf8").split("\n")) {
    if (line.length === 0) continue;
    if (line.startsWith("bundle:")) {
      // A module started inside the program bundle (dist/cli/program.cjs): its path, logged by the bundle's hook.
      const path = line.slice("bundle:".length);
      if (path.startsWith("src/")) sources.add(path);
      urls.push(`bundle:/${path}`);
      continue;
    }
    urls.push(line);
    // The ESM chunks name their source modules in `// src/...` lines; the program bundle names all of them, so
    // only its started modules (above) count.
    if (!line.startsWith("file:") || !line.includes("/dist/") || line.endsWith(".cjs")) continue;
    const text = readFileSync(fileURLToPath(line), "utf8");
    for (const match of text.matchAll(/^\/\/ (src\/[\w/.-]+)$/gm)) sources.add(match[1] as string);
  }
  return { urls, sources: [...sources].sort(), status: result.status, stdout: result.stdout };
}

/** Libraries and source folders `emf` and `temp` must not load. */
const forbiddenPackages = ["zod", "d3-scale", "d3-shape", "cli-progress", "decimal.js", "pure-rand", "commander"];
const forbiddenSources = [
  "src/design/",
  "src/trip/",
  "src/faults/",
  "src/report/",
  "src/chain/",
  "src/uncertainty/",
  "src/firmware/",
  "src/cli/commands/",
  "src/cli/program.ts",
];

beforeAll(() => {
  ensureDist();
  const dir = tempDir();
  hookPath = join(dir, "logModules.mjs");
  // A loader hook (node:module register) that appends every URL it loads to the log file.
  const hooks = [
    'import { appendFileSync } from "node:fs";',
    "export async function load(url, context, next) {",
    "  appendFileSync(process.env.HOTJUNCTION_MODULE_LOG, url + '\\n');",
    "  return next(url, context);",
    "}",
  ].join("\n");
  writeFileSync(join(dir, "hooks.mjs"), hooks);
  writeFileSync(hookPath, `import { register } from "node:module";\nregister(${JSON.stringify(`file://${join(dir, "hooks.mjs")}`)});\n`);
}, 300_000);

describe("start-up path of the built CLI", () => {
  it("emf and temp load the conversion code only (no zod, d3, commander, design, trip, fault or report code)", () => {
    for (const args of [["emf", "K", "500"], ["temp", "K", "20.644"], ["emf", "N", "1250", "--cold-junction", "30", "--json"]]) {
      const run = loadedModules(args);
      expect(run.status, args.join(" ")).toBe(0);
      const packages = run.urls.filter((u) => forbiddenPackages.some((p) => u.includes(`/node_modules/${p}/`)));
      expect(packages, args.join(" ")).toEqual([]);
      const sources = run.sources.filter((s) => forbiddenSources.some((f) => s.startsWith(f)));
      expect(sources, args.join(" ")).toEqual([]);
      expect(run.sources).toContain("src/its90/convert.ts");
      expect(run.urls.filter((u) => u.endsWith("/program.cjs") || u.startsWith("bundle:")), args.join(" ")).toEqual([]);
    }
  });

  it("the full parser path of emf (with --out) loads commander and emf's command only", () => {
    const dir = tempDir();
    const run = loadedModules(["emf", "K", "500", "--out", join(dir, "e.txt")]);
    expect(run.status).toBe(0);
    expect(run.urls.some((u) => u.includes("/node_modules/commander/"))).toBe(true);
    expect(run.urls.filter((u) => ["zod", "d3-scale", "d3-shape", "cli-progress"].some((p) => u.includes(`/node_modules/${p}/`)))).toEqual([]);
    const commands = run.sources.filter((s) => s.startsWith("src/cli/commands/"));
    expect(commands).toEqual(["src/cli/commands/emf.ts"]);
    // The program's --help text carries the safety caution, which lives on the ground floor (src/caution.ts).
    const heavy = run.sources.filter((s) => ["src/design/", "src/trip/", "src/faults/", "src/report/"].some((f) => s.startsWith(f)));
    expect(heavy).toEqual([]);
    expect(run.sources).toContain("src/caution.ts");
  });

  it("check loads the schema library and the trip code (the detector sees what it is looking for)", () => {
    const run = loadedModules(["check", "examples/reflow-oven-trip.json", "--trials", "200"]);
    expect(run.status).toBe(0);
    expect(run.urls.some((u) => u.includes("/node_modules/zod/"))).toBe(true);
    expect(run.sources).toContain("src/trip/designTrip.ts");
    expect(run.sources).toContain("src/design/parseDesign.ts");
    expect(run.sources.filter((s) => s.startsWith("src/cli/commands/"))).toEqual(["src/cli/commands/check.ts"]);
    expect(run.urls.some((u) => u.endsWith("/dist/cli/program.cjs"))).toBe(true);
  });
});

describe("commands load only what the run uses", () => {
  // A chart library or the progress bar loaded without --svg or without a terminal is start-up work for nothing:
  // with the chart imported statically, `check` loaded d3-scale and cli-progress on every run (this test failed
  // on that build).
  const unusedPackages = ["d3-scale", "d3-shape", "cli-progress"];
  it("check, compare and sweep without --svg, on a pipe, load no chart library, no chart code and no progress bar", () => {
    const runs = [
      ["check", "examples/reflow-oven-trip.json", "--trials", "200"],
      ["check", "examples/heated-enclosure-adc.json", "--trials", "200"],
      ["compare", "examples/reflow-oven-trip.json", "--trials", "200"],
      ["sweep", "examples/heated-enclosure-adc.json", "--from", "20", "--to", "40", "--step", "10", "--trials", "200"],
    ];
    for (const args of runs) {
      const run = loadedModules(args);
      expect(run.status, args.join(" ")).toBe(0);
      expect(run.urls.filter((u) => unusedPackages.some((p) => u.includes(`/node_modules/${p}/`))), args.join(" ")).toEqual([]);
      expect(run.sources.filter((s) => /^src\/report\/\w*Chart\.ts$/.test(s)), args.join(" ")).toEqual([]);
    }
  });

  it("--svg loads the chart code and d3 (the detector sees what it is looking for)", () => {
    const dir = tempDir();
    const run = loadedModules(["check", "examples/reflow-oven-trip.json", "--trials", "200", "--svg", join(dir, "bands.svg")]);
    expect(run.status).toBe(0);
    expect(run.urls.some((u) => u.includes("/node_modules/d3-scale/"))).toBe(true);
    expect(run.sources).toContain("src/report/tripBandChart.ts");
  });
});

describe("the emf/temp fast path", () => {
  it("knows the same thermocouple letters as the library", () => {
    expect([..._fastPathTypes].sort()).toEqual([...thermocoupleTypes].sort());
  });

  it("prints exactly what the full parser prints, for results and for errors", async () => {
    const cases: string[][] = [];
    for (const type of ["K", "J", "N", "T", "B"]) {
      cases.push(["emf", type, "500"], ["emf", type, "-100"], ["emf", type, "1e3", "--json"]);
      cases.push(["temp", type, "5.5"], ["temp", type, "5500", "--emf-unit", "uV", "--unit", "F", "--decimals", "4"]);
    }
    cases.push(
      ["emf", "K", "212", "--unit", "F", "--cold-junction", "77", "--emf-unit", "uV"],
      ["emf", "K", "500", "--decimals", "6", "--cold-junction", "-5.5"],
      ["temp", "K", "19.644", "--cold-junction", "25", "--json"],
      ["emf", "K", "5000"],
      ["temp", "K", "99"],
      ["emf", "K", "NaN"],
      ["emf", "X", "5"],
      ["emf", "K", "5", "--unit", "R"],
      ["emf", "K", "5", "--decimals", "16"],
      ["emf", "K", "5", "extra"],
      ["emf", "K", "5", "--json", "--json"],
      ["emf", "K"],
      ["emf", "K", "5", "--unknown"],
      ["temp", "K", "--help"],
      ["emf", "K", "500", "--unit=F"],
    );
    for (const args of cases) {
      const outputs = [];
      for (const fastPath of [true, false]) {
        let stdout = "";
        let stderr = "";
        const io = { writeOut: (t: string) => (stdout += t), writeErr: (t: string) => (stderr += t), stderrIsTty: false, cwd: projectRoot };
        const code = await _runCli(args, io, { fastPath });
        outputs.push({ code, stdout, stderr });
      }
      expect(outputs[0], args.join(" ")).toEqual(outputs[1]);
    }
  });
});
