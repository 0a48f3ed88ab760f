CREATE TYPE "public"."upload_status" AS ENUM('pending', 'stored', 'processed', 'failed');--> statement-breakpoint
CREATE TABLE "class_invitations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"class_id" uuid NOT NULL,
	"email" text NOT NULL,
	"name" text,
	"token_hash" text NOT NULL,
	"invited_by" uuid,
	"expires_at" timestamp with time zone NOT NULL,
	"claimed_at" timestamp with time zone,
	"claimed_by" uuid,
	"revoked_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "uploads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"status" "upload_status" DEFAULT 'pending' NOT NULL,
	"file_key" text,
	"original_name" text NOT NULL,
	"byte_size" integer NOT NULL,
	"width" integer,
	"height" integer,
	"display_key" text,
	"thumb_key" text,
	"failure_reason" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "uploads_processed_has_variants" CHECK ("uploads"."status" <> 'processed' or ("uploads"."display_key" is not null and "uploads"."thumb_key" is not null and "uploads"."width" > 0 and "uploads"."height" > 0)),
	CONSTRAINT "uploads_failed_has_reason" CHECK ("uploads"."status" <> 'failed' or "uploads"."failure_reason" is not null)
);
--> statement-breakpoint
ALTER TABLE "classes" ADD COLUMN "seats_purchased" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "classes" ADD COLUMN "seats_claimed" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "class_invitations" ADD CONSTRAINT "class_invitations_class_id_classes_id_fk" FOREIGN KEY ("class_id") REFERENCES "public"."classes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "class_invitations" ADD CONSTRAINT "class_invitations_invited_by_users_id_fk" FOREIGN KEY ("invited_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "class_invitations" ADD CONSTRAINT "class_invitations_claimed_by_users_id_fk" FOREIGN KEY ("claimed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "class_invitations_token_hash_key" ON "class_invitations" USING btree ("token_hash");--> statement-breakpoint
CREATE UNIQUE INDEX "class_invitations_pending_key" ON "class_invitations" USING btree ("class_id","email") WHERE "class_invitations"."claimed_at" IS NULL AND "class_invitations"."revoked_at" IS NULL;--> statement-breakpoint
CREATE INDEX "class_invitations_class_idx" ON "class_invitations" USING btree ("class_id");--> statement-breakpoint
CREATE INDEX "uploads_owner_idx" ON "uploads" USING btree ("owner_id","created_at");--> statement-breakpoint
CREATE INDEX "uploads_status_created_idx" ON "uploads" USING btree ("status","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "uploads_file_key_key" ON "uploads" USING btree ("file_key");--> statement-breakpoint
ALTER TABLE "classes" ADD CONSTRAINT "classes_seats_check" CHECK ("classes"."seats_claimed" >= 0 AND "classes"."seats_claimed" <= "classes"."seats_purchased");