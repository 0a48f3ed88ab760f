import type { ReactNode } from "react";
import { renderToStaticMarkup } from "react-dom/server";

/** Server-rendered markup of a figure in its initial state (no window needed). */
export function markup(node: ReactNode): string {
  return renderToStaticMarkup(node);
}

function decodeEntities(text: string): string {
  return text.replace(/&amp;/g, "&").replace(/&lt;/g, "<").replace(/&gt;/g, ">").replace(/&quot;/g, '"').replace(/&#x27;/g, "'").replace(/&#39;/g, "'");
}

/** Visible text of the element carrying data-testid="id" (tags stripped; the first match). */
export function textOf(html: string, testId: string): string {
  const start = html.indexOf(`data-testid="${testId}"`);
  if (start < 0) throw new Error(`no data-testid="${testId}" in markup`);
  const open = html.lastIndexOf("<", start);
  const tag = /^<([a-zA-Z0-9]+)/.exec(html.slice(open))![1];
  const bodyStart = html.indexOf(">", start) + 1;
  // Walk to the matching close tag (elements of the same name may nest).
  let depth = 1;
  let cursor = bodyStart;
  const pattern = new RegExp(`<(/?)${tag}\\b[^>]*?(/?)>`, "g");
  pattern.lastIndex = bodyStart;
  for (let match = pattern.exec(html); match; match = pattern.exec(html)) {
    if (match[2] === "/") continue;
    depth += match[1] === "/" ? -1 : 1;
    if (depth === 0) {
      cursor = match.index;
      break;
    }
  }
  return decodeEntities(html.slice(bodyStart, cursor).replace(/<[^>]+>/g, "")).replace(/\s+/g, " ").trim();
}

/** The first number in a readout ("−9.54 dB" → −9.54; "−∞ dB" → −Infinity). */
export function numberIn(text: string): number {
  const normalised = text.replace(/\u2212/g, "-");
  if (/-∞/.test(normalised)) return -Infinity;
  const match = /[-+]?\d+(?:\.\d+)?/.exec(normalised);
  if (!match) throw new Error(`no number in "${text}"`);
  return Number(match[0]);
}

/** The aria-label of the first element with role="img" whose label starts with `prefix`. */
export function imageLabel(html: string, prefix: string): string {
  const match = new RegExp(`role="img" aria-label="(${prefix}[^"]*)"`).exec(html);
  if (!match) throw new Error(`no role="img" label starting "${prefix}"`);
  return decodeEntities(match[1]);
}
