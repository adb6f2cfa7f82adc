// A Monte Carlo worker pool that counts the chunks of trials it is asked for, so a test can see that a run left
// the calling thread (tests/trip/designTripParallel.test.ts, tests/chain/evaluateChainParallel.test.ts).
import { createMonteCarloPool, type MonteCarloPool } from "../src/uncertainty/propagateParallel.js";

/** Runs `body` with a 2-worker pool, closes it, and returns how many chunks the workers were asked for. */
export async function chunksRunOnPool(body: (pool: MonteCarloPool) => Promise<void>): Promise<number> {
  const pool = await createMonteCarloPool({ workers: 2 });
  if (pool === undefined) throw new Error("no worker pool");
  const counted = pool as unknown as { run: (...a: unknown[]) => Promise<Float64Array> };
  const run = counted.run.bind(pool);
  let chunks = 0;
  counted.run = (...a: unknown[]) => {
    chunks++;
    return run(...a);
  };
  try {
    await body(pool);
  } finally {
    await pool.close();
  }
  return chunks;
}
