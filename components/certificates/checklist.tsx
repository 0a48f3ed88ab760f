// The completion checklist of one course: lessons (a count, and the open ones), module quizzes and
// placement briefs, each marked done or to do in words as well as by glyph (WCAG 1.4.1).
import Link from "next/link";
import type { ChecklistItem, CompletionDto } from "@/lib/dto/certificates";

const KIND_TITLE = { lesson: "Lessons", quiz: "Module quizzes", brief: "Placement briefs" } as const;

function Item({ item }: { item: ChecklistItem }) {
  return (
    <li className="flex items-start gap-2 text-body-sm">
      <span aria-hidden="true" className={item.done ? "text-success" : "text-ink-muted"}>
        {item.done ? "✓" : "○"}
      </span>
      <span>
        {item.href ? <Link href={item.href}>{item.title}</Link> : item.title}
        <span className={item.done ? "text-success" : "text-ink-muted"}> · {item.done ? "done" : "to do"}</span>
      </span>
    </li>
  );
}

export function CompletionChecklist({ completion }: { completion: CompletionDto }) {
  return (
    <div className="grid gap-4 md:grid-cols-3">
      {(["lesson", "quiz", "brief"] as const).map((kind) => {
        const items = completion.items.filter((i) => i.kind === kind);
        const done = items.filter((i) => i.done).length;
        const open = items.filter((i) => !i.done);
        return (
          <section key={kind} aria-label={`${KIND_TITLE[kind]}: ${completion.courseTitle}`} className="flex flex-col gap-2">
            <h4 className="text-body font-semibold">
              {KIND_TITLE[kind]}: {done} of {items.length}
            </h4>
            {kind === "brief" && completion.borrowedBriefs && <p className="text-body-sm text-ink-muted">This course has no briefs of its own: the first two placement briefs of the catalogue count.</p>}
            {items.length === 0 ? (
              <p className="text-body-sm text-ink-muted">None in this course.</p>
            ) : kind === "lesson" && open.length === 0 ? (
              <p className="text-body-sm text-success">✓ Every lesson done.</p>
            ) : (
              <ul className="flex flex-col gap-1">
                {(kind === "lesson" ? open : items).map((item) => (
                  <Item key={item.id} item={item} />
                ))}
              </ul>
            )}
          </section>
        );
      })}
    </div>
  );
}
