CREATE TYPE "public"."monthly_gift_status" AS ENUM('pending', 'active', 'past_due', 'stopped');--> statement-breakpoint
CREATE TABLE "gift_dedications" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid,
	"monthly_gift_id" uuid,
	"tribute_kind" text,
	"tribute_name" text,
	"notice_name" text,
	"notice_email" text,
	"notice_shows_amount" boolean DEFAULT false NOT NULL,
	"fee_covered_cents" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "gift_dedications_kind" CHECK ("gift_dedications"."tribute_kind" is null or "gift_dedications"."tribute_kind" in ('honor', 'memory')),
	CONSTRAINT "gift_dedications_fee" CHECK ("gift_dedications"."fee_covered_cents" >= 0)
);
--> statement-breakpoint
CREATE TABLE "giving_settings" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"time_zone" text DEFAULT 'America/Los_Angeles' NOT NULL,
	"fee_basis_points" integer DEFAULT 290 NOT NULL,
	"fee_fixed_cents" integer DEFAULT 30 NOT NULL,
	"lead_time_weeks" integer DEFAULT 6 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "giving_settings_single_row" CHECK ("giving_settings"."id" = 1),
	CONSTRAINT "giving_settings_fee" CHECK ("giving_settings"."fee_basis_points" between 0 and 1000 and "giving_settings"."fee_fixed_cents" between 0 and 500),
	CONSTRAINT "giving_settings_lead" CHECK ("giving_settings"."lead_time_weeks" between 0 and 52)
);
--> statement-breakpoint
CREATE TABLE "monthly_gifts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"amount_cents" integer NOT NULL,
	"customer_id" text NOT NULL,
	"subscription_id" text NOT NULL,
	"status" "monthly_gift_status" DEFAULT 'pending' NOT NULL,
	"stopped_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "monthly_gifts_amount" CHECK ("monthly_gifts"."amount_cents" between 100 and 1000000)
);
--> statement-breakpoint
ALTER TABLE "gifts" ADD COLUMN "invoice_id" text;--> statement-breakpoint
ALTER TABLE "gifts" ADD COLUMN "monthly_gift_id" uuid;--> statement-breakpoint
ALTER TABLE "gift_dedications" ADD CONSTRAINT "gift_dedications_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "gift_dedications" ADD CONSTRAINT "gift_dedications_monthly_gift_id_monthly_gifts_id_fk" FOREIGN KEY ("monthly_gift_id") REFERENCES "public"."monthly_gifts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "monthly_gifts" ADD CONSTRAINT "monthly_gifts_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "gift_dedications_order_key" ON "gift_dedications" USING btree ("order_id");--> statement-breakpoint
CREATE UNIQUE INDEX "gift_dedications_monthly_key" ON "gift_dedications" USING btree ("monthly_gift_id");--> statement-breakpoint
CREATE UNIQUE INDEX "monthly_gifts_subscription_key" ON "monthly_gifts" USING btree ("subscription_id");--> statement-breakpoint
CREATE INDEX "monthly_gifts_user_idx" ON "monthly_gifts" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "monthly_gifts_customer_idx" ON "monthly_gifts" USING btree ("customer_id");--> statement-breakpoint
ALTER TABLE "gifts" ADD CONSTRAINT "gifts_invoice_id_unique" UNIQUE("invoice_id");