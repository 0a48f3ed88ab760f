import type { Metadata } from "next";
import Link from "next/link";
import type { ReactNode } from "react";
import { BenchTool } from "@/components/figures/bench-tool";
import { FIGURE_META } from "@/components/figures/figure-meta";
import type { FigureName } from "@/components/figures/figure-names";

// One route file per tool (app/(site)/bench/<name>/page.tsx), each importing its own figure:
// the figure is then a client reference the server draws in place and the browser hydrates in
// place, and each Bench page carries the code of its own figure only. (One [tool] route that
// imported every figure made every Bench page load all nine, 33 KB gzipped; one that loaded
// them through next/dynamic had the server outline the figure behind a placeholder, and the
// text below jumped when it arrived: Lighthouse mobile, CLS 0.12.)

export function benchToolMetadata(tool: FigureName): Metadata {
  return { title: `${FIGURE_META[tool].title} · The Bench`, description: FIGURE_META[tool].summary };
}

/** A Bench tool page: the figure (from its route file), its words, and the URL binding. */
export function BenchToolPage({ tool, figure }: { tool: FigureName; figure: ReactNode }) {
  const meta = FIGURE_META[tool];
  return (
    <article className="flex flex-col gap-6">
      <header className="flex max-w-reading flex-col gap-2">
        <nav aria-label="Breadcrumb">
          <Link href="/bench" className="text-body-sm">
            The Bench
          </Link>
        </nav>
        <h1 className="text-title-1 text-ink">{meta.title}</h1>
        <p className="text-lead text-ink-muted">{meta.summary}</p>
      </header>
      <BenchTool tool={tool}>{figure}</BenchTool>
      <section aria-labelledby="bench-computes" className="flex max-w-reading flex-col gap-2">
        <h2 id="bench-computes" className="text-title-3 text-ink">
          What it computes
        </h2>
        <p className="text-body text-ink">{meta.computes}</p>
        <h2 className="text-title-3 text-ink">Source of the formulas</h2>
        <p className="text-body text-ink" data-testid="bench-formula-source">
          {meta.formulaSource}
        </p>
        <p className="text-body-sm text-ink-muted">Every number in the figure comes from Axisline&apos;s tested acoustics library; the figure only rounds it for display.</p>
      </section>
    </article>
  );
}
