// The admin's list of users: staff first, 50 a page, searchable by name or e-mail, with the
// pattern's own wildcards taken literally (PostgreSQL 15 manual §9.7.1: LIKE escapes with "\").
import { afterAll, describe, expect, it } from "vitest";
import { closeDb } from "@/db/connection";
import { signInWithPassword } from "@/lib/server/accounts";
import { USERS_PAGE_SIZE, listUsers } from "@/lib/server/users";
import { createUser, ctx, viewerFromToken } from "./helpers";

afterAll(async () => {
  await closeDb();
});

async function adminViewer() {
  const u = await createUser("admin");
  const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
  if (!s.ok) throw new Error("sign-in failed");
  return (await viewerFromToken(s.sessionToken))!;
}

describe("listUsers", () => {
  it("finds one account by its address, and a literal underscore matches only itself", async () => {
    const admin = await adminViewer();
    const u = await createUser("apprentice");
    const found = await listUsers(admin, { query: u.email });
    expect(found.ok && found.users.map((x) => x.email)).toEqual([u.email]);
    const wildcard = await listUsers(admin, { query: "%" });
    expect(wildcard.ok && wildcard.total).toBe(0);
    const underscore = await listUsers(admin, { query: u.email.replace("-", "_") });
    expect(underscore.ok && underscore.total).toBe(0);
  });

  it("pages by 50 with staff before apprentices", async () => {
    const admin = await adminViewer();
    const first = await listUsers(admin, {});
    if (!first.ok) throw new Error(first.code);
    expect(first.users.length).toBeLessThanOrEqual(USERS_PAGE_SIZE);
    expect(first.users[0].role).toBe("admin");
    const order = ["admin", "school_manager", "instructor", "apprentice"];
    const ranks = first.users.map((u) => order.indexOf(u.role));
    expect([...ranks].sort((a, b) => a - b)).toEqual(ranks);
  });

  it("refuses a page number a form would never send", async () => {
    const admin = await adminViewer();
    expect(await listUsers(admin, { page: "-3" })).toMatchObject({ ok: false, code: "invalid_input" });
  });
});
