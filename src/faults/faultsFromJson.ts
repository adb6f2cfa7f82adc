/**
 * Faults given as JSON (a user's own faults for an element or a custom element, without touching the engine).
 * @module
 */
import { HotjunctionRangeError } from "../errors.js";
import { _checkFault } from "./_faultEffects.js";
import type { Fault } from "./types.js";

function rejectCustom(value: unknown, context: string): void {
  if (Array.isArray(value)) {
    for (const v of value) rejectCustom(v, context);
    return;
  }
  if (typeof value !== "object" || value === null) return;
  const o = value as Record<string, unknown>;
  if (o["kind"] === "custom") {
    // Same error shape as other typed-error checks (deliberate: each names its own quantity and problem).
    throw new HotjunctionRangeError({
      code: "INVALID_OPTION",
      quantity: "effect kind",
      value: "custom",
      context,
      problem: "needs functions and cannot be given in JSON; use override-node, offset-node, scale-node or the structural kinds",
    });
  }
  for (const v of Object.values(o)) rejectCustom(v, context);
}

/**
 * Reads a list of faults given as JSON (text, or an already parsed value) and checks every field: each fault is
 * `{ id, element, description, effects, mitigation? }` with data effects only, e.g.
 * `{ "kind": "override-node", "node": "amplifierOutput", "volts": 0 }`,
 * `{ "kind": "offset-node", "node": "thermocoupleEmf", "millivolts": -0.5 }`,
 * `{ "kind": "scale-node", "node": "amplifierInput", "factor": 0.5 }`,
 * `{ "kind": "thermocouple-short", "atC": 400 }`, `{ "kind": "open-thermocouple" }`,
 * `{ "kind": "resistor-fault", "element": "divider", "index": 1, "state": "open" }`,
 * `{ "kind": "reference-open" }`, `{ "kind": "board-supply-loss" }`, or
 * `{ "kind": "any-of", "alternatives": [{ "label": "...", "effects": [...] }] }`.
 * Pass the result as `faults` or `extraFaults` of {@link reviewFaults}.
 * @param json - JSON text or a parsed value: an array of faults
 * @returns the faults
 * @throws HotjunctionRangeError (INVALID_OPTION) for bad JSON, a bad field, a unit key that does not fit the node,
 *   or a `custom` effect (functions cannot be JSON)
 * @example
 * ```ts
 * import { faultsFromJson } from "hotjunction";
 * const faults = faultsFromJson('[{"id":"filter.capacitorShort","element":"input filter","description":"filter capacitor shorted","effects":[{"kind":"override-node","node":"amplifierInput","millivolts":0}]}]');
 * const effect = faults[0]?.effects[0];
 * console.log(faults.length, effect?.kind === "override-node" ? effect.node : "?"); // 1 "amplifierInput"
 * ```
 */
export function faultsFromJson(json: unknown): Fault[] {
  const context = "faults from JSON";
  let value = json;
  // Same error shape as other failed-parse checks (deliberate: this one names the JSON text).
  if (typeof json === "string") {
    try {
      value = JSON.parse(json) as unknown;
    } catch (e) {
      throw new HotjunctionRangeError({
        code: "INVALID_OPTION",
        quantity: "JSON text",
        value: json,
        context,
        problem: `does not parse (${(e as Error).message})`,
      });
    }
  }
  if (!Array.isArray(value)) {
    throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity: "faults", value, context, problem: "is not an array" });
  }
  rejectCustom(value, context);
  return value.map((f, i) => _checkFault(f, `${context}, [${i}]`));
}
