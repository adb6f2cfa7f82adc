/**
 * One CSV field (RFC 4180 quoting) of the fault review and safety-figure reports: quoted when it holds a double
 * quote, a comma, a line break, or leading or trailing white space; inner double quotes doubled; null is empty.
 * @internal
 * @module
 */

/** The field as CSV text. @internal */
export function _csvField(value: string | number | boolean | null): string {
  if (value === null) return "";
  const text = String(value);
  const quoted = text.includes('"') || /[,\r\n]/.test(text) || /^\s|\s$/.test(text);
  return quoted ? `"${text.replaceAll('"', '""')}"` : text;
}
