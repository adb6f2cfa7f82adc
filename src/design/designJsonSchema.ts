/**
 * The JSON Schema of the design file, generated from the zod schema (draft 2020-12).
 * @module
 */
import * as z from "zod";
import { designFileSchema } from "./designSchema.js";

/**
 * Generates the JSON Schema of design files (what `schema/hotjunction-design.schema.json` holds).
 * @returns a JSON Schema object (draft 2020-12); unknown keys are refused (`additionalProperties: false`)
 * @example
 * ```ts
 * import { designJsonSchema } from "hotjunction/design";
 * console.log(designJsonSchema().additionalProperties); // false
 * ```
 */
export function designJsonSchema(): Record<string, unknown> {
  const schema = z.toJSONSchema(designFileSchema, { target: "draft-2020-12", io: "input" }) as Record<string, unknown>;
  return {
    $schema: schema["$schema"],
    title: "hotjunction design file, format 1",
    ...schema,
  };
}

/** The schema as the committed file's text (2-space JSON, final newline). @internal */
export function _designJsonSchemaText(): string {
  return `${JSON.stringify(designJsonSchema(), null, 2)}\n`;
}
