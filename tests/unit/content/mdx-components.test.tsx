// Server-rendered markup of our MDX components and of the locked-lesson tree renderer.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { Callout } from "@/components/mdx/callout";
import { KeyTakeaways } from "@/components/mdx/key-takeaways";
import { LessonTree } from "@/components/mdx/lesson-tree";
import { Term } from "@/components/mdx/term";

describe("Callout", () => {
  it("says its kind in words beside the glyph, not by colour alone (WCAG 1.4.1)", () => {
    const html = renderToStaticMarkup(<Callout kind="danger" title="Mains">Leave it to an electrician.</Callout>);
    expect(html).toContain('role="note"');
    expect(html).toMatch(/>Danger<span[^>]*>: Mains<\/span>/);
    expect(html).toContain('aria-hidden="true"');
    for (const [kind, word] of [["note", "Note"], ["tip", "Tip"], ["caution", "Caution"]] as const) {
      expect(renderToStaticMarkup(<Callout kind={kind}>x</Callout>)).toContain(`>${word}</p>`);
    }
  });
});

describe("Term", () => {
  it("links to the glossary entry and is described by its definition (WCAG 1.4.13: present before any hover)", () => {
    const html = renderToStaticMarkup(
      <Term id="null" term="Null" definition="Where pickup is least.">
        null
      </Term>,
    );
    expect(html).toMatch(/<a href="\/glossary#null" aria-describedby="(term-[^"]+)"/);
    const describedBy = /aria-describedby="([^"]+)"/.exec(html)![1];
    expect(html).toContain(`id="${describedBy}" role="tooltip"`);
    // closed: kept for screen readers, not shown
    expect(html).toMatch(/role="tooltip" data-state="closed" class="sr-only"/);
    expect(html).toContain("Where pickup is least.");
  });
});

describe("KeyTakeaways", () => {
  it("is a labelled section with the heading the table of contents links to", () => {
    const html = renderToStaticMarkup(<KeyTakeaways>x</KeyTakeaways>);
    expect(html).toContain('aria-labelledby="key-takeaways"');
    expect(html).toMatch(/<h2 id="key-takeaways"[^>]*>.*Key takeaways<\/h2>/);
  });
});

describe("LessonTree", () => {
  it("draws known tags and components from the JSON tree", () => {
    const html = renderToStaticMarkup(
      <LessonTree nodes={[{ t: "h2", p: { id: "kick" }, c: ["Kick"] }, { t: "p", c: ["Aim the ", { t: "strong", c: ["null"] }, "."] }, { t: "Callout", p: { kind: "tip" }, c: ["Listen first."] }]} />,
    );
    expect(html).toContain('<h2 id="kick">Kick</h2>');
    expect(html).toContain("<p>Aim the <strong>null</strong>.</p>");
    expect(html).toContain(">Tip</p>");
  });

  it("never passes scripts, event handlers, styles or unsafe links through", () => {
    const html = renderToStaticMarkup(
      <LessonTree
        nodes={[
          { t: "script", c: ["alert(1)"] },
          { t: "a", p: { href: "javascript:alert(1)", onclick: "x", style: "color:red" }, c: ["bad link"] },
          { t: "a", p: { href: "//evil.example/x" }, c: ["protocol-relative"] },
          { t: "a", p: { href: "/glossary#null" }, c: ["good link"] },
          { t: "iframe", p: { src: "https://x" } },
        ]}
      />,
    );
    expect(html).not.toMatch(/<script|<iframe|javascript:|onclick|style=|evil\.example/);
    // unknown tags drop out but their text stays
    expect(html).toContain("alert(1)");
    expect(html).toContain("<a>bad link</a>");
    expect(html).toContain('<a href="/glossary#null">good link</a>');
  });
});
