// Colours for the diagrams. Outlines use currentColor (the page's text colour), the rest
// read the site's CSS variables with fallbacks, so the drawings work in light and dark themes.

/** Label text: the site's ink colour, else whatever the page's text colour is. */
export const INK = "var(--color-ink, currentColor)";
/** Secondary detail lines (strings, cymbal lathing, grille cloth). */
export const DETAIL = "var(--color-border, #8a8f98)";
/** Microphone position marks and the mic glyphs. */
export const ACCENT = "var(--color-accent, #c2410c)";
/** Equipment bodies get a faint tint of the text colour, visible on light and dark pages. */
export const BODY_FILL_OPACITY = 0.07;

/** Label font size, viewBox units. Chosen so labels stay ≥ 10 px when a drawing is shown 320 px wide. */
export const LABEL_FONT_SIZE = 18;
/** Smaller captions inside a drawing (part names, directions). */
export const NOTE_FONT_SIZE = 15;
