import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Suspense } from "react";
import { BenchToolDefault, BenchToolFromUrl } from "@/components/figures/bench-tool";
import { FIGURE_META } from "@/components/figures/figure-meta";
import { FIGURE_NAMES, isFigureName } from "@/components/figures/figure-names";

type BenchToolPageProps = { params: Promise<{ tool: string }> };

// Only the registered figures exist; any other name is a 404 without rendering.
export const dynamicParams = false;

export function generateStaticParams() {
  return FIGURE_NAMES.map((tool) => ({ tool }));
}

export async function generateMetadata({ params }: BenchToolPageProps): Promise<Metadata> {
  const { tool } = await params;
  if (!isFigureName(tool)) return {};
  return { title: `${FIGURE_META[tool].title} · The Bench`, description: FIGURE_META[tool].summary };
}

export default async function BenchToolPage({ params }: BenchToolPageProps) {
  const { tool } = await params;
  if (!isFigureName(tool)) notFound();
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
      <Suspense fallback={<BenchToolDefault tool={tool} />}>
        <BenchToolFromUrl tool={tool} />
      </Suspense>
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
