import { describe, expect, it } from "vitest";
import { EnvError, parseEnv } from "@/lib/env";

const good = {
  DATABASE_URL: "postgres://u:p@127.0.0.1:54329/axisline",
  NEXTAUTH_URL: "http://127.0.0.1:3000",
  NEXTAUTH_SECRET: "0123456789abcdef0123456789abcdef",
};

describe("environment validation", () => {
  it("accepts a complete local environment and fills the defaults", () => {
    expect(parseEnv(good)).toMatchObject({ SERVICES_MODE: "local", SMTP_PORT: 2525, SMTP_HOST: "127.0.0.1" });
  });
  it.each([
    [{ DATABASE_URL: "mysql://x" }, /DATABASE_URL must start with postgres:\/\//],
    [{ NEXTAUTH_SECRET: "short" }, /NEXTAUTH_SECRET must be at least 32 characters/],
    [{ NEXTAUTH_URL: "not a url" }, /NEXTAUTH_URL must be a URL/],
    [{ SMTP_PORT: "seventy" }, /SMTP_PORT must be a port number/],
    [{ SMTP_PORT: "70000" }, /SMTP_PORT must be between 1 and 65535/],
    [{ SERVICES_MODE: "staging" }, /SERVICES_MODE must be "local"/],
  ])("names the variable and the reason: %o", (override, message) => {
    expect(() => parseEnv({ ...good, ...override })).toThrow(EnvError);
    expect(() => parseEnv({ ...good, ...override })).toThrow(message);
  });
  it("says which variable is missing", () => {
    expect(() => parseEnv({ NEXTAUTH_URL: good.NEXTAUTH_URL, NEXTAUTH_SECRET: good.NEXTAUTH_SECRET })).toThrow(/DATABASE_URL must be set/);
  });
  it("requires https for hosted mode off loopback", () => {
    expect(() => parseEnv({ ...good, SERVICES_MODE: "hosted", NEXTAUTH_URL: "http://axisline.example" })).toThrow(/https/);
  });
  it("a production build defaults to the hosted services; development to the local stand-ins", () => {
    const payments = { STRIPE_SECRET_KEY: "sk_live_0123456789abcdef", STRIPE_WEBHOOK_SECRET: "whsec_0123456789abcdef0123" };
    expect(parseEnv({ ...good, ...payments, NODE_ENV: "production", NEXTAUTH_URL: "https://axisline.example" }).SERVICES_MODE).toBe("hosted");
    expect(parseEnv({ ...good, NODE_ENV: "development" }).SERVICES_MODE).toBe("local");
    expect(parseEnv({ ...good, NODE_ENV: "production", SERVICES_MODE: "local" }).SERVICES_MODE).toBe("local");
  });
  it("refuses the local stand-ins (and the dev inbox) on a non-loopback listening address", () => {
    expect(() => parseEnv({ ...good, SERVICES_MODE: "local", HOST: "0.0.0.0" })).toThrow(/HOST must be a loopback address/);
    expect(() => parseEnv({ ...good, SERVICES_MODE: "local", HOST: "192.0.2.10" })).toThrow(/HOST must be a loopback address/);
    expect(parseEnv({ ...good, SERVICES_MODE: "local", HOST: "127.0.0.1" }).HOST).toBe("127.0.0.1");
    expect(parseEnv({ ...good, SERVICES_MODE: "local", HOST: "::1" }).HOST).toBe("::1");
  });
  it.each([
    [{ TRUST_PROXY_HOPS: "-1" }, /TRUST_PROXY_HOPS must be between 0 and 5/],
    [{ TRUST_PROXY_HOPS: "many" }, /TRUST_PROXY_HOPS must be a number/],
    [{ PG_POOL_MAX: "0" }, /PG_POOL_MAX must be between 1 and 50/],
    [{ COMPRESSION_BY_PROXY: "yes" }, /COMPRESSION_BY_PROXY must be "true" or "false"/],
  ])("validates the serving variables: %o", (override, message) => {
    expect(() => parseEnv({ ...good, ...override })).toThrow(message);
  });
  it("trusts no proxy hop by default", () => {
    expect(parseEnv(good).TRUST_PROXY_HOPS).toBe(0);
  });
});
