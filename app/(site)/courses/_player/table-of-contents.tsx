import { KEY_TAKEAWAYS_ID } from "@/components/mdx/key-takeaways";
import type { Heading } from "@/lib/content";

type Props = { headings: Heading[]; idSuffix: string; collapsed?: boolean };

/**
 * "On this page": the lesson's h2 and h3, then the key takeaways every lesson ends with.
 * `collapsed` (the copy above the lesson on phones and tablets) folds the list into a native
 * disclosure, so the lesson's first paragraph is not pushed below the first screen by a list of
 * links the reader has not asked for; it opens with a tap, Enter or Space, without JavaScript.
 */
export function TableOfContents({ headings, idSuffix, collapsed = false }: Props) {
  const headingId = `toc-heading-${idSuffix}`;
  const list = (
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
  );
  if (collapsed) {
    return (
      <details className="text-body-sm print:hidden">
        <summary className="cursor-pointer py-2 font-mono text-caption tracking-wide text-ink-muted uppercase">On this page</summary>
        <nav aria-label="On this page">{list}</nav>
      </details>
    );
  }
  return (
    <nav aria-labelledby={headingId} className="text-body-sm print:hidden">
      <h2 id={headingId} className="font-mono text-caption tracking-wide text-ink-muted uppercase">
        On this page
      </h2>
      {list}
    </nav>
  );
}
