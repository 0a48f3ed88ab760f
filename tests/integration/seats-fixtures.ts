// Schools, classes and invitations for the seat and invitation tests (real PostgreSQL).
import { and, desc, eq, like } from "drizzle-orm";
import { randomBytes } from "node:crypto";
import { classes, mailOutbox, schoolMembers, schools } from "@/db/schema";
import { signInWithPassword } from "@/lib/server/accounts";
import type { Viewer } from "@/lib/server/viewer";
import { createUser, ctx, testDb, viewerFromToken } from "./helpers";

export const COURSE = "miking-the-band";
export const OTHER_COURSE = "how-microphones-hear";

export async function signedIn(role: "apprentice" | "instructor" | "school_manager" | "admin"): Promise<{ viewer: Viewer; id: string; email: string; password: string }> {
  const u = await createUser(role);
  const s = await signInWithPassword({ email: u.email, password: u.password }, ctx());
  if (!s.ok) throw new Error(`sign-in failed: ${s.code}`);
  return { viewer: (await viewerFromToken(s.sessionToken))!, ...u };
}

/** A school run by `managerId`, with its own slug. */
export async function makeSchool(managerId: string, name = "Seat Test School"): Promise<string> {
  const [school] = await testDb().insert(schools).values({ slug: `seats-${Date.now()}-${randomBytes(3).toString("hex")}`, name }).returning({ id: schools.id });
  await testDb().insert(schoolMembers).values({ schoolId: school.id, userId: managerId, role: "manager" });
  return school.id;
}

export async function makeClass(schoolId: string, seats: number, courseSlug = COURSE, name = "Test class"): Promise<string> {
  const [klass] = await testDb().insert(classes).values({ schoolId, name, term: "Test term", courseSlug, seatsPurchased: seats }).returning({ id: classes.id });
  return klass.id;
}

export async function seatsOf(classId: string): Promise<{ purchased: number; claimed: number }> {
  const [row] = await testDb().select({ purchased: classes.seatsPurchased, claimed: classes.seatsClaimed }).from(classes).where(eq(classes.id, classId));
  return row;
}

/** The token of the newest invitation mail to `email`, read from the outbox (the mail as it will be sent). */
export async function invitationTokenFor(email: string): Promise<string> {
  const [mail] = await testDb()
    .select({ text: mailOutbox.text })
    .from(mailOutbox)
    .where(and(eq(mailOutbox.toAddress, email), like(mailOutbox.subject, "%invites you%")))
    .orderBy(desc(mailOutbox.createdAt))
    .limit(1);
  const m = mail?.text.match(/\/invitations\/([A-Za-z0-9_-]{43})/);
  if (!m) throw new Error(`no invitation mail to ${email}`);
  return m[1];
}

export async function mailsTo(email: string): Promise<number> {
  return (await testDb().select({ id: mailOutbox.id }).from(mailOutbox).where(eq(mailOutbox.toAddress, email))).length;
}
