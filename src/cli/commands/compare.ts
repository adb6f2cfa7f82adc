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
import { CliError, marginFailExitCode } from "../cliError.js";
import {
  _addAnalysisOptions,
  _addReportOnlyOption,
  _analysisSettings,
  _loadDesign,
  _methodInfo,
  type AnalysisOptionValues,
} from "../designOptions.js";
import {
  _addOutputOptions,
  _chosenFormat,
  _emitOutputs,
  _planCommandOutputs,
  type OutputOptionValues,
} from "../outputOptions.js";
import type { CommandContext } from "../runCli.js";

type CompareOptions = OutputOptionValues & Omit<AnalysisOptionValues, "svg"> & { readonly reportOnly?: boolean };

/** Registers the `compare` command. @internal */
export function registerCompareCommand(program: Command, context: CommandContext): Command {
  const command = program
    .command("compare")
    .description("compare the reference options of a design file (reference and referenceAlternatives)")
    .argument("<design>", "design file (JSON) with a comparator")
    .addHelpText("after", "\nExample:\n  hotjunction compare examples/reflow-oven-trip.json --markdown\n");
  // No --svg yet: the chart of the options' bands side by side is still to come (check --svg draws one design's).
  _addAnalysisOptions(command, undefined);
  _addOutputOptions(command, ["json", "markdown", "csv"]);
  _addReportOnlyOption(command);
  command.action(async (path: string, options: CompareOptions) => {
    const plan = _planCommandOutputs(context.io, options, [path]);
    const { design, input } = await _loadDesign(context.io, path);
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
    _emitOutputs(context.io, plan, options, formatComparisonReport(comparison, _chosenFormat(options), _methodInfo(settings), design.name), [], [input]);
    // The design as drawn is its own reference (the first option); the alternatives failing is what a comparison shows.
    const own = comparison.options[0];
    if (own !== undefined && own.verdict !== "adequate" && options.reportOnly !== true) {
      context.io.writeErr(
        `hotjunction: ${path}: the design's own reference (${own.name}) fails its margins (exit ${marginFailExitCode}; --report-only exits 0)\n`,
      );
      if (context.outcome !== undefined) context.outcome.exitCode = marginFailExitCode;
    }
  });
  return command;
}
