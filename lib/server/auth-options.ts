import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { env, secureCookies } from "@/lib/env";

export const SESSION_MAX_AGE_SECONDS = 30 * 24 * 60 * 60;

// next-auth's own cookie names; __Secure- is required by browsers once the cookie is Secure.
export function sessionCookieName(): string {
  return secureCookies() ? "__Secure-next-auth.session-token" : "next-auth.session-token";
}

/**
 * next-auth (v4, JWT strategy) carries the session cookie. The token holds only the user id,
 * the session id and the session version; lib/server/viewer.ts checks all three against the
 * database on every request, so revocation takes effect at the very next request.
 * Sign-in itself happens in our route handlers (lib/server/accounts.ts), which need to answer
 * 429 with a sentence; they mint the same JWT with next-auth's encoder.
 */
export function authOptions(): NextAuthOptions {
  const secure = secureCookies();
  return {
    secret: env().NEXTAUTH_SECRET,
    session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS },
    useSecureCookies: secure,
    cookies: {
      sessionToken: {
        name: sessionCookieName(),
        // Lax: the cookie rides along top-level navigations (a link from an e-mail) but not cross-site POSTs.
        options: { httpOnly: true, sameSite: "lax", path: "/", secure },
      },
    },
    pages: { signIn: "/sign-in", error: "/sign-in" },
    // No provider signs anyone in through next-auth's callback route; ours do (see above).
    providers: [
      CredentialsProvider({
        id: "disabled",
        name: "disabled",
        credentials: {},
        authorize: async () => null,
      }),
    ],
    callbacks: {
      async session({ session, token }) {
        return { ...session, sid: token.sid, uid: token.sub, sv: token.sv } as typeof session;
      },
    },
  };
}
