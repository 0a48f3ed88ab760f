import { describe, expect, it } from "vitest";
import { FIGURE_META } from "@/components/figures/figure-meta";
import { FIGURE_NAMES, isFigureName } from "@/components/figures/figure-names";
import { FIGURES } from "@/components/figures/registry";

// The names lessons already use in <Figure name="…"> (content/courses/**/*.mdx); they must stay stable.
const LESSON_NAMES = ["pickup-pattern", "proximity", "two-mics", "distance-level", "direct-box", "phantom-power", "feedback-margin", "noise-dose", "gain-structure"];

describe("figure registry", () => {
  it("registers exactly the nine stable names", () => {
    expect([...FIGURE_NAMES].sort()).toEqual([...LESSON_NAMES].sort());
    expect(Object.keys(FIGURES).sort()).toEqual([...LESSON_NAMES].sort());
  });

  it("gives every figure a title, summary, formula source and a component", () => {
    for (const name of FIGURE_NAMES) {
      const entry = FIGURES[name];
      expect(entry.title.length, name).toBeGreaterThan(3);
      expect(entry.summary.length, name).toBeGreaterThan(20);
      expect(entry.formulaSource.length, name).toBeGreaterThan(10);
      expect(entry.component, name).toBeTruthy();
      expect(FIGURE_META[name].computes.length, name).toBeGreaterThan(40);
    }
  });

  it("cites the published sources the project works from", () => {
    // The published sources of each computation (tests/sources.md).
    expect(FIGURES["pickup-pattern"].formulaSource).toContain("Eargle");
    expect(FIGURES["feedback-margin"].formulaSource).toContain("ch. 34");
    expect(FIGURES["phantom-power"].formulaSource).toContain("IEC 61938");
    expect(FIGURES["noise-dose"].formulaSource).toContain("98-126");
    expect(FIGURES["noise-dose"].formulaSource).toContain("29 CFR 1910.95");
    expect(FIGURES["gain-structure"].formulaSource).toContain("EBU R68");
    expect(FIGURES["gain-structure"].formulaSource).toContain("SMPTE RP 155");
  });

  it("tells figure names from other strings", () => {
    expect(isFigureName("two-mics")).toBe(true);
    expect(isFigureName("polar")).toBe(false);
    expect(isFigureName("")).toBe(false);
  });
});
