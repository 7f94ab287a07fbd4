CREATE TABLE "roost_report_link_uses" (
	"nonce" text PRIMARY KEY NOT NULL,
	"house_key" text NOT NULL,
	"season" integer NOT NULL,
	"answer" "roost_answer" NOT NULL,
	"used_at" timestamp with time zone DEFAULT now() NOT NULL
);
