/**
 * The voltage-reference element, three kinds (series, shunt, regulator): its named error sources and its
 * transfer function V = V_nom·(1 + Σ relative errors).
 * @module
 */
import { _invalidChoice } from "../errors.js";
import { _checkAmbient, _requireObject, _requirePositive, type _SourceContext } from "./_common.js";
import { _regulatorReferenceSources } from "./regulatorReference.js";
import { _seriesReferenceSources } from "./seriesReference.js";
import { _shuntReferenceSources } from "./shuntReference.js";
import type {
  AmbientRange,
  ChainErrorSource,
  ReferenceElement,
  RegulatorReference,
  SeriesReference,
  ShuntReference,
  SourceDistributionOverride,
} from "./types.js";

/** Options of {@link referenceErrorSources}. */
export interface ReferenceErrorSourcesOptions {
  /** Per-source distribution overrides, by source name. */
  readonly sourceDistributions?: Readonly<Record<string, SourceDistributionOverride>>;
}

/** @internal Sources of a reference, by kind. */
export function _referenceSources(
  element: ReferenceElement,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): ChainErrorSource[] {
  const o = _requireObject(element, "reference", context);
  if (o["kind"] !== "reference") return _invalidChoice("reference kind", o["kind"], ["reference"], context);
  _requirePositive(o["nominalVolts"], "nominalVolts", "V", context);
  switch (o["variant"]) {
    case "series":
      return _seriesReferenceSources(element as SeriesReference, ambient, ctx, `${context} (series)`);
    case "shunt":
      return _shuntReferenceSources(element as ShuntReference, ambient, ctx, `${context} (shunt)`);
    case "regulator":
      return _regulatorReferenceSources(element as RegulatorReference, ctx, `${context} (regulator)`);
    default:
      return _invalidChoice("reference variant", o["variant"], ["series", "shunt", "regulator"], context);
  }
}

/**
 * The named error sources of a voltage reference over an ambient range, each a ± fraction of its output
 * (rectangular unless overridden). Sources with a zero limit are left out.
 * @param reference - series, shunt or regulator reference
 * @param ambient - ambient range, °C
 * @param options - distribution overrides
 * @returns the sources (names `"reference.<quantity>"`)
 * @throws HotjunctionRangeError / HotjunctionTypeError for a bad element (e.g. line regulation without a
 *   supply range), or (code `INVALID_DESIGN`) a shunt reference starved or over-driven by its resistor
 * @example
 * ```ts
 * import { referenceErrorSources } from "hotjunction";
 * const ref = { kind: "reference", variant: "series", nominalVolts: 2.5, initialAccuracyFraction: 0.001, tempcoPpmPerC: 7 } as const;
 * const s = referenceErrorSources(ref, { minC: -40, maxC: 85 });
 * console.log(s.map((x) => `${x.name} ${x.limit}`).join("; ")); // "reference.initialAccuracy 0.001; reference.tempco 0.000875"
 * ```
 */
export function referenceErrorSources(
  reference: ReferenceElement,
  ambient: AmbientRange,
  options?: ReferenceErrorSourcesOptions,
): ChainErrorSource[] {
  const context = "reference";
  return _referenceSources(reference, _checkAmbient(ambient, context), { overrides: options?.sourceDistributions }, context);
}

/** @internal The reference stage of a compiled chain. */
export interface _ReferenceStage {
  readonly sources: readonly ChainErrorSource[];
  readonly nominalVolts: number;
  /** Actual output for the source values, V. */
  volts(x: Readonly<Record<string, number>>): number;
}

/** @internal Builds the stage. */
export function _referenceStage(
  element: ReferenceElement,
  ambient: AmbientRange,
  ctx: _SourceContext,
  context: string,
): _ReferenceStage {
  const sources = _referenceSources(element, ambient, ctx, context);
  const names = sources.map((s) => s.name);
  const n = names.length;
  const vNom = element.nominalVolts;
  return {
    sources,
    nominalVolts: vNom,
    volts: (x) => {
      let rel = 0;
      for (let i = 0; i < n; i++) rel += x[names[i] as string] as number;
      return vNom * (1 + rel);
    },
  };
}
