import type { Metadata } from "next";
import Link from "next/link";
import { AccountForm } from "@/components/account/account-form";
import { SessionButtons } from "@/components/account/session-buttons";
import { LinkButton } from "@/components/ui/link-button";
import { Notice } from "@/components/ui/notice";
import { viewInvitation } from "@/lib/server/invitation-claims";
import { pageData } from "@/lib/server/page-guard";
import { getViewer } from "@/lib/server/viewer";

export const metadata: Metadata = { title: "Your invitation to a class", robots: { index: false } };

const dayFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });

// Scanner-safe: opening the e-mailed link shows this page and consumes nothing. Only the person's
// POST from a button (accept, or sign up and accept) takes the seat.
export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const viewer = await getViewer();
  const { invitation } = pageData(await viewInvitation(viewer, token));
  if (invitation.state === "invalid")
    return (
      <div className="space-y-4">
        <h1 className="text-2xl font-bold">This invitation can&apos;t be used</h1>
        <p>It has expired, was withdrawn, or has already been accepted. Ask your school to send a new one.</p>
        <p>
          <Link href="/sign-in">Sign in</Link> if you already accepted it.
        </p>
      </div>
    );
  const tokenField = { name: "token", label: "", type: "hidden" as const, defaultValue: token };
  const passwordField = { name: "password", label: "Choose a password", type: "password" as const, autoComplete: "new-password", hint: "At least 8 characters. Long passphrases are welcome (up to 128)." };
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Join {invitation.className}</h1>
      <p>
        {invitation.schoolName} has a seat for {invitation.name ?? "you"} in this class on the course <strong>{invitation.courseTitle}</strong>. The invitation was sent to{" "}
        <strong className="break-all">{invitation.email}</strong> and works once, until {dayFormat.format(new Date(invitation.expiresAt))}.
      </p>
      {invitation.viewer === "invitee" && (
        <AccountForm testId="invitation-accept-form" endpoint="/api/invitations/accept" submitLabel="Accept my seat" redirectTo="/learn" fields={[tokenField]} />
      )}
      {invitation.viewer === "other-account" && (
        <Notice tone="caution" label="Another account">
          <p>
            You are signed in as {viewer?.email}. This invitation is for {invitation.email}: sign out, then open the link from the e-mail again.
          </p>
          <div className="mt-3">
            <SessionButtons />
          </div>
        </Notice>
      )}
      {invitation.viewer === "signed-out" && invitation.account === "verified" && (
        <div className="space-y-3">
          <p>This address already has an Axisline account. Sign in with it, and you&apos;ll come back here to accept.</p>
          <LinkButton variant="primary" href={`/sign-in?next=${encodeURIComponent(`/invitations/${token}`)}`}>
            Sign in to accept
          </LinkButton>
        </div>
      )}
      {invitation.viewer === "signed-out" && invitation.account !== "verified" && (
        <div className="space-y-3">
          {invitation.account === "unverified" ? (
            <p>An account was started with this address but its e-mail was never confirmed. This invitation confirms it: choose a password and any earlier password and sign-ins of that account end.</p>
          ) : (
            <p>Create your Axisline account to accept. This link proves your address, so there is nothing else to confirm.</p>
          )}
          <AccountForm
            testId="invitation-sign-up-form"
            endpoint="/api/invitations/sign-up"
            submitLabel="Create my account and accept"
            redirectTo="/learn"
            fields={[tokenField, { name: "name", label: "Your name", autoComplete: "name", defaultValue: invitation.name ?? "" }, passwordField]}
          />
        </div>
      )}
    </div>
  );
}
