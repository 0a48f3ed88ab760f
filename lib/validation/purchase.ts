// What a purchase form may send (lib/server/purchases.ts validates with these). Strict types: a
// quantity is a number, never a string, so "5" from a JSON client is refused; server actions
// turn a form's digits into a number first (quantityFromForm).
import { z } from "zod";
import { hasPrice, MAX_SEATS_PER_ORDER } from "@/lib/pricing/prices";

export const QUANTITY_MESSAGE = `Choose a whole number of seats from 1 to ${MAX_SEATS_PER_ORDER}.`;
const COURSE_MESSAGE = "Choose one of the courses on sale.";
const NONCE_MESSAGE = "This purchase form is incomplete or too old. Reload the page and try again.";

const courseSlug = z
  .string({ error: COURSE_MESSAGE })
  .regex(/^[a-z0-9-]{1,80}$/, { error: COURSE_MESSAGE })
  .refine(hasPrice, { error: COURSE_MESSAGE });

const quantity = z
  .number({ error: QUANTITY_MESSAGE })
  .int({ error: QUANTITY_MESSAGE })
  .min(1, { error: QUANTITY_MESSAGE })
  .max(MAX_SEATS_PER_ORDER, { error: QUANTITY_MESSAGE });

/** A random token rendered into each purchase form: two submissions of one form share it. */
const nonce = z.string({ error: NONCE_MESSAGE }).regex(/^[A-Za-z0-9_-]{16,64}$/, { error: NONCE_MESSAGE });

const className = z.string({ error: "Give the new class a name." }).trim().min(2, { error: "Give the new class a name of at least 2 characters." }).max(80, { error: "Keep the class name under 80 characters." });
const term = z.string({ error: "Say which term the class runs in." }).trim().min(2, { error: "Say which term the class runs in (at least 2 characters)." }).max(40, { error: "Keep the term under 40 characters." });

export const SchoolPurchaseInput = z
  .object({
    courseSlug,
    quantity,
    nonce,
    classId: z.uuid({ error: "Choose one of your classes." }).optional(),
    newClass: z.object({ schoolId: z.uuid({ error: "Choose your school." }), name: className, term }).optional(),
  })
  .refine((v) => (v.classId === undefined) !== (v.newClass === undefined), { error: "Choose one of your classes, or name a new class, not both.", path: ["classId"] });

export const SelfPurchaseInput = z.object({ courseSlug, nonce });

export type SchoolPurchaseInputT = z.infer<typeof SchoolPurchaseInput>;

/** A form's quantity field: whole digits become a number; anything else is passed on for zod to refuse. */
export function quantityFromForm(value: FormDataEntryValue | null): unknown {
  return typeof value === "string" && /^\s*\d{1,9}\s*$/.test(value) ? Number(value) : value;
}

/** Field errors by the first path segment, and the first problem as the sentence. */
export function purchaseProblems(error: z.ZodError): { message: string; fieldErrors: Record<string, string> } {
  const fieldErrors: Record<string, string> = {};
  for (const issue of error.issues) fieldErrors[String(issue.path[0] ?? "form")] ??= issue.message;
  return { message: error.issues[0]?.message ?? "Some of what you entered needs another look.", fieldErrors };
}
