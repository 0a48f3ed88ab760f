CREATE TYPE "public"."review_decision" AS ENUM('approve', 'redo');--> statement-breakpoint
CREATE TYPE "public"."review_state" AS ENUM('draft', 'final');--> statement-breakpoint
CREATE TYPE "public"."submission_status" AS ENUM('submitted', 'redo_requested', 'approved');--> statement-breakpoint
CREATE TABLE "brief_reviews" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"submission_id" uuid NOT NULL,
	"reviewer_id" uuid NOT NULL,
	"state" "review_state" DEFAULT 'draft' NOT NULL,
	"scores" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"pins" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"decision" "review_decision",
	"comment" text DEFAULT '' NOT NULL,
	"total_points" integer,
	"max_points" integer,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"finalized_at" timestamp with time zone,
	CONSTRAINT "brief_reviews_final_complete" CHECK ("brief_reviews"."state" = 'draft' or ("brief_reviews"."decision" is not null and "brief_reviews"."finalized_at" is not null and "brief_reviews"."total_points" is not null))
);
--> statement-breakpoint
CREATE TABLE "brief_submissions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"brief_id" text NOT NULL,
	"course_slug" text NOT NULL,
	"user_id" uuid NOT NULL,
	"class_id" uuid NOT NULL,
	"attempt" integer NOT NULL,
	"status" "submission_status" DEFAULT 'submitted' NOT NULL,
	"submitted_at" timestamp with time zone DEFAULT now() NOT NULL,
	"reviewed_at" timestamp with time zone,
	CONSTRAINT "brief_submissions_attempt_positive" CHECK ("brief_submissions"."attempt" >= 1),
	CONSTRAINT "brief_submissions_reviewed_has_time" CHECK ("brief_submissions"."status" = 'submitted' or "brief_submissions"."reviewed_at" is not null)
);
--> statement-breakpoint
CREATE TABLE "review_notices" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"instructor_id" uuid NOT NULL,
	"submission_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"digested_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "submission_photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"submission_id" uuid NOT NULL,
	"upload_id" uuid NOT NULL,
	"caption" text NOT NULL,
	"position" integer NOT NULL
);
--> statement-breakpoint
ALTER TABLE "brief_reviews" ADD CONSTRAINT "brief_reviews_submission_id_brief_submissions_id_fk" FOREIGN KEY ("submission_id") REFERENCES "public"."brief_submissions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "brief_reviews" ADD CONSTRAINT "brief_reviews_reviewer_id_users_id_fk" FOREIGN KEY ("reviewer_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "brief_submissions" ADD CONSTRAINT "brief_submissions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "brief_submissions" ADD CONSTRAINT "brief_submissions_class_id_classes_id_fk" FOREIGN KEY ("class_id") REFERENCES "public"."classes"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_notices" ADD CONSTRAINT "review_notices_instructor_id_users_id_fk" FOREIGN KEY ("instructor_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_notices" ADD CONSTRAINT "review_notices_submission_id_brief_submissions_id_fk" FOREIGN KEY ("submission_id") REFERENCES "public"."brief_submissions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submission_photos" ADD CONSTRAINT "submission_photos_submission_id_brief_submissions_id_fk" FOREIGN KEY ("submission_id") REFERENCES "public"."brief_submissions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "submission_photos" ADD CONSTRAINT "submission_photos_upload_id_uploads_id_fk" FOREIGN KEY ("upload_id") REFERENCES "public"."uploads"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "brief_reviews_submission_key" ON "brief_reviews" USING btree ("submission_id");--> statement-breakpoint
CREATE UNIQUE INDEX "brief_submissions_user_brief_attempt_key" ON "brief_submissions" USING btree ("user_id","brief_id","attempt");--> statement-breakpoint
CREATE UNIQUE INDEX "brief_submissions_one_waiting_key" ON "brief_submissions" USING btree ("user_id","brief_id") WHERE "brief_submissions"."status" = 'submitted';--> statement-breakpoint
CREATE UNIQUE INDEX "brief_submissions_one_approved_key" ON "brief_submissions" USING btree ("user_id","brief_id") WHERE "brief_submissions"."status" = 'approved';--> statement-breakpoint
CREATE INDEX "brief_submissions_queue_idx" ON "brief_submissions" USING btree ("class_id","status","submitted_at");--> statement-breakpoint
CREATE INDEX "brief_submissions_user_course_idx" ON "brief_submissions" USING btree ("user_id","course_slug","status");--> statement-breakpoint
CREATE UNIQUE INDEX "review_notices_instructor_submission_key" ON "review_notices" USING btree ("instructor_id","submission_id");--> statement-breakpoint
CREATE INDEX "review_notices_pending_idx" ON "review_notices" USING btree ("instructor_id") WHERE "review_notices"."digested_at" is null;--> statement-breakpoint
CREATE UNIQUE INDEX "submission_photos_position_key" ON "submission_photos" USING btree ("submission_id","position");--> statement-breakpoint
CREATE UNIQUE INDEX "submission_photos_upload_key" ON "submission_photos" USING btree ("submission_id","upload_id");