import type { Metadata } from "next";
import { SessionButtons } from "@/components/account/session-buttons";
import { ROLE_LABEL } from "@/components/shell/nav-links";
import { requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const viewer = await requirePageViewer("/account");
  return (
    <div className="max-w-xl space-y-6">
      <h1 className="text-3xl font-bold">Your account</h1>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-2 rounded-xl border border-rule bg-surface-raised p-5">
        <dt className="text-ink-muted">Name</dt>
        <dd>{viewer.name}</dd>
        <dt className="text-ink-muted">E-mail</dt>
        <dd className="font-mono text-sm">{viewer.email}</dd>
        <dt className="text-ink-muted">Role</dt>
        <dd>{ROLE_LABEL[viewer.role]}</dd>
      </dl>
      <section className="space-y-3">
        <h2 className="text-xl font-semibold">Sessions</h2>
        <p className="text-ink-muted">Signing out everywhere ends every session of this account, on every device, at its next request.</p>
        <SessionButtons />
      </section>
    </div>
  );
}
