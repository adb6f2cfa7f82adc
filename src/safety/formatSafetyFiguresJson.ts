/**
 * JSON rendering of a safety-figures report.
 * @module
 */
import { _checkSafetyReport } from "./_safetyWords.js";
import type { SafetyFiguresReport } from "./types.js";

/**
 * Format tag of the JSON rendering (the `format` field), versioned: a new major number for incompatible changes.
 * @example
 * ```ts
 * import { safetyFiguresJsonFormat } from "hotjunction";
 * console.log(safetyFiguresJsonFormat); // "hotjunction-safety-figures/1"
 * ```
 */
export const safetyFiguresJsonFormat = "hotjunction-safety-figures/1";

/**
 * The report as JSON text (2-space indent): `{ format, caution, certification, scope, name?, setpoints,
 * twoChannel, curves }`; every figure a field in its unit by key name (FIT, h, per hour, fractions); null where
 * a figure is undefined (SFF with no rated S or D failure, DC with λ_D = 0, no proof test).
 * @param input - from {@link safetyFiguresReport}
 * @returns JSON text ending with a newline
 * @throws HotjunctionRangeError when `input` is not a safety-figures report
 * @example
 * ```ts
 * import { formatSafetyFiguresJson, safetyFiguresReport } from "hotjunction";
 * const data = JSON.parse(formatSafetyFiguresJson(safetyFiguresReport()));
 * console.log(data.format, data.setpoints.length); // "hotjunction-safety-figures/1" 0
 * ```
 */
export function formatSafetyFiguresJson(input: SafetyFiguresReport): string {
  const r = _checkSafetyReport(input, "formatSafetyFiguresJson");
  const body = {
    format: safetyFiguresJsonFormat,
    caution: r.caution,
    certification: r.certification,
    scope: r.scope,
    ...(r.name !== undefined ? { name: r.name } : {}),
    setpoints: r.setpoints,
    twoChannel: r.twoChannel,
    curves: r.curves,
  };
  return `${JSON.stringify(body, null, 2)}\n`;
}
