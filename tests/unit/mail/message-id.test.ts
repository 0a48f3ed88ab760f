import { describe, expect, it } from "vitest";
import { messageIdFor, senderDomain } from "@/lib/email/message-id";
import { backoffMs, LEASE_SECONDS, MAX_ATTEMPTS } from "@/lib/email/worker";
import { SMTP_TIMEOUTS_MS } from "@/lib/email/transport";

const ROW = "3f2b8c1e-7d4a-4e59-9a61-0c5d2e8f1b7a";

describe("Message-ID of an outbox row", () => {
  it("takes the domain of the sender, written with or without a display name", () => {
    expect(senderDomain("Axisline <no-reply@axisline.test>")).toBe("axisline.test");
    expect(senderDomain("no-reply@Mail.Axisline.example")).toBe("mail.axisline.example");
    expect(senderDomain('"Axisline, training" <hello@axisline.example> ')).toBe("axisline.example");
  });

  it("refuses a sender without a usable domain, with a sentence naming MAIL_FROM", () => {
    for (const bad of ["Axisline", "no-reply@", "Axisline <no-reply@localhost>", "a@b@-bad-.example"]) {
      expect(() => senderDomain(bad)).toThrow(/MAIL_FROM/);
    }
  });

  it("is an RFC 5322 §3.6.4 msg-id, the same for every attempt at one row", () => {
    const id = messageIdFor(ROW, "Axisline <no-reply@axisline.test>");
    expect(id).toBe(`<${ROW}@axisline.test>`);
    // msg-id = "<" id-left "@" id-right ">", id-left and id-right dot-atom-text (RFC 5322 §3.6.4, §3.2.3).
    expect(id).toMatch(/^<[A-Za-z0-9!#$%&'*+/=?^_`{|}~-]+(\.[A-Za-z0-9!#$%&'*+/=?^_`{|}~-]+)*@[A-Za-z0-9!#$%&'*+/=?^_`{|}~-]+(\.[A-Za-z0-9!#$%&'*+/=?^_`{|}~-]+)*>$/);
    expect(messageIdFor(ROW, "Axisline <no-reply@axisline.test>")).toBe(id);
    expect(messageIdFor(ROW.toUpperCase(), "no-reply@axisline.test")).toBe(id);
  });

  it("refuses an id that could break the header", () => {
    expect(() => messageIdFor("x>\r\nBcc: someone@example.org", "no-reply@axisline.test")).toThrow();
  });
});

describe("retries and leases", () => {
  it("backs off 5 s, doubling, capped at 30 minutes", () => {
    expect([1, 2, 3, 4].map(backoffMs)).toEqual([5_000, 10_000, 20_000, 40_000]);
    expect(backoffMs(MAX_ATTEMPTS)).toBe(640_000);
    expect(backoffMs(20)).toBe(30 * 60_000);
  });

  it("leases a row for longer than one send can take, so a slow relay is not raced by a second worker", () => {
    const worstSendMs = SMTP_TIMEOUTS_MS.connection + SMTP_TIMEOUTS_MS.greeting + SMTP_TIMEOUTS_MS.socket;
    expect(LEASE_SECONDS * 1000).toBeGreaterThan(2 * worstSendMs);
  });
});
