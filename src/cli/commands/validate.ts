/**
 * `hotjunction validate <design.json>`: checks a design file and says what it describes; with a `failureData`
 * section, also every failure-data problem at once (each with its path), the fault ids checked against the fault
 * catalogue of each channel.
 * @module
 */
import type { Command } from "commander";
import { faultsFromJson } from "../../faults/faultsFromJson.js";
import type { CommandContext } from "../commandContext.js";
import { _loadDesign } from "../designOptions.js";
import { CliError } from "../cliError.js";
import { _designFailureDataProblems, _designFaultIds } from "../../designAnalysis/designSafety.js";
import { _failureDataError } from "../faultSafety.js";
import { _readInputFile } from "../readInput.js";

/**
 * Loads a design; when it is invalid, lists every problem found on standard error (one line each: path, what was
 * expected and found) before the one-line summary the error itself prints. @internal
 */
async function _loadDesignListingProblems(context: CommandContext, path: string): ReturnType<typeof _loadDesign> {
  try {
    return await _loadDesign(context.io, path);
  } catch (error) {
    const problems = (error as { problems?: readonly { path: string; problem: string }[] }).problems;
    if (problems !== undefined && problems.length > 1) {
      context.io.writeErr(`hotjunction: ${path}: ${problems.length} problems:\n`);
      for (const p of problems) context.io.writeErr(`  ${p.path.length > 0 ? `at ${p.path}` : "(file)"}: ${p.problem}\n`);
    }
    throw error;
  }
}

/** Registers the `validate` command. @internal */
export function registerValidateCommand(program: Command, context: CommandContext): Command {
  return program
    .command("validate")
    .description("check a design file against the format (schema and cross-field rules; failure data against the fault catalogue)")
    .argument("<design>", "design file (JSON)")
    .option("--extra-faults <file>", "JSON file with more faults that failure-data modes may name (as for `faults`)")
    .action(async (path: string, options: { readonly extraFaults?: string }) => {
      const { design } = await _loadDesignListingProblems(context, path);
      const detector = design.comparator !== undefined ? "comparator (hardware) trip" : "ADC (firmware) trip";
      const count = design.setpoints.length;
      let rates = "";
      if (design.failureData !== undefined) {
        const extra = options.extraFaults === undefined ? [] : faultsFromJson(_readInputFile(context.io.cwd, options.extraFaults).text);
        const problems = _designFailureDataProblems(design, _designFaultIds(design, extra));
        if (problems.length > 0) {
          for (const p of problems.slice(1)) context.io.writeErr(`hotjunction: ${_failureDataError(path, p).message}\n`);
          const first = _failureDataError(path, problems[0] as (typeof problems)[number]);
          throw new CliError(problems.length === 1 ? first.message : `${first.message} (and ${problems.length - 1} more failure-data problem${problems.length === 2 ? "" : "s"} above)`);
        }
        const elements = design.failureData.elements.length + (design.failureData.secondChannel?.elements.length ?? 0);
        rates = `, failure data for ${elements} element${elements === 1 ? "" : "s"}${design.failureData.secondChannel !== undefined ? " in two channels" : ""}`;
      }
      context.io.writeOut(`${path}: valid design, ${detector}, ${count} setpoint${count === 1 ? "" : "s"}${rates}\n`);
    });
}
