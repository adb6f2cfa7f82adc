/**
 * The rows of a sweep (internal): what the `sweep` command computes, in the calling thread or in a worker over a
 * range of its points.
 * @module
 * @internal
 */
import { _chainDraws, _chainEvaluationAt } from "../chain/evaluateChain.js";
import { _checkBoundsOptions } from "../chain/_chainBounds.js";
import { _compileChain } from "../chain/_compileChain.js";
import type { MeasurementChain } from "../chain/types.js";
import { _requireFinite } from "../errors.js";
import type { ErrorSweep, ErrorSweepBracket } from "../report/reportTypes.js";
import { _enclosureGapToleranceC } from "../uncertainty/types.js";
import type { PropagationMethod } from "../uncertainty/types.js";

/** What each sweep point runs: the methods and their settings (as `evaluateChain` takes them). @internal */
export interface _SweepPointOptions {
  readonly methods: readonly PropagationMethod[];
  readonly coverage: number;
  readonly trials: number;
  readonly seed: number;
}

/**
 * A sweep's chain compiled once, with its checked options and its Monte Carlo draws made once: `rows` evaluates
 * any points with them (`evaluateChain` at each point; each point's Monte Carlo band is, bit for bit, the one
 * `evaluateChain` gives there alone, so a row depends only on its temperature). @internal
 */
export class _SweepRange {
  private readonly cc: ReturnType<typeof _compileChain>;
  private readonly opts: ReturnType<typeof _checkBoundsOptions>;
  private readonly draws: ReturnType<typeof _chainDraws>;

  constructor(chain: MeasurementChain, options: _SweepPointOptions) {
    this.cc = _compileChain(chain);
    this.opts = _checkBoundsOptions(options, "evaluateChain");
    this.draws = _chainDraws(this.opts);
  }

  /** The rows at these temperatures, in order; `onPoint(done)` after each. */
  rows(temperatures: readonly number[], onPoint?: (done: number) => void): _SweepRow[] {
    const cc = this.cc;
    return temperatures.map((t, i) => {
      const evaluation = _chainEvaluationAt(cc, _requireFinite(t, "hot-junction temperature", "°C", cc.context), this.opts, this.draws);
      onPoint?.(i + 1);
      return {
        temperatureC: t,
        nominalErrorC: evaluation.indicatedC - t,
        bands: evaluation.bounds.map((b) => ({
          method: b.method,
          errorLowC: b.errorLowC,
          errorHighC: b.errorHighC,
          ...(b.enclosureLowC !== undefined && b.enclosureHighC !== undefined
            ? { enclosureErrorLowC: b.enclosureLowC - t, enclosureErrorHighC: b.enclosureHighC - t }
            : {}),
          ...(b.enclosureGapLowC !== undefined && b.enclosureGapHighC !== undefined ? { enclosureGapLowC: b.enclosureGapLowC, enclosureGapHighC: b.enclosureGapHighC } : {}),
        })),
        largestSources: [...evaluation.contributions]
          .sort((a, b) => b.worstCaseSwingC - a.worstCaseSwingC)
          .slice(0, 3)
          .map((c) => ({ source: c.source, halfSwingC: c.worstCaseSwingC / 2 })),
      };
    });
  }
}

/** One row of a sweep. @internal */
export type _SweepRow = ErrorSweep["rows"][number];

/**
 * The worst case's bracket over a sweep's rows: points with an enclosure and the largest gap (either side), with the
 * tolerance we state; `undefined` when no point's worst case has an enclosure. @internal
 */
export function _sweepBracket(rows: readonly _SweepRow[]): ErrorSweepBracket | undefined {
  let enclosedPoints = 0;
  let largestGapC = 0;
  let largestGapAtC = Number.NaN;
  for (const row of rows) {
    const w = row.bands.find((b) => b.method === "worst-case");
    if (w?.enclosureGapLowC === undefined || w.enclosureGapHighC === undefined) continue;
    enclosedPoints++;
    const gap = Math.max(w.enclosureGapLowC, w.enclosureGapHighC);
    if (enclosedPoints === 1 || gap > largestGapC) {
      largestGapC = gap;
      largestGapAtC = row.temperatureC;
    }
  }
  return enclosedPoints === 0 ? undefined : { points: rows.length, enclosedPoints, largestGapC, largestGapAtC, gapToleranceC: _enclosureGapToleranceC };
}
