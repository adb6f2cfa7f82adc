/**
 * Safe output files: written atomically (a temporary file renamed into place, so a reader never sees half a
 * file), never over an input file, never over an existing file unless the user said `--force`.
 * @module
 */
import { lstatSync, realpathSync, statSync, type Stats } from "node:fs";
import { basename, dirname, resolve } from "node:path";
import writeFileAtomic from "write-file-atomic";
import { CliError, failureExitCode, usageExitCode } from "./cliError.js";

/** Options of {@link _planOutputs}. */
export interface PlanOutputsOptions {
  /** Directory relative paths are resolved from. */
  readonly cwd: string;
  /** Paths of every file the command reads; no output may resolve to one of them. */
  readonly inputPaths: readonly string[];
  /** Replace existing files (never an input). */
  readonly force: boolean;
}

/** One checked output: the path as the user wrote it and where it lands. */
export interface PlannedOutput {
  readonly displayPath: string;
  readonly absolutePath: string;
}

interface FileIdentity {
  readonly realPath: string;
  readonly stats: Stats | undefined;
}

function identify(absolutePath: string): FileIdentity {
  try {
    return { realPath: realpathSync(absolutePath), stats: statSync(absolutePath) };
  } catch {
    // Not there (yet): compare through the real parent directory, so `dir/../x` and symlinked folders still match.
    let parent: string;
    try {
      parent = realpathSync(dirname(absolutePath));
    } catch {
      parent = dirname(absolutePath);
    }
    return { realPath: resolve(parent, basename(absolutePath)), stats: undefined };
  }
}

function sameFile(a: FileIdentity, b: FileIdentity): boolean {
  if (a.realPath === b.realPath) return true;
  // Hard links: the same inode on the same device.
  return a.stats !== undefined && b.stats !== undefined && a.stats.dev === b.stats.dev && a.stats.ino === b.stats.ino;
}

/**
 * Checks every output path before anything is computed or written: refuses an output that is an input (even with
 * `--force`), two outputs that are the same file, a directory, a missing directory, or an existing file without
 * `--force`.
 * @throws CliError with exit code 2 naming the path and the reason
 * @internal
 */
export function _planOutputs(outputPaths: readonly string[], options: PlanOutputsOptions): PlannedOutput[] {
  const inputs = options.inputPaths.map((p) => ({ display: p, id: identify(resolve(options.cwd, p)) }));
  const planned: { output: PlannedOutput; id: FileIdentity }[] = [];
  for (const displayPath of outputPaths) {
    if (displayPath.length === 0) throw new CliError("output path is empty", usageExitCode);
    const absolutePath = resolve(options.cwd, displayPath);
    const id = identify(absolutePath);
    for (const input of inputs) {
      if (sameFile(id, input.id)) {
        throw new CliError(
          `refusing to write ${displayPath}: it is the input file ${input.display}; choose another output path`,
          usageExitCode,
        );
      }
    }
    for (const earlier of planned) {
      if (sameFile(id, earlier.id)) {
        throw new CliError(
          `refusing to write ${displayPath}: the same file is also given as ${earlier.output.displayPath}`,
          usageExitCode,
        );
      }
    }
    let exists = false;
    let isDirectory = false;
    try {
      const link = lstatSync(absolutePath);
      exists = true;
      isDirectory = id.stats?.isDirectory() ?? link.isDirectory();
    } catch {
      exists = false;
    }
    if (isDirectory) throw new CliError(`cannot write ${displayPath}: it is a directory`, usageExitCode);
    if (exists && !options.force) {
      throw new CliError(`refusing to overwrite ${displayPath}: it exists (add --force to replace it)`, usageExitCode);
    }
    if (!exists) {
      let parentOk = false;
      try {
        parentOk = statSync(dirname(absolutePath)).isDirectory();
      } catch {
        parentOk = false;
      }
      if (!parentOk) {
        throw new CliError(`cannot write ${displayPath}: directory ${dirname(displayPath)} does not exist`, usageExitCode);
      }
    }
    planned.push({ output: { displayPath, absolutePath }, id });
  }
  return planned.map((p) => p.output);
}

/**
 * Writes a planned output atomically (temporary file, fsync, rename).
 * @throws CliError with exit code 1 when the write fails; the previous file, if any, is left as it was
 * @internal
 */
export async function _writeOutput(output: PlannedOutput, content: string): Promise<void> {
  try {
    await writeFileAtomic(output.absolutePath, content, { encoding: "utf8" });
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    throw new CliError(`cannot write ${output.displayPath}: ${reason}`, failureExitCode);
  }
}
