/**
 * The wire's part of the chain models' interval enclosures (`_readingEnclosure.ts`; `_tripEnclosure.ts` has its
 * own copy of the pieces and may call these): the EMF the wire adds after the thermocouple, piece by piece in the
 * model's order, and the ends of the wire's sources that raise (or lower) it where that direction is proven.
 *
 * W = ΔE_cable + Σ ΔE_connector + V_loop. The pieces that do not depend on the cold junction (an envelope cable,
 * inline connectors, the loop) are affine in their own sources: `_cornerRange`. The proportional cable
 * k·[E(t_j) − E(t_cj)] and a terminating connector E(t_cj) − E(t_conn) + leg give their values and t_cj-slopes
 * over a box (`emfErrorOver`, outward rounded). `_wireSideBox` fixes sources at an end:
 *
 * - the proportional cable's tolerance k: the model is affine in k (k·[E(t_j) − E(t_cj)] is its only use), so its
 *   extremes over k are at the ends of k's range; where the sign of E(t_j) − E(t_cj) is proven over the box, the
 *   end that moves W the wanted way, else both ends (two boxes);
 * - a terminating connector's temperature above the cold junction r: W holds −E(t_cj + r), so W falls with r
 *   where E′ > 0 over t_cj + r; the piecewise E may step back at a seam inside t_cj + r, by at most
 *   `_backwardSeamStep` (returned, for the caller's allowance). An absolute connector temperature stays an
 *   interval (single-use, enclosed by `_emfOver` within its own evaluation bound); so does the cable junction's.
 * @module
 * @internal
 */
import { _addInterval, _emfOver, _seebeckOver, _subInterval, type _Interval } from "./_intervals.js";
import { _backwardSeamStep, _cornerRange } from "./_coldJunctionRange.js";
import type { _CompiledChain } from "./_compileChain.js";

type Box = Readonly<Record<string, readonly [number, number]>>;

/** @internal One piece of the wire's added EMF: over a box and a t_cj interval, or a transfer of its own sources. */
export type _AddedPiece =
  | { readonly over: (box: Box, tc: _Interval) => { readonly value: _Interval; readonly coldJunctionSlope: _Interval } }
  | { readonly transfer: (x: Readonly<Record<string, number>>) => number; readonly names: readonly string[] };

const namesOf = (sources: readonly { readonly name: string }[] | undefined): string[] => (sources ?? []).map((s) => s.name);

/** @internal The wire's added-EMF pieces in the model's order (cable, connectors, loop); none without a wire. */
export function _wirePieces(cc: _CompiledChain): readonly _AddedPiece[] {
  const wire = cc.wire;
  const added: _AddedPiece[] = [];
  if (wire === undefined) return added;
  for (const piece of [wire.cable, ...wire.connectors]) {
    if (piece === undefined) continue;
    const over = piece.emfErrorOver;
    if (over !== undefined) added.push({ over });
    else added.push({ transfer: (x) => piece.emfErrorMillivolts(x, 0), names: namesOf(piece.sources) });
  }
  if (wire.loop !== undefined) {
    const loop = wire.loop;
    added.push({ transfer: (x) => loop.offsetMillivolts(x), names: namesOf(loop.sources) });
  }
  return added;
}

/** @internal Every source name of the wire (cable, connectors, loop, leakage, ageing). */
export function _wireNames(cc: _CompiledChain): string[] {
  const wire = cc.wire;
  if (wire === undefined) return [];
  return [
    ...namesOf(wire.cable?.sources),
    ...wire.connectors.flatMap((c) => namesOf(c.sources)),
    ...namesOf(wire.loop?.sources),
    ...namesOf(wire.leakage?.sources),
    ...(wire.ageing !== undefined ? ["probe.ageing"] : []),
  ];
}

/** @internal The ranges of the pieces that are transfers of their own sources (undefined for the others). */
export function _fixedPieceRanges(pieces: readonly _AddedPiece[], x: Record<string, number>, box: Box): (_Interval | undefined)[] {
  return pieces.map((p) => ("transfer" in p ? _cornerRange(p.transfer, x, box, p.names.filter((n) => n in box)) : undefined));
}

/** @internal W and its t_cj-slope over a t_cj interval, and the largest magnitude of a piece (for the rounding allowance). */
export function _addedOver(
  pieces: readonly _AddedPiece[],
  fixed: readonly (_Interval | undefined)[],
  box: Box,
  tc: _Interval,
): { readonly value: _Interval; readonly slope: _Interval; readonly magnitude: number } {
  let value: _Interval = [0, 0];
  let slope: _Interval = [0, 0];
  let magnitude = 0;
  pieces.forEach((p, i) => {
    let v: _Interval;
    if ("over" in p) {
      const o = p.over(box, tc);
      v = o.value;
      slope = _addInterval(slope, o.coldJunctionSlope);
    } else v = fixed[i] as _Interval;
    value = i === 0 ? v : _addInterval(value, v);
    magnitude += Math.max(Math.abs(v[0]), Math.abs(v[1]));
  });
  return { value, slope, magnitude };
}

/** @internal The box with the wire's sources at the ends that move W up (`wantUp`) or down, where proven; see the module note. */
export interface _WireSide {
  /** One box, or two (the cable's k at each end, where the sign of its factor is not proven: A is affine in k). */
  readonly boxes: readonly Box[];
  /** Each terminating connector's r above the cold junction, after the choice (a point when fixed at an end). */
  readonly offsets: readonly _Interval[];
  /** Σ of `_backwardSeamStep` over t_cj + r of each r fixed at an end, mV (times the factor on W in the allowance). */
  readonly backStep: number;
}

/** @internal The ends of the wire's sources for one side (`wantUp` undefined: the direction of W is not known). */
export function _wireSideBox(cc: _CompiledChain, box: Box, tcRange: _Interval, wantUp: boolean | undefined): _WireSide {
  const b: Record<string, readonly [number, number]> = { ...box };
  const offsets: _Interval[] = [];
  let backStep = 0;
  const wire = cc.wire;
  if (wire === undefined) return { boxes: [b], offsets, backStep };
  const ct = cc.ct;
  for (const c of wire.connectors) {
    const t = c.temperature;
    if (t === undefined || !t.relative) continue;
    let r = (box[t.name] ?? t.range) as _Interval;
    if (wantUp !== undefined && r[1] > r[0]) {
      const shifted = _addInterval(tcRange, r);
      if (_seebeckOver(ct, shifted)[0] > 0) {
        r = wantUp ? [r[0], r[0]] : [r[1], r[1]];
        b[t.name] = r;
        backStep += _backwardSeamStep(ct, shifted);
      }
    }
    offsets.push(r);
  }
  const cable = wire.cable;
  const k = box["cable.tolerance"];
  if (cable?.emfErrorOver === undefined || k === undefined || k[0] === k[1]) return { boxes: [b], offsets, backStep };
  const j = cable.junctionTemperatureC;
  const tj = (box["cable.junctionTemperature"] ?? [j.minC, j.minC]) as _Interval;
  const d = _subInterval(_emfOver(ct, tj), _emfOver(ct, tcRange));
  const at = (v: number): Box => ({ ...b, "cable.tolerance": [v, v] });
  // W = k·d: up with k where d > 0, down where d < 0; else (or with no direction) both ends
  if (wantUp !== undefined && d[0] > 0) return { boxes: [at(wantUp ? k[1] : k[0])], offsets, backStep };
  if (wantUp !== undefined && d[1] < 0) return { boxes: [at(wantUp ? k[0] : k[1])], offsets, backStep };
  return { boxes: [at(k[0]), at(k[1])], offsets, backStep };
}
