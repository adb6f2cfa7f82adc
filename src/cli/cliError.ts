/**
 * Failures of the command-line front and their exit codes: 2 for usage and validation errors, 1 otherwise.
 * @module
 */
import { isHotjunctionError } from "../errors.js";

/** Exit code of a usage or validation error (bad argument, bad option, bad design file content). */
export const usageExitCode = 2;
/** Exit code of any other failure (unreadable file, failed write, internal error). */
export const failureExitCode = 1;

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
