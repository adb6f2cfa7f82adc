/**
 * `hotjunction workbench [design.json]`: writes the workbench page, one self-contained HTML file that runs the
 * library in a browser (opened from disk, no network), optionally opening with a given design.
 * @module
 */
import { existsSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { Command } from "commander";
import { withInitialDesign } from "../workbenchPageFile.js";
import { CliError } from "../cliError.js";
import { _emitOutputs, _planCommandOutputs } from "../outputOptions.js";
import { _readInputFile } from "../readInput.js";
import type { CommandContext } from "../commandContext.js";

interface WorkbenchOptions {
  readonly out?: string;
  readonly force?: boolean;
}

/** Where the built page may be: beside the CLI bundle (`dist/`), or in `dist/` when the CLI runs from its sources. */
const pageCandidates = ["./workbench.html", "../workbench.html", "../../dist/workbench.html", "../../../dist/workbench.html"];

/** The built page's text. @internal */
export function _workbenchPage(): string {
  for (const candidate of pageCandidates) {
    const path = fileURLToPath(new URL(candidate, import.meta.url));
    if (existsSync(path)) return readFileSync(path, "utf8");
  }
  throw new CliError("the workbench page is not built (run `npm run build`, which writes dist/workbench.html)");
}

/** Registers the `workbench` command. @internal */
export function registerWorkbenchCommand(program: Command, context: CommandContext): Command {
  const command = program
    .command("workbench")
    .description("write the workbench page: edit a design in a browser and watch its trip bands, offline (one HTML file)")
    .argument("[design]", "design file (JSON) the page opens with (default: the first example)")
    .option("--out <file>", "write the page to FILE", "workbench.html")
    .option("--force", "allow --out to replace an existing file (never an input file)")
    .addHelpText(
      "after",
      "\nOpen the written file in a browser (file://); it makes no network request.\n\nExamples:\n  hotjunction workbench\n  hotjunction workbench kiln.json --out kiln-workbench.html\n",
    );
  command.action(async (path: string | undefined, options: WorkbenchOptions) => {
    const values = { out: options.out ?? "workbench.html", ...(options.force === true ? { force: true } : {}) };
    const plan = _planCommandOutputs(context.io, values, path !== undefined ? [path] : []);
    let page = _workbenchPage();
    const inputs = [];
    if (path !== undefined) {
      const file = _readInputFile(context.io.cwd, path);
      const { parseDesign } = await import("../../design/parseDesign.js");
      parseDesign(file.text, { fileName: path });
      page = withInitialDesign(page, file.text, path);
      inputs.push(file.identity);
    }
    _emitOutputs(context.io, plan, values, page, [], inputs);
  });
  return command;
}
