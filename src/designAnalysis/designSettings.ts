/**
 * The analysis settings a design file states (acceptance method, Monte Carlo trials and seed), with the defaults of
 * every design-file tool (the CLI's options override them; the workbench and the fault review use them as they are).
 * @internal
 * @module
 */
import type { DesignFile } from "../design/designSchema.js";
import type { PropagationMethod } from "../uncertainty/types.js";

/** Resolved analysis settings (a tool's options over the design file over the defaults). @internal */
export interface AnalysisSettings {
  readonly acceptanceMethod: PropagationMethod;
  readonly trials: number;
  readonly seed: number;
  readonly coverage: number;
}

/** Monte Carlo trials when neither the design file nor the tool names a count (modest; the CLI raises it with --trials). @internal */
export const _defaultDesignTrials = 20_000;

/** The design file's settings over the defaults (worst case, 20,000 trials, seed 1, 95 % coverage). @internal */
export function _designAnalysisSettings(design: DesignFile): AnalysisSettings {
  return {
    acceptanceMethod: design.analysis?.acceptanceMethod ?? "worst-case",
    trials: design.analysis?.monteCarloTrials ?? _defaultDesignTrials,
    seed: design.analysis?.seed ?? 1,
    coverage: 0.95,
  };
}
