// ITS-90 conversion speed beside bare hand-written Horner loops over the same coefficients, in one run.
// Targets (issue): bulk forward ≤ 1.3x a bare loop, scalar forward ≤ 2x; bulk exact inverse ≤ 2x a bare loop of
// the published approximate inverse, scalar exact inverse ≤ 3x, while ≥ 10,000x more accurate.
import {
  approximateInverseRanges,
  emfFromTemperature,
  emfFromTemperatureArray,
  temperatureFromEmf,
  temperatureFromEmfArray,
  typeK,
} from "../src/index.js";
import { measure, ratioLine, type BenchCase } from "./lib.js";

const N = 4096;

export async function runIts90Bench(): Promise<string[]> {
  // Type K, 0 to 1372 °C (upper sub-range with its exponential term), the common high-temperature case.
  const temps = new Float64Array(N);
  for (let i = 0; i < N; i++) temps[i] = (1372 * (i + 0.5)) / N;
  const emfs = emfFromTemperatureArray("K", temps);
  const out = new Float64Array(N);

  const upper = typeK.forward[1];
  if (upper === undefined || typeK.exponential === undefined) throw new Error("type K data missing");
  const c = Float64Array.from(upper.coefficients);
  const a0 = Number(typeK.exponential.a0);
  const a1 = Number(typeK.exponential.a1);
  const a2 = Number(typeK.exponential.a2);
  const bareForward = (t: number): number => {
    let acc = 0;
    for (let k = c.length - 1; k >= 0; k--) acc = acc * t + (c[k] as number);
    const d = t - a2;
    return acc + a0 * Math.exp(a1 * d * d);
  };
  const published = approximateInverseRanges("K").filter((r) => r.minC >= 0);
  const [lowRange, highRange] = published.map((r) => Float64Array.from(r.coefficients));
  const split = published[0]?.maxEmfMillivolts ?? 20.644;
  if (lowRange === undefined || highRange === undefined) throw new Error("published inverse missing");
  const bareInverse = (e: number): number => {
    const d = e < split ? lowRange : highRange;
    let acc = 0;
    for (let k = d.length - 1; k >= 0; k--) acc = acc * e + (d[k] as number);
    return acc;
  };

  let sink = 0;
  const cases: BenchCase[] = [
    { name: "bare Horner loop (forward)", itemsPerCall: N, fn: () => { for (let i = 0; i < N; i++) out[i] = bareForward(temps[i] as number); } },
    { name: "emfFromTemperatureArray (bulk)", itemsPerCall: N, fn: () => { emfFromTemperatureArray("K", temps, out); } },
    { name: "emfFromTemperature (scalar)", itemsPerCall: N, fn: () => { let s = 0; for (let i = 0; i < N; i++) s += emfFromTemperature("K", temps[i] as number); sink += s; } },
    { name: "bare published-inverse loop", itemsPerCall: N, fn: () => { for (let i = 0; i < N; i++) out[i] = bareInverse(emfs[i] as number); } },
    { name: "temperatureFromEmfArray (bulk exact)", itemsPerCall: N, fn: () => { temperatureFromEmfArray("K", emfs, out); } },
    { name: "temperatureFromEmf (scalar exact)", itemsPerCall: N, fn: () => { let s = 0; for (let i = 0; i < N; i++) s += temperatureFromEmf("K", emfs[i] as number); sink += s; } },
  ];
  const [bareF, bulkF, scalarF, bareI, bulkI, scalarI] = await measure(cases);
  if (!bareF || !bulkF || !scalarF || !bareI || !bulkI || !scalarI) throw new Error("missing figures");

  // Accuracy beside speed: worst round-trip error of each inverse over the same points.
  let worstExact = 0;
  let worstPublished = 0;
  for (let i = 0; i < N; i++) {
    const e = emfs[i] as number;
    worstExact = Math.max(worstExact, Math.abs(temperatureFromEmf("K", e) - (temps[i] as number)));
    worstPublished = Math.max(worstPublished, Math.abs(bareInverse(e) - (temps[i] as number)));
  }
  const lines = [
    `ITS-90 type K, 0..1372 °C, ${N} points per call (sink ${sink > 0 ? "ok" : "?"})`,
    ratioLine(bulkF, bareF, 1.3),
    ratioLine(scalarF, bareF, 2),
    ratioLine(bulkI, bareI, 2),
    ratioLine(scalarI, bareI, 3),
    `accuracy: exact inverse worst round trip ${worstExact.toExponential(2)} °C; published inverse ${worstPublished.toExponential(2)} °C -> ${(worstPublished / worstExact).toExponential(2)}x closer`,
  ];
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  for (const line of await runIts90Bench()) console.log(line);
}
