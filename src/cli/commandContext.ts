/**
 * What every command registration receives (its own module, so that the commands and the program import it
 * without importing the entry that loads them).
 * @module
 */
import type { CliIo } from "./io.js";

/** What every command registration receives. */
export interface CommandContext {
  readonly io: CliIo;
  /** Exit code of a command that completed (0 unless it sets another, e.g. a design failing its margins). */
  readonly outcome?: { exitCode: number };
}
