/**
 * Firmware lookup tables: breakpoint placement (uniform power-of-two or adaptive), fixed-point storage,
 * and a proven bound on the worst error of the interpolated result against the exact ITS-90 conversion.
 *
 * Error bound. On a segment [a, b] of length h, linear interpolation of a C² function f errs by at most
 * max|f''|·(x−a)(b−x)/2 ≤ max|f''|·h²/8 (the linear interpolation error theorem; any numerical analysis
 * text, from memory). For an integer input only whole x occur, so the factor is ⌊h/2⌋·⌈h/2⌉/2.
 * max|f''| on a segment is bounded from 33 equally spaced samples of f'' as max|f''ₖ| + max|f''ₖ₊₁ − f''ₖ|
 * (the sampled maximum plus the largest step between neighbours, a margin for what lies between samples;
 * this is a sampled bound, not an interval enclosure). f'' comes from the library's analytic Seebeck
 * coefficient S(t) = dE/dt: S'(t) by a central difference of S with a 0.01 °C step within one sub-range
 * of the reference function; for EMF or code inputs (inverse tables) f'' = −k²·S'/S³ with k the µV per
 * input unit. Where a segment contains a seam between sub-ranges, the jump J of f' there (type N: S
 * jumps by 0.23 µV/°C at 0 °C) adds |J|·(s−a)(b−s)/(b−a), and any jump D of f adds |D|. Rounding adds, for integer outputs,
 * half a stored unit at the breakpoints plus half a stored unit in the nearest-rounded interpolation
 * (1 stored unit), and for float outputs 6 unit roundoffs of the largest output magnitude.
 * A dense search of the interpolated result (the C routine's exact arithmetic) against the exact
 * conversion then reports the largest error actually found and where.
 * @module
 */
import type { ThermocoupleType } from "../data/thermocoupleData.js";
import { _invalidChoice, _requireFinite, _requireInRange, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { thermocoupleTypes } from "../its90/resolveType.js";
import type { FirmwareAdcChain } from "./firmwareAdcChain.js";
import { _numberTypeInfo, _roundToNumberType, type _NumberTypeInfo, type FirmwareNumberType } from "./firmwareNumberType.js";
import { _interpolateStored, type _InterpolationData } from "./interpolateFirmwareTable.js";
import {
  _firmwareTableKinds,
  _tableFunction,
  type _TableFunction,
  type FirmwareTableKind,
  type FirmwareTableUnit,
} from "./tableFunction.js";

/** How breakpoints are placed. */
export type FirmwareTablePlacement = "adaptive" | "uniform";

/** Storage of one column: number type and fixed-point scale (stored = natural · scale). */
export interface FirmwareColumnFormat {
  /** Number type of the stored values. */
  readonly numberType: FirmwareNumberType;
  /**
   * Stored units per natural unit, finite and > 0 (default 1). E.g. 100 stores temperature in
   * centi-degrees, 1000 in milli-degrees; 1 stores EMF in whole µV.
   */
  readonly scale?: number;
}

/** Options of {@link buildFirmwareTable}. A plain JSON-able object. */
export interface BuildFirmwareTableOptions {
  /** Thermocouple type letter. */
  readonly type: ThermocoupleType;
  /** What the table converts; see {@link FirmwareTableKind}. */
  readonly kind: FirmwareTableKind;
  /**
   * Lowest temperature the table must cover, °C (hot junction, or cold-junction sensor for cold-junction
   * tables), within the type's range (for EMF/code inputs of type B: above about 42.13 °C, where the
   * inverse becomes unique).
   */
  readonly minC: number;
  /** Highest temperature the table must cover, °C, above `minC` and within the type's range. */
  readonly maxC: number;
  /**
   * Largest error allowed anywhere in the range, in the output's natural unit (°C for temperature
   * outputs, µV for EMF outputs, codes for ADC-code outputs), finite and > 0, and above the rounding
   * bound of the output format (1 stored unit for integer outputs).
   */
  readonly maxErrorOutputUnits: number;
  /**
   * `"adaptive"` (default): fewest breakpoints meeting the error (greedy farthest reach with bisection).
   * `"uniform"`: equal spacing of 2^k stored input units (shift-based indexing), the widest that meets
   * the error; needs an integer input type.
   */
  readonly placement?: FirmwareTablePlacement;
  /**
   * Input column format. Default: int32, scale 1 for EMF (whole µV) and codes; int32, scale 100
   * (centi-degrees) for temperatures.
   */
  readonly input?: FirmwareColumnFormat;
  /**
   * Output column format. Default: int32, scale 1000 (milli-degrees) for temperatures; int32, scale 1
   * for µV and codes. An integer output needs an integer input.
   */
  readonly output?: FirmwareColumnFormat;
  /** The ADC chain, required for the `…AdcCode…` kinds; see {@link FirmwareAdcChain}. */
  readonly chain?: FirmwareAdcChain;
  /** Cap on the number of breakpoints, an integer 2 … 65536 (default 4096). */
  readonly maxBreakpoints?: number;
}

/** One column of a built table. */
export interface FirmwareTableColumn {
  /** What the column holds, in words (e.g. `"EMF"`, `"temperature"`, `"ADC code"`). */
  readonly quantity: string;
  /** Natural unit. */
  readonly unit: FirmwareTableUnit;
  readonly numberType: FirmwareNumberType;
  /** Stored units per natural unit. */
  readonly scale: number;
  /** Lowest value: for the input, the lowest accepted input; for the output, the lowest stored value (stored units). */
  readonly min: number;
  /** Highest value (stored units), as `min`. */
  readonly max: number;
}

/** The reported error of a table, in the output's natural unit. */
export interface FirmwareTableErrorBound {
  /** Proven bound on |table − exact| anywhere in the input range: interpolation plus rounding (at least the largest error found). */
  readonly totalOutputUnits: number;
  /** Interpolation part, max|f''|·h²/8 on the worst segment. */
  readonly interpolationOutputUnits: number;
  /** Rounding part (fixed point or float). */
  readonly roundingOutputUnits: number;
  /** Index of the worst segment (breakpoints `segmentIndex` and `segmentIndex + 1`). */
  readonly segmentIndex: number;
  /** Temperature span of the worst segment, °C. */
  readonly fromC: number;
  readonly toC: number;
}

/** The largest error the dense search found. */
export interface FirmwareTableErrorFound {
  /** |table − exact|, output's natural unit. */
  readonly errorOutputUnits: number;
  /** Input where it occurs, stored units. */
  readonly atInputStored: number;
  /** Temperature there, °C. */
  readonly atTemperatureC: number;
  /** How many inputs the search evaluated. */
  readonly pointsChecked: number;
}

/** A built firmware table: breakpoints in stored units, formats and the error report. */
export interface FirmwareTable {
  readonly thermocoupleType: ThermocoupleType;
  readonly kind: FirmwareTableKind;
  readonly placement: FirmwareTablePlacement;
  /** The requested temperature range, °C. */
  readonly requestedMinC: number;
  readonly requestedMaxC: number;
  /** The temperatures the accepted input range spans, °C (may differ from the request by one input step). */
  readonly coveredMinC: number;
  readonly coveredMaxC: number;
  readonly input: FirmwareTableColumn;
  readonly output: FirmwareTableColumn;
  /** The chain the table was built for, with defaults filled in, or null. */
  readonly chain: Required<Omit<FirmwareAdcChain, "coldJunctionC">> & { readonly coldJunctionC: number | null } | null;
  /** log2 of the spacing of a uniform table, stored input units; null for adaptive tables. */
  readonly spacingLog2: number | null;
  /**
   * Breakpoint inputs, stored units, increasing. A uniform table's last breakpoint may lie beyond
   * `input.max`; its value then continues the last segment's chord.
   */
  readonly inputs: readonly number[];
  /** Breakpoint outputs, stored units. */
  readonly outputs: readonly number[];
  readonly requestedMaxErrorOutputUnits: number;
  readonly errorBound: FirmwareTableErrorBound;
  readonly maxErrorFound: FirmwareTableErrorFound;
  /** Order of the stored outputs. */
  readonly monotonic: "increasing" | "decreasing" | "none";
}

const DEFAULT_MAX_BREAKPOINTS = 4096;
const HARD_MAX_BREAKPOINTS = 65536;
const CURVATURE_SAMPLES = 32;
const DENSE_ALL_INTEGERS_UP_TO = 300_000;
const DENSE_POINTS_PER_SEGMENT = 128;

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

function overflow(quantity: string, value: number, info: _NumberTypeInfo, numberType: string, context: string): never {
  throw new HotjunctionRangeError({
    code: "OVERFLOW",
    quantity,
    value,
    min: info.min,
    max: info.max,
    unit: "stored units",
    context,
    problem: `does not fit the ${numberType} storage type (change the scale or use a wider type)`,
  });
}

function tooManyBreakpoints(needed: number, cap: number, context: string): never {
  throw new HotjunctionRangeError({
    code: "OUT_OF_RANGE",
    quantity: "breakpoint count",
    value: needed,
    min: 2,
    max: cap,
    context,
    problem: "is above the cap maxBreakpoints (raise the cap, loosen maxErrorOutputUnits or narrow the range)",
  });
}

/** Next representable value of the input type towards +∞ (dir 1) or −∞ (dir −1). */
function stepInward(x: number, dir: 1 | -1, info: _NumberTypeInfo, numberType: FirmwareNumberType): number {
  if (info.integer) return x + dir;
  const ulp = Math.max(Math.abs(x) * info.unitRoundoff * 2, Number.MIN_VALUE * 2 ** 60);
  return _roundToNumberType(x + dir * ulp, numberType);
}

/**
 * Builds a firmware lookup table for linear interpolation: places breakpoints (adaptive: fewest that meet
 * `maxErrorOutputUnits`; uniform: widest power-of-two spacing that meets it), stores them in the chosen
 * fixed-point or float formats, and reports a proven error bound (interpolation bound max|f''|·h²/8 per
 * segment plus rounding) and the largest error a dense search of the firmware arithmetic finds.
 * Output is deterministic: the same options give the same table.
 * @param options - see {@link BuildFirmwareTableOptions}
 * @returns the table and its error report; see {@link FirmwareTable}
 * @throws HotjunctionTypeError for a non-finite number or a malformed option object;
 *   HotjunctionRangeError: `OUT_OF_RANGE` for a range outside the type (or a chain's ADC codes), a
 *   maximum error ≤ 0 or not above the rounding bound, or more breakpoints than `maxBreakpoints`;
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
  // inward where outward would leave the function's domain.
  const toNatural = (xs: number): number => xs / input.scale;
  const loRaw = fn.inputAtTemperature(minC) * input.scale;
  const hiRaw = fn.inputAtTemperature(maxC) * input.scale;
  let lo = inInfo.integer ? Math.floor(loRaw + 1e-9) : _roundToNumberType(loRaw, input.numberType);
  let hi = inInfo.integer ? Math.ceil(hiRaw - 1e-9) : _roundToNumberType(hiRaw, input.numberType);
  for (let guard = 0; guard < 4 && !fn.inDomain(toNatural(lo)); guard++) lo = stepInward(lo, 1, inInfo, input.numberType);
  for (let guard = 0; guard < 4 && !fn.inDomain(toNatural(hi)); guard++) hi = stepInward(hi, -1, inInfo, input.numberType);
  if (lo < inInfo.min || lo > inInfo.max) overflow("lowest table input", lo, inInfo, input.numberType, context);
  if (hi < inInfo.min || hi > inInfo.max) overflow("highest table input", hi, inInfo, input.numberType, context);
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

  // Rounding part of the bound.
  let maxAbsOutput = 0;
  for (let k = 0; k <= 64; k++) {
    const xs = lo + ((hi - lo) * k) / 64;
    maxAbsOutput = Math.max(maxAbsOutput, Math.abs(fn.value(toNatural(k === 64 ? hi : xs))));
  }
  const roundingBound = outInfo.integer
    ? 1 / output.scale
    : 6 * Math.max(outInfo.unitRoundoff, inInfo.unitRoundoff) * maxAbsOutput * 1.01;
  const budget = maxError - roundingBound;
  if (!(budget > 0)) {
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

  const segmentBound = (a: number, b: number): number => {
    const h = b - a;
    if (inInfo.integer && h <= 1) return 0;
    let maxAbs = 0;
    let maxStep = 0;
    let previous = 0;
    for (let k = 0; k <= CURVATURE_SAMPLES; k++) {
      const xs = k === CURVATURE_SAMPLES ? b : a + (h * k) / CURVATURE_SAMPLES;
      const c = fn.curvature(toNatural(xs));
      maxAbs = Math.max(maxAbs, Math.abs(c));
      if (k > 0) maxStep = Math.max(maxStep, Math.abs(c - previous));
      previous = c;
    }
    const factor = inInfo.integer ? (Math.floor(h / 2) * Math.ceil(h / 2)) / 2 : (h * h) / 8;
    let bound = ((maxAbs + maxStep) * factor) / (input.scale * input.scale);
    // A seam inside the segment: f = smooth part + J·(x − s)₊ + D·step, and linear interpolation of the
    // kink errs by at most |J|·(s − a)(b − s)/(b − a); of the value jump by at most |D|.
    for (const seam of fn.seams) {
      const s = seam.input * input.scale;
      if (s > a && s < b) bound += (Math.abs(seam.slopeJump) * ((s - a) * (b - s))) / h / input.scale + seam.valueJump;
    }
    return bound;
  };
  const fits = (a: number, b: number): boolean => segmentBound(a, b) <= budget;

  let inputs: number[];
  let spacingLog2: number | null = null;
  if (placement === "adaptive") {
    inputs = [lo];
    let a = lo;
    let guess = inInfo.integer ? Math.max(1, Math.floor((hi - lo) / 16)) : (hi - lo) / 16;
    const tolerance = (hi - lo) * 1e-9;
    const roundInput = (v: number): number => (inInfo.integer ? Math.floor(v) : _roundToNumberType(v, input.numberType));
    while (a < hi) {
      let b: number;
      if (fits(a, hi)) {
        b = hi;
      } else {
        let good = inInfo.integer ? a + 1 : a;
        let bad = hi;
        let step = guess;
        for (;;) {
          const trial = roundInput(a + step);
          if (trial >= hi) break;
          if (trial > good) {
            if (fits(a, trial)) good = trial;
            else {
              bad = trial;
              break;
            }
          }
          step *= 2;
        }
        for (;;) {
          const gap = bad - good;
          if (inInfo.integer ? gap <= 1 : gap <= tolerance) break;
          const mid = roundInput(good + gap / 2);
          if (mid <= good || mid >= bad) break;
          if (fits(a, mid)) good = mid;
          else bad = mid;
        }
        if (good <= a) {
          throw new HotjunctionRangeError({
            code: "OUT_OF_RANGE",
            quantity: "maximum error",
            value: maxError,
            unit: fn.outputUnit,
            context,
            problem: "cannot be met at the input type's resolution",
          });
        }
        b = good;
      }
      inputs.push(b);
      if (inputs.length > cap) tooManyBreakpoints(inputs.length, cap, context);
      guess = Math.max(inInfo.integer ? 1 : 0, (b - a) / 2);
      a = b;
    }
  } else {
    const span = hi - lo;
    let chosen: number | null = null;
    for (let k = Math.ceil(Math.log2(span)); k >= 0; k--) {
      const step = 2 ** k;
      const segments = Math.ceil(span / step);
      if (segments + 1 > cap) tooManyBreakpoints(segments + 1, cap, context);
      let ok = true;
      for (let i = 0; i < segments && ok; i++) {
        const a = lo + i * step;
        ok = fits(a, Math.min(a + step, hi));
      }
      if (ok) {
        chosen = k;
        break;
      }
    }
    if (chosen === null) chosen = 0; // spacing 1 on an integer input is exact between breakpoints
    spacingLog2 = chosen;
    const step = 2 ** chosen;
    const segments = Math.ceil(span / step);
    inputs = [];
    for (let i = 0; i <= segments; i++) inputs.push(lo + i * step);
  }

  // Stored outputs (a uniform table's last breakpoint beyond hi continues the chord to hi).
  const outputs: number[] = [];
  const last = inputs.length - 1;
  for (let i = 0; i <= last; i++) {
    const xs = inputs[i] as number;
    if (xs < inInfo.min || xs > inInfo.max) overflow(`table input [${i}]`, xs, inInfo, input.numberType, context);
    let natural: number;
    if (xs > hi) {
      const xa = inputs[i - 1] as number;
      const ya = fn.value(toNatural(xa));
      const yh = fn.value(toNatural(hi));
      natural = ya + ((yh - ya) * (xs - xa)) / (hi - xa);
    } else {
      natural = fn.value(toNatural(xs));
    }
    const stored = _roundToNumberType(natural * output.scale, output.numberType);
    if (!(stored >= outInfo.min && stored <= outInfo.max)) {
      overflow(`table output [${i}]`, natural * output.scale, outInfo, output.numberType, context);
    }
    outputs.push(stored);
  }
  if (outInfo.integer) {
    for (let i = 0; i < last; i++) {
      const product = Math.abs((outputs[i + 1] as number) - (outputs[i] as number)) * ((inputs[i + 1] as number) - (inputs[i] as number));
      if (product + ((inputs[i + 1] as number) - (inputs[i] as number)) > 2 ** 53) {
        overflow(`interpolation product of segment ${i}`, product, { ...outInfo, min: -(2 ** 53), max: 2 ** 53 }, "64-bit (exact below 2^53)", context);
      }
    }
  }

  // Analytic bound per segment.
  let worst = -1;
  let worstInterpolation = -1;
  for (let i = 0; i < last; i++) {
    const bound = segmentBound(inputs[i] as number, Math.min(inputs[i + 1] as number, hi));
    if (bound > worstInterpolation) {
      worstInterpolation = bound;
      worst = i;
    }
  }

  // Dense search with the firmware's arithmetic.
  const data: _InterpolationData = {
    inputs,
    outputs,
    spacingLog2,
    inputNumberType: input.numberType,
    outputNumberType: output.numberType,
  };
  let found = -1;
  let foundAt = lo;
  let points = 0;
  const check = (xs: number): void => {
    const y = _interpolateStored(data, outInfo, xs) / output.scale;
    const error = Math.abs(y - fn.value(toNatural(xs)));
    points++;
    if (error > found) {
      found = error;
      foundAt = xs;
    }
  };
  if (inInfo.integer && hi - lo + 1 <= DENSE_ALL_INTEGERS_UP_TO) {
    for (let xs = lo; xs <= hi; xs++) check(xs);
  } else {
    for (let i = 0; i < last; i++) {
      const a = inputs[i] as number;
      const b = Math.min(inputs[i + 1] as number, hi);
      for (let k = 0; k < DENSE_POINTS_PER_SEGMENT; k++) {
        let xs = a + ((b - a) * k) / DENSE_POINTS_PER_SEGMENT;
        xs = inInfo.integer ? Math.round(xs) : _roundToNumberType(xs, input.numberType);
        if (xs >= a && xs <= b) check(xs);
      }
    }
    check(hi);
  }

  let monotonic: FirmwareTable["monotonic"] = "increasing";
  let up = true;
  let down = true;
  for (let i = 0; i < last; i++) {
    if ((outputs[i + 1] as number) < (outputs[i] as number)) up = false;
    if ((outputs[i + 1] as number) > (outputs[i] as number)) down = false;
  }
  monotonic = up ? "increasing" : down ? "decreasing" : "none";

  const analyticTotal = worstInterpolation + roundingBound;
  return {
    thermocoupleType: type,
    kind,
    placement,
    requestedMinC: minC,
    requestedMaxC: maxC,
    coveredMinC: fn.temperatureAt(toNatural(lo)),
    coveredMaxC: fn.temperatureAt(toNatural(hi)),
    input: { quantity: fn.inputQuantity, unit: fn.inputUnit, numberType: input.numberType, scale: input.scale, min: lo, max: hi },
    output: {
      quantity: fn.outputQuantity,
      unit: fn.outputUnit,
      numberType: output.numberType,
      scale: output.scale,
      min: Math.min(...outputs),
      max: Math.max(...outputs),
    },
    chain:
      chain === undefined
        ? null
        : {
            gain: chain.gain,
            offsetMillivolts: chain.offsetMillivolts,
            referenceVolts: chain.referenceVolts,
            bits: chain.bits,
            coldJunctionC: chain.coldJunctionC ?? null,
          },
    spacingLog2,
    inputs,
    outputs,
    requestedMaxErrorOutputUnits: maxError,
    errorBound: {
      totalOutputUnits: Math.max(analyticTotal, found),
      interpolationOutputUnits: worstInterpolation,
      roundingOutputUnits: roundingBound,
      segmentIndex: worst,
      fromC: fn.temperatureAt(toNatural(inputs[worst] as number)),
      toC: fn.temperatureAt(toNatural(Math.min(inputs[worst + 1] as number, hi))),
    },
    maxErrorFound: {
      errorOutputUnits: found,
      atInputStored: foundAt,
      atTemperatureC: fn.temperatureAt(toNatural(foundAt)),
      pointsChecked: points,
    },
    monotonic,
  };
}
