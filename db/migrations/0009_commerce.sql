CREATE TYPE "public"."order_kind" AS ENUM('school', 'self');--> statement-breakpoint
CREATE TYPE "public"."order_status" AS ENUM('created', 'awaiting_payment', 'paid', 'failed', 'expired', 'refunded_partly', 'refunded');--> statement-breakpoint
CREATE TYPE "public"."refund_status" AS ENUM('requested', 'approved', 'rejected', 'completed');--> statement-breakpoint
CREATE TABLE "orders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"kind" "order_kind" NOT NULL,
	"school_id" uuid,
	"class_id" uuid,
	"user_id" uuid NOT NULL,
	"course_slug" text NOT NULL,
	"quantity" integer NOT NULL,
	"unit_amount" integer NOT NULL,
	"amount_total" integer NOT NULL,
	"currency" text NOT NULL,
	"checkout_session_id" text,
	"checkout_url" text,
	"idempotency_key" text NOT NULL,
	"status" "order_status" DEFAULT 'created' NOT NULL,
	"payment_intent_id" text,
	"paid_at" timestamp with time zone,
	"fulfilled_at" timestamp with time zone,
	"seats_refunded" integer DEFAULT 0 NOT NULL,
	"amount_refunded" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "orders_quantity_check" CHECK ("orders"."quantity" > 0),
	CONSTRAINT "orders_amounts_check" CHECK ("orders"."unit_amount" > 0 AND "orders"."amount_total" > 0),
	CONSTRAINT "orders_refunded_check" CHECK ("orders"."seats_refunded" >= 0 AND "orders"."seats_refunded" <= "orders"."quantity" AND "orders"."amount_refunded" >= 0 AND "orders"."amount_refunded" <= "orders"."amount_total"),
	CONSTRAINT "orders_kind_check" CHECK (("orders"."kind" = 'school' AND "orders"."school_id" IS NOT NULL AND "orders"."class_id" IS NOT NULL) OR ("orders"."kind" = 'self' AND "orders"."school_id" IS NULL AND "orders"."class_id" IS NULL AND "orders"."quantity" = 1))
);
--> statement-breakpoint
CREATE TABLE "payment_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"object_id" text,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL,
	"processed_at" timestamp with time zone,
	"result" text
);
--> statement-breakpoint
CREATE TABLE "refunds" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"seats" integer NOT NULL,
	"amount" integer NOT NULL,
	"currency" text NOT NULL,
	"status" "refund_status" DEFAULT 'requested' NOT NULL,
	"reason" text NOT NULL,
	"requested_by" uuid,
	"decided_by" uuid,
	"decision_note" text,
	"stripe_refund_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"decided_at" timestamp with time zone,
	"completed_at" timestamp with time zone,
	CONSTRAINT "refunds_positive_check" CHECK ("refunds"."seats" > 0 AND "refunds"."amount" > 0)
);
--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_school_id_schools_id_fk" FOREIGN KEY ("school_id") REFERENCES "public"."schools"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_class_id_classes_id_fk" FOREIGN KEY ("class_id") REFERENCES "public"."classes"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_requested_by_users_id_fk" FOREIGN KEY ("requested_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_decided_by_users_id_fk" FOREIGN KEY ("decided_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "orders_checkout_session_key" ON "orders" USING btree ("checkout_session_id");--> statement-breakpoint
CREATE UNIQUE INDEX "orders_idempotency_key" ON "orders" USING btree ("idempotency_key");--> statement-breakpoint
CREATE INDEX "orders_school_idx" ON "orders" USING btree ("school_id","created_at");--> statement-breakpoint
CREATE INDEX "orders_user_idx" ON "orders" USING btree ("user_id","created_at");--> statement-breakpoint
CREATE INDEX "orders_unfinished_idx" ON "orders" USING btree ("created_at") WHERE "orders"."status" IN ('created', 'awaiting_payment');--> statement-breakpoint
CREATE INDEX "payment_events_object_idx" ON "payment_events" USING btree ("object_id");--> statement-breakpoint
CREATE INDEX "refunds_order_idx" ON "refunds" USING btree ("order_id");--> statement-breakpoint
CREATE UNIQUE INDEX "refunds_stripe_refund_key" ON "refunds" USING btree ("stripe_refund_id");--> statement-breakpoint
CREATE UNIQUE INDEX "refunds_open_key" ON "refunds" USING btree ("order_id") WHERE "refunds"."status" = 'requested';