// The error contract (docs/decisions/002-error-contract.md): one table of codes, each with its
// HTTP status (RFC 9110 §15 for the meaning of each status; 429 is RFC 6585 §4) and a sentence.
import { describe, expect, it } from "vitest";
import { ERRORS, fail, formState, statusOf } from "@/lib/server/errors";

describe("the error table", () => {
  it("gives every code a 4xx or 5xx status and a sentence a person can read", () => {
    for (const [code, { status, message }] of Object.entries(ERRORS)) {
      expect(status, code).toBeGreaterThanOrEqual(400);
      expect(status, code).toBeLessThan(600);
      expect(message, code).toMatch(/^[A-Z].*[.!]$/);
    }
  });

  it("has the statuses HTTP defines for them", () => {
    expect(statusOf("not_signed_in")).toBe(401); // RFC 9110 §15.5.2
    expect(statusOf("forbidden")).toBe(403); // RFC 9110 §15.5.4
    expect(statusOf("not_found")).toBe(404); // RFC 9110 §15.5.5
    expect(statusOf("conflict")).toBe(409); // RFC 9110 §15.5.10
    expect(statusOf("payload_too_large")).toBe(413); // RFC 9110 §15.5.14 (Content Too Large)
    expect(statusOf("rate_limited")).toBe(429); // RFC 6585 §4
    expect(statusOf("unavailable")).toBe(503); // RFC 9110 §15.6.4
    expect(ERRORS.unavailable.message).toBe("Axisline can't reach its database right now. Please try again in a minute.");
  });
});

describe("fail and formState", () => {
  it("a failure carries its code and the table's sentence unless a more precise one is given", () => {
    expect(fail("not_found")).toEqual({ ok: false, code: "not_found", message: ERRORS.not_found.message });
    const precise = fail("forbidden", { message: "Only apprentices keep lesson progress." });
    expect(precise).toMatchObject({ ok: false, code: "forbidden", message: "Only apprentices keep lesson progress." });
    expect(statusOf(precise.code)).toBe(403);
  });

  it("a server action's form gets the sentence and the field errors, or the success sentence", () => {
    const refused = fail("invalid_input", { fieldErrors: { role: "Choose one of the four roles." } });
    expect(formState(refused, "Saved.")).toEqual({ ok: false, code: "invalid_input", message: ERRORS.invalid_input.message, fieldErrors: { role: "Choose one of the four roles." } });
    expect(formState({ ok: true }, "Saved.")).toEqual({ ok: true, message: "Saved." });
  });
});
