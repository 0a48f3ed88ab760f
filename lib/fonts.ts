/**
 * Self-hosted faces (no network at build time). next/font/local emits @font-face rules,
 * preloads the files and sets two CSS variables that app/globals.css maps to
 * `--font-sans` and `--font-mono`. Put `fontVariables` on <html>.
 * Paths are relative to this file (a next/font requirement).
 */
import localFont from "next/font/local";

/** Reading face for UI and lessons (IBM Plex Sans, SIL Open Font License; fonts/ibm-plex-sans/LICENSE). */
export const textFont = localFont({
  src: [
    { path: "../fonts/ibm-plex-sans/ibm-plex-sans-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/ibm-plex-sans/ibm-plex-sans-latin-400-italic.woff2", weight: "400", style: "italic" },
    { path: "../fonts/ibm-plex-sans/ibm-plex-sans-latin-600-normal.woff2", weight: "600", style: "normal" },
    { path: "../fonts/ibm-plex-sans/ibm-plex-sans-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-text",
  display: "swap",
  fallback: ["ui-sans-serif", "system-ui", "sans-serif"],
});

/** Figures face: readouts, input lists, codes, tabular numbers (JetBrains Mono, OFL; fonts/jetbrains-mono/LICENSE). */
export const figuresFont = localFont({
  src: [
    { path: "../fonts/jetbrains-mono/jetbrains-mono-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/jetbrains-mono/jetbrains-mono-latin-600-normal.woff2", weight: "600", style: "normal" },
  ],
  variable: "--font-figures",
  display: "swap",
  fallback: ["ui-monospace", "monospace"],
  // The default metric-adjusted fallback is Arial; a proportional fallback would reflow tables.
  adjustFontFallback: false,
  // Not preloaded: readouts sit below the first screen, and on a slow phone connection two more
  // preloaded files (43 KB) hold back the page's own CSS and scripts (Lighthouse, mobile).
  preload: false,
});

/** Class names that define --font-text and --font-figures; for <html className>. */
export const fontVariables = `${textFont.variable} ${figuresFont.variable}`;
