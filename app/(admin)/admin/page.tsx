import type { Metadata } from "next";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/input";
import { LinkButton } from "@/components/ui/link-button";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { listUsers } from "@/lib/server/users";
import { UserControls } from "./user-controls";

export const metadata: Metadata = { title: "Users" };

const ROLE_LABEL = { apprentice: "Apprentice", instructor: "Instructor", school_manager: "School manager", admin: "Admin" } as const;

type Search = { q?: string | string[]; page?: string | string[] };
const one = (v: string | string[] | undefined) => (typeof v === "string" ? v : undefined);

function pageHref(query: string, page: number): string {
  const params = new URLSearchParams();
  if (query) params.set("q", query);
  if (page > 1) params.set("page", String(page));
  const s = params.toString();
  return s ? `/admin?${s}` : "/admin";
}

export default async function AdminUsersPage({ searchParams }: { searchParams: Promise<Search> }) {
  const viewer = await requirePageViewer("/admin", "admin");
  const search = await searchParams;
  const result = await listUsers(viewer, { query: one(search.q), page: one(search.page) });
  // A page number or search the form would never send falls back to the first page of everyone.
  const { users, total, page, pageSize, query } = pageData(result.ok || result.code !== "invalid_input" ? result : await listUsers(viewer));
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Users</h1>
      <form method="get" action="/admin" role="search" className="flex flex-wrap items-end gap-3">
        <label className="flex min-w-64 flex-1 flex-col gap-1 text-sm font-semibold">
          Find a user by name or e-mail
          <Input type="search" name="q" defaultValue={query} maxLength={254} autoComplete="off" />
        </label>
        <Button type="submit" variant="secondary">Find user</Button>
        {query && <LinkButton href="/admin" variant="ghost">Show everyone</LinkButton>}
      </form>
      <p className="text-sm text-ink-muted" data-testid="user-count">
        {total === 0 ? "No account matches." : `${total} ${total === 1 ? "account" : "accounts"}${query ? ` matching “${query}”` : ""}; page ${page} of ${pages}.`}
      </p>
      <div className="relative overflow-x-auto rounded-xl border border-rule bg-surface-raised">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Axisline accounts, with their role and status (staff first)</caption>
          <thead className="border-b border-rule bg-surface-sunken">
            <tr>
              <th scope="col" className="px-3 py-2">Name</th>
              <th scope="col" className="px-3 py-2">E-mail</th>
              <th scope="col" className="px-3 py-2">Role</th>
              <th scope="col" className="px-3 py-2">Status</th>
              <th scope="col" className="px-3 py-2">Change</th>
            </tr>
          </thead>
          <tbody>
            {users.map((u) => (
              <tr key={u.id} className="border-b border-rule last:border-0" data-testid={`user-row-${u.email}`}>
                <td className="px-3 py-2 font-semibold">{u.name}</td>
                <td className="px-3 py-2 font-mono text-xs">{u.email}</td>
                <td className="px-3 py-2">{ROLE_LABEL[u.role]}</td>
                <td className="px-3 py-2">{u.status === "active" ? "Active" : "Disabled"}</td>
                <td className="px-3 py-2">{u.id === viewer.id ? <span className="text-ink-muted">(you)</span> : <UserControls userId={u.id} name={u.name} role={u.role} status={u.status} />}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {pages > 1 && (
        <nav aria-label="Pages of users" className="flex items-center gap-3">
          {page > 1 && <LinkButton href={pageHref(query, page - 1)} variant="secondary">Previous page</LinkButton>}
          {page < pages && <LinkButton href={pageHref(query, page + 1)} variant="secondary">Next page</LinkButton>}
        </nav>
      )}
    </div>
  );
}
