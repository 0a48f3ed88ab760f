// A small, self-contained view of the Markdown/MDX syntax tree (mdast + mdast-util-mdx), and the
// few walks the content code needs. Pure: no filesystem, no React.

export type MdxAttribute = {
  type: "mdxJsxAttribute" | "mdxJsxExpressionAttribute";
  name?: string;
  value?: string | null | { type: string; value: string };
};

export type MdNode = {
  type: string;
  children?: MdNode[];
  value?: string;
  depth?: number;
  url?: string;
  name?: string | null;
  attributes?: MdxAttribute[];
  position?: { start: { line: number; column: number }; end: { line: number; column: number } };
  data?: { hProperties?: Record<string, unknown> } & Record<string, unknown>;
};

export const isJsx = (node: MdNode): boolean => node.type === "mdxJsxFlowElement" || node.type === "mdxJsxTextElement";

/** Depth-first, in document order; the visitor gets each node and its ancestors (nearest last). */
export function walk(node: MdNode, visit: (node: MdNode, ancestors: MdNode[]) => void, ancestors: MdNode[] = []): void {
  visit(node, ancestors);
  if (!node.children) return;
  const next = [...ancestors, node];
  for (const child of node.children) walk(child, visit, next);
}

/** The text of a node, as a reader sees it (component attributes are not text). */
export function textOf(node: MdNode): string {
  if (node.type === "text" || node.type === "inlineCode") return node.value ?? "";
  if (!node.children) return "";
  return node.children.map(textOf).join("");
}

const BLOCKS = new Set(["paragraph", "heading", "listItem", "tableRow", "tableCell", "blockquote", "code", "mdxJsxFlowElement", "list", "table"]);

/** Plain text of a whole tree with blocks separated, for search and word counts. */
export function plainText(node: MdNode): string {
  if (node.type === "text" || node.type === "inlineCode") return node.value ?? "";
  if (node.type === "code") return "";
  if (!node.children) return "";
  const sep = node.children.some((child) => BLOCKS.has(child.type)) ? "\n" : "";
  const inner = node.children.map(plainText);
  return (sep ? inner.filter((part) => part !== "") : inner).join(sep);
}

/** Counts words: runs of letters or digits (with inner apostrophes, hyphens, dots and commas). */
export function countWords(text: string): number {
  return text.match(/[\p{L}\p{N}]+(?:['’.,\-–][\p{L}\p{N}]+)*/gu)?.length ?? 0;
}

/** A JSX element's attribute, as written: string, the source of an {expression}, true for a bare name, or undefined. */
export function rawAttribute(node: MdNode, name: string): string | { expression: string } | true | undefined {
  const attribute = node.attributes?.find((a) => a.type === "mdxJsxAttribute" && a.name === name);
  if (!attribute) return undefined;
  if (attribute.value === null || attribute.value === undefined) return true;
  if (typeof attribute.value === "string") return attribute.value;
  return { expression: attribute.value.value };
}

export function stringAttribute(node: MdNode, name: string): string | undefined {
  const value = rawAttribute(node, name);
  return typeof value === "string" ? value : undefined;
}

export type PropValue = string | number | boolean;

/** The props a lesson gives a component. Only strings, bare names and numeric literals are allowed. */
export function jsxProps(node: MdNode): { props: Record<string, PropValue>; errors: string[] } {
  const props: Record<string, PropValue> = {};
  const errors: string[] = [];
  for (const attribute of node.attributes ?? []) {
    if (attribute.type !== "mdxJsxAttribute" || !attribute.name) {
      errors.push(`<${node.name}>: spread attributes are not allowed`);
      continue;
    }
    const value = attribute.value;
    if (value === null || value === undefined) props[attribute.name] = true;
    else if (typeof value === "string") props[attribute.name] = value;
    else if (/^\s*-?\d+(?:\.\d+)?\s*$/.test(value.value)) props[attribute.name] = Number(value.value);
    else errors.push(`<${node.name} ${attribute.name}={${value.value}}>: only numeric {…} props are allowed`);
  }
  return { props, errors };
}

export const lineOf = (node: MdNode): number => node.position?.start.line ?? 0;
