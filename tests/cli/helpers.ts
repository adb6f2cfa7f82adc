import { spawnSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { runCli } from "../../src/cli/runCli.js";

export const projectRoot = fileURLToPath(new URL("../..", import.meta.url));

/** Runs the CLI in-process with captured streams. */
export async function run(args: string[], cwd: string = projectRoot): Promise<{ code: number; stdout: string; stderr: string }> {
  let stdout = "";
  let stderr = "";
  const code = await runCli(args, {
    writeOut: (t) => (stdout += t),
    writeErr: (t) => (stderr += t),
    stderrIsTty: false,
    cwd,
  });
  return { code, stdout, stderr };
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
