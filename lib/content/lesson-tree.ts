// Builds the JSON tree of a lesson body (see lesson-tree-types.ts) with the same remark plugins
// as the static renderer, so both show the same lesson. Pure: no filesystem, no React.
import { createProcessor } from "@mdx-js/mdx";
import type { LessonTreeNode, LessonTreeProps } from "./lesson-tree-types";
import { jsxProps, type MdNode } from "./mdast";
import { lessonRemarkPlugins, type GlossaryLookup } from "./mdx-pipeline";

type HastNode = MdNode & { tagName?: string; properties?: Record<string, unknown> };

/** Parents whose whitespace-only text children are layout, not content (React warns on them in tables). */
const PHRASING_PARENTS = new Set(["p", "li", "a", "strong", "em", "del", "code", "pre", "td", "th", "h2", "h3", "h4", "h5", "h6", "blockquote"]);

function convertProps(properties: Record<string, unknown> | undefined): LessonTreeProps | undefined {
  if (!properties) return undefined;
  const out: LessonTreeProps = {};
  for (const [key, value] of Object.entries(properties)) {
    if (typeof value === "string" || typeof value === "number" || typeof value === "boolean") out[key] = value;
    else if (Array.isArray(value)) out[key] = value.join(" ");
  }
  return Object.keys(out).length > 0 ? out : undefined;
}

function convertChildren(node: HastNode, keepWhitespace: boolean): LessonTreeNode[] {
  const out: LessonTreeNode[] = [];
  for (const child of node.children ?? []) {
    const converted = convertNode(child as HastNode, keepWhitespace);
    if (converted !== null) out.push(converted);
  }
  return out;
}

function convertNode(node: HastNode, keepWhitespace: boolean): LessonTreeNode | null {
  switch (node.type) {
    case "text": {
      const value = node.value ?? "";
      return !keepWhitespace && value.trim() === "" ? null : value;
    }
    case "element": {
      const tag = node.tagName ?? "div";
      const children = convertChildren(node, PHRASING_PARENTS.has(tag));
      const props = convertProps(node.properties);
      return { t: tag, ...(props ? { p: props } : {}), ...(children.length > 0 ? { c: children } : {}) };
    }
    case "mdxJsxFlowElement":
    case "mdxJsxTextElement": {
      if (!node.name) throw new Error("JSX fragments are not allowed in lessons");
      const { props, errors } = jsxProps(node);
      if (errors.length > 0) throw new Error(errors.join("; "));
      const children = convertChildren(node, node.type === "mdxJsxTextElement");
      return { t: node.name, ...(Object.keys(props).length > 0 ? { p: props } : {}), ...(children.length > 0 ? { c: children } : {}) };
    }
    case "mdxFlowExpression":
    case "mdxTextExpression":
    case "mdxjsEsm":
      throw new Error("expressions, imports and exports are not allowed in lessons");
    default:
      // comments, doctype, raw HTML: lessons have none, and none is passed on.
      return null;
  }
}

/** The lesson body (frontmatter removed) as a JSON tree. Throws on content the contract forbids. */
export async function buildLessonTree(body: string, glossary: GlossaryLookup): Promise<LessonTreeNode[]> {
  let captured: HastNode | undefined;
  const capture = () => (tree: HastNode) => {
    captured = structuredClone(tree);
  };
  const processor = createProcessor({ remarkPlugins: lessonRemarkPlugins(glossary), rehypePlugins: [capture] });
  // Runs the whole chain (it ends in JavaScript, which is dropped); the tree was captured on the way.
  await processor.run(processor.parse(body) as never);
  if (!captured) throw new Error("the MDX pipeline produced no tree");
  return convertChildren(captured, false);
}
