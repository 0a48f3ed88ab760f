import "server-only";
// The static lesson body: next-mdx-remote's compileMDX with our components. Repo content is
// trusted, so {…} is allowed (numeric props need it, STACK trap 5) but blockDangerousJS stays on.
import { compileMDX } from "next-mdx-remote/rsc";
import type { ReactElement } from "react";
import { MDX_COMPONENTS } from "@/components/mdx/registry";
import { glossaryLookup, type LessonSource } from "./index";
import { lessonRemarkPlugins } from "./mdx-pipeline";

export async function renderLessonBody(lesson: Pick<LessonSource, "body">): Promise<ReactElement> {
  const { content } = await compileMDX({
    source: lesson.body,
    components: MDX_COMPONENTS,
    options: {
      parseFrontmatter: false,
      blockJS: false,
      blockDangerousJS: true,
      mdxOptions: { remarkPlugins: lessonRemarkPlugins(await glossaryLookup()) },
    },
  });
  return content;
}
