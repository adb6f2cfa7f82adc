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
import { firmwareTripReport, tripBandChartSvg, tripReportFromResult, type ReportMethodInfo, type TripReport } from "../report/index.js";

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
  readonly part: "trip" | "comparison" | "faults";
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
    return {
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
    report = named(firmwareTripReport(setpoints, evaluations, methods, details));
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
  return {
    settings,
    monteCarloFinal,
    kind: "adc",
    methods,
    ...(report !== undefined ? { report, bandsSvg: tripBandChartSvg(report) } : {}),
    ...(faults !== undefined ? { faults } : {}),
    problems,
  };
}
