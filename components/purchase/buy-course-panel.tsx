"use client";
// "Buy this course" on the (static) course page: the price is rendered with the page; who is
// looking is read in the browser (/api/me, /api/progress). A visitor is asked to sign in, an
// apprentice without a seat gets the form, anyone with a seat or another role sees only the price.
import Link from "next/link";
import { useActionState, useState } from "react";
import { useCourseProgress } from "@/components/home/use-progress";
import { SubmitButton } from "@/components/ui/submit-button";
import { useRemoteData } from "@/lib/client/remote-data";
import type { FormState } from "@/lib/dto/result";

type Me = { id: string; role: string } | null;
export type PurchaseAction = (state: FormState | null, form: FormData) => Promise<FormState | null>;

async function fetchMe(url: string): Promise<Me> {
  const res = await fetch(url, { credentials: "same-origin", cache: "no-store" });
  if (!res.ok) throw new Error(`me: ${res.status}`);
  return ((await res.json()) as { me: Me }).me;
}

function newNonce(): string {
  return crypto.randomUUID();
}

export function BuyCoursePanel({ courseSlug, courseTitle, priceLabel, action }: { courseSlug: string; courseTitle: string; priceLabel: string; action: PurchaseAction }) {
  const { data: me, isLoading } = useRemoteData("/api/me", fetchMe, { revalidateOnFocus: true });
  const { course, isLoading: progressLoading } = useCourseProgress(courseSlug);
  // One nonce per rendering of the form: a double submit sends it twice and makes one order.
  const [nonce] = useState(newNonce);
  const [state, formAction] = useActionState(action, null);

  let body: React.ReactNode = null;
  if (isLoading || (me && progressLoading)) body = <span className="block h-10 w-48 animate-pulse rounded-md bg-surface-sunken" aria-hidden="true" />;
  else if (!me)
    body = (
      <p className="text-body-sm">
        <Link href={`/sign-in?next=${encodeURIComponent(`/courses/${courseSlug}`)}`} className="font-semibold">
          Sign in to buy this course
        </Link>{" "}
        or get a seat from your school.
      </p>
    );
  else if (course) body = <p className="text-body-sm text-ink-muted">You have a seat on this course.</p>;
  else if (me.role === "apprentice")
    body = (
      <form action={formAction} className="space-y-2" data-testid="buy-course-form">
        <input type="hidden" name="courseSlug" value={courseSlug} />
        <input type="hidden" name="nonce" value={nonce} />
        <SubmitButton>
          Buy this course<span className="sr-only">: {courseTitle}</span>
        </SubmitButton>
        <p className="text-caption text-ink-muted">You pay on the payment service&apos;s secure page and come back here.</p>
        {state && !state.ok && (
          <p role="alert" className="text-body-sm font-semibold text-danger">
            {state.message}
          </p>
        )}
      </form>
    );
  else body = <p className="text-body-sm text-ink-muted">Schools buy seats for their classes in the school office.</p>;

  return (
    <section aria-labelledby="course-price" className="space-y-3 rounded-card border border-rule bg-surface-raised p-5" data-testid="course-price">
      <h2 id="course-price" className="text-title-3">
        Price
      </h2>
      <p>
        <span className="font-mono text-title-3">{priceLabel}</span> <span className="text-body-sm text-ink-muted">for one seat</span>
      </p>
      {body}
    </section>
  );
}
