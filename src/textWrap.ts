/**
 * Word wrapping of report prose, the one copy every renderer uses (text reports, SVG notes, the runaway chart).
 * @internal
 * @module
 */

/**
 * Wraps text at spaces into lines of at most `width` characters (a word longer than `width` stands on its own
 * line). @internal
 */
export function _wrapWords(text: string, width: number): string[] {
  const lines: string[] = [];
  let current = "";
  for (const word of text.split(" ")) {
    if (current.length > 0 && current.length + 1 + word.length > width) {
      lines.push(current);
      current = word;
    } else current = current.length > 0 ? `${current} ${word}` : word;
  }
  if (current.length > 0) lines.push(current);
  return lines;
}
