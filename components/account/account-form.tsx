"use client";
import { useId, useState, type ReactNode } from "react";
import { useRouter } from "next/navigation";

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
  const router = useRouter();
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
      const data = (await res.json().catch(() => ({ ok: false, message: "Something went wrong on our side. Please try again." }))) as Failure | { ok: true };
      if (!data.ok) {
        setFailure(data);
        return;
      }
      if (redirectTo) {
        router.push(redirectTo);
        router.refresh();
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
      <div role="status" className="rounded-lg border border-success bg-success-soft p-4 text-ink">
        {successMessage}
      </div>
    );

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" data-testid={testId} aria-describedby={failure ? `${formId}-error` : undefined}>
      {failure && (
        <div id={`${formId}-error`} role="alert" className="rounded-lg border border-danger bg-danger-soft p-3 text-ink">
          {failure.message}
        </div>
      )}
      {fields.map((f) =>
        f.type === "hidden" ? (
          <input key={f.name} type="hidden" name={f.name} defaultValue={f.defaultValue} />
        ) : (
          <Field key={f.name} formId={formId} spec={f} error={failure?.fieldErrors?.[f.name]} />
        ),
      )}
      <button
        type="submit"
        disabled={pending}
        className="inline-flex min-h-11 w-full items-center justify-center rounded-md bg-accent px-4 font-semibold text-accent-ink hover:bg-accent-hover disabled:opacity-60"
      >
        {pending ? "Working…" : submitLabel}
      </button>
      {footer}
    </form>
  );
}

function Field({ formId, spec, error }: { formId: string; spec: FieldSpec; error?: string }) {
  const id = `${formId}-${spec.name}`;
  const describedBy = [spec.hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block font-semibold text-ink">
        {spec.label}
      </label>
      {spec.hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-muted">
          {spec.hint}
        </p>
      )}
      <input
        id={id}
        name={spec.name}
        type={spec.type ?? "text"}
        autoComplete={spec.autoComplete}
        defaultValue={spec.defaultValue}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className="block min-h-11 w-full rounded-md border border-border bg-surface-raised px-3 text-ink aria-[invalid=true]:border-danger"
      />
      {error && (
        <p id={`${id}-error`} className="text-sm font-semibold text-danger">
          {error}
        </p>
      )}
    </div>
  );
}
