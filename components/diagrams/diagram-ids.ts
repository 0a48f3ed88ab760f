// Element ids for <title>/<desc>/clip paths. A diagram may appear twice on a page, and server
// components cannot call useId, so the default prefix is derived from the props.

/** Small deterministic string hash (djb2), base 36. Not for security; only to tell instances apart. */
function hashText(text: string): string {
  let hash = 5381;
  for (let index = 0; index < text.length; index += 1) {
    hash = ((hash * 33) ^ text.charCodeAt(index)) >>> 0;
  }
  return hash.toString(36);
}

/** A valid, stable id prefix such as "diagram-drum-kit-1x9k2p". */
export function diagramIdPrefix(name: string, distinguishingText: string): string {
  const safeName = name.replace(/[^a-z0-9-]/gi, "-");
  return `diagram-${safeName}-${hashText(distinguishingText)}`;
}
