/**
 * Options shared by commands that print a result: output format (`--json`, `--markdown`, `--csv`), `--out FILE`,
 * `--force`, and the routine that prints or writes the result safely.
 * @module
 */
import { Option, type Command } from "commander";
import type { CliIo } from "./io.js";
import { _planOutputs, _writeOutput, type PlannedOutput } from "./writeOutput.js";

/** Output formats of a report. `text` is the terminal table (default). */
export type OutputFormat = "text" | "json" | "markdown" | "csv";

/** Parsed common output options. */
export interface OutputOptionValues {
  readonly json?: boolean;
  readonly markdown?: boolean;
  readonly csv?: boolean;
  readonly out?: string;
  readonly force?: boolean;
}

/**
 * Adds the format flags (mutually exclusive) for the formats given, plus `--out` and `--force`.
 * @internal
 */
export function _addOutputOptions(command: Command, formats: readonly Exclude<OutputFormat, "text">[]): Command {
  const descriptions: Record<Exclude<OutputFormat, "text">, string> = {
    json: "print machine-readable JSON instead of the text table",
    markdown: "print a Markdown report",
    csv: "print comma-separated values",
  };
  for (const format of formats) {
    const others = formats.filter((f) => f !== format);
    const option = new Option(`--${format}`, descriptions[format]);
    if (others.length > 0) option.conflicts(others);
    command.addOption(option);
  }
  command.option("--out <file>", "write the result to FILE (atomically) instead of standard output");
  command.option("--force", "allow --out/--svg to replace an existing file (never an input file)");
  return command;
}

/** The chosen format. @internal */
export function _chosenFormat(values: OutputOptionValues): OutputFormat {
  if (values.json === true) return "json";
  if (values.markdown === true) return "markdown";
  if (values.csv === true) return "csv";
  return "text";
}

/** A plan of where a command's outputs go, checked before any work is done. */
export interface OutputPlan {
  /** The main result's file, or undefined for standard output. */
  readonly main: PlannedOutput | undefined;
  /** Extra files (e.g. the SVG chart), in the order asked. */
  readonly extras: readonly PlannedOutput[];
}

/**
 * Checks `--out` and any extra output paths against the inputs and existing files.
 * @internal
 */
export function _planCommandOutputs(
  io: CliIo,
  values: OutputOptionValues,
  inputPaths: readonly string[],
  extraPaths: readonly string[] = [],
): OutputPlan {
  const paths = [...(values.out !== undefined ? [values.out] : []), ...extraPaths];
  const planned = _planOutputs(paths, { cwd: io.cwd, inputPaths, force: values.force === true });
  if (values.out !== undefined) return { main: planned[0], extras: planned.slice(1) };
  return { main: undefined, extras: planned };
}

/**
 * Prints the main result on standard output or writes it to the planned file.
 * @internal
 */
export async function _emitMain(io: CliIo, plan: OutputPlan, text: string): Promise<void> {
  const body = text.endsWith("\n") ? text : `${text}\n`;
  if (plan.main === undefined) {
    io.writeOut(body);
    return;
  }
  await _writeOutput(plan.main, body);
  io.writeErr(`hotjunction: wrote ${plan.main.displayPath}\n`);
}
