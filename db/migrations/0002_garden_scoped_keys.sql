CREATE TYPE "public"."amount_measure" AS ENUM('mass', 'volume', 'percent-of-mix');
--> statement-breakpoint
CREATE TABLE "worm_moves" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garden_id" uuid NOT NULL,
	"moved_on" date NOT NULL,
	"from_bin_id" uuid,
	"to_bin_id" uuid,
	"worm_count" integer NOT NULL,
	"note" text,
	"logged_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "worm_moves_count_positive" CHECK ("worm_moves"."worm_count" > 0),
	CONSTRAINT "worm_moves_somewhere" CHECK ("worm_moves"."from_bin_id" is not null or "worm_moves"."to_bin_id" is not null)
);
--> statement-breakpoint
CREATE TABLE "application_draws" (
	"garden_id" uuid NOT NULL,
	"application_id" uuid NOT NULL,
	"lot_id" uuid NOT NULL,
	"amount_si" double precision NOT NULL,
	CONSTRAINT "application_draws_application_id_lot_id_pk" PRIMARY KEY("application_id","lot_id"),
	CONSTRAINT "application_draws_amount_positive" CHECK ("application_draws"."amount_si" > 0)
);
--> statement-breakpoint
ALTER TABLE "crops" DROP CONSTRAINT "crops_feeding_rule_id_feeding_rules_id_fk";
--> statement-breakpoint
ALTER TABLE "plantings" DROP CONSTRAINT "plantings_bed_id_beds_id_fk";
--> statement-breakpoint
ALTER TABLE "plantings" DROP CONSTRAINT "plantings_crop_id_crops_id_fk";
--> statement-breakpoint
ALTER TABLE "plantings" DROP CONSTRAINT "plantings_feeding_rule_id_feeding_rules_id_fk";
--> statement-breakpoint
ALTER TABLE "bin_events" DROP CONSTRAINT "bin_events_bin_id_bins_id_fk";
--> statement-breakpoint
ALTER TABLE "bin_events" DROP CONSTRAINT "bin_events_target_bin_id_bins_id_fk";
--> statement-breakpoint
ALTER TABLE "bins" DROP CONSTRAINT "bins_parent_bin_id_bins_id_fk";
--> statement-breakpoint
ALTER TABLE "stock_lots" DROP CONSTRAINT "stock_lots_bin_id_bins_id_fk";
--> statement-breakpoint
ALTER TABLE "stock_lots" DROP CONSTRAINT "stock_lots_source_event_id_bin_events_id_fk";
--> statement-breakpoint
ALTER TABLE "applications" DROP CONSTRAINT "applications_planting_id_plantings_id_fk";
--> statement-breakpoint
ALTER TABLE "applications" DROP CONSTRAINT "applications_bed_id_beds_id_fk";
--> statement-breakpoint
ALTER TABLE "applications" DROP CONSTRAINT "applications_lot_id_stock_lots_id_fk";
--> statement-breakpoint
ALTER TABLE "gardens" ALTER COLUMN "castings_price_per_kg" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "gardens" ALTER COLUMN "castings_price_per_kg" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "gardens" ALTER COLUMN "castings_price_per_kg" DROP NOT NULL;
--> statement-breakpoint
ALTER TABLE "beds" ALTER COLUMN "length_m" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "beds" ALTER COLUMN "width_m" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "beds" ALTER COLUMN "depth_m" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "beds" ALTER COLUMN "container_volume_l" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "crops" ALTER COLUMN "name" DROP NOT NULL;
--> statement-breakpoint
ALTER TABLE "crops" ALTER COLUMN "edible_touches_soil" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "crops" ALTER COLUMN "edible" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "feeding_rules" ALTER COLUMN "amount_si" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "plantings" ALTER COLUMN "plant_count" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "plantings" ALTER COLUMN "area_m2" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "plantings" ALTER COLUMN "priority" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "plantings" ALTER COLUMN "priority" DROP NOT NULL;
--> statement-breakpoint
ALTER TABLE "bin_events" ALTER COLUMN "food_kg" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bin_events" ALTER COLUMN "castings_kg" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bin_events" ALTER COLUMN "liquid_l" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bin_events" ALTER COLUMN "temperature_c" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bin_events" ALTER COLUMN "moisture_percent" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "tray_length_m" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "tray_width_m" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "tray_depth_m" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "rotation_days" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "rotation_days" DROP NOT NULL;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "processing_days" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "processing_days" DROP NOT NULL;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "fill_fraction" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "fill_fraction" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "fill_fraction" DROP NOT NULL;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "bulk_density_kg_per_l" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "bulk_density_kg_per_l" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "bulk_density_kg_per_l" DROP NOT NULL;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "leachate_estimate_l_per_week" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "leachate_estimate_l_per_week" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "bins" ALTER COLUMN "leachate_estimate_l_per_week" DROP NOT NULL;
--> statement-breakpoint
ALTER TABLE "stock_lots" ALTER COLUMN "initial_amount_si" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "stock_lots" ALTER COLUMN "manure_feedstock" DROP DEFAULT;
--> statement-breakpoint
ALTER TABLE "stock_lots" ALTER COLUMN "manure_feedstock" DROP NOT NULL;
--> statement-breakpoint
ALTER TABLE "applications" ALTER COLUMN "amount_si" SET DATA TYPE double precision;
--> statement-breakpoint
ALTER TABLE "gardens" ADD COLUMN "shelf_life_days" smallint;
--> statement-breakpoint
ALTER TABLE "gardens" ADD COLUMN "liquid_max_age_days" smallint;
--> statement-breakpoint
ALTER TABLE "gardens" ADD COLUMN "tea_castings_per_water" double precision;
--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD COLUMN "amount_measure" "amount_measure";
--> statement-breakpoint
UPDATE "feeding_rules" SET "amount_measure" = CASE
  WHEN "basis" = 'percent-of-mix' THEN 'percent-of-mix'::"amount_measure"
  WHEN "material" = 'castings' THEN 'mass'::"amount_measure"
  ELSE 'volume'::"amount_measure" END;
--> statement-breakpoint
ALTER TABLE "feeding_rules" ALTER COLUMN "amount_measure" SET NOT NULL;
--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD COLUMN "dilution_water_parts" double precision;
--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD COLUMN "tea_castings_per_water" double precision;
--> statement-breakpoint
ALTER TABLE "bin_events" ADD COLUMN "predicted_castings_kg" double precision;
--> statement-breakpoint
ALTER TABLE "bins" ADD COLUMN "intake_fraction_per_day" double precision;
--> statement-breakpoint
ALTER TABLE "bins" ADD COLUMN "density_ceiling_kg_per_m2" double precision;
--> statement-breakpoint
ALTER TABLE "applications" ADD COLUMN "planned_key" text;
--> statement-breakpoint
ALTER TABLE "worm_moves" ADD CONSTRAINT "worm_moves_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "worm_moves" ADD CONSTRAINT "worm_moves_logged_by_users_id_fk" FOREIGN KEY ("logged_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "beds" ADD CONSTRAINT "beds_garden_id_id" UNIQUE("garden_id","id");
--> statement-breakpoint
ALTER TABLE "crops" ADD CONSTRAINT "crops_garden_id_id" UNIQUE("garden_id","id");
--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_garden_id_id" UNIQUE("garden_id","id");
--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_garden_id_id" UNIQUE("garden_id","id");
--> statement-breakpoint
ALTER TABLE "bin_events" ADD CONSTRAINT "bin_events_garden_id_id" UNIQUE("garden_id","id");
--> statement-breakpoint
ALTER TABLE "bins" ADD CONSTRAINT "bins_garden_id_id" UNIQUE("garden_id","id");
--> statement-breakpoint
ALTER TABLE "stock_lots" ADD CONSTRAINT "stock_lots_garden_id_id" UNIQUE("garden_id","id");
--> statement-breakpoint
ALTER TABLE "stock_lots" ADD CONSTRAINT "stock_lots_source_event" UNIQUE("garden_id","source_event_id");
--> statement-breakpoint
ALTER TABLE "applications" ADD CONSTRAINT "applications_garden_id_id" UNIQUE("garden_id","id");
--> statement-breakpoint
ALTER TABLE "applications" ADD CONSTRAINT "applications_planned_once" UNIQUE("garden_id","planned_key");
--> statement-breakpoint
-- Hand-written data steps (drizzle-kit writes schema changes only). Rows already
-- in a database are the old demo seed's; these steps let the new keys hold.
-- Starter crops no longer carry a rule (null = the engine's default for the
-- feeder class), and a planting must use a crop of its own garden: each starter
-- crop a garden uses is copied into that garden.
UPDATE "plantings" SET "feeding_rule_id" = NULL WHERE "feeding_rule_id" IN (SELECT "id" FROM "feeding_rules" WHERE "garden_id" IS NULL);
--> statement-breakpoint
UPDATE "crops" SET "feeding_rule_id" = NULL WHERE "garden_id" IS NULL;
--> statement-breakpoint
DELETE FROM "feeding_rules" WHERE "garden_id" IS NULL;
--> statement-breakpoint
INSERT INTO "crops" ("garden_id", "name", "feeder_class", "edible_touches_soil", "edible")
SELECT DISTINCT p."garden_id", c."name", c."feeder_class", c."edible_touches_soil", c."edible"
FROM "plantings" p JOIN "crops" c ON c."id" = p."crop_id" WHERE c."garden_id" IS NULL;
--> statement-breakpoint
UPDATE "plantings" p SET "crop_id" = g."id"
FROM "crops" s, "crops" g
WHERE s."id" = p."crop_id" AND s."garden_id" IS NULL
  AND g."garden_id" = p."garden_id" AND g."name" = s."name" AND g."feeder_class" = s."feeder_class";
--> statement-breakpoint
INSERT INTO "worm_moves" ("garden_id", "moved_on", "from_bin_id", "to_bin_id", "worm_count", "note", "logged_by")
SELECT "garden_id", "occurred_on", "bin_id", "target_bin_id", "worm_count", "note", "logged_by"
FROM "bin_events" WHERE "kind" = 'worms-moved' AND "worm_count" > 0;
--> statement-breakpoint
DELETE FROM "bin_events" WHERE "kind" = 'worms-moved';
--> statement-breakpoint
-- Applications named one lot; that becomes their one draw.
INSERT INTO "application_draws" ("garden_id", "application_id", "lot_id", "amount_si")
SELECT "garden_id", "id", "lot_id", "amount_si" FROM "applications" WHERE "lot_id" IS NOT NULL;
--> statement-breakpoint
ALTER TABLE "worm_moves" ADD CONSTRAINT "worm_moves_from_same_garden_fk" FOREIGN KEY ("garden_id","from_bin_id") REFERENCES "public"."bins"("garden_id","id") ON DELETE cascade ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "worm_moves" ADD CONSTRAINT "worm_moves_to_same_garden_fk" FOREIGN KEY ("garden_id","to_bin_id") REFERENCES "public"."bins"("garden_id","id") ON DELETE cascade ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "application_draws" ADD CONSTRAINT "application_draws_garden_id_gardens_id_fk" FOREIGN KEY ("garden_id") REFERENCES "public"."gardens"("id") ON DELETE cascade ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "application_draws" ADD CONSTRAINT "application_draws_application_same_garden_fk" FOREIGN KEY ("garden_id","application_id") REFERENCES "public"."applications"("garden_id","id") ON DELETE cascade ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "application_draws" ADD CONSTRAINT "application_draws_lot_same_garden_fk" FOREIGN KEY ("garden_id","lot_id") REFERENCES "public"."stock_lots"("garden_id","id") ON DELETE no action ON UPDATE no action;
--> statement-breakpoint
CREATE INDEX "worm_moves_garden_idx" ON "worm_moves" USING btree ("garden_id");
--> statement-breakpoint
CREATE INDEX "application_draws_lot_idx" ON "application_draws" USING btree ("lot_id");
--> statement-breakpoint
ALTER TABLE "crops" ADD CONSTRAINT "crops_rule_same_garden_fk" FOREIGN KEY ("garden_id","feeding_rule_id") REFERENCES "public"."feeding_rules"("garden_id","id") ON DELETE no action ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_bed_same_garden_fk" FOREIGN KEY ("garden_id","bed_id") REFERENCES "public"."beds"("garden_id","id") ON DELETE cascade ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_crop_same_garden_fk" FOREIGN KEY ("garden_id","crop_id") REFERENCES "public"."crops"("garden_id","id") ON DELETE no action ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_rule_same_garden_fk" FOREIGN KEY ("garden_id","feeding_rule_id") REFERENCES "public"."feeding_rules"("garden_id","id") ON DELETE no action ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "bin_events" ADD CONSTRAINT "bin_events_bin_same_garden_fk" FOREIGN KEY ("garden_id","bin_id") REFERENCES "public"."bins"("garden_id","id") ON DELETE cascade ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "bin_events" ADD CONSTRAINT "bin_events_target_same_garden_fk" FOREIGN KEY ("garden_id","target_bin_id") REFERENCES "public"."bins"("garden_id","id") ON DELETE no action ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "bins" ADD CONSTRAINT "bins_parent_same_garden_fk" FOREIGN KEY ("garden_id","parent_bin_id") REFERENCES "public"."bins"("garden_id","id") ON DELETE no action ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "stock_lots" ADD CONSTRAINT "stock_lots_bin_same_garden_fk" FOREIGN KEY ("garden_id","bin_id") REFERENCES "public"."bins"("garden_id","id") ON DELETE no action ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "stock_lots" ADD CONSTRAINT "stock_lots_event_same_garden_fk" FOREIGN KEY ("garden_id","source_event_id") REFERENCES "public"."bin_events"("garden_id","id") ON DELETE no action ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "applications" ADD CONSTRAINT "applications_planting_same_garden_fk" FOREIGN KEY ("garden_id","planting_id") REFERENCES "public"."plantings"("garden_id","id") ON DELETE cascade ON UPDATE no action;
--> statement-breakpoint
ALTER TABLE "stock_lots" DROP COLUMN "remaining_amount_si";
--> statement-breakpoint
ALTER TABLE "stock_lots" DROP COLUMN "si_unit";
--> statement-breakpoint
ALTER TABLE "applications" DROP COLUMN "bed_id";
--> statement-breakpoint
ALTER TABLE "applications" DROP COLUMN "lot_id";
--> statement-breakpoint
ALTER TABLE "applications" DROP COLUMN "si_unit";
--> statement-breakpoint
ALTER TABLE "beds" ADD CONSTRAINT "beds_size_for_kind" CHECK (("beds"."kind" = 'bed' and "beds"."length_m" > 0 and "beds"."width_m" > 0)
        or ("beds"."kind" = 'container' and "beds"."container_volume_l" > 0));
--> statement-breakpoint
ALTER TABLE "crops" ADD CONSTRAINT "crops_starter_without_rule" CHECK ("crops"."garden_id" is not null or "crops"."feeding_rule_id" is null);
--> statement-breakpoint
ALTER TABLE "crops" ADD CONSTRAINT "crops_starter_named" CHECK ("crops"."garden_id" is not null or "crops"."name" is not null);
--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_amount_non_negative" CHECK ("feeding_rules"."amount_si" >= 0);
--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_percent_of_mix" CHECK (("feeding_rules"."basis" = 'percent-of-mix') = ("feeding_rules"."amount_measure" = 'percent-of-mix'));
--> statement-breakpoint
ALTER TABLE "feeding_rules" ADD CONSTRAINT "feeding_rules_liquids_by_volume" CHECK ("feeding_rules"."material" = 'castings' or "feeding_rules"."amount_measure" = 'volume');
--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_plant_count_positive" CHECK ("plantings"."plant_count" > 0);
--> statement-breakpoint
ALTER TABLE "plantings" ADD CONSTRAINT "plantings_end_after_start" CHECK ("plantings"."ended_on" is null or "plantings"."ended_on" >= "plantings"."planted_on");
--> statement-breakpoint
ALTER TABLE "bins" ADD CONSTRAINT "bins_tray_count_positive" CHECK ("bins"."tray_count" > 0);
--> statement-breakpoint
ALTER TABLE "stock_lots" ADD CONSTRAINT "stock_lots_amount_non_negative" CHECK ("stock_lots"."initial_amount_si" >= 0);
--> statement-breakpoint
ALTER TABLE "applications" ADD CONSTRAINT "applications_amount_positive" CHECK ("applications"."amount_si" > 0);
--> statement-breakpoint
DROP TYPE "public"."si_unit";
