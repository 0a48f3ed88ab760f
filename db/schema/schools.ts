import { sql } from "drizzle-orm";
import { check, index, integer, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { users } from "./users";

export const schools = pgTable(
  "schools",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    slug: text("slug").notNull(),
    name: text("name").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("schools_slug_key").on(t.slug)],
);

export const schoolMemberRoleEnum = pgEnum("school_member_role", ["manager", "instructor", "apprentice"]);

/** Membership of a school is data, checked per object on the server. */
export const schoolMembers = pgTable(
  "school_members",
  {
    schoolId: uuid("school_id")
      .notNull()
      .references(() => schools.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: schoolMemberRoleEnum("role").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.schoolId, t.userId] }), index("school_members_user_idx").on(t.userId)],
);

/** A Class: a school's group of apprentices on one course. */
export const classes = pgTable(
  "classes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    schoolId: uuid("school_id")
      .notNull()
      .references(() => schools.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    courseSlug: text("course_slug").notNull(),
    term: text("term").notNull(),
    // The seat pool (lib/server/seat-pool.ts): seats bought for the class and seats taken by an
    // apprentice. Claims move seats_claimed in one conditional UPDATE; the CHECK is the backstop.
    seatsPurchased: integer("seats_purchased").notNull().default(0),
    seatsClaimed: integer("seats_claimed").notNull().default(0),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index("classes_school_idx").on(t.schoolId),
    check("classes_seats_check", sql`${t.seatsClaimed} >= 0 AND ${t.seatsClaimed} <= ${t.seatsPurchased}`),
  ],
);

export const classMemberRoleEnum = pgEnum("class_member_role", ["instructor", "apprentice"]);

export const classMembers = pgTable(
  "class_members",
  {
    classId: uuid("class_id")
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: classMemberRoleEnum("role").notNull(),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.classId, t.userId] }), index("class_members_user_idx").on(t.userId)],
);

/**
 * An invitation to take a seat in a class, sent by e-mail as a single-use link. Only the SHA-256
 * of the token is stored. Pending = not claimed, not revoked (and, to hold a seat, not expired);
 * at most one pending invitation per class and address.
 */
export const classInvitations = pgTable(
  "class_invitations",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    classId: uuid("class_id")
      .notNull()
      .references(() => classes.id, { onDelete: "cascade" }),
    // Stored lower-cased, like users.email.
    email: text("email").notNull(),
    // The name from the roster, if it gave one (used to greet and to prefill sign-up).
    name: text("name"),
    tokenHash: text("token_hash").notNull(),
    invitedBy: uuid("invited_by").references(() => users.id, { onDelete: "set null" }),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    claimedAt: timestamp("claimed_at", { withTimezone: true }),
    claimedBy: uuid("claimed_by").references(() => users.id, { onDelete: "set null" }),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("class_invitations_token_hash_key").on(t.tokenHash),
    uniqueIndex("class_invitations_pending_key").on(t.classId, t.email).where(sql`${t.claimedAt} IS NULL AND ${t.revokedAt} IS NULL`),
    index("class_invitations_class_idx").on(t.classId),
  ],
);
