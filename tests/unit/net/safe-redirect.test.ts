// Open-redirect forms from the OWASP Unvalidated Redirects and Forwards Cheat Sheet and the WHATWG
// URL Standard's parsing rules (tabs/newlines stripped, "\" read as "/" in special schemes).
import { describe, expect, it } from "vitest";
import { safeRedirectPath } from "@/lib/net/safe-redirect";

const ORIGIN = "http://127.0.0.1:3000";

describe("safeRedirectPath", () => {
  it.each([
    ["/learn", "/learn"],
    ["/courses/miking-the-band?x=1#part-2", "/courses/miking-the-band?x=1#part-2"],
    ["/teach/quizzes/a%20b", "/teach/quizzes/a%20b"],
    ["/./learn", "/learn"],
  ])("keeps a path on our origin: %s", (input, expected) => {
    expect(safeRedirectPath(input, ORIGIN)).toBe(expected);
  });

  it.each([
    "//evil.example",
    "///evil.example",
    "/\\evil.example",
    "\\\\evil.example",
    "/\t/evil.example",
    "/\n/evil.example",
    "/\r\n/evil.example",
    "/.//evil.example",
    "https://evil.example/",
    "http://127.0.0.1:3000.evil.example/",
    "javascript:alert(1)",
    "JaVaScRiPt:alert(1)",
    " /learn",
    "evil.example",
    "",
    "/" + "a".repeat(3000),
  ])("refuses %j and falls back to /home", (input) => {
    const out = safeRedirectPath(input, ORIGIN);
    expect(out).toBe("/home");
  });

  it("anything it returns resolves, as a browser would, to our origin", () => {
    for (const input of ["/learn", "/%2F%2Fevil.example", "/%5Cevil.example", "/%09/evil.example"]) {
      const out = safeRedirectPath(input, ORIGIN);
      expect(new URL(out, ORIGIN).origin).toBe(ORIGIN);
      expect(out.startsWith("//")).toBe(false);
    }
  });

  it("refuses undefined and a non-string", () => {
    expect(safeRedirectPath(undefined, ORIGIN)).toBe("/home");
    expect(safeRedirectPath(null, ORIGIN)).toBe("/home");
  });
});
