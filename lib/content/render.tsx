import "server-only";
// The static lesson body: next-mdx-remote's compileMDX with the components the page hands in
// (components/mdx/registry.ts: lib/ never imports components/). Repo content is trusted, so {…}
// is allowed (numeric props need it, STACK trap 5) but blockDangerousJS stays on.
import type { MDXComponents } from "mdx/types";
import { compileMDX } from "next-mdx-remote/rsc";
import type { ReactElement } from "react";
import { glossaryLookup, type LessonSource } from "./index";
import { lessonRemarkPlugins } from "./mdx-pipeline";

export async function renderLessonBody(lesson: Pick<LessonSource, "body">, components: MDXComponents): Promise<ReactElement> {
  const { content } = await compileMDX({
    source: lesson.body,
    components,
    options: {
      parseFrontmatter: false,
      blockJS: false,
      blockDangerousJS: true,
      mdxOptions: { remarkPlugins: lessonRemarkPlugins(await glossaryLookup()) },
    },
  });
  return content;
}
