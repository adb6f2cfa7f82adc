/**
 * Failures of the command-line front and their exit codes (one table, {@link exitCodes}, printed by `--help` and
 * in the README).
 * @module
 */
import { isHotjunctionError } from "../errors.js";

/** Exit code of a usage or validation error (bad argument, bad option, bad design file content, refused output). */
export const usageExitCode = 2;
/** Exit code of any other failure (unreadable or special input file, failed write, internal error). */
export const failureExitCode = 1;
/** Exit code of `check`, `compare` and `runaway` when the design fails its margins (turned off by `--report-only`). */
export const marginFailExitCode = 3;

/** Every exit code of the CLI and what it means. */
export const exitCodes: readonly { readonly code: number; readonly meaning: string }[] = [
  { code: 0, meaning: "success (check/compare/runaway: the design keeps its margins, or --report-only)" },
  {
    code: 1,
    meaning: "a file could not be read or written (missing, not a regular file, full disk, permission) or an internal error",
  },
  {
    code: 2,
    meaning: "usage or validation error: bad argument or option, invalid design file, output refused (exists, input, link, device)",
  },
  { code: 3, meaning: "check/compare/runaway: the design fails its margins, with dynamics by its runaway peak (the report is still printed or written)" },
];

/** The exit-code table as `--help` prints it. @internal */
export const _exitCodeHelp: string = ["Exit codes:", ...exitCodes.map((e) => `  ${e.code}  ${e.meaning}`)].join("\n");

/**
 * A failure the CLI reports as one line `hotjunction: <message>` with a chosen exit code.
 * @internal
 */
export class CliError extends Error {
  override readonly name = "CliError";
  readonly exitCode: number;
  constructor(message: string, exitCode: number = usageExitCode) {
    super(message);
    this.exitCode = exitCode;
  }
}

/** Collapses a message to one line (newlines and runs of blanks become one space). */
export function _oneLine(text: string): string {
  return text.replace(/\s*[\r\n]+\s*/g, " ").replace(/[ \t]{2,}/g, " ").trim();
}

/**
 * Turns anything thrown into the one line and exit code the CLI reports.
 * Errors of the library's family are validation errors (exit 2): they come from values the user gave.
 * @internal
 */
export function _describeFailure(error: unknown): { message: string; exitCode: number } {
  if (error instanceof CliError) return { message: _oneLine(error.message), exitCode: error.exitCode };
  if (isHotjunctionError(error)) return { message: _oneLine(error.message), exitCode: usageExitCode };
  if (error instanceof Error) {
    const code = (error as NodeJS.ErrnoException).code;
    const prefix = typeof code === "string" && code.length > 0 ? `${code}: ` : "";
    const text = error.message.startsWith(prefix) ? error.message : `${prefix}${error.message}`;
    return { message: _oneLine(text.length > 0 ? text : error.name), exitCode: failureExitCode };
  }
  return { message: _oneLine(`unexpected failure: ${String(error)}`), exitCode: failureExitCode };
}

/**
 * Writes a failure as one line on standard error (`hotjunction: <message>`) and returns its exit code: the CLI
 * entry's last word, and the program bundle's (`_programBundle.ts`), whose error classes are its own copies.
 * @internal
 */
export function _reportFailure(error: unknown, io: { readonly writeErr: (text: string) => void }): number {
  const failure = _describeFailure(error);
  io.writeErr(`hotjunction: ${failure.message}\n`);
  return failure.exitCode;
}
