import "server-only";
import type { Role } from "@/db/schema";
import { secureCookies } from "@/lib/env";

/**
 * How long a sign-in lasts (OWASP ASVS 5.0 V7.3: an inactivity timeout and an absolute maximum
 * lifetime). Values follow NIST SP 800-63B §4.1.3 and §4.2.3 (reauthentication at AAL1 at least
 * every 30 days; at AAL2 every 12 hours and after 30 minutes of inactivity): admins, who can
 * change anyone's role, get the AAL2 limits; everyone else a reading-friendly day of idleness
 * and two weeks in all.
 */
export const SESSION_POLICY = {
  standard: { idleSeconds: 24 * 60 * 60, absoluteSeconds: 14 * 24 * 60 * 60 },
  admin: { idleSeconds: 30 * 60, absoluteSeconds: 12 * 60 * 60 },
} as const;

/** The longest any session can live: the cookie and its JWT never outlive it. */
export const SESSION_MAX_AGE_SECONDS = SESSION_POLICY.standard.absoluteSeconds;

/** last_seen_at is written at most this often, so a busy reader costs one UPDATE a minute. */
export const LAST_SEEN_RESOLUTION_SECONDS = 60;

export function sessionLimitsFor(role: Role) {
  return role === "admin" ? SESSION_POLICY.admin : SESSION_POLICY.standard;
}

// next-auth v4's cookie names; the __Secure- prefix is required by browsers once the cookie is Secure.
export function sessionCookieName(): string {
  return secureCookies() ? "__Secure-next-auth.session-token" : "next-auth.session-token";
}
