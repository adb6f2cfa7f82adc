/**
 * `hotjunction compare <design.json>`: the design's reference and its `referenceAlternatives`, each on its own
 * standard resistors, against the design's margins; recommends the cheapest adequate one.
 * @module
 */
import type { Command } from "commander";
import { referenceOptionFromDesign, tripDesignFromDesign } from "../../design/designToObjects.js";
import { formatComparisonReport } from "../../report/renderComparisonReport.js";
import { compareReferences } from "../../trip/compareReferences.js";
import { _startProgress } from "../progress.js";
import { CliError } from "../cliError.js";
import {
  _addAnalysisOptions,
  _analysisSettings,
  _loadDesign,
  _methodInfo,
  type AnalysisOptionValues,
} from "../designOptions.js";
import {
  _addOutputOptions,
  _chosenFormat,
  _emitMain,
  _planCommandOutputs,
  type OutputOptionValues,
} from "../outputOptions.js";
import type { CommandContext } from "../runCli.js";

type CompareOptions = OutputOptionValues & Omit<AnalysisOptionValues, "svg">;

/** Registers the `compare` command. @internal */
export function registerCompareCommand(program: Command, context: CommandContext): Command {
  const command = program
    .command("compare")
    .description("compare the reference options of a design file (reference and referenceAlternatives)")
    .argument("<design>", "design file (JSON) with a comparator")
    .addHelpText("after", "\nExample:\n  hotjunction compare examples/reflow-oven-trip.json --markdown\n");
  _addAnalysisOptions(command, "nothing (not available for compare)");
  _addOutputOptions(command, ["json", "markdown", "csv"]);
  command.action(async (path: string, options: CompareOptions & { svg?: string }) => {
    if (options.svg !== undefined) throw new CliError("compare has no chart; use check --svg for the trip bands");
    const plan = _planCommandOutputs(context.io, options, [path]);
    const design = _loadDesign(context.io, path);
    if (design.comparator === undefined) {
      throw new CliError(`${path}: compare needs a comparator design (this one trips in firmware from an ADC)`);
    }
    const settings = _analysisSettings(design, options);
    const references = [design.reference, ...(design.referenceAlternatives ?? [])].map(referenceOptionFromDesign);
    const progress = _startProgress(context.io, "Monte Carlo");
    let comparison: ReturnType<typeof compareReferences>;
    try {
      comparison = compareReferences(tripDesignFromDesign(design), references, {
        acceptanceMethod: settings.acceptanceMethod,
        coverage: settings.coverage,
        monteCarloTrials: settings.trials,
        seed: settings.seed,
        onProgress: (fraction) => progress.update(fraction),
      });
    } finally {
      progress.stop();
    }
    await _emitMain(context.io, plan, formatComparisonReport(comparison, _chosenFormat(options), _methodInfo(settings), design.name));
  });
  return command;
}
