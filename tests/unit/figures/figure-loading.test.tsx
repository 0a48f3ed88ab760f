import { describe, expect, it } from "vitest";
import { FigureLoading } from "@/components/figures/figure-loading";
import { markup } from "./markup";

// WCAG 2.2 SC 1.4.3 (contrast, minimum) holds at every frame of an animation, so the pulse must
// never dim the words: only an aria-hidden background layer may carry it.
describe("figure placeholder", () => {
  const html = markup(<FigureLoading />);

  it("pulses a background layer hidden from assistive tech, never the box that holds the text", () => {
    const elements = [...html.matchAll(/<(div|span)([^>]*)>/g)].map((m) => ({ tag: m[1], attrs: m[2] }));
    const animated = elements.filter((e) => e.attrs.includes("animate-"));
    expect(animated).toHaveLength(1);
    expect(animated[0].attrs).toContain('aria-hidden="true"');
    expect(elements.find((e) => e.attrs.includes('role="status"'))!.attrs).not.toContain("animate-");
  });

  it("says what is loading, in a status region", () => {
    expect(html).toMatch(/role="status"[^>]*>.*Loading the figure…/);
    expect(html).toContain('<span class="relative">Loading the figure…</span>');
  });
});
