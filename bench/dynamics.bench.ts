// Response time: one design's whole dynamic check (two thresholds, noise figures) beside a bare loop of the same
// integration (the same exact step matrices, precomputed, stepped the same number of times with a plain crossing
// test and no event location, series or validation), in one run. Target: the check well under a second, and
// reported as a ratio to the bare loop's time (the check also builds the matrices and locates events).
// Run: `npx tsx bench/dynamics.bench.ts`.
import { checkDynamics, type DynamicsModel } from "../src/index.js";
import { _compileDynamics } from "../src/dynamics/_compileDynamics.js";
import { _buildLinearSystem, _propagator } from "../src/dynamics/_linearSystem.js";
import { measure, ratioLine } from "./lib.js";

// An invented demo design: a curing oven with a sheathed probe in a well, an analog comparator trip and a contactor.
const oven: DynamicsModel = {
  runaway: { kind: "heaterPower", heaterWatts: 4500, loadCapacityJoulesPerK: 60_000, lossWattsPerK: 12, ambientC: 25, element: { capacityJoulesPerK: 2500, couplingWattsPerK: 45 } },
  sensor: { kind: "twoLags", wellTimeConstantSeconds: 18, probeTimeConstantSeconds: 4 },
  signalPath: { kind: "analog", inputFilter: { resistanceOhms: 10_000, capacitanceFarads: 4.7e-6 }, amplifierBandwidthHz: 20, comparatorDelaySeconds: 1e-5 },
  outputStages: [{ kind: "relay", releaseTimeSeconds: 0.03 }],
  noise: { sensitivityVoltsPerC: 0.002, white: { kind: "density", densityVoltsPerRootHertz: 40e-6, bandwidthHz: 20 }, mainsPickup: { amplitudeVolts: 0.02, frequencyHz: 50 }, chatterTargetPerHour: 0.01 },
};
const input = {
  model: oven,
  maxNormalOperatingC: 200,
  hazardLimitC: 240,
  bandLowEdgeC: 206,
  thresholds: [
    { name: "slowest unit (band high edge)", tripTemperatureC: 214 },
    { name: "nominal", tripTemperatureC: 210 },
  ],
};

export async function runDynamicsBench(): Promise<string[]> {
  const check = checkDynamics(input);
  // The bare loop: same step and step count per case as the check used, matrices built once outside the timing.
  const compiled = _compileDynamics(oven);
  const system = _buildLinearSystem(compiled, input.maxNormalOperatingC);
  const cases = check.cases.map((c) => {
    const prop = _propagator(system, c.response.stepSeconds);
    const steps = Math.ceil((c.response.series.timeSeconds.at(-1) as number) / c.response.stepSeconds);
    return { prop, steps, thr: c.response.scenario.tripTemperatureC - input.maxNormalOperatingC, off: c.response.heatOffSeconds as number, h: c.response.stepSeconds };
  });
  const n = system.n;
  let x = new Float64Array(n);
  let y = new Float64Array(n);
  let sink = 0;
  const bare = () => {
    for (const c of cases) {
      x.set(system.x0);
      const { phi, gamma } = c.prop;
      let peak = -Infinity;
      for (let k = 0; k < c.steps; k++) {
        const on = k * c.h < c.off ? 1 : 0;
        for (let i = 0; i < n; i++) {
          let s = (gamma[i * 2] as number) * on + (gamma[i * 2 + 1] as number);
          for (let j = 0; j < n; j++) s += (phi[i * n + j] as number) * (x[j] as number);
          y[i] = s;
        }
        [x, y] = [y, x];
        const t = x[system.trueIndex] as number;
        if (t > peak) peak = t;
      }
      sink += peak;
    }
  };
  const [ours, baseline] = await measure(
    [
      { name: "checkDynamics (2 thresholds + noise)", itemsPerCall: 1, fn: () => void checkDynamics(input) },
      { name: "bare loop, same integration", itemsPerCall: 1, fn: bare },
    ],
    400,
    3,
  );
  if (sink === 42) console.log("");
  const o = ours as NonNullable<typeof ours>;
  const b = baseline as NonNullable<typeof baseline>;
  return [
    `dynamic check of one design: ${o.msPerCall.toFixed(2)} ms per check (target: well under 1000 ms); steps per case ${cases.map((c) => c.steps).join(", ")}`,
    ratioLine(o, b, 50),
  ];
}

if (import.meta.url === `file://${process.argv[1]}`) {
  for (const line of await runDynamicsBench()) console.log(line);
}
