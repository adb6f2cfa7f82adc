/**
 * Runs every documented example and compares what it prints with what its comments promise.
 *
 * Examples collected:
 * - every ```ts fence inside the `@example` block of a JSDoc comment in any file under `src/`;
 * - every ```ts fence in `docs/guides/*.md` (a fence written ```ts no-run is shown, not run).
 *
 * How an example runs: imports from "hotjunction" are pointed at `src/index.ts`, and from "hotjunction/<name>"
 * at `src/<name>/index.ts` or `src/<name>.ts`; the code is written to a scratch module under `.tmp/` and imported,
 * so it runs as ESM TypeScript against the sources. All examples are also type-checked together with the
 * project's strict compiler options.
 *
 * The output rule (what `// <expected>` means):
 * 1. Every `console.log(...)` call must end, on the line holding its closing parenthesis, with a `// <expected>`
 *    comment; one checked call per line. Each time the call runs, its output is compared with that comment.
 *    Every such line must run at least once, and each example must have at least one.
 * 2. The printed text is what `console.log` prints: `util.format(...args)` (strings without quotes, numbers in
 *    shortest round-trip form, objects and arrays as `util.inspect` shows them, e.g. `[ 1.6, 4.4 ]`).
 * 3. The expected comment is split into tokens at white space, where a double-quoted JSON string counts as one
 *    token (it may contain spaces). A token that is a whole double-quoted string stands for its content without
 *    the quotes, so `// "20.644"` expects `20.644`, and `// "100.00" "1000.00"` expects `100.00 1000.00`.
 *    Tokens are joined with one space.
 * 4. Both sides are compared after collapsing every run of white space (including line breaks of a long
 *    `util.inspect`) to one space and trimming. The comment's text as written (quotes kept) is accepted too, so
 *    output that really contains double quotes can be expected literally.
 */
import { execFileSync } from "node:child_process";
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join, relative } from "node:path";
import { format } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

const projectDir = join(import.meta.dirname, "..", "..");
const srcDir = join(projectDir, "src");
const guidesDir = join(projectDir, "docs", "guides");
const scratchDir = join(projectDir, ".tmp", `doc-examples-${process.pid}`);

interface Example {
  /** Where the example is: `src/its90/convert.ts:36`. */
  readonly location: string;
  readonly code: string;
}

interface CheckedCall {
  readonly line: number;
  readonly expected: string;
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

/** ```ts fences inside `@example` blocks of the JSDoc comments of a source file. */
function examplesInSource(file: string): Example[] {
  const text = readFileSync(file, "utf8");
  const examples: Example[] = [];
  for (const comment of text.matchAll(/\/\*\*[\s\S]*?\*\//g)) {
    const startLine = text.slice(0, comment.index).split("\n").length;
    const lines = comment[0].split("\n").map((line) => line.replace(/^\s*\/?\*+\/?\s?/, "").replace(/\*\/\s*$/, ""));
    let inExample = false;
    let fenceStart = -1;
    let fenceLines: string[] = [];
    lines.forEach((line, index) => {
      if (/^@\w+/.test(line.trim())) inExample = line.trim().startsWith("@example");
      if (!inExample) return;
      if (fenceStart < 0 && /^```ts\s*$/.test(line.trim())) {
        fenceStart = index;
        fenceLines = [];
      } else if (fenceStart >= 0 && line.trim() === "```") {
        examples.push({ location: `${relative(projectDir, file)}:${startLine + fenceStart + 1}`, code: fenceLines.join("\n") });
        fenceStart = -1;
      } else if (fenceStart >= 0) {
        fenceLines.push(line);
      }
    });
  }
  return examples;
}

/** ```ts fences of a Markdown guide (```ts no-run fences are skipped). */
function examplesInMarkdown(file: string): Example[] {
  const lines = readFileSync(file, "utf8").split("\n");
  const examples: Example[] = [];
  let fenceStart = -1;
  let runnable = false;
  let fenceLines: string[] = [];
  lines.forEach((line, index) => {
    if (fenceStart < 0 && /^```/.test(line)) {
      fenceStart = index;
      runnable = /^```ts\s*$/.test(line);
      fenceLines = [];
    } else if (fenceStart >= 0 && /^```\s*$/.test(line)) {
      if (runnable) examples.push({ location: `${relative(projectDir, file)}:${fenceStart + 1}`, code: fenceLines.join("\n") });
      fenceStart = -1;
    } else if (fenceStart >= 0) {
      fenceLines.push(line);
    }
  });
  return examples;
}

/** Module path in `src/` for an import specifier of the package. */
function sourceModuleFor(specifier: string): string {
  if (specifier === "hotjunction") return join(srcDir, "index.js");
  const name = specifier.slice("hotjunction/".length);
  if (existsSync(join(srcDir, name, "index.ts"))) return join(srcDir, name, "index.js");
  if (existsSync(join(srcDir, `${name}.ts`))) return join(srcDir, `${name}.js`);
  throw new Error(`no source module for ${specifier}`);
}

/** Index of the parenthesis closing the one at `open`, skipping strings, templates and comments. */
function closingParen(code: string, open: number): number {
  let depth = 0;
  const templateDepths: number[] = [];
  for (let i = open; i < code.length; i++) {
    const ch = code[i];
    if (ch === '"' || ch === "'") {
      for (i++; i < code.length && code[i] !== ch; i++) if (code[i] === "\\") i++;
    } else if (ch === "`") {
      for (i++; i < code.length && code[i] !== "`"; i++) {
        if (code[i] === "\\") i++;
        else if (code[i] === "$" && code[i + 1] === "{") {
          templateDepths.push(depth);
          depth++;
          i++;
          break;
        }
      }
    } else if (ch === "/" && code[i + 1] === "/") {
      while (i < code.length && code[i] !== "\n") i++;
    } else if (ch === "(" || ch === "{" || ch === "[") {
      depth++;
    } else if (ch === ")" || ch === "}" || ch === "]") {
      depth--;
      if (ch === "}" && templateDepths.length > 0 && templateDepths[templateDepths.length - 1] === depth) {
        templateDepths.pop();
        // back inside the template literal: skip to its end or next substitution
        for (i++; i < code.length && code[i] !== "`"; i++) {
          if (code[i] === "\\") i++;
          else if (code[i] === "$" && code[i + 1] === "{") {
            templateDepths.push(depth);
            depth++;
            i++;
            break;
          }
        }
        continue;
      }
      if (depth === 0) return i;
    }
  }
  return -1;
}

/** Points the example's imports of the package at the sources. */
function rewriteImports(example: Example): string {
  return example.code.replace(/(from\s+|import\s*\(\s*)"(hotjunction(?:\/[\w-]+)?)"/g, (_, head: string, specifier: string) =>
    `${head}${JSON.stringify(sourceModuleFor(specifier))}`,
  );
}

/** Rewrites imports and `console.log(` calls; returns the module text and the checked calls by id. */
function instrument(example: Example): { moduleText: string; calls: CheckedCall[] } {
  let code = rewriteImports(example);
  const calls: CheckedCall[] = [];
  const linesWithCall = new Set<number>();
  let searchFrom = 0;
  for (;;) {
    const at = code.indexOf("console.log(", searchFrom);
    if (at < 0) break;
    const open = at + "console.log".length;
    const close = closingParen(code, open);
    if (close < 0) throw new Error(`${example.location}: unbalanced console.log(...)`);
    const lineEnd = code.indexOf("\n", close) === -1 ? code.length : code.indexOf("\n", close);
    const rest = code.slice(close + 1, lineEnd);
    const line = code.slice(0, close).split("\n").length;
    const exampleLine = `${example.location} (example line ${line})`;
    const comment = /\/\/\s?(.*)$/.exec(rest);
    if (comment === null) throw new Error(`${exampleLine}: console.log without a "// <expected output>" comment`);
    if (linesWithCall.has(line)) throw new Error(`${exampleLine}: two console.log calls end on one line`);
    linesWithCall.add(line);
    const id = calls.length;
    calls.push({ line, expected: (comment[1] ?? "").trim() });
    const replacement = `__hotjunctionExample.log(${id}, `;
    const argumentsEmpty = code.slice(open + 1, close).trim() === "";
    code = code.slice(0, at) + (argumentsEmpty ? `__hotjunctionExample.log(${id}` : replacement) + code.slice(open + 1);
    searchFrom = at + replacement.length;
  }
  const header = `const __hotjunctionExample = (globalThis as unknown as { __hotjunctionExample: { log(id: number, ...args: unknown[]): void } }).__hotjunctionExample;\n`;
  return { moduleText: `${header}${code}\nexport {};\n`, calls };
}

/** The expected comment, read with the output rule of this file's header. */
function expectedText(comment: string): string {
  const tokens = comment.match(/"(?:[^"\\]|\\.)*"|\S+/g) ?? [];
  return tokens
    .map((token) => {
      if (/^"(?:[^"\\]|\\.)*"$/.test(token)) {
        try {
          return JSON.parse(token) as string;
        } catch {
          return token;
        }
      }
      return token;
    })
    .join(" ");
}

function normalizeSpace(text: string): string {
  return text.replace(/\s+/g, " ").trim();
}

const examples: Example[] = [
  ...listFiles(srcDir, ".ts").flatMap(examplesInSource),
  ...listFiles(guidesDir, ".md").flatMap(examplesInMarkdown),
];
const files = new Map<Example, string>();

beforeAll(() => {
  mkdirSync(scratchDir, { recursive: true });
});

afterAll(() => {
  rmSync(scratchDir, { recursive: true, force: true });
});

describe("documented examples", () => {
  it("there are examples to run (in src/ and in the guides)", () => {
    expect(examples.filter((e) => e.location.startsWith("src/")).length).toBeGreaterThan(10);
    expect(examples.filter((e) => e.location.startsWith("docs/")).length).toBeGreaterThan(0);
  });

  it("the output rule reads expected comments as documented", () => {
    expect(expectedText(`"20.644"`)).toBe("20.644");
    expect(expectedText(`-270 1372 "54.886"`)).toBe("-270 1372 54.886");
    expect(expectedText(`"100.00" "1000.00"`)).toBe("100.00 1000.00");
    expect(expectedText(`"type K: temperature 5000 °C" true`)).toBe("type K: temperature 5000 °C true");
    expect(expectedText(`[ 1.6, 4.4 ]`)).toBe("[ 1.6, 4.4 ]");
    expect(normalizeSpace(format("%s", { a: 1, b: "x" }))).toBe("{ a: 1, b: 'x' }");
  });

  it.each(examples.map((example) => [example.location, example] as const))("%s prints what it promises", async (_, example) => {
    const { moduleText, calls } = instrument(example);
    expect(calls.length, "an example shows its result with console.log(...) // <expected>").toBeGreaterThan(0);
    const file = join(scratchDir, `example${files.size}.ts`);
    files.set(example, file);
    writeFileSync(file, moduleText);
    const printed: string[][] = calls.map(() => []);
    (globalThis as unknown as { __hotjunctionExample: unknown }).__hotjunctionExample = {
      log(id: number, ...args: unknown[]) {
        printed[id]?.push(format(...args));
      },
    };
    await import(/* @vite-ignore */ file);
    calls.forEach((call, id) => {
      const outputs = printed[id] ?? [];
      const where = `${example.location}, example line ${call.line}`;
      expect(outputs.length, `${where}: the console.log line never ran`).toBeGreaterThan(0);
      for (const output of outputs) {
        const actual = normalizeSpace(output);
        const accepted = [normalizeSpace(expectedText(call.expected)), normalizeSpace(call.expected)];
        expect(accepted.includes(actual) ? accepted[0] : actual, where).toBe(accepted[0]);
      }
    });
  });

  it("every example type-checks with the project's strict options", () => {
    const all = examples.map((example, index) => {
      const file = join(scratchDir, `typecheck${index}.ts`);
      writeFileSync(file, `${rewriteImports(example)}\nexport {};\n`);
      return [example.location, file] as const;
    });
    writeFileSync(
      join(scratchDir, "tsconfig.json"),
      JSON.stringify({ extends: join(projectDir, "tsconfig.json"), compilerOptions: { noEmit: true }, include: ["typecheck*.ts"] }),
    );
    // tsc reports `typecheckN.ts(line,column)`: the line is the line within the example's fence.
    let output = "";
    try {
      execFileSync(process.execPath, [join(projectDir, "node_modules", "typescript", "bin", "tsc"), "-p", join(scratchDir, "tsconfig.json")], {
        encoding: "utf8",
      });
    } catch (error) {
      output = String((error as { stdout?: string }).stdout ?? error);
      for (const [location, file] of all) output = output.split(relative(projectDir, file)).join(location).split(file).join(location);
    }
    expect(output).toBe("");
  });
});
