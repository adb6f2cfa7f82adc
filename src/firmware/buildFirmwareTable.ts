/**
 * Firmware lookup tables: the builder. Checks the request, fixes the accepted input range, then places
 * breakpoints (`placement.ts`) against the segment bound (`segmentBound.ts`: interpolation from an interval
 * enclosure of |f''|, plus the reference values' float64 error), stores and checks them (`tableOutputs.ts`)
 * and reports the bound. A table is never returned with a bound above its request: when the dense search
 * finds more than the analytic bound, the builder tightens the budget and places again (twice at most), then
 * refuses with a typed error.
 * @module
 */
import { _invalidChoice, _requireFinite, _requireInRange, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { thermocoupleTypes } from "../its90/resolveType.js";
import { _numberTypeInfo, _roundToNumberType, type _NumberTypeInfo, type FirmwareNumberType } from "./firmwareNumberType.js";
import { _placeAdaptive, _placeUniform, type _PlacementRequest } from "./placement.js";
import { _segmentBound } from "./segmentBound.js";
import { _firmwareTableKinds, _tableFunction, type _TableFunction, type FirmwareTableKind } from "./tableFunction.js";
import { _denseSearch, _monotonic, _overflow, _roundingBound, _storeOutputs, type _Column } from "./tableOutputs.js";
import type { BuildFirmwareTableOptions, FirmwareTable, FirmwareTablePlacement } from "./types.js";
import { _maxOf, _minOf } from "../extremes.js";

export type {
  BuildFirmwareTableOptions,
  FirmwareColumnFormat,
  FirmwareTable,
  FirmwareTableColumn,
  FirmwareTableErrorBound,
  FirmwareTableErrorFound,
  FirmwareTablePlacement,
} from "./types.js";

const DEFAULT_MAX_BREAKPOINTS = 4096;
const HARD_MAX_BREAKPOINTS = 65536;

function checkColumn(
  format: unknown,
  fallback: { numberType: FirmwareNumberType; scale: number },
  quantity: string,
  context: string,
): { numberType: FirmwareNumberType; scale: number; info: _NumberTypeInfo } {
  if (format === undefined) return { ...fallback, info: _numberTypeInfo(fallback.numberType, quantity, context) };
  if (typeof format !== "object" || format === null) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: `${quantity} format`,
      value: format,
      problem: "is not a { numberType, scale? } object",
      context,
    });
  }
  const f = format as Record<string, unknown>;
  const info = _numberTypeInfo(f["numberType"], `${quantity} number type`, context);
  const scale = f["scale"] === undefined ? 1 : _requireFinite(f["scale"], `${quantity} scale`, undefined, context);
  if (scale <= 0) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: `${quantity} scale`,
      value: scale,
      context,
      problem: "is not positive",
    });
  }
  return { numberType: f["numberType"] as FirmwareNumberType, scale, info };
}

/** Next representable value of the input type towards +∞ (dir 1) or −∞ (dir −1). */
function stepInward(x: number, dir: 1 | -1, info: _NumberTypeInfo, numberType: FirmwareNumberType): number {
  if (info.integer) return x + dir;
  const ulp = Math.max(Math.abs(x) * info.unitRoundoff * 2, Number.MIN_VALUE * 2 ** 60);
  return _roundToNumberType(x + dir * ulp, numberType);
}

/** A checked request. */
interface Request {
  readonly type: BuildFirmwareTableOptions["type"];
  readonly kind: FirmwareTableKind;
  readonly placement: FirmwareTablePlacement;
  readonly fn: _TableFunction;
  readonly minC: number;
  readonly maxC: number;
  readonly maxError: number;
  readonly cap: number;
  readonly input: _Column;
  readonly output: _Column;
  readonly context: string;
}

/** Checks the options and fills in the defaults. */
function checkRequest(options: BuildFirmwareTableOptions): Request {
  // Same error shape as other object checks (deliberate: errors.ts `_requireOptionsObject` would also refuse an
  // array here, which today reaches the type check below with its own message).
  if (typeof options !== "object" || options === null) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "options",
      value: options,
      problem: "is not an options object",
      context: "firmware table",
    });
  }
  const type = options.type;
  if (!thermocoupleTypes.includes(type)) _invalidChoice("thermocouple type", type, thermocoupleTypes, "firmware table");
  const kind = options.kind;
  if (!_firmwareTableKinds.includes(kind)) _invalidChoice("table kind", kind, _firmwareTableKinds, "firmware table");
  const context = `firmware table (${kind}, type ${type})`;
  const placement = options.placement ?? "adaptive";
  if (placement !== "adaptive" && placement !== "uniform") {
    _invalidChoice("placement", placement, ["adaptive", "uniform"], context);
  }
  const fn = _tableFunction(type, kind, options.chain, context);

  const minC = _requireInRange(options.minC, "minimum temperature", fn.allowedMinC, fn.allowedMaxC, "°C", context);
  const maxC = _requireInRange(options.maxC, "maximum temperature", fn.allowedMinC, fn.allowedMaxC, "°C", context);
  if (maxC <= minC) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "maximum temperature",
      value: maxC,
      min: minC,
      unit: "°C",
      context,
      problem: "is not above the minimum temperature",
    });
  }
  const maxError = _requireFinite(options.maxErrorOutputUnits, "maximum error", fn.outputUnit, context);
  if (maxError <= 0) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "maximum error",
      value: maxError,
      unit: fn.outputUnit,
      context,
      problem: "is not positive",
    });
  }
  const cap =
    options.maxBreakpoints === undefined
      ? DEFAULT_MAX_BREAKPOINTS
      : _requireInRange(options.maxBreakpoints, "maxBreakpoints", 2, HARD_MAX_BREAKPOINTS, undefined, context);
  if (!Number.isInteger(cap)) {
    // Same error shape as other typed-error checks (deliberate: each names its own quantity and problem).
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "maxBreakpoints",
      value: cap,
      context,
      problem: "is not a whole number",
    });
  }

  const temperatureInput = fn.inputUnit === "°C";
  const input = checkColumn(options.input, { numberType: "int32", scale: temperatureInput ? 100 : 1 }, "input", context);
  const output = checkColumn(
    options.output,
    { numberType: "int32", scale: fn.outputUnit === "°C" ? 1000 : 1 },
    "output",
    context,
  );
  const inInfo = input.info;
  const outInfo = output.info;
  if (outInfo.integer && !inInfo.integer) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "input number type",
      value: input.numberType,
      context,
      problem: "is a float type, but the output is an integer type (use an integer input or a float output)",
    });
  }
  if (placement === "uniform" && !inInfo.integer) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "placement",
      value: placement,
      context,
      problem: "needs an integer input type (shift-based indexing)",
    });
  }

  // Accepted input range in stored units: the requested range rounded outward to the input's grid, or
  return { type, kind, placement, fn, minC, maxC, maxError, cap, input, output, context };
}

/**
 * Accepted input range in stored units: the requested range rounded outward to the input's grid, or
 * inward where outward would leave the function's domain.
 */
function acceptedRange(r: Request): { lo: number; hi: number } {
  const { fn, input, minC, maxC, context } = r;
  const inInfo = input.info;
  const toNatural = (xs: number): number => xs / input.scale;
  const loRaw = fn.inputAtTemperature(minC) * input.scale;
  const hiRaw = fn.inputAtTemperature(maxC) * input.scale;
  let lo = inInfo.integer ? Math.floor(loRaw + 1e-9) : _roundToNumberType(loRaw, input.numberType);
  let hi = inInfo.integer ? Math.ceil(hiRaw - 1e-9) : _roundToNumberType(hiRaw, input.numberType);
  for (let guard = 0; guard < 4 && !fn.inDomain(toNatural(lo)); guard++) lo = stepInward(lo, 1, inInfo, input.numberType);
  for (let guard = 0; guard < 4 && !fn.inDomain(toNatural(hi)); guard++) hi = stepInward(hi, -1, inInfo, input.numberType);
  if (lo < inInfo.min || lo > inInfo.max) _overflow("lowest table input", lo, inInfo, input.numberType, context);
  if (hi < inInfo.min || hi > inInfo.max) _overflow("highest table input", hi, inInfo, input.numberType, context);
  if (!(hi > lo) || !fn.inDomain(toNatural(lo)) || !fn.inDomain(toNatural(hi))) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "temperature span",
      value: maxC - minC,
      unit: "°C",
      context,
      problem: "covers less than one input step",
    });
  }
  const chain = fn.chain;
  if (chain !== undefined && chain.coldJunctionC !== undefined && fn.inputUnit === "code") {
    for (const code of [toNatural(lo), toNatural(hi)]) {
      // Same error shape as the probe ageing's hours check (deliberate: each names its own quantity and range).
      if (code < 0 || code > chain.maxCode) {
        throw new HotjunctionRangeError({
          code: "OUT_OF_RANGE",
          quantity: "ADC code",
          value: code,
          min: 0,
          max: chain.maxCode,
          context,
          problem: `is outside the ADC's codes: ${minC} … ${maxC} °C does not fit the chain's span`,
        });
      }
    }
  }
  return { lo, hi };
}

/**
 * Builds a firmware lookup table for linear interpolation: places breakpoints (adaptive: fewest that meet
 * `maxErrorOutputUnits`; uniform: widest power-of-two spacing that meets it), stores them in the chosen
 * fixed-point or float formats, and reports an error bound (interpolation bound max|f''|·h²/8 per segment
 * from an interval enclosure of f'', plus rounding, plus the reference values' float64 error) that is never
 * above the request, and the largest error a dense search of the firmware arithmetic finds.
 * Output is deterministic: the same options give the same table.
 * @param options - see {@link BuildFirmwareTableOptions}
 * @returns the table and its error report; see {@link FirmwareTable}
 * @throws HotjunctionTypeError for a non-finite number or a malformed option object;
 *   HotjunctionRangeError: `OUT_OF_RANGE` for a range outside the type (or a chain's ADC codes), a
 *   maximum error ≤ 0, not above the rounding bound or not reachable at the input's resolution and
 *   the reference's accuracy, or more breakpoints than `maxBreakpoints`;
 *   `OVERFLOW` for a value that does not fit its storage type (or a 64-bit interpolation product above
 *   2^53); `INVALID_OPTION` for an unknown kind, type, placement or number type, or an integer output fed
 *   by a float input
 * @example
 * ```ts
 * import { buildFirmwareTable } from "hotjunction";
 * const table = buildFirmwareTable({ type: "K", kind: "emfToTemperature", minC: 0, maxC: 500, maxErrorOutputUnits: 0.05 });
 * console.log(table.inputs.length, table.errorBound.totalOutputUnits <= 0.05); // 17 true
 * ```
 * @see the linear interpolation error theorem (any numerical analysis text, from memory)
 */
export function buildFirmwareTable(options: BuildFirmwareTableOptions): FirmwareTable {
  const r = checkRequest(options);
  const { fn, input, output, maxError, context } = r;
  const { lo, hi } = acceptedRange(r);
  const roundingBound = _roundingBound(fn, input, output, lo, hi);
  if (!(maxError - roundingBound > 0)) {
    throw new HotjunctionRangeError({
      code: "OUT_OF_RANGE",
      quantity: "maximum error",
      value: maxError,
      min: roundingBound,
      unit: fn.outputUnit,
      context,
      problem: "is not above the rounding bound of the output format (raise the output scale or use a float output)",
    });
  }
  // Never return a bound above the request: a dense-search error beyond the analytic bound tightens the
  // budget and places again, then refuses.
  let budget = maxError - roundingBound;
  for (let attempt = 0; attempt < 3; attempt++) {
    const table = buildWithBudget(r, lo, hi, roundingBound, budget);
    if (table.errorBound.totalOutputUnits <= maxError) return table;
    budget *= Math.min(0.5, (maxError / table.errorBound.totalOutputUnits) * 0.9);
  }
  return unmet(r);
}

function unmet(r: Request): never {
  throw new HotjunctionRangeError({
    code: "OUT_OF_RANGE",
    quantity: "maximum error",
    value: r.maxError,
    unit: r.fn.outputUnit,
    context: r.context,
    problem: "cannot be met at the input type's resolution and the reference's float64 accuracy",
  });
}

/** One placement against `budget` (interpolation plus reference error per segment), with its report. */
function buildWithBudget(r: Request, lo: number, hi: number, roundingBound: number, budget: number): FirmwareTable {
  const { fn, input, output, context } = r;
  const bound = (a: number, b: number): { interpolation: number; reference: number } =>
    _segmentBound(fn, input.info.integer, input.scale, a, b);
  const request: _PlacementRequest = {
    lo,
    hi,
    integerInput: input.info.integer,
    inputNumberType: input.numberType,
    cap: r.cap,
    context,
    fits: (a, b) => {
      const s = bound(a, b);
      return s.interpolation + s.reference <= budget;
    },
    unmet: () => unmet(r),
  };
  let inputs: number[];
  let spacingLog2: number | null = null;
  if (r.placement === "adaptive") {
    inputs = _placeAdaptive(request);
  } else {
    ({ spacingLog2, inputs } = _placeUniform(request));
  }
  const outputs = _storeOutputs(fn, inputs, hi, input, output, context);
  const last = inputs.length - 1;

  // Analytic bound per segment; the worst segment by interpolation plus reference error.
  let worst = 0;
  let worstTotal = -1;
  let worstSegment = { interpolation: 0, reference: 0 };
  let maxReference = 0;
  for (let i = 0; i < last; i++) {
    const s = bound(inputs[i] as number, Math.min(inputs[i + 1] as number, hi));
    maxReference = Math.max(maxReference, s.reference);
    if (s.interpolation + s.reference > worstTotal) {
      worstTotal = s.interpolation + s.reference;
      worstSegment = s;
      worst = i;
    }
  }
  const data = { inputs, outputs, spacingLog2, inputNumberType: input.numberType, outputNumberType: output.numberType };
  const found = _denseSearch(fn, data, input, output, lo, hi);
  const analyticTotal = worstTotal + roundingBound;
  const toNatural = (xs: number): number => xs / input.scale;
  const chain = fn.chain;
  return {
    thermocoupleType: r.type,
    kind: r.kind,
    placement: r.placement,
    requestedMinC: r.minC,
    requestedMaxC: r.maxC,
    coveredMinC: fn.temperatureAt(toNatural(lo)),
    coveredMaxC: fn.temperatureAt(toNatural(hi)),
    input: { quantity: fn.inputQuantity, unit: fn.inputUnit, numberType: input.numberType, scale: input.scale, min: lo, max: hi },
    output: {
      quantity: fn.outputQuantity,
      unit: fn.outputUnit,
      numberType: output.numberType,
      scale: output.scale,
      min: _minOf(outputs),
      max: _maxOf(outputs),
    },
    chain:
      chain === undefined
        ? null
        : {
            gain: chain.gain,
            offsetMillivolts: chain.offsetMillivolts,
            fullScaleVolts: chain.fullScaleVolts,
            referenceVolts: chain.fullScaleVolts,
            bits: chain.bits,
            coldJunctionC: chain.coldJunctionC ?? null,
          },
    spacingLog2,
    inputs,
    outputs,
    requestedMaxErrorOutputUnits: r.maxError,
    errorBound: {
      totalOutputUnits: Math.max(analyticTotal, found.errorOutputUnits + maxReference),
      interpolationOutputUnits: worstSegment.interpolation,
      roundingOutputUnits: roundingBound,
      referenceOutputUnits: worstSegment.reference,
      curvatureMethod: fn.curvatureMethod,
      segmentIndex: worst,
      fromC: fn.temperatureAt(toNatural(inputs[worst] as number)),
      toC: fn.temperatureAt(toNatural(Math.min(inputs[worst + 1] as number, hi))),
    },
    maxErrorFound: found,
    monotonic: _monotonic(outputs),
  };
}
