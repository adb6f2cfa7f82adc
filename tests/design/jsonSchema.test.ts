import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { _designJsonSchemaText } from "../../src/design/designJsonSchema.js";

describe("schema/hotjunction-design.schema.json", () => {
  it("equals the schema generated from the zod definitions (regenerate: npx tsx scripts/writeSchema.ts)", () => {
    const committed = readFileSync(new URL("../../schema/hotjunction-design.schema.json", import.meta.url), "utf8");
    expect(committed).toBe(_designJsonSchemaText());
  });

  it("refuses unknown keys in every object it describes", () => {
    const schema = JSON.parse(_designJsonSchemaText()) as unknown;
    const objects: Record<string, unknown>[] = [];
    const visit = (node: unknown): void => {
      if (Array.isArray(node)) node.forEach(visit);
      else if (node !== null && typeof node === "object") {
        const record = node as Record<string, unknown>;
        if (record["type"] === "object" && record["properties"] !== undefined) objects.push(record);
        Object.values(record).forEach(visit);
      }
    };
    visit(schema);
    expect(objects.length).toBeGreaterThan(15);
    for (const object of objects) expect(object["additionalProperties"]).toBe(false);
  });
});
