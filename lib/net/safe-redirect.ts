// Where to send a person after sign-in, from a `next` parameter anyone can craft. The candidate is
// resolved with the WHATWG URL parser, exactly as the browser will resolve it (it strips tabs and
// newlines and reads a backslash as a slash), and kept only if it stays on our origin and its path
// can't be read as scheme-relative ("//host") when used as a link again.

export const DEFAULT_AFTER_SIGN_IN = "/home";

export function safeRedirectPath(candidate: string | null | undefined, origin: string, fallback = DEFAULT_AFTER_SIGN_IN): string {
  if (typeof candidate !== "string" || candidate.length === 0 || candidate.length > 2048) return fallback;
  // Only a path: no scheme, no host, no backslash or control character anywhere.
  if (!candidate.startsWith("/") || /[\\\u0000-\u001f\u007f]/.test(candidate)) return fallback;
  let base: URL;
  let resolved: URL;
  try {
    base = new URL(origin);
    resolved = new URL(candidate, base);
  } catch {
    return fallback;
  }
  if (resolved.origin !== base.origin) return fallback;
  if (resolved.pathname.startsWith("//") || resolved.pathname.includes("\\")) return fallback;
  return `${resolved.pathname}${resolved.search}${resolved.hash}`;
}
