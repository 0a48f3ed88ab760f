import { sql } from "drizzle-orm";
import { boolean, customType, index, pgEnum, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { classes } from "./schools";
import { users } from "./users";

export const enrollmentSourceEnum = pgEnum("enrollment_source", ["class", "purchase"]);

/** A seat on a course: through a school's class, or bought. Locked lessons need one. */
export const enrollments = pgTable(
  "enrollments",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    // Content is code (content/courses/<slug>), so the course is referenced by its slug.
    courseSlug: text("course_slug").notNull(),
    source: enrollmentSourceEnum("source").notNull(),
    classId: uuid("class_id").references(() => classes.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("enrollments_user_course_key").on(t.userId, t.courseSlug), index("enrollments_class_idx").on(t.classId)],
);

/** One row per apprentice and lesson (lesson ids are unique across courses). */
export const lessonProgress = pgTable(
  "lesson_progress",
  {
    userId: uuid("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    courseSlug: text("course_slug").notNull(),
    lessonId: text("lesson_id").notNull(),
    completedAt: timestamp("completed_at", { withTimezone: true }),
    lastViewedAt: timestamp("last_viewed_at", { withTimezone: true }),
  },
  (t) => [primaryKey({ columns: [t.userId, t.lessonId] }), index("lesson_progress_user_course_idx").on(t.userId, t.courseSlug)],
);

const tsvector = customType<{ data: string }>({
  dataType() {
    return "tsvector";
  },
});

export const searchKindEnum = pgEnum("search_kind", ["lesson", "term"]);

/**
 * Lessons and glossary terms for full-text search, rebuilt from content/ by indexContent().
 * public_* is what anyone may search and see (title, summary, objectives, headings); body_text
 * is searched and quoted only for viewers who may read the lesson.
 */
export const searchDocuments = pgTable(
  "search_documents",
  {
    id: text("id").primaryKey(),
    kind: searchKindEnum("kind").notNull(),
    courseSlug: text("course_slug"),
    lessonId: text("lesson_id"),
    title: text("title").notNull(),
    href: text("href").notNull(),
    preview: boolean("preview").notNull().default(false),
    publicText: text("public_text").notNull(),
    bodyText: text("body_text").notNull().default(""),
    publicTsv: tsvector("public_tsv").generatedAlwaysAs(
      sql`setweight(to_tsvector('english'::regconfig, "title"), 'A') || setweight(to_tsvector('english'::regconfig, "public_text"), 'B')`,
    ),
    fullTsv: tsvector("full_tsv").generatedAlwaysAs(
      sql`setweight(to_tsvector('english'::regconfig, "title"), 'A') || setweight(to_tsvector('english'::regconfig, "public_text"), 'B') || setweight(to_tsvector('english'::regconfig, "body_text"), 'C')`,
    ),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("search_documents_public_tsv_idx").using("gin", t.publicTsv), index("search_documents_full_tsv_idx").using("gin", t.fullTsv)],
);

export type EnrollmentSource = (typeof enrollmentSourceEnum.enumValues)[number];
