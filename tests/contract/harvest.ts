/**
 * Valid example arguments for every export, harvested from the documented examples.
 *
 * Every ```ts fence inside a JSDoc `@example` block under `src/` and every runnable ```ts fence of
 * `docs/guides/*.md` is run with its `hotjunction…` imports pointed at a recording copy of the entry: each
 * function export is wrapped, and every call an example makes is kept with its arguments. Those calls are
 * the valid argument sets the contract test perturbs one leaf at a time. A new export with an example is
 * covered without editing anything here; the entries themselves come from `tests/package/apiSurface.json`.
 */
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join, relative } from "node:path";
import { threadId } from "node:worker_threads";

export const projectDir = join(import.meta.dirname, "..", "..");
const srcDir = join(projectDir, "src");

/** Package entries and their source modules (package.json `exports`). */
export const entrySources: Readonly<Record<string, string>> = {
  hotjunction: "src/index.ts",
  "hotjunction/exact": "src/exact.ts",
  "hotjunction/design": "src/design/index.ts",
  "hotjunction/report": "src/report/index.ts",
};

/** One call an example made through the recording entry. */
export interface RecordedCall {
  readonly entry: string;
  readonly name: string;
  readonly args: readonly unknown[];
}

interface Example {
  readonly location: string;
  readonly code: string;
}

function listFiles(dir: string, extension: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { withFileTypes: true })
    .flatMap((entry) => {
      const path = join(dir, entry.name);
      if (entry.isDirectory()) return listFiles(path, extension);
      return entry.name.endsWith(extension) ? [path] : [];
    })
    .sort();
}

function examplesInSource(file: string): Example[] {
  const text = readFileSync(file, "utf8");
  const examples: Example[] = [];
  for (const comment of text.matchAll(/\/\*\*[\s\S]*?\*\//g)) {
    const lines = comment[0].split("\n").map((line) => line.replace(/^\s*\/?\*+\/?\s?/, "").replace(/\*\/\s*$/, ""));
    let inExample = false;
    let fence: string[] | undefined;
    for (const line of lines) {
      if (/^@\w+/.test(line.trim())) inExample = line.trim().startsWith("@example");
      if (!inExample) continue;
      if (fence === undefined && /^```ts\s*$/.test(line.trim())) fence = [];
      else if (fence !== undefined && line.trim() === "```") {
        examples.push({ location: relative(projectDir, file), code: fence.join("\n") });
        fence = undefined;
      } else if (fence !== undefined) fence.push(line);
    }
  }
  return examples;
}

function examplesInMarkdown(file: string): Example[] {
  const examples: Example[] = [];
  let fence: string[] | undefined;
  let runnable = false;
  for (const line of readFileSync(file, "utf8").split("\n")) {
    if (fence === undefined && /^```/.test(line)) {
      fence = [];
      runnable = /^```ts\s*$/.test(line);
    } else if (fence !== undefined && /^```\s*$/.test(line)) {
      if (runnable) examples.push({ location: relative(projectDir, file), code: fence.join("\n") });
      fence = undefined;
    } else if (fence !== undefined) fence.push(line);
  }
  return examples;
}

/** True for a class constructor (wrapped, it would lose `new` and `instanceof`). */
export function isClass(value: unknown): boolean {
  return typeof value === "function" && /^class\b/.test(Function.prototype.toString.call(value));
}

/** Runs every documented example through recording entries; returns the calls they made. */
export async function harvestExampleCalls(entries: Record<string, Record<string, unknown>>): Promise<RecordedCall[]> {
  // one folder per process and thread: the contract's workers harvest side by side in one process
  const scratch = join(projectDir, ".tmp", `contract-${process.pid}-${threadId}`);
  mkdirSync(scratch, { recursive: true });
  const calls: RecordedCall[] = [];
  const globalSlot = globalThis as unknown as { __hotjunctionContract?: unknown };
  let depth = 0;
  globalSlot.__hotjunctionContract = (entry: string, name: string, fn: (...args: unknown[]) => unknown) =>
    (...args: unknown[]) => {
      // only the outermost call of an example is a valid argument set written by a person
      if (depth === 0) calls.push({ entry, name, args });
      depth++;
      try {
        return fn(...args);
      } finally {
        depth--;
      }
    };
  try {
    const wrapperOf: Record<string, string> = {};
    for (const [entry, source] of Object.entries(entrySources)) {
      const real = JSON.stringify(join(projectDir, source).replace(/\.ts$/, ".js"));
      const lines = [`import * as real from ${real};`, `export * from ${real};`, "const wrap = (globalThis as any).__hotjunctionContract;"];
      for (const [name, value] of Object.entries(entries[entry] ?? {})) {
        if (typeof value === "function" && !isClass(value)) lines.push(`export const ${name} = wrap(${JSON.stringify(entry)}, ${JSON.stringify(name)}, real.${name});`);
      }
      const file = join(scratch, `entry-${entry.replace(/\W/g, "_")}.ts`);
      writeFileSync(file, `${lines.join("\n")}\n`);
      wrapperOf[entry] = file;
    }
    const examples = [
      ...listFiles(srcDir, ".ts").flatMap(examplesInSource),
      ...listFiles(join(projectDir, "docs", "guides"), ".md").flatMap(examplesInMarkdown),
    ];
    let index = 0;
    for (const example of examples) {
      const code = example.code.replace(/(from\s+|import\s*\(\s*)"(hotjunction(?:\/[\w-]+)?)"/g, (whole, head: string, specifier: string) =>
        wrapperOf[specifier] === undefined ? whole : `${head}${JSON.stringify(wrapperOf[specifier])}`,
      );
      const file = join(scratch, `example-${index++}.ts`);
      writeFileSync(file, `const console = { log: (..._: unknown[]) => undefined, table: (..._: unknown[]) => undefined };\n${code}\nexport {};\n`);
      try {
        await import(/* @vite-ignore */ file);
      } catch {
        // a broken example is tests/package/docExamples.test.ts's finding; the calls it made are still kept
      }
    }
  } finally {
    delete globalSlot.__hotjunctionContract;
    rmSync(scratch, { recursive: true, force: true });
  }
  return calls;
}
