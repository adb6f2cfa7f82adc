/**
 * The commander program: the command tree, each command's code loaded when it runs, and commander's own errors
 * turned into one line. Loaded by runCli only when the start-up fast path does not answer.
 * @module
 */
import { Command, CommanderError } from "commander";
import { CAUTION_TEXT } from "../caution.js";
import { _exitCodeHelp, _oneLine, usageExitCode } from "./cliError.js";
import type { CliIo } from "./io.js";
import type { CommandContext } from "./commandContext.js";
import { _packageVersion } from "./version.js";

/** Adds one command to the program and returns it. */
type Registration = (program: Command, context: CommandContext) => Command;

/**
 * Every command, in the order `--help` lists them, each with the loader of its code. A command's module (and
 * what it imports: the design schema library, the trip and fault code, the chart code) is loaded only when that
 * command runs, so `hotjunction emf K 500` loads the conversion code and the argument parser and nothing else.
 */
// Deliberately alike: one line per command; each import() names its own file literally so the build splits it.
const commandLoaders: readonly (readonly [string, () => Promise<Registration>])[] = [
  ["emf", async () => (await import("./commands/emf.js")).registerEmfCommand],
  ["temp", async () => (await import("./commands/temp.js")).registerTempCommand],
  ["ref-table", async () => (await import("./commands/refTable.js")).registerRefTableCommand],
  ["table", async () => (await import("./commands/table.js")).registerTableCommand],
  ["validate", async () => (await import("./commands/validate.js")).registerValidateCommand],
  ["check", async () => (await import("./commands/check.js")).registerCheckCommand],
  ["compare", async () => (await import("./commands/compare.js")).registerCompareCommand],
  ["sweep", async () => (await import("./commands/sweep.js")).registerSweepCommand],
  ["faults", async () => (await import("./commands/faults.js")).registerFaultsCommand],
  ["runaway", async () => (await import("./commands/runaway.js")).registerRunawayCommand],
  ["schema", async () => (await import("./commands/schema.js")).registerSchemaCommand],
  ["workbench", async () => (await import("./commands/workbench.js")).registerWorkbenchCommand],
  ["starter", async () => (await import("./commands/starter.js")).registerStarterCommand],
];

/** Names of every command. @internal */
export const _commandNames: readonly string[] = commandLoaders.map(([name]) => name);

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
 * Builds the program. With `only`, just that command is loaded and registered (the others cannot run in this
 * invocation); without it, every command (for the overview `--help`, `--version` and suggestions on a typo).
 * @internal
 */
export async function _createProgram(
  io: CliIo,
  only?: string,
  outcome: { exitCode: number } = { exitCode: 0 },
): Promise<Command> {
  const program = new Command("hotjunction");
  program
    .description(
      "Thermocouple conversion per ITS-90, measurement-chain error budgets and over-temperature trip design.",
    )
    .version(_packageVersion, "-V, --version", "print the version")
    .helpOption("-h, --help", "show help")
    .addHelpCommand(false)
    .addHelpText("after", `\n${_exitCodeHelp}\nCaution: ${CAUTION_TEXT}\n`);
  configure(program, io);
  const context: CommandContext = { io, outcome };
  const chosen = only === undefined ? commandLoaders : commandLoaders.filter(([name]) => name === only);
  const registrations = await Promise.all(chosen.map(([, load]) => load()));
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
 * Parses and runs a command line with commander; returns the exit code, or throws what a command threw.
 * @internal
 */
export async function _runProgram(argv: readonly string[], io: CliIo): Promise<number> {
  const first = argv[0] as string;
  const outcome = { exitCode: 0 };
  try {
    const program = await _createProgram(io, _commandNames.includes(first) ? first : undefined, outcome);
    await program.parseAsync([...argv], { from: "user" });
    return outcome.exitCode;
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
    throw error;
  }
}
