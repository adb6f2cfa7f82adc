/**
 * Reading a design file from disk (Node): checks it is a regular file within the size cap before reading,
 * decodes strict UTF-8, then {@link parseDesign}. Reads only; never changes any file.
 * @module
 */
import { closeSync, fstatSync, openSync, readSync } from "node:fs";
import { basename } from "node:path";
import { HotjunctionTypeError, _requireOptionsObject } from "../errors.js";
import { DesignFileError } from "./designFileError.js";
import type { DesignFile } from "./designSchema.js";
import { designFileMaxBytes, parseDesign } from "./parseDesign.js";

/** Options of {@link loadDesignFile}. */
export interface LoadDesignFileOptions {
  /** Name shown in messages. Default: the path as given. */
  readonly fileName?: string;
}

// Deliberately alike: src/cli/readInput.ts (`_readInputFile`) reads a file with the same steps and throws the
// CLI's errors; this entry may not import the CLI, and its errors are DesignFileError.
/**
 * Loads and validates a design file.
 * @param path - path of a JSON design file (at most 1 MiB)
 * @param options - `fileName` for messages
 * @returns the design, typed
 * @throws DesignFileError with a one-line message (missing file, not a file, too large, not UTF-8, invalid)
 * @example
 * ```ts
 * import { loadDesignFile } from "hotjunction/design";
 * try { loadDesignFile("no-such-design.json"); } catch (e) { console.log((e as Error).message); } // "no-such-design.json: cannot read: no such file"
 * ```
 */
export function loadDesignFile(path: string, options: LoadDesignFileOptions = {}): DesignFile {
  if (typeof path !== "string" || path.length === 0) {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "design file path", value: path, context: "loadDesignFile", problem: "is not a non-empty string" });
  }
  _requireOptionsObject(options, "loadDesignFile", false);
  const fileName = options.fileName ?? (path.length > 0 ? path : basename(path));
  let fd: number;
  try {
    fd = openSync(path, "r");
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    const reason =
      code === "ENOENT" ? "no such file" : code === "EACCES" || code === "EPERM" ? "permission denied" : (code ?? "unreadable");
    throw new DesignFileError({ fileName, path: "", problem: `cannot read: ${reason}` });
  }
  let bytes: Buffer;
  try {
    const stats = fstatSync(fd);
    if (!stats.isFile()) throw new DesignFileError({ fileName, path: "", problem: "cannot read: not a regular file" });
    if (stats.size > designFileMaxBytes) {
      throw new DesignFileError({ fileName, path: "", problem: `file is larger than ${designFileMaxBytes} bytes (1 MiB)` });
    }
    // Read at most one byte past the cap, whatever the size said (the file may grow while we read).
    const buffer = Buffer.alloc(designFileMaxBytes + 1);
    let length = 0;
    for (;;) {
      const n = readSync(fd, buffer, length, buffer.length - length, null);
      if (n === 0) break;
      length += n;
      if (length > designFileMaxBytes) {
        throw new DesignFileError({ fileName, path: "", problem: `file is larger than ${designFileMaxBytes} bytes (1 MiB)` });
      }
    }
    bytes = buffer.subarray(0, length);
  } catch (error) {
    if (error instanceof DesignFileError) throw error;
    const code = (error as NodeJS.ErrnoException).code;
    throw new DesignFileError({ fileName, path: "", problem: `cannot read: ${code ?? String(error)}` });
  } finally {
    closeSync(fd);
  }
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new DesignFileError({ fileName, path: "", problem: "not UTF-8 text" });
  }
  return parseDesign(text, { fileName });
}
