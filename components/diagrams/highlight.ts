// Parsing of the `highlight` prop. MDX passes a comma-separated string
// (highlight="kick-inside,snare-top"); React callers may pass an array.

export type HighlightInput = string | readonly string[] | undefined;

/** Splits, trims and de-duplicates the requested ids (unknown ids are kept; see unknownHighlightIds). */
export function parseHighlight(highlight: HighlightInput): string[] {
  if (highlight === undefined) return [];
  const parts = typeof highlight === "string" ? highlight.split(",") : highlight;
  const ids = parts.map((part) => part.trim()).filter((part) => part.length > 0);
  return [...new Set(ids)];
}

/** Requested ids that are not positions of the diagram: content checks report these as typos. */
export function unknownHighlightIds(highlight: HighlightInput, validIds: readonly string[]): string[] {
  const valid = new Set(validIds);
  return parseHighlight(highlight).filter((id) => !valid.has(id));
}
