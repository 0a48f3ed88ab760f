// Draws a lesson body from its JSON tree (lib/content/lesson-tree-types.ts) with our MDX
// components. Only known tags and components are drawn, and only plain attributes are passed, so
// a tree can never inject script, styles or event handlers.
import { createElement, Fragment, type ReactNode } from "react";
import type { LessonTreeNode, LessonTreeProps } from "@/lib/content/lesson-tree-types";
import { MDX_COMPONENTS, isMdxComponentName } from "./registry";

const TAGS = new Set([
  "p", "h2", "h3", "h4", "h5", "h6", "ul", "ol", "li", "strong", "em", "del", "a", "code", "pre", "blockquote",
  "table", "thead", "tbody", "tfoot", "tr", "th", "td", "hr", "br", "sup", "sub", "span", "div", "section", "input",
]);

const VOID_TAGS = new Set(["hr", "br", "input"]);

/** hast property names that React spells the same way and that are safe on any of TAGS. */
const ATTRIBUTES = new Set(["id", "className", "title", "align", "start", "colSpan", "rowSpan", "checked", "disabled", "type"]);

function safeHref(href: unknown): string | undefined {
  if (typeof href !== "string") return undefined;
  return /^(\/(?!\/)|#|https:\/\/|mailto:)/.test(href) ? href : undefined;
}

function htmlProps(tag: string, props: LessonTreeProps | undefined, key: number): Record<string, unknown> {
  const out: Record<string, unknown> = { key };
  for (const [name, value] of Object.entries(props ?? {})) if (ATTRIBUTES.has(name)) out[name] = value;
  if (tag === "a") out.href = safeHref(props?.href);
  if (tag === "input") {
    // GFM task-list boxes are read-only marks, as in the static page.
    if (out.type !== "checkbox") return { key };
    out.readOnly = true;
    out.disabled = true;
  }
  return out;
}

function renderNode(node: LessonTreeNode, key: number): ReactNode {
  if (typeof node === "string") return node;
  const children = node.c?.map(renderNode);
  if (isMdxComponentName(node.t)) {
    return createElement(MDX_COMPONENTS[node.t] as (props: object) => ReactNode, { ...node.p, key } as object, children);
  }
  if (TAGS.has(node.t)) {
    return VOID_TAGS.has(node.t) ? createElement(node.t, htmlProps(node.t, node.p, key)) : createElement(node.t, htmlProps(node.t, node.p, key), children);
  }
  return createElement(Fragment, { key }, children);
}

export function LessonTree({ nodes }: { nodes: LessonTreeNode[] }) {
  return <>{nodes.map(renderNode)}</>;
}
