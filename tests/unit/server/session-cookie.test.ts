// The session cookie goes only through next-auth's public JWT API (next-auth v4, next-auth/jwt): tokens interoperate both ways.
import { decode, encode } from "next-auth/jwt";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { env } from "@/lib/env";
import { decodeSessionToken, encodeSessionToken } from "@/lib/server/session-cookie";

// env() is read lazily: a complete local environment for it, before its first call.
beforeAll(() => {
  vi.stubEnv("DATABASE_URL", "postgres://u:p@127.0.0.1:1/unused");
  vi.stubEnv("NEXTAUTH_URL", "http://127.0.0.1:3000");
  vi.stubEnv("NEXTAUTH_SECRET", "a test secret of more than thirty-two characters");
});

const claims = { sub: "3f1b0c1e-0000-4000-8000-000000000001", sid: "3f1b0c1e-0000-4000-8000-000000000002", sv: 3 };

describe("session cookie", () => {
  it("reads a token made by next-auth's encoder, and next-auth reads ours", async () => {
    const byNextAuth = await encode({ token: claims, secret: env().NEXTAUTH_SECRET, maxAge: 60 });
    expect(await decodeSessionToken(byNextAuth)).toEqual(claims);
    const ours = await encodeSessionToken(claims);
    expect(await decode({ token: ours, secret: env().NEXTAUTH_SECRET })).toMatchObject(claims);
  });

  it("refuses a token from another secret, a tampered one and an expired one", async () => {
    const foreign = await encode({ token: claims, secret: "another secret entirely, 32+ chars long", maxAge: 60 });
    expect(await decodeSessionToken(foreign)).toBeNull();
    const good = await encodeSessionToken(claims);
    const parts = good.split(".");
    parts[3] = parts[3].slice(0, -2) + (parts[3].endsWith("AA") ? "BB" : "AA");
    expect(await decodeSessionToken(parts.join("."))).toBeNull();
    // Expired beyond next-auth's 15 s clock tolerance.
    const expired = await encode({ token: claims, secret: env().NEXTAUTH_SECRET, maxAge: -60 });
    expect(await decodeSessionToken(expired)).toBeNull();
  });

  it("refuses a token whose claims are not ours", async () => {
    const odd = await encode({ token: { sub: "x", sid: 7 }, secret: env().NEXTAUTH_SECRET, maxAge: 60 });
    expect(await decodeSessionToken(odd)).toBeNull();
    expect(await decodeSessionToken("not a token")).toBeNull();
  });
});
