CREATE TYPE "public"."roost_answer" AS ENUM('no_sign', 'signs', 'bats_seen', 'gone');--> statement-breakpoint
CREATE TYPE "public"."roost_count_band" AS ENUM('1-10', '11-50', '51-200', 'over-200');--> statement-breakpoint
CREATE TYPE "public"."roost_reporter" AS ENUM('account', 'order_link', 'email_link', 'demo');--> statement-breakpoint
CREATE TYPE "public"."roost_review" AS ENUM('new', 'accepted', 'doubtful', 'follow_up');--> statement-breakpoint
CREATE TABLE "roost_ask_opt_outs" (
	"email" text PRIMARY KEY NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "roost_reports" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"house_key" text NOT NULL,
	"order_line_id" uuid,
	"unit" integer NOT NULL,
	"model_id" uuid NOT NULL,
	"season" integer NOT NULL,
	"hemisphere" text NOT NULL,
	"summer" integer NOT NULL,
	"answer" "roost_answer" NOT NULL,
	"count_band" "roost_count_band",
	"note" text DEFAULT '' NOT NULL,
	"photo_key_base" text,
	"photo_widths" integer[],
	"site_id" uuid,
	"band_id" text,
	"mount" text,
	"state" text,
	"site_rating" text,
	"reporter" "roost_reporter" NOT NULL,
	"reporter_user_id" uuid,
	"reporter_token_hash" text,
	"current" boolean DEFAULT true NOT NULL,
	"replaced_at" timestamp with time zone,
	"review" "roost_review" DEFAULT 'new' NOT NULL,
	"review_reason" text DEFAULT '' NOT NULL,
	"reviewed_by_id" uuid,
	"reviewed_at" timestamp with time zone,
	"demo" boolean DEFAULT false NOT NULL,
	"reported_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "roost_reports_unit" CHECK ("roost_reports"."unit" between 1 and 10),
	CONSTRAINT "roost_reports_summer" CHECK ("roost_reports"."summer" >= 0),
	CONSTRAINT "roost_reports_count_band" CHECK ("roost_reports"."count_band" is null or "roost_reports"."answer" = 'bats_seen')
);
--> statement-breakpoint
ALTER TABLE "roost_reports" ADD CONSTRAINT "roost_reports_order_line_id_order_lines_id_fk" FOREIGN KEY ("order_line_id") REFERENCES "public"."order_lines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "roost_reports" ADD CONSTRAINT "roost_reports_model_id_house_models_id_fk" FOREIGN KEY ("model_id") REFERENCES "public"."house_models"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "roost_reports" ADD CONSTRAINT "roost_reports_reporter_user_id_users_id_fk" FOREIGN KEY ("reporter_user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "roost_reports" ADD CONSTRAINT "roost_reports_reviewed_by_id_users_id_fk" FOREIGN KEY ("reviewed_by_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "roost_reports_current_key" ON "roost_reports" USING btree ("house_key","season") WHERE "roost_reports"."current";--> statement-breakpoint
CREATE INDEX "roost_reports_model_idx" ON "roost_reports" USING btree ("model_id");--> statement-breakpoint
CREATE INDEX "roost_reports_review_idx" ON "roost_reports" USING btree ("review","reported_at");--> statement-breakpoint
CREATE INDEX "roost_reports_line_idx" ON "roost_reports" USING btree ("order_line_id");