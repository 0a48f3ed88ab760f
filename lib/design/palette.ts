/**
 * Axisline's palette, as data. This file is the single source of truth:
 * app/globals.css mirrors these hex values (light in `@theme`, dark in the two dark
 * blocks) and tests/unit/ui/contrast.test.ts fails if the two drift apart or if an
 * intended pairing drops below its WCAG 2.2 contrast minimum.
 *
 * The look: "house lights" (light) and "show" (dark). Warm chalk or stage-black
 * neutrals with a faint violet cast, a gel-amber accent for the one thing to do next,
 * and a cable-blue secondary for links, focus and selection.
 */

export type ThemeName = "light" | "dark";

/** Token names without the `--color-` prefix; CSS utilities are `bg-surface`, `text-ink`, ... */
export const paletteTokenNames = [
  // neutrals
  "surface", // page background
  "surface-raised", // cards, inputs, dialogs, menus
  "surface-sunken", // wells, table heads, code, skeletons
  "surface-inverse", // toasts, tooltips: the opposite of the page
  "ink", // body text and headings
  "ink-muted", // secondary text, hints, captions
  "ink-inverse", // text on surface-inverse
  "border", // boundaries of controls (inputs, checkboxes, secondary buttons): ≥ 3:1
  "rule", // decorative hairlines between regions (not needed to identify a control)
  // gel amber: primary action
  "accent", // fill of the primary button, progress fill, selected marker
  "accent-hover",
  "accent-ink", // text/icons on accent and accent-hover
  "accent-text", // amber-family text on neutral surfaces
  "accent-soft", // tinted background for accent badges/highlights
  "accent-line", // amber for bars, fills and boundaries that must read against neutrals (≥ 3:1)
  // cable blue: links, selection, secondary emphasis
  "secondary",
  "secondary-ink",
  "secondary-text", // links
  "secondary-soft",
  "focus", // focus-visible ring
  // status tones: `tone` is text on surfaces and a fill; `tone-ink` is text on the fill
  "danger",
  "danger-ink",
  "danger-soft",
  "caution",
  "caution-ink",
  "caution-soft",
  "success",
  "success-ink",
  "success-soft",
  "note",
  "note-ink",
  "note-soft",
  // figure traces (polar plots, level curves): non-text graphics, ≥ 3:1 on surfaces
  "trace-1",
  "trace-2",
  "trace-3",
  "trace-4",
] as const;

export type PaletteToken = (typeof paletteTokenNames)[number];

/** Lower-case #rrggbb; the CSS uses the same spelling so the drift test can compare strings. */
export type HexColor = `#${string}`;

export type ThemePalette = Readonly<Record<PaletteToken, HexColor>>;

const light: ThemePalette = {
  surface: "#f8f6f1",
  "surface-raised": "#ffffff",
  "surface-sunken": "#efece5",
  "surface-inverse": "#1b1a21",
  ink: "#17161c",
  "ink-muted": "#55525e",
  "ink-inverse": "#f3f1eb",
  border: "#7f7c88",
  rule: "#d9d5cc",
  accent: "#f2b134",
  "accent-hover": "#e29f1d",
  "accent-ink": "#1a1405",
  "accent-text": "#8a4d00",
  "accent-soft": "#fbefd6",
  "accent-line": "#a86400",
  secondary: "#1d5fc2",
  "secondary-ink": "#ffffff",
  "secondary-text": "#1d5fc2",
  "secondary-soft": "#e3ecfa",
  focus: "#1d5fc2",
  danger: "#b42318",
  "danger-ink": "#ffffff",
  "danger-soft": "#fdeceb",
  caution: "#9e4805",
  "caution-ink": "#ffffff",
  "caution-soft": "#fcebd9",
  success: "#1b7339",
  "success-ink": "#ffffff",
  "success-soft": "#e4f3e8",
  note: "#4a45b5",
  "note-ink": "#ffffff",
  "note-soft": "#ecebfa",
  "trace-1": "#a86400",
  "trace-2": "#1d5fc2",
  "trace-3": "#1b7339",
  "trace-4": "#b02a84",
};

const dark: ThemePalette = {
  surface: "#121117",
  "surface-raised": "#1c1b23",
  "surface-sunken": "#0b0a0f",
  "surface-inverse": "#eeece6",
  ink: "#eeece6",
  "ink-muted": "#a9a6b3",
  "ink-inverse": "#17161c",
  border: "#7a7784",
  rule: "#2e2c37",
  accent: "#f2b134",
  "accent-hover": "#f7c25a",
  "accent-ink": "#1a1405",
  "accent-text": "#f5be55",
  "accent-soft": "#3a2c10",
  "accent-line": "#f2b134",
  secondary: "#6fa8ff",
  "secondary-ink": "#0b1730",
  "secondary-text": "#8ab8ff",
  "secondary-soft": "#16243d",
  focus: "#7db2ff",
  danger: "#ff8a80",
  "danger-ink": "#2a0705",
  "danger-soft": "#3a1614",
  caution: "#ffa75e",
  "caution-ink": "#2a1403",
  "caution-soft": "#3a2410",
  success: "#6cd58e",
  "success-ink": "#05240f",
  "success-soft": "#12301c",
  note: "#a9a4ff",
  "note-ink": "#16133a",
  "note-soft": "#24224a",
  "trace-1": "#f2b134",
  "trace-2": "#6fa8ff",
  "trace-3": "#6cd58e",
  "trace-4": "#f27bc8",
};

export const palette: Readonly<Record<ThemeName, ThemePalette>> = { light, dark };

/** What a pairing is for decides its WCAG 2.2 minimum. */
export type PairingKind =
  | "text" // SC 1.4.3 Contrast (Minimum): 4.5:1 for normal-size text
  | "non-text"; // SC 1.4.11 Non-text Contrast: 3:1 for control boundaries, focus rings, essential graphics

export type IntendedPairing = {
  readonly foreground: PaletteToken;
  readonly background: PaletteToken;
  readonly kind: PairingKind;
  readonly use: string;
};

const neutralBackgrounds = ["surface", "surface-raised", "surface-sunken"] as const;

function onEveryNeutral(
  foreground: PaletteToken,
  kind: PairingKind,
  use: string,
): IntendedPairing[] {
  return neutralBackgrounds.map((background) => ({ foreground, background, kind, use }));
}

const statusTones = ["danger", "caution", "success", "note"] as const;

/**
 * Every foreground/background combination the components use. A component that puts a
 * token on a background not listed here is using an unchecked pairing: add it here first.
 */
export const intendedPairings: readonly IntendedPairing[] = [
  ...onEveryNeutral("ink", "text", "body text and headings"),
  ...onEveryNeutral("ink-muted", "text", "hints, captions, table secondary text"),
  ...onEveryNeutral("accent-text", "text", "amber-family labels"),
  ...onEveryNeutral("secondary-text", "text", "links"),
  ...statusTones.flatMap((tone) => onEveryNeutral(tone, "text", `${tone} message text`)),
  { foreground: "ink-inverse", background: "surface-inverse", kind: "text", use: "toast text" },
  { foreground: "accent-ink", background: "accent", kind: "text", use: "primary button label" },
  { foreground: "accent-ink", background: "accent-hover", kind: "text", use: "primary button hovered" },
  { foreground: "accent-text", background: "accent-soft", kind: "text", use: "accent badge" },
  { foreground: "ink", background: "accent-soft", kind: "text", use: "highlighted row text" },
  { foreground: "secondary-ink", background: "secondary", kind: "text", use: "selected chip label" },
  { foreground: "secondary-text", background: "secondary-soft", kind: "text", use: "secondary badge" },
  ...statusTones.flatMap((tone): IntendedPairing[] => [
    { foreground: `${tone}-ink`, background: tone, kind: "text", use: `${tone} button/solid badge` },
    { foreground: tone, background: `${tone}-soft`, kind: "text", use: `${tone} badge and notice title` },
    { foreground: "ink", background: `${tone}-soft`, kind: "text", use: `${tone} notice body` },
  ]),
  ...onEveryNeutral("border", "non-text", "input, checkbox, radio and secondary-button boundary"),
  ...onEveryNeutral("focus", "non-text", "focus-visible ring (drawn with an offset, so it sits on the surface)"),
  ...onEveryNeutral("accent-line", "non-text", "progress fill, selected-tab bar, checked-box boundary"),
  { foreground: "accent-ink", background: "accent", kind: "non-text", use: "check mark in a checked box" },
  ...(["trace-1", "trace-2", "trace-3", "trace-4"] as const).flatMap((trace) =>
    onEveryNeutral(trace, "non-text", "figure trace"),
  ),
];
