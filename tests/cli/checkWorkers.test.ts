// `check --workers N`: the report's JSON is byte for byte the same for any worker count (the Monte Carlo draws
// depend on the seed and the trial index only, JCGM 101 7.9's reproducibility through a printed seed), for a
// comparator design (designTripParallel) and an ADC design (evaluateChainParallel), run above the threshold
// where workers start (262,144 trials); a worker count outside 1–64 is a one-line usage error.
import { describe, expect, it } from "vitest";
import { oneLine, run } from "./helpers.js";

describe("check --workers", () => {
  it("the same JSON for 1 and 2 workers at 300,000 trials (reflow oven, heated enclosure ADC)", async () => {
    for (const design of ["examples/reflow-oven-trip.json", "examples/heated-enclosure-adc.json"]) {
      const one = await run(["check", design, "--trials", "300000", "--workers", "1", "--json"]);
      const two = await run(["check", design, "--trials", "300000", "--workers", "2", "--json"]);
      expect(one.code, one.stderr).toBe(0);
      expect(two.code, two.stderr).toBe(0);
      expect(two.stdout).toBe(one.stdout);
      expect((JSON.parse(one.stdout) as { setpoints: unknown[] }).setpoints.length).toBeGreaterThan(0);
    }
  }, 180_000);

  it("--workers 0 is a usage error (exit 2) naming the option and its range", async () => {
    const out = await run(["check", "examples/reflow-oven-trip.json", "--workers", "0"]);
    expect(out.code).toBe(2);
    expect(oneLine(out.stderr)).toContain("--workers");
    expect(out.stderr).toContain("1 to 64");
  });
});
