/**
 * `hotjunction sweep <design.json> --from --to --step`: the chain's reading error (indicated − true) over a
 * range of true temperatures, by worst case, RSS and Monte Carlo.
 * @module
 */
import type { Command } from "commander";
import { evaluateChain } from "../../chain/evaluateChain.js";
import { measurementChainFromDesign } from "../../design/designToObjects.js";
import { errorBandChartSvg } from "../../report/errorBandChart.js";
import { formatSweepReport } from "../../report/renderSweepReport.js";
import type { ErrorSweep } from "../../report/reportTypes.js";
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
import { _parseNumber, _parsePositiveNumber } from "../parseArgs.js";
import { _startProgress } from "../progress.js";
import type { CommandContext } from "../runCli.js";
import { _writeOutput } from "../writeOutput.js";

type SweepOptions = OutputOptionValues & AnalysisOptionValues & { from: number; to: number; step: number };

/** Most temperatures one sweep evaluates. */
const maxSweepPoints = 2001;

/** Registers the `sweep` command. @internal */
export function registerSweepCommand(program: Command, context: CommandContext): Command {
  const command = program
    .command("sweep")
    .description("sweep the measurement chain's reading error over temperature")
    .argument("<design>", "design file (JSON)")
    .requiredOption("--from <C>", "first true temperature, °C", _parseNumber)
    .requiredOption("--to <C>", "last true temperature, °C", _parseNumber)
    .option("--step <C>", "step, °C", _parsePositiveNumber, 10)
    .addHelpText("after", "\nExample:\n  hotjunction sweep examples/heated-enclosure-adc.json --from 20 --to 120 --step 5 --svg enclosure-error.svg\n");
  _addAnalysisOptions(command, "the error bands");
  _addOutputOptions(command, ["json", "markdown", "csv"]);
  command.action(async (path: string, options: SweepOptions) => {
    if (options.to < options.from) throw new CliError(`--to (${options.to}) is below --from (${options.from})`);
    const count = Math.floor((options.to - options.from) / options.step + 1e-9) + 1;
    if (count > maxSweepPoints) throw new CliError(`the sweep has ${count} points; at most ${maxSweepPoints} (use a larger --step)`);
    const plan = _planCommandOutputs(context.io, options, [path], options.svg !== undefined ? [options.svg] : []);
    const design = _loadDesign(context.io, path);
    const settings = _analysisSettings(design, options);
    const methods = _methodInfo(settings);
    const chain = measurementChainFromDesign(design);
    const temperatures = Array.from({ length: count }, (_, i) => Number((options.from + i * options.step).toPrecision(12)));
    const progress = _startProgress(context.io, "sweep");
    const rows: ErrorSweep["rows"][number][] = [];
    try {
      temperatures.forEach((t, i) => {
        const evaluation = evaluateChain(chain, t, {
          methods: methods.methods,
          coverage: settings.coverage,
          trials: settings.trials,
          seed: settings.seed,
        });
        rows.push({
          temperatureC: t,
          nominalErrorC: evaluation.indicatedC - t,
          bands: evaluation.bounds.map((b) => ({ method: b.method, errorLowC: b.errorLowC, errorHighC: b.errorHighC })),
        });
        progress.update((i + 1) / count);
      });
    } finally {
      progress.stop();
    }
    const { acceptanceMethod: _unused, ...methodsWithoutAcceptance } = methods;
    const sweep: ErrorSweep = {
      title: "Reading error sweep",
      ...(design.name !== undefined ? { designName: design.name } : {}),
      rows,
      notes: [
        design.comparator !== undefined
          ? "Comparator design: the error is that of the signal at the comparator input read as a temperature (no threshold)."
          : "ADC design: the error is that of the temperature firmware computes from the ADC code.",
      ],
      methods: methodsWithoutAcceptance,
    };
    await _emitMain(context.io, plan, formatSweepReport(sweep, _chosenFormat(options)));
    const svg = plan.extras[0];
    if (svg !== undefined) {
      if (rows.length < 2) throw new CliError("the chart needs at least two temperatures (widen --from/--to)");
      await _writeOutput(svg, errorBandChartSvg(sweep));
      context.io.writeErr(`hotjunction: wrote ${svg.displayPath}\n`);
    }
  });
  return command;
}
