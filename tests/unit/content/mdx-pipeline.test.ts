// The shared MDX pipeline: frontmatter split, heading ids for the table of contents, glossary
// definitions on <Term>, and the JSON tree a locked lesson is sent as.
import { describe, expect, it } from "vitest";
import { splitFrontmatter } from "@/lib/content/frontmatter";
import { buildLessonTree } from "@/lib/content/lesson-tree";
import type { LessonTreeElement, LessonTreeNode } from "@/lib/content/lesson-tree-types";
import { countWords, plainText } from "@/lib/content/mdast";
import { collectHeadings, createSlugger, parseLessonBody } from "@/lib/content/mdx-pipeline";

const glossary = new Map([["cardioid", { term: "Cardioid", definition: "A heart-shaped first-order pickup pattern." }]]);

function find(nodes: LessonTreeNode[], tag: string): LessonTreeElement[] {
  const out: LessonTreeElement[] = [];
  const visit = (n: LessonTreeNode) => {
    if (typeof n === "string") return;
    if (n.t === tag) out.push(n);
    n.c?.forEach(visit);
  };
  nodes.forEach(visit);
  return out;
}

describe("splitFrontmatter", () => {
  it("separates YAML from the body and says on which file line the body starts", () => {
    const split = splitFrontmatter("---\nid: les-x\nminutes: 12\n---\n\nFirst line of prose.\n");
    expect(split.data).toEqual({ id: "les-x", minutes: 12 });
    expect(split.body).toBe("\nFirst line of prose.\n");
    // lines 1–4 are the frontmatter, so the body's first line is file line 5
    expect(split.bodyStartLine).toBe(5);
  });

  it("refuses a file without frontmatter and says so", () => {
    expect(() => splitFrontmatter("## Just a heading\n")).toThrow(/must start with YAML frontmatter/);
    expect(() => splitFrontmatter("---\nid: [unclosed\n---\n")).toThrow(/not valid YAML/);
  });
});

describe("heading ids", () => {
  it("slugs like GitHub's heading anchors, numbering repeats", () => {
    // github-slugger behaviour (from memory): lower case, punctuation dropped, spaces to hyphens, -1 for repeats
    const slug = createSlugger();
    expect(slug("Snare top")).toBe("snare-top");
    expect(slug("Bass: DI, microphone, or both")).toBe("bass-di-microphone-or-both");
    expect(slug("The 3:1 practice")).toBe("the-31-practice");
    expect(slug("Snare top")).toBe("snare-top-1");
  });

  it("builds the table of contents from h2 and h3 only, with text from inside components", () => {
    const tree = parseLessonBody(`## Why a <Term id="cardioid">cardioid</Term>?\n\n### Its null\n\n#### Too deep\n\n## Why a cardioid?\n`);
    expect(collectHeadings(tree)).toEqual([
      { depth: 2, text: "Why a cardioid?", id: "why-a-cardioid" },
      { depth: 3, text: "Its null", id: "its-null" },
      { depth: 2, text: "Why a cardioid?", id: "why-a-cardioid-1" },
    ]);
  });
});

describe("buildLessonTree (the locked lesson's body as data)", () => {
  const body = [
    "## Pattern",
    "",
    'A <Term id="cardioid">cardioid</Term> is about 6 dB down at 90°.',
    "",
    '<Figure name="proximity" distanceM={0.05} />',
    "",
    "| angle | level |",
    "| --- | --- |",
    "| 90° | −6 dB |",
    "",
    '<Callout kind="danger" title="Ears">',
    "Wear protection.",
    "</Callout>",
    "",
  ].join("\n");

  it("keeps headings with the same ids as the table of contents", async () => {
    const tree = await buildLessonTree(body, glossary);
    expect(find(tree, "h2")[0]).toEqual({ t: "h2", p: { id: "pattern" }, c: ["Pattern"] });
    expect(collectHeadings(parseLessonBody(body)).map((h) => h.id)).toEqual(["pattern"]);
  });

  it("attaches the glossary definition to each Term, and keeps numeric props as numbers", async () => {
    const tree = await buildLessonTree(body, glossary);
    expect(find(tree, "Term")[0].p).toEqual({ id: "cardioid", term: "Cardioid", definition: "A heart-shaped first-order pickup pattern." });
    expect(find(tree, "Figure")[0].p).toEqual({ name: "proximity", distanceM: 0.05 });
    expect(find(tree, "Callout")[0].p).toEqual({ kind: "danger", title: "Ears" });
  });

  it("drops layout whitespace inside tables (React warns about it)", async () => {
    const tree = await buildLessonTree(body, glossary);
    const table = find(tree, "table")[0];
    expect(table.c?.every((child) => typeof child !== "string")).toBe(true);
    expect(find(tree, "td").map((td) => td.c)).toEqual([["90°"], ["−6 dB"]]);
  });

  it("refuses expressions and imports, which the content contract forbids", async () => {
    await expect(buildLessonTree("Two is {1 + 1}.\n", glossary)).rejects.toThrow(/not allowed/);
    await expect(buildLessonTree('<Figure name="x" a={danger()} />\n', glossary)).rejects.toThrow(/only numeric/);
    await expect(buildLessonTree('import x from "y"\n\nText\n', glossary)).rejects.toThrow(/not allowed/);
  });
});

describe("plain text and word counts", () => {
  it("counts the words a reader reads, not component attributes", () => {
    const tree = parseLessonBody('A <Term id="null">null</Term> sits at 125°.\n\n<Diagram name="drum-kit" caption="not counted" />\n\n- one item\n');
    expect(plainText(tree)).toBe("A null sits at 125°.\none item");
    // hyphenated and decimal tokens are one word each
    expect(countWords("A figure-8 is 0.5 m away, isn't it?")).toBe(8);
  });
});
