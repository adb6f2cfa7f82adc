// Firmware tables: generation time of a 0.01 °C adaptive type K EMF->temperature table over -200..1372 °C,
// and interpolation speed of that table in TypeScript beside the library's exact inverse, in one run.
import { buildFirmwareTable, interpolateFirmwareTable, temperatureFromEmfArray, type BuildFirmwareTableOptions } from "../src/index.js";
import { formatRate, measure, type BenchCase } from "./lib.js";

const N = 4096;

export async function runFirmwareBench(): Promise<string[]> {
  const options: BuildFirmwareTableOptions = {
    type: "K",
    kind: "emfToTemperature",
    minC: -200,
    maxC: 1372,
    maxErrorOutputUnits: 0.01,
  };
  const table = buildFirmwareTable(options);
  const [generation] = await measure([{ name: "buildFirmwareTable (K, 0.01 °C)", itemsPerCall: 1, fn: () => void buildFirmwareTable(options) }], 1500, 2);
  if (generation === undefined) throw new Error("missing figure");

  // Inputs: whole µV spread over the table's range.
  const emfMicrovolts = new Int32Array(N);
  const emfMillivolts = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    const x = Math.round(table.input.min + ((table.input.max - table.input.min) * (i + 0.5)) / N);
    emfMicrovolts[i] = x;
    emfMillivolts[i] = x / 1000;
  }
  const xs = Int32Array.from(table.inputs);
  const ys = Int32Array.from(table.outputs);
  const last = xs.length - 1;
  const out = new Float64Array(N);
  // A plain interpolation loop, as firmware would write it: binary search, integer interpolation rounded to nearest.
  const plainLoop = (): void => {
    for (let i = 0; i < N; i++) {
      const x = emfMicrovolts[i] as number;
      let lo = 0;
      let hi = last;
      while (hi - lo > 1) {
        const mid = (lo + hi) >>> 1;
        if (x < (xs[mid] as number)) hi = mid;
        else lo = mid;
      }
      const x0 = xs[lo] as number;
      const dx = (xs[hi] as number) - x0;
      const num = ((ys[hi] as number) - (ys[lo] as number)) * (x - x0);
      const q = num >= 0 ? Math.floor((num + (dx >> 1)) / dx) : -Math.floor((-num + (dx >> 1)) / dx);
      out[i] = ((ys[lo] as number) + q) / 1000;
    }
  };
  const cases: BenchCase[] = [
    { name: "table interpolation, plain TS loop", itemsPerCall: N, fn: plainLoop },
    {
      name: "interpolateFirmwareTable (checked)",
      itemsPerCall: N,
      fn: () => {
        for (let i = 0; i < N; i++) out[i] = interpolateFirmwareTable(table, emfMicrovolts[i] as number);
      },
    },
    { name: "temperatureFromEmfArray (exact)", itemsPerCall: N, fn: () => void temperatureFromEmfArray("K", emfMillivolts, out) },
  ];
  const [plain, checked, exact] = await measure(cases);
  if (!plain || !checked || !exact) throw new Error("missing figures");
  return [
    `Firmware table, type K EMF->temperature, -200..1372 °C, requested 0.01 °C, int32 µV -> int32 milli-degrees`,
    `generation: ${generation.msPerCall.toFixed(1)} ms per table, ${table.inputs.length} breakpoints; ` +
      `bound ${table.errorBound.totalOutputUnits.toFixed(5)} °C (interpolation ${table.errorBound.interpolationOutputUnits.toFixed(5)} + rounding ${table.errorBound.roundingOutputUnits}), ` +
      `largest error found ${table.maxErrorFound.errorOutputUnits.toFixed(5)} °C at ${table.maxErrorFound.atTemperatureC.toFixed(2)} °C over ${table.maxErrorFound.pointsChecked} inputs`,
    `${plain.name.padEnd(40)} ${formatRate(plain.itemsPerSecond)}`,
    `${checked.name.padEnd(40)} ${formatRate(checked.itemsPerSecond)}`,
    `${exact.name.padEnd(40)} ${formatRate(exact.itemsPerSecond)}`,
    `ratio: plain table loop is ${(plain.itemsPerSecond / exact.itemsPerSecond).toFixed(2)}x the exact inverse's throughput; ` +
      `checked interpolateFirmwareTable ${(checked.itemsPerSecond / exact.itemsPerSecond).toFixed(2)}x`,
  ];
}

if (import.meta.url === `file://${process.argv[1]}`) {
  for (const line of await runFirmwareBench()) console.log(line);
}
