/**
 * The command-line program: builds the commander tree and runs it, turning every failure into one line on
 * standard error (`hotjunction: <message>`) and an exit code (2 usage/validation, 1 otherwise, 0 success).
 * @module
 */
import { Command, CommanderError } from "commander";
import { CAUTION_TEXT } from "../caution.js";
import { _describeFailure, _oneLine, usageExitCode } from "./cliError.js";
import type { CliIo } from "./io.js";
import { registerEmfCommand } from "./commands/emf.js";
import { registerRefTableCommand } from "./commands/refTable.js";
import { registerTempCommand } from "./commands/temp.js";
import { registerCheckCommand } from "./commands/check.js";
import { registerCompareCommand } from "./commands/compare.js";
import { registerSchemaCommand } from "./commands/schema.js";
import { registerSweepCommand } from "./commands/sweep.js";
import { registerTableCommand } from "./commands/table.js";
import { registerValidateCommand } from "./commands/validate.js";
import { registerFaultsCommand } from "./commands/faults.js";
import { _packageVersion } from "./version.js";

/** What every command registration receives. */
export interface CommandContext {
  readonly io: CliIo;
}

function configure(command: Command, io: CliIo): void {
  command.exitOverride();
  command.configureOutput({
    writeOut: (text) => io.writeOut(text),
    writeErr: (text) => io.writeErr(text),
    // Commander's own error text is reported by runCli as one line; suppress its multi-line print.
    outputError: () => undefined,
  });
  command.showSuggestionAfterError(true);
  command.allowExcessArguments(false);
}

/**
 * Builds the program with all commands.
 * @internal
 */
export function _createProgram(io: CliIo): Command {
  const program = new Command("hotjunction");
  program
    .description(
      "Thermocouple conversion per ITS-90, measurement-chain error budgets and over-temperature trip design.",
    )
    .version(_packageVersion, "-V, --version", "print the version")
    .helpOption("-h, --help", "show help")
    .addHelpCommand(false)
    .addHelpText("after", `\nCaution: ${CAUTION_TEXT}\n`);
  configure(program, io);
  const context: CommandContext = { io };
  const registrations = [
    registerEmfCommand,
    registerTempCommand,
    registerRefTableCommand,
    registerTableCommand,
    registerValidateCommand,
    registerCheckCommand,
    registerCompareCommand,
    registerSweepCommand,
    registerFaultsCommand,
    registerSchemaCommand,
  ];
  for (const register of registrations) {
    const command = register(program, context);
    configure(command, io);
  }
  return program;
}

function commanderMessage(error: CommanderError): string {
  return _oneLine(error.message.replace(/^error:\s*/i, ""));
}

/**
 * Runs the CLI with arguments (without `node` and the script path) and returns the exit code.
 * Never throws.
 */
export async function runCli(argv: readonly string[], io: CliIo): Promise<number> {
  try {
    if (argv.length === 0) {
      io.writeErr("hotjunction: no command given; run `hotjunction --help` for the list of commands\n");
      return usageExitCode;
    }
    const program = _createProgram(io);
    await program.parseAsync([...argv], { from: "user" });
    return 0;
  } catch (error) {
    if (error instanceof CommanderError) {
      if (
        error.code === "commander.helpDisplayed" ||
        error.code === "commander.version" ||
        error.code === "commander.help"
      ) {
        return error.exitCode === 0 ? 0 : usageExitCode;
      }
      io.writeErr(`hotjunction: ${commanderMessage(error)}\n`);
      return usageExitCode;
    }
    const failure = _describeFailure(error);
    io.writeErr(`hotjunction: ${failure.message}\n`);
    return failure.exitCode;
  }
}
