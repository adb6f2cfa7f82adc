/**
 * Regenerates schema/hotjunction-report.schema.json from the zod schema of the JSON reports
 * (run: `npx tsx scripts/writeReportSchema.ts`). tests/report/reportSchema.test.ts fails when the committed file differs.
 */
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { _reportJsonSchemaText } from "../src/report/_reportSchema.js";

const target = fileURLToPath(new URL("../schema/hotjunction-report.schema.json", import.meta.url));
writeFileSync(target, _reportJsonSchemaText());
console.log(`wrote ${target}`);
