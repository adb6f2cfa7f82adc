// Every property test runs from a fixed seed, so a CI run is reproducible: a test that names its own seed keeps
// it; the others take this one (fast-check's global parameters). A property that fails prints its seed and
// counterexample; keep such a case as a named regression test.
import fc from "fast-check";

fc.configureGlobal({ seed: 20261203 });
