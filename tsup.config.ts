import { defineConfig } from "tsup";

export default defineConfig([
  {
    entry: {
      index: "src/index.ts",
      exact: "src/exact.ts",
      design: "src/design/index.ts",
      // Worker entry of propagateParallel: must sit beside the chunk that starts it (dist/monteCarloWorker.js).
      monteCarloWorker: "src/uncertainty/_monteCarloWorker.ts",
    },
    format: ["esm", "cjs"],
    dts: { compilerOptions: { ignoreDeprecations: "6.0" } },
    sourcemap: false,
    clean: true,
    treeshake: true,
    splitting: true,
    target: "es2022",
  },
  {
    entry: { cli: "src/cli/main.ts" },
    format: ["esm"],
    banner: { js: "#!/usr/bin/env node" },
    sourcemap: false,
    clean: false,
    target: "node20",
    platform: "node",
  },
]);
