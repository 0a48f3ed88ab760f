CREATE TABLE "quiz_answers" (
	"attempt_id" uuid NOT NULL,
	"question_id" text NOT NULL,
	"answer" jsonb NOT NULL,
	"seq" integer NOT NULL,
	"saved_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "quiz_answers_attempt_id_question_id_pk" PRIMARY KEY("attempt_id","question_id")
);
--> statement-breakpoint
CREATE TABLE "quiz_attempts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"bank_id" text NOT NULL,
	"course_slug" text NOT NULL,
	"seed" integer NOT NULL,
	"question_order" jsonb NOT NULL,
	"started_at" timestamp with time zone DEFAULT now() NOT NULL,
	"deadline_at" timestamp with time zone,
	"submitted_at" timestamp with time zone,
	"score_percent" double precision,
	"passed" boolean,
	"result" jsonb
);
--> statement-breakpoint
CREATE TABLE "quiz_time_extensions" (
	"user_id" uuid NOT NULL,
	"bank_id" text NOT NULL,
	"extra_minutes" integer NOT NULL,
	"granted_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "quiz_time_extensions_user_id_bank_id_pk" PRIMARY KEY("user_id","bank_id")
);
--> statement-breakpoint
ALTER TABLE "quiz_answers" ADD CONSTRAINT "quiz_answers_attempt_id_quiz_attempts_id_fk" FOREIGN KEY ("attempt_id") REFERENCES "public"."quiz_attempts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quiz_attempts" ADD CONSTRAINT "quiz_attempts_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quiz_time_extensions" ADD CONSTRAINT "quiz_time_extensions_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quiz_time_extensions" ADD CONSTRAINT "quiz_time_extensions_granted_by_users_id_fk" FOREIGN KEY ("granted_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "quiz_attempts_user_bank_idx" ON "quiz_attempts" USING btree ("user_id","bank_id");--> statement-breakpoint
CREATE INDEX "quiz_attempts_bank_submitted_idx" ON "quiz_attempts" USING btree ("bank_id") WHERE "quiz_attempts"."submitted_at" is not null;