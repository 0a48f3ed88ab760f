import type { Metadata } from "next";
import { ManagedCertificates } from "@/components/certificates/managed-list";
import { listManagedCertificates } from "@/lib/server/certificate-admin";
import { pageData, requirePageViewer } from "@/lib/server/page-guard";
import { revokeCertificateAction } from "./actions";

export const metadata: Metadata = { title: "Certificates" };

export default async function AdminCertificatesPage({ searchParams }: { searchParams: Promise<{ code?: string }> }) {
  const viewer = await requirePageViewer("/admin/certificates", "admin");
  const code = (await searchParams).code ?? "";
  const { certificates } = await listManagedCertificates(viewer, { code }).then(pageData);
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">Certificates</h1>
        <p className="max-w-reading text-ink-muted">The newest 100 certificates, or the one with a code. Revoking is final; the reason you give is public.</p>
      </header>
      <ManagedCertificates certificates={certificates} action={revokeCertificateAction} searchPath="/admin/certificates" code={code} />
    </div>
  );
}
