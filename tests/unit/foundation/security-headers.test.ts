// The headers next.config.ts sends on every route (OWASP HTTP Headers Cheat Sheet; CSP Level 3).
import { afterEach, describe, expect, it, vi } from "vitest";

async function headersWith(env: Record<string, string>) {
  vi.resetModules();
  for (const [k, v] of Object.entries(env)) vi.stubEnv(k, v);
  const config = (await import("@/next.config")).default;
  const [rule] = await config.headers!();
  return Object.fromEntries(rule.headers.map((h) => [h.key, h.value]));
}

afterEach(() => vi.unstubAllEnvs());

describe("security headers", () => {
  it("a loopback http build sends the CSP and no HSTS", async () => {
    const h = await headersWith({ NODE_ENV: "production", NEXTAUTH_URL: "http://127.0.0.1:3000" });
    expect(h["Strict-Transport-Security"]).toBeUndefined();
    const csp = h["Content-Security-Policy"];
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("base-uri 'self'");
    expect(csp).not.toContain("unsafe-eval");
    expect(csp).not.toContain("upgrade-insecure-requests");
    expect(h["X-Content-Type-Options"]).toBe("nosniff");
  });

  it("an https (hosted) build adds HSTS for a year and upgrades insecure requests", async () => {
    const h = await headersWith({ NODE_ENV: "production", NEXTAUTH_URL: "https://axisline.example" });
    expect(h["Strict-Transport-Security"]).toBe("max-age=31536000; includeSubDomains");
    expect(h["Content-Security-Policy"]).toContain("upgrade-insecure-requests");
  });

  it("compression is Next's own unless the proxy compresses", async () => {
    vi.resetModules();
    vi.stubEnv("COMPRESSION_BY_PROXY", "true");
    expect((await import("@/next.config")).default.compress).toBe(false);
    vi.unstubAllEnvs();
    vi.resetModules();
    expect((await import("@/next.config")).default.compress).toBe(true);
  });
});
