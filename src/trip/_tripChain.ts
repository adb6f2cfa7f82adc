/**
 * Thin adapter between a trip design and the compiled comparator chain of `chain/`: builds the
 * `MeasurementChain` for a realized reference and divider, and gives the nominal signal, the nominal
 * switching temperature and the trip-temperature model of a tap.
 * @module
 * @internal
 */
import {
  _ambientInputName,
  _coldJunctionC,
  _compileChain,
  _hotFromVolts,
  _signalVolts,
  _sourcesAt,
  _switchingVolts,
  type _CompiledChain,
} from "../chain/_compileChain.js";
import type { ChainErrorSource, ComparatorEdge, DividerElement, MeasurementChain, ReferenceElement } from "../chain/types.js";
import type { Distribution, Model } from "../uncertainty/types.js";
import type { TripDesign } from "./types.js";

/** @internal A compiled trip chain and the cold-junction temperature thresholds are designed at. */
export interface _TripChain {
  readonly chain: MeasurementChain;
  readonly compiled: _CompiledChain;
  readonly designColdJunctionC: number;
}

/** @internal Builds and compiles the comparator chain of a design with a given reference and divider. */
export function _buildTripChain(
  design: TripDesign,
  reference: ReferenceElement,
  divider: DividerElement | undefined,
): _TripChain {
  const chain: MeasurementChain = {
    thermocouple: design.thermocouple,
    ...(design.coldJunction !== undefined ? { coldJunction: design.coldJunction } : {}),
    ...(design.amplifier !== undefined ? { amplifier: design.amplifier } : {}),
    reference,
    ...(divider !== undefined ? { divider } : {}),
    detector: design.comparator,
    ambient: design.ambient,
    ...(design.sourceDistributions !== undefined ? { sourceDistributions: design.sourceDistributions } : {}),
    ...(design.name !== undefined ? { label: design.name } : {}),
  };
  const compiled = _compileChain(chain);
  // Without an ambient span the chain holds the cold junction at the single ambient value.
  const designColdJunctionC = compiled.hasAmbientInput ? (design.designColdJunctionC ?? compiled.ambientCenterC) : design.ambient.minC;
  return { chain, compiled, designColdJunctionC };
}

/** Record of every source at zero deviation, the cold junction at the design temperature. */
function nominalRecord(tc: _TripChain, sources: readonly ChainErrorSource[]): Record<string, number> {
  const out: Record<string, number> = {};
  for (const s of sources) out[s.name] = s.name === _ambientInputName ? tc.designColdJunctionC : 0;
  return out;
}

/** @internal Nominal detector-input voltage at a hot-junction temperature, V. */
export function _nominalSignalVolts(tc: _TripChain, hotJunctionC: number): number {
  return _signalVolts(tc.compiled, hotJunctionC, nominalRecord(tc, _sourcesAt(tc.compiled, hotJunctionC)));
}

/** @internal Comparator switching point minus threshold for an edge (hysteresis placement, no offset), V. */
export function _edgeVolts(tc: _TripChain, edge: ComparatorEdge): number {
  return (tc.compiled.comparator as NonNullable<_CompiledChain["comparator"]>).edgeMillivolts(edge) / 1000;
}

/** @internal Nominal hot-junction temperature at which a tap switches on an edge, °C. */
export function _nominalSwitchingC(tc: _TripChain, tap: number, edge: ComparatorEdge, nearC: number): number {
  const sources = _sourcesAt(tc.compiled, nearC);
  const x = nominalRecord(tc, sources);
  const edgeMv = _edgeVolts(tc, edge) * 1000;
  return _hotFromVolts(tc.compiled, _switchingVolts(tc.compiled, x, tap, edgeMv), x, tc.designColdJunctionC);
}

/** @internal The trip-temperature model of a tap: source values -> hot-junction temperature at switching, °C. */
export interface _TripModel {
  readonly model: Model;
  readonly inputs: Readonly<Record<string, Distribution>>;
  readonly sources: readonly ChainErrorSource[];
}

/**
 * @internal The model of the temperature at which a tap switches on an edge, with the thermocouple tolerance
 * taken at `nearC` (the setpoint) and the cold junction anywhere in the ambient range.
 */
export function _tripTemperatureModel(tc: _TripChain, tap: number, edge: ComparatorEdge, nearC: number): _TripModel {
  const cc = tc.compiled;
  const sources = _sourcesAt(cc, nearC);
  const edgeMv = _edgeVolts(tc, edge) * 1000;
  const inputs: Record<string, Distribution> = {};
  for (const s of sources) inputs[s.name] = s.distribution;
  const direct: Model = (x) => _hotFromVolts(cc, _switchingVolts(cc, x, tap, edgeMv), x, _coldJunctionC(cc, x));
  if (sources.some((s) => s.name === "thermocouple.tolerance")) return { model: direct, inputs, sources };
  // A zero thermocouple tolerance gives no source, but the chain's transfer reads the name: feed it 0 through
  // one reused record (propagate rejects reads of names that are not inputs).
  const names = sources.map((s) => s.name);
  const record: Record<string, number> = { "thermocouple.tolerance": 0 };
  const model: Model = (x) => {
    for (const name of names) record[name] = x[name] as number;
    return direct(record);
  };
  return { model, inputs, sources };
}
