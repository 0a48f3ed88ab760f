import { z } from "zod";

// Request schemas for the account forms. Shared by the route handlers (the real check)
// and the forms (for hints). Messages are what a person sees.

export const emailField = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .toLowerCase()
  .min(1, { error: "Enter your e-mail address." })
  .max(254, { error: "That e-mail address is too long." })
  .pipe(z.email({ error: "Enter an e-mail address like name@example.com." }));

// Length is checked here; the common-password rule runs on the server (lib/server/passwords.ts).
export const newPasswordField = z
  .string({ error: "Choose a password." })
  .min(8, { error: "Use at least 8 characters." })
  .max(128, { error: "Use at most 128 characters." });

// A name reaches plain-text mail and certificates: no control characters, line or paragraph breaks.
const CONTROL_OR_BREAK = /[\u0000-\u001f\u007f-\u009f\u2028\u2029]/;

export const nameField = z
  .string({ error: "Enter your name." })
  .trim()
  .min(1, { error: "Enter your name." })
  .max(120, { error: "Use at most 120 characters for your name." })
  .refine((name) => !CONTROL_OR_BREAK.test(name), { error: "Use letters, spaces and punctuation only: no line breaks or control characters." });

export const SignUpInput = z.object({
  name: nameField,
  email: emailField,
  password: newPasswordField,
});

export const SignInInput = z.object({
  email: emailField,
  password: z.string({ error: "Enter your password." }).min(1, { error: "Enter your password." }).max(1024, { error: "That password is too long." }),
});

export const EmailOnlyInput = z.object({ email: emailField });

export const TokenInput = z.object({
  token: z.string({ error: "The link is incomplete." }).regex(/^[A-Za-z0-9_-]{43}$/, { error: "The link is incomplete or damaged. Copy the whole address from the e-mail." }),
});

export const ResetPasswordInput = TokenInput.extend({ password: newPasswordField });

/** The current password is required by the server whenever the account has one. */
export const ChangePasswordInput = z.object({
  currentPassword: z.string().max(1024, { error: "That password is too long." }).optional(),
  newPassword: newPasswordField,
});

export type SignUpInput = z.infer<typeof SignUpInput>;
export type SignInInput = z.infer<typeof SignInInput>;

/** zod issues → { field: first message } for a form. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = String(issue.path[0] ?? "form");
    out[key] ??= issue.message;
  }
  return out;
}
