// The content check's rules for one lesson (scripts/content-check.ts runs them on every lesson).
// Pure: the names that are valid come in through CheckContext, so this file depends on no
// registry. Lines are file lines (1-based).
import { countWords, isJsx, jsxProps, lineOf, plainText, stringAttribute, walk, type MdNode } from "./mdast";
import { safetyProblems } from "./safety-checks";

export const MIN_LESSON_WORDS = 500;

export type CheckContext = {
  glossaryIds: ReadonlySet<string>;
  figureNames: ReadonlySet<string>;
  /** Diagram name → its position ids. */
  diagramPositions: ReadonlyMap<string, readonly string[]>;
  /** Lesson id → course slug, for every lesson. */
  lessonCourse: ReadonlyMap<string, string>;
  courseSlugs: ReadonlySet<string>;
  componentNames: ReadonlySet<string>;
  calloutKinds: ReadonlySet<string>;
  /** The safety topics a lesson may be tagged with (and a callout's `hazard` may name). */
  safetyTopics: ReadonlySet<string>;
};

export type LineProblem = { line: number; message: string };

export type CheckedLesson = {
  body: string;
  bodyStartLine: number;
  figures: readonly string[];
  safety: readonly string[];
};

/** Why an internal link does not resolve, or null when it does. External (https:, mailto:) links pass. */
export function internalLinkProblem(url: string, ctx: CheckContext): string | null {
  if (/^(https:|mailto:)/.test(url)) return null;
  if (/^http:/.test(url)) return `link "${url}" must use https`;
  if (url.startsWith("#")) return null;
  const [path, hash] = url.split("#", 2);
  if (path === "/courses" || path === "/glossary" || path === "/bench" || path === "/search") {
    if (path === "/glossary" && hash !== undefined && !ctx.glossaryIds.has(hash)) return `link "${url}": no glossary term "${hash}"`;
    return null;
  }
  const course = /^\/courses\/([^/]+)(?:\/([^/]+))?$/.exec(path);
  if (course) {
    const [, courseSlug, lessonId] = course;
    if (!ctx.courseSlugs.has(courseSlug)) return `link "${url}": no course "${courseSlug}"`;
    if (lessonId === undefined) return null;
    const owner = ctx.lessonCourse.get(lessonId);
    if (!owner) return `link "${url}": no lesson "${lessonId}" (links use lesson ids)`;
    if (owner !== courseSlug) return `link "${url}": lesson "${lessonId}" belongs to course "${owner}"`;
    return null;
  }
  const bench = /^\/bench\/([^/]+)$/.exec(path);
  if (bench) return ctx.figureNames.has(bench[1]) ? null : `link "${url}": no figure "${bench[1]}" on the Bench`;
  return `link "${url}" does not resolve (use /courses/<course>/<lesson-id>, /glossary#<term>, /bench/<figure>)`;
}

// Letters followed by digits, like a product's model number ("Tok-00"). Trade and standard names
// that look the same are allowed: phantom-power variants (IEC 61938) and AES standard numbers.
const MODEL_NUMBER = /\b[A-Z][A-Za-z]{0,3}-?\d{2,5}[A-Za-z]{0,2}\b/g;
const ALLOWED_CODES = /^(?:S?P(?:12L?|24|48)|AES\d+|IEC\d+|ISO\d+|EN\d+)$/;

/** Things in a text that look like brand model numbers. */
export function modelNumberProblems(text: string, firstLine = 1): LineProblem[] {
  const problems: LineProblem[] = [];
  text.split("\n").forEach((line, index) => {
    for (const match of line.matchAll(MODEL_NUMBER)) {
      if (!ALLOWED_CODES.test(match[0])) problems.push({ line: firstLine + index, message: `"${match[0]}" looks like a product model number: describe the equipment generically` });
    }
  });
  return problems;
}

function checkComponent(node: MdNode, ctx: CheckContext, used: Set<string>): string[] {
  const name = node.name ?? "";
  if (!name) return ["JSX fragments (<>…</>) are not allowed"];
  if (!ctx.componentNames.has(name)) return [`unknown component <${name}> (allowed: ${[...ctx.componentNames].join(", ")})`];
  const out = jsxProps(node).errors;
  const attr = (key: string) => stringAttribute(node, key);
  switch (name) {
    case "Callout":
      if (!ctx.calloutKinds.has(attr("kind") ?? "")) out.push(`<Callout kind="${attr("kind") ?? ""}">: kind must be one of ${[...ctx.calloutKinds].join(", ")}`);
      break;
    case "Figure": {
      const figure = attr("name") ?? "";
      if (!ctx.figureNames.has(figure)) out.push(`<Figure name="${figure}">: no such figure (known: ${[...ctx.figureNames].join(", ")})`);
      used.add(figure);
      break;
    }
    case "Diagram": {
      const diagram = attr("name") ?? "";
      const positions = ctx.diagramPositions.get(diagram);
      if (!positions) out.push(`<Diagram name="${diagram}">: no such diagram (known: ${[...ctx.diagramPositions.keys()].join(", ")})`);
      for (const id of (attr("highlight") ?? "").split(",").map((s) => s.trim()).filter(Boolean)) {
        if (positions && !positions.includes(id)) out.push(`<Diagram name="${diagram}">: no position "${id}" (known: ${positions.join(", ")})`);
      }
      used.add(diagram);
      break;
    }
    case "Term": {
      const id = attr("id") ?? "";
      if (!ctx.glossaryIds.has(id)) out.push(`<Term id="${id}">: not in content/glossary.json`);
      if (plainText(node).trim() === "") out.push(`<Term id="${id}"> needs the words to show`);
      break;
    }
  }
  return out;
}

function sameSet(a: Iterable<string>, b: Iterable<string>): { missing: string[]; extra: string[] } {
  const left = new Set(a);
  const right = new Set(b);
  return { missing: [...right].filter((x) => !left.has(x)), extra: [...left].filter((x) => !right.has(x)) };
}

/** Every rule of the content contract that can be checked on one lesson's parsed body (model numbers: run modelNumberProblems on the whole file). */
export function checkLessonTree(lesson: CheckedLesson, tree: MdNode, ctx: CheckContext): LineProblem[] {
  const problems: LineProblem[] = [];
  const at = (node: MdNode | undefined, message: string) => problems.push({ line: (node ? lineOf(node) || 1 : 1) + lesson.bodyStartLine - 1, message });
  const usedFigures = new Set<string>();
  const callouts: MdNode[] = [];
  let takeaways = 0;

  walk(tree, (node) => {
    if (isJsx(node)) {
      for (const message of checkComponent(node, ctx, usedFigures)) at(node, message);
      if (node.name === "KeyTakeaways") takeaways += 1;
      if (node.name === "Callout") callouts.push(node);
    } else if (node.type === "mdxFlowExpression" || node.type === "mdxTextExpression") {
      at(node, "{…} expressions are not allowed (only numeric props)");
    } else if (node.type === "mdxjsEsm") {
      at(node, "imports and exports are not allowed");
    } else if (node.type === "html") {
      at(node, "raw HTML is not allowed");
    } else if (node.type === "heading" && node.depth === 1) {
      at(node, "no # h1 in a lesson: the title comes from the frontmatter");
    } else if (node.type === "link" && node.url !== undefined) {
      const problem = internalLinkProblem(node.url, ctx);
      if (problem) at(node, problem);
    } else if (node.type === "image") {
      at(node, "images are not allowed: use <Figure> or <Diagram>");
    }
  });

  const blocks = (tree.children ?? []).filter((n) => !(n.type === "text" && !(n.value ?? "").trim()));
  const last = blocks[blocks.length - 1];
  if (takeaways !== 1) at(undefined, `must have exactly one <KeyTakeaways> (found ${takeaways})`);
  else if (!last || !isJsx(last) || last.name !== "KeyTakeaways") at(last, "must end with <KeyTakeaways>");

  const { missing, extra } = sameSet(lesson.figures, usedFigures);
  if (missing.length > 0) at(undefined, `frontmatter figures is missing ${missing.join(", ")} (used in the body)`);
  if (extra.length > 0) at(undefined, `frontmatter figures lists ${extra.join(", ")}, which the body does not use`);

  const words = countWords(plainText(tree));
  if (words < MIN_LESSON_WORDS) at(undefined, `only ${words} words of prose (at least ${MIN_LESSON_WORDS})`);
  // Hazard props, tags and deferral wording (safety-checks.ts); its lines are body lines.
  for (const p of safetyProblems(lesson.safety, callouts, ctx.safetyTopics)) problems.push({ line: p.line + lesson.bodyStartLine - 1, message: p.message });
  return problems;
}
