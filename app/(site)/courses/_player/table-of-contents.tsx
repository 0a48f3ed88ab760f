import { KEY_TAKEAWAYS_ID } from "@/components/mdx/key-takeaways";
import type { Heading } from "@/lib/content";

/** "On this page": the lesson's h2 and h3, then the key takeaways every lesson ends with. */
export function TableOfContents({ headings, idSuffix }: { headings: Heading[]; idSuffix: string }) {
  const headingId = `toc-heading-${idSuffix}`;
  return (
    <nav aria-labelledby={headingId} className="text-body-sm print:hidden">
      <h2 id={headingId} className="font-mono text-caption tracking-wide text-ink-muted uppercase">
        On this page
      </h2>
      <ol className="mt-2 space-y-1.5 border-l border-rule">
        {headings.map((h) => (
          <li key={h.id} className={h.depth === 3 ? "pl-6" : "pl-3"}>
            <a href={`#${h.id}`} className="text-ink no-underline hover:underline">
              {h.text}
            </a>
          </li>
        ))}
        <li className="pl-3">
          <a href={`#${KEY_TAKEAWAYS_ID}`} className="text-ink no-underline hover:underline">
            Key takeaways
          </a>
        </li>
      </ol>
    </nav>
  );
}
