ALTER TYPE "public"."mail_status" ADD VALUE 'sending' BEFORE 'sent';--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD COLUMN "claimed_by" text;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD COLUMN "lease_until" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "mail_outbox" ADD COLUMN "message_id" text;--> statement-breakpoint
CREATE INDEX "mail_outbox_lease_idx" ON "mail_outbox" USING btree ("status","lease_until");