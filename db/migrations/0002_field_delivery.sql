CREATE TYPE "public"."clip_status" AS ENUM('uploading', 'ready', 'rejected', 'aborted');--> statement-breakpoint
CREATE TABLE "clips" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"inspector_id" uuid NOT NULL,
	"status" "clip_status" DEFAULT 'uploading' NOT NULL,
	"label" text NOT NULL,
	"size_bytes" bigint NOT NULL,
	"declared_type" text NOT NULL,
	"detected_type" text,
	"object_key" text NOT NULL,
	"upload_id" text,
	"part_size_bytes" integer NOT NULL,
	"part_count" integer NOT NULL,
	"duration_seconds" double precision,
	"start_footage" double precision,
	"poster_key" text,
	"rejected_reason" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"completed_at" timestamp with time zone,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "clips_object_key_unique" UNIQUE("object_key")
);
--> statement-breakpoint
CREATE TABLE "inspections" (
	"order_id" uuid PRIMARY KEY NOT NULL,
	"record" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"narrative" text DEFAULT '' NOT NULL,
	"recommendation" text DEFAULT '' NOT NULL,
	"revision" integer DEFAULT 0 NOT NULL,
	"evaluation" jsonb,
	"engine_version" text,
	"rates_id" text,
	"submitted_at" timestamp with time zone,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stills" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"clip_id" uuid,
	"second" double precision,
	"object_key" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stills_object_key_unique" UNIQUE("object_key")
);
--> statement-breakpoint
ALTER TABLE "clips" ADD CONSTRAINT "clips_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "clips" ADD CONSTRAINT "clips_inspector_id_users_id_fk" FOREIGN KEY ("inspector_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "inspections" ADD CONSTRAINT "inspections_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stills" ADD CONSTRAINT "stills_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stills" ADD CONSTRAINT "stills_clip_id_clips_id_fk" FOREIGN KEY ("clip_id") REFERENCES "public"."clips"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "clips_order_idx" ON "clips" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "clips_status_idx" ON "clips" USING btree ("status","updated_at");--> statement-breakpoint
CREATE INDEX "stills_order_idx" ON "stills" USING btree ("order_id");