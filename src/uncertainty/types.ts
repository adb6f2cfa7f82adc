/**
 * Types of the propagation engine (contract shared by `uncertainty/` and its users such as `chain/`).
 * `uncertainty/` knows nothing about thermocouples.
 * @module
 */

/** Kinds of input distribution (JCGM 100 4.3.7–4.3.9; JCGM 101 6.4). */
export type DistributionKind = "normal" | "rectangular" | "triangular" | "trapezoidal" | "arcsine";

/** An input distribution: a plain, JSON-serializable object made by a factory (`normalDistribution`, `rectangular`, ...). */
export interface InputDistribution {
  readonly kind: DistributionKind;
  /** Expectation, in the input's own unit. */
  readonly mean: number;
  /** Standard uncertainty (standard deviation), in the input's own unit. */
  readonly standardUncertainty: number;
  /** Half-width of the bounded support; `undefined` for a normal (unbounded) input. */
  readonly halfWidth?: number;
  /** Trapezoid top-to-base ratio β (0 = triangular, 1 = rectangular); trapezoidal only. */
  readonly beta?: number;
  /** Degrees of freedom for Welch–Satterthwaite; `Infinity` (default) when the value is known exactly. */
  readonly degreesOfFreedom?: number;
}

/** Propagation methods. */
export type PropagationMethod = "worst-case" | "rss" | "monte-carlo";

/** The propagation methods, in their reporting order: the one list every module reads. @internal */
export const _propagationMethods = ["worst-case", "rss", "monte-carlo"] as const satisfies readonly PropagationMethod[];

/** A propagation model: maps a record of input values (by input name) to one output value. */
export type PropagationModel<Name extends string = string> = (inputs: Readonly<Record<Name, number>>) => number;

/** @deprecated use {@link PropagationModel}; kept for one minor version. */
export type Model<Name extends string = string> = PropagationModel<Name>;

/** @deprecated use {@link InputDistribution}; kept for one minor version. */
export type Distribution = InputDistribution;

/** Options of `propagate`. */
export interface PropagateOptions<Name extends string = string> {
  /** Default `"rss"`. */
  readonly method?: PropagationMethod;
  /** Coverage probability of the interval, in (0, 1). Default 0.95. */
  readonly coverage?: number;
  /** Correlation coefficients between named inputs, r in [−1, 1]. */
  readonly correlations?: readonly (readonly [Name, Name, number])[];
  /** Monte Carlo: number of trials (default 1e6 unless `adaptive`; the design file's and the chain's name). */
  readonly monteCarloTrials?: number;
  /**
   * Monte Carlo: the number of trials under its former name.
   * @deprecated use `monteCarloTrials` (kept for one minor version; giving both is an error).
   */
  readonly trials?: number;
  /** Monte Carlo: seed of the generator (default 1). Same seed, same result, bit for bit. */
  readonly seed?: number;
  /** Monte Carlo: JCGM 101 7.9 adaptive stopping with this many significant digits (1–3). */
  readonly adaptive?: { readonly significantDigits: number; readonly maxTrials?: number };
  /** Monte Carlo: `"symmetric"` (default, probabilistically symmetric) or `"shortest"` coverage interval. */
  readonly interval?: "symmetric" | "shortest";
  /**
   * Worst case: coverage used to bound normal inputs (±k·u with k from this probability). Required when any
   * input is normal and the method is worst-case.
   */
  readonly normalBoundCoverage?: number;
  /**
   * Worst case: an interval extension of the model, `box → [low, high]` that contains the model's value at every
   * point of the box (each input in its `[low, high]`), e.g. the model written in interval arithmetic with
   * outward rounding. With it the result carries a proven `enclosure` (branch and bound over the input box)
   * beside the `attained` extremes. The bracket holds only as far as the extension is a true enclosure.
   */
  readonly modelEnclosure?: ((box: Readonly<Record<Name, readonly [number, number]>>) => readonly [number, number]) | undefined;
  /** Monte Carlo: called now and then with the fraction done (0–1), for progress display. */
  readonly onProgress?: (fractionDone: number) => void;
}

/** One input's share of the result. */
export interface Contribution {
  /** Sensitivity coefficient ∂f/∂xᵢ at the estimates (output unit per input unit). */
  readonly sensitivity: number;
  /** |cᵢ|·u(xᵢ) for rss/monte-carlo; for worst-case, the output swing this input alone causes over its bounds. */
  readonly contribution: number;
  /** Share of the output variance (rss: (cᵢ·uᵢ)²/Σ, ignoring correlation terms; sums to 1 without correlations). */
  readonly varianceShare: number;
}

/** Result of `propagate`. */
export interface PropagationResult<Name extends string = string> {
  readonly method: PropagationMethod;
  /** Output estimate (model at the input means; Monte Carlo: mean of the trials). */
  readonly estimate: number;
  /** Standard uncertainty of the output. */
  readonly standardUncertainty: number;
  /** Coverage interval [low, high] (worst case: the extremes). */
  readonly interval: readonly [number, number];
  /** Coverage probability of the interval (1 for worst case). */
  readonly coverage: number;
  /** Coverage factor k where it applies (rss; Monte Carlo symmetric: half-width / u). */
  readonly coverageFactor?: number;
  /** Effective degrees of freedom (rss with finite degrees of freedom). */
  readonly effectiveDegreesOfFreedom?: number;
  /** Per input. */
  readonly contributions: Readonly<Record<Name, Contribution>>;
  /** Monte Carlo: trials run. */
  readonly trials?: number;
  /** Monte Carlo: seed used. */
  readonly seed?: number;
  /** Monte Carlo adaptive: whether the JCGM 101 7.9 stopping tolerance was met before `maxTrials`. */
  readonly converged?: boolean;
  /**
   * Monte Carlo runs above 4,194,304 trials (bounded memory): the number of segments whose intervals were
   * averaged; absent when the interval is from all outputs at once.
   */
  readonly intervalSegments?: number;
  /**
   * Monte Carlo with `intervalSegments`: standard error [low, high] of the averaged interval endpoints, from the
   * spread between segments (a statistical estimate, not a bound), in the output's unit.
   */
  readonly intervalStandardError?: readonly [number, number];
  /**
   * Worst case: the attained extremes, each with a point of the input box where the model reaches it (input
   * values by name). `interval` is [attained.low.value, attained.high.value]: a search result, a lower bound of the
   * true range for a non-monotone model.
   */
  readonly attained?: {
    readonly low: { readonly value: number; readonly at: Readonly<Record<Name, number>> };
    readonly high: { readonly value: number; readonly at: Readonly<Record<Name, number>> };
  };
  /**
   * Worst case with `modelEnclosure`: [low, high] that contains the model's value over the whole input box (as
   * far as the given extension is an enclosure), by branch and bound. The true range lies between `attained` and
   * `enclosure`.
   */
  readonly enclosure?: readonly [number, number];
  /**
   * Worst case with `modelEnclosure`: [attained.low − enclosure low, enclosure high − attained.high], both ≥ 0; 0
   * when the bracket is closed (monotone models with a tight extension: the corners reach the bounds).
   */
  readonly enclosureGap?: readonly [number, number];
  /** How the result was found, in one sentence (e.g. worst-case search strategy). */
  readonly note: string;
}

/**
 * @internal The largest gap we state between a worst-case extreme of a chain model (comparator trip, reading) and its
 * enclosure, °C: the chain models' enclosures meet their attained extremes within it (tests/trip/worstCaseEnclosure.test.ts,
 * tests/chain/readingEnclosure.test.ts; the gap itself is printed).
 */
export const _enclosureGapToleranceC = 1e-9;
