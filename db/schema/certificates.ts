import { sql } from "drizzle-orm";
import { boolean, check, doublePrecision, index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { schools } from "./schools";
import { users } from "./users";

/**
 * A graduate's certificate for one course, issued once (unique user + course) in the same
 * transaction as its verification code and its signed Open Badges 3.0 credential
 * (docs/decisions/008-certificates.md).
 *
 * - `code`: 12 characters of Crockford's base32 (no I, L, O, U), stored without dashes;
 *   shown as XXXX-XXXX-XXXX. 60 random bits.
 * - Name, course, hours, school and instructor are snapshots at issue: a later rename of the
 *   course or the school does not change what the certificate said.
 * - `statusListIndex`: the credential's bit in the published revocation list (W3C Bitstring
 *   Status List v1.0), chosen at random among 131,072 (the spec's minimum list size).
 * - `credentialJwt`: the OpenBadgeCredential as a compact JWS (VC-JWT), signed once at issue;
 *   older signing keys stay published, so it keeps verifying after a key rotation.
 * - `revocationReason` is public: the verification page shows it.
 */
export const certificates = pgTable(
  "certificates",
  {
    id: uuid("id").primaryKey(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    courseSlug: text("course_slug").notNull(),
    code: text("code").notNull(),
    issuedAt: timestamp("issued_at", { withTimezone: true }).notNull(),
    recipientName: text("recipient_name").notNull(),
    courseTitle: text("course_title").notNull(),
    // Planned study time of the course's lessons, in hours (one decimal).
    hours: doublePrecision("hours").notNull(),
    schoolId: uuid("school_id").references(() => schools.id, { onDelete: "set null" }),
    schoolName: text("school_name"),
    instructorName: text("instructor_name"),
    showName: boolean("show_name").notNull().default(true),
    // The credential subject's id (urn:uuid:…): random, so two certificates of one person can't be linked by it.
    subjectId: uuid("subject_id").notNull(),
    statusListIndex: integer("status_list_index").notNull(),
    credentialJwt: text("credential_jwt").notNull(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    revokedBy: uuid("revoked_by").references(() => users.id, { onDelete: "set null" }),
    revocationReason: text("revocation_reason"),
  },
  (t) => [
    uniqueIndex("certificates_user_course_key").on(t.userId, t.courseSlug),
    uniqueIndex("certificates_code_key").on(t.code),
    uniqueIndex("certificates_status_list_index_key").on(t.statusListIndex),
    index("certificates_school_idx").on(t.schoolId),
    check("certificates_code_format", sql`${t.code} ~ '^[0-9A-HJKMNP-TV-Z]{12}$'`),
    check("certificates_status_list_index_range", sql`${t.statusListIndex} >= 0 AND ${t.statusListIndex} < 131072`),
  ],
);

export type CertificateRow = typeof certificates.$inferSelect;
