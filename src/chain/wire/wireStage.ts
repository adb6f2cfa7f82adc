/**
 * The wire between the probe and the amplifier as one stage: cable, connectors, loop, leakage and ageing,
 * and where each sits in the signal path. The chain's EMF at the amplifier input becomes
 *
 *   e_in = s·[E(t_h + ε + a) − E(t_cj)] + ΔE_cable + Σ ΔE_connector + V_loop
 *
 * with ε the thermocouple's tolerance (`thermocouple.tolerance`), a the ageing drift (`probe.ageing`, °C at
 * the hot junction), s = 1 + `probe.leakage` (≤ 1), ΔE_cable (`cable.tolerance`, `cable.junctionTemperature`),
 * ΔE_connector (`connector.*`) and V_loop (`loop.biasOffset`, `loop.detectionOffset` and the nominal
 * detection offset). Hardware compensation and the amplifier follow unchanged: V_out = G·(e_in + V_comp + V_os).
 * @module
 */
import type { ThermocoupleType } from "../../data/thermocoupleData.js";
import { _invalidChoice, _requireFinite, _requireOptionsObject, HotjunctionTypeError } from "../../errors.js";
import { _compile, type CompiledType } from "../../its90/compiled.js";
import { _emfFromTemperature } from "../../its90/engine.js";
import { thermocoupleData } from "../../its90/resolveType.js";
import { _checkAmbient, _requireObject, type _SourceContext } from "../_common.js";
import type { AmbientRange, SourceDistributionOverride } from "../types.js";
import type { WireErrorSource } from "../types.js";
import type {
  AgeingElement,
  ConnectorElement,
  ExtensionCableElement,
  InsulationLeakageElement,
  LoopResistanceElement,
  WireDescription,
} from "../wireTypes.js";

export type { WireDescription } from "../wireTypes.js";
import type { _Inputs } from "./_wireCommon.js";
import { _connectorStage, type _ConnectorStage } from "./connector.js";
import { _extensionCableStage, type _ExtensionCableStage } from "./extensionCable.js";
import { _loopStage, type _LoopStage } from "./loopResistance.js";
import { _ageingStage, _leakageStage, type _AgeingStage, type _LeakageStage } from "./probe.js";


/** @internal The wire's slots, in signal-path order (the compile switch of the wire: an unknown key is refused). */
export const _wireSlots = ["cable", "connectors", "loop", "leakage", "ageing"] as const;

/** @internal The wire stage. */
export interface _WireStage {
  readonly cable: _ExtensionCableStage | undefined;
  readonly connectors: readonly _ConnectorStage[];
  readonly loop: _LoopStage | undefined;
  readonly leakage: _LeakageStage | undefined;
  readonly ageing: _AgeingStage | undefined;
  /** Sources that do not depend on the hot-junction temperature, in listing order. */
  readonly fixedSources: readonly WireErrorSource[];
  /** Sources at a hot-junction temperature (ageing), in listing order. */
  sourcesAt(hotJunctionC: number): WireErrorSource[];
  /** Deviation added to the thermocouple's ε at the hot junction, °C. */
  hotDeviationC(x: _Inputs): number;
  /** Factor on the thermocouple's EMF. */
  emfScale(x: _Inputs): number;
  /** EMF added after the thermocouple (cable, connectors, loop), mV. */
  addedEmfMillivolts(x: _Inputs, coldJunctionC: number): number;
}

/** @internal Builds the wire stage for a thermocouple type and the chain's ambient (the cold junction's range). */
export function _wireStage(
  wire: WireDescription,
  type: ThermocoupleType,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): _WireStage {
  const w = _requireObject(wire, "wire", context);
  for (const key of Object.keys(w)) if (!_wireSlots.includes(key as (typeof _wireSlots)[number])) _invalidChoice("wire element", key, _wireSlots, context);
  const amb = _checkAmbient(ambient, context);
  const cable = w["cable"] === undefined ? undefined : _extensionCableStage(wire.cable as ExtensionCableElement, type, amb, ctx, `${context}, cable`);
  const list = w["connectors"] === undefined ? [] : (wire.connectors as readonly ConnectorElement[]);
  if (!Array.isArray(list)) {
    throw new HotjunctionTypeError({ code: "INVALID_OPTION", quantity: "connectors", value: list, context, problem: "is not an array" });
  }
  const connectors = list.map((c, i) =>
    _connectorStage(c, type, amb, ctx, `${context}, connector ${i + 1}`, list.length === 1 ? "connector" : `connector${i + 1}`),
  );
  const loop = w["loop"] === undefined ? undefined : _loopStage(wire.loop as LoopResistanceElement, type, ctx, `${context}, loop`);
  const leakage = w["leakage"] === undefined ? undefined : _leakageStage(wire.leakage as InsulationLeakageElement, ctx, `${context}, leakage`);
  const ageing = w["ageing"] === undefined ? undefined : _ageingStage(wire.ageing as AgeingElement, ctx, `${context}, ageing`);
  const fixedSources = [
    ...(cable?.sources ?? []),
    ...connectors.flatMap((c) => c.sources),
    ...(loop?.sources ?? []),
    ...(leakage?.sources ?? []),
  ];
  return {
    cable,
    connectors,
    loop,
    leakage,
    ageing,
    fixedSources,
    sourcesAt: (hotJunctionC) => [...(ageing?.sourcesAt(hotJunctionC) ?? []), ...fixedSources],
    hotDeviationC: (x) => (ageing === undefined ? 0 : ageing.deviationC(x)),
    emfScale: (x) => (leakage === undefined ? 1 : leakage.emfScale(x)),
    addedEmfMillivolts: (x, tcj) => {
      let e = cable === undefined ? 0 : cable.emfErrorMillivolts(x, tcj);
      for (const c of connectors) e += c.emfErrorMillivolts(x, tcj);
      return loop === undefined ? e : e + loop.offsetMillivolts(x);
    },
  };
}

/** @internal EMF at the amplifier input with the wire, mV (see the module note). */
export function _wireEmfMillivolts(
  stage: _WireStage,
  ct: CompiledType,
  hotJunctionC: number,
  coldJunctionC: number,
  toleranceC: number,
  x: _Inputs,
): number {
  const tip = _emfFromTemperature(ct, hotJunctionC + toleranceC + stage.hotDeviationC(x)) - _emfFromTemperature(ct, coldJunctionC);
  return stage.emfScale(x) * tip + stage.addedEmfMillivolts(x, coldJunctionC);
}

/** Options of {@link wireErrorSources} and {@link wireEmfMillivolts}. */
export interface WireOptions {
  /** Per-source distribution overrides, by source name. */
  readonly sourceDistributions?: Readonly<Record<string, SourceDistributionOverride>>;
}

/**
 * The wire's error sources at a hot-junction temperature, in listing order (ageing, cable, connectors,
 * loop, leakage). Each is an ordinary named source (unit, limit, distribution) for worst case, RSS and Monte
 * Carlo.
 * @param wire - the wire's elements
 * @param type - thermocouple type letter
 * @param ambient - range of the cold-junction (terminal) temperature, °C
 * @param hotJunctionC - hot-junction temperature, °C
 * @param options - distribution overrides
 * @returns the sources
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad element (a one-line message naming the quantity, value and valid range)
 * @example
 * ```ts
 * import { wireErrorSources } from "hotjunction";
 * const s = wireErrorSources(
 *   { loop: { kind: "loopResistance", thermocoupleOhms: 200, biasCurrentNanoamps: 100 } },
 *   "K", { minC: 25, maxC: 25 }, 500,
 * );
 * console.log(s.map((x) => `${x.name} ±${x.limit} ${x.unit}`)); // [ 'loop.biasOffset ±20 µV' ]
 * ```
 */
export function wireErrorSources(
  wire: WireDescription,
  type: ThermocoupleType,
  ambient: AmbientRange,
  hotJunctionC: number,
  options: WireOptions = {},
): WireErrorSource[] {
  return _wireStage(wire, type, ambient, { overrides: options.sourceDistributions }, "wire").sourcesAt(hotJunctionC);
}

/**
 * The EMF at the amplifier input with the wire, for given source values (missing ones at their means):
 * s·[E(t_h + ε + a) − E(t_cj)] + ΔE_cable + ΣΔE_connector + V_loop.
 * @param wire - the wire's elements
 * @param type - thermocouple type letter
 * @param ambient - range of the cold-junction temperature, °C
 * @param hotJunctionC - hot-junction temperature, °C
 * @param coldJunctionC - cold-junction (terminal) temperature, °C
 * @param values - source values by name (default: every source at its mean); `thermocouple.tolerance` is read too
 * @returns mV
 * @example
 * ```ts
 * import { wireEmfMillivolts } from "hotjunction";
 * const block = { kind: "connector", arrangement: "terminates", contactMetal: "copper", temperatureC: { minC: 35, maxC: 35 } } as const;
 * console.log(wireEmfMillivolts({ connectors: [block] }, "K", { minC: 25, maxC: 25 }, 500, 25).toFixed(3)); // "19.237"
 * ```
 */
export function wireEmfMillivolts(
  wire: WireDescription,
  type: ThermocoupleType,
  ambient: AmbientRange,
  hotJunctionC: number,
  coldJunctionC: number,
  values: Readonly<Record<string, number>> = {},
): number {
  const stage = _wireStage(wire, type, ambient, { overrides: undefined }, "wire");
  _requireFinite(hotJunctionC, "hot-junction temperature", "°C", "wire");
  _requireFinite(coldJunctionC, "cold-junction temperature", "°C", "wire");
  _requireOptionsObject(values, "wire", false);
  const x: Record<string, number> = {};
  for (const s of stage.sourcesAt(hotJunctionC)) x[s.name] = values[s.name] ?? s.distribution.mean;
  return _wireEmfMillivolts(stage, _compile(thermocoupleData(type)), hotJunctionC, coldJunctionC, values["thermocouple.tolerance"] ?? 0, x);
}
