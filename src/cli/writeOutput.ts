/**
 * Safe output files, written with plain `fs` primitives.
 *
 * - Every output is first written in full to a temporary file created exclusively (`O_EXCL | O_NOFOLLOW`) in the
 *   target's folder: all bytes (a loop over short writes), `fsync`, then the size on disk is compared with the
 *   bytes meant.
 * - Only when every output of the command is staged are the targets checked again, at that moment: an output may
 *   not be an input (device and inode of every input as read and as it is now), a symbolic link, or anything but a
 *   regular file; an existing file is replaced only with `--force`.
 * - Then each temporary file takes its name: without `--force` by a hard link that fails if the name exists
 *   (or, where hard links are not supported, an exclusive create of the name first), with `--force` by a rename.
 *   If a later output fails, the earlier ones are rolled back (the previous file comes back from a hard-linked
 *   backup). Any failure removes the temporary files and leaves every previous file as it was.
 * @module
 */
import { _fileKind } from "./fileKind.js";
import {
  chmodSync,
  closeSync,
  constants,
  fstatSync,
  fsyncSync,
  linkSync,
  lstatSync,
  openSync,
  realpathSync,
  renameSync,
  statSync,
  unlinkSync,
  writeSync,
  type Stats,
} from "node:fs";
import { randomBytes } from "node:crypto";
import { basename, dirname, join, resolve } from "node:path";
import { CliError, failureExitCode, usageExitCode } from "./cliError.js";
import type { InputIdentity } from "./readInput.js";

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

/**
 * Points where tests reach into a write: a replacement for `fs.writeSync` (short writes, a full disk) and
 * callbacks between the stages (to swap a symlink in while the command runs).
 * @internal
 */
export interface WriteHooks {
  /** Called instead of `fs.writeSync(fd, buffer, offset, length)` for every chunk; returns the bytes written. */
  readonly write?: (fd: number, buffer: Uint8Array, offset: number, length: number) => number;
  /** Called once every output is staged in its temporary file, before the targets are checked again. */
  readonly beforeCommit?: () => void;
  /** Called after the targets were checked again, before the first one is replaced. */
  readonly afterVerify?: () => void;
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


function lstatOrUndefined(path: string): Stats | undefined {
  try {
    return lstatSync(path);
  } catch {
    return undefined;
  }
}

/**
 * Checks every output path before anything is computed: refuses an output that is an input (even with `--force`),
 * two outputs that are the same file, anything that exists and is not a regular file (a directory, a device, a
 * FIFO, a symbolic link), a missing directory, or an existing file without `--force`. The same checks run again at
 * write time ({@link _writeOutputs}); this early pass only saves a long computation that could not be written.
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
    const link = lstatOrUndefined(absolutePath);
    if (link !== undefined && link.isDirectory()) throw new CliError(`cannot write ${displayPath}: it is a directory`, usageExitCode);
    if (link !== undefined && !link.isFile()) {
      throw new CliError(`refusing to write ${displayPath}: it is ${_fileKind(link)}, not a regular file`, usageExitCode);
    }
    if (link !== undefined && !options.force) {
      throw new CliError(`refusing to overwrite ${displayPath}: it exists (add --force to replace it)`, usageExitCode);
    }
    if (link === undefined) {
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

/** One output and the text it receives. */
export interface OutputContent {
  readonly output: PlannedOutput;
  readonly content: string;
}

/** Options of {@link _writeOutputs}. */
export interface WriteOutputsOptions {
  /** Every file the command read, as read. */
  readonly inputs: readonly InputIdentity[];
  /** Replace existing regular files. */
  readonly force: boolean;
  readonly hooks?: WriteHooks | undefined;
}

function errnoText(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  const messages: Record<string, string> = {
    ENOSPC: "no space left on the device (ENOSPC)",
    EDQUOT: "disk quota exceeded (EDQUOT)",
    EACCES: "permission denied (EACCES)",
    EPERM: "operation not permitted (EPERM)",
    EROFS: "read-only file system (EROFS)",
    EIO: "input/output error (EIO)",
  };
  if (typeof code === "string" && messages[code] !== undefined) return messages[code];
  if (typeof code === "string") return code;
  return error instanceof Error ? error.message : String(error);
}

function temporaryName(target: string, what: string): string {
  return join(dirname(target), `.${basename(target)}.${what}-${process.pid}-${randomBytes(6).toString("hex")}`);
}

function removeQuietly(path: string): void {
  try {
    unlinkSync(path);
  } catch {
    // Already gone.
  }
}

/** Writes all of `bytes` to a new temporary file beside the target; returns its path. */
function stage(entry: OutputContent, hooks: WriteHooks | undefined): string {
  const bytes = Buffer.from(entry.content, "utf8");
  const write = hooks?.write ?? ((fd: number, buffer: Uint8Array, offset: number, length: number) => writeSync(fd, buffer, offset, length));
  const temp = temporaryName(entry.output.absolutePath, "tmp");
  let fd: number | undefined;
  try {
    fd = openSync(temp, constants.O_WRONLY | constants.O_CREAT | constants.O_EXCL | constants.O_NOFOLLOW, 0o666);
    let offset = 0;
    while (offset < bytes.length) {
      const n = write(fd, bytes, offset, bytes.length - offset);
      if (!Number.isInteger(n) || n <= 0) {
        throw new CliError(`cannot write ${entry.output.displayPath}: the device took no more bytes after ${offset} of ${bytes.length}; nothing was written`, failureExitCode);
      }
      offset += n;
    }
    fsyncSync(fd);
    const size = fstatSync(fd).size;
    if (size !== bytes.length) {
      throw new CliError(`cannot write ${entry.output.displayPath}: ${size} bytes reached the disk of ${bytes.length}; nothing was written`, failureExitCode);
    }
    closeSync(fd);
    fd = undefined;
    return temp;
  } catch (error) {
    if (fd !== undefined) {
      try {
        closeSync(fd);
      } catch {
        // Closing a file that failed to write may fail too; the file is removed below.
      }
    }
    removeQuietly(temp);
    if (error instanceof CliError) throw error;
    throw new CliError(`cannot write ${entry.output.displayPath}: ${errnoText(error)}; nothing was written`, failureExitCode);
  }
}

/** The targets checked again at the moment of writing. */
function verify(entries: readonly OutputContent[], options: WriteOutputsOptions): boolean[] {
  const inputIds: { display: string; dev: number; ino: number }[] = [];
  for (const input of options.inputs) {
    inputIds.push({ display: input.displayPath, dev: input.dev, ino: input.ino });
    try {
      const now = statSync(input.absolutePath);
      inputIds.push({ display: input.displayPath, dev: now.dev, ino: now.ino });
    } catch {
      // The input is gone now: only its identity as read counts.
    }
  }
  return entries.map(({ output }) => {
    const link = lstatOrUndefined(output.absolutePath);
    if (link === undefined) return false;
    const suffix = "while the command ran; nothing was written";
    let followed: Stats | undefined;
    try {
      followed = statSync(output.absolutePath);
    } catch {
      followed = undefined;
    }
    for (const candidate of [link, followed]) {
      if (candidate === undefined) continue;
      const input = inputIds.find((i) => i.dev === candidate.dev && i.ino === candidate.ino);
      if (input !== undefined) {
        throw new CliError(`refusing to write ${output.displayPath}: it became the input file ${input.display} ${suffix}`, usageExitCode);
      }
    }
    if (!link.isFile()) {
      throw new CliError(`refusing to write ${output.displayPath}: it became ${_fileKind(link)} ${suffix}`, usageExitCode);
    }
    if (!options.force) {
      throw new CliError(`refusing to overwrite ${output.displayPath}: it was created ${suffix} (add --force to replace it)`, usageExitCode);
    }
    return true;
  });
}

interface Committed {
  readonly target: string;
  /** Hard link to the previous file, when there was one. */
  readonly backup: string | undefined;
}

function linkSupported(error: unknown): boolean {
  const code = (error as NodeJS.ErrnoException).code;
  return !(code === "EPERM" || code === "ENOTSUP" || code === "EOPNOTSUPP" || code === "EMLINK" || code === "ENOSYS");
}

/** Gives the staged temporary file the target's name. */
function commitOne(entry: OutputContent, temp: string, existed: boolean, force: boolean): Committed {
  const target = entry.output.absolutePath;
  if (!force || !existed) {
    // The name must still be free: a hard link (or an exclusive create) fails if anything took it meanwhile.
    try {
      linkSync(temp, target);
      removeQuietly(temp);
      return { target, backup: undefined };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === "EEXIST") {
        throw new CliError(`refusing to overwrite ${entry.output.displayPath}: it was created while the command ran; nothing was written`, usageExitCode);
      }
      if (linkSupported(error)) throw error;
    }
    const fd = openSync(target, constants.O_WRONLY | constants.O_CREAT | constants.O_EXCL | constants.O_NOFOLLOW, 0o666);
    closeSync(fd);
    renameSync(temp, target);
    return { target, backup: undefined };
  }
  // The replacement keeps the permission bits of the file it replaces.
  try {
    chmodSync(temp, statSync(target).mode & 0o7777);
  } catch {
    // The default mode of a new file is kept.
  }
  let backup: string | undefined = temporaryName(target, "old");
  try {
    linkSync(target, backup);
  } catch {
    backup = undefined;
  }
  try {
    renameSync(temp, target);
  } catch (error) {
    if (backup !== undefined) removeQuietly(backup);
    throw error;
  }
  return { target, backup };
}

function syncDirectory(path: string): void {
  try {
    const fd = openSync(path, constants.O_RDONLY);
    try {
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
  } catch {
    // Some file systems do not sync directories; the files themselves are synced.
  }
}

/**
 * Writes every output of a command, all or nothing (see the module description).
 * @throws CliError exit 1 when a write fails (full disk, short write, permissions), exit 2 when a target became an
 *   input, a link or a special file, or appeared without `--force`, while the command ran; in every case no
 *   previous file is changed and no temporary file is left
 * @internal
 */
export function _writeOutputs(entries: readonly OutputContent[], options: WriteOutputsOptions): void {
  const staged: string[] = [];
  const committed: Committed[] = [];
  try {
    for (const entry of entries) staged.push(stage(entry, options.hooks));
    options.hooks?.beforeCommit?.();
    const existed = verify(entries, options);
    options.hooks?.afterVerify?.();
    entries.forEach((entry, i) => {
      committed.push(commitOne(entry, staged[i] as string, existed[i] as boolean, options.force));
    });
  } catch (error) {
    for (const done of committed.reverse()) {
      try {
        if (done.backup !== undefined) renameSync(done.backup, done.target);
        else unlinkSync(done.target);
      } catch {
        // Best effort: the message below still says the command failed.
      }
    }
    for (const temp of staged) removeQuietly(temp);
    if (error instanceof CliError) throw error;
    const display = entries.map((e) => e.output.displayPath).join(", ");
    throw new CliError(`cannot write ${display}: ${errnoText(error)}; nothing was written`, failureExitCode);
  }
  for (const done of committed) if (done.backup !== undefined) removeQuietly(done.backup);
  for (const dir of new Set(entries.map((e) => dirname(e.output.absolutePath)))) syncDirectory(dir);
}
