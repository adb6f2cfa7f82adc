/**
 * The start-up fast path of the two commands a user runs most often and waits on: `emf` and `temp` with plain
 * arguments (`hotjunction emf K 500 --cold-junction 25 --json`). They are answered without loading the argument
 * parser or any other command's code. Anything else — an unknown or repeated option, `--help`, `--out`, a value
 * that is not a plain number or a listed choice — is left to the full parser, which writes every usage error;
 * the fast path only prints what the full parser would print, byte for byte, and lets a conversion error (a
 * temperature out of range) reach the same one-line report (a test compares both paths).
 * @module
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import type { CliIo } from "./io.js";
import { _readDecimal, _readWhole } from "./numbers.js";
import { emfUnits, temperatureUnits, type EmfUnit, type TemperatureUnit } from "./temperatureUnits.js";

/** The thermocouple letters the commands accept (the same list as `thermocoupleTypes`; a test compares them). */
export const _fastPathTypes: readonly string[] = ["B", "E", "J", "K", "N", "R", "S", "T"];

interface Parsed {
  unit?: TemperatureUnit;
  emfUnit?: EmfUnit;
  coldJunction?: number;
  decimals?: number;
  json?: boolean;
}

/** Parses `emf`/`temp` arguments the simple way, or returns undefined to leave them to the full parser. */
function parse(rest: readonly string[]): { positionals: string[]; options: Parsed } | undefined {
  const positionals: string[] = [];
  const options: Parsed = {};
  const seen = new Set<string>();
  for (let i = 0; i < rest.length; i++) {
    const token = rest[i] as string;
    if (!token.startsWith("-") || (token.length > 1 && _readDecimal(token) !== undefined && !token.startsWith("--"))) {
      positionals.push(token);
      continue;
    }
    if (seen.has(token)) return undefined;
    seen.add(token);
    if (token === "--json") {
      options.json = true;
      continue;
    }
    const value = rest[i + 1];
    if (value === undefined) return undefined;
    i++;
    if (token === "--unit") {
      if (!(temperatureUnits as readonly string[]).includes(value)) return undefined;
      options.unit = value as TemperatureUnit;
    } else if (token === "--emf-unit") {
      if (!(emfUnits as readonly string[]).includes(value)) return undefined;
      options.emfUnit = value as EmfUnit;
    } else if (token === "--cold-junction") {
      const n = _readDecimal(value);
      if (n === undefined) return undefined;
      options.coldJunction = n;
    } else if (token === "--decimals") {
      const n = _readWhole(value, 0, 15);
      if (n === undefined) return undefined;
      options.decimals = n;
    } else {
      return undefined;
    }
  }
  return { positionals, options };
}

/**
 * Answers `emf`/`temp` with plain arguments; returns the exit code, or undefined when the full parser must run.
 * Errors of the conversion itself (a temperature out of range) are thrown, for the caller's one-line report.
 * @internal
 */
export async function _tryFastPath(argv: readonly string[], io: CliIo): Promise<number | undefined> {
  const command = argv[0];
  if (command !== "emf" && command !== "temp") return undefined;
  const parsed = parse(argv.slice(1));
  if (parsed === undefined || parsed.positionals.length !== 2) return undefined;
  const [type, valueText] = parsed.positionals as [string, string];
  if (!_fastPathTypes.includes(type)) return undefined;
  const value = _readDecimal(valueText);
  if (value === undefined) return undefined;
  const { _emfText, _tempText } = await import("./conversionText.js");
  const options = { unit: parsed.options.unit ?? "C", emfUnit: parsed.options.emfUnit ?? "mV", ...parsed.options } as const;
  const text =
    command === "emf" ? _emfText(type as ThermocoupleType, value, options) : _tempText(type as ThermocoupleType, value, options);
  io.writeOut(`${text}\n`);
  return 0;
}
