/**
 * The built page as a file: where a design to open with goes. Plain string work, shared by the build script and
 * the CLI's `workbench` command (no browser code).
 * @module
 */

/** The empty element of the built page that can hold a design to open with. */
export const initialDesignMarker = `<script type="application/json" id="hj-initial-design"></script>`;

/**
 * The page with a design to open with: the design's text goes into the `hj-initial-design` element, with `<`
 * written as `\u003c` so no text can close the element.
 * @param page - the built page
 * @param designText - the design file's text (already validated by the caller)
 * @param name - shown when the page says what it loaded
 */
export function withInitialDesign(page: string, designText: string, name: string): string {
  if (!page.includes(initialDesignMarker)) throw new Error("the workbench page has no place for a design to open with");
  const safe = designText.replace(/</g, "\\u003c");
  const attr = name.replace(/&/g, "&amp;").replace(/"/g, "&quot;").replace(/</g, "&lt;");
  return page.replace(initialDesignMarker, () => `<script type="application/json" id="hj-initial-design" data-name="${attr}">${safe}</script>`);
}
