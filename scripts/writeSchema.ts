/**
 * Regenerates schema/hotjunction-design.schema.json from the zod schema (run: `npx tsx scripts/writeSchema.ts`).
 * tests/design/jsonSchema.test.ts fails when the committed file differs from what this writes.
 */
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { _designJsonSchemaText } from "../src/design/designJsonSchema.js";

const target = fileURLToPath(new URL("../schema/hotjunction-design.schema.json", import.meta.url));
writeFileSync(target, _designJsonSchemaText());
console.log(`wrote ${target}`);
