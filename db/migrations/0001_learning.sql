CREATE TYPE "public"."enrollment_source" AS ENUM('class', 'purchase');--> statement-breakpoint
CREATE TYPE "public"."search_kind" AS ENUM('lesson', 'term');--> statement-breakpoint
CREATE TABLE "enrollments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"course_slug" text NOT NULL,
	"source" "enrollment_source" NOT NULL,
	"class_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "lesson_progress" (
	"user_id" uuid NOT NULL,
	"course_slug" text NOT NULL,
	"lesson_id" text NOT NULL,
	"completed_at" timestamp with time zone,
	"last_viewed_at" timestamp with time zone,
	CONSTRAINT "lesson_progress_user_id_lesson_id_pk" PRIMARY KEY("user_id","lesson_id")
);
--> statement-breakpoint
CREATE TABLE "search_documents" (
	"id" text PRIMARY KEY NOT NULL,
	"kind" "search_kind" NOT NULL,
	"course_slug" text,
	"lesson_id" text,
	"title" text NOT NULL,
	"href" text NOT NULL,
	"preview" boolean DEFAULT false NOT NULL,
	"public_text" text NOT NULL,
	"body_text" text DEFAULT '' NOT NULL,
	"public_tsv" "tsvector" GENERATED ALWAYS AS (setweight(to_tsvector('english'::regconfig, "title"), 'A') || setweight(to_tsvector('english'::regconfig, "public_text"), 'B')) STORED,
	"full_tsv" "tsvector" GENERATED ALWAYS AS (setweight(to_tsvector('english'::regconfig, "title"), 'A') || setweight(to_tsvector('english'::regconfig, "public_text"), 'B') || setweight(to_tsvector('english'::regconfig, "body_text"), 'C')) STORED,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "enrollments" ADD CONSTRAINT "enrollments_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "enrollments" ADD CONSTRAINT "enrollments_class_id_classes_id_fk" FOREIGN KEY ("class_id") REFERENCES "public"."classes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "lesson_progress" ADD CONSTRAINT "lesson_progress_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "enrollments_user_course_key" ON "enrollments" USING btree ("user_id","course_slug");--> statement-breakpoint
CREATE INDEX "enrollments_class_idx" ON "enrollments" USING btree ("class_id");--> statement-breakpoint
CREATE INDEX "lesson_progress_user_course_idx" ON "lesson_progress" USING btree ("user_id","course_slug");--> statement-breakpoint
CREATE INDEX "search_documents_public_tsv_idx" ON "search_documents" USING gin ("public_tsv");--> statement-breakpoint
CREATE INDEX "search_documents_full_tsv_idx" ON "search_documents" USING gin ("full_tsv");