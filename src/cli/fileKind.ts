/**
 * What a path that is not a regular file is, in words (the CLI's reads and writes refuse such paths).
 * @module
 */
import type { Stats } from "node:fs";

/** What kind of thing that is not a regular file a stat or lstat found. @internal */
export function _fileKind(stats: Stats): string {
  if (stats.isSymbolicLink()) return "a symbolic link";
  if (stats.isFIFO()) return "a FIFO";
  if (stats.isCharacterDevice()) return "a character device";
  if (stats.isBlockDevice()) return "a block device";
  if (stats.isDirectory()) return "a directory";
  if (stats.isSocket()) return "a socket";
  return "not a regular file";
}
