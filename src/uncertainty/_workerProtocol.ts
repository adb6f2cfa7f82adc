/**
 * Messages between `propagateParallel` and its workers, errors across threads, and loading a model from a
 * module (internal; shared by the host and the worker entry).
 * @module
 * @internal
 */
import { HotjunctionRangeError, HotjunctionTypeError, isHotjunctionError } from "../errors.js";
import type { Model } from "./types.js";

/** @internal A job as the host sends it. */
export interface _WorkerJob {
  readonly kind: "job";
  readonly job: number;
  readonly module: string;
  readonly exportName: string;
  readonly inputs: Record<string, unknown>;
  readonly correlations: unknown;
  /** When present, the export is a factory: the model is `export(argument)`. */
  readonly argument?: unknown;
}

/** @internal A request for the outputs of `count` trials from a block boundary with stream `state`. */
export interface _WorkerRun {
  readonly kind: "run";
  readonly job: number;
  readonly id: number;
  readonly state: readonly number[];
  readonly count: number;
}

/** @internal An error as it crosses threads. */
export interface _SerializedError {
  readonly typed: "range" | "type" | undefined;
  readonly message: string;
  readonly details: Record<string, unknown>;
}

/** @internal Serializes an error for postMessage. */
export function _serializeError(error: unknown): _SerializedError {
  if (isHotjunctionError(error)) {
    const details: Record<string, unknown> = {};
    for (const key of ["code", "quantity", "value", "min", "max", "unit", "context", "problem", "allowed"]) {
      const v = (error as unknown as Record<string, unknown>)[key];
      if (v !== undefined) details[key] = typeof v === "function" || typeof v === "symbol" ? String(v) : v;
    }
    return { typed: error instanceof HotjunctionRangeError ? "range" : "type", message: error.message, details };
  }
  return { typed: undefined, message: error instanceof Error ? error.message : String(error), details: {} };
}

/** @internal Rebuilds an error sent by {@link _serializeError}. */
export function _deserializeError(e: _SerializedError): Error {
  if (e.typed === "range") return new HotjunctionRangeError(e.details as never);
  if (e.typed === "type") return new HotjunctionTypeError(e.details as never);
  return new Error(e.message);
}

/** How {@link _loadModel} imports a module (see {@link _setModuleImporter}). */
let importModule = (specifier: string): Promise<unknown> => import(/* @vite-ignore */ specifier);

/**
 * @internal Sets how {@link _loadModel} imports a model module. The CLI's program bundle runs as a `node:vm`
 * script, which has no module loader of its own (its `import()` calls are built as `require`, which cannot load
 * an ES module): it passes the `import()` of the CLI's ES module entry.
 */
export function _setModuleImporter(importer: (specifier: string) => Promise<unknown>): void {
  importModule = importer;
}

/**
 * @internal Loads a model export from a module; with an `argument` the export is a factory and the model is
 * what it returns for that argument.
 */
export async function _loadModel(module: string, exportName: string, context: string, argument?: unknown): Promise<Model> {
  // Same error shape as other failed-load checks (deliberate: this one names the model module).
  let namespace: Record<string, unknown>;
  try {
    namespace = (await importModule(module)) as Record<string, unknown>;
  } catch (error) {
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "model module",
      value: module,
      context,
      problem: `cannot be imported (${error instanceof Error ? error.message : String(error)})`,
    });
  }
  const model = namespace[exportName];
  if (typeof model !== "function") {
    // Same error shape as other typed-error checks (deliberate: each names its own quantity and problem).
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "model export",
      value: exportName,
      context,
      problem: `is not a function exported by ${module}`,
      allowed: Object.keys(namespace).filter((k) => typeof namespace[k] === "function"),
    });
  }
  if (argument === undefined) return model as Model;
  const made = (model as (a: unknown) => unknown)(argument);
  if (typeof made !== "function") {
    // Same error shape as other typed-error checks (deliberate: each names its own quantity and problem).
    throw new HotjunctionTypeError({
      code: "INVALID_OPTION",
      quantity: "model factory result",
      value: made,
      context,
      problem: `is not a function (${exportName} of ${module} was called with the reference's argument)`,
    });
  }
  return made as Model;
}

