"use client";
import { useId, useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { FormField } from "@/components/ui/form-field";
import { Input } from "@/components/ui/input";
import { Notice } from "@/components/ui/notice";

export type FieldSpec = {
  name: string;
  label: string;
  type?: "text" | "email" | "password" | "hidden";
  autoComplete?: string;
  hint?: string;
  defaultValue?: string;
};

type Failure = { ok: false; message: string; fieldErrors?: Record<string, string> };

/**
 * A small form that posts JSON to one of our /api/account routes and shows the answer in words.
 * The server validates everything; the browser only helps.
 */
export function AccountForm({
  endpoint,
  fields,
  submitLabel,
  successMessage,
  redirectTo,
  footer,
  testId,
}: {
  endpoint: string;
  fields: FieldSpec[];
  submitLabel: string;
  successMessage?: ReactNode;
  redirectTo?: string;
  footer?: ReactNode;
  testId?: string;
}) {
  const formId = useId();
  const [pending, setPending] = useState(false);
  const [failure, setFailure] = useState<Failure | null>(null);
  const [done, setDone] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setPending(true);
    setFailure(null);
    const body = Object.fromEntries(new FormData(event.currentTarget).entries());
    try {
      const res = await fetch(endpoint, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body), credentials: "same-origin" });
      const data = (await res.json().catch(() => ({ ok: false, message: "Something went wrong on our side. Please try again." }))) as Failure | { ok: true; next?: string };
      if (!data.ok) {
        setFailure(data);
        return;
      }
      // The server may name the next step (a path of ours, e.g. choosing a password after a first link sign-in).
      const next = "next" in data && typeof data.next === "string" && data.next.startsWith("/") && !data.next.startsWith("//") ? data.next : redirectTo;
      if (next) {
        // A sign-in changes what every page and cached request may show: load the next page afresh
        // rather than navigating inside the old client state.
        window.location.assign(next);
        return;
      }
      setDone(true);
    } catch {
      setFailure({ ok: false, message: "We couldn't reach Axisline. Check your connection and try again." });
    } finally {
      setPending(false);
    }
  }

  if (done && successMessage)
    return (
      <Notice tone="success" announce>
        {successMessage}
      </Notice>
    );

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid={testId}>
      {failure && (
        <Notice tone="danger" label="That didn't work" announce id={`${formId}-error`}>
          {failure.message}
        </Notice>
      )}
      {fields.map((f) =>
        f.type === "hidden" ? (
          <input key={f.name} type="hidden" name={f.name} defaultValue={f.defaultValue} />
        ) : (
          <FormField key={f.name} label={f.label} name={f.name} hint={f.hint} error={failure?.fieldErrors?.[f.name]}>
            {(control) => <Input type={f.type ?? "text"} autoComplete={f.autoComplete} defaultValue={f.defaultValue} {...control} />}
          </FormField>
        ),
      )}
      <Button type="submit" loading={pending} loadingText="Working…" className="w-full">
        {submitLabel}
      </Button>
      {footer}
    </form>
  );
}
