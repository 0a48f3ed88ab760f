// A plain GET form to /search: works without JavaScript, and the browser keeps the query in history.
import { cx } from "@/components/ui/cx";

export function SearchBox({ defaultValue, className, id = "site-search" }: { defaultValue?: string; className?: string; id?: string }) {
  return (
    <form role="search" action="/search" method="get" className={cx("flex items-center gap-2", className)}>
      <label htmlFor={id} className="sr-only">
        Search lessons and glossary
      </label>
      <input
        id={id}
        name="q"
        type="search"
        defaultValue={defaultValue}
        placeholder="Search lessons and glossary"
        minLength={2}
        maxLength={200}
        className="min-h-control-md w-full min-w-0 rounded-control border border-border bg-surface-raised px-3 text-body text-ink placeholder:text-ink-muted"
      />
      <button type="submit" className="inline-flex min-h-control-md items-center rounded-control border border-border bg-surface-raised px-3 font-semibold text-ink hover:bg-surface-sunken">
        Search
      </button>
    </form>
  );
}
