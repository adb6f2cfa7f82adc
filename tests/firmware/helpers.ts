/**
 * Test helpers for firmware tables: the exact conversion from the library's public API (independent of the
 * table code), dense inputs, and compiling an emitted C header with the machine's gcc.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { emfFromTemperature, temperatureFromEmf, type FirmwareTable } from "../../src/index.js";

/** Exact output (natural units) of the conversion a table approximates, at a stored input. */
export function exactOutput(table: FirmwareTable, inputStored: number): number {
  const x = inputStored / table.input.scale;
  const type = table.thermocoupleType;
  const chain = table.chain;
  const lsbMillivolts = chain === null ? 0 : (1000 * chain.referenceVolts) / 2 ** chain.bits;
  const cj = chain?.coldJunctionC ?? null;
  switch (table.kind) {
    case "emfToTemperature":
      return temperatureFromEmf(type, x / 1000);
    case "adcCodeToTemperature": {
      if (chain === null) throw new Error("chain expected");
      const measuredMillivolts = (x * lsbMillivolts - chain.offsetMillivolts) / chain.gain;
      return cj === null
        ? temperatureFromEmf(type, measuredMillivolts)
        : temperatureFromEmf(type, measuredMillivolts, { coldJunctionC: cj });
    }
    case "temperatureToEmf":
    case "coldJunctionToEmf":
      return emfFromTemperature(type, x) * 1000;
    case "temperatureToAdcCode": {
      if (chain === null) throw new Error("chain expected");
      const e = cj === null ? emfFromTemperature(type, x) : emfFromTemperature(type, x, { coldJunctionC: cj });
      return (chain.gain * e + chain.offsetMillivolts) / lsbMillivolts;
    }
    case "coldJunctionToAdcCode":
      if (chain === null) throw new Error("chain expected");
      return (chain.gain * emfFromTemperature(type, x)) / lsbMillivolts;
  }
}

/** Every integer input (integer tables, thinned above `limit`), or 64 points per segment (float inputs). */
export function denseInputs(table: FirmwareTable, limit = 200_000): number[] {
  const out: number[] = [];
  const { min, max } = table.input;
  const integer = !table.input.numberType.startsWith("float");
  if (integer) {
    const step = Math.max(1, Math.ceil((max - min + 1) / limit));
    for (let x = min; x <= max; x += step) out.push(x);
    if (out[out.length - 1] !== max) out.push(max);
    return out;
  }
  const round = table.input.numberType === "float32" ? Math.fround : (v: number): number => v;
  for (let i = 0; i + 1 < table.inputs.length; i++) {
    const a = table.inputs[i] as number;
    const b = Math.min(table.inputs[i + 1] as number, max);
    for (let k = 0; k < 64; k++) {
      const x = round(a + ((b - a) * (k + 0.5)) / 64);
      if (x >= min && x <= max) out.push(x);
    }
  }
  out.push(min, max);
  return out;
}

const C_TYPE: Record<string, string> = {
  int16: "int16_t",
  uint16: "uint16_t",
  int32: "int32_t",
  uint32: "uint32_t",
  float32: "float",
  float64: "double",
};

/** Whether gcc runs on this machine. */
export function hasGcc(): boolean {
  return spawnSync("gcc", ["--version"]).status === 0;
}

/**
 * Compiles `header` with a driver (gcc -O2 -Wall -Werror -std=c99), feeds it `inputs` (stored units) and
 * returns, per input, the routine's status and output (stored units).
 */
export function runCompiled(
  header: string,
  prefix: string,
  table: FirmwareTable,
  inputs: readonly number[],
): { status: number[]; outputs: number[] } {
  const dir = mkdtempSync(join(tmpdir(), "hj-firmware-"));
  try {
    const inType = C_TYPE[table.input.numberType] as string;
    const outType = C_TYPE[table.output.numberType] as string;
    writeFileSync(join(dir, `${prefix}.h`), header);
    writeFileSync(
      join(dir, "driver.c"),
      [
        "#include <stdio.h>",
        `#include "${prefix}.h"`,
        "int main(void)",
        "{",
        "    double v;",
        "    while (scanf(\"%lf\", &v) == 1) {",
        `        ${outType} y = 0;`,
        `        const int s = ${prefix}_lookup((${inType})v, &y);`,
        "        printf(\"%d %.17g\\n\", s, (double)y);",
        "    }",
        "    return 0;",
        "}",
        "",
      ].join("\n"),
    );
    execFileSync("gcc", ["-O2", "-Wall", "-Werror", "-std=c99", "-o", join(dir, "driver"), join(dir, "driver.c")], {
      stdio: "pipe",
    });
    const run = spawnSync(join(dir, "driver"), [], {
      input: inputs.map((x) => String(x)).join("\n") + "\n",
      maxBuffer: 1 << 28,
    });
    if (run.status !== 0) throw new Error(`driver failed: ${run.stderr.toString()}`);
    const status: number[] = [];
    const outputs: number[] = [];
    for (const line of run.stdout.toString().trim().split("\n")) {
      const [s, y] = line.split(" ");
      status.push(Number(s));
      outputs.push(Number(y));
    }
    return { status, outputs };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
