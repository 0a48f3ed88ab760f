// The one MDX pipeline every renderer shares (the static lesson page via compileMDX, the locked
// lesson's JSON tree, the content check): GFM, heading ids for the table of contents, and glossary
// definitions attached to each <Term>. Pure: no filesystem, no React.
import { createProcessor, type CompileOptions } from "@mdx-js/mdx";
import remarkGfm from "remark-gfm";
import { isJsx, stringAttribute, textOf, walk, type MdNode } from "./mdast";

export type GlossaryLookup = ReadonlyMap<string, { term: string; definition: string }>;

export type Heading = { depth: 2 | 3; text: string; id: string };

/** GitHub-style heading slugs: lower case, punctuation dropped, spaces to hyphens, repeats numbered. */
export function createSlugger(): (text: string) => string {
  const seen = new Map<string, number>();
  return (text) => {
    const base =
      text
        .toLowerCase()
        .normalize("NFKD")
        .replace(/[\u0300-\u036f]/g, "")
        .replace(/[^\p{L}\p{N}\s-]/gu, "")
        .trim()
        .replace(/\s+/g, "-") || "section";
    const count = seen.get(base) ?? 0;
    seen.set(base, count + 1);
    return count === 0 ? base : `${base}-${count}`;
  };
}

/** Every heading of depth ≥ 2 with its id, in document order (one slugger, so repeats number alike everywhere). */
function headingIds(tree: MdNode): { node: MdNode; text: string; id: string }[] {
  const slug = createSlugger();
  const out: { node: MdNode; text: string; id: string }[] = [];
  walk(tree, (node) => {
    if (node.type !== "heading" || (node.depth ?? 1) < 2) return;
    const text = textOf(node).trim();
    out.push({ node, text, id: slug(text) });
  });
  return out;
}

/** The table of contents: h2 and h3, with the ids the renderers give them. */
export function collectHeadings(tree: MdNode): Heading[] {
  return headingIds(tree)
    .filter(({ node }) => node.depth === 2 || node.depth === 3)
    .map(({ node, text, id }) => ({ depth: node.depth as 2 | 3, text, id }));
}

/** remark plugin: gives each h2…h6 its id (the TOC links to them). */
export function remarkHeadingIds() {
  return (tree: MdNode) => {
    for (const { node, id } of headingIds(tree)) {
      node.data = { ...node.data, hProperties: { ...node.data?.hProperties, id } };
    }
  };
}

/** remark plugin: adds term="…" and definition="…" to each <Term id="…">, from the glossary. */
export function remarkGlossaryTerms(glossary: GlossaryLookup) {
  return () => (tree: MdNode) => {
    walk(tree, (node) => {
      if (!isJsx(node) || node.name !== "Term") return;
      const id = stringAttribute(node, "id");
      const entry = id ? glossary.get(id) : undefined;
      if (!entry) return;
      node.attributes = [
        ...(node.attributes ?? []).filter((a) => a.name !== "term" && a.name !== "definition"),
        { type: "mdxJsxAttribute", name: "term", value: entry.term },
        { type: "mdxJsxAttribute", name: "definition", value: entry.definition },
      ];
    });
  };
}

/** The remark plugins, in order, for compileMDX / evaluate / the tree builder. */
export type RemarkPlugins = NonNullable<CompileOptions["remarkPlugins"]>;

export function lessonRemarkPlugins(glossary: GlossaryLookup): RemarkPlugins {
  // Our plugins take the loose MdNode view of the tree; unified's types want its own Root.
  return [remarkGfm, remarkHeadingIds, remarkGlossaryTerms(glossary)] as unknown as RemarkPlugins;
}

/** Parses a lesson body (frontmatter already removed) into mdast, with GFM and MDX syntax. */
export function parseLessonBody(body: string): MdNode {
  const processor = createProcessor({ remarkPlugins: [remarkGfm] });
  return processor.parse(body) as unknown as MdNode;
}
