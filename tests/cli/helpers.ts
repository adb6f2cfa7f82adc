import { spawnSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { runCli } from "../../src/cli/runCli.js";
import type { WriteHooks } from "../../src/cli/writeOutput.js";

export const projectRoot = fileURLToPath(new URL("../..", import.meta.url));

/** Runs the CLI in-process with captured streams (and, for fault injection, hooks into the output writes). */
export async function run(
  args: string[],
  cwd: string = projectRoot,
  writeHooks?: WriteHooks,
): Promise<{ code: number; stdout: string; stderr: string }> {
  let stdout = "";
  let stderr = "";
  const code = await runCli(args, {
    writeOut: (t) => (stdout += t),
    writeErr: (t) => (stderr += t),
    stderrIsTty: false,
    cwd,
    ...(writeHooks !== undefined ? { writeHooks } : {}),
  });
  return { code, stdout, stderr };
}

/** Asserts a one-line error on standard error (`hotjunction: ...\n`). */
export function oneLine(stderr: string): string {
  const lines = stderr.split("\n");
  if (lines.length !== 2 || lines[1] !== "" || !stderr.startsWith("hotjunction: ")) {
    throw new Error(`expected one line "hotjunction: ...", found ${JSON.stringify(stderr)}`);
  }
  return lines[0] as string;
}

/** Runs the real binary entry through tsx in a child process. */
export function spawnCli(args: string[], cwd: string = projectRoot): { code: number | null; stdout: string; stderr: string } {
  const result = spawnSync(process.execPath, ["--import", "tsx", join(projectRoot, "src/cli/main.ts"), ...args], {
    cwd,
    encoding: "utf8",
    env: { ...process.env, NO_COLOR: "1" },
    timeout: 60_000,
  });
  return { code: result.status, stdout: result.stdout, stderr: result.stderr };
}

export function tempDir(): string {
  return mkdtempSync(join(tmpdir(), "hotjunction-cli-"));
}
