CREATE TYPE "public"."stock_adjustment_reason" AS ENUM('spilled', 'given-away', 'spoiled', 'correction');--> statement-breakpoint
ALTER TYPE "public"."bin_event_kind" ADD VALUE 'bedding-added' BEFORE 'tray-added';--> statement-breakpoint
ALTER TYPE "public"."bin_kind" ADD VALUE 'flow-through';--> statement-breakpoint
CREATE TABLE "stock_adjustments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"lot_id" uuid NOT NULL,
	"adjusted_on" date NOT NULL,
	"amount_si" numeric(14, 6) NOT NULL,
	"reason" "stock_adjustment_reason" NOT NULL,
	"note" text,
	"logged_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stock_adjustments_amount_non_zero" CHECK ("stock_adjustments"."amount_si" <> 0)
);
--> statement-breakpoint
ALTER TABLE "beds" ADD COLUMN "archived_on" date;--> statement-breakpoint
ALTER TABLE "crops" ADD COLUMN "days_to_harvest" smallint;--> statement-breakpoint
ALTER TABLE "crops" ADD COLUMN "spacing_m" numeric(14, 6);--> statement-breakpoint
ALTER TABLE "crops" ADD COLUMN "archived_on" date;--> statement-breakpoint
ALTER TABLE "plantings" ADD COLUMN "archived_on" date;--> statement-breakpoint
ALTER TABLE "bin_events" ADD COLUMN "castings_l" numeric(14, 6);--> statement-breakpoint
ALTER TABLE "bin_events" ADD COLUMN "food_kinds" text[] DEFAULT '{}' NOT NULL;--> statement-breakpoint
ALTER TABLE "bins" ADD COLUMN "drain_interval_days" smallint;--> statement-breakpoint
ALTER TABLE "stock_lots" ADD COLUMN "price_per_kg" numeric(14, 6);--> statement-breakpoint
ALTER TABLE "stock_lots" ADD COLUMN "note" text;--> statement-breakpoint
ALTER TABLE "stock_adjustments" ADD CONSTRAINT "stock_adjustments_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_adjustments" ADD CONSTRAINT "stock_adjustments_logged_by_users_id_fk" FOREIGN KEY ("logged_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_adjustments" ADD CONSTRAINT "stock_adjustments_lot_same_garden_fk" FOREIGN KEY ("garden_id","lot_id") REFERENCES "public"."stock_lots"("garden_id","id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "stock_adjustments_garden_idx" ON "stock_adjustments" USING btree ("garden_id");--> statement-breakpoint
CREATE INDEX "stock_adjustments_lot_idx" ON "stock_adjustments" USING btree ("lot_id");