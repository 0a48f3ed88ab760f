import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import {
  intendedPairings,
  palette,
  paletteTokenNames,
  type HexColor,
  type PairingKind,
  type ThemeName,
} from "@/lib/design/palette";

/*
 * WCAG 2.2 (W3C Recommendation, Oct 2023), Glossary, "relative luminance" and "contrast ratio":
 *   channel c in 0..1 from 8-bit sRGB; linear = c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ^ 2.4
 *   L = 0.2126 R + 0.7152 G + 0.0722 B
 *   ratio = (L_lighter + 0.05) / (L_darker + 0.05), from 1:1 to 21:1
 * (Older texts print the threshold as 0.03928; no 8-bit value falls between the two.)
 */
function linearChannel(channel8bit: number): number {
  const c = channel8bit / 255;
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

function relativeLuminance(hex: string): number {
  const match = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!match) throw new Error(`not a #rrggbb colour: ${hex}`);
  const [red, green, blue] = match.slice(1).map((pair) => linearChannel(parseInt(pair, 16)));
  return 0.2126 * red + 0.7152 * green + 0.0722 * blue;
}

function contrastRatio(foreground: string, background: string): number {
  const [lighter, darker] = [relativeLuminance(foreground), relativeLuminance(background)].sort((a, b) => b - a);
  return (lighter + 0.05) / (darker + 0.05);
}

// WCAG 2.2 SC 1.4.3 Contrast (Minimum): 4.5:1 for text; SC 1.4.11 Non-text Contrast: 3:1.
const minimumRatio: Record<PairingKind, number> = { text: 4.5, "non-text": 3 };

describe("contrastRatio (WCAG 2.2 relative-luminance formula)", () => {
  // Check values derived with the WCAG 2.2 relative luminance and contrast ratio definitions (SC 1.4.3).
  it("gives 21:1 for black on white, the maximum", () => {
    expect(contrastRatio("#000000", "#ffffff")).toBeCloseTo(21, 10);
  });
  it("gives 1:1 for a colour on itself, the minimum", () => {
    expect(contrastRatio("#55525e", "#55525e")).toBe(1);
  });
  it("passes #767676 on #FFFFFF at 4.54:1", () => {
    const ratio = contrastRatio("#767676", "#ffffff");
    expect(ratio).toBeCloseTo(4.54, 2);
    expect(ratio).toBeGreaterThanOrEqual(4.5);
  });
  it("fails #777777 on #FFFFFF at 4.48:1", () => {
    const ratio = contrastRatio("#777777", "#ffffff");
    expect(ratio).toBeCloseTo(4.48, 2);
    expect(ratio).toBeLessThan(4.5);
  });
  it("gives 3.03:1 for #949494 on #FFFFFF (just enough for large text and non-text)", () => {
    expect(contrastRatio("#949494", "#ffffff")).toBeCloseTo(3.03, 2);
  });
  it("does not depend on which colour is the foreground", () => {
    expect(contrastRatio("#ffffff", "#767676")).toBe(contrastRatio("#767676", "#ffffff"));
  });
});

const themes: readonly ThemeName[] = ["light", "dark"];

describe.each(themes)("the %s palette", (theme) => {
  it("defines every token as lower-case #rrggbb", () => {
    for (const token of paletteTokenNames) {
      expect(palette[theme][token], token).toMatch(/^#[0-9a-f]{6}$/);
    }
  });

  it.each(intendedPairings.map((pairing) => [`${pairing.foreground} on ${pairing.background}`, pairing] as const))(
    "%s meets its WCAG minimum",
    (_label, pairing) => {
      const ratio = contrastRatio(palette[theme][pairing.foreground], palette[theme][pairing.background]);
      expect(ratio, `${theme}: ${pairing.use} is ${ratio.toFixed(2)}:1`).toBeGreaterThanOrEqual(
        minimumRatio[pairing.kind],
      );
    },
  );
});

/** `--color-token: #hex;` declarations between the given markers, once per marked block. */
function markedBlocks(css: string, marker: string): Array<Record<string, HexColor>> {
  const pattern = new RegExp(`/\\* palette:${marker}:start \\*/([\\s\\S]*?)/\\* palette:${marker}:end \\*/`, "g");
  return [...css.matchAll(pattern)].map((block) =>
    Object.fromEntries(
      [...block[1].matchAll(/--color-([a-z0-9-]+):\s*(#[0-9a-fA-F]{6});/g)].map((declaration) => [
        declaration[1],
        declaration[2] as HexColor,
      ]),
    ),
  );
}

describe("app/globals.css mirrors lib/design/palette.ts", () => {
  const css = readFileSync(path.resolve(import.meta.dirname, "../../../app/globals.css"), "utf8");

  it("has the light palette once, equal to palette.light", () => {
    const blocks = markedBlocks(css, "light");
    expect(blocks).toHaveLength(1);
    expect(blocks[0]).toEqual(palette.light);
  });

  it("has the dark palette twice (OS preference and data-theme), each equal to palette.dark", () => {
    const blocks = markedBlocks(css, "dark");
    expect(blocks).toHaveLength(2);
    for (const block of blocks) expect(block).toEqual(palette.dark);
  });
});
