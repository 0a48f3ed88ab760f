// Certificates an admin or an instructor of the issuing school may revoke: a search by code and
// one row per certificate, with the revocation form for a valid one.
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { FormField } from "@/components/ui/form-field";
import { Input } from "@/components/ui/input";
import type { ManagedCertificateDto } from "@/lib/dto/certificates";
import { CertificateActionForm, type CertificateAction } from "./action-form";

const dateOf = (iso: string) => new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" }).format(new Date(iso));

export function ManagedCertificates({ certificates, action, searchPath, code }: { certificates: ManagedCertificateDto[]; action: CertificateAction; searchPath: string; code: string }) {
  return (
    <div className="flex flex-col gap-6">
      <form method="get" action={searchPath} className="flex flex-wrap items-end gap-3">
        <FormField label="Find by verification code" name="code">
          {(control) => <Input defaultValue={code} autoComplete="off" spellCheck={false} placeholder="XXXX-XXXX-XXXX" className="font-figures" {...control} />}
        </FormField>
        <Button type="submit" variant="secondary">
          Find certificate
        </Button>
      </form>
      {certificates.length === 0 ? (
        <p className="text-ink-muted">{code ? "No certificate you may revoke has this code." : "No certificates yet."}</p>
      ) : (
        <ul className="flex flex-col gap-4">
          {certificates.map((c) => (
            <li key={c.id} className="flex flex-col gap-3 rounded-card border border-rule bg-surface-raised p-5" data-code={c.displayCode}>
              <div className="flex flex-wrap items-center gap-3">
                <h2 className="text-lg font-semibold">
                  {c.recipientName}: {c.courseTitle}
                </h2>
                <Badge tone={c.status === "valid" ? "success" : "danger"} withIcon>
                  {c.status === "valid" ? "Valid" : "Revoked"}
                </Badge>
              </div>
              <p className="text-body-sm text-ink-muted">
                <span className="font-figures">{c.displayCode}</span> · issued {dateOf(c.issuedAt)}
                {c.schoolName ? ` · ${c.schoolName}` : " · no school"}
              </p>
              {c.status === "revoked" ? (
                <p className="text-body-sm">
                  Revoked {dateOf(c.revokedAt!)}: {c.revocationReason}
                </p>
              ) : (
                <CertificateActionForm action={action} fields={{ certificateId: c.id }} reason="Reason for revoking" label="Revoke certificate" labelDetail={`${c.recipientName}, ${c.displayCode}`} variant="danger" loadingText="revoking" />
              )}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
