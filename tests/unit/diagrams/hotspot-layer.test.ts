// The quiz hotspot overlay, rendered on the server: a radiogroup of letter-named radios that
// sit on the registry's hotspots, with one tab stop (roving tabindex).
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { DiagramHotspot } from "@/components/diagrams/hotspot-layer";
import { DIAGRAMS } from "@/components/diagrams/registry";

const noop = () => {};

describe("DiagramHotspot", () => {
  it("renders one radio per selectable position inside a labelled radiogroup", () => {
    const markup = renderToStaticMarkup(
      createElement(DiagramHotspot, { name: "guitar-cabinet", label: "Where is the mic darkest?", onSelect: noop }),
    );
    expect(markup).toContain('role="radiogroup"');
    expect(markup).toContain('aria-label="Where is the mic darkest?"');
    expect([...markup.matchAll(/role="radio"/g)].length).toBe(DIAGRAMS["guitar-cabinet"].positions.length);
    // Names would give the answer away: targets are named by letter, and the drawing shows letters.
    expect(markup).toContain('aria-label="Position A"');
    expect(markup).not.toContain(">Cone edge</text>");
    // Only one target is in the tab order.
    expect([...markup.matchAll(/tabindex="0"/gi)].length).toBe(1);
    // Targets are never smaller than 24 px (WCAG 2.2, 2.5.8 target size minimum).
    expect(markup).toContain("width:max(24px,");
  });

  it("limits targets to the selectable ids and reflects the selection", () => {
    const markup = renderToStaticMarkup(
      createElement(DiagramHotspot, {
        name: "drum-kit",
        label: "Pick the snare bottom position",
        selectableIds: ["snare-top", "snare-bottom", "hihat"],
        selectedId: "snare-bottom",
        onSelect: noop,
      }),
    );
    expect([...markup.matchAll(/role="radio"/g)].length).toBe(3);
    expect(markup).toMatch(/aria-checked="true"[^>]*data-position-id="snare-bottom"/);
    expect(markup).toMatch(/data-position-id="snare-bottom" data-highlighted="true"/);
    expect(markup).toMatch(/aria-checked="true"[^>]*tabindex="0"|tabindex="0"[^>]*aria-checked="true"/i);
  });
});
