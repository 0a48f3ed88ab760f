import type { ReactNode } from "react";
import { CheckIcon } from "@/components/ui/icons";

/** Fixed id: every lesson ends with exactly one, and the table of contents links to it. */
export const KEY_TAKEAWAYS_ID = "key-takeaways";

export function KeyTakeaways({ children }: { children?: ReactNode }) {
  return (
    <section aria-labelledby={KEY_TAKEAWAYS_ID} className="not-prose mt-10 rounded-card border border-accent-line bg-accent-soft px-5 py-4 print:border-black">
      <h2 id={KEY_TAKEAWAYS_ID} className="flex items-center gap-2 text-title-3 text-ink">
        <CheckIcon className="text-accent-text" />
        Key takeaways
      </h2>
      <div className="mt-2 text-body text-ink [&_li]:mt-1.5 [&_li]:ml-5 [&_li]:pl-1 [&_ul]:list-disc [&_ul]:marker:text-accent-line">{children}</div>
    </section>
  );
}
