import type { Metadata } from "next";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { listUsers } from "@/lib/server/users";
import { UserControls } from "./user-controls";

export const metadata: Metadata = { title: "Users" };

const ROLE_LABEL = { apprentice: "Apprentice", instructor: "Instructor", school_manager: "School manager", admin: "Admin" } as const;

export default async function AdminUsersPage() {
  const viewer = await requirePageViewer("/admin", "admin");
  const { users } = pageData(await listUsers(viewer));
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Users</h1>
      <div className="relative overflow-x-auto rounded-xl border border-rule bg-surface-raised">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Every Axisline account, with its role and status</caption>
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
    </div>
  );
}
