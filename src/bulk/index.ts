/**
 * `hotjunction/bulk`: the bulk conversions of the root entry on a WebAssembly SIMD kernel (two float64 lanes),
 * with the same results to the last bit. The kernel's bytes are embedded in this entry, so it works in Node and
 * in browsers without reading a file; where WebAssembly or its SIMD instructions are missing, the root entry's
 * JavaScript loops run instead (see {@link bulkBackend}). A bundle that does not import this entry carries none
 * of it.
 * @module
 */
import type { ThermocoupleData, ThermocoupleType } from "../data/thermocoupleData.js";
import { _requireFinite } from "../errors.js";
import { _checkBulkArrays, _emfFromTemperatureArray, _temperatureFromEmfArray } from "../its90/bulk.js";
import { _compile, _emf, type CompiledType } from "../its90/compiled.js";
import { _checkEmf, _checkTemperature, _EMF_END_TOLERANCE_MV } from "../its90/engine.js";
import { _exactInverse, _exactInverseTables } from "../its90/exactInverse.js";
import { thermocoupleData } from "../its90/resolveType.js";
import {
  _bulkKernel,
  _CHUNK_ELEMENTS,
  _inverseMirror,
  _loadForwardType,
  _mirrorSegmentOf,
  _views,
  type BulkKernel,
} from "./wasmKernel.js";

/** Which code converts the arrays: the WebAssembly SIMD kernel or the JavaScript loops. */
export type BulkBackend = "webassembly-simd" | "javascript";

/**
 * Tells which code the bulk conversions of this entry run on: `"webassembly-simd"` when the engine runs
 * WebAssembly with SIMD (the kernel is instantiated on the first call), else `"javascript"`. Either way the
 * results are the same floats. On an engine whose `Math.exp` is not V8's fdlibm algorithm (checked at
 * instantiation on about 12,000 arguments), types with an exponential term (K) convert forward on the JavaScript path.
 * @returns the backend in use
 * @example
 * ```ts
 * import { bulkBackend } from "hotjunction/bulk";
 * console.log(bulkBackend()); // "webassembly-simd"
 * ```
 */
export function bulkBackend(): BulkBackend {
  return _bulkKernel() === null ? "javascript" : "webassembly-simd";
}

// Deliberately alike: inverseOnKernel below walks the chunks the same way (copy in, run the kernel, fall back per
// element); what runs on a chunk differs (forward sub-ranges here, the exact inverse's pieces there).
function forwardOnKernel(k: BulkKernel, ct: CompiledType, input: Float64Array, result: Float64Array, n: number): void {
  const x = k.exports;
  const sub = ct.subranges;
  for (let start = 0; start < n; start += _CHUNK_ELEMENTS) {
    const m = Math.min(_CHUNK_ELEMENTS, n - start);
    const base = k.chunk / 8;
    _views(k).f64.set(input.subarray(start, start + m), base);
    let j = 0;
    while (j < m) {
      j += x.forward(k.chunk + j * 8, m - j, k.forwardTable, sub.length, ct.minC, ct.maxC, ct.a0, ct.a1, ct.a2);
      if (j < m) {
        // Left for JavaScript: out of range (throws, naming the element, after the elements before it) or an
        // exponential argument the kernel does not scale.
        const t = input[start + j] as number;
        if (!(t >= ct.minC && t <= ct.maxC)) {
          result.set(k.f64.subarray(base, base + j), start);
          _checkTemperature(ct, t, `temperature [${start + j}]`);
        }
        k.f64[base + j] = _emf(ct, t);
        j++;
      }
    }
    result.set(k.f64.subarray(base, base + m), start);
  }
}

// Deliberately alike: forwardOnKernel above walks the chunks the same way; here the inverse's pieces and window.
function inverseOnKernel(k: BulkKernel, ct: CompiledType, input: Float64Array, result: Float64Array, n: number): void {
  const x = k.exports;
  const inv = _exactInverseTables(ct);
  const mirror = _inverseMirror(k, ct, inv);
  const np = inv.pieces.length;
  // The acceptance window of the JavaScript bulk path; anything else is checked in full there.
  const lowOk = ct.monotonicFromC > ct.minC ? ct.emfAtMinC : ct.emfAtMinC - _EMF_END_TOLERANCE_MV;
  const highOk = ct.emfAtMaxC + _EMF_END_TOLERANCE_MV;
  for (let start = 0; start < n; start += _CHUNK_ELEMENTS) {
    const m = Math.min(_CHUNK_ELEMENTS, n - start);
    const base = k.chunk / 8;
    _views(k).f64.set(input.subarray(start, start + m), base);
    let j = 0;
    while (j < m) {
      j += x.inverse(k.chunk + j * 8, m - j, mirror.table, np, lowOk, highOk);
      if (j < m) {
        // Left for JavaScript: outside the window (checked in full, throws after the elements before it), or a
        // segment not mirrored yet (built here if needed, then copied) or solved by Newton.
        const e = input[start + j] as number;
        if (!(e > lowOk && e <= highOk)) {
          result.set(k.f64.subarray(base, base + j), start);
          _requireFinite(e, `EMF [${start + j}]`, "mV", ct.context);
          _checkEmf(ct, e, `EMF [${start + j}]`, ct.context);
        }
        const t = _exactInverse(ct, inv, e);
        _mirrorSegmentOf(k, mirror, e);
        _views(k).f64[base + j] = t;
        j++;
      }
    }
    result.set(k.f64.subarray(base, base + m), start);
  }
}

/**
 * Bulk forward conversion over a `Float64Array`, into `out` when given: the root entry's
 * `emfFromTemperatureArray` on the WebAssembly kernel, the same floats (type K's exponential term by the kernel's
 * fdlibm e^x, the algorithm of V8's `Math.exp`).
 * @param type - `"B"`, `"E"`, `"J"`, `"K"`, `"N"`, `"R"`, `"S"`, `"T"` or a data object
 * @param temperaturesC - temperatures, °C, each within the type's range
 * @param out - optional output array of at least the same length
 * @returns EMFs, mV (the `out` array when given)
 * @throws HotjunctionTypeError (`INVALID_OPTION`) if an array is not a `Float64Array` or `out` is too short;
 *   HotjunctionRangeError (`OUT_OF_RANGE`) naming the first element out of range (`temperature [i]`), or
 *   HotjunctionTypeError for a NaN element; elements before it are written to `out`
 * @example
 * ```ts
 * import { emfFromTemperatureArray } from "hotjunction/bulk";
 * const emf = emfFromTemperatureArray("K", new Float64Array([0, 100, 500]));
 * console.log(emf[2]?.toFixed(6)); // "20.644286"
 * ```
 */
export function emfFromTemperatureArray(
  type: ThermocoupleType | ThermocoupleData,
  temperaturesC: Float64Array,
  out?: Float64Array,
): Float64Array {
  const ct = _compile(thermocoupleData(type));
  const k = _bulkKernel();
  if (k === null || !_loadForwardType(k, ct)) return _emfFromTemperatureArray(ct, temperaturesC, out);
  const n = _checkBulkArrays(temperaturesC, out, "temperatures", ct.context);
  const result = out ?? new Float64Array(n);
  forwardOnKernel(k, ct, temperaturesC, result, n);
  return result;
}

/**
 * Bulk exact inverse over a `Float64Array`, into `out` when given: the root entry's `temperatureFromEmfArray` with
 * the interpolated segments evaluated on the WebAssembly kernel, the same floats. Segments are built by the
 * JavaScript exact inverse when an EMF first reaches them (then copied to the kernel); EMFs in the few segments
 * solved by Newton (where the Seebeck coefficient nearly vanishes) are converted by it.
 * @param type - `"B"`, `"E"`, `"J"`, `"K"`, `"N"`, `"R"`, `"S"`, `"T"` or a data object
 * @param emfsMillivolts - EMFs, mV, each within the type's unambiguous EMF range
 * @param out - optional output array of at least the same length
 * @returns temperatures, °C (the `out` array when given)
 * @throws HotjunctionTypeError (`INVALID_OPTION`) if an array is not a `Float64Array` or `out` is too short;
 *   HotjunctionRangeError (`OUT_OF_RANGE`, or `AMBIGUOUS_EMF` for type B at or below 0 mV) naming the first bad
 *   element (`EMF [i]`), or HotjunctionTypeError for a NaN element; elements before it are written to `out`
 * @example
 * ```ts
 * import { temperatureFromEmfArray } from "hotjunction/bulk";
 * const t = temperatureFromEmfArray("K", new Float64Array([4.096, 41.276]));
 * console.log(t[0]?.toFixed(1), t[1]?.toFixed(1)); // "100.0" "1000.0"
 * ```
 */
export function temperatureFromEmfArray(
  type: ThermocoupleType | ThermocoupleData,
  emfsMillivolts: Float64Array,
  out?: Float64Array,
): Float64Array {
  const ct = _compile(thermocoupleData(type));
  const k = _bulkKernel();
  if (k === null) return _temperatureFromEmfArray(ct, emfsMillivolts, out);
  const n = _checkBulkArrays(emfsMillivolts, out, "EMFs", ct.context);
  const result = out ?? new Float64Array(n);
  inverseOnKernel(k, ct, emfsMillivolts, result, n);
  return result;
}
