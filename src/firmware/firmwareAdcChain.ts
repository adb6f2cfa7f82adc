/**
 * The small, self-contained ADC chain description used by firmware tables.
 * @module
 */
import { _requireAdcBits } from "../chain/adc.js";
import { _requireFinite, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";

/**
 * An idealised measurement chain for firmware tables: thermocouple EMF, amplified by `gain`, shifted by
 * `offsetMillivolts`, converted by a unipolar ADC of `bits` bits over 0 … `fullScaleVolts` (the name the design
 * file and the chain's ADC element use).
 *
 * code = (gain · E_measured[mV] + offsetMillivolts) / (1000 · fullScaleVolts / 2^bits)
 *
 * The full chain models (tolerances, drift, noise) live elsewhere in the library; this object only
 * fixes the nominal mapping a table is built for.
 */
export interface FirmwareAdcChain {
  /** Amplifier gain, V/V, finite and > 0 (e.g. 100). */
  readonly gain: number;
  /** Offset added at the ADC input, mV, finite (default 0), e.g. a level shift so negative EMFs stay above code 0. */
  readonly offsetMillivolts?: number;
  /** ADC full-scale (reference) voltage, V, finite and > 0 (e.g. 2.5). Required unless the deprecated `referenceVolts` is given. */
  readonly fullScaleVolts?: number;
  /**
   * The same full-scale voltage under its former name.
   * @deprecated use `fullScaleVolts` (kept for one minor version; accepted when `fullScaleVolts` is absent or equal).
   */
  readonly referenceVolts?: number;
  /** ADC resolution, bits, an integer 1 … 32 (the one range of the library, `chain/adc.ts`). */
  readonly bits: number;
  /**
   * Fixed cold-junction temperature, °C, within the type's range. When given, the table maps the raw code
   * straight to the hot-junction temperature. When omitted, the table's input is the compensated code
   * (raw code plus the cold-junction code from a `"coldJunctionToAdcCode"` table of the same chain).
   */
  readonly coldJunctionC?: number;
}

/** A checked chain with its derived LSB. @internal */
export interface _CheckedAdcChain {
  readonly gain: number;
  readonly offsetMillivolts: number;
  readonly fullScaleVolts: number;
  readonly bits: number;
  readonly coldJunctionC: number | undefined;
  /** One code in mV at the ADC input. */
  readonly lsbMillivolts: number;
  /** Highest code, 2^bits − 1. */
  readonly maxCode: number;
}

/** A chain figure that must be finite and positive (gain, full-scale voltage), with the chain's own message. */
function requirePositiveFigure(value: unknown, quantity: string, unit: string, context: string): number {
  const x = _requireFinite(value, quantity, unit, context);
  if (x <= 0) throw new HotjunctionRangeError({ code: "OUT_OF_RANGE", quantity, value: x, unit, context, problem: "is not positive" });
  return x;
}

/** Validates a chain object. @internal */
export function _checkAdcChain(chain: unknown, context: string): _CheckedAdcChain {
  // Same error shape as other object checks (deliberate: this one names the ADC chain and its fields).
  if (typeof chain !== "object" || chain === null) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "ADC chain",
      value: chain,
      problem: "is not a chain object { gain, fullScaleVolts, bits, offsetMillivolts?, coldJunctionC? }",
      context,
    });
  }
  const c = chain as Record<string, unknown>;
  const gain = requirePositiveFigure(c["gain"], "ADC chain gain", "V/V", context);
  const fullScaleVolts = requirePositiveFigure(fullScaleOf(c, context), "ADC full-scale voltage", "V", context);
  const bits = _requireAdcBits(c["bits"], context, "ADC resolution");
  const offsetMillivolts =
    c["offsetMillivolts"] === undefined ? 0 : _requireFinite(c["offsetMillivolts"], "ADC offset", "mV", context);
  const coldJunctionC =
    c["coldJunctionC"] === undefined
      ? undefined
      : _requireFinite(c["coldJunctionC"], "cold-junction temperature", "°C", context);
  const lsbMillivolts = (1000 * fullScaleVolts) / 2 ** bits;
  return { gain, offsetMillivolts, fullScaleVolts, bits, coldJunctionC, lsbMillivolts, maxCode: 2 ** bits - 1 };
}

/** `fullScaleVolts`, or the deprecated `referenceVolts` when it is absent; both given must agree. */
function fullScaleOf(c: Record<string, unknown>, context: string): unknown {
  const fullScale = c["fullScaleVolts"];
  const former = c["referenceVolts"];
  if (fullScale === undefined) return former;
  if (former !== undefined && !Object.is(former, fullScale)) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "ADC chain referenceVolts (deprecated name of fullScaleVolts)",
      value: former,
      unit: "V",
      context,
      problem: `differs from fullScaleVolts ${String(fullScale)} V; give fullScaleVolts alone`,
    });
  }
  return fullScale;
}
