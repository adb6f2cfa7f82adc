/**
 * `hotjunction runaway <design.json>`: the response time of the trip through a runaway (heater stuck on), from the
 * design's `dynamics` section: per setpoint the slowest unit (the static worst-case band's high edge) and the
 * nominal unit, heat off, peak and dynamic margin to the hazard limit, the uncontrolled time to the hazard, the noise
 * figures; `--svg` writes the runaway chart (true and indicated temperature against time).
 * @module
 */
import { Option, type Command } from "commander";
import { runawayChartSvg } from "../../dynamics/runawayChartSvg.js";
import { formatRunawayReport } from "../../report/runawayReport.js";
import { CliError, marginFailExitCode } from "../cliError.js";
import {
  _addAnalysisOptions,
  _addReportOnlyOption,
  _analysisSettings,
  _loadDesign,
  _methodInfo,
  type AnalysisOptionValues,
} from "../designOptions.js";
import { _dynamicsFigures, _runawayToChart, _tripDynamicsOfDesign } from "../../designAnalysis/dynamicsOfDesign.js";
import { _addOutputOptions, _chosenFormat, _emitOutputs, _planCommandOutputs, type OutputOptionValues } from "../outputOptions.js";
import type { CommandContext } from "../commandContext.js";
import { _tripReportOfDesignOnCores } from "./check.js";

type RunawayOptions = OutputOptionValues &
  AnalysisOptionValues & { readonly reportOnly?: boolean; readonly setpoint?: string; readonly case?: string; readonly unit?: string };

/** Registers the `runaway` command. @internal */
export function registerRunawayCommand(program: Command, context: CommandContext): Command {
  const command = program
    .command("runaway")
    .description("how hot it gets before the cutoff acts: the trip's response through a runaway, from the design's dynamics")
    .argument("<design>", "design file (JSON) with a dynamics section")
    .addHelpText(
      "after",
      "\nThe chart (--svg) shows the setpoint and case with the smallest dynamic margin unless --setpoint/--case choose.\n" +
        "\nExamples:\n  hotjunction runaway examples/ceramic-kiln-cutout.json\n  hotjunction runaway kiln.json --markdown --out kiln-runaway.md --svg kiln-runaway.svg --setpoint bisque\n",
    );
  _addAnalysisOptions(command, "the runaway (true and indicated temperature against time)");
  command.option("--setpoint <name>", "setpoint whose runaway the chart shows");
  command.option("--case <case>", "case the chart shows: slowest (the unit at the band's high edge) or nominal");
  // `--unit` is the display unit of temperatures, as on every design command. Until 0.2 it named the chart's case:
  // `slowest` and `nominal` stay accepted there (deprecated; use --case).
  command.addOption(
    new Option("--unit <unit>", "temperature unit of the report: C, F or K, for text, Markdown and CSV (design files and JSON fields stay in °C; JSON records the unit)")
      .choices(["C", "F", "K", "slowest", "nominal"]),
  );
  _addOutputOptions(command, ["json", "markdown", "csv"], true);
  _addReportOnlyOption(command);
  command.action(async (path: string, options: RunawayOptions) => {
    const svg = (options as { svg?: string }).svg;
    const unitIsCase = options.unit === "slowest" || options.unit === "nominal";
    if (options.case !== undefined && unitIsCase) throw new CliError("--case and the deprecated --unit slowest|nominal both given; give --case only");
    const chartCase = options.case ?? (unitIsCase ? options.unit : undefined);
    const temperatureUnit = unitIsCase || options.unit === undefined ? "C" : (options.unit as "C" | "F" | "K");
    if (chartCase !== undefined && chartCase !== "slowest" && chartCase !== "nominal") {
      throw new CliError(`--case ${JSON.stringify(chartCase)} is not a case; valid: slowest, nominal`);
    }
    const plan = _planCommandOutputs(context.io, options, [path], svg !== undefined ? [svg] : []);
    const { design, input } = await _loadDesign(context.io, path);
    if (design.dynamics === undefined) throw new CliError(`${path}: the design states no "dynamics" section (see docs/guides/response-time.md)`);
    if (options.setpoint !== undefined && !design.setpoints.some((s) => s.name === options.setpoint)) {
      throw new CliError(`--setpoint ${JSON.stringify(options.setpoint)} is not a setpoint of ${path}; valid: ${design.setpoints.map((s) => JSON.stringify(s.name)).join(", ")}`);
    }
    const settings = _analysisSettings(design, options);
    const report = await _tripReportOfDesignOnCores(context.io, design, settings, undefined);
    const result = _tripDynamicsOfDesign(design, report);
    if (result === undefined) throw new CliError(`${path}: the design states no "dynamics" section`);
    const method = _methodInfo(settings);
    const details = [
      `Trip points from the static trip design (${report.title.toLowerCase()}): the slowest unit at the high edge of the worst-case band, the nominal unit at the nominal trip.`,
      `Static verdict (${method.acceptanceMethod ?? "worst-case"} band): ${report.pass ? "PASS" : "FAIL"}; the verdict here uses the dynamic peak.`,
    ];
    const text = formatRunawayReport(
      { title: "Runaway response", ...(design.name !== undefined ? { designName: design.name } : {}), dynamics: _dynamicsFigures(result), details },
      _chosenFormat(options),
      { temperatureUnit },
    );
    const extras: string[] = [];
    if (plan.extras.length > 0) {
      const { response, title } = _runawayToChart(design, result, { setpoint: options.setpoint, chartCase });
      extras.push(runawayChartSvg(response, { title }));
    }
    _emitOutputs(context.io, plan, options, text, extras, [input]);
    if (!result.pass && options.reportOnly !== true) {
      context.io.writeErr(`hotjunction: ${path}: the runaway peak reaches the hazard limit or a unit never trips (exit ${marginFailExitCode}; --report-only exits 0)\n`);
      if (context.outcome !== undefined) context.outcome.exitCode = marginFailExitCode;
    }
  });
  return command;
}
