CREATE TABLE "cache_tag_events" (
	"id" serial PRIMARY KEY NOT NULL,
	"tags" text[] NOT NULL,
	"expire_seconds" integer,
	"instance" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE INDEX "cache_tag_events_created" ON "cache_tag_events" USING btree ("created_at");