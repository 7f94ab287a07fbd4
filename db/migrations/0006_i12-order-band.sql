ALTER TABLE "orders" ADD COLUMN "band_id" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "band_source" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "band_value_f" double precision;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "band_zip" text;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "band_typed_value" double precision;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "band_typed_unit" text;