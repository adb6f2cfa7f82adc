import { defineConfig } from "tsup";
import { finishProgramBundle } from "./scripts/finishProgramBundle.js";

export default defineConfig([
  {
    entry: {
      index: "src/index.ts",
      exact: "src/exact.ts",
      design: "src/design/index.ts",
      report: "src/report/index.ts",
      // The WebAssembly bulk kernel (bytes embedded as base64): its own entry, so no other bundle carries it.
      bulk: "src/bulk/index.ts",
      // Worker entry of propagateParallel: must sit beside the chunk that starts it (dist/monteCarloWorker.js).
      monteCarloWorker: "src/uncertainty/_monteCarloWorker.ts",
      // Model factory of designTripParallel's workers: must sit beside the chunk that names it (dist/tripModel.js).
      tripModel: "src/trip/_tripModelFactory.ts",
      // Model factory of evaluateChainParallel's workers (dist/chainModel.js), likewise.
      chainModel: "src/chain/_chainModelFactory.ts",
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
    // The sweep's worker entry sits beside cli.js (dist/sweepWorker.js), one level above the command chunks; the
    // CLI's own copies of the Monte Carlo worker entry and the trip model factory sit beside its chunks (dist/cli/),
    // where `check`'s designTripParallel looks for them.
    entry: {
      cli: "src/cli/main.ts",
      sweepWorker: "src/cli/_sweepWorker.ts",
      "cli/monteCarloWorker": "src/uncertainty/_monteCarloWorker.ts",
      "cli/tripModel": "src/trip/_tripModelFactory.ts",
      "cli/chainModel": "src/chain/_chainModelFactory.ts",
    },
    format: ["esm"],
    banner: { js: "#!/usr/bin/env node" },
    sourcemap: false,
    clean: false,
    // Each command's code (and the libraries only it uses) in its own chunk, loaded when that command runs, so
    // `hotjunction emf K 500` does not load the schema library, the trip or fault code or the chart code.
    splitting: true,
    esbuildOptions(options) {
      options.chunkNames = "cli/[name]-[hash]";
    },
    // The commander program is not in this build: `_programLoader.ts` runs dist/cli/program.cjs (the next entry).
    define: { __HOTJUNCTION_PROGRAM_BUNDLE__: "true" },
    target: "node20",
    platform: "node",
  },
  {
    // The CLI's program bundle (src/cli/_programBundle.ts): the commander program, every command and the libraries
    // they use in one CommonJS file, so that the CLI can compile it through a V8 code cache (Node 20 has none for
    // modules). Each command's code still starts only when that command runs (every import() becomes a lazy module
    // start). import.meta.url is the bundle's own URL, so worker entries are found beside it in dist/cli/.
    entry: { "cli/program": "src/cli/_programBundle.ts" },
    format: ["cjs"],
    outExtension: () => ({ js: ".cjs" }),
    sourcemap: false,
    clean: false,
    splitting: false,
    noExternal: [/./],
    define: { "import.meta.url": "__hotjunctionBundleUrl" },
    banner: { js: 'var __hotjunctionBundleUrl = require("node:url").pathToFileURL(__filename).href;' },
    // Every import() as a lazy require: the bundle runs as a node:vm script, which has no module loader of its own.
    esbuildOptions(options) {
      options.supported = { ...options.supported, "dynamic-import": false };
    },
    target: "node20",
    platform: "node",
    onSuccess: finishProgramBundle,
  },
]);
