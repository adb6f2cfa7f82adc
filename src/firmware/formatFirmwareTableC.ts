/**
 * C header emitter for firmware tables.
 * @module
 */
import { _requireShape, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import type { FirmwareTable } from "./types.js";
import { firmwareTableCaution } from "./firmwareCaution.js";
import { _numberTypeInfo, type FirmwareNumberType } from "./firmwareNumberType.js";
import { _checkFirmwareTable, _firmwareReportShape } from "./_firmwareTableShape.js";

/** Options of {@link formatFirmwareTableC}. */
export interface FormatFirmwareTableCOptions {
  /**
   * Name prefix of every emitted identifier: a C identifier of 1 … 40 characters starting with a letter
   * (letters, digits, `_`), not a C99 keyword. Arrays and the routine use it as given
   * (`<prefix>_outputs`, `<prefix>_lookup`), macros in upper case (`<PREFIX>_COUNT`). Default `"tc_table"`.
   */
  readonly prefix?: string;
}

// Marked pure so that bundles which never emit C drop it (sideEffects: false covers modules, not statements).
const C_KEYWORDS = /* @__PURE__ */ new Set([
  "auto", "break", "case", "char", "const", "continue", "default", "do", "double", "else", "enum", "extern",
  "float", "for", "goto", "if", "inline", "int", "long", "register", "restrict", "return", "short", "signed",
  "sizeof", "static", "struct", "switch", "typedef", "union", "unsigned", "void", "volatile", "while", "_Bool",
  "_Complex", "_Imaginary",
]);

/** Validates a C identifier prefix. @internal */
export function _checkPrefix(prefix: unknown): string {
  if (typeof prefix !== "string") {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "prefix",
      value: prefix,
      context: "C header",
      problem: "is not a string",
    });
  }
  if (!/^[A-Za-z][A-Za-z0-9_]{0,39}$/.test(prefix) || C_KEYWORDS.has(prefix)) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "prefix",
      value: prefix,
      context: "C header",
      problem:
        "is not a usable C identifier (1 to 40 letters, digits or '_', starting with a letter, not a C keyword)",
    });
  }
  return prefix;
}

/** A C literal of a stored value, exact for its type. @internal */
export function _cLiteral(value: number, numberType: FirmwareNumberType): string {
  if (numberType === "float32" || numberType === "float64") {
    let text = String(value);
    if (!/[.e]/.test(text)) text += ".0";
    text = text.replace("e+", "e");
    return numberType === "float32" ? `${text}f` : text;
  }
  if (numberType === "int32" && value === -2147483648) return "(-2147483647 - 1)";
  if (numberType === "int16" && value === -32768) return "(-32767 - 1)";
  if (numberType === "uint32" || numberType === "uint16") return `${value}u`;
  return value < 0 ? `(${value})` : String(value);
}

/**
 * An exact C99 hexadecimal literal of a float value (`0x1.8p+1f`): exact at any evaluation precision, which a
 * shortest decimal is not where FLT_EVAL_METHOD 2 evaluates constants in long double. @internal
 */
export function _cHexLiteral(value: number, numberType: "float32" | "float64"): string {
  const suffix = numberType === "float32" ? "f" : "";
  if (value === 0) return `${Object.is(value, -0) ? "-" : ""}0x0p+0${suffix}`;
  const sign = value < 0 ? "-" : "";
  let magnitude = Math.abs(value);
  let exponent = Math.floor(Math.log2(magnitude));
  if (2 ** exponent > magnitude) exponent--;
  else if (2 ** (exponent + 1) <= magnitude) exponent++;
  // A subnormal double keeps the smallest normal exponent's scaling exact in two steps.
  magnitude = magnitude / 2 ** Math.max(exponent, -1022) / 2 ** Math.min(0, exponent + 1022);
  const fraction = Math.round((magnitude - 1) * 2 ** 52)
    .toString(16)
    .padStart(13, "0")
    .replace(/0+$/, "");
  return `${sign}0x1${fraction === "" ? "" : `.${fraction}`}p${exponent >= 0 ? "+" : ""}${exponent}${suffix}`;
}

/** The range macros' literal: exact hexadecimal for floats (with the decimal value in a comment). */
function rangeLiteral(value: number, numberType: FirmwareNumberType): string {
  if (numberType === "float32" || numberType === "float64") return `${_cHexLiteral(value, numberType)} /* ${_cLiteral(value, numberType)} */`;
  return _cLiteral(value, numberType);
}

function arrayBody(values: readonly number[], numberType: FirmwareNumberType): string {
  const perLine = numberType.startsWith("float") ? 4 : 8;
  const lines: string[] = [];
  for (let i = 0; i < values.length; i += perLine) {
    lines.push(
      "    " +
        values
          .slice(i, i + perLine)
          .map((v) => _cLiteral(v, numberType).replace(/^\((-\d+)\)$/, "$1"))
          .join(", ") +
        ",",
    );
  }
  return lines.join("\n");
}

const ASCII_UNIT: Record<string, string> = { "µV": "uV", "°C": "degC", code: "code" };

function g(value: number): string {
  return Number(value.toPrecision(6)).toString();
}

/** The header's opening comment: caution, columns, chain, range, breakpoints and the error report. */
function headerComment(table: FirmwareTable, prefix: string, inType: string, outType: string): string[] {
  const n = table.inputs.length;
  const uniform = table.spacingLog2 !== null;
  const inUnit = ASCII_UNIT[table.input.unit] ?? table.input.unit;
  const outUnit = ASCII_UNIT[table.output.unit] ?? table.output.unit;
  const b = table.errorBound;
  const f = table.maxErrorFound;
  const lines: string[] = [];
  lines.push(`/* ${prefix}.h - type ${table.thermocoupleType} thermocouple, ${table.kind} lookup table.`);
  lines.push(" * Generated by hotjunction; regenerate rather than edit.");
  lines.push(" *");
  const caution = firmwareTableCaution.split(" ");
  let line = " *";
  for (const word of caution) {
    if (line.length + word.length + 1 > 100) {
      lines.push(line);
      line = " *";
    }
    line += ` ${word}`;
  }
  lines.push(line);
  lines.push(" *");
  const inRef =
    table.input.unit === "µV"
      ? " (reference junction at 0 degC)"
      : table.chain !== null && table.input.unit === "code"
        ? table.chain.coldJunctionC !== null
          ? ` (raw code, cold junction fixed at ${table.chain.coldJunctionC} degC)`
          : " (raw code plus the cold-junction code)"
        : "";
  lines.push(` * Input:  ${table.input.quantity}${inRef}, ${inUnit}; ${inType}, stored = ${inUnit} * ${table.input.scale}`);
  lines.push(` * Output: ${table.output.quantity}, ${outUnit}; ${outType}, stored = ${outUnit} * ${table.output.scale}`);
  if (table.chain !== null) {
    const c = table.chain;
    lines.push(
      ` * ADC chain: gain ${c.gain}, offset ${c.offsetMillivolts} mV, full scale ${c.fullScaleVolts} V, ${c.bits} bits` +
        (c.coldJunctionC !== null ? `, cold junction ${c.coldJunctionC} degC` : ""),
    );
  }
  lines.push(
    ` * Range:  ${g(table.coveredMinC)} to ${g(table.coveredMaxC)} degC (requested ${table.requestedMinC} to ${table.requestedMaxC} degC)`,
  );
  lines.push(
    ` * Breakpoints: ${n}, ${table.placement}` + (uniform ? `, spacing 2^${table.spacingLog2} stored input units` : ""),
  );
  lines.push(
    ` * Error bound: ${g(b.totalOutputUnits)} ${outUnit} (interpolation ${g(b.interpolationOutputUnits)} + rounding ${g(b.roundingOutputUnits)}),`,
  );
  lines.push(
    ` *   worst on segment ${b.segmentIndex} (${g(b.fromC)} to ${g(b.toC)} degC); requested ${table.requestedMaxErrorOutputUnits} ${outUnit}`,
  );
  lines.push(
    ` * Largest error found by a dense search (${f.pointsChecked} inputs): ${g(f.errorOutputUnits)} ${outUnit} at input ${g(f.atInputStored)} (${g(f.atTemperatureC)} degC)`,
  );
  lines.push(" */");
  return lines;
}

/** The documented `static inline` lookup routine. */
function lookupRoutine(
  table: FirmwareTable,
  prefix: string,
  macro: string,
  integerInput: boolean,
  integerOutput: boolean,
  inType: string,
  outType: string,
): string[] {
  const uniform = table.spacingLog2 !== null;
  const lines: string[] = [];
  lines.push(`/* Linear interpolation in the table. Returns 0 and writes *out when x is within`);
  lines.push(` * ${macro}_INPUT_MIN..${macro}_INPUT_MAX; returns -1 below the range${integerInput ? "" : " or for NaN"}, 1 above it,`);
  lines.push(" * and leaves *out untouched then: never use an out-of-range reading as a temperature.");
  if (integerOutput) {
    lines.push(" * Arithmetic: 64-bit integers, the segment result rounded to nearest (halves away from zero). */");
  } else {
    lines.push(` * Arithmetic: ${outType}, one rounding per operation. Bit-identical to the library with FLT_EVAL_METHOD 0`);
    lines.push(" * and no contraction; a fused multiply-add (-ffp-contract=fast, -march=native) or wider intermediates");
    lines.push(" * (FLT_EVAL_METHOD 1 or 2, e.g. x87 -mfpmath=387) change the last bits but stay within the error bound,");
    lines.push(" * which counts 6 unit roundoffs of the largest output with a 1% margin (a fused operation rounds less;");
    lines.push(" * a double rounding errs by at most u(1 + 2^-11) per operation). Other methods are refused below. */");
  }
  lines.push(`static inline int ${prefix}_lookup(${inType} x, ${outType} *out)`);
  lines.push("{");
  if (uniform) {
    lines.push("    uint32_t lo;");
    lines.push("    int64_t xl;");
  } else {
    lines.push("    uint32_t lo = 0u;");
    lines.push(`    uint32_t hi = ${macro}_COUNT - 1u;`);
  }
  lines.push(`    if (!(x >= ${macro}_INPUT_MIN)) return -1;`);
  lines.push(`    if (x > ${macro}_INPUT_MAX) return 1;`);
  if (uniform) {
    lines.push(`    lo = (uint32_t)(((int64_t)x - ${macro}_INPUT_MIN) >> ${macro}_SHIFT);`);
    lines.push(`    if (lo > ${macro}_COUNT - 2u) lo = ${macro}_COUNT - 2u;`);
    lines.push(`    xl = (int64_t)${macro}_INPUT_MIN + ((int64_t)lo << ${macro}_SHIFT);`);
    lines.push("    {");
    if (integerOutput) {
      lines.push(`        const int64_t dx = (int64_t)1 << ${macro}_SHIFT;`);
      lines.push(`        const int64_t num = ((int64_t)${prefix}_outputs[lo + 1u] - ${prefix}_outputs[lo]) * ((int64_t)x - xl);`);
      lines.push("        const int64_t q = num >= 0 ? (num + dx / 2) / dx : -((-num + dx / 2) / dx);");
      lines.push(`        *out = (${outType})(${prefix}_outputs[lo] + q);`);
    } else {
      // A float output interpolates in its own type (never in integers, which would truncate the outputs).
      lines.push(`        const ${outType} u = (${outType})((int64_t)x - xl);`);
      lines.push(`        const ${outType} dx = (${outType})((int64_t)1 << ${macro}_SHIFT);`);
      lines.push(`        const ${outType} dy = ${prefix}_outputs[lo + 1u] - ${prefix}_outputs[lo];`);
      lines.push(`        const ${outType} r = u / dx;`);
      lines.push(`        const ${outType} step = dy * r;`);
      lines.push(`        *out = ${prefix}_outputs[lo] + step;`);
    }
    lines.push("    }");
  } else {
    lines.push("    while (hi - lo > 1u) {");
    lines.push("        const uint32_t mid = (lo + hi) >> 1;");
    lines.push(`        if (x < ${prefix}_inputs[mid]) hi = mid; else lo = mid;`);
    lines.push("    }");
    lines.push("    {");
    if (integerOutput) {
      lines.push(`        const int64_t dx = (int64_t)${prefix}_inputs[hi] - ${prefix}_inputs[lo];`);
      lines.push(
        `        const int64_t num = ((int64_t)${prefix}_outputs[hi] - ${prefix}_outputs[lo]) * ((int64_t)x - ${prefix}_inputs[lo]);`,
      );
      lines.push("        const int64_t q = num >= 0 ? (num + dx / 2) / dx : -((-num + dx / 2) / dx);");
      lines.push(`        *out = (${outType})(${prefix}_outputs[lo] + q);`);
    } else {
      const diff = (a: string, c: string): string =>
        integerInput ? `(${outType})((int64_t)${a} - ${c})` : `(${outType})(${a} - ${c})`;
      lines.push(`        const ${outType} u = ${diff("x", `${prefix}_inputs[lo]`)};`);
      lines.push(`        const ${outType} dx = ${diff(`${prefix}_inputs[hi]`, `${prefix}_inputs[lo]`)};`);
      lines.push(`        const ${outType} dy = ${prefix}_outputs[hi] - ${prefix}_outputs[lo];`);
      lines.push(`        const ${outType} r = u / dx;`);
      lines.push(`        const ${outType} step = dy * r;`);
      lines.push(`        *out = ${prefix}_outputs[lo] + step;`);
    }
    lines.push("    }");
  }
  return lines;
}

/**
 * Emits a firmware table as a self-contained C99 header: `<stdint.h>` types, `static const` arrays,
 * range constants, a caution comment, the error report, and a documented `static inline` interpolation
 * routine `int <prefix>_lookup(x, *out)` that returns 0 and writes the interpolated output for an input
 * within `<PREFIX>_INPUT_MIN … <PREFIX>_INPUT_MAX`, −1 below the range (and for NaN), 1 above it.
 * Integer tables interpolate in 64-bit integers rounded to nearest; uniform tables index by shift.
 * The text is deterministic (byte-identical for the same table and prefix), ASCII only.
 * @param table - a table from {@link buildFirmwareTable}
 * @param options - `prefix`; see {@link FormatFirmwareTableCOptions}
 * @returns the header text, ending in a newline
 * @throws HotjunctionRangeError (`INVALID_OPTION`) for a prefix that is not a usable C identifier
 * @example
 * ```ts
 * import { buildFirmwareTable, formatFirmwareTableC } from "hotjunction";
 * const table = buildFirmwareTable({ type: "T", kind: "temperatureToEmf", minC: 0, maxC: 100, maxErrorOutputUnits: 5 });
 * const header = formatFirmwareTableC(table, { prefix: "oven_tc" });
 * console.log(header.includes("static inline int oven_tc_lookup(int32_t x, int32_t *out)")); // true
 * ```
 */
export function formatFirmwareTableC(table: FirmwareTable, options?: FormatFirmwareTableCOptions): string {
  _checkFirmwareTable(table, "formatFirmwareTableC");
  _requireShape(table, _firmwareReportShape, "table", "formatFirmwareTableC");
  const prefix = _checkPrefix(options?.prefix ?? "tc_table");
  const macro = prefix.toUpperCase();
  const inInfo = _numberTypeInfo(table.input.numberType, "input number type");
  const outInfo = _numberTypeInfo(table.output.numberType, "output number type");
  const inType = inInfo.cType;
  const outType = outInfo.cType;
  const n = table.inputs.length;
  const uniform = table.spacingLog2 !== null;
  const lines: string[] = headerComment(table, prefix, inType, outType);
  lines.push(`#ifndef ${macro}_H`);
  lines.push(`#define ${macro}_H`);
  lines.push("");
  lines.push("#include <stdint.h>");
  if (!outInfo.integer || !inInfo.integer) {
    lines.push("#include <float.h>");
    lines.push("");
    lines.push("#if defined(FLT_EVAL_METHOD) && (FLT_EVAL_METHOD < 0 || FLT_EVAL_METHOD > 2)");
    lines.push(`#error "${prefix}.h: the error bound assumes float evaluation method 0, 1 or 2 (FLT_EVAL_METHOD)"`);
    lines.push("#endif");
  }
  lines.push("");
  lines.push(`#define ${macro}_COUNT ${n}u`);
  lines.push(`#define ${macro}_INPUT_MIN ${rangeLiteral(table.input.min, table.input.numberType)}`);
  lines.push(`#define ${macro}_INPUT_MAX ${rangeLiteral(table.input.max, table.input.numberType)}`);
  lines.push(`#define ${macro}_INPUT_SCALE ${table.input.scale}`);
  lines.push(`#define ${macro}_OUTPUT_SCALE ${table.output.scale}`);
  if (uniform) lines.push(`#define ${macro}_SHIFT ${table.spacingLog2}`);
  lines.push("");
  if (!uniform) {
    lines.push(`static const ${inType} ${prefix}_inputs[${n}] = {`);
    lines.push(arrayBody(table.inputs, table.input.numberType));
    lines.push("};");
    lines.push("");
  }
  lines.push(`static const ${outType} ${prefix}_outputs[${n}] = {`);
  lines.push(arrayBody(table.outputs, table.output.numberType));
  lines.push("};");
  lines.push("");
  lines.push(...lookupRoutine(table, prefix, macro, inInfo.integer, outInfo.integer, inType, outType));
  lines.push("    return 0;");
  lines.push("}");
  lines.push("");
  lines.push(`#endif /* ${macro}_H */`);
  return lines.join("\n") + "\n";
}
