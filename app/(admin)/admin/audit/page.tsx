import type { Metadata } from "next";
import { listAudit } from "@/lib/server/audit";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "Audit log" };

export default async function AuditPage() {
  const viewer = await requirePageViewer("/admin/audit", "admin");
  const { entries } = pageData(await listAudit(viewer, { limit: 100 }));
  return (
    <div className="space-y-6">
      <h1 className="text-3xl font-bold">Audit log</h1>
      {entries.length === 0 ? (
        <p className="text-ink-muted">No changes recorded yet.</p>
      ) : (
        <div className="relative overflow-x-auto rounded-xl border border-rule bg-surface-raised">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Changes made by admins, newest first (UTC)</caption>
            <thead className="border-b border-rule bg-surface-sunken">
              <tr>
                <th scope="col" className="px-3 py-2">When (UTC)</th>
                <th scope="col" className="px-3 py-2">Who</th>
                <th scope="col" className="px-3 py-2">What</th>
                <th scope="col" className="px-3 py-2">Target</th>
                <th scope="col" className="px-3 py-2">Detail</th>
              </tr>
            </thead>
            <tbody>
              {entries.map((e) => (
                <tr key={e.id} className="border-b border-rule last:border-0">
                  <td className="px-3 py-2 font-mono text-xs">{e.createdAtUtc.replace("T", " ").slice(0, 19)}</td>
                  <td className="px-3 py-2 font-mono text-xs">{e.actorName ?? "—"}</td>
                  <td className="px-3 py-2">{e.action}</td>
                  <td className="px-3 py-2 font-mono text-xs">{e.targetName ?? e.targetId}</td>
                  <td className="px-3 py-2 font-mono text-xs">{JSON.stringify(e.detail)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
