/**
 * What the firmware-table formatters and `interpolateFirmwareTable` read of a table, checked at their entry with the
 * shared shape guard (`_requireShape`, src/errors.ts): a forged or truncated table is refused by field name.
 * @module
 * @internal
 */
import { _requireInteger, _requireShape, HotjunctionRangeError, type _Shape } from "../errors.js";
import type { FirmwareTable } from "./types.js";

const column: _Shape = { quantity: "string", unit: "string", numberType: "string", scale: "positive", min: "number", max: "number" };
const tableShape: _Shape = {
  thermocoupleType: "string",
  kind: "string",
  input: column,
  output: column,
  inputs: ["array", "number"],
  outputs: ["array", "number"],
  spacingLog2: ["nullable", "number"],
};

function invalid(quantity: string, value: unknown, context: string, problem: string): never {
  throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity, value, context, problem });
}

/**
 * @internal What a header's comment prints of a table besides its columns and breakpoints (the request, the covered
 * range, the error report and the ADC chain), each a finite number or a string: checked by `formatFirmwareTableC`.
 */
export const _firmwareReportShape: _Shape = {
  placement: "string",
  requestedMinC: "number",
  requestedMaxC: "number",
  coveredMinC: "number",
  coveredMaxC: "number",
  requestedMaxErrorOutputUnits: "number",
  chain: ["nullable", { gain: "number", offsetMillivolts: "number", fullScaleVolts: "number", bits: "number", coldJunctionC: ["nullable", "number"] }],
  errorBound: { totalOutputUnits: "number", interpolationOutputUnits: "number", roundingOutputUnits: "number", segmentIndex: "number", fromC: "number", toC: "number" },
  maxErrorFound: { errorOutputUnits: "number", atInputStored: "number", atTemperatureC: "number", pointsChecked: "number" },
};

/**
 * @internal Checks a firmware table's columns and breakpoints: one output per input, finite, scales > 0; at least
 * two inputs, strictly increasing and covering the input column's range; steps between neighbouring inputs and
 * outputs finite (so an interpolation cannot overflow in a difference); a uniform table's inputs on its 2^k grid.
 */
export function _checkFirmwareTable(table: unknown, context: string): FirmwareTable {
  _requireShape(table, tableShape, "table", context);
  const t = table as FirmwareTable;
  if (t.inputs.length !== t.outputs.length) {
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "table.outputs",
      value: t.outputs,
      context,
      problem: `must hold one output per input (${t.inputs.length} inputs)`,
    });
  }
  const n = t.inputs.length;
  if (n < 2) invalid("table.inputs", t.inputs, context, "must hold at least two breakpoints");
  for (let i = 1; i < n; i++) {
    const step = (t.inputs[i] as number) - (t.inputs[i - 1] as number);
    if (!(step > 0 && step < Infinity)) invalid(`table.inputs[${i}]`, t.inputs[i], context, "is not above the one before by a finite step");
    if (!Number.isFinite((t.outputs[i] as number) - (t.outputs[i - 1] as number))) invalid(`table.outputs[${i}]`, t.outputs[i], context, "is not a finite step from the one before");
  }
  if (!(t.input.min >= (t.inputs[0] as number) && t.input.max <= (t.inputs[n - 1] as number) && t.input.min <= t.input.max)) {
    invalid("table.input", `${t.input.min} to ${t.input.max}`, context, "is not a range within the breakpoints");
  }
  if (t.spacingLog2 !== null) {
    const k = _requireInteger(t.spacingLog2, "table.spacingLog2", 0, 1023, context);
    for (let i = 1; i < n; i++) {
      if (t.inputs[i] !== (t.inputs[0] as number) + i * 2 ** k) invalid(`table.inputs[${i}]`, t.inputs[i], context, "is not on the table's 2^spacingLog2 grid");
    }
  }
  return t;
}
