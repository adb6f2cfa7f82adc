/**
 * The workbench's analysis of one design: the same library calls the CLI's `check`, `compare` and `faults` make,
 * gathered into one plain, structured-cloneable result (so a web worker can compute it and post it back).
 * Nothing here computes a number itself: every figure comes from the library.
 * @module
 */
import {
  compareReferences,
  designTrip,
  evaluateChain,
  reviewChainFaults,
  reviewTripDesignFaults,
  type ChainEvaluation,
  type PropagationMethod,
  type FaultReviewReport,
  type ReferenceComparison,
  type ReviewFaultsOptions,
  type TripDesignResult,
} from "../index.js";
import { measurementChainFromDesign, referenceOptionFromDesign, tripDesignFromDesign, type DesignFile } from "../design/index.js";
import { firmwareTripReport, runawayChartSvg, tripBandChartSvg, tripReportFromResult, type ReportMethodInfo, type TripReport } from "../report/index.js";
// The design-file steps the CLI takes too (library modules, one source), so the page shows what `check`, `runaway`
// and `validate` print: the dynamics fold-in (runaway against each setpoint's static band, verdict from the dynamic
// peak), the ADC build sheet and the failure-data checks.
import { _adcBuildSheet } from "../designAnalysis/adcBuildSheet.js";
import { _designFailureDataProblems, _designFaultIds } from "../designAnalysis/designSafety.js";
import { _foldDynamics, _runawayToChart, _tripDynamicsOfDesign } from "../designAnalysis/dynamicsOfDesign.js";

/** How hard to work. */
export interface AnalysisSettings {
  /** Monte Carlo trials per setpoint (the design's, else 20 000). */
  readonly trials: number;
  /** Monte Carlo seed (the design's, else 1). */
  readonly seed: number;
  readonly acceptanceMethod: PropagationMethod;
  readonly coverage: number;
}

/** One part of the analysis that could not be done, with the library's message. */
export interface AnalysisProblem {
  readonly part: "trip" | "comparison" | "faults" | "dynamics";
  readonly message: string;
}

/** Everything the page shows for one design. Plain data. */
export interface WorkbenchAnalysis {
  readonly settings: AnalysisSettings;
  /** True when the Monte Carlo figures are final (computed with `settings.trials`). */
  readonly monteCarloFinal: boolean;
  readonly kind: "comparator" | "adc";
  readonly methods: ReportMethodInfo;
  readonly report?: TripReport;
  /** Comparator designs: the trip design result (thresholds, resistors, release, reference realization). */
  readonly trip?: TripDesignResult;
  readonly comparison?: ReferenceComparison;
  readonly faults?: FaultReviewReport;
  /** The trip bands chart, as the CLI's `check --svg` writes it. */
  readonly bandsSvg?: string;
  /**
   * Designs with a `dynamics` section: true once the runaway has been run and folded into `report` (its verdict
   * then comes from the dynamic peak, `report.dynamics` holds the figures).
   */
  readonly dynamicsDone?: boolean;
  /** The runaway chart, as the CLI's `runaway --svg` writes it by default (the case with the smallest dynamic margin). */
  readonly runawaySvg?: string;
  readonly problems: readonly AnalysisProblem[];
}

/** Default Monte Carlo trials, as the CLI's. */
export const defaultTrials = 20_000;

/** Settings of a design: the design file's analysis section over the CLI's defaults. */
export function settingsOfDesign(design: DesignFile): AnalysisSettings {
  return {
    trials: design.analysis?.monteCarloTrials ?? defaultTrials,
    seed: design.analysis?.seed ?? 1,
    acceptanceMethod: design.analysis?.acceptanceMethod ?? "worst-case",
    coverage: 0.95,
  };
}

/** The method line of the reports. */
export function methodInfo(settings: AnalysisSettings): ReportMethodInfo {
  return {
    methods: ["worst-case", "rss", "monte-carlo"],
    acceptanceMethod: settings.acceptanceMethod,
    coverage: settings.coverage,
    trials: settings.trials,
    seed: settings.seed,
  };
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** The fault review options from the design's protection section (as `faults` does with no options given). */
export function faultOptionsOfDesign(design: DesignFile): ReviewFaultsOptions {
  const protection = design.protection ?? {};
  const d = protection.detection ?? {};
  const sup = d.supervisoryReading;
  const window = d.outOfRangeWindowC ?? d.outOfRangeWindowVolts;
  return {
    ...(protection.openCircuitBias !== undefined ? { openCircuitBias: protection.openCircuitBias } : {}),
    ...(protection.outputStage !== undefined ? { outputStage: protection.outputStage } : {}),
    ...(protection.comparatorTripLevel !== undefined ? { comparatorTripLevel: protection.comparatorTripLevel } : {}),
    ...(protection.amplifierRailsVolts !== undefined ? { amplifierRailsVolts: protection.amplifierRailsVolts } : {}),
    detection: {
      ...(window !== undefined ? { outOfRangeWindow: window } : {}),
      ...(d.openThermocoupleDetection === true ? { openThermocoupleDetection: true } : {}),
      ...(d.secondComparatorC !== undefined ? { secondComparator: { thresholdC: d.secondComparatorC } } : {}),
      ...(sup !== undefined
        ? {
            supervisoryReading: {
              ...(sup.plausibleLowC !== undefined ? { plausibleLowC: sup.plausibleLowC } : {}),
              ...(sup.plausibleHighC !== undefined ? { plausibleHighC: sup.plausibleHighC } : {}),
              ...(sup.independentSensor === true ? { independentSensor: true } : {}),
              ...(sup.toleranceC !== undefined ? { toleranceC: sup.toleranceC } : {}),
            },
          }
        : {}),
    },
  };
}

/**
 * The problems `validate` finds in a design that parses (failure-data fault ids against the fault catalogue of
 * each channel, proof-test fault ids), each with its path and message, as `validate` prints them.
 */
export function validationProblems(design: DesignFile): { path: string; message: string }[] {
  if (design.failureData === undefined) return [];
  try {
    return _designFailureDataProblems(design, _designFaultIds(design)).map((e) => {
      const prefix = `failure data: ${e.quantity} `;
      return { path: e.quantity, message: e.message.startsWith(prefix) ? e.message.slice(prefix.length) : e.message };
    });
  } catch (error) {
    return [{ path: "failureData", message: messageOf(error) }];
  }
}

/** Setpoints of an ADC design with their limits (presence was checked by validation). */
function adcSetpoints(design: DesignFile) {
  return design.setpoints.map((s) => ({
    name: s.name,
    tripTemperatureC: s.tripTemperatureC,
    maxNormalOperatingC: s.maxNormalOperatingC ?? design.processLimits?.maxNormalOperatingC ?? Number.NaN,
    hazardLimitC: s.hazardLimitC ?? design.processLimits?.hazardLimitC ?? Number.NaN,
  }));
}

/** Options of {@link analyseDesign}. */
export interface AnalyseOptions {
  /** Trials to use now (fewer than the design's for a quick first look); the report still names the design's. */
  readonly trials?: number;
  /** Skip the reference comparison and the fault review (they follow from the worker). */
  readonly bandsOnly?: boolean;
  readonly onProgress?: (fractionDone: number) => void;
  /** Skip the runaway of a design's `dynamics` section (it follows with {@link withDynamics}). */
  readonly skipDynamics?: boolean;
}

/** The chart `runaway --svg` writes with no `--setpoint`/`--case`: the case with the smallest dynamic margin. */
function runawayChartOf(design: DesignFile, result: NonNullable<ReturnType<typeof _tripDynamicsOfDesign>>): string {
  const { response, title } = _runawayToChart(design, result);
  return runawayChartSvg(response, { title });
}

/**
 * The analysis with the design's runaway folded in, as `check` folds it (verdict from the dynamic peak) and with
 * the chart `runaway --svg` draws. Unchanged when the design has no `dynamics` section or no trip report.
 */
export function withDynamics(design: DesignFile, analysis: WorkbenchAnalysis): WorkbenchAnalysis {
  if (design.dynamics === undefined || analysis.report === undefined || analysis.dynamicsDone === true) return analysis;
  try {
    const result = _tripDynamicsOfDesign(design, analysis.report);
    if (result === undefined) return analysis;
    const report = _foldDynamics(analysis.report, result);
    // The bands chart titles each setpoint with its verdict: drawn again from the folded report, as `check --svg`.
    return { ...analysis, report, bandsSvg: tripBandChartSvg(report), dynamicsDone: true, runawaySvg: runawayChartOf(design, result) };
  } catch (error) {
    return { ...analysis, dynamicsDone: true, problems: [...analysis.problems, { part: "dynamics", message: messageOf(error) }] };
  }
}

/**
 * Analyses a valid design: the trip report (comparator: `designTrip`; ADC: `evaluateChain` at each setpoint), the
 * reference comparison, the fault review and the trip bands chart.
 */
export function analyseDesign(design: DesignFile, options: AnalyseOptions = {}): WorkbenchAnalysis {
  const settings = settingsOfDesign(design);
  const trials = options.trials ?? settings.trials;
  const monteCarloFinal = trials === settings.trials;
  const methods = methodInfo({ ...settings, trials });
  const problems: AnalysisProblem[] = [];
  const progress = options.onProgress;
  const named = <T extends TripReport>(r: T): T => (design.name !== undefined ? { ...r, designName: design.name } : r);
  if (design.comparator !== undefined) {
    const tripDesign = tripDesignFromDesign(design);
    let trip: TripDesignResult | undefined;
    let report: TripReport | undefined;
    const share = options.bandsOnly === true ? 1 : 1 / (1 + 1 + (design.referenceAlternatives?.length ?? 0));
    try {
      trip = designTrip(tripDesign, {
        acceptanceMethod: settings.acceptanceMethod,
        coverage: settings.coverage,
        monteCarloTrials: trials,
        seed: settings.seed,
        ...(progress !== undefined ? { onProgress: (f: number) => progress(f * share) } : {}),
      });
      report = named(tripReportFromResult(trip, methods));
    } catch (error) {
      problems.push({ part: "trip", message: messageOf(error) });
    }
    let comparison: ReferenceComparison | undefined;
    let faults: FaultReviewReport | undefined;
    if (options.bandsOnly !== true) {
      try {
        const references = [design.reference, ...(design.referenceAlternatives ?? [])].map(referenceOptionFromDesign);
        comparison = compareReferences(tripDesign, references, {
          acceptanceMethod: settings.acceptanceMethod,
          coverage: settings.coverage,
          monteCarloTrials: trials,
          seed: settings.seed,
          ...(progress !== undefined ? { onProgress: (f: number) => progress(share + f * (1 - 2 * share)) } : {}),
        });
      } catch (error) {
        problems.push({ part: "comparison", message: messageOf(error) });
      }
      if (trip !== undefined) {
        try {
          faults = reviewTripDesignFaults(tripDesign, trip, faultOptionsOfDesign(design));
        } catch (error) {
          problems.push({ part: "faults", message: messageOf(error) });
        }
      }
    }
    progress?.(1);
    // Deliberately alike: the ADC analysis below assembles the same result fields for its own kind and parts.
    const result: WorkbenchAnalysis = {
      settings,
      monteCarloFinal,
      kind: "comparator",
      methods,
      ...(report !== undefined ? { report, bandsSvg: tripBandChartSvg(report) } : {}),
      ...(trip !== undefined ? { trip } : {}),
      ...(comparison !== undefined ? { comparison } : {}),
      ...(faults !== undefined ? { faults } : {}),
      problems,
    };
    return options.skipDynamics === true ? result : withDynamics(design, result);
  }
  let report: TripReport | undefined;
  let faults: FaultReviewReport | undefined;
  const setpoints = adcSetpoints(design);
  try {
    const chain = measurementChainFromDesign(design);
    const evaluations: ChainEvaluation[] = setpoints.map((s, i) => {
      const evaluation = evaluateChain(chain, s.tripTemperatureC, {
        methods: methods.methods,
        coverage: settings.coverage,
        monteCarloTrials: trials,
        seed: settings.seed,
      });
      progress?.((i + 1) / setpoints.length);
      return evaluation;
    });
    const reference = design.reference;
    const details = [`Reference: ${reference.name} (${reference.kind}), ${reference.nominalVolts} V.`, `ADC: ${design.adc?.bits ?? "?"} bits.`];
    const plain = firmwareTripReport(setpoints, evaluations, methods, details);
    report = named({ ...plain, buildSheet: _adcBuildSheet(design, chain, plain, evaluations) });
    if (options.bandsOnly !== true) {
      try {
        faults = reviewChainFaults(chain, setpoints, faultOptionsOfDesign(design));
      } catch (error) {
        problems.push({ part: "faults", message: messageOf(error) });
      }
    }
  } catch (error) {
    problems.push({ part: "trip", message: messageOf(error) });
  }
  progress?.(1);
  // Deliberately alike: the comparator analysis above assembles the same result fields for its own kind and parts.
  const result: WorkbenchAnalysis = {
    settings,
    monteCarloFinal,
    kind: "adc",
    methods,
    ...(report !== undefined ? { report, bandsSvg: tripBandChartSvg(report) } : {}),
    ...(faults !== undefined ? { faults } : {}),
    problems,
  };
  return options.skipDynamics === true ? result : withDynamics(design, result);
}
