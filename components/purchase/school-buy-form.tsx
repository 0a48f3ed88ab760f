"use client";
// The school's purchase form: course, class (one of the school's classes on that course, or a
// new one), quantity, and the price as it will be charged, computed by the same pricing module
// the server uses. The server recomputes everything; this only shows it.
import { useActionState, useState } from "react";
import { FormField } from "@/components/ui/form-field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { SubmitButton } from "@/components/ui/submit-button";
import type { PurchaseOptionsDto } from "@/lib/dto/orders";
import type { FormState } from "@/lib/dto/result";
import { formatMoney, MAX_SEATS_PER_ORDER, quoteSchoolOrder } from "@/lib/pricing/prices";
import type { PurchaseAction } from "./buy-course-panel";

export function SchoolBuyForm({ options, nonce, action, preselectClassId }: { options: PurchaseOptionsDto; nonce: string; action: PurchaseAction; preselectClassId?: string }) {
  const [state, formAction] = useActionState<FormState | null, FormData>(action, null);
  const allClasses = options.schools.flatMap((s) => s.classes.map((c) => ({ ...c, schoolName: s.schoolName })));
  const preselected = allClasses.find((c) => c.id === preselectClassId);
  const [courseSlug, setCourseSlug] = useState(preselected?.courseSlug ?? options.courses[0]?.slug ?? "");
  const classesOfCourse = allClasses.filter((c) => c.courseSlug === courseSlug);
  const [target, setTarget] = useState<"existing" | "new">(preselected || classesOfCourse.length > 0 ? "existing" : "new");
  const [quantity, setQuantity] = useState("6");
  const quote = /^\d{1,4}$/.test(quantity.trim()) ? quoteSchoolOrder({ courseSlug, quantity: Number(quantity) }) : null;
  const errors = state?.fieldErrors ?? {};
  const useExisting = target === "existing" && classesOfCourse.length > 0;

  return (
    <form action={formAction} className="max-w-reading space-y-5" data-testid="school-buy-form">
      <input type="hidden" name="nonce" value={nonce} />
      <FormField label="Course" name="courseSlug" error={errors.courseSlug} required>
        {(control) => (
          <Select {...control} value={courseSlug} onChange={(e) => setCourseSlug(e.target.value)}>
            {options.courses.map((c) => (
              <option key={c.slug} value={c.slug}>
                {c.title}
              </option>
            ))}
          </Select>
        )}
      </FormField>

      <fieldset className="space-y-3">
        <legend className="text-body font-semibold">Seats for</legend>
        <label className="flex min-h-10 items-center gap-2">
          <input type="radio" name="target" value="existing" checked={useExisting} disabled={classesOfCourse.length === 0} onChange={() => setTarget("existing")} className="size-5" />
          One of your classes on this course{classesOfCourse.length === 0 ? " (none yet)" : ""}
        </label>
        <label className="flex min-h-10 items-center gap-2">
          <input type="radio" name="target" value="new" checked={!useExisting} onChange={() => setTarget("new")} className="size-5" />A new class
        </label>
      </fieldset>

      {useExisting ? (
        <FormField label="Class" name="classId" error={errors.classId} required>
          {(control) => (
            <Select {...control} key={courseSlug} defaultValue={preselected?.courseSlug === courseSlug ? preselected.id : classesOfCourse[0]?.id}>
              {classesOfCourse.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.name} ({c.term}): {c.seatsPurchased} bought, {c.seatsClaimed} taken{options.schools.length > 1 ? `, ${c.schoolName}` : ""}
                </option>
              ))}
            </Select>
          )}
        </FormField>
      ) : (
        <div className="space-y-4 rounded-card border border-rule p-4">
          {options.schools.length > 1 ? (
            <FormField label="School" name="schoolId" required>
              {(control) => (
                <Select {...control}>
                  {options.schools.map((s) => (
                    <option key={s.schoolId} value={s.schoolId}>
                      {s.schoolName}
                    </option>
                  ))}
                </Select>
              )}
            </FormField>
          ) : (
            <input type="hidden" name="schoolId" value={options.schools[0]?.schoolId ?? ""} />
          )}
          <FormField label="Name of the new class" name="className" error={errors.newClass} required>
            {(control) => <Input {...control} maxLength={80} autoComplete="off" />}
          </FormField>
          <FormField label="Term" name="term" hint="For example “Spring 2027”." required>
            {(control) => <Input {...control} maxLength={40} autoComplete="off" />}
          </FormField>
        </div>
      )}

      <FormField label="Number of seats" name="quantity" hint={`From 1 to ${MAX_SEATS_PER_ORDER}.`} error={errors.quantity} required>
        {(control) => <Input {...control} type="number" inputMode="numeric" min={1} max={MAX_SEATS_PER_ORDER} step={1} value={quantity} onChange={(e) => setQuantity(e.target.value)} className="max-w-40" />}
      </FormField>

      <p aria-live="polite" className="rounded-card bg-surface-sunken px-4 py-3" data-testid="live-price">
        {quote?.ok ? (
          <>
            <span className="font-semibold">Total {formatMoney(quote.amountTotal)}</span>: {quote.quantity} × {formatMoney(quote.unitAmount)}
            {quote.percentOff > 0 ? ` (${quote.tierLabel}, ${quote.percentOff} % off ${formatMoney(quote.listUnitAmount)})` : ` (${quote.tierLabel})`}
          </>
        ) : (
          `Choose a whole number of seats from 1 to ${MAX_SEATS_PER_ORDER} to see the price.`
        )}
      </p>

      {state && !state.ok && (
        <p role="alert" className="font-semibold text-danger">
          {state.message}
        </p>
      )}
      <SubmitButton>Go to payment</SubmitButton>
      <p className="text-caption text-ink-muted">You pay on the payment service&apos;s secure page; the seats reach the class as soon as the payment is confirmed.</p>
    </form>
  );
}
