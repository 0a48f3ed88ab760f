// Splits a lesson file into its YAML frontmatter and its MDX body. Pure (no filesystem).
// `yaml` arrives with next-mdx-remote (vfile-matter); it is the same parser it uses.
import { parse as parseYaml } from "yaml";

export type SplitLesson = {
  data: unknown;
  body: string;
  /** 1-based line in the file where the body starts, so body positions map back to file lines. */
  bodyStartLine: number;
};

export class FrontmatterError extends Error {}

export function splitFrontmatter(source: string): SplitLesson {
  const text = source.replace(/^\uFEFF/, "");
  const match = /^---\r?\n([\s\S]*?)\r?\n---[ \t]*(?:\r?\n|$)/.exec(text);
  if (!match) throw new FrontmatterError("the file must start with YAML frontmatter between --- lines");
  let data: unknown;
  try {
    data = parseYaml(match[1]);
  } catch (err) {
    throw new FrontmatterError(`frontmatter is not valid YAML: ${(err as Error).message}`);
  }
  const bodyStartLine = match[0].split("\n").length - (match[0].endsWith("\n") ? 0 : 1);
  return { data, body: text.slice(match[0].length), bodyStartLine };
}
