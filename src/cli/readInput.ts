/**
 * Reading the files a command takes as input: only regular files (a FIFO, a device or a directory is refused
 * before it is opened, and the open never blocks), at most a size cap, strict UTF-8; the file's identity (device
 * and inode) is kept so the writer can check at write time that no output lands on an input.
 * @module
 */
import { _fileKind } from "./fileKind.js";
import { closeSync, constants, fstatSync, openSync, readSync, statSync, type Stats } from "node:fs";
import { resolve } from "node:path";
import { CliError, failureExitCode, usageExitCode } from "./cliError.js";

/** Where an input file was when it was read. */
export interface InputIdentity {
  /** The path as the user wrote it. */
  readonly displayPath: string;
  /** Absolute path (not resolved through symlinks). */
  readonly absolutePath: string;
  /** Device and inode of the file that was read. */
  readonly dev: number;
  readonly ino: number;
}

/** An input file's text and identity. */
export interface InputFile {
  readonly text: string;
  readonly identity: InputIdentity;
}

/** Largest input the CLI reads, bytes (the design-file cap, 1 MiB). */
export const inputMaxBytes = 1_048_576;


function reasonOf(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  if (code === "ENOENT") return "no such file";
  if (code === "EACCES" || code === "EPERM") return "permission denied";
  if (code === "ENOTDIR") return "a folder on the path is not a directory";
  return code ?? String(error);
}

// Deliberately alike: src/design/loadDesignFile.ts reads a file with the same steps (one open descriptor, a
// regular-file check on it, a size cap, strict UTF-8); each throws its own family (CliError with exit codes here,
// DesignFileError there) and the design entry may not import the CLI.
/**
 * Reads an input file given on the command line.
 * @param cwd - directory relative paths are resolved from
 * @param displayPath - the path as given (shown in messages)
 * @throws CliError exit 1 when the file cannot be read (missing, permission, not a regular file, changed while
 *   opening, larger than the cap); exit 2 when its bytes are not UTF-8 (content the user must fix)
 * @internal
 */
export function _readInputFile(cwd: string, displayPath: string): InputFile {
  const absolutePath = resolve(cwd, displayPath);
  const cannot = (reason: string): CliError => new CliError(`${displayPath}: cannot read: ${reason}`, failureExitCode);
  let before: Stats;
  try {
    before = statSync(absolutePath);
  } catch (error) {
    throw cannot(reasonOf(error));
  }
  if (!before.isFile()) throw cannot(`it is ${_fileKind(before)}, not a regular file`);
  let fd: number;
  try {
    // O_NONBLOCK: should a FIFO be swapped in after the check, opening it returns at once instead of waiting.
    fd = openSync(absolutePath, constants.O_RDONLY | constants.O_NONBLOCK | constants.O_NOCTTY);
  } catch (error) {
    throw cannot(reasonOf(error));
  }
  let bytes: Buffer;
  let stats: Stats;
  try {
    stats = fstatSync(fd);
    if (!stats.isFile()) throw cannot(`it is ${_fileKind(stats)}, not a regular file`);
    if (stats.dev !== before.dev || stats.ino !== before.ino) throw cannot("the file was replaced while it was opened");
    if (stats.size > inputMaxBytes) throw cannot(`it is larger than ${inputMaxBytes} bytes (1 MiB)`);
    const buffer = Buffer.alloc(inputMaxBytes + 1);
    let length = 0;
    for (;;) {
      const n = readSync(fd, buffer, length, buffer.length - length, null);
      if (n === 0) break;
      length += n;
      if (length > inputMaxBytes) throw cannot(`it is larger than ${inputMaxBytes} bytes (1 MiB)`);
    }
    bytes = buffer.subarray(0, length);
  } catch (error) {
    if (error instanceof CliError) throw error;
    throw cannot(reasonOf(error));
  } finally {
    closeSync(fd);
  }
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new CliError(`${displayPath}: not UTF-8 text`, usageExitCode);
  }
  return { text, identity: { displayPath, absolutePath, dev: stats.dev, ino: stats.ino } };
}
