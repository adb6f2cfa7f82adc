/**
 * Options shared by commands that print a result: output format (`--json`, `--markdown`, `--csv`, and `--html`
 * wherever Markdown is offered: the Markdown report as a self-contained HTML document), `--out FILE`,
 * `--force`, and the routine that prints or writes the result safely.
 * @module
 */
import { Option, type Command } from "commander";
import type { CliIo } from "./io.js";
import type { InputIdentity } from "./readInput.js";
import { markdownToHtmlDocument } from "./markdownHtml.js";
import { _planOutputs, _writeOutputs, type PlannedOutput } from "./writeOutput.js";

/** Output formats of a report. `text` is the terminal table (default). */
export type OutputFormat = "text" | "json" | "markdown" | "csv";

/** Parsed common output options. */
export interface OutputOptionValues {
  readonly json?: boolean;
  readonly markdown?: boolean;
  readonly csv?: boolean;
  /** The Markdown report as a self-contained HTML document. */
  readonly html?: boolean;
  readonly out?: string;
  readonly force?: boolean;
}

/**
 * Adds the format flags (mutually exclusive) for the formats given, plus `--out` and `--force` (whose help names
 * `--svg` only when the command has it).
 * @internal
 */
export function _addOutputOptions(
  command: Command,
  formats: readonly Exclude<OutputFormat, "text">[],
  hasSvg: boolean = false,
): Command {
  const descriptions: Record<Exclude<OutputFormat, "text">, string> = {
    json: "print machine-readable JSON instead of the text table",
    markdown: "print a Markdown report",
    csv: "print comma-separated values",
  };
  const flags: string[] = [...formats, ...(formats.includes("markdown") ? ["html"] : [])];
  for (const format of flags) {
    const others = flags.filter((f) => f !== format);
    const option = new Option(`--${format}`, format === "html" ? "print the report as a self-contained HTML document (styles inline, no script)" : descriptions[format as Exclude<OutputFormat, "text">]);
    if (others.length > 0) option.conflicts(others);
    command.addOption(option);
  }
  command.option("--out <file>", "write the result to FILE (atomically) instead of standard output");
  command.option(
    "--force",
    `allow ${hasSvg ? "--out/--svg" : "--out"} to replace an existing regular file (never an input, a link or a device)`,
  );
  return command;
}

/** The chosen format. @internal */
export function _chosenFormat(values: OutputOptionValues): OutputFormat {
  if (values.json === true) return "json";
  // HTML is the Markdown report in a document (see _emitOutputs).
  if (values.markdown === true || values.html === true) return "markdown";
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
 * Writes a command's results once everything is computed: the files (`--out` and the extras, e.g. `--svg`) all or
 * nothing, checked again at this moment against the inputs as read; then the main result on standard output when
 * no `--out` was given.
 * @param extras - contents of `plan.extras`, in the same order
 * @internal
 */
export function _emitOutputs(
  io: CliIo,
  plan: OutputPlan,
  values: OutputOptionValues,
  mainText: string,
  extras: readonly string[] = [],
  inputs: readonly InputIdentity[] = [],
): void {
  const text = values.html === true ? markdownToHtmlDocument(mainText) : mainText;
  const body = text.endsWith("\n") ? text : `${text}\n`;
  if (extras.length !== plan.extras.length) throw new Error("internal: one content per extra output expected");
  const files = [
    ...(plan.main !== undefined ? [{ output: plan.main, content: body }] : []),
    ...plan.extras.map((output, i) => ({ output, content: extras[i] as string })),
  ];
  if (files.length > 0) {
    _writeOutputs(files, { inputs, force: values.force === true, hooks: io.writeHooks });
    for (const file of files) io.writeErr(`hotjunction: wrote ${file.output.displayPath}\n`);
  }
  if (plan.main === undefined) io.writeOut(body);
}
