// npm run content:check — content is checked like code (STYLE habit 15).
//   Every course.json, lesson frontmatter and content/glossary.json parses (zod); lesson ids are
//   unique; every <Figure>/<Diagram> name, diagram position, <Term> id and internal link resolves;
//   frontmatter `figures` matches the body; each lesson has ≥ 500 words and ends with
//   <KeyTakeaways>; nothing looks like a product model number; every lesson compiles
//   (next-mdx-remote compileMDX) and renders with our components both ways the player shows it
//   (static MDX, and the JSON tree of a locked lesson), with the same text.
//   Safety (lib/content/safety-checks.ts): every caution or danger <Callout> names its hazard
//   (hazard="<safety topic>[, …]", each one of the lesson's `safety` tags), every tag has such a
//   callout, and every such callout defers to local codes, venue rules or licensed practice.
//   Every question bank (content/banks/<course>/*.json) parses, and no surface feature gives a key
//   away (lib/content/bank-checks.ts): the key is the longest option in at most 35 % of a bank's
//   single-choice items and sits in no authored position more than its fair share; no item repeats
//   another; at most three items of a bank share a generator; ordering items ask for the physics'
//   or the safety reason's order, not the lesson's wording.
//   Every placement brief (content/briefs/*.json) parses and names a lesson of its course; each
//   safety note defers as a callout must (lib/content/brief-checks.ts). The scenario
//   (content/scenario/lantern-room.json) parses against lib/content/scenario-schema.ts.
//   Option: --dir <folder> checks another content folder instead of ./content.
// Prints one line per problem as file:line, then a summary and "N passed, M failed"; exits 1 on any problem.
//
// Runs under `--conditions=react-server` (for server-only modules). React's server build cannot
// render client components, so the render step re-runs this file in a child process without it.
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

const RENDER_FLAG = "--render-worker";

type Problem = { file: string; line: number; message: string };

type RenderJob = { id: string; file: string; bodyStartLine: number; body: string; headingIds: string[] };
type RenderInput = { lessons: RenderJob[]; glossary: [string, { term: string; definition: string }][] };
type RenderOutput = { problems: Problem[] };

const RESULT_MARK = "@@content-check-result@@";

if (process.argv.includes(RENDER_FLAG)) {
  renderWorker().catch((err) => {
    console.error(err);
    process.exit(2);
  });
} else {
  main().then(
    (code) => process.exit(code),
    (err) => {
      console.error(err);
      process.exit(2);
    },
  );
}

/**
 * The scenario is read without a parse at run time (lib/content/scenario.ts, so the browser loads
 * no zod for it): this is the check that stops invalid data before a build ships it.
 */
async function checkScenarioFile(file: string): Promise<Problem[]> {
  if (!fs.existsSync(file)) return [];
  const { scenarioSchema } = await import("@/lib/content/scenario-schema");
  const shown = path.relative(process.cwd(), file);
  let data: unknown;
  try {
    data = JSON.parse(fs.readFileSync(file, "utf8"));
  } catch (err) {
    return [{ file: shown, line: 1, message: `is not JSON: ${err instanceof Error ? err.message : String(err)}` }];
  }
  const parsed = scenarioSchema.safeParse(data);
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) => ({ file: shown, line: 1, message: `${issue.path.join(".") || "(root)"}: ${issue.message}` }));
}

async function main(): Promise<number> {
  const { readContent } = await import("@/lib/content/read");
  const { checkLessonTree, modelNumberProblems } = await import("@/lib/content/lesson-checks");
  const { parseLessonBody, lessonRemarkPlugins } = await import("@/lib/content/mdx-pipeline");
  const { FIGURE_NAMES } = await import("@/components/figures/figure-names");
  const { DIAGRAM_POSITION_IDS } = await import("@/components/diagrams/registry");
  const { CALLOUT_KINDS } = await import("@/components/mdx/callout");
  const { compileMDX } = await import("next-mdx-remote/rsc");
  const { SAFETY_TOPICS } = await import("@/lib/content/schemas");

  const started = Date.now();
  // --dir <folder>: check another content folder (used to test this script on broken copies).
  const dirFlag = process.argv.indexOf("--dir");
  const contentDir = path.resolve(dirFlag > 0 ? process.argv[dirFlag + 1] : "content");
  const index = await readContent(contentDir);
  const problems: Problem[] = [...index.problems];
  const lessons = index.allLessons;
  const ctx = {
    glossaryIds: new Set(index.glossary.map((g) => g.id)),
    figureNames: new Set<string>(FIGURE_NAMES),
    diagramPositions: new Map<string, readonly string[]>(Object.entries(DIAGRAM_POSITION_IDS)),
    lessonCourse: new Map(lessons.map((l) => [l.id, l.courseSlug])),
    courseSlugs: new Set(index.courses.map((c) => c.slug)),
    // The names lessons may use (components/mdx/registry.ts); listed here so this process never loads client components.
    componentNames: new Set(["Callout", "Figure", "Diagram", "Term", "KeyTakeaways", "Checklist", "InputList", "Ch"]),
    calloutKinds: new Set<string>(CALLOUT_KINDS),
    safetyTopics: new Set<string>(SAFETY_TOPICS),
  };

  // Course files: the first lesson of each course is the free preview, and only it.
  for (const course of index.courses) {
    const ordered = course.modules.flatMap((m) => m.lessons);
    ordered.forEach((lesson, i) => {
      if (i === 0 && !lesson.preview) problems.push({ file: lesson.file, line: 2, message: "the first lesson of a course must be preview: true" });
      if (i > 0 && lesson.preview) problems.push({ file: lesson.file, line: 2, message: "only the first lesson of a course is a free preview (preview: false)" });
    });
    const text = fs.readFileSync(path.join(process.cwd(), course.file), "utf8");
    for (const p of modelNumberProblems(text)) problems.push({ file: course.file, ...p });
  }
  const glossaryFile = path.relative(process.cwd(), path.join(contentDir, "glossary.json"));
  const glossaryText = fs.existsSync(glossaryFile) ? fs.readFileSync(glossaryFile, "utf8") : "";
  for (const p of modelNumberProblems(glossaryText)) problems.push({ file: glossaryFile, ...p });

  const glossary = new Map(index.glossary.map((g) => [g.id, { term: g.term, definition: g.definition }]));
  for (const lesson of lessons) {
    const tree = parseLessonBody(lesson.body);
    for (const p of checkLessonTree(lesson, tree, ctx)) problems.push({ file: lesson.file, ...p });
    const source = fs.readFileSync(path.join(process.cwd(), lesson.file), "utf8");
    for (const p of modelNumberProblems(source)) problems.push({ file: lesson.file, ...p });
    try {
      await compileMDX({
        source: lesson.body,
        options: { blockJS: false, blockDangerousJS: true, mdxOptions: { remarkPlugins: lessonRemarkPlugins(glossary) } },
      });
    } catch (err) {
      const message = (err as Error).message.split("\n")[0];
      const line = Number(/\((\d+):\d+/.exec(message)?.[1] ?? 1);
      problems.push({ file: lesson.file, line: line + lesson.bodyStartLine - 1, message: `does not compile: ${message}` });
    }
  }

  problems.push(...(await checkBankFiles(contentDir)));
  problems.push(...(await checkScenarioFile(path.join(contentDir, "scenario", "lantern-room.json"))));

  // Placement briefs (lib/content/brief-checks.ts): zod contract, lesson in the course, safety deferrals.
  const { readBriefFiles } = await import("@/lib/content/briefs");
  const { checkBriefFiles } = await import("@/lib/content/brief-checks");
  const briefCheck = checkBriefFiles(await readBriefFiles(path.join(contentDir, "briefs")), ctx.lessonCourse);
  problems.push(...briefCheck.problems);

  problems.push(...runRenderWorker({ lessons: lessons.map((l) => ({ id: l.id, file: l.file, bodyStartLine: l.bodyStartLine, body: l.body, headingIds: l.headings.map((h) => h.id) })), glossary: [...glossary] }));

  problems.sort((a, b) => a.file.localeCompare(b.file) || a.line - b.line);
  for (const p of problems) console.log(`${p.file}:${p.line} ${p.message}`);
  const failedFiles = new Set(problems.map((p) => p.file));
  const failedLessons = lessons.filter((l) => failedFiles.has(l.file)).length;
  const otherFailures = [...failedFiles].filter((f) => !lessons.some((l) => l.file === f)).length;
  const words = lessons.reduce((sum, l) => sum + l.words, 0);
  console.log(
    `content check: ${index.courses.length} courses, ${lessons.length} lessons, ${index.glossary.length} glossary terms, ${briefCheck.briefs.length} placement briefs, ${words.toLocaleString("en-US")} words, ${problems.length} problem${problems.length === 1 ? "" : "s"} (${((Date.now() - started) / 1000).toFixed(1)} s)`,
  );
  console.log(`${lessons.length - failedLessons} passed, ${failedLessons + otherFailures} failed`);
  return problems.length === 0 ? 0 : 1;
}

/** Parses every bank under <content>/banks and runs the cross-bank rules; one problem per line. */
async function checkBankFiles(contentDir: string): Promise<Problem[]> {
  const { questionBankSchema } = await import("@/lib/assessment/question-schema");
  const { checkBanks } = await import("@/lib/content/bank-checks");
  const root = path.join(contentDir, "banks");
  if (!fs.existsSync(root)) return [];
  const problems: Problem[] = [];
  const banks: { file: string; bank: import("@/lib/assessment/question-schema").QuestionBank }[] = [];
  for (const course of fs.readdirSync(root, { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name).sort()) {
    for (const name of fs.readdirSync(path.join(root, course)).filter((n) => n.endsWith(".json")).sort()) {
      const file = path.relative(process.cwd(), path.join(root, course, name));
      let raw: unknown;
      try {
        raw = JSON.parse(fs.readFileSync(file, "utf8"));
      } catch (err) {
        problems.push({ file, line: 1, message: `cannot read JSON: ${(err as Error).message}` });
        continue;
      }
      const parsed = questionBankSchema.safeParse(raw);
      if (!parsed.success) {
        for (const issue of parsed.error.issues) problems.push({ file, line: 1, message: `${issue.path.join(".")}: ${issue.message}` });
        continue;
      }
      banks.push({ file, bank: parsed.data });
    }
  }
  const fileOf = new Map(banks.map((b) => [b.bank.id, b.file]));
  for (const p of checkBanks(banks.map((b) => b.bank))) {
    problems.push({ file: fileOf.get(p.bankId) ?? p.bankId, line: 1, message: `${p.questionId ? p.questionId + ": " : ""}${p.message}` });
  }
  return problems;
}

/** Re-runs this script without the react-server condition and hands it the lessons to render. */
function runRenderWorker(input: RenderInput): Problem[] {
  const execArgv: string[] = [];
  for (let i = 0; i < process.execArgv.length; i += 1) {
    const arg = process.execArgv[i];
    if (arg === "--conditions=react-server" || arg === "-C=react-server") continue;
    if ((arg === "--conditions" || arg === "-C") && process.execArgv[i + 1] === "react-server") {
      i += 1;
      continue;
    }
    execArgv.push(arg);
  }
  const child = spawnSync(process.execPath, [...execArgv, process.argv[1], RENDER_FLAG], {
    input: JSON.stringify(input),
    encoding: "utf8",
    maxBuffer: 64 * 1024 * 1024,
    env: { ...process.env, NODE_OPTIONS: (process.env.NODE_OPTIONS ?? "").replace(/--conditions[= ]react-server/g, "") },
  });
  const marked = child.stdout?.split("\n").find((line) => line.startsWith(RESULT_MARK));
  if (child.status !== 0 || !marked) {
    return [{ file: "scripts/content-check.ts", line: 1, message: `the render step failed (exit ${child.status}): ${(child.stderr || child.stdout || "").slice(-2000)}` }];
  }
  return (JSON.parse(marked.slice(RESULT_MARK.length)) as RenderOutput).problems;
}

/** Visible text of rendered HTML, for comparing the two renderers. */
function textOfHtml(html: string): string {
  return html
    .replace(/<[^>]+>/g, " ")
    .replace(/&#x27;|&#39;/g, "'")
    .replace(/&quot;/g, '"')
    .replace(/&amp;/g, "&")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/\s+/g, " ")
    .trim();
}

function firstDifference(a: string, b: string): string {
  let i = 0;
  while (i < a.length && a[i] === b[i]) i += 1;
  return `static "…${a.slice(Math.max(0, i - 40), i + 40)}…" vs tree "…${b.slice(Math.max(0, i - 40), i + 40)}…"`;
}

async function renderWorker(): Promise<void> {
  const input = JSON.parse(fs.readFileSync(0, "utf8")) as RenderInput;
  const { createElement } = await import("react");
  const runtime = await import("react/jsx-runtime");
  const { renderToString } = await import("react-dom/server");
  const { evaluate } = await import("@mdx-js/mdx");
  const { MDX_COMPONENTS } = await import("@/components/mdx/registry");
  const { LessonTree } = await import("@/components/mdx/lesson-tree");
  const { FIGURES } = await import("@/components/figures/registry");
  const { buildLessonTree } = await import("@/lib/content/lesson-tree");
  const { lessonRemarkPlugins } = await import("@/lib/content/mdx-pipeline");

  // Figures load lazily (next/dynamic); load them all first so they render for real, not as placeholders.
  for (const entry of Object.values(FIGURES)) {
    const loadable = entry.component as unknown as { render?: { preload?: () => Promise<unknown> } };
    await loadable.render?.preload?.();
  }

  const glossary = new Map(input.glossary);
  const problems: Problem[] = [];
  const captured: string[] = [];
  const original = { error: console.error, warn: console.warn, log: console.log };
  console.error = console.warn = (...args: unknown[]) => captured.push(args.map(String).join(" ").split("\n")[0]);
  console.log = () => undefined;
  for (const lesson of input.lessons) {
    const at = (message: string) => problems.push({ file: lesson.file, line: lesson.bodyStartLine, message });
    captured.length = 0;
    try {
      const { default: Content } = await evaluate(lesson.body, { ...runtime, development: false, remarkPlugins: lessonRemarkPlugins(glossary) } as Parameters<typeof evaluate>[1]);
      const staticHtml = renderToString(createElement(Content, { components: MDX_COMPONENTS }));
      const tree = await buildLessonTree(lesson.body, glossary);
      const treeHtml = renderToString(createElement(LessonTree, { nodes: tree }));
      for (const id of lesson.headingIds) if (!staticHtml.includes(`id="${id}"`)) at(`the table of contents links to #${id}, which the rendered lesson lacks`);
      const a = textOfHtml(staticHtml);
      const b = textOfHtml(treeHtml);
      if (a !== b) at(`the locked-lesson renderer shows different text from the static one: ${firstDifference(a, b)}`);
      if (a.length === 0) at("renders no text");
    } catch (err) {
      at(`does not render: ${(err as Error).message.split("\n")[0]}`);
    }
    for (const warning of new Set(captured)) at(`render warning: ${warning}`);
  }
  Object.assign(console, original);
  process.stdout.write(`\n${RESULT_MARK}${JSON.stringify({ problems } satisfies RenderOutput)}\n`);
}
