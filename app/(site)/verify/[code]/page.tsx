import type { Metadata } from "next";
import { headers } from "next/headers";
import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Notice } from "@/components/ui/notice";
import type { VerificationDto } from "@/lib/dto/certificates";
import { addressFromHeaders, verifyCertificate } from "@/lib/server/verification";

export const metadata: Metadata = { title: "Certificate verification", robots: { index: false, follow: false } };

const dateOf = (iso: string) => new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" }).format(new Date(iso));

function Found({ v }: { v: Extract<VerificationDto, { found: true }> }) {
  const valid = v.status === "valid";
  return (
    <div className="flex flex-col gap-5" data-status={v.status}>
      {valid ? (
        <Notice tone="success" label="Valid" title="This certificate is valid">
          Axisline issued it and has not revoked it.
        </Notice>
      ) : (
        <Notice tone="danger" label="Revoked" title="This certificate has been revoked">
          Revoked on {dateOf(v.revokedAt!)}
          {v.revocationReason ? `. Reason: ${v.revocationReason}` : "."}
        </Notice>
      )}
      <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-2 rounded-card border border-rule bg-surface-raised p-5">
        <dt className="text-ink-muted">Graduate</dt>
        <dd>{v.recipientName ?? <span className="text-ink-muted">Not shown: the graduate chose to keep their name off this page.</span>}</dd>
        <dt className="text-ink-muted">Course</dt>
        <dd className="font-semibold">{v.courseTitle}</dd>
        <dt className="text-ink-muted">Issued</dt>
        <dd>{dateOf(v.issuedAt)}</dd>
        <dt className="text-ink-muted">Study time</dt>
        <dd>{v.hours} hours</dd>
        {v.schoolName && (
          <>
            <dt className="text-ink-muted">School</dt>
            <dd>{v.schoolName}</dd>
          </>
        )}
        {v.instructorName && (
          <>
            <dt className="text-ink-muted">Instructor</dt>
            <dd>{v.instructorName}</dd>
          </>
        )}
        <dt className="text-ink-muted">Code</dt>
        <dd className="font-figures">
          {v.displayCode}{" "}
          <Badge tone={valid ? "success" : "danger"} withIcon>
            {valid ? "Valid" : "Revoked"}
          </Badge>
        </dd>
      </dl>
    </div>
  );
}

export default async function VerifyCodePage({ params }: { params: Promise<{ code: string }> }) {
  const { code } = await params;
  const result = await verifyCertificate({ code: decodeURIComponent(code) }, { address: addressFromHeaders(await headers()) });
  return (
    <div className="flex max-w-reading flex-col gap-6">
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">Certificate verification</h1>
        <p className="text-ink-muted">What Axisline&apos;s records say about this certificate today.</p>
      </header>
      {!result.ok ? (
        <Notice tone="caution" label="Slow down" title="Too many look-ups">
          {result.message}
        </Notice>
      ) : result.verification.found ? (
        <Found v={result.verification} />
      ) : (
        <div data-status="unknown">
          <Notice tone="caution" label="Unknown" title="We have no certificate with this code">
            No Axisline certificate has the code {result.verification.code || "you gave"}. Check it against the printed certificate; letters I, L, O and U never appear in a code.
          </Notice>
        </div>
      )}
      <p>
        <Link href="/verify">Check another code</Link>
      </p>
    </div>
  );
}
