// The client's address, decided once at the edge of our process (scripts/serve.ts) from the
// socket and the proxy hops we were told to trust, then handed to the app in headers that the
// edge always overwrites. Next.js keeps a client-sent X-Forwarded-For (it fills the header from
// the socket only when it is absent), so the app must never read a raw one.

/** Set by scripts/serve.ts on every request, replacing whatever the client sent. */
export const EDGE_HEADERS = {
  /** The resolved client address (one address, never a list). Next passes it on as is. */
  clientAddress: "x-forwarded-for",
  /** The TCP peer of the app process (the proxy, when there is one). */
  peerAddress: "x-axisline-peer",
  /** "1" when the request carried any forwarding header (it came through a proxy, or claims to). */
  forwarded: "x-axisline-forwarded",
} as const;

const FORWARDING_HEADERS = ["x-forwarded-for", "forwarded", "x-real-ip", "x-client-ip", "true-client-ip", "cf-connecting-ip"];

/** Strips the IPv4-mapped prefix so 127.0.0.1 and ::ffff:127.0.0.1 are one bucket. */
export function normalizeAddress(address: string): string {
  const a = address.trim().toLowerCase();
  return a.startsWith("::ffff:") && a.includes(".") ? a.slice(7) : a;
}

/**
 * With `trustedHops` proxies in front, each appending the address it saw to X-Forwarded-For, the
 * chain as we receive it is `[client-sent..., client, proxy1...]` + the socket peer. The client is
 * the trustedHops-th address counted from the right of `chain + peer` (0 hops: the peer itself).
 * If the chain is shorter than promised, the leftmost address is the best we know.
 */
export function resolveClientAddress(input: { peerAddress: string; forwardedFor: string | null | undefined; trustedHops: number }): string {
  const peer = normalizeAddress(input.peerAddress || "unknown");
  if (input.trustedHops <= 0) return peer;
  const chain = (input.forwardedFor ?? "")
    .split(",")
    .map((s) => normalizeAddress(s))
    .filter((s) => s.length > 0);
  const all = [...chain, peer];
  return all[Math.max(0, all.length - 1 - input.trustedHops)];
}

/** True when a request names any forwarding header: it did not come straight from its peer. */
export function carriesForwardingHeaders(headers: Record<string, string | string[] | undefined>): boolean {
  return FORWARDING_HEADERS.some((h) => headers[h] !== undefined);
}
