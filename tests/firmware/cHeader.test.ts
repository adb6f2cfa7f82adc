/**
 * The emitted C header, compiled with the machine's gcc (-O2 -Wall -Werror -std=c99) and run over dense
 * inputs, agrees with the library's exact conversion within the reported bound, the bound is not loose by
 * more than 2x, and the compiled arithmetic equals the TypeScript evaluation bit for bit.
 * The exact values come from the library's ITS-90 conversion (checked elsewhere against NIST Monograph 175
 * tables); the bound is the linear interpolation error theorem (from memory) plus rounding.
 */
import { describe, expect, it } from "vitest";
import {
  buildFirmwareTable,
  formatFirmwareTableC,
  interpolateFirmwareTable,
  type BuildFirmwareTableOptions,
} from "../../src/index.js";
import { denseInputs, exactOutput, hasGcc, runCompiled } from "./helpers.js";

const cases: { name: string; prefix: string; options: BuildFirmwareTableOptions }[] = [
  {
    name: "type K EMF (int32 µV) to milli-degrees, adaptive 0.05 °C over -200..1372 °C",
    prefix: "kiln_k",
    options: { type: "K", kind: "emfToTemperature", minC: -200, maxC: 1372, maxErrorOutputUnits: 0.05 },
  },
  {
    name: "type S EMF to milli-degrees, uniform (shift indexing) 0.2 °C over 0..1768 °C",
    prefix: "furnace_s",
    options: { type: "S", kind: "emfToTemperature", minC: 0, maxC: 1768, maxErrorOutputUnits: 0.2, placement: "uniform" },
  },
  {
    name: "type K ADC code (16 bit, fixed cold junction 25 °C) to centi-degrees, uniform 0.5 °C",
    prefix: "oven_adc",
    options: {
      type: "K",
      kind: "adcCodeToTemperature",
      minC: 0,
      maxC: 1000,
      maxErrorOutputUnits: 0.5,
      placement: "uniform",
      chain: { gain: 50, offsetMillivolts: 100, referenceVolts: 2.5, bits: 16, coldJunctionC: 25 },
      output: { numberType: "int32", scale: 100 },
    },
  },
  {
    name: "type J temperature (uint16 centi-degrees) to int16 µV, adaptive 2 µV (alarm thresholds)",
    prefix: "alarm_j",
    options: {
      type: "J",
      kind: "temperatureToEmf",
      minC: 0,
      maxC: 500,
      maxErrorOutputUnits: 2,
      input: { numberType: "uint16", scale: 100 },
      output: { numberType: "int16", scale: 1 },
    },
  },
  {
    name: "type T EMF (float) to temperature (float), adaptive 0.02 °C",
    prefix: "enclosure_t",
    options: {
      type: "T",
      kind: "emfToTemperature",
      minC: -200,
      maxC: 400,
      maxErrorOutputUnits: 0.02,
      input: { numberType: "float32" },
      output: { numberType: "float32" },
    },
  },
  {
    name: "type K cold-junction sensor (int32 centi-degrees) to ADC codes (double), 24-bit chain",
    prefix: "cj_codes",
    options: {
      type: "K",
      kind: "coldJunctionToAdcCode",
      minC: -40,
      maxC: 85,
      maxErrorOutputUnits: 0.5,
      chain: { gain: 100, referenceVolts: 2.5, bits: 24 },
      output: { numberType: "float64" },
    },
  },
  {
    name: "type N temperature to 20-bit ADC code thresholds (int32), crossing the 0 °C seam",
    prefix: "trip_n",
    options: {
      type: "N",
      kind: "temperatureToAdcCode",
      minC: -100,
      maxC: 1200,
      maxErrorOutputUnits: 3,
      chain: { gain: 40, offsetMillivolts: 200, referenceVolts: 3, bits: 20, coldJunctionC: 20 },
    },
  },
];

describe.skipIf(!hasGcc())("C header compiled with gcc", () => {
  for (const { name, prefix, options } of cases) {
    it(name, () => {
      const table = buildFirmwareTable(options);
      const header = formatFirmwareTableC(table, { prefix });
      const inputs = denseInputs(table);
      const below = table.input.numberType.startsWith("float") ? table.input.min - Math.abs(table.input.min) * 1e-3 - 1 : table.input.min - 1;
      const above = table.input.numberType.startsWith("float") ? table.input.max + Math.abs(table.input.max) * 1e-3 + 1 : table.input.max + 1;
      const probes = [...inputs];
      // Out-of-range probes only where the input type can hold them (uint16 cannot hold min − 1 = −1).
      const lowProbe = !(table.input.numberType.startsWith("uint") && below < 0);
      if (lowProbe) probes.push(below);
      probes.push(above);
      const { status, outputs } = runCompiled(header, prefix, table, probes);
      let worst = 0;
      let notOk = 0;
      let differentFromTs = 0;
      for (let i = 0; i < inputs.length; i++) {
        const x = inputs[i] as number;
        if (status[i] !== 0) notOk++;
        const y = outputs[i] as number;
        // Same arithmetic as the TypeScript evaluation, bit for bit.
        if (y !== interpolateFirmwareTable(table, x)) differentFromTs++;
        worst = Math.max(worst, Math.abs(y / table.output.scale - exactOutput(table, x)));
      }
      expect(notOk).toBe(0);
      expect(differentFromTs).toBe(0);
      const bound = table.errorBound.totalOutputUnits;
      expect(worst).toBeLessThanOrEqual(bound);
      expect(bound).toBeLessThanOrEqual(options.maxErrorOutputUnits);
      // Not loose by more than 2x.
      expect(bound).toBeLessThanOrEqual(2 * worst);
      if (lowProbe) expect(status[inputs.length]).toBe(-1);
      expect(status[status.length - 1]).toBe(1);
    });
  }
});
