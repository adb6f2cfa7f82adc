/**
 * The CLI's side of the fault review with failure data: a failure-data problem as a one-line error with the file
 * name. The review and the safety figures themselves are library code (designAnalysis/designSafety.ts).
 * @module
 */
import type { HotjunctionError } from "../errors.js";
import { CliError } from "./cliError.js";

/** One failure-data problem as a one-line CLI error with the file and the path. @internal */
export function _failureDataError(fileName: string, e: HotjunctionError): CliError {
  const prefix = `failure data: ${e.quantity} `;
  const problem = e.message.startsWith(prefix) ? e.message.slice(prefix.length) : e.message;
  return new CliError(`${fileName}: at ${e.quantity}: ${problem}`);
}
