ALTER TABLE "climate_stations" ADD COLUMN "jan_high_f" double precision;--> statement-breakpoint
ALTER TABLE "climate_stations" ADD COLUMN "jan_flag" text;