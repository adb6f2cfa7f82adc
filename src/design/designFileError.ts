/**
 * The error a design file that cannot be used raises: one line naming the file, the place in it, what was
 * expected and what was found.
 * @module
 */
import { HotjunctionRangeError } from "../errors.js";

/** Fields of a {@link DesignFileError}. */
export interface DesignFileErrorDetails {
  /** File name shown at the start of the message (e.g. `"kiln.json"`). */
  readonly fileName: string;
  /** Dotted path of the offending value (`"reference.tempcoPpmPerC"`, `"setpoints[1].tripC"`), empty for the whole file. */
  readonly path: string;
  /** What was wrong, in words (one line, e.g. `expected a number, found "abc"`). */
  readonly problem: string;
  /** How many further problems were found and not shown. Default 0. */
  readonly moreProblems?: number;
  /** Every problem found (the first one included), each with its path and what was expected and found. */
  readonly problems?: readonly DesignFileProblem[];
  /** The quantity that failed (`"design.reference.nominalVolts"`); default `"design file"`. */
  readonly quantity?: string;
  /** The value found at `path` (default the file name, for a problem of the whole file). */
  readonly value?: unknown;
  /** The valid range of the value at `path`, where the schema states one. */
  readonly min?: number | undefined;
  readonly max?: number | undefined;
}

/** One problem of a design file. */
export interface DesignFileProblem {
  /** Dotted path of the offending value, empty for the whole file. */
  readonly path: string;
  /** What was wrong (`expected …, found …`). */
  readonly problem: string;
}

/** Shortens a long part of the message (a deep path, a long list of keys) so the line stays readable. */
function clip(text: string, max: number): string {
  return text.length > max ? `${text.slice(0, max - 1)}…` : text;
}

function messageOf(details: DesignFileErrorDetails): string {
  const at = details.path.length > 0 ? `at ${clip(details.path, 160)}: ` : "";
  const more =
    details.moreProblems !== undefined && details.moreProblems > 0
      ? ` (and ${details.moreProblems} more problem${details.moreProblems === 1 ? "" : "s"})`
      : "";
  return `${clip(details.fileName, 120)}: ${at}${clip(details.problem, 280)}${more}`.replace(/[\r\n]+/g, " ");
}

/**
 * A design file that is unreadable, malformed or invalid. `code` is `INVALID_DESIGN`; the message is one line:
 * `<file>: at <path>: <problem>`.
 * @example
 * ```ts
 * import { parseDesign } from "hotjunction/design";
 * try { parseDesign("{", { fileName: "kiln.json" }); } catch (e) { console.log((e as Error).message); } // "kiln.json: not valid JSON at line 1, column 2: expected a key in double quotes, found the end of the file"
 * ```
 */
export class DesignFileError extends HotjunctionRangeError {
  /** File name as shown. */
  readonly fileName: string;
  /** Dotted path of the offending value; empty for the whole file. */
  readonly path: string;
  /** What was wrong. */
  override readonly problem: string;
  /** Every problem found, the first one included (one entry when only one is known). */
  readonly problems: readonly DesignFileProblem[];
  constructor(details: DesignFileErrorDetails) {
    super({
      code: "INVALID_DESIGN",
      quantity: details.quantity ?? "design file",
      value: "value" in details ? details.value : details.fileName,
      problem: details.problem,
      min: details.min,
      max: details.max,
    });
    this.fileName = details.fileName;
    this.path = details.path;
    this.problem = details.problem;
    this.problems = details.problems ?? [{ path: details.path, problem: details.problem }];
    this.message = messageOf(details);
  }
}
