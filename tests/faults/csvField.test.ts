/**
 * The CSV field of the fault-review and safety-figure reports (RFC 4180, section 2: fields holding a double quote,
 * a comma or a line break are enclosed in double quotes, inner double quotes doubled; leading or trailing white
 * space is quoted too, common practice, no source). Checked on the RFC's cases and, over many random strings, against
 * the rule written out as one regular expression (the form both reports used before they shared the helper).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { _csvField } from "../../src/csvField.js";

const byOneExpression = (value: string | number | boolean | null): string => {
  if (value === null) return "";
  const text = String(value);
  return /[",\r\n]/.test(text) || /^\s|\s$/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
};

describe("_csvField", () => {
  it("quotes what RFC 4180 requires and leaves the rest", () => {
    expect(_csvField("plain")).toBe("plain");
    expect(_csvField('say "hi"')).toBe('"say ""hi"""');
    expect(_csvField("a,b")).toBe('"a,b"');
    expect(_csvField("two\nlines")).toBe('"two\nlines"');
    expect(_csvField("cr\rlf")).toBe('"cr\rlf"');
    expect(_csvField(" padded")).toBe('" padded"');
    expect(_csvField(null)).toBe("");
    expect(_csvField(-0.5)).toBe("-0.5");
    expect(_csvField(true)).toBe("true");
  });

  it("equals the one-expression rule for any string", () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom("a", " ", '"', ",", "\n", "\r", "\t", "x") }), (text) => {
        expect(_csvField(text)).toBe(byOneExpression(text));
      }),
      { numRuns: 2000 },
    );
  });
});
