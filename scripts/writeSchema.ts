/**
 * Regenerates schema/hotjunction-design.schema.json and schema/hotjunction-safety-figures.schema.json from the
 * zod schemas (run: `npx tsx scripts/writeSchema.ts`). tests/design/jsonSchema.test.ts and
 * tests/safety/outputSchema.test.ts fail when a committed file differs from what this writes.
 */
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { _designJsonSchemaText } from "../src/design/designJsonSchema.js";
import { _safetyFiguresJsonSchemaText } from "../src/design/safetyFiguresJsonSchema.js";

for (const [name, text] of [
  ["hotjunction-design.schema.json", _designJsonSchemaText()],
  ["hotjunction-safety-figures.schema.json", _safetyFiguresJsonSchemaText()],
] as const) {
  const target = fileURLToPath(new URL(`../schema/${name}`, import.meta.url));
  writeFileSync(target, text);
  console.log(`wrote ${target}`);
}
