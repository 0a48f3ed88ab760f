import type { Metadata } from "next";
import Link from "next/link";
import { SearchBox } from "@/components/shell/search-box";
import { Badge } from "@/components/ui/badge";
import { searchContent } from "@/lib/server/search";
import { getViewer } from "@/lib/server/viewer";

export const metadata: Metadata = { title: "Search", robots: { index: false } };

type SearchParams = { searchParams: Promise<{ q?: string | string[] }> };

export default async function SearchPage({ searchParams }: SearchParams) {
  const raw = (await searchParams).q;
  const q = (Array.isArray(raw) ? raw[0] : raw)?.trim() ?? "";
  const result = q ? await searchContent(await getViewer(), { q }) : null;
  return (
    <div className="max-w-reading space-y-6">
      <h1 className="text-title-1">Search</h1>
      <SearchBox defaultValue={q} id="search-page-q" />
      {!result ? (
        <p className="text-ink-muted">Search every lesson and the glossary: try “phantom power”, “null” or “noise dose”.</p>
      ) : !result.ok ? (
        <p role="status" className="text-ink">
          {result.message}
        </p>
      ) : (
        <section aria-labelledby="results-heading" className="space-y-4">
          <h2 id="results-heading" role="status" className="text-title-3">
            {result.results.length === 0
              ? `Nothing found for “${result.query}”`
              : `${result.results.length}${result.results.length === 25 ? "+" : ""} result${result.results.length === 1 ? "" : "s"} for “${result.query}”`}
          </h2>
          <ol className="space-y-4">
            {result.results.map((r) => (
              <li key={r.id} className="rounded-card border border-rule bg-surface-raised p-4" data-result={r.id}>
                <div className="flex flex-wrap items-center gap-2 text-caption">
                  <Badge tone={r.kind === "term" ? "note" : "secondary"}>{r.kind === "term" ? "Glossary" : "Lesson"}</Badge>
                  {r.courseTitle ? <span className="text-ink-muted">{r.courseTitle}</span> : null}
                  {r.locked ? <Badge>Seat needed</Badge> : null}
                </div>
                <h3 className="mt-1 text-title-3">
                  <Link href={r.href}>{r.title}</Link>
                </h3>
                <p className="mt-1 text-body-sm text-ink-muted">
                  {r.snippet.map((part, index) =>
                    part.hit ? (
                      <mark key={index} className="rounded-tag bg-accent-soft px-0.5 text-ink">
                        {part.text}
                      </mark>
                    ) : (
                      <span key={index}>{part.text}</span>
                    ),
                  )}
                </p>
              </li>
            ))}
          </ol>
        </section>
      )}
    </div>
  );
}
