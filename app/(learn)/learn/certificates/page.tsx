import type { Metadata } from "next";
import Link from "next/link";
import { CertificateActionForm } from "@/components/certificates/action-form";
import { CompletionChecklist } from "@/components/certificates/checklist";
import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { LinkButton } from "@/components/ui/link-button";
import { Notice } from "@/components/ui/notice";
import type { MyCertificateDto } from "@/lib/dto/certificates";
import { getCertificatesOverview } from "@/lib/server/certificates";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { claimCertificateAction, setNameVisibilityAction } from "./actions";

export const metadata: Metadata = { title: "Certificates" };

const dateOf = (iso: string) => new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" }).format(new Date(iso));

function IssuedCertificate({ certificate }: { certificate: MyCertificateDto }) {
  const base = `/api/certificates/${certificate.id}`;
  return (
    <div className="flex flex-col gap-4 rounded-card border border-rule bg-surface-raised p-5">
      <div className="flex flex-wrap items-center gap-3">
        {certificate.status === "valid" ? (
          <Badge tone="success" withIcon>
            Issued
          </Badge>
        ) : (
          <Badge tone="danger" withIcon>
            Revoked
          </Badge>
        )}
        <span className="text-body-sm text-ink-muted">Issued {dateOf(certificate.issuedAt)}</span>
      </div>
      {certificate.status === "revoked" && (
        <Notice tone="danger" label="Revoked" title="This certificate has been revoked">
          Revoked on {dateOf(certificate.revokedAt!)}
          {certificate.revocationReason ? `: ${certificate.revocationReason}` : "."} The verification page and the credential&apos;s status say so.
        </Notice>
      )}
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-body-sm">
        <dt className="text-ink-muted">Verification code</dt>
        <dd className="font-figures font-semibold" data-testid="certificate-code">
          {certificate.displayCode}
        </dd>
        <dt className="text-ink-muted">Public page</dt>
        <dd className="break-all">
          <Link href={`/verify/${certificate.displayCode}`}>{certificate.verifyUrl}</Link>
        </dd>
      </dl>
      <div className="flex flex-wrap gap-3">
        <a className="font-semibold" href={`${base}/pdf?paper=a4`} download>
          Download PDF (A4)
        </a>
        <a className="font-semibold" href={`${base}/pdf?paper=letter`} download>
          Download PDF (US Letter)
        </a>
        <a className="font-semibold" href={`${base}/credential`} download>
          Download credential (Open Badges 3.0)
        </a>
      </div>
      <p className="text-body-sm text-ink-muted">
        The credential is a signed file an employer&apos;s or a wallet&apos;s verifier can check against our published keys. The verification page shows your name {certificate.showName ? "(now shown)" : "(now hidden)"}, the course and the dates.
      </p>
      <CertificateActionForm
        action={setNameVisibilityAction}
        fields={{ certificateId: certificate.id, showName: certificate.showName ? "false" : "true" }}
        label={certificate.showName ? "Hide my name on the verification page" : "Show my name on the verification page"}
        labelDetail={certificate.courseTitle}
        variant="secondary"
        loadingText="saving"
      />
    </div>
  );
}

export default async function CertificatesPage() {
  const viewer = await requirePageViewer("/learn/certificates", "apprentice");
  const { courses } = await getCertificatesOverview(viewer).then(pageData);
  return (
    <div className="flex flex-col gap-8">
      <nav aria-label="Breadcrumb" className="text-body-sm">
        <Link href="/learn">My classes</Link> <span aria-hidden="true">›</span> <span aria-current="page">Certificates</span>
      </nav>
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">Certificates</h1>
        <p className="max-w-reading text-ink-muted">
          A course&apos;s certificate is yours once every lesson is complete, every module quiz is passed and its placement briefs are approved by your instructor. Employers check it by its code or QR link.
        </p>
      </header>
      {courses.length === 0 ? (
        <EmptyState title="No courses yet" description="When you have a seat on a course, its certificate checklist appears here." action={<LinkButton href="/courses">Browse the courses</LinkButton>} />
      ) : (
        courses.map((course) => (
          <section key={course.courseSlug} aria-labelledby={`cert-${course.courseSlug}`} className="flex flex-col gap-4" data-course={course.courseSlug}>
            <h2 id={`cert-${course.courseSlug}`} className="text-xl font-semibold">
              {course.courseTitle}
            </h2>
            {course.certificate ? (
              <IssuedCertificate certificate={course.certificate} />
            ) : course.complete ? (
              <div className="flex flex-col gap-2 rounded-card border border-rule bg-surface-raised p-5">
                <p>Everything is done. Claim your certificate: it is issued once, with its own verification code.</p>
                <CertificateActionForm action={claimCertificateAction} fields={{ courseSlug: course.courseSlug }} label="Claim my certificate" labelDetail={course.courseTitle} loadingText="issuing the certificate" />
              </div>
            ) : (
              <p className="text-ink-muted">{course.missing}</p>
            )}
            {!course.certificate && <CompletionChecklist completion={course} />}
          </section>
        ))
      )}
    </div>
  );
}
