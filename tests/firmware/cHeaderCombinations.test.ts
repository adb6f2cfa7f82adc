/**
 * Every combination of placement (adaptive, uniform), input number type, output number type and direction
 * (EMF → temperature, temperature → EMF), type K over 0 … 250 °C, emitted as C headers and compiled with the
 * machine's gcc (-std=c99 -O2 -Wall -Werror), evaluated over every integer input (float inputs: every
 * breakpoint ± 3 ulps, the range ends ± 3 ulps and 20,000 random inputs), against
 * - the library's interpolation (bit for bit with the default flags),
 * - the float64 reference plus its error bound, everywhere, and
 * - a 40-digit decimal reference (decimal.js through src/its90/exactDecimal.ts, from the NIST SRD 60
 *   coefficients) at the 8 worst inputs and 8 random inputs of each table.
 * Floating-point outputs are compiled twice more: with fused multiply-add (-ffp-contract=fast -mfma, where the
 * CPU has FMA) and with x87 intermediates (-mfpmath=387, x86-64), where the last bits may differ from the
 * library but the stated bound must still hold. Sources: the linear interpolation error theorem (from memory),
 * the reference functions of NIST SRD 60 / Monograph 175.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { arch, tmpdir } from "node:os";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { buildFirmwareTable, formatFirmwareTableC, interpolateFirmwareTable, seebeckCoefficient, typeK } from "../../src/index.js";
import type { BuildFirmwareTableOptions, FirmwareNumberType, FirmwareTable } from "../../src/index.js";
import { _decimalContext, _emfDecimal } from "../../src/its90/exactDecimal.js";
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

interface Case {
  readonly name: string;
  readonly table: FirmwareTable;
  readonly inputs: number[];
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

function ulpStep(x: number, k: number, numberType: FirmwareNumberType): number {
  const round = numberType === "float32" ? Math.fround : (v: number): number => v;
  const u = numberType === "float32" ? 2 ** -23 : 2 ** -52;
  return round(x + k * Math.max(Math.abs(x), 1e-30) * u);
}

function inputsOf(table: FirmwareTable, random: () => number): number[] {
  const { min, max, numberType } = table.input;
  const out: number[] = [];
  if (!isFloat(numberType)) {
    for (let x = min; x <= max; x++) out.push(x);
    return out;
  }
  const round = numberType === "float32" ? Math.fround : (v: number): number => v;
  for (const b of [...table.inputs, min, max]) {
    for (let k = -3; k <= 3; k++) {
      const x = ulpStep(b, k, numberType);
      if (x >= min && x <= max) out.push(x);
    }
  }
  for (let i = 0; i < 20_000; i++) {
    const x = round(min + (max - min) * random());
    if (x >= min && x <= max) out.push(x);
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

function compileAndRun(cases: readonly Case[], flags: readonly string[]): number[][] {
  const dir = mkdtempSync(join(tmpdir(), "hj-combos-"));
  try {
    const includes: string[] = [];
    const branches: string[] = [];
    cases.forEach((c, k) => {
      const prefix = `t${k}`;
      writeFileSync(join(dir, `${prefix}.h`), formatFirmwareTableC(c.table, { prefix }));
      includes.push(`#include "${prefix}.h"`);
      const outType = C_TYPE[c.table.output.numberType];
      const inType = C_TYPE[c.table.input.numberType];
      branches.push(`        case ${k}: { ${outType} y = 0; const int s = ${prefix}_lookup((${inType})v, &y); printf("%d %.17g\\n", s, (double)y); break; }`);
    });
    const driver = [
      "#include <stdio.h>",
      ...includes,
      "int main(void)",
      "{",
      "    int k;",
      "    double v;",
      "    while (scanf(\"%d %lf\", &k, &v) == 2) {",
      "        switch (k) {",
      ...branches,
      "        default: return 2;",
      "        }",
      "    }",
      "    return 0;",
      "}",
      "",
    ].join("\n");
    writeFileSync(join(dir, "driver.c"), driver);
    execFileSync("gcc", ["-std=c99", "-O2", "-Wall", "-Werror", ...flags, "-o", join(dir, "driver"), join(dir, "driver.c")], { stdio: "pipe" });
    const lines: string[] = [];
    cases.forEach((c, k) => {
      for (const x of c.inputs) lines.push(`${k} ${x}`);
    });
    const run = spawnSync(join(dir, "driver"), [], { input: lines.join("\n") + "\n", maxBuffer: 1 << 30 });
    if (run.status !== 0) throw new Error(`driver failed (${run.status}): ${run.stderr.toString()}`);
    const text = run.stdout.toString();
    const results: number[][] = cases.map(() => []);
    let k = 0;
    let i = 0;
    for (const line of text.split("\n")) {
      if (line === "") continue;
      while (i >= (cases[k] as Case).inputs.length) {
        k++;
        i = 0;
      }
      const space = line.indexOf(" ");
      if (line.slice(0, space) !== "0") throw new Error(`table ${k} input ${(cases[k] as Case).inputs[i]}: status ${line.slice(0, space)}`);
      (results[k] as number[]).push(Number(line.slice(space + 1)));
      i++;
    }
    return results;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
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
  const random = fc.sample(fc.double({ min: 0, max: 1, noNaN: true, maxExcluded: true }), { seed: 1307, numRuns: 1 })[0] ?? 0.5;
  let state = Math.floor(random * 2 ** 31) | 1;
  const next = (): number => {
    state = (Math.imul(state, 1103515245) + 12345) >>> 0;
    return state / 2 ** 32;
  };
  for (const kind of ["emfToTemperature", "temperatureToEmf"] as const) {
    for (const placement of ["adaptive", "uniform"] as const) {
      for (const input of numberTypes) {
        for (const output of numberTypes) {
          if (placement === "uniform" && isFloat(input)) continue;
          if (!isFloat(output) && isFloat(input)) continue;
          const table = buildFirmwareTable(options(kind, placement, input, output));
          cases.push({ name: `${kind} ${placement} ${input}→${output}`, table, inputs: inputsOf(table, next) });
        }
      }
    }
  }
  const totals = { tables: cases.length, points: 0, worstRatio: 0, worstRatio40: 0, decimalPoints: 0 };

  it("builds 104 tables, each with a bound within its request", () => {
    expect(cases.length).toBe(104);
    for (const c of cases) expect(c.table.errorBound.totalOutputUnits, c.name).toBeLessThanOrEqual(c.table.requestedMaxErrorOutputUnits);
  });

  it("default flags: bit-identical to the library, within the bound against float64 and 40-digit references", () => {
    const results = compileAndRun(cases, []);
    cases.forEach((c, k) => {
      const ys = results[k] as number[];
      expect(ys.length, c.name).toBe(c.inputs.length);
      const bound = c.table.errorBound.totalOutputUnits;
      const reference = c.table.errorBound.referenceOutputUnits;
      const errors: [number, number][] = [];
      let different = 0;
      c.inputs.forEach((x, i) => {
        const y = ys[i] as number;
        if (y !== interpolateFirmwareTable(c.table, x)) different++;
        errors.push([Math.abs(y / c.table.output.scale - exactOutput(c.table, x)), i]);
      });
      expect(different, c.name).toBe(0);
      errors.sort((a, b) => b[0] - a[0]);
      const worst = (errors[0] as [number, number])[0];
      // The float64 reference is itself within `reference` of the exact value.
      expect(worst + reference, c.name).toBeLessThanOrEqual(bound);
      totals.points += c.inputs.length;
      totals.worstRatio = Math.max(totals.worstRatio, worst / bound);
      const picks = [...errors.slice(0, 8).map((e) => e[1]), ...Array.from({ length: 8 }, () => Math.floor(next() * c.inputs.length))];
      for (const i of picks) {
        const x = c.inputs[i] as number;
        const e40 = new D(ys[i] as number).div(c.table.output.scale).minus(exact40(c.table, x)).abs().toNumber();
        expect(e40, `${c.name} at ${x}`).toBeLessThanOrEqual(bound);
        totals.worstRatio40 = Math.max(totals.worstRatio40, e40 / bound);
        totals.decimalPoints++;
      }
    });
    console.log(`cHeaderCombinations: ${totals.tables} tables, ${totals.points} inputs compiled and checked, ${totals.decimalPoints} at 40 digits; worst error/bound ${totals.worstRatio.toFixed(4)} (float64 reference), ${totals.worstRatio40.toFixed(4)} (40 digits)`);
  }, 240_000);

  const floatCases = cases.filter((c) => isFloat(c.table.output.numberType));
  const variants: { name: string; flags: string[]; run: boolean }[] = [
    { name: "fused multiply-add (-ffp-contract=fast -mfma)", flags: ["-ffp-contract=fast", "-mfma"], run: hasFma && arch() === "x64" },
    // The build machine's own instruction set with contraction on (what a firmware build with -march=native does).
    { name: "native instruction set (-march=native -ffp-contract=fast)", flags: ["-march=native", "-ffp-contract=fast"], run: arch() === "x64" },
    { name: "x87 intermediates (-mfpmath=387)", flags: ["-mfpmath=387"], run: arch() === "x64" },
    // -m32 -mfpmath=387 (a 32-bit x87 target) is not compiled: the CI image has no 32-bit C library (multilib),
    // so gcc -m32 cannot link. -mfpmath=387 on x86-64 gives the same x87 excess precision (FLT_EVAL_METHOD 2).
  ];
  for (const v of variants) {
    it.skipIf(!v.run)(`${v.name}: float outputs stay within the bound`, () => {
      const results = compileAndRun(floatCases, v.flags);
      let changed = 0;
      floatCases.forEach((c, k) => {
        const ys = results[k] as number[];
        const bound = c.table.errorBound.totalOutputUnits - c.table.errorBound.referenceOutputUnits;
        let worst = 0;
        c.inputs.forEach((x, i) => {
          const y = ys[i] as number;
          if (y !== interpolateFirmwareTable(c.table, x)) changed++;
          worst = Math.max(worst, Math.abs(y / c.table.output.scale - exactOutput(c.table, x)));
        });
        expect(worst, c.name).toBeLessThanOrEqual(bound);
      });
      console.log(`cHeaderCombinations ${v.name}: ${floatCases.length} tables, ${changed} lookups differ in the last bits from the library`);
    }, 240_000);
  }
});
