import Link from "next/link";
import { TableHeaderCell } from "@/components/ui/table";
import type { OfficeSortKey } from "@/lib/dto/school-office";

/**
 * A column header that sorts the table on the server: a link to the same page with ?sort=&dir=.
 * The sorted column carries aria-sort; the link says in words what pressing it will do. The cell is
 * `relative` so the visually hidden words stay inside the table's scroll region at narrow widths.
 */
export function SortHeader({ label, sortKey, current, basePath, numeric }: { label: string; sortKey: OfficeSortKey; current: { key: OfficeSortKey; dir: "asc" | "desc" }; basePath: string; numeric?: boolean }) {
  const active = current.key === sortKey;
  const nextDir = active && current.dir === "asc" ? "desc" : "asc";
  const href = `${basePath}?sort=${encodeURIComponent(sortKey)}&dir=${nextDir}#apprentices`;
  return (
    <TableHeaderCell numeric={numeric} className="relative" aria-sort={active ? (current.dir === "asc" ? "ascending" : "descending") : undefined}>
      <Link href={href} scroll={false} className="inline-flex min-h-6 items-center gap-1 whitespace-nowrap text-ink underline-offset-2 hover:underline">
        {label}
        <span aria-hidden="true">{active ? (current.dir === "asc" ? "▲" : "▼") : "↕"}</span>
        <span className="sr-only">{`, sort ${nextDir === "asc" ? "ascending" : "descending"}`}</span>
      </Link>
    </TableHeaderCell>
  );
}
