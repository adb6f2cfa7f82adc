/**
 * The WebAssembly bulk kernel (`kernel.wat`, embedded as base64 in `_kernelWasm.ts`): instantiated on first use,
 * or `null` where WebAssembly or its SIMD instructions are missing (then the JavaScript loops of `its90/bulk.ts`
 * run). Owns the kernel's memory: the forward table, one chunk of elements converted in place, and one mirror of
 * the exact-inverse tables per type used (a copy of the segments built so far, refreshed when the kernel meets a
 * segment it does not have). The JavaScript tables stay the truth; the mirror only caches them.
 * @internal
 * @module
 */
import type { CompiledType, ExactInverse, InversePiece } from "../its90/compiled.js";
import { _kernelWasmBase64 } from "./_kernelWasm.js";

interface KernelExports {
  readonly memory: WebAssembly.Memory;
  forward(ptr: number, n: number, tab: number, nsub: number, minC: number, maxC: number, a0: number, a1: number, a2: number): number;
  inverse(ptr: number, n: number, tab: number, np: number, lowOk: number, highOk: number): number;
  exp(x: number): number;
}

/** Where the exact-inverse mirror of one type lives in the kernel's memory. @internal */
export interface InverseMirror {
  readonly inv: ExactInverse;
  /** Address of the piece table (48 bytes per piece: see kernel.wat). */
  readonly table: number;
  /** Per piece, the address of its segment records (80 bytes each: 8 coefficients, lower and upper edge). */
  readonly recordsAt: readonly number[];
}

/** The instantiated kernel and its memory plan. @internal */
export interface BulkKernel {
  readonly exports: KernelExports;
  /** Address of the forward table (up to {@link _FORWARD_MAX_SUBRANGES} sub-ranges of 160 bytes). */
  readonly forwardTable: number;
  /** Address of the chunk buffer ({@link _CHUNK_ELEMENTS} float64). */
  readonly chunk: number;
  /** Whether the kernel's e^x gave the engine's Math.exp at every checked point (else types with an exponential term use the JavaScript path). */
  readonly expMatchesEngine: boolean;
  /** The type whose sub-ranges are in the forward table. */
  forwardType: CompiledType | undefined;
  /** Next free address for mirrors. */
  top: number;
  readonly mirrors: WeakMap<CompiledType, InverseMirror>;
  f64: Float64Array;
  u8: Uint8Array;
  i32: Int32Array;
}

/** Elements per kernel call (32 KiB of float64, converted in place). @internal */
export const _CHUNK_ELEMENTS = 4096;
/** Sub-ranges the forward table holds (a data object with more uses the JavaScript path). @internal */
export const _FORWARD_MAX_SUBRANGES = 16;
/** Coefficients per sub-range the forward table holds (the data check allows 1 to 16). @internal */
export const _FORWARD_MAX_COEFFICIENTS = 16;

const FORWARD_TABLE = 0;
const CHUNK = 4096;
// 36864–40960 (after the chunk): the exact inverse's scratch area, written and read inside one kernel call.
const MIRRORS = 65536;
/** 1.5·2⁵²: added to a record address it keeps the address in the float's low 32 bits (see kernel.wat). */
const RECORD_BIAS = 6755399441055744;

function decodeBase64(text: string): Uint8Array<ArrayBuffer> {
  const binary = atob(text);
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
  return bytes;
}

/**
 * Points where the kernel's e^x is compared with Math.exp at instantiation: 4,096 arguments spread over the
 * exponential term's domain for the built-in data (type K: a1·(t − a2)² from −183.5 to 0) and beyond (±700), both
 * branch edges of the argument reduction (±0.5 ln 2, ±1.5 ln 2) and tiny arguments. V8's Math.exp is the same
 * fdlibm algorithm (a JavaScript transcription measured equal to it on 3.4e7 arguments; the kernel's e^x equal on
 * 2e6 in tests/bulk); an engine whose Math.exp differs anywhere
 * checked gets the JavaScript path for types with an exponential term, so bulk results stay its scalar ones.
 */
function expMatches(exp: (x: number) => number): boolean {
  const edges = [0.5 * Math.LN2, 1.5 * Math.LN2, 2 ** -28, 1];
  const points: number[] = [];
  for (const e of edges) for (let d = -4; d <= 4; d++) points.push(e * (1 + d * 2 ** -52), -e * (1 + d * 2 ** -52));
  for (let j = 0; j < 4096; j++) {
    const u = (j + 0.5) / 4096;
    points.push(-184 * u, -184 * u * u * u, 700 * (2 * u - 1) * u * u);
  }
  for (const x of points) if (!Object.is(exp(x), Math.exp(x))) return false;
  return true;
}

function refreshViews(k: BulkKernel): void {
  const buffer = k.exports.memory.buffer;
  if (k.f64.buffer !== buffer) {
    k.f64 = new Float64Array(buffer);
    k.u8 = new Uint8Array(buffer);
    k.i32 = new Int32Array(buffer);
  }
}

/** Memory views of the kernel, current after any growth. @internal */
export function _views(k: BulkKernel): BulkKernel {
  refreshViews(k);
  return k;
}

let kernel: BulkKernel | null | undefined;

/**
 * Instantiates the kernel (once per module instance): `null` when `WebAssembly` is missing, does not validate the
 * module (no SIMD) or refuses to compile it. @internal
 */
export function _bulkKernel(): BulkKernel | null {
  if (kernel !== undefined) return kernel;
  kernel = null;
  const wasm = (globalThis as { WebAssembly?: typeof WebAssembly }).WebAssembly;
  if (typeof wasm !== "object" || wasm === null || typeof wasm.Instance !== "function") return kernel;
  try {
    const bytes = decodeBase64(_kernelWasmBase64);
    if (!wasm.validate(bytes)) return kernel;
    const exports = new wasm.Instance(new wasm.Module(bytes), {}).exports as unknown as KernelExports;
    const buffer = exports.memory.buffer;
    kernel = {
      exports,
      forwardTable: FORWARD_TABLE,
      chunk: CHUNK,
      expMatchesEngine: expMatches(exports.exp),
      forwardType: undefined,
      top: MIRRORS,
      mirrors: new WeakMap(),
      f64: new Float64Array(buffer),
      u8: new Uint8Array(buffer),
      i32: new Int32Array(buffer),
    };
  } catch {
    kernel = null;
  }
  return kernel;
}

/**
 * Writes a type's sub-ranges into the forward table (lo, hi, coefficient count, exponential flag, 16 slots with
 * the coefficients from the highest down, right-aligned); false when the type does not fit (then the JavaScript path runs). @internal
 */
export function _loadForwardType(k: BulkKernel, ct: CompiledType): boolean {
  if (k.forwardType === ct) return true;
  const subs = ct.subranges;
  if (subs.length > _FORWARD_MAX_SUBRANGES) return false;
  if (!k.expMatchesEngine && subs.some((s) => s.hasExp)) return false;
  _views(k);
  for (let s = 0; s < subs.length; s++) {
    const sub = subs[s] as CompiledSubrange;
    const c = sub.c;
    if (c.length > _FORWARD_MAX_COEFFICIENTS) return false;
    const at = (k.forwardTable + s * 160) / 8;
    k.f64[at] = s === 0 ? ct.minC : sub.minC;
    k.f64[at + 1] = s === subs.length - 1 ? Infinity : (subs[s + 1] as CompiledSubrange).minC;
    k.i32[(at + 2) * 2] = c.length;
    k.i32[(at + 2) * 2 + 1] = sub.hasExp ? 1 : 0;
    // Right-aligned in 16 slots: c[n − 1] in slot 16 − n, c₀ in the last.
    for (let i = 0; i < c.length; i++) k.f64[at + 3 + _FORWARD_MAX_COEFFICIENTS - c.length + i] = c[c.length - 1 - i] as number;
  }
  k.forwardType = ct;
  return true;
}

type CompiledSubrange = CompiledType["subranges"][number];

/**
 * The mirror of a type's exact-inverse tables, allocated on first use with no segment in it (every record's lower
 * edge NaN). @internal
 */
export function _inverseMirror(k: BulkKernel, ct: CompiledType, inv: ExactInverse): InverseMirror {
  let mirror = k.mirrors.get(ct);
  if (mirror !== undefined && mirror.inv === inv) return mirror;
  const pieces = inv.pieces;
  let top = k.top;
  const table = top;
  top += pieces.length * 48;
  const recordsAt: number[] = [];
  for (const p of pieces) {
    recordsAt.push(top);
    top += p.count * 80;
  }
  const memory = k.exports.memory;
  if (top > memory.buffer.byteLength) memory.grow(Math.ceil((top - memory.buffer.byteLength) / 65536));
  _views(k);
  // The EMF interval [L, U) of each piece: the exact inverse scans the pieces in order and stops at the first
  // whose start is above the EMF, so it picks piece j exactly when L(j) <= e < L(j + 1), with L(j) the largest
  // start of pieces 0..j (−∞ for piece 0; L is non-decreasing) and +∞ after the last piece.
  const lower = pieces.map((_, j) => (j === 0 ? -Infinity : Math.max(...pieces.slice(0, j + 1).map((p) => p.emfStart))));
  pieces.forEach((p, j) => {
    const at = (table + j * 48) / 8;
    k.f64[at] = p.emfStart;
    k.f64[at + 1] = p.perMillivolt;
    k.f64[at + 2] = p.count - 1;
    // 1.5·2⁵² + address: the address in the float's low 32 bits, and base + 80·k exact for the kernel.
    k.f64[at + 3] = RECORD_BIAS + (recordsAt[j] as number);
    k.f64[at + 4] = lower[j] as number;
    k.f64[at + 5] = lower[j + 1] ?? Infinity;
    for (let s = 0; s < p.count; s++) k.f64[(recordsAt[j] as number) / 8 + s * 10 + 8] = NaN;
  });
  k.top = top;
  mirror = { inv, table, recordsAt };
  k.mirrors.set(ct, mirror);
  return mirror;
}

/**
 * Copies the segment an EMF falls in into the mirror when the JavaScript tables have its interpolant (state 2);
 * the piece and segment are chosen as the exact inverse chooses them. @internal
 */
export function _mirrorSegmentOf(k: BulkKernel, mirror: InverseMirror, emfMillivolts: number): void {
  const pieces = mirror.inv.pieces;
  let j = 0;
  while (j + 1 < pieces.length && emfMillivolts >= (pieces[j + 1] as InversePiece).emfStart) j++;
  const p = pieces[j] as InversePiece;
  let s = Math.floor((emfMillivolts - p.emfStart) * p.perMillivolt);
  if (s >= p.count) s = p.count - 1;
  else if (s < 0) s = 0;
  if (p.state[s] !== 2) return;
  _views(k);
  const at = (mirror.recordsAt[j] as number) / 8 + s * 10;
  k.f64.set(p.coefficients.subarray(s * 8, s * 8 + 8), at);
  k.f64[at + 9] = p.edgesC[s + 1] as number;
  // The lower edge last: it marks the record as complete.
  k.f64[at + 8] = p.edgesC[s] as number;
}
