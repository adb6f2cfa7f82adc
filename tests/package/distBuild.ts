/**
 * Shared by the package tests: makes sure `dist/` holds a build of the current sources, and packs the package.
 *
 * `npm test` builds right before vitest runs, so there this only checks. When a package test runs alone and
 * `dist/` is missing, it builds once with tsup; a lock directory keeps parallel test files from building at the
 * same time. A `dist/` older than the sources is not rebuilt here (run `npm run build`): the tests that compare
 * the build with the sources then fail and say so.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdirSync, rmdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

/** Absolute path of the project folder. */
export const projectDir: string = join(dirname(fileURLToPath(import.meta.url)), "..", "..");
/** Absolute path of `dist/`. */
export const distDir: string = join(projectDir, "dist");
/** The command that runs npm on this platform. */
export const npmCommand: string = process.platform === "win32" ? "npm.cmd" : "npm";

function distIsPresent(): boolean {
  return existsSync(join(distDir, "index.js")) && existsSync(join(distDir, "cli.js"));
}

function sleep(milliseconds: number): void {
  Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, milliseconds);
}

/** Builds `dist/` with tsup unless it is present. */
export function ensureDist(): void {
  if (distIsPresent()) return;
  const lockDir = join(projectDir, ".tmp", "dist-build.lock");
  mkdirSync(dirname(lockDir), { recursive: true });
  const deadline = Date.now() + 240_000;
  for (;;) {
    try {
      mkdirSync(lockDir);
      break;
    } catch {
      if (Date.now() > deadline) throw new Error(`gave up waiting for the build lock ${lockDir}`);
      sleep(500);
    }
  }
  try {
    if (distIsPresent()) return;
    const result = spawnSync("npx", ["tsup"], { cwd: projectDir, encoding: "utf8" });
    if (result.status !== 0) {
      throw new Error(`tsup build failed:\n${result.stdout}\n${result.stderr}`);
    }
  } finally {
    rmdirSync(lockDir);
  }
}

/** Packs the package into `destinationDir` (never into the project) and returns the tarball's path. */
export function packInto(destinationDir: string): string {
  const output = execFileSync(
    npmCommand,
    ["pack", "--json", "--ignore-scripts", "--pack-destination", destinationDir],
    { cwd: projectDir, encoding: "utf8" },
  );
  const packed = JSON.parse(output.slice(output.search(/^\[/m))) as { filename: string }[];
  const filename = packed[0]?.filename;
  if (filename === undefined) throw new Error("npm pack reported no tarball");
  return join(destinationDir, filename);
}
