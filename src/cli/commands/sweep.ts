/**
 * `hotjunction sweep <design.json> --from --to --step`: the chain's reading error (indicated − true) over a
 * range of true temperatures, by worst case, RSS and Monte Carlo.
 * @module
 */
import type { Command } from "commander";
import { _sweepBracket } from "../_sweepRows.js";
import { _sweepRowsOnWorkers } from "../_sweepWorkers.js";
import { measurementChainFromDesign, tripDesignFromDesign } from "../../design/designToObjects.js";
import type { DesignFile } from "../../design/designSchema.js";
import type { MeasurementChain } from "../../chain/types.js";
import { _realizedTripReference } from "../../trip/designTrip.js";
import { formatSweepReport } from "../../report/renderSweepReport.js";
import type { ErrorSweep } from "../../report/reportTypes.js";
import { CliError } from "../cliError.js";
import {
  _addAnalysisOptions,
  _analysisSettings,
  _addDisplayUnitOption,
  _loadDesign,
  _methodInfo,
  _setpointLimitsOfDesign,
  type AnalysisOptionValues,
} from "../designOptions.js";
import {
  _addOutputOptions,
  _chosenFormat,
  _emitOutputs,
  _planCommandOutputs,
  type OutputOptionValues,
} from "../outputOptions.js";
import { _integerParser, _parseNumber, _parsePositiveNumber } from "../parseArgs.js";
import { _startProgress } from "../progress.js";
import { _temperatureSymbol, _toCelsius, type TemperatureUnit } from "../temperatureUnits.js";
import { _maxModelEvaluations } from "../../uncertainty/_propagateMonteCarlo.js";
import type { CommandContext } from "../commandContext.js";

type SweepOptions = OutputOptionValues & AnalysisOptionValues & { from: number; to: number; step: number; workers?: number; unit?: TemperatureUnit };

/** Most temperatures one sweep evaluates. */
const maxSweepPoints = 2001;

/** Significant digits the sweep keeps in its temperatures (JSON and CSV print them so). */
const sweepSignificantDigits = 12;

/**
 * The smallest step a sweep's output can show from `fromC` to `toC`: the text and Markdown tables print the
 * temperature with one decimal (0.1 °C); JSON and CSV keep 12 significant digits, so one unit in the 12th digit
 * of the largest magnitude.
 * @internal
 */
export function _smallestSweepStepC(fromC: number, toC: number, format: "text" | "json" | "markdown" | "csv"): number {
  const largest = Math.max(Math.abs(fromC), Math.abs(toC));
  const digitUnit = largest === 0 ? Number.MIN_VALUE : 10 ** (Math.floor(Math.log10(largest)) - (sweepSignificantDigits - 1));
  return format === "text" || format === "markdown" ? Math.max(0.1, digitUnit) : digitUnit;
}

/**
 * The chain a sweep evaluates: the design's chain, with a shunt reference whose series resistor the design leaves
 * to the tool sized as `check` sizes it (for the threshold networks the trip design finds). @internal
 */
export function sweepChainOfDesign(design: DesignFile): MeasurementChain {
  const chain = measurementChainFromDesign(design);
  if (design.comparator !== undefined && design.reference.kind === "shunt" && design.reference.seriesOhms === undefined) {
    return { ...chain, reference: _realizedTripReference(tripDesignFromDesign(design)) };
  }
  return chain;
}

/** Registers the `sweep` command. @internal */
export function registerSweepCommand(program: Command, context: CommandContext): Command {
  // Deliberately alike: check (and every design command) starts its registration the same way, each with its own options.
  const command = program
    .command("sweep")
    .description("sweep the measurement chain's reading error over temperature")
    .argument("<design>", "design file (JSON)")
    .requiredOption("--from <t>", "first true temperature, in --unit (default °C)", _parseNumber)
    .requiredOption("--to <t>", "last true temperature, in --unit", _parseNumber)
    .option("--step <t>", "step, in --unit", _parsePositiveNumber, 10)
    .option(
      "--workers <n>",
      "worker threads for the points, 1 to 64 (default: the cores available, at most 8, for 2,000,000 model evaluations or more; else 1); the same results for any number",
      _integerParser(1, 64),
    )
    .addHelpText(
      "after",
      "\nExamples:\n  hotjunction sweep examples/heated-enclosure-adc.json --from 20 --to 120 --step 5 --svg enclosure-error.svg\n  hotjunction sweep examples/reflow-oven-trip.json --from 400 --to 560 --step 20 --unit F\n",
    );
  _addAnalysisOptions(command, "the error bands");
  _addDisplayUnitOption(command, " and of --from, --to, --step");
  _addOutputOptions(command, ["json", "markdown", "csv"], true);
  command.action(async (path: string, options: SweepOptions) => {
    const unit = options.unit ?? "C";
    const symbol = _temperatureSymbol(unit);
    if (options.to < options.from) throw new CliError(`--to (${options.to}) is below --from (${options.from})`);
    // (to − from) / step carries the rounding of to − from, relative to the larger magnitude: a step that lands on
    // --to within that rounding still reaches it.
    const slack = (8 * Number.EPSILON * Math.max(Math.abs(options.from), Math.abs(options.to))) / options.step + 1e-9;
    const count = Math.floor((options.to - options.from) / options.step + slack) + 1;
    if (count > maxSweepPoints) throw new CliError(`the sweep has ${count} points; at most ${maxSweepPoints} (use a larger --step)`);
    const format = _chosenFormat(options);
    const smallest = _smallestSweepStepC(options.from, options.to, format);
    if (count > 1 && options.step < smallest) {
      throw new CliError(
        `--step ${options.step} ${symbol} is finer than the ${format} output shows from ${options.from} to ${options.to} ${symbol}; the smallest step is ${Number(smallest.toPrecision(1))} ${symbol}`,
      );
    }
    if (options.svg !== undefined && count < 2) throw new CliError("the chart needs at least two temperatures (widen --from/--to)");
    const plan = _planCommandOutputs(context.io, options, [path], options.svg !== undefined ? [options.svg] : []);
    const { design, input } = await _loadDesign(context.io, path);
    const settings = _analysisSettings(design, options);
    const methods = _methodInfo(settings);
    if (methods.methods.includes("monte-carlo") && count * settings.trials > _maxModelEvaluations) {
      throw new CliError(
        `the sweep's work, ${count} points × ${settings.trials} trials = ${count * settings.trials} model evaluations, is above the limit of ${_maxModelEvaluations} (use a larger --step or fewer --trials)`,
      );
    }
    const chain = sweepChainOfDesign(design);
    // The points are spaced in the display unit (as typed), then converted to °C for the chain.
    const shown = Array.from({ length: count }, (_, i) => Number((options.from + i * options.step).toPrecision(sweepSignificantDigits)));
    for (let i = 1; i < shown.length; i++) {
      if (!((shown[i] as number) > (shown[i - 1] as number))) {
        throw new CliError(`--step ${options.step} ${symbol} repeats the temperature ${shown[i]} ${symbol}; the smallest step is ${Number(smallest.toPrecision(1))} ${symbol}`);
      }
    }
    const temperatures = shown.map((t) => _toCelsius(t, unit));
    const progress = _startProgress(context.io, "sweep");
    let rows: ErrorSweep["rows"][number][];
    try {
      const pointOptions = { methods: methods.methods, coverage: settings.coverage, trials: settings.trials, seed: settings.seed };
      rows = await _sweepRowsOnWorkers(chain, temperatures, pointOptions, options.workers, (done) => progress.update(done / count));
    } finally {
      progress.stop();
    }
    const { acceptanceMethod: _unused, ...methodsWithoutAcceptance } = methods;
    const bracket = _sweepBracket(rows);
    const sweep: ErrorSweep = {
      title: "Reading error sweep",
      ...(design.name !== undefined ? { designName: design.name } : {}),
      rows,
      setpoints: _setpointLimitsOfDesign(design),
      ...(bracket !== undefined ? { worstCaseBracket: bracket } : {}),
      notes: [
        design.comparator !== undefined
          ? "Comparator design: the error is that of the signal at the comparator input read as a temperature (no threshold)."
          : "ADC design: the error is that of the temperature firmware computes from the ADC code.",
      ],
      methods: methodsWithoutAcceptance,
    };
    // The chart code (and its d3 scales and shapes) loads only when a chart is asked for.
    const display = { temperatureUnit: unit } as const;
    const extras = plan.extras.length > 0 ? [(await import("../../report/errorBandChart.js")).errorBandChartSvg(sweep, display)] : [];
    _emitOutputs(context.io, plan, options, formatSweepReport(sweep, format, display), extras, [input]);
  });
  return command;
}
