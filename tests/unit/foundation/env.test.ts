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
});
