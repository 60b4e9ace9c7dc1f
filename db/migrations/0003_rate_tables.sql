CREATE TABLE "rate_tables" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"market" text NOT NULL,
	"table" jsonb NOT NULL,
	"source_note" text,
	"created_by" uuid,
	"effective_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "rate_tables" ADD CONSTRAINT "rate_tables_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "rate_tables_market_idx" ON "rate_tables" USING btree ("market","effective_at");