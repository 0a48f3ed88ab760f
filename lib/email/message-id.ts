// The Message-ID of an outbox row (RFC 5322 §3.6.4: msg-id = "<" id-left "@" id-right ">").
// id-left is the row's uuid, id-right the sender's domain, so every attempt at the same row
// carries the same header and a receiver (or a test) can tell a retry from a second message.

const DOMAIN = /^[a-z0-9](?:[a-z0-9-]*[a-z0-9])?(?:\.[a-z0-9](?:[a-z0-9-]*[a-z0-9])?)+$/;
const ID_LEFT = /^[A-Za-z0-9-]+$/;

/** The domain of a sender written `Name <local@domain>` or `local@domain`, lower-cased. */
export function senderDomain(from: string): string {
  const angle = from.match(/<([^<>]*)>\s*$/);
  const address = (angle ? angle[1] : from).trim();
  const at = address.lastIndexOf("@");
  const domain = at > 0 ? address.slice(at + 1).toLowerCase() : "";
  if (!DOMAIN.test(domain)) throw new Error(`The sender address "${from}" has no domain to build a Message-ID from (MAIL_FROM must be like "Axisline <no-reply@example.org>").`);
  return domain;
}

export function messageIdFor(outboxId: string, from: string): string {
  if (!ID_LEFT.test(outboxId)) throw new Error("An outbox id must be a uuid to serve as a Message-ID.");
  return `<${outboxId.toLowerCase()}@${senderDomain(from)}>`;
}
