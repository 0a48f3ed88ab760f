CREATE TABLE "certificates" (
	"id" uuid PRIMARY KEY NOT NULL,
	"user_id" uuid NOT NULL,
	"course_slug" text NOT NULL,
	"code" text NOT NULL,
	"issued_at" timestamp with time zone NOT NULL,
	"recipient_name" text NOT NULL,
	"course_title" text NOT NULL,
	"hours" double precision NOT NULL,
	"school_id" uuid,
	"school_name" text,
	"instructor_name" text,
	"show_name" boolean DEFAULT true NOT NULL,
	"subject_id" uuid NOT NULL,
	"status_list_index" integer NOT NULL,
	"credential_jwt" text NOT NULL,
	"revoked_at" timestamp with time zone,
	"revoked_by" uuid,
	"revocation_reason" text,
	CONSTRAINT "certificates_code_format" CHECK ("certificates"."code" ~ '^[0-9A-HJKMNP-TV-Z]{12}$'),
	CONSTRAINT "certificates_status_list_index_range" CHECK ("certificates"."status_list_index" >= 0 AND "certificates"."status_list_index" < 131072)
);
--> statement-breakpoint
ALTER TABLE "certificates" ADD CONSTRAINT "certificates_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "certificates" ADD CONSTRAINT "certificates_school_id_schools_id_fk" FOREIGN KEY ("school_id") REFERENCES "public"."schools"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "certificates" ADD CONSTRAINT "certificates_revoked_by_users_id_fk" FOREIGN KEY ("revoked_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "certificates_user_course_key" ON "certificates" USING btree ("user_id","course_slug");--> statement-breakpoint
CREATE UNIQUE INDEX "certificates_code_key" ON "certificates" USING btree ("code");--> statement-breakpoint
CREATE UNIQUE INDEX "certificates_status_list_index_key" ON "certificates" USING btree ("status_list_index");--> statement-breakpoint
CREATE INDEX "certificates_school_idx" ON "certificates" USING btree ("school_id");