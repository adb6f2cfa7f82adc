/**
 * The command-line program's entry: answers `emf`/`temp` with plain arguments on a fast path, otherwise loads
 * the commander program (src/cli/program.ts; in the built CLI the program bundle `dist/cli/program.cjs`, through
 * `_programLoader.ts` and its compile cache); turns every failure into one line on standard error
 * (`hotjunction: <message>`) and an exit code (the table in cliError.ts, printed by `--help`).
 * @module
 */
import { _reportFailure, usageExitCode } from "./cliError.js";
import { _tryFastPath } from "./fastPath.js";
import type { CliIo } from "./io.js";


/** Options of {@link _runCli}. @internal */
export interface RunCliOptions {
  /** Answer plain `emf`/`temp` calls without the full parser. Default true. */
  readonly fastPath?: boolean;
}

/**
 * Runs the CLI with arguments (without `node` and the script path) and returns the exit code.
 * Never throws.
 */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  return _runCli(argv, io, {});
}

/** {@link runCli} with the fast path switchable (tests compare both paths). @internal */
export async function _runCli(argv: readonly string[], io: CliIo, options: RunCliOptions): Promise<number> {
  try {
    if (argv.length === 0) {
      io.writeErr("hotjunction: no command given; run `hotjunction --help` for the list of commands\n");
      return usageExitCode;
    }
    if (options.fastPath !== false) {
      const code = await _tryFastPath(argv, io);
      if (code !== undefined) return code;
    }
    const { _runProgramOnce } = await import("./_programLoader.js");
    return await _runProgramOnce(argv, io);
  } catch (error) {
    return _reportFailure(error, io);
  }
}
