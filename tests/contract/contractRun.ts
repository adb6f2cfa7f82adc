/**
 * The calls of the typed-error contract and their judgement, run inside a worker thread (contractWorker.ts) so
 * that the test's watchdog (contract.test.ts) can stop a call that never returns or exhausts memory and name it.
 *
 * Where the argument sets come from:
 * - every function export of every entry listed in tests/package/apiSurface.json (read at run time from the
 *   entry modules in src/, so a new export is covered without editing this file);
 * - raw calls: no argument, each hostile value alone, and fast-check generated tuples of hostile values;
 * - the valid calls the documented examples make (tests/contract/harvest.ts), each perturbed one node at a time:
 *   every leaf and every sub-object of every argument (data objects, options, arrays) replaced by each hostile
 *   value, or deleted.
 *
 * Before each call the worker writes the call's export index, serial number and label into shared memory; the
 * watchdog reads them when a call overstays its budget. The order of the calls of one export is fixed by the seed,
 * so a restarted worker resumes after the call that was stopped.
 */
import fc from "fast-check";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { isHotjunctionError } from "../../src/errors.js";
import { harvestExampleCalls, isClass, projectDir, type RecordedCall } from "./harvest.js";

/** Settings of one run (from the environment of the test; see contract.test.ts). */
export interface ContractSettings {
  readonly seed: number;
  /** Generated tuples of hostile values per export. */
  readonly tuplesPerExport: number;
  /** Time budget of the generated and perturbed calls of one export, ms (heavier exports get a seeded subset). */
  readonly budgetPerExportMs: number;
  /** Calls run in each part (generated tuples; perturbations of one example call) whatever the budget. */
  readonly minCallsPerPart: number;
  /** Documented example calls of one export that are perturbed. */
  readonly basesPerExport: number;
  /** A call that returns (or throws) after more than this is a failure ("slow"). */
  readonly slowCallMs: number;
}

/** One contract violation. */
export interface Failure {
  readonly target: string;
  readonly where: string;
  readonly problem: string;
}

/** Layout of the shared progress memory: Int32 slots, then the label's UTF-8 bytes. */
export const progressSlots = { exportIndex: 0, serial: 1, labelLength: 2, count: 4 } as const;
export const progressLabelBytes = 1024;

/** A hostile value with the label a failure shows. */
interface Hostile {
  readonly label: string;
  readonly make: () => unknown;
}

export const hostileValues: readonly Hostile[] = [
  { label: "NaN", make: () => Number.NaN },
  { label: "Infinity", make: () => Number.POSITIVE_INFINITY },
  { label: "-Infinity", make: () => Number.NEGATIVE_INFINITY },
  { label: "-0", make: () => -0 },
  { label: "0", make: () => 0 },
  { label: "-1", make: () => -1 },
  { label: "1e308", make: () => 1e308 },
  { label: "-1e308", make: () => -1e308 },
  { label: "1e-320", make: () => 1e-320 },
  { label: "-1e-320", make: () => -1e-320 },
  { label: "1e15", make: () => 1e15 },
  { label: "0.5", make: () => 0.5 },
  { label: '""', make: () => "" },
  { label: '"25"', make: () => "25" },
  { label: '"K"', make: () => "K" },
  { label: '"__proto__"', make: () => "__proto__" },
  { label: "null", make: () => null },
  { label: "undefined", make: () => undefined },
  { label: "true", make: () => true },
  { label: "false", make: () => false },
  { label: "{}", make: () => ({}) },
  { label: "[]", make: () => [] },
  { label: "{valueOf: 25}", make: () => ({ valueOf: () => 25, toString: () => "25" }) },
  { label: "[NaN]", make: () => [Number.NaN] },
  // eslint-disable-next-line no-sparse-arrays
  { label: "[1, , 3]", make: () => [1, , 3] },
  { label: "[0, NaN, 1]", make: () => [0, Number.NaN, 1] },
  { label: "Object.create(null)", make: () => Object.create(null) as unknown },
  { label: "a function", make: () => () => 25 },
];

const hostileArbitrary: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(...hostileValues.map((h) => h.make())),
  fc.double(),
  fc.integer(),
  fc.string({ maxLength: 8 }),
  fc.sparseArray(fc.oneof(fc.double(), fc.constant(null)), { maxLength: 5 }),
  fc.dictionary(fc.constantFrom("type", "value", "min", "max", "trials", "seed", "kind", "name", "__proto__"), fc.oneof(fc.double(), fc.string(), fc.constant(null)), { maxKeys: 3 }),
);

/** Problems in a returned value: non-finite numbers, and "NaN"/"Infinity" in text. */
export function scanResult(value: unknown, path: string, seen: WeakSet<object>, problems: string[], depth = 0): void {
  if (problems.length > 0 || depth > 12) return;
  if (typeof value === "number") {
    if (!Number.isFinite(value)) problems.push(`returned ${String(value)} at ${path}`);
  } else if (typeof value === "string") {
    const m = /\bNaN\b|Infinity/.exec(value);
    if (m !== null) problems.push(`returned text with "${m[0]}" at ${path}: …${value.slice(Math.max(0, m.index - 40), m.index + 20).replace(/\s+/g, " ")}…`);
  } else if (typeof value === "object" && value !== null) {
    if (seen.has(value)) return;
    seen.add(value);
    if (value instanceof Map) {
      for (const [k, v] of value) scanResult(v, `${path}.${String(k)}`, seen, problems, depth + 1);
      return;
    }
    if (ArrayBuffer.isView(value)) {
      const arr = value as unknown as ArrayLike<number | bigint>;
      for (let i = 0; i < arr.length; i++) scanResult(arr[i], `${path}[${i}]`, seen, problems, depth + 1);
      return;
    }
    for (const key of Object.keys(value)) scanResult((value as Record<string, unknown>)[key], `${path}.${key}`, seen, problems, depth + 1);
  }
}

/** True when a NaN is anywhere in `value` (a typed error may then quote it). */
function containsNaN(value: unknown, depth: number): boolean {
  if (typeof value === "number") return Number.isNaN(value);
  if (depth > 8 || typeof value !== "object" || value === null) return false;
  return Object.values(value).some((v) => containsNaN(v, depth + 1));
}

/** A short text for a value, safe for values without a string form. */
export function describeValue(value: unknown): string {
  try {
    return fc.stringify(value).slice(0, 80);
  } catch {
    return typeof value;
  }
}

function isPlain(value: unknown): value is Record<string, unknown> | unknown[] {
  if (Array.isArray(value)) return true;
  if (typeof value !== "object" || value === null) return false;
  const proto = Object.getPrototypeOf(value) as unknown;
  return proto === Object.prototype || proto === null;
}

type Path = readonly (string | number)[];

/** Every node of an argument list (leaves and sub-objects), as paths. */
function nodePaths(args: readonly unknown[]): Path[] {
  const paths: Path[] = [];
  const walk = (value: unknown, path: Path, depth: number): void => {
    paths.push(path);
    if (depth > 8 || !isPlain(value)) return;
    if (Array.isArray(value)) value.forEach((v, i) => walk(v, [...path, i], depth + 1));
    else for (const key of Object.keys(value)) walk(value[key], [...path, key], depth + 1);
  };
  args.forEach((a, i) => walk(a, [i], 0));
  return paths;
}

const deleted = Symbol("deleted");

/** A copy of `args` with the node at `path` replaced (copies only along the path). */
function replaceAt(args: readonly unknown[], path: Path, replacement: unknown): unknown[] {
  const update = (value: unknown, rest: Path): unknown => {
    if (rest.length === 0) return replacement;
    const [key, ...tail] = rest as [string | number, ...(string | number)[]];
    if (Array.isArray(value)) {
      const copy = value.slice();
      copy[key as number] = update(value[key as number], tail);
      return copy;
    }
    const copy: Record<string, unknown> = Object.getPrototypeOf(value) === null ? Object.create(null) : {};
    Object.assign(copy, value as Record<string, unknown>);
    const next = update((value as Record<string, unknown>)[key], tail);
    if (next === deleted) delete copy[key];
    else copy[key] = next;
    return copy;
  };
  return update(args, path) as unknown[];
}

function pathText(path: Path): string {
  return path.map((p, i) => (i === 0 ? `arg${String(p)}` : typeof p === "number" ? `[${p}]` : `.${p}`)).join("");
}

/** One export and the documented calls made to it. */
export interface ExportUnderTest {
  readonly target: string;
  readonly fn: (...args: unknown[]) => unknown;
  readonly valid: RecordedCall[];
}

/** Every function export of every entry (in the order of the API surface), with its harvested example calls. */
export async function exportsUnderTest(): Promise<ExportUnderTest[]> {
  const entries: Record<string, Record<string, unknown>> = {
    hotjunction: await import("../../src/index.js"),
    "hotjunction/exact": await import("../../src/exact.js"),
    "hotjunction/design": await import("../../src/design/index.js"),
    "hotjunction/report": await import("../../src/report/index.js"),
  };
  const surface = JSON.parse(readFileSync(join(projectDir, "tests/package/apiSurface.json"), "utf8")) as Record<string, { values: string[] }>;
  const harvested = await harvestExampleCalls(entries);
  const underTest: ExportUnderTest[] = [];
  for (const [entry, names] of Object.entries(surface)) {
    for (const name of names.values) {
      const value = entries[entry]?.[name];
      if (typeof value !== "function" || isClass(value)) continue;
      // the same function re-exported by another entry is tested once
      if (underTest.some((u) => u.fn === value)) continue;
      const valid = harvested.filter((c) => (entries[c.entry]?.[c.name] as unknown) === value);
      underTest.push({ target: `${entry}:${name}`, fn: value as (...args: unknown[]) => unknown, valid });
    }
  }
  return underTest;
}

/** Calls `fn(...args)` once; returns the contract violation it shows, if any. */
async function check(fn: (...args: unknown[]) => unknown, args: unknown[], slowCallMs: number): Promise<string | undefined> {
  const start = performance.now();
  let result: unknown;
  try {
    result = fn(...args);
    if (result instanceof Promise) result = await result;
  } catch (error) {
    const ms = performance.now() - start;
    if (ms > slowCallMs) return `slow: ${Math.round(ms)} ms before throwing`;
    if (isHotjunctionError(error)) {
      if (/\bNaN\b/.test(error.message) && !containsNaN(args, 0)) return `typed error message shows NaN: ${error.message.slice(0, 160)}`;
      return undefined;
    }
    const e = error as Error;
    return `plain ${e?.name ?? typeof error}: ${String(e?.message ?? error).slice(0, 160)}`;
  }
  const ms = performance.now() - start;
  if (ms > slowCallMs) return `slow: ${Math.round(ms)} ms`;
  const problems: string[] = [];
  scanResult(result, "result", new WeakSet(), problems);
  return problems[0];
}

/** What one export's calls gave. */
export interface ExportOutcome {
  readonly exportIndex: number;
  readonly target: string;
  readonly calls: number;
  readonly failures: Failure[];
  readonly hasExample: boolean;
}

/** Shared progress memory written before every call (read by the watchdog). */
export class ProgressWriter {
  private readonly slots: Int32Array;
  private readonly label: Uint8Array;
  private readonly encoder = new TextEncoder();
  constructor(buffer: SharedArrayBuffer) {
    this.slots = new Int32Array(buffer, 0, progressSlots.count);
    this.label = new Uint8Array(buffer, progressSlots.count * 4, progressLabelBytes);
  }
  mark(exportIndex: number, serial: number, label: string): void {
    const { written } = this.encoder.encodeInto(label.slice(0, progressLabelBytes / 4), this.label);
    Atomics.store(this.slots, progressSlots.labelLength, written);
    Atomics.store(this.slots, progressSlots.exportIndex, exportIndex);
    Atomics.store(this.slots, progressSlots.serial, serial);
  }
}

/** Reads the shared progress memory (watchdog side). */
export function readProgress(buffer: SharedArrayBuffer): { exportIndex: number; serial: number; label: string } {
  const slots = new Int32Array(buffer, 0, progressSlots.count);
  const length = Atomics.load(slots, progressSlots.labelLength);
  const bytes = new Uint8Array(buffer, progressSlots.count * 4, progressLabelBytes).slice(0, length);
  return { exportIndex: Atomics.load(slots, progressSlots.exportIndex), serial: Atomics.load(slots, progressSlots.serial), label: new TextDecoder().decode(bytes) };
}

/**
 * Runs every call of export `index`: raw hostile calls, generated tuples, then its documented example calls
 * perturbed one node at a time. Calls with a serial number ≤ `skipThrough` are not run (a restarted worker
 * resumes after the call that was stopped).
 */
export async function runExport(u: ExportUnderTest, index: number, settings: ContractSettings, progress: ProgressWriter, skipThrough = -1): Promise<ExportOutcome> {
  const failures: Failure[] = [];
  let serial = -1;
  let calls = 0;
  const run = async (args: unknown[], where: () => string): Promise<void> => {
    serial++;
    if (serial <= skipThrough) return;
    progress.mark(index, serial, `${u.target} ${where()}`);
    calls++;
    const problem = await check(u.fn, args, settings.slowCallMs);
    if (problem !== undefined) failures.push({ target: u.target, where: where(), problem });
  };
  // One time budget per export, spent cheapest-first: the raw hostile calls always run (they are refused at the
  // entry), then generated tuples and perturbed example calls while the budget lasts. A cheap export gets many
  // calls, an expensive one (a trip design, a Monte Carlo run) its example and a few perturbations of it.
  const deadline = performance.now() + settings.budgetPerExportMs;
  const singles: unknown[][] = [[], ...hostileValues.map((h) => [h.make()])];
  for (const args of singles) await run(args, () => `(${args.map(describeValue).join(", ")})`);
  const tuples = fc.sample(fc.array(hostileArbitrary, { minLength: 1, maxLength: 4 }), { seed: settings.seed + index, numRuns: settings.tuplesPerExport });
  // half the budget at most for the tuples, so the perturbed example calls always get their share
  const tupleDeadline = performance.now() + settings.budgetPerExportMs / 2;
  for (const [k, args] of tuples.entries()) {
    if (k >= settings.minCallsPerPart && performance.now() > tupleDeadline) break;
    await run(args, () => `generated tuple ${describeValue(args)}`);
  }

  const distinct = new Map<string, RecordedCall>();
  for (const c of u.valid) {
    let key: string;
    try {
      key = fc.stringify(c.args);
    } catch {
      key = String(distinct.size);
    }
    if (!distinct.has(key)) distinct.set(key, c);
  }
  const bases = [...distinct.values()].slice(0, settings.basesPerExport);
  for (const [b, base] of bases.entries()) {
    // an expensive export stops after the first base that ran out of its budget
    if (b > 0 && performance.now() > deadline) break;
    const baseArgs = [...base.args];
    await run(baseArgs, () => "documented example call");
    const candidates: { path: Path; hostile: Hostile | undefined }[] = [];
    for (const path of nodePaths(baseArgs)) {
      for (const hostile of hostileValues) candidates.push({ path, hostile });
      if (path.length > 1) candidates.push({ path, hostile: undefined });
    }
    // a fixed order (seeded shuffle), truncated by the export's time budget: the same seed tries the same calls first
    const order = fc.sample(fc.shuffledSubarray(candidates, { minLength: candidates.length, maxLength: candidates.length }), { seed: settings.seed + index, numRuns: 1 })[0]!;
    const baseDeadline = Math.min(deadline, performance.now() + (deadline - performance.now()) / (bases.length - b));
    for (const [k, { path, hostile }] of order.entries()) {
      if (k >= settings.minCallsPerPart && performance.now() > baseDeadline) break;
      const args = replaceAt(baseArgs, path, hostile === undefined ? deleted : hostile.make());
      await run(args, () => `${pathText(path)} = ${hostile?.label ?? "(deleted)"}`);
    }
  }
  return { exportIndex: index, target: u.target, calls, failures, hasExample: u.valid.length > 0 };
}
