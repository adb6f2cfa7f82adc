/**
 * Unit helpers at the edges of the library: temperature in °C, K and °F; voltage in V, mV and µV.
 * Inside hotjunction every temperature is °C and every thermocouple EMF is mV; convert at the edge.
 * @module
 */
import { _requireFinite, _requireFiniteResult, HotjunctionRangeError } from "./errors.js";

/** 0 °C in kelvin (ITS-90: T90/K = t90/°C + 273.15). */
export const kelvinAtZeroCelsius = 273.15;

function requireAboveAbsoluteZero(kelvin: number, value: number, unit: string): void {
  if (kelvin < 0) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "temperature",
      value,
      unit,
      problem: "is below absolute zero",
      min: unit === "K" ? 0 : unit === "°C" ? -kelvinAtZeroCelsius : -459.67,
    });
  }
}

/**
 * Converts °C to kelvin.
 * @param temperatureC - temperature in °C, not below −273.15
 * @returns temperature in K
 * @throws HotjunctionTypeError for a non-finite number; HotjunctionRangeError below absolute zero
 * @example
 * ```ts
 * import { celsiusToKelvin } from "hotjunction";
 * console.log(celsiusToKelvin(25)); // 298.15
 * ```
 */
export function celsiusToKelvin(temperatureC: number): number {
  _requireFinite(temperatureC, "temperature", "°C");
  const kelvin = temperatureC + kelvinAtZeroCelsius;
  requireAboveAbsoluteZero(kelvin, temperatureC, "°C");
  return kelvin;
}

/**
 * Converts kelvin to °C.
 * @param temperatureK - temperature in K, not negative
 * @returns temperature in °C
 * @throws HotjunctionTypeError for a non-finite number; HotjunctionRangeError below 0 K
 * @example
 * ```ts
 * import { kelvinToCelsius } from "hotjunction";
 * console.log(kelvinToCelsius(373.15)); // 100
 * ```
 */
export function kelvinToCelsius(temperatureK: number): number {
  _requireFinite(temperatureK, "temperature", "K");
  requireAboveAbsoluteZero(temperatureK, temperatureK, "K");
  return temperatureK - kelvinAtZeroCelsius;
}

/**
 * Converts °C to °F (t_F = 1.8·t_C + 32).
 * @param temperatureC - temperature in °C, not below −273.15
 * @returns temperature in °F
 * @throws HotjunctionTypeError for a non-finite number; HotjunctionRangeError below absolute zero
 * @example
 * ```ts
 * import { celsiusToFahrenheit } from "hotjunction";
 * console.log(celsiusToFahrenheit(100)); // 212
 * ```
 */
export function celsiusToFahrenheit(temperatureC: number): number {
  _requireFinite(temperatureC, "temperature", "°C");
  requireAboveAbsoluteZero(temperatureC + kelvinAtZeroCelsius, temperatureC, "°C");
  return _requireFiniteResult(temperatureC * 1.8 + 32, "temperature", temperatureC, "°C");
}

/**
 * Converts °F to °C.
 * @param temperatureF - temperature in °F, not below −459.67
 * @returns temperature in °C
 * @throws HotjunctionTypeError for a non-finite number; HotjunctionRangeError below absolute zero
 * @example
 * ```ts
 * import { fahrenheitToCelsius } from "hotjunction";
 * console.log(fahrenheitToCelsius(212)); // 100
 * ```
 */
export function fahrenheitToCelsius(temperatureF: number): number {
  _requireFinite(temperatureF, "temperature", "°F");
  const celsius = (temperatureF - 32) / 1.8;
  requireAboveAbsoluteZero(celsius + kelvinAtZeroCelsius, temperatureF, "°F");
  return celsius;
}

/**
 * Converts volts to millivolts.
 * @param volts - voltage in V
 * @returns voltage in mV
 * @throws HotjunctionTypeError for a non-finite number
 * @example
 * ```ts
 * import { voltsToMillivolts } from "hotjunction";
 * console.log(voltsToMillivolts(0.0125)); // 12.5
 * ```
 */
export function voltsToMillivolts(volts: number): number {
  return _requireFiniteResult(_requireFinite(volts, "voltage", "V") * 1000, "voltage", volts, "V");
}

/**
 * Converts millivolts to volts.
 * @param millivolts - voltage in mV
 * @returns voltage in V
 * @throws HotjunctionTypeError for a non-finite number
 * @example
 * ```ts
 * import { millivoltsToVolts } from "hotjunction";
 * console.log(millivoltsToVolts(250)); // 0.25
 * ```
 */
export function millivoltsToVolts(millivolts: number): number {
  return _requireFinite(millivolts, "voltage", "mV") / 1000;
}

/**
 * Converts microvolts to millivolts.
 * @param microvolts - voltage in µV
 * @returns voltage in mV
 * @throws HotjunctionTypeError for a non-finite number
 * @example
 * ```ts
 * import { microvoltsToMillivolts } from "hotjunction";
 * console.log(microvoltsToMillivolts(41)); // 0.041
 * ```
 */
export function microvoltsToMillivolts(microvolts: number): number {
  return _requireFinite(microvolts, "voltage", "µV") / 1000;
}

/**
 * Converts millivolts to microvolts.
 * @param millivolts - voltage in mV
 * @returns voltage in µV
 * @throws HotjunctionTypeError for a non-finite number
 * @example
 * ```ts
 * import { millivoltsToMicrovolts } from "hotjunction";
 * console.log(millivoltsToMicrovolts(1.5)); // 1500
 * ```
 */
export function millivoltsToMicrovolts(millivolts: number): number {
  return _requireFiniteResult(_requireFinite(millivolts, "voltage", "mV") * 1000, "voltage", millivolts, "mV");
}
