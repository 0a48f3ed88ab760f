// Diagram registry and server rendering. The registry is the single source for marks and hotspots,
// so these checks keep the data well formed and the rendered SVG accessible and in step with it.
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { Diagram } from "@/components/diagrams/diagram";
import { parseHighlight, unknownHighlightIds } from "@/components/diagrams/highlight";
import { LABEL_FONT_SIZE, NOTE_FONT_SIZE } from "@/components/diagrams/palette";
import {
  DIAGRAM_NAMES,
  DIAGRAM_POSITION_IDS,
  DIAGRAMS,
  findPosition,
  isDiagramName,
  isInsideHotspot,
  type DiagramName,
} from "@/components/diagrams/registry";

// The names and position ids lessons may use: the content contract for <Diagram> (content/ lessons).
const CONTRACT_POSITION_IDS: Record<DiagramName, string[]> = {
  "drum-kit": [
    "kick-inside", "kick-outside", "snare-top", "snare-bottom", "hihat",
    "tom-rack", "tom-floor", "overhead-left", "overhead-right",
  ],
  "grand-piano": ["pair-low", "pair-high", "single-centre", "lid-closed-boundary"],
  "guitar-cabinet": ["cone-centre", "cone-edge", "off-axis"],
  "stage-plan": ["vocal-centre", "wedge-centre", "drum-riser", "bass-rig", "guitar-rig", "keys-rig", "stage-box"],
};

/** Narrowest width the drawings must work at, CSS px (the product's smallest layout). */
const NARROW_WIDTH_PX = 320;
/** Minimum target size, CSS px (WCAG 2.2 success criterion 2.5.8, target size minimum). */
const MIN_TARGET_PX = 24;

function render(element: Parameters<typeof renderToStaticMarkup>[0]): string {
  return renderToStaticMarkup(element);
}

function countMatches(text: string, pattern: RegExp): number {
  return [...text.matchAll(pattern)].length;
}

function highlightedIds(markup: string): string[] {
  return [...markup.matchAll(/data-position-id="([^"]+)" data-highlighted="true"/g)].map((match) => match[1]);
}

describe("diagram registry data", () => {
  it("lists exactly the diagrams of the content contract", () => {
    expect([...DIAGRAM_NAMES].sort()).toEqual(Object.keys(CONTRACT_POSITION_IDS).sort());
    expect(isDiagramName("drum-kit")).toBe(true);
    expect(isDiagramName("drum-kits")).toBe(false);
  });

  describe.each(DIAGRAM_NAMES)("%s", (name) => {
    const spec = DIAGRAMS[name];
    const { width, height } = spec.viewBox;

    it("has a title, a text alternative and at least three positions", () => {
      expect(spec.title.trim().length).toBeGreaterThan(10);
      expect(spec.description.trim().length).toBeGreaterThan(80);
      expect(spec.positions.length).toBeGreaterThanOrEqual(3);
    });

    it("keeps labels at least 10 px and notes at least 8 px tall when drawn 320 px wide", () => {
      // common practice: body-adjacent labels of about 10 px stay legible on phones
      expect((LABEL_FONT_SIZE * NARROW_WIDTH_PX) / width).toBeGreaterThanOrEqual(10);
      expect((NOTE_FONT_SIZE * NARROW_WIDTH_PX) / width).toBeGreaterThanOrEqual(8);
    });

    it("has unique position ids that match the content contract and the typed id list", () => {
      const ids = spec.positions.map((position) => position.id);
      expect(new Set(ids).size).toBe(ids.length);
      expect(ids).toEqual(CONTRACT_POSITION_IDS[name]);
      expect(ids).toEqual([...DIAGRAM_POSITION_IDS[name]]);
    });

    it("keeps every hotspot circle and label point inside the viewBox", () => {
      for (const position of spec.positions) {
        expect(position.r).toBeGreaterThan(0);
        expect(position.x - position.r).toBeGreaterThanOrEqual(0);
        expect(position.y - position.r).toBeGreaterThanOrEqual(0);
        expect(position.x + position.r).toBeLessThanOrEqual(width);
        expect(position.y + position.r).toBeLessThanOrEqual(height);
        expect(position.labelX).toBeGreaterThanOrEqual(0);
        expect(position.labelX).toBeLessThanOrEqual(width);
        expect(position.labelY).toBeGreaterThan(0);
        expect(position.labelY).toBeLessThanOrEqual(height);
      }
    });

    it("has hotspots that do not overlap, even as 24 px minimum targets at 320 px wide", () => {
      const pxPerUnit = NARROW_WIDTH_PX / width;
      spec.positions.forEach((a, index) => {
        for (const b of spec.positions.slice(index + 1)) {
          const distance = Math.hypot(a.x - b.x, a.y - b.y);
          expect(distance, `${a.id} vs ${b.id}`).toBeGreaterThanOrEqual(a.r + b.r);
          expect(distance * pxPerUnit, `${a.id} vs ${b.id} at 320 px`).toBeGreaterThanOrEqual(MIN_TARGET_PX);
        }
      });
    });

    it("has labels and details for every position, with no model-number-like tokens", () => {
      const modelNumberLike = /\b[A-Za-z]{1,4}-?\d{2,}[A-Za-z]*\b/; // project rule: no product or model names
      const texts = [spec.title, spec.description, ...spec.positions.flatMap((p) => [p.label, p.detail])];
      for (const text of texts) {
        expect(text.trim().length).toBeGreaterThan(0);
        expect(text).not.toMatch(modelNumberLike);
      }
    });
  });

  it("finds positions and tests points against hotspots (for graders of click answers)", () => {
    const kickInside = findPosition("drum-kit", "kick-inside");
    expect(kickInside).toBeDefined();
    if (!kickInside) return;
    expect(isInsideHotspot(kickInside, kickInside.x, kickInside.y)).toBe(true);
    expect(isInsideHotspot(kickInside, kickInside.x + kickInside.r, kickInside.y)).toBe(true);
    expect(isInsideHotspot(kickInside, kickInside.x + kickInside.r + 1, kickInside.y)).toBe(false);
    expect(findPosition("drum-kit", "no-such-position")).toBeUndefined();
  });
});

describe("highlight parsing", () => {
  it("accepts comma-separated strings from MDX and arrays, trimming and de-duplicating", () => {
    expect(parseHighlight("kick-inside, snare-top,,kick-inside")).toEqual(["kick-inside", "snare-top"]);
    expect(parseHighlight(["hihat", " tom-rack "])).toEqual(["hihat", "tom-rack"]);
    expect(parseHighlight(undefined)).toEqual([]);
    expect(parseHighlight("")).toEqual([]);
  });

  it("reports ids that are not positions of the diagram", () => {
    expect(unknownHighlightIds("kick-inside,snare-tpo", DIAGRAM_POSITION_IDS["drum-kit"])).toEqual(["snare-tpo"]);
  });
});

describe("server-rendered diagrams", () => {
  describe.each(DIAGRAM_NAMES)("%s", (name) => {
    const spec = DIAGRAMS[name];

    it("renders an accessible, scalable SVG with one mark per position", () => {
      const markup = render(createElement(Diagram, { name }));
      expect(countMatches(markup, /<svg\b/g)).toBe(1);
      expect(markup).toContain('role="img"');
      expect(markup).toContain(`viewBox="0 0 ${spec.viewBox.width} ${spec.viewBox.height}"`);
      expect(markup).toContain('width="100%"');
      expect(markup).toMatch(/<title id="[^"]+">[^<]+<\/title>/);
      expect(markup).toMatch(/<desc id="[^"]+">[^<]+<\/desc>/);
      const labelledBy = markup.match(/aria-labelledby="([^"]+)"/)?.[1] ?? "";
      for (const id of labelledBy.split(" ")) expect(markup).toContain(`id="${id}"`);
      expect(countMatches(markup, /data-position-id="/g)).toBe(spec.positions.length);
      for (const position of spec.positions) {
        expect(markup).toContain(`data-position-id="${position.id}"`);
        expect(markup).toContain(`>${position.label}</text>`);
      }
      expect(highlightedIds(markup)).toEqual([]);
      expect(markup).toContain("currentColor");
      expect(markup).toContain("var(--color-accent, #c2410c)");
      expect(markup).not.toContain("<figure");
    });

    it("marks the requested ids as highlighted, from a string or an array", () => {
      const [first, , third] = spec.positions.map((position) => position.id);
      const fromString = render(createElement(Diagram, { name, highlight: `${first}, ${third}, not-a-position` }));
      expect(highlightedIds(fromString)).toEqual([first, third]);
      const fromArray = render(createElement(Diagram, { name, highlight: [third] }));
      expect(highlightedIds(fromArray)).toEqual([third]);
      // Highlighted marks differ in shape (a diamond), not only in colour.
      expect(countMatches(fromArray, /<polygon points="0,-10 10,0 0,10 -10,0"/g)).toBe(1);
    });

    it("wraps the drawing in a figure with a caption when one is given", () => {
      const markup = render(createElement(Diagram, { name, caption: "Positions used at the Kestrel Bay spring class" }));
      expect(markup).toMatch(/^<figure[^>]*><svg/);
      expect(markup).toContain("<figcaption>Positions used at the Kestrel Bay spring class</figcaption>");
    });

    it("in letters mode shows letters and keeps position names out of the text alternative", () => {
      const markup = render(createElement(Diagram, { name, labelMode: "letters" }));
      const desc = markup.match(/<desc id="[^"]+">([^<]+)<\/desc>/)?.[1] ?? "";
      for (const position of spec.positions) expect(desc).not.toContain(position.label);
      expect(markup).toContain(">A</text>");
      expect(countMatches(markup, /data-position-id="/g)).toBe(spec.positions.length);
    });
  });

  it("gives two instances with different props different element ids, and honours an explicit prefix", () => {
    const plain = render(createElement(Diagram, { name: "drum-kit" }));
    const lit = render(createElement(Diagram, { name: "drum-kit", highlight: "hihat" }));
    const titleId = (markup: string) => markup.match(/<title id="([^"]+)"/)?.[1];
    expect(titleId(plain)).not.toBe(titleId(lit));
    const fixed = render(createElement(Diagram, { name: "drum-kit", idPrefix: "lesson-kit" }));
    expect(titleId(fixed)).toBe("lesson-kit-title");
  });

  it("draws only the requested positions when onlyPositions is given", () => {
    const markup = render(createElement(Diagram, { name: "drum-kit", onlyPositions: ["hihat", "tom-floor"] }));
    expect(countMatches(markup, /data-position-id="/g)).toBe(2);
  });

  it("throws on an unknown diagram name so content checks catch typos", () => {
    expect(() => render(createElement(Diagram, { name: "drum-kitt" }))).toThrow(/Unknown diagram "drum-kitt"/);
  });
});
