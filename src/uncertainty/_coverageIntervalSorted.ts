/**
 * Coverage intervals from sorted Monte Carlo values (internal).
 * @module
 * @internal
 */

/**
 * @internal Probabilistically symmetric or shortest 100p % interval from M values sorted ascending
 * (JCGM 101:2008 7.7): q = pM if integer, else ⌊pM + ½⌋; symmetric r = (M − q)/2 if integer, else
 * ⌊(M − q + 1)/2⌋, interval [y₍ᵣ₎, y₍ᵣ₊q₎] (1-based); shortest: least y₍ᵣ₊q₎ − y₍ᵣ₎ over r = 1 … M − q.
 */
export function _coverageIntervalSorted(
  sorted: Float64Array,
  coverage: number,
  shortest: boolean,
): [number, number] {
  const m = sorted.length;
  const pm = coverage * m;
  const q = Number.isInteger(pm) ? pm : Math.floor(pm + 0.5);
  if (shortest) {
    let bestR = 1;
    let bestLength = Number.POSITIVE_INFINITY;
    for (let r = 1; r + q <= m; r++) {
      const length = (sorted[r + q - 1] as number) - (sorted[r - 1] as number);
      if (length < bestLength) {
        bestLength = length;
        bestR = r;
      }
    }
    return [sorted[bestR - 1] as number, sorted[bestR + q - 1] as number];
  }
  const [lowIndex, highIndex] = _symmetricIntervalIndices(m, coverage);
  return [sorted[lowIndex] as number, sorted[highIndex] as number];
}

/** @internal The 0-based sorted indices of the probabilistically symmetric interval's ends (JCGM 101:2008 7.7). */
export function _symmetricIntervalIndices(m: number, coverage: number): [number, number] {
  const pm = coverage * m;
  const q = Number.isInteger(pm) ? pm : Math.floor(pm + 0.5);
  const half = (m - q) / 2;
  const r = Number.isInteger(half) ? half : Math.floor((m - q + 1) / 2);
  const lowIndex = Math.max(r, 1) - 1;
  return [lowIndex, Math.min(lowIndex + q, m - 1)];
}

/** @internal Smallest trial count for which the interval indices exist. */
export function _minimumTrials(coverage: number): number {
  return Math.ceil(1 / (1 - coverage) - 1e-9);
}
