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
