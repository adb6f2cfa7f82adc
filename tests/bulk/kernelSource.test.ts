/**
 * The embedded kernel is the assembly of the hand-written source: `src/bulk/_kernelWasm.ts` must be what
 * `scripts/buildWasm.ts` writes from `src/bulk/kernel.wat` with the pinned wabt (regenerate with
 * `npx tsx scripts/buildWasm.ts`). And the module uses no fused multiply-add: it validates without the
 * relaxed-SIMD proposal, the only WebAssembly feature that has one (WebAssembly core spec 2.0 and its SIMD
 * proposal define every float operation as the IEEE 754 operation, correctly rounded).
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { assembleKernel, kernelModuleText } from "../../scripts/buildWasm.js";
import { _kernelWasmBase64 } from "../../src/bulk/_kernelWasm.js";

describe("embedded WebAssembly kernel", () => {
  it("is the assembly of src/bulk/kernel.wat", async () => {
    const committed = readFileSync(fileURLToPath(new URL("../../src/bulk/_kernelWasm.ts", import.meta.url)), "utf8");
    const bytes = await assembleKernel();
    expect(committed).toBe(kernelModuleText(bytes));
    expect(Buffer.from(_kernelWasmBase64, "base64").equals(Buffer.from(bytes))).toBe(true);
  });

  it("names no relaxed-SIMD (fused multiply-add) instruction and validates as plain SIMD", async () => {
    const source = readFileSync(fileURLToPath(new URL("../../src/bulk/kernel.wat", import.meta.url)), "utf8");
    const code = source.replace(/;;.*$/gm, "");
    expect(code).toMatch(/f64x2\.mul/);
    expect(code).not.toMatch(/relaxed|madd|fma|fms/);
    // assembleKernel enables SIMD alone: a relaxed-SIMD instruction would not assemble.
    expect(WebAssembly.validate((await assembleKernel()) as Uint8Array<ArrayBuffer>)).toBe(true);
  });
});
