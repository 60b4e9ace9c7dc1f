ALTER TYPE "public"."clip_status" ADD VALUE 'removed';--> statement-breakpoint
ALTER TABLE "stills" ADD COLUMN "verified_at" timestamp with time zone;--> statement-breakpoint
-- Stills stored before this column existed count as verified; from here on only the completed byte check sets it.
UPDATE "stills" SET "verified_at" = "created_at";
