/**
 * Every combination of placement (adaptive, uniform), input number type, output number type and direction
 * (EMF → temperature, temperature → EMF), type K over 0 … 250 °C, emitted as C headers and compiled with the
 * machine's gcc (-std=c99 -O2 -Wall -Werror). Inputs: every integer input of an integer-input table; for a
 * float-input table 10⁶ random inputs (uniform over the input range, rounded to the input type) plus every
 * breakpoint, both range ends, every seam of the reference function (sub-range boundary) and every segment edge
 * of the exact inverse inside the range, each ± 3 units in the last place (exact neighbours).
 *
 * The heavy work is done in C: the test writes, per table, the inputs, the library's interpolation and the
 * float64 exact conversion (tests/firmware/helpers.ts `exactOutput`, the public API) as binary files; a checker
 * (its own translation unit, always compiled with the default flags) calls the compiled lookups (compiled with
 * the flags under test), and for every input checks
 * - the status (in range),
 * - bit identity with the library's interpolation (default flags),
 * - |C output − float64 reference| + the table's stated reference error ≤ the stated bound (the float64
 *   reference is itself within `errorBound.referenceOutputUnits` of the exact value),
 * and reports the 8 worst inputs and 8 inputs spread over the list, which are re-checked against a 40-digit
 * decimal reference (decimal.js through src/its90/exactDecimal.ts, from the NIST SRD 60 coefficients).
 * Floating-point outputs are compiled three more ways: fused multiply-add (-ffp-contract=fast -mfma, where the
 * CPU has FMA), the build machine's instruction set (-march=native -ffp-contract=fast) and x87 intermediates
 * (-mfpmath=387, x86-64), where the last bits may differ from the library but the stated bound must still hold.
 * Sources: the linear interpolation error theorem (from memory), the reference functions of NIST SRD 60 /
 * Monograph 175.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { arch, tmpdir } from "node:os";
import { join } from "node:path";
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { buildFirmwareTable, formatFirmwareTableC, interpolateFirmwareTable, seebeckCoefficient, thermocoupleData, typeK } from "../../src/index.js";
import type { BuildFirmwareTableOptions, FirmwareNumberType, FirmwareTable } from "../../src/index.js";
import { _tableFunction } from "../../src/firmware/tableFunction.js";
import { _compile } from "../../src/its90/compiled.js";
import { _decimalContext, _emfDecimal } from "../../src/its90/exactDecimal.js";
import { _exactInverseTables } from "../../src/its90/exactInverse.js";
import { exactOutput, hasGcc } from "./helpers.js";

const numberTypes: FirmwareNumberType[] = ["int16", "uint16", "int32", "uint32", "float32", "float64"];
const C_TYPE: Record<FirmwareNumberType, string> = {
  int16: "int16_t",
  uint16: "uint16_t",
  int32: "int32_t",
  uint32: "uint32_t",
  float32: "float",
  float64: "double",
};
const isFloat = (t: FirmwareNumberType): boolean => t.startsWith("float");
const D = _decimalContext(40);
const RANDOM_INPUTS = 1_000_000;
const NEIGHBOURS = 3;
const REPORTED = 8;

interface Case {
  readonly name: string;
  readonly table: FirmwareTable;
  /** Number of inputs written to the case's data file. */
  count: number;
}

function options(kind: "emfToTemperature" | "temperatureToEmf", placement: "adaptive" | "uniform", input: FirmwareNumberType, output: FirmwareNumberType): BuildFirmwareTableOptions {
  const inverse = kind === "emfToTemperature";
  const floatOut = isFloat(output);
  return {
    type: "K",
    kind,
    minC: 0,
    maxC: 250,
    placement,
    input: { numberType: input, scale: inverse || isFloat(input) ? 1 : 20 },
    output: { numberType: output, scale: inverse && !floatOut ? 100 : 1 },
    maxErrorOutputUnits: inverse ? (floatOut ? 0.001 : 0.05) : floatOut ? 0.1 : 3,
  };
}

const f64 = new Float64Array(1);
const i64 = new BigInt64Array(f64.buffer);
const f32 = new Float32Array(1);
const i32 = new Int32Array(f32.buffer);

/** Ordered integer key of a float (monotone in the value, −0 = +0), and back. */
function keyOf(x: number, numberType: FirmwareNumberType): bigint {
  if (numberType === "float32") {
    f32[0] = x;
    const b = i32[0] as number;
    return BigInt(b < 0 ? -(b & 0x7fffffff) : b);
  }
  f64[0] = x;
  const b = i64[0] as bigint;
  return b < 0n ? -(b & 0x7fffffffffffffffn) : b;
}
function fromKey(k: bigint, numberType: FirmwareNumberType): number {
  if (numberType === "float32") {
    const n = Number(k);
    i32[0] = n < 0 ? -n | 0x80000000 : n;
    return f32[0] as number;
  }
  i64[0] = k < 0n ? -k | -0x8000000000000000n : k;
  return f64[0] as number;
}
/** The float `k` places after x in the input type (exact neighbours; checked in the inputs test). */
function neighbour(x: number, k: number, numberType: FirmwareNumberType): number {
  const round = numberType === "float32" ? Math.fround : (v: number): number => v;
  return fromKey(keyOf(round(x), numberType) + BigInt(k), numberType);
}

/** Natural-unit positions where a float-input table's reference has a seam or a segment edge. */
function seamInputs(table: FirmwareTable): number[] {
  const out = _tableFunction(table.thermocoupleType, table.kind, undefined, "test").seams.map((s) => s.input);
  if (table.kind === "emfToTemperature") {
    for (const p of _exactInverseTables(_compile(thermocoupleData(table.thermocoupleType))).pieces) {
      for (let k = 0; k <= p.count; k++) out.push((p.emfStart + k * p.width) * 1000);
    }
  }
  return out;
}

/** Inputs (stored units) of a table: every integer input, or random + breakpoints, ends, seams ± 3 units. */
function inputsOf(table: FirmwareTable, random: () => number): Float64Array {
  const { min, max, numberType, scale } = table.input;
  if (!isFloat(numberType)) {
    const out = new Float64Array(max - min + 1);
    for (let x = min; x <= max; x++) out[x - min] = x;
    return out;
  }
  const round = numberType === "float32" ? Math.fround : (v: number): number => v;
  const special: number[] = [];
  for (const b of [...table.inputs, min, max, ...seamInputs(table).map((s) => s * scale)]) {
    for (let k = -NEIGHBOURS; k <= NEIGHBOURS; k++) {
      const x = neighbour(b, k, numberType);
      if (x >= min && x <= max) special.push(x);
    }
  }
  const out = new Float64Array(special.length + RANDOM_INPUTS);
  out.set(special);
  let n = special.length;
  while (n < out.length) {
    const x = round(min + (max - min) * random());
    if (x >= min && x <= max) out[n++] = x;
  }
  return out;
}

/** 40-digit exact output (natural units) at a stored input. */
function exact40(table: FirmwareTable, x: number): InstanceType<typeof D> {
  const natural = new D(x).div(table.input.scale);
  if (table.kind === "temperatureToEmf") return _emfDecimal(typeK, natural.toString(), 40).times(1000);
  // Inverse: Newton on the decimal forward function from the float reference (the float slope suffices:
  // the iteration contracts by |1 − S/Ŝ| ≈ 1e-15 per step).
  const emf = natural.div(1000);
  let t = new D(exactOutput(table, x));
  for (let i = 0; i < 4; i++) {
    const slope = new D(seebeckCoefficient("K", Math.min(Math.max(t.toNumber(), 0), 1372)) / 1000);
    t = t.minus(_emfDecimal(typeK, t.toString(), 40).minus(emf).div(slope));
  }
  return t;
}

/** The checker: reads each case's inputs, library values and float64 reference, runs the lookups, checks. */
const CHECKER = `#include <math.h>
#include <stdio.h>
#include <stdlib.h>
void hj_run(int k, const double *x, double *y, int *status, size_t n);
int main(void)
{
    int k;
    unsigned long n;
    double scale, reference, bound;
    char path[4096];
    while (scanf("%d %lu %lf %lf %lf %4095s", &k, &n, &scale, &reference, &bound, path) == 6) {
        double *d = malloc(3 * n * sizeof *d);
        double *y = malloc(n * sizeof *y);
        int *status = malloc(n * sizeof *status);
        FILE *f = fopen(path, "rb");
        size_t i, j, badStatus = 0, differ = 0, over = 0, firstBad = n;
        size_t worst[${REPORTED}];
        double worstErr[${REPORTED}], maxErr = 0;
        if (d == NULL || y == NULL || status == NULL || f == NULL || fread(d, sizeof *d, 3 * n, f) != 3 * n) return 3;
        fclose(f);
        for (j = 0; j < ${REPORTED}; j++) { worst[j] = n; worstErr[j] = -1; }
        hj_run(k, d, y, status, n);
        for (i = 0; i < n; i++) {
            double e;
            if (status[i] != 0) { badStatus++; if (firstBad == n) firstBad = i; continue; }
            if (y[i] != d[n + i]) differ++;
            e = fabs(y[i] / scale - d[2 * n + i]);
            if (!(e + reference <= bound)) { over++; if (firstBad == n) firstBad = i; }
            if (!(e <= maxErr)) maxErr = e;
            if (e > worstErr[${REPORTED - 1}] || e != e) {
                for (j = ${REPORTED - 1}; j > 0 && !(worstErr[j - 1] >= e); j--) { worstErr[j] = worstErr[j - 1]; worst[j] = worst[j - 1]; }
                worstErr[j] = e;
                worst[j] = i;
            }
        }
        printf("case %d %lu %lu %lu %lu %lu %.17g\\n", k, n, (unsigned long)badStatus, (unsigned long)differ, (unsigned long)over, (unsigned long)firstBad, maxErr);
        for (j = 0; j < ${REPORTED}; j++) if (worst[j] < n) printf("point %d %.17g %.17g\\n", k, d[worst[j]], y[worst[j]]);
        for (j = 0; j < ${REPORTED}; j++) { i = (n - 1) * j / ${REPORTED - 1}; printf("point %d %.17g %.17g\\n", k, d[i], y[i]); }
        if (firstBad < n) printf("bad %d %.17g %d %.17g\\n", k, d[firstBad], status[firstBad], y[firstBad]);
        free(d);
        free(y);
        free(status);
    }
    return 0;
}
`;

interface CaseResult {
  count: number;
  badStatus: number;
  differ: number;
  over: number;
  maxError: number;
  points: { x: number; y: number }[];
  bad: string | null;
}

const GCC = ["-std=c99", "-O2", "-Wall", "-Werror"];

/** Compiles the lookups of `indices` with `flags`, links the checker and runs it over the cases' data files. */
function compileAndCheck(dir: string, cases: readonly Case[], indices: readonly number[], flags: readonly string[], tag: string): Map<number, CaseResult> {
  const lines: string[] = [];
  const branches: string[] = [];
  for (const k of indices) {
    const c = cases[k] as Case;
    const inType = C_TYPE[c.table.input.numberType];
    const outType = C_TYPE[c.table.output.numberType];
    lines.push(`#include "t${k}.h"`);
    branches.push(`    case ${k}: for (i = 0; i < n; i++) { ${outType} v = 0; status[i] = t${k}_lookup((${inType})x[i], &v); y[i] = (double)v; } break;`);
  }
  const source = [
    "#include <stddef.h>",
    ...lines,
    "void hj_run(int k, const double *x, double *y, int *status, size_t n);",
    "void hj_run(int k, const double *x, double *y, int *status, size_t n)",
    "{",
    "    size_t i;",
    "    switch (k) {",
    ...branches,
    "    default: for (i = 0; i < n; i++) status[i] = -1000; break;",
    "    }",
    "}",
    "",
  ].join("\n");
  writeFileSync(join(dir, `lookups-${tag}.c`), source);
  const exe = join(dir, `driver-${tag}`);
  execFileSync("gcc", [...GCC, ...flags, "-c", "-o", join(dir, `lookups-${tag}.o`), join(dir, `lookups-${tag}.c`)], { stdio: "pipe" });
  execFileSync("gcc", ["-o", exe, join(dir, `lookups-${tag}.o`), join(dir, "checker.o"), "-lm"], { stdio: "pipe" });
  const manifest = indices.map((k) => {
    const c = cases[k] as Case;
    const e = c.table.errorBound;
    return `${k} ${c.count} ${c.table.output.scale} ${e.referenceOutputUnits} ${e.totalOutputUnits} ${join(dir, `c${k}.bin`)}`;
  });
  const text = execFileSync(exe, [], { input: manifest.join("\n") + "\n", maxBuffer: 1 << 26 }).toString();
  const results = new Map<number, CaseResult>();
  for (const line of text.split("\n")) {
    const f = line.split(" ");
    if (f[0] === "case") {
      results.set(Number(f[1]), {
        count: Number(f[2]),
        badStatus: Number(f[3]),
        differ: Number(f[4]),
        over: Number(f[5]),
        maxError: Number(f[7]),
        points: [],
        bad: null,
      });
    } else if (f[0] === "point") (results.get(Number(f[1])) as CaseResult).points.push({ x: Number(f[2]), y: Number(f[3]) });
    else if (f[0] === "bad") (results.get(Number(f[1])) as CaseResult).bad = `input ${f[2]} status ${f[3]} output ${f[4]}`;
  }
  return results;
}

const hasFma = (() => {
  try {
    return /\bfma\b/.test(readFileSync("/proc/cpuinfo", "utf8"));
  } catch {
    return false;
  }
})();

describe.skipIf(!hasGcc())("C headers: every placement × input type × output type × direction", () => {
  const cases: Case[] = [];
  for (const kind of ["emfToTemperature", "temperatureToEmf"] as const) {
    for (const placement of ["adaptive", "uniform"] as const) {
      for (const input of numberTypes) {
        for (const output of numberTypes) {
          if (placement === "uniform" && isFloat(input)) continue;
          if (!isFloat(output) && isFloat(input)) continue;
          cases.push({ name: `${kind} ${placement} ${input}→${output}`, table: buildFirmwareTable(options(kind, placement, input, output)), count: 0 });
        }
      }
    }
  }
  const random = fc.sample(fc.double({ min: 0, max: 1, noNaN: true, maxExcluded: true }), { seed: 1307, numRuns: 1 })[0] ?? 0.5;
  let state = Math.floor(random * 2 ** 31) | 1;
  const next32 = (): number => {
    state = (Math.imul(state, 1103515245) + 12345) >>> 0;
    return state >>> 16;
  };
  // 53 random bits from the high halves of four LCG steps.
  const next = (): number => (((next32() * 2 ** 16 + next32()) % 2 ** 21) * 2 ** 32 + next32() * 2 ** 16 + next32()) / 2 ** 53;
  let dir = "";
  const totals = { tables: cases.length, points: 0, integerPoints: 0, floatInputPoints: 0, worstRatio: 0, worstRatio40: 0, decimalPoints: 0, worstTable: "" };

  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), "hj-combos-"));
    writeFileSync(join(dir, "checker.c"), CHECKER);
    execFileSync("gcc", [...GCC, "-c", "-o", join(dir, "checker.o"), join(dir, "checker.c")], { stdio: "pipe" });
    cases.forEach((c, k) => {
      writeFileSync(join(dir, `t${k}.h`), formatFirmwareTableC(c.table, { prefix: `t${k}` }));
      const xs = inputsOf(c.table, next);
      const n = xs.length;
      const data = new Float64Array(3 * n);
      data.set(xs);
      for (let i = 0; i < n; i++) {
        const x = xs[i] as number;
        data[n + i] = interpolateFirmwareTable(c.table, x);
        data[2 * n + i] = exactOutput(c.table, x);
      }
      writeFileSync(join(dir, `c${k}.bin`), new Uint8Array(data.buffer));
      c.count = n;
      totals.points += n;
      if (isFloat(c.table.input.numberType)) totals.floatInputPoints += n;
      else totals.integerPoints += n;
    });
  }, 300_000);
  afterAll(() => {
    if (dir !== "") rmSync(dir, { recursive: true, force: true });
  });

  it("builds 104 tables, each with a bound within its request", () => {
    expect(cases.length).toBe(104);
    for (const c of cases) expect(c.table.errorBound.totalOutputUnits, c.name).toBeLessThanOrEqual(c.table.requestedMaxErrorOutputUnits);
  });

  it("the inputs: every integer input, or 10⁶ random plus every breakpoint, end and seam ± 3 exact neighbours", () => {
    // The neighbour function against Math.fround / the float64 spacing (exact ulps, IEEE 754).
    expect(neighbour(1, 1, "float32")).toBe(1 + 2 ** -23);
    expect(neighbour(1, -1, "float32")).toBe(1 - 2 ** -24);
    expect(neighbour(1, 3, "float64")).toBe(1 + 3 * 2 ** -52);
    expect(neighbour(0, -1, "float64")).toBe(-(2 ** -1074));
    expect(neighbour(-2, 1, "float64")).toBe(-2 + 2 ** -52);
    // IEEE 754 spacing: the next float is above x and no float of the type lies strictly between (the midpoint
    // rounds to one of the two).
    for (const numberType of ["float32", "float64"] as const) {
      const round = numberType === "float32" ? Math.fround : (v: number): number => v;
      fc.assert(
        fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (v) => {
          const x = round(v);
          const up = neighbour(x, 1, numberType);
          const mid = round(x / 2 + up / 2);
          return up > x && (mid === x || mid === up) && neighbour(up, -1, numberType) === (x === 0 ? 0 : x);
        }),
        { seed: 13, numRuns: 2000 },
      );
    }
    for (const c of cases) {
      const { min, max, numberType } = c.table.input;
      if (!isFloat(numberType)) expect(c.count, c.name).toBe(max - min + 1);
      else expect(c.count, c.name).toBeGreaterThan(RANDOM_INPUTS + 7 * c.table.inputs.length);
    }
  });

  function check40(c: Case, points: readonly { x: number; y: number }[], bound: number): number {
    let worst = 0;
    for (const { x, y } of points) {
      const e40 = new D(y).div(c.table.output.scale).minus(exact40(c.table, x)).abs().toNumber();
      expect(e40, `${c.name} at ${x}`).toBeLessThanOrEqual(bound);
      worst = Math.max(worst, e40 / bound);
      totals.decimalPoints++;
    }
    return worst;
  }

  it("default flags: bit-identical to the library, within the bound against float64 and 40-digit references", () => {
    const results = compileAndCheck(dir, cases, cases.map((_, k) => k), [], "default");
    cases.forEach((c, k) => {
      const r = results.get(k);
      expect(r, c.name).toBeDefined();
      const { count, badStatus, differ, over, maxError, points, bad } = r as CaseResult;
      expect(count, c.name).toBe(c.count);
      expect([badStatus, differ, over, bad], c.name).toEqual([0, 0, 0, null]);
      const bound = c.table.errorBound.totalOutputUnits;
      expect(maxError + c.table.errorBound.referenceOutputUnits, c.name).toBeLessThanOrEqual(bound);
      if (maxError / bound > totals.worstRatio) totals.worstTable = c.name;
      totals.worstRatio = Math.max(totals.worstRatio, maxError / bound);
      totals.worstRatio40 = Math.max(totals.worstRatio40, check40(c, points, bound));
    });
    const counts = (float: boolean): string => {
      const n = cases.filter((c) => isFloat(c.table.input.numberType) === float).map((c) => c.count);
      return `${Math.min(...n)}–${Math.max(...n)} per table`;
    };
    console.log(
      `cHeaderCombinations: ${totals.tables} tables, ${totals.points} inputs compiled and checked (${totals.integerPoints} integer inputs of ${cases.filter((c) => !isFloat(c.table.input.numberType)).length} tables, ${counts(false)}; ${totals.floatInputPoints} float inputs of ${cases.filter((c) => isFloat(c.table.input.numberType)).length} tables, ${counts(true)}), ${totals.decimalPoints} at 40 digits; worst error/bound ${totals.worstRatio.toFixed(4)} (float64 reference; ${totals.worstTable}), ${totals.worstRatio40.toFixed(4)} (40 digits)`,
    );
  }, 300_000);

  const floatOutputs = cases.flatMap((c, k) => (isFloat(c.table.output.numberType) ? [k] : []));
  const variants: { name: string; tag: string; flags: string[]; run: boolean }[] = [
    { name: "fused multiply-add (-ffp-contract=fast -mfma)", tag: "fma", flags: ["-ffp-contract=fast", "-mfma"], run: hasFma && arch() === "x64" },
    // The build machine's own instruction set with contraction on (what a firmware build with -march=native does).
    { name: "native instruction set (-march=native -ffp-contract=fast)", tag: "native", flags: ["-march=native", "-ffp-contract=fast"], run: arch() === "x64" },
    { name: "x87 intermediates (-mfpmath=387)", tag: "x87", flags: ["-mfpmath=387"], run: arch() === "x64" },
    // -m32 -mfpmath=387 (a 32-bit x87 target) is not compiled: the CI image has no 32-bit C library (multilib),
    // so gcc -m32 cannot link. -mfpmath=387 on x86-64 gives the same x87 excess precision (FLT_EVAL_METHOD 2).
  ];
  for (const v of variants) {
    it.skipIf(!v.run)(`${v.name}: float outputs stay within the bound`, () => {
      const results = compileAndCheck(dir, cases, floatOutputs, v.flags, v.tag);
      let changed = 0;
      let points = 0;
      let worstRatio = 0;
      let worstRatio40 = 0;
      for (const k of floatOutputs) {
        const c = cases[k] as Case;
        const { count, badStatus, over, maxError, points: picks, bad, differ } = results.get(k) as CaseResult;
        expect(count, c.name).toBe(c.count);
        expect([badStatus, over, bad], c.name).toEqual([0, 0, null]);
        const bound = c.table.errorBound.totalOutputUnits;
        expect(maxError + c.table.errorBound.referenceOutputUnits, c.name).toBeLessThanOrEqual(bound);
        changed += differ;
        points += count;
        worstRatio = Math.max(worstRatio, maxError / bound);
        worstRatio40 = Math.max(worstRatio40, check40(c, picks, bound));
      }
      console.log(`cHeaderCombinations ${v.name}: ${floatOutputs.length} tables, ${points} inputs, ${changed} lookups differ in the last bits from the library; worst error/bound ${worstRatio.toFixed(4)} (float64 reference), ${worstRatio40.toFixed(4)} (40 digits)`);
    }, 300_000);
  }
});
