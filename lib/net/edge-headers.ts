import type { IncomingMessage } from "node:http";
import { carriesForwardingHeaders, EDGE_HEADERS, resolveClientAddress } from "./client-address";

// The headers scripts/serve.ts writes onto every incoming request before Next.js sees it. Pure,
// so the rule is tested without a socket: what a client sent in these three headers never
// survives; only the socket and the proxies we were told to trust decide the address.

export type RawHeaders = Record<string, string | string[] | undefined>;
export type EdgeHeaderValues = Record<(typeof EDGE_HEADERS)[keyof typeof EDGE_HEADERS], string>;

/** One header value as a string: Node joins repeated X-Forwarded-For lines with ", " already; an array is joined the same way. */
function single(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value.join(", ") : value;
}

/**
 * The values of the edge headers for one request: the resolved client address (one address),
 * the TCP peer, and whether the raw request carried any forwarding header. The caller replaces
 * the three headers with these, whatever the client sent in them.
 */
export function edgeHeaders(raw: RawHeaders, socketAddress: string | undefined, trustedHops: number): EdgeHeaderValues {
  const peer = resolveClientAddress({ peerAddress: socketAddress ?? "", forwardedFor: null, trustedHops: 0 });
  return {
    [EDGE_HEADERS.clientAddress]: resolveClientAddress({ peerAddress: socketAddress ?? "", forwardedFor: single(raw["x-forwarded-for"]), trustedHops }),
    [EDGE_HEADERS.peerAddress]: peer,
    [EDGE_HEADERS.forwarded]: carriesForwardingHeaders(raw) ? "1" : "0",
  };
}

/**
 * Writes the edge headers onto our own incoming request (scripts/serve.ts calls it first thing
 * for every request). The values are computed from the raw headers before any is replaced.
 */
export function applyEdgeHeaders(req: IncomingMessage, trustedHops: number): void {
  const values = edgeHeaders(req.headers, req.socket.remoteAddress, trustedHops);
  for (const name of Object.values(EDGE_HEADERS)) delete req.headers[name];
  Object.assign(req.headers, values);
}
