/**
 * The CLI's connection to the outside world, passed in so commands can run in-process in tests.
 * @module
 */
import type { WriteHooks } from "./writeOutput.js";

/** Where a CLI run writes and how it reads its surroundings. */
export interface CliIo {
  /** Writes text to standard output as given (the caller adds newlines). */
  readonly writeOut: (text: string) => void;
  /** Writes text to standard error as given. */
  readonly writeErr: (text: string) => void;
  /** Whether standard error is a terminal (progress bars are shown only then). */
  readonly stderrIsTty: boolean;
  /** Directory relative paths are resolved from. */
  readonly cwd: string;
  /** Test hooks into output writes (short writes, races); absent in real runs. @internal */
  readonly writeHooks?: WriteHooks;
}

/** The real process streams. */
export function _processIo(): CliIo {
  return {
    writeOut: (text) => {
      process.stdout.write(text);
    },
    writeErr: (text) => {
      process.stderr.write(text);
    },
    stderrIsTty: process.stderr.isTTY === true,
    cwd: process.cwd(),
  };
}
