/**
 * Self-hosted faces (no network at build time). next/font/local emits @font-face rules
 * (with metric-adjusted fallbacks) and sets two CSS variables that app/globals.css maps to
 * `--font-sans` and `--font-mono`. Put `fontVariables` on <html>.
 * Paths are relative to this file (a next/font requirement).
 */
import localFont from "next/font/local";

/**
 * Reading face for UI and lessons (IBM Plex Sans, SIL Open Font License; fonts/ibm-plex-sans/LICENSE).
 * One variable file (weight axis 100-700, latin, 45.7 KB) instead of one file per weight: each
 * file is a request on a slow connection. Nothing is preloaded, and `display: optional`: a file
 * that is not there within the browser's short block period (about 100 ms) is not swapped in
 * for this page view (it is cached for the next one), so text paints at once in the
 * metric-adjusted fallback (Arial scaled to Plex's metrics by next/font) and the page is not laid
 * out a second time, with a second set of font sizes to resolve, when the file arrives. That
 * second layout cost a Bench tool about 1 s of blocking time in Lighthouse's mobile profile
 * (TBT 1,678 ms with `swap`, 718 ms with `optional`; `npm run measure:pages`).
 * The italic is a static 400 file, fetched only by pages that set italic text.
 */
export const textFont = localFont({
  src: [
    { path: "../fonts/ibm-plex-sans/ibm-plex-sans-latin-wght-normal.woff2", weight: "100 700", style: "normal" },
    { path: "../fonts/ibm-plex-sans/ibm-plex-sans-latin-400-italic.woff2", weight: "400", style: "italic" },
  ],
  variable: "--font-text",
  display: "optional",
  fallback: ["ui-sans-serif", "system-ui", "sans-serif"],
  preload: false,
});

/** Figures face: readouts, input lists, codes, tabular numbers (JetBrains Mono, OFL; fonts/jetbrains-mono/LICENSE); one variable file (weights 100-800, latin, 40.4 KB). */
export const figuresFont = localFont({
  src: [{ path: "../fonts/jetbrains-mono/jetbrains-mono-latin-wght-normal.woff2", weight: "100 800", style: "normal" }],
  variable: "--font-figures",
  display: "optional",
  fallback: ["ui-monospace", "monospace"],
  // The default metric-adjusted fallback is Arial; a proportional fallback would reflow tables.
  adjustFontFallback: false,
  // Not preloaded and `optional`, for the same reasons as the text face.
  preload: false,
});

/** Class names that define --font-text and --font-figures; for <html className>. */
export const fontVariables = `${textFont.variable} ${figuresFont.variable}`;
