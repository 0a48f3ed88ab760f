import type { Metadata } from "next";
import Link from "next/link";
import { Card, CardDescription, CardTitle } from "@/components/ui/card";
import { FIGURE_META } from "@/components/figures/figure-meta";
import { FIGURE_NAMES } from "@/components/figures/figure-names";

export const metadata: Metadata = {
  title: "The Bench",
  description: "The interactive figures from Axisline's lessons, full size: pickup patterns, proximity effect, comb filtering, levels, DI boxes, phantom power, feedback, noise dose and gain structure.",
};

export default function BenchPage() {
  return (
    <div className="flex flex-col gap-8">
      <header className="flex max-w-reading flex-col gap-3">
        <p className="font-mono text-caption tracking-widest text-accent-text uppercase">Tools</p>
        <h1 className="text-title-1 text-ink">The Bench</h1>
        <p className="text-lead text-ink-muted">
          The figures from the lessons, full size and free to use. Each one keeps its settings in the page address, so you can bookmark a setup or send it to a classmate.
        </p>
      </header>
      <ul className="grid gap-5 sm:grid-cols-2 lg:grid-cols-3" aria-label="Tools">
        {FIGURE_NAMES.map((name) => (
          <Card as="li" key={name} className="relative">
            <CardTitle level={2}>
              <Link href={`/bench/${name}`} className="text-ink no-underline after:absolute after:inset-0 after:content-[''] hover:underline">
                {FIGURE_META[name].title}
              </Link>
            </CardTitle>
            <CardDescription>{FIGURE_META[name].summary}</CardDescription>
            <p aria-hidden="true" className="mt-auto text-body-sm font-semibold text-accent-text">
              Open the tool →
            </p>
          </Card>
        ))}
      </ul>
    </div>
  );
}
