CREATE TYPE "public"."refund_cause" AS ENUM('cancel', 'refund', 'automatic');--> statement-breakpoint
CREATE TYPE "public"."refund_status" AS ENUM('requested', 'succeeded', 'failed');--> statement-breakpoint
ALTER TABLE "refunds" ALTER COLUMN "provider_refund_id" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "refunds" ADD COLUMN "idempotency_key" text DEFAULT gen_random_uuid()::text NOT NULL;--> statement-breakpoint
ALTER TABLE "refunds" ADD COLUMN "payment_intent_id" text;--> statement-breakpoint
ALTER TABLE "refunds" ADD COLUMN "status" "refund_status" DEFAULT 'succeeded' NOT NULL;--> statement-breakpoint
ALTER TABLE "refunds" ADD COLUMN "cause" "refund_cause" DEFAULT 'refund' NOT NULL;--> statement-breakpoint
ALTER TABLE "refunds" ADD COLUMN "attempts" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "refunds" ADD COLUMN "next_attempt_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "refunds" ADD COLUMN "last_error" text;--> statement-breakpoint
ALTER TABLE "refunds" ADD COLUMN "confirmed_at" timestamp with time zone;--> statement-breakpoint
CREATE INDEX "refunds_order_idx" ON "refunds" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "refunds_requested_idx" ON "refunds" USING btree ("status","next_attempt_at");--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_idempotency_key_unique" UNIQUE("idempotency_key");--> statement-breakpoint
ALTER TABLE "refunds" ADD CONSTRAINT "refunds_amount" CHECK ("refunds"."amount_cents" > 0);