// The school office's pages and route handlers over HTTP, as each role and as another school's
// manager (the data-access matrix, tests/integration/authorization-seats.ts, covers the server actions).
import { withDb } from "../support/db";
import { uniqueEmail } from "../support/unique";
import { apiContext, demoUser, signInApi } from "./helpers";
import { expect, test, type APIRequestContext } from "./page-check";

type Who = "anonymous" | "apprentice" | "instructor" | "school_manager" | "admin" | "other_manager";
const WHO: Who[] = ["anonymous", "apprentice", "instructor", "school_manager", "admin", "other_manager"];
const PASSWORD = "another school's passphrase";

/** A manager of a school of their own (signed up over HTTP, promoted in the database). */
async function otherManager(): Promise<string> {
  const email = uniqueEmail("other-manager");
  const api = await apiContext();
  expect((await api.post("/api/account/sign-up", { data: { name: "Ivo Strand", email, password: PASSWORD } })).status()).toBe(200);
  await api.dispose();
  await withDb(async (c) => {
    const { rows: u } = await c.query("update users set role = 'school_manager', email_verified_at = now() where email = $1 returning id", [email]);
    const { rows: s } = await c.query("insert into schools (slug, name) values ($1, 'Elsewhere Sound School') returning id", [`elsewhere-${Date.now()}-${Math.random().toString(36).slice(2, 8)}`]);
    await c.query("insert into school_members (school_id, user_id, role) values ($1, $2, 'manager')", [s[0].id, u[0].id]);
  });
  return email;
}

async function contextFor(who: Who, otherEmail: string): Promise<APIRequestContext> {
  if (who === "anonymous") return apiContext();
  if (who === "other_manager") return (await signInApi(otherEmail, PASSWORD)).api;
  const u = demoUser(who);
  return (await signInApi(u.email, u.password)).api;
}

test("school office pages and routes answer each role, and another school's manager gets 404", async () => {
  const other = await otherManager();
  const { rows } = await withDb((c) => c.query("select id from classes where name = 'Spring class: Miking the band'"));
  const classId = rows[0].id as string;
  const expected: Record<string, Record<Who, number>> = {
    "GET /school": { anonymous: 307, apprentice: 403, instructor: 403, school_manager: 200, admin: 403, other_manager: 200 },
    [`GET /school/classes/${classId}`]: { anonymous: 307, apprentice: 403, instructor: 403, school_manager: 200, admin: 403, other_manager: 404 },
    [`GET /school/classes/${classId}/roster.csv`]: { anonymous: 401, apprentice: 403, instructor: 403, school_manager: 200, admin: 403, other_manager: 404 },
    "GET /school/classes/not-a-class": { anonymous: 307, apprentice: 403, instructor: 403, school_manager: 404, admin: 403, other_manager: 404 },
    // An unknown or used token shows the "can't be used" page, to anyone.
    [`GET /invitations/${"x".repeat(43)}`]: { anonymous: 200, apprentice: 200, instructor: 200, school_manager: 200, admin: 200, other_manager: 200 },
    // Empty body: signed out 401, staff 403 (seats are for apprentices), an apprentice 400 (no valid token).
    "POST /api/invitations/accept": { anonymous: 401, apprentice: 400, instructor: 403, school_manager: 403, admin: 403, other_manager: 403 },
    "POST /api/invitations/sign-up": { anonymous: 400, apprentice: 400, instructor: 400, school_manager: 400, admin: 400, other_manager: 400 },
  };
  for (const who of WHO) {
    const api = await contextFor(who, other);
    for (const [line, byWho] of Object.entries(expected)) {
      const [method, path] = line.split(" ");
      const res = method === "GET" ? await api.get(path) : await api.post(path, { data: {} });
      expect(res.status(), `${who} ${line}`).toBe(byWho[who]);
      if (res.status() >= 400 && path.startsWith("/api/")) expect((await res.json()).message, `${who} ${line}`).toMatch(/^[A-Z].+\.$/);
      if (path.endsWith("roster.csv") && res.status() === 200) {
        expect(res.headers()["content-type"]).toContain("text/csv");
        expect(res.headers()["content-disposition"]).toBe('attachment; filename="spring-class-miking-the-band-roster.csv"');
        expect(await res.text()).toContain("Ade Brightwater,ade.brightwater@kestrel-bay.example,");
      }
    }
    await api.dispose();
  }
});
