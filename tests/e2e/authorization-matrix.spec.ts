import { expect, test, type APIRequestContext } from "./page-check";
import { apiContext, demoUser, signInApi } from "./helpers";

// Every page and route handler of the foundation × (anonymous, each role) → the expected status.
// Pages redirect anonymous visitors to sign-in (307) and answer 403 to the wrong role.
type Who = "anonymous" | "apprentice" | "instructor" | "school_manager" | "admin";
const WHO: Who[] = ["anonymous", "apprentice", "instructor", "school_manager", "admin"];

const ALL = (s: number) => Object.fromEntries(WHO.map((w) => [w, s])) as Record<Who, number>;
const ONLY = (role: Who) => ({ ...ALL(403), anonymous: 307, [role]: 200 }) as Record<Who, number>;
const SIGNED_IN = (s: number) => ({ ...ALL(s), anonymous: 307 }) as Record<Who, number>;

const PAGES: [string, Record<Who, number>][] = [
  ["/", ALL(200)],
  ["/sign-in", ALL(200)],
  ["/sign-up", ALL(200)],
  ["/sign-in/link", ALL(200)],
  ["/reset-password", ALL(200)],
  ["/verify-email", ALL(200)],
  ["/home", SIGNED_IN(307)],
  ["/account", SIGNED_IN(200)],
  ["/learn", ONLY("apprentice")],
  ["/teach", ONLY("instructor")],
  ["/school", ONLY("school_manager")],
  ["/admin", ONLY("admin")],
  ["/admin/audit", ONLY("admin")],
  // The dev inbox answers only a direct request from this machine (lib/server/dev-inbox.ts); these
  // requests carry X-Forwarded-For (apiContext), so 404 for everyone. The browser test in shell.spec.ts opens it.
  ["/dev/inbox", ALL(404)],
  ["/no-such-page", ALL(404)],
  // Certificates (issue 13): the graduate's page, the revocation pages, the public verification.
  ["/learn/certificates", ONLY("apprentice")],
  ["/teach/certificates", ONLY("instructor")],
  ["/admin/certificates", ONLY("admin")],
  ["/verify", ALL(200)],
  ["/verify/0000-0000-0000", ALL(200)], // an unknown code is an answer, not a missing page
];

const ROUTES: [string, string, Record<Who, number>][] = [
  ["GET", "/api/health", ALL(200)],
  ["GET", "/api/me", ALL(200)], // anonymous: { me: null }
  // sign-out-everywhere would end the shared demo sessions: tested with fresh accounts in auth-http.spec.ts
  ["POST", "/api/account/sign-in", ALL(400)], // empty body: a sentence, whoever asks
  ["POST", "/api/account/sign-up", ALL(400)],
  ["POST", "/api/account/reset-request", ALL(400)],
  ["POST", "/api/account/reset-password", ALL(400)],
  ["POST", "/api/account/link-request", ALL(400)],
  ["POST", "/api/account/link", ALL(400)],
  ["POST", "/api/account/verify-email", ALL(400)],
  ["POST", "/api/account/sign-out", ALL(200)],
  // Certificates: public issuer, keys, status list and verification; the graduate's and revokers' commands.
  ["GET", "/issuer", ALL(200)],
  ["GET", "/issuer/jwks.json", ALL(200)],
  ["GET", "/credentials/status/1", ALL(200)],
  ["GET", "/api/verify/0000-0000-0000", ALL(200)],
  ["POST", "/api/certificates", { anonymous: 401, apprentice: 400, instructor: 403, school_manager: 403, admin: 403 }], // empty body: no course named
  ["GET", "/api/certificates/00000000-0000-4000-8000-000000000000/credential", { anonymous: 401, apprentice: 404, instructor: 403, school_manager: 403, admin: 403 }],
  ["POST", "/api/certificates/00000000-0000-4000-8000-000000000000/revoke", { anonymous: 401, apprentice: 403, instructor: 400, school_manager: 403, admin: 400 }], // no reason given
];

async function contextFor(who: Who): Promise<APIRequestContext> {
  if (who === "anonymous") return apiContext();
  const u = demoUser(who);
  return (await signInApi(u.email, u.password)).api;
}

for (const who of WHO) {
  test(`pages as ${who}`, async () => {
    const api = await contextFor(who);
    for (const [path, expected] of PAGES) {
      const res = await api.get(path);
      expect(res.status(), `${who} GET ${path}`).toBe(expected[who]);
      if (res.status() === 307 && expected[who] === 307 && who === "anonymous") expect(res.headers()["location"]).toContain("/sign-in");
    }
  });

  test(`route handlers as ${who}`, async () => {
    for (const [method, path, expected] of ROUTES) {
      // A fresh sign-in per route: sign-out and sign-out-everywhere end the session they are given.
      const api = await contextFor(who);
      const res = method === "GET" ? await api.get(path) : await api.post(path, { data: {} });
      expect(res.status(), `${who} ${method} ${path}`).toBe(expected[who]);
    }
  });
}
