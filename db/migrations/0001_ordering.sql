CREATE TYPE "public"."proposal_status" AS ENUM('proposed', 'confirmed', 'declined', 'withdrawn');--> statement-breakpoint
CREATE TABLE "appointment_proposals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"inspector_id" uuid NOT NULL,
	"start" timestamp with time zone NOT NULL,
	"end" timestamp with time zone NOT NULL,
	"status" "proposal_status" DEFAULT 'proposed' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "price_settings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"market" text NOT NULL,
	"base_cents" integer NOT NULL,
	"no_cleanout_cents" integer NOT NULL,
	"rush_cents" integer NOT NULL,
	"extra_sewer_cents" integer NOT NULL,
	"reuse_cents" integer NOT NULL,
	"platform_fee_bps" integer NOT NULL,
	"reuse_inspector_share_bps" integer NOT NULL,
	"source_note" text,
	"created_by" uuid,
	"effective_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "orders" ADD COLUMN "at_risk_notified_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "appointment_proposals" ADD CONSTRAINT "appointment_proposals_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "appointment_proposals" ADD CONSTRAINT "appointment_proposals_inspector_id_users_id_fk" FOREIGN KEY ("inspector_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "price_settings" ADD CONSTRAINT "price_settings_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "appointment_proposals_order_idx" ON "appointment_proposals" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "price_settings_market_idx" ON "price_settings" USING btree ("market","effective_at");