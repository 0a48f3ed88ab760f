import type { Metadata } from "next";
import { getGlossary } from "@/lib/content";

export const metadata: Metadata = {
  title: "Glossary",
  description: "The live-sound terms used in Axisline's lessons, each in one or two plain sentences.",
};

/** First letter for grouping; digits and symbols ("3:1 practice") go under "#". */
function initialOf(term: string): string {
  const first = term.trim().charAt(0).toUpperCase();
  return /[A-Z]/.test(first) ? first : "#";
}

export default async function GlossaryPage() {
  const entries = [...(await getGlossary())].sort((a, b) => a.term.localeCompare(b.term, "en", { sensitivity: "base" }));
  const titles = new Map(entries.map((e) => [e.id, e.term]));
  const groups = new Map<string, typeof entries>();
  for (const entry of entries) groups.set(initialOf(entry.term), [...(groups.get(initialOf(entry.term)) ?? []), entry]);
  const letters = [...groups.keys()].sort((a, b) => (a === "#" ? -1 : b === "#" ? 1 : a.localeCompare(b)));
  return (
    <div className="space-y-8">
      <header className="max-w-reading space-y-3">
        <h1 className="text-title-1">Glossary</h1>
        <p className="text-lead text-ink-muted">
          {entries.length} terms from the lessons. In a lesson, hover over or focus a dotted term to see its definition; it links here.
        </p>
      </header>
      <nav aria-label="Glossary letters" className="print:hidden">
        <ul className="flex flex-wrap gap-1">
          {letters.map((l) => (
            <li key={l}>
              <a href={`#letter-${l === "#" ? "digits" : l}`} className="inline-flex min-h-target min-w-target items-center justify-center rounded-control border border-rule px-2 font-mono">
                {l}
              </a>
            </li>
          ))}
        </ul>
      </nav>
      {letters.map((l) => (
        <section key={l} aria-labelledby={`letter-${l === "#" ? "digits" : l}`} className="space-y-4">
          <h2 id={`letter-${l === "#" ? "digits" : l}`} className="border-b border-rule pb-1 font-mono text-title-2">
            {l === "#" ? "0–9" : l}
          </h2>
          <dl className="max-w-reading space-y-5">
            {groups.get(l)!.map((e) => (
              <div key={e.id} id={e.id} className="scroll-mt-6 target:rounded-card target:bg-accent-soft target:p-3">
                <dt className="font-semibold text-ink">{e.term}</dt>
                <dd className="mt-1 text-ink">{e.definition}</dd>
                {e.seeAlso.length > 0 ? (
                  <dd className="mt-1 text-body-sm text-ink-muted">
                    See also:{" "}
                    {e.seeAlso.map((id, index) => (
                      <span key={id}>
                        {index > 0 ? ", " : null}
                        <a href={`#${id}`}>{titles.get(id) ?? id}</a>
                      </span>
                    ))}
                  </dd>
                ) : null}
              </div>
            ))}
          </dl>
        </section>
      ))}
    </div>
  );
}
