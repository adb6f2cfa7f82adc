/**
 * The temperature unit a design report is shown in. Reports compute and store everything in °C (design files,
 * JSON fields ending in `C`); the text, Markdown, CSV, HTML and SVG forms show temperatures in the display unit.
 * Absolute temperatures convert with the offset (t_F = 1.8·t_C + 32, T = t_C + 273.15); temperature differences
 * (half-widths, margins, swings, standard uncertainties, hysteresis) by the scale alone (Δt_F = 1.8·Δt_C,
 * ΔT = Δt_C). A quantity per degree (codes per °C) divides by the scale.
 * @module
 */
import { _invalidChoice } from "../errors.js";

/** Display units of a design report: degrees Celsius, degrees Fahrenheit, kelvin. */
export type ReportTemperatureUnit = "C" | "F" | "K";

/** The display units, in the order offered. */
export const reportTemperatureUnits: readonly ReportTemperatureUnit[] = ["C", "F", "K"];

/** Options of the design-report renderers. */
export interface ReportDisplayOptions {
  /** Unit temperatures are shown in (default `"C"`); JSON keeps its °C fields and records the unit. */
  readonly temperatureUnit?: ReportTemperatureUnit;
}

/** How one report shows temperatures. @internal */
export interface _TemperatureDisplay {
  readonly unit: ReportTemperatureUnit;
  /** `°C`, `°F` or `K`. */
  readonly symbol: "°C" | "°F" | "K";
  /** An absolute temperature given in °C, in the display unit (non-finite values pass through). */
  readonly at: (temperatureC: number) => number;
  /** A temperature difference given in °C, in the display unit. */
  readonly diff: (differenceC: number) => number;
  /** A quantity per °C (e.g. codes per °C), per display degree. */
  readonly perDegree: (perC: number) => number;
  /** The suffix of CSV column names: `C`, `F` or `K`. */
  readonly csvSuffix: ReportTemperatureUnit;
}

/** A converted value to 15 significant digits (drops the conversion's last-bit noise: 262 °C is 503.6 °F, not 503.6000000000001). */
function _clean(value: number): number {
  return Number.isFinite(value) ? Number(value.toPrecision(15)) : value;
}

/**
 * The display of a unit (default °C); an unknown unit is a typed error.
 * @internal
 */
export function _temperatureDisplay(unit: ReportTemperatureUnit | undefined = "C"): _TemperatureDisplay {
  if (unit === "C") return { unit, symbol: "°C", at: (t) => t, diff: (d) => d, perDegree: (p) => p, csvSuffix: "C" };
  if (unit === "F") return { unit, symbol: "°F", at: (t) => _clean(t * 1.8 + 32), diff: (d) => _clean(d * 1.8), perDegree: (p) => _clean(p / 1.8), csvSuffix: "F" };
  if (unit === "K") return { unit, symbol: "K", at: (t) => _clean(t + 273.15), diff: (d) => d, perDegree: (p) => p, csvSuffix: "K" };
  return _invalidChoice("temperature unit", unit, reportTemperatureUnits, "report");
}

/** The display of a renderer's options object (absent: °C). @internal */
export function _displayOf(options: ReportDisplayOptions | undefined): _TemperatureDisplay {
  return _temperatureDisplay(options?.temperatureUnit ?? "C");
}

/** The CSV comment line naming a display unit other than °C (empty for °C). @internal */
export function _csvUnitLine(display: _TemperatureDisplay): string {
  return display.unit === "C" ? "" : `# temperatures in ${display.symbol} (differences ×${display.unit === "F" ? "1.8" : "1"} of °C); the JSON report keeps °C\n`;
}

/**
 * `temperatureUnit` of a JSON report: the unit the other forms of the same report show (`°C`, `°F` or `K`). The
 * JSON's own temperature fields stay in °C whatever it says. @internal
 */
export function _jsonUnitField(display: _TemperatureDisplay): { temperatureUnit: "°C" | "°F" | "K" } {
  return { temperatureUnit: display.symbol };
}
