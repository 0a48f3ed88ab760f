import "server-only";
// Full-text search over lessons and the glossary (PostgreSQL tsvector + GIN, ts_headline snippets).
// A locked lesson is matched and quoted only on its public shell (title, summary, objectives,
// headings) unless the viewer may read it, so search never leaks a locked body.
import { inArray, notInArray, sql } from "drizzle-orm";
import { z } from "zod";
import { db, type Queryable } from "@/db/client";
import { searchDocuments } from "@/db/schema";
import { getGlossary, listAllLessons, listCourses } from "@/lib/content";
import { fail, type Result } from "./errors";
import { readableCourseSlugs } from "./lessons";
import type { Viewer } from "./viewer";

type SearchDocument = typeof searchDocuments.$inferInsert;

async function contentDocuments(): Promise<SearchDocument[]> {
  const docs: SearchDocument[] = [];
  for (const lesson of await listAllLessons()) {
    docs.push({
      id: `lesson:${lesson.id}`,
      kind: "lesson",
      courseSlug: lesson.courseSlug,
      lessonId: lesson.id,
      title: lesson.title,
      href: lesson.href,
      preview: lesson.preview,
      publicText: [lesson.summary, ...lesson.objectives, ...lesson.headings.map((h) => h.text)].join("\n"),
      bodyText: lesson.text,
    });
  }
  for (const entry of await getGlossary()) {
    docs.push({ id: `term:${entry.id}`, kind: "term", title: entry.term, href: `/glossary#${entry.id}`, preview: true, publicText: entry.definition, bodyText: "" });
  }
  return docs;
}

/**
 * Rebuilds the search index from content/. Idempotent: upserts every document, drops the ones gone.
 * A system task (seed, deploy), not a viewer's request: nothing in app/ calls it.
 */
export async function indexContent(database: Queryable = db()): Promise<{ documents: number }> {
  const docs = await contentDocuments();
  const fromInsert = (column: string) => sql.raw(`excluded.${column}`);
  await database.transaction(async (tx) => {
    await tx
      .insert(searchDocuments)
      .values(docs)
      .onConflictDoUpdate({
        target: searchDocuments.id,
        set: {
          kind: fromInsert("kind"),
          courseSlug: fromInsert("course_slug"),
          lessonId: fromInsert("lesson_id"),
          title: fromInsert("title"),
          href: fromInsert("href"),
          preview: fromInsert("preview"),
          publicText: fromInsert("public_text"),
          bodyText: fromInsert("body_text"),
          updatedAt: sql`now()`,
        },
      });
    await tx.delete(searchDocuments).where(notInArray(searchDocuments.id, docs.map((d) => d.id)));
  });
  return { documents: docs.length };
}

export const SearchInput = z.object({ q: z.string().trim().min(2, "Type at least two letters.").max(200, "Use at most 200 characters.") });

export type SnippetPart = { text: string; hit: boolean };

export type SearchResultDto = {
  id: string;
  kind: "lesson" | "term";
  title: string;
  href: string;
  courseTitle: string | null;
  /** True when the viewer may not read the lesson yet (it matched on its public shell). */
  locked: boolean;
  snippet: SnippetPart[];
};

// Private-use characters as highlight markers: they never occur in content, so the snippet can be
// split into text and hits without ever treating it as HTML.
const START = "\uE000";
const STOP = "\uE001";

export function splitSnippet(headline: string): SnippetPart[] {
  const parts: SnippetPart[] = [];
  for (const piece of headline.split(START)) {
    const [hit, rest] = piece.includes(STOP) ? piece.split(STOP, 2) : [null, piece];
    // Objectives and headings are stored one a line; in a snippet they read better as a list.
    if (hit) parts.push({ text: hit, hit: true });
    if (rest) parts.push({ text: rest.replace(/\s*\n\s*/g, " · "), hit: false });
  }
  return parts;
}

/** One word → prefix match ("cardio" finds cardioid); otherwise web-search syntax ("quoted phrases", -not). */
function tsQuery(q: string) {
  const single = /^[\p{L}\p{N}]+$/u.test(q);
  return single ? sql`to_tsquery('english'::regconfig, ${q.toLowerCase() + ":*"})` : sql`websearch_to_tsquery('english'::regconfig, ${q})`;
}

/** Anyone may search (signed out included); what a viewer may read decides what is matched and quoted. */
export async function searchContent(viewer: Viewer | null, raw: unknown, database: Queryable = db()): Promise<Result<{ query: string; results: SearchResultDto[] }>> {
  const parsed = SearchInput.safeParse(raw);
  if (!parsed.success) return fail("invalid_input", { message: parsed.error.issues[0]?.message });
  const q = parsed.data.q;
  const readable = await readableCourseSlugs(viewer, database);
  const readableSql =
    readable === "all"
      ? sql`true`
      : readable.size > 0
        ? sql`(${searchDocuments.preview} or ${inArray(searchDocuments.courseSlug, [...readable])})`
        : sql`${searchDocuments.preview}`;
  const options = `StartSel=${START}, StopSel=${STOP}, MaxWords=28, MinWords=10, MaxFragments=2, FragmentDelimiter=" … "`;
  // A glossary definition is one or two sentences: show it whole.
  const termOptions = `StartSel=${START}, StopSel=${STOP}, HighlightAll=true`;
  const result = await database.execute<{ id: string; kind: "lesson" | "term"; title: string; href: string; course_slug: string | null; readable: boolean; headline: string }>(sql`
    with query as (select ${tsQuery(q)} as q),
    docs as (
      select ${searchDocuments}.*, ${readableSql} as readable from ${searchDocuments}
    )
    select id, kind, title, href, course_slug, readable,
      case when kind = 'term' then ts_headline('english'::regconfig, public_text, query.q, ${termOptions})
      else ts_headline('english'::regconfig,
        case when readable then public_text || ' ' || body_text else public_text end,
        query.q, ${options}) end as headline
    from docs, query
    where (case when readable then full_tsv else public_tsv end) @@ query.q
    order by ts_rank(case when readable then full_tsv else public_tsv end, query.q) desc, title
    limit 25`);
  const courseTitles = new Map((await listCourses()).map((c) => [c.slug, c.title]));
  const results = result.rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    title: r.title,
    href: r.href,
    courseTitle: r.course_slug ? (courseTitles.get(r.course_slug) ?? null) : null,
    locked: r.kind === "lesson" && !r.readable,
    snippet: splitSnippet(r.headline),
  }));
  return { ok: true, query: q, results };
}
