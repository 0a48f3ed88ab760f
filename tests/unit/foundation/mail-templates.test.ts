import { describe, expect, it } from "vitest";
import { renderMail } from "@/lib/email/templates";
import { backoffMs } from "@/lib/email/worker";

describe("mail templates", () => {
  it("every template has a subject, a plain-text and an HTML part carrying the link", () => {
    for (const template of ["verify_email", "sign_in_link", "reset_password"] as const) {
      const m = renderMail({ template, name: "Maren", url: "http://127.0.0.1:3000/x?token=abc" });
      expect(m.subject.length).toBeGreaterThan(5);
      expect(m.text).toContain("http://127.0.0.1:3000/x?token=abc");
      expect(m.html).toContain("http://127.0.0.1:3000/x?token=abc");
    }
  });
  it("escapes names in HTML", () => {
    const m = renderMail({ template: "verify_email", name: "<script>x</script>", url: "http://a.test/" });
    expect(m.html).not.toContain("<script>x");
    expect(m.html).toContain("&lt;script&gt;");
  });
  it("the sign-in link mail states the 10-minute, single-use limit", () => {
    expect(renderMail({ template: "sign_in_link", name: "J", url: "http://a.test/" }).text).toMatch(/once, for 10 minutes/);
  });
});

describe("outbox backoff", () => {
  it("doubles from 5 s and caps at 30 minutes", () => {
    expect([1, 2, 3, 4].map(backoffMs)).toEqual([5000, 10000, 20000, 40000]);
    expect(backoffMs(30)).toBe(30 * 60_000);
  });
});
