/**
 * Temperature and voltage units at the CLI edge: the library works in °C and mV; users may type K, °F, µV or V.
 * @module
 */
import {
  celsiusToFahrenheit,
  celsiusToKelvin,
  fahrenheitToCelsius,
  kelvinToCelsius,
} from "../units.js";

/** Temperature units accepted on the command line. */
export const temperatureUnits = ["C", "K", "F"] as const;
/** A temperature unit accepted on the command line. */
export type TemperatureUnit = (typeof temperatureUnits)[number];
/** EMF units accepted on the command line. */
export const emfUnits = ["mV", "uV", "V"] as const;
/** An EMF unit accepted on the command line. */
export type EmfUnit = (typeof emfUnits)[number];

/** Unit symbol for display. */
export function _temperatureSymbol(unit: TemperatureUnit): string {
  return unit === "K" ? "K" : unit === "F" ? "°F" : "°C";
}

/** Unit symbol for display. */
export function _emfSymbol(unit: EmfUnit): string {
  return unit === "uV" ? "µV" : unit;
}

/** A temperature in `unit` to °C. */
export function _toCelsius(value: number, unit: TemperatureUnit): number {
  if (unit === "K") return kelvinToCelsius(value);
  if (unit === "F") return fahrenheitToCelsius(value);
  return value;
}

/** A temperature in °C to `unit`. */
export function _fromCelsius(temperatureC: number, unit: TemperatureUnit): number {
  if (unit === "K") return celsiusToKelvin(temperatureC);
  if (unit === "F") return celsiusToFahrenheit(temperatureC);
  return temperatureC;
}

/** An EMF in `unit` to mV. */
export function _toMillivolts(value: number, unit: EmfUnit): number {
  if (unit === "uV") return value / 1000;
  if (unit === "V") return value * 1000;
  return value;
}

/** An EMF in mV to `unit`. */
export function _fromMillivolts(emfMillivolts: number, unit: EmfUnit): number {
  if (unit === "uV") return emfMillivolts * 1000;
  if (unit === "V") return emfMillivolts / 1000;
  return emfMillivolts;
}

/** Default number of decimals shown for an EMF unit (0.001 mV resolution, as the reference tables). */
export function _defaultEmfDecimals(unit: EmfUnit): number {
  return unit === "uV" ? 0 : unit === "V" ? 6 : 3;
}
