// Client-safe shapes of certificates and the completion checklist (lib/server/completion.ts,
// lib/server/certificates.ts build them; pages and components read them).

export type ChecklistKind = "lesson" | "quiz" | "brief";

export type ChecklistItem = { kind: ChecklistKind; id: string; title: string; done: boolean; href: string | null };

export type CompletionDto = {
  courseSlug: string;
  courseTitle: string;
  items: ChecklistItem[];
  complete: boolean;
  /** What is still missing, in one sentence (empty when complete). */
  missing: string;
  /** True when the course has no placement briefs of its own and the first two of the catalogue count instead. */
  borrowedBriefs: boolean;
};

export type CertificateStatus = "valid" | "revoked";

export type MyCertificateDto = {
  id: string;
  courseSlug: string;
  courseTitle: string;
  code: string;
  /** XXXX-XXXX-XXXX */
  displayCode: string;
  issuedAt: string;
  hours: number;
  schoolName: string | null;
  instructorName: string | null;
  showName: boolean;
  status: CertificateStatus;
  revokedAt: string | null;
  revocationReason: string | null;
  verifyUrl: string;
};

export type CertificatesOverviewDto = { courses: (CompletionDto & { certificate: MyCertificateDto | null })[] };

/** What the public verification page may show: only what the graduate agreed to. */
export type VerificationDto =
  | { found: false; code: string }
  | {
      found: true;
      code: string;
      displayCode: string;
      status: CertificateStatus;
      /** null when the graduate hid their name. */
      recipientName: string | null;
      courseTitle: string;
      issuedAt: string;
      hours: number;
      schoolName: string | null;
      instructorName: string | null;
      revokedAt: string | null;
      revocationReason: string | null;
    };

/** A certificate as an admin or the issuing school's instructor sees it (to revoke it). */
export type ManagedCertificateDto = {
  id: string;
  displayCode: string;
  recipientName: string;
  courseTitle: string;
  schoolName: string | null;
  issuedAt: string;
  status: CertificateStatus;
  revokedAt: string | null;
  revocationReason: string | null;
};
