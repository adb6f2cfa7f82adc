/**
 * Shared words of the fault-review renderers.
 * @module
 * @internal
 */
import { _invalidChoice } from "../errors.js";
import type { FaultCategory, FaultCategoryCounts, FaultReviewReport } from "./types.js";

/** @internal Category labels for tables. */
export const _categoryWords: Readonly<Record<FaultCategory, string>> = {
  "safe-detected": "safe, detected",
  "safe-undetected": "safe, undetected",
  "dangerous-detected": "DANGEROUS, detected",
  "dangerous-undetected": "DANGEROUS, undetected",
  "no-effect": "no effect",
};

/** @internal The counts as label/value pairs. */
export function _countEntries(c: FaultCategoryCounts): [string, number][] {
  return [
    ["safe, detected", c.safeDetected],
    ["safe, undetected", c.safeUndetected],
    ["dangerous, detected", c.dangerousDetected],
    ["dangerous, undetected", c.dangerousUndetected],
    ["no effect", c.noEffect],
    ["total", c.total],
  ];
}

/** @internal One decimal, without a negative zero. */
export function _fmt1(x: number): string {
  const v = x.toFixed(1);
  return v === "-0.0" ? "0.0" : v;
}

/** @internal Checks that a value looks like a report (has a reviews array). */
export function _checkReport(report: unknown, context: string): FaultReviewReport {
  const ok = typeof report === "object" && report !== null && Array.isArray((report as { reviews?: unknown }).reviews);
  if (!ok) _invalidChoice("report", report, ["a fault review report"], context);
  return report as FaultReviewReport;
}
