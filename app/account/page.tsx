import type { Metadata } from "next";
import { AccountForm } from "@/components/account/account-form";
import { SessionButtons } from "@/components/account/session-buttons";
import { Notice } from "@/components/ui/notice";
import { passwordStatus } from "@/lib/server/accounts";
import { ROLE_LABEL } from "@/components/shell/nav-links";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage({ searchParams }: { searchParams: Promise<{ "choose-password"?: string }> }) {
  const viewer = await requirePageViewer("/account");
  const { hasPassword } = pageData(await passwordStatus(viewer));
  const choosing = (await searchParams)["choose-password"] === "1" && !hasPassword;
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
      <section className="space-y-3" id="password" aria-labelledby="password-heading">
        <h2 id="password-heading" className="text-xl font-semibold">{hasPassword ? "Change your password" : "Choose a password"}</h2>
        {choosing && (
          <Notice tone="note" label="Your address is confirmed">
            You signed in with the link we e-mailed. Any password set on this account before you proved the address has been removed, and every other session ended. Choose a password now, or keep signing in by e-mail link.
          </Notice>
        )}
        <p className="text-ink-muted">A new password ends every other session of this account and cancels sign-in and reset links already sent.</p>
        <AccountForm
          testId="password-form"
          endpoint="/api/account/password"
          submitLabel={hasPassword ? "Change password" : "Save password"}
          successMessage="Your password is saved. Other sessions have been signed out."
          fields={[
            ...(hasPassword ? [{ name: "currentPassword", label: "Current password", type: "password" as const, autoComplete: "current-password" }] : []),
            { name: "newPassword", label: "New password", type: "password" as const, autoComplete: "new-password", hint: "8 to 128 characters; not one of the most common passwords." },
          ]}
        />
      </section>
      <section className="space-y-3">
        <h2 className="text-xl font-semibold">Sessions</h2>
        <p className="text-ink-muted">Signing out everywhere ends every session of this account, on every device, at its next request.</p>
        <SessionButtons />
      </section>
    </div>
  );
}
