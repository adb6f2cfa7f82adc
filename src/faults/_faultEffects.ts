/**
 * Validation of faults given as data, and their resolution into the structural changes the plant evaluates.
 * @module
 * @internal
 */
import type { MeasurementChain } from "../chain/types.js";
import { _invalidChoice, _requireFinite, HotjunctionRangeError, HotjunctionTypeError } from "../errors.js";
import { _emptyMods, type _Mods } from "./_faultPlant.js";
import type { Fault, FaultEffect, FaultNodeName, FaultSignals } from "./types.js";

const nodeUnits: Readonly<Record<FaultNodeName, "millivolts" | "volts" | "code" | "tripped">> = {
  thermocoupleEmf: "millivolts",
  compensation: "millivolts",
  amplifierInput: "millivolts",
  amplifierOutput: "volts",
  reference: "volts",
  threshold: "volts",
  adcCode: "code",
  detectorOutput: "tripped",
};

/** @internal Names of the signal nodes. */
export const _faultNodeNames = /* @__PURE__ */ Object.keys(nodeUnits) as FaultNodeName[];

const effectKinds = [
  "override-node",
  "offset-node",
  "scale-node",
  "thermocouple-short",
  "open-thermocouple",
  "resistor-fault",
  "reference-open",
  "board-supply-loss",
  "any-of",
  "custom",
] as const;

const valueKeys = ["millivolts", "volts", "rail", "code", "tripped"] as const;

function bad(quantity: string, value: unknown, context: string, problem: string): never {
  throw new HotjunctionRangeError({ code: "INVALID_OPTION", quantity, value, context, problem });
}

function checkNode(value: unknown, quantity: string, context: string): FaultNodeName {
  if (typeof value !== "string" || !(value in nodeUnits)) return _invalidChoice(quantity, value, _faultNodeNames, context);
  return value as FaultNodeName;
}

/** Checks the single value key of an override/offset effect against the node's unit. */
function checkValueKey(o: Record<string, unknown>, node: FaultNodeName, allowRail: boolean, context: string): string {
  const present = valueKeys.filter((k) => o[k] !== undefined);
  const unit = nodeUnits[node];
  const allowed: string[] = [unit];
  if (allowRail && node === "amplifierOutput") allowed.push("rail");
  if (present.length !== 1 || !allowed.includes(present[0] as string)) {
    return bad("value keys", present.join(", ") || "none", `${context}, node ${node}`, `must be exactly one of: ${allowed.join(", ")}`);
  }
  const key = present[0] as string;
  const v = o[key];
  if (key === "rail") {
    if (v !== "low" && v !== "high") _invalidChoice("rail", v, ["low", "high"], context);
  } else if (key === "tripped") {
    if (typeof v !== "boolean") throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "tripped", value: v, context, problem: "is not a boolean" });
  } else _requireFinite(v, key, key === "code" ? "LSB" : key === "volts" ? "V" : "mV", context);
  return key;
}

function checkEffect(effect: unknown, context: string, depth: number): void {
  if (typeof effect !== "object" || effect === null || Array.isArray(effect)) bad("effect", effect, context, "is not an object");
  const o = effect as Record<string, unknown>;
  const kind = o["kind"];
  if (typeof kind !== "string" || !(effectKinds as readonly string[]).includes(kind)) _invalidChoice("effect kind", kind, effectKinds, context);
  switch (kind) {
    case "override-node":
      checkValueKey(o, checkNode(o["node"], "node", context), true, context);
      break;
    case "offset-node": {
      const node = checkNode(o["node"], "node", context);
      if (node === "detectorOutput") bad("node", node, context, "cannot take an offset (it is a logic level)");
      checkValueKey(o, node, false, context);
      break;
    }
    case "scale-node": {
      const node = checkNode(o["node"], "node", context);
      if (node === "detectorOutput") bad("node", node, context, "cannot be scaled (it is a logic level)");
      _requireFinite(o["factor"], "factor", undefined, context);
      break;
    }
    case "thermocouple-short":
      if (o["atC"] !== undefined) _requireFinite(o["atC"], "atC", "°C", context);
      if (o["alongWire"] !== undefined && typeof o["alongWire"] !== "boolean") bad("alongWire", o["alongWire"], context, "is not a boolean");
      break;
    case "resistor-fault":
      if (o["state"] !== "open" && o["state"] !== "short") _invalidChoice("state", o["state"], ["open", "short"], context);
      if (o["element"] === "divider") {
        const i = o["index"];
        if (typeof i !== "number" || !Number.isInteger(i) || i < 0) bad("index", i, context, "is not a non-negative integer");
      } else if (o["element"] === "amplifier") {
        if (o["resistor"] !== "feedback" && o["resistor"] !== "ground") _invalidChoice("resistor", o["resistor"], ["feedback", "ground"], context);
      } else _invalidChoice("resistor-fault element", o["element"], ["divider", "amplifier"], context);
      break;
    case "any-of": {
      const alts = o["alternatives"];
      if (!Array.isArray(alts) || alts.length === 0) bad("alternatives", alts, context, "is not a non-empty array");
      if (depth > 4) bad("any-of", "nested", context, "is nested too deeply (more than 4 levels)");
      (alts as unknown[]).forEach((a, i) => {
        const ctx = `${context}, alternative ${i}`;
        if (typeof a !== "object" || a === null) bad("alternative", a, ctx, "is not an object");
        const ao = a as Record<string, unknown>;
        if (typeof ao["label"] !== "string" || ao["label"] === "") bad("label", ao["label"], ctx, "is not a non-empty string");
        if (!Array.isArray(ao["effects"])) bad("effects", ao["effects"], ctx, "is not an array");
        for (const e of ao["effects"] as unknown[]) checkEffect(e, ctx, depth + 1);
      });
      break;
    }
    case "custom":
      if (o["node"] !== undefined) checkNode(o["node"], "node", context);
      if (o["transformNode"] !== undefined && typeof o["transformNode"] !== "function") bad("transformNode", o["transformNode"], context, "is not a function");
      if (o["transformChain"] !== undefined && typeof o["transformChain"] !== "function") bad("transformChain", o["transformChain"], context, "is not a function");
      if ((o["transformNode"] === undefined) === (o["transformChain"] === undefined) && o["transformNode"] === undefined) {
        bad("custom effect", "empty", context, "needs transformNode (with node) or transformChain");
      }
      if (o["transformNode"] !== undefined && o["node"] === undefined) bad("node", undefined, context, "is required with transformNode");
      break;
    default:
      break;
  }
}

/** @internal Checks one fault (shape, ids, effects); returns it typed. */
export function _checkFault(fault: unknown, context: string): Fault {
  if (typeof fault !== "object" || fault === null || Array.isArray(fault)) bad("fault", fault, context, "is not an object");
  const o = fault as Record<string, unknown>;
  for (const key of ["id", "element", "description"] as const) {
    if (typeof o[key] !== "string" || o[key] === "") bad(key, o[key], context, "is not a non-empty string");
  }
  const ctx = `${context}, fault ${String(o["id"])}`;
  if (o["mitigation"] !== undefined && typeof o["mitigation"] !== "string") bad("mitigation", o["mitigation"], ctx, "is not a string");
  if (!Array.isArray(o["effects"]) || o["effects"].length === 0) bad("effects", o["effects"], ctx, "is not a non-empty array");
  for (const e of o["effects"] as unknown[]) checkEffect(e, ctx, 0);
  return fault as Fault;
}

/** @internal Design facts the resolution needs. */
export interface _ResolveFacts {
  readonly railLowVolts: number;
  readonly railHighVolts: number;
  readonly openCircuitBias: "pull-up" | "pull-down" | "none";
  readonly openCircuitBiasMillivolts: number;
  readonly wireShortC: number;
  readonly coldJunctionC: number;
}

/** @internal One way a fault can end: its label (any-of), structural changes and chain transforms. */
export interface _Alternative {
  readonly label: string | undefined;
  readonly mods: _Mods;
  readonly chainTransforms: readonly ((chain: MeasurementChain) => MeasurementChain)[];
}

interface Draft {
  labels: string[];
  effects: FaultEffect[];
}

/** Expands any-of effects (and a floating open input) into flat alternatives. */
function expand(effects: readonly FaultEffect[], facts: _ResolveFacts): Draft[] {
  let drafts: Draft[] = [{ labels: [], effects: [] }];
  for (const e of effects) {
    let options: Draft[];
    if (e.kind === "any-of") {
      options = e.alternatives.flatMap((a) => expand(a.effects, facts).map((d) => ({ labels: [a.label, ...d.labels], effects: d.effects })));
    } else if (e.kind === "open-thermocouple" && facts.openCircuitBias === "none") {
      // A floating input may settle anywhere: high, near zero, or low; the worst counts.
      options = [
        { labels: ["floating input drifts up"], effects: [e] },
        { labels: ["floating input settles near zero"], effects: [e] },
        { labels: ["floating input drifts down"], effects: [e] },
      ];
    } else options = [{ labels: [], effects: [e] }];
    drafts = drafts.flatMap((d) => options.map((o) => ({ labels: [...d.labels, ...o.labels], effects: [...d.effects, ...o.effects] })));
  }
  return drafts;
}

function pushOp(m: _Mods, node: FaultNodeName, op: (v: number, signals: Partial<FaultSignals>) => number): void {
  const list = m.nodeOps.get(node) ?? [];
  list.push(op);
  m.nodeOps.set(node, list);
}

/** @internal The alternatives of a (checked) fault. */
export function _resolveFault(fault: Fault, facts: _ResolveFacts): _Alternative[] {
  return expand(fault.effects, facts).map((draft) => {
    const m = _emptyMods();
    const transforms: ((chain: MeasurementChain) => MeasurementChain)[] = [];
    for (const e of draft.effects) {
      switch (e.kind) {
        case "override-node": {
          let value: number;
          if (e.rail !== undefined) value = e.rail === "high" ? facts.railHighVolts : facts.railLowVolts;
          else if (e.tripped !== undefined) value = e.tripped ? 1 : 0;
          else value = (e.millivolts ?? e.volts ?? e.code) as number;
          pushOp(m, e.node, () => value);
          break;
        }
        case "offset-node": {
          const add = (e.millivolts ?? e.volts ?? e.code) as number;
          pushOp(m, e.node, (v) => v + add);
          break;
        }
        case "scale-node":
          pushOp(m, e.node, (v) => v * e.factor);
          break;
        case "thermocouple-short":
          m.shortAtC = e.atC ?? (e.alongWire === true ? facts.wireShortC : facts.coldJunctionC);
          break;
        case "open-thermocouple": {
          const mv = facts.openCircuitBiasMillivolts;
          const label = draft.labels.find((l) => l.startsWith("floating"));
          if (facts.openCircuitBias === "pull-up" || label === "floating input drifts up") m.openMillivolts = mv;
          else if (facts.openCircuitBias === "pull-down" || label === "floating input drifts down") m.openMillivolts = -mv;
          else m.openMillivolts = 0;
          break;
        }
        case "resistor-fault":
          if (e.element === "divider") m.dividerStates.set(e.index, e.state);
          else if (e.resistor === "feedback") m.feedback = e.state;
          else m.ground = e.state;
          break;
        case "reference-open":
          m.referenceOpen = true;
          break;
        case "board-supply-loss":
          m.boardLoss = true;
          break;
        case "custom":
          if (e.transformNode !== undefined && e.node !== undefined) pushOp(m, e.node, e.transformNode);
          if (e.transformChain !== undefined) transforms.push(e.transformChain);
          break;
        case "any-of":
          break; // expanded above
      }
    }
    return { label: draft.labels.length === 0 ? undefined : draft.labels.join("; "), mods: m, chainTransforms: transforms };
  });
}
