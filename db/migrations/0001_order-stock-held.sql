ALTER TABLE "orders" ADD COLUMN "stock_held" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "phone" text;