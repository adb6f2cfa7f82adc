/**
 * The results of `emf` and `temp` as printed, shared by the commander commands and the start-up fast path
 * (so both print the same bytes). Imports no argument parser.
 * @module
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { emfFromTemperature, temperatureFromEmf } from "../its90/convert.js";
import {
  _defaultEmfDecimals,
  _emfSymbol,
  _fromCelsius,
  _fromMillivolts,
  _temperatureSymbol,
  _toCelsius,
  _toMillivolts,
  type EmfUnit,
  type TemperatureUnit,
} from "./temperatureUnits.js";

/** Options of `emf` and `temp` that shape the result. */
export interface ConversionOptions {
  readonly unit: TemperatureUnit;
  readonly emfUnit: EmfUnit;
  readonly coldJunction?: number | undefined;
  readonly decimals?: number | undefined;
  readonly json?: boolean | undefined;
}

/** The text `hotjunction emf` prints (without the final newline). @internal */
export function _emfText(type: ThermocoupleType, temperature: number, options: ConversionOptions): string {
  // Deliberately alike: _tempText below is the inverse direction (EMF in, temperature out) with its own units.
  const temperatureC = _toCelsius(temperature, options.unit);
  const coldJunctionC = options.coldJunction === undefined ? 0 : _toCelsius(options.coldJunction, options.unit);
  const emfMillivolts = emfFromTemperature(type, temperatureC, { coldJunctionC });
  const shown = _fromMillivolts(emfMillivolts, options.emfUnit);
  if (options.json === true) {
    return JSON.stringify({ type, temperatureC, coldJunctionC, emfMillivolts, emf: shown, emfUnit: options.emfUnit }, null, 2);
  }
  const symbol = _temperatureSymbol(options.unit);
  const decimals = options.decimals ?? _defaultEmfDecimals(options.emfUnit);
  const cj = options.coldJunction === undefined ? `0 °C` : `${options.coldJunction} ${symbol}`;
  return `type ${type} at ${temperature} ${symbol}, cold junction ${cj}: ${shown.toFixed(decimals)} ${_emfSymbol(options.emfUnit)}`;
}

/** The text `hotjunction temp` prints (without the final newline). @internal */
export function _tempText(type: ThermocoupleType, emf: number, options: ConversionOptions): string {
  // Deliberately alike: _emfText above is the forward direction (temperature in, EMF out) with its own units.
  const emfMillivolts = _toMillivolts(emf, options.emfUnit);
  const coldJunctionC = options.coldJunction === undefined ? 0 : _toCelsius(options.coldJunction, options.unit);
  const temperatureC = temperatureFromEmf(type, emfMillivolts, { coldJunctionC });
  const shown = _fromCelsius(temperatureC, options.unit);
  if (options.json === true) {
    return JSON.stringify(
      { type, emfMillivolts, coldJunctionC, temperatureC, temperature: shown, temperatureUnit: options.unit },
      null,
      2,
    );
  }
  const symbol = _temperatureSymbol(options.unit);
  const cj = options.coldJunction === undefined ? `0 °C` : `${options.coldJunction} ${symbol}`;
  return `type ${type}, ${emf} ${_emfSymbol(options.emfUnit)} with cold junction ${cj}: ${shown.toFixed(options.decimals ?? 2)} ${symbol}`;
}
