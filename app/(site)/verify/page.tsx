import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { Button } from "@/components/ui/button";
import { FormField } from "@/components/ui/form-field";
import { Input } from "@/components/ui/input";
import { formatCode, normalizeCode } from "@/lib/certificates/code";

export const metadata: Metadata = { title: "Verify a certificate", description: "Check an Axisline certificate by its verification code." };

/** A typed code (any case, with or without dashes) goes to its page; one that can't be a code gets a sentence. */
export default async function VerifyFormPage({ searchParams }: { searchParams: Promise<{ code?: string | string[] }> }) {
  const raw = (await searchParams).code;
  const typed = typeof raw === "string" ? raw : "";
  const code = typed ? normalizeCode(typed) : null;
  if (code) redirect(`/verify/${formatCode(code)}`);
  const error = typed ? "A verification code has 12 letters and digits, like 7KQ2-M9XH-4RTB. Check what you typed." : undefined;
  return (
    <div className="flex max-w-reading flex-col gap-6">
      <header className="flex flex-col gap-2">
        <h1 className="text-3xl font-bold">Verify a certificate</h1>
        <p className="text-ink-muted">Type the code printed on the certificate, under &ldquo;Verification code&rdquo;. Capital or small letters, with or without the dashes.</p>
      </header>
      <form method="get" action="/verify" className="flex flex-col gap-3">
        <FormField label="Verification code" name="code" required error={error}>
          {(control) => <Input autoComplete="off" autoCapitalize="characters" spellCheck={false} defaultValue={typed} placeholder="XXXX-XXXX-XXXX" className="font-figures" {...control} />}
        </FormField>
        <Button type="submit" className="self-start">
          Check the certificate
        </Button>
      </form>
      <p className="text-body-sm text-ink-muted">Scanning the QR code on a certificate opens its page directly.</p>
    </div>
  );
}
