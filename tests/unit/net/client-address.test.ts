import { describe, expect, it } from "vitest";
import { carriesForwardingHeaders, normalizeAddress, resolveClientAddress } from "@/lib/net/client-address";

// Chain semantics. MDN, "X-Forwarded-For" (HTTP headers reference): the syntax is
// `X-Forwarded-For: <client>, <proxy1>, <proxy2>`; each proxy appends the address it received
// the request from, so the rightmost entries are the most recent hops, and the leftmost are
// whatever the client chose to send. Section "Selecting an IP address", "Trusted proxy count":
// with a fixed number of reverse proxies, search the list from the rightmost address, skipping
// (number of trusted proxies − 1); the first address found is the client. RFC 7239 §8.1: such
// headers can be forged by the client, so only entries added by trusted proxies may be used.
// Our function counts over the chain plus the socket peer (the last proxy is the peer), which is
// the same position: chain[length − hops].

describe("resolveClientAddress", () => {
  it("with 0 trusted hops the socket peer is the client and any X-Forwarded-For is ignored (RFC 7239 §8.1)", () => {
    expect(resolveClientAddress({ peerAddress: "192.0.2.10", forwardedFor: "203.0.113.9", trustedHops: 0 })).toBe("192.0.2.10");
    expect(resolveClientAddress({ peerAddress: "192.0.2.10", forwardedFor: null, trustedHops: 0 })).toBe("192.0.2.10");
  });

  it("with 1 trusted hop the rightmost X-Forwarded-For entry is the client (MDN: skip 1 − 1 = 0 entries)", () => {
    // A proxy that appends: the client sent "198.51.100.1", the proxy added the address it saw.
    expect(resolveClientAddress({ peerAddress: "10.0.0.2", forwardedFor: "198.51.100.1, 203.0.113.9", trustedHops: 1 })).toBe("203.0.113.9");
    // A proxy that overwrites (nginx `proxy_set_header X-Forwarded-For $remote_addr`): one entry.
    expect(resolveClientAddress({ peerAddress: "10.0.0.2", forwardedFor: "203.0.113.9", trustedHops: 1 })).toBe("203.0.113.9");
  });

  it("with 2 trusted hops the second entry from the right is the client (MDN: skip 2 − 1 = 1 entry)", () => {
    // MDN's example shape `<client>, <proxy1>, <proxy2>` behind two proxies; here the client forged a first entry.
    expect(resolveClientAddress({ peerAddress: "10.0.0.3", forwardedFor: "1.2.3.4, 203.0.113.9, 10.0.0.2", trustedHops: 2 })).toBe("203.0.113.9");
  });

  it("a chain shorter than the hops promised falls back to its leftmost address, never to a forged one beyond it", () => {
    expect(resolveClientAddress({ peerAddress: "10.0.0.2", forwardedFor: null, trustedHops: 1 })).toBe("10.0.0.2");
    expect(resolveClientAddress({ peerAddress: "10.0.0.3", forwardedFor: "203.0.113.9", trustedHops: 3 })).toBe("203.0.113.9");
  });

  it("ignores empty list entries and spaces, and treats IPv4-mapped IPv6 as the IPv4 address", () => {
    expect(resolveClientAddress({ peerAddress: "::ffff:127.0.0.1", forwardedFor: " , 203.0.113.9 ,", trustedHops: 1 })).toBe("203.0.113.9");
    expect(resolveClientAddress({ peerAddress: "::ffff:127.0.0.1", forwardedFor: undefined, trustedHops: 0 })).toBe("127.0.0.1");
    expect(normalizeAddress(" ::FFFF:192.0.2.1 ")).toBe("192.0.2.1");
    expect(normalizeAddress("2001:db8::1")).toBe("2001:db8::1");
  });

  it("an unknown socket address is named, not left empty", () => {
    expect(resolveClientAddress({ peerAddress: "", forwardedFor: null, trustedHops: 0 })).toBe("unknown");
  });
});

describe("carriesForwardingHeaders", () => {
  it("notices X-Forwarded-For, Forwarded (RFC 7239 §4) and the common single-address headers", () => {
    expect(carriesForwardingHeaders({ host: "127.0.0.1" })).toBe(false);
    expect(carriesForwardingHeaders({ "x-forwarded-for": "203.0.113.9" })).toBe(true);
    expect(carriesForwardingHeaders({ forwarded: "for=192.0.2.60;proto=http;by=203.0.113.43" })).toBe(true);
    expect(carriesForwardingHeaders({ "x-real-ip": "203.0.113.9" })).toBe(true);
  });
});
